#include "io/plausibility.hpp"

#include <cmath>

namespace pinproof::plausibility {

std::optional<std::string> outside(double value, plausible_range r, dimension d, unit_system system,
                                   const std::string& found)
{
    if (value >= r.lo && value <= r.hi) return std::nullopt;
    return "expected a " + describe(d) + " between " + format_quantity(r.lo, d, system) + " and " +
           format_quantity(r.hi, d, system) + " (a value outside this range is not a building beam), found " + found;
}

std::optional<std::string> load_too_large(double value, dimension d, unit_system system, const std::string& found)
{
    if (std::abs(value) <= plausible_load_magnitude) return std::nullopt;
    return "expected a " + describe(d) + " of magnitude at most " +
           format_quantity(plausible_load_magnitude, d, system) + ", found " + found;
}

std::optional<std::string> stiffness_too_large(double value, unit_system system, const std::string& found)
{
    if (value <= plausible_stiffness) return std::nullopt;
    return "expected a rotational stiffness of at most " +
           format_quantity(plausible_stiffness, dims::rotational_stiffness, system) +
           " (write \"rigid\" for a fixed end), found " + found;
}

}  // namespace pinproof::plausibility
