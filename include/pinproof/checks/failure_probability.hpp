// The probability that each check of a beam does not pass, given the joint
// stiffness as a probability distribution (docs/method/sweep-and-probability.md).
//
// The stiffnesses are mapped to probability space, u = F(S) in (0, 1), where
// the state of a check is a step function. Rather than integrating a
// discontinuous integrand, the steps are located (toms748 on the check's
// margin, threshold.hpp) and the probability masses between them are summed:
//   fully correlated ends (correlation 1, one draw u for both ends,
//     S_start = F_start^-1(u), S_end = F_end^-1(u)):
//     P = total length of the adverse u-intervals, exact up to the root tolerance;
//   independent ends (correlation 0):
//     P = integral over u_start of the conditional 1-D result, by adaptive
//     Gauss-Kronrod (15 points, boost::math::quadrature::gauss_kronrod), split
//     where a one-end threshold meets the edges of the unit square.
// The tails u < 1e-12 and u > 1 - 1e-12 are taken to keep the state at their
// edge; their mass (2e-12 per dimension) is added to the error estimate.
// An end without a distribution is held at each bound of its range in turn,
// and the larger probability is reported.
// "Adverse" is fail, or warn for an advisory check (rotation demand).
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/model/stiffness_distribution.hpp"

namespace pinproof {

struct failure_probability {
    std::string check;   // check id as in assess_beam
    double p_fail = 0;   // probability that the check does not pass
    double error = 0;    // absolute error estimate of p_fail
    std::string method;  // how it was computed
};

// Accuracy aimed at: 1e-6 absolute (the error estimate says what was reached).
// Checks that do not apply are left out. Empty if no end has a distribution.
std::vector<failure_probability> failure_probabilities(const project& p, const beam& b,
                                                       const stiffness_uncertainty& u);

struct monte_carlo_estimate {
    std::string check;
    double p_fail = 0;
    double standard_error = 0;  // sqrt(p (1 - p) / n)
    std::size_t samples = 0;
    std::uint64_t seed = 0;
};

inline constexpr std::uint64_t default_monte_carlo_seed = 20240611;

// Plain Monte Carlo with std::mt19937_64 and the given seed, the same draws on
// every platform (u = (top 53 bits + 0.5) / 2^53). A cross-check of the
// integral, not a replacement for it.
std::vector<monte_carlo_estimate> monte_carlo_probabilities(const project& p, const beam& b,
                                                            const stiffness_uncertainty& u, std::size_t samples,
                                                            std::uint64_t seed = default_monte_carlo_seed);

}  // namespace pinproof
