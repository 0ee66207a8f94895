// The uncertainty of a joint's rotational stiffness as a probability
// distribution, and the reader of its project-file form
// ("stiffness_distribution", docs/method/sweep-and-probability.md).
//
// Kinds and parameters (all stiffnesses in N*m/rad):
//   lognormal   : ln S ~ Normal(mu, sigma). Given as `median` and `cov`
//                 (mu = ln median, sigma^2 = ln(1 + cov^2)), or as the
//                 fractiles `p05` and `p95` (mu = mean of their logs,
//                 sigma = (ln p95 - ln p05) / (2 z_0.95)).
//   uniform-log : ln S uniform between ln `min` and ln `max`.
//   normal      : Normal(`mean`, `sd`) truncated at zero (a stiffness is
//                 never negative): F(S) = (Phi((S-m)/sd) - Phi(-m/sd)) / Phi(m/sd).
#pragma once


#include <optional>
#include <string>

#include "pinproof/core/errors.hpp"

namespace pinproof {

// The 5 % and 95 % fractiles, N*m/rad.
struct fractile_bounds {
    double p05 = 0, p95 = 0;
};

enum class distribution_kind { lognormal, uniform_log, normal };
std::string to_string(distribution_kind k);  // "lognormal", "uniform-log", "normal"

class stiffness_distribution {
public:
    // Throw std::invalid_argument for parameters outside their domain
    // (non-positive stiffness or spread, min not below max, p05 not below p95).
    static stiffness_distribution lognormal(double median, double cov);
    static stiffness_distribution lognormal_from_fractiles(double p05, double p95);
    static stiffness_distribution uniform_log(double min, double max);
    static stiffness_distribution normal(double mean, double sd);

    distribution_kind kind() const noexcept { return kind_; }
    // lognormal: (mu, sigma) of ln S; uniform-log: (ln min, ln max); normal: (mean, sd).
    double first() const noexcept { return a_; }
    double second() const noexcept { return b_; }

    double cdf(double S) const;
    double pdf(double S) const;
    // The stiffness of non-exceedance probability u, 0 < u < 1.
    double quantile(double u) const;
    double median() const { return quantile(0.5); }

    // The 5 % to 95 % fractile range, used by `check` where no range is given
    // (as {stiffness::spring(p05), stiffness::spring(p95)}).
    fractile_bounds fractile_range() const;

    // One line for reports, e.g. "lognormal, median 1000 N*m/rad, sigma_ln 0.294".
    std::string describe() const;

private:
    stiffness_distribution(distribution_kind k, double a, double b) : kind_(k), a_(a), b_(b) {}
    distribution_kind kind_ = distribution_kind::lognormal;
    double a_ = 0, b_ = 0;
};

// The distributions of the two joints of a beam and their correlation.
struct stiffness_uncertainty {
    std::optional<stiffness_distribution> start, end;
    int correlation = 1;  // 1: one draw for both ends; 0: independent ends
    bool any() const { return start.has_value() || end.has_value(); }
};

}  // namespace pinproof
