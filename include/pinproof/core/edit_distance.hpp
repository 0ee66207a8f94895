// The Levenshtein distance between two texts: the fewest insertions, deletions
// and substitutions of one character that turn one into the other (V. I.
// Levenshtein, 1966). Used to name the nearest known names (sections, beam ids)
// when a name is not found.
#pragma once

#include <cstddef>
#include <string>
#include <string_view>

namespace pinproof {

std::size_t edit_distance(std::string_view a, std::string_view b);
// The same with upper and lower case counted as one letter (ASCII).
std::size_t edit_distance_ignoring_case(std::string_view a, std::string_view b);

}  // namespace pinproof
