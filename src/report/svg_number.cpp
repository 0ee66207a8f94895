#include "report/svg_number.hpp"

#include <cmath>
#include <cstdio>

#include "pinproof/core/errors.hpp"

namespace pinproof {

std::string svg_number(double v, int decimals)
{
    if (!std::isfinite(v)) throw internal_error("a drawing coordinate is not finite");
    if (decimals < 0 || decimals > 6) throw internal_error("a drawing coordinate asks for 0 to 6 decimals");
    // Half a unit of the last place: below it the value prints as zero, so
    // small negatives would print as "-0.0".
    if (std::abs(v) < 0.5 * std::pow(10.0, -decimals)) v = 0.0;
    char b[48];
    std::snprintf(b, sizeof b, "%.*f", decimals, v);
    return b;
}

}  // namespace pinproof
