// Verification of the number format of SVG coordinates (src/report/svg_number.cpp).
// Reference: C's printf %.Nf (ISO C 7.21.6.1, rounding to nearest), with values
// below half a unit of the last place written as zero: common practice, no source.
#include <doctest/doctest.h>

#include <limits>

#include "pinproof/core/errors.hpp"
#include "report/svg_number.hpp"

using namespace pinproof;

TEST_CASE("svg_number: fixed decimals - no negative zero - non-finite refused - exact text")
{
    // | value      | decimals | text     |
    CHECK(svg_number(12.34) == "12.3");
    CHECK(svg_number(12.36) == "12.4");
    CHECK(svg_number(-7.25, 2) == "-7.25");
    CHECK(svg_number(0.0) == "0.0");
    CHECK(svg_number(-0.04) == "0.0");      // not "-0.0"
    CHECK(svg_number(-0.004, 2) == "0.00");  // not "-0.00"
    CHECK(svg_number(-0.06) == "-0.1");
    CHECK(svg_number(480.0, 0) == "480");
    CHECK_THROWS_AS(svg_number(std::numeric_limits<double>::quiet_NaN()), internal_error);
    CHECK_THROWS_AS(svg_number(std::numeric_limits<double>::infinity()), internal_error);
}
