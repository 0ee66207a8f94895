// Reading and validating the `detail` object of a joint (docs/file-format.md,
// defaults and their sources in docs/method/gap-geometry.md).
#pragma once

#include <nlohmann/json_fwd.hpp>

#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/connection_detail.hpp"

namespace pinproof {

// Reads the `detail` object of a joint at JSON pointer `pointer`, applies the
// documented defaults and validates it against the supported beam's section.
// Every problem is added to `problems` with the pointer of the field at fault;
// the returned value is meaningful only when no problem was added.
connection_detail read_connection_detail(const nlohmann::json& value, const std::string& pointer,
                                         const section& beam, problem_list& problems);

}  // namespace pinproof
