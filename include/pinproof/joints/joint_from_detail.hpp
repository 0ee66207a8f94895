// The joint worked out from its connection detail, for every beam end of a
// project whose detail type the library derives (fin plates: EN 1993-1-8
// components in an EN project, AISC 360-16 single-plate strengths in a US
// project; joints/fin_plate.hpp), and "from-detail" resolved: the joint's
// stiffness range becomes S_j,ini times its scatter factors (0.5 and 2 unless
// the joint gives "stiffness_scatter") and its moment resistance the derived
// one. Runs once after the project is read and before any analysis; the
// assessment refuses a "from-detail" joint that has not been derived.
//
// Defaults of the derivation, each reported as a default (derived_joint::defaults):
//   bolt grade 8.8 (EN) or A325 (US), threads in the shear plane: the usual
//     bolts of simple joints (common practice, no source)
//   the plate's edge distance 2 d (EN) or 1.5 d (US) (joints/fin_plate.hpp)
//   the beam's steel S275 (EN) or A992 (US) where the beam gives none
//     (common practice, no source)
//   no weld given: the weld component is not derived
#pragma once

#include <optional>
#include <string>

#include "pinproof/model/derived_joint.hpp"
#include "pinproof/model/project.hpp"

namespace pinproof {

// The joint at `end` of beam `b` derived from its detail; nullopt where the
// joint has no detail or its type is not derived. Throws input_error, with the
// pointer of the field at fault, where the joint asks for "from-detail" and
// the detail cannot be derived; a joint that does not ask is left without a
// derivation then, and `why_not` (where given) says why.
std::optional<derived_joint> derive_joint(const beam& b, beam_end end, design_standard standard,
                                          std::string* why_not = nullptr);

// derive_joint for both ends of beam `b`, and "from-detail" put into each
// joint's range and moment resistance. Throws input_error with every problem.
void derive_beam_joints(beam& b, design_standard standard);

// derive_beam_joints for every beam of the project, every problem reported together.
void derive_joints(project& p);

}  // namespace pinproof
