// A group of bolts in one plane under a shear force and a moment about its
// centroid, by the elastic method: each bolt takes an equal share of the
// force and a share of the moment proportional to its distance r_i from the
// centroid, at right angles to r_i (the instantaneous-centre refinements are
// not used: they give more, not less, resistance).
//   force on bolt i   F_i = V/n + M r_i / sum(r^2) (vectorially)
//   moment resistance M_Rd = F_Rd sum(r^2) / r_max with no shear (a textbook
//                     result; reference pack 10.2, from memory)
// For one vertical line of n bolts at pitch p_1 with the shear at a lever arm z,
// this is the simple-joints design guides' V_Rd = n F_Rd / sqrt((1 + alpha n)^2 +
// (beta n)^2) with alpha = 0, beta = 6 z / (n (n + 1) p_1) (reference pack 10.2).
// The group's rotational stiffness: each bolt a translational spring k_i, so
// S = sum(k_i r_i^2) about the centroid (the component method's bolts in shear
// and in bearing, EN 1993-1-8 Table 6.11 components 11 and 12, in series per
// bolt); the free rotation before the bolts bear: (d_0 - d) / r_max for the bolt
// furthest out (reference pack 10.5, derived from the geometry).
// Units: SI. Coordinates: x horizontal (along the beam), y vertical.
#pragma once

#include <vector>

namespace pinproof {

struct bolt_position {
    double x = 0, y = 0;  // m
};

// A rectangular pattern: `lines` vertical lines at gauge p2, `rows` rows at pitch p1.
std::vector<bolt_position> bolt_pattern(int rows, double pitch, int lines = 1, double gauge = 0);

class bolt_group {
public:
    // Throws std::invalid_argument for an empty group or a group whose bolts all
    // coincide (no moment can be carried).
    explicit bolt_group(std::vector<bolt_position> bolts);

    std::size_t size() const noexcept { return bolts_.size(); }
    double polar_moment() const noexcept { return polar_; }  // sum(r_i^2), m^2
    double furthest() const noexcept { return r_max_; }       // r_max, m

    // The largest bolt force (N) under a vertical shear V at horizontal lever
    // arm z from the centroid (the moment V z about it).
    double largest_bolt_force(double V, double z) const;
    // The vertical shear resistance with the eccentricity z, for bolts of
    // resistance F_Rd each: V_Rd with largest_bolt_force(V_Rd, z) = F_Rd.
    double shear_resistance(double F_Rd, double z) const;
    // The moment resistance about the centroid with no shear: F_Rd sum(r^2) / r_max.
    double moment_resistance(double F_Rd) const;
    // The rotational stiffness (N*m/rad) of bolts of translational stiffness k (N/m).
    double rotational_stiffness(double k) const;
    // The rotation (rad) the group turns freely before its furthest bolt bears,
    // with hole clearance (d_0 - d).
    double free_rotation(double clearance) const;

private:
    std::vector<bolt_position> bolts_;  // relative to the centroid
    double polar_ = 0, r_max_ = 0;
};

// EN 1993-1-8 Table 6.11, component stiffness coefficients (lengths, m; the
// spring is E k), non-preloaded bolts, from memory (reference pack 2.3):
//   k_11 bolts in shear     16 n_b d^2 f_ub / (E d_M16), d_M16 = 16 mm
//   k_12 bolts in bearing   24 n_b k_b k_t d f_u / E, k_b = min(k_b1, k_b2),
//                           k_b1 = 0.25 e_b/d + 0.5 <= 1.25, k_b2 = 0.25 p_b/d + 0.375 <= 1.25,
//                           k_t = 1.5 t_j / d_M16 <= 2.5
// for one bolt (n_b = 1).
double en_k11_bolt_shear(double diameter, double fub, double E);
double en_k12_bolt_bearing(double diameter, double fu, double thickness, double end_distance, double pitch, double E);

}  // namespace pinproof
