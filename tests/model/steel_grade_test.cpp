// Verification table: steel grades (include/pinproof/model/steel_grade.hpp).
// Sources:
//   [EN10025-2]  EN 10025-2:2019 Table 7, minimum yield and tensile strengths
//                by nominal thickness (from memory; reference pack 10.4 gives
//                S275: 275 to 16 mm, 265 to 40 mm, 255 to 63 mm, fu 410 MPa)
//   [AISC-2-4]   AISC Steel Construction Manual Table 2-4 (A36 36/58 ksi,
//                A572 Gr. 50 and A992 50/65 ksi; reference pack 10.3, from memory)
#include <doctest/doctest.h>

#include <stdexcept>

#include "pinproof/model/steel_grade.hpp"

using namespace pinproof;

namespace {
steel_material grade(steel_grade g) { return steel_material{g, 0, 0}; }
constexpr double MPa = 1e6;
constexpr double ksi = 6.894757293168361e6;
}  // namespace

TEST_CASE("S275 yield strength by thickness [EN10025-2 Table 7 - pack 10.4]: 275 - 265 - 255 MPa - tol exact")
{
    const auto s = grade(steel_grade::s275);
    CHECK(s.fy(10e-3) == doctest::Approx(275 * MPa).epsilon(1e-15));
    CHECK(s.fy(16e-3) == doctest::Approx(275 * MPa).epsilon(1e-15));  // the step's upper bound belongs to it
    CHECK(s.fy(16.1e-3) == doctest::Approx(265 * MPa).epsilon(1e-15));
    CHECK(s.fy(40e-3) == doctest::Approx(265 * MPa).epsilon(1e-15));
    CHECK(s.fy(63e-3) == doctest::Approx(255 * MPa).epsilon(1e-15));
    CHECK(s.fu(20e-3).value() == doctest::Approx(410 * MPa).epsilon(1e-15));
}

TEST_CASE("S235 - S355 - S460 first steps [EN10025-2 Table 7 - from memory]: fy and fu - tol exact")
{
    CHECK(grade(steel_grade::s235).fy(8e-3) == doctest::Approx(235 * MPa));
    CHECK(grade(steel_grade::s355).fy(8e-3) == doctest::Approx(355 * MPa));
    CHECK(grade(steel_grade::s355).fy(30e-3) == doctest::Approx(345 * MPa));
    CHECK(grade(steel_grade::s460).fy(30e-3) == doctest::Approx(440 * MPa));
    CHECK(grade(steel_grade::s355).fu(10e-3).value() == doctest::Approx(470 * MPa));
}

TEST_CASE("US grades [AISC-2-4 - from memory]: A36 36/58 ksi - A572-50 and A992 50/65 ksi - tol exact")
{
    CHECK(grade(steel_grade::a36).fy(0.5 * 0.0254) == doctest::Approx(36 * ksi));
    CHECK(grade(steel_grade::a36).fu(0.5 * 0.0254).value() == doctest::Approx(58 * ksi));
    CHECK(grade(steel_grade::a572_50).fy(0.02) == doctest::Approx(50 * ksi));
    CHECK(grade(steel_grade::a992).fu(0.02).value() == doctest::Approx(65 * ksi));
    CHECK(is_us_grade(steel_grade::a992));
    CHECK_FALSE(is_us_grade(steel_grade::s355));
}

TEST_CASE("grade names round-trip and thickness beyond the table is refused [SELF]")
{
    for (const auto& n : steel_grade_names()) CHECK(to_string(*parse_steel_grade(n)) == n);
    CHECK_FALSE(parse_steel_grade("S270").has_value());
    CHECK_THROWS_AS(grade(steel_grade::s275).fy(0.2), std::invalid_argument);
    const steel_material user{steel_grade::user, 300 * MPa, 0};
    CHECK(user.fy(0.01) == doctest::Approx(300 * MPa));
    CHECK_FALSE(user.fu(0.01).has_value());
}
