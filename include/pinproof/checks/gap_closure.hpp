// The beam with joints whose end gap closes: each joint is bilinear, its range
// stiffness S up to the closure rotation, then S plus a contact stiffness K_c
// (rigid by default: the rotation stops at closure) once the beam end bears on
// the support. Signs: sign_conventions.hpp.
#pragma once

#include <optional>
#include <string>

#include "pinproof/model/beam_model.hpp"

namespace pinproof {

struct closing_joint {
    stiffness before = stiffness::pinned();   // the joint's own stiffness
    std::optional<double> closure_sagging;    // rad >= 0; nullopt: never closes in that sense
    std::optional<double> closure_hogging;    // rad >= 0, magnitude of a negative rotation
    stiffness contact = stiffness::rigid();   // added once closed
};

enum class joint_phase { closed_hogging, open, closed_sagging };
std::string to_string(joint_phase p);  // "closed-hogging", "open", "closed-sagging"

struct closed_state {
    beam_state state;
    joint_phase start = joint_phase::open;
    joint_phase end = joint_phase::open;
};

// Solves the beam with two bilinear joints exactly. The response is piecewise
// linear with at most three phases per joint, so the nine phase pairs are each
// a 2x2 solve (event-to-event in one step) and exactly one is consistent: the
// rotations lie in that phase's range. Throws internal_error if none is.
closed_state solve_with_closure(const beam_model& model, const closing_joint& start, const closing_joint& end);

// The same for a beam with one joint, at its start: an overhang (the beam runs
// on over its end support, beam_layout::overhang). Its start rotation is
// rot = rot0 - f m (hogging m), both read from the model itself: rot0 with a
// pinned start, f from a second solve with a spring (L/(3EI) for a uniform
// beam, whatever runs on beyond the end support). The three phases are each
// one linear equation; the consistent one is taken, and the state is the
// model's state at the secant stiffness m / rot, which reproduces that moment
// and rotation exactly (the model is linear in its start moment). The end
// phase is open. Throws internal_error if no phase is consistent.
closed_state solve_with_closure_at_start(const beam_model& model, const closing_joint& start);

}  // namespace pinproof
