// Reading a project file (format "pinproof-project/1", docs/file-format.md)
// into a `project` in SI base units, with every problem reported at its JSON
// pointer.
#pragma once

#include <nlohmann/json_fwd.hpp>

#include <string>
#include <string_view>

#include "pinproof/model/project.hpp"

namespace pinproof {

inline constexpr const char* project_format = "pinproof-project/1";

// Reads a project from parsed JSON. Throws input_error listing every problem
// found, each with its JSON pointer.
project read_project(const nlohmann::json& document);

// Where joints given as detail ids (e.g. "FP-3-M20") are looked up: the detail
// catalogue file given on the command line, or else the file named by the
// project's "details" key, relative to base_dir (docs/batch-and-catalogues.md).
struct project_sources {
    std::string details_file;
    std::string base_dir;
};

// Parses project-file text (JSON syntax errors are reported with their line
// and column) and reads it.
project parse_project(std::string_view text, const project_sources& sources = {});

// Reads a project file from disk. A file that cannot be read is an input_error
// naming the path. `details_file` overrides the project's "details" key.
project load_project_file(const std::string& path, const std::string& details_file = "");

}  // namespace pinproof
