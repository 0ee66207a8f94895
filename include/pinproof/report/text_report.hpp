// The plain-text report of `pinproof check`: one block per beam, aligned
// tables with units in the unit system the project file used, a legend and
// the cautions.
#pragma once

#include <string>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

std::string text_report(const project_assessment& a, const std::string& version);

// A combination as reports write it: "1.35 G + 1.50 Q".
std::string combination_text(const combination& c);

// The caution every report carries.
inline constexpr const char* caution_text =
    "Results support, and do not replace, the judgement of a qualified engineer. Local codes and licensed "
    "practice govern. Check the input against the drawings before relying on any result.";

}  // namespace pinproof
