// Verification of the batch run over a schedule read part by part
// (streamed_batch.hpp) against the run over the schedule held whole
// (run_batch with batch_summary_csv and batch_result_json, verified in
// batch_test.cpp): the summary CSV and the JSON result byte for byte, the
// counts and the refused rows' problems.
// Reference: run_batch (the project's own whole-schedule run; common
// practice, no source: streaming must not change a byte of the outputs).
#include <doctest/doctest.h>

#include <sstream>
#include <string>

#include "pinproof/batch/batch.hpp"
#include "pinproof/batch/streamed_batch.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/io/schedule.hpp"
#include "temp_dir.hpp"

using namespace pinproof;

namespace {

const detail_catalogue& details()
{
    static const detail_catalogue c = parse_detail_catalogue(R"({
  "format": "pinproof-details/1",
  "details": [
    { "id": "FP", "type": "fin-plate", "stiffness": { "min": "300 kN*m/rad", "max": "1400 kN*m/rad" },
      "moment_resistance": "18 kN*m" },
    { "id": "PIN", "type": "custom", "stiffness": 0 },
    { "id": "FIX", "type": "end-plate", "stiffness": "rigid", "moment_resistance": "500 kN*m" }
  ]
})",
                                                             "details.json");
    return c;
}

// Rows in SI units, or (us) in US customary units; every 97th row bad (an
// unknown section) and every 1013th a repeated id.
std::string rows(int n, bool us, int first = 0)
{
    std::string t;
    const char* ends[] = {"FP", "PIN", "FIX"};
    for (int i = first; i < first + n; ++i) {
        const std::string id = i % 1013 == 1012 ? "B" + std::to_string(i - 1000) : "B" + std::to_string(i);
        const std::string section = i % 97 == 96 ? "IPE 999" : us ? "W18x35" : "IPE 300";
        t += id + "," + (us ? std::to_string(18 + i % 7) + " ft," : std::to_string(5 + i % 4) + " m,") + section + "," +
             (us ? "0.4 kip/ft,0.6 kip/ft," : "8 kN/m,5 kN/m,") + ends[i % 3] + "," + ends[(i / 3) % 3] + "," +
             (us ? "ASCE7" : "EN1990") + "\n";
    }
    return t;
}

const std::string header = "id,span,section,g,q,start,end,combinations\n";

std::string text_of(scratch_file& f)
{
    std::ostringstream out;
    f.copy_to(out);
    return out.str();
}

void check_same_as_whole(const std::string& text, bool json, unit_system units)
{
    pinproof::testing::temp_dir dir("streamed-batch");
    const std::string path = dir.write("s.csv", text);
    const schedule s = parse_schedule(text, path);
    batch_options whole_options;
    whole_options.jobs = 2;
    whole_options.json = json;
    const batch_result whole = run_batch(s, details(), whole_options);

    streamed_batch_options o;
    o.batch = whole_options;
    o.problems_kept = 3;
    streamed_batch_outputs out;
    out.csv_si = std::make_shared<scratch_file>(dir.path.string() + "/out.csv");
    out.csv_us = std::make_shared<scratch_file>(dir.path.string() + "/out.csv");
    if (json) out.json = std::make_shared<scratch_file>("-");
    std::size_t last_done = 0;
    o.progress = [&](std::size_t done, double) { last_done = done; };
    schedule_stream in(path);
    const streamed_batch_result r = run_streamed_batch(in, details(), o, out);

    CHECK_FALSE(r.cancelled);
    CHECK(r.units == units);
    CHECK(r.units == whole.units);
    CHECK(last_done == whole.rows.size());
    CHECK(r.summary.rows == whole.summary.rows);
    CHECK(r.summary.checked == whole.summary.checked);
    CHECK(r.summary.passed == whole.summary.passed);
    CHECK(r.summary.failed == whole.summary.failed);
    CHECK(r.summary.refused == whole.summary.refused);
    CHECK(r.summary.refused > 0);
    std::size_t problems = 0;
    for (const auto& row : whole.rows) problems += row.problems.size();
    CHECK(r.problem_count == problems);
    REQUIRE(r.problems.size() == 3);
    CHECK(r.problems[0].where == whole.rows[96].problems.at(0).where);

    const std::string csv = batch_summary_csv_header(r.units) +
                            text_of(r.units == unit_system::us_customary ? *out.csv_us : *out.csv_si);
    CHECK(csv == batch_summary_csv(whole));
    if (json) {
        const std::string j = batch_result_json_head(r.summary, path, details()) + text_of(*out.json) +
                              batch_result_json_tail;
        CHECK(j == batch_result_json(whole, s, details()));
    }
}

}  // namespace

TEST_CASE("streamed batch: the summary CSV byte for byte as the whole run's over several parts [run_batch] - exact")
{
    // Over a megabyte (read in parts) and over 4096 rows (assessed in parts).
    check_same_as_whole(header + rows(14000, false), false, unit_system::si);
}

TEST_CASE("streamed batch: the JSON result byte for byte as the whole run's [run_batch] - exact")
{
    check_same_as_whole(header + rows(600, false), true, unit_system::si);
}

TEST_CASE("streamed batch: US customary only when every assessed row is as in the whole run [run_batch] - exact")
{
    check_same_as_whole(header + rows(300, true), false, unit_system::us_customary);
    // An SI row after many US rows turns the whole summary to SI.
    check_same_as_whole(header + rows(5000, true) + rows(3, false, 5000), false, unit_system::si);
}
