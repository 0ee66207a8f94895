// A joint worked out from its connection detail (joints/joint_from_detail.hpp):
// its components with their resistances, the joint's shear and moment
// resistance with the governing component, and its initial rotational
// stiffness with the range that stands in for its scatter. Data only; the
// formulas and their sources are in joints/fin_plate.hpp and
// docs/method/joint-from-geometry.md. Units: SI.
#pragma once

#include <optional>
#include <string>
#include <vector>

namespace pinproof {

struct joint_component {
    std::string id;                   // "bolt-shear", "bolt-bearing-plate", ...
    std::optional<double> resistance; // N, against the end shear (nullopt: not critical / not derived)
    std::optional<double> per_bolt;   // N, the resistance of one bolt where it applies
    std::optional<double> stiffness;  // N/m, translational stiffness of one bolt where it applies
    std::string source;               // clause or guide, and any note
};

// A bolt row of an end plate in tension under the joint's moment, about the
// plate's bottom edge (joints/end_plate.hpp).
struct derived_tension_row {
    double lever_arm = 0;   // m, h_r
    double resistance = 0;  // N, F_tr,Rd
    std::string governing;  // "end-plate-t-stub mode 1", "bolt-tension", "web-tension", ...
    double stiffness = 0;   // N/m, E k_eff,r (k_5 and k_10 in series)
};

struct derived_joint {
    std::string basis;  // "EN 1993-1-8" or "AISC 360-16": the standard the components follow
    // N*m/rad; nullopt where the standard gives no component stiffness (AISC 360).
    std::optional<double> initial_stiffness;
    // The range that stands for the derived value's scatter: initial_stiffness
    // times the scatter factors (0.5 and 2 unless the joint gives its own).
    std::optional<double> stiffness_min, stiffness_max;
    double scatter_min = 0.5, scatter_max = 2.0;
    bool scatter_default = true;
    double free_rotation = 0;      // rad, hole clearance over the furthest bolt's lever arm
    double shear_resistance = 0;   // N, the weakest component's
    std::string governing;         // its id
    double moment_resistance = 0;  // N*m, the bolt group about its centroid with its weakest bolt
    std::string moment_governing;  // the bolt component that limits it
    std::optional<double> rotation_capacity;  // rad; nullopt: no published method derives it
    // Whether a published rule finds the rotation capacity adequate (EN 1993-1-8
    // 6.4.2(2) for end plates); nullopt where no rule applies. The rule in words
    // (or why none applies) in rotation_capacity_basis.
    std::optional<bool> rotation_capacity_adequate;
    std::string rotation_capacity_basis;
    // End plates: the bolt rows in tension, from the top row down (empty otherwise).
    std::vector<derived_tension_row> tension_rows;
    std::vector<joint_component> components;
    // Every default the derivation took, in words ("bolt grade 8.8 (default)").
    std::vector<std::string> defaults;
    // Dimensional limits of the standard's configuration that the detail exceeds.
    std::vector<std::string> limits_exceeded;
};

}  // namespace pinproof
