// Small real polynomials (degree <= 5) used inside beam elements.
#pragma once

#include <array>
#include <vector>

namespace pinproof::polynomial {

using coefficients = std::array<double, 6>;  // c[0] + c[1] s + ... + c[5] s^5

double value(const coefficients& c, double s);
coefficients derivative(const coefficients& c);

// Every real root of c in [a, b], each found by bisection on an interval where
// c is monotone (the intervals come from the roots of the derivative, found the
// same way), so that no root between two samples is missed.
std::vector<double> roots_in(const coefficients& c, double a, double b);

}  // namespace pinproof::polynomial
