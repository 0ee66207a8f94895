// Gap closure at a beam end: how far the beam end can rotate, as a rigid body
// about its centre of rotation, before some point of it reaches the support,
// and the end-gap check of a rotation demand against it. The geometry (frame,
// outline, support, clearance) is model/end_geometry.hpp.
//
// For each vertex of the outline against each edge of the support, and each
// vertex of the support against each edge of the outline, the contact
// condition n . (c + R(theta) r) = k has the closed-form solution
// theta = atan2(B, A) -/+ acos(d / sqrt(A^2 + B^2)) (first principles; the
// special case of a vertical face is the reference formula
// theta_c = atan2(dc, s - g) - acos(s / sqrt((s - g)^2 + dc^2))). Contact of a
// vertex with a root-fillet arc is solved the same way. The first contact is
// the smallest positive root that lies within the extents of the edge or arc.
#pragma once

#include <optional>
#include <string>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/end_geometry.hpp"
#include "pinproof/model/section.hpp"

namespace pinproof {

// Rotation of the beam end to be accommodated, as magnitudes (rad, >= 0).
struct rotation_demand {
    double sagging = 0;
    double hogging = 0;
    // From a signed end rotation in the convention of sign_conventions.hpp
    // (positive: the sense a simply supported beam turns under downward load).
    static rotation_demand from_end_rotation(double signed_rotation);
};

// The searched range of rotation. A contact beyond it is reported as "no
// closure within pi/2", never as an infinite rotation.
inline constexpr double max_searched_rotation = 1.5707963267948966;

struct closure {
    rotation_sense sense = rotation_sense::sagging;
    // First contact rotation (rad, >= 0); nullopt when nothing closes within
    // max_searched_rotation. Zero when the outline touches and presses into
    // the support at rest.
    std::optional<double> rotation;
    std::optional<contact_point> contact;
};

// `verify` runs the engine's own check (nothing overlaps before the contact
// found, and the outline touches at it; an internal error otherwise). A root
// search over many trial geometries leaves it off and verifies its answer.
closure find_closure(const beam_end_geometry& g, rotation_sense sense, bool verify = true);

// Result of one sense at the worst-case gap.
struct sense_check {
    rotation_sense sense = rotation_sense::sagging;
    closure closing;
    double demand = 0;                 // rad
    std::optional<double> margin;      // closure / demand; nullopt when demand is zero
    bool margin_is_lower_bound = false; // no closure within pi/2: margin >= (pi/2) / demand
    double clearance_at_demand = 0;    // m, signed as in clearance()
    bool passes = true;                // closure >= demand
};

struct gap_check {
    double gap = 0;            // as detailed
    double gap_tolerance = 0;
    double worst_case_gap = 0;
    sense_check sagging;
    sense_check hogging;
    rotation_sense governing = rotation_sense::sagging;  // smaller margin (or smaller closure when no demand)
    // The as-detailed gap (tolerance added back) that just passes the demand
    // in every sense with a positive demand; nullopt with a note when there is
    // no demand or when no gap in the searched range passes.
    std::optional<double> min_gap_required;
    std::string min_gap_note;
    bool passes = true;
    const sense_check& of(rotation_sense s) const { return s == rotation_sense::sagging ? sagging : hogging; }
    // The critical point of the governing sense, e.g. "bottom flange corner against support face".
    std::string critical_point() const;
};

double margin(const closure& c, double demand);  // closure / demand (pi/2 when no closure); demand > 0

// Smallest as-detailed gap that passes the demand in every sense with a
// positive demand, solved with a bracketing root finder (TOMS 748) to 1e-10
// relative. nullopt when there is no demand or no gap up to the searched
// bound passes; `note` (if given) says why.
std::optional<double> min_gap_required(const connection_detail& detail, const section& beam,
                                       const rotation_demand& demand, std::string* note = nullptr);

// `find_min_gap` false skips the search for the smallest passing gap (its
// result is then nullopt with a note), for callers that evaluate many demands.
gap_check check_gap(const connection_detail& detail, const section& beam, const rotation_demand& demand,
                    bool find_min_gap = true);

}  // namespace pinproof
