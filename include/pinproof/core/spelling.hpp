// "Did you mean" for a misspelt name: the known names nearest to it.
//
// Nearness is the edit distance (Levenshtein: insertions, deletions and
// substitutions of one byte each, compared without case). Only names at most
// 2 edits away, and at most half the name's length away, are offered,
// and only those at the smallest distance found, so that a name one edit away
// is not listed beside names two away (the rule of similar_catalogue_sections
// in section.hpp).
#pragma once

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

namespace pinproof {


// The nearest known names, at most `most`, in the order of `known`.
std::vector<std::string> similar_names(std::string_view name, const std::vector<std::string>& known,
                                       std::size_t most = 3);

// "; did you mean \"A\" or \"B\"?" for the similar names, or "" when none is near.
std::string did_you_mean(std::string_view name, const std::vector<std::string>& known);

}  // namespace pinproof
