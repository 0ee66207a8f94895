// The checks of a cantilever: is its fixed root real? (docs/method/layouts.md,
// docs/method/checks.md)
//   root-class        the root's least S*L/EI (L the cantilever's length)
//                     against the rigid boundary of the project's standard:
//                     EN 1993-1-8 5.2.2.5(1) k_b (8 braced, 25 unbraced frames),
//                     AISC 360-16 Commentary B3.4 fully restrained (20).
//   root-flexibility  the largest increase of the deflection over the value
//                     with a rigid root, over the root's stiffness range and
//                     every combination, against limits.root_flexibility (10 %
//                     unless given). For a tip load the increase is 3 EI/(S L),
//                     for a uniform load 4 EI/(S L): the code's boundary alone
//                     lets a "rigid" root add 37 % (k_b = 8) or 15 % (20), so
//                     the fixed root holds only where both checks pass.
//   deflection        the tip deflection under service combinations against
//                     limits.deflection (L the cantilever's length), with the
//                     tip rotation and the rigid-root values beside it.
//   root-moment       the root moment under strength combinations against the
//                     joint's declared moment resistance.
// A check that cannot be made (no limit, no combination) is not applicable, with its reason.
#pragma once

#include <vector>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

check root_class_check(const project& p, const beam& b, const joint_assessment& root);
check root_flexibility_check(const project& p, const beam& b, const std::vector<combination_result>& combos);
check tip_deflection_check(const project& p, const beam& b, const std::vector<combination_result>& combos);
check root_moment_check(const project& p, const beam& b, const std::vector<combination_result>& combos);

// The rigid boundary of S*L/EI for the project's standard and frame.
double root_rigid_limit(const project& p);

}  // namespace pinproof
