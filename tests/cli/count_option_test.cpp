// Verification of the count options' validator (src/cli/count_option.cpp).
// Reference: docs/robustness.md, "Resources" (the ranges are the project's
// own; common practice, no source, for refusing with one readable line).
// No numerical tolerance: whole numbers compared exactly.
#include <doctest/doctest.h>

#include <string>

#include "count_option.hpp"

namespace {

std::string judged(const std::string& text, std::uint64_t low = 0, std::uint64_t high = 256)
{
    std::string t = text;
    const std::string e = pinproof::cli::count_range(low, high)(t);
    return e.empty() ? "ok " + t : e;
}

}  // namespace

TEST_CASE("count range - whole numbers within the range are accepted as written")
{
    CHECK(judged("0") == "ok 0");
    CHECK(judged("256") == "ok 256");
    CHECK(judged(" 16 ") == "ok 16");
}

TEST_CASE("count range - negatives and fractions and huge values are refused in one short line")
{
    CHECK(judged("-1") == "expected a whole number from 0 to 256, found \"-1\"");
    CHECK(judged("257") == "expected a whole number from 0 to 256, found 257");
    CHECK(judged("1e3") == "expected a whole number from 0 to 256, found \"1e3\"");
    CHECK(judged("") == "expected a whole number from 0 to 256, found nothing");
    CHECK(judged(std::string(309, '9')) == "expected a whole number from 0 to 256, found a number of 309 digits");
    CHECK(judged("18446744073709551616") ==
          "expected a whole number from 0 to 256, found 18446744073709551616");  // 2^64: no wrap-around
    CHECK(judged("1", 2, 1000) == "expected a whole number from 2 to 1000, found 1");
}
