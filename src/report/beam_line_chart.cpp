#include "pinproof/report/beam_line_chart.hpp"

#include <algorithm>
#include <cmath>
#include <vector>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/joints/nonlinear_analysis.hpp"
#include "pinproof/model/beam_model.hpp"

namespace pinproof {
namespace {

// One strength combination's beam line at a joint: M_F with the joint rigid,
// theta_s with it pinned, the far joint at its lower bound (reference pack §5).
struct combination_line {
    const combination* comb = nullptr;
    beam_model model;
    nonlinear_end far;
    double fixed_moment = 0, pinned_rotation = 0;
};

std::string in_units(double si, dimension d, unit_system u) { return format_quantity(si, d, u); }

double shown(double si, dimension d, unit_system u)
{
    const double v = si / display_unit_for(d, u).si_per_unit;
    return std::abs(v) < 1e-12 ? 0.0 : v;
}

std::string stiffness_text(stiffness s, unit_system u)
{
    return s.is_rigid() ? std::string("rigid") : in_units(s.value(), dims::rotational_stiffness, u);
}

}  // namespace

std::optional<law_beam_line_chart> joint_law_beam_lines(const project& p, const beam& b, beam_end e)
{
    const joint& here = b.at(e);
    if (!here.behaviour) return std::nullopt;
    const bool start = e == beam_end::start;
    const int j = start ? 0 : 1;
    const joint& far_joint = b.at(start ? beam_end::end : beam_end::start);
    const unit_system u = p.units;
    const dimension md = dims::moment;

    std::vector<combination_line> lines;
    for (const auto& c : b.combinations) {
        if (c.use != limit_state::strength) continue;
        combination_line l{&c, beam_model(b.span, b.EI(), factored_loads(b.loads, c)), end_for(far_joint, far_joint.range.min)};
        const nonlinear_solution rigid = start ? solve_nonlinear(l.model, nonlinear_end::rigid(), l.far)
                                               : solve_nonlinear(l.model, l.far, nonlinear_end::rigid());
        l.fixed_moment = start ? rigid.state.moment_start : rigid.state.moment_end;
        l.pinned_rotation = beam_line_rotation(l.model, j, 0.0, l.far);
        if (l.fixed_moment > 0 && l.pinned_rotation > 0) lines.push_back(std::move(l));
    }
    if (lines.empty()) return std::nullopt;

    double th_max = 0, m_max = 0;
    for (const auto& l : lines) {
        th_max = std::max(th_max, l.pinned_rotation);
        m_max = std::max(m_max, l.fixed_moment);
    }
    law_beam_line_chart out;
    line_chart& ch = out.chart;
    const std::string end = to_string(e);
    ch.title = "Beam " + b.id + ": beam lines at the " + end + " joint (" + to_string(here.behaviour->law) + " law)";
    ch.x.label = "end rotation (mrad)";
    ch.y.label = "end moment (" + display_unit_for(md, u).symbol + "), hogging +";
    ch.width = 760;
    ch.height = 420;
    // Solid for the first strength combination, dashed for the next: the
    // legend tells them apart by name.
    for (std::size_t i = 0; i < lines.size(); ++i) {
        const auto& l = lines[i];
        chart_series s{"beam line, " + l.comb->name + " (M_F " + in_units(l.fixed_moment, md, u) + ")", {},
                       chart_colour::beam_line, i % 2 == 1};
        for (int k = 0; k <= 60; ++k) {
            const double m = l.fixed_moment * k / 60.0;
            s.points.emplace_back(beam_line_rotation(l.model, j, m, l.far) * 1e3, shown(m, md, u));
        }
        std::sort(s.points.begin(), s.points.end());
        ch.series.push_back(std::move(s));
    }
    double m_top = 0;  // the largest moment of a curve or a working point
    const auto curve = [&](stiffness sj, const char* name, const char* colour) {
        const nonlinear_end n = end_for(here, sj);
        chart_series cs{std::string(name) + " (" + stiffness_text(sj, u) + ")", {}, colour, true};
        for (int k = 0; k <= 80; ++k) {
            const double th = th_max * k / 80.0;
            const double m = n.law ? n.law->moment(th) : 0.0;
            m_top = std::max(m_top, m);
            cs.points.emplace_back(th * 1e3, shown(m, md, u));
        }
        ch.series.push_back(cs);
        // The working point of each strength combination: the analysed state.
        for (const auto& l : lines) {
            const nonlinear_solution at = start ? solve_nonlinear(l.model, n, l.far) : solve_nonlinear(l.model, l.far, n);
            const double x = (start ? at.state.rotation_start : at.state.rotation_end) * 1e3;
            const double m = start ? at.state.moment_start : at.state.moment_end;
            m_top = std::max(m_top, std::abs(m));
            chart_series pt{std::string(name) + ", " + l.comb->name + ": " + format_number(x, 4) + " mrad, " +
                                in_units(m, md, u),
                            {{x, shown(m, md, u)}},
                            colour,
                            false};
            pt.marks_only = true;
            ch.series.push_back(std::move(pt));
        }
    };
    curve(here.range.min, "law at S min", chart_colour::range_lower);
    curve(here.range.max, "law at S max", chart_colour::range_upper);
    // The joint's curves and working points fill most of the height; a beam
    // line rising far above them (M_F of a stiff beam) leaves at the top, its
    // M_F given in the legend.
    ch.y.min = 0.0;
    const double top = std::min(m_max, 1.6 * m_top);
    const double v = shown(top, md, u);
    const auto ticks = nice_ticks(0.0, v, false);
    const double step = ticks.size() > 1 ? ticks[1] - ticks[0] : v;
    ch.y.max = v > 0 ? std::ceil(v / step - 1e-9) * step : 1.0;
    out.caption = "Beam lines at the " + end + " joint for every strength combination: the end moment against the "
                  "end rotation with the far joint at its lower bound " + stiffness_text(far_joint.range.min, u) +
                  (far_joint.behaviour ? " following its own law (so each line is curved)" : "") +
                  ", from M_F (this joint rigid) to theta_s (this joint pinned); the joint's " +
                  to_string(here.behaviour->law) + " law at the bounds of its stiffness range" +
                  (here.moment_resistance ? ", capped at its moment resistance " + in_units(*here.moment_resistance, md, u)
                                          : std::string()) +
                  "; the marked points are the working points, the states analysed for each combination.";
    return out;
}

}  // namespace pinproof
