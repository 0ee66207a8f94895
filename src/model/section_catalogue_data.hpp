// The section catalogue text, src/data/sections.csv, compiled into the
// library so that the program needs no data files at run time. The defining
// source file is generated from the CSV by the build.
#pragma once

namespace pinproof::detail {
extern const char section_catalogue_csv[];
}  // namespace pinproof::detail

#include <string_view>
#include <vector>

#include "pinproof/model/section.hpp"

namespace pinproof::detail {
// Parses catalogue text in the format documented at the top of
// src/data/sections.csv, converting lengths to metres. A malformed line is an
// internal_error naming the line and column: the catalogue is part of the
// program, not user input.
std::vector<section_dimensions> parse_section_catalogue(std::string_view text);
}  // namespace pinproof::detail
