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
    if (j.detail->type != detail_type::fin_plate && j.detail->type != detail_type::end_plate)
        return "The joint's " + to_string(j.detail->type) + " detail is not derived yet (fin plates and EN end plates are)";
    const std::string what = j.detail->type == detail_type::fin_plate ? "fin plate" : "end plate";
    return "The " + what + " is not derived (" + (j.not_derived_reason.empty() ? std::string("outside the derivation's scope")
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
                                 " against " + fmt(p, d.moment_resistance, dims::moment) + " derived (" +
                                 (d.tension_rows.empty() ? "the bolt group" : "the bolt rows in tension") + ", " +
                                 d.moment_governing + " governing; the limit shown, " + fmt(p, *c.limit, dims::moment) +
                                 ", is 10 % above it)";
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

namespace {

const joint_component* component(const derived_joint& d, const std::string& id)
{
    for (const auto& c : d.components)
        if (c.id == id) return &c;
    return nullptr;
}

// The least throat of the two fillet welds of a plate of thickness t that
// makes them as strong as the plate in tension across them (full strength),
// EN 1993-1-8 4.5.3.2, the directional method for a weld loaded
// perpendicular to its axis: sigma_perp = tau_perp = F / (a sqrt 2), so
// 2 a f_u / (sqrt 2 beta_w gamma_M2) >= t f_y / gamma_M0, that is
// a >= t f_y sqrt 2 beta_w gamma_M2 / (2 f_u), with beta_w 0.85 for S275 and
// 0.9 for S355 (Table 4.1), gamma_M2 1.25, gamma_M0 1.0, and f_y, f_u of the
// plate by EN 10025-2 as everywhere in the derivation (steel_grade.hpp). With
// the f_u = 430 MPa of EN 1993-1-1 Table 3.1 the ratio for S275 is the 0.48 of
// the simple-joint guides (reference pack 10.2); EN 10025-2's 410 MPa gives 0.50.
double full_strength_throat_ratio(plate_grade g, double t)
{
    steel_material m;
    m.grade = g == plate_grade::s355 ? steel_grade::s355 : steel_grade::s275;
    const double beta_w = g == plate_grade::s355 ? 0.9 : 0.85;
    return m.fy(t) * std::sqrt(2.0) * beta_w * 1.25 / (2 * *m.fu(t) * 1.0);
}

}  // namespace

check ductile_hierarchy_check(const project& p, const beam& b, beam_end e)
{
    const joint& j = b.at(e);
    check c;
    c.id = "ductile-hierarchy-" + to_string(e);
    c.dim = dims::length;
    c.varies_with_stiffness = false;  // the detail alone decides it
    if (!j.derived || !j.detail) {
        c.message = not_derived(j) + ", so the order in which its parts yield is not checked.";
        return c;
    }
    const derived_joint& d = *j.derived;
    const connection_detail& det = *j.detail;
    const bool us = p.standard == design_standard::aisc360;
    std::vector<std::string> found, fine;
    bool compared = false;
    // The numbers of each comparison made; the check's value and limit are
    // those of the first adverse one (the one the warning is about), else the
    // weld's, else the first made.
    struct comparison {
        double value, limit;
        dimension dim;
        bool limit_is_minimum, adverse, weld;
    };
    std::vector<comparison> numbers;
    // The bolts must not be the first to go: bearing in the plate or the web
    // (which deforms and lets the joint turn) before bolt shear (which is
    // sudden). EN 1993-1-8 6.4.2(3): a joint governed by bolt shear is not
    // given rotation capacity (reference pack 10.5, from memory); the
    // simple-joint guides require the same of fin plates. In an AISC 360
    // project the conventional configuration's thickness limit serves this
    // end (detailing-plate-ductility), so only the weld is checked here.
    if (!us) {
        const auto* shear = component(d, "bolt-shear");
        const auto* plate = component(d, "bolt-bearing-plate");
        const auto* web = component(d, "bolt-bearing-web");
        if (shear && shear->resistance && plate && plate->resistance && web && web->resistance) {
            compared = true;
            const double bearing = std::min(*plate->resistance, *web->resistance);
            const std::string which = *plate->resistance <= *web->resistance ? "bearing on the plate" : "bearing on the web";
            const std::string text = which + " (" + fmt(p, bearing, dims::force) + ") against bolt shear (" +
                                     fmt(p, *shear->resistance, dims::force) + ")";
            numbers.push_back({bearing, *shear->resistance, dims::force, false, bearing > *shear->resistance, false});
            if (bearing <= *shear->resistance) fine.push_back(text + ": bearing governs, the bolts do not shear first");
            else
                found.push_back(text + ": bolt shear governs, so the bolts may shear before the holes deform and "
                                       "the joint may not turn as a pin needs (EN 1993-1-8 6.4.2(3))");
        }
    }
    // An end plate must yield in bending before its bolts break in tension:
    // EN 1993-1-8 6.4.2(2), t_p <= 0.36 d sqrt(f_ub / f_y) where the end plate in
    // bending governs (reference pack 10.5, from memory).
    if (!us && det.type == detail_type::end_plate) {
        compared = true;
        if (d.rotation_capacity_adequate && *d.rotation_capacity_adequate)
            fine.push_back("the rotation capacity is " + d.rotation_capacity_basis);
        else if (d.rotation_capacity_adequate)
            found.push_back("the rotation capacity is " + d.rotation_capacity_basis +
                            ": the plate is too thick for its bolts to be sure it yields before they break");
        else
            found.push_back("the moment resistance is governed by " + d.moment_governing +
                            ", not by the end plate in bending, so EN 1993-1-8 6.4.2(2) gives no rotation capacity");
    }
    // The welds must be stronger than the plate, so that the plate yields
    // and the welds never tear.
    if (det.derivation.weld) {
        const fillet_weld& w = *det.derivation.weld;
        const double tp = det.plate_thickness;
        double have = 0, need = 0;
        std::string rule;
        if (us) {
            // AISC: fillets on both sides of 5/8 of the plate thickness develop
            // the plate (reference pack 10.3: AISC Engineering FAQ 5.2.1).
            have = w.leg_length();
            need = 0.625 * tp;
            rule = "fillet legs of at least 5/8 of the plate thickness (AISC Engineering FAQ 5.2.1)";
        } else {
            have = w.throat();
            need = full_strength_throat_ratio(det.grade, tp) * tp;
            rule = "a full-strength throat of at least " + format_number(full_strength_throat_ratio(det.grade, tp), 3) +
                   " t_p (EN 1993-1-8 4.5.3.2, " + to_string(det.grade) + ")";
        }
        compared = true;
        numbers.push_back({have, need, dims::length, true, !(have >= need * (1 - 1e-9)), true});
        const std::string text = std::string("the weld ") + (us ? "leg " : "throat ") + fmt(p, have, dims::length) +
                                 " against " + rule + ", " + fmt(p, need, dims::length);
        if (have >= need * (1 - 1e-9)) fine.push_back(text + ": the plate yields before the weld");
        else found.push_back(text + ": the weld may tear before the plate yields");
    } else {
        fine.push_back("the weld is not checked (no weld size given)");
    }
    if (!found.empty()) c.status = check_status::warn;
    else if (compared) c.status = check_status::pass;
    const comparison* shown = nullptr;
    for (const auto& n : numbers)
        if (n.adverse && !shown) shown = &n;
    for (const auto& n : numbers)
        if (n.weld && !shown) shown = &n;
    if (!shown && !numbers.empty()) shown = &numbers.front();
    if (shown) {
        c.value = shown->value;
        c.limit = shown->limit;
        c.dim = shown->dim;
        c.limit_is_minimum = shown->limit_is_minimum;
    }
    const auto join = [](const std::vector<std::string>& v) {
        std::string out;
        for (std::size_t i = 0; i < v.size(); ++i) out += (i ? "; " : "") + v[i];
        return out;
    };
    const std::string head = "The order in which the parts of " + basis_of(d) + " yield: ";
    if (c.status == check_status::warn)
        c.message = head + join(found) + (fine.empty() ? "" : "; " + join(fine)) +
                    ". A simple joint must deform before it breaks: change the detail so that the plate or web "
                    "yields first.";
    else if (c.status == check_status::pass)
        c.message = head + join(fine) + ".";
    else
        c.message = head + join(fine) + "; nothing else of the hierarchy applies in an " + d.basis + " project.";
    return c;
}

}  // namespace pinproof
