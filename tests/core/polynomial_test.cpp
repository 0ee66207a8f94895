// Verification of the real-root search on element polynomials (src/polynomial.hpp),
// which finds the extremes of bending moment and deflection in every state.
//
// References: polynomials built from chosen roots, so the roots are known
// exactly by construction (common practice, no source); the cancellation case
// of the quadratic formula, Press et al., Numerical Recipes, 3rd ed., 2007, 5.6.
// Tolerances are relative to the root unless stated.
#include <doctest/doctest.h>

#include <cmath>
#include <vector>

#include "core/polynomial.hpp"

using namespace pinproof;
using polynomial::coefficients;

namespace {

// c[0] + c[1] s + ... for the product of (s - r_i), times `scale`.
coefficients from_roots(const std::vector<double>& roots, double scale = 1.0)
{
    coefficients c{};
    c[0] = scale;
    int degree = 0;
    for (double r : roots) {
        coefficients next{};
        for (int i = 0; i <= degree; ++i) {
            next[i + 1] += c[i];
            next[i] -= r * c[i];
        }
        c = next;
        ++degree;
    }
    return c;
}

std::vector<double> found(const coefficients& c, double a, double b)
{
    const auto r = polynomial::roots_in(c, a, b);
    return std::vector<double>(r.begin(), r.end());
}

void check_roots(const std::vector<double>& got, const std::vector<double>& expected, double tol)
{
    REQUIRE(got.size() == expected.size());
    for (std::size_t i = 0; i < got.size(); ++i) CHECK(std::abs(got[i] - expected[i]) <= tol * std::max(1.0, std::abs(expected[i])));
}

}  // namespace

TEST_CASE("roots by construction - degrees 1 to 5 - every root in the interval - ascending - tol 1e-12 (common practice - no source)")
{
    check_roots(found(from_roots({0.7}), 0, 1), {0.7}, 1e-15);
    check_roots(found(from_roots({0.3, 0.8}, -2.5), 0, 1), {0.3, 0.8}, 1e-14);
    check_roots(found(from_roots({0.1, 0.45, 0.9}, 3.0), 0, 1), {0.1, 0.45, 0.9}, 1e-12);
    check_roots(found(from_roots({0.2, 0.4, 0.6, 0.8}), 0, 1), {0.2, 0.4, 0.6, 0.8}, 1e-12);
    check_roots(found(from_roots({1, 2, 3, 4, 5}, 1e-7), 0, 6), {1, 2, 3, 4, 5}, 1e-12);
    // Only the roots inside [a, b]; a root on a bound counts.
    check_roots(found(from_roots({1, 2, 3, 4, 5}), 1.5, 4), {2, 3, 4}, 1e-12);
    check_roots(found(from_roots({0.25, 0.75}), 0.25, 0.5), {0.25}, 1e-15);  // exact in binary
}

TEST_CASE("quadratic with cancellation [Press et al. 2007 - 5.6]: s^2 - (1e8 + 1e-8) s + 1 has roots 1e-8 and 1e8 - tol 1e-15")
{
    const coefficients c{1.0, -(1e8 + 1e-8), 1.0, 0, 0, 0};
    check_roots(found(c, 0, 1e9), {1e-8, 1e8}, 1e-15);
    CHECK(std::abs(found(c, 0, 1)[0] - 1e-8) <= 1e-15 * 1e-8);
}

TEST_CASE("no real root - constant - and a double root (common practice - no source)")
{
    CHECK(found({1.0, 0.0, 1.0, 0, 0, 0}, -5, 5).empty());   // s^2 + 1
    CHECK(found({2.0, 0, 0, 0, 0, 0}, -5, 5).empty());       // constant
    CHECK(found({0.0, 0, 0, 0, 0, 0}, -5, 5).empty());       // zero: no isolated roots
    check_roots(found(from_roots({0.5, 0.5}), 0, 1), {0.5}, 1e-15);      // touching the axis
    check_roots(found(from_roots({0.25, 0.25, 0.25}), 0, 1), {0.25}, 1e-5);  // triple root: ill-conditioned
}
