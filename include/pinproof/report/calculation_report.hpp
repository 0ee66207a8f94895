// The calculation report of `pinproof report`: one self-contained HTML file
// (inline CSS and SVG, no scripts, no fonts or images fetched), printable on
// A4 and Letter, with the inputs, the method in brief, per beam the diagrams,
// the stiffness sweep, the beam-line charts, the gap drawings, the checks,
// the verdict, the references and the cautions (docs/report.md).
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/model/project.hpp"

namespace pinproof {

struct report_info {
    std::string input_file;    // the project file's name as given
    std::string input_sha256;  // SHA-256 of the file's bytes, 64 hex digits
    std::string date;          // ISO 8601, e.g. "2026-12-02"; passed in so reports are reproducible
    std::string version;       // of pinproof
};

// `a` must be assess_project(p).
std::string calculation_report_html(const project& p, const project_assessment& a, const report_info& info);

// Text made safe for HTML element content and quoted attribute values.
std::string html_escape(std::string_view text);

// SHA-256 of `bytes` (FIPS 180-4) as 64 lower-case hex digits.
std::string input_hash(std::string_view bytes);

// The beam line of one end (common practice of semi-rigid design; the
// construction of the beam-line method). With the far joint held at its
// lower-bound stiffness, the end moment is linear in the end rotation:
//   M = M_F (1 - theta / theta_s),
// M_F the hogging end moment with this joint rigid, theta_s the end rotation
// with this joint pinned. A joint of stiffness S carries M = S theta; the
// intersection is the analysis result for that pair of joints.
struct beam_line_point {
    stiffness joint = stiffness::pinned();
    double rotation = 0;  // rad
    double moment = 0;    // N*m, hogging +
};

struct beam_line {
    beam_end end = beam_end::start;
    stiffness far_end = stiffness::pinned();  // the far joint's lower bound
    double fixed_moment = 0;                  // M_F, N*m
    double pinned_rotation = 0;               // theta_s, rad
    beam_line_point lower, upper;             // with this joint's S_min and S_max
};

beam_line beam_line_of(const beam& b, const combination& c, beam_end e);

// The elevation drawing (SVG) of a joint's gap detail at the worst-case gap,
// turned to the gap check's rotation demand; nullopt when the joint has no detail.
std::optional<std::string> gap_detail_svg(const beam& b, beam_end e, const beam_assessment& a,
                                          unit_system units = unit_system::si);

}  // namespace pinproof
