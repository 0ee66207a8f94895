#include "pinproof/checks/failure_probability.hpp"

#include <boost/math/distributions/normal.hpp>
#include <boost/math/quadrature/gauss_kronrod.hpp>

#include <algorithm>
#include <cmath>
#include <functional>
#include <map>
#include <random>

#include "pinproof/core/errors.hpp"
#include "pinproof/checks/threshold.hpp"

namespace pinproof {

namespace {

// Probability space is cut at eps from each end; see the header.
constexpr double eps = 1e-12;
constexpr double u_tolerance = 1e-13;  // absolute, in u

// The scan in u: eps, Phi(z) for z evenly spaced in [-7, 7] (dense in both
// tails), 1 - eps.
const std::vector<double>& u_grid()
{
    static const std::vector<double> grid = [] {
        const boost::math::normal n(0.0, 1.0);
        std::vector<double> g{eps};
        const int m = 29;
        for (int i = 0; i < m; ++i) {
            const double z = -7.0 + 14.0 * i / (m - 1.0);
            g.push_back(z <= 0 ? boost::math::cdf(n, z) : 1.0 - boost::math::cdf(boost::math::complement(n, z)));
        }
        g.push_back(1.0 - eps);
        return g;
    }();
    return grid;
}

bool u_close(double a, double b) { return std::abs(b - a) <= u_tolerance; }

struct line_result {
    double measure = 0;  // adverse length in u
    double error = 0;
    std::vector<double> roots;
};

using pair_of_u = std::function<stiffness_pair(double)>;

std::vector<std::optional<double>> margins(const point_evaluation& e)
{
    std::vector<std::optional<double>> m;
    for (const auto& c : e.checks) m.push_back(check_margin(c));
    return m;
}

// Adverse measure of check k along a line in u, from a scan of margins.
line_result along_line(const project& p, const beam& b, const pair_of_u& pair,
                       const std::vector<std::vector<std::optional<double>>>& scan, std::size_t k)
{
    const auto& g = u_grid();
    line_result out;
    const auto f = [&](double u) {
        const auto m = check_margin(evaluate_at(p, b, pair(u)).checks.at(k));
        return m ? *m : -1.0;
    };
    for (std::size_t i = 0; i + 1 < g.size(); ++i) {
        const auto& m0 = scan[i][k];
        const auto& m1 = scan[i + 1][k];
        if (!m0 || !m1) continue;
        const bool a0 = *m0 > 0, a1 = *m1 > 0;
        if (a0 && a1) out.measure += g[i + 1] - g[i];
        if (a0 == a1) continue;
        const auto rb = sign_changes(f, {g[i], g[i + 1]}, u_close);
        for (const auto& r : rb) {
            out.roots.push_back(r.root());
            out.measure += a0 ? r.root() - g[i] : g[i + 1] - r.root();
            out.error += r.upper - r.lower;
        }
    }
    // The tails keep the state at the edges of the scan.
    if (scan.front()[k] && *scan.front()[k] > 0) out.measure += eps;
    if (scan.back()[k] && *scan.back()[k] > 0) out.measure += eps;
    out.error += 2 * eps;
    return out;
}

std::vector<std::vector<std::optional<double>>> scan_line(const project& p, const beam& b, const pair_of_u& pair)
{
    std::vector<std::vector<std::optional<double>>> scan;
    for (double u : u_grid()) scan.push_back(margins(evaluate_at(p, b, pair(u))));
    return scan;
}

// One way of holding the ends without a distribution.
struct scenario {
    std::optional<stiffness> held_start, held_end;
    std::string text;
};

std::vector<scenario> scenarios(const project& p, const beam& b, const stiffness_uncertainty& u)
{
    const auto options = [](const joint& j) {
        std::vector<stiffness> s{j.range.min};
        if (!(j.range.max == j.range.min)) s.push_back(j.range.max);
        return s;
    };
    const auto text = [&p](stiffness s) {
        return s.is_rigid() ? std::string("rigid") : format_quantity(s.value(), dims::rotational_stiffness, p.units);
    };
    std::vector<scenario> out;
    // One joint (a cantilever's root, an overhang's start): the end is a pin by construction.
    if (b.layout != beam_layout::two_supports && u.start)
        out.push_back({std::nullopt, stiffness::pinned(),
                       b.layout == beam_layout::cantilever ? "; the root's only, the tip free"
                                                           : "; the start joint's only, no end joint"});
    else if (u.start && u.end) out.push_back({});
    else if (u.start)
        for (stiffness s : options(b.end)) out.push_back({std::nullopt, s, "; the end joint held at " + text(s)});
    else if (u.end)
        for (stiffness s : options(b.start)) out.push_back({s, std::nullopt, "; the start joint held at " + text(s)});
    return out;
}

// Where the checks that apply are listed: the pinned beam, or a cantilever's
// rigid root (its pinned root is a mechanism). Its end is a pin in both.
stiffness_pair probe_pair(const beam& b)
{
    if (b.layout == beam_layout::cantilever) return {stiffness::rigid(), stiffness::pinned()};
    return {stiffness::pinned(), stiffness::pinned()};
}

stiffness draw(const std::optional<stiffness_distribution>& d, const std::optional<stiffness>& held, double u)
{
    if (held) return *held;
    return stiffness::spring(d->quantile(u));
}

std::vector<failure_probability> one_scenario(const project& p, const beam& b, const stiffness_uncertainty& u,
                                              const scenario& sc)
{
    std::vector<failure_probability> out;
    const bool two_d = u.start && u.end && u.correlation == 0;
    const point_evaluation probe = evaluate_at(p, b, probe_pair(b));
    if (!two_d) {
        const pair_of_u pair = [&](double x) {
            return stiffness_pair{draw(u.start, sc.held_start, x), draw(u.end, sc.held_end, x)};
        };
        const auto scan = scan_line(p, b, pair);
        for (std::size_t k = 0; k < probe.checks.size(); ++k) {
            if (!check_margin(probe.checks[k])) continue;
            const line_result r = along_line(p, b, pair, scan, k);
            const std::string how = u.start && u.end ? "fully correlated ends, one draw"
                                                     : "one end uncertain";
            out.push_back({probe.checks[k].id, r.measure, r.error,
                           "1-D: probability masses between the thresholds in u = F(S) (" + how + sc.text + ")"});
        }
        return out;
    }
    // Independent ends: outer integral over u_start of the adverse measure over u_end.
    std::map<double, std::vector<std::vector<std::optional<double>>>> cache;
    const auto inner = [&](double us, std::size_t k) {
        const stiffness s_start = stiffness::spring(u.start->quantile(us));
        const pair_of_u pair = [&](double ue) { return stiffness_pair{s_start, stiffness::spring(u.end->quantile(ue))}; };
        auto it = cache.find(us);
        if (it == cache.end()) it = cache.emplace(us, scan_line(p, b, pair)).first;
        return along_line(p, b, pair, it->second, k);
    };
    for (std::size_t k = 0; k < probe.checks.size(); ++k) {
        if (!check_margin(probe.checks[k])) continue;
        // Where the boundary meets the edges u_end = eps and 1 - eps, the
        // conditional result may jump or kink: split the outer integral there.
        std::vector<double> cuts{eps, 1.0 - eps};
        for (double ue : {eps, 1.0 - eps}) {
            const stiffness s_end = stiffness::spring(u.end->quantile(ue));
            const pair_of_u edge = [&](double us) { return stiffness_pair{stiffness::spring(u.start->quantile(us)), s_end}; };
            const auto r = along_line(p, b, edge, scan_line(p, b, edge), k);
            cuts.insert(cuts.end(), r.roots.begin(), r.roots.end());
        }
        std::sort(cuts.begin(), cuts.end());
        double total = 0, error = 0, inner_error = 0;
        for (std::size_t i = 0; i + 1 < cuts.size(); ++i) {
            if (cuts[i + 1] - cuts[i] <= 0) continue;
            double seg_error = 0;
            const auto g = [&](double us) {
                const line_result r = inner(us, k);
                inner_error = std::max(inner_error, r.error);
                return r.measure;
            };
            total += boost::math::quadrature::gauss_kronrod<double, 15>::integrate(g, cuts[i], cuts[i + 1], 12, 1e-9,
                                                                                    &seg_error);
            error += seg_error;
        }
        // Outer tails (mass 2 eps) and the inner error, which bounds the
        // integrand's error everywhere on a unit interval.
        error += inner_error + 2 * eps;
        total = std::clamp(total, 0.0, 1.0);
        out.push_back({probe.checks[k].id, total, error,
                       "2-D: adaptive 15-point Gauss-Kronrod over u_start = F_start(S) of the 1-D probability masses "
                       "over u_end (independent ends)"});
    }
    return out;
}

}  // namespace

std::vector<failure_probability> failure_probabilities(const project& p, const beam& b, const stiffness_uncertainty& u)
{
    std::vector<failure_probability> best;
    for (const auto& sc : scenarios(p, b, u)) {
        auto r = one_scenario(p, b, u, sc);
        if (best.empty()) {
            best = std::move(r);
            continue;
        }
        for (std::size_t i = 0; i < r.size() && i < best.size(); ++i)
            if (r[i].p_fail > best[i].p_fail) best[i] = r[i];
    }
    for (auto& f : best) {
        if (!std::isfinite(f.p_fail) || !std::isfinite(f.error)) throw internal_error("a failure probability is not finite");
        f.p_fail = std::clamp(f.p_fail, 0.0, 1.0);
    }
    return best;
}

std::vector<monte_carlo_estimate> monte_carlo_probabilities(const project& p, const beam& b,
                                                            const stiffness_uncertainty& u, std::size_t samples,
                                                            std::uint64_t seed)
{
    std::vector<monte_carlo_estimate> best;
    if (samples == 0) return best;
    const bool two_d = u.start && u.end && u.correlation == 0;
    const point_evaluation probe = evaluate_at(p, b, probe_pair(b));
    for (const auto& sc : scenarios(p, b, u)) {
        std::mt19937_64 gen(seed);
        const auto uniform = [&gen] { return (static_cast<double>(gen() >> 11) + 0.5) * 0x1.0p-53; };
        std::vector<std::size_t> adverse(probe.checks.size(), 0);
        for (std::size_t n = 0; n < samples; ++n) {
            const double us = uniform();
            const double ue = two_d ? uniform() : us;
            const auto e = evaluate_at(p, b, {draw(u.start, sc.held_start, us), draw(u.end, sc.held_end, ue)});
            for (std::size_t k = 0; k < e.checks.size(); ++k) {
                const auto m = check_margin(e.checks[k]);
                if (m && *m > 0) ++adverse[k];
            }
        }
        std::vector<monte_carlo_estimate> r;
        for (std::size_t k = 0; k < probe.checks.size(); ++k) {
            if (!check_margin(probe.checks[k])) continue;
            const double ph = static_cast<double>(adverse[k]) / samples;
            r.push_back({probe.checks[k].id, ph, std::sqrt(ph * (1 - ph) / samples), samples, seed});
        }
        if (best.empty()) best = std::move(r);
        else
            for (std::size_t i = 0; i < r.size() && i < best.size(); ++i)
                if (r[i].p_fail > best[i].p_fail) best[i] = r[i];
    }
    return best;
}

}  // namespace pinproof
