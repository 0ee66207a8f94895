// Reading typed fields out of a project file's JSON, at the input edge.
//
// Every reader takes the JSON pointer of the object it reads from and adds a
// problem (pointer of the field, what was expected, what was found) to the
// problem_list instead of throwing, so that one run reports every mistake.
// A reader that could not produce a value returns nullopt.
#pragma once

#include <nlohmann/json.hpp>

#include <optional>
#include <set>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof::json_fields {

using json = nlohmann::json;

// "/beams/0" + "span" -> "/beams/0/span" (escaping '~' and '/' per RFC 6901).
std::string child(const std::string& pointer, const std::string& key);
std::string child(const std::string& pointer, std::size_t index);

// Short rendering of a JSON value for messages: "\"25 kN\"", "12", "an object".
std::string shown(const json& value);

// A quantity of the expected dimension: a bare number in SI base units or a
// "number unit" string. Must be finite. `system` (if given) is updated with the
// unit system the text used.
std::optional<double> quantity(const json& value, const std::string& pointer, dimension expected,
                               problem_list& problems, unit_system* system = nullptr);

// Field `key` of object `obj` (at `pointer`) read as a quantity. Missing:
// nullopt and, if `required`, a problem "missing required field".
std::optional<double> quantity_field(const json& obj, const std::string& pointer, const std::string& key,
                                     dimension expected, bool required, problem_list& problems,
                                     unit_system* system = nullptr);

std::optional<std::string> string_field(const json& obj, const std::string& pointer, const std::string& key,
                                        bool required, problem_list& problems);

// A string that must be one of `allowed`; the message lists them.
std::optional<std::string> choice_field(const json& obj, const std::string& pointer, const std::string& key,
                                        const std::vector<std::string>& allowed, bool required,
                                        problem_list& problems);

std::optional<double> number_field(const json& obj, const std::string& pointer, const std::string& key,
                                   bool required, problem_list& problems);

std::optional<long long> integer_field(const json& obj, const std::string& pointer, const std::string& key,
                                       bool required, problem_list& problems);

std::optional<bool> bool_field(const json& obj, const std::string& pointer, const std::string& key,
                               bool required, problem_list& problems);

// "line L, column C" of byte offset `byte` in `text` (both counted from 1), for
// JSON syntax errors.
std::string line_column(std::string_view text, std::size_t byte);

// The multiple k of a stiffness written relative to the beam, "k EI/L"
// ("0.5 EI/L" -> 0.5). nullopt when the text does not end in "EI/L". Throws
// std::invalid_argument when it does but k is not a plain non-negative decimal
// number (no hexadecimal, nan or inf: the rules of parse_quantity).
std::optional<double> multiple_of_EI_over_L(const std::string& text);

// A stiffness written relative to the beam: a string ending in "EI/L".
// `relative` is false when `value` is not of that form (the caller reads it
// otherwise); `multiple` is empty, after a problem at `pointer`, when the
// multiple is not a plain non-negative number.
struct EI_over_L_multiple {
    bool relative = false;
    std::optional<double> multiple;
};
EI_over_L_multiple read_EI_over_L_multiple(const json& value, const std::string& pointer, problem_list& problems);

// A rotational stiffness written as a quantity, zero or more. Its problems
// also name the other accepted forms, "rigid" and multiples of EI/L.
std::optional<double> absolute_stiffness(const json& value, const std::string& pointer, problem_list& problems,
                                         unit_system* system = nullptr);

// Checks that `value` is a JSON object; adds a problem if not.
bool expect_object(const json& value, const std::string& pointer, problem_list& problems);

// Adds a problem for every key of `obj` not in `known` ("unknown field ...; known fields are ...").
void reject_unknown_keys(const json& obj, const std::string& pointer, const std::vector<std::string>& known,
                         problem_list& problems);

// The document's "format" field, which must be `expected`.
void format_field(const json& doc, const std::string& expected, problem_list& problems);

// Field `key` ("beams", "details") of the top-level object, a non-empty array
// of `key`; nullptr (with a problem) when it is missing or not such an array.
const json* non_empty_array_field(const json& doc, const std::string& key, problem_list& problems);

// Ids of the elements of an array, each to be unique: `note` adds a problem at
// ".../id" for an id seen before ("expected a unique beam id, found ... a
// second time"). Elements without a string id are left to their reader.
class unique_ids {
public:
    explicit unique_ids(std::string what) : what_(std::move(what)) {}
    void note(const json& element, const std::string& pointer, problem_list& problems);

private:
    std::string what_;  // "beam id", "detail id"
    std::set<std::string> seen_;
};

// The bounds of a range object {"min": ..., "max": ...} at `pointer`: an
// unknown key or a missing bound is a problem; each present bound is read by
// `read(value, pointer_of_the_bound)`, which returns std::optional<T>.
template <class T>
struct bounds {
    std::optional<T> min, max;
};
template <class T, class Reader>
bounds<T> read_bounds(const json& range, const std::string& pointer, Reader read, problem_list& problems)
{
    reject_unknown_keys(range, pointer, {"min", "max"}, problems);
    bounds<T> out;
    for (const char* key : {"min", "max"}) {
        const std::string at = child(pointer, key);
        std::optional<T>& bound = std::string_view(key) == "min" ? out.min : out.max;
        if (!range.contains(key)) problems.add(at, std::string("missing required field \"") + key + "\"");
        else bound = read(range.at(key), at);
    }
    return out;
}

}  // namespace pinproof::json_fields
