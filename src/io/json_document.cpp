#include "io/json_document.hpp"

#include <unordered_set>
#include <vector>

#include "io/input_text.hpp"
#include "io/json_fields.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/core/printable_text.hpp"

namespace pinproof::json_document {
namespace {

using json = nlohmann::json;

// The parser's message quotes the bytes it read, which may be invalid UTF-8:
// bytes outside ASCII are shown as \xNN so that the message itself stays valid text.
std::string printable(const std::string& message)
{
    static const char hex[] = "0123456789ABCDEF";
    std::string out;
    for (unsigned char c : message) {
        if (c < 0x80) {
            out += static_cast<char>(c);
        } else {
            out += "\\x";
            out += hex[c >> 4];
            out += hex[c & 15];
        }
    }
    return message_text(out);
}

// One pass over the text, keeping the path to the current value.
class scanner : public nlohmann::json_sax<json> {
public:
    problem_list problems;
    bool syntax_error = false;
    std::size_t error_byte = 0;
    std::string error_message;

    bool null() override { return value(); }
    bool boolean(bool) override { return value(); }
    bool number_integer(number_integer_t) override { return value(); }
    bool number_unsigned(number_unsigned_t) override { return value(); }
    bool number_float(number_float_t, const string_t&) override { return value(); }
    bool binary(binary_t&) override { return value(); }
    bool string(string_t& s) override
    {
        const std::string at = begin_value();
        check_text(s, at, "a string");
        return true;
    }
    bool start_object(std::size_t) override { return open(true); }
    bool start_array(std::size_t) override { return open(false); }
    bool end_object() override { return close(); }
    bool end_array() override { return close(); }
    bool key(string_t& k) override
    {
        frame& f = frames_.back();
        f.key = k;
        const std::string at = pending_pointer();
        if (!f.keys.insert(k).second)
            problems.add(at, "expected each key once in an object, found \"" + message_text(k) +
                                 "\" a second time (JSON readers differ on which one counts, so pinproof refuses both)");
        check_text(k, at, "a key");
        return true;
    }
    bool parse_error(std::size_t position, const std::string& last_token, const json::exception& e) override
    {
        error_byte = position;
        if (e.id == 406) {  // out_of_range: a number beyond a double
            problems.add(pending_pointer(), "expected a number within the range of a double (about 1.8e308 in "
                                            "magnitude), found " + printable(last_token));
            return false;
        }
        syntax_error = true;
        error_message = e.what();
        return false;
    }

    bool too_deep = false;

private:
    struct frame {
        bool object = false;
        std::size_t count = 0;    // values begun in an array
        std::size_t current = 0;  // the index of the value being read in an array
        std::string key;        // the current key of an object
        std::unordered_set<std::string> keys;
    };
    std::vector<frame> frames_;

    // The pointer of the value about to begin (or being parsed).
    std::string pending_pointer() const
    {
        std::string p;
        for (std::size_t i = 0; i < frames_.size(); ++i) {
            const frame& f = frames_[i];
            const bool innermost = i + 1 == frames_.size();
            p = f.object ? json_fields::child(p, f.key) : json_fields::child(p, innermost ? f.count : f.current);
        }
        return p.empty() ? "/" : p;
    }

    std::string begin_value()
    {
        const std::string at = pending_pointer();
        if (!frames_.empty() && !frames_.back().object) frames_.back().current = frames_.back().count++;
        return at;
    }

    bool value()
    {
        if (!frames_.empty() && !frames_.back().object) frames_.back().current = frames_.back().count++;
        return true;
    }

    bool open(bool object)
    {
        const std::string at = begin_value();
        if (frames_.size() >= max_json_depth) {
            problems.add(at, "expected objects and arrays nested at most " + std::to_string(max_json_depth) +
                                 " levels deep, found deeper nesting starting here");
            too_deep = true;
            return false;
        }
        frames_.push_back(frame{object, 0, 0, {}, {}});
        return true;
    }

    bool close()
    {
        frames_.pop_back();
        return true;
    }

    void check_text(const std::string& s, const std::string& at, const char* what)
    {
        if (const auto c = first_control_character(s))
            problems.add(at, std::string("expected ") + what + " without control characters, found " +
                                 describe_code_point(c->code_point) + " at byte " + std::to_string(c->offset + 1) +
                                 " of \"" + message_text(s.substr(0, 60)) + (s.size() > 60 ? "...\"" : "\""));
    }
};

std::string located(const std::string& source, const std::string& where)
{
    return source.empty() ? where : source + "#" + where;
}

}  // namespace

json parse(std::string_view text, const std::string& what, const std::string& source)
{
    input_text::refuse_non_utf8_encodings(text, what == "file" ? "project file" : "detail catalogue", source);
    scanner scan;
    json::sax_parse(text.begin(), text.end(), &scan);
    if (scan.syntax_error) {
        const std::string& m = scan.error_message;
        const auto pos = m.find("syntax error");
        throw input_error(located(source, input_text::line_column(text, scan.error_byte > 0 ? scan.error_byte - 1 : 0)),
                          "the " + what + " is not valid JSON: " + printable(pos == std::string::npos ? m : m.substr(pos)));
    }
    if (!scan.problems.empty()) {
        std::vector<input_problem> out;
        for (const auto& p : scan.problems.problems()) out.push_back({located(source, p.where), p.message});
        throw input_error(std::move(out), scan.problems.size());
    }
    try {
        return json::parse(text.begin(), text.end());
    } catch (const json::exception& e) {
        // The pass above accepted the text, so this is pinproof's fault.
        throw internal_error(std::string("the JSON reader refused text the scan accepted: ") + e.what());
    }
}

}  // namespace pinproof::json_document
