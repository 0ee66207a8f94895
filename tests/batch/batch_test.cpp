// Verification of the batch run over a schedule (batch.hpp) and of the
// `batch` subcommand (src/cli/batch_command.cpp).
//
// Sources (reference pack items in brackets):
//   [R8.1]   Roark's Formulas for Stress and Strain, 7th ed., Table 8.1 (from
//            memory); Hicks, Civil Engineering Formulas, Fig. 2.2 cases 5 and 10
//            (confirmed), pack section 6: simply supported UDL
//            theta = w L^3 / (24 EI); fixed-ended UDL M = w L^2 / 12.
//   [EN1990] EN 1990 Eq. 6.10, Table A1.2(B): 1.35G + 1.5Q (pack section 9, [C]).
//   [ASCE7]  ASCE 7-16 2.3.1: 1.2D + 1.6L and 1.4D (pack section 9, [C]).
//   [PF]     The same beam written as a project file (docs/file-format.md) and
//            read by the project reader: the batch must give the same checks.
//   [CLI]    Common command-line practice (common practice, no source): nothing
//            is written when a run is refused.
// Tolerances: 1e-9 relative against closed forms (the engine is exact for a
// UDL); identical values (==) between the batch and the project route, which
// run the same arithmetic.
#include <doctest/doctest.h>

#include <algorithm>

#include "temp_dir.hpp"

#include <nlohmann/json.hpp>

#include <atomic>
#include <cmath>
#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>
#include <string>

#include "batch_command.hpp"
#include "cli.hpp"
#include "pinproof/batch/batch.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/joints/joint_from_detail.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/io/schedule.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/io/project_input.hpp"

namespace fs = std::filesystem;
using json = nlohmann::json;
using namespace pinproof;

namespace {

const char* const catalogue_text = R"({
  "format": "pinproof-details/1",
  "details": [
    { "id": "FP-3-M20", "type": "fin-plate", "stiffness": { "min": "300 kN*m/rad", "max": "1400 kN*m/rad" },
      "moment_resistance": "18 kN*m" },
    { "id": "PIN", "type": "custom", "stiffness": 0 },
    { "id": "FIX", "type": "end-plate", "stiffness": "rigid", "moment_resistance": "500 kN*m" },
    { "id": "SL", "type": "fin-plate", "stiffness": { "min": "0.05 EI/L", "max": "0.3 EI/L" } }
  ]
})";

const detail_catalogue& test_details()
{
    static const detail_catalogue c = parse_detail_catalogue(catalogue_text, "test.json");
    return c;
}

// One directory per test, removed at its end (tests/temp_dir.hpp).
struct temp_dir : pinproof::testing::temp_dir {
    temp_dir() : pinproof::testing::temp_dir("batch-test") {}
};

bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::max(std::abs(a), std::abs(b)); }

const check* find_check(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return &c;
    return nullptr;
}

std::string many_rows(int n)
{
    std::string t = "id,span,section,g,q,start,end,combinations,deflection_limit\n";
    const char* sections[] = {"IPE 240", "IPE 300", "IPE 400", "HE 200 A"};
    const char* details[] = {"FP-3-M20", "PIN", "SL", "FIX"};
    for (int i = 0; i < n; ++i)
        t += "B" + std::to_string(i) + "," + std::to_string(4.0 + 0.1 * (i % 40)) + " m," + sections[i % 4] + "," +
             std::to_string(3 + i % 7) + " kN/m," + std::to_string(2 + i % 5) + " kN/m," + details[i % 4] + "," +
             details[(i / 4) % 4] + "," + (i % 3 ? "EN1990" : "ASCE7") + ",span/360\n";
    return t;
}

}  // namespace

TEST_CASE("batch: pinned ends give theta = wL^3/(24EI) at 1.35G+1.5Q [R8.1 and EN1990] - tol 1e-9")
{
    const schedule s = parse_schedule("id,span,section,g,q,start,end\nB1,6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n");
    const batch_row r = assess_schedule_row(s, 0, test_details(), {});
    REQUIRE(r.verdict == batch_verdict::holds);
    const double EI = 210e9 * find_catalogue_section("IPE 300")->I;
    const double w = 1.35 * 8e3 + 1.5 * 5e3;
    CHECK(close(*r.rotation_start, w * 216.0 / (24 * EI), 1e-9));
    CHECK(close(*r.rotation_end, w * 216.0 / (24 * EI), 1e-9));
    CHECK(*r.moment_start == 0.0);
    CHECK(r.closure_rotation_start == std::nullopt);
}

TEST_CASE("batch: rigid ends attract M = wL^2/12 at 1.2D+1.6L [R8.1 and ASCE7] - tol 1e-9")
{
    const schedule s =
        parse_schedule("id,span,section,g,q,start,end,combinations\nB1,8 m,IPE 400,6 kN/m,4 kN/m,FIX,FIX,ASCE7\n");
    const batch_row r = assess_schedule_row(s, 0, test_details(), {});
    // 1.2 x 6 + 1.6 x 4 = 13.6 kN/m governs 1.4 x 6 = 8.4 kN/m.
    CHECK(close(*r.moment_start, 13.6e3 * 64.0 / 12, 1e-9));
    CHECK(close(*r.moment_end, 13.6e3 * 64.0 / 12, 1e-9));
    // A rigid joint is not pinned: the stiffness-class check fails without a ratio.
    CHECK(r.verdict == batch_verdict::does_not_hold);
    CHECK(r.governing_check == "stiffness-class-start");
    CHECK_FALSE(r.worst_ratio.has_value());
    // Every failed check is named, not only the governing one; the reaction is
    // wL/2 at each end (symmetric, both ends rigid; handbook closed form).
    CHECK(std::find(r.failed_checks.begin(), r.failed_checks.end(), "stiffness-class-start") != r.failed_checks.end());
    CHECK(std::find(r.failed_checks.begin(), r.failed_checks.end(), "stiffness-class-end") != r.failed_checks.end());
    CHECK(close(*r.reaction_start, 13.6e3 * 8.0 / 2, 1e-9));
    CHECK(close(*r.reaction_end, 13.6e3 * 8.0 / 2, 1e-9));
    CHECK(r.summary_line.find(",stiffness-class-start stiffness-class-end") != std::string::npos);
}

TEST_CASE("batch: a schedule beam gives the same checks as the same beam in a project file [PF] - exact")
{
    const schedule s = parse_schedule("id,span,section,g,q,start,end,deflection_limit\n"
                                      "B1,6.5 m,IPE 330,9 kN/m,6 kN/m,FP-3-M20,SL,span/360\n");
    const schedule_row row = read_schedule_row(s, 0, test_details());
    REQUIRE(row.input.has_value());
    const beam_assessment from_schedule = assess_beam(row.settings, *row.input, assessment_options{false});

    json doc = json::parse(R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "B1", "span": "6.5 m", "section": "IPE 330",
        "loads": [{"case": "G", "kind": "udl", "w": "9 kN/m"}, {"case": "Q", "kind": "udl", "w": "6 kN/m"}],
        "combinations": [{"name": "U", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}},
                         {"name": "S", "use": "service", "factors": {"G": 1.0, "Q": 1.0}}],
        "joints": {"start": "FP-3-M20", "end": "SL"},
        "limits": {"deflection": "span/360"}}]})");
    problem_list problems;
    resolve_detail_references(doc, test_details(), problems);
    REQUIRE(problems.empty());
    const project p = read_project(doc);
    // The project route with its default interior search: the checks do not use it.
    const beam_assessment from_project = assess_beam(p, p.beams.at(0));

    REQUIRE(from_schedule.checks.size() == from_project.checks.size());
    for (std::size_t i = 0; i < from_project.checks.size(); ++i) {
        const check& a = from_schedule.checks[i];
        const check& b = from_project.checks[i];
        CAPTURE(b.id);
        CHECK(a.id == b.id);
        CHECK(a.status == b.status);
        CHECK(a.value == b.value);
        CHECK(a.limit == b.limit);
    }
    CHECK(from_schedule.holds() == from_project.holds());
    const batch_row r = assess_schedule_row(s, 0, test_details(), {});
    CHECK(r.moment_start == find_check(from_project, "joint-moment-start")->value);
    CHECK(r.rotation_end == find_check(from_project, "rotation-demand-end")->value);
}

TEST_CASE("batch: a bad row is refused and the others are checked [common practice and no source]")
{
    const schedule s = parse_schedule("id,span,section,g,q,start,end\n"
                                      "B1,6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n"
                                      "B2,-6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n"
                                      "B3,6 m,IPE 300,8 kN/m,5 kN/m,FIX,PIN\n"
                                      "B4,6 m,IPE 300,8 kN/m,5 kN/m,PIN,GONE\n");
    const batch_result r = run_batch(s, test_details(), {});
    REQUIRE(r.rows.size() == 4);
    CHECK(r.summary.rows == 4);
    CHECK(r.summary.checked == 2);
    CHECK(r.summary.passed == 1);
    CHECK(r.summary.failed == 1);
    CHECK(r.summary.refused == 2);
    CHECK(r.rows[0].verdict == batch_verdict::holds);
    CHECK(r.rows[1].verdict == batch_verdict::refused);
    REQUIRE(r.rows[1].problems.size() == 1);
    CHECK(r.rows[1].problems[0].where == "line 3, column 2 (span)");
    CHECK(r.rows[1].problems[0].message.find("found \"-6 m\"") != std::string::npos);
    CHECK(r.rows[2].verdict == batch_verdict::does_not_hold);
    CHECK(r.rows[3].problems.at(0).where == "line 5, column 7 (end)");
    CHECK(batch_counts_text(r.summary) == "4 rows: 2 checked (1 passed, 1 failed), 2 refused");

    const std::string csv = batch_summary_csv(r);
    // The header first (a spreadsheet reads the first line as the header),
    // units in brackets as in the sweep CSV, no comment lines.
    CHECK(csv.rfind("line,id,verdict,governing_check,worst_ratio [1],reaction_start [kN],reaction_end [kN],"
                    "moment_start [kN*m],moment_end [kN*m],rotation_start [mrad],rotation_end [mrad],"
                    "closure_rotation_start [mrad],closure_rotation_end [mrad],failed_checks,message\n",
                    0) == 0);
    CHECK(csv.find('#') == std::string::npos);
    CHECK(csv.find("\n3,B2,refused,,,,,,,,,,,,\"line 3, column 2 (span): expected") != std::string::npos);
    CHECK(csv.find("nan") == std::string::npos);
    CHECK(csv.find("inf") == std::string::npos);
}

TEST_CASE("batch: formula-leading ids are neutralised in the summary CSV and trimmed ids are duplicates [OWASP CSV Injection]")
{
    // OWASP, "CSV Injection": a cell starting with =, +, -, @ is prefixed by
    // an apostrophe; numbers keep their sign (core/csv_cell.hpp).
    const schedule s = parse_schedule("id,span,section,g,q,start,end\n"
                                      "=1+1,6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n"
                                      "-B2,6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n"
                                      "\" -B2 \",6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n");
    const batch_result r = run_batch(s, test_details(), {});
    REQUIRE(r.rows.size() == 3);
    const std::string csv = batch_summary_csv(r);
    CHECK(csv.find("\n2,'=1+1,holds,") != std::string::npos);
    CHECK(csv.find("\n3,'-B2,holds,") != std::string::npos);
    CHECK(r.rows[2].verdict == batch_verdict::refused);
    REQUIRE_FALSE(r.rows[2].problems.empty());
    CHECK(r.rows[2].problems[0].where == "line 4, column 1 (id)");
    CHECK(r.rows[2].problems[0].message.find("already used on line 3") != std::string::npos);
}

TEST_CASE("batch: results keep the input order with 2 jobs and equal those of 1 job [common practice and no source] - exact")
{
    const schedule s = parse_schedule(many_rows(300));
    batch_options one, two;
    one.jobs = 1;
    two.jobs = 2;
    one.json = two.json = true;
    const batch_result a = run_batch(s, test_details(), one);
    const batch_result b = run_batch(s, test_details(), two);
    REQUIRE(b.rows.size() == 300);
    for (int i = 0; i < 300; ++i) {
        CHECK(b.rows[i].id == "B" + std::to_string(i));
        CHECK(b.rows[i].line == static_cast<std::size_t>(i + 2));
        CHECK(b.rows[i].json == a.rows[i].json);
    }
    CHECK(batch_summary_csv(a) == batch_summary_csv(b));
    CHECK(b.summary.refused == 0);
    CHECK(b.summary.checked == 300);

    const json j = json::parse(batch_result_json(b, s, test_details()));
    CHECK(j["format"] == "pinproof-batch-result/1");
    CHECK(j["summary"]["checked"] == 300);
    REQUIRE(j["beams"].size() == 300);
    CHECK(j["beams"][7]["id"] == "B7");
    CHECK(j["beams"][7]["result"]["checks"].is_array());
    CHECK(j["beams"][7]["closure_rotation_start"].is_null());
}

TEST_CASE("batch: a cancelled run says so and the progress callback sees the total [common practice and no source]")
{
    const schedule s = parse_schedule(many_rows(50));
    std::atomic<bool> cancel{true};
    batch_options o;
    o.cancel = &cancel;
    const batch_result r = run_batch(s, test_details(), o);
    CHECK(r.cancelled);

    std::size_t last_done = 0, last_total = 0;
    batch_options p;
    p.progress = [&](std::size_t done, std::size_t total) {
        last_done = done;
        last_total = total;
    };
    CHECK_FALSE(run_batch(s, test_details(), p).cancelled);
    CHECK(last_done == 50);
    CHECK(last_total == 50);
}

TEST_CASE("batch command: exit codes and outputs and nothing written for a refused run [CLI]")
{
    temp_dir dir;
    const std::string details = dir.write("details.json", catalogue_text);
    const std::string good = dir.write("good.csv", "id,span,section,g,q,start,end\nB1,6 m,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n");
    const std::string failing =
        dir.write("failing.csv", "id,span,section,g,q,start,end\nB1,6 m,IPE 300,8 kN/m,5 kN/m,FIX,PIN\n");
    const std::string bad_row = dir.write("bad-row.csv", "id,span,section,g,q,start,end\nB1,6 m,IPE 300,8 kN/m,5 kN/m,"
                                                         "PIN,PIN\nB2,x,IPE 300,8 kN/m,5 kN/m,PIN,PIN\n");
    const std::string bad_header = dir.write("bad-header.csv", "id,span,section,g,q,start\nB1,6,IPE 300,1,1,PIN\n");
    const std::string bad_details = dir.write("bad-details.json", R"({"format": "pinproof-details/1", "details": 3})");
    const std::string out_csv = (dir.path / "out.csv").string();
    const std::string out_json = (dir.path / "out.json").string();

    const auto run = [&](const std::string& sched, const std::string& det, std::ostringstream& out,
                         std::ostringstream& err) {
        cli::batch_command_options o;
        o.schedule = sched;
        o.details = det;
        o.out_csv = out_csv;
        o.out_json = out_json;
        o.jobs = 2;
        return cli::batch_command(o, out, err);
    };
    {
        std::ostringstream out, err;
        CHECK(run(good, details, out, err) == cli::exit_holds);
        CHECK(fs::exists(out_csv));
        CHECK(json::parse(std::ifstream(out_json))["summary"]["passed"] == 1);
        CHECK(out.str().find("1 row: 1 checked (1 passed, 0 failed), 0 refused") != std::string::npos);
    }
    {
        std::ostringstream out, err;
        CHECK(run(failing, details, out, err) == cli::exit_does_not_hold);
    }
    {
        std::ostringstream out, err;
        CHECK(run(bad_row, details, out, err) == cli::exit_error);
        CHECK(err.str().find("error: line 3, column 2 (span): expected length") != std::string::npos);
    }
    fs::remove(out_csv);
    fs::remove(out_json);
    for (const auto& [sched, det] : {std::pair{bad_header, details}, std::pair{good, bad_details},
                                     std::pair{(dir.path / "missing.csv").string(), details}}) {
        std::ostringstream out, err;
        CHECK(run(sched, det, out, err) == cli::exit_error);
        CHECK(err.str().find("nothing was written") != std::string::npos);
        CHECK_FALSE(fs::exists(out_csv));
        CHECK_FALSE(fs::exists(out_json));
    }
    // No temporary file is left beside the outputs either.
    for (const auto& e : fs::directory_iterator(dir.path)) CHECK(e.path().filename().string().find(".tmp-") == std::string::npos);
}

TEST_CASE("batch: the shipped example schedule reads without refused rows [common practice and no source]")
{
    const std::string root = PINPROOF_SOURCE_DIR;
    const detail_catalogue c = load_detail_catalogue_file(root + "/catalog-examples/details-harbour-lane.json");
    const schedule s = load_schedule_file(root + "/catalog-examples/schedule-harbour-lane.csv");
    CHECK(s.rows.size() >= 200);
    const batch_result r = run_batch(s, c, {});
    CHECK(r.summary.refused == 0);
    CHECK(r.summary.checked == s.rows.size());
    CHECK(r.summary.passed > 0);
    CHECK(r.summary.failed > 0);
}

// A catalogue entry with a moment-rotation law: the schedule row reads it
// under the row's standard, and gives the checks of the same joint written
// inline in a project file [PF]. The EN 1993-1-8 6.3.1(6) curve caps the joint
// moment at M_j,Rd, so a joint that attracts 55 kN*m as a linear spring
// (above its 38 kN*m) carries at most 38 kN*m with the curve: the joint-moment
// check passes (EN 1993-1-8 6.3.1(6), 5.1.2(3); pack section 2).
TEST_CASE("batch: a catalogue entry's law is applied to the row as in a project file [PF] [EN 1993-1-8 6.3.1(6)]")
{
    const detail_catalogue cat = parse_detail_catalogue(R"({"format": "pinproof-details/1", "details": [
      {"id": "EP", "type": "end-plate", "stiffness": {"min": "700 kN*m/rad", "max": "3000 kN*m/rad"},
       "moment_resistance": "38 kN*m"},
      {"id": "EP-EC3", "type": "end-plate", "stiffness": {"min": "700 kN*m/rad", "max": "3000 kN*m/rad"},
       "moment_resistance": "38 kN*m", "behaviour": {"law": "ec3-curve", "joint_type": "bolted-end-plate"}}]})");
    const schedule s = parse_schedule("id,span,section,g,q,start,end,combinations\n"
                                      "LIN,8 m,IPE 400,20 kN/m,15 kN/m,EP,EP,EN1990\n"
                                      "EC3,8 m,IPE 400,20 kN/m,15 kN/m,EP-EC3,EP-EC3,EN1990\n"
                                      "US,8 m,IPE 400,20 kN/m,15 kN/m,EP-EC3,EP,ASCE7\n");
    const batch_result r = run_batch(s, cat, {});
    REQUIRE(r.rows.size() == 3);
    // | row | joint             | expected                                        |
    // | LIN | linear spring     | joint-moment-start fails (55 kN*m > 38 kN*m)    |
    // | EC3 | ec3-curve         | |M| <= M_j,Rd = 38 kN*m; joint-moment passes    |
    // | US  | ec3-curve, AISC   | refused: an EN rule under AISC 360              |
    CHECK(std::find(r.rows[0].failed_checks.begin(), r.rows[0].failed_checks.end(), "joint-moment-start") !=
          r.rows[0].failed_checks.end());
    CHECK(*r.rows[0].moment_start > 38e3);
    REQUIRE(r.rows[1].moment_start.has_value());
    CHECK(*r.rows[1].moment_start <= 38e3 * (1 + 1e-12));
    CHECK(*r.rows[1].moment_start > 2.0 / 3.0 * 38e3);  // beyond the elastic part of the curve
    CHECK(std::find(r.rows[1].failed_checks.begin(), r.rows[1].failed_checks.end(), "joint-moment-start") ==
          r.rows[1].failed_checks.end());
    CHECK(r.rows[2].verdict == batch_verdict::refused);
    REQUIRE(!r.rows[2].problems.empty());
    CHECK(r.rows[2].problems[0].message.find("a rule of EN 1993-1-8") != std::string::npos);

    // The project route: the same beam with the law written inline.
    json doc = json::parse(R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "EC3", "span": "8 m", "section": "IPE 400",
        "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m"}, {"case": "Q", "kind": "udl", "w": "15 kN/m"}],
        "combinations": [{"name": "EN1990 6.10: 1.35G+1.5Q", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}},
                         {"name": "EN1990 6.14b: G+Q", "use": "service", "factors": {"G": 1.0, "Q": 1.0}}],
        "joints": {"start": "EP-EC3", "end": "EP-EC3"}}]})");
    problem_list problems;
    resolve_detail_references(doc, cat, problems);
    REQUIRE(problems.empty());
    const project p = read_project(doc);
    REQUIRE(p.beams.at(0).start.behaviour.has_value());
    const beam_assessment from_project = assess_beam(p, p.beams.at(0));
    CHECK(r.rows[1].moment_start == find_check(from_project, "joint-moment-start")->value);
}

// A catalogue fin plate with "from-detail" stiffness and resistance: each row
// derives the joint from the entry's geometry (EN 1993-1-8 components,
// joints/fin_plate.hpp, verified in fin_plate_test.cpp) and gives the checks of
// the same joint written inline in a project file [PF]. Under AISC 360 a
// derived stiffness is refused (AISC 360 gives no component stiffness).
TEST_CASE("batch: a catalogue entry's from-detail joint is derived on each row as in a project file [PF] - exact")
{
    const detail_catalogue cat = parse_detail_catalogue(R"({"format": "pinproof-details/1", "details": [
      {"id": "FP-D", "type": "fin-plate", "stiffness": "from-detail", "moment_resistance": "from-detail",
       "geometry": {"gap": "10 mm", "gap_tolerance": "3 mm", "plate_top": "50 mm", "plate_depth": "190 mm",
                    "plate_thickness": "10 mm", "bolt_diameter": "20 mm", "bolt_rows": 3, "bolt_pitch": "60 mm",
                    "first_bolt": "35 mm", "bolt_line": "50 mm"}},
      {"id": "PIN", "type": "custom", "stiffness": 0}]})");
    const schedule s = parse_schedule("id,span,section,g,q,start,end,combinations\n"
                                      "EN,6 m,IPE 300,8.5 kN/m,7.5 kN/m,FP-D,PIN,EN1990\n"
                                      "US,6 m,IPE 300,8.5 kN/m,7.5 kN/m,FP-D,PIN,ASCE7\n");
    const schedule_row row = read_schedule_row(s, 0, cat);
    REQUIRE(row.input.has_value());
    beam b = *row.input;
    derive_beam_joints(b, row.settings.standard);
    REQUIRE(b.start.derived.has_value());
    // | quantity            | expected                                  |
    // | stiffness range     | 0.5 and 2 x the derived S_j,ini (default) |
    // | moment resistance   | the derived bolt group's                  |
    CHECK(!b.start.range.min.is_rigid());
    CHECK(b.start.range.min.value() == 0.5 * *b.start.derived->initial_stiffness);
    CHECK(b.start.range.max.value() == 2.0 * *b.start.derived->initial_stiffness);
    CHECK(b.start.moment_resistance == b.start.derived->moment_resistance);

    const batch_result r = run_batch(s, cat, {});
    REQUIRE(r.rows.size() == 2);
    CHECK(r.rows[0].verdict != batch_verdict::refused);
    CHECK(r.rows[1].verdict == batch_verdict::refused);
    REQUIRE(!r.rows[1].problems.empty());
    CHECK(r.rows[1].problems[0].message.find("AISC 360-16 gives no component stiffness") != std::string::npos);

    json doc = json::parse(R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "EN", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": "8.5 kN/m"}, {"case": "Q", "kind": "udl", "w": "7.5 kN/m"}],
        "combinations": [{"name": "EN1990 6.10: 1.35G+1.5Q", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}},
                         {"name": "EN1990 6.14b: G+Q", "use": "service", "factors": {"G": 1.0, "Q": 1.0}}],
        "joints": {"start": "FP-D", "end": "PIN"}}]})");
    problem_list problems;
    resolve_detail_references(doc, cat, problems);
    REQUIRE(problems.empty());
    project p = read_project(doc);
    derive_joints(p);
    const beam_assessment from_project = assess_beam(p, p.beams.at(0));
    CHECK(r.rows[0].moment_start == find_check(from_project, "joint-moment-start")->value);
    CHECK(r.rows[0].reaction_start == find_check(from_project, "joint-shear-start")->value);
}
