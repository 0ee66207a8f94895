#include "pinproof/core/edit_distance.hpp"

#include <algorithm>
#include <cctype>
#include <vector>

namespace pinproof {
namespace {

// The textbook dynamic programme, one row at a time.
template <class Same>
std::size_t levenshtein(std::string_view a, std::string_view b, Same same)
{
    std::vector<std::size_t> row(b.size() + 1);
    for (std::size_t j = 0; j <= b.size(); ++j) row[j] = j;
    for (std::size_t i = 1; i <= a.size(); ++i) {
        std::size_t diagonal = row[0];
        row[0] = i;
        for (std::size_t j = 1; j <= b.size(); ++j) {
            const std::size_t above = row[j];
            row[j] = std::min({row[j] + 1, row[j - 1] + 1, diagonal + (same(a[i - 1], b[j - 1]) ? 0 : 1)});
            diagonal = above;
        }
    }
    return row[b.size()];
}

}  // namespace

std::size_t edit_distance(std::string_view a, std::string_view b)
{
    return levenshtein(a, b, [](char x, char y) { return x == y; });
}

std::size_t edit_distance_ignoring_case(std::string_view a, std::string_view b)
{
    const auto lower = [](char c) { return std::tolower(static_cast<unsigned char>(c)); };
    return levenshtein(a, b, [&](char x, char y) { return lower(x) == lower(y); });
}

}  // namespace pinproof
