// Verification of the schedule reader.
//
// Sources (reference pack items in brackets):
//   [RFC4180] RFC 4180, Common Format and MIME Type for CSV Files (2005), section 2:
//             quoted fields, doubled quotes, CRLF, line breaks inside quotes.
//   [EN1990]  EN 1990:2002 Eq. 6.10 with Table A1.2(B): gamma_G,sup = 1.35,
//             gamma_Q = 1.5; characteristic combination Eq. 6.14b: G + Q
//             (pack section 9, confirmed [C]).
//   [ASCE7]   ASCE 7-16 2.3.1: 1.4D; 1.2D + 1.6L (+ 0.5 Lr/S/R, zero here);
//             service D + L (pack section 9, confirmed [C]).
//   [FT]      International yard and pound agreement (1959): ft = 0.3048 m exactly.
//   [SI]      SI Brochure, 9th ed., Table 7: k = 1e3.
// Tolerances: exact (==) for factors and exact unit conversions; 1e-12 relative
// for products of them.
#include <doctest/doctest.h>

#include <memory>
#include <string>

#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/io/schedule.hpp"

using namespace pinproof;

namespace {

const detail_catalogue& test_catalogue()
{
    static const detail_catalogue c = parse_detail_catalogue(R"({
      "format": "pinproof-details/1",
      "details": [
        { "id": "FP-3-M20", "type": "fin-plate", "stiffness": { "min": "300 kN*m/rad", "max": "1400 kN*m/rad" },
          "moment_resistance": "18 kN*m" },
        { "id": "SL", "type": "fin-plate", "stiffness": { "min": "0.05 EI/L", "max": "0.3 EI/L" } }
      ]
    })", "test.json");
    return c;
}

const char* const header = "id,span,section,g,q,start,end,combinations,deflection_limit,E\n";

std::string where_of(const schedule_row& r, std::size_t i = 0) { return i < r.problems.size() ? r.problems[i].where : ""; }
std::string message_of(const schedule_row& r, std::size_t i = 0)
{
    return i < r.problems.size() ? r.problems[i].message : "";
}

std::vector<input_problem> schedule_problems(const std::string& text)
{
    try {
        parse_schedule(text);
    } catch (const input_error& e) {
        return e.problems();
    }
    return {};
}

}  // namespace

TEST_CASE("csv: quoted cells with commas and doubled quotes and line breaks [RFC4180 section 2] - exact")
{
    const auto rs = read_csv("a,b,c\r\n\"x, y\",\"say \"\"hi\"\"\",\"two\nlines\"\r\n\n# a comment\n  p , q ,r");
    REQUIRE(rs.size() == 3);
    CHECK(rs[0].line == 1);
    CHECK(rs[0].cells == std::vector<std::string>{"a", "b", "c"});
    CHECK(rs[1].line == 2);
    CHECK(rs[1].cells == std::vector<std::string>{"x, y", "say \"hi\"", "two\nlines"});
    // The record after a two-line cell, a blank line and a comment starts on line 6.
    CHECK(rs[2].line == 6);
    CHECK(rs[2].cells == std::vector<std::string>{"p", "q", "r"});
    CHECK(read_csv("a,,\n").at(0).cells == std::vector<std::string>{"a", "", ""});
    CHECK(read_csv("\xEF\xBB\xBFid\n").at(0).cells == std::vector<std::string>{"id"});
}

TEST_CASE("csv: an unclosed quote is an error at its line and column [RFC4180 section 2 rule 5]")
{
    try {
        read_csv("a,b\n1,\"open\n2,3\n");
        FAIL("expected an input_error");
    } catch (const input_error& e) {
        REQUIRE(e.problems().size() == 1);
        CHECK(e.problems()[0].where == "line 2, column 2");
        CHECK(e.problems()[0].message.find("closing double quote") != std::string::npos);
    }
    const auto rs = read_csv("a,b\n\"x\"y,2\n3,4\n");
    REQUIRE(rs.size() == 3);
    CHECK(rs[1].bad_column == 1);
    CHECK(rs[2].bad_column == 0);
}

TEST_CASE("schedule: header problems refuse the whole schedule with line and column [common practice and no source]")
{
    auto ps = schedule_problems("id,span,section,g,q,start\nB1,6,IPE 300,1,1,FP-3-M20\n");
    CHECK(ps.size() == 1);
    CHECK(ps.at(0).where == "line 1");
    CHECK(ps.at(0).message.find("\"end\"") != std::string::npos);
    ps = schedule_problems("id,span,section,g,q,start,end,spna,id\nB1,6,IPE 300,1,1,FP-3-M20,FP-3-M20,1,B1\n");
    REQUIRE(ps.size() == 2);
    CHECK(ps[0].where == "line 1, column 8");
    CHECK(ps[0].message.find("found \"spna\"") != std::string::npos);
    CHECK(ps[1].where == "line 1, column 9 (id)");
    CHECK(schedule_problems("").at(0).message.find("header") != std::string::npos);
    CHECK(schedule_problems(header).at(0).where == "line 2");
}

TEST_CASE("schedule: EN1990 set is 1.35G+1.5Q strength and G+Q service [EN1990 Eq. 6.10 and Table A1.2(B) and Eq. 6.14b] - exact")
{
    const auto c = combinations_of(combination_set::en1990);
    REQUIRE(c.size() == 2);
    CHECK(c[0].use == limit_state::strength);
    CHECK(c[0].factors == std::map<std::string, double>{{"G", 1.35}, {"Q", 1.5}});
    CHECK(c[1].use == limit_state::service);
    CHECK(c[1].factors == std::map<std::string, double>{{"G", 1.0}, {"Q", 1.0}});
}

TEST_CASE("schedule: ASCE7 set is 1.4D and 1.2D+1.6L strength and D+L service [ASCE 7-16 2.3.1] - exact")
{
    const auto c = combinations_of(combination_set::asce7);
    REQUIRE(c.size() == 3);
    CHECK(c[0].use == limit_state::strength);
    CHECK(c[0].factors == std::map<std::string, double>{{"G", 1.4}});
    CHECK(c[1].use == limit_state::strength);
    CHECK(c[1].factors == std::map<std::string, double>{{"G", 1.2}, {"Q", 1.6}});
    CHECK(c[2].use == limit_state::service);
    CHECK(c[2].factors == std::map<std::string, double>{{"G", 1.0}, {"Q", 1.0}});
    CHECK(parse_combination_set("ASCE7") == combination_set::asce7);
    CHECK_FALSE(parse_combination_set("asce7").has_value());
}

TEST_CASE("schedule: a row becomes a beam with SI values [SI prefixes - ft = 0.3048 m exactly] - tol 1e-12")
{
    const schedule s = parse_schedule(std::string(header) +
                                      "B1,6,IPE 300,8500,7.5 kN/m,FP-3-M20,SL,,span/360,\n"
                                      "B2,20 ft,IPE 300,\"8.5 kN/m\",0,SL,FP-3-M20,ASCE7,20 mm,200 GPa\n");
    const schedule_row r1 = read_schedule_row(s, 0, test_catalogue());
    REQUIRE(r1.problems.empty());
    REQUIRE(r1.input.has_value());
    const beam& b = *r1.input;
    CHECK(b.id == "B1");
    CHECK(b.span == 6.0);
    CHECK(b.sec.name == "IPE 300");
    CHECK(b.E == 210e9);  // EN 1993-1-1 3.2.6(1), the default with the EN1990 set
    CHECK(b.E_is_default);
    REQUIRE(b.loads.size() == 2);
    CHECK(b.loads[0].load_case == "G");
    CHECK(b.loads[0].value == 8500.0);
    CHECK(b.loads[0].from == 0.0);
    CHECK(b.loads[0].to == 6.0);
    CHECK(b.loads[1].load_case == "Q");
    CHECK(b.loads[1].value == 7500.0);
    CHECK(b.combinations.size() == 2);
    CHECK(b.start.range.min.value() == 300e3);
    CHECK(b.start.range.max.value() == 1400e3);
    CHECK(*b.start.moment_resistance == 18e3);
    CHECK(b.end.range.max.value() == doctest::Approx(0.3 * b.EI() / 6.0).epsilon(1e-12));
    REQUIRE(b.deflection.has_value());
    CHECK(b.deflection->value(6.0) == doctest::Approx(6.0 / 360).epsilon(1e-12));
    CHECK(r1.settings.standard == design_standard::en1993_1_8);

    const schedule_row r2 = read_schedule_row(s, 1, test_catalogue());
    REQUIRE(r2.problems.empty());
    CHECK(r2.input->span == doctest::Approx(20 * 0.3048).epsilon(1e-12));
    CHECK(r2.input->E == 200e9);
    CHECK(r2.input->loads[1].value == 0.0);
    CHECK(r2.input->combinations.size() == 3);
    CHECK(r2.settings.standard == design_standard::aisc360);
    CHECK(r2.settings.units == unit_system::us_customary);
    CHECK(*r2.input->deflection->absolute == doctest::Approx(0.02).epsilon(1e-12));
    CHECK(r2.line == 3);
}

TEST_CASE("schedule: row problems name line and column and header and what was found [common practice and no source]")
{
    const schedule s = parse_schedule(std::string(header) +
                                      "B1,6 kN,IPE 301,-1 kN/m,x,FP-9,SL,EN1991,span/0,\n"
                                      "B2,6,IPE 300,1,1,FP-3-M20\n"
                                      "B3,6,IPE 300,1,1,FP-3-M20,SL,,,,extra\n"
                                      "B1,6,IPE 300,1,1,FP-3-M20,SL,,,\n"
                                      ",,IPE 300,0,0,FP-3-M20,SL,,,\n");
    const schedule_row r = read_schedule_row(s, 0, test_catalogue());
    CHECK_FALSE(r.input.has_value());
    const auto find = [&](const std::string& where) {
        for (const auto& p : r.problems)
            if (p.where == where) return p.message;
        return std::string("(no problem at " + where + ")");
    };
    CHECK(find("line 2, column 2 (span)").find("expected length") == 0);
    CHECK(find("line 2, column 2 (span)").find("found \"6 kN\", which is force") != std::string::npos);
    CHECK(find("line 2, column 3 (section)").find("found \"IPE 301\"") != std::string::npos);
    CHECK(find("line 2, column 4 (g)").find("found \"-1 kN/m\"") != std::string::npos);
    CHECK(find("line 2, column 5 (q)").find("found \"x\"") != std::string::npos);
    CHECK(find("line 2, column 6 (start)").find("found \"FP-9\"") != std::string::npos);
    CHECK(find("line 2, column 6 (start)").find("test.json") != std::string::npos);
    CHECK(find("line 2, column 8 (combinations)").find("found \"EN1991\"") != std::string::npos);
    CHECK(find("line 2, column 9 (deflection_limit)").find("found \"span/0\"") != std::string::npos);
    CHECK(r.problems.size() == 7);

    const schedule_row short_row = read_schedule_row(s, 1, test_catalogue());
    CHECK(where_of(short_row) == "line 3, column 7 (end)");
    CHECK(message_of(short_row).find("found 6 cells") != std::string::npos);
    CHECK(short_row.id == "B2");
    CHECK(where_of(read_schedule_row(s, 2, test_catalogue())) == "line 4, column 11");
    const schedule_row dup = read_schedule_row(s, 3, test_catalogue());
    CHECK(where_of(dup) == "line 5, column 1 (id)");
    CHECK(message_of(dup).find("already used on line 2") != std::string::npos);
    const schedule_row empty = read_schedule_row(s, 4, test_catalogue());
    CHECK(where_of(empty, 0) == "line 6, column 1 (id)");
    CHECK(message_of(empty, 0) == "expected a value, found an empty cell");
    CHECK(where_of(empty, 1) == "line 6, column 2 (span)");
    CHECK(where_of(empty, 2) == "line 6, column 4 (g)");
    CHECK(message_of(empty, 2).find("g = 0 and q = 0") != std::string::npos);
}

TEST_CASE("a catalogue entry's geometry is read afresh when another catalogue takes its place (common practice - no source): the gap of each catalogue in turn - exact")
{
    // read_schedule_row keeps the detail read from each entry per thread; a
    // later catalogue may sit at the same address with other geometry.
    const auto catalogue_with_gap = [](const std::string& gap) {
        return std::make_unique<detail_catalogue>(parse_detail_catalogue(R"({
          "format": "pinproof-details/1",
          "details": [
            { "id": "FP-3-M20", "type": "fin-plate", "stiffness": { "min": "300 kN*m/rad", "max": "1400 kN*m/rad" },
              "geometry": { "support": "column-flange", "gap": ")" + gap + R"(", "gap_tolerance": "5 mm",
                "plate_top": "50 mm", "plate_depth": "230 mm", "plate_thickness": "10 mm", "plate_grade": "S275",
                "bolt_diameter": "20 mm", "bolt_rows": 3, "bolt_pitch": "70 mm", "first_bolt": "45 mm",
                "bolt_line": "50 mm" } }
          ]
        })", "test.json"));
    };
    const schedule s =
        parse_schedule(std::string(header) + "B1,6 m,IPE 300,5 kN/m,3 kN/m,FP-3-M20,FP-3-M20,EN1990,span/360,\n");
    for (const char* gap : {"20 mm", "12 mm", "20 mm", "15 mm"}) {
        auto c = catalogue_with_gap(gap);
        const schedule_row r = read_schedule_row(s, 0, *c);
        REQUIRE(r.input);
        REQUIRE(r.input->start.detail);
        CHECK(r.input->start.detail->gap == parse_quantity(gap).value);
        c.reset();
    }
}

TEST_CASE("schedule: a layout column - a cantilever row takes its root at start and leaves end empty - refusals at line and column [the project's rules]")
{
    const std::string text = "id,span,section,g,q,start,end,layout\n"
                             "B1,6 m,IPE 300,10 kN/m,5 kN/m,FP-3-M20,FP-3-M20,\n"
                             "C1,1.8 m,IPE 240,6 kN/m,6 kN/m,FP-3-M20,,cantilever\n"
                             "C2,1.8 m,IPE 240,6 kN/m,6 kN/m,FP-3-M20,FP-3-M20,cantilever\n"
                             "C3,1.8 m,IPE 240,6 kN/m,6 kN/m,FP-3-M20,FP-3-M20,overhang\n";
    const schedule s = parse_schedule(text);
    const auto b1 = read_schedule_row(s, 0, test_catalogue());
    REQUIRE(b1.input);
    CHECK(b1.input->layout == beam_layout::two_supports);
    const auto c1 = read_schedule_row(s, 1, test_catalogue());
    REQUIRE(c1.input);
    CHECK(c1.input->layout == beam_layout::cantilever);
    CHECK(c1.input->end.range.max.is_pinned());
    CHECK(c1.input->start.range.min.value() == doctest::Approx(300e3).epsilon(1e-12));
    const auto c2 = read_schedule_row(s, 2, test_catalogue());
    CHECK_FALSE(c2.input);
    CHECK(where_of(c2) == "line 4, column 7 (end)");
    CHECK(message_of(c2).find("free tip") != std::string::npos);
    const auto c3 = read_schedule_row(s, 3, test_catalogue());
    CHECK_FALSE(c3.input);
    CHECK(where_of(c3) == "line 5, column 8 (layout)");
    CHECK(message_of(c3).find("needs an \"overhang\" column") != std::string::npos);
}

TEST_CASE("schedule: an overhang column - an overhang row takes its start detail and its length - the loads run to the tip - refusals at line and column [the project's rules]")
{
    const std::string text = "id,span,section,g,q,start,end,layout,overhang\n"
                             "O1,6 m,IPE 300,4 kN/m,2 kN/m,FP-3-M20,,overhang,1.5 m\n"
                             "O2,6 m,IPE 300,4 kN/m,2 kN/m,FP-3-M20,,overhang,\n"
                             "O3,6 m,IPE 300,4 kN/m,2 kN/m,FP-3-M20,FP-3-M20,overhang,1.5 m\n"
                             "B1,6 m,IPE 300,4 kN/m,2 kN/m,FP-3-M20,FP-3-M20,,1.5 m\n";
    const schedule s = parse_schedule(text);
    const auto o1 = read_schedule_row(s, 0, test_catalogue());
    REQUIRE(o1.input);
    CHECK(o1.input->layout == beam_layout::overhang);
    CHECK(o1.input->overhang == doctest::Approx(1.5).epsilon(1e-15));
    CHECK(o1.input->end.range.max.is_pinned());
    for (const auto& l : o1.input->loads) CHECK(l.to == doctest::Approx(7.5).epsilon(1e-15));
    const auto o2 = read_schedule_row(s, 1, test_catalogue());
    CHECK_FALSE(o2.input);
    CHECK(where_of(o2) == "line 3, column 9 (overhang)");
    const auto o3 = read_schedule_row(s, 2, test_catalogue());
    CHECK_FALSE(o3.input);
    CHECK(where_of(o3) == "line 4, column 7 (end)");
    CHECK(message_of(o3).find("continuous") != std::string::npos);
    const auto b1 = read_schedule_row(s, 3, test_catalogue());
    CHECK_FALSE(b1.input);
    CHECK(where_of(b1) == "line 5, column 9 (overhang)");
    CHECK(message_of(b1).find("only a row with layout \"overhang\"") != std::string::npos);
}
