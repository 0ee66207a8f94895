#include "pinproof/joints/law_fit.hpp"

#include <Eigen/Dense>
#include <algorithm>
#include <cmath>
#include <functional>
#include <stdexcept>

namespace pinproof {
namespace {

void validate(const std::vector<law_point>& points, std::size_t parameters)
{
    if (points.size() < parameters + 1)
        throw std::invalid_argument("a fit of " + std::to_string(parameters) + " parameters needs at least " +
                                    std::to_string(parameters + 1) + " points");
    double largest = 0;
    for (const law_point& p : points) {
        if (!(std::isfinite(p.rotation) && p.rotation > 0))
            throw std::invalid_argument("every rotation must be finite and > 0");
        if (!(std::isfinite(p.moment) && p.moment >= 0))
            throw std::invalid_argument("every moment must be finite and >= 0");
        largest = std::max(largest, p.moment);
    }
    if (!(largest > 0)) throw std::invalid_argument("the points carry no moment");
}

using law_of = std::function<joint_law(const Eigen::VectorXd&)>;

// Levenberg-Marquardt with a forward-difference Jacobian in the (log)
// parameters q; returns the best q.
Eigen::VectorXd levenberg_marquardt(const std::vector<law_point>& points, const law_of& law, Eigen::VectorXd q,
                                    int& iterations)
{
    const auto n = static_cast<Eigen::Index>(points.size());
    auto residuals = [&](const Eigen::VectorXd& p, Eigen::VectorXd& r) {
        try {
            const joint_law l = law(p);
            for (Eigen::Index i = 0; i < n; ++i) r[i] = l.moment(points[i].rotation) - points[i].moment;
            return r.allFinite();
        } catch (const std::invalid_argument&) {
            return false;
        }
    };
    Eigen::VectorXd r(n), trial_r(n);
    if (!residuals(q, r)) throw std::runtime_error("the starting point of the fit is outside the law's domain");
    double cost = r.squaredNorm(), mu = 1e-3;
    Eigen::MatrixXd J(n, q.size());
    for (iterations = 0; iterations < 500; ++iterations) {
        for (Eigen::Index k = 0; k < q.size(); ++k) {
            Eigen::VectorXd qk = q;
            const double h = 1e-7 * std::max(1.0, std::abs(q[k]));
            qk[k] += h;
            if (!residuals(qk, trial_r)) {
                qk[k] = q[k] - h;
                if (!residuals(qk, trial_r)) throw std::runtime_error("the fit left the law's domain");
                J.col(k) = (r - trial_r) / h;
            } else {
                J.col(k) = (trial_r - r) / h;
            }
        }
        const Eigen::MatrixXd A = J.transpose() * J;
        const Eigen::VectorXd g = J.transpose() * r;
        bool improved = false;
        for (int tries = 0; tries < 40 && !improved; ++tries) {
            Eigen::MatrixXd damped = A;
            damped.diagonal() += mu * A.diagonal().cwiseMax(1e-12);
            const Eigen::VectorXd step = damped.ldlt().solve(-g);
            const Eigen::VectorXd next = q + step;
            if (step.allFinite() && residuals(next, trial_r) && trial_r.squaredNorm() < cost) {
                const double gain = cost - trial_r.squaredNorm();
                q = next;
                r = trial_r;
                cost = r.squaredNorm();
                mu = std::max(mu / 3, 1e-12);
                improved = true;
                if (gain <= 1e-15 * cost || step.norm() <= 1e-12 * (1 + q.norm())) return q;
            } else {
                mu *= 4;
            }
        }
        if (!improved) return q;  // no step lowers the cost: a minimum to working precision
    }
    throw std::runtime_error("the fit did not converge in 500 iterations");
}

double rms(const std::vector<law_point>& points, const joint_law& l)
{
    double s = 0;
    for (const law_point& p : points) s += std::pow(l.moment(p.rotation) - p.moment, 2);
    return std::sqrt(s / static_cast<double>(points.size()));
}

// Starting values: the steepest secant of the first points as the initial
// stiffness, the largest moment as the moment scale.
double start_stiffness(const std::vector<law_point>& points)
{
    double k = 0;
    for (const law_point& p : points) k = std::max(k, p.moment / p.rotation);
    return 1.2 * k;
}

double largest_moment(const std::vector<law_point>& points)
{
    double m = 0;
    for (const law_point& p : points) m = std::max(m, p.moment);
    return m;
}

}  // namespace

law_fit fit_power_law(const std::vector<law_point>& points)
{
    validate(points, 3);
    law_of law = [](const Eigen::VectorXd& q) {
        return joint_law::power(std::exp(q[0]), std::exp(q[1]), std::exp(q[2]));
    };
    Eigen::VectorXd q(3);
    q << std::log(start_stiffness(points)), std::log(1.1 * largest_moment(points)), std::log(1.5);
    law_fit out{joint_law::linear(0), 0, 0};
    q = levenberg_marquardt(points, law, q, out.iterations);
    out.law = law(q);
    out.rms_error = rms(points, out.law);
    return out;
}

law_fit fit_richard_abbott_law(const std::vector<law_point>& points)
{
    validate(points, 4);
    // k_p = k / (1 + exp(-q3)) keeps 0 < k_p < k.
    law_of law = [](const Eigen::VectorXd& q) {
        const double k = std::exp(q[0]);
        return joint_law::richard_abbott(k, std::exp(q[1]), k / (1 + std::exp(-q[3])), std::exp(q[2]));
    };
    const double k0 = start_stiffness(points);
    // Hardening from the last two points, as a fraction of k.
    std::vector<law_point> sorted = points;
    std::sort(sorted.begin(), sorted.end(), [](const law_point& a, const law_point& b) { return a.rotation < b.rotation; });
    const law_point& a = sorted[sorted.size() - 2];
    const law_point& b = sorted.back();
    const double kp = std::clamp((b.moment - a.moment) / (b.rotation - a.rotation), 1e-4 * k0, 0.5 * k0);
    Eigen::VectorXd q(4);
    q << std::log(k0), std::log(largest_moment(points)), std::log(1.5), -std::log(k0 / kp - 1);
    law_fit out{joint_law::linear(0), 0, 0};
    q = levenberg_marquardt(points, law, q, out.iterations);
    out.law = law(q);
    out.rms_error = rms(points, out.law);
    return out;
}

}  // namespace pinproof
