// The checks of an overhang that a beam on two supports does not have
// (docs/method/layouts.md):
//   tip-deflection  the largest |deflection| of the free tip under service
//                   combinations, over the start joint's stiffness range,
//                   against limits.deflection. A limit given as span/n is
//                   taken with twice the overhang's length (the tip read as a
//                   cantilever: common practice, no source); an absolute limit
//                   as given. The tip's rotation and its values with a pinned
//                   and with a fixed start are given beside it.
// The back span's deflection is the `deflection` check of a beam on two
// supports (its limit with the span between the supports); the start joint
// has the checks of a beam end on two supports (assessment.cpp).
#pragma once

#include <vector>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

check overhang_tip_deflection_check(const project& p, const beam& b, const std::vector<combination_result>& combos);

// The length a span/n deflection limit is taken with at an overhang's tip: 2 a.
double overhang_limit_length(const beam& b);

}  // namespace pinproof
