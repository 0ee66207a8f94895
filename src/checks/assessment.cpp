#include "pinproof/checks/assessment.hpp"

#include <algorithm>
#include <cmath>
#include <string>
#include <unordered_map>
#include <utility>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/joints/joint_law.hpp"
#include "pinproof/checks/joint_strength.hpp"
#include "pinproof/checks/cantilever_checks.hpp"
#include "pinproof/checks/overhang_checks.hpp"
#include "pinproof/checks/derived_joint_checks.hpp"

namespace pinproof {

std::string to_string(check_status s)
{
    switch (s) {
    case check_status::pass: return "pass";
    case check_status::fail: return "fail";
    case check_status::warn: return "warn";
    case check_status::not_applicable: return "not-applicable";
    }
    return "unknown";
}

std::string status_label(check_status s)
{
    switch (s) {
    case check_status::pass: return "pass";
    case check_status::fail: return "FAIL";
    case check_status::warn: return "warn";
    case check_status::not_applicable: return "n/a";
    }
    return "?";
}

value_range corner_range(const combination_result& r, double beam_state::*member)
{
    if (r.corners.empty()) throw internal_error("a range with no corner state");
    value_range out{r.corners.front().*member, r.corners.front().*member};
    for (const auto& s : r.corners) {
        out.min = std::min(out.min, s.*member);
        out.max = std::max(out.max, s.*member);
    }
    return out;
}

const value_range& state_envelope::of(double beam_state::*member) const
{
    const auto& f = result_fields();
    for (std::size_t i = 0; i < f.size(); ++i)
        if (f[i].member == member) return ranges.at(i);
    throw internal_error("unknown result field");
}

bool beam_assessment::holds() const
{
    return std::none_of(checks.begin(), checks.end(), [](const check& c) { return c.status == check_status::fail; });
}

bool project_assessment::all_hold() const
{
    return std::all_of(beams.begin(), beams.end(), [](const beam_assessment& b) { return b.holds(); });
}

namespace {

void include(state_envelope& env, const beam_state& s, bool first)
{
    const auto& f = result_fields();
    env.ranges.resize(f.size());
    for (std::size_t i = 0; i < f.size(); ++i) {
        const double v = s.*(f[i].member);
        if (first) env.ranges[i] = {v, v};
        env.ranges[i].min = std::min(env.ranges[i].min, v);
        env.ranges[i].max = std::max(env.ranges[i].max, v);
    }
}

// Stiffness of fixity factor r (Monforton and Wu, 1963): r = 1/(1 + 3EI/(S L)).
stiffness from_fixity(double r, double EI, double span)
{
    if (r >= 1.0) return stiffness::rigid();
    return stiffness::spring(3.0 * r * EI / (span * (1.0 - r)));
}

double fixity(stiffness s, double EI, double span)
{
    if (s.is_rigid()) return 1.0;
    const double k = s.ratio(EI, span);
    return k / (k + 3.0);
}

bool has_law(const beam& b) { return b.start.behaviour || b.end.behaviour; }

// One end of the beam for the nonlinear analysis: its law at stiffness s, a
// linear spring, or rigid.
// A sweep or a threshold search takes a law's stiffness to its limits: at zero
// the joint is a pin, rigid it is rigid up to its moment resistance.
nonlinear_end end_for_joint(const joint& j, stiffness s)
{
    if (s.is_rigid()) return j.behaviour ? nonlinear_end::rigid(j.moment_resistance) : nonlinear_end::rigid();
    if (j.behaviour && (s.value() > 0 || j.behaviour->law == joint_law_kind::multilinear))
        return nonlinear_end::following(joint_law::from(*j.behaviour, s.value(), j.moment_resistance));
    return nonlinear_end::following(joint_law::linear(s.value()));
}

// The nonlinear state, or a refusal naming the beam and the combination: never a number that was not found.
nonlinear_solution solve_with_laws(const beam_model& model, const beam& b, const combination& c, stiffness s,
                                   stiffness e, double load_factor = 1.0)
{
    try {
        // The states need no yield load factors: the joint-moment check
        // finds its own (joint_strength.cpp).
        return solve_nonlinear(model, end_for_joint(b.start, s), end_for_joint(b.end, e), load_factor, false);
    } catch (const nonlinear_failure& f) {
        throw input_error(b.pointer + "/joints",
                          std::string("no state of the beam with its joints' moment-rotation laws could be found "
                                      "under combination ") + c.name + ": " + f.what());
    }
}

// The state at a pair of stiffnesses: the linear engine, or the joints' laws where given.
beam_state solve_state(const beam_model& model, const beam& b, const combination& c, stiffness s, stiffness e)
{
    if (!has_law(b)) return model.solve(s, e);
    return solve_with_laws(model, b, c, s, e).state;
}

// The first natural frequency, remembered per thread: a sweep, a threshold
// search or a boundary curve assesses the same beam at thousands of stiffness
// pairs, and meets the pinned and fixed states and the scan's points again and
// again. The key is every input of the solve, byte for byte, so a remembered
// value is the value the solve would give.
double remembered_frequency(double span, double EI, const std::vector<load>& loads, stiffness s, stiffness e,
                            beam_layout layout, double overhang = 0.0)
{
    std::string key;
    const auto put = [&key](const auto& v) { key.append(reinterpret_cast<const char*>(&v), sizeof v); };
    put(static_cast<int>(layout));
    put(span);
    put(overhang);
    put(EI);
    for (const stiffness k : {s, e}) {
        put(k.is_rigid());
        put(k.is_rigid() ? 0.0 : k.value());
    }
    for (const load& l : loads) {
        put(static_cast<int>(l.kind));
        put(l.value);
        put(l.value_end);
        put(l.from);
        put(l.to);
    }
    thread_local std::unordered_map<std::string, double> memory;
    if (const auto it = memory.find(key); it != memory.end()) return it->second;
    if (memory.size() >= 50000) memory.clear();  // bounded: a few MB
    const double f = first_natural_frequency(span, EI, loads, s, e, layout, overhang);
    memory.emplace(std::move(key), f);
    return f;
}

// The first natural frequency of a vibration combination's states. Vibration is
// of small amplitude: each joint acts with its stiffness of the state (for a
// joint with a law, the law's initial stiffness at that bound).
combination_result::frequencies frequencies_of(const beam& b, const combination& c)
{
    const std::vector<load> loads = factored_loads(b.loads, c);
    const auto f = [&](stiffness s, stiffness e) {
        try {
            return remembered_frequency(b.span, b.EI(), loads, s, e, b.layout, b.overhang);
        } catch (const std::invalid_argument& x) {
            // The reader refuses a vibration combination without mass or with an upward load.
            throw internal_error(std::string("the frequency of combination ") + c.name + " could not be found: " + x.what());
        }
    };
    combination_result::frequencies out;
    const bool cantilever = b.layout == beam_layout::cantilever;
    // A cantilever and an overhang have no end joint: their end is a pin by construction.
    const bool end_free = cantilever || b.layout == beam_layout::overhang;
    if (!cantilever) out.pinned = f(stiffness::pinned(), stiffness::pinned());
    out.fixed = end_free ? f(stiffness::rigid(), stiffness::pinned()) : f(stiffness::rigid(), stiffness::rigid());
    const auto& rs = b.start.range;
    const auto& re = b.end.range;
    const std::pair<stiffness, stiffness> at[] = {{rs.min, re.min}, {rs.min, re.max}, {rs.max, re.min}, {rs.max, re.max}};
    for (std::size_t i = 0; i < 4; ++i) {
        // A degenerate range (a sweep point) repeats a corner: solve it once.
        std::optional<double> same;
        for (std::size_t k = 0; k < i; ++k)
            if (at[k].first == at[i].first && at[k].second == at[i].second) same = out.corners[k];
        out.corners.push_back(same ? *same : f(at[i].first, at[i].second));
    }
    out.range = {*std::min_element(out.corners.begin(), out.corners.end()),
                 *std::max_element(out.corners.begin(), out.corners.end())};
    return out;
}

combination_result analyse_combination(const beam& b, const combination& c, bool search_interior)
{
    combination_result out;
    out.comb = c;
    const beam_model model(b.span, b.EI(), factored_loads(b.loads, c), b.layout, b.overhang);
    const bool cantilever = b.layout == beam_layout::cantilever;
    // A cantilever's tip is free (its end joint a pin by construction); its
    // pinned bound would be a mechanism. An overhang has no end joint either:
    // its bounds are the start joint's, pinned and fixed.
    const bool end_free = cantilever || b.layout == beam_layout::overhang;
    if (!cantilever) out.pinned = model.solve(stiffness::pinned(), stiffness::pinned());
    out.fixed = model.solve(stiffness::rigid(), end_free ? stiffness::pinned() : stiffness::rigid());
    const auto& rs = b.start.range;
    const auto& re = b.end.range;
    const auto solve = [&](stiffness s, stiffness e) { return solve_state(model, b, c, s, e); };
    out.corners = {solve(rs.min, re.min), solve(rs.min, re.max), solve(rs.max, re.min), solve(rs.max, re.max)};
    if (c.use == limit_state::vibration) out.frequency = frequencies_of(b, c);
    // The collapse of the beam with its joints: worked out on two supports only.
    if (c.use == limit_state::strength && b.layout == beam_layout::two_supports) {
        if (const auto Mpl = b.plastic_moment()) {
            try {
                out.collapse = beam_collapse(model, end_for_joint(b.start, rs.min), end_for_joint(b.end, re.min), *Mpl);
            } catch (const nonlinear_failure& f) {
                throw input_error(b.pointer + "/joints",
                                  "the collapse of the beam with its joints could not be followed under combination " +
                                      c.name + ": " + f.what());
            }
        }
    }
    bool first = true;
    for (const auto& s : out.corners) {
        include(out.envelope, s, first);
        first = false;
    }
    // Every result of a state is linear in the two end moments, and for a fixed
    // stiffness at one end the end moments move monotonically along a line as
    // the other end's stiffness grows, so each pointwise result is monotone in
    // each stiffness and takes its extremes at the corners. The maximum sagging
    // moment and the largest deflection are maxima over x of such results: their
    // largest values are at the corners too, but their smallest may lie inside
    // the box. A grid in fixity-factor space finds those (range-envelope.md).
    const bool degenerate = rs.min == rs.max && re.min == re.max;
    if (!degenerate && search_interior) {
        const int n = 9;
        const double EI = b.EI();
        const double r0s = fixity(rs.min, EI, b.span), r1s = fixity(rs.max, EI, b.span);
        const double r0e = fixity(re.min, EI, b.span), r1e = fixity(re.max, EI, b.span);
        for (int i = 0; i < n; ++i)
            for (int j = 0; j < n; ++j) {
                const double fs = r0s + (r1s - r0s) * i / (n - 1.0);
                const double fe = r0e + (r1e - r0e) * j / (n - 1.0);
                const beam_state s = solve(i == 0 ? rs.min : i == n - 1 ? rs.max : from_fixity(fs, EI, b.span),
                                           j == 0 ? re.min : j == n - 1 ? re.max : from_fixity(fe, EI, b.span));
                const auto& f = result_fields();
                for (std::size_t k = 0; k < f.size(); ++k) {
                    const bool searched = f[k].member == &beam_state::max_sagging_moment ||
                                          f[k].member == &beam_state::max_hogging_moment ||
                                          f[k].member == &beam_state::max_deflection ||
                                          f[k].member == &beam_state::max_sagging_at ||
                                          f[k].member == &beam_state::max_hogging_at ||
                                          f[k].member == &beam_state::max_deflection_at;
                    if (!searched) continue;
                    const double v = s.*(f[k].member);
                    out.envelope.ranges[k].min = std::min(out.envelope.ranges[k].min, v);
                    out.envelope.ranges[k].max = std::max(out.envelope.ranges[k].max, v);
                }
                ++out.interior_points;
            }
    }
    return out;
}

joint_assessment assess_joint(const project& p, const beam& b, beam_end e)
{
    joint_assessment j;
    j.end = e;
    j.range = b.at(e).range;
    const double EI = b.EI();
    if (!j.range.min.is_rigid()) j.ratio_lower = j.range.min.ratio(EI, b.span);
    if (!j.range.max.is_rigid()) j.ratio_upper = j.range.max.ratio(EI, b.span);
    j.fixity_lower = fixity(j.range.min, EI, b.span);
    j.fixity_upper = fixity(j.range.max, EI, b.span);
    j.en_lower = classify_en(j.range.min, EI, b.span, p.frame);
    j.en_upper = classify_en(j.range.max, EI, b.span, p.frame);
    j.aisc_lower = classify_aisc(j.range.min, EI, b.span);
    j.aisc_upper = classify_aisc(j.range.max, EI, b.span);
    return j;
}

struct formatter {
    unit_system system;
    std::string operator()(double v, dimension d) const { return format_quantity(v, d, system); }
};

std::string stiffness_text(stiffness s, const formatter& fmt)
{
    return s.is_rigid() ? std::string("rigid") : fmt(s.value(), dims::rotational_stiffness);
}

check stiffness_class_check(const project& p, const joint_assessment& j)
{
    const formatter fmt{p.units};
    check c;
    c.id = "stiffness-class-" + to_string(j.end);
    c.dim = dims::dimensionless;
    c.limit = pinned_limit(p.standard);
    const bool en = p.standard == design_standard::en1993_1_8;
    const std::string clause = en ? "EN 1993-1-8 5.2.2.5(1)" : "AISC 360-16 Commentary B3.4";
    const std::string pinned_word = en ? "nominally pinned" : "simple";
    const std::string cls = en ? to_string(j.en_upper) : to_string(j.aisc_upper);
    const std::string upper = "The upper-bound stiffness " + stiffness_text(j.range.max, fmt);
    if (!j.ratio_upper) {
        c.status = check_status::fail;
        c.message = upper + " is a rigid joint, not " + pinned_word + " under " + clause +
                    ": the beam end is fixed and the pinned assumption does not hold.";
        return c;
    }
    c.value = *j.ratio_upper;
    const std::string ratio = "S*L/EI = " + format_number(*j.ratio_upper, 3);
    if (*j.ratio_upper <= *c.limit) {
        c.status = check_status::pass;
        c.message = upper + " gives " + ratio + " <= " + format_number(*c.limit, 2) + ": " + pinned_word +
                    " under " + clause + ".";
    } else {
        c.status = check_status::fail;
        c.message = upper + " gives " + ratio + " > " + format_number(*c.limit, 2) + ": " + cls + " under " + clause +
                    ", so the joint may not be idealised as " + pinned_word +
                    ". Design the beam with the semi-rigid joint, or use a more flexible detail.";
    }
    return c;
}

struct governing {
    double value = 0;
    std::string combination;
    bool found = false;
};

check joint_moment_check(const project& p, const beam& b, const std::vector<combination_result>& combos, beam_end e,
                         const joint_assessment& ja)
{
    if (b.at(e).behaviour) return joint_moment_law_check(p, b, ja);
    const formatter fmt{p.units};
    check c;
    c.id = "joint-moment-" + to_string(e);
    c.dim = dims::moment;
    double beam_state::*member = e == beam_end::start ? &beam_state::moment_start : &beam_state::moment_end;
    governing g;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::strength) continue;
        const auto& range = r.envelope.of(member);
        const double m = std::max(std::abs(range.min), std::abs(range.max));
        if (!g.found || m > g.value) g = {m, r.comb.name, true};
    }
    const auto& mrd = b.at(e).moment_resistance;
    if (!g.found) {
        c.status = check_status::not_applicable;
        c.message = "No strength combination is given, so the moment the joint attracts under design loads is not checked.";
        return c;
    }
    c.value = g.value;
    const std::string attracted = "Under strength combinations the joint attracts up to " + fmt(g.value, dims::moment) +
                                  " (combination " + g.combination +
                                  (b.layout == beam_layout::overhang
                                       ? std::string(", at the joint's upper-bound stiffness; an overhang has no far joint)")
                                       : std::string(", at this joint's upper-bound stiffness with the far joint at its "
                                                     "lower bound)"));
    if (!mrd) {
        c.status = check_status::not_applicable;
        c.message = attracted + "; no moment resistance is declared for the joint, so this is not checked.";
        return c;
    }
    c.limit = *mrd;
    // A resistance worked out from the detail is not the user's declaration.
    const std::string whose = b.at(e).moment_resistance_from_detail ? "derived (from its detail)" : "declared";
    if (g.value <= *mrd) {
        c.status = check_status::pass;
        c.message = attracted + ", within its " + whose + " moment resistance " + fmt(*mrd, dims::moment) + ".";
    } else {
        c.status = check_status::fail;
        c.message = attracted + ", more than its " + whose + " moment resistance " + fmt(*mrd, dims::moment) +
                    ": the joint would have to yield to behave as a pin. As a linear spring it never yields, which "
                    "overstates the moment: give the joint its moment-rotation law (a \"behaviour\", e.g. " +
                    std::string(p.standard == design_standard::en1993_1_8
                                    ? "the EN 1993-1-8 6.3.1(6) curve"
                                    : "a power or multilinear curve from tests") +
                    "; docs/method/joint-laws.md) to see whether it yields and is ductile enough. Otherwise design it "
                    "for the moment, or use a more flexible detail.";
    }
    return c;
}

// Whether the end moment keeps one sign. A joint detailed for the hogging moment
// of gravity loads (top bolts in tension, bottom flange in bearing) that sees a
// sagging moment under uplift or a reversed load has its tension and bearing
// sides swapped (common practice, no source): advice, never a failure.
check moment_reversal_check(const project& p, const std::vector<combination_result>& combos, beam_end e)
{
    const formatter fmt{p.units};
    check c;
    c.id = "moment-reversal-" + to_string(e);
    c.dim = dims::moment;
    c.informative = true;
    double beam_state::*member = e == beam_end::start ? &beam_state::moment_start : &beam_state::moment_end;
    double hogging = 0, sagging = 0;  // largest of each sign, as magnitudes
    std::string hogging_combination, sagging_combination;
    for (const auto& r : combos) {
        const auto& range = r.envelope.of(member);
        if (range.max > hogging) {
            hogging = range.max;
            hogging_combination = r.comb.name;
        }
        if (-range.min > sagging) {
            sagging = -range.min;
            sagging_combination = r.comb.name;
        }
    }
    if (combos.empty()) {
        c.status = check_status::not_applicable;
        c.message = "No combination is given.";
        return c;
    }
    // A moment below 1e-9 of the larger one is round-off, not a reversal.
    const double scale = std::max(hogging, sagging);
    if (!(scale > 0)) {
        c.status = check_status::pass;
        c.message = "The joint takes no end moment (its upper-bound stiffness is a pin), so none reverses.";
        return c;
    }
    const double tol = 1e-9 * scale;
    if (hogging > tol && sagging > tol) {
        c.status = check_status::warn;
        c.value = std::min(hogging, sagging);
        c.message = "The end moment changes sign across the combinations: up to " + fmt(hogging, dims::moment) +
                    " hogging (combination " + hogging_combination + ") and up to " + fmt(sagging, dims::moment) +
                    " sagging (combination " + sagging_combination +
                    "). A joint detailed for one sense sees the other: its tension and bearing sides swap. "
                    "Confirm the joint, its bolts and the support for both senses.";
        return c;
    }
    c.status = check_status::pass;
    c.value = scale;
    c.message = "The end moment keeps one sign over every combination and the stiffness range: " +
                std::string(hogging > tol ? "hogging" : "sagging") + ", up to " + fmt(scale, dims::moment) + ".";
    return c;
}

// The demand on the support in the governing strength state: every corner of
// the range of every strength combination, the largest |M_j + R e|
// (support_demand.hpp).
std::optional<joint_assessment::support_response> support_response_of(const beam& b,
                                                                      const std::vector<combination_result>& combos,
                                                                      beam_end e)
{
    const joint& j = b.at(e);
    // A cantilever's root is a moment joint: its shear is taken at the face of
    // the support, and the nominal 100 mm of simple construction does not
    // apply (common practice, no source).
    const double ecc = j.support_eccentricity           ? *j.support_eccentricity
                       : b.layout == beam_layout::cantilever ? 0.0
                                                        : default_support_eccentricity(j.detail ? &*j.detail : nullptr);
    std::optional<support_column> column;
    if (j.column)
        column = support_column{j.column->length_above > 0 ? j.column->sec.I : 0.0, j.column->length_above,
                                j.column->sec.I, j.column->length_below};
    const bool beam_web = j.detail && j.detail->support == support_type::beam_web;
    double beam_state::*moment = e == beam_end::start ? &beam_state::moment_start : &beam_state::moment_end;
    double beam_state::*reaction = e == beam_end::start ? &beam_state::reaction_start : &beam_state::reaction_end;
    std::optional<joint_assessment::support_response> out;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::strength) continue;
        for (const auto& s : r.corners) {
            support_demand d;
            try {
                d = demand_on_support(s.*moment, s.*reaction, ecc, column, beam_web);
            } catch (const std::invalid_argument& x) {
                throw internal_error(std::string("the demand on the support could not be found: ") + x.what());
            }
            if (out && std::abs(d.moment) <= std::abs(out->demand.moment)) continue;
            // A cantilever has no pinned state (a mechanism): no pinned reaction to compare with.
            out = joint_assessment::support_response{d, r.comb.name, s.*moment, s.*reaction,
                                                     r.pinned ? (*r.pinned).*reaction : 0.0, !j.support_eccentricity};
        }
    }
    return out;
}

check support_moment_check(const project& p, const beam& b, const joint_assessment& ja)
{
    const formatter fmt{p.units};
    check c;
    c.id = "support-moment-" + to_string(ja.end);
    c.dim = dims::moment;
    c.informative = true;
    if (!ja.support) {
        c.status = check_status::not_applicable;
        c.message = "No strength combination is given, so no support moment is reported.";
        return c;
    }
    const auto& s = *ja.support;
    const joint& j = b.at(ja.end);
    const support_demand& d = s.demand;
    c.value = std::abs(d.moment);
    const bool root = b.layout == beam_layout::cantilever;
    const std::string basis =
        s.eccentricity_is_default && root
            ? " (the default for a cantilever's root, a moment joint, whose shear the support takes at its face: "
              "common practice, no source)"
        : s.eccentricity_is_default
            ? (j.detail && j.detail->support == support_type::beam_web && j.detail->type == detail_type::fin_plate
                   ? " (at the bolt line, gap plus bolt line: common practice, no source)"
                   : p.standard == design_standard::en1993_1_8
                         ? " (the default: 100 mm from the face of the support, BS 5950-1:2000 4.7.7, the nominal "
                           "eccentricity of simple construction)"
                         // AISC 360 sets no nominal eccentricity: the UK rule is named, never applied silently.
                         : " (AISC 360 sets no nominal eccentricity: the default is the 100 mm of UK simple "
                           "construction, BS 5950-1:2000 4.7.7; give support_eccentricity for this project)")
            : " (as given)";
    c.message = "For the supporting member: up to " + fmt(c.value.value(), dims::moment) + " (combination " +
                s.combination + ", at a corner of the stiffness range): the " + (root ? "root" : "joint") + " moment " +
                fmt(s.joint_moment, dims::moment) +
                (d.eccentricity == 0.0 ? ", the reaction " + fmt(s.reaction, dims::force) + " taken at the face" + basis
                                       : " plus the reaction " + fmt(s.reaction, dims::force) + " at " +
                                             fmt(d.eccentricity, dims::length) + basis) +
                ".";
    if (d.moment_above && d.moment_below)
        c.message += " Shared by the column in proportion to I/L: " + fmt(*d.moment_above, dims::moment) + " above, " +
                     fmt(*d.moment_below, dims::moment) + " below.";
    if (d.torsion)
        c.message += " On the web of the supporting beam it is a torsion of " + fmt(*d.torsion, dims::moment) + ".";
    if (s.reaction_pinned > 0 && s.reaction > s.reaction_pinned * (1 + 1e-6))
        c.message += " The reaction is " + format_number(100.0 * (s.reaction / s.reaction_pinned - 1.0), 2) +
                     " % above the " + fmt(s.reaction_pinned, dims::force) + " with pins.";
    if (j.support_moment_resistance) {
        c.informative = false;
        c.limit = *j.support_moment_resistance;
        const bool ok = *c.value <= *c.limit;
        c.status = ok ? check_status::pass : check_status::fail;
        c.message += std::string(ok ? " Within" : " More than") + " the support's declared moment resistance " +
                     fmt(*c.limit, dims::moment) +
                     (ok ? "." : ": the supporting member must be designed for this moment, or the joint made more "
                                 "flexible.");
        return c;
    }
    // Without a resistance it is reported for the designer of the supporting
    // member: a warning where the joint adds a moment the pinned design of that
    // member does not include (the eccentricity moment alone is part of it).
    // A cantilever's support carries its root moment by design: reported, not
    // a warning.
    if (root) {
        c.status = check_status::pass;
        c.message += " The support must be designed for the cantilever's root moment: pass these figures to its "
                     "designer (give support_moment_resistance to check them here).";
        return c;
    }
    c.status = std::abs(s.joint_moment) > 0 ? check_status::warn : check_status::pass;
    c.message += c.status == check_status::warn
                     ? " The joint moment is not in a pinned design of the support: pass these on to its designer."
                     : " In that state the joint transfers no moment: the eccentricity moment alone, as in simple "
                       "construction.";
    return c;
}

check rotation_demand_check(const project& p, const std::vector<combination_result>& combos, beam_end e,
                            bool one_joint = false)
{
    const formatter fmt{p.units};
    check c;
    c.id = "rotation-demand-" + to_string(e);
    c.dim = dims::angle;
    double beam_state::*member = e == beam_end::start ? &beam_state::rotation_start : &beam_state::rotation_end;
    governing g;
    for (const auto& r : combos) {
        const auto& range = r.envelope.of(member);
        const double m = std::max(std::abs(range.min), std::abs(range.max));
        if (!g.found || m > g.value) g = {m, r.comb.name, true};
    }
    c.value = g.value;
    c.limit = simple_connection_rotation_rule_of_thumb;
    const std::string demand = "The end rotation demand is up to " + fmt(g.value, dims::angle) + " (combination " +
                               g.combination +
                               (one_joint ? ", the joint at its lower-bound stiffness)"
                                          : ", both joints at their lower-bound stiffness)");
    if (g.value <= simple_connection_rotation_rule_of_thumb) {
        c.status = check_status::pass;
        c.message = demand + ", within the about 30 mrad a simple connection is commonly expected to accommodate "
                             "(rule of thumb, not a check of the detail; check the end gap and the connection's "
                             "rotation capacity).";
    } else {
        c.status = check_status::warn;
        c.message = demand + ", more than the about 30 mrad a simple connection is commonly expected to accommodate "
                             "(rule of thumb): confirm the connection's rotation capacity and the end gap.";
    }
    return c;
}

check deflection_check(const project& p, const beam& b, const std::vector<combination_result>& combos)
{
    const formatter fmt{p.units};
    check c;
    c.id = "deflection";
    c.dim = dims::length;
    governing g;
    double pinned = 0;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::service) continue;
        const auto& range = r.envelope.of(&beam_state::max_deflection);
        const double d = std::max(std::abs(range.min), std::abs(range.max));
        if (!g.found || d > g.value) {
            g = {d, r.comb.name, true};
            pinned = std::abs(r.pinned.value().max_deflection);
        }
    }
    if (!b.deflection) {
        c.status = check_status::not_applicable;
        c.message = "No deflection limit is given (limits.deflection), so service deflection is not checked.";
        if (g.found) c.value = g.value;
        return c;
    }
    c.limit = b.deflection->value(b.span);
    if (!g.found) {
        c.status = check_status::not_applicable;
        c.message = "No service combination is given, so the deflection limit " + b.deflection->text + " is not checked.";
        return c;
    }
    c.value = g.value;
    const std::string text = std::string(b.layout == beam_layout::overhang ? "The service deflection of the back span "
                                                                           "(between the supports) is up to "
                                                                         : "The service deflection is up to ") +
                             fmt(g.value, dims::length) + " over the stiffness range (" +
                             fmt(pinned, dims::length) + " with ideal pins), combination " + g.combination +
                             ", against the limit " +
                             (b.deflection->span_ratio ? b.deflection->text + " = " : std::string()) +
                             fmt(*c.limit, dims::length);
    c.status = g.value <= *c.limit ? check_status::pass : check_status::fail;
    c.message = text + (c.status == check_status::pass ? "." : ": the beam is too flexible.");
    return c;
}

// The first natural frequency against its least value (limits.frequency), with
// the pinned-end frequency beside the range and the 18/sqrt(delta) estimate
// (model/natural_frequency.hpp) as the cross-check engineers know.
check frequency_check(const project& p, const beam& b, const std::vector<combination_result>& combos)
{
    const formatter fmt{p.units};
    check c;
    c.id = "frequency";
    c.dim = dims::frequency;
    c.limit_is_minimum = true;
    const combination_result* gov = nullptr;
    for (const auto& r : combos)
        if (r.frequency && (!gov || r.frequency->range.min < gov->frequency->range.min)) gov = &r;
    if (!gov) {
        c.status = check_status::not_applicable;
        c.message = "No vibration combination is given (a combination with use \"vibration\", such as G + 0.1 Q), "
                    "so the first natural frequency is not found or checked.";
        return c;
    }
    const auto& f = *gov->frequency;
    c.value = f.range.min;
    // The estimate from the deflection of the state with the lowest frequency.
    const auto lowest = static_cast<std::size_t>(std::min_element(f.corners.begin(), f.corners.end()) - f.corners.begin());
    // A cantilever's bounds are its rigid root (no pinned bound: a mechanism);
    // the 18/sqrt(delta) estimate belongs to a beam on two supports and is not given for it.
    const bool cantilever = b.layout == beam_layout::cantilever;
    const bool overhang = b.layout == beam_layout::overhang;
    std::string estimate;
    if (b.layout == beam_layout::two_supports) {
        const double delta = gov->corners.at(lowest).max_deflection, delta_pinned = gov->pinned.value().max_deflection;
        if (delta > 0 && delta_pinned > 0)
            estimate = "; the estimate 18/sqrt(delta) gives " + fmt(frequency_from_deflection(delta), dims::frequency) +
                       " (delta " + fmt(delta, dims::length) + ") and " +
                       fmt(frequency_from_deflection(delta_pinned), dims::frequency) + " with pins";
    }
    const std::string bounds = cantilever ? fmt(f.fixed, dims::frequency) + " with a rigid root"
                               : overhang ? fmt(f.pinned.value(), dims::frequency) + " with a pinned start, " +
                                                fmt(f.fixed, dims::frequency) + " with a fixed start; the 18/sqrt(delta) "
                                                "estimate belongs to a beam on two supports and is not given"
                                          : fmt(f.pinned.value(), dims::frequency) + " with ideal pins, " +
                                                fmt(f.fixed, dims::frequency) + " fixed";
    const std::string text = "The first natural frequency is at least " + fmt(f.range.min, dims::frequency) +
                             " over the stiffness range (" + bounds + "), combination " + gov->comb.name + estimate;
    if (!b.frequency_limit) {
        c.status = check_status::not_applicable;
        c.message = text + ". No frequency limit is given (limits.frequency), so it is not checked.";
        return c;
    }
    c.limit = *b.frequency_limit;
    const std::string against = text + ". Least frequency (limits.frequency): " + fmt(*c.limit, dims::frequency);
    if (f.range.min >= *c.limit) {
        c.status = check_status::pass;
        c.message = against + ".";
        if (f.pinned && *f.pinned < *c.limit)
            c.message += " With ideal pins the beam would not reach it: the check relies on the stiffness of the joints.";
        return c;
    }
    c.status = check_status::fail;
    c.message = against + ": the beam is too lively at its lower-bound joint stiffness. Stiffen the beam, or assess "
                          "the floor's response to walking.";
    return c;
}

struct rotation_extremes {
    double sagging = 0, hogging = 0;
    std::string sagging_combination, hogging_combination;
};

// The extremes of the end rotation over the combinations: over the range
// envelope where the lower-bound stiffness is credited, else of the pinned beam.
rotation_extremes end_rotation_extremes(const std::vector<combination_result>& combos, beam_end e, bool strength_only,
                                        bool over_range)
{
    double beam_state::*member = e == beam_end::start ? &beam_state::rotation_start : &beam_state::rotation_end;
    rotation_extremes r;
    for (const auto& c : combos) {
        if (strength_only && c.comb.use != limit_state::strength) continue;
        const auto range = over_range ? c.envelope.of(member) : value_range{c.pinned.value().*member, c.pinned.value().*member};
        if (range.max > r.sagging) {
            r.sagging = range.max;
            r.sagging_combination = c.comb.name;
        }
        if (-range.min > r.hogging) {
            r.hogging = -range.min;
            r.hogging_combination = c.comb.name;
        }
    }
    return r;
}

// The beam end's own closure rotation: the support's rotation uses part of the gap.
std::optional<double> beam_closure(const closure& c, double support_rotation)
{
    if (!c.rotation) return std::nullopt;
    return std::max(0.0, *c.rotation - support_rotation);
}

// The state after closure in words: what was solved, and what each joint does in it.
std::string closed_state_text(const project& p, const std::string& combination, const closed_state& r,
                              const closing_joint (&cj)[2], bool start_only)
{
    const formatter fmt{p.units};
    std::string text = "State after closure under " + combination +
                       ": the beam solved with bilinear joints, each at the stiffness its gap check credits (its "
                       "lower bound where declared dependable, else none) until its gap closes; contact "
                       "frictionless, the bearing force normal to the touching surfaces.";
    for (beam_end k : {beam_end::start, beam_end::end}) {
        if (start_only && k == beam_end::end) {
            text += " End: the beam runs on, continuous, over its support (no joint).";
            continue;
        }
        const closing_joint& c = cj[k == beam_end::start ? 0 : 1];
        const joint_phase ph = k == beam_end::start ? r.start : r.end;
        text += " " + std::string(k == beam_end::start ? "Start" : "End") + " joint: ";
        if (ph == joint_phase::open) {
            text += "open (gap not closed), stiffness " + stiffness_text(c.before, fmt) + ".";
            continue;
        }
        const bool hog = ph == joint_phase::closed_hogging;
        const double at = (hog ? c.closure_hogging : c.closure_sagging).value_or(0.0);
        text += std::string("closed in ") + (hog ? "hogging" : "sagging") + ": the beam end bears on the support";
        if (c.contact.is_rigid())
            text += " and is held at its closure rotation, " + fmt(at, dims::angle) + (hog ? " hogging," : " sagging,") +
                    " by that contact (rigid contact); its moment is the joint's own " + stiffness_text(c.before, fmt) +
                    " times that rotation plus what the contact takes.";
        else
            text += " beyond its closure rotation, " + fmt(at, dims::angle) + (hog ? " hogging," : " sagging,") +
                    " against a contact stiffness " +
                    stiffness_text(c.contact, fmt) + " added to the joint's own " + stiffness_text(c.before, fmt) + ".";
    }
    text += " The state's stiffness_start and stiffness_end are the joints' own stiffness before closure, not the "
            "stiffness after it.";
    return text;
}

void assess_details(const project& p, const beam& b, beam_assessment& a, bool find_min_gap)
{
    for (beam_end e : {beam_end::start, beam_end::end}) {
        const joint& j = b.at(e);
        if (!j.detail) continue;
        detail_assessment d;
        // Bolt slip in clearance holes can leave a joint turning as a pin before
        // it stiffens: the lower-bound stiffness is credited only where it is
        // declared dependable (docs/method/checks.md, gap-closure).
        d.credits_lower_bound = j.dependable_lower_bound;
        d.free_slip = j.behaviour && j.behaviour->law == joint_law_kind::multilinear ? j.behaviour->slip : 0.0;
        const auto all = end_rotation_extremes(a.combinations, e, false, d.credits_lower_bound);
        const auto strength = end_rotation_extremes(a.combinations, e, true, d.credits_lower_bound);
        // The demand on the gap is the relative rotation of beam end and support.
        // The support's own rotation closes one side of the gap whatever the
        // beam does, and its sense is not given (a magnitude): it is added to
        // the demand of both senses, even where the beam itself turns only one
        // way (docs/method/checks.md). The free slip likewise.
        const double extra = j.support_rotation + d.free_slip;
        d.demand_sagging = all.sagging + extra;
        d.demand_hogging = all.hogging + extra;
        d.demand_combination = all.sagging >= all.hogging ? all.sagging_combination : all.hogging_combination;
        d.strength_demand_sagging = strength.sagging + extra;
        d.strength_demand_hogging = strength.hogging + extra;
        d.strength_combination =
            strength.sagging >= strength.hogging ? strength.sagging_combination : strength.hogging_combination;
        d.gap = check_gap(*j.detail, b.sec, rotation_demand{d.demand_sagging, d.demand_hogging}, find_min_gap);
        d.findings = check_detailing_rules(*j.detail, b.sec, p.units, p.standard);
        const auto closes = [](const sense_check& sc, double demand) {
            return sc.closing.rotation && demand > *sc.closing.rotation;
        };
        d.closes_under_strength = closes(d.gap.sagging, d.strength_demand_sagging) ||
                                  closes(d.gap.hogging, d.strength_demand_hogging);
        d.closes_under_service = !d.closes_under_strength && !d.gap.passes;
        const auto clears = [](const sense_check& sc) {
            return !sc.closing.rotation || *sc.closing.rotation >= fallback_rotation_demand.value;
        };
        d.clears_rule_of_thumb = clears(d.gap.sagging) && (d.demand_hogging == 0 || clears(d.gap.hogging));
        (e == beam_end::start ? a.start : a.end).detail = std::move(d);
    }

    // Consequence of closure: the strength combination with the largest rotation,
    // with both joints at their lower-bound stiffness (where the rotation is largest).
    for (beam_end e : {beam_end::start, beam_end::end}) {
        auto& ja = e == beam_end::start ? a.start : a.end;
        if (!ja.detail || !ja.detail->closes_under_strength) continue;
        const combination_result* governing = nullptr;
        for (const auto& c : a.combinations)
            if (c.comb.name == ja.detail->strength_combination) governing = &c;
        if (!governing) continue;
        const beam_model model(b.span, b.EI(), factored_loads(b.loads, governing->comb), b.layout, b.overhang);
        closing_joint cj[2];
        for (beam_end k : {beam_end::start, beam_end::end}) {
            const joint& j = b.at(k);
            const auto& jk = k == beam_end::start ? a.start : a.end;
            closing_joint& c = cj[k == beam_end::start ? 0 : 1];
            // Before closure each joint has the stiffness its gap check credits:
            // its lower bound where declared dependable, else none (a pin).
            c.before = j.dependable_lower_bound ? j.range.min : stiffness::pinned();
            c.contact = j.contact_stiffness;
            if (jk.detail) {
                const double used = j.support_rotation + jk.detail->free_slip;
                c.closure_sagging = beam_closure(jk.detail->gap.sagging.closing, used);
                c.closure_hogging = beam_closure(jk.detail->gap.hogging.closing, used);
            }
        }
        closure_consequence cc;
        cc.combination = governing->comb.name;
        // An overhang has its one joint at the start (the end runs on over its support).
        cc.result = b.layout == beam_layout::overhang ? solve_with_closure_at_start(model, cj[0])
                                                      : solve_with_closure(model, cj[0], cj[1]);
        const bool start = e == beam_end::start;
        const joint_phase phase = start ? cc.result.start : cc.result.end;
        const sense_check& sc = phase == joint_phase::closed_hogging ? ja.detail->gap.hogging : ja.detail->gap.sagging;
        const auto& c = cj[start ? 0 : 1];
        cc.closure_rotation = (phase == joint_phase::closed_hogging ? c.closure_hogging : c.closure_sagging).value_or(0.0);
        const double M = start ? cc.result.state.moment_start : cc.result.state.moment_end;
        const double own = c.before.is_rigid() ? 0.0 : c.before.value() * cc.closure_rotation;
        // The beam end, free body about the centre of rotation: the moment beyond
        // the joint's own share is balanced by the bearing force times its
        // perpendicular arm (frictionless contact; docs/method/gap-geometry.md).
        cc.lever_arm = sc.closing.contact ? sc.closing.contact->lever_arm : 0.0;
        if (phase != joint_phase::open && cc.lever_arm > 1e-9)
            cc.contact_force = std::abs(std::abs(M) - own) / cc.lever_arm;
        cc.assumptions = closed_state_text(p, cc.combination, cc.result, cj, b.layout == beam_layout::overhang);
        ja.detail->consequence = cc;
    }
}

std::string closure_text(const std::optional<double>& r, const formatter& fmt)
{
    return r ? fmt(*r, dims::angle) : std::string("no closure within 90 degrees");
}

check gap_closure_check(const project& p, const beam& b, const joint_assessment& ja)
{
    const formatter fmt{p.units};
    check c;
    c.id = "gap-closure-" + to_string(ja.end);
    c.dim = dims::angle;
    if (!ja.detail) {
        c.status = check_status::not_applicable;
        c.message = "No connection detail is given for this joint, so the end gap is not checked.";
        return c;
    }
    const detail_assessment& d = *ja.detail;
    const joint& j = b.at(ja.end);
    const bool sag = d.gap.governing == rotation_sense::sagging;
    const sense_check& sc = d.gap.of(d.gap.governing);
    c.value = sag ? d.demand_sagging : d.demand_hogging;
    if (sc.closing.rotation) c.limit = *sc.closing.rotation;
    const std::string where = sc.closing.contact ? sc.closing.contact->description() : std::string("the beam end");
    const std::string gaps = "worst-case gap " + fmt(d.gap.worst_case_gap, dims::length) + " (" +
                             fmt(d.gap.gap, dims::length) + " as detailed less " +
                             fmt(d.gap.gap_tolerance, dims::length) + " tolerance)";
    const double extra = j.support_rotation + d.free_slip;
    const bool support_alone = extra > 0 && !(*c.value > extra);
    std::string included;
    if (j.support_rotation > 0) included += "support rotation " + fmt(j.support_rotation, dims::angle);
    if (d.free_slip > 0) included += (included.empty() ? "" : ", ") + std::string("free slip ") + fmt(d.free_slip, dims::angle);
    const std::string basis = d.credits_lower_bound
                                  ? "the beam's rotation at the joints' lower-bound stiffness (declared dependable)"
                                  : "the pinned beam's rotation (no joint stiffness credited: bolt slip may leave the "
                                    "joint free to turn; declare dependable_lower_bound to credit the lower bound)";
    const std::string demand =
        std::string(sag ? "sagging" : "hogging") + " rotation demand " + fmt(*c.value, dims::angle) +
        (support_alone ? " (the support's own rotation and free slip alone: the beam end does not turn this way)"
                       : " (" + basis + (included.empty() ? "" : ", plus " + included) + ")" +
                             ", combination " + d.demand_combination);
    const std::string closure = "closure rotation " + closure_text(sc.closing.rotation, fmt) + " (" + where + ")";
    const std::string min_gap = d.gap.min_gap_required
                                    ? "The smallest as-detailed gap that passes is " + fmt(*d.gap.min_gap_required, dims::length) + "."
                                    : (d.gap.min_gap_note.empty() ? std::string() : d.gap.min_gap_note + ".");
    if (!d.closes_under_strength && !d.closes_under_service) {
        c.status = check_status::pass;
        c.message = "With the " + gaps + " the " + closure + " exceeds the " + demand + "; clearance left at the demand " +
                    fmt(sc.clearance_at_demand, dims::length) + ". " + min_gap;
        return c;
    }
    if (!d.closes_under_strength) {
        c.status = check_status::warn;
        c.message = "With the " + gaps + " the " + closure + " is below the " + demand +
                    " (a service combination): the beam end bears on the support in service. " + min_gap;
        return c;
    }
    const auto& cc = *d.consequence;
    const bool start = ja.end == beam_end::start;
    const double M = start ? cc.result.state.moment_start : cc.result.state.moment_end;
    const std::string held = j.contact_stiffness.is_rigid()
                                 ? "held at its closure rotation " + fmt(cc.closure_rotation, dims::angle) +
                                       " by the contact (rigid contact)"
                                 : "turning beyond its closure rotation " + fmt(cc.closure_rotation, dims::angle) +
                                       " against the contact stiffness " +
                                       fmt(j.contact_stiffness.value(), dims::rotational_stiffness);
    const std::string effect = "Once closed, the beam end bears on the support, " + held + "; solved with each joint "
                               "at the stiffness its gap check credits, the joint takes " + fmt(M, dims::moment) + " under " +
                               cc.combination + ", a bearing force of about " + fmt(cc.contact_force, dims::force) +
                               " (frictionless, normal to the contact, arm " + fmt(cc.lever_arm, dims::length) +
                               " about the centre of rotation), and the same moment goes into the support.";
    if (j.designed_for_closure) {
        if (j.moment_resistance && std::abs(M) > *j.moment_resistance) {
            c.status = check_status::fail;
            c.message = "The gap closes under strength loads: " + closure + " is below the " + demand + ". " + effect +
                        " The joint is declared designed for closure, but its moment resistance " +
                        fmt(*j.moment_resistance, dims::moment) + " is less.";
        } else {
            c.status = check_status::pass;
            c.message = "The gap closes under strength loads: " + closure + " is below the " + demand + ". " + effect +
                        " The joint is declared designed for this moment (designed_for_closure).";
        }
        return c;
    }
    c.status = check_status::fail;
    c.message = "The gap closes under strength loads: with the " + gaps + " the " + closure + " is below the " + demand +
                ". " + effect + " The joint is then not a pin. " + min_gap +
                " Or design the joint and the support for the moment and declare it (designed_for_closure).";
    return c;
}

check detailing_check(const detailing_finding& f, beam_end e, const project& p)
{
    (void)p;
    check c;
    c.id = "detailing-" + f.id + "-" + to_string(e);
    c.varies_with_stiffness = false;
    c.status = f.status == finding_status::pass   ? check_status::pass
               : f.status == finding_status::warn ? check_status::warn
                                                  : check_status::not_applicable;
    c.value = f.value;
    c.limit = f.limit;
    c.dim = f.unit;
    // The finding's message states the rule; its source is added.
    c.message = f.message + (f.source.empty() ? std::string() : " Source: " + f.source + ".");
    return c;
}

// The fixed question for a cantilever (cantilever_checks.hpp): its root is
// the only restraint, so the checks of a pinned end, of the end gap, of a
// detail and of the support's demand are not run; the tip is free.
void assess_cantilever(const project& p, const beam& b, beam_assessment& a)
{
    a.checks.push_back(root_class_check(p, b, a.start));
    a.checks.push_back(root_flexibility_check(p, b, a.combinations));
    a.checks.push_back(root_moment_check(p, b, a.combinations));
    a.checks.push_back(tip_deflection_check(p, b, a.combinations));
    a.checks.push_back(frequency_check(p, b, a.combinations));
    a.start.support = support_response_of(b, a.combinations, beam_end::start);
    a.checks.push_back(support_moment_check(p, b, a.start));
    a.notes.push_back("Cantilever: the start joint is the root, the end a free tip. The checks ask whether the fixed "
                      "root is real, and report the root's demand on its support; the pinned-end and end-gap checks "
                      "of a beam on two supports are not run (docs/method/layouts.md).");
}

// An overhang (overhang_checks.hpp): the start joint is checked as the
// start of a beam on two supports; the beam runs on over its end support, so
// there is no end joint and nothing of it is checked; the back span's
// deflection and the tip's are checked.
void assess_overhang(const project& p, const beam& b, beam_assessment& a, const assessment_options& options)
{
    const beam_end e = beam_end::start;
    a.checks.push_back(stiffness_class_check(p, a.start));
    a.plastic_moment = b.plastic_moment();
    a.checks.push_back(joint_moment_check(p, b, a.combinations, e, a.start));
    a.checks.push_back(strength_class_check(p, b, e));
    a.checks.push_back(joint_ductility_check(p, b, a.combinations, e));
    a.start.support = support_response_of(b, a.combinations, e);
    a.checks.push_back(support_moment_check(p, b, a.start));
    a.checks.push_back(moment_reversal_check(p, a.combinations, e));
    a.checks.push_back(rotation_demand_check(p, a.combinations, e, true));
    a.checks.push_back(joint_shear_check(p, b, a.combinations, e));
    a.checks.push_back(declared_resistance_check(p, b, e));
    a.checks.push_back(ductile_hierarchy_check(p, b, e));
    a.checks.push_back(deflection_check(p, b, a.combinations));
    a.checks.push_back(overhang_tip_deflection_check(p, b, a.combinations));
    a.checks.push_back(frequency_check(p, b, a.combinations));
    // The start joint's end gap, as on two supports; the end has no joint, so
    // no detail (assess_details passes it by).
    assess_details(p, b, a, options.find_min_gap);
    a.checks.push_back(gap_closure_check(p, b, a.start));
    if (a.start.detail)
        for (const auto& f : a.start.detail->findings) a.checks.push_back(detailing_check(f, e, p));
    a.notes.push_back("Overhang: the beam runs on, continuous, over its end support to a free tip " +
                      format_quantity(b.overhang, dims::length, p.units) +
                      " beyond it. The start joint is checked as on two supports, its end gap included; there is no "
                      "end joint. Moment-rotation laws and the collapse load are not worked out for an overhang "
                      "(docs/method/layouts.md).");
}

// Assumptions and defaults applied to the beam, in words.
void add_notes(const project& p, const beam& b, beam_assessment& a)
{
    if (b.E_is_default)
        a.notes.push_back(p.standard == design_standard::en1993_1_8
                              ? "E not given: 210 000 MPa is used (EN 1993-1-1 3.2.6(1))."
                              : "E not given: 29 000 ksi is used (AISC 360-16, Section B2 / Symbols).");
    if (p.standard == design_standard::aisc360)
        a.notes.push_back("AISC 360-16 Commentary B3.4 classifies a connection by its secant stiffness at service "
                          "loads: the stiffness range should be that secant stiffness.");
    if (p.frame == frame_bracing::unbraced && p.standard == design_standard::en1993_1_8)
        a.notes.push_back("Unbraced frame: the EN 1993-1-8 rigid boundary k_b = 25 applies only where K_b/K_c >= 0.1 in "
                          "every storey; otherwise joints are semi-rigid (5.2.2.5(1)).");
}

}  // namespace

beam_assessment assess_beam(const project& p, const beam& b, const assessment_options& options)
{
    beam_assessment a;
    a.id = b.id;
    a.input = &b;
    for (beam_end e : {beam_end::start, beam_end::end})
        if ((b.at(e).stiffness_from_detail || b.at(e).moment_resistance_from_detail) && !b.at(e).derived)
            throw internal_error("beam " + b.id + ", " + to_string(e) + " joint: \"from-detail\" is not resolved; "
                                 "derive_joints (joints/joint_from_detail.hpp) runs before the assessment");
    for (const auto& c : b.combinations) a.combinations.push_back(analyse_combination(b, c, options.search_interior));
    a.start = assess_joint(p, b, beam_end::start);
    a.end = assess_joint(p, b, beam_end::end);
    a.checks.reserve(32);
    if (b.layout == beam_layout::cantilever) {
        assess_cantilever(p, b, a);
        add_notes(p, b, a);
        return a;
    }
    if (b.layout == beam_layout::overhang) {
        assess_overhang(p, b, a, options);
        add_notes(p, b, a);
        return a;
    }
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(stiffness_class_check(p, a.joint_at(e)));
    a.plastic_moment = b.plastic_moment();
    for (beam_end e : {beam_end::start, beam_end::end})
        if (b.at(e).behaviour)
            (e == beam_end::start ? a.start : a.end).law =
                law_response_of(b, a.combinations, e, options.find_yield_factor);
    for (beam_end e : {beam_end::start, beam_end::end})
        a.checks.push_back(joint_moment_check(p, b, a.combinations, e, a.joint_at(e)));
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(strength_class_check(p, b, e));
    for (beam_end e : {beam_end::start, beam_end::end})
        a.checks.push_back(joint_ductility_check(p, b, a.combinations, e));
    for (beam_end e : {beam_end::start, beam_end::end})
        (e == beam_end::start ? a.start : a.end).support = support_response_of(b, a.combinations, e);
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(support_moment_check(p, b, a.joint_at(e)));
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(moment_reversal_check(p, a.combinations, e));
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(rotation_demand_check(p, a.combinations, e));
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(joint_shear_check(p, b, a.combinations, e));
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(declared_resistance_check(p, b, e));
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(ductile_hierarchy_check(p, b, e));
    a.checks.push_back(deflection_check(p, b, a.combinations));
    a.checks.push_back(frequency_check(p, b, a.combinations));
    assess_details(p, b, a, options.find_min_gap);
    for (beam_end e : {beam_end::start, beam_end::end}) a.checks.push_back(gap_closure_check(p, b, a.joint_at(e)));
    for (beam_end e : {beam_end::start, beam_end::end})
        if (a.joint_at(e).detail)
            for (const auto& f : a.joint_at(e).detail->findings) a.checks.push_back(detailing_check(f, e, p));
    add_notes(p, b, a);
    return a;
}

nonlinear_end end_for(const joint& j, stiffness s) { return end_for_joint(j, s); }

project_assessment assess_project(const project& p, const assessment_options& options)
{
    project_assessment out;
    out.input = &p;
    for (const auto& b : p.beams) out.beams.push_back(assess_beam(p, b, options));
    return out;
}

}  // namespace pinproof
