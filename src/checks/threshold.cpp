#include "pinproof/checks/threshold.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>

#include "pinproof/core/errors.hpp"

namespace pinproof {

std::string to_string(moving_end m)
{
    switch (m) {
    case moving_end::both: return "both";
    case moving_end::start: return "start";
    case moving_end::end: return "end";
    }
    return "unknown";
}

double fixity_factor(stiffness s, double EI, double span)
{
    if (s.is_rigid()) return 1.0;
    const double k = s.ratio(EI, span);
    return k / (k + 3.0);
}

stiffness stiffness_of_fixity(double r, double EI, double span)
{
    if (!(r >= 0.0 && r <= 1.0)) throw internal_error("a fixity factor outside [0, 1] was asked for");
    if (r == 1.0) return stiffness::rigid();
    return stiffness::spring(3.0 * r * EI / (span * (1.0 - r)));
}

stiffness_path single_joint_path() { return {moving_end::start, stiffness::pinned()}; }

stiffness_pair point_on_path(const stiffness_path& path, stiffness s)
{
    switch (path.moving) {
    case moving_end::both: return {s, s};
    case moving_end::start: return {s, path.held};
    case moving_end::end: return {path.held, s};
    }
    return {s, s};
}

point_evaluation evaluate_at(const project& p, const beam& b, stiffness_pair at)
{
    beam copy = b;
    copy.start.range = {at.start, at.start};
    copy.end.range = {at.end, at.end};
    assessment_options options;
    options.search_interior = false;
    options.find_min_gap = false;
    options.find_yield_factor = false;
    beam_assessment a = assess_beam(p, copy, options);
    point_evaluation out;
    out.at = at;
    out.checks = std::move(a.checks);
    for (const auto& c : a.combinations) {
        if (c.corners.empty()) throw internal_error("an assessment at one stiffness pair has no state");
        out.states.push_back(c.corners.front());
    }
    return out;
}

bool is_adverse(check_status s) { return s == check_status::fail || s == check_status::warn; }

std::optional<double> check_margin(const check& c)
{
    if (c.status == check_status::not_applicable || c.informative || !c.varies_with_stiffness) return std::nullopt;
    if (c.value && c.limit) return c.limit_is_minimum ? *c.limit - *c.value : *c.value - *c.limit;
    return is_adverse(c.status) ? 1.0 : -1.0;
}

std::vector<double> ratio_scan(int points)
{
    if (points < 2) throw internal_error("a stiffness scan needs at least two points");
    std::vector<double> out;
    for (int i = 0; i < points; ++i) out.push_back(std::pow(10.0, -2.0 + 5.0 * i / (points - 1.0)));
    return out;
}

namespace {

root_bracket refine(const std::function<double(double)>& f, double a, double b, double fa, double fb,
                    const std::function<bool(double, double)>& tolerance)
{
    if (fa == 0.0) return {a, a};
    if (fb == 0.0) return {b, b};
    std::uintmax_t iterations = 200;
    const auto r = boost::math::tools::toms748_solve(f, a, b, fa, fb, tolerance, iterations);
    return {r.first, r.second};
}

// Bracket ends are r in [0, 1]; S = 3 r EI / ((1 - r) L), so dS/S = dr / (r (1 - r)).
// Stopping when |dr| <= 1e-11 r (1 - r) keeps S within 1e-10 relative.
bool fixity_tolerance(double a, double b)
{
    const double m = 0.5 * (a + b);
    return std::abs(b - a) <= 1e-11 * m * (1.0 - m);
}

// The largest fixity factor below rigid used inside a root search: kappa = 3e12.
constexpr double almost_rigid = 1.0 - 1e-12;

std::vector<double> fixity_scan(int points, double EI, double span)
{
    std::vector<double> r{0.0};
    for (double k : ratio_scan(points)) r.push_back(fixity_factor(stiffness::spring(k * EI / span), EI, span));
    r.push_back(1.0);
    return r;
}

std::vector<threshold> thresholds_on_scan(const project& p, const beam& b, const stiffness_path& path,
                                          const std::vector<double>& r_grid, const std::string* only)
{
    const double EI = b.EI(), L = b.span;
    std::vector<point_evaluation> scan;
    for (double r : r_grid) scan.push_back(evaluate_at(p, b, point_on_path(path, stiffness_of_fixity(r, EI, L))));
    std::vector<threshold> out;
    const std::size_t n_checks = scan.front().checks.size();
    for (std::size_t k = 0; k < n_checks; ++k) {
        const std::string& id = scan.front().checks[k].id;
        if (only && id != *only) continue;
        const auto margin = [&](double r) {
            const auto e = evaluate_at(p, b, point_on_path(path, stiffness_of_fixity(r, EI, L)));
            const auto m = check_margin(e.checks.at(k));
            return m ? *m : -1.0;
        };
        for (std::size_t i = 0; i + 1 < scan.size(); ++i) {
            const check& c0 = scan[i].checks.at(k);
            const check& c1 = scan[i + 1].checks.at(k);
            if (c0.id != id || c1.id != id) throw internal_error("the checks of one beam changed order");
            const auto m0 = check_margin(c0), m1 = check_margin(c1);
            if (!m0 || !m1 || (*m0 > 0) == (*m1 > 0)) continue;
            double lo = r_grid[i], hi = r_grid[i + 1];
            double f_lo = *m0, f_hi = *m1;
            if (hi == 1.0) {
                // The rigid state has no finite kappa: search below it, and
                // report no threshold if the change happens only at exact rigidity.
                hi = almost_rigid;
                f_hi = margin(hi);
                if ((f_hi > 0) == (f_lo > 0)) continue;
            }
            const root_bracket rb = refine(margin, lo, hi, f_lo, f_hi, fixity_tolerance);
            threshold t;
            t.check = id;
            t.below = c0.status;
            t.above = c1.status;
            t.fixity = rb.root();
            t.at = stiffness_of_fixity(t.fixity, EI, L);
            t.ratio = t.at.ratio(EI, L);
            out.push_back(t);
        }
    }
    return out;
}

}  // namespace

std::vector<root_bracket> sign_changes(const std::function<double(double)>& f, const std::vector<double>& grid,
                                       const std::function<bool(double, double)>& tolerance)
{
    std::vector<root_bracket> out;
    if (grid.size() < 2) return out;
    std::vector<double> v;
    for (double x : grid) v.push_back(f(x));
    for (std::size_t i = 0; i + 1 < grid.size(); ++i)
        if ((v[i] > 0) != (v[i + 1] > 0)) out.push_back(refine(f, grid[i], grid[i + 1], v[i], v[i + 1], tolerance));
    return out;
}

std::vector<threshold> find_thresholds(const project& p, const beam& b, const stiffness_path& path, int scan_points)
{
    if (b.layout != beam_layout::two_supports) {
        // One joint (a cantilever's root, an overhang's start): only it moves.
        // A cantilever's root never reaches the pin (a mechanism): its scan
        // starts at the least kappa of the scan, 0.01.
        std::vector<double> grid = fixity_scan(scan_points, b.EI(), b.span);
        if (b.layout == beam_layout::cantilever) grid.erase(grid.begin());
        return thresholds_on_scan(p, b, single_joint_path(), grid, nullptr);
    }
    return thresholds_on_scan(p, b, path, fixity_scan(scan_points, b.EI(), b.span), nullptr);
}

std::vector<boundary_point> boundary_curve(const project& p, const beam& b, const std::string& check_id, int points)
{
    if (points < 2) throw internal_error("a boundary curve needs at least two points");
    if (b.layout != beam_layout::two_supports) throw internal_error("a boundary curve needs two joints");
    const double EI = b.EI(), L = b.span;
    const std::vector<double> r_grid = fixity_scan(25, EI, L);
    std::vector<boundary_point> out;
    // Lines of constant start fixity and of constant end fixity, so that the
    // curve is traced whichever way it runs.
    for (int i = 0; i < points; ++i) {
        const double r = static_cast<double>(i) / (points - 1);
        const stiffness s = stiffness_of_fixity(r, EI, L);
        for (const auto& t : thresholds_on_scan(p, b, {moving_end::end, s}, r_grid, &check_id))
            out.push_back({s, t.at, r, t.fixity});
        for (const auto& t : thresholds_on_scan(p, b, {moving_end::start, s}, r_grid, &check_id))
            out.push_back({t.at, s, t.fixity, r});
    }
    std::sort(out.begin(), out.end(), [](const boundary_point& a, const boundary_point& b) {
        return a.fixity_start != b.fixity_start ? a.fixity_start < b.fixity_start : a.fixity_end > b.fixity_end;
    });
    return out;
}

std::vector<std::string> threshold_report_lines(const project& p, const beam& b)
{
    std::vector<std::string> out;
    const auto S = [&](const threshold& t) {
        return "S = " + format_quantity(t.at.value(), dims::rotational_stiffness, p.units) +
               " (S*L/EI = " + format_number(t.ratio, 3) + ")";
    };
    const auto gives = [](check_status s) -> std::string {
        switch (s) {
        case check_status::pass: return "passes";
        case check_status::fail: return "fails";
        case check_status::warn: return "warns";
        case check_status::not_applicable: return "does not apply";
        }
        return "unknown";
    };
    const bool one_joint = b.layout != beam_layout::two_supports;
    const std::string joint_word = b.layout == beam_layout::cantilever ? "the root" : "the start joint";
    for (const auto& t : find_thresholds(p, b, {moving_end::both, stiffness::pinned()})) {
        const bool class_check = t.check.rfind("stiffness-class-", 0) == 0;
        if (class_check && t.below == check_status::pass && is_adverse(t.above))
            out.push_back(t.check + ": the pinned assumption stops holding above " + S(t) + ".");
        else if (t.below == check_status::pass)
            out.push_back(t.check + ": passes up to " + S(t) + ", " + gives(t.above) + " above.");
        else
            out.push_back(t.check + ": " + gives(t.below) + " below " + S(t) + ", " + gives(t.above) + " above.");
    }
    const std::string from = b.layout == beam_layout::cantilever ? "S*L/EI = 0.01 (a pinned root is a mechanism)"
                                                                 : "a true pin";
    if (out.empty())
        out.push_back("No check changes its answer between " + from + " and a rigid joint (" +
                      (one_joint ? joint_word + " moving" : std::string("both ends equal")) + ").");
    else
        out.insert(out.begin(), "Stiffness thresholds, " + (one_joint ? joint_word + " moving" : std::string("both ends equal")) +
                                    " (each check's state change between " + from + " and a rigid joint):");
    return out;
}

}  // namespace pinproof
