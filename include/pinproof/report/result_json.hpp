// The machine-readable result, format "pinproof-result/1" (docs/file-format.md).
// Every value is in SI base units; a rigid stiffness is null.
#pragma once

#include <nlohmann/json_fwd.hpp>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

inline constexpr const char* result_format = "pinproof-result/1";

nlohmann::json to_json(const beam_state& s);
nlohmann::json to_json(const beam_assessment& a);
nlohmann::json to_json(const project_assessment& a);

}  // namespace pinproof
