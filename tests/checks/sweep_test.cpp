// Verification of the stiffness sweep.
//
// Sources:
//   [check] The pinned and fixed states of assess_beam (pinproof check): the
//           sweep's end points must equal them exactly (same engine, exact ends).
//   [MW63]  Monforton & Wu 1963 [C], pack section 5: equal springs, UDL:
//           M = MF kappa/(kappa + 2) [D]; r = kappa/(kappa + 3) [M].
#include <doctest/doctest.h>

#include <cmath>
#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/checks/sweep.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/report/sweep_output.hpp"

using namespace pinproof;

namespace {

project two_combination_project()
{
    return parse_project(R"({ "format": "pinproof-project/1", "title": "sweep test", "standard": "EN1993-1-8",
      "frame": "braced", "beams": [ { "id": "B1", "span": "6 m", "E": "210 GPa", "section": "IPE 300",
      "loads": [ { "case": "G", "kind": "udl", "w": "8 kN/m" }, { "case": "Q", "kind": "point", "P": "20 kN", "at": "2 m" } ],
      "combinations": [ { "name": "ULS", "use": "strength", "factors": { "G": 1.35, "Q": 1.5 } },
                        { "name": "SLS", "use": "service", "factors": { "G": 1.0, "Q": 1.0 } } ],
      "joints": { "start": { "stiffness": { "min": "0.1 EI/L", "max": "0.6 EI/L" }, "moment_resistance": "20 kN*m" },
                  "end": { "stiffness": { "min": "0.2 EI/L", "max": "rigid" } } },
      "limits": { "deflection": "span/360" } } ] })");
}

bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::max(std::abs(a), std::abs(b)); }

}  // namespace

TEST_CASE("sweep end points equal the pinned and fixed states of check [check]: exact equality")
{
    const project p = two_combination_project();
    const beam& b = p.beams.front();
    const beam_assessment a = assess_beam(p, b);
    for (std::size_t ci = 0; ci < b.combinations.size(); ++ci) {
        sweep_settings s;
        s.points = 7;
        s.combination = b.combinations[ci].name;
        const sweep_result r = sweep_beam(p, b, s);
        REQUIRE(r.rows.size() == 9);
        CHECK(r.rows.front().at.start.is_pinned());
        CHECK(r.rows.front().at.end.is_pinned());
        CHECK(r.rows.back().at.start.is_rigid());
        CHECK(r.rows.back().at.end.is_rigid());
        for (const auto& f : result_fields()) {
            CAPTURE(f.key);
            CHECK(r.rows.front().state.*(f.member) == a.combinations[ci].pinned.value().*(f.member));
            CHECK(r.rows.back().state.*(f.member) == a.combinations[ci].fixed.*(f.member));
            CHECK(r.pinned.*(f.member) == a.combinations[ci].pinned.value().*(f.member));
            CHECK(r.fixed.*(f.member) == a.combinations[ci].fixed.*(f.member));
        }
        CHECK(r.rows.front().fixity_start == 0.0);
        CHECK(r.rows.back().fixity_end == 1.0);
    }
}

TEST_CASE("sweep points log spaced from 0.01 to 1000 [issue]: fixity r = kappa/(kappa+3) [MW63] - tol 1e-12")
{
    const project p = two_combination_project();
    const beam& b = p.beams.front();
    sweep_settings s;
    s.points = 6;
    const sweep_result r = sweep_beam(p, b, s);
    REQUIRE(r.rows.size() == 8);
    for (int i = 0; i < 6; ++i) {
        const auto& row = r.rows[i + 1];
        const double k = std::pow(10.0, -2 + i);
        CHECK(close(row.at.start.ratio(b.EI(), b.span), k, 1e-12));
        CHECK(close(row.fixity_start, k / (k + 3), 1e-12));
    }
}

TEST_CASE("sweep state at kappa = 1 - equal springs - UDL [MW63 - D]: M = MF/3 - tol 1e-9")
{
    const project p = parse_project(R"({ "format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced", "beams": [ { "id": "B1",
      "span": "6 m", "E": "210 GPa", "section": "IPE 300", "loads": [ { "case": "G", "kind": "udl", "w": "20 kN/m" } ],
      "combinations": [ { "name": "ULS", "use": "strength", "factors": { "G": 1.0 } } ],
      "joints": { "start": { "stiffness": "1 EI/L" }, "end": { "stiffness": "1 EI/L" } } } ] })");
    sweep_settings s;
    s.points = 6;
    const sweep_result r = sweep_beam(p, p.beams.front(), s);
    const auto& row = r.rows[3];  // kappa = 1
    const double MF = 20e3 * 36 / 12;
    CHECK(close(row.state.moment_start, MF / 3, 1e-9));
    CHECK(close(row.state.moment_end, MF / 3, 1e-9));
}

TEST_CASE("one end moving [issue]: the other end held at the given value in every row")
{
    const project p = two_combination_project();
    sweep_settings s;
    s.points = 5;
    s.path = {moving_end::end, stiffness::spring(1e6)};
    const sweep_result r = sweep_beam(p, p.beams.front(), s);
    for (const auto& row : r.rows) CHECK(row.at.start == stiffness::spring(1e6));
    CHECK(r.rows.back().at.end.is_rigid());
}

TEST_CASE("grid [issue]: (N+2) x (N+2) pairs with start outer - no thresholds along a path")
{
    const project p = two_combination_project();
    sweep_settings s;
    s.points = 3;
    s.grid = true;
    const sweep_result r = sweep_beam(p, p.beams.front(), s);
    REQUIRE(r.rows.size() == 25);
    CHECK(r.rows[4].at.start.is_pinned());
    CHECK(r.rows[4].at.end.is_rigid());
    CHECK(r.rows[5].at.end.is_pinned());
    CHECK(r.thresholds.empty());
}

TEST_CASE("CSV [issue]: header with units - rigid written as text - no nan or inf - one line per row")
{
    const project p = two_combination_project();
    sweep_settings s;
    s.points = 4;
    const sweep_result r = sweep_beam(p, p.beams.front(), s);
    const std::string csv = sweep_csv(r, unit_system::si);
    CHECK(csv.find("stiffness_start [kN*m/rad],ratio_start [1],fixity_start [1]") == 0);
    CHECK(csv.find("moment_start [kN*m]") != std::string::npos);
    CHECK(csv.find("rotation_start [mrad]") != std::string::npos);
    const std::string us = sweep_csv(r, unit_system::us_customary);
    CHECK(us.find("moment_start [kip*ft]") != std::string::npos);
    CHECK(us.find("reaction_start [kip]") != std::string::npos);
    CHECK(csv.find(",deflection,") != std::string::npos);
    CHECK(csv.find(",gap-closure-end\n") != std::string::npos);
    CHECK(csv.find("rigid,") != std::string::npos);
    CHECK(csv.find("nan") == std::string::npos);
    CHECK(csv.find("inf") == std::string::npos);
    std::size_t lines = 0;
    for (char c : csv) lines += c == '\n';
    CHECK(lines == r.rows.size() + 1);
}

TEST_CASE("unknown combination [project rules]: input_error naming the option and the known names")
{
    const project p = two_combination_project();
    sweep_settings s;
    s.combination = "ULS-X";
    try {
        sweep_beam(p, p.beams.front(), s);
        FAIL("no error");
    } catch (const input_error& e) {
        CHECK(e.problems().front().where == "--combination");
        CHECK(e.problems().front().message.find("ULS, SLS") != std::string::npos);
    }
}

TEST_CASE("sweep chart [issue]: code boundaries and thresholds marked - ranges shaded - no nan")
{
    const project p = two_combination_project();
    const beam& b = p.beams.front();
    sweep_settings s;
    s.points = 21;
    const sweep_result r = sweep_beam(p, b, s);
    const std::string svg = sweep_svg(p, b, r);
    for (const char* t : {"EN pinned 0.5", "EN rigid 8 (braced)", "EN rigid 25 (unbraced)", "AISC simple 2",
                          "AISC FR 20", "stiffness range, start joint", "stiffness-class-start 0.5"})
        CHECK(svg.find(t) != std::string::npos);
    CHECK(svg.find("nan") == std::string::npos);
}

TEST_CASE("cantilever sweep [issue]: the root alone from S*L/EI = 0.01 (no pinned root: a mechanism) to rigid - a grid refused at --grid")
{
    const project p = parse_project(R"({ "format": "pinproof-project/1", "title": "cantilever sweep", "standard": "EN1993-1-8",
      "frame": "braced", "beams": [ { "id": "C1", "layout": "cantilever", "span": "2 m", "section": "IPE 240",
      "loads": [ { "case": "G", "kind": "udl", "w": "10 kN/m" } ],
      "combinations": [ { "name": "SLS", "use": "service", "factors": { "G": 1.0 } } ],
      "joints": { "start": { "stiffness": { "min": "10 EI/L", "max": "50 EI/L" } } },
      "limits": { "deflection": "span/300" } } ] })");
    const beam& b = p.beams.at(0);
    sweep_settings settings;
    settings.points = 11;
    const sweep_result s = sweep_beam(p, b, settings);
    REQUIRE(s.rows.size() == 12);  // 11 log-spaced values and the rigid root
    CHECK(s.rows.front().at.start.ratio(b.EI(), b.span) == doctest::Approx(0.01).epsilon(1e-12));
    CHECK(s.rows.back().at.start.is_rigid());
    for (const auto& r : s.rows) CHECK(r.at.end.is_pinned());  // the free tip
    CHECK(s.settings.path.moving == moving_end::start);
    // pinned holds the rigid root: a cantilever has no pinned state.
    CHECK(s.pinned.max_deflection == s.fixed.max_deflection);
    CHECK_FALSE(s.thresholds.empty());
    // The chart plots the rigid root's tip deflection over the tip deflection,
    // 1 / (1 + 4/kappa) under a UDL (Roark, 7th ed., Table 8.1, from memory,
    // with the root spring's (wL^2/2)/S L derived in cantilever_checks_test.cpp):
    // between 0 and 1, not growing without bound as the root softens.
    for (const auto& r : s.rows) {
        if (r.at.start.is_rigid()) continue;
        const double kappa = r.at.start.ratio(b.EI(), b.span);
        CHECK(s.fixed.max_deflection / r.state.max_deflection == doctest::Approx(1 / (1 + 4 / kappa)).epsilon(1e-9));
    }
    const std::string svg = sweep_svg(p, b, s);
    CHECK(svg.find("rigid root / tip deflection") != std::string::npos);
    CHECK(svg.find("1 where the root acts as fixed") != std::string::npos);
    settings.grid = true;
    try {
        sweep_beam(p, b, settings);
        FAIL("a grid was swept");
    } catch (const input_error& e) {
        CHECK(std::string(e.what()).find("--grid") != std::string::npos);
    }
}
