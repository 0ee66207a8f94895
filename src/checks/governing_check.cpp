#include "pinproof/checks/governing_check.hpp"

#include <cmath>
#include <limits>

namespace pinproof {

std::optional<double> utilisation(const check& c)
{
    if (!c.value || !c.limit || !(*c.limit > 0)) return std::nullopt;
    // A least limit (the floor frequency) is used up as the value falls to it.
    if (c.limit_is_minimum && !(*c.value > 0)) return std::nullopt;
    const double r = c.limit_is_minimum ? *c.limit / *c.value : *c.value / *c.limit;
    if (!std::isfinite(r)) return std::nullopt;
    return r;
}

const check* governing_check(const beam_assessment& a)
{
    const check* governing = nullptr;
    int best_rank = 0;
    double best_ratio = -1;
    for (const auto& c : a.checks) {
        if (c.id.rfind("detailing-", 0) == 0 || c.informative) continue;
        const auto r = utilisation(c);
        const bool failed = c.status == check_status::fail;
        const int rank = failed ? 2 : r ? 1 : 0;
        if (rank == 0) continue;
        const double key = r ? *r : std::numeric_limits<double>::infinity();
        if (rank > best_rank || (rank == best_rank && key > best_ratio)) {
            governing = &c;
            best_rank = rank;
            best_ratio = key;
        }
    }
    return governing;
}

}  // namespace pinproof
