// The Levenshtein distance between two texts: the fewest insertions, deletions
// and substitutions of one character that turn one into the other (V. I.
// Levenshtein, 1966). Used to name the nearest known names (sections, beam ids)
// when a name is not found.
#pragma once

#include <cstddef>
#include <string>

namespace pinproof {

std::size_t edit_distance(const std::string& a, const std::string& b);

}  // namespace pinproof
