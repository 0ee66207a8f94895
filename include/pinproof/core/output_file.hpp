// Writing result files so that a failed or interrupted run never leaves a
// half-written file: the text goes to a temporary file beside the target,
// which is then renamed over it.
#pragma once

#include <string>

namespace pinproof {

// Writes `content` to `path` atomically. Throws pinproof::error on failure,
// after removing the temporary file.
void write_file_atomically(const std::string& path, const std::string& content);

}  // namespace pinproof
