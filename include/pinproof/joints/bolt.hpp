// Bolts of simple joints: grades, areas and the design resistance of one bolt
// in shear and in bearing, each standard in its own terms.
//
// EN 1993-1-8:2005 Table 3.4 (gamma_M2 = 1.25, the recommended value; the
// formulas seen in several transcriptions of the table, reference pack 10.1):
//   shear per plane  F_v,Rd = alpha_v f_ub A / gamma_M2, A = A_s where the plane
//                    passes through the thread, else the shank area; alpha_v =
//                    0.6 (4.6, 5.6, 8.8, or any class through the shank), 0.5
//                    (4.8, 5.8, 6.8, 10.9 through the thread)
//   bearing          F_b,Rd = k_1 alpha_b f_u d t / gamma_M2, alpha_b = min(alpha_d,
//                    f_ub/f_u, 1), alpha_d = e_1/(3 d_0) (end bolt) or p_1/(3 d_0) - 1/4
//                    (inner bolt) in the direction of the load; k_1 = min(2.8 e_2/d_0 - 1.7,
//                    1.4 p_2/d_0 - 1.7, 2.5) (edge bolt) or min(1.4 p_2/d_0 - 1.7, 2.5)
//                    (inner bolt) across it
// AISC 360-16 (reference pack 10.3, from memory unless said):
//   shear            phi r_n = phi F_nv A_b, phi = 0.75, Table J3.2: Group A (A325)
//                    N 54 ksi, X 68 ksi; Group B (A490) N 68 ksi, X 84 ksi
//   bearing and      phi r_n = phi min(1.2 l_c t F_u, 2.4 d t F_u), phi = 0.75 (J3.10,
//   tear-out         deformation at the hole at service a design consideration)
// Units: SI (m, N, Pa).
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pinproof {

enum class bolt_grade { g4_6, g8_8, g10_9, a325, a490 };
std::string to_string(bolt_grade g);  // "4.6", "8.8", "10.9", "A325", "A490"
std::optional<bolt_grade> parse_bolt_grade(std::string_view text);
const std::vector<std::string>& bolt_grade_names();
bool is_us_grade(bolt_grade g);  // A325, A490

// Nominal ultimate and yield strengths of the bolt material (Pa): EN ISO 898-1
// classes 400/240, 800/640, 1000/900 MPa (pack 10.1); ASTM F3125 Grade A325
// 120 ksi and A490 150 ksi tensile (from memory; the US resistances use F_nv).
double bolt_fub(bolt_grade g);
double bolt_fyb(bolt_grade g);

// Tensile stress area A_s (m^2) of a metric coarse-thread bolt: M12 84.3, M16 157,
// M20 245, M22 303, M24 353, M27 459, M30 561 mm^2 (ISO 898-1; pack 10.1 for
// M12 to M30, M22 and M27 from memory). nullopt for another diameter.
std::optional<double> metric_stress_area(double diameter);
// Shank (nominal) area pi d^2 / 4.
double shank_area(double diameter);

// EN 1993-1-8 Table 3.4: one shear plane. Throws std::invalid_argument for a US grade
// or a metric diameter without a stress area.
double en_bolt_shear_resistance(bolt_grade g, double diameter, bool threads_in_shear_plane,
                                double gamma_M2 = 1.25);

// Geometry of one bolt for bearing, in the direction of the load (1) and across it (2).
struct bearing_geometry {
    double hole = 0;                  // d_0
    std::optional<double> e1, p1;     // end distance (end bolt) or pitch (inner bolt)
    std::optional<double> e2, p2;     // edge distance (edge bolt) and/or pitch across
};

struct bearing_factors {
    double alpha_b = 0, k1 = 0;
};
// alpha_b and k_1 of Table 3.4 (an end bolt takes e1; an inner bolt p1; the
// smaller alpha_d governs when both are given). Throws std::invalid_argument
// when neither e1 nor p1, or neither e2 nor p2, is given.
bearing_factors en_bearing_factors(const bearing_geometry& g, double diameter, double fub, double fu);
double en_bolt_bearing_resistance(const bearing_geometry& g, double diameter, double fub, double fu,
                                  double thickness, double gamma_M2 = 1.25);

// AISC 360-16 J3.6 with Table J3.2: design shear strength phi r_n of one bolt
// in one plane. Throws std::invalid_argument for an EN grade.
double aisc_bolt_shear_strength(bolt_grade g, double diameter, bool threads_in_shear_plane);
// AISC 360-16 J3.10(a)(i): design bearing and tear-out strength phi r_n at one hole,
// with clear distance l_c to the edge or the next hole in the direction of the force.
double aisc_bolt_bearing_strength(double diameter, double clear_distance, double thickness, double Fu);

}  // namespace pinproof
