#include "pinproof/joints/joint_law.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace pinproof {
namespace {

bool positive(double v) { return std::isfinite(v) && v > 0; }
bool non_negative(double v) { return std::isfinite(v) && v >= 0; }

void require(bool ok, const char* what)
{
    if (!ok) throw std::invalid_argument(what);
}

void require_cap(const std::optional<double>& cap)
{
    if (cap) require(positive(*cap), "the moment resistance must be finite and > 0");
}

}  // namespace

joint_law joint_law::linear(double initial_stiffness, std::optional<double> moment_resistance)
{
    require(non_negative(initial_stiffness), "the stiffness must be finite and >= 0");
    require_cap(moment_resistance);
    joint_law j;
    j.kind_ = joint_law_kind::linear;
    j.k_ = initial_stiffness;
    j.cap_ = moment_resistance;
    return j;
}

joint_law joint_law::ec3_curve(double initial_stiffness, double moment_resistance, double psi)
{
    require(positive(initial_stiffness), "the initial stiffness must be finite and > 0");
    require(positive(moment_resistance), "the moment resistance must be finite and > 0");
    require(positive(psi) && psi <= 10, "psi must be > 0 and at most 10");
    joint_law j;
    j.kind_ = joint_law_kind::ec3_curve;
    j.k_ = initial_stiffness;
    j.a_ = psi;
    j.b_ = moment_resistance;  // the curve's own M_j,Rd, kept when a lower cap is added
    j.ec3_log_term_ = psi * std::log(moment_resistance / 1.5);
    j.cap_ = moment_resistance;
    return j;
}

joint_law joint_law::ec3_eta(double initial_stiffness, double eta, std::optional<double> moment_resistance)
{
    require(non_negative(initial_stiffness), "the initial stiffness must be finite and >= 0");
    require(std::isfinite(eta) && eta >= 1 && eta <= 10, "eta must be at least 1 and at most 10");
    require_cap(moment_resistance);
    joint_law j;
    j.kind_ = joint_law_kind::ec3_eta;
    j.k_ = initial_stiffness;
    j.a_ = eta;
    j.cap_ = moment_resistance;
    return j;
}

joint_law joint_law::power(double initial_stiffness, double ultimate_moment, double shape,
                           std::optional<double> moment_resistance)
{
    require(positive(initial_stiffness), "the initial stiffness must be finite and > 0");
    require(positive(ultimate_moment), "the ultimate moment must be finite and > 0");
    require(positive(shape) && shape <= 50, "the shape parameter n must be > 0 and at most 50");
    require_cap(moment_resistance);
    joint_law j;
    j.kind_ = joint_law_kind::power;
    j.k_ = initial_stiffness;
    j.a_ = ultimate_moment;
    j.b_ = shape;
    j.cap_ = moment_resistance;
    return j;
}

joint_law joint_law::richard_abbott(double initial_stiffness, double reference_moment, double plastic_stiffness,
                                    double shape, std::optional<double> moment_resistance)
{
    require(positive(initial_stiffness), "the initial stiffness must be finite and > 0");
    require(positive(reference_moment), "the reference moment must be finite and > 0");
    // k_p = S_j,ini leaves the linear law M = S_j,ini theta (the curved term vanishes).
    require(non_negative(plastic_stiffness) && plastic_stiffness <= initial_stiffness,
            "the plastic stiffness must be >= 0 and at most the initial stiffness");
    require(positive(shape) && shape <= 50, "the shape parameter n must be > 0 and at most 50");
    require_cap(moment_resistance);
    joint_law j;
    j.kind_ = joint_law_kind::richard_abbott;
    j.k_ = initial_stiffness;
    j.a_ = reference_moment;
    j.b_ = plastic_stiffness;
    j.c_ = shape;
    j.cap_ = moment_resistance;
    return j;
}

joint_law joint_law::multilinear(std::vector<law_point> points, double slip, std::optional<double> moment_resistance)
{
    require(!points.empty(), "a multilinear law needs at least one point");
    require(non_negative(slip), "the slip must be finite and >= 0");
    require_cap(moment_resistance);
    law_point previous{0, 0};
    for (const law_point& p : points) {
        require(std::isfinite(p.rotation) && p.rotation > previous.rotation,
                "the rotations must increase strictly from 0");
        require(std::isfinite(p.moment) && p.moment >= previous.moment,
                "the moments must not decrease (the curve is monotone)");
        previous = p;
    }
    require(points.back().moment > 0, "the curve must carry some moment");
    joint_law j;
    j.kind_ = joint_law_kind::multilinear;
    j.points_.reserve(points.size() + 1);
    j.points_.push_back({0, 0});
    j.points_.insert(j.points_.end(), points.begin(), points.end());
    j.k_ = points.front().moment / points.front().rotation;
    j.slip_ = slip;
    j.cap_ = moment_resistance;
    return j;
}

std::vector<std::pair<std::string, double>> joint_law::parameters() const
{
    std::vector<std::pair<std::string, double>> p{{"initial_stiffness", k_}};
    switch (kind_) {
    case joint_law_kind::linear:
    case joint_law_kind::multilinear: break;
    case joint_law_kind::ec3_curve: p.emplace_back("psi", a_); break;
    case joint_law_kind::ec3_eta: p.emplace_back("eta", a_); break;
    case joint_law_kind::power:
        p.emplace_back("ultimate_moment", a_);
        p.emplace_back("shape", b_);
        break;
    case joint_law_kind::richard_abbott:
        p.emplace_back("reference_moment", a_);
        p.emplace_back("plastic_stiffness", b_);
        p.emplace_back("shape", c_);
        break;
    }
    if (slip_ > 0) p.emplace_back("slip", slip_);
    if (cap_) p.emplace_back("moment_resistance", *cap_);
    return p;
}

double joint_law::uncapped(double a) const
{
    switch (kind_) {
    case joint_law_kind::linear: return k_ * a;
    case joint_law_kind::ec3_eta: return k_ / a_ * a;
    case joint_law_kind::ec3_curve: {
        // theta(M) = M mu(M) / S_j,ini with mu = (1.5 M / M_Rd)^psi above
        // 2/3 M_Rd; inverted in closed form: M^(1 + psi) = theta S_j,ini (M_Rd / 1.5)^psi.
        const double M_Rd = b_, elastic = k_ * a;
        if (elastic <= 2.0 / 3.0 * M_Rd) return elastic;
        return std::exp((std::log(elastic) + ec3_log_term_) / (1.0 + a_));
    }
    case joint_law_kind::power: {
        // Kishi and Chen (1990): M = R theta / [1 + (theta / theta_0)^n]^(1/n).
        const double x = k_ * a / a_;  // theta / theta_0
        return k_ * a / std::pow(1.0 + std::pow(x, b_), 1.0 / b_);
    }
    case joint_law_kind::richard_abbott: {
        const double kd = k_ - b_, x = kd * a / a_;
        return kd * a / std::pow(1.0 + std::pow(x, c_), 1.0 / c_) + b_ * a;
    }
    case joint_law_kind::multilinear: {
        const auto it = std::upper_bound(points_.begin(), points_.end(), a,
                                         [](double v, const law_point& p) { return v < p.rotation; });
        if (it == points_.end()) return points_.back().moment;  // the last segment extended flat
        const law_point& lo = *(it - 1);
        const law_point& hi = *it;
        return lo.moment + (hi.moment - lo.moment) * (a - lo.rotation) / (hi.rotation - lo.rotation);
    }
    }
    return 0;
}

double joint_law::uncapped_slope(double a) const
{
    switch (kind_) {
    case joint_law_kind::linear: return k_;
    case joint_law_kind::ec3_eta: return k_ / a_;
    case joint_law_kind::ec3_curve: {
        if (k_ * a <= 2.0 / 3.0 * b_) return k_;
        return uncapped(a) / ((1.0 + a_) * a);  // d/dtheta of (C theta)^(1/(1+psi))
    }
    case joint_law_kind::power: {
        const double x = k_ * a / a_;
        return k_ / std::pow(1.0 + std::pow(x, b_), 1.0 + 1.0 / b_);
    }
    case joint_law_kind::richard_abbott: {
        const double kd = k_ - b_, x = kd * a / a_;
        return kd / std::pow(1.0 + std::pow(x, c_), 1.0 + 1.0 / c_) + b_;
    }
    case joint_law_kind::multilinear: {
        const auto it = std::upper_bound(points_.begin(), points_.end(), a,
                                         [](double v, const law_point& p) { return v < p.rotation; });
        if (it == points_.end()) return 0;
        const law_point& lo = *(it - 1);
        const law_point& hi = *it;
        return (hi.moment - lo.moment) / (hi.rotation - lo.rotation);
    }
    }
    return 0;
}

double joint_law::moment(double rotation) const
{
    const double a = std::abs(rotation) - slip_;
    if (!(a > 0)) return 0;
    double m = uncapped(a);
    if (cap_) m = std::min(m, *cap_);
    return rotation < 0 ? -m : m;
}

double joint_law::tangent(double rotation) const
{
    const double a = std::abs(rotation) - slip_;
    if (a < 0) return 0;
    if (kind_ == joint_law_kind::ec3_curve && k_ * a > 2.0 / 3.0 * b_) {
        // One evaluation of the curve serves the cap test and the slope
        // (uncapped_slope would evaluate it again).
        const double m = uncapped(a);
        if (cap_ && m >= *cap_) return 0;
        return m / ((1.0 + a_) * a);
    }
    if (cap_ && uncapped(a) >= *cap_) return 0;
    return uncapped_slope(a);
}

double joint_law::secant(double rotation) const
{
    if (rotation == 0) return slip_ > 0 ? 0 : uncapped_slope(0);
    return moment(rotation) / rotation;
}

std::optional<double> joint_law::rotation_at_cap() const
{
    if (!cap_) return std::nullopt;
    const double M = *cap_;
    switch (kind_) {
    case joint_law_kind::linear:
        if (k_ == 0) return std::nullopt;
        return slip_ + M / k_;
    case joint_law_kind::ec3_eta:
        if (k_ == 0) return std::nullopt;
        return slip_ + M * a_ / k_;
    case joint_law_kind::ec3_curve:
        if (M >= b_) return slip_ + b_ * std::pow(1.5, a_) / k_;  // mu = 1.5^psi at M_j,Rd
        break;
    default: break;
    }
    // The other laws rise monotonically (richard-abbott without bound when
    // k_p > 0): bracket, then bisect.
    double hi = M / k_;
    for (int i = 0; i < 200 && uncapped(hi) < M; ++i) hi *= 2;
    if (uncapped(hi) < M) return std::nullopt;
    double lo = 0;
    for (int i = 0; i < 200 && hi - lo > 1e-15 * hi; ++i) {
        const double mid = 0.5 * (lo + hi);
        (uncapped(mid) < M ? lo : hi) = mid;
    }
    return slip_ + hi;
}

joint_law joint_law::with_initial_stiffness(double s) const
{
    require(non_negative(s), "the stiffness must be finite and >= 0");
    joint_law j = *this;
    if (k_ == 0) {
        require(kind_ == joint_law_kind::linear || kind_ == joint_law_kind::ec3_eta,
                "a law with no initial stiffness cannot be scaled");
        j.k_ = s;
        return j;
    }
    const double f = s / k_;
    require(f > 0 || kind_ == joint_law_kind::linear || kind_ == joint_law_kind::ec3_eta,
            "this law needs an initial stiffness > 0");
    j.k_ = s;
    if (kind_ == joint_law_kind::richard_abbott) j.b_ = b_ * f;
    if (kind_ == joint_law_kind::multilinear)
        for (law_point& p : j.points_) p.rotation /= f;
    return j;
}

joint_law joint_law::from(const joint_behaviour& b, double initial_stiffness, std::optional<double> moment_resistance)
{
    switch (b.law) {
    case joint_law_kind::linear: return linear(initial_stiffness, moment_resistance);
    case joint_law_kind::ec3_curve:
        if (!moment_resistance) throw std::invalid_argument("the ec3-curve law needs the moment resistance");
        return ec3_curve(initial_stiffness, *moment_resistance, b.psi);
    case joint_law_kind::ec3_eta: return ec3_eta(initial_stiffness, b.eta, moment_resistance);
    case joint_law_kind::power: return power(initial_stiffness, b.ultimate_moment, b.shape, moment_resistance);
    case joint_law_kind::richard_abbott:
        // The project's range is checked to lie above k_p (project_input); a
        // sweep, a threshold search or a sampled stiffness can go below it.
        // There the plastic branch cannot be stiffer than the joint, so the
        // law is taken as linear at S_j,ini: the curve's own limit as k_p
        // reaches S_j,ini, and the stiffer (more moment-attracting) reading.
        return richard_abbott(initial_stiffness, b.reference_moment, std::min(b.plastic_stiffness, initial_stiffness),
                              b.shape, moment_resistance);
    case joint_law_kind::multilinear: {
        std::vector<law_point> pts;
        for (const auto& [theta, m] : b.points) pts.push_back({theta, m});
        return multilinear(std::move(pts), b.slip, moment_resistance);
    }
    }
    return linear(initial_stiffness, moment_resistance);
}

joint_law joint_law::capped_at(double cap) const
{
    require(positive(cap), "the cap must be finite and > 0");
    joint_law j = *this;
    j.cap_ = cap_ ? std::min(*cap_, cap) : cap;
    return j;
}

}  // namespace pinproof
