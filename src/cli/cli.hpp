// The pinproof command line, as a function: main() only forwards to run().
//
// Exit codes: 0 every verdict holds, 1 a verdict does not hold, 2 bad input,
// a usage error or an internal error.
#pragma once

#include <iosfwd>
#include <string>
#include <vector>

namespace pinproof::cli {

inline constexpr int exit_holds = 0;
inline constexpr int exit_does_not_hold = 1;
inline constexpr int exit_error = 2;

// args excludes the program name. Data goes to `out`, messages to `err`.
int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err);

}  // namespace pinproof::cli
