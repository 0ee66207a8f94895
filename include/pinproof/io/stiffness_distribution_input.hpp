// Reading stiffness distributions ("stiffness_distribution" objects of a joint
// or a catalogue entry) and the beam's "stiffness_correlation"
// (docs/method/sweep-and-probability.md).
#pragma once

#include <nlohmann/json_fwd.hpp>

#include <optional>
#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/model/stiffness_distribution.hpp"

namespace pinproof {

// Reads a "stiffness_distribution" object at `pointer`. Stiffness values are
// rotational stiffnesses ("1500 kN*m/rad", a bare number in N*m/rad) or
// multiples of EI/L ("0.5 EI/L"; EI_over_L in N*m/rad, <= 0 if unknown, in
// which case such a value is not converted and nullopt is returned without a
// further problem). Every problem is added to `problems` with its JSON pointer;
// nullopt is returned if any was found.
std::optional<stiffness_distribution> read_stiffness_distribution(const nlohmann::json& value,
                                                                  const std::string& pointer, double EI_over_L,
                                                                  problem_list& problems);

// Reads the beam's "stiffness_correlation" (0: the two ends independent,
// 1: fully correlated, one draw for both) from the beam object at
// `beam_pointer`; default 1. Other values are refused with a message.
std::optional<int> read_stiffness_correlation(const nlohmann::json& beam_object, const std::string& beam_pointer,
                                              problem_list& problems);

// Reads "/joints/start/stiffness_distribution", "/joints/end/stiffness_distribution"
// and "stiffness_correlation" of beam `b` from the project document (at b.pointer).
stiffness_uncertainty read_stiffness_uncertainty(const nlohmann::json& document, const beam& b,
                                                 problem_list& problems);

}  // namespace pinproof
