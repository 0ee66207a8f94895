// Reading measured moment-rotation points (CSV): values in SI, every problem
// at its line and column [project rules: docs/file-format.md, `pinproof fit`].
#include <doctest/doctest.h>

#include <cmath>

#include "pinproof/core/errors.hpp"
#include "pinproof/io/moment_rotation_points.hpp"

using namespace pinproof;

TEST_CASE("points in mixed units are read in SI - the moments' unit system kept [project rules]")
{
    const auto r = read_moment_rotation_points("Rotation , Moment\r\n2.5 mrad,10.4 kN*m\n\n0.005 rad, 18 kN*m\n");
    REQUIRE(r.points.size() == 2);
    CHECK(std::abs(r.points[0].rotation - 2.5e-3) <= 1e-18);
    CHECK(std::abs(r.points[0].moment - 10.4e3) <= 1e-9);
    CHECK(std::abs(r.points[1].rotation - 5e-3) <= 1e-18);
    CHECK(r.system == unit_system::si);
    const auto us = read_moment_rotation_points("rotation,moment\n2 mrad,5 kip*ft\n4 mrad,8 kip*ft\n");
    CHECK(us.system == unit_system::us_customary);
}

TEST_CASE("problems are named at their line and column [project rules]")
{
    try {
        read_moment_rotation_points("rotation,moment\n2 mrad,5 kN\nx,3 kN*m\n-1 mrad,2 kN*m\n1 mrad\n");
        FAIL("expected input_error");
    } catch (const input_error& e) {
        REQUIRE(e.problems().size() == 4);
        CHECK(e.problems()[0].where == "line 2, column 8");
        CHECK(e.problems()[0].message.find("a force") != std::string::npos);
        CHECK(e.problems()[1].where == "line 3, column 1");
        CHECK(e.problems()[2].where == "line 4, column 1");
        CHECK(e.problems()[2].message.find("> 0") != std::string::npos);
        CHECK(e.problems()[3].where == "line 5, column 1");
    }
    CHECK_THROWS_AS(read_moment_rotation_points(""), input_error);
    CHECK_THROWS_AS(read_moment_rotation_points("theta,M\n1 mrad,1 kN*m\n2 mrad,2 kN*m\n"), input_error);
    CHECK_THROWS_AS(read_moment_rotation_points("rotation,moment\n1 mrad,1 kN*m\n"), input_error);
}
