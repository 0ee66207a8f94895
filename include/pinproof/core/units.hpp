// Physical quantities at the input and output edges.
//
// Inside the library every value is a double in SI base units: m, N, Pa,
// N*m, N*m/rad, rad (and N/m for line loads, m^4 for second moments).
// This header is the only place where other units exist: text such as
// "250 kN*m/rad" is parsed into SI here, and SI values are formatted back
// into the unit system a project file used.
//
// Dimensions are tracked as exponents of length, mass, time and plane angle.
// Angle is kept as its own dimension (though SI treats it as 1) so that a
// moment "25 kN*m" is refused where a rotational stiffness "25 kN*m/rad"
// is expected.
//
// Unit symbols understood (case-sensitive):
//   SI    m (with prefixes k, c, m), N (k, M, G), Pa (k, M, G), kg;
//   US    ft, in, lbf (synonym lb), kip, psi, ksi;
//   other s, Hz, rad (prefix m), deg.
// Exact factors: in = 0.0254 m, ft = 0.3048 m (international yard and pound,
// 1959); lbf = 0.45359237 kg x 9.80665 m/s^2 (standard gravity, 3rd CGPM
// 1901); kip = 1000 lbf; psi = lbf/in^2; ksi = kip/in^2; deg = pi/180 rad.
// A prefix applies only to the symbols listed with it, and a symbol that
// could be read two ways is refused, so "min" is not milli-inch.
//
// Symbols written together without an operator are one symbol: "kNm" is
// refused (write "kN*m"), because juxtaposition cannot be read safely in
// general ("mm" is the millimetre, not m*m).
//
// Unit system of a parsed value: us_customary if any US symbol appears,
// otherwise si if any SI symbol appears, otherwise neutral (angles, seconds,
// bare numbers). Mixing, e.g. "kN*ft", is accepted and counts as US.
#pragma once

#include <string>
#include <string_view>

namespace pinproof {

struct dimension {
    int length = 0;
    int mass = 0;
    int time = 0;
    int angle = 0;
    friend constexpr bool operator==(dimension a, dimension b)
    {
        return a.length == b.length && a.mass == b.mass && a.time == b.time && a.angle == b.angle;
    }
    friend constexpr bool operator!=(dimension a, dimension b) { return !(a == b); }
};

namespace dims {
inline constexpr dimension dimensionless{0, 0, 0, 0};
inline constexpr dimension length{1, 0, 0, 0};
inline constexpr dimension force{1, 1, -2, 0};               // N
inline constexpr dimension pressure{-1, 1, -2, 0};           // Pa (also modulus)
inline constexpr dimension line_load{0, 1, -2, 0};           // N/m
inline constexpr dimension second_moment{4, 0, 0, 0};        // m^4
inline constexpr dimension area{2, 0, 0, 0};                 // m^2
inline constexpr dimension moment{2, 1, -2, 0};              // N*m
inline constexpr dimension rotational_stiffness{2, 1, -2, -1};  // N*m/rad
inline constexpr dimension angle{0, 0, 0, 1};                // rad
inline constexpr dimension frequency{0, 0, -1, 0};           // Hz (cycles per second)
}  // namespace dims

// Which family of units a text used. Angles and bare numbers are neutral.
enum class unit_system { neutral, si, us_customary };

struct quantity {
    double value = 0.0;  // in SI base units
    dimension dim;
    unit_system system = unit_system::neutral;
};

// Parses "number unit-expression", for example "12.5 kN/m", "8356 cm4",
// "2500 kN*m/rad", "3/8 in" is NOT accepted (use 0.375 in). A bare number
// is dimensionless. Unit expressions are products and quotients of unit
// symbols with integer powers: "kN*m/rad", "kN.m", "N/mm^2", "mm4", "m**4".
//   number   : optional sign, decimal digits, optional exponent ("-2.5E-3");
//              nan, inf, hex, and values out of the range of a double are
//              refused, as is a value that becomes infinite in SI units.
//   products : '*', '.', U+00B7 or U+22C5 between factors ("kN.m", "kN·m").
//   quotients: '/', left-associative: "kN*m/rad" = (kN*m)/rad,
//              "N/mm/mm" = N/mm^2. Parentheses group: "kN/(m*rad)".
//   powers   : digits right after a symbol ("mm4"), "^n" or "**n" (n may be
//              negative: "s^-2"), or U+00B2, U+00B3, U+2074 ("m²").
//   spaces   : optional between number and unit ("20kN/m") and around
//              operators; not between a symbol and its power.
// Throws std::invalid_argument with a message naming what was wrong.
quantity parse_quantity(std::string_view text);

// Human name of a dimension: "length", "force", "rotational stiffness", ...
// A dimension without a name is described by its SI base units:
// "quantity of dimension m*s^-1".
std::string describe(dimension d);

// An example of a valid text for a dimension, used in error messages:
// "2500 kN*m/rad" for rotational stiffness.
std::string example_of(dimension d);

// The unit symbol and its size in SI, used to show a value of dimension d
// in a unit system: (moment, si) -> {"kN*m", 1e3}; (moment, us) -> {"kip*ft", 1355.8...}.
struct display_unit {
    std::string symbol;
    double si_per_unit = 1.0;
};
// The neutral system displays like SI. A dimension without a display unit
// is shown in SI base units ("m*s^-1", factor 1) in every system.
display_unit display_unit_for(dimension d, unit_system system);

// Formats an SI value in the display unit of (d, system) with the given
// number of significant figures, e.g. "48.00 kN*m". Never prints nan/inf:
// a non-finite value is an internal error.
// Numbers are fixed-point with enough decimals to show `significant` figures
// (48.00, 0.01026; 12345 stays "12345"). Scientific notation ("1.500e+09") is
// used when the rounded magnitude is >= 1e9 or fixed-point would need more
// than 6 decimals, so no figure is ever lost. Zero (also -0) prints as "0".
// Rounding happens once, in decimal: the value is first written to 9
// significant figures and the shown figures are rounded from those digits,
// half away from zero, so values that agree to about 1e-9 print the same
// (68.17499999999999 and 68.17500000000001 both as "68.18").
// `significant` must be 1..17, otherwise internal_error.
std::string format_quantity(double si_value, dimension d, unit_system system, int significant = 4);

// The number part alone, formatted as format_quantity would.
std::string format_number(double value, int significant = 4);

}  // namespace pinproof
