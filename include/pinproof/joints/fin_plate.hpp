// A fin plate joint worked out from its detail under EN 1993-1-8: the
// resistance of each component to the beam's end shear, the joint's moment
// resistance and governing component, its initial rotational stiffness and
// the free rotation its bolt holes allow.
//
// One vertical line of bolts through the plate and the beam web (the common
// fin plate); the shear V acts at the support face and reaches the bolt line
// at the lever arm z = gap + bolt line (reference pack 10.2). Components and
// sources (EN 1993-1-8:2005 unless said; gamma_M0 = 1.0, gamma_M2 = 1.25):
//   bolt-shear          bolt group under V at z, F_v,Rd of Table 3.4 (bolt_group.hpp)
//   bolt-bearing-plate  the group with F_b,Rd of Table 3.4 in the plate, the smaller
//                       of the vertical and horizontal directions for every bolt (the
//                       bolt forces of an eccentric group lean; taking the smaller is
//                       on the safe side)
//   bolt-bearing-web    likewise in the beam web (no end distance above the top bolt in
//                       an uncoped web; the end distance to the beam end horizontally)
//   plate-shear         gross h_p t_p f_y/(1.27 sqrt(3) gamma_M0) (the 1.27 allows for the
//                       bending at the bolt line, the simple-joints design guide, from
//                       memory) and net (h_p - n d_0) t_p f_u/(sqrt(3) gamma_M2), EN 1993-1-1
//                       6.2.6 and 1993-1-8 3.10
//   plate-block-tearing 3.10.2(3), eccentric: 0.5 f_u A_nt/gamma_M2 + f_y A_nv/(sqrt(3) gamma_M0),
//                       the block below the top bolt between the bolt line and the free edge
//   plate-bending       W_el f_y/(z gamma_M0), W_el = t_p h_p^2/6, where h_p < 2.73 z (the
//                       guide's limit, from memory); not critical otherwise
//   weld                two fillet welds of the plate's depth, the simplified method 4.5.3.3
//                       (f_vw,d = f_u/(sqrt(3) beta_w gamma_M2), beta_w 0.85 S275, 0.9 S355)
//                       under V and V z at the weld, elastic
//   web-shear           the beam web, EN 1993-1-1 6.2.6: A_v f_y/(sqrt(3) gamma_M0), A_v of the
//                       rolled section, or t_w times the depth left by copes
// Stiffness (Table 6.11, from memory; reference pack 2.3): per bolt, bolts in
// shear (k_11) and bearing on the plate and on the web (k_12) in series; the
// group's S_j,ini = E k_bolt sum(r^2). Free rotation: (d_0 - d)/r_max.
// Units: SI.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "pinproof/joints/bolt.hpp"
#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/derived_joint.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/model/steel_grade.hpp"

namespace pinproof {

struct fin_plate_inputs {
    bolt_grade bolts = bolt_grade::g8_8;
    bool threads_in_shear_plane = true;
    std::optional<double> plate_edge_distance;  // m, bolt line to the plate's free vertical edge; default 2 d
    std::optional<double> weld_throat;          // m; nullopt: the weld is not derived
    steel_material beam_steel;                  // the beam web's steel
    double E = 210e9;
};

struct fin_plate_joint {
    std::vector<joint_component> components;
    double shear_resistance = 0;       // N, the smallest component resistance
    std::string governing;             // its id
    double moment_resistance = 0;      // N*m, the bolt group with its weakest bolt, no shear
    std::string moment_governing;      // "bolt-shear", "bolt-bearing-plate" or "bolt-bearing-web"
    double initial_stiffness = 0;      // N*m/rad
    double free_rotation = 0;          // rad
    double lever_arm = 0;              // z, m
    double plate_edge_distance = 0;    // m, as used
    bool plate_edge_distance_default = false;
};

// Throws std::invalid_argument for a detail that is not a fin plate, a US bolt
// grade (EN 1993-1-8 is for EN projects) or a geometry that puts a bolt
// outside the plate.
fin_plate_joint derive_fin_plate(const connection_detail& d, const section& beam, const fin_plate_inputs& in);

// The same joint under AISC 360-16 (LRFD design strengths, phi included), for
// US projects: a single-plate shear connection with one vertical row of bolts.
// Components (AISC 360-16; from memory unless the reference pack confirms):
//   bolt-shear          J3.6, Table J3.2, the bolt group by the elastic method
//                       with the full distance z from the support face (on the
//                       safe side of the Manual's instantaneous-centre coefficients)
//   bolt-bearing-plate  J3.10(a)(i): 0.75 min(1.2 l_c t F_u, 2.4 d t F_u) per bolt, the
//   bolt-bearing-web    smaller of the vertical and horizontal clear distances
//   plate-shear         J4.2: shear yielding 1.00 * 0.6 F_y A_gv, rupture 0.75 * 0.6 F_u A_nv
//   plate-block-tearing J4.3: 0.75 (0.6 F_u A_nv + U_bs F_u A_nt) <= 0.75 (0.6 F_y A_gv +
//                       U_bs F_u A_nt), U_bs = 1
//   plate-bending       F1 / the Manual's single-plate flexure: 0.90 F_y Z / z, Z = t h^2/4
//   weld                J2.4: two fillets, 0.75 * 0.6 F_EXX (70 ksi) on the throat, under V and V z
//   web-shear           G2.1: 1.00 * 0.6 F_y d t_w (C_v1 = 1 for rolled I shapes of ordinary webs)
// The conventional configuration's dimensional limits (2 to 12 rows, bolt line
// within 3 1/2 in of the weld, plate and web no thicker than d/2 + 1/16 in, the
// weld 5/8 of the plate's thickness; reference pack 10.3) are reported in
// `limits_exceeded`, one sentence each.
struct single_plate_inputs {
    bolt_grade bolts = bolt_grade::a325;
    bool threads_in_shear_plane = true;
    std::optional<double> plate_edge_distance;  // m, bolt line to the plate's free edge; default 1.5 d
    std::optional<double> weld_leg;             // m, each side; nullopt: not derived
    steel_material plate_steel{steel_grade::a36};
    steel_material beam_steel{steel_grade::a992};
    double weld_strength = 70 * 6.894757293168361e6;  // F_EXX, Pa (E70 electrodes)
};

struct single_plate_joint : fin_plate_joint {
    std::vector<std::string> limits_exceeded;
};

single_plate_joint derive_single_plate(const connection_detail& d, const section& beam, const single_plate_inputs& in);

}  // namespace pinproof
