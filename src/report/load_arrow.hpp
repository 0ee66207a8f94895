// The arrow of a load on an elevation drawing (report/beam_elevation,
// report/cantilever_elevation): a shaft and a filled head. A downward load's
// head touches the member's side at y (the shaft `length` above it); an
// uplift's shaft stands on y with its head `length` above, pointing away from
// the member. SVG user units, y downward; coordinates to 0.1 px.
#pragma once

#include <string>

namespace pinproof {

std::string load_arrow_svg(double x, double y, double length, bool down, const std::string& colour,
                           const std::string& stroke_width);

}  // namespace pinproof
