// Detailing rules at, below and above their limits.
//
// References (as cited in docs/method/gap-geometry.md):
//   [SBE fin]   Steel Buildings in Europe, Part 5: Joint design, fin plates (MSB05 p. 32): hp >= 0.6 hb;
//               tp <= 0.5 d (S275); end and edge distances >= 2d; long when
//               tp / z < 0.15. 0.42 d for S355: from memory.
//   [SBE end]   SBE Part 5, partial-depth end plates (MSB05 p. 16): hp >= 0.6 hb,
//               tp 10 or 12 mm, < 8 mm not advised; d0 = d + 2 mm (d <= 24 mm),
//               d + 3 mm above.
//   [P212]      SCI P212: 10 mm gap usual (from memory).
//   [P358]      SCI P358: end plate 10 mm with M20, 12 mm with M24 (from memory).
//   [AISC]      fallback rotation 0.03 rad: AISC 360 Commentary and Manual
//               Part 10 (from memory).
//   [M10]       AISC Steel Construction Manual, Part 10 (reference pack 10.3 and
//               7, from memory): conventional single plate, plate or web
//               t <= d_b/2 + 1/16 in, bolt line at most 3 1/2 in from the weld
//               line; double angles at most 5/8 in thick; setback 1/2 in;
//               connection length at least half the clear web depth.
//   [J3.4]      AISC 360-16 Table J3.4 minimum edge distances (from memory):
//               1 in for a 3/4 in bolt, 1 1/4 in for a 1 in bolt.
#include <doctest/doctest.h>

#include <string>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/checks/detailing_rules.hpp"

using namespace pinproof;

namespace {

constexpr double mm = 1e-3;

section ipe300()
{
    // EN 10365 IPE 300: h 300, tw 7.1, tf 10.7 mm.
    section s;
    s.name = "IPE 300";
    s.depth = 300 * mm;
    s.web_thickness = 7.1 * mm;
    s.flange_thickness = 10.7 * mm;
    return s;
}

connection_detail fin_plate()
{
    connection_detail d;
    d.type = detail_type::fin_plate;
    d.gap = 10 * mm;
    d.plate_top = 50 * mm;
    d.plate_depth = 180 * mm;  // exactly 0.6 x 300
    d.plate_thickness = 10 * mm;
    d.bolts.diameter = 20 * mm;
    d.bolts.hole_diameter = 22 * mm;
    d.bolts.rows = 2;
    d.bolts.pitch = 100 * mm;
    d.bolts.first_bolt = 40 * mm;  // 2d = 40 mm: at the limit; bottom 180 - 140 = 40 mm
    d.bolts.bolt_line = 50 * mm;
    return d;
}

detailing_finding find(const std::vector<detailing_finding>& all, const std::string& id)
{
    for (const auto& f : all)
        if (f.id == id) return f;
    FAIL("no finding " << id);
    return {};
}

detailing_finding rule(const connection_detail& d, const std::string& id, const section& s = ipe300())
{
    return find(check_detailing_rules(d, s), id);
}

}  // namespace

TEST_CASE("every rule is reported once - with its rule and source stated")
{
    const auto all = check_detailing_rules(fin_plate(), ipe300());
    CHECK(all.size() == 8);
    for (const auto& f : all) {
        CHECK_FALSE(f.rule.empty());
        CHECK_FALSE(f.source.empty());
        CHECK_FALSE(f.message.empty());
    }
}

TEST_CASE("gap-tolerance [common practice - no source]: warn when it is left out and taken as 0 - pass when given")
{
    auto d = fin_plate();
    d.gap_tolerance_given = false;
    d.gap_tolerance = 0;
    auto f = rule(d, "gap-tolerance");
    CHECK(f.status == finding_status::warn);
    CHECK(f.message.find("taken as 0") != std::string::npos);
    d.gap_tolerance_given = true;
    d.gap_tolerance = 3 * mm;
    CHECK(rule(d, "gap-tolerance").status == finding_status::pass);
}

TEST_CASE("min-gap: 10 mm [P212 - from memory]")
{
    auto d = fin_plate();
    CHECK(rule(d, "min-gap").status == finding_status::pass);  // at the limit
    d.gap = 9.9 * mm;
    auto f = rule(d, "min-gap");
    CHECK(f.status == finding_status::warn);
    CHECK(*f.value == doctest::Approx(9.9 * mm));
    CHECK(*f.limit == doctest::Approx(10 * mm));
    CHECK(f.source.find("from memory") != std::string::npos);
    d.gap = 20 * mm;
    CHECK(rule(d, "min-gap").status == finding_status::pass);
    auto e = fin_plate();
    e.type = detail_type::end_plate;
    CHECK(rule(e, "min-gap").status == finding_status::not_applicable);
}

TEST_CASE("plate-depth: hp >= 0.6 hb [SBE fin] - [SBE end]")
{
    auto d = fin_plate();
    CHECK(rule(d, "plate-depth").status == finding_status::pass);  // 180 = 0.6 x 300
    d.plate_depth = 179 * mm;
    const auto f = rule(d, "plate-depth");
    CHECK(f.status == finding_status::warn);
    CHECK(*f.limit == doctest::Approx(180 * mm));
    d.plate_depth = 220 * mm;
    CHECK(rule(d, "plate-depth").status == finding_status::pass);
    d.type = detail_type::web_cleats;
    d.plate_depth = 150 * mm;
    CHECK(rule(d, "plate-depth").status == finding_status::warn);
    d.type = detail_type::custom;
    CHECK(rule(d, "plate-depth").status == finding_status::not_applicable);
}

TEST_CASE("plate-ductility: fin plate or web no thicker than 0.5 d in S275 [SBE fin] - 0.42 d in S355 (from memory)")
{
    auto d = fin_plate();
    // The IPE 300 web (7.1 mm) is thinner than 0.5 x 20 = 10 mm: passes whatever the plate.
    d.plate_thickness = 15 * mm;
    auto f = rule(d, "plate-ductility");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.value == doctest::Approx(7.1 * mm));
    CHECK(f.rule.find("S275") != std::string::npos);

    // A thick web: the plate decides.
    section thick = ipe300();
    thick.web_thickness = 12 * mm;
    d.plate_thickness = 10 * mm;  // at 0.5 d
    CHECK(rule(d, "plate-ductility", thick).status == finding_status::pass);
    d.plate_thickness = 10.5 * mm;
    f = rule(d, "plate-ductility", thick);
    CHECK(f.status == finding_status::warn);
    CHECK(*f.limit == doctest::Approx(10 * mm));
    d.plate_thickness = 8 * mm;
    CHECK(rule(d, "plate-ductility", thick).status == finding_status::pass);

    // S355: 0.42 d = 8.4 mm.
    d.grade = plate_grade::s355;
    d.plate_thickness = 8.4 * mm;
    f = rule(d, "plate-ductility", thick);
    CHECK(f.status == finding_status::pass);
    CHECK(*f.limit == doctest::Approx(8.4 * mm));
    CHECK(f.rule.find("S355") != std::string::npos);
    d.plate_thickness = 9 * mm;
    CHECK(rule(d, "plate-ductility", thick).status == finding_status::warn);

    // End plate: about 0.5 d [P358, from memory]; cleats: not applied.
    auto e = fin_plate();
    e.type = detail_type::end_plate;
    e.plate_thickness = 12 * mm;
    e.bolts.diameter = 24 * mm;
    CHECK(rule(e, "plate-ductility").status == finding_status::pass);
    e.bolts.diameter = 20 * mm;
    f = rule(e, "plate-ductility");
    CHECK(f.status == finding_status::warn);
    CHECK(f.source.find("from memory") != std::string::npos);
    e.type = detail_type::web_cleats;
    CHECK(rule(e, "plate-ductility").status == finding_status::not_applicable);
}

TEST_CASE("bolt-hole-clearance: d + 2 mm up to M24 - d + 3 mm above [SBE end]")
{
    auto d = fin_plate();
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::pass);
    d.bolts.hole_diameter = 21 * mm;
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::warn);
    d.bolts.hole_diameter = 24 * mm;
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::warn);
    d.bolts.diameter = 24 * mm;
    d.bolts.hole_diameter = 26 * mm;
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::pass);
    d.bolts.diameter = 27 * mm;
    d.bolts.hole_diameter = 29 * mm;
    const auto f = rule(d, "bolt-hole-clearance");
    CHECK(f.status == finding_status::warn);
    CHECK(*f.limit == doctest::Approx(3 * mm));
    d.bolts.hole_diameter = 30 * mm;
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::pass);
}

TEST_CASE("bolt-hole-clearance: standard holes of AISC 360-16 Table J3.3 pass - 3/4 in bolt in 13/16 in - 1 in bolt in 1-1/8 in (from memory)")
{
    constexpr double inch = 0.0254;
    auto d = fin_plate();
    d.bolts.diameter = 0.75 * inch;
    d.bolts.hole_diameter = 13.0 / 16 * inch;
    auto f = rule(d, "bolt-hole-clearance");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.limit == doctest::Approx(inch / 16));
    d.bolts.diameter = 1.0 * inch;
    d.bolts.hole_diameter = 1.125 * inch;
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::pass);
    d.bolts.hole_diameter = 1.0625 * inch;  // 1/16 in: tight for a 1 in bolt (1.59 mm, below 2 and 3.18 mm)
    CHECK(rule(d, "bolt-hole-clearance").status == finding_status::warn);
    d.bolts.diameter = 0.75 * inch;
    d.bolts.hole_diameter = 0.75 * inch + 1.8 * mm;  // between 1/16 in and 2 mm: neither
    f = rule(d, "bolt-hole-clearance");
    CHECK(f.status == finding_status::warn);
    CHECK(f.message.find("neither normal clearance") != std::string::npos);
}

TEST_CASE("bolt-edge-distance: at least 2d [SBE fin]")
{
    auto d = fin_plate();
    CHECK(rule(d, "bolt-edge-distance").status == finding_status::pass);  // 40 = 2 x 20 at both ends
    d.plate_depth = 175 * mm;  // bottom end distance 35 mm
    const auto f = rule(d, "bolt-edge-distance");
    CHECK(f.status == finding_status::warn);
    CHECK(*f.value == doctest::Approx(35 * mm));
    d.plate_depth = 200 * mm;
    d.bolts.first_bolt = 45 * mm;
    CHECK(rule(d, "bolt-edge-distance").status == finding_status::pass);
}

TEST_CASE("long-fin-plate: tp / z < 0.15 is long [SBE fin]")
{
    auto d = fin_plate();  // z = 10 + 50 = 60 mm; 10 / 60 = 0.167
    CHECK(rule(d, "long-fin-plate").status == finding_status::pass);
    d.plate_thickness = 9 * mm;  // 9 / 60 = 0.15: at the limit
    CHECK(rule(d, "long-fin-plate").status == finding_status::pass);
    d.plate_thickness = 8 * mm;  // 0.133
    const auto f = rule(d, "long-fin-plate");
    CHECK(f.status == finding_status::warn);
    CHECK(*f.value == doctest::Approx(8.0 / 60.0));
    CHECK(f.unit == dims::dimensionless);
}

TEST_CASE("end-plate-thickness: 8 mm or more [SBE end]")
{
    auto d = fin_plate();
    d.type = detail_type::end_plate;
    d.plate_thickness = 8 * mm;
    CHECK(rule(d, "end-plate-thickness").status == finding_status::pass);
    d.plate_thickness = 6 * mm;
    CHECK(rule(d, "end-plate-thickness").status == finding_status::warn);
    d.type = detail_type::fin_plate;
    CHECK(rule(d, "end-plate-thickness").status == finding_status::not_applicable);
}

TEST_CASE("fallback rotation demand [AISC - from memory]")
{
    CHECK(fallback_rotation_demand.value == 0.03);
    CHECK(fallback_rotation_demand.label.find("fallback") != std::string_view::npos);
    CHECK(fallback_rotation_demand.source.find("from memory") != std::string_view::npos);
    CHECK(to_string(finding_status::not_applicable) == "not-applicable");
}

namespace {

constexpr double inch = 0.0254;

// A W18x35 as the US rules see it (AISC Manual Table 1-1, from memory): d 17.7 in,
// t_w 0.300 in, t_f 0.425 in, fillet taken as 0.40 in.
section w18x35()
{
    section s;
    s.name = "W18x35";
    s.depth = 17.7 * inch;
    s.web_thickness = 0.300 * inch;
    s.flange_thickness = 0.425 * inch;
    s.root_radius = 0.40 * inch;
    return s;
}

// A conventional single plate: 3/8 in A36, three 3/4 in bolts at 3 in, 1 1/2 in
// edge distances, 9 in long, bolt line 3 in from the weld line with a 1/2 in setback.
connection_detail single_plate()
{
    connection_detail d;
    d.type = detail_type::fin_plate;
    d.grade = plate_grade::a36;
    d.gap = 0.5 * inch;
    d.plate_top = 3 * inch;
    d.plate_depth = 9 * inch;
    d.plate_thickness = 0.375 * inch;
    d.bolts.diameter = 0.75 * inch;
    d.bolts.hole_diameter = 13.0 / 16 * inch;
    d.bolts.rows = 3;
    d.bolts.pitch = 3 * inch;
    d.bolts.first_bolt = 1.5 * inch;
    d.bolts.bolt_line = 2.5 * inch;
    return d;
}

detailing_finding us_rule(const connection_detail& d, const std::string& id, const section& s = w18x35())
{
    return find(check_detailing_rules(d, s, unit_system::us_customary, design_standard::aisc360), id);
}

}  // namespace

TEST_CASE("AISC 360 project: the US rules under the same ids - never the European guides' [M10] [J3.4]")
{
    auto d = single_plate();
    // | rule               | value                        | limit                         | status |
    // | plate-ductility    | web 0.300 in (thinner)       | 3/8 + 1/16 = 0.4375 in        | pass   |
    // | long-fin-plate     | 0.5 + 2.5 = 3.0 in           | 3.5 in                        | pass   |
    // | bolt-edge-distance | 1.5 in                       | 1 in (3/4 in bolt)            | pass   |
    // | min-gap            | 0.5 in                       | 0.5 in                        | pass   |
    // | plate-depth        | 9 in                         | (17.7 - 2(0.425 + 0.40))/2 = 8.025 in | pass |
    const auto all = check_detailing_rules(d, w18x35(), unit_system::us_customary, design_standard::aisc360);
    CHECK(all.size() == 8);
    for (const auto& f : all) {
        CAPTURE(f.id);
        CHECK(f.source.find("Steel Buildings in Europe") == std::string::npos);
        CHECK(f.source.find("SCI P") == std::string::npos);
    }
    auto f = us_rule(d, "plate-ductility");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.value == doctest::Approx(0.300 * inch).epsilon(1e-12));
    CHECK(*f.limit == doctest::Approx(0.4375 * inch).epsilon(1e-12));
    f = us_rule(d, "long-fin-plate");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.value == doctest::Approx(3.0 * inch).epsilon(1e-12));
    CHECK(*f.limit == doctest::Approx(3.5 * inch).epsilon(1e-12));
    f = us_rule(d, "bolt-edge-distance");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.limit == doctest::Approx(1.0 * inch).epsilon(1e-12));
    f = us_rule(d, "min-gap");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.limit == doctest::Approx(0.5 * inch).epsilon(1e-12));
    f = us_rule(d, "plate-depth");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.limit == doctest::Approx(8.025 * inch).epsilon(1e-12));
    CHECK(us_rule(d, "end-plate-thickness").status == finding_status::not_applicable);

    // Beyond each limit: a 1/2 in plate on a 1/2 in web, the bolt line 4 in out,
    // a 7/8 in edge distance, a 3/8 in setback, a 6 in plate.
    section thick = w18x35();
    thick.web_thickness = 0.5 * inch;
    d.plate_thickness = 0.5 * inch;
    CHECK(us_rule(d, "plate-ductility", thick).status == finding_status::warn);
    d.bolts.bolt_line = 3.5 * inch;
    CHECK(us_rule(d, "long-fin-plate").status == finding_status::warn);
    d.bolts.first_bolt = 0.875 * inch;
    CHECK(us_rule(d, "bolt-edge-distance").status == finding_status::warn);
    d.gap = 0.375 * inch;
    CHECK(us_rule(d, "min-gap").status == finding_status::warn);
    d.plate_depth = 6 * inch;
    CHECK(us_rule(d, "plate-depth").status == finding_status::warn);
}

TEST_CASE("AISC 360 project: double angles at most 5/8 in thick [M10] - a 1 in bolt needs 1 1/4 in of edge [J3.4]")
{
    auto d = single_plate();
    d.type = detail_type::web_cleats;
    d.plate_thickness = 0.625 * inch;
    auto f = us_rule(d, "plate-ductility");
    CHECK(f.status == finding_status::pass);
    d.plate_thickness = 0.75 * inch;
    CHECK(us_rule(d, "plate-ductility").status == finding_status::warn);
    // The same angles in an EN project: no thickness rule (thin cleats give flexibility).
    CHECK(rule(d, "plate-ductility").status == finding_status::not_applicable);
    auto p = single_plate();
    p.bolts.diameter = 1.0 * inch;
    p.bolts.hole_diameter = 1.125 * inch;
    p.bolts.first_bolt = 1.25 * inch;
    f = us_rule(p, "bolt-edge-distance");
    CHECK(f.status == finding_status::pass);
    CHECK(*f.limit == doctest::Approx(1.25 * inch).epsilon(1e-12));
}
