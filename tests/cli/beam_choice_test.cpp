// Verification of choosing a beam by id (src/cli/beam_choice.cpp).
// Reference: Levenshtein edit distance (V. I. Levenshtein, 1966; the textbook
// dynamic programme), counted by hand for the cases below.
// No numerical tolerance: ids compared exactly.
#include <doctest/doctest.h>

#include <string>
#include <vector>

#include "beam_choice.hpp"

TEST_CASE("nearest ids [Levenshtein] - the closest ids first and at most the count asked")
{
    std::vector<std::string> ids;
    for (int i = 0; i < 10000; ++i) ids.push_back("B-" + std::to_string(10000 + i).substr(1));
    const auto near = pinproof::cli::nearest_ids(ids, "B-1234X", 5);
    REQUIRE(near.size() == 5);
    CHECK(near.front() == "B-1234");  // one deletion
    CHECK(pinproof::cli::nearest_ids({"MZ-C/3-4", "MZ-D/3-4"}, "MZ-D/3-5", 5) ==
          std::vector<std::string>{"MZ-D/3-4", "MZ-C/3-4"});  // distances 1 and 2
}
