#include "pinproof/beam_model.hpp"

#include <Eigen/Dense>

#include <algorithm>
#include <cmath>
#include <sstream>
#include <stdexcept>

#include "pinproof/errors.hpp"
#include "polynomial.hpp"

namespace pinproof {
namespace {

using element_vector = std::array<double, 4>;  // (w1, theta1, w2, theta2)

// Hermite cubic shape functions of an element of length l in power form,
// N[k][i] = coefficient of s^i (standard Euler-Bernoulli beam element,
// e.g. Przemieniecki, Theory of Matrix Structural Analysis, 1968, ch. 5).
std::array<std::array<double, 4>, 4> hermite(double l)
{
    const double l2 = l * l, l3 = l2 * l;
    return {{{1.0, 0.0, -3.0 / l2, 2.0 / l3},
             {0.0, 1.0, -2.0 / l, 1.0 / l2},
             {0.0, 0.0, 3.0 / l2, -2.0 / l3},
             {0.0, 0.0, -1.0 / l, 1.0 / l2}}};
}

// Element stiffness for dofs (w1, theta1, w2, theta2), theta = dw/dx.
Eigen::Matrix4d element_stiffness(double EI, double l)
{
    const double k = EI / (l * l * l);
    Eigen::Matrix4d m;
    m << 12, 6 * l, -12, 6 * l,
         6 * l, 4 * l * l, -6 * l, 2 * l * l,
         -12, -6 * l, 12, -6 * l,
         6 * l, 2 * l * l, -6 * l, 4 * l * l;
    return k * m;
}

// Consistent nodal loads of a line load varying linearly from qa to qb over
// the element: integral of q(s) N_k(s) ds, in closed form.
element_vector consistent_loads(double qa, double qb, double l)
{
    const double t = qb - qa;  // triangular part, zero at s = 0
    return {qa * l / 2 + 3 * t * l / 20, qa * l * l / 12 + t * l * l / 30,
            qa * l / 2 + 7 * t * l / 20, -qa * l * l / 12 - t * l * l / 20};
}

// Deflection of the element, both ends clamped, under the same line load:
// EI w'''' = q(s) with w = w' = 0 at s = 0 and s = l. Added to the Hermite
// interpolation of the nodal values it gives the exact deflected shape.
polynomial::coefficients clamped_particular(double qa, double qb, double l, double EI)
{
    const double t = qb - qa;
    const double A = (qa * std::pow(l, 4) / 24 + t * std::pow(l, 4) / 120) / EI;  // w_q(l)
    const double B = (qa * std::pow(l, 3) / 6 + t * std::pow(l, 3) / 24) / EI;    // w_q'(l)
    polynomial::coefficients c{};
    c[2] = (-3 * A + B * l) / (l * l);
    c[3] = (2 * A / l - B) / (l * l);
    c[4] = qa / (24 * EI);
    c[5] = t / (120 * l * EI);
    return c;
}

element_polynomial interpolate(const element_vector& u, double l)
{
    const auto N = hermite(l);
    element_polynomial c{};
    for (int k = 0; k < 4; ++k)
        for (int i = 0; i < 4; ++i) c[i] += u[k] * N[k][i];
    return c;
}

bool finite(double v) { return std::isfinite(v); }

}  // namespace

beam_model::beam_model(double span, double EI, std::vector<load> loads)
    : span_(span), EI_(EI), loads_(std::move(loads))
{
    if (!finite(span) || span <= 0) throw std::invalid_argument("span must be positive and finite");
    if (!finite(EI) || EI <= 0) throw std::invalid_argument("EI must be positive and finite");
    for (const auto& l : loads_) {
        const bool distributed = l.kind == load_kind::udl || l.kind == load_kind::linear;
        if (!finite(l.value) || !finite(l.value_end) || !finite(l.from) || !finite(l.to))
            throw std::invalid_argument("load values must be finite");
        if (l.from < 0 || l.from > span) throw std::invalid_argument("load position outside the span");
        if (distributed && (l.to > span || !(l.to - l.from > 1e-9 * span)))
            throw std::invalid_argument("distributed load extent must lie within the span and have length");
    }

    // Nodes: ends, load positions and load boundaries. Positions closer than
    // 1e-12 L are merged; the shift is far below the equilibrium tolerance.
    std::vector<double> x{0.0, span};
    for (const auto& l : loads_) {
        x.push_back(l.from);
        if (l.kind == load_kind::udl || l.kind == load_kind::linear) x.push_back(l.to);
    }
    std::sort(x.begin(), x.end());
    const double merge = 1e-12 * span;
    for (double v : x)
        if (nodes_.empty() || v - nodes_.back() > merge) nodes_.push_back(v);
    nodes_.back() = span;
    nodes_.front() = 0.0;
    const auto nearest_node = [&](double v) {
        auto it = std::lower_bound(nodes_.begin(), nodes_.end(), v - merge);
        return static_cast<std::size_t>(std::min<std::ptrdiff_t>(it - nodes_.begin(), nodes_.size() - 1));
    };

    const std::size_t n_nodes = nodes_.size();
    const std::size_t n_dof = 2 * n_nodes;
    Eigen::MatrixXd K = Eigen::MatrixXd::Zero(n_dof, n_dof);
    Eigen::VectorXd f = Eigen::VectorXd::Zero(n_dof);

    elements_.resize(n_nodes - 1);
    std::vector<std::array<double, 2>> element_q(n_nodes - 1);
    for (std::size_t e = 0; e + 1 < n_nodes; ++e) {
        const double xa = nodes_[e], xb = nodes_[e + 1];
        elements_[e].x0 = xa;
        elements_[e].length = xb - xa;
        double qa = 0, qb = 0;
        for (const auto& l : loads_) {
            if (l.kind != load_kind::udl && l.kind != load_kind::linear) continue;
            const double mid = 0.5 * (xa + xb);
            if (mid <= l.from || mid >= l.to) continue;
            qa += intensity_at(l, std::clamp(xa, l.from, l.to));
            qb += intensity_at(l, std::clamp(xb, l.from, l.to));
        }
        element_q[e] = {qa, qb};
        const Eigen::Matrix4d ke = element_stiffness(EI_, xb - xa);
        const element_vector fe = consistent_loads(qa, qb, xb - xa);
        for (int i = 0; i < 4; ++i) {
            f(2 * e + i) += fe[i];
            for (int j = 0; j < 4; ++j) K(2 * e + i, 2 * e + j) += ke(i, j);
        }
    }
    for (const auto& l : loads_) {
        if (l.kind == load_kind::point) f(2 * nearest_node(l.from)) += l.value;
        if (l.kind == load_kind::moment) f(2 * nearest_node(l.from) + 1) += l.value;
    }

    // Free dofs: everything except the deflection at the two supports.
    std::vector<Eigen::Index> free;
    for (std::size_t d = 0; d < n_dof; ++d)
        if (d != 0 && d != n_dof - 2) free.push_back(static_cast<Eigen::Index>(d));
    const Eigen::Index nf = static_cast<Eigen::Index>(free.size());
    Eigen::MatrixXd Kff(nf, nf);
    Eigen::MatrixXd rhs = Eigen::MatrixXd::Zero(nf, 3);
    for (Eigen::Index i = 0; i < nf; ++i) {
        for (Eigen::Index j = 0; j < nf; ++j) Kff(i, j) = K(free[i], free[j]);
        rhs(i, 0) = f(free[i]);
    }
    // A unit hogging moment at the start is a unit anticlockwise couple on the
    // beam there; at the end it is a unit clockwise couple.
    rhs(0, 1) = -1.0;       // theta at node 0 is the first free dof
    rhs(nf - 1, 2) = 1.0;   // theta at the last node is the last free dof
    const Eigen::LDLT<Eigen::MatrixXd> ldlt(Kff);
    if (ldlt.info() != Eigen::Success) throw internal_error("beam stiffness matrix could not be factorised");
    const Eigen::MatrixXd sol = ldlt.solve(rhs);

    Eigen::MatrixXd u = Eigen::MatrixXd::Zero(n_dof, 3);
    for (Eigen::Index i = 0; i < nf; ++i) u.row(free[i]) = sol.row(i);
    for (Eigen::Index k = 0; k < 3; ++k)
        for (Eigen::Index d = 0; d < static_cast<Eigen::Index>(n_dof); ++d)
            if (!finite(u(d, k))) throw internal_error("beam solution is not finite");

    // Upward support reactions: the out-of-balance of the support dofs, f - K u.
    const Eigen::MatrixXd Ku = K * u;
    const auto reaction = [&](Eigen::Index d, int state) { return (state == 0 ? f(d) : 0.0) - Ku(d, state); };
    const Eigen::Index d_start = 0, d_end = static_cast<Eigen::Index>(n_dof) - 2;
    reaction0_ = {reaction(d_start, 0), reaction(d_end, 0)};
    reaction_per_start_ = {reaction(d_start, 1), reaction(d_end, 1)};
    reaction_per_end_ = {reaction(d_start, 2), reaction(d_end, 2)};

    const Eigen::Index th_start = 1, th_end = static_cast<Eigen::Index>(n_dof) - 1;
    rot0_ = {u(th_start, 0), -u(th_end, 0)};
    flex_ = {{{-u(th_start, 1), -u(th_start, 2)}, {u(th_end, 1), u(th_end, 2)}}};

    for (std::size_t e = 0; e + 1 < n_nodes; ++e) {
        const double l = elements_[e].length;
        for (int state = 0; state < 3; ++state) {
            const element_vector ue{u(2 * e, state), u(2 * e + 1, state), u(2 * e + 2, state), u(2 * e + 3, state)};
            element_polynomial c = interpolate(ue, l);
            if (state == 0) {
                const auto p = clamped_particular(element_q[e][0], element_q[e][1], l, EI_);
                for (int i = 0; i < 6; ++i) c[i] += p[i];
                elements_[e].w_load = c;
            } else if (state == 1) {
                elements_[e].w_start = c;
            } else {
                elements_[e].w_end = c;
            }
        }
    }

    for (const auto& l : loads_) {
        total_force_ += total_force(l);
        total_moment_about_start_ += moment_about_start(l);
        load_scale_ += std::abs(total_force(l)) + std::abs(moment_about_start(l)) / span_;
    }
}

std::array<double, 2> beam_model::end_moments(stiffness start, stiffness end) const
{
    // Unknown hogging moments m. For each end j, one equation:
    //   pin    : m_j = 0
    //   rigid  : rotation_j = 0          -> F_j . m = rot0_j
    //   spring : m_j = S_j rotation_j    -> (F_jj + 1/S_j) m_j + F_jk m_k = rot0_j
    // A soft spring's row is multiplied through by S_j so that no term is huge:
    //   (1 + S_j F_jj) m_j + S_j F_jk m_k = S_j rot0_j.
    const stiffness joints[2] = {start, end};
    double a[2][2], b[2];
    for (int j = 0; j < 2; ++j) {
        const int k = 1 - j;
        const stiffness s = joints[j];
        if (s.is_pinned()) {
            a[j][j] = 1.0;
            a[j][k] = 0.0;
            b[j] = 0.0;
        } else if (s.is_rigid() || s.value() * flex_[j][j] >= 1.0) {
            const double compliance = s.is_rigid() ? 0.0 : 1.0 / s.value();
            a[j][j] = flex_[j][j] + compliance;
            a[j][k] = flex_[j][k];
            b[j] = rot0_[j];
        } else {
            a[j][j] = 1.0 + s.value() * flex_[j][j];
            a[j][k] = s.value() * flex_[j][k];
            b[j] = s.value() * rot0_[j];
        }
    }
    const double det = a[0][0] * a[1][1] - a[0][1] * a[1][0];
    if (!(std::abs(det) > 0.0) || !finite(det)) throw internal_error("end-spring system is singular");
    return {(b[0] * a[1][1] - a[0][1] * b[1]) / det, (a[0][0] * b[1] - a[1][0] * b[0]) / det};
}

beam_state beam_model::solve(stiffness start, stiffness end) const
{
    const auto m = end_moments(start, end);
    beam_state s = state_for_end_moments(m[0], m[1]);
    s.stiffness_start = start;
    s.stiffness_end = end;
    // A rigid end's rotation is zero by definition, not by round-off.
    if (start.is_rigid()) s.rotation_start = 0.0;
    if (end.is_rigid()) s.rotation_end = 0.0;
    return s;
}

element_polynomial beam_model::combined(const element& e, double m_start, double m_end) const
{
    element_polynomial c{};
    for (int i = 0; i < 6; ++i) c[i] = e.w_load[i] + m_start * e.w_start[i] + m_end * e.w_end[i];
    return c;
}

std::size_t beam_model::element_index(double x) const
{
    auto it = std::upper_bound(nodes_.begin(), nodes_.end(), x);
    std::ptrdiff_t i = (it - nodes_.begin()) - 1;
    return static_cast<std::size_t>(std::clamp<std::ptrdiff_t>(i, 0, static_cast<std::ptrdiff_t>(elements_.size()) - 1));
}

double beam_model::deflection_at(double x, double m_start, double m_end) const
{
    const element& e = elements_[element_index(x)];
    return polynomial::value(combined(e, m_start, m_end), x - e.x0);
}

double beam_model::moment_at(double x, double m_start, double m_end) const
{
    const element& e = elements_[element_index(x)];
    const auto w2 = polynomial::derivative(polynomial::derivative(combined(e, m_start, m_end)));
    return -EI_ * polynomial::value(w2, x - e.x0);
}

beam_state beam_model::state_for_end_moments(double m_start, double m_end) const
{
    if (!finite(m_start) || !finite(m_end)) throw internal_error("end moments are not finite");
    beam_state s;
    s.moment_start = m_start;
    s.moment_end = m_end;
    s.reaction_start = reaction0_[0] + m_start * reaction_per_start_[0] + m_end * reaction_per_end_[0];
    s.reaction_end = reaction0_[1] + m_start * reaction_per_start_[1] + m_end * reaction_per_end_[1];
    s.rotation_start = rot0_[0] - flex_[0][0] * m_start - flex_[0][1] * m_end;
    s.rotation_end = rot0_[1] - flex_[1][0] * m_start - flex_[1][1] * m_end;

    bool first = true;
    bool first_w = true;
    for (const auto& e : elements_) {
        const auto w = combined(e, m_start, m_end);
        const auto w1 = polynomial::derivative(w);
        const auto w2 = polynomial::derivative(w1);
        const auto w3 = polynomial::derivative(w2);
        // Bending moment M = -EI w''; its extremes are at the element ends or where
        // the shear (-EI w''') vanishes.
        std::vector<double> at{0.0, e.length};
        for (double r : polynomial::roots_in(w3, 0.0, e.length)) at.push_back(r);
        for (double sx : at) {
            const double M = -EI_ * polynomial::value(w2, sx);
            if (first || M > s.max_sagging_moment) {
                s.max_sagging_moment = M;
                s.max_sagging_at = e.x0 + sx;
                first = false;
            }
        }
        std::vector<double> wat{0.0, e.length};
        for (double r : polynomial::roots_in(w1, 0.0, e.length)) wat.push_back(r);
        for (double sx : wat) {
            const double v = polynomial::value(w, sx);
            if (first_w || std::abs(v) > std::abs(s.max_deflection)) {
                s.max_deflection = v;
                s.max_deflection_at = e.x0 + sx;
                first_w = false;
            }
        }
    }
    check_equilibrium(s);
    return s;
}

void beam_model::check_equilibrium(const beam_state& s) const
{
    const double vertical = s.reaction_start + s.reaction_end - total_force_;
    // Clockwise moments about the start: loads, the end reaction, the joints'
    // couples on the beam (anticlockwise hogging at the start, clockwise at the end).
    const double rotational = total_moment_about_start_ - s.reaction_end * span_ - s.moment_start + s.moment_end;
    const double scale = load_scale_ + std::abs(s.reaction_start) + std::abs(s.reaction_end) +
                         (std::abs(s.moment_start) + std::abs(s.moment_end)) / span_;
    const double tol = 1e-9 * scale;
    if (!(std::abs(vertical) <= tol) || !(std::abs(rotational) / span_ <= tol)) {
        std::ostringstream msg;
        msg << "equilibrium residual above 1e-9 of the load scale (vertical " << vertical << " N, moment "
            << rotational << " N*m, scale " << scale << " N)";
        throw internal_error(msg.str());
    }
}

}  // namespace pinproof
