#include "pinproof/core/spelling.hpp"

#include "pinproof/core/edit_distance.hpp"

#include <algorithm>
#include <cctype>

namespace pinproof {

std::vector<std::string> similar_names(std::string_view name, const std::vector<std::string>& known, std::size_t most)
{
    // Names far longer than any known one are not misspellings (and would cost time).
    if (name.size() > 200) return {};
    const std::size_t limit = std::min<std::size_t>(2, std::max<std::size_t>(1, name.size() / 2));
    std::vector<std::pair<std::size_t, const std::string*>> near;
    for (const auto& k : known) {
        const std::size_t d = edit_distance_ignoring_case(name, k);
        if (d <= limit && k != name) near.emplace_back(d, &k);
    }
    std::size_t best = limit + 1;
    for (const auto& n : near) best = std::min(best, n.first);
    std::vector<std::string> out;
    for (const auto& [d, k] : near) {
        if (out.size() == most) break;
        if (d == best) out.push_back(*k);
    }
    return out;
}

std::string did_you_mean(std::string_view name, const std::vector<std::string>& known)
{
    const auto similar = similar_names(name, known);
    std::string out;
    for (std::size_t i = 0; i < similar.size(); ++i)
        out += (i == 0 ? "; did you mean \"" : i + 1 == similar.size() ? "\" or \"" : "\", \"") + similar[i];
    return similar.empty() ? out : out + "\"?";
}

}  // namespace pinproof
