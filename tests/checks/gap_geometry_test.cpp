// Verification of the gap-closure geometry.
//
// References:
//   [closed form]  rigid rotation of a point about a centre (first principles):
//                  a point at (s - g, -dc) from a centre s behind the support
//                  face reaches the face when (s - g) cos(t) + dc sin(t) = s,
//                  t = atan2(dc, s - g) - acos(s / sqrt((s - g)^2 + dc^2));
//                  with the centre on the face (s = 0), tan(t) = g / dc exactly,
//                  and t -> g / dc for small angles.
//   [pack D]       check values derived from these formulas: fin plate
//                  s = 60, g = 10, dc = 150 mm gives 0.06748 rad; header plate
//                  on an IPE 300 with dc = 70 mm, g = 10 mm gives
//                  atan(10/70) = 0.14190 rad.
//   [scipy]        scipy.optimize.brentq (python3-scipy), an independent
//                  bracketing solver applied to the contact equation written
//                  out afresh in the test.
//   [EN 10365]     IPE 300, IPE 400 dimensions (h, b, tw, tf, r).
//   [free body]    the beam end after closure as a free body about its centre
//                  of rotation C (first principles): frictionless contact, so
//                  the bearing force acts along the normal to the touching
//                  surfaces at the contact point, in the position at contact;
//                  its arm is the perpendicular distance from C to that line,
//                  |(P_contact - C) x n|. Written out afresh in each case.
#include <doctest/doctest.h>

#include <array>
#include <cmath>
#include <cstdio>
#include <memory>
#include <string>

#include "detail_fixtures.hpp"
#include "python_output.hpp"
#include "pinproof/model/connection_detail.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/checks/gap_geometry.hpp"

using namespace pinproof;

namespace {

using test_data::fin_plate;
using test_data::ipe300;
using test_data::mm;

supporting_beam ipe400_support(double top)
{
    // EN 10365: h 400, b 180, tw 8.6, tf 13.5, r 21 mm.
    supporting_beam sb;
    sb.name = "IPE 400";
    sb.depth = 400 * mm;
    sb.flange_width = 180 * mm;
    sb.web_thickness = 8.6 * mm;
    sb.flange_thickness = 13.5 * mm;
    sb.root_radius = 21 * mm;
    sb.top = top;
    return sb;
}

connection_detail end_plate(double thickness)
{
    connection_detail d;
    d.type = detail_type::end_plate;
    d.gap = thickness;
    d.plate_top = 50 * mm;
    d.plate_depth = 180 * mm;
    d.plate_thickness = thickness;
    d.bolts.diameter = 20 * mm;
    d.bolts.hole_diameter = 22 * mm;
    d.bolts.rows = 2;
    d.bolts.pitch = 100 * mm;
    d.bolts.first_bolt = 40 * mm;
    return d;
}

connection_detail web_cleats(double gap)
{
    connection_detail d = end_plate(10 * mm);
    d.type = detail_type::web_cleats;
    d.gap = gap;
    return d;
}

double fin_plate_closed_form(double s, double g, double dc)
{
    return std::atan2(dc, s - g) - std::acos(s / std::hypot(s - g, dc));
}

// Runs a python expression printing one number; nullopt if python or scipy is missing.
std::optional<double> python_value(const std::string& program)
{
    const auto out = test_data::python_output(program);
    if (!out) return std::nullopt;
    try {
        std::size_t used = 0;
        const double v = std::stod(*out, &used);
        return used > 0 ? std::optional<double>(v) : std::nullopt;
    } catch (...) {
        return std::nullopt;
    }
}

}  // namespace

TEST_CASE("fin plate closure against the closed form and the pack check value")
{
    // [closed form], [pack D]: s = gap + bolt line = 60 mm, g = 10 mm, dc = 150 mm.
    const auto g = build_geometry(fin_plate(10 * mm), ipe300());
    const auto sag = find_closure(g, rotation_sense::sagging);
    REQUIRE(sag.rotation);
    CHECK(*sag.rotation == doctest::Approx(fin_plate_closed_form(0.060, 0.010, 0.150)).epsilon(1e-12));
    CHECK(*sag.rotation == doctest::Approx(0.06748).epsilon(1e-4));  // pack value to its 4 figures
    CHECK(sag.contact->outline_part == "bottom flange corner");
    CHECK(sag.contact->support_part == "column flange face");
    CHECK(sag.contact->distance == doctest::Approx(std::hypot(0.050, 0.150)).epsilon(1e-12));

    // The hand form with e = s - g = 50 mm, y = dc: y sin(t) - e (1 - cos(t)) = g.
    const double t = *sag.rotation;
    CHECK(0.150 * std::sin(t) - 0.050 * (1 - std::cos(t)) == doctest::Approx(0.010).epsilon(1e-12));

    // The exact closure exceeds the small-angle g/dc = 0.06667 (pack D).
    CHECK(t > 0.010 / 0.150);

    // Hogging: the top flange corner, also 150 mm from the centroid.
    const auto hog = find_closure(g, rotation_sense::hogging);
    REQUIRE(hog.rotation);
    CHECK(*hog.rotation == doctest::Approx(t).epsilon(1e-12));
    CHECK(hog.contact->outline_part == "top flange corner");
}

TEST_CASE("fin plate closure cross-checked with scipy brentq")
{
    // [scipy]: the contact equation x(t) = -(g + e) + e cos t + dc sin t = 0
    // written afresh and solved on [0, 0.5] by brentq.
    const auto v = python_value(
        "from scipy.optimize import brentq; from math import sin, cos; "
        "print(repr(brentq(lambda t: -(0.010 + 0.050) + 0.050*cos(t) + 0.150*sin(t), 0.0, 0.5, xtol=1e-15)))");
    if (!v) {
        MESSAGE("skipped: /usr/bin/python3 with scipy is not available");
        return;
    }
    const auto c = find_closure(build_geometry(fin_plate(10 * mm), ipe300()), rotation_sense::sagging);
    REQUIRE(c.rotation);
    CHECK(*c.rotation == doctest::Approx(*v).epsilon(1e-12));
}

TEST_CASE("hogging with the bolt group off mid-depth")
{
    // [closed form] with dc = 125 mm (top) and 175 mm (bottom): plate top 50,
    // first bolt 40, two rows at 70 mm put the centroid 125 mm below the top.
    connection_detail d = fin_plate(10 * mm);
    d.bolts.rows = 2;
    d.bolts.pitch = 70 * mm;
    d.plate_depth = 150 * mm;
    const auto g = build_geometry(d, ipe300());
    const auto hog = find_closure(g, rotation_sense::hogging);
    const auto sag = find_closure(g, rotation_sense::sagging);
    REQUIRE(hog.rotation);
    REQUIRE(sag.rotation);
    CHECK(*hog.rotation == doctest::Approx(fin_plate_closed_form(0.060, 0.010, 0.125)).epsilon(1e-12));
    CHECK(*sag.rotation == doctest::Approx(fin_plate_closed_form(0.060, 0.010, 0.175)).epsilon(1e-12));
    CHECK(hog.contact->outline_part == "top flange corner");
    CHECK(*hog.rotation > *sag.rotation);  // the shorter lever closes later
}

TEST_CASE("centre on the support face: tan(t) = g / dc exactly (header plate check value)")
{
    // [closed form] s = 0; [pack D]: IPE 300, plate top 50 mm, hp = 180 mm,
    // dc = 70 mm, g = tp = 10 mm: atan(10/70) = 0.14190 rad.
    const auto g = build_geometry(end_plate(10 * mm), ipe300());
    const auto sag = find_closure(g, rotation_sense::sagging);
    REQUIRE(sag.rotation);
    CHECK(*sag.rotation == doctest::Approx(std::atan(10.0 / 70.0)).epsilon(1e-12));
    CHECK(*sag.rotation == doctest::Approx(0.14190).epsilon(1e-4));
    CHECK(sag.contact->outline_part == "bottom flange corner");
    // Hogging pivots on the plate's top edge, 50 mm below the top: tan(t) = 10/50.
    const auto hog = find_closure(g, rotation_sense::hogging);
    REQUIRE(hog.rotation);
    CHECK(*hog.rotation == doctest::Approx(std::atan(10.0 / 50.0)).epsilon(1e-12));
    CHECK(hog.contact->outline_part == "top flange corner");
}

TEST_CASE("small-angle limit: t -> g / dc")
{
    // [closed form]: for g << dc the closure tends to g/dc; the relative
    // difference is of order (g/dc)^2 (centre on the face) or g e / dc^2
    // (centre set back by e).
    for (double gap : {1.0 * mm, 0.1 * mm, 0.01 * mm}) {
        const auto cleat = find_closure(build_geometry(web_cleats(gap), ipe300()), rotation_sense::sagging);
        REQUIRE(cleat.rotation);
        const double ratio = gap / 0.070;
        CHECK(std::abs(*cleat.rotation / ratio - 1) <= ratio * ratio);

        const auto fin = find_closure(build_geometry(fin_plate(gap), ipe300()), rotation_sense::sagging);
        REQUIRE(fin.rotation);
        const double small = gap / 0.150;
        CHECK(std::abs(*fin.rotation / small - 1) <= 2 * small * 0.050 / 0.150 + small * small);
    }
}

TEST_CASE("coped beam: the cope corner - not the flange - governs")
{
    // [closed form] with the bottom cope corner 300 - 60 = 240 mm below the
    // top, dc = 240 - 150 = 90 mm from the bolt centroid.
    connection_detail d = fin_plate(10 * mm);
    d.cope_bottom = cope{60 * mm, 100 * mm};
    const auto c = find_closure(build_geometry(d, ipe300()), rotation_sense::sagging);
    REQUIRE(c.rotation);
    CHECK(c.contact->outline_part == "bottom cope corner");
    CHECK(*c.rotation == doctest::Approx(fin_plate_closed_form(0.060, 0.010, 0.090)).epsilon(1e-12));
    // The flange end behind the cope, 110 mm from the face, would close far later.
    CHECK(*c.rotation < 0.5);
    // Top cope in hogging: the corner 40 mm below the top, dc = 110 mm.
    connection_detail t = fin_plate(10 * mm);
    t.cope_top = cope{40 * mm, 100 * mm};
    const auto h = find_closure(build_geometry(t, ipe300()), rotation_sense::hogging);
    REQUIRE(h.rotation);
    CHECK(h.contact->outline_part == "top cope corner");
    CHECK(*h.rotation == doctest::Approx(fin_plate_closed_form(0.060, 0.010, 0.110)).epsilon(1e-12));
}

TEST_CASE("beam to beam: the supporting beam's top flange governs in hogging")
{
    // IPE 300 into the web of an IPE 400, tops level, top cope 40 x 85 mm.
    // The cope end stands 10 + 85 - 85.7 = 9.3 mm behind the flange tip.
    // [closed form]: in the beam's frame (which turns clockwise in hogging)
    // the tip's upper corner Q turns by +t about the centre C; contact when its
    // x reaches the cope end x = -95 mm:
    //   C.x + qx cos t - qy sin t = -0.095, q = Q - C,
    // i.e. A cos t + B sin t = d with A = qx, B = -qy, d = -0.095 - C.x; the
    // root in (0, pi/2) is atan2(B, A) + acos(d / hypot(A, B)).
    connection_detail d = fin_plate(10 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(0.0);
    d.cope_top = cope{40 * mm, 85 * mm};
    const auto g = build_geometry(d, ipe300());
    const auto hog = find_closure(g, rotation_sense::hogging);
    REQUIRE(hog.rotation);
    CHECK(hog.contact->outline_part == "top cope end");
    CHECK(hog.contact->support_part == "supporting beam top flange tip, upper corner");
    const double qx = -0.0857 + 0.060, qy = 0.0 + 0.150;  // Q = (-85.7, 0), C = (-60, -150) mm
    const double rho = std::hypot(qx, qy);
    const double expected = std::atan2(-qy, qx) + std::acos((-0.095 + 0.060) / rho);
    CHECK(*hog.rotation == doctest::Approx(expected).epsilon(1e-12));
    // The cope corner against the web face would close only at dc = 110 mm.
    CHECK(*hog.rotation < fin_plate_closed_form(0.060, 0.010, 0.110));
    // A longer cope (100 mm) moves the contact back to the web face.
    d.cope_top = cope{40 * mm, 100 * mm};
    const auto longer = find_closure(build_geometry(d, ipe300()), rotation_sense::hogging);
    REQUIRE(longer.rotation);
    CHECK(longer.contact->description() == "top cope corner against supporting beam web face");
    CHECK(*longer.rotation == doctest::Approx(fin_plate_closed_form(0.060, 0.010, 0.110)).epsilon(1e-12));
}

TEST_CASE("beam to beam: the supporting beam's bottom flange governs in sagging")
{
    // IPE 300 on web cleats into an IPE 400 whose top is 80 mm above ours, so
    // its bottom flange top face is 306.5 mm below our top: 6.5 mm under our
    // bottom flange. Gap 15 mm keeps the root fillet clear.
    // Centre: the cleats' bottom edge on the face, C = (0, -230) mm. The flange
    // tip's upper corner Q = (-85.7, -306.5) mm turns by -t in the beam frame
    // and meets the bottom face y = -300 mm when
    //   -qx sin t + qy cos t = -0.300 - C.y.
    connection_detail d = web_cleats(15 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(-80 * mm);
    const auto g = build_geometry(d, ipe300());
    const auto sag = find_closure(g, rotation_sense::sagging);
    REQUIRE(sag.rotation);
    CHECK(sag.contact->support_part == "supporting beam bottom flange tip, upper corner");
    CHECK(sag.contact->outline_part == "bottom flange");
    const double qx = -0.0857, qy = -0.3065 + 0.230;
    // -qx sin t + qy cos t = -0.070  ->  A cos t + B sin t = d with A = qy, B = -qx
    const double expected = std::atan2(-qx, qy) - std::acos(-0.070 / std::hypot(qx, qy));
    CHECK(*sag.rotation == doctest::Approx(expected).epsilon(1e-12));
    // The web face alone would allow atan(15/70).
    CHECK(*sag.rotation < std::atan(15.0 / 70.0));

    // [scipy]: the same contact by brentq.
    const auto v = python_value(
        "from scipy.optimize import brentq; from math import sin, cos; "
        "print(repr(brentq(lambda t: 0.0857*sin(t) + (-0.3065 + 0.230)*cos(t) + 0.070, 0.0, 0.5, xtol=1e-15)))");
    if (v)
        CHECK(*sag.rotation == doctest::Approx(*v).epsilon(1e-12));
    else
        MESSAGE("scipy cross-check skipped: /usr/bin/python3 with scipy is not available");
}

TEST_CASE("beam to beam: a root fillet of the supporting beam governs - checked by scipy")
{
    // As above with a 10 mm gap: our bottom flange corner P = (-10, -300) mm
    // swings about C = (0, -230) mm into the bottom root fillet, a circle of
    // radius 21 mm centred at (-21, -285.5) mm whose material lies outside it.
    // [scipy]: brentq on |C + R(t)(P - C) - O| - r = 0 written afresh.
    connection_detail d = web_cleats(10 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(-80 * mm);
    const auto sag = find_closure(build_geometry(d, ipe300()), rotation_sense::sagging);
    REQUIRE(sag.rotation);
    CHECK(sag.contact->description() == "bottom flange corner against supporting beam bottom root fillet");
    const auto v = python_value(
        "from scipy.optimize import brentq; from math import sin, cos, hypot; "
        "f = lambda t: hypot(0.0 + (-0.010)*cos(t) - (-0.070)*sin(t) + 0.021, "
        "-0.230 + (-0.010)*sin(t) + (-0.070)*cos(t) + 0.2855) - 0.021; "
        "print(repr(brentq(f, 0.0, 0.1, xtol=1e-15)))");
    if (!v) {
        MESSAGE("skipped: /usr/bin/python3 with scipy is not available");
        return;
    }
    CHECK(*sag.rotation == doctest::Approx(*v).epsilon(1e-10));
}

TEST_CASE("no closure within pi/2 is reported as such - never as infinity")
{
    // A custom outline lying wholly above its centre: in sagging every point
    // moves away from the support (first principles).
    connection_detail d;
    d.type = detail_type::custom;
    d.outline = {{20 * mm, 0}, {200 * mm, 0}, {200 * mm, 100 * mm}, {20 * mm, 100 * mm}};
    d.gap = 20 * mm;
    d.centre_of_rotation = detail_point{20 * mm, 150 * mm};
    const auto g = build_geometry(d, ipe300());
    const auto sag = find_closure(g, rotation_sense::sagging);
    CHECK_FALSE(sag.rotation.has_value());
    CHECK_FALSE(sag.contact.has_value());
    const auto r = check_gap(d, ipe300(), {0.03, 0.0});
    CHECK(r.sagging.passes);
    REQUIRE(r.sagging.margin);
    CHECK(r.sagging.margin_is_lower_bound);
    CHECK(*r.sagging.margin == doctest::Approx(max_searched_rotation / 0.03));
    CHECK(std::isfinite(r.sagging.clearance_at_demand));
}

TEST_CASE("clearance at a rotation")
{
    // [closed form]: the bottom flange corner stands 60 - 50 cos t - 150 sin t
    // (m x 1e-3) from the face; negative past closure (overlap depth).
    const auto g = build_geometry(fin_plate(10 * mm), ipe300());
    CHECK(clearance(g, rotation_sense::sagging, 0.0) == doctest::Approx(0.010).epsilon(1e-12));
    for (double t : {0.01, 0.03, 0.06}) {
        const double expected = 0.060 - 0.050 * std::cos(t) - 0.150 * std::sin(t);
        CHECK(clearance(g, rotation_sense::sagging, t) == doctest::Approx(expected).epsilon(1e-9));
    }
    const double past = 0.08;
    CHECK(clearance(g, rotation_sense::sagging, past) ==
          doctest::Approx(0.060 - 0.050 * std::cos(past) - 0.150 * std::sin(past)).epsilon(1e-9));
    CHECK(clearance(g, rotation_sense::sagging, past) < 0);
}

TEST_CASE("worst-case gap - margins and check results")
{
    // Gap 12 mm with 2 mm tolerance behaves as the 10 mm case [closed form].
    connection_detail d = fin_plate(12 * mm);
    d.gap_tolerance = 2 * mm;
    const auto r = check_gap(d, ipe300(), {0.03, 0.0});
    const double closure = fin_plate_closed_form(0.060, 0.010, 0.150);
    CHECK(r.worst_case_gap == doctest::Approx(0.010));
    REQUIRE(r.sagging.closing.rotation);
    CHECK(*r.sagging.closing.rotation == doctest::Approx(closure).epsilon(1e-12));
    REQUIRE(r.sagging.margin);
    CHECK(*r.sagging.margin == doctest::Approx(closure / 0.03).epsilon(1e-12));
    CHECK(r.sagging.passes);
    CHECK_FALSE(r.hogging.margin.has_value());  // no hogging demand
    CHECK(r.governing == rotation_sense::sagging);
    CHECK(r.passes);
    CHECK(r.critical_point() == "bottom flange corner against column flange face (sagging)");
    CHECK(r.sagging.clearance_at_demand ==
          doctest::Approx(0.060 - 0.050 * std::cos(0.03) - 0.150 * std::sin(0.03)).epsilon(1e-9));

    // A demand above the closure fails and shows a negative clearance.
    const auto f = check_gap(d, ipe300(), {0.08, 0.0});
    CHECK_FALSE(f.passes);
    CHECK(f.sagging.clearance_at_demand < 0);

    // From a signed end rotation (sign_conventions.hpp): negative is hogging.
    const auto dem = rotation_demand::from_end_rotation(-0.02);
    CHECK(dem.hogging == doctest::Approx(0.02));
    CHECK(dem.sagging == 0);
}

TEST_CASE("min gap required: closed form and round trip")
{
    // [closed form] inverted: the worst-case gap that closes exactly at t is
    // g = dc sin t - e (1 - cos t); the as-detailed gap adds the tolerance.
    connection_detail d = fin_plate(10 * mm);
    d.gap_tolerance = 3 * mm;
    const double demand = 0.05;
    std::string note;
    const auto g = min_gap_required(d, ipe300(), {demand, 0.0}, &note);
    REQUIRE(g);
    const double expected = 0.150 * std::sin(demand) - 0.050 * (1 - std::cos(demand)) + 0.003;
    CHECK(*g == doctest::Approx(expected).epsilon(1e-9));
    // Round trip: detailed at that gap, the worst-case closure equals the demand.
    connection_detail at = d;
    at.gap = *g;
    const auto c = find_closure(build_geometry(at, ipe300()), rotation_sense::sagging);
    REQUIRE(c.rotation);
    CHECK(*c.rotation == doctest::Approx(demand).epsilon(1e-9));
    CHECK(*c.rotation >= demand * (1 - 1e-9));

    // Header plate: tp = dc tan t (+ tolerance) [closed form].
    connection_detail e = end_plate(10 * mm);
    const auto tp = min_gap_required(e, ipe300(), {0.1, 0.0});
    REQUIRE(tp);
    CHECK(*tp == doctest::Approx(0.070 * std::tan(0.1)).epsilon(1e-9));

    // Both senses: the larger requirement governs (hogging lever 50 mm on the plate's top edge).
    const auto both = min_gap_required(e, ipe300(), {0.1, 0.1});
    REQUIRE(both);
    CHECK(*both == doctest::Approx(std::max(0.070, 0.050) * std::tan(0.1)).epsilon(1e-9));

    // No demand: no requirement, with a note.
    CHECK_FALSE(min_gap_required(d, ipe300(), {0.0, 0.0}, &note).has_value());
    CHECK(note == "no rotation demand");
}

TEST_CASE("min gap required when the gap does not govern")
{
    // The bottom flange tip of the supporting beam (6.5 mm under our bottom
    // flange, 85.7 mm from the face) limits the sagging rotation about the
    // cleats' bottom edge to about 0.0735 rad whatever the gap, since neither
    // the centre nor the tip moves with it (first principles), until the beam
    // end stands beyond the tip (85.7 mm), outside the searched range of
    // 50 mm: a demand of 0.1 rad has no passing gap.
    connection_detail d = web_cleats(15 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(-80 * mm);
    std::string note;
    const auto g = min_gap_required(d, ipe300(), {0.1, 0.0}, &note);
    CHECK_FALSE(g.has_value());
    CHECK(note.find("no gap up to") != std::string::npos);
}

TEST_CASE("an outline overlapping the support at rest closes at zero")
{
    // Placed 0.5 mm from the web, the cope end (0.5 + 85 = 85.5 mm from the
    // face) lies inside the flange tip (85.7 mm out): overlap at rest.
    connection_detail d = fin_plate(10 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(0.0);
    d.cope_top = cope{40 * mm, 85 * mm};
    const auto g = build_geometry(d, ipe300(), 0.5 * mm);
    CHECK(clearance(g, rotation_sense::hogging, 0.0) < 0);
    const auto c = find_closure(g, rotation_sense::hogging);
    REQUIRE(c.rotation);
    CHECK(*c.rotation == 0.0);
    REQUIRE(c.contact);
    CHECK(c.contact->support_part.find("supporting beam top flange") != std::string::npos);
}

TEST_CASE("per-thread results of a detail on a section [closed form]: a detail that differs in one value - or a section that differs in one dimension - is never given another's closure - tol 1e-12")
{
    // check_gap keeps the closure geometry of each detail and section; every
    // call must still equal the closure worked out afresh (find_closure on
    // build_geometry, which nothing caches).
    const auto fresh = [](const connection_detail& d, const section& s) {
        return *find_closure(build_geometry(d, s), rotation_sense::sagging).rotation;
    };
    const auto cached = [](const connection_detail& d, const section& s) {
        return *check_gap(d, s, {0.01, 0.0}, false).sagging.closing.rotation;
    };
    connection_detail a = fin_plate(10 * mm), b = fin_plate(10 * mm);
    b.gap_tolerance = 1 * mm;
    connection_detail c = fin_plate(10 * mm);
    c.cope_top = cope{30 * mm, 120 * mm};
    section deeper = ipe300();
    deeper.depth = 310 * mm;
    section renamed = ipe300();
    renamed.name = "IPE 300 (as measured)";
    for (int pass = 0; pass < 2; ++pass) {
        CHECK(std::abs(cached(a, ipe300()) - fresh(a, ipe300())) <= 1e-12);
        CHECK(std::abs(cached(b, ipe300()) - fresh(b, ipe300())) <= 1e-12);
        CHECK(std::abs(cached(c, ipe300()) - fresh(c, ipe300())) <= 1e-12);
        CHECK(std::abs(cached(a, deeper) - fresh(a, deeper)) <= 1e-12);
        CHECK(std::abs(cached(a, renamed) - fresh(a, renamed)) <= 1e-12);
    }
    // The values differ, so a stale answer would have been seen.
    CHECK(fresh(b, ipe300()) < fresh(a, ipe300()));
    CHECK(fresh(a, deeper) != fresh(a, ipe300()));
}

namespace {
point2 turned(point2 p, point2 c, double angle)
{
    const double cs = std::cos(angle), sn = std::sin(angle);
    return {c.x + cs * (p.x - c.x) - sn * (p.y - c.y), c.y + sn * (p.x - c.x) + cs * (p.y - c.y)};
}
double arm(point2 at, point2 c, point2 n) { return std::abs((at.x - c.x) * n.y - (at.y - c.y) * n.x); }
}  // namespace

TEST_CASE("contact force arm - column flange and column web: vertical offset of the turned corner [free body] - tol 1e-12")
{
    // Fin plate on an IPE 300: C = (-60, -150) mm, bottom flange corner
    // P = (-10, -300) mm turns by +t (sagging) to P' and touches the face x = 0.
    // The force is horizontal (normal n = (1, 0)): arm = |P'.y - C.y|.
    for (support_type st : {support_type::column_flange, support_type::column_web}) {
        connection_detail d = fin_plate(10 * mm);
        d.support = st;
        const auto sag = find_closure(build_geometry(d, ipe300()), rotation_sense::sagging);
        REQUIRE(sag.rotation);
        REQUIRE(sag.contact);
        const point2 C{-0.060, -0.150};
        const point2 Pt = turned({-0.010, -0.300}, C, *sag.rotation);
        CHECK(Pt.x == doctest::Approx(0.0).epsilon(1e-12));  // on the face
        const double expected = std::abs(Pt.y - C.y);
        CHECK(sag.contact->lever_arm == doctest::Approx(expected).epsilon(1e-12));
        // Free body: the force F = M / arm balances M about C; the straight
        // distance |CP| = 158.1 mm would give a force 8 % low (unsafe), the fault
        // issue 11 found.
        const double M = 100e3;  // any moment beyond the joint's own share
        const double F = M / sag.contact->lever_arm;
        CHECK(F * expected == doctest::Approx(M).epsilon(1e-12));
        CHECK(sag.contact->distance / sag.contact->lever_arm == doctest::Approx(std::hypot(0.05, 0.15) / expected).epsilon(1e-12));
        CHECK(sag.contact->distance > 1.07 * sag.contact->lever_arm);
    }
}

TEST_CASE("contact force arm - beam web support: a flange tip corner against the beam's turned bottom flange [free body] - tol 1e-12")
{
    // Web cleats into an IPE 400 whose top is 80 mm above ours (the case of the
    // test above): C = (0, -230) mm; the supporting beam's bottom flange tip
    // upper corner Q = (-85.7, -306.5) mm touches our bottom flange face, which
    // has turned by +t. The force acts at Q along that face's normal
    // n = (-sin t, cos t): arm = |(Q - C) x n|.
    connection_detail d = web_cleats(15 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(-80 * mm);
    const auto sag = find_closure(build_geometry(d, ipe300()), rotation_sense::sagging);
    REQUIRE(sag.rotation);
    REQUIRE(sag.contact);
    REQUIRE(sag.contact->support_part == "supporting beam bottom flange tip, upper corner");
    const double t = *sag.rotation;
    const point2 C{0.0, -0.230}, Q{-0.0857, -0.3065};
    const double expected = arm(Q, C, {-std::sin(t), std::cos(t)});
    CHECK(sag.contact->lever_arm == doctest::Approx(expected).epsilon(1e-12));
    CHECK(sag.contact->lever_arm < sag.contact->distance);
}

TEST_CASE("contact force arm - beam web support: a corner against the root fillet acts along its radius [free body] - tol 1e-12")
{
    // 10 mm gap: our bottom flange corner P = (-10, -300) mm turns about
    // C = (0, -230) mm into the bottom root fillet, centre O = (-21, -285.5) mm,
    // radius 21 mm. The force acts along O -> P' (the fillet's normal).
    connection_detail d = web_cleats(10 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(-80 * mm);
    const auto sag = find_closure(build_geometry(d, ipe300()), rotation_sense::sagging);
    REQUIRE(sag.rotation);
    REQUIRE(sag.contact);
    REQUIRE(sag.contact->support_part == "supporting beam bottom root fillet");
    const point2 C{0.0, -0.230}, O{-0.021, -0.2855};
    const point2 Pt = turned({-0.010, -0.300}, C, *sag.rotation);
    const double r = std::hypot(Pt.x - O.x, Pt.y - O.y);
    CHECK(r == doctest::Approx(0.021).epsilon(1e-9));  // on the fillet
    const double expected = arm(Pt, C, {(Pt.x - O.x) / r, (Pt.y - O.y) / r});
    CHECK(sag.contact->lever_arm == doctest::Approx(expected).epsilon(1e-9));
}

TEST_CASE("contact force arm - beam web support: a cope corner against the web face is horizontal [free body] - tol 1e-12")
{
    // Fin plate into an IPE 400 with a 40 x 100 mm top cope: in hogging the top
    // cope corner at the beam end, P = (-10, -40) mm, turns by -t about
    // C = (-60, -150) mm and touches the web face x = 0: the force is
    // horizontal, arm |P'.y - C.y|.
    connection_detail d = fin_plate(10 * mm);
    d.support = support_type::beam_web;
    d.support_beam = ipe400_support(0.0);
    d.cope_top = cope{40 * mm, 100 * mm};
    const auto g = build_geometry(d, ipe300());
    const auto hog = find_closure(g, rotation_sense::hogging);
    REQUIRE(hog.rotation);
    REQUIRE(hog.contact);
    REQUIRE(hog.contact->description() == "top cope corner against supporting beam web face");
    const point2 C = g.centre_hogging;
    const point2 Pt = turned(hog.contact->at, C, -*hog.rotation);
    CHECK(Pt.x == doctest::Approx(0.0).epsilon(1e-12));
    CHECK(hog.contact->lever_arm == doctest::Approx(std::abs(Pt.y - C.y)).epsilon(1e-12));
}
