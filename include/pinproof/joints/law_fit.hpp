// Fitting a moment-rotation law to measured (rotation, moment) points of a
// joint test: least squares on the moments, by Levenberg-Marquardt
// (Nocedal and Wright, Numerical Optimization, 2nd ed., 10.3) with the
// parameters on a log scale so that each stays in its domain.
//   power           R_ki, M_u, n (Kishi and Chen 1990)
//   richard-abbott  k, M_0, k_p, n (Richard and Abbott 1975), 0 <= k_p < k
// Units: SI.
#pragma once

#include <vector>

#include "pinproof/joints/joint_law.hpp"

namespace pinproof {

struct law_fit {
    joint_law law;
    double rms_error = 0;  // N*m, root mean square of the moment residuals
    int iterations = 0;
};

// Points need rotation > 0 and moment >= 0, at least as many points as the
// law has parameters, and some moment; throws std::invalid_argument otherwise
// and std::runtime_error when the fit does not converge.
law_fit fit_power_law(const std::vector<law_point>& points);
law_fit fit_richard_abbott_law(const std::vector<law_point>& points);

}  // namespace pinproof
