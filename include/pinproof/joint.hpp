// A beam-end joint as the project file describes it: the range of its initial
// rotational stiffness and, optionally, its design moment resistance.
#pragma once

#include <optional>
#include <string>

#include "pinproof/stiffness.hpp"

namespace pinproof {

struct stiffness_range {
    stiffness min = stiffness::pinned();
    stiffness max = stiffness::pinned();
};

struct joint {
    stiffness_range range;
    std::optional<double> moment_resistance;  // N*m, design resistance of the joint
};

enum class beam_end { start, end };
std::string to_string(beam_end e);  // "start", "end"

}  // namespace pinproof
