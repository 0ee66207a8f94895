// Independent solvers in tests: a python3 one-liner (python3-scipy,
// python3-sympy) run as `/usr/bin/python3 -c "CODE"`.
#pragma once

#include <unistd.h>

#include <array>
#include <cstdio>
#include <memory>
#include <optional>
#include <string>

namespace pinproof::test_data {

// What the code printed; nullopt where python3, or a module it imports, is
// not available (the caller then skips with a message). CODE must not hold a
// double quote.
inline std::optional<std::string> python_output(const std::string& code)
{
    if (access("/usr/bin/python3", X_OK) != 0) return std::nullopt;
    const std::string cmd = "/usr/bin/python3 -c \"" + code + "\" 2>/dev/null";
    std::unique_ptr<FILE, int (*)(FILE*)> pipe(popen(cmd.c_str(), "r"), pclose);
    if (!pipe) return std::nullopt;
    std::string out;
    std::array<char, 256> buf{};
    while (fgets(buf.data(), buf.size(), pipe.get())) out += buf.data();
    if (out.empty()) return std::nullopt;
    return out;
}

}  // namespace pinproof::test_data
