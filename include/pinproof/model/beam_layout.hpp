// How a beam is supported (docs/method/layouts.md):
//
//   two_supports  a vertical support at each end (x = 0 and x = L), each end
//                 restrained by its joint's rotational spring. The default.
//   cantilever    one support at the start (x = 0), the root, whose joint is
//                 the only restraint; the end (x = L) is a free tip. A root
//                 without stiffness is a mechanism and is never solved.
//   overhang      a vertical support at the start (x = 0), restrained by the
//                 start joint's spring as on two supports, and one at x = L
//                 over which the beam runs on, continuous, to a free tip at
//                 x = L + a (a the overhang). No end joint.
//
// Signs: sign_conventions.hpp (for a cantilever, rotation_end is -theta(L) at
// the tip, so a tip dropping under gravity turns through a negative rotation_end;
// for an overhang, rotation_end is at the end support and rotation_tip at the tip,
// both -theta(x)).
#pragma once

#include <string>
#include <vector>

namespace pinproof {

enum class beam_layout { two_supports, cantilever, overhang };

std::string to_string(beam_layout l);  // "two-supports", "cantilever", "overhang"
// Throws std::invalid_argument for an unknown spelling.
beam_layout parse_beam_layout(const std::string& s);
// The spellings the reader accepts, in order.
const std::vector<std::string>& beam_layout_names();

}  // namespace pinproof
