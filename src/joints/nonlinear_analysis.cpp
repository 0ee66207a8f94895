#include "pinproof/joints/nonlinear_analysis.hpp"

#include <algorithm>
#include <array>
#include <cmath>

#include "pinproof/core/errors.hpp"

namespace pinproof {
namespace {

using moments = std::array<double, 2>;
constexpr double relative_tolerance = 1e-12;

// One end's equation, with the other end's moment held: the moment m_j that
// satisfies the end's condition when its rotation is
//   theta_j = c - F_jj m_j,   c = lambda theta_0,j - F_jk m_k.
struct end_equation {
    const nonlinear_end& end;
    double F_jj;

    // The exact solution of the one-end equation: a rigid end needs
    // theta_j = 0 (clipped at its cap); a law end m = M(c - F_jj m), whose
    // left side minus right side rises strictly with m, so bisection between
    // 0 and M(c) finds it.
    double solve(double c) const
    {
        if (!end.law) {
            double m = c / F_jj;
            if (end.rigid_cap) m = std::clamp(m, -*end.rigid_cap, *end.rigid_cap);
            return m;
        }
        const joint_law& law = *end.law;
        const double bound = law.moment(c);
        double lo = std::min(0.0, bound), hi = std::max(0.0, bound);
        // g(m) = m - M(c - F_jj m) rises strictly (g' = 1 + F_jj M' >= 1):
        // Newton steps, kept inside the bracket [lo, hi] and replaced by a
        // bisection wherever they would leave it (a safeguarded Newton
        // method, e.g. Press et al., Numerical Recipes, 9.4 "rtsafe").
        double m = 0.5 * (lo + hi);
        for (int i = 0; i < 200 && hi - lo > 1e-15 * std::max(std::abs(lo), std::abs(hi)); ++i) {
            const double theta = c - F_jj * m;
            const double g = m - law.moment(theta);
            if (g == 0) return m;
            (g < 0 ? lo : hi) = m;
            const double dg = 1.0 + F_jj * law.tangent(theta);
            const double next = m - g / dg;
            const bool inside = next > lo && next < hi;
            if (inside && std::abs(next - m) <= 1e-16 * std::abs(m)) return next;
            m = inside ? next : 0.5 * (lo + hi);
        }
        return m;
    }

    // Residual m_j - solve(c) written for Newton: the law's form
    // m_j - M(c - F_jj m_j) with its derivatives in m_j and in c.
    struct linearised {
        double residual, d_own, d_c;
    };
    linearised linearise(double m_j, double c) const
    {
        if (!end.law) {
            const double target = solve(c);
            const bool clipped = end.rigid_cap && std::abs(c / F_jj) > *end.rigid_cap;
            return {m_j - target, 1.0, clipped ? 0.0 : -1.0 / F_jj};
        }
        const double theta = c - F_jj * m_j;
        const double t = end.law->tangent(theta);
        return {m_j - end.law->moment(theta), 1.0 + t * F_jj, -t};
    }
};

struct system {
    const beam_model& model;
    end_equation ends[2];
    std::array<double, 2> rot0;
    std::array<std::array<double, 2>, 2> F;

    double c(int j, double lambda, const moments& m) const { return lambda * rot0[j] - F[j][1 - j] * m[1 - j]; }

    double residual(double lambda, const moments& m) const
    {
        double r = 0;
        for (int j = 0; j < 2; ++j) r = std::max(r, std::abs(m[j] - ends[j].solve(c(j, lambda, m))));
        return r;
    }

    // Newton on the two end moments; true when converged to tol.
    bool newton(double lambda, moments& m, double tol, int& iterations) const
    {
        for (int it = 0; it < 30; ++it) {
            ++iterations;
            end_equation::linearised r[2];
            for (int j = 0; j < 2; ++j) r[j] = ends[j].linearise(m[j], c(j, lambda, m));
            if (std::max(std::abs(r[0].residual), std::abs(r[1].residual)) <= tol) return true;
            // J = [[d_own0, d_c0 * (-F01)], [d_c1 * (-F10), d_own1]]
            const double a = r[0].d_own, b = -r[0].d_c * F[0][1];
            const double cc = -r[1].d_c * F[1][0], d = r[1].d_own;
            const double det = a * d - b * cc;
            if (!(std::abs(det) > 0) || !std::isfinite(det)) return false;
            const moments step{(r[0].residual * d - b * r[1].residual) / det,
                               (a * r[1].residual - cc * r[0].residual) / det};
            m[0] -= step[0];
            m[1] -= step[1];
            if (!std::isfinite(m[0]) || !std::isfinite(m[1])) return false;
        }
        return false;
    }

    // Block Gauss-Seidel with exact one-end solves: always converges for
    // |F_jk| < F_jj (see the header).
    bool gauss_seidel(double lambda, moments& m, double tol, int& iterations) const
    {
        for (int it = 0; it < 400; ++it) {
            ++iterations;
            double change = 0;
            for (int j = 0; j < 2; ++j) {
                const double next = ends[j].solve(c(j, lambda, m));
                change = std::max(change, std::abs(next - m[j]));
                m[j] = next;
            }
            if (change <= 0.25 * tol && residual(lambda, m) <= tol) return true;
        }
        return residual(lambda, m) <= tol;
    }
};

bool at_cap(const nonlinear_end& e, double m)
{
    const auto cap = e.cap();
    return cap && std::abs(m) >= *cap * (1 - 1e-9);
}

beam_state state_at(const beam_model& model, const nonlinear_end (&ends)[2], double lambda, const moments& m)
{
    if (lambda == 0) return beam_state{};
    beam_state s = model.state_for_end_moments(m[0] / lambda, m[1] / lambda);
    if (lambda != 1) {
        for (double* v : {&s.reaction_start, &s.reaction_end, &s.moment_start, &s.moment_end, &s.max_sagging_moment,
                          &s.max_hogging_moment,
                          &s.max_deflection, &s.rotation_start, &s.rotation_end})
            *v *= lambda;
    }
    const double rotation[2] = {s.rotation_start, s.rotation_end};
    stiffness* secant[2] = {&s.stiffness_start, &s.stiffness_end};
    for (int j = 0; j < 2; ++j) {
        const double sec = rotation[j] != 0 ? std::abs(m[j] / rotation[j]) : 0.0;
        if (ends[j].law)
            *secant[j] = stiffness::spring(rotation[j] != 0 ? sec : ends[j].law->secant(0));
        else
            *secant[j] = (at_cap(ends[j], m[j]) && rotation[j] != 0) ? stiffness::spring(sec) : stiffness::rigid();
    }
    return s;
}

}  // namespace

nonlinear_end nonlinear_end::capped_at(double cap) const
{
    nonlinear_end e = *this;
    if (e.law)
        e.law = e.law->capped_at(cap);
    else
        e.rigid_cap = e.rigid_cap ? std::min(*e.rigid_cap, cap) : cap;
    return e;
}

nonlinear_solution solve_nonlinear(const beam_model& model, const nonlinear_end& start, const nonlinear_end& end,
                                   double load_factor, bool find_yield)
{
    if (!std::isfinite(load_factor) || load_factor < 0)
        throw nonlinear_failure("the load factor must be finite and >= 0");
    const auto F = model.flexibility();
    const system sys{model, {{start, F[0][0]}, {end, F[1][1]}}, model.pinned_rotations(), F};
    const nonlinear_end ends[2] = {start, end};

    // The moment scale: what a rigid end would carry alone at the full load.
    const double scale = load_factor * std::max(std::abs(sys.rot0[0]) / F[0][0], std::abs(sys.rot0[1]) / F[1][1]);
    nonlinear_solution out;
    out.load_factor = load_factor;
    moments m{0, 0};
    if (!(scale > 0)) {
        out.state = state_at(model, ends, load_factor, m);
        return out;
    }
    const double tol = relative_tolerance * scale;

    // Steps of at most a quarter of the load, halved where a step fails.
    double lambda = 0, step = load_factor / 4;
    while (lambda < load_factor) {
        const double next = std::min(load_factor, lambda + step);
        moments trial = m;
        bool ok = sys.newton(next, trial, tol, out.iterations);
        if (!ok) {
            trial = m;
            ok = sys.gauss_seidel(next, trial, tol, out.iterations);
        }
        if (!ok) {
            step *= 0.5;
            if (step < load_factor * 1e-6 || out.steps > 4000)
                throw nonlinear_failure("the joints' moment-rotation laws give no converged state at load factor " +
                                        std::to_string(next));
            continue;
        }
        // The load factor at which an end first reaches its cap, by bisection
        // between the last two converged steps.
        for (int j = 0; j < 2 && find_yield; ++j) {
            std::optional<double>& yield = j == 0 ? out.start_yield_factor : out.end_yield_factor;
            if (yield || !at_cap(ends[j], trial[j])) continue;
            double lo = lambda, hi = next;
            moments mm = m;
            for (int i = 0; i < 40 && hi - lo > 1e-10 * hi; ++i) {
                const double mid = 0.5 * (lo + hi);
                moments probe = mm;
                int ignored = 0;
                if (!sys.newton(mid, probe, tol, ignored)) {
                    probe = mm;
                    if (!sys.gauss_seidel(mid, probe, tol, ignored)) break;
                }
                if (at_cap(ends[j], probe[j])) {
                    hi = mid;
                } else {
                    lo = mid;
                    mm = probe;
                }
            }
            yield = hi;
        }
        m = trial;
        lambda = next;
        ++out.steps;
    }
    out.residual = sys.residual(load_factor, m) / scale;
    if (!(out.residual <= 1e-9)) throw internal_error("nonlinear joint state: residual " + std::to_string(out.residual));
    out.start_at_cap = at_cap(start, m[0]);
    out.end_at_cap = at_cap(end, m[1]);
    out.state = state_at(model, ends, load_factor, m);
    return out;
}

double beam_line_rotation(const beam_model& model, int end, double m, const nonlinear_end& far, double load_factor)
{
    const auto F = model.flexibility();
    const auto rot0 = model.pinned_rotations();
    const int j = end == 0 ? 0 : 1, k = 1 - j;
    const end_equation far_end{far, F[k][k]};
    const double m_far = far_end.solve(load_factor * rot0[k] - F[k][j] * m);
    return load_factor * rot0[j] - F[j][j] * m - F[j][k] * m_far;
}

std::optional<collapse_point> beam_collapse(const beam_model& model, const nonlinear_end& start,
                                            const nonlinear_end& end, double plastic_moment)
{
    if (!(std::isfinite(plastic_moment) && plastic_moment > 0))
        throw std::invalid_argument("the plastic moment must be finite and > 0");
    const double pinned_sagging = model.state_for_end_moments(0, 0).max_sagging_moment;
    if (!(pinned_sagging > 0)) return std::nullopt;
    const nonlinear_end s = start.capped_at(plastic_moment), e = end.capped_at(plastic_moment);
    auto excess = [&](double lambda) {
        return solve_nonlinear(model, s, e, lambda, false).state.max_sagging_moment - plastic_moment;
    };
    // Bracket: at lambda = 2 M_pl / M_0 the sagging moment is at least
    // lambda M_0 - M_pl = M_pl whatever end moments (each at most M_pl) act.
    double lo = 0, hi = 2 * plastic_moment / pinned_sagging;
    double f_lo = -plastic_moment, f_hi = excess(hi);
    // Illinois regula falsi: superlinear, never leaves the bracket.
    int side = 0;
    for (int i = 0; i < 200 && hi - lo > 1e-12 * hi; ++i) {
        const double x = (lo * f_hi - hi * f_lo) / (f_hi - f_lo);
        const double f = excess(x);
        if (f == 0) {
            lo = hi = x;
            break;
        }
        if ((f < 0) == (f_lo < 0)) {
            lo = x;
            f_lo = f;
            if (side == -1) f_hi *= 0.5;
            side = -1;
        } else {
            hi = x;
            f_hi = f;
            if (side == 1) f_lo *= 0.5;
            side = 1;
        }
    }
    const nonlinear_solution at = solve_nonlinear(model, s, e, hi, false);
    collapse_point c;
    c.load_factor = hi;
    c.rotation_start = at.state.rotation_start;
    c.rotation_end = at.state.rotation_end;
    c.moment_start = at.state.moment_start;
    c.moment_end = at.state.moment_end;
    return c;
}

}  // namespace pinproof
