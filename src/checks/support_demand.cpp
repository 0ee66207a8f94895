#include "pinproof/checks/support_demand.hpp"

#include <cmath>
#include <stdexcept>

namespace pinproof {

double default_support_eccentricity(const connection_detail* detail)
{
    constexpr double nominal = 0.100;  // BS 5950-1 4.7.7: 100 mm from the face
    if (detail && detail->support == support_type::beam_web && detail->type == detail_type::fin_plate)
        return detail->gap + detail->bolts.bolt_line;
    return nominal;
}

support_demand demand_on_support(double joint_moment, double reaction, double eccentricity,
                                 const std::optional<support_column>& column, bool beam_web_support)
{
    if (!std::isfinite(joint_moment) || !std::isfinite(reaction) || !(std::isfinite(eccentricity) && eccentricity >= 0))
        throw std::invalid_argument("the support demand needs finite moments, reactions and eccentricities");
    support_demand d;
    d.eccentricity = eccentricity;
    d.moment = joint_moment + reaction * eccentricity;
    if (beam_web_support) d.torsion = d.moment;
    if (column) {
        const auto stiffness_of = [](double I, double length) {
            if (I < 0 || length < 0 || !std::isfinite(I) || !std::isfinite(length))
                throw std::invalid_argument("a column length and its second moment must be finite and >= 0");
            return length > 0 ? I / length : 0.0;
        };
        const double above = stiffness_of(column->I_above, column->length_above);
        const double below = stiffness_of(column->I_below, column->length_below);
        if (!(above + below > 0)) throw std::invalid_argument("a column needs a length above or below the joint");
        d.moment_above = d.moment * above / (above + below);
        d.moment_below = d.moment * below / (above + below);
    }
    return d;
}

}  // namespace pinproof
