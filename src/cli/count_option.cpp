#include "count_option.hpp"

#include <string>

namespace pinproof::cli {
namespace {

// At most this many characters of a refused value are quoted back.
std::string shown(const std::string& text)
{
    return text.size() <= 24 ? "\"" + text + "\"" : "\"" + text.substr(0, 20) + "...\" (" +
                                                        std::to_string(text.size()) + " characters)";
}

}  // namespace

CLI::Validator count_range(std::uint64_t low, std::uint64_t high)
{
    const std::string range = std::to_string(low) + " to " + std::to_string(high);
    return CLI::Validator(
        [low, high, range](std::string& text) -> std::string {
            const std::string expected = "expected a whole number from " + range + ", found ";
            std::size_t i = 0;
            while (i < text.size() && text[i] == ' ') ++i;
            std::size_t j = text.size();
            while (j > i && text[j - 1] == ' ') --j;
            const std::string t = text.substr(i, j - i);
            if (t.empty()) return expected + "nothing";
            std::uint64_t v = 0;
            bool too_large = false;
            for (char c : t) {
                if (c < '0' || c > '9') return expected + shown(text);
                if (!too_large) {
                    const unsigned d = static_cast<unsigned>(c - '0');
                    if (v > (UINT64_MAX - d) / 10) too_large = true;
                    else v = v * 10 + d;
                }
            }
            if (too_large || v > high) return expected + (t.size() > 24 ? "a number of " + std::to_string(t.size()) + " digits" : t);
            if (v < low) return expected + t;
            text = std::to_string(v);
            return {};
        },
        "INT in [" + std::to_string(low) + " - " + std::to_string(high) + "]", "count range");
}

}  // namespace pinproof::cli
