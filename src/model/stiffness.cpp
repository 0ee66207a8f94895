#include "pinproof/model/stiffness.hpp"

#include <cmath>
#include <stdexcept>

namespace pinproof {

stiffness stiffness::spring(double n_m_per_rad)
{
    if (!std::isfinite(n_m_per_rad) || n_m_per_rad < 0.0)
        throw std::invalid_argument("a joint spring stiffness must be finite and not negative");
    return stiffness(false, n_m_per_rad);
}

}  // namespace pinproof
