// A coordinate or length written into an SVG drawing or chart, in pixels:
// fixed-point with a given number of decimals (a tenth of a pixel is finer
// than any screen or print shows), a value that rounds to zero written as
// zero (never "-0.0"). A coordinate that is not finite is an internal error:
// no drawing carries NaN or infinity.
#pragma once

#include <string>

namespace pinproof {

std::string svg_number(double v, int decimals = 1);

}  // namespace pinproof
