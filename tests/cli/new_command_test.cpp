// `pinproof new`: the starter project is accepted by `check` as written and
// every verdict holds, in SI and in US units; an existing file is never
// replaced [project rules: issue on the calculation sheet and command-line habits].
#include <doctest/doctest.h>

#include <filesystem>
#include <fstream>
#include <sstream>

#include "cli/cli.hpp"
#include "temp_dir.hpp"

using pinproof::cli::run;

namespace {
int run_cli(const std::vector<std::string>& args, std::string* out_text = nullptr, std::string* err_text = nullptr)
{
    std::ostringstream out, err;
    const int code = run(args, out, err);
    if (out_text) *out_text = out.str();
    if (err_text) *err_text = err.str();
    return code;
}
}  // namespace

TEST_CASE("new writes a starter that check accepts and whose verdict holds - SI and US")
{
    pinproof::testing::temp_dir dir("new");
    for (const char* units : {"SI", "US"}) {
        const std::string file = (dir.path / (std::string("starter-") + units + ".json")).string();
        CHECK(run_cli({"new", "--units", units, "-o", file}) == 0);
        std::string report;
        CHECK(run_cli({"check", file}, &report) == 0);
        CHECK(report.find(units == std::string("US") ? "AISC 360" : "EN 1993-1-8") != std::string::npos);
    }
}

TEST_CASE("new writes to standard output by default - and never replaces a file")
{
    std::string text;
    CHECK(run_cli({"new"}, &text) == 0);
    CHECK(text.find("\"format\": \"pinproof-project/1\"") != std::string::npos);
    pinproof::testing::temp_dir dir("new");
    const std::string existing = dir.write("project.json", "my own project");
    std::string err;
    CHECK(run_cli({"new", "-o", existing}, nullptr, &err) == 2);
    CHECK(err.find("exists already") != std::string::npos);
    std::ifstream in(existing);
    std::string kept((std::istreambuf_iterator<char>(in)), {});
    CHECK(kept == "my own project");
}
