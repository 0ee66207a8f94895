// The checks of a joint against what its detail gives (joints/joint_from_detail.hpp;
// docs/method/joint-from-geometry.md, docs/method/checks.md):
//   joint-shear-<end>          the largest end reaction under the strength
//                              combinations, over the stiffness range, against the
//                              derived shear resistance of the joint, its governing
//                              component named (fail when it exceeds it)
//   declared-resistance-<end>  a declared moment resistance more than 10 % above
//                              the derived one, or a declared stiffness range that
//                              does not contain the derived S_j,ini (warn: the
//                              declared numbers are not what the detail gives)
//   ductile-hierarchy-<end>    the order in which the joint's parts yield, each
//                              standard in its own terms: EN, bearing governs
//                              before bolt shear and the weld is full strength;
//                              AISC, fillets of 5/8 t_p (warn: a simple joint
//                              must deform before it breaks)
// All are not applicable where the joint is not derived.
#pragma once

#include <vector>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

check joint_shear_check(const project& p, const beam& b, const std::vector<combination_result>& combos, beam_end e);
check declared_resistance_check(const project& p, const beam& b, beam_end e);
check ductile_hierarchy_check(const project& p, const beam& b, beam_end e);

// How far a declared moment resistance may exceed the derived one before it
// is flagged: 10 % (a margin for the derivation's simplifications, common
// practice, no source).
inline constexpr double declared_resistance_margin = 0.10;

}  // namespace pinproof
