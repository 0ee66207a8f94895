// Verification of the project-file reader (src/project_input.cpp) at the input edge.
//
// References:
//   [CORPUS] tests/bad-input/expected.tsv: for every file, the JSON pointer (or
//            "line L, column C" of a JSON syntax error) and a substring of the
//            message expected there. The rule checked is the project's own
//            (common practice, no source): exit code 2, every problem named, no
//            output file and no temporary file left behind.
//   [UNITS]  Exact unit definitions: in = 0.0254 m, ft = 0.3048 m (international
//            yard and pound agreement, 1959); lbf = 0.45359237 kg x 9.80665 m/s^2
//            (standard gravity, 3rd CGPM 1901); kip = 1000 lbf; ksi = kip/in^2.
//   [E-EN]   EN 1993-1-1:2005 3.2.6(1): E = 210 000 N/mm^2.
//   [E-AISC] AISC 360-16, Symbols: E = 29 000 ksi.
//   [SPAN-END] The project's rule (common practice, no source): a position
//            within a relative 1e-9 of the span from 0 or from the span is that
//            end; issue 11 found "7100 mm" on "7.1 m" and "384 in" on "32 ft"
//            refused because the converted position lay one ulp above the span.
// Tolerances are stated in each case.
#include <doctest/doctest.h>

#include "temp_dir.hpp"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <charconv>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <map>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "cli.hpp"
#include "pinproof/checks/assessment.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/io/project_input.hpp"

using namespace pinproof;
namespace fs = std::filesystem;

namespace {

// One directory per test, removed at its end (tests/temp_dir.hpp).
struct temp_dir : pinproof::testing::temp_dir {
    temp_dir() : pinproof::testing::temp_dir("input-test") {}
};

const fs::path corpus_dir = fs::path(PINPROOF_SOURCE_DIR) / "tests" / "bad-input";

struct expectation {
    std::string where;
    std::string message;
};

std::map<std::string, std::vector<expectation>> read_manifest()
{
    std::map<std::string, std::vector<expectation>> rows;
    std::ifstream in(corpus_dir / "expected.tsv");
    REQUIRE(in);
    std::string line;
    while (std::getline(in, line)) {
        if (line.empty() || line[0] == '#') continue;
        const auto t1 = line.find('\t');
        const auto t2 = line.find('\t', t1 + 1);
        REQUIRE_MESSAGE(t2 != std::string::npos, "malformed manifest line: " << line);
        rows[line.substr(0, t1)].push_back({line.substr(t1 + 1, t2 - t1 - 1), line.substr(t2 + 1)});
    }
    return rows;
}

struct run_result {
    int code;
    std::string out, err;
};

run_result run_cli(const std::vector<std::string>& args)
{
    std::ostringstream out, err;
    const int code = cli::run(args, out, err);
    return {code, out.str(), err.str()};
}

// Whether `err` has a line "error: WHERE: ..." that contains `message`.
bool reports(const std::string& err, const std::string& where, const std::string& message)
{
    std::istringstream lines(err);
    std::string line;
    const std::string head = "error: " + where + ": ";
    while (std::getline(lines, line))
        if (line.rfind(head, 0) == 0 && line.find(message) != std::string::npos) return true;
    return false;
}

bool has_stray_temporary(const fs::path& dir)
{
    for (const auto& e : fs::directory_iterator(dir))
        if (e.path().filename().string().find(".tmp-") != std::string::npos) return true;
    return false;
}

// Relative difference, taken against `scale` when both values are smaller.
double rel_diff(double a, double b, double scale)
{
    const double s = std::max({std::abs(a), std::abs(b), scale});
    return s == 0 ? 0 : std::abs(a - b) / s;
}

std::string format17(double v)
{
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.17g", v);
    return buf;
}

}  // namespace

TEST_CASE("bad-input corpus: at least 60 files and every file has an expectation [CORPUS]")
{
    const auto rows = read_manifest();
    int files = 0;
    for (const auto& e : fs::directory_iterator(corpus_dir)) {
        if (e.path().extension() != ".json") continue;
        ++files;
        CHECK_MESSAGE(rows.count(e.path().filename().string()) == 1,
                      e.path().filename().string() << " has no row in expected.tsv");
    }
    CHECK(files >= 60);
    for (const auto& [file, exp] : rows) CHECK_MESSAGE(fs::exists(corpus_dir / file), file << " is listed but missing");
}

TEST_CASE("bad-input corpus: exit 2 with every problem named and no output file [CORPUS]")
{
    const auto rows = read_manifest();
    temp_dir tmp;
    const fs::path result = tmp.path / "result.json";
    for (const auto& [file, exp] : rows) {
        CAPTURE(file);
        const auto r = run_cli({"check", (corpus_dir / file).string(), "--json", result.string()});
        CHECK(r.code == cli::exit_error);
        CHECK(r.out.empty());
        CHECK(r.err.find("internal error") == std::string::npos);
        CHECK(r.err.find("nothing was written") != std::string::npos);
        for (const auto& e : exp)
            CHECK_MESSAGE(reports(r.err, e.where, e.message),
                          "expected \"error: " << e.where << ": ..." << e.message << "...\" in:\n" << r.err);
        CHECK_FALSE(fs::exists(result));
        CHECK_FALSE(has_stray_temporary(tmp.path));
    }
}

namespace {

// tests/bad-input/commands.tsv: cases that need a command other than check, a
// catalogue or a schedule. Columns (one tab between them): case name, the
// command's arguments separated by spaces, the expected exit code, the place
// ("error: PLACE: ..."), a substring of its message, and the output files
// (space-separated, in the run's temporary folder) that must not exist after
// the run. In arguments and places, {bad} stands for tests/bad-input and {out}
// for the run's temporary folder.
struct command_case {
    std::string name;
    std::vector<std::string> args;
    int exit_code = 0;
    std::string where, message;
    std::vector<std::string> absent;
};

std::string substituted(std::string s, const fs::path& out)
{
    for (const auto& [key, value] : {std::pair<std::string, std::string>{"{bad}", corpus_dir.string()},
                                     std::pair<std::string, std::string>{"{out}", out.string()}})
        for (auto at = s.find(key); at != std::string::npos; at = s.find(key, at + value.size()))
            s.replace(at, key.size(), value);
    return s;
}

std::vector<std::string> words(const std::string& s)
{
    std::istringstream in(s);
    std::vector<std::string> out;
    for (std::string w; in >> w;) out.push_back(w);
    return out;
}

std::vector<command_case> read_command_cases(const fs::path& out)
{
    std::vector<command_case> cases;
    std::ifstream in(corpus_dir / "commands.tsv");
    REQUIRE(in);
    std::string line;
    while (std::getline(in, line)) {
        if (line.empty() || line[0] == '#') continue;
        std::vector<std::string> cols;
        std::size_t start = 0;
        for (std::size_t tab; (tab = line.find('\t', start)) != std::string::npos; start = tab + 1)
            cols.push_back(line.substr(start, tab - start));
        cols.push_back(line.substr(start));
        REQUIRE_MESSAGE((cols.size() == 5 || cols.size() == 6), "malformed commands.tsv line: " << line);
        command_case c;
        c.name = cols[0];
        c.args = words(substituted(cols[1], out));
        c.exit_code = std::stoi(cols[2]);
        c.where = substituted(cols[3], out);
        c.message = cols[4];
        if (cols.size() == 6) c.absent = words(cols[5]);
        cases.push_back(std::move(c));
    }
    return cases;
}

}  // namespace

TEST_CASE("bad-input corpus: catalogues and schedules and other commands - exit code and place and no output [CORPUS commands.tsv]")
{
    temp_dir tmp;
    const auto cases = read_command_cases(tmp.path);
    CHECK(cases.size() >= 40);
    for (const auto& c : cases) {
        CAPTURE(c.name);
        const auto r = run_cli(c.args);
        CHECK(r.code == c.exit_code);
        CHECK(r.err.find("internal error") == std::string::npos);
        CHECK_MESSAGE(reports(r.err, c.where, c.message),
                      "expected \"error: " << c.where << ": ..." << c.message << "...\" in:\n" << r.err.substr(0, 2000));
        for (const auto& f : c.absent) CHECK_MESSAGE(!fs::exists(tmp.path / f), f << " exists after the run");
        CHECK_FALSE(has_stray_temporary(tmp.path));
        for (const auto& e : fs::directory_iterator(tmp.path)) fs::remove(e.path());
    }
}

TEST_CASE("several mistakes in one file are all reported in one run [CORPUS several-mistakes-*]")
{
    // parse_project itself carries every problem, in file order.
    std::ifstream in(corpus_dir / "several-mistakes-three-beams.json");
    std::stringstream text;
    text << in.rdbuf();
    try {
        (void)parse_project(text.str());
        FAIL("no input_error");
    } catch (const input_error& e) {
        std::vector<std::string> where;
        for (const auto& p : e.problems()) where.push_back(p.where);
        const std::vector<std::string> expected{"/beams/0/loads/0/w", "/beams/1/section", "/beams/2/loads/0/at",
                                                "/beams/2/joints/start/stiffness"};
        CHECK(where == expected);
    }
}

namespace {

// One beam written twice: in US customary units, and in SI with the values
// converted by the exact factors of [UNITS] (printed to 17 significant figures,
// which round-trips a double).
constexpr double inch = 0.0254, foot = 0.3048;
constexpr double lbf = 0.45359237 * 9.80665, kip = 1000 * lbf, ksi = kip / (inch * inch);

std::string units_project(bool us)
{
    auto q = [&](double us_value, const char* us_unit, double factor, const char* si_unit) {
        return us ? format17(us_value) + " " + us_unit : format17(us_value * factor) + " " + si_unit;
    };
    nlohmann::json b;
    b["id"] = "W-1";
    b["span"] = q(24, "ft", foot, "m");
    b["E"] = q(29000, "ksi", ksi, "Pa");
    b["section"] = {{"I", q(510, "in4", std::pow(inch, 4), "m4")}, {"depth", q(17.7, "in", inch, "m")}};
    b["loads"] = {
        {{"case", "D"}, {"kind", "udl"}, {"w", q(0.6, "kip/ft", kip / foot, "N/m")}},
        {{"case", "L"}, {"kind", "point"}, {"P", q(9, "kip", kip, "N")}, {"at", q(9.5, "ft", foot, "m")}},
        {{"case", "L"},
         {"kind", "linear"},
         {"w_start", q(0.2, "kip/ft", kip / foot, "N/m")},
         {"w_end", q(0.5, "kip/ft", kip / foot, "N/m")},
         {"from", q(4, "ft", foot, "m")},
         {"to", q(18, "ft", foot, "m")}},
        {{"case", "D"}, {"kind", "moment"}, {"M", q(3, "kip*ft", kip * foot, "N*m")}, {"at", q(20, "ft", foot, "m")}},
    };
    b["combinations"] = {
        {{"name", "LRFD-2"}, {"use", "strength"}, {"factors", {{"D", 1.2}, {"L", 1.6}}}},
        {{"name", "service"}, {"use", "service"}, {"factors", {{"D", 1.0}, {"L", 1.0}}}},
    };
    b["joints"] = {
        {"start",
         {{"stiffness", {{"min", q(3000, "kip*in/rad", kip * inch, "N*m/rad")},
                         {"max", q(45000, "kip*in/rad", kip * inch, "N*m/rad")}}},
          {"moment_resistance", q(40, "kip*ft", kip * foot, "N*m")}}},
        {"end", {{"stiffness", {{"min", q(6000, "kip*in/rad", kip * inch, "N*m/rad")}, {"max", "rigid"}}}}},
    };
    b["limits"] = {{"deflection", q(0.8, "in", inch, "m")}};
    nlohmann::json p = {{"format", "pinproof-project/1"},
                        {"title", "units equivalence"},
                        {"standard", "AISC360"},
                        {"frame", "braced"},
                        {"beams", {b}}};
    return p.dump(2);
}

}  // namespace

TEST_CASE("US and SI input of the same beam give the same SI results to 1e-12 relative [UNITS]")
{
    const project us = parse_project(units_project(true));
    const project si = parse_project(units_project(false));
    CHECK(us.units == unit_system::us_customary);
    CHECK(si.units == unit_system::si);
    REQUIRE(us.beams.size() == 1);
    const beam& bu = us.beams[0];
    const beam& bs = si.beams[0];
    const double tol = 1e-12;
    CHECK(rel_diff(bu.span, bs.span, 0) <= tol);
    CHECK(rel_diff(bu.E, bs.E, 0) <= tol);
    CHECK(rel_diff(bu.sec.I, bs.sec.I, 0) <= tol);
    CHECK(rel_diff(*bu.deflection->absolute, *bs.deflection->absolute, 0) <= tol);
    REQUIRE(bu.loads.size() == bs.loads.size());
    for (std::size_t i = 0; i < bu.loads.size(); ++i) {
        CHECK(rel_diff(bu.loads[i].value, bs.loads[i].value, 0) <= tol);
        CHECK(rel_diff(bu.loads[i].value_end, bs.loads[i].value_end, 0) <= tol);
        CHECK(rel_diff(bu.loads[i].from, bs.loads[i].from, 0) <= tol);
        CHECK(rel_diff(bu.loads[i].to, bs.loads[i].to, 0) <= tol);
    }

    const project_assessment au = assess_project(us);
    const project_assessment as = assess_project(si);
    const auto& ru = au.beams[0];
    const auto& rs = as.beams[0];
    REQUIRE(ru.combinations.size() == rs.combinations.size());
    for (std::size_t c = 0; c < ru.combinations.size(); ++c) {
        const auto& cu = ru.combinations[c];
        const auto& cs = rs.combinations[c];
        std::vector<std::pair<const beam_state*, const beam_state*>> states{{&cu.pinned.value(), &cs.pinned.value()},
                                                                            {&cu.fixed, &cs.fixed}};
        REQUIRE(cu.corners.size() == cs.corners.size());
        for (std::size_t k = 0; k < cu.corners.size(); ++k) states.push_back({&cu.corners[k], &cs.corners[k]});
        for (const auto& f : result_fields()) {
            // Relative to the largest magnitude of the field in this combination,
            // so that a value that is zero in theory does not divide by zero.
            double scale = 0;
            for (const auto& [a, b] : states) scale = std::max({scale, std::abs(a->*f.member), std::abs(b->*f.member)});
            for (const auto& [a, b] : states) {
                CAPTURE(f.key);
                CHECK(rel_diff(a->*f.member, b->*f.member, scale) <= tol);
            }
            const auto& eu = cu.envelope.of(f.member);
            const auto& es = cs.envelope.of(f.member);
            CHECK(rel_diff(eu.min, es.min, scale) <= tol);
            CHECK(rel_diff(eu.max, es.max, scale) <= tol);
        }
    }
    REQUIRE(ru.checks.size() == rs.checks.size());
    for (std::size_t i = 0; i < ru.checks.size(); ++i) {
        CAPTURE(ru.checks[i].id);
        CHECK(ru.checks[i].id == rs.checks[i].id);
        CHECK(ru.checks[i].status == rs.checks[i].status);
        CHECK(ru.checks[i].value.has_value() == rs.checks[i].value.has_value());
        if (ru.checks[i].value && rs.checks[i].value)
            CHECK(rel_diff(*ru.checks[i].value, *rs.checks[i].value, 0) <= tol);
        if (ru.checks[i].limit && rs.checks[i].limit)
            CHECK(rel_diff(*ru.checks[i].limit, *rs.checks[i].limit, 0) <= tol);
    }
    CHECK(ru.holds() == rs.holds());
}

namespace {

// A minimal valid project with the given stiffness JSON at the start joint.
std::string stiffness_project(const std::string& start_stiffness, const std::string& standard = "EN1993-1-8",
                              const std::string& extra_beam_fields = "\"E\": \"210 GPa\",")
{
    return R"({"format": "pinproof-project/1", "title": "t", "standard": ")" + standard +
           R"(", "frame": "braced",
  "beams": [{"id": "B", "span": "6 m", )" + extra_beam_fields +
           R"( "section": {"I": "8356 cm4", "depth": "300 mm"},
    "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m"}],
    "combinations": [{"name": "C", "use": "strength", "factors": {"G": 1}}],
    "joints": {"start": {"stiffness": )" + start_stiffness +
           R"(}, "end": {"stiffness": 0}}}]})";
}

}  // namespace

TEST_CASE("accepted stiffness forms: rigid and multiples of EI/L and numbers and single values (exact to 1e-15)")
{
    // EI/L for IPE 300 properties given directly: 210e9 Pa x 8356e-8 m^4 / 6 m
    // (reference pack section 5, worked case: 0.5 EI/L = 1462 kN*m/rad [D]).
    const double EI_over_L = 210e9 * 8356e-8 / 6.0;
    SUBCASE("\"rigid\" as a single value is an exact fixity at both bounds")
    {
        const auto p = parse_project(stiffness_project("\"rigid\""));
        CHECK(p.beams[0].start.range.min.is_rigid());
        CHECK(p.beams[0].start.range.max.is_rigid());
    }
    SUBCASE("\"  rigid \" with surrounding spaces")
    {
        CHECK(parse_project(stiffness_project("\" rigid  \"")).beams[0].start.range.max.is_rigid());
    }
    SUBCASE("\"0.5 EI/L\" is half of E I / span")
    {
        const auto r = parse_project(stiffness_project(R"({"min": "0.5 EI/L", "max": "8EI/L"})")).beams[0].start.range;
        CHECK(rel_diff(r.min.value(), 0.5 * EI_over_L, 0) <= 1e-15);
        CHECK(rel_diff(r.max.value(), 8 * EI_over_L, 0) <= 1e-15);
        CHECK(std::abs(r.min.value() / 1e3 - 1462.3) < 0.1);  // reference pack 5, 1462 kN*m/rad [D]
    }
    SUBCASE("a bare number is in N*m/rad")
    {
        const auto r = parse_project(stiffness_project(R"({"min": 0, "max": 1.5e6})")).beams[0].start.range;
        CHECK(r.min.is_pinned());
        CHECK(r.max.value() == 1.5e6);
    }
    SUBCASE("a single value with units gives min = max")
    {
        const auto r = parse_project(stiffness_project("\"2500 kN*m/rad\"")).beams[0].start.range;
        CHECK(r.min.value() == doctest::Approx(2.5e6).epsilon(1e-15));
        CHECK(r.min == r.max);
    }
    SUBCASE("min pinned and max rigid")
    {
        const auto r = parse_project(stiffness_project(R"({"min": "0 kN*m/rad", "max": "rigid"})")).beams[0].start.range;
        CHECK(r.min.is_pinned());
        CHECK(r.max.is_rigid());
    }
    SUBCASE("equal min and max are accepted")
    {
        const auto r = parse_project(stiffness_project(R"({"min": "1 EI/L", "max": "1 EI/L"})")).beams[0].start.range;
        CHECK(r.min == r.max);
    }
}

TEST_CASE("defaults: E by standard [E-EN] [E-AISC] and a distributed load over the whole span (exact to 1e-15)")
{
    SUBCASE("EN 1993-1-8 project without E: 210 GPa [E-EN]")
    {
        const auto p = parse_project(stiffness_project("0", "EN1993-1-8", ""));
        CHECK(p.beams[0].E == 210e9);
        CHECK(p.beams[0].E_is_default);
    }
    SUBCASE("AISC 360 project without E: 29 000 ksi [E-AISC] [UNITS]")
    {
        const auto p = parse_project(stiffness_project("0", "AISC360", ""));
        CHECK(rel_diff(p.beams[0].E, 29000 * ksi, 0) <= 1e-15);
        CHECK(std::abs(p.beams[0].E / 1e9 - 199.948) < 1e-3);  // 29 000 ksi = 199.948 GPa [UNITS]
        CHECK(p.beams[0].E_is_default);
    }
    SUBCASE("E given is not a default")
    {
        CHECK_FALSE(parse_project(stiffness_project("0")).beams[0].E_is_default);
    }
    SUBCASE("udl without from and to covers 0 to the span")
    {
        const project p = parse_project(stiffness_project("0"));
        const load& l = p.beams[0].loads.at(0);
        CHECK(l.kind == load_kind::udl);
        CHECK(l.from == 0.0);
        CHECK(l.to == 6.0);
        CHECK(l.value == doctest::Approx(20e3).epsilon(1e-15));
    }
}

TEST_CASE("read_project on a parsed document reports the JSON pointer of a wrong field [CORPUS]")
{
    auto doc = nlohmann::json::parse(stiffness_project("0"));
    doc["beams"][0]["loads"][0]["to"] = "7 m";
    try {
        (void)read_project(doc);
        FAIL("no input_error");
    } catch (const input_error& e) {
        REQUIRE(e.problems().size() == 1);
        CHECK(e.problems()[0].where == "/beams/0/loads/0/to");
        CHECK(e.problems()[0].message.find("found \"7 m\"") != std::string::npos);
    }
}

TEST_CASE("load_project_file names the path of a file that cannot be opened [CORPUS]")
{
    const std::string path = (fs::temp_directory_path() / "pinproof-no-such-dir" / "missing.json").string();
    try {
        (void)load_project_file(path);
        FAIL("no input_error");
    } catch (const input_error& e) {
        CHECK(e.problems().at(0).where == path);
    }
}

TEST_CASE("a 50 MB file with one wrong field is refused with exit 2 and its pointer [CORPUS]")
{
    // Generated here and never committed. Valid JSON of about 50 MB: a huge
    // title string and a huge array of numbers under "notes" (ignored by the
    // reader), and one mistake, a span in kN.
    temp_dir tmp;
    const fs::path big = tmp.path / "fifty-megabytes.json";
    {
        std::ofstream f(big, std::ios::binary);
        f << R"({"format": "pinproof-project/1", "title": ")" << std::string(25'000'000, 'x') << R"(",)"
          << R"("notes": [)";
        for (int i = 0; i < 2'500'000; ++i) f << (i ? "," : "") << "1234.5678";
        f << "],\n";
        f << R"("standard": "EN1993-1-8", "frame": "braced", "beams": [{"id": "B", "span": "6 kN",
            "section": "IPE 300", "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m", "to": "3 m"}],
            "combinations": [{"name": "C", "use": "strength", "factors": {"G": 1}}],
            "joints": {"start": {"stiffness": 0}, "end": {"stiffness": 0}}}]})";
        REQUIRE(f);
    }
    CHECK(fs::file_size(big) > 45'000'000);
    const fs::path result = tmp.path / "result.json";
    const auto t0 = std::chrono::steady_clock::now();
    const auto r = run_cli({"check", big.string(), "--json", result.string()});
    const double seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    CHECK(r.code == cli::exit_error);
    CHECK(reports(r.err, "/beams/0/span", "which is force"));
    CHECK(r.err.find("pinproof: the input has 1 problem") != std::string::npos);
    CHECK_FALSE(fs::exists(result));
    CHECK_FALSE(has_stray_temporary(tmp.path));
    // Speed belongs to the benchmark, not to a test: the time is only reported.
    MESSAGE("50 MB file refused in " << seconds << " s");
}

namespace {

// One beam with the span and the end of a full-length distributed load and a
// point load at the span end, each written in its own unit.
std::string span_end_project(const std::string& span, const std::string& to)
{
    return R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced",
  "beams": [{"id": "B", "span": ")" + span + R"(", "E": "210 GPa",
    "section": {"I": "8356 cm4", "depth": "300 mm"},
    "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m", "from": "0 mm", "to": ")" + to + R"("},
              {"case": "G", "kind": "point", "P": "5 kN", "at": ")" + to + R"("}],
    "combinations": [{"name": "C", "use": "strength", "factors": {"G": 1}}],
    "joints": {"start": {"stiffness": 0}, "end": {"stiffness": 0}}}]})";
}

// Shortest decimal that reads back as v ("7.1", not "7.0999999999999996").
std::string shortest(double v)
{
    char buf[64];
    const auto r = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, r.ptr);
}

}  // namespace

TEST_CASE("a load ending at the span written in another unit is the span end [SPAN-END] - exact")
{
    for (const auto& [span, to] : std::vector<std::pair<std::string, std::string>>{
             {"7.1 m", "7100 mm"}, {"32 ft", "384 in"}, {"7100 mm", "7.1 m"}, {"384 in", "32 ft"}}) {
        CAPTURE(span);
        const project p = parse_project(span_end_project(span, to));
        const beam& b = p.beams.at(0);
        CHECK(b.loads.at(0).to == b.span);
        CHECK(b.loads.at(1).from == b.span);
    }
}

TEST_CASE("position_on_span: within 1e-9 of the span is the end and beyond is refused [SPAN-END] - exact")
{
    const double L = 7.1;
    CHECK(position_on_span(L * (1 + 0.9e-9), L) == L);
    CHECK(position_on_span(L * (1 - 0.9e-9), L) == L);
    CHECK(position_on_span(-0.9e-9 * L, L) == 0.0);
    CHECK_FALSE(position_on_span(L * (1 + 2e-9), L).has_value());
    CHECK_FALSE(position_on_span(-2e-9 * L, L).has_value());
    CHECK(position_on_span(0.5 * L, L) == 0.5 * L);
}

TEST_CASE("property: 1000 random spans with the load end in another unit are all accepted [SPAN-END] - exact")
{
    std::mt19937 rng(20261205);
    std::uniform_int_distribution<int> metric(1000, 150000);  // span in mm, 1 m to 150 m
    std::uniform_int_distribution<int> imperial(4, 600);      // span in quarter feet (3 in), 1 ft to 150 ft
    std::uniform_int_distribution<int> pair(0, 5);
    int refused = 0;
    for (int i = 0; i < 1000; ++i) {
        std::string span, to;
        const int k = pair(rng);
        if (k < 3) {
            const int mm = metric(rng);
            const std::string m = shortest(mm / 1000.0), cm = shortest(mm / 10.0), in_mm = std::to_string(mm);
            if (k == 0) span = m + " m", to = in_mm + " mm";
            else if (k == 1) span = in_mm + " mm", to = m + " m";
            else span = cm + " cm", to = m + " m";
        } else {
            const int quarter_feet = imperial(rng);
            const std::string ft = shortest(quarter_feet / 4.0), in = std::to_string(3 * quarter_feet);
            if (k == 3) span = ft + " ft", to = in + " in";
            else if (k == 4) span = in + " in", to = ft + " ft";
            else span = ft + "ft", to = in + "in";
        }
        CAPTURE(span);
        CAPTURE(to);
        try {
            const project p = parse_project(span_end_project(span, to));
            CHECK(p.beams.at(0).loads.at(0).to == p.beams.at(0).span);
        } catch (const input_error& e) {
            ++refused;
            FAIL_CHECK(e.what());
        }
    }
    CHECK(refused == 0);
}
