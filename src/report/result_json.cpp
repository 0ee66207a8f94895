#include "pinproof/report/result_json.hpp"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/checks/sweep.hpp"
#include "pinproof/report/sweep_output.hpp"

namespace pinproof {
namespace {

using json = nlohmann::json;

// A value that is not finite must never reach an output.
json number(double v)
{
    if (!std::isfinite(v)) throw internal_error("a result value is not finite");
    return v;
}

json stiffness_json(stiffness s) { return s.is_rigid() ? json(nullptr) : number(s.value()); }

json optional_number(const std::optional<double>& v) { return v ? number(*v) : json(nullptr); }

json closure_json(const std::optional<double>& r) { return r ? number(*r) : json(nullptr); }

json point_json(const point2& p) { return {{"x", number(p.x)}, {"y", number(p.y)}}; }

json detail_json(const detail_assessment& d, const joint& j)
{
    json out;
    out["type"] = to_string(j.detail->type);
    out["support"] = to_string(j.detail->support);
    out["gap"] = number(d.gap.gap);
    out["gap_tolerance"] = number(d.gap.gap_tolerance);
    out["worst_case_gap"] = number(d.gap.worst_case_gap);
    out["closure_rotation_sagging"] = closure_json(d.gap.sagging.closing.rotation);
    out["closure_rotation_hogging"] = closure_json(d.gap.hogging.closing.rotation);
    out["rotation_demand"] = number(d.gap.governing == rotation_sense::sagging ? d.demand_sagging : d.demand_hogging);
    out["rotation_demand_sagging"] = number(d.demand_sagging);
    out["rotation_demand_hogging"] = number(d.demand_hogging);
    out["support_rotation"] = number(j.support_rotation);
    out["credits_lower_bound"] = d.credits_lower_bound;
    out["free_slip"] = number(d.free_slip);
    out["governing_sense"] = to_string(d.gap.governing);
    out["critical_point"] = d.gap.critical_point();
    const auto& sc = d.gap.of(d.gap.governing);
    out["margin"] = sc.margin ? number(*sc.margin) : json(nullptr);
    out["margin_is_lower_bound"] = sc.margin_is_lower_bound;
    out["clearance_at_demand"] = number(sc.clearance_at_demand);
    out["min_gap_required"] = d.gap.min_gap_required ? number(*d.gap.min_gap_required) : json(nullptr);
    if (!d.gap.min_gap_note.empty()) out["min_gap_note"] = d.gap.min_gap_note;
    out["centre_of_rotation"] = {{"sagging", point_json(d.gap.sagging.closing.contact ? d.gap.sagging.closing.contact->centre : point2{})},
                                 {"hogging", point_json(d.gap.hogging.closing.contact ? d.gap.hogging.closing.contact->centre : point2{})}};
    out["closes_under_strength"] = d.closes_under_strength;
    out["closes_under_service"] = d.closes_under_service;
    out["clears_rule_of_thumb_rotation"] = d.clears_rule_of_thumb;
    if (d.consequence) {
        const auto& c = *d.consequence;
        out["closure_analysis"] = {{"combination", c.combination},
                                   {"closure_rotation", number(c.closure_rotation)},
                                   {"contact_force", number(c.contact_force)},
                                   {"lever_arm", number(c.lever_arm)},
                                   {"phase_start", to_string(c.result.start)},
                                   {"phase_end", to_string(c.result.end)},
                                   {"assumptions", c.assumptions},
                                   {"state", to_json(c.result.state)}};
    } else {
        out["closure_analysis"] = nullptr;
    }
    return out;
}

// The declared law and its parameters in SI (docs/file-format.md).
json behaviour_json(const joint_assessment& j, const joint& jt)
{
    if (!jt.behaviour) return nullptr;
    const joint_behaviour& bh = *jt.behaviour;
    json params = json::object();
    switch (bh.law) {
    case joint_law_kind::linear: break;
    case joint_law_kind::ec3_curve: params["psi"] = number(bh.psi); break;
    case joint_law_kind::ec3_eta: params["eta"] = number(bh.eta); break;
    case joint_law_kind::power:
        params["ultimate_moment"] = number(bh.ultimate_moment);
        params["shape"] = number(bh.shape);
        break;
    case joint_law_kind::richard_abbott:
        params["reference_moment"] = number(bh.reference_moment);
        params["plastic_stiffness"] = number(bh.plastic_stiffness);
        params["shape"] = number(bh.shape);
        break;
    case joint_law_kind::multilinear: {
        json pts = json::array();
        for (const auto& [theta, m] : bh.points) pts.push_back({{"rotation", number(theta)}, {"moment", number(m)}});
        params["points"] = pts;
        params["slip"] = number(bh.slip);
        break;
    }
    }
    if (bh.joint_type) params["joint_type"] = to_string(*bh.joint_type);
    if (bh.joint_location) params["joint_location"] = to_string(*bh.joint_location);
    json out;
    out["law"] = to_string(bh.law);
    out["parameters"] = params;
    out["secant_stiffness_at_uls"] = j.law ? number(j.law->secant_stiffness) : json(nullptr);
    out["yields"] = j.law ? j.law->yields : false;
    out["yield_load_factor"] = j.law && j.law->yield_factor ? number(*j.law->yield_factor) : json(nullptr);
    return out;
}

// The joint worked out from its detail (model/derived_joint.hpp), in SI.
json derived_json(const derived_joint& d)
{
    json components = json::array();
    for (const joint_component& c : d.components)
        components.push_back({{"id", c.id},
                              {"resistance", optional_number(c.resistance)},
                              {"per_bolt", optional_number(c.per_bolt)},
                              {"stiffness", optional_number(c.stiffness)},
                              {"source", c.source}});
    json out;
    out["basis"] = d.basis;
    out["initial_stiffness"] = optional_number(d.initial_stiffness);
    out["stiffness_min"] = optional_number(d.stiffness_min);
    out["stiffness_max"] = optional_number(d.stiffness_max);
    out["stiffness_scatter"] = {{"min", number(d.scatter_min)}, {"max", number(d.scatter_max)}, {"default", d.scatter_default}};
    out["free_rotation"] = number(d.free_rotation);
    out["shear_resistance"] = number(d.shear_resistance);
    out["moment_resistance"] = number(d.moment_resistance);
    out["governing"] = d.governing;
    out["moment_governing"] = d.moment_governing;
    out["rotation_capacity"] = optional_number(d.rotation_capacity);
    out["rotation_capacity_adequate"] = d.rotation_capacity_adequate ? json(*d.rotation_capacity_adequate) : json(nullptr);
    out["rotation_capacity_basis"] = d.rotation_capacity_basis;
    json rows = json::array();
    for (const derived_tension_row& r : d.tension_rows)
        rows.push_back({{"lever_arm", number(r.lever_arm)},
                        {"resistance", number(r.resistance)},
                        {"governing", r.governing},
                        {"stiffness", number(r.stiffness)}});
    out["tension_rows"] = rows;
    out["components"] = components;
    out["defaults"] = d.defaults;
    out["limits_exceeded"] = d.limits_exceeded;
    return out;
}

// The demand passed to the support in the governing strength state; null
// without a strength combination, and each part null where it does not apply.
json support_demand_json(const joint_assessment& j)
{
    if (!j.support) return nullptr;
    const support_demand& d = j.support->demand;
    return {{"eccentricity", number(d.eccentricity)},
            {"moment", number(d.moment)},
            {"moment_above", optional_number(d.moment_above)},
            {"moment_below", optional_number(d.moment_below)},
            {"torsion", optional_number(d.torsion)}};
}

json joint_json(const joint_assessment& j, const beam& b)
{
    json out;
    out["stiffness"] = {{"min", stiffness_json(j.range.min)}, {"max", stiffness_json(j.range.max)}};
    out["ratio"] = {{"lower", optional_number(j.ratio_lower)}, {"upper", optional_number(j.ratio_upper)}};
    out["fixity_factor"] = {{"lower", number(j.fixity_lower)}, {"upper", number(j.fixity_upper)}};
    out["class"] = {
        {"EN1993-1-8", {{"lower", to_string(j.en_lower)}, {"upper", to_string(j.en_upper)}}},
        {"AISC360", {{"lower", to_string(j.aisc_lower)}, {"upper", to_string(j.aisc_upper)}}},
    };
    const auto& mr = b.at(j.end).moment_resistance;
    out["moment_resistance"] = optional_number(mr);
    out["detail"] = j.detail ? detail_json(*j.detail, b.at(j.end)) : json(nullptr);
    out["behaviour"] = behaviour_json(j, b.at(j.end));
    out["rotation_capacity"] = optional_number(b.at(j.end).rotation_capacity);
    out["derived"] = b.at(j.end).derived ? derived_json(*b.at(j.end).derived) : json(nullptr);
    out["support_demand"] = support_demand_json(j);
    // The connection as used, every default marked with its source.
    json inputs = json::array();
    if (const auto& d = b.at(j.end).detail)
        for (const detail_input& i : d->inputs)
            inputs.push_back({{"field", i.field},
                              {"value", i.length ? json(number(*i.length)) : json(i.text)},
                              {"default", i.is_default},
                              {"source", i.is_default ? json(i.source) : json(nullptr)}});
    out["inputs"] = inputs;
    return out;
}

std::string unit_of(dimension d)
{
    if (d == dims::moment) return "N*m";
    if (d == dims::angle) return "rad";
    if (d == dims::length) return "m";
    if (d == dims::force) return "N";
    if (d == dims::rotational_stiffness) return "N*m/rad";
    if (d == dims::frequency) return "Hz";
    return "1";
}

}  // namespace

json to_json(const beam_state& s)
{
    json out;
    out["stiffness_start"] = stiffness_json(s.stiffness_start);
    out["stiffness_end"] = stiffness_json(s.stiffness_end);
    for (const auto& f : result_fields()) out[f.key] = number(s.*(f.member));
    return out;
}

namespace {

// An overhang's tip (beam_model.hpp): its deflection and rotation in every
// state, and their range over the corners (linear in the start moment, so the
// corners hold the extremes).
void add_tip(json& c, json& corners, json& env, const combination_result& r)
{
    const auto put = [](json& j, const beam_state& s) {
        j["tip_deflection"] = number(s.tip_deflection);
        j["rotation_tip"] = number(s.rotation_tip);
    };
    if (r.pinned) put(c["pinned"], *r.pinned);
    put(c["fixed"], r.fixed);
    for (std::size_t i = 0; i < corners.size(); ++i) put(corners[i], r.corners.at(i));
    for (double beam_state::*m : {&beam_state::tip_deflection, &beam_state::rotation_tip}) {
        const value_range range = corner_range(r, m);
        env[m == &beam_state::tip_deflection ? "tip_deflection" : "rotation_tip"] = {{"min", number(range.min)},
                                                                                       {"max", number(range.max)}};
    }
}

}  // namespace

json to_json(const beam_assessment& a)
{
    const beam& b = *a.input;
    json out;
    out["id"] = a.id;
    // Written for a layout other than the default only, so that the result
    // of a beam on two supports reads as it always has (absent: "two-supports").
    const bool cantilever = b.layout == beam_layout::cantilever;
    const bool overhang = b.layout == beam_layout::overhang;
    if (b.layout != beam_layout::two_supports) out["layout"] = to_string(b.layout);
    out["verdict"] = a.holds() ? "holds" : "does-not-hold";
    out["span"] = number(b.span);
    if (overhang) out["overhang"] = number(b.overhang);
    out["E"] = number(b.E);
    out["section"] = {{"name", b.sec.name}, {"I", number(b.sec.I)}, {"depth", number(b.sec.depth)}};
    out["steel"] = b.steel ? json(b.steel->name()) : json(nullptr);
    out["plastic_moment"] = optional_number(a.plastic_moment);
    json checks = json::array();
    for (const auto& c : a.checks) {
        checks.push_back({{"id", c.id},
                          {"status", to_string(c.status)},
                          {"value", optional_number(c.value)},
                          {"limit", optional_number(c.limit)},
                          {"unit", unit_of(c.dim)},
                          {"message", c.message}});
    }
    out["checks"] = checks;
    // A cantilever's tip is free, and an overhang runs on over its end support: no end joint.
    out["joints"] = {{"start", joint_json(a.start, b)},
                     {"end", cantilever || overhang ? json(nullptr) : joint_json(a.end, b)}};
    json combos = json::array();
    for (const auto& r : a.combinations) {
        json c;
        c["name"] = r.comb.name;
        c["use"] = to_string(r.comb.use);
        c["factors"] = r.comb.factors;
        // A cantilever's pinned bound is a mechanism: null.
        c["pinned"] = r.pinned ? to_json(*r.pinned) : json(nullptr);
        c["fixed"] = to_json(r.fixed);
        json corners = json::array();
        for (const auto& s : r.corners) corners.push_back(to_json(s));
        json env;
        const auto& f = result_fields();
        for (std::size_t i = 0; i < f.size(); ++i)
            env[f[i].key] = {{"min", number(r.envelope.ranges[i].min)}, {"max", number(r.envelope.ranges[i].max)}};
        // A vibration combination: the first natural frequency (Hz) of each state.
        if (r.frequency) {
            if (r.frequency->pinned) c["pinned"]["frequency"] = number(*r.frequency->pinned);
            c["fixed"]["frequency"] = number(r.frequency->fixed);
            for (std::size_t i = 0; i < corners.size(); ++i) corners[i]["frequency"] = number(r.frequency->corners.at(i));
            env["frequency"] = {{"min", number(r.frequency->range.min)}, {"max", number(r.frequency->range.max)}};
        }
        if (overhang) add_tip(c, corners, env, r);
        c["range"] = {{"corners", corners}, {"envelope", env}, {"interior_points", r.interior_points}};
        c["collapse"] = r.collapse ? json{{"load_factor", number(r.collapse->load_factor)},
                                          {"rotation_start", number(r.collapse->rotation_start)},
                                          {"rotation_end", number(r.collapse->rotation_end)}}
                                   : json(nullptr);
        combos.push_back(c);
    }
    out["combinations"] = combos;
    out["notes"] = a.notes;
    return out;
}

json to_json(const project_assessment& a)
{
    json out;
    out["format"] = result_format;
    out["title"] = a.input->title;
    out["standard"] = to_string(a.input->standard);
    out["frame"] = to_string(a.input->frame);
    out["verdict"] = a.all_hold() ? "holds" : "does-not-hold";
    json beams = json::array();
    for (const auto& b : a.beams) {
        beams.push_back(to_json(b));
        const beam& in = *b.input;
        // Thresholds and probabilities: for a cantilever or an overhang along
        // its one joint (threshold.hpp).
        beams.back()["sensitivity"] =
            sensitivity_json(*a.input, in, {in.start.distribution, in.end.distribution, in.stiffness_correlation});
    }
    out["beams"] = beams;
    out["caution"] = "Results support, and do not replace, the judgement of a qualified engineer; local codes and "
                     "licensed practice govern.";
    return out;
}

}  // namespace pinproof
