#include "pinproof/model/beam_model.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <sstream>
#include <stdexcept>

#include "pinproof/core/errors.hpp"
#include "core/polynomial.hpp"

namespace pinproof {
namespace {

bool finite(double v) { return std::isfinite(v); }

}  // namespace

beam_model::beam_model(double span, double EI, std::vector<load> loads, beam_layout layout, double overhang)
    : span_(span), EI_(EI), overhang_(overhang), layout_(layout), loads_(std::move(loads))
{
    if (!finite(span) || span <= 0) throw std::invalid_argument("span must be positive and finite");
    if (!finite(EI) || EI <= 0) throw std::invalid_argument("EI must be positive and finite");
    if (layout == beam_layout::overhang && (!finite(overhang) || !(overhang > 1e-9 * span)))
        throw std::invalid_argument("an overhang's length must be positive and finite");
    if (layout != beam_layout::overhang && overhang != 0.0)
        throw std::invalid_argument("only an overhang layout has an overhang length");
    const double length = span + overhang;  // the whole member
    for (const auto& l : loads_) {
        const bool distributed = l.kind == load_kind::udl || l.kind == load_kind::linear;
        if (!finite(l.value) || !finite(l.value_end) || !finite(l.from) || !finite(l.to))
            throw std::invalid_argument("load values must be finite");
        if (l.from < 0 || l.from > length) throw std::invalid_argument("load position outside the span");
        if (distributed && (l.to > length || !(l.to - l.from > 1e-9 * span)))
            throw std::invalid_argument("distributed load extent must lie within the span and have length");
    }

    // Nodes: ends, load positions and load boundaries (an overhang: also its
    // end support at x = span). Positions closer than 1e-12 L are merged; the
    // shift is far below the equilibrium tolerance.
    std::vector<double> x{0.0, span, length};
    for (const auto& l : loads_) {
        x.push_back(l.from);
        if (l.kind == load_kind::udl || l.kind == load_kind::linear) x.push_back(l.to);
    }
    std::sort(x.begin(), x.end());
    const double merge = 1e-12 * span;
    for (double v : x)
        if (nodes_.empty() || v - nodes_.back() > merge) nodes_.push_back(v);
    nodes_.back() = length;
    nodes_.front() = 0.0;
    if (layout_ == beam_layout::overhang) {
        // The end support is a node of its own, exactly at x = span.
        support_node_ = nearest_node(span);
        if (!(support_node_ > 0 && support_node_ + 1 < nodes_.size()))
            throw std::invalid_argument("an overhang needs its end support between the start and the tip");
        nodes_[support_node_] = span;
    }

    elements_.resize(nodes_.size() - 1);
    for (std::size_t e = 0; e + 1 < nodes_.size(); ++e) {
        auto& el = elements_[e];
        el.x0 = nodes_[e];
        el.length = nodes_[e + 1] - nodes_[e];
        const double mid = 0.5 * (nodes_[e] + nodes_[e + 1]);
        for (const auto& l : loads_) {
            if (l.kind != load_kind::udl && l.kind != load_kind::linear) continue;
            if (mid <= l.from || mid >= l.to) continue;
            el.qa += intensity_at(l, std::clamp(nodes_[e], l.from, l.to));
            el.qb += intensity_at(l, std::clamp(nodes_[e + 1], l.from, l.to));
        }
    }

    for (const auto& l : loads_) {
        total_force_ += total_force(l);
        total_moment_about_start_ += moment_about_start(l);
        load_scale_ += std::abs(total_force(l)) + std::abs(moment_about_start(l)) / span_;
    }
    if (layout_ == beam_layout::overhang) {
        set_up_overhang();
        return;
    }
    if (layout_ == beam_layout::cantilever) {
        // The load state with a rigid root, and a unit root rotation: a
        // rigid-body turn about the root, w = x (no moment, no shear).
        const load_state s0 = integrate_cantilever();
        for (const auto& c : s0.w)
            for (double v : c)
                if (!finite(v)) throw internal_error("beam solution is not finite");
        for (std::size_t e = 0; e < elements_.size(); ++e) {
            elements_[e].w_load = s0.w[e];
            elements_[e].w_start = element_polynomial{elements_[e].x0, 1.0, 0, 0, 0, 0};
            elements_[e].w_end = element_polynomial{};
        }
        root_moment_ = total_moment_about_start_;
        reaction0_ = {s0.reaction_start, 0.0};
        rot0_ = {0.0, s0.rotation_end};
        closure_ = {s0.closure_shear, s0.closure_moment, 0, 0, 0, 0};
        return;
    }

    // The load state, and the states of a unit hogging moment at each end
    // (a unit anticlockwise couple at the start, a unit clockwise couple at the end).
    const load_state s0 = integrate(loads_, 0.0, 0.0);
    const load_state sa = integrate({}, -1.0, 0.0);
    const load_state sb = integrate({}, 0.0, 1.0);
    for (const load_state* st : {&s0, &sa, &sb})
        for (const auto& c : st->w)
            for (double v : c)
                if (!finite(v)) throw internal_error("beam solution is not finite");
    for (std::size_t e = 0; e < elements_.size(); ++e) {
        elements_[e].w_load = s0.w[e];
        elements_[e].w_start = sa.w[e];
        elements_[e].w_end = sb.w[e];
    }
    reaction0_ = {s0.reaction_start, s0.reaction_end};
    reaction_per_start_ = {sa.reaction_start, sa.reaction_end};
    reaction_per_end_ = {sb.reaction_start, sb.reaction_end};
    rot0_ = {s0.rotation_start, s0.rotation_end};
    flex_ = {{{-sa.rotation_start, -sb.rotation_start}, {-sa.rotation_end, -sb.rotation_end}}};
    closure_ = {s0.closure_shear, s0.closure_moment, sa.closure_shear, sa.closure_moment, sb.closure_shear,
                sb.closure_moment};
}

// The overhang's two states (see the header): the load state with a pinned
// start and the state of a unit hogging moment at the start. The end support
// carries the beam's moment over it, so there is no end-moment state.
void beam_model::set_up_overhang()
{
    const load_state s0 = integrate_overhang(loads_, 0.0);
    const load_state sa = integrate_overhang({}, -1.0);
    for (const load_state* st : {&s0, &sa})
        for (const auto& c : st->w)
            for (double v : c)
                if (!finite(v)) throw internal_error("beam solution is not finite");
    for (std::size_t e = 0; e < elements_.size(); ++e) {
        elements_[e].w_load = s0.w[e];
        elements_[e].w_start = sa.w[e];
        elements_[e].w_end = element_polynomial{};
    }
    // Hogging over the end support, just on the overhang's side of it: the
    // statics of the overhang as a free body, the same whatever the start
    // moment (the unit state's moment vanishes at x = L).
    support_moment_ = s0.support_moment;
    reaction0_ = {s0.reaction_start, s0.reaction_end};
    reaction_per_start_ = {sa.reaction_start, sa.reaction_end};
    reaction_per_end_ = {0.0, 0.0};
    rot0_ = {s0.rotation_start, s0.rotation_end};
    // The end support's rotation moves with the start moment (column 0); no
    // end moment is a redundant (column 1 is 0).
    flex_ = {{{-sa.rotation_start, 0.0}, {-sa.rotation_end, 0.0}}};
    closure_ = {s0.closure_shear, s0.closure_moment, sa.closure_shear, sa.closure_moment, 0.0, 0.0};
    tip0_ = {s0.tip_deflection, s0.rotation_tip};
    tip_per_start_ = {sa.tip_deflection, sa.rotation_tip};
}

std::size_t beam_model::nearest_node(double v) const
{
    auto it = std::lower_bound(nodes_.begin(), nodes_.end(), v - 1e-12 * span_);
    return static_cast<std::size_t>(
        std::min<std::ptrdiff_t>(it - nodes_.begin(), static_cast<std::ptrdiff_t>(nodes_.size()) - 1));
}

// Exact deflection of the pinned-pinned beam under clockwise end couples and
// either the beam's loads (`loads` is loads_) or none (`loads` is empty).
//
// With pinned supports the beam is statically determinate: the reactions
// follow from statics and on each element (between two nodes) the bending
// moment is a polynomial of degree <= 3. EI w'' = -M is integrated element by
// element, exactly, from w(0) = 0 with start slope 0; the rigid rotation that
// restores w(L) = 0 is added afterwards. On every element this is the exact
// Euler-Bernoulli solution, the same as cubic elements with consistent nodal
// loads plus the clamped particular solution inside each element. Integrating
// instead of assembling a stiffness matrix keeps full accuracy when two nodes
// are very close (an assembled matrix carries 12EI/l^3 terms and loses the
// 1e-9 equilibrium once l/L falls below about 1e-4).
beam_model::load_state beam_model::integrate(const std::vector<load>& loads, double couple_start,
                                             double couple_end) const
{
    load_state out;
    out.w.resize(elements_.size());
    double force = 0, moment = couple_start + couple_end;
    for (const auto& l : loads) {
        force += total_force(l);
        moment += moment_about_start(l);
    }
    // Clockwise moments about the start: loads and couples, less R_end L.
    out.reaction_end = moment / span_;
    out.reaction_start = force - out.reaction_end;

    std::vector<double> P(nodes_.size(), 0.0), C(nodes_.size(), 0.0);
    for (const auto& l : loads) {
        if (l.kind == load_kind::point) P[nearest_node(l.from)] += l.value;
        if (l.kind == load_kind::moment) C[nearest_node(l.from)] += l.value;
    }
    C.front() += couple_start;
    C.back() += couple_end;

    // Shear (upward on the left-hand part) and sagging moment just right of a
    // node; a clockwise couple raises the sagging moment by its value.
    const element_run run = integrate_elements(P, C, out.reaction_start - P.front(), C.front(), !loads.empty(), out.w);
    const double V = run.shear, M = run.moment, w = run.w, slope = run.slope;
    // Past the end support nothing may remain: these residuals are the
    // equilibrium of the whole beam, reached by a path independent of statics.
    out.closure_shear = V + out.reaction_end;
    out.closure_moment = M;
    const double theta_start = -w / span_;
    for (std::size_t e = 0; e < elements_.size(); ++e) {
        out.w[e][0] += theta_start * elements_[e].x0;
        out.w[e][1] += theta_start;
    }
    out.rotation_start = theta_start;
    out.rotation_end = -(slope + theta_start);
    return out;
}

// EI w'' = -M integrated element by element from w = 0 and slope 0 at the
// start, with the shear V and the sagging moment M just right of the start,
// the point forces P and clockwise couples C at the nodes, and the elements'
// line loads where `with_loads`: on each element M(s) = M + V s - qa s^2/2 -
// t s^3/(6 l) and w = w + slope s - (1/EI) times the double integral of M(s),
// exactly. Returns the shear and moment just past the last node, and the
// deflection and slope there.
beam_model::element_run beam_model::integrate_elements(const std::vector<double>& P, const std::vector<double>& C,
                                                      double V, double M, bool with_loads,
                                                      std::vector<element_polynomial>& w_out) const
{
    double slope = 0.0, w = 0.0;
    for (std::size_t e = 0; e < elements_.size(); ++e) {
        const auto& el = elements_[e];
        const double l = el.length;
        const double qa = with_loads ? el.qa : 0.0, t = with_loads ? el.qb - el.qa : 0.0;
        element_polynomial c{};
        c[0] = w;
        c[1] = slope;
        c[2] = -M / (2 * EI_);
        c[3] = -V / (6 * EI_);
        c[4] = qa / (24 * EI_);
        c[5] = t / (120 * l * EI_);
        w_out[e] = c;
        w = polynomial::value(c, l);
        slope = polynomial::value(polynomial::derivative(c), l);
        const double V_end = V - qa * l - t * l / 2;
        const double M_end = M + V * l - qa * l * l / 2 - t * l * l / 6;
        V = V_end - P[e + 1];
        M = M_end + C[e + 1];
    }
    return {V, M, w, slope};
}

// Exact deflection of the overhanging beam with a pinned start under the
// loads (`loads` is loads_) or none, and a clockwise couple at the start. The
// beam is statically determinate: the end reaction from moments about the
// start, put in as an upward point force at the end support's node; EI w'' =
// -M is integrated from w = 0 and slope 0 at the start over the whole length,
// and the rigid-body turn that restores w(L) = 0 is added afterwards, as in
// integrate(). What is left past the free tip is the closure.
beam_model::load_state beam_model::integrate_overhang(const std::vector<load>& loads, double couple_start) const
{
    load_state out;
    out.w.resize(elements_.size());
    double force = 0, moment = couple_start;
    for (const auto& l : loads) {
        force += total_force(l);
        moment += moment_about_start(l);
    }
    out.reaction_end = moment / span_;
    out.reaction_start = force - out.reaction_end;
    std::vector<double> P(nodes_.size(), 0.0), C(nodes_.size(), 0.0);
    for (const auto& l : loads) {
        if (l.kind == load_kind::point) P[nearest_node(l.from)] += l.value;
        if (l.kind == load_kind::moment) C[nearest_node(l.from)] += l.value;
    }
    C.front() += couple_start;
    P[support_node_] -= out.reaction_end;  // the support pushes up
    const element_run run = integrate_elements(P, C, out.reaction_start - P.front(), C.front(), !loads.empty(), out.w);
    out.closure_shear = run.shear;  // no support at the tip
    out.closure_moment = run.moment;
    const element_polynomial& at_support = out.w[support_node_];  // the element starting at x = L
    const double theta_start = -at_support[0] / span_;
    const double slope_support = at_support[1];
    out.support_moment = 2.0 * EI_ * at_support[2];  // -M(L+), M = -EI w''
    for (std::size_t e = 0; e < elements_.size(); ++e) {
        out.w[e][0] += theta_start * elements_[e].x0;
        out.w[e][1] += theta_start;
    }
    out.rotation_start = theta_start;
    out.rotation_end = -(slope_support + theta_start);
    out.tip_deflection = run.w + theta_start * (span_ + overhang_);
    out.rotation_tip = -(run.slope + theta_start);
    return out;
}

// Exact deflection of the cantilever with a rigid root under the beam's loads.
// Statics gives the root reaction (the total load) and the hogging root moment
// (the loads' clockwise moment about the root); EI w'' = -M is integrated
// element by element from w(0) = 0, theta(0) = 0, as in integrate(). What is
// left past the free tip is the closure: equilibrium by a second path.
beam_model::load_state beam_model::integrate_cantilever() const
{
    load_state out;
    out.w.resize(elements_.size());
    double force = 0, moment = 0;
    for (const auto& l : loads_) {
        force += total_force(l);
        moment += moment_about_start(l);
    }
    out.reaction_start = force;
    out.reaction_end = 0.0;
    std::vector<double> P(nodes_.size(), 0.0), C(nodes_.size(), 0.0);
    for (const auto& l : loads_) {
        if (l.kind == load_kind::point) P[nearest_node(l.from)] += l.value;
        if (l.kind == load_kind::moment) C[nearest_node(l.from)] += l.value;
    }
    // Just right of the root: the root's anticlockwise couple (hogging) makes
    // the sagging moment -M_root; a clockwise couple there raises it.
    const element_run run = integrate_elements(P, C, out.reaction_start - P.front(), -moment + C.front(), true, out.w);
    out.closure_shear = run.shear;  // no support at the tip
    out.closure_moment = run.moment;
    out.rotation_start = 0.0;
    out.rotation_end = -run.slope;
    return out;
}

void beam_model::end_moments_grid(const std::vector<stiffness>& starts, const std::vector<stiffness>& ends,
                                  std::vector<std::array<double, 2>>& out) const
{
    if (layout_ == beam_layout::cantilever) {
        for (const stiffness& s : starts)
            if (s.is_pinned()) throw std::invalid_argument("a cantilever with a pinned root is a mechanism");
        out.assign(starts.size() * ends.size(), {root_moment_, 0.0});
        return;
    }
    if (layout_ == beam_layout::overhang) {
        // One redundant: each start stiffness is one division, whatever the end.
        out.resize(starts.size() * ends.size());
        for (std::size_t i = 0; i < starts.size(); ++i) {
            const std::array<double, 2> m = end_moments(starts[i], stiffness::pinned());
            for (std::size_t j = 0; j < ends.size(); ++j) out[i * ends.size() + j] = m;
        }
        return;
    }
    std::vector<condensed_row> rows_end(ends.size());
    for (std::size_t j = 0; j < ends.size(); ++j) rows_end[j] = row_for(1, ends[j]);
    out.resize(starts.size() * ends.size());
    // The singularity test is gathered over the sweep and acted on once, so
    // that the inner loop has no branch and the compiler can vectorise it.
    bool regular = true;
    for (std::size_t i = 0; i < starts.size(); ++i) {
        const condensed_row r0 = row_for(0, starts[i]);
        std::array<double, 2>* o = out.data() + i * ends.size();
        for (std::size_t j = 0; j < ends.size(); ++j) {
            const condensed_row& r1 = rows_end[j];
            const double det = r0.own * r1.own - r0.other * r1.other;
            regular &= std::abs(det) > 0.0 && std::abs(det) <= std::numeric_limits<double>::max();
            o[j] = {(r0.rhs * r1.own - r0.other * r1.rhs) / det, (r0.own * r1.rhs - r1.other * r0.rhs) / det};
        }
    }
    if (!regular) {
        out.clear();
        throw internal_error("end-spring system is singular");
    }
}

beam_state beam_model::solve(stiffness start, stiffness end) const
{
    if (layout_ == beam_layout::cantilever) {
        if (start.is_pinned()) throw std::invalid_argument("a cantilever with a pinned root is a mechanism");
        if (!end.is_pinned()) throw std::invalid_argument("a cantilever's tip is free: it takes no end joint");
        beam_state s = state_for_root_rotation(start.is_rigid() ? 0.0 : root_moment_ / start.value());
        s.stiffness_start = start;
        s.stiffness_end = end;
        return s;
    }
    if (layout_ == beam_layout::overhang) {
        if (!end.is_pinned())
            throw std::invalid_argument("an overhang runs on over its end support: it takes no end joint");
        beam_state s = state_for_start_moment(end_moments(start, end)[0]);
        s.stiffness_start = start;
        s.stiffness_end = end;
        if (start.is_rigid()) s.rotation_start = 0.0;
        return s;
    }
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

std::array<double, 2> beam_model::coefficients(const beam_state& s) const
{
    if (layout_ == beam_layout::cantilever) return {s.rotation_start, 0.0};
    if (layout_ == beam_layout::overhang) return {s.moment_start, 0.0};
    return {s.moment_start, s.moment_end};
}

double beam_model::deflection_at(double x, const beam_state& s) const
{
    const auto k = coefficients(s);
    const element& e = elements_[element_index(x)];
    return polynomial::value(combined(e, k[0], k[1]), x - e.x0);
}

double beam_model::moment_at(double x, const beam_state& s) const
{
    const auto k = coefficients(s);
    const element& e = elements_[element_index(x)];
    return -EI_ * polynomial::value(polynomial::derivative(polynomial::derivative(combined(e, k[0], k[1]))), x - e.x0);
}

double beam_model::shear_at(double x, const beam_state& s) const
{
    const auto k = coefficients(s);
    const element& e = elements_[element_index(x)];
    const auto w3 = polynomial::derivative(polynomial::derivative(polynomial::derivative(combined(e, k[0], k[1]))));
    return -EI_ * polynomial::value(w3, x - e.x0);
}

double beam_model::deflection_at(double x, double m_start, double m_end) const
{
    if (layout_ == beam_layout::cantilever) throw std::logic_error("deflection_at(x, moments) on a cantilever");
    const element& e = elements_[element_index(x)];
    return polynomial::value(combined(e, m_start, m_end), x - e.x0);
}

double beam_model::moment_at(double x, double m_start, double m_end) const
{
    if (layout_ == beam_layout::cantilever) throw std::logic_error("moment_at(x, moments) on a cantilever");
    const element& e = elements_[element_index(x)];
    const auto w2 = polynomial::derivative(polynomial::derivative(combined(e, m_start, m_end)));
    return -EI_ * polynomial::value(w2, x - e.x0);
}

double beam_model::shear_at(double x, double m_start, double m_end) const
{
    if (layout_ == beam_layout::cantilever) throw std::logic_error("shear_at(x, moments) on a cantilever");
    const element& e = elements_[element_index(x)];
    const auto w3 = polynomial::derivative(polynomial::derivative(polynomial::derivative(combined(e, m_start, m_end))));
    return -EI_ * polynomial::value(w3, x - e.x0);
}

beam_state beam_model::state_for_end_moments(double m_start, double m_end) const
{
    if (layout_ == beam_layout::cantilever) throw std::logic_error("state_for_end_moments on a cantilever");
    if (layout_ == beam_layout::overhang) throw std::logic_error("state_for_end_moments on an overhang");
    if (!finite(m_start) || !finite(m_end)) throw internal_error("end moments are not finite");
    beam_state s;
    s.moment_start = m_start;
    s.moment_end = m_end;
    s.reaction_start = reaction0_[0] + m_start * reaction_per_start_[0] + m_end * reaction_per_end_[0];
    s.reaction_end = reaction0_[1] + m_start * reaction_per_start_[1] + m_end * reaction_per_end_[1];
    s.rotation_start = rot0_[0] - flex_[0][0] * m_start - flex_[0][1] * m_end;
    s.rotation_end = rot0_[1] - flex_[1][0] * m_start - flex_[1][1] * m_end;
    return fill_extremes(s, m_start, m_end);
}

// An overhang: the state for a hogging start moment (N*m); the moment over
// the end support is the overhang's statics.
beam_state beam_model::state_for_start_moment(double m_start) const
{
    if (!finite(m_start)) throw internal_error("start moment is not finite");
    beam_state s;
    s.moment_start = m_start;
    s.moment_end = support_moment_;
    s.reaction_start = reaction0_[0] + m_start * reaction_per_start_[0];
    s.reaction_end = reaction0_[1] + m_start * reaction_per_start_[1];
    s.rotation_start = rot0_[0] - flex_[0][0] * m_start;
    s.rotation_end = rot0_[1] - flex_[1][0] * m_start;
    s.tip_deflection = tip0_[0] + m_start * tip_per_start_[0];
    s.rotation_tip = tip0_[1] + m_start * tip_per_start_[1];
    return fill_extremes(s, m_start, 0.0);
}

beam_state beam_model::state_for_root_rotation(double theta) const
{
    if (layout_ != beam_layout::cantilever) throw std::logic_error("state_for_root_rotation on a beam on two supports");
    if (!finite(theta)) throw internal_error("root rotation is not finite");
    beam_state s;
    s.moment_start = root_moment_;
    s.moment_end = 0.0;
    s.reaction_start = reaction0_[0];
    s.reaction_end = 0.0;
    s.rotation_start = theta;
    // -theta(L): the rigid-root tip slope plus the root's turn.
    s.rotation_end = rot0_[1] - theta;
    return fill_extremes(s, theta, 0.0);
}

// The span extremes of the state whose deflection is w_load + a w_start + b w_end.
beam_state beam_model::fill_extremes(beam_state s, double a, double b) const
{
    const double m_start = s.moment_start, m_end = s.moment_end;

    bool first = true;
    bool first_w = true;
    // Moments within round-off of each other are equal: the first from the
    // start is kept, so a position does not flip between equal extremes (the
    // two zero-moment ends of a pinned beam under uplift).
    const double moment_tol = 1e-12 * (load_scale_ * span_ + std::abs(m_start) + std::abs(m_end));
    for (const auto& e : elements_) {
        const auto w = combined(e, a, b);
        const auto w1 = polynomial::derivative(w);
        const auto w2 = polynomial::derivative(w1);
        const auto w3 = polynomial::derivative(w2);
        // Bending moment M = -EI w''; its extremes are at the element ends or where
        // the shear (-EI w''') vanishes.
        const auto moment_candidate = [&](double sx) {
            const double M = -EI_ * polynomial::value(w2, sx);
            if (first || M > s.max_sagging_moment + moment_tol) {
                s.max_sagging_moment = M;
                s.max_sagging_at = e.x0 + sx;
            }
            if (first || M < s.max_hogging_moment - moment_tol) {
                s.max_hogging_moment = M;
                s.max_hogging_at = e.x0 + sx;
            }
            first = false;
        };
        moment_candidate(0.0);
        moment_candidate(e.length);
        for (double sx : polynomial::roots_in(w3, 0.0, e.length)) moment_candidate(sx);
        // Deflection extremes: at the element ends or where the slope vanishes.
        const auto deflection_candidate = [&](double sx) {
            const double v = polynomial::value(w, sx);
            if (first_w || std::abs(v) > std::abs(s.max_deflection)) {
                s.max_deflection = v;
                s.max_deflection_at = e.x0 + sx;
                first_w = false;
            }
        };
        // An overhang: the back span's deflection (the tip's is its own result).
        if (layout_ == beam_layout::overhang && !(e.x0 < span_)) continue;
        deflection_candidate(0.0);
        deflection_candidate(e.length);
        for (double sx : polynomial::roots_in(w1, 0.0, e.length)) deflection_candidate(sx);
    }
    // No hogging moment anywhere (to round-off): 0, at the start.
    if (!(s.max_hogging_moment < -moment_tol)) {
        s.max_hogging_moment = 0.0;
        s.max_hogging_at = 0.0;
    }
    check_equilibrium(s, a, b);
    return s;
}

void beam_model::check_equilibrium(const beam_state& s, double a, double b) const
{
    const double vertical = s.reaction_start + s.reaction_end - total_force_;
    // Clockwise moments about the start: loads, the end reaction, the joints'
    // couples on the beam (anticlockwise hogging at the start, clockwise at the end).
    // (An overhang's moment over the end support is internal, not a joint's couple.)
    const double end_couple = layout_ == beam_layout::overhang ? 0.0 : s.moment_end;
    const double rotational = total_moment_about_start_ - s.reaction_end * span_ - s.moment_start + end_couple;
    // The shear and moment left over past the end support after integrating
    // along the beam: equilibrium reached by the second, independent path
    // (a and b scale the unit states: the end moments, or a cantilever's root
    // rotation, whose rigid-body turn leaves nothing past the tip).
    const double shear_left = closure_[0] + a * closure_[2] + b * closure_[4];
    const double moment_left = closure_[1] + a * closure_[3] + b * closure_[5];
    const double scale = load_scale_ + std::abs(s.reaction_start) + std::abs(s.reaction_end) +
                         (std::abs(s.moment_start) + std::abs(s.moment_end)) / span_;
    const double tol = 1e-9 * scale;
    const bool ok = std::abs(vertical) <= tol && std::abs(rotational) / span_ <= tol && std::abs(shear_left) <= tol &&
                    std::abs(moment_left) / span_ <= tol;
    if (!ok) {
        std::ostringstream msg;
        msg << "equilibrium residual above 1e-9 of the load scale (vertical " << vertical << " N, moment "
            << rotational << " N*m, shear past the end " << shear_left << " N, moment past the end " << moment_left
            << " N*m, scale " << scale << " N)";
        throw internal_error(msg.str());
    }
}

}  // namespace pinproof
