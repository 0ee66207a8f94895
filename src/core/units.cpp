#include "pinproof/core/units.hpp"

#include "pinproof/core/errors.hpp"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <optional>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <stdexcept>
#include <system_error>

namespace pinproof {

// No quantity of a beam check comes near 1e100 in SI base units; refusing
// larger magnitudes keeps every value finite in any display unit.
constexpr double max_magnitude = 1e100;
namespace {

// International yard and pound agreement (1959): 1 in = 25.4 mm, 1 ft = 12 in.
constexpr double metre_per_inch = 0.0254;
constexpr double metre_per_foot = 0.3048;
// Pound-force: avoirdupois pound 0.45359237 kg (1959 agreement) under standard
// gravity 9.80665 m/s^2 (3rd CGPM, 1901); NIST SP 811, Appendix B.
constexpr double newton_per_lbf = 0.45359237 * 9.80665;
constexpr double newton_per_kip = 1000.0 * newton_per_lbf;
constexpr double pi = 3.14159265358979323846;

constexpr dimension mass_dim{0, 1, 0, 0};
constexpr dimension time_dim{0, 0, 1, 0};

struct base_unit {
    std::string_view symbol;
    double si_factor;
    dimension dim;
    unit_system system;
    std::string_view prefixes;  // SI prefixes this symbol accepts
};

const base_unit base_units[] = {
    {"m", 1.0, dims::length, unit_system::si, "kcm"},
    {"N", 1.0, dims::force, unit_system::si, "kMG"},
    {"Pa", 1.0, dims::pressure, unit_system::si, "kMG"},
    {"kg", 1.0, mass_dim, unit_system::si, ""},
    {"s", 1.0, time_dim, unit_system::neutral, ""},
    // The hertz, one cycle per second (SI Brochure, 9th ed., Table 4); no prefix:
    // floor frequencies are a few hertz.
    {"Hz", 1.0, dims::frequency, unit_system::neutral, ""},
    {"rad", 1.0, dims::angle, unit_system::neutral, "m"},
    {"deg", pi / 180.0, dims::angle, unit_system::neutral, ""},
    {"in", metre_per_inch, dims::length, unit_system::us_customary, ""},
    {"ft", metre_per_foot, dims::length, unit_system::us_customary, ""},
    {"lbf", newton_per_lbf, dims::force, unit_system::us_customary, ""},
    {"lb", newton_per_lbf, dims::force, unit_system::us_customary, ""},
    {"kip", newton_per_kip, dims::force, unit_system::us_customary, ""},
    {"psi", newton_per_lbf / (metre_per_inch * metre_per_inch), dims::pressure,
     unit_system::us_customary, ""},
    {"ksi", newton_per_kip / (metre_per_inch * metre_per_inch), dims::pressure,
     unit_system::us_customary, ""},
};

double prefix_factor(char p)
{
    switch (p) {
    case 'G': return 1e9;
    case 'M': return 1e6;
    case 'k': return 1e3;
    case 'c': return 1e-2;
    case 'm': return 1e-3;
    default: return 0.0;
    }
}

// Bounds dimension exponents so that nested powers cannot overflow an int.
constexpr int max_exponent = 24;

struct unit_value {
    double factor = 1.0;
    dimension dim;
};

unit_value multiply(unit_value a, unit_value b, int sign)
{
    return {sign > 0 ? a.factor * b.factor : a.factor / b.factor,
            {a.dim.length + sign * b.dim.length, a.dim.mass + sign * b.dim.mass,
             a.dim.time + sign * b.dim.time, a.dim.angle + sign * b.dim.angle}};
}

unit_value raise(unit_value a, int p)
{
    return {std::pow(a.factor, p),
            {a.dim.length * p, a.dim.mass * p, a.dim.time * p, a.dim.angle * p}};
}

bool exponents_in_range(dimension d)
{
    return std::abs(d.length) <= max_exponent && std::abs(d.mass) <= max_exponent &&
           std::abs(d.time) <= max_exponent && std::abs(d.angle) <= max_exponent;
}

bool is_letter(char c) { return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z'); }
bool is_digit(char c) { return c >= '0' && c <= '9'; }

std::string quoted(std::string_view s) { return "\"" + std::string(s) + "\""; }

class unit_parser {
public:
    explicit unit_parser(std::string_view text) : text_(text) {}

    quantity parse()
    {
        skip_spaces();
        const double number = parse_number();
        if (peek() == 'x' || peek() == 'X') fail("hexadecimal numbers are not accepted: " + quoted(text_));
        if (peek() == ',') fail("in " + quoted(text_) + ": the decimal separator is '.', found ','");
        skip_spaces();
        unit_value unit;
        if (pos_ < text_.size()) {
            unit = expression(0);
            skip_spaces();
            if (pos_ < text_.size()) fail_unexpected("an operator '*', '/' or the end of the text");
        }
        const double value = number * unit.factor;
        if (!std::isfinite(value) || std::abs(value) > max_magnitude)
            fail(quoted(text_) + " is too large: its magnitude in SI base units exceeds 1e100");
        const unit_system system = has_us_   ? unit_system::us_customary
                                   : has_si_ ? unit_system::si
                                             : unit_system::neutral;
        return {value, unit.dim, system};
    }

private:
    std::string_view text_;
    std::size_t pos_ = 0;
    bool has_si_ = false;
    bool has_us_ = false;

    [[noreturn]] void fail(const std::string& message) const { throw std::invalid_argument(message); }

    [[noreturn]] void fail_unexpected(const std::string& expected) const
    {
        const std::string found = pos_ < text_.size() ? quoted(text_.substr(pos_)) : "the end of the text";
        fail("in " + quoted(text_) + ": expected " + expected + ", found " + found);
    }

    char peek(std::size_t ahead = 0) const
    {
        return pos_ + ahead < text_.size() ? text_[pos_ + ahead] : '\0';
    }
    bool at(std::string_view s) const { return text_.substr(pos_, s.size()) == s; }
    bool eat(std::string_view s)
    {
        if (!at(s)) return false;
        pos_ += s.size();
        return true;
    }
    void skip_spaces()
    {
        while (peek() == ' ' || peek() == '\t') ++pos_;
    }

    // Decimal number: [+-] digits [. digits] [(e|E) [+-] digits], or [+-] . digits ...
    double parse_number()
    {
        const std::size_t start = pos_;
        if (peek() == '+' || peek() == '-') ++pos_;
        std::size_t digits = 0;
        while (is_digit(peek())) ++pos_, ++digits;
        if (peek() == '.' && (digits > 0 || is_digit(peek(1)))) {
            ++pos_;
            while (is_digit(peek())) ++pos_, ++digits;
        }
        if (digits == 0) {
            if (text_.find_first_not_of(" \t") == std::string_view::npos)
                fail("empty text: expected a number followed by a unit, e.g. \"6.5 m\"");
            fail(quoted(text_) + " is not a number followed by a unit (e.g. \"6.5 m\", \"20 kN/m\")");
        }
        if ((peek() == 'e' || peek() == 'E')) {
            const std::size_t sign = (peek(1) == '+' || peek(1) == '-') ? 1 : 0;
            if (is_digit(peek(1 + sign))) {
                pos_ += 1 + sign;
                while (is_digit(peek())) ++pos_;
            }
        }
        std::string_view token = text_.substr(start, pos_ - start);
        if (const auto f = fraction(token)) return *f;
        std::string_view digits_part = token[0] == '+' ? token.substr(1) : token;
        double value = 0.0;
        const auto [end, ec] =
            std::from_chars(digits_part.data(), digits_part.data() + digits_part.size(), value);
        if (ec == std::errc::result_out_of_range || !std::isfinite(value))
            fail("number " + quoted(token) + " in " + quoted(text_) + " is out of the range of a double");
        if (ec != std::errc() || end != digits_part.data() + digits_part.size())
            fail(quoted(text_) + " is not a number followed by a unit");
        return value;
    }

    // A whole number of digits at [from, pos_) as a double; false if none.
    bool whole_number(std::size_t from, double& value) const
    {
        if (from >= pos_) return false;
        for (std::size_t i = from; i < pos_; ++i)
            if (!is_digit(text_[i])) return false;
        const auto r = std::from_chars(text_.data() + from, text_.data() + pos_, value);
        return r.ec == std::errc() && std::isfinite(value);
    }

    // US practice writes inches as fractions: "13/16 in", "1-1/2 in" or
    // "1 1/2 in" (a whole number, a hyphen or a space, then a fraction).
    // Called after a whole number token; returns its value where a fraction
    // follows, with the position moved past it.
    std::optional<double> fraction(std::string_view token)
    {
        const bool negative = token[0] == '-';
        const std::size_t whole_start = pos_ - token.size() + ((token[0] == '+' || token[0] == '-') ? 1 : 0);
        double whole = 0;
        if (!whole_number(whole_start, whole)) return std::nullopt;
        const std::size_t after_whole = pos_;
        const auto read_fraction = [&](std::size_t from, double& num, double& den) {
            pos_ = from;
            const std::size_t n0 = pos_;
            while (is_digit(peek())) ++pos_;
            if (!whole_number(n0, num) || peek() != '/' || !is_digit(peek(1))) return false;
            ++pos_;
            const std::size_t d0 = pos_;
            while (is_digit(peek())) ++pos_;
            if (!whole_number(d0, den)) return false;
            if (den == 0) fail("in " + quoted(text_) + ": a fraction with denominator 0");
            if (peek() == '.' || peek() == '/' || is_digit(peek()))
                fail("in " + quoted(text_) + ": expected a fraction of whole numbers such as 13/16, found " +
                     quoted(text_.substr(n0)));
            return true;
        };
        double num = 0, den = 1;
        // "13/16": the whole number is the numerator.
        if (peek() == '/' && is_digit(peek(1))) {
            if (read_fraction(whole_start, num, den)) return (negative ? -1.0 : 1.0) * num / den;
            pos_ = after_whole;
            return std::nullopt;
        }
        // "1-1/2" or "1 1/2": a whole number and a proper fraction.
        std::size_t next = pos_;
        if (peek() == '-') ++next;
        else
            while (next < text_.size() && (text_[next] == ' ' || text_[next] == '\t')) ++next;
        if (next == pos_ || next >= text_.size() || !is_digit(text_[next])) return std::nullopt;
        if (read_fraction(next, num, den)) {
            if (!(num < den))
                fail("in " + quoted(text_) + ": expected a proper fraction after the whole number (as in 1-1/2), "
                     "found " + quoted(text_.substr(next, pos_ - next)));
            return (negative ? -1.0 : 1.0) * (whole + num / den);
        }
        pos_ = after_whole;
        return std::nullopt;
    }

    // expression := term { ('*' | '.' | '·' | '⋅' | '/') term }, left-associative
    unit_value expression(int depth)
    {
        unit_value result = term(depth);
        for (;;) {
            skip_spaces();
            int sign = 0;
            if (at("**")) break;  // a power belongs to a term, never here
            if (eat("*") || eat(".") || eat("\xC2\xB7") || eat("\xE2\x8B\x85"))
                sign = 1;
            else if (eat("/"))
                sign = -1;
            else
                break;
            skip_spaces();
            result = multiply(result, term(depth), sign);
            if (!exponents_in_range(result.dim)) fail("unit expression in " + quoted(text_) + " is too complex");
        }
        return result;
    }

    // term := (symbol | '(' expression ')') [power]
    unit_value term(int depth)
    {
        unit_value base;
        if (eat("(")) {
            if (depth >= 8) fail("too many nested parentheses in " + quoted(text_));
            skip_spaces();
            base = expression(depth + 1);
            skip_spaces();
            if (!eat(")")) fail_unexpected("')'");
        } else if (is_letter(peek())) {
            const std::size_t start = pos_;
            while (is_letter(peek())) ++pos_;
            base = resolve(text_.substr(start, pos_ - start));
        } else {
            fail_unexpected("a unit symbol such as m, mm, kN, MPa, rad, ft, kip");
        }
        const int p = parse_power();
        if (p == 1) return base;
        const unit_value result = raise(base, p);
        if (!exponents_in_range(result.dim)) fail("unit expression in " + quoted(text_) + " is too complex");
        return result;
    }

    // Returns 1 when no power is written.
    int parse_power()
    {
        if (eat("\xC2\xB2")) return 2;
        if (eat("\xC2\xB3")) return 3;
        if (eat("\xE2\x81\xB4")) return 4;
        int sign = 1;
        if (eat("^") || eat("**")) {
            if (eat("-"))
                sign = -1;
            else
                eat("+");
            if (!is_digit(peek())) fail_unexpected("an integer power after '^' or '**'");
        } else if (!is_digit(peek())) {
            return 1;
        }
        int p = 0;
        while (is_digit(peek())) {
            p = p * 10 + (peek() - '0');
            ++pos_;
            if (p > max_exponent) fail("power too large in " + quoted(text_));
        }
        if (p == 0) fail("power 0 in " + quoted(text_) + " is meaningless");
        return sign * p;
    }

    // A symbol is either a base symbol or one allowed prefix + a base symbol;
    // a symbol readable both ways is refused rather than guessed.
    unit_value resolve(std::string_view symbol)
    {
        const base_unit* match = nullptr;
        double factor = 0.0;
        int matches = 0;
        for (const base_unit& u : base_units) {
            if (symbol == u.symbol) {
                match = &u, factor = u.si_factor, ++matches;
            } else if (symbol.size() == u.symbol.size() + 1 && symbol.substr(1) == u.symbol &&
                       u.prefixes.find(symbol[0]) != std::string_view::npos) {
                match = &u, factor = prefix_factor(symbol[0]) * u.si_factor, ++matches;
            }
        }
        if (matches > 1) fail("ambiguous unit " + quoted(symbol) + " in " + quoted(text_));
        if (matches == 0)
            fail("unknown unit " + quoted(symbol) + " in " + quoted(text_) +
                 " (expected symbols such as m, mm, kN, kN*m, kN*m/rad, MPa, GPa, cm4, rad, deg, "
                 "ft, in, kip, kip*ft, ksi; write products with '*', e.g. \"kN*m\")");
        if (match->system == unit_system::si) has_si_ = true;
        if (match->system == unit_system::us_customary) has_us_ = true;
        return {factor, match->dim};
    }
};

struct named_dimension {
    dimension dim;
    const char* name;
    const char* example;
    display_unit si;
    display_unit us;
};

const named_dimension named_dimensions[] = {
    {dims::length, "length", "6.5 m", {"mm", 1e-3}, {"in", metre_per_inch}},
    {dims::force, "force", "120 kN", {"kN", 1e3}, {"kip", newton_per_kip}},
    {dims::pressure, "pressure or modulus", "210 GPa", {"GPa", 1e9},
     {"ksi", newton_per_kip / (metre_per_inch * metre_per_inch)}},
    {dims::line_load, "line load (force per length)", "20 kN/m", {"kN/m", 1e3},
     {"kip/ft", newton_per_kip / metre_per_foot}},
    {dims::second_moment, "second moment of area", "8356 cm4", {"cm4", 1e-8},
     {"in4", std::pow(metre_per_inch, 4)}},
    {dims::area, "area", "53.8 cm2", {"cm2", 1e-4}, {"in2", metre_per_inch * metre_per_inch}},
    {dims::moment, "moment", "48 kN*m", {"kN*m", 1e3}, {"kip*ft", newton_per_kip * metre_per_foot}},
    {dims::rotational_stiffness, "rotational stiffness", "2500 kN*m/rad", {"kN*m/rad", 1e3},
     {"kip*in/rad", newton_per_kip * metre_per_inch}},
    {dims::angle, "angle (rotation)", "0.01 rad", {"mrad", 1e-3}, {"mrad", 1e-3}},
    {dims::frequency, "frequency", "4 Hz", {"Hz", 1.0}, {"Hz", 1.0}},
    {dims::dimensionless, "dimensionless number", "0.5", {"", 1.0}, {"", 1.0}},
};

const named_dimension* find_named(dimension d)
{
    for (const auto& n : named_dimensions)
        if (n.dim == d) return &n;
    return nullptr;
}

// SI base-unit expression of a dimension, e.g. "m^2*kg*s^-2*rad^-1".
std::string base_expression(dimension d)
{
    std::string s;
    const std::pair<const char*, int> parts[] = {{"m", d.length}, {"kg", d.mass}, {"s", d.time}, {"rad", d.angle}};
    for (const auto& [symbol, exponent] : parts) {
        if (exponent == 0) continue;
        if (!s.empty()) s += '*';
        s += symbol;
        if (exponent != 1) s += "^" + std::to_string(exponent);
    }
    return s;
}

}  // namespace

quantity parse_quantity(std::string_view text) { return unit_parser(text).parse(); }

std::string describe(dimension d)
{
    if (const auto* n = find_named(d)) return n->name;
    return "quantity of dimension " + base_expression(d);
}

std::string example_of(dimension d)
{
    if (const auto* n = find_named(d)) return n->example;
    return "1 " + base_expression(d);
}

display_unit display_unit_for(dimension d, unit_system system)
{
    if (const auto* n = find_named(d)) return system == unit_system::us_customary ? n->us : n->si;
    return {base_expression(d), 1.0};
}

std::string format_quantity(double si_value, dimension d, unit_system system, int significant)
{
    if (!std::isfinite(si_value))
        throw internal_error("non-finite value of " + describe(d) + " reached the output");
    const display_unit unit = display_unit_for(d, system);
    std::string out = format_number(si_value / unit.si_per_unit, significant);
    if (!unit.symbol.empty()) {
        out += ' ';
        out += unit.symbol;
    }
    return out;
}

std::string format_number(double value, int significant)
{
    if (!std::isfinite(value)) throw internal_error("non-finite number reached the output");
    if (significant < 1 || significant > 17)
        throw internal_error("format_number: significant figures must be 1..17, got " +
                             std::to_string(significant));
    if (value == 0.0) return "0";
    // Round once, in decimal, from the value to `decimal_figures` significant
    // figures: two results that agree to about 1e-9 (a symmetric pair computed
    // by two paths, 68.17499999999999 and 68.17500000000001) have the same
    // decimal digits there and so print the same; the shown figures are then
    // taken from those digits, half away from zero. At 9 figures and beyond the
    // value's own nearest decimal is used.
    // Every message of every check goes through here: the figures are kept in
    // fixed buffers on the stack, not in strings.
    constexpr int decimal_figures = 9;
    const int figures = std::max(significant, decimal_figures);
    char buf[64];
    auto r = std::to_chars(buf, buf + sizeof buf, std::abs(value), std::chars_format::scientific, figures - 1);
    if (r.ec != std::errc()) throw internal_error("format_number: buffer too small");
    const char* e = std::find(buf, r.ptr, 'e');
    int exponent = 0;
    std::from_chars(e + 1 + (e[1] == '+'), r.ptr, exponent);
    char digits[32];  // the `figures` significant digits, without the point
    int nd = 0;
    for (const char* c = buf; c != e; ++c)
        if (*c != '.') digits[nd++] = *c;
    // The first n figures of `digits` (all of them when there are fewer) into
    // `out`, rounded half away from zero; a carry out of the first figure
    // (9.9996 -> 10.00) raises the exponent by one. Returns how many figures.
    auto round_to = [&](int n, char* out, int& exp) {
        int len = std::min(n, nd);
        std::copy(digits, digits + len, out);
        exp = exponent;
        if (n < nd && digits[n] >= '5') {
            int i = n - 1;
            while (i >= 0 && out[i] == '9') out[i--] = '0';
            if (i >= 0) {
                ++out[i];
            } else {
                if (len > 0) std::copy_backward(out, out + len - 1, out + len);
                out[0] = '1';
                len = std::max(len, 1);
                ++exp;
            }
        }
        return len;
    };
    char shown[32];
    int rounded_exponent = exponent;
    const int ns = round_to(significant, shown, rounded_exponent);
    // The exponent of the rounded value decides the layout.
    const int decimals = std::max(0, significant - 1 - rounded_exponent);
    char text[96];
    int k = 0;
    if (value < 0) text[k++] = '-';
    const auto put = [&](const char* from, int n) {
        std::copy(from, from + n, text + k);
        k += n;
    };
    if (rounded_exponent >= 9 || decimals > 6) {
        text[k++] = shown[0];
        if (significant > 1) {
            text[k++] = '.';
            put(shown + 1, ns - 1);
        }
        k += std::snprintf(text + k, sizeof text - static_cast<std::size_t>(k), "e%c%02d",
                           rounded_exponent < 0 ? '-' : '+', std::abs(rounded_exponent));
        return std::string(text, static_cast<std::size_t>(k));
    }
    if (decimals == 0) {
        // Every figure before the decimal point is shown (12345 stays "12345"):
        // the value rounded to a whole number.
        int whole_exponent = exponent;
        char whole[32];
        const int nw = round_to(exponent + 1, whole, whole_exponent);
        put(whole, nw);
        for (int z = whole_exponent + 1 - nw; z > 0; --z) text[k++] = '0';
        return std::string(text, static_cast<std::size_t>(k));
    }
    if (rounded_exponent < 0) {
        text[k++] = '0';
        text[k++] = '.';
        for (int z = -rounded_exponent - 1; z > 0; --z) text[k++] = '0';
        put(shown, ns);
        return std::string(text, static_cast<std::size_t>(k));
    }
    const int point = rounded_exponent + 1;
    put(shown, point);
    text[k++] = '.';
    put(shown + point, ns - point);
    return std::string(text, static_cast<std::size_t>(k));
}

}  // namespace pinproof
