#include "pinproof/result_json.hpp"

#include <nlohmann/json.hpp>

#include <cmath>

#include "pinproof/errors.hpp"
#include "pinproof/result_fields.hpp"

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
    return out;
}

std::string unit_of(dimension d)
{
    if (d == dims::moment) return "N*m";
    if (d == dims::angle) return "rad";
    if (d == dims::length) return "m";
    if (d == dims::force) return "N";
    if (d == dims::rotational_stiffness) return "N*m/rad";
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

json to_json(const beam_assessment& a)
{
    const beam& b = *a.input;
    json out;
    out["id"] = a.id;
    out["verdict"] = a.holds() ? "holds" : "does-not-hold";
    out["span"] = number(b.span);
    out["E"] = number(b.E);
    out["section"] = {{"name", b.sec.name}, {"I", number(b.sec.I)}, {"depth", number(b.sec.depth)}};
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
    out["joints"] = {{"start", joint_json(a.start, b)}, {"end", joint_json(a.end, b)}};
    json combos = json::array();
    for (const auto& r : a.combinations) {
        json c;
        c["name"] = r.comb.name;
        c["use"] = to_string(r.comb.use);
        c["factors"] = r.comb.factors;
        c["pinned"] = to_json(r.pinned);
        c["fixed"] = to_json(r.fixed);
        json corners = json::array();
        for (const auto& s : r.corners) corners.push_back(to_json(s));
        json env;
        const auto& f = result_fields();
        for (std::size_t i = 0; i < f.size(); ++i)
            env[f[i].key] = {{"min", number(r.envelope.ranges[i].min)}, {"max", number(r.envelope.ranges[i].max)}};
        c["range"] = {{"corners", corners}, {"envelope", env}, {"interior_points", r.interior_points}};
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
    for (const auto& b : a.beams) beams.push_back(to_json(b));
    out["beams"] = beams;
    out["caution"] = "Results support, and do not replace, the judgement of a qualified engineer; local codes and "
                     "licensed practice govern.";
    return out;
}

}  // namespace pinproof
