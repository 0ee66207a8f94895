// The demand on the supporting member, against hand-worked cases.
//
// Sources:
//   [4.7.7]  BS 5950-1:2000 4.7.7 and the complementary information for Eurocode simple
//            construction (reference pack 11.3, confirmed): the reaction 100 mm from the face of
//            the column, the net moment shared by the column lengths above and below in
//            proportion to EI/L.
//   [hand]   the cases worked out in the test.
#include <doctest/doctest.h>

#include <cmath>
#include <stdexcept>

#include "pinproof/checks/support_demand.hpp"

using namespace pinproof;

TEST_CASE("nominal eccentricity [4.7.7]: 100 mm from a column face - the bolt line for a beam-web fin plate")
{
    CHECK(default_support_eccentricity(nullptr) == 0.100);
    connection_detail d;
    d.support = support_type::column_flange;
    CHECK(default_support_eccentricity(&d) == 0.100);
    d.support = support_type::beam_web;
    d.gap = 0.012;
    d.bolts.bolt_line = 0.050;
    CHECK(std::abs(default_support_eccentricity(&d) - 0.062) <= 1e-15);
}

TEST_CASE("moment on the support [hand]: 13.86 kN*m joint moment and 87.75 kN at 100 mm give 22.635 kN*m - tol 1e-12")
{
    const support_demand s = demand_on_support(13.86e3, 87.75e3, 0.100, std::nullopt, false);
    CHECK(std::abs(s.moment - 22.635e3) <= 1e-12 * 22.635e3);
    CHECK_FALSE(s.torsion);
    CHECK_FALSE(s.moment_above);
}

TEST_CASE("column split [4.7.7] [hand]: 3.5 m above and 4.2 m below of the same section share 6/11 and 5/11 - tol 1e-12")
{
    // I/L: 1/3.5 and 1/4.2, in the ratio 4.2 : 3.5 = 6 : 5.
    const support_column c{1e-4, 3.5, 1e-4, 4.2};
    const support_demand s = demand_on_support(10e3, 50e3, 0.1, c, false);
    CHECK(std::abs(*s.moment_above - 15e3 * 6 / 11) <= 1e-12 * 15e3);
    CHECK(std::abs(*s.moment_below - 15e3 * 5 / 11) <= 1e-12 * 15e3);
    // A roof column: all of it below.
    const support_demand roof = demand_on_support(10e3, 50e3, 0.1, support_column{0, 0, 1e-4, 4.2}, false);
    CHECK(*roof.moment_below == roof.moment);
    CHECK(*roof.moment_above == 0.0);
}

TEST_CASE("beam-web support [hand]: the moment twists the supporting beam - torsion = moment")
{
    const support_demand s = demand_on_support(5e3, 40e3, 0.062, std::nullopt, true);
    REQUIRE(s.torsion);
    CHECK(std::abs(*s.torsion - (5e3 + 40e3 * 0.062)) <= 1e-9);
}

TEST_CASE("bad values are refused [project rules]")
{
    CHECK_THROWS_AS(demand_on_support(1, 1, -0.1, std::nullopt, false), std::invalid_argument);
    CHECK_THROWS_AS(demand_on_support(1, 1, 0.1, support_column{0, 0, 0, 0}, false), std::invalid_argument);
    CHECK_THROWS_AS(demand_on_support(std::nan(""), 1, 0.1, std::nullopt, false), std::invalid_argument);
}
