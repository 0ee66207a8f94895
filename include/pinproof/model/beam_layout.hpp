// How a beam is supported (docs/method/layouts.md):
//
//   two_supports  a vertical support at each end (x = 0 and x = L), each end
//                 restrained by its joint's rotational spring. The default.
//   cantilever    one support at the start (x = 0), the root, whose joint is
//                 the only restraint; the end (x = L) is a free tip. A root
//                 without stiffness is a mechanism and is never solved.
//
// Signs: sign_conventions.hpp (for a cantilever, rotation_end is -theta(L) at
// the tip, so a tip dropping under gravity turns through a negative rotation_end).
#pragma once

#include <string>
#include <vector>

namespace pinproof {

enum class beam_layout { two_supports, cantilever };

std::string to_string(beam_layout l);  // "two-supports", "cantilever"
// Throws std::invalid_argument for an unknown spelling.
beam_layout parse_beam_layout(const std::string& s);
// The spellings the reader accepts, in order.
const std::vector<std::string>& beam_layout_names();

}  // namespace pinproof
