// Verification of core/spelling: "did you mean" for misspelt names.
//
// References:
//   [LEV] V. I. Levenshtein, "Binary codes capable of correcting deletions,
//         insertions and reversals", Soviet Physics Doklady 10 (1966) 707:
//         the edit distance; kitten -> sitting is 3 (a standard example).
// Every case is exact.
#include <doctest/doctest.h>

#include "pinproof/core/edit_distance.hpp"
#include "pinproof/core/spelling.hpp"

using namespace pinproof;

TEST_CASE("edit distance [LEV]: kitten to sitting is 3 - and case is ignored - exact")
{
    CHECK(edit_distance_ignoring_case("kitten", "sitting") == 3);
    CHECK(edit_distance_ignoring_case("Span", "span") == 0);
    CHECK(edit_distance_ignoring_case("", "abc") == 3);
}

TEST_CASE("did you mean [LEV]: only the nearest names within 2 edits are offered - exact")
{
    const std::vector<std::string> keys{"stiffness", "stiffness_distribution", "moment_resistance", "id", "type"};
    CHECK(did_you_mean("stifness", keys) == "; did you mean \"stiffness\"?");
    CHECK(did_you_mean("tpye", keys) == "; did you mean \"type\"?");
    CHECK(did_you_mean("colour", keys).empty());
    CHECK(did_you_mean("FP-2-M2O", {"FP-2-M20", "FP-3-M20", "WC-2-M20"}) == "; did you mean \"FP-2-M20\"?");
    CHECK(did_you_mean("FP-4-M20", {"FP-2-M20", "FP-3-M20"}) == "; did you mean \"FP-2-M20\" or \"FP-3-M20\"?");
}
