// Bolt groups under eccentric shear, their moment resistance and stiffness.
//
// Sources:
//   [guide]   the simple-joints design guides' fin plate bolt group formula
//             V_Rd = n F_Rd / sqrt((1 + alpha n)^2 + (beta n)^2), alpha = 0,
//             beta = 6 z/(n (n + 1) p_1); worked example 3 M20 8.8, p_1 = 70 mm,
//             z = 60 mm: beta = 0.43, V_Rd = 173 kN (reference pack 10.2, confirmed).
//   [elastic] the elastic method's M_Rd = F_Rd sum(r^2)/r_max (textbook, from memory;
//             pack 10.2); worked by hand in the test.
//   [T6.11]   EN 1993-1-8 Table 6.11 k_11 and k_12 (from memory; pack 2.3), worked by hand.
//   [geometry] free rotation (d_0 - d)/r_max (pack 10.5, derived).
#include <doctest/doctest.h>

#include <cmath>
#include <stdexcept>

#include "pinproof/joints/bolt.hpp"
#include "pinproof/joints/bolt_group.hpp"

using namespace pinproof;

namespace {
constexpr double kN = 1e3, mm = 1e-3, MPa = 1e6;
}

TEST_CASE("fin plate bolt group [guide]: 3 M20 8.8 p1 70 z 60 gives 173 kN - rounding 0.5 kN")
{
    const bolt_group g(bolt_pattern(3, 70 * mm));
    const double F = en_bolt_shear_resistance(bolt_grade::g8_8, 20 * mm, true);
    CHECK(std::abs(g.shear_resistance(F, 60 * mm) - 173 * kN) <= 0.5 * kN);
}

TEST_CASE("one line of n bolts [guide]: the elastic method equals the guides' formula for n 2 to 10 - tol 1e-12")
{
    const double F = 94.08 * kN, p1 = 70 * mm;
    for (int n = 2; n <= 10; ++n)
        for (double z : {0.0, 40 * mm, 60 * mm, 110 * mm}) {
            const bolt_group g(bolt_pattern(n, p1));
            const double beta = 6 * z / (n * (n + 1) * p1);
            const double guide = n * F / std::sqrt(1 + std::pow(beta * n, 2));
            CHECK(std::abs(g.shear_resistance(F, z) - guide) <= 1e-12 * guide);
        }
}

TEST_CASE("moment resistance [elastic]: 3 bolts at 60 mm give F_Rd 2 (60^2)/60 = 0.12 m F_Rd - tol 1e-12")
{
    const bolt_group g(bolt_pattern(3, 60 * mm));
    CHECK(std::abs(g.moment_resistance(94.08 * kN) - 0.12 * 94.08 * kN) <= 1e-12 * 0.12 * 94.08 * kN);
    CHECK(std::abs(g.polar_moment() - 2 * 0.06 * 0.06) <= 1e-15);
    // Two lines at gauge 90, two rows at 70: r^2 = 45^2 + 35^2 for each of four bolts.
    const bolt_group two(bolt_pattern(2, 70 * mm, 2, 90 * mm));
    CHECK(std::abs(two.polar_moment() - 4 * (0.045 * 0.045 + 0.035 * 0.035)) <= 1e-15);
}

TEST_CASE("free rotation [geometry]: 2 mm clearance over 60 mm gives 33.3 mrad - tol 1e-12")
{
    const bolt_group g(bolt_pattern(3, 60 * mm));
    CHECK(std::abs(g.free_rotation(2 * mm) - 2.0 / 60.0) <= 1e-12);
}

TEST_CASE("component stiffness [T6.11] [hand]: k11 = 16 d^2 f_ub/(E d_M16) and k12 for M20 in a 10 mm plate - tol 1e-12")
{
    const double E = 210e9;
    // k11 = 16 * 20^2 * 800 / (210000 * 16) mm = 1.5238 mm.
    CHECK(std::abs(en_k11_bolt_shear(20 * mm, 800 * MPa, E) - 16.0 * 400 * 800 / (210000.0 * 16) * mm) <= 1e-15);
    // k_b1 = 0.25*40/20 + 0.5 = 1.0, k_b2 = 0.25*70/20 + 0.375 = 1.25, k_t = 1.5*10/16 = 0.9375:
    // k12 = 24 * 1.0 * 0.9375 * 20 * 430 / 210000 mm.
    const double k12 = en_k12_bolt_bearing(20 * mm, 430 * MPa, 10 * mm, 40 * mm, 70 * mm, E);
    CHECK(std::abs(k12 - 24 * 1.0 * 0.9375 * 20 * 430 / 210000.0 * mm) <= 1e-15);
}

TEST_CASE("property: the group's stiffness grows with the number of rows - nothing is NaN [project rules]")
{
    double previous = 0;
    for (int n = 2; n <= 8; ++n) {
        const bolt_group g(bolt_pattern(n, 70 * mm));
        const double S = g.rotational_stiffness(1e8);
        CHECK(S > previous);
        CHECK(std::isfinite(S));
        CHECK(std::isfinite(g.shear_resistance(94 * kN, 60 * mm)));
        previous = S;
    }
    CHECK_THROWS_AS(bolt_group(bolt_pattern(1, 70 * mm)), std::invalid_argument);
    CHECK_THROWS_AS(bolt_group({}), std::invalid_argument);
}
