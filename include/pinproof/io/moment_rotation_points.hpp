// Measured moment-rotation points of a joint test, read from CSV for fitting a
// joint law (`pinproof fit`).
//
// Format: a header line `rotation,moment` (any case, spaces around names
// allowed), then one point per line, each cell a quantity with its unit:
//   rotation,moment
//   2.5 mrad,10.4 kN*m
//   0.005 rad,18.1 kN*m
// Blank lines are skipped. Rotations must be > 0 and moments >= 0, finite; a
// file needs at least two points (a law needs more: the fit says how many).
// Problems are reported at "line L, column C".
#pragma once

#include <string>
#include <string_view>
#include <vector>

#include "pinproof/core/units.hpp"

namespace pinproof {

struct measured_point {
    double rotation = 0;  // rad
    double moment = 0;    // N*m
};

struct moment_rotation_points {
    std::vector<measured_point> points;
    unit_system system = unit_system::neutral;  // of the moments: how to show results
};

// Throws input_error with every problem found (line and column each).
moment_rotation_points read_moment_rotation_points(std::string_view text);

}  // namespace pinproof
