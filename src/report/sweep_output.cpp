#include "pinproof/report/sweep_output.hpp"

#include <nlohmann/json.hpp>

#include <cmath>
#include <iterator>
#include <sstream>
#include <vector>

#include "pinproof/core/csv_cell.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/report/beam_line_chart.hpp"
#include "pinproof/report/svg_chart.hpp"

namespace pinproof {

namespace {

// A column's unit in the project's units ("1" for a ratio), and the factor
// from SI: the same style as the batch CSV ("name [unit]").
struct column_unit {
    std::string symbol;
    double per_si = 1;
};

column_unit unit_of(dimension d, unit_system u)
{
    if (d == dims::dimensionless) return {"1", 1};
    const display_unit du = display_unit_for(d, u);
    return {du.symbol.empty() ? std::string("1") : du.symbol, 1.0 / du.si_per_unit};
}

}  // namespace

std::string sweep_csv(const sweep_result& s, unit_system units)
{
    std::ostringstream o;
    o.precision(10);
    const column_unit k_unit = unit_of(dims::rotational_stiffness, units);
    o << "stiffness_start [" << k_unit.symbol << "],ratio_start [1],fixity_start [1],stiffness_end [" << k_unit.symbol
      << "],ratio_end [1],fixity_end [1]";
    std::vector<column_unit> field_units;
    for (const auto& f : result_fields()) {
        field_units.push_back(unit_of(f.dim, units));
        o << "," << f.key << " [" << field_units.back().symbol << "]";
    }
    if (!s.rows.empty())
        for (const auto& c : s.rows.front().checks) o << "," << csv_cell(c.id);
    o << "\n";
    const auto stiff = [&](stiffness k) {
        std::ostringstream t;
        t.precision(10);
        if (k.is_rigid()) t << "rigid,";
        else t << k.value() * k_unit.per_si << "," << k.ratio(s.EI, s.span);
        return t.str();
    };
    for (const auto& r : s.rows) {
        o << stiff(r.at.start) << "," << r.fixity_start << "," << stiff(r.at.end) << "," << r.fixity_end;
        std::size_t i = 0;
        for (const auto& f : result_fields()) {
            const double v = r.state.*(f.member) * field_units[i++].per_si;
            if (!std::isfinite(v)) throw internal_error("a sweep value is not finite");
            o << "," << (std::abs(v) < 1e-300 ? 0.0 : v);
        }
        for (const auto& c : r.checks) o << "," << to_string(c.status);
        o << "\n";
    }
    return o.str();
}

std::string sweep_svg(const project& p, const beam& b, const sweep_result& s)
{
    if (s.settings.grid) throw internal_error("the sweep chart is drawn for a path, not a grid");
    line_chart ch;
    const bool cantilever = b.layout == beam_layout::cantilever;
    const std::string moving = cantilever                                   ? "the root moving"
                               : b.layout == beam_layout::overhang          ? "the start joint moving"
                               : s.settings.path.moving == moving_end::both ? "both ends equal"
                                                                            : to_string(s.settings.path.moving) + " joint moving";
    ch.title = "Beam " + s.beam_id + ": results against joint stiffness (" + moving + ", combination " +
               s.combination + ")";
    ch.x = {"joint stiffness S*L/EI (-), log scale; EI/L = " +
                format_quantity(s.EI / s.span, dims::rotational_stiffness, p.units),
            true, 0.01, 1000.0};
    ch.y = {cantilever ? "value with a rigid root / result (-): 1 where the root acts as fixed"
                       : "result / its pinned or fixed-end value (-)",
            false, std::nullopt, std::nullopt};
    struct normalised {
        double beam_state::*member;
        bool by_fixed;
        const char* label;
        bool dashed;
        bool inverse = false;  // reference / result, not result / reference
    };
    const normalised list[] = {
        {&beam_state::moment_start, true, "end moment, start / fixed", false},
        {&beam_state::moment_end, true, "end moment, end / fixed", true},
        {&beam_state::max_sagging_moment, false, "max sagging moment / pinned", false},
        {&beam_state::max_deflection, false, "max deflection / pinned", false},
        {&beam_state::rotation_start, false, "end rotation, start / pinned", false},
        {&beam_state::rotation_end, false, "end rotation, end / pinned", true},
        {&beam_state::reaction_start, false, "reaction, start / pinned", false},
        {&beam_state::reaction_end, false, "reaction, end / pinned", true},
    };
    // A cantilever: its root moment and reaction are statics (the same at every
    // stiffness); the tip's deflection and rotation, as their rigid-root values
    // over them: 0 for a root that is a pin (a mechanism), 1 for a rigid one.
    // The ratio the other way grows without bound as the root softens (400 at
    // S L/EI = 0.01) and flattens the range that matters.
    const normalised cantilever_list[] = {
        {&beam_state::max_deflection, true, "rigid root / tip deflection", false, true},
        {&beam_state::rotation_end, true, "rigid root / tip rotation", true, true},
    };
    double y_top = 1.0;
    for (const auto& n : cantilever ? std::vector<normalised>(std::begin(cantilever_list), std::end(cantilever_list))
                                    : std::vector<normalised>(std::begin(list), std::end(list))) {
        const double ref = (n.by_fixed ? s.fixed : s.pinned).*(n.member);
        if (!(std::abs(ref) > 0)) continue;
        chart_series cs;
        cs.label = n.label;
        cs.dashed = n.dashed;
        for (const auto& r : s.rows) {
            const stiffness k = s.settings.path.moving == moving_end::end ? r.at.end : r.at.start;
            if (k.is_rigid() || k.is_pinned()) continue;  // not on a log axis
            const double v = r.state.*(n.member);
            if (n.inverse && !(std::abs(v) > 0)) continue;
            cs.points.emplace_back(k.ratio(s.EI, s.span), n.inverse ? ref / v : v / ref);
            y_top = std::max(y_top, cs.points.back().second);
        }
        ch.series.push_back(cs);
    }
    // Room above the curves that reach their reference value 1.
    ch.y.min = 0.0;
    ch.y.max = std::ceil(y_top * 1.08 * 10) / 10;
    const std::string en = chart_colour::en, aisc = chart_colour::aisc;
    ch.markers.push_back({en_pinned_limit, "EN pinned 0.5", en, true});
    ch.markers.push_back({en_rigid_limit(frame_bracing::braced), "EN rigid 8 (braced)", en, true});
    ch.markers.push_back({en_rigid_limit(frame_bracing::unbraced), "EN rigid 25 (unbraced)", en, true});
    ch.markers.push_back({aisc_simple_limit, "AISC simple 2", aisc, true});
    ch.markers.push_back({aisc_fully_restrained_limit, "AISC FR 20", aisc, true});
    for (const auto& t : s.thresholds)
        ch.markers.push_back({t.ratio, t.check + " " + format_number(t.ratio, 3), chart_colour::failure, false});
    const auto band = [&](const joint& j, const std::string& label, const std::string& colour) {
        const double lo = j.range.min.is_rigid() ? 1000.0 : std::max(0.01, j.range.min.ratio(s.EI, s.span));
        const double hi = j.range.max.is_rigid() ? 1000.0 : std::max(0.01, j.range.max.ratio(s.EI, s.span));
        ch.bands.push_back({lo, hi, label, colour, 0.15});
    };
    const bool same = b.start.range.min == b.end.range.min && b.start.range.max == b.end.range.max;
    if (b.layout != beam_layout::two_supports)
        band(b.start, cantilever ? "stiffness range, root" : "stiffness range, start joint", chart_colour::range_band);
    else if (same) band(b.start, "stiffness range (both joints)", chart_colour::range_band);
    else {
        band(b.start, "stiffness range, start joint", chart_colour::range_band);
        band(b.end, "stiffness range, end joint", chart_colour::other_band);
    }
    // Joints that follow a law: their curves, the beam lines and the working
    // points below the sweep chart, as in the report.
    std::vector<line_chart> charts{ch};
    for (beam_end e : {beam_end::start, beam_end::end})
        if (auto law = joint_law_beam_lines(p, b, e)) charts.push_back(std::move(law->chart));
    return charts.size() == 1 ? to_svg(ch) : to_svg(charts);
}

nlohmann::json thresholds_json(const std::vector<threshold>& ts, const std::string& path)
{
    nlohmann::json out = nlohmann::json::array();
    for (const auto& t : ts) {
        if (t.at.is_rigid() || !std::isfinite(t.ratio)) throw internal_error("a threshold is not a finite stiffness");
        out.push_back({{"check", t.check},
                       {"stiffness", t.at.value()},
                       {"ratio", t.ratio},
                       {"fixity_factor", t.fixity},
                       {"below", to_string(t.below)},
                       {"above", to_string(t.above)},
                       {"path", path}});
    }
    return out;
}

nlohmann::json probabilities_json(const std::vector<failure_probability>& fs)
{
    nlohmann::json out = nlohmann::json::array();
    for (const auto& f : fs) {
        if (!std::isfinite(f.p_fail) || !std::isfinite(f.error)) throw internal_error("a probability is not finite");
        out.push_back({{"check", f.check}, {"p_fail", f.p_fail}, {"error", f.error}, {"method", f.method}});
    }
    return out;
}

nlohmann::json sensitivity_json(const project& p, const beam& b, const stiffness_uncertainty& u)
{
    nlohmann::json out;
    // A beam with one joint moves its start alone (threshold.hpp).
    const bool one_joint = b.layout != beam_layout::two_supports;
    out["thresholds"] = thresholds_json(find_thresholds(p, b, {moving_end::both, stiffness::pinned()}),
                                        one_joint ? "start" : "both");
    out["probability"] = probabilities_json(failure_probabilities(p, b, u));
    out["stiffness_correlation"] = u.correlation;
    const auto d = [](const std::optional<stiffness_distribution>& x) {
        return x ? nlohmann::json(x->describe()) : nlohmann::json(nullptr);
    };
    out["distributions"] = {{"start", d(u.start)}, {"end", d(u.end)}};
    return out;
}

}  // namespace pinproof
