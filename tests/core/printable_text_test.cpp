// Verification of core/printable_text: what reaches a terminal or a message.
//
// References:
//   [UNICODE] The Unicode Standard 15.0, 4.4 (General Category): C0 controls
//             U+0000..U+001F, DEL U+007F, C1 controls U+0080..U+009F (Cc);
//             U+00A0 NO-BREAK SPACE (Zs), U+200B ZERO WIDTH SPACE (Cf),
//             U+202E RIGHT-TO-LEFT OVERRIDE (Cf, bidirectional control).
//   [ECMA48]  ECMA-48 5th ed., 5.4: a control sequence starts with ESC [
//             (U+001B U+005B); it is what hides or recolours terminal text.
//   [UTF8]    RFC 3629, 3: well-formed UTF-8 sequences.
// Every case is exact (text comparison).
#include <doctest/doctest.h>

#include <string>

#include "pinproof/core/printable_text.hpp"

using namespace pinproof;

TEST_CASE("terminal text [ECMA48]: ESC of a control sequence is shown as a code point - exact")
{
    CHECK(terminal_text("B1\x1b[8mhidden") == "B1<U+001B>[8mhidden");
    CHECK(terminal_text(std::string("a\0b", 3)) == "a<U+0000>b");
    CHECK(terminal_text("a\x7f") == "a<U+007F>");
}

TEST_CASE("terminal text [UNICODE]: C1 controls and bidirectional overrides are shown - exact")
{
    CHECK(terminal_text("x\xc2\x9b" "31m") == "x<U+009B>" "31m");  // CSI as a C1 control
    CHECK(terminal_text("a\xe2\x80\xae" "b") == "a<U+202E>" "b");  // right-to-left override
}

TEST_CASE("terminal text [UNICODE]: line feed and tab keep the layout and letters stay - exact")
{
    CHECK(terminal_text("line\n\tnext") == "line\n\tnext");
    CHECK(terminal_text("M ≤ 0.25 Mpl θ") == "M ≤ 0.25 Mpl θ");
    CHECK(terminal_text("a\xa0" "b") == "a<0xA0>b");  // [UTF8]: a lone continuation byte
}

TEST_CASE("message text [UNICODE]: invisible characters are shown as code points - exact")
{
    CHECK(message_text("IPE\xc2\xa0" "300") == "IPE<U+00A0>300");
    CHECK(message_text("B1\xe2\x80\x8b") == "B1<U+200B>");
    CHECK(message_text("\xef\xbb\xbf" "braced") == "<U+FEFF>braced");
    CHECK(message_text("two\nlines") == "two<U+000A>lines");
}

TEST_CASE("first control character [UNICODE]: offset and code point - exact")
{
    CHECK_FALSE(first_control_character("plain text é").has_value());
    const auto c = first_control_character("ab\x1b");
    REQUIRE(c.has_value());
    CHECK(c->offset == 2);
    CHECK(c->code_point == 0x1B);
    const auto c1 = first_control_character("é\xc2\x85");
    REQUIRE(c1.has_value());
    CHECK(c1->offset == 2);
    CHECK(c1->code_point == 0x85);
    CHECK(describe_code_point(0x1B) == "U+001B (escape)");
    CHECK(describe_code_point(0x85) == "U+0085 (a C1 control character)");
}
