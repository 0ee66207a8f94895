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
#include "pinproof/model/section.hpp"
#include "pinproof/model/steel_grade.hpp"

namespace pinproof {

struct joint_component {
    std::string id;                   // "bolt-shear", "bolt-bearing-plate", ...
    std::optional<double> resistance; // N, against the end shear (nullopt: not critical / not derived)
    std::optional<double> per_bolt;   // N, the resistance of one bolt where it applies
    std::optional<double> stiffness;  // N/m, translational stiffness of one bolt where it applies
    std::string source;               // clause or guide, and any note
};

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

}  // namespace pinproof
