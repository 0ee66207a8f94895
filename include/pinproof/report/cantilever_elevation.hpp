// Elevation sketch of a cantilever, as a self-contained SVG document (not to
// scale vertically): the supporting member hatched at the root on the left,
// the root joint's rotational spring drawn as a coil with its stiffness range,
// the member to the free tip on the right, each load as arrows at its place
// (a line load as a row of arrows over its extent, a point load as one arrow,
// a point moment as a curved arrow, clockwise + as sign_conventions.hpp), and
// the length dimensioned below. Loads are unfactored, labelled with their case.
#pragma once

#include <string>

#include "pinproof/model/project.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

// Throws std::invalid_argument for a beam that is not a cantilever.
std::string cantilever_elevation_svg(const beam& b, unit_system units);

}  // namespace pinproof
