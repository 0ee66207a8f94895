// Small real polynomials (degree <= 5) used inside beam elements.
#pragma once

#include <array>

namespace pinproof::polynomial {

using coefficients = std::array<double, 6>;  // c[0] + c[1] s + ... + c[5] s^5

double value(const coefficients& c, double s);
coefficients derivative(const coefficients& c);

// At most five real roots, ascending, kept on the stack: the beam engine asks
// for roots several times per state.
struct root_list {
    std::array<double, 6> v{};
    int n = 0;
    const double* begin() const { return v.data(); }
    const double* end() const { return v.data() + n; }
};

// Every real root of c in [a, b]. Degrees 1 and 2 in closed form; above, each
// root is found on an interval where c is monotone (the intervals come from the
// roots of the derivative, found the same way), so that no root between two
// samples is missed.
root_list roots_in(const coefficients& c, double a, double b);

}  // namespace pinproof::polynomial
