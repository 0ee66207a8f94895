#include "pinproof/checks/derived_joint_checks.hpp"

#include <algorithm>
#include <cmath>

namespace pinproof {
namespace {

std::string fmt(const project& p, double v, dimension d) { return format_quantity(v, d, p.units); }

// Why a joint has no derivation: no detail, or a type not derived yet.
std::string not_derived(const joint& j)
{
    if (!j.detail) return "The joint has no detail to derive it from";
    if (j.detail->type != detail_type::fin_plate)
        return "The joint's " + to_string(j.detail->type) + " detail is not derived yet (fin plates are)";
    return "The fin plate is not derived (" + (j.not_derived_reason.empty() ? std::string("outside the derivation's scope")
                                                                              : j.not_derived_reason) + ")";
}

std::string basis_of(const derived_joint& d)
{
    return "the joint derived from its detail (" + d.basis + ")";
}

}  // namespace

check joint_shear_check(const project& p, const beam& b, const std::vector<combination_result>& combos, beam_end e)
{
    const joint& j = b.at(e);
    check c;
    c.id = "joint-shear-" + to_string(e);
    c.dim = dims::force;
    if (!j.derived) {
        c.message = not_derived(j) + ", so its shear resistance is not checked.";
        return c;
    }
    const derived_joint& d = *j.derived;
    double V = 0;
    std::string governing_combination;
    const bool start = e == beam_end::start;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::strength) continue;
        const value_range& range = r.envelope.of(start ? &beam_state::reaction_start : &beam_state::reaction_end);
        const double here = std::max(std::abs(range.min), std::abs(range.max));
        if (governing_combination.empty() || here > V) {
            V = here;
            governing_combination = r.comb.name;
        }
    }
    if (governing_combination.empty()) {
        c.message = "No strength combination is given, so the end shear is not checked against the joint's resistance.";
        return c;
    }
    c.value = V;
    c.limit = d.shear_resistance;
    const std::string compared = "The largest end shear under strength loads, " + fmt(p, V, dims::force) + " (" +
                                 governing_combination + ", over the stiffness range), against the shear resistance " +
                                 fmt(p, d.shear_resistance, dims::force) + " of " + basis_of(d) + ", governed by " +
                                 d.governing;
    if (V <= d.shear_resistance) {
        c.status = check_status::pass;
        c.message = compared + ": within it (utilisation " + format_number(V / d.shear_resistance, 3) + ").";
    } else {
        c.status = check_status::fail;
        c.message = compared + ": the end shear exceeds it (utilisation " + format_number(V / d.shear_resistance, 3) +
                    "). Strengthen the " + d.governing + " component (more or larger bolts, a thicker plate) and check again.";
    }
    return c;
}

check declared_resistance_check(const project& p, const beam& b, beam_end e)
{
    const joint& j = b.at(e);
    check c;
    c.id = "declared-resistance-" + to_string(e);
    c.dim = dims::moment;
    c.varies_with_stiffness = false;
    // Advice on the inputs, not a criterion of the beam: left out of thresholds,
    // probabilities and batch verdicts, like moment-reversal.
    c.informative = true;
    if (!j.derived) {
        c.message = not_derived(j) + ", so its declared values are not compared with derived ones.";
        return c;
    }
    const derived_joint& d = *j.derived;
    const bool declared_m = j.moment_resistance && !j.moment_resistance_from_detail;
    const bool declared_s = !j.stiffness_from_detail && d.initial_stiffness;
    if (!declared_m && !declared_s) {
        c.message = "The joint's moment resistance and stiffness are those derived from its detail; nothing declared to compare.";
        return c;
    }
    std::vector<std::string> found, fine;
    if (declared_m) {
        c.value = *j.moment_resistance;
        c.limit = (1 + declared_resistance_margin) * d.moment_resistance;
        const std::string text = "the declared moment resistance " + fmt(p, *j.moment_resistance, dims::moment) +
                                 " against " + fmt(p, d.moment_resistance, dims::moment) + " derived (the bolt group, " +
                                 d.moment_governing + " governing)";
        if (*j.moment_resistance > *c.limit)
            found.push_back(text + ": more than 10 % above it, so the joint may not carry what the declaration assumes");
        else
            fine.push_back(text);
    }
    if (declared_s) {
        const double S = *d.initial_stiffness;
        const bool inside = j.range.min <= stiffness::spring(S) && stiffness::spring(S) <= j.range.max;
        const std::string text = "the derived initial stiffness " + fmt(p, S, dims::rotational_stiffness) +
                                 (inside ? " lies within" : " lies outside") + " the declared range " +
                                 (j.range.min.is_rigid() ? "rigid" : fmt(p, j.range.min.value(), dims::rotational_stiffness)) +
                                 " to " +
                                 (j.range.max.is_rigid() ? "rigid" : fmt(p, j.range.max.value(), dims::rotational_stiffness));
        (inside ? fine : found).push_back(text);
    }
    const auto join = [](const std::vector<std::string>& v) {
        std::string out;
        for (std::size_t i = 0; i < v.size(); ++i) out += (i ? "; " : "") + v[i];
        return out;
    };
    if (found.empty()) {
        c.status = check_status::pass;
        c.message = "Compared with " + basis_of(d) + ": " + join(fine) + ".";
    } else {
        c.status = check_status::warn;
        c.message = "Compared with " + basis_of(d) + ": " + join(found) + (fine.empty() ? "" : "; " + join(fine)) +
                    ". Declare the derived values (\"from-detail\") or justify the declared ones.";
    }
    return c;
}

}  // namespace pinproof
