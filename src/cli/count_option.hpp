// Count options (--points, --jobs, --monte-carlo): whole numbers within a
// documented range, refused outside it with one readable line. The check runs
// on the text, before CLI11 converts it, so "-1" never wraps to 2^64 - 1 and
// a 400-digit number is named as out of range rather than printed back.
#pragma once

#include <CLI/CLI.hpp>

#include <cstdint>

namespace pinproof::cli {

// A validator accepting the decimal whole numbers from `low` to `high`.
CLI::Validator count_range(std::uint64_t low, std::uint64_t high);

}  // namespace pinproof::cli
