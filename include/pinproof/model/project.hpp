// A pinproof project: the contents of a project file (format
// "pinproof-project/1", docs/file-format.md), in SI base units. The reader
// is io/project_input.hpp.
#pragma once

#include <optional>
#include <string_view>
#include <string>
#include <vector>

#include "pinproof/model/beam_layout.hpp"
#include "pinproof/model/design_standard.hpp"
#include "pinproof/model/joint.hpp"
#include "pinproof/model/loads.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/model/steel_grade.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

// A service deflection limit: span / ratio, or an absolute length.
struct deflection_limit {
    std::optional<double> span_ratio;  // e.g. 360 for "span/360"
    std::optional<double> absolute;    // m
    std::string text;                  // as written, for the report
    double value(double span) const { return span_ratio ? span / *span_ratio : *absolute; }
};

struct beam {
    std::string id;
    std::string description;
    double span = 0;   // m (a cantilever: root to tip; an overhang: between the supports)
    // How the beam is supported (beam_layout.hpp). A cantilever's start joint
    // is its root; its end is a free tip whose joint is a pin by construction
    // (the file gives none).
    beam_layout layout = beam_layout::two_supports;
    // An overhang: the length beyond the end support to the free tip (m); 0
    // in the other layouts. Load positions run from the start over the whole
    // length span + overhang.
    double overhang = 0;
    double E = 0;      // Pa
    bool E_is_default = false;  // E was not given; the standard's value is used
    section sec;
    std::vector<load> loads;
    std::vector<combination> combinations;
    joint start, end;
    std::optional<deflection_limit> deflection;
    // The least first natural frequency under a vibration combination (Hz).
    std::optional<double> frequency_limit;
    // A cantilever: the largest increase of the tip deflection over the
    // rigid-root value that still counts as a fixed root (a fraction; 0.10
    // unless given, docs/method/layouts.md).
    double root_flexibility_limit = 0.10;
    bool root_flexibility_is_default = true;
    // 1: both joints are the same connection type, one stiffness draw for both;
    // 0: independent (docs/method/sweep-and-probability.md).
    int stiffness_correlation = 1;
    std::string pointer;  // JSON pointer of the beam in its file, e.g. "/beams/0"
    // The beam's steel, where given: its plastic moment, the strength
    // classification of the joints and the collapse of the beam need it.
    std::optional<steel_material> steel;
    double EI() const { return E * sec.I; }
    // Design plastic moment: W_pl f_y / gamma_M0 (EN 1993-1-1 6.2.5, gamma_M0 = 1.0,
    // f_y by the flange thickness per EN 10025-2) or the nominal M_p = F_y Z (AISC 360
    // F2.1); nullopt without a steel or a plastic modulus.
    std::optional<double> plastic_moment() const
    {
        if (!steel || !sec.W_pl) return std::nullopt;
        return *sec.W_pl * steel->fy(sec.flange_thickness.value_or(0.0));
    }
    const joint& at(beam_end e) const { return e == beam_end::start ? start : end; }
};

// The job a calculation belongs to, as a consultancy's calc sheets carry it:
// printed in the running header and footer of the HTML report and at the
// head of the text report. Every field is optional ("" when not given).
struct job_info {
    std::string number, title, made_by, checked_by, revision, date;
};

struct project {
    std::string format;  // "pinproof-project/1"
    std::string title;
    std::optional<job_info> job;
    design_standard standard = design_standard::en1993_1_8;
    frame_bracing frame = frame_bracing::braced;
    unit_system units = unit_system::si;  // the system the file used, for reports
    std::vector<beam> beams;
};

}  // namespace pinproof
