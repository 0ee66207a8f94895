// Replays every input the fuzzers ever failed on (tests/fuzz/regressions/TARGET/)
// and the seed corpora (catalog-examples/, tests/bad-input/) through the same
// entry points as the fuzz targets (tests/fuzz/fuzz_entry.hpp): each must be
// accepted or refused the documented way (docs/robustness.md), never crash,
// throw anything else or put a non-finite number into an output.
// Reference: the promises of docs/robustness.md (common practice, no source).
#include <doctest/doctest.h>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

#include "fuzz/fuzz_entry.hpp"

namespace fs = std::filesystem;

namespace {

const fs::path source_dir{PINPROOF_SOURCE_DIR};

std::vector<fs::path> files_in(const fs::path& dir, const std::string& extension = "")
{
    std::vector<fs::path> out;
    if (!fs::is_directory(dir)) return out;
    for (const auto& e : fs::directory_iterator(dir))
        if (e.is_regular_file() && (extension.empty() || e.path().extension() == extension) &&
            e.path().filename().string()[0] != '.')
            out.push_back(e.path());
    std::sort(out.begin(), out.end());
    return out;
}

std::string contents(const fs::path& p)
{
    std::ifstream in(p, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

const std::string details_file = (source_dir / "catalog-examples/details-harbour-lane.json").string();

const pinproof::detail_catalogue& catalogue()
{
    static const pinproof::detail_catalogue c =
        pinproof::load_detail_catalogue_file(details_file);
    return c;
}

template <class Entry>
void replay(const std::vector<fs::path>& files, Entry entry)
{
    for (const auto& f : files) {
        INFO(f.string());
        const std::string text = contents(f);
        CHECK_NOTHROW(entry(text));
    }
}

}  // namespace

TEST_CASE("fuzz regressions: project-file inputs are accepted or refused with a place")
{
    replay(files_in(source_dir / "tests/fuzz/regressions/fuzz_project"),
           [](const std::string& t) { pinproof::fuzz::project_input(t, details_file); });
}

TEST_CASE("fuzz regressions: unit texts are parsed or refused with a message")
{
    replay(files_in(source_dir / "tests/fuzz/regressions/fuzz_units"),
           [](const std::string& t) { pinproof::fuzz::unit_text(t); });
}

TEST_CASE("fuzz regressions: schedule inputs are read or refused at a line and column")
{
    replay(files_in(source_dir / "tests/fuzz/regressions/fuzz_schedule"),
           [](const std::string& t) { pinproof::fuzz::schedule_input(t, catalogue()); });
}

TEST_CASE("fuzz regressions: detail catalogues are read or refused with a place")
{
    replay(files_in(source_dir / "tests/fuzz/regressions/fuzz_catalogue"),
           [](const std::string& t) { pinproof::fuzz::catalogue_input(t); });
}

TEST_CASE("fuzz regressions: stiffness distribution objects are read or refused with a place")
{
    replay(files_in(source_dir / "tests/fuzz/regressions/fuzz_distribution"),
           [](const std::string& t) { pinproof::fuzz::distribution_input(t, details_file); });
}

TEST_CASE("fuzz seeds: example and bad-input catalogues pass the catalogue entry point")
{
    const auto bad = files_in(source_dir / "tests/bad-input/catalogue", ".json");
    CHECK(bad.size() >= 10);
    replay(bad, [](const std::string& t) { pinproof::fuzz::catalogue_input(t); });
    replay(files_in(source_dir / "catalog-examples", ".json"), [](const std::string& t) {
        pinproof::fuzz::catalogue_input(t);
    });
    for (const char* t : {R"({"kind": "lognormal", "median": "0.5 EI/L", "cov": 1e300})",
                          R"({"kind": "lognormal", "p05": "1e-300 N*m/rad", "p95": 1e39})",
                          R"({"kind": "normal", "mean": "1 MN*m/rad", "sd": "1e39 N*m/rad"})", "[[[[", "1e400", "{}"})
        CHECK_NOTHROW(pinproof::fuzz::distribution_input(t, details_file));
}

TEST_CASE("fuzz seeds: the examples and the bad-input corpus pass the fuzz entry points")
{
    const auto bad = files_in(source_dir / "tests/bad-input", ".json");
    CHECK(bad.size() >= 60);
    replay(bad, [](const std::string& t) { pinproof::fuzz::project_input(t, details_file); });
    replay(files_in(source_dir / "catalog-examples", ".json"), [](const std::string& t) {
        pinproof::fuzz::project_input(t, details_file);
    });
    // Only the first 16 rows of a schedule are assessed, as in the fuzz target.
    replay(files_in(source_dir / "catalog-examples", ".csv"),
           [](const std::string& t) { pinproof::fuzz::schedule_input(t, catalogue()); });
    for (const char* t : {"12.5 kN/m", "8356 cm4", "2500 kN*m/rad", "1e308 GN", "kN", "3/8 in", "nan m", ""})
        CHECK_NOTHROW(pinproof::fuzz::unit_text(t));
}
