// Verification of checks of the assessment (src/checks/assessment.cpp) that
// no other test file covers: the support rotation in the gap demand and the
// reversal of an end moment across the combinations.
//
// References:
//   [R8.1]  Simply supported beam, UDL: end rotation wL^3/(24 EI), M(L/2) = wL^2/8
//           (Hicks, Civil Engineering Formulas, Fig. 2.2, confirmed; pack section 6).
//   [MW63]  Monforton & Wu 1963, equal springs of fixity r under a symmetric load:
//           M = MF 3r/(2 + r), MF = wL^2/12 (pack section 5).
//   [Blevins] Blevins, Formulas for Natural Frequency and Mode Shape (1979), Table 8-1:
//           f_1 = lambda^2/(2 pi L^2) sqrt(EI/m), lambda = pi pinned-pinned, 4.73004074
//           fixed-fixed, 3.92660231 fixed-pinned (9 figures from memory; lambda^2 = 9.8696,
//           22.373, 15.418 in reference pack 11.4).
//   [scipy]  python3-scipy brentq on the determinant of the boundary conditions of
//           W = A cos + B sin + C cosh + D sinh with end springs EI W'' = +-k W' (as in
//           tests/model/natural_frequency_test.cpp), m = w/g_n, g_n = 9.80665 m/s^2 (CGPM 1901).
//   [18/d]   f = 18/sqrt(delta mm), reference pack 11.4 (within 1.5 % for a UDL).
//   [RULE]  The project's rules (docs/method/checks.md; common practice, no source):
//           the support rotation, a magnitude of unknown sense, adds to the demand
//           of both senses; an end moment that changes sign across the combinations
//           is a warning.
#include <doctest/doctest.h>

#include <cmath>
#include <string>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "pinproof/model/project.hpp"
#include "python_output.hpp"
#include <sstream>

using namespace pinproof;

namespace {
const check& find(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return c;
    FAIL("no check " << id);
    return a.checks.front();
}
}  // namespace

namespace {
// A 6 m IPE 300 on a fin plate at the start, with a support rotation, under a
// downward (w > 0) or upward (w < 0) line load.
std::string project_with_support_rotation(const std::string& w)
{
    return R"({"format": "pinproof-project/1", "title": "support rotation", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "B", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": ")" + w + R"("}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": 0, "support_rotation": "5 mrad",
                             "detail": {"type": "fin-plate", "gap": "15 mm", "plate_top": "50 mm", "plate_depth": "200 mm",
                                        "plate_thickness": "10 mm", "bolt_diameter": "20 mm", "bolt_rows": 3,
                                        "bolt_pitch": "60 mm", "first_bolt": "40 mm", "bolt_line": "50 mm"}},
                   "end": {"stiffness": 0}}}]})";
}
}  // namespace

TEST_CASE("support rotation closes one side of the gap whatever the beam does: added in both senses [RULE] [R8.1] - tol 1e-9")
{
    // The project's rule (docs/method/checks.md; common practice, no source):
    // the support rotation is a magnitude of unknown sense, so it adds to the
    // sagging and to the hogging demand. Pinned end of a simply supported beam
    // under a UDL: theta = w L^3 / (24 EI) (Hicks, Civil Engineering Formulas
    // Fig. 2.2, confirmed; pack section 6).
    const double phi = 5e-3;
    SUBCASE("downward load: the beam turns sagging only - hogging demand is the support rotation alone")
    {
        const project p = parse_project(project_with_support_rotation("20 kN/m"));
        const auto a = assess_beam(p, p.beams[0]);
        REQUIRE(a.start.detail);
        const double theta = 20e3 * 216.0 / (24.0 * p.beams[0].EI());
        CHECK(a.start.detail->demand_sagging == doctest::Approx(theta + phi).epsilon(1e-9));
        CHECK(a.start.detail->demand_hogging == doctest::Approx(phi).epsilon(1e-15));
        CHECK(a.start.detail->gap.hogging.demand == doctest::Approx(phi).epsilon(1e-15));
    }
    SUBCASE("upward load: the beam turns hogging only - sagging demand is the support rotation alone")
    {
        const project p = parse_project(project_with_support_rotation("-20 kN/m"));
        const auto a = assess_beam(p, p.beams[0]);
        REQUIRE(a.start.detail);
        const double theta = 20e3 * 216.0 / (24.0 * p.beams[0].EI());
        CHECK(a.start.detail->demand_hogging == doctest::Approx(theta + phi).epsilon(1e-9));
        CHECK(a.start.detail->demand_sagging == doctest::Approx(phi).epsilon(1e-15));
        CHECK(a.start.detail->gap.sagging.demand == doctest::Approx(phi).epsilon(1e-15));
    }
}

namespace {
// A 6 m IPE 300 with equal joints under gravity G and wind uplift W, in two
// strength combinations.
std::string project_with_uplift(const std::string& stiffness)
{
    return R"({"format": "pinproof-project/1", "title": "uplift", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "B", "span": "6 m", "section": "IPE 300", "E": "210 GPa",
        "loads": [{"case": "G", "kind": "udl", "w": "5 kN/m"}, {"case": "W", "kind": "udl", "w": "-10 kN/m"}],
        "combinations": [{"name": "gravity", "use": "strength", "factors": {"G": 1.35}},
                         {"name": "uplift", "use": "strength", "factors": {"G": 1.0, "W": 1.5}}],
        "joints": {"start": {"stiffness": )" + stiffness + R"(}, "end": {"stiffness": )" + stiffness + R"(}}}]})";
}
}  // namespace

TEST_CASE("moment-reversal: a semi-rigid joint under gravity and uplift warns with both moments [MW63] [RULE] - tol 1e-9")
{
    const project p = parse_project(project_with_uplift("\"2 EI/L\""));
    const auto a = assess_beam(p, p.beams[0]);
    // S = 2 EI/L: r = 1/(1 + 3/2) = 0.4, M = (wL^2/12) 3r/(2 + r) = wL^2/12 x 0.5 [MW63].
    const double L = 6.0, factor = 0.5;
    const double gravity = 1.35 * 5e3 * L * L / 12 * factor;            // hogging
    const double uplift = (1.5 * 10e3 - 1.0 * 5e3) * L * L / 12 * factor;  // sagging
    for (const char* id : {"moment-reversal-start", "moment-reversal-end"}) {
        CAPTURE(id);
        const check& c = find(a, id);
        CHECK(c.status == check_status::warn);
        REQUIRE(c.value);
        CHECK(*c.value == doctest::Approx(std::min(gravity, uplift)).epsilon(1e-9));
        CHECK(c.message.find("gravity") != std::string::npos);
        CHECK(c.message.find("uplift") != std::string::npos);
    }
    // The span moment under uplift: M(L/2) = -wL^2/8 + M_end, hogging [R8.1].
    for (const auto& r : a.combinations) {
        if (r.comb.name != "uplift") continue;
        const double w_up = 1.5 * 10e3 - 5e3;
        CHECK(r.corners[0].max_hogging_moment == doctest::Approx(-(w_up * L * L / 8 - uplift)).epsilon(1e-9));
        CHECK(r.corners[0].max_hogging_at == doctest::Approx(L / 2).epsilon(1e-9));
        CHECK(r.pinned->max_hogging_moment == doctest::Approx(-w_up * L * L / 8).epsilon(1e-9));
    }
}

TEST_CASE("moment-reversal: a pinned joint takes no moment and passes [RULE] - exact")
{
    const project p = parse_project(project_with_uplift("0"));
    const auto a = assess_beam(p, p.beams[0]);
    CHECK(find(a, "moment-reversal-start").status == check_status::pass);
    CHECK(find(a, "moment-reversal-end").status == check_status::pass);
    CHECK(a.holds() == assess_beam(p, p.beams[0]).holds());
}

TEST_CASE("moment-reversal: gravity alone keeps the moment hogging and passes [RULE] - exact")
{
    std::string text = project_with_uplift("\"2 EI/L\"");
    text.replace(text.find("\"W\": 1.5"), 8, "\"W\": 0.0");
    const project p = parse_project(text);
    const auto a = assess_beam(p, p.beams[0]);
    const check& c = find(a, "moment-reversal-start");
    CHECK(c.status == check_status::pass);
    CHECK(c.message.find("hogging") != std::string::npos);
}

namespace {
// An 8 m IPE 240 on a 1 mm end plate at the start (plate 40 mm below the top,
// 150 mm deep): the gap closes in sagging under the strength combination.
std::string project_closing(bool dependable = false)
{
    std::string text = R"({"format": "pinproof-project/1", "title": "closure", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "B", "span": "8 m", "section": "IPE 240",
        "loads": [{"case": "G", "kind": "udl", "w": "12 kN/m"}, {"case": "Q", "kind": "udl", "w": "10 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}}],
        "joints": {"start": {"stiffness": {"min": "100 kN*m/rad", "max": "0.2 EI/L"},
                             "detail": {"type": "end-plate", "plate_thickness": "1 mm", "plate_top": "40 mm",
                                        "plate_depth": "150 mm", "bolt_rows": 2}DEPENDABLE},
                   "end": {"stiffness": 0}}}]})";
    const std::string key = "DEPENDABLE";
    text.replace(text.find(key), key.size(), dependable ? R"(, "dependable_lower_bound": true)" : "");
    return text;
}
}  // namespace

TEST_CASE("state after closure: labelled with each joint's phase - bearing force from the free body [RULE] - tol 1e-12")
{
    // Free body of the beam end about its centre of rotation C (first
    // principles; docs/method/gap-geometry.md): the end moment beyond the
    // joint's own share S theta_c is carried by the bearing force F on the
    // column face, horizontal (frictionless contact), at the arm |P'.y - C.y|
    // of the turned bottom flange corner P'. End plate: C on the face at the
    // plate's bottom edge, (0, -190) mm; P = (-1, -240) mm at rest.
    for (bool dependable : {false, true}) {
        CAPTURE(dependable);
        const project p = parse_project(project_closing(dependable));
        const auto a = assess_beam(p, p.beams[0]);
        REQUIRE(a.start.detail);
        REQUIRE(a.start.detail->consequence);
        const auto& cc = *a.start.detail->consequence;
        CHECK(cc.result.start == joint_phase::closed_sagging);
        CHECK(cc.result.end == joint_phase::open);
        CHECK(cc.assumptions.find("held at its closure rotation") != std::string::npos);
        CHECK(cc.assumptions.find("End joint: open") != std::string::npos);
        const double t = cc.closure_rotation;
        const double Cx = 0.0, Cy = -0.190, Px = -0.001, Py = -0.240;
        const double x = Cx + std::cos(t) * (Px - Cx) - std::sin(t) * (Py - Cy);
        const double y = Cy + std::sin(t) * (Px - Cx) + std::cos(t) * (Py - Cy);
        CHECK(x == doctest::Approx(0.0).epsilon(1e-12));  // the corner is on the face
        const double arm = std::abs(y - Cy);
        CHECK(cc.lever_arm == doctest::Approx(arm).epsilon(1e-12));
        // The joint's own share: its lower bound only where declared dependable.
        const double own = dependable ? 100e3 * t : 0.0;
        CHECK(cc.contact_force * arm == doctest::Approx(std::abs(cc.result.state.moment_start) - own).epsilon(1e-12));
        // The check's message labels the state.
        for (const auto& c : a.checks)
            if (c.id == "gap-closure-start") CHECK(c.message.find("held at its closure rotation") != std::string::npos);
    }
}

TEST_CASE("gap demand basis [issue rule]: the pinned rotation unless the lower bound is declared dependable - tol 1e-12")
{
    // Pinned 8 m UDL beam: theta = wL^3/(24EI) (handbook closed form);
    // w = 1.35*12 + 1.5*10 = 31.2 kN/m; EI of the beam as read (IPE 240 from its dimensions).
    const double w = 31.2e3, L = 8.0;
    for (bool dependable : {false, true}) {
        CAPTURE(dependable);
        const project p = parse_project(project_closing(dependable));
        const auto a = assess_beam(p, p.beams[0]);
        const double EI = p.beams[0].EI();
        REQUIRE(a.start.detail);
        const auto& d = *a.start.detail;
        CHECK(d.credits_lower_bound == dependable);
        const double pinned = w * L * L * L / (24 * EI);
        if (!dependable) CHECK(d.strength_demand_sagging == doctest::Approx(pinned).epsilon(1e-12));
        else CHECK(d.strength_demand_sagging < pinned);
        for (const auto& c : a.checks)
            if (c.id == "gap-closure-start")
                CHECK(c.message.find(dependable ? "declared dependable" : "pinned beam's rotation") != std::string::npos);
    }
}

namespace {
// A 7.5 m IPE 360 floor beam: G 3.5 kN/m and Q 5 kN/m, vibrating under G + 0.1 Q
// (4.0 kN/m, a mass of 4000/g_n kg/m), with the joint stiffness ranges given.
std::string floor_beam(const std::string& start, const std::string& end, const std::string& limits)
{
    return R"({"format": "pinproof-project/1", "title": "floor", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "F", "span": "7.5 m", "section": "IPE 360",
        "loads": [{"case": "G", "kind": "udl", "w": "3.5 kN/m"}, {"case": "Q", "kind": "udl", "w": "5 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}},
                         {"name": "VIB", "use": "vibration", "factors": {"G": 1.0, "Q": 0.1}}],
        "joints": {"start": {"stiffness": )" + start + R"(}, "end": {"stiffness": )" + end + R"(}})" + limits + "}]}";
}

double classical(const beam& b, double lambda)
{
    const double m = 4.0e3 / 9.80665;
    return lambda * lambda / (2 * M_PI * b.span * b.span) * std::sqrt(b.EI() / m);
}

const combination_result& vibration(const beam_assessment& a)
{
    for (const auto& c : a.combinations)
        if (c.comb.use == limit_state::vibration) return c;
    FAIL("no vibration combination");
    return a.combinations.front();
}
}  // namespace

TEST_CASE("frequency of a vibration combination [Blevins]: pinned (pi/2) sqrt(EI/m)/L^2 - fixed 22.373 - fixed-pinned 15.418 - tol 1e-7")
{
    const project p = parse_project(floor_beam(R"("rigid")", "0", ""));
    const auto a = assess_beam(p, p.beams[0]);
    const auto& r = vibration(a);
    REQUIRE(r.frequency);
    const beam& b = p.beams[0];
    CHECK(std::abs(r.frequency->pinned.value() / classical(b, M_PI) - 1) <= 1e-7);
    CHECK(std::abs(r.frequency->fixed / classical(b, 4.73004074) - 1) <= 1e-7);
    // Every corner of the range is the fixed-pinned beam.
    for (double f : r.frequency->corners) CHECK(std::abs(f / classical(b, 3.92660231) - 1) <= 1e-7);
    CHECK(std::abs(r.frequency->range.min / classical(b, 3.92660231) - 1) <= 1e-7);
    // Only the vibration combination has frequencies.
    for (const auto& c : a.combinations) CHECK(c.frequency.has_value() == (c.comb.use == limit_state::vibration));
}

TEST_CASE("frequency range of end springs against scipy brentq on the frequency determinant [scipy] - tol 1e-6")
{
    // Both joints 0.5 EI/L to 5 EI/L: the range runs from kappa = 0.5 at both ends to 5 at both.
    const project p = parse_project(floor_beam(R"({"min": "0.5 EI/L", "max": "5 EI/L"})",
                                               R"({"min": "0.5 EI/L", "max": "5 EI/L"})", ""));
    const auto a = assess_beam(p, p.beams[0]);
    const auto& r = vibration(a);
    REQUIRE(r.frequency);
    const auto out = test_data::python_output(
        "import numpy as np\nfrom scipy.optimize import brentq\n"
        "def det(l,a,b):\n"
        "  c,s,ch,sh=np.cos(l),np.sin(l),np.cosh(l),np.sinh(l)\n"
        "  A=np.array([[1,0,1,0],[-l*l,-a*l,l*l,-a*l],[c,s,ch,sh],"
        "[-l*l*c+b*(-l*s),-l*l*s+b*(l*c),l*l*ch+b*(l*sh),l*l*sh+b*(l*ch)]])\n"
        "  return np.linalg.det(A)\n"
        "for (a,b) in [(0.5,0.5),(0.5,5.0),(5.0,5.0)]:\n"
        "  print(repr(brentq(lambda l: det(l,a,b), np.pi-1e-9, 4.7301, xtol=1e-15)))\n");
    if (!out) {
        MESSAGE("scipy not available at /usr/bin/python3: cross-check skipped");
        return;
    }
    std::istringstream in(*out);
    double low = 0, mixed = 0, high = 0;
    in >> low >> mixed >> high;
    REQUIRE(static_cast<bool>(in));
    const beam& b = p.beams[0];
    CHECK(std::abs(r.frequency->range.min / classical(b, low) - 1) <= 1e-6);
    CHECK(std::abs(r.frequency->range.max / classical(b, high) - 1) <= 1e-6);
    CHECK(std::abs(r.frequency->corners.at(1) / classical(b, mixed) - 1) <= 1e-6);
    CHECK(std::abs(r.frequency->corners.at(2) / classical(b, mixed) - 1) <= 1e-6);
}

TEST_CASE("frequency check against limits.frequency [Blevins] [18/d]: the lower bound governs - the pinned frequency and 18/sqrt(delta) beside it")
{
    SUBCASE("fixed-pinned 12.6 Hz against 10 Hz passes - with pins (8.1 Hz) it would not")
    {
        const project p = parse_project(floor_beam(R"("rigid")", "0", R"(, "limits": {"frequency": "10 Hz"})"));
        const auto a = assess_beam(p, p.beams[0]);
        const check& c = find(a, "frequency");
        CHECK(c.status == check_status::pass);
        CHECK(c.limit_is_minimum);
        REQUIRE(c.value);
        REQUIRE(c.limit);
        CHECK(std::abs(*c.value / classical(p.beams[0], 3.92660231) - 1) <= 1e-7);
        CHECK(*c.limit == 10.0);
        CHECK(c.dim == dims::frequency);
        CHECK(c.message.find("with ideal pins") != std::string::npos);
        CHECK(c.message.find("18/sqrt(delta)") != std::string::npos);
        CHECK(c.message.find("relies on the stiffness of the joints") != std::string::npos);
    }
    SUBCASE("against 13 Hz it fails and the beam does not hold")
    {
        const project p = parse_project(floor_beam(R"("rigid")", "0", R"(, "limits": {"frequency": "13 Hz"})"));
        const auto a = assess_beam(p, p.beams[0]);
        CHECK(find(a, "frequency").status == check_status::fail);
        CHECK_FALSE(a.holds());
    }
    SUBCASE("without a limit the frequency is reported - not checked")
    {
        const project p = parse_project(floor_beam("0", "0", ""));
        const auto a = assess_beam(p, p.beams[0]);  // kept: the check refers into it
        const check& c = find(a, "frequency");
        CHECK(c.status == check_status::not_applicable);
        REQUIRE(c.value);
        CHECK(std::abs(*c.value / classical(p.beams[0], M_PI) - 1) <= 1e-7);
    }
    SUBCASE("the estimate 18/sqrt(delta) of the pinned beam lies within 1.5 % of its frequency")
    {
        const project p = parse_project(floor_beam("0", "0", ""));
        const auto a = assess_beam(p, p.beams[0]);  // kept: the state refers into it
        const auto& r = vibration(a);
        CHECK(std::abs(frequency_from_deflection(r.pinned->max_deflection) / r.frequency->pinned.value() - 1) <= 0.015);
    }
}

namespace {
// A 6 m IPE 300 under 20 kN/m (strength factor 1.0) on two equal joints of
// exactly 2 EI/L, with the support fields of the start joint given.
std::string beam_on_support(const std::string& start_extra)
{
    return R"({"format": "pinproof-project/1", "title": "support demand", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "S", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": "2 EI/L")" + start_extra + R"(}, "end": {"stiffness": "2 EI/L"}}}]})";
}
}  // namespace

// [MW63] and reference pack 11.2: equal springs kappa under a UDL take M = M_F kappa/(kappa + 2),
// M_F = wL^2/12; kappa = 2: M = wL^2/24 = 30 kN*m, R = wL/2 = 60 kN (symmetry).
// [4.7.7] BS 5950-1:2000 4.7.7 (reference pack 11.3): the reaction 100 mm from the column face,
// the net moment shared by the column lengths in proportion to EI/L.
TEST_CASE("support demand [MW63] [4.7.7]: 30 kN*m + 60 kN x 100 mm = 36 kN*m - column 3.5 m above and 4.2 m below shares 6/11 and 5/11 - tol 1e-9")
{
    const project p = parse_project(beam_on_support(
        R"(, "column": {"section": "HE 200 B", "length_above": "3.5 m", "length_below": "4.2 m"})"));
    const auto a = assess_beam(p, p.beams[0]);
    REQUIRE(a.start.support);
    const support_demand& d = a.start.support->demand;
    CHECK(d.eccentricity == doctest::Approx(0.100).epsilon(1e-15));
    CHECK(a.start.support->joint_moment == doctest::Approx(30e3).epsilon(1e-9));
    CHECK(a.start.support->reaction == doctest::Approx(60e3).epsilon(1e-9));
    CHECK(d.moment == doctest::Approx(36e3).epsilon(1e-9));
    REQUIRE(d.moment_above);
    REQUIRE(d.moment_below);
    CHECK(*d.moment_above == doctest::Approx(36e3 * 6 / 11).epsilon(1e-9));
    CHECK(*d.moment_below == doctest::Approx(36e3 * 5 / 11).epsilon(1e-9));
    CHECK_FALSE(d.torsion);
    const check& c = find(a, "support-moment-start");
    CHECK(c.status == check_status::warn);  // no resistance given: passed on, not a failure
    CHECK(c.informative);
    CHECK(c.value == doctest::Approx(36e3).epsilon(1e-9));
    // The end joint has no column: no shares.
    REQUIRE(a.end.support);
    CHECK_FALSE(a.end.support->demand.moment_above);
}

TEST_CASE("support demand against the support's resistance [MW63] [4.7.7]: e = 150 mm gives 39 kN*m - fails at 35 kN*m and passes at 40 kN*m - tol 1e-9")
{
    SUBCASE("fails below the demand")
    {
        const project p = parse_project(beam_on_support(
            R"(, "support_eccentricity": "150 mm", "support_moment_resistance": "35 kN*m")"));
        const auto a = assess_beam(p, p.beams[0]);
        const check& c = find(a, "support-moment-start");
        CHECK(c.value == doctest::Approx(39e3).epsilon(1e-9));
        CHECK(c.limit == doctest::Approx(35e3).epsilon(1e-15));
        CHECK(c.status == check_status::fail);
        CHECK_FALSE(c.informative);
        CHECK_FALSE(a.holds());
        CHECK(find(a, "support-moment-end").status == check_status::warn);  // no resistance at the end
    }
    SUBCASE("passes above it")
    {
        const project p = parse_project(beam_on_support(
            R"(, "support_eccentricity": "150 mm", "support_moment_resistance": "40 kN*m")"));
        CHECK(find(assess_beam(p, p.beams[0]), "support-moment-start").status == check_status::pass);
    }
}

TEST_CASE("support demand of a pinned joint [4.7.7]: the eccentricity moment alone - wL/2 x 100 mm = 6 kN*m - passes - tol 1e-9")
{
    std::string text = beam_on_support("");
    const std::string spring = R"("stiffness": "2 EI/L")";
    for (std::size_t at = text.find(spring); at != std::string::npos; at = text.find(spring))
        text.replace(at, spring.size(), R"("stiffness": 0)");
    const project p = parse_project(text);
    const auto a = assess_beam(p, p.beams[0]);
    const check& c = find(a, "support-moment-start");
    CHECK(c.value == doctest::Approx(6e3).epsilon(1e-9));
    CHECK(c.status == check_status::pass);
}

// corner_range: the least and largest of a result over the corners (exact: a
// min and a max of the stored values; the project's rules).
TEST_CASE("corner_range: min and max over the four corners - no corner is an internal error - exact")
{
    combination_result r;
    for (double v : {0.004, -0.002, 0.007, 0.001}) {
        beam_state s;
        s.tip_deflection = v;
        r.corners.push_back(s);
    }
    const value_range range = corner_range(r, &beam_state::tip_deflection);
    CHECK(range.min == -0.002);
    CHECK(range.max == 0.007);
    r.corners.clear();
    CHECK_THROWS_AS(corner_range(r, &beam_state::tip_deflection), internal_error);
}
