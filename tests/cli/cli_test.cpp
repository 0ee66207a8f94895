// Verification of the command line (src/cli/run.cpp), golden style: one case
// per behaviour, each calling pinproof::cli::run as main() does.
//
// References:
//   [CLI]  Common command-line practice (common practice, no source): --help
//          and --version print to stdout and exit 0; usage errors go to stderr
//          with a non-zero exit; data on stdout, messages on stderr.
//   [FMT]  docs/file-format.md, result format "pinproof-result/1": the keys
//          checked below, and the stable check ids.
//   [EX]   catalog-examples/mezzanine-fin-plates.json, an invented example project
//          whose verdict holds for both beams (exit 0).
// No numerical tolerance: these cases compare exit codes, keys and text.
#include <doctest/doctest.h>

#include "temp_dir.hpp"

#include <nlohmann/json.hpp>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include <sys/wait.h>

#include "cli.hpp"

namespace fs = std::filesystem;
using json = nlohmann::json;
using pinproof::cli::run;

namespace {

// One directory per test, removed at its end (tests/temp_dir.hpp).
struct temp_dir : pinproof::testing::temp_dir {
    temp_dir() : pinproof::testing::temp_dir("cli-test") {}
};

struct run_result {
    int code;
    std::string out, err;
};

run_result run_cli(const std::vector<std::string>& args)
{
    std::ostringstream out, err;
    const int code = run(args, out, err);
    return {code, out.str(), err.str()};
}

const std::string example = (fs::path(PINPROOF_SOURCE_DIR) / "catalog-examples" / "mezzanine-fin-plates.json").string();
const std::string bad_example = (fs::path(PINPROOF_SOURCE_DIR) / "tests" / "bad-input" / "span-negative.json").string();

bool has_keys(const json& j, const std::vector<std::string>& keys)
{
    bool ok = j.is_object();
    for (const auto& k : keys) {
        if (!ok || !j.contains(k)) {
            MESSAGE("missing key " << k);
            return false;
        }
    }
    return ok;
}

const std::vector<std::string> state_keys{"stiffness_start", "stiffness_end", "reaction_start", "reaction_end",
                                          "moment_start", "moment_end", "max_sagging_moment", "max_sagging_at",
                                          "max_deflection", "rotation_start", "rotation_end"};

}  // namespace

// pinproof --help: the usage text on stdout, exit 0, nothing on stderr [CLI].
TEST_CASE("cli --help prints usage on stdout and exits 0 [CLI]")
{
    const auto r = run_cli({"--help"});
    CHECK(r.code == 0);
    CHECK(r.out.find("Usage: pinproof") != std::string::npos);
    CHECK(r.out.find("check") != std::string::npos);
    CHECK(r.out.find("Exit codes") != std::string::npos);
    CHECK(r.err.empty());
}

// pinproof --version: "pinproof X.Y.Z" on stdout, exit 0 [CLI].
TEST_CASE("cli --version prints the version on stdout and exits 0 [CLI]")
{
    const auto r = run_cli({"--version"});
    CHECK(r.code == 0);
    CHECK(r.out.rfind("pinproof ", 0) == 0);
    CHECK(r.out.find_first_of("0123456789") == 9);
    CHECK(r.out.back() == '\n');
    CHECK(r.err.empty());
}

// pinproof check --help and pinproof sections --help: the command's usage, exit 0 [CLI].
TEST_CASE("cli --help on every command prints its usage on stdout [CLI]")
{
    const auto c = run_cli({"check", "--help"});
    CHECK(c.code == 0);
    CHECK(c.out.find("pinproof check") != std::string::npos);
    CHECK(c.out.find("--json") != std::string::npos);
    CHECK(c.err.empty());
    const auto s = run_cli({"sections", "--help"});
    CHECK(s.code == 0);
    CHECK(s.out.find("pinproof sections") != std::string::npos);
    CHECK(s.err.empty());
}

// No command: a message on stderr, exit 2, nothing on stdout [CLI].
TEST_CASE("cli without a command exits 2 with a message on stderr [CLI]")
{
    const auto r = run_cli({});
    CHECK(r.code == pinproof::cli::exit_error);
    CHECK(r.out.empty());
    CHECK(r.err.find("command is required") != std::string::npos);
    CHECK(r.err.find("--help") != std::string::npos);
}

// An unknown option, at the top level or after a command, is named; exit 2 [CLI].
TEST_CASE("cli unknown option exits 2 and names the option [CLI]")
{
    const auto top = run_cli({"--frobnicate"});
    CHECK(top.code == pinproof::cli::exit_error);
    CHECK(top.out.empty());
    CHECK(top.err.find("--frobnicate") != std::string::npos);
    const auto sub = run_cli({"check", example, "--frobnicate"});
    CHECK(sub.code == pinproof::cli::exit_error);
    CHECK(sub.out.empty());
    CHECK(sub.err.find("--frobnicate") != std::string::npos);
}

// check without FILE is a usage error [CLI].
TEST_CASE("cli check without a file exits 2 [CLI]")
{
    const auto r = run_cli({"check"});
    CHECK(r.code == pinproof::cli::exit_error);
    CHECK(r.err.find("FILE") != std::string::npos);
}

// A project file that does not exist: exit 2, the message names the path.
TEST_CASE("cli check on a missing file exits 2 and names the path [CLI]")
{
    temp_dir tmp;
    const std::string missing = (tmp.path / "no-such-project.json").string();
    const auto r = run_cli({"check", missing});
    CHECK(r.code == pinproof::cli::exit_error);
    CHECK(r.out.empty());
    CHECK(r.err.find("error: " + missing + ": ") != std::string::npos);
}

// The example project: exit 0, the verdict line of each beam and the caution [EX].
TEST_CASE("cli check on the mezzanine example exits 0 with verdicts and the caution [EX]")
{
    const auto r = run_cli({"check", example});
    CHECK(r.code == pinproof::cli::exit_holds);
    CHECK(r.err.empty());
    CHECK(r.out.find("Verdict for beam MZ-C/3-4") != std::string::npos);
    CHECK(r.out.find("Verdict for beam MZ-D/3-4") != std::string::npos);
    CHECK(r.out.find("HOLDS") != std::string::npos);
    CHECK(r.out.find("qualified engineer") != std::string::npos);
}

// --quiet: no report, the exit code still gives the verdict [CLI].
TEST_CASE("cli check --quiet prints nothing and keeps the exit code [CLI]")
{
    const auto r = run_cli({"check", example, "--quiet"});
    CHECK(r.code == pinproof::cli::exit_holds);
    CHECK(r.out.empty());
    CHECK(r.err.empty());
}

// --quiet and --verbose on every command [CLI]: quiet leaves only the results
// asked for; verbose adds the files read and the running time on stderr.
TEST_CASE("cli --quiet and --verbose are accepted by every command and exclude each other [CLI]")
{
    temp_dir tmp;
    const std::string html = (tmp.path / "r.html").string();
    const auto quiet = run_cli({"report", example, "-o", html, "--quiet"});
    CHECK(quiet.code == pinproof::cli::exit_holds);
    CHECK(quiet.out.empty());
    CHECK(quiet.err.empty());
    CHECK(fs::exists(html));
    const auto verbose = run_cli({"report", example, "-o", html, "--verbose"});
    CHECK(verbose.code == pinproof::cli::exit_holds);
    CHECK(verbose.out.find("Report written to") != std::string::npos);
    CHECK(verbose.err.find("read the project file " + example + " (") != std::string::npos);
    CHECK(verbose.err.find("pinproof: report took ") != std::string::npos);
    // The results asked for on stdout are not silenced.
    const auto json_quiet = run_cli({"check", example, "--json", "-", "-q"});
    CHECK(json_quiet.out.find("\"format\"") != std::string::npos);
    for (const char* cmd : {"check", "sections", "detail", "sweep", "batch", "report", "new", "fit"}) {
        CAPTURE(cmd);
        const auto help = run_cli({cmd, "--help"});
        CHECK(help.out.find("--quiet") != std::string::npos);
        CHECK(help.out.find("--verbose") != std::string::npos);
    }
    const auto both = run_cli({"check", example, "-q", "-v"});
    CHECK(both.code == pinproof::cli::exit_error);
    CHECK(both.err.find("--quiet excludes --verbose") != std::string::npos);
}

// A misspelt command or option gets the nearest known name [CLI].
TEST_CASE("cli did you mean: a misspelt command and a misspelt option [CLI]")
{
    const auto cmd = run_cli({"chek", example});
    CHECK(cmd.code == pinproof::cli::exit_error);
    CHECK(cmd.out.empty());
    CHECK(cmd.err.find("unknown command \"chek\"; did you mean \"check\"?") != std::string::npos);
    const auto opt = run_cli({"check", example, "--jsn", "x.json"});
    CHECK(opt.code == pinproof::cli::exit_error);
    CHECK(opt.err.find("unknown option --jsn; did you mean \"--json\"?") != std::string::npos);
}

// --json -: only the JSON result on stdout, with the keys of [FMT].
TEST_CASE("cli check --json - writes the result JSON on stdout with the required keys [FMT]")
{
    const auto r = run_cli({"check", example, "--json", "-"});
    CHECK(r.code == pinproof::cli::exit_holds);
    CHECK(r.err.empty());
    json j;
    REQUIRE_NOTHROW(j = json::parse(r.out));
    REQUIRE(has_keys(j, {"format", "beams"}));
    CHECK(j["format"] == "pinproof-result/1");
    REQUIRE(j["beams"].is_array());
    REQUIRE(j["beams"].size() == 2);
    const std::set<std::string> stable_ids{"stiffness-class-start", "stiffness-class-end", "joint-moment-start",
                                           "joint-moment-end",      "support-moment-start", "support-moment-end", "moment-reversal-start", "moment-reversal-end",
                                           "rotation-demand-start", "rotation-demand-end", "deflection", "frequency",
                                           "gap-closure-start",     "gap-closure-end",
                                           "strength-class-start",  "strength-class-end",
                                           "joint-ductility-start", "joint-ductility-end",
                                           "joint-shear-start",     "joint-shear-end",
                                           "declared-resistance-start", "declared-resistance-end",
                                           "ductile-hierarchy-start", "ductile-hierarchy-end"};
    for (const auto& b : j["beams"]) {
        CAPTURE(b.value("id", std::string("?")));
        REQUIRE(has_keys(b, {"id", "verdict", "checks", "joints", "combinations"}));
        std::set<std::string> ids;
        for (const auto& c : b["checks"]) {
            CHECK(has_keys(c, {"id", "status", "value", "limit", "message"}));
            ids.insert(c["id"].get<std::string>());
        }
        // The stable ids are all present; the only others are the detailing rules
        // of the example's connection details.
        for (const auto& id : stable_ids) CHECK(ids.count(id) == 1);
        for (const auto& id : ids) CHECK((stable_ids.count(id) == 1 || id.rfind("detailing-", 0) == 0));
        CHECK(b["checks"].size() == ids.size());
        for (const char* end : {"start", "end"}) {
            const auto& jt = b["joints"][end];
            REQUIRE(has_keys(jt, {"ratio", "class"}));
            CHECK(has_keys(jt["ratio"], {"lower", "upper"}));
            CHECK(has_keys(jt["class"], {"EN1993-1-8", "AISC360"}));
        }
        REQUIRE(b["combinations"].is_array());
        REQUIRE_FALSE(b["combinations"].empty());
        for (const auto& c : b["combinations"]) {
            REQUIRE(has_keys(c, {"name", "pinned", "fixed", "range"}));
            CHECK(has_keys(c["pinned"], state_keys));
            CHECK(has_keys(c["fixed"], state_keys));
            REQUIRE(has_keys(c["range"], {"corners", "envelope"}));
            REQUIRE(c["range"]["corners"].size() == 4);
            for (const auto& s : c["range"]["corners"]) CHECK(has_keys(s, state_keys));
            for (const auto& k : state_keys) {
                if (k == "stiffness_start" || k == "stiffness_end") continue;  // the box itself, not a result
                CAPTURE(k);
                REQUIRE(c["range"]["envelope"].contains(k));
                CHECK(has_keys(c["range"]["envelope"][k], {"min", "max"}));
                CHECK(c["range"]["envelope"][k]["min"].get<double>() <= c["range"]["envelope"][k]["max"].get<double>());
            }
        }
    }
}

// --json FILE: the file exists afterwards, parses, and no temporary is left [CLI].
TEST_CASE("cli check --json FILE writes a parsable file and the report on stdout [FMT]")
{
    temp_dir tmp;
    const fs::path out = tmp.path / "result.json";
    const auto r = run_cli({"check", example, "--json", out.string()});
    CHECK(r.code == pinproof::cli::exit_holds);
    CHECK(r.out.find("qualified engineer") != std::string::npos);
    REQUIRE(fs::exists(out));
    std::ifstream in(out);
    json j;
    REQUIRE_NOTHROW(j = json::parse(in));
    CHECK(j["format"] == "pinproof-result/1");
    int entries = 0;
    for (const auto& e : fs::directory_iterator(tmp.path)) {
        (void)e;
        ++entries;
    }
    CHECK(entries == 1);
}

// A failed run leaves an existing result file untouched (atomic writes) [CLI].
TEST_CASE("cli check on bad input leaves an existing result file unchanged [CLI]")
{
    temp_dir tmp;
    const fs::path out = tmp.path / "result.json";
    {
        std::ofstream f(out);
        f << "previous result\n";
    }
    const auto r = run_cli({"check", bad_example, "--json", out.string()});
    CHECK(r.code == pinproof::cli::exit_error);
    std::ifstream in(out);
    std::stringstream text;
    text << in.rdbuf();
    CHECK(text.str() == "previous result\n");
}

// The real program: exit codes of the process, 2 for a bad file and 0 for the example [CLI].
TEST_CASE("cli binary process exit codes are 2 for bad input and 0 for the example [CLI]")
{
    temp_dir tmp;
    const std::string sink = " >" + (tmp.path / "out.txt").string() + " 2>" + (tmp.path / "err.txt").string();
    const std::string binary = std::string("\"") + PINPROOF_BINARY + "\"";
    const int bad = std::system((binary + " check \"" + bad_example + "\"" + sink).c_str());
    REQUIRE(bad != -1);
    REQUIRE(WIFEXITED(bad));
    CHECK(WEXITSTATUS(bad) == 2);
    const int good = std::system((binary + " check \"" + example + "\"" + sink).c_str());
    REQUIRE(good != -1);
    REQUIRE(WIFEXITED(good));
    CHECK(WEXITSTATUS(good) == 0);
}
