// Reading and validating the `detail` object of a joint (docs/file-format.md,
// defaults and their sources in docs/method/gap-geometry.md).
#pragma once

#include <nlohmann/json_fwd.hpp>

#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/model/connection_detail.hpp"

namespace pinproof {

// Reads the `detail` object of a joint at JSON pointer `pointer`, applies the
// documented defaults and validates it against the supported beam's section
// and the project's standard (its plate and bolt grades, its edge-distance and
// weld rules).
// Every problem is added to `problems` with the pointer of the field at fault;
// the returned value is meaningful only when no problem was added.
connection_detail read_connection_detail(const nlohmann::json& value, const std::string& pointer,
                                         const section& beam, problem_list& problems,
                                         design_standard standard = design_standard::en1993_1_8);

// The rules a fin plate (or an end plate) must meet for its joint to be
// derived from it ("from-detail"): every bolt hole inside the plate, and the
// plate's end distances above the top bolt and below the bottom bolt, its edge
// distance and (fin plate) the web's end distance to the beam end, or (end
// plate) the distance from each bolt line to the plate's side edge, no smaller
// than the code's minimum (EN 1993-1-8 Table 3.3, AISC 360-16 Table J3.4). Problems go to `problems`
// with the pointer of the field at fault under `pointer` (the detail's),
// lengths shown in `units` (the file's).
void check_fin_plate_derivable(const connection_detail& d, const std::string& pointer, design_standard standard,
                               problem_list& problems, unit_system units = unit_system::neutral);

}  // namespace pinproof
