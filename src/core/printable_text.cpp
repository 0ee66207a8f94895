#include "pinproof/core/printable_text.hpp"

#include <cstdio>

namespace pinproof {
namespace {

// One UTF-8 sequence at `i`: its code point and length, or length 0 when the
// bytes are not well-formed UTF-8 (RFC 3629).
struct decoded {
    char32_t cp = 0;
    std::size_t length = 0;
};

decoded decode(std::string_view s, std::size_t i)
{
    const unsigned char c = static_cast<unsigned char>(s[i]);
    if (c < 0x80) return {c, 1};
    std::size_t len = 0;
    char32_t cp = 0;
    if ((c & 0xE0) == 0xC0) { len = 2; cp = c & 0x1F; }
    else if ((c & 0xF0) == 0xE0) { len = 3; cp = c & 0x0F; }
    else if ((c & 0xF8) == 0xF0) { len = 4; cp = c & 0x07; }
    else return {};
    if (i + len > s.size()) return {};
    for (std::size_t k = 1; k < len; ++k) {
        const unsigned char d = static_cast<unsigned char>(s[i + k]);
        if ((d & 0xC0) != 0x80) return {};
        cp = (cp << 6) | (d & 0x3F);
    }
    const char32_t min_cp[] = {0, 0, 0x80, 0x800, 0x10000};
    if (cp < min_cp[len] || cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF)) return {};
    return {cp, len};
}

bool is_control(char32_t c) { return c < 0x20 || c == 0x7F || (c >= 0x80 && c <= 0x9F); }

bool is_bidi_control(char32_t c) { return (c >= 0x202A && c <= 0x202E) || (c >= 0x2066 && c <= 0x2069); }

// Characters that print as nothing or as an ordinary space (Unicode General
// Category Zs other than U+0020, Cf format characters in common use).
bool is_invisible(char32_t c)
{
    return c == 0x00A0 || c == 0x00AD || c == 0x034F || c == 0x061C || c == 0x115F || c == 0x1160 || c == 0x1680 ||
           c == 0x180E || (c >= 0x2000 && c <= 0x200F) || (c >= 0x2028 && c <= 0x202F) ||
           (c >= 0x205F && c <= 0x206F) || c == 0x3000 || c == 0x3164 || c == 0xFEFF || c == 0xFFA0;
}

std::string code_point_tag(char32_t c)
{
    char buf[16];
    std::snprintf(buf, sizeof buf, "<U+%04X>", static_cast<unsigned>(c));
    return buf;
}

std::string escaped(std::string_view text, bool for_message)
{
    std::string out;
    out.reserve(text.size());
    for (std::size_t i = 0; i < text.size();) {
        const decoded d = decode(text, i);
        if (d.length == 0) {
            char buf[8];
            std::snprintf(buf, sizeof buf, "<0x%02X>", static_cast<unsigned char>(text[i]));
            out += buf;
            ++i;
            continue;
        }
        const bool keep_layout = !for_message && (d.cp == '\n' || d.cp == '\t');
        if ((is_control(d.cp) && !keep_layout) || is_bidi_control(d.cp) || (for_message && is_invisible(d.cp)))
            out += code_point_tag(d.cp);
        else
            out.append(text.substr(i, d.length));
        i += d.length;
    }
    return out;
}

}  // namespace

std::string terminal_text(std::string_view text) { return escaped(text, false); }

std::string message_text(std::string_view text) { return escaped(text, true); }

std::optional<control_character> first_control_character(std::string_view text)
{
    for (std::size_t i = 0; i < text.size();) {
        const decoded d = decode(text, i);
        if (d.length == 0) {
            ++i;  // not UTF-8: the reader refuses it on that ground
            continue;
        }
        if (is_control(d.cp)) return control_character{i, d.cp};
        i += d.length;
    }
    return std::nullopt;
}

std::string describe_code_point(char32_t c)
{
    std::string tag = code_point_tag(c);
    tag = tag.substr(1, tag.size() - 2);
    switch (c) {
    case 0x00: return tag + " (NUL)";
    case 0x09: return tag + " (tab)";
    case 0x0A: return tag + " (line feed)";
    case 0x0D: return tag + " (carriage return)";
    case 0x1B: return tag + " (escape)";
    case 0x7F: return tag + " (delete)";
    default: return tag + (c >= 0x80 ? " (a C1 control character)" : " (a control character)");
    }
}

}  // namespace pinproof
