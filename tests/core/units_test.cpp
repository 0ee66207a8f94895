// Verification of units: parsing to SI, dimensions, unit systems, formatting.
//
// Sources of the conversion factors (NIST SP 811, 2008 ed., Appendix B, cited
// from memory; the definitions themselves are exact):
//   [YP59] in = 0.0254 m, ft = 0.3048 m exactly: international yard and
//          pound agreement, 1959. Avoirdupois pound = 0.45359237 kg exactly.
//   [CGPM] standard gravity g_n = 9.80665 m/s^2 exactly: 3rd CGPM, 1901.
//          lbf = 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N exactly.
//   [SI]   SI prefixes k = 1e3, M = 1e6, G = 1e9, c = 1e-2, m = 1e-3 and
//          N = kg*m/s^2, Pa = N/m^2: SI Brochure, 9th ed. (BIPM 2019).
//   kip = 1000 lbf, psi = lbf/in^2, ksi = kip/in^2, deg = pi/180 rad:
//          common practice, no source.
// Expected SI values of derived US units were computed by us as exact
// rationals from these definitions (python3 fractions.Fraction) and rounded
// to 17 significant figures; they are not taken from a table.
// Tolerance: 1e-12 relative unless a case states otherwise.
#include "pinproof/core/errors.hpp"
#include "pinproof/core/units.hpp"

#include <doctest/doctest.h>

#include <cmath>
#include <limits>
#include <stdexcept>
#include <string>
#include <vector>

using namespace pinproof;

namespace {

constexpr double rel_tol = 1e-12;

bool close(double actual, double expected, double rel = rel_tol)
{
    return std::abs(actual - expected) <= rel * std::abs(expected);
}

std::string parse_error(const std::string& text)
{
    try {
        parse_quantity(text);
    } catch (const std::invalid_argument& e) {
        return e.what();
    }
    return "";
}

struct unit_case {
    const char* text;
    double si;
    dimension dim;
    const char* source;
};

}  // namespace

TEST_CASE("every listed unit parses to its exact SI value (1e-12 relative)")
{
    const double lbf = 4.4482216152605;  // [YP59] x [CGPM], exact
    const unit_case table[] = {
        {"1 m", 1.0, dims::length, "SI base unit"},
        {"1 mm", 1e-3, dims::length, "[SI] prefix m"},
        {"1 cm", 1e-2, dims::length, "[SI] prefix c"},
        {"1 ft", 0.3048, dims::length, "[YP59]"},
        {"1 in", 0.0254, dims::length, "[YP59]"},
        {"1 N", 1.0, dims::force, "[SI]"},
        {"1 kN", 1e3, dims::force, "[SI] prefix k"},
        {"1 MN", 1e6, dims::force, "[SI] prefix M"},
        {"1 lbf", lbf, dims::force, "[YP59] x [CGPM]"},
        {"1 lb", lbf, dims::force, "synonym of lbf, common practice, no source"},
        {"1 kip", 4448.2216152605, dims::force, "1000 lbf"},
        {"1 Pa", 1.0, dims::pressure, "[SI]"},
        {"1 kPa", 1e3, dims::pressure, "[SI]"},
        {"1 MPa", 1e6, dims::pressure, "[SI]"},
        {"1 GPa", 1e9, dims::pressure, "[SI]"},
        {"1 psi", 6894.757293168362, dims::pressure, "lbf/in^2, computed: 8896443230521/1290320000 Pa"},
        {"1 ksi", 6894757.293168361, dims::pressure, "kip/in^2, computed: 8896443230521/1290320 Pa"},
        {"1 N/m", 1.0, dims::line_load, "[SI]"},
        {"1 kN/m", 1e3, dims::line_load, "[SI]"},
        {"1 N/mm", 1e3, dims::line_load, "[SI]"},
        {"1 lbf/ft", 14.593902937206364, dims::line_load, "computed: 8896443230521/609600000000 N/m"},
        {"1 kip/ft", 14593.902937206365, dims::line_load, "computed: 8896443230521/609600000 N/m"},
        {"1 mm4", 1e-12, dims::second_moment, "[SI]"},
        {"1 cm4", 1e-8, dims::second_moment, "[SI]"},
        {"1 m4", 1.0, dims::second_moment, "[SI]"},
        {"1 in4", 4.162314256e-7, dims::second_moment, "0.0254^4 exactly, [YP59]"},
        {"1 mm2", 1e-6, dims::area, "[SI]"},
        {"1 cm2", 1e-4, dims::area, "[SI]"},
        {"1 in2", 6.4516e-4, dims::area, "0.0254^2 exactly, [YP59]"},
        {"1 N*m", 1.0, dims::moment, "[SI]"},
        {"1 kN*m", 1e3, dims::moment, "[SI]"},
        {"1 kip*ft", 1355.8179483314004, dims::moment, "computed: 3389544870828501/2500000000000 N*m"},
        {"1 kip*in", 112.9848290276167, dims::moment, "computed: 1129848290276167/10000000000000 N*m"},
        {"1 N*m/rad", 1.0, dims::rotational_stiffness, "[SI]"},
        {"1 kN*m/rad", 1e3, dims::rotational_stiffness, "[SI]"},
        {"1 kip*in/rad", 112.9848290276167, dims::rotational_stiffness, "as kip*in"},
        {"1 kip*ft/rad", 1355.8179483314004, dims::rotational_stiffness, "as kip*ft"},
        {"1 rad", 1.0, dims::angle, "SI coherent unit"},
        {"1 mrad", 1e-3, dims::angle, "[SI]"},
        {"1 deg", 0.017453292519943295, dims::angle, "pi/180, common practice, no source"},
        {"1 kg", 1.0, dimension{0, 1, 0, 0}, "SI base unit"},
        {"1 s", 1.0, dimension{0, 0, 1, 0}, "SI base unit"},
        {"4 Hz", 4.0, dims::frequency, "hertz = 1/s, SI Brochure Table 4"},
        {"4 s^-1", 4.0, dims::frequency, "[SI]"},
    };
    for (const auto& c : table) {
        CAPTURE(c.text);
        CAPTURE(c.source);
        const quantity q = parse_quantity(c.text);
        CHECK(close(q.value, c.si));
        CHECK(q.dim == c.dim);
    }
}

TEST_CASE("spellings of the same unit expression agree (1e-12 relative)")
{
    const unit_case table[] = {
        {"20 kN/m", 20e3, dims::line_load, "reference spelling"},
        {"20kN/m", 20e3, dims::line_load, "no space after the number"},
        {"  20   kN / m  ", 20e3, dims::line_load, "spaces around operators"},
        {"+20 kN/m", 20e3, dims::line_load, "explicit sign"},
        {"48 kN.m", 48e3, dims::moment, "'.' product"},
        {"48 kN\xC2\xB7m", 48e3, dims::moment, "U+00B7 middle dot"},
        {"48 kN\xE2\x8B\x85m", 48e3, dims::moment, "U+22C5 dot operator"},
        {"48 m*kN", 48e3, dims::moment, "commuted product"},
        {"8356 cm^4", 8356e-8, dims::second_moment, "'^' power"},
        {"8356 cm**4", 8356e-8, dims::second_moment, "'**' power"},
        {"8356 cm\xE2\x81\xB4", 8356e-8, dims::second_moment, "U+2074 superscript four"},
        {"53.8 cm\xC2\xB2", 53.8e-4, dims::area, "U+00B2 superscript two"},
        {"2 m\xC2\xB3", 2.0, dimension{3, 0, 0, 0}, "U+00B3 superscript three"},
        {"210000 N/mm2", 210e9, dims::pressure, "N/mm^2 = MPa, [SI]"},
        {"210000 N/mm/mm", 210e9, dims::pressure, "left-associative quotient"},
        {"2500 kN*m*rad^-1", 2.5e6, dims::rotational_stiffness, "negative power"},
        {"2500 (kN*m)/rad", 2.5e6, dims::rotational_stiffness, "parentheses"},
        {"2500 kN/(rad/m)", 2.5e6, dims::rotational_stiffness, "parenthesised quotient"},
        {"1 kg*m/s^2", 1.0, dims::force, "N = kg*m/s^2, [SI]"},
        {"1 N/m^2", 1.0, dims::pressure, "Pa = N/m^2, [SI]"},
        {"-2.5E-3 m", -2.5e-3, dims::length, "signed exponent"},
        {"1e30 N", 1e30, dims::force, "large but finite"},
        {".5 m", 0.5, dims::length, "no leading zero"},
        {"6.", 6.0, dims::dimensionless, "bare number"},
    };
    for (const auto& c : table) {
        CAPTURE(c.text);
        CAPTURE(c.source);
        const quantity q = parse_quantity(c.text);
        CHECK(close(q.value, c.si));
        CHECK(q.dim == c.dim);
    }
}

TEST_CASE("the same quantity in SI and US units gives the same SI value (1e-12 relative)")
{
    const std::pair<const char*, const char*> pairs[] = {
        {"1 kip*ft", "1355.8179483314004 N*m"},  // computed from [YP59] x [CGPM]
        {"1 kip*ft", "12 kip*in"},               // ft = 12 in, [YP59]
        {"1 ft", "304.8 mm"},                    // [YP59]
        {"12 in", "1 ft"},                       // [YP59]
        {"1 ksi", "6.894757293168362 MPa"},      // computed
        {"1 ksi", "1000 psi"},                   // kip = 1000 lbf
        {"1 psi", "1 lbf/in^2"},                 // definition of psi
        {"1 kip/ft", "14.593902937206365 kN/m"}, // computed
        {"1 in4", "41.62314256 cm4"},            // 2.54^4 cm4, [YP59]
        {"1 kip*in/rad", "0.1129848290276167 kN*m/rad"},  // computed
        {"180 deg", "3.141592653589793 rad"},    // pi
        {"1 lb", "1 lbf"},                       // synonym
        {"1 kN*ft", "304.8 N*m"},                // mixed system, [YP59]
    };
    for (const auto& [a, b] : pairs) {
        CAPTURE(a);
        CAPTURE(b);
        const quantity qa = parse_quantity(a);
        const quantity qb = parse_quantity(b);
        CHECK(close(qa.value, qb.value));
        CHECK(qa.dim == qb.dim);
    }
}

TEST_CASE("the returned dimension tells a wrong kind of quantity (exact)")
{
    CHECK(parse_quantity("25 kN*m").dim == dims::moment);
    CHECK(parse_quantity("25 kN*m").dim != dims::rotational_stiffness);
    CHECK(parse_quantity("25 kN*m/rad").dim == dims::rotational_stiffness);
    CHECK(parse_quantity("25 kN*m/rad").dim != dims::moment);
    CHECK(parse_quantity("20 kN").dim != dims::line_load);
    CHECK(parse_quantity("20 kN/m2").dim == dims::pressure);
    CHECK(parse_quantity("8356 cm2").dim != dims::second_moment);
    CHECK(parse_quantity("0.5 deg").dim == dims::angle);
    CHECK(parse_quantity("0.5").dim == dims::dimensionless);
    CHECK(parse_quantity("4 Hz").dim != dims::angle);
    CHECK(parse_quantity("4 Hz").system == unit_system::neutral);
    CHECK(parse_quantity("6 m").dim != dims::dimensionless);
}

TEST_CASE("unit system of a parsed value (documented choice in units.hpp)")
{
    CHECK(parse_quantity("20 kN/m").system == unit_system::si);
    CHECK(parse_quantity("1 kip*ft").system == unit_system::us_customary);
    CHECK(parse_quantity("1 kN*ft").system == unit_system::us_customary);  // mixed counts as US
    CHECK(parse_quantity("1 ft*kN").system == unit_system::us_customary);
    CHECK(parse_quantity("1 kip*ft/rad").system == unit_system::us_customary);
    CHECK(parse_quantity("0.01 rad").system == unit_system::neutral);
    CHECK(parse_quantity("2 deg").system == unit_system::neutral);
    CHECK(parse_quantity("5").system == unit_system::neutral);
    CHECK(parse_quantity("5 mrad").system == unit_system::neutral);
}

TEST_CASE("malformed texts are refused with std::invalid_argument")
{
    const char* bad[] = {
        "", "   ", "abc", "nan", "NaN m", "inf", "-inf kN", "infinity",
        "0x1A m", "0x10",
        "1e400 m",    // overflows a double
        "1e-400 m",   // underflows a double
        "1e308 GPa",  // finite number, infinite in SI
        "25 kNn", "kN 25", "25 kN m", "25 kNm", "5 min", "5 mft", "5 kft", "5 kkN", "5 Mm",
        "1,5 m", "1.5.5 m", "--5 m", "- 5 m", "5 m/", "5 /m", "5 m^", "5 m^0", "5 m**", "5 m^2^2",
        "5 (m", "5 m)", "5 ()", "3/8.5 in", "5 m extra", "5 kN*", "5 kN..m", ".", "-", "+",
        "1e m", "5 m 4", "5 \xC2\xB5m", "5 m^99", "5 ((((((((((m))))))))))",
    };
    for (const char* text : bad) {
        CAPTURE(text);
        CHECK_THROWS_AS(parse_quantity(text), std::invalid_argument);
    }
}

TEST_CASE("error messages say what was found and what was expected")
{
    CHECK(parse_error("25 kNn").find("unknown unit \"kNn\" in \"25 kNn\"") != std::string::npos);
    CHECK(parse_error("25 kNm").find("\"kN*m\"") != std::string::npos);  // hint to write a product
    CHECK(parse_error("abc").find("\"abc\" is not a number followed by a unit") != std::string::npos);
    CHECK(parse_error("").find("empty") != std::string::npos);
    CHECK(parse_error("1e400 m").find("out of the range") != std::string::npos);
    CHECK(parse_error("25 kN m").find("found \"m\"") != std::string::npos);
    CHECK(parse_error("0x1A m").find("hexadecimal") != std::string::npos);
    CHECK(parse_error("1,5 m").find("decimal separator") != std::string::npos);
}

TEST_CASE("describe and example_of name each dimension - and every example parses back to it")
{
    const std::pair<dimension, const char*> names[] = {
        {dims::length, "length"},
        {dims::force, "force"},
        {dims::pressure, "pressure or modulus"},
        {dims::line_load, "line load (force per length)"},
        {dims::second_moment, "second moment of area"},
        {dims::area, "area"},
        {dims::moment, "moment"},
        {dims::rotational_stiffness, "rotational stiffness"},
        {dims::angle, "angle (rotation)"},
        {dims::dimensionless, "dimensionless number"},
        {dimension{1, 0, -1, 0}, "quantity of dimension m*s^-1"},
        {dimension{2, 1, -2, -2}, "quantity of dimension m^2*kg*s^-2*rad^-2"},
    };
    for (const auto& [d, name] : names) {
        CAPTURE(name);
        CHECK(describe(d) == name);
        CHECK(parse_quantity(example_of(d)).dim == d);
    }
    CHECK(example_of(dims::rotational_stiffness) == "2500 kN*m/rad");
}

TEST_CASE("display units: symbol parses back to the stated size and dimension (1e-12 relative)")
{
    const dimension all[] = {dims::length, dims::force, dims::pressure, dims::line_load,
                             dims::second_moment, dims::area, dims::moment,
                             dims::rotational_stiffness, dims::angle, dimension{1, 0, -1, 0}};
    for (const dimension d : all)
        for (const unit_system s : {unit_system::si, unit_system::us_customary, unit_system::neutral}) {
            const display_unit u = display_unit_for(d, s);
            CAPTURE(u.symbol);
            const quantity q = parse_quantity("1 " + u.symbol);
            CHECK(q.dim == d);
            CHECK(close(q.value, u.si_per_unit));
        }
    // The table asked for by the project (common practice, no source).
    CHECK(display_unit_for(dims::moment, unit_system::si).symbol == "kN*m");
    CHECK(display_unit_for(dims::moment, unit_system::us_customary).symbol == "kip*ft");
    CHECK(close(display_unit_for(dims::moment, unit_system::us_customary).si_per_unit, 1355.8179483314004));
    CHECK(display_unit_for(dims::length, unit_system::si).symbol == "mm");
    CHECK(display_unit_for(dims::length, unit_system::neutral).symbol == "mm");
    CHECK(display_unit_for(dims::pressure, unit_system::si).symbol == "GPa");
    CHECK(display_unit_for(dims::rotational_stiffness, unit_system::us_customary).symbol == "kip*in/rad");
    CHECK(display_unit_for(dims::angle, unit_system::us_customary).symbol == "mrad");
    CHECK(display_unit_for(dims::dimensionless, unit_system::si).symbol.empty());
}

TEST_CASE("format_number: significant figures - fixed or scientific layout (exact strings)")
{
    CHECK(format_number(48.0) == "48.00");
    CHECK(format_number(0.01026) == "0.01026");
    CHECK(format_number(12345.0) == "12345");
    CHECK(format_number(-3.14159) == "-3.142");
    CHECK(format_number(9.9996) == "10.00");  // rounding carries into a new digit
    CHECK(format_number(0.001234) == "0.001234");
    CHECK(format_number(0.0001234) == "1.234e-04");  // fixed would need 7 decimals
    CHECK(format_number(1.5e9) == "1.500e+09");
    CHECK(format_number(999999999.0) == "1.000e+09");
    CHECK(format_number(123456789.0) == "123456789");
    CHECK(format_number(1.234e-7) == "1.234e-07");
    CHECK(format_number(0.0) == "0");
    CHECK(format_number(-0.0) == "0");
    CHECK(format_number(2.0, 1) == "2");
    CHECK(format_number(1.0 / 3.0, 3) == "0.333");
    CHECK(format_number(-9.9996) == "-10.00");
    CHECK(format_number(99999.6) == "100000");
    CHECK(format_number(0.00099996) == "0.001000");
}

TEST_CASE("format refuses non-finite values and bad precision with internal_error")
{
    const double nan = std::numeric_limits<double>::quiet_NaN();
    const double inf = std::numeric_limits<double>::infinity();
    CHECK_THROWS_AS(format_number(nan), internal_error);
    CHECK_THROWS_AS(format_number(inf), internal_error);
    CHECK_THROWS_AS(format_number(-inf), internal_error);
    CHECK_THROWS_AS(format_quantity(nan, dims::moment, unit_system::si), internal_error);
    CHECK_THROWS_AS(format_quantity(inf, dims::length, unit_system::us_customary), internal_error);
    CHECK_THROWS_AS(format_number(1.0, 0), internal_error);
    CHECK_THROWS_AS(format_number(1.0, 18), internal_error);
}

TEST_CASE("format_quantity in SI and US (exact strings)")
{
    // Values of the worked IPE 300 beam, reference pack section 5 [D].
    CHECK(format_quantity(48e3, dims::moment, unit_system::si) == "48.00 kN*m");
    CHECK(format_quantity(0.01026, dims::angle, unit_system::si) == "10.26 mrad");
    CHECK(format_quantity(0.01923, dims::length, unit_system::si) == "19.23 mm");
    CHECK(format_quantity(210e9, dims::pressure, unit_system::si) == "210.0 GPa");
    CHECK(format_quantity(8356e-8, dims::second_moment, unit_system::neutral) == "8356 cm4");
    CHECK(format_quantity(1355.8179483314004, dims::moment, unit_system::us_customary) == "1.000 kip*ft");
    CHECK(format_quantity(0.0254, dims::length, unit_system::us_customary) == "1.000 in");
    CHECK(format_quantity(0.5, dims::dimensionless, unit_system::si) == "0.5000");
}

TEST_CASE("round trips parse(format_quantity(x)) (17 s.f.: 1e-12 relative - 4 s.f.: 5e-4 relative)")
{
    const std::pair<double, dimension> values[] = {
        {48e3, dims::moment},           {2.5e6, dims::rotational_stiffness},
        {0.01026, dims::angle},         {-0.01923, dims::length},
        {210e9, dims::pressure},        {20e3, dims::line_load},
        {8.356e-5, dims::second_moment}, {5.38e-3, dims::area},
        {120e3, dims::force},           {0.37, dims::dimensionless},
        {1.23e-9, dims::length},        {7.5e12, dims::force},
        {3.7, dimension{1, 0, -1, 0}},
    };
    for (const auto& [x, d] : values)
        for (const unit_system s : {unit_system::si, unit_system::us_customary}) {
            const std::string full = format_quantity(x, d, s, 17);
            const std::string short_form = format_quantity(x, d, s, 4);
            CAPTURE(full);
            CAPTURE(short_form);
            CHECK(close(parse_quantity(full).value, x));
            CHECK(parse_quantity(full).dim == d);
            CHECK(close(parse_quantity(short_form).value, x, 5e-4));
        }
}

TEST_CASE("format_number: values that agree to 1e-9 print the same - round once from the decimal digits (exact strings)")
{
    // Issue 11: equal symmetric end values printed as 68.17 and 68.18. The rule
    // is the project's (common practice, no source): round once, half away from
    // zero, from the 9-figure decimal of the value.
    const double below = 68.17499999999999, above = 68.17500000000001;
    CHECK(format_number(below) == "68.18");
    CHECK(format_number(above) == "68.18");
    CHECK(format_number(-below) == "-68.18");
    // 2.675 is stored as 2.67499999999999982236431605997495353221893310546875.
    CHECK(format_number(2.675, 3) == "2.68");
    CHECK(format_number(0.1 * 3, 1) == format_number(0.3, 1));
    // A real difference above 1e-9 still shows.
    CHECK(format_number(68.1749) == "68.17");
    // Property: a value and its neighbours within 1e-12 relative print the same,
    // over 10 000 values placed on the half-way points of 4 figures.
    int differ = 0;
    for (int k = 1000; k < 11000; ++k) {
        const double half = (k + 0.5) * 1e-2;  // 10.005 ... 110.005
        const std::string a = format_number(half * (1 - 1e-12)), b = format_number(half * (1 + 1e-12));
        if (a != b) ++differ;
    }
    CHECK(differ == 0);
}

TEST_CASE("fractional inches [YP59] [common practice - no source]: 13/16 in - 1-1/2 in - 1 1/2 in (1e-15 relative)")
{
    // US drawings write fractions of an inch; in = 0.0254 m exactly [YP59].
    struct row {
        const char* text;
        double inches;
    };
    for (const row& r : {row{"13/16 in", 13.0 / 16.0}, row{"1-1/2 in", 1.5}, row{"1 1/2 in", 1.5},
                         row{"3/4in", 0.75}, row{"-1-1/4 in", -1.25}, row{"2-3/8 in", 2.375}, row{"5/8 in", 0.625}}) {
        CAPTURE(r.text);
        const quantity q = parse_quantity(r.text);
        CHECK(q.dim == dims::length);
        CHECK(q.value == doctest::Approx(r.inches * 0.0254).epsilon(1e-15));
        CHECK(q.system == unit_system::us_customary);
    }
    // Not fractions: units keep their meaning.
    CHECK(parse_quantity("20 kN/m").dim == dims::line_load);
    CHECK(parse_quantity("6 m").value == 6.0);
}

TEST_CASE("malformed fractions are refused with the reason [project rules]")
{
    for (const char* text : {"1/0 in", "1-3/2 in", "1.5/2 in", "1/2/3 in", "1/2.5 in"}) {
        CAPTURE(text);
        CHECK_THROWS_AS(parse_quantity(text), std::invalid_argument);
    }
    try {
        parse_quantity("1/0 in");
    } catch (const std::invalid_argument& e) {
        CHECK(std::string(e.what()).find("denominator 0") != std::string::npos);
    }
    try {
        parse_quantity("1-3/2 in");
    } catch (const std::invalid_argument& e) {
        CHECK(std::string(e.what()).find("proper fraction") != std::string::npos);
    }
}
