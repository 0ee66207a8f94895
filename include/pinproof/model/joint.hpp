// A beam-end joint as the project file describes it: the range of its initial
// rotational stiffness and, optionally, its design moment resistance.
#pragma once

#include <optional>
#include <string>
#include <utility>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/derived_joint.hpp"
#include "pinproof/model/joint_behaviour.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/model/stiffness.hpp"
#include "pinproof/model/stiffness_distribution.hpp"

namespace pinproof {

struct stiffness_range {
    stiffness min = stiffness::pinned();
    stiffness max = stiffness::pinned();
};

// The continuous column a joint frames into, as given: one section above and
// below the joint, and the storey lengths (a length of 0 above: a roof).
struct joint_column {
    section sec;
    double length_above = 0, length_below = 0;  // m
};

struct joint {
    stiffness_range range;
    std::optional<double> moment_resistance;  // N*m, design resistance of the joint
    std::string description;
    // The stiffness as a distribution, where given (stiffness_distribution.hpp);
    // the range is then its 5 % to 95 % fractiles unless given too.
    std::optional<stiffness_distribution> distribution;
    // The connection as detailed, for the end-gap check (gap_geometry.hpp).
    std::optional<connection_detail> detail;
    // Rotation of the support itself (rad), added to the beam's end rotation
    // in the gap check.
    double support_rotation = 0;
    // Stiffness added once the gap has closed; rigid by default.
    stiffness contact_stiffness = stiffness::rigid();
    // The joint is declared designed for the moment that develops after closure.
    bool designed_for_closure = false;
    // The lower bound of the stiffness range is declared dependable at the
    // gap: only then does the end-gap check credit it. Otherwise bolt slip in
    // clearance holes may leave the joint free to turn as a pin before it
    // stiffens, and the gap demand is the pinned beam's rotation (plus the
    // support's rotation and the law's free slip).
    bool dependable_lower_bound = false;
    // Its moment-rotation law where given (joints/joint_law.hpp); without it the
    // joint is an uncapped linear spring.
    std::optional<joint_behaviour> behaviour;
    // Rotation (rad) the joint can undergo without fracturing, where known.
    std::optional<double> rotation_capacity;
    // "from-detail": the stiffness range or the moment resistance is the one
    // derived from the detail (joints/joint_from_detail.hpp fills them in
    // before any analysis); the stiffness range is S_j,ini times the scatter
    // factors, {0.5, 2} unless given.
    bool stiffness_from_detail = false;
    bool moment_resistance_from_detail = false;
    std::optional<std::pair<double, double>> stiffness_scatter;
    // The joint worked out from its detail, where the detail type is derived.
    std::optional<derived_joint> derived;
    // Why a fin plate was not derived (the derivation's refusal), where it was not.
    std::string not_derived_reason;
    // The demand passed to the support (checks/support_demand.hpp): the
    // reaction's eccentricity where given (m; else the default of simple
    // construction), the column where given, and the moment the support can
    // take, where given (N*m).
    std::optional<double> support_eccentricity;
    std::optional<joint_column> column;
    std::optional<double> support_moment_resistance;
};

enum class beam_end { start, end };
std::string to_string(beam_end e);  // "start", "end"

}  // namespace pinproof
