// The checks of a joint that follows a moment-rotation law, and of its
// strength and ductility (docs/method/joint-laws.md, docs/method/checks.md):
//   joint-moment-<end>     with a behaviour: the moment under the law against
//                          M_j,Rd, whether it stayed below 2/3 M_j,Rd where
//                          S_j,ini is valid (EN 1993-1-8 5.1.2(3)), and where the
//                          law reaches its cap a warning that the joint yields,
//                          deferring to the ductility check
//   strength-class-<end>   EN 1993-1-8 5.2.3: nominally pinned by strength when
//                          M_j,Rd <= 0.25 M_pl,Rd of the beam (the full-strength
//                          moment of a joint at the top of a column, taken as the
//                          beam's); AISC 360-16 Commentary B3: no flexural
//                          strength when the moment at 0.02 rad is below 0.2 M_p
//   joint-ductility-<end>  the end rotation at the collapse of the beam against
//                          the joint's rotation capacity (reference pack 11.1)
#pragma once

#include <vector>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

// The law's response in the governing strength combination (this joint at its
// upper-bound stiffness, the far joint at its lower bound); nullopt without a
// behaviour or a strength combination. Without find_yield_factor the
// response's yield_factor stays nullopt (the rest is the same).
std::optional<joint_assessment::law_response> law_response_of(const beam& b, const std::vector<combination_result>& combos,
                                                              beam_end e, bool find_yield_factor = true);

check joint_moment_law_check(const project& p, const beam& b, const joint_assessment& ja);
check strength_class_check(const project& p, const beam& b, beam_end e);
check joint_ductility_check(const project& p, const beam& b, const std::vector<combination_result>& combos, beam_end e);

}  // namespace pinproof
