// Verification of io/json_document: the pass over a JSON input before it is read.
//
// References:
//   [RFC8259] RFC 8259, 4: "The names within an object SHOULD be unique";
//             7: control characters U+0000..U+001F must be escaped in strings.
//   [RFC6901] RFC 6901: JSON pointers ("/a/0/b").
//   [DEPTH]   The project's own limit, max_json_depth = 64 (docs/robustness.md;
//             common practice, no source).
// Every case is exact (the place and a part of the message).
#include <doctest/doctest.h>

#include <string>

#include "io/json_document.hpp"
#include "pinproof/core/errors.hpp"

using namespace pinproof;

namespace {

// The first problem's place and message of parsing `text`, or "accepted".
std::string refusal(const std::string& text, const std::string& source = "")
{
    try {
        (void)json_document::parse(text, "file", source);
        return "accepted";
    } catch (const input_error& e) {
        return e.problems().front().where + ": " + e.problems().front().message;
    }
}

std::string nested(std::size_t depth)
{
    return std::string(depth, '[') + "1" + std::string(depth, ']');
}

}  // namespace

TEST_CASE("json document [DEPTH]: 64 levels are read - 65 are refused at the pointer of the 65th")
{
    CHECK(refusal(nested(64)) == "accepted");
    const std::string r = refusal(nested(65));
    std::string pointer;
    for (int i = 0; i < 64; ++i) pointer += "/0";
    CHECK(r.rfind(pointer + ": expected objects and arrays nested at most 64 levels deep", 0) == 0);
}

TEST_CASE("json document [DEPTH]: 200 000 levels are refused without a crash")
{
    CHECK(refusal(nested(200000)).find("nested at most 64 levels deep") != std::string::npos);
    CHECK(refusal("{\"a\": " + nested(200000) + "}", "cat.json").rfind("cat.json#/a/0/0", 0) == 0);
}

TEST_CASE("json document [RFC8259 4]: a repeated key is refused at its second occurrence")
{
    CHECK(refusal(R"({"a": [1, {"b": 1, "c": 2, "b": 3}]})").rfind("/a/1/b: expected each key once", 0) == 0);
    CHECK(refusal(R"({"a": {"b": 1}, "c": {"b": 2}})") == "accepted");  // the same key in two objects
}

TEST_CASE("json document [RFC8259 7]: an escaped control character is refused at its pointer")
{
    CHECK(refusal(R"({"id": ["ok", "B\u001b[8m"]})").rfind("/id/1: expected a string without control characters, "
                                                          "found U+001B (escape)", 0) == 0);
    CHECK(refusal("{\"t\": \"a\xc2\x85\"}").find("U+0085") != std::string::npos);
}

TEST_CASE("json document [RFC6901]: a number beyond a double is refused at its pointer")
{
    CHECK(refusal(R"({"beams": [{"span": 2}, {"span": 1e400}]})").rfind("/beams/1/span: expected a number within", 0) == 0);
}

TEST_CASE("json document: UTF-16 and NUL bytes are named as such")
{
    CHECK(refusal(std::string("\xff\xfe{\0}\0", 6)).find("found UTF-16 text") != std::string::npos);
    CHECK(refusal(std::string("{\0\"\0a\0\"\0:\0 \01\0}\0", 16)).find("zero bytes between the characters") !=
          std::string::npos);
    CHECK(refusal(std::string("{\n  \"a\": 1\0}", 12)).rfind("line 2, column 9: expected a project file as text, found a NUL byte", 0) == 0);
}

TEST_CASE("json document: CR-only line endings count as line breaks in places")
{
    CHECK(refusal("{\r\"a\": 1,\r\"b\" 2}").rfind("line 3, column 5: the file is not valid JSON", 0) == 0);
}
