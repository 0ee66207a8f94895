// Verification of the checks of a cantilever (src/checks/cantilever_checks.cpp)
// and of a cantilever project read and assessed end to end.
//
// References:
//   [EN]    EN 1993-1-8:2005 5.2.2.5(1): rigid where S_j,ini >= k_b E I_b / L_b, k_b = 8 for
//           braced frames, 25 otherwise (reference pack 1.1; applied to a cantilever's root
//           with L its length, docs/method/layouts.md).
//   [AISC]  AISC 360-16 Commentary B3.4: fully restrained from S L / EI = 20 (pack section 3).
//   [C8]    Cantilever, rigid root: tip deflection wL^4/(8EI), PL^3/(3EI) (Roark's Formulas,
//           7th ed., Table 8.1, from memory; reference pack 11.5 [D]); the spring root adds
//           (M_root/S) L, derived in the tests, so the increase is 4/kappa (UDL) and 3/kappa
//           (tip load), kappa = S L/EI.
//   [Blevins] Blevins, Formulas for Natural Frequency and Mode Shape (1979), Table 8-1:
//           clamped-free lambda = 1.87510407 (from memory; lambda^2 = 3.5160 in pack 11.4).
#include <doctest/doctest.h>

#include <cmath>
#include <string>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "pinproof/model/project.hpp"

using namespace pinproof;

namespace {
const check& find(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return c;
    FAIL("no check " << id);
    return a.checks.front();
}

bool has(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return true;
    return false;
}

// A 2 m IPE 240 cantilever under 10 kN/m, its root at kappa_min .. kappa_max times EI/L.
std::string cantilever(const std::string& root_stiffness, const std::string& extra = "",
                       const std::string& standard = "EN1993-1-8")
{
    return R"({"format": "pinproof-project/1", "title": "cantilever", "standard": ")" + standard +
           R"(", "frame": "braced",
      "beams": [{"id": "C", "layout": "cantilever", "span": "2 m", "section": "IPE 240",
        "loads": [{"case": "G", "kind": "udl", "w": "10 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35}},
                         {"name": "SLS", "use": "service", "factors": {"G": 1.0}},
                         {"name": "VIB", "use": "vibration", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": )" + root_stiffness + R"(, "moment_resistance": "30 kN*m"}},
        "limits": {"deflection": "span/180")" + extra + R"(}}]})";
}
}  // namespace

TEST_CASE("root-class [EN]: kappa_min 9 passes k_b = 8 - kappa_min 7 fails - rigid passes - tol exact")
{
    {
        const project p = parse_project(cantilever(R"({"min": "9 EI/L", "max": "20 EI/L"})"));
        const auto a = assess_beam(p, p.beams[0]);
        const check& c = find(a, "root-class");
        CHECK(c.status == check_status::pass);
        CHECK(*c.value == doctest::Approx(9.0).epsilon(1e-12));
        CHECK(*c.limit == 8.0);
    }
    {
        const project p = parse_project(cantilever(R"({"min": "7 EI/L", "max": "20 EI/L"})"));
        CHECK(find(assess_beam(p, p.beams[0]), "root-class").status == check_status::fail);
    }
    {
        const project p = parse_project(cantilever(R"("rigid")"));
        const auto a = assess_beam(p, p.beams[0]);
        CHECK(find(a, "root-class").status == check_status::pass);
        CHECK(find(a, "root-flexibility").status == check_status::pass);
        CHECK(*find(a, "root-flexibility").value == 0.0);
        CHECK(a.holds());
    }
}

TEST_CASE("root-class [AISC]: the fully restrained boundary 20 - kappa_min 15 fails")
{
    const project p = parse_project(cantilever(R"({"min": "15 EI/L", "max": "30 EI/L"})", "", "AISC360"));
    const auto a = assess_beam(p, p.beams[0]);  // kept alive while its check is read
    const check& c = find(a, "root-class");
    CHECK(c.status == check_status::fail);
    CHECK(*c.limit == 20.0);
}

TEST_CASE("root-flexibility [C8]: UDL increase 4/kappa_min against 10 % - kappa 50 passes - kappa 20 fails - tol 1e-9")
{
    {
        const project p = parse_project(cantilever(R"({"min": "50 EI/L", "max": "80 EI/L"})"));
        const auto a = assess_beam(p, p.beams[0]);  // kept alive while its check is read
        const check& c = find(a, "root-flexibility");
        CHECK(*c.value == doctest::Approx(4.0 / 50.0).epsilon(1e-9));
        CHECK(*c.limit == doctest::Approx(0.10).epsilon(1e-15));
        CHECK(c.status == check_status::pass);
    }
    {
        const project p = parse_project(cantilever(R"({"min": "20 EI/L", "max": "80 EI/L"})"));
        const auto a = assess_beam(p, p.beams[0]);
        const check& c = find(a, "root-flexibility");
        CHECK(*c.value == doctest::Approx(4.0 / 20.0).epsilon(1e-9));
        CHECK(c.status == check_status::fail);
        // The code calls the root rigid (20 >= 8) yet the fixed root does not hold.
        CHECK(find(a, "root-class").status == check_status::pass);
        CHECK_FALSE(a.holds());
    }
    {
        // limits.root_flexibility given as a percentage.
        const project p = parse_project(cantilever(R"({"min": "20 EI/L", "max": "80 EI/L"})", R"(, "root_flexibility": "25 %")"));
        const auto a = assess_beam(p, p.beams[0]);  // kept alive while its check is read
        const check& c = find(a, "root-flexibility");
        CHECK(*c.limit == doctest::Approx(0.25).epsilon(1e-12));
        CHECK(c.status == check_status::pass);
    }
}

TEST_CASE("cantilever deflection [C8] - root moment from statics - frequency [Blevins] - no pinned state - tol 1e-9")
{
    const project p = parse_project(cantilever(R"({"min": "10 EI/L", "max": "40 EI/L"})"));
    const beam& b = p.beams[0];
    const auto a = assess_beam(p, b);
    const double w = 10e3, L = 2.0, EI = b.EI(), S_min = 10 * EI / L;
    // Tip deflection at the least stiff root: wL^4/(8EI) + (wL^2/2) L / S_min.
    const check& d = find(a, "deflection");
    CHECK(*d.value == doctest::Approx(w * std::pow(L, 4) / (8 * EI) + w * L * L / 2 * L / S_min).epsilon(1e-9));
    CHECK(*d.limit == doctest::Approx(L / 180).epsilon(1e-12));
    const check& m = find(a, "root-moment");
    CHECK(*m.value == doctest::Approx(1.35 * w * L * L / 2).epsilon(1e-9));
    CHECK(m.status == check_status::pass);
    for (const auto& r : a.combinations) CHECK_FALSE(r.pinned.has_value());
    const auto& vib = a.combinations[2];
    REQUIRE(vib.frequency);
    CHECK_FALSE(vib.frequency->pinned.has_value());
    const double lambda = 1.87510407, mass = w / standard_gravity;
    CHECK(vib.frequency->fixed ==
          doctest::Approx(lambda * lambda / (2 * M_PI * L * L) * std::sqrt(EI / mass)).epsilon(1e-7));
    CHECK(vib.frequency->range.min < vib.frequency->fixed);
    // The checks of a pinned end and of a beam on two supports are not run.
    for (const char* id : {"stiffness-class-start", "stiffness-class-end", "joint-moment-end", "support-moment-end",
                           "rotation-demand-start", "gap-closure-end"})
        CHECK_FALSE(has(a, id));
}

// The root's demand on its support, worked by hand: under ULS (1.35 G) the
// root carries M = 1.35 w L^2/2 = 27 kN*m and V = 1.35 w L = 27 kN (statics).
// Support demand = M + V e (support_demand.hpp); the share of a continuous
// column above and below in proportion to I/L (BS 5950-1:2000 4.7.7, reference
// pack 11.3; the same I both ways, so in proportion to 1/L).
TEST_CASE("cantilever root support demand: M + V e - column split by 1/L - resistance checked - tol 1e-9")
{
    const double M = 1.35 * 10e3 * 2.0 * 2.0 / 2, V = 1.35 * 10e3 * 2.0;
    {
        // Default eccentricity 0 for a moment joint: the demand is the root moment.
        const project p = parse_project(cantilever(R"({"min": "10 EI/L", "max": "40 EI/L"})"));
        const auto a = assess_beam(p, p.beams[0]);
        const check& c = find(a, "support-moment-start");
        CHECK(*c.value == doctest::Approx(M).epsilon(1e-9));
        CHECK(c.status == check_status::pass);
        CHECK(c.informative);
        REQUIRE(a.start.support);
        CHECK(a.start.support->demand.eccentricity == 0.0);
        CHECK(c.message.find("root moment") != std::string::npos);
    }
    {
        std::string text = cantilever(R"({"min": "10 EI/L", "max": "40 EI/L"})");
        const std::string at = R"("moment_resistance": "30 kN*m")";
        text.replace(text.find(at), at.size(),
                     at + R"(, "support_eccentricity": "50 mm", "support_moment_resistance": "28 kN*m",
                     "column": {"section": "HEB 200", "length_above": "3 m", "length_below": "3.5 m"})");
        const project p = parse_project(text);
        const auto a = assess_beam(p, p.beams[0]);
        const check& c = find(a, "support-moment-start");
        const double d = M + V * 0.05;  // 28.35 kN*m
        CHECK(*c.value == doctest::Approx(d).epsilon(1e-9));
        CHECK(c.status == check_status::fail);  // above the declared 28 kN*m
        CHECK_FALSE(c.informative);
        REQUIRE(a.start.support);
        REQUIRE(a.start.support->demand.moment_above);
        CHECK(*a.start.support->demand.moment_above == doctest::Approx(d * (1 / 3.0) / (1 / 3.0 + 1 / 3.5)).epsilon(1e-9));
        CHECK(*a.start.support->demand.moment_below == doctest::Approx(d * (1 / 3.5) / (1 / 3.0 + 1 / 3.5)).epsilon(1e-9));
    }
}

TEST_CASE("cantilever refusals at the input edge: pinned root - range reaching 0 - an end joint - an overhang without its length")
{
    const auto refused = [](const std::string& text, const std::string& pointer, const std::string& words) {
        try {
            parse_project(text);
            FAIL("accepted: " << pointer);
        } catch (const input_error& e) {
            const std::string what = e.what();
            CHECK_MESSAGE(what.find(pointer) != std::string::npos, what);
            CHECK_MESSAGE(what.find(words) != std::string::npos, what);
        }
    };
    refused(cantilever("0"), "/beams/0/joints/start/stiffness", "is a mechanism");
    refused(cantilever(R"({"min": 0, "max": "20 EI/L"})"), "/beams/0/joints/start/stiffness/min", "range reaches 0");
    std::string with_end = cantilever(R"("rigid")");
    with_end.replace(with_end.find(R"(, "moment_resistance": "30 kN*m"}})"), 34,
                     R"(, "moment_resistance": "30 kN*m"}, "end": {"stiffness": 0}})");
    refused(with_end, "/beams/0/joints/end", "free tip");
    std::string overhang = cantilever(R"("rigid")");
    overhang.replace(overhang.find(R"("layout": "cantilever")"), 22, R"("layout": "overhang")");
    refused(overhang, "/beams/0/overhang", "missing required field");
}
