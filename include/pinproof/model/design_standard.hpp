// The design standard a project is checked to, and the bracing of its frame:
// the two project-wide choices that select which code's rules apply. An EN
// project is checked with EN 1993-1-8 and EN 1990 only, a US project with
// AISC 360 only; no rule of one is applied to the other.
#pragma once

#include <string>

namespace pinproof {

enum class design_standard { en1993_1_8, aisc360 };
enum class frame_bracing { braced, unbraced };

std::string to_string(design_standard s);  // "EN1993-1-8", "AISC360"
std::string to_string(frame_bracing f);    // "braced", "unbraced"
// Throw std::invalid_argument for an unknown spelling.
design_standard parse_design_standard(const std::string& s);
frame_bracing parse_frame_bracing(const std::string& s);

}  // namespace pinproof
