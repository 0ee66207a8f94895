// The schedule's summary page: counts by verdict, failed and governing checks
// tallied, every beam in a sortable table with its units, user text escaped.
//
// Reference: the rows are made by hand here; their counts are worked out
// below (exact). The page states the caution the brief requires.
#include <doctest/doctest.h>

#include <string>

#include "pinproof/report/calculation_report.hpp"
#include "pinproof/batch/schedule_summary.hpp"
#include "pinproof/report/text_report.hpp"

using namespace pinproof;

namespace {

std::size_t count(const std::string& s, const std::string& what)
{
    std::size_t n = 0;
    for (std::size_t at = s.find(what); at != std::string::npos; at = s.find(what, at + 1)) ++n;
    return n;
}

batch_result three_rows()
{
    batch_result r;
    batch_row a;
    a.line = 2;
    a.id = "L1-A/1";
    a.verdict = batch_verdict::holds;
    a.governing_check = "deflection";
    a.worst_ratio = 0.961;
    a.reaction_start = a.reaction_end = 102.3e3;
    a.moment_start = a.moment_end = 11.24e3;
    a.rotation_start = a.rotation_end = 11.95e-3;
    batch_row b = a;
    b.line = 3;
    b.id = "L1-A/<2>";
    b.verdict = batch_verdict::does_not_hold;
    b.governing_check = "stiffness-class-start";
    b.worst_ratio = 1.46;
    b.failed_checks = {"stiffness-class-start", "joint-moment-start"};
    batch_row c;
    c.line = 4;
    c.id = "L1-A/3";
    c.verdict = batch_verdict::refused;
    c.problems = {{"schedule.csv:4:3", "expected a section name, found \"IPE 3000\""}};
    r.rows = {a, b, c};
    r.summary = {3, 2, 1, 1, 1};
    return r;
}

schedule_summary_info info()
{
    schedule_summary_info i;
    i.schedule_file = "schedule.csv";
    i.schedule_sha256 = std::string(64, 'a');
    i.catalogue_file = "details.json";
    i.catalogue_title = "Invented catalogue";
    i.date = "2026-12-05";
    i.version = "test";
    return i;
}

}  // namespace

TEST_CASE("schedule_summary - counts and tallies and table and caution")
{
    const std::string html = schedule_summary_html(three_rows(), info());
    // | item                          | expected (worked by hand)           |
    // | verdict line                  | 1 of 3 beams does not hold, 1 refused |
    // | failed-check tally            | each failed id once                 |
    // | rows of the sortable table    | 3                                   |
    CHECK(html.find("DOES NOT HOLD for 1 of 3 beams; 1 row was refused") != std::string::npos);
    CHECK(html.find("<td>holds</td><td class=\"num\">1</td><td class=\"num\">33.3 %</td>") != std::string::npos);
    CHECK(html.find("<code>joint-moment-start</code></td><td class=\"num\">1</td>") != std::string::npos);
    CHECK(count(html, "<tr><td class=\"num\" data-v=\"") == 3);
    CHECK(count(html, "class=\"sortable\"") == 1);
    // Units in the headers, values in them: 102.3 kN, 11.24 kN*m, 11.95 mrad.
    CHECK(html.find("R start [kN]") != std::string::npos);
    CHECK(html.find(">102.3</td>") != std::string::npos);
    CHECK(html.find(">11.24</td>") != std::string::npos);
    CHECK(html.find(">11.95</td>") != std::string::npos);
    // A refused row is listed with where and what.
    CHECK(html.find("schedule.csv:4:3") != std::string::npos);
    CHECK(html.find("IPE 3000") != std::string::npos);
    // User text escaped; the caution on the page; the sheet count in the footer.
    CHECK(html.find("L1-A/&lt;2&gt;") != std::string::npos);
    CHECK(html.find("L1-A/<2>") == std::string::npos);
    CHECK(html.find(html_escape(caution_text)) != std::string::npos);
    CHECK(html.find("counter(pages)") != std::string::npos);
}

TEST_CASE("schedule_summary - US customary units in the headers")
{
    batch_result r = three_rows();
    r.units = unit_system::us_customary;
    const std::string html = schedule_summary_html(r, info());
    CHECK(html.find("R start [kip]") != std::string::npos);
    CHECK(html.find("@page { size: letter") != std::string::npos);
    // 102.3 kN = 23.00 kip (1 kip = 4.448222 kN).
    CHECK(html.find(">23.00</td>") != std::string::npos);
}
