// Whether the simple-support (pinned) assumption holds for a beam: its states
// for pinned, fixed and semi-rigid ends over the stiffness range box, the
// classification of each joint, and the checks with their verdict.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "pinproof/model/beam_model.hpp"
#include "pinproof/joints/classification.hpp"
#include "pinproof/joints/nonlinear_analysis.hpp"
#include "pinproof/checks/detailing_rules.hpp"
#include "pinproof/checks/gap_closure.hpp"
#include "pinproof/checks/gap_geometry.hpp"
#include "pinproof/checks/support_demand.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

enum class check_status { pass, fail, warn, not_applicable };
std::string to_string(check_status s);  // "pass", "fail", "warn", "not-applicable"
// The word the reports print, a failure in capitals: "pass", "FAIL", "warn", "n/a".
std::string status_label(check_status s);

struct check {
    std::string id;        // stable, e.g. "stiffness-class-start"
    check_status status = check_status::not_applicable;
    std::optional<double> value;  // SI
    std::optional<double> limit;  // SI
    dimension dim;         // of value and limit
    std::string message;   // one or two sentences: what was compared and what follows
    // Reported for someone else to use (the support moment), not a criterion:
    // sensitivity studies leave it out.
    bool informative = false;
    // False for checks of the detail's geometry alone (detailing rules), which
    // no joint stiffness changes: sensitivity studies leave them out too.
    bool varies_with_stiffness = true;
    // The limit is a least value (the floor frequency): the check passes where
    // value >= limit. Otherwise it is a largest value (value <= limit).
    bool limit_is_minimum = false;
};

struct value_range {
    double min = 0, max = 0;
};

// Envelope of every result_fields() entry over the states of a range box.
struct state_envelope {
    std::vector<value_range> ranges;  // in result_fields() order
    const value_range& of(double beam_state::*member) const;
};

struct combination_result;

// The least and largest of one result over the corners of the range box: the
// envelope of a result linear in the joints' moments, such as an overhang's
// tip deflection and rotation (not among result_fields()).
value_range corner_range(const combination_result& r, double beam_state::*member);

struct combination_result {
    combination comb;
    // The ideal bounds: both ends pinned, both fixed. A cantilever's "fixed"
    // is its rigid root; its "pinned" is a mechanism and is not solved (nullopt).
    std::optional<beam_state> pinned;
    beam_state fixed;
    // Corners of the range box, in the order (min,min), (min,max), (max,min),
    // (max,max) for (start, end).
    std::vector<beam_state> corners;
    state_envelope envelope;
    // Whether the envelope needed more than the corners (docs/method/range-envelope.md).
    int interior_points = 0;
    // A vibration combination: the first natural frequency of each state
    // (model/natural_frequency.hpp), Hz.
    struct frequencies {
        std::optional<double> pinned;  // nullopt for a cantilever (a mechanism)
        double fixed = 0;
        std::vector<double> corners;  // in the order of `corners`
        // Over the range box. Adding end stiffness never lowers an eigenvalue
        // (the Rayleigh quotient of K + dK with dK >= 0), so the frequency grows
        // with each joint's stiffness and its extremes lie at the corners.
        value_range range;
    };
    std::optional<frequencies> frequency;
    // A strength combination of a beam with a steel: the collapse of the beam
    // with both joints at their lower-bound stiffness (joints/nonlinear_analysis.hpp).
    std::optional<collapse_point> collapse;
};

// What happens when the end gap closes under a strength combination: the beam
// solved with bilinear joints at the lower-bound stiffness (gap_closure.hpp).
struct closure_consequence {
    std::string combination;
    closed_state result;
    double closure_rotation = 0;  // rad, of the beam end (the support's own rotation taken off)
    double contact_force = 0;     // N: moment beyond the joint's own share over the lever arm
    // m, perpendicular distance from the centre of rotation to the line of
    // action of the bearing force (frictionless contact, normal to the surfaces)
    double lever_arm = 0;
    // What the state after closure is, in words: the model, each joint's phase
    // (open, or closed and held at its closure rotation by contact), and what
    // the state's stiffness fields mean. Shown in every output.
    std::string assumptions;
};

struct detail_assessment {
    gap_check gap;                        // at the demand below, worst-case gap
    // The demand's basis: the pinned beam's end rotation (the default), or the
    // rotation at the joints' lower-bound stiffness where this joint declares
    // that bound dependable (joint::dependable_lower_bound).
    bool credits_lower_bound = false;
    double free_slip = 0;                 // rad, the law's free slip, in the demand
    double demand_sagging = 0;            // rad, all combinations, incl. the support rotation and slip
    double demand_hogging = 0;
    std::string demand_combination;
    double strength_demand_sagging = 0;   // rad, strength combinations only
    double strength_demand_hogging = 0;
    std::string strength_combination;
    bool closes_under_strength = false;
    bool closes_under_service = false;
    std::optional<closure_consequence> consequence;
    std::vector<detailing_finding> findings;
    // Whether the detail clears the rule-of-thumb rotation, shown for comparison only.
    bool clears_rule_of_thumb = false;
};

struct joint_assessment {
    beam_end end = beam_end::start;
    stiffness_range range;
    // kappa = S L / (E I) at the bounds; nullopt for a rigid bound.
    std::optional<double> ratio_lower, ratio_upper;
    // Fixity factor r = kappa / (kappa + 3) (Monforton and Wu, 1963).
    double fixity_lower = 0, fixity_upper = 0;
    en_joint_class en_lower{}, en_upper{};
    aisc_joint_class aisc_lower{}, aisc_upper{};
    std::optional<detail_assessment> detail;
    // A joint with a behaviour, in the governing strength combination with this
    // joint at its upper-bound stiffness and the far joint at its lower bound.
    struct law_response {
        std::string combination;
        double moment = 0;              // N*m, the largest moment the law carries
        double secant_stiffness = 0;    // N*m/rad, M / theta there
        bool yields = false;            // it reaches its moment resistance
        std::optional<double> yield_factor;  // of that combination's loads
    };
    std::optional<law_response> law;
    // The demand passed to the support (support_demand.hpp) in the governing
    // strength state: the largest |M_j + R e| over the strength combinations
    // and the corners of the range; nullopt without a strength combination.
    struct support_response {
        support_demand demand;
        std::string combination;
        double joint_moment = 0;   // N*m, hogging +, in that state
        double reaction = 0;       // N, up +, in that state
        double reaction_pinned = 0;  // N, of that combination with pins
        bool eccentricity_is_default = true;
    };
    std::optional<support_response> support;
};

struct beam_assessment {
    std::string id;
    const beam* input = nullptr;
    std::vector<combination_result> combinations;
    joint_assessment start, end;
    std::vector<check> checks;
    std::vector<std::string> notes;  // assumptions and defaults applied
    std::optional<double> plastic_moment;  // N*m, where the beam's steel is given
    bool holds() const;
    const joint_assessment& joint_at(beam_end e) const { return e == beam_end::start ? start : end; }
};

struct project_assessment {
    const project* input = nullptr;
    std::vector<beam_assessment> beams;
    bool all_hold() const;
};

// The largest end rotation a simple connection is commonly expected to
// accommodate, used only as an advisory limit when no detail is checked:
// about 0.03 rad (AISC 360-16 Commentary B3.4; the design rotation behind the
// single-plate procedure of the AISC Manual Part 10, Astaneh-Asl et al. 2002;
// from memory).
inline constexpr double simple_connection_rotation_rule_of_thumb = 0.03;

struct assessment_options {
    // Search inside the range box for the smallest maximum sagging moment and
    // deflection (range-envelope.md). The checks never need it: a schedule of
    // many beams may switch it off.
    bool search_interior = true;
    // Search for the smallest end gap that passes (gap_geometry.hpp); off for
    // callers that assess the same beam at many stiffness values.
    bool find_min_gap = true;
    // Locate the load factor at which a yielding joint law reaches its cap
    // (joint_assessment::law_response::yield_factor: the joint-moment check's
    // message and the result file); off where only the checks' values are
    // wanted, as in threshold and sweep probes.
    bool find_yield_factor = true;
};

beam_assessment assess_beam(const project& p, const beam& b, const assessment_options& options = {});

// One end of the beam for the nonlinear analysis (joints/nonlinear_analysis.hpp):
// the joint's law at stiffness s, a linear spring without one; at zero a pin,
// rigid up to the joint's moment resistance.
nonlinear_end end_for(const joint& j, stiffness s);
project_assessment assess_project(const project& p, const assessment_options& options = {});

}  // namespace pinproof
