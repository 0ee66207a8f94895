// Linear elastic analysis of a uniform straight beam in one of the layouts of
// beam_layout.hpp: between two vertical supports, each end restrained by a
// rotational spring (pin, spring or rigid), or a cantilever whose root is
// restrained by a spring or rigid and whose tip is free.
//
// Method (docs/method/beam-model.md):
//  1. Nodes at each end, at every point load or point moment and at every
//     boundary of a distributed load. On each element between two nodes the
//     exact Euler-Bernoulli solution (a polynomial of degree <= 5) is found by
//     integrating EI w'' = -M for the pinned-pinned beam, whose bending moment
//     follows from statics. This is the exact solution that cubic elements with
//     consistent loads and the clamped particular solution give at these
//     nodes (tests/beam_model_test.cpp checks it against such an assembled
//     stiffness model built with Eigen), without the ill-conditioning of an
//     assembled matrix when two nodes are very close.
//  2. The end moments are the two redundants. The load state and the states of
//     a unit moment at each end are computed once; this static condensation onto
//     the two end rotations makes any pair of end springs a 2x2 solve, and a
//     rigid end the exact constraint rotation = 0, not a large spring number.
//  A cantilever is statically determinate: the root moment and reaction follow
//  from statics whatever the root's stiffness. The beam is integrated from the
//  root with w(0) = 0 and theta(0) = 0 (the rigid root), element by element
//  with the same polynomials, and a spring root adds the rigid-body rotation
//  theta_root = M_root / S about the root: w(x) += theta_root x
//  (docs/method/layouts.md).
//  An overhang (a beam on two supports running on, continuous, over the end
//  support to a free tip at L + a) has one redundant, the start moment: the
//  hogging moment over the end support follows from the statics of the
//  overhang. The load state is the overhanging beam with a pinned start, and
//  the unit state a unit hogging moment at the start, both integrated over the
//  whole length with the end reaction as a point force at x = L and the
//  rigid-body turn that restores w(L) = 0; the start spring is then a 1x1
//  solve (the start row of the condensed system, docs/method/layouts.md).
//  3. Every state is checked for equilibrium of vertical forces and of moments
//     about the start, and by the shear and moment left over past the end
//     support (for a cantilever: past the free tip) after integrating along the
//     beam; a residual above 1e-9 of the load scale throws internal_error.
// Signs: sign_conventions.hpp. Units: SI base units.
#pragma once

#include <array>
#include <cmath>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/beam_layout.hpp"
#include "pinproof/model/loads.hpp"
#include "pinproof/model/sign_conventions.hpp"
#include "pinproof/model/stiffness.hpp"

namespace pinproof {

struct beam_state {
    stiffness stiffness_start = stiffness::pinned();
    stiffness stiffness_end = stiffness::pinned();
    double reaction_start = 0;      // N, upward positive
    double reaction_end = 0;        // N, upward positive
    double moment_start = 0;        // N*m, hogging positive
    double moment_end = 0;          // N*m, hogging positive
    double max_sagging_moment = 0;  // N*m, largest M(x) over the span (may be negative)
    double max_sagging_at = 0;      // m from the start
    // N*m, the most hogging M(x) over the span, ends included (<= 0: the
    // governing span moment under uplift); 0 at the start (x = 0) when M(x)
    // is nowhere hogging. Of equal values within round-off, the first from
    // the start is kept, for both extremes.
    double max_hogging_moment = 0;
    double max_hogging_at = 0;      // m from the start
    // m, downward positive: w(x) of largest magnitude (for a cantilever under
    // loads of one sign, the tip's deflection)
    double max_deflection = 0;
    double max_deflection_at = 0;   // m from the start
    double rotation_start = 0;      // rad, positive as a simply supported beam under gravity (a cantilever: the root's)
    double rotation_end = 0;        // rad, same sense (a cantilever: at the tip, -theta(L))
    // An overhang only (0 in the other layouts): the free tip at x = L + a.
    // max_deflection is then the back span's (0 <= x <= L), rotation_end is at
    // the end support and moment_end is the hogging moment over it.
    double tip_deflection = 0;      // m, downward positive, w(L + a)
    double rotation_tip = 0;        // rad, -theta(L + a): negative as the tip drops
};

// Polynomial in the local coordinate s of one element: c[0] + c[1] s + ... + c[5] s^5.
using element_polynomial = std::array<double, 6>;

class beam_model {
public:
    // Throws std::invalid_argument for span <= 0, EI <= 0, non-finite values,
    // a load outside [0, span] ([0, span + overhang] for an overhang), an
    // overhang <= 0 on that layout or an overhang other than 0 on another (the
    // project loader reports these to the user with field names before a model
    // is built).
    beam_model(double span, double EI, std::vector<load> loads, beam_layout layout = beam_layout::two_supports,
               double overhang = 0.0);

    // The span between the supports (a cantilever: root to tip); an
    // overhang's length beyond the end support; the whole member's length.
    double span() const noexcept { return span_; }
    double overhang() const noexcept { return overhang_; }
    double length() const noexcept { return span_ + overhang_; }
    beam_layout layout() const noexcept { return layout_; }
    double EI() const noexcept { return EI_; }
    const std::vector<double>& nodes() const noexcept { return nodes_; }

    // The full linear state for a pair of end joints. A cantilever takes its
    // root's stiffness as `start` and a pin (no joint) as `end`; a pinned root
    // is a mechanism and throws std::invalid_argument (the reader refuses it
    // at the root joint's field first).
    beam_state solve(stiffness start, stiffness end) const;

    // Two supports: the state for given hogging end moments (N*m), whatever
    // joint produced them. Used by non-linear joint models (gap closure) that
    // iterate on the end moments. Throws std::logic_error on a cantilever,
    // whose root moment is fixed by statics (state_for_root_rotation).
    beam_state state_for_end_moments(double moment_start, double moment_end) const;

    // A cantilever: the state for a root rotation theta (rad, sign_conventions.hpp);
    // a spring root S turns through root_moment() / S, a rigid one through 0.
    // Throws std::logic_error on a beam on two supports.
    beam_state state_for_root_rotation(double theta) const;
    // A cantilever: the hogging root moment (N*m), from statics.
    double root_moment() const noexcept { return root_moment_; }

    // Two supports only (pinned_rotations, flexibility): the condensed form: end rotations are
    //   rotation = pinned_rotations() - flexibility() * {moment_start, moment_end}
    // with rotations and hogging moments in the sign convention.
    std::array<double, 2> pinned_rotations() const noexcept { return rot0_; }
    std::array<std::array<double, 2>, 2> flexibility() const noexcept { return flex_; }

    // Hogging end moments for a pair of joints from the condensed 2x2 system.
    std::array<double, 2> end_moments(stiffness start, stiffness end) const;

    // End moments for every pair (starts[i], ends[j]) of a sweep, written to
    // out[i * ends.size() + j]. Each joint's row of the condensed system is
    // formed once for the whole sweep, so a pair costs one 2x2 elimination.
    // Throws internal_error, writing nothing usable, if any pair is singular.
    void end_moments_grid(const std::vector<stiffness>& starts, const std::vector<stiffness>& ends,
                          std::vector<std::array<double, 2>>& out) const;

    // Two supports: deflection (m, downward) and bending moment (N*m,
    // sagging) at x for the state with the given hogging end moments (throw
    // std::logic_error on a cantilever).
    double deflection_at(double x, double moment_start, double moment_end) const;
    double moment_at(double x, double moment_start, double moment_end) const;
    // Shear force (N, sign_conventions.hpp) at x. At a point load it jumps:
    // the value just after x (to its right) is returned; ask for x less a
    // small step for the value just before it.
    double shear_at(double x, double moment_start, double moment_end) const;
    // The same for a state of this model, in any layout.
    double deflection_at(double x, const beam_state& s) const;
    double moment_at(double x, const beam_state& s) const;
    double shear_at(double x, const beam_state& s) const;

private:
    // Row j of the condensed system a[j][j] m_j + a[j][k] m_k = b_j for joint
    // j (0 start, 1 end) with stiffness s; see end_moments.
    struct condensed_row {
        double own = 0, other = 0, rhs = 0;
    };
    condensed_row row_for(int j, stiffness s) const noexcept;

    struct element {
        double x0 = 0, length = 0;
        double qa = 0, qb = 0;  // line load at the element's ends, N/m
        // Deflection polynomials for the load state and for unit hogging end
        // moments at the start and at the end (a cantilever: the load state
        // with a rigid root, a unit root rotation, and 0).
        element_polynomial w_load{}, w_start{}, w_end{};
    };
    struct load_state {
        std::vector<element_polynomial> w;  // deflection per element
        double reaction_start = 0, reaction_end = 0, rotation_start = 0, rotation_end = 0;
        double closure_shear = 0, closure_moment = 0;  // what is left past the end support
        // An overhang: the tip's deflection and rotation, the hogging moment over the end support.
        double tip_deflection = 0, rotation_tip = 0, support_moment = 0;
    };
    load_state integrate(const std::vector<load>& loads, double couple_start, double couple_end) const;
    load_state integrate_cantilever() const;
    load_state integrate_overhang(const std::vector<load>& loads, double couple_start) const;
    void set_up_overhang();
    beam_state state_for_start_moment(double moment_start) const;
    struct element_run {
        double shear = 0, moment = 0, w = 0, slope = 0;  // just past the last node
    };
    element_run integrate_elements(const std::vector<double>& P, const std::vector<double>& C, double V, double M,
                                   bool with_loads, std::vector<element_polynomial>& w_out) const;
    // The state whose deflection is w_load + a w_start + b w_end (two
    // supports: a, b the end moments; a cantilever: a the root rotation, b 0).
    beam_state fill_extremes(beam_state s, double a, double b) const;
    std::array<double, 2> coefficients(const beam_state& s) const;
    std::size_t nearest_node(double x) const;
    element_polynomial combined(const element& e, double m_start, double m_end) const;
    std::size_t element_index(double x) const;
    void check_equilibrium(const beam_state& s, double a, double b) const;

    double span_ = 0, EI_ = 0;
    double overhang_ = 0;        // m beyond the end support (overhang layout)
    std::size_t support_node_ = 0;  // an overhang: index of the node at x = span_
    double support_moment_ = 0;  // an overhang: hogging moment over the end support, N*m (statics)
    beam_layout layout_ = beam_layout::two_supports;
    double root_moment_ = 0;  // a cantilever's hogging root moment, N*m
    std::vector<load> loads_;
    std::vector<double> nodes_;
    std::vector<element> elements_;
    std::array<double, 2> rot0_{};                 // pinned end rotations
    std::array<std::array<double, 2>, 2> flex_{};  // d(rotation)/d(-moment)
    // Reactions (upward) of the load state and per unit hogging end moment.
    std::array<double, 2> reaction0_{}, reaction_per_start_{}, reaction_per_end_{};
    double total_force_ = 0, total_moment_about_start_ = 0, load_scale_ = 0;
    std::array<double, 6> closure_{};  // shear and moment closure of the three states
    // An overhang: the tip's deflection and rotation of the load state, and per unit start moment.
    std::array<double, 2> tip0_{}, tip_per_start_{};
};

// Defined here so that a sweep over many stiffness pairs can inline them.
inline beam_model::condensed_row beam_model::row_for(int j, stiffness s) const noexcept
{
    // Unknown hogging moments m. For end j (other end k), one equation:
    //   spring or pin: m_j = S_j rotation_j, written for a soft spring as
    //                  (1 + S_j F_jj) m_j + S_j F_jk m_k = S_j rot0_j   (a pin, S_j = 0, gives m_j = 0)
    //   stiff spring:  (F_jj + 1/S_j) m_j + F_jk m_k = rot0_j           (divided through by S_j)
    //   rigid:         F_jj m_j + F_jk m_k = rot0_j                     (rotation_j = 0 exactly)
    // so that no term is huge; the form is chosen by S_j F_jj.
    const int k = 1 - j;
    const double S = s.value();
    if (s.is_rigid()) return {flex_[j][j], flex_[j][k], rot0_[j]};
    if (S * flex_[j][j] >= 1.0) return {flex_[j][j] + 1.0 / S, flex_[j][k], rot0_[j]};
    return {1.0 + S * flex_[j][j], S * flex_[j][k], S * rot0_[j]};
}

inline std::array<double, 2> beam_model::end_moments(stiffness start, stiffness end) const
{
    if (layout_ == beam_layout::cantilever) return {root_moment_, 0.0};  // statics, whatever the root's stiffness
    if (layout_ == beam_layout::overhang) {
        // One redundant: the start row alone (flex_[0][1] = 0; the end support's
        // moment is fixed by the overhang's statics).
        (void)end;
        const condensed_row r0 = row_for(0, start);
        if (!(std::abs(r0.own) > 0.0) || !std::isfinite(r0.own)) throw internal_error("start-spring equation is singular");
        return {r0.rhs / r0.own, support_moment_};
    }
    const condensed_row r0 = row_for(0, start), r1 = row_for(1, end);
    const double det = r0.own * r1.own - r0.other * r1.other;
    if (!(std::abs(det) > 0.0) || !std::isfinite(det)) throw internal_error("end-spring system is singular");
    return {(r0.rhs * r1.own - r0.other * r1.rhs) / det, (r0.own * r1.rhs - r1.other * r0.rhs) / det};
}

}  // namespace pinproof
