// The beam line of a joint that follows a moment-rotation law: the law's
// curve M(theta) at both bounds of the joint's stiffness range, the beam line
// of every strength combination (the far joint at its lower bound, following
// its own law where it has one), and the working points where they meet.
//
// Axes: end rotation in mrad (the sense that opens the joint positive) and
// end moment in the project's units, hogging positive (docs/method/joint-laws.md).
#pragma once

#include <optional>
#include <string>

#include "pinproof/model/project.hpp"
#include "pinproof/report/svg_chart.hpp"

namespace pinproof {

struct law_beam_line_chart {
    line_chart chart;
    std::string caption;  // what is drawn, in words, for the report's figure
};

// nullopt where the joint has no law, or no strength combination bends
// hogging moment into it (nothing to draw).
std::optional<law_beam_line_chart> joint_law_beam_lines(const project& p, const beam& b, beam_end e);

}  // namespace pinproof
