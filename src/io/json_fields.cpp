#include "io/json_fields.hpp"

#include "io/input_text.hpp"
#include "pinproof/core/printable_text.hpp"
#include "pinproof/core/spelling.hpp"

#include <cctype>
#include <cmath>
#include <stdexcept>

namespace pinproof::json_fields {

std::string child(const std::string& pointer, const std::string& key)
{
    std::string escaped;
    for (char c : key) {
        if (c == '~') escaped += "~0";
        else if (c == '/') escaped += "~1";
        else escaped += c;
    }
    return pointer + "/" + escaped;
}

std::string child(const std::string& pointer, std::size_t index)
{
    return pointer + "/" + std::to_string(index);
}

std::string shown(const json& value)
{
    switch (value.type()) {
    case json::value_t::object: return "an object";
    case json::value_t::array: return "an array";
    case json::value_t::null: return "null";
    default: break;
    }
    // Invisible characters are shown as code points (core/printable_text.hpp).
    std::string s = value.dump(-1, ' ', false, json::error_handler_t::replace);
    if (s.size() > 60) s = s.substr(0, 57) + "...";
    return message_text(s);
}

std::optional<double> quantity(const json& value, const std::string& pointer, dimension expected,
                               problem_list& problems, unit_system* system)
{
    const std::string want = "expected " + describe(expected) + " (a number in SI base units or a string such as \"" +
                             example_of(expected) + "\")";
    if (value.is_number()) {
        const double v = value.get<double>();
        // The same ceiling as parse_quantity: no beam quantity comes near 1e100.
        if (!std::isfinite(v) || std::abs(v) > 1e100) {
            problems.add(pointer, want + ", found " + shown(value) + ", beyond 1e100 in magnitude");
            return std::nullopt;
        }
        return v;
    }
    if (!value.is_string()) {
        problems.add(pointer, want + ", found " + shown(value));
        return std::nullopt;
    }
    const auto text = value.get<std::string>();
    try {
        const pinproof::quantity q = parse_quantity(text);
        if (q.dim != expected) {
            problems.add(pointer, want + ", found \"" + text + "\", which is " + describe(q.dim));
            return std::nullopt;
        }
        if (system && q.system != unit_system::neutral && *system == unit_system::neutral) *system = q.system;
        return q.value;
    } catch (const std::invalid_argument& e) {
        problems.add(pointer, want + ", found \"" + text + "\": " + e.what());
        return std::nullopt;
    }
}

namespace {
const json* field(const json& obj, const std::string& pointer, const std::string& key, bool required,
                  problem_list& problems)
{
    if (!obj.is_object()) return nullptr;
    auto it = obj.find(key);
    if (it == obj.end()) {
        if (required) problems.add(child(pointer, key), "missing required field \"" + key + "\"");
        return nullptr;
    }
    return &*it;
}
}  // namespace

std::optional<double> quantity_field(const json& obj, const std::string& pointer, const std::string& key,
                                     dimension expected, bool required, problem_list& problems,
                                     unit_system* system)
{
    const json* v = field(obj, pointer, key, required, problems);
    if (!v) return std::nullopt;
    return quantity(*v, child(pointer, key), expected, problems, system);
}

std::optional<std::string> string_field(const json& obj, const std::string& pointer, const std::string& key,
                                        bool required, problem_list& problems)
{
    const json* v = field(obj, pointer, key, required, problems);
    if (!v) return std::nullopt;
    if (!v->is_string()) {
        problems.add(child(pointer, key), "expected a string, found " + shown(*v));
        return std::nullopt;
    }
    return v->get<std::string>();
}

std::optional<std::string> choice_field(const json& obj, const std::string& pointer, const std::string& key,
                                        const std::vector<std::string>& allowed, bool required,
                                        problem_list& problems)
{
    std::string list;
    for (const auto& a : allowed) list += (list.empty() ? "\"" : ", \"") + a + "\"";
    const json* v = field(obj, pointer, key, required, problems);
    if (!v) return std::nullopt;
    if (v->is_string()) {
        const auto s = v->get<std::string>();
        for (const auto& a : allowed)
            if (s == a) return s;
    }
    problems.add(child(pointer, key), "expected one of " + list + ", found " + shown(*v));
    return std::nullopt;
}

std::optional<double> number_field(const json& obj, const std::string& pointer, const std::string& key,
                                   bool required, problem_list& problems)
{
    const json* v = field(obj, pointer, key, required, problems);
    if (!v) return std::nullopt;
    if (!v->is_number() || !std::isfinite(v->get<double>())) {
        problems.add(child(pointer, key), "expected a finite number, found " + shown(*v));
        return std::nullopt;
    }
    return v->get<double>();
}

std::optional<long long> integer_field(const json& obj, const std::string& pointer, const std::string& key,
                                       bool required, problem_list& problems)
{
    const json* v = field(obj, pointer, key, required, problems);
    if (!v) return std::nullopt;
    if (v->is_number_integer()) return v->get<long long>();
    if (v->is_number_float()) {
        const double d = v->get<double>();
        if (std::isfinite(d) && d == std::floor(d) && std::abs(d) < 1e15) return static_cast<long long>(d);
    }
    problems.add(child(pointer, key), "expected a whole number, found " + shown(*v));
    return std::nullopt;
}

std::optional<bool> bool_field(const json& obj, const std::string& pointer, const std::string& key,
                               bool required, problem_list& problems)
{
    const json* v = field(obj, pointer, key, required, problems);
    if (!v) return std::nullopt;
    if (!v->is_boolean()) {
        problems.add(child(pointer, key), "expected true or false, found " + shown(*v));
        return std::nullopt;
    }
    return v->get<bool>();
}

std::string line_column(std::string_view text, std::size_t byte) { return input_text::line_column(text, byte); }

std::optional<double> multiple_of_EI_over_L(const std::string& text)
{
    std::size_t b = 0, e = text.size();
    while (b < e && std::isspace(static_cast<unsigned char>(text[b]))) ++b;
    while (e > b && std::isspace(static_cast<unsigned char>(text[e - 1]))) --e;
    const std::string t = text.substr(b, e - b);
    const std::string rel = "EI/L";
    if (t.size() < rel.size() || t.compare(t.size() - rel.size(), rel.size(), rel) != 0) return std::nullopt;
    const pinproof::quantity k = parse_quantity(t.substr(0, t.size() - rel.size()));
    if (k.dim != dims::dimensionless || !(k.value >= 0))
        throw std::invalid_argument("expected a non-negative number before EI/L");
    return k.value;
}

EI_over_L_multiple read_EI_over_L_multiple(const json& value, const std::string& pointer, problem_list& problems)
{
    EI_over_L_multiple out;
    if (!value.is_string()) return out;
    try {
        out.multiple = multiple_of_EI_over_L(value.get<std::string>());
        out.relative = out.multiple.has_value();
    } catch (const std::invalid_argument&) {
        out.relative = true;
        problems.add(pointer, "expected a non-negative multiple of EI/L such as \"0.5 EI/L\", found " + shown(value));
    }
    return out;
}

std::optional<double> absolute_stiffness(const json& value, const std::string& pointer, problem_list& problems,
                                         unit_system* system)
{
    problem_list local;
    const auto s = quantity(value, pointer, dims::rotational_stiffness, local, system);
    if (!s) {
        for (const auto& pr : local.problems())
            problems.add(pr.where, pr.message + " (\"rigid\" and multiples such as \"0.5 EI/L\" are accepted too)");
        return std::nullopt;
    }
    if (*s < 0) {
        problems.add(pointer, "expected a rotational stiffness of zero or more, found " + shown(value));
        return std::nullopt;
    }
    return s;
}

bool expect_object(const json& value, const std::string& pointer, problem_list& problems)
{
    if (value.is_object()) return true;
    problems.add(pointer.empty() ? "/" : pointer, "expected an object, found " + shown(value));
    return false;
}

void reject_unknown_keys(const json& obj, const std::string& pointer, const std::vector<std::string>& known,
                         problem_list& problems)
{
    if (!obj.is_object()) return;
    for (auto it = obj.begin(); it != obj.end(); ++it) {
        bool ok = it.key() == "notes";
        for (const auto& k : known) ok = ok || it.key() == k;
        if (ok) continue;
        std::string list;
        for (const auto& k : known) list += (list.empty() ? "" : ", ") + k;
        problems.add(child(pointer, it.key()), "unknown field \"" + it.key() + "\" (known fields here: " + list +
                                                   ", notes)" + did_you_mean(it.key(), known));
    }
}

void format_field(const json& doc, const std::string& expected, problem_list& problems)
{
    const auto format = string_field(doc, "", "format", true, problems);
    if (format && *format != expected)
        problems.add("/format", "expected \"" + expected + "\", found \"" + *format + "\"");
}

const json* non_empty_array_field(const json& doc, const std::string& key, problem_list& problems)
{
    const std::string at = child("", key);
    const auto it = doc.find(key);
    if (it == doc.end()) {
        problems.add(at, "missing required field \"" + key + "\" (an array of " + key + ")");
        return nullptr;
    }
    if (!it->is_array() || it->empty()) {
        problems.add(at, "expected a non-empty array of " + key + ", found " + shown(*it));
        return nullptr;
    }
    return &*it;
}

void unique_ids::note(const json& element, const std::string& pointer, problem_list& problems)
{
    if (!element.is_object() || !element.contains("id") || !element["id"].is_string()) return;
    const auto id = element["id"].get<std::string>();
    if (id.empty()) return;
    if (!seen_.insert(id).second)
        problems.add(child(pointer, "id"), "expected a unique " + what_ + ", found \"" + id + "\" a second time");
}

}  // namespace pinproof::json_fields
