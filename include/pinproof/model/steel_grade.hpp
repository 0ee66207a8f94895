// Structural steel grades and their strengths, for the beam (plastic moment)
// and for plates, cleats and webs (the joint's components).
//
// European grades (EN 10025-2:2019 Table 7, hot-rolled non-alloy steels; from
// memory, verify in print): the minimum yield strength falls with the nominal
// thickness t in steps
//            t <= 16   <= 40   <= 63   <= 80   <= 100  <= 150 mm
//   S235       235      225     215     215     215     195   MPa
//   S275       275      265     255     245     235     225
//   S355       355      345     335     325     315     295
//   S460       460      440     430     410     400     380
// and the tensile strength is the lower end of the range for 3 < t <= 100 mm:
// S235 360, S275 410, S355 470, S460 540 MPa (550 below 3 mm is not used).
// These are the product standard's values, which the UK National Annex to
// EN 1993-1-1 adopts; EN 1993-1-1 Table 3.1 rounds them into two bands (t <= 40,
// 40 < t <= 80 mm) with higher fu (430, 490 MPa for S275, S355). The product
// standard's lower values are used here, on the safe side.
//
// US grades (ASTM A36, A572 Grade 50, A992; AISC Steel Construction Manual
// Table 2-4; from memory): Fy / Fu = 36 / 58, 50 / 65, 50 / 65 ksi, with no
// reduction by thickness within the shapes and plates this tool handles.
//
// Each standard in its own terms: a European project takes S grades, a US
// project takes ASTM grades (refused otherwise at the input, which knows the
// project's standard).
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pinproof {

enum class steel_grade { s235, s275, s355, s460, a36, a572_50, a992, user };

// "S235", "S275", "S355", "S460", "A36", "A572-50", "A992"; "user" for given strengths.
std::string to_string(steel_grade g);
std::optional<steel_grade> parse_steel_grade(std::string_view text);
const std::vector<std::string>& steel_grade_names();  // the named grades, in the order above
bool is_us_grade(steel_grade g);                        // A36, A572-50, A992

// A steel as given in a file: a named grade, or strengths given by the user
// (grade user, fy and optionally fu given).
struct steel_material {
    steel_grade grade = steel_grade::s275;
    double fy_given = 0;  // Pa; grade user only
    double fu_given = 0;  // Pa; grade user only, 0 when not given

    // Yield strength (Pa) of an element of nominal thickness t (m). Throws
    // std::invalid_argument for t beyond the grade's table (150 mm for EN grades).
    double fy(double thickness) const;
    // Tensile strength (Pa); nullopt for a user steel given without fu.
    std::optional<double> fu(double thickness) const;
    // "S275", "A992", or "fy = 300 MPa (given)".
    std::string name() const;
};

}  // namespace pinproof
