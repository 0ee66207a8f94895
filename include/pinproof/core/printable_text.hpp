// Text that came from an input file or the command line, made safe to show.
//
// Ids, titles and descriptions are refused at the input when they hold control
// characters (docs/robustness.md), but a message may still quote what was
// refused, and a file name comes from the command line. So everything shown
// on a terminal passes through one of these:
//
//   terminal_text : C0 controls (U+0000 to U+001F, except line feed and tab),
//                   DEL (U+007F), C1 controls (U+0080 to U+009F) and the
//                   bidirectional controls (U+202A to U+202E, U+2066 to U+2069)
//                   become "<U+001B>"; bytes that are not UTF-8 become "<0xFF>".
//                   An escape sequence can then neither hide nor reorder text.
//   message_text  : as terminal_text, and also line feed, tab and the invisible
//                   characters (no-break and other spaces of Unicode, zero-width
//                   characters, the soft hyphen, the byte-order mark) become
//                   "<U+00A0>", so that a message shows what differs from the
//                   expected text.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>

namespace pinproof {

std::string terminal_text(std::string_view text);
std::string message_text(std::string_view text);

// A control character found in text: its offset in bytes and its code point.
struct control_character {
    std::size_t offset = 0;
    char32_t code_point = 0;
};

// The first C0 control (U+0000 to U+001F), DEL or C1 control (U+0080 to U+009F)
// in UTF-8 text, if any. Tab and line feed count as control characters here.
std::optional<control_character> first_control_character(std::string_view text);

// "U+001B (escape)" for a message: the code point and, for the common ones, its name.
std::string describe_code_point(char32_t c);

}  // namespace pinproof
