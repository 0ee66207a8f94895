// The text of an input file before it is read as JSON or CSV: what a text
// file must not be (docs/robustness.md, "Encodings").
#pragma once

#include <string>
#include <string_view>

namespace pinproof::input_text {

// Refuses text that is not a UTF-8 text file, naming what it is instead:
// UTF-16 or UTF-32 (a byte-order mark, or zero bytes between characters) and
// NUL bytes. Throws input_error at "line L, column C" (prefixed by
// `source#` when `source` is given); `what` names the file in the message
// ("project file", "detail catalogue", "schedule").
void refuse_non_utf8_encodings(std::string_view text, const std::string& what, const std::string& source = "");

// "line L, column C" of byte offset `byte` (both counted from 1). A line ends at
// LF, at CRLF, and at a CR alone (a file saved with CR-only line endings).
std::string line_column(std::string_view text, std::size_t byte);

}  // namespace pinproof::input_text
