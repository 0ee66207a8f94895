// Reading the text of a JSON input (project file, detail catalogue) into a
// document that every reader can walk safely.
//
// Before the document is built, one pass over the text (nlohmann_json's SAX
// interface, which keeps its own stack) refuses, each at its place:
//   - text that is not UTF-8 (input_text.hpp),
//   - a JSON syntax error, at "line L, column C",
//   - a number beyond the range of a double ("1e400"), at its JSON pointer,
//   - nesting deeper than max_json_depth, at the pointer of the first value
//     that goes deeper (readers and copies of the document recurse, so a
//     deeper document could overflow the stack),
//   - a key repeated in one object, at the pointer of its second occurrence
//     (RFC 8259 4: names SHOULD be unique; readers differ on which one wins),
//   - a control character (C0, DEL, C1) in a string or a key, at its pointer.
// Every problem found is reported in one input_error (except after a syntax
// error or the depth limit, where the pass stops).
#pragma once

#include <nlohmann/json.hpp>

#include <cstddef>
#include <string>
#include <string_view>

namespace pinproof::json_document {

// Objects and arrays nested deeper than this are refused. The deepest value a
// pinproof file needs is a few levels down (/beams/0/joints/start/detail/
// outline/0/x is 7); 64 leaves room for any "notes".
constexpr std::size_t max_json_depth = 64;

// `what` names the file in messages ("file", "catalogue"); places are prefixed
// by `source#` when `source` is given.
nlohmann::json parse(std::string_view text, const std::string& what, const std::string& source = "");

}  // namespace pinproof::json_document
