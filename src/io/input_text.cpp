#include "io/input_text.hpp"

#include <algorithm>

#include "pinproof/core/errors.hpp"

namespace pinproof::input_text {

namespace {
std::string located(const std::string& source, const std::string& where)
{
    return source.empty() ? where : source + "#" + where;
}
}  // namespace

std::string line_column(std::string_view text, std::size_t byte)
{
    std::size_t line = 1, col = 1;
    for (std::size_t i = 0; i < byte && i < text.size(); ++i) {
        const bool lone_cr = text[i] == '\r' && (i + 1 >= text.size() || text[i + 1] != '\n');
        if (text[i] == '\n' || lone_cr) {
            ++line;
            col = 1;
        } else {
            ++col;
        }
    }
    return "line " + std::to_string(line) + ", column " + std::to_string(col);
}

void refuse_non_utf8_encodings(std::string_view text, const std::string& what, const std::string& source)
{
    const std::string save_as = "; save it as UTF-8";
    // Byte-order marks (The Unicode Standard, 23.8): UTF-32 first, as its
    // little-endian mark begins with the UTF-16 one.
    if (text.size() >= 4 && (text.substr(0, 4) == std::string_view("\xFF\xFE\0\0", 4) ||
                             text.substr(0, 4) == std::string_view("\0\0\xFE\xFF", 4)))
        throw input_error(located(source, "line 1, column 1"),
                          "expected a " + what + " in UTF-8, found UTF-32 text (it starts with a UTF-32 byte-order "
                          "mark)" + save_as);
    if (text.size() >= 2 && (text.substr(0, 2) == "\xFF\xFE" || text.substr(0, 2) == "\xFE\xFF"))
        throw input_error(located(source, "line 1, column 1"),
                          "expected a " + what + " in UTF-8, found UTF-16 text (it starts with the UTF-16 byte-order "
                          "mark " + std::string(text[0] == '\xFF' ? "FF FE" : "FE FF") + ")" + save_as);
    const auto nul = text.find('\0');
    if (nul == std::string_view::npos) return;
    // ASCII characters in UTF-16 have a zero byte beside them.
    const std::size_t probe = std::min<std::size_t>(text.size(), 64);
    const auto zeros = std::count(text.begin(), text.begin() + static_cast<std::ptrdiff_t>(probe), '\0');
    if (probe >= 4 && zeros * 3 >= static_cast<std::ptrdiff_t>(probe))
        throw input_error(located(source, "line 1, column 1"),
                          "expected a " + what + " in UTF-8, found zero bytes between the characters: UTF-16 or "
                          "UTF-32 text without a byte-order mark" + save_as);
    throw input_error(located(source, line_column(text, nul)),
                      "expected a " + what + " as text, found a NUL byte (0x00), which no text file holds (is it a "
                      "binary file, or was it cut short while being written?)");
}

}  // namespace pinproof::input_text
