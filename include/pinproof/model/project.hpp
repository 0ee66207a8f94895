// A pinproof project: the contents of a project file (format
// "pinproof-project/1", docs/file-format.md), in SI base units. The reader
// is io/project_input.hpp.
#pragma once

#include <optional>
#include <string_view>
#include <string>
#include <vector>

#include "pinproof/model/design_standard.hpp"
#include "pinproof/model/joint.hpp"
#include "pinproof/model/loads.hpp"
#include "pinproof/model/section.hpp"
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
    double span = 0;   // m
    double E = 0;      // Pa
    bool E_is_default = false;  // E was not given; the standard's value is used
    section sec;
    std::vector<load> loads;
    std::vector<combination> combinations;
    joint start, end;
    std::optional<deflection_limit> deflection;
    // 1: both joints are the same connection type, one stiffness draw for both;
    // 0: independent (docs/method/sweep-and-probability.md).
    int stiffness_correlation = 1;
    std::string pointer;  // JSON pointer of the beam in its file, e.g. "/beams/0"
    double EI() const { return E * sec.I; }
    const joint& at(beam_end e) const { return e == beam_end::start ? start : end; }
};

struct project {
    std::string format;  // "pinproof-project/1"
    std::string title;
    design_standard standard = design_standard::en1993_1_8;
    frame_bracing frame = frame_bracing::braced;
    unit_system units = unit_system::si;  // the system the file used, for reports
    std::vector<beam> beams;
};

}  // namespace pinproof
