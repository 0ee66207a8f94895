// Classification of a beam-end joint by its rotational stiffness, against the
// published boundaries, in terms of kappa = S L / (E I_b).
//
// EN 1993-1-8:2005 5.2.2.5(1), Fig. 5.4 (initial stiffness S_j,ini):
//   nominally pinned  kappa <= 0.5
//   rigid             kappa >= k_b, k_b = 8 for a braced frame (bracing reduces
//                     horizontal displacement by at least 80 %), 25 otherwise
//                     (the latter provided K_b/K_c >= 0.1 in every storey)
//   semi-rigid        between
// AISC 360-16 Commentary B3.4 (secant stiffness at service loads):
//   simple            kappa <= 2
//   fully restrained  kappa >= 20
//   partially restrained between
// A boundary value itself belongs to the pinned/simple or rigid/FR class, as
// the inequalities above state.
#pragma once

#include <string>

#include "pinproof/model/design_standard.hpp"
#include "pinproof/model/stiffness.hpp"

namespace pinproof {

enum class en_joint_class { nominally_pinned, semi_rigid, rigid };
enum class aisc_joint_class { simple, partially_restrained, fully_restrained };

std::string to_string(en_joint_class c);    // "nominally-pinned", "semi-rigid", "rigid"
std::string to_string(aisc_joint_class c);  // "simple", "partially-restrained", "fully-restrained"

// EN 1993-1-8 boundaries.
inline constexpr double en_pinned_limit = 0.5;
double en_rigid_limit(frame_bracing f);  // k_b: 8 braced, 25 unbraced
// AISC 360 Commentary B3 boundaries.
inline constexpr double aisc_simple_limit = 2.0;
inline constexpr double aisc_fully_restrained_limit = 20.0;

// kappa of a rigid joint is unbounded; classify_* take the stiffness itself.
en_joint_class classify_en(stiffness s, double EI, double span, frame_bracing f);
aisc_joint_class classify_aisc(stiffness s, double EI, double span);

// The pinned (EN) or simple (AISC) boundary of the chosen standard.
double pinned_limit(design_standard s);
// Whether the joint counts as pinned / simple under the chosen standard.
bool is_nominally_pinned(stiffness s, double EI, double span, design_standard standard);

}  // namespace pinproof
