#include "pinproof/model/natural_frequency.hpp"

#include <Eigen/Dense>
#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <vector>

#include "pinproof/core/errors.hpp"

namespace pinproof {
namespace {

constexpr int minimum_elements = 48;
constexpr double pi = 3.14159265358979323846;

struct mass_model {
    std::vector<double> nodes;        // positions, m
    std::vector<double> line_mass;    // per element, kg/m
    std::vector<double> point_mass;   // per node, kg
};

// `span` is the meshed length; `support` an interior support (< 0: none), a node of its own.
mass_model masses_of(double span, const std::vector<load>& loads, double support = -1.0)
{
    std::vector<double> cuts{0.0, span};
    if (support > 0) cuts.push_back(support);
    for (const load& l : loads) {
        if (l.kind == load_kind::point || l.kind == load_kind::moment) {
            cuts.push_back(l.from);
        } else {
            cuts.push_back(l.from);
            cuts.push_back(l.to);
        }
    }
    std::sort(cuts.begin(), cuts.end());
    cuts.erase(std::unique(cuts.begin(), cuts.end(), [&](double a, double b) { return b - a <= 1e-9 * span; }),
               cuts.end());
    cuts.back() = span;
    // Subdivide each interval so that no element is longer than span / minimum_elements.
    mass_model m;
    const double longest = span / minimum_elements;
    for (std::size_t i = 0; i + 1 < cuts.size(); ++i) {
        const int parts = std::max(1, static_cast<int>(std::ceil((cuts[i + 1] - cuts[i]) / longest - 1e-9)));
        for (int p = 0; p < parts; ++p) m.nodes.push_back(cuts[i] + (cuts[i + 1] - cuts[i]) * p / parts);
    }
    m.nodes.push_back(span);
    m.line_mass.assign(m.nodes.size() - 1, 0.0);
    m.point_mass.assign(m.nodes.size(), 0.0);
    for (const load& l : loads) {
        if (l.kind == load_kind::moment) continue;
        if (l.kind == load_kind::point) {
            const auto it = std::min_element(m.nodes.begin(), m.nodes.end(), [&](double a, double b) {
                return std::abs(a - l.from) < std::abs(b - l.from);
            });
            m.point_mass[static_cast<std::size_t>(it - m.nodes.begin())] += l.value / standard_gravity;
            continue;
        }
        for (std::size_t e = 0; e + 1 < m.nodes.size(); ++e) {
            const double x0 = m.nodes[e], x1 = m.nodes[e + 1];
            // The element's mean intensity: exact for a uniform load, and for a
            // linear one the mean over the element.
            m.line_mass[e] += 0.5 * (intensity_at(l, x0 + 1e-12 * (x1 - x0)) + intensity_at(l, x1 - 1e-12 * (x1 - x0))) /
                              standard_gravity;
        }
    }
    for (double v : m.line_mass)
        if (v < 0) throw std::invalid_argument("a vibration combination must not load the beam upward (negative mass)");
    for (double v : m.point_mass)
        if (v < 0) throw std::invalid_argument("a vibration combination must not load the beam upward (negative mass)");
    return m;
}

// The lowest eigenvalue of K phi = mu M phi by inverse iteration with the
// Rayleigh quotient (Bathe, Finite Element Procedures, 1996, 11.2.1, from
// memory), started from the static deflection under the mass itself,
// x0 = K^-1 M u with u a unit deflection of every node: for a beam on two
// supports with non-negative end springs that deflection and the first mode
// both keep one sign along the span (the fundamental mode has no interior
// node), so x0 has a component along the first mode and the iteration
// converges to it, at the rate (mu_1/mu_2)^2 per step (about 1/50 or faster
// for a beam). It costs one factorisation instead of a full eigensolution,
// which matters where a sweep or a threshold search asks for thousands of
// frequencies. Returns 0 where it does not settle (the caller then solves
// the whole problem).
double lowest_by_inverse_iteration(const Eigen::MatrixXd& K, const Eigen::MatrixXd& M, const Eigen::VectorXd& u)
{
    // Kept per thread with the matrices below: a fresh allocation of this size
    // for every solve returns memory to the system and asks for it again.
    thread_local Eigen::LDLT<Eigen::MatrixXd> ldlt;
    ldlt.compute(K);
    if (ldlt.info() != Eigen::Success || !ldlt.isPositive()) return 0.0;
    Eigen::VectorXd x = ldlt.solve(M * u);
    double previous = 0.0;
    for (int step = 0; step < 200; ++step) {
        const Eigen::VectorXd Mx = M * x;
        const Eigen::VectorXd y = ldlt.solve(Mx);
        const double yMy = y.dot(M * y);
        if (!(std::isfinite(yMy) && yMy > 0)) return 0.0;
        const double mu = y.dot(Mx) / yMy;  // Rayleigh quotient y'Ky / y'My, with K y = M x
        x = y / std::sqrt(yMy);
        if (step > 0 && std::abs(mu - previous) <= 1e-14 * mu) return mu;
        previous = mu;
    }
    return 0.0;
}

// A symmetric band matrix of half-bandwidth `width`, held as its lower band:
// row i keeps A(i, i - width) ... A(i, i). The beam's element matrices couple
// a node's two degrees of freedom with the next node's only, so in any
// ordering that keeps the nodes in sequence the half-bandwidth is 3.
struct band_matrix {
    static constexpr int width = 3;
    Eigen::Index n = 0;
    std::vector<double> lower;  // n rows of width + 1; entry (i, j), j in [i - width, i], at i * (width + 1) + (j - i + width)
    void resize(Eigen::Index rows)
    {
        n = rows;
        lower.assign(static_cast<std::size_t>(n * (width + 1)), 0.0);
    }
    double& at(Eigen::Index i, Eigen::Index j) { return lower[static_cast<std::size_t>(i * (width + 1) + (j - i + width))]; }
    double at(Eigen::Index i, Eigen::Index j) const
    {
        return lower[static_cast<std::size_t>(i * (width + 1) + (j - i + width))];
    }
    // y = A x, from the lower band and its mirror.
    void multiply(const std::vector<double>& x, std::vector<double>& y) const
    {
        y.assign(x.size(), 0.0);
        for (Eigen::Index i = 0; i < n; ++i)
            for (Eigen::Index j = std::max<Eigen::Index>(0, i - width); j <= i; ++j) {
                const double a = at(i, j);
                y[static_cast<std::size_t>(i)] += a * x[static_cast<std::size_t>(j)];
                if (j != i) y[static_cast<std::size_t>(j)] += a * x[static_cast<std::size_t>(i)];
            }
    }
    // In place, A = L L^T (banded Cholesky; Golub and Van Loan, Matrix
    // Computations, 4th ed., 4.3.5). False where a pivot is not positive, that
    // is where A is not positive definite.
    bool factorise()
    {
        for (Eigen::Index j = 0; j < n; ++j) {
            const Eigen::Index first = std::max<Eigen::Index>(0, j - width);
            double d = at(j, j);
            for (Eigen::Index k = first; k < j; ++k) d -= at(j, k) * at(j, k);
            if (!(d > 0)) return false;
            const double root = std::sqrt(d);
            at(j, j) = root;
            for (Eigen::Index i = j + 1; i <= std::min(n - 1, j + width); ++i) {
                double v = at(i, j);
                for (Eigen::Index k = std::max<Eigen::Index>(0, i - width); k < j; ++k) v -= at(i, k) * at(j, k);
                at(i, j) = v / root;
            }
        }
        return true;
    }
    // x = A^-1 b with the factor from factorise().
    void solve(std::vector<double>& x) const
    {
        for (Eigen::Index i = 0; i < n; ++i) {
            double v = x[static_cast<std::size_t>(i)];
            for (Eigen::Index k = std::max<Eigen::Index>(0, i - width); k < i; ++k) v -= at(i, k) * x[static_cast<std::size_t>(k)];
            x[static_cast<std::size_t>(i)] = v / at(i, i);
        }
        for (Eigen::Index i = n - 1; i >= 0; --i) {
            double v = x[static_cast<std::size_t>(i)];
            for (Eigen::Index k = i + 1; k <= std::min(n - 1, i + width); ++k) v -= at(k, i) * x[static_cast<std::size_t>(k)];
            x[static_cast<std::size_t>(i)] = v / at(i, i);
        }
    }
};

double dot(const std::vector<double>& a, const std::vector<double>& b)
{
    double s = 0;
    for (std::size_t i = 0; i < a.size(); ++i) s += a[i] * b[i];
    return s;
}

// The same inverse iteration as lowest_by_inverse_iteration, on band
// matrices (k is factorised in place): the cost of a step is linear in the
// number of elements instead of quadratic, and the factorisation linear
// instead of cubic. Used where every degree of freedom carries mass, so that
// nothing is condensed and the matrices keep their band.
double lowest_by_band_inverse_iteration(band_matrix& k, const band_matrix& m, const std::vector<double>& u)
{
    thread_local std::vector<double> x, Mx, y, My;
    if (!k.factorise()) return 0.0;
    m.multiply(u, Mx);
    x = Mx;
    k.solve(x);
    double previous = 0.0;
    for (int step = 0; step < 200; ++step) {
        m.multiply(x, Mx);
        y = Mx;
        k.solve(y);
        m.multiply(y, My);
        const double yMy = dot(y, My);
        if (!(std::isfinite(yMy) && yMy > 0)) return 0.0;
        const double mu = dot(y, Mx) / yMy;  // Rayleigh quotient y'Ky / y'My, with K y = M x
        const double scale = 1.0 / std::sqrt(yMy);
        for (std::size_t i = 0; i < y.size(); ++i) x[i] = y[i] * scale;
        if (step > 0 && std::abs(mu - previous) <= 1e-14 * mu) return mu;
        previous = mu;
    }
    return 0.0;
}

}  // namespace

double first_natural_frequency(double back_span, double EI, const std::vector<load>& loads, stiffness start,
                               stiffness end, beam_layout layout, double overhang)
{
    const bool cantilever = layout == beam_layout::cantilever;
    const bool overhanging = layout == beam_layout::overhang;
    if (cantilever && (start.is_pinned() || !end.is_pinned()))
        throw std::invalid_argument("a cantilever needs a root with stiffness and a free tip");
    if (overhanging && (!(std::isfinite(overhang) && overhang > 0) || !end.is_pinned()))
        throw std::invalid_argument("an overhang needs a length above 0 and no end joint");
    if (!overhanging && overhang != 0.0) throw std::invalid_argument("only an overhang layout has an overhang length");
    if (!(std::isfinite(back_span) && back_span > 0) || !(std::isfinite(EI) && EI > 0))
        throw std::invalid_argument("span and EI must be finite and > 0");
    // The meshed length: the whole member (an overhang: to its tip). Every
    // length below is made dimensionless by it, and the springs' kappa with it.
    const double span = back_span + overhang;
    for (const load& l : loads)
        if (!(l.from >= 0 && l.from <= span) || (l.kind != load_kind::point && l.kind != load_kind::moment &&
                                                 !(l.to >= l.from && l.to <= span)))
            throw std::invalid_argument("a load lies outside the span");
    const mass_model mm = masses_of(span, loads, overhanging ? back_span : -1.0);
    // An overhang's end support: the node at x = back_span.
    std::size_t support_node = 0;
    if (overhanging)
        support_node = static_cast<std::size_t>(
            std::min_element(mm.nodes.begin(), mm.nodes.end(),
                             [&](double a, double b) { return std::abs(a - back_span) < std::abs(b - back_span); }) -
            mm.nodes.begin());
    double total = 0;
    for (std::size_t e = 0; e < mm.line_mass.size(); ++e) total += mm.line_mass[e] * (mm.nodes[e + 1] - mm.nodes[e]);
    for (double p : mm.point_mass) total += p;
    if (!(total > 0)) throw std::invalid_argument("the vibration combination carries no mass");

    // Nondimensional: lengths by L, stiffness by EI/L^3, mass by m_ref L with
    // m_ref the mean mass per length; eigenvalue mu = omega^2 m_ref L^4 / EI.
    const double m_ref = total / span;
    const std::size_t n_nodes = mm.nodes.size();
    // DOFs: node i -> w (2i), theta (2i + 1); the end deflections are held.
    const Eigen::Index full = static_cast<Eigen::Index>(2 * n_nodes);
    const Eigen::Index rot_start = 1, rot_end = full - 1;
    // The element matrices (Przemieniecki, Theory of Matrix Structural
    // Analysis, 1968, from memory: the cubic Hermite element's stiffness and
    // consistent mass), nondimensional.
    const auto element = [&](std::size_t e, Eigen::Matrix4d& k, Eigen::Matrix4d& m) {
        const double l = (mm.nodes[e + 1] - mm.nodes[e]) / span;
        const double mu = mm.line_mass[e] / m_ref;
        k << 12, 6 * l, -12, 6 * l, 6 * l, 4 * l * l, -6 * l, 2 * l * l, -12, -6 * l, 12, -6 * l, 6 * l, 2 * l * l,
            -6 * l, 4 * l * l;
        k /= l * l * l;
        m << 156, 22 * l, 54, -13 * l, 22 * l, 4 * l * l, 13 * l, -3 * l * l, 54, 13 * l, 156, -22 * l, -13 * l,
            -3 * l * l, -22 * l, 4 * l * l;
        m *= mu * l / 420;
    };
    // The degrees of freedom kept, in order, and each one's place among them (-1: held).
    std::vector<Eigen::Index> kept, place(static_cast<std::size_t>(full), -1);
    for (Eigen::Index d = 0; d < full; ++d) {
        if (d == 0) continue;                    // the start's deflection held by its support
        if (d == full - 2 && !cantilever && !overhanging) continue;  // the end's too, unless it is a free tip
        if (overhanging && d == static_cast<Eigen::Index>(2 * support_node)) continue;  // the end support's
        if (d == rot_start && start.is_rigid()) continue;
        if (d == rot_end && end.is_rigid()) continue;
        place[static_cast<std::size_t>(d)] = static_cast<Eigen::Index>(kept.size());
        kept.push_back(d);
    }
    const Eigen::Index n = static_cast<Eigen::Index>(kept.size());

    // Where every element carries mass, every degree of freedom does, nothing
    // is condensed, and the matrices are assembled straight into band form.
    const bool all_massive =
        std::all_of(mm.line_mass.begin(), mm.line_mass.end(), [](double v) { return v > 0; });
    double mu = 0.0;
    if (all_massive) {
        thread_local band_matrix kb, mb;
        kb.resize(n);
        mb.resize(n);
        for (std::size_t e = 0; e + 1 < n_nodes; ++e) {
            Eigen::Matrix4d k, m;
            element(e, k, m);
            for (int a = 0; a < 4; ++a)
                for (int b = 0; b <= a; ++b) {
                    const Eigen::Index i = place[2 * e + static_cast<std::size_t>(a)];
                    const Eigen::Index j = place[2 * e + static_cast<std::size_t>(b)];
                    if (i < 0 || j < 0) continue;
                    kb.at(i, j) += k(a, b);
                    mb.at(i, j) += m(a, b);
                }
        }
        for (std::size_t i = 0; i < n_nodes; ++i) {
            const Eigen::Index w = place[2 * i];
            if (w >= 0) mb.at(w, w) += mm.point_mass[i] / (m_ref * span);
        }
        // Springs: kappa = S L / EI on the end rotations.
        if (!start.is_rigid()) kb.at(place[1], place[1]) += start.ratio(EI, span);
        if (!end.is_rigid()) kb.at(place.back(), place.back()) += end.ratio(EI, span);
        std::vector<double> gravity(static_cast<std::size_t>(n), 0.0);
        for (Eigen::Index i = 0; i < n; ++i)
            if (kept[static_cast<std::size_t>(i)] % 2 == 0) gravity[static_cast<std::size_t>(i)] = 1.0;
        mu = lowest_by_band_inverse_iteration(kb, mb, gravity);
    }
    if (!(mu > 0)) {
        // Otherwise (or should the band iteration not settle) dense matrices,
        // with the degrees of freedom that carry no mass (all of them but the
        // point masses' deflections when the beam carries point loads only)
        // condensed out statically, which is exact for them:
        // K* = K_mm - K_mo K_oo^-1 K_om.
        thread_local Eigen::MatrixXd K, M;
        K.setZero(full, full);
        M.setZero(full, full);
        for (std::size_t e = 0; e + 1 < n_nodes; ++e) {
            Eigen::Matrix4d k, m;
            element(e, k, m);
            const Eigen::Index o = static_cast<Eigen::Index>(2 * e);
            K.block<4, 4>(o, o) += k;
            M.block<4, 4>(o, o) += m;
        }
        for (std::size_t i = 0; i < n_nodes; ++i)
            M(static_cast<Eigen::Index>(2 * i), static_cast<Eigen::Index>(2 * i)) += mm.point_mass[i] / (m_ref * span);
        if (!start.is_rigid()) K(rot_start, rot_start) += start.ratio(EI, span);
        if (!end.is_rigid()) K(rot_end, rot_end) += end.ratio(EI, span);
        thread_local Eigen::MatrixXd Kr, Mr;
        Kr.resize(n, n);
        Mr.resize(n, n);
        for (Eigen::Index i = 0; i < n; ++i)
            for (Eigen::Index j = 0; j < n; ++j) {
                Kr(i, j) = K(kept[static_cast<std::size_t>(i)], kept[static_cast<std::size_t>(j)]);
                Mr(i, j) = M(kept[static_cast<std::size_t>(i)], kept[static_cast<std::size_t>(j)]);
            }
        std::vector<Eigen::Index> massive, massless;
        for (Eigen::Index i = 0; i < n; ++i) (Mr.row(i).cwiseAbs().maxCoeff() > 0 ? massive : massless).push_back(i);
        if (massive.empty()) throw std::invalid_argument("the vibration combination carries no mass");
        auto pick = [](const Eigen::MatrixXd& A, const std::vector<Eigen::Index>& r, const std::vector<Eigen::Index>& c) {
            Eigen::MatrixXd B(static_cast<Eigen::Index>(r.size()), static_cast<Eigen::Index>(c.size()));
            for (std::size_t i = 0; i < r.size(); ++i)
                for (std::size_t j = 0; j < c.size(); ++j)
                    B(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j)) = A(r[i], c[j]);
            return B;
        };
        thread_local Eigen::MatrixXd Kc, Mc;
        if (massless.empty()) {
            Kc = Kr;
            Mc = Mr;
        } else {
            Kc = pick(Kr, massive, massive);
            Mc = pick(Mr, massive, massive);
            const Eigen::MatrixXd Kmo = pick(Kr, massive, massless);
            Kc -= Kmo * pick(Kr, massless, massless).ldlt().solve(Kmo.transpose());
        }
        // The deflection DOFs among those kept: the start vector of the inverse iteration.
        Eigen::VectorXd gravity = Eigen::VectorXd::Zero(static_cast<Eigen::Index>(massive.size()));
        for (std::size_t i = 0; i < massive.size(); ++i)
            if (kept[static_cast<std::size_t>(massive[i])] % 2 == 0) gravity(static_cast<Eigen::Index>(i)) = 1.0;
        mu = lowest_by_inverse_iteration(Kc, Mc, gravity);
        if (!(mu > 0)) {
            Eigen::GeneralizedSelfAdjointEigenSolver<Eigen::MatrixXd> solver(Kc, Mc, Eigen::EigenvaluesOnly);
            if (solver.info() != Eigen::Success) throw internal_error("the frequency eigenproblem did not converge");
            mu = solver.eigenvalues()(0);
        }
    }
    if (!(std::isfinite(mu) && mu > 0)) throw internal_error("the frequency eigenproblem gave no positive eigenvalue");
    const double omega = std::sqrt(mu * EI / (m_ref * std::pow(span, 4)));
    return omega / (2 * pi);
}

double frequency_from_deflection(double deflection)
{
    if (!(std::isfinite(deflection) && deflection > 0))
        throw std::invalid_argument("the deflection must be finite and > 0");
    return 18.0 / std::sqrt(deflection * 1e3);
}

}  // namespace pinproof
