// Verification of the stiffness thresholds against closed forms.
//
// Sources (reference pack items in brackets; [M] = from memory, [D] = derived):
//   [MW63]  Monforton & Wu, J. Struct. Div. ASCE 89(ST6), 1963 [C], pack section 5:
//           fixity factor r = kappa/(kappa + 3) [M formula]; equal springs under a
//           symmetric load: M = MF kappa/(kappa + 2) [D], so M = f MF at
//           S = 2 f EI / ((1 - f) L); theta = theta_s 2/(kappa + 2) [D];
//           UDL mid-span deflection wL^4/(384EI) [5 - 4 kappa/(kappa + 2)] [D];
//           unequal springs, UDL: M_A = (wL^2/4) rA (2 - rB)/(4 - rA rB) [D].
//   [EC3]   EN 1993-1-8:2005 5.2.2.5(1): nominally pinned for S L/EI <= 0.5 [C*].
//   [AISC]  AISC 360-16 Commentary B3.4: simple for S L/EI <= 2 [C*].
// The thresholds are found to 1e-10 relative in S; the checks here use 1e-9.
#include <doctest/doctest.h>

#include <cmath>
#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/checks/threshold.hpp"
#include "pinproof/io/project_input.hpp"

using namespace pinproof;

namespace {

// IPE 300 (catalogue dimensions), L = 6 m, full UDL w (kN/m), both joints with
// the given stiffness text and moment resistance (kN*m).
project udl_project(double w_kn, double mrd_kn, const std::string& standard = "EN1993-1-8",
                    const std::string& deflection = "span/360")
{
    const std::string joint = "{ \"stiffness\": { \"min\": \"0.1 EI/L\", \"max\": \"0.4 EI/L\" }, "
                              "\"moment_resistance\": \"" + std::to_string(mrd_kn) + " kN*m\" }";
    return parse_project(R"({ "format": "pinproof-project/1", "title": "threshold test", "standard": ")" + standard +
                         R"(", "frame": "braced", "beams": [ { "id": "B1", "span": "6 m", "E": "210 GPa",
      "section": "IPE 300", "loads": [ { "case": "G", "kind": "udl", "w": ")" + std::to_string(w_kn) + R"( kN/m" } ],
      "combinations": [ { "name": "ULS", "use": "strength", "factors": { "G": 1.0 } },
                        { "name": "SLS", "use": "service", "factors": { "G": 1.0 } } ],
      "joints": { "start": )" + joint + ", \"end\": " + joint + R"( },
      "limits": { "deflection": ")" + deflection + R"(" } } ] })");
}

const threshold* find(const std::vector<threshold>& ts, const std::string& id)
{
    for (const auto& t : ts)
        if (t.check == id) return &t;
    return nullptr;
}

bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::max(std::abs(a), std::abs(b)); }

}  // namespace

TEST_CASE("joint moment threshold - equal springs - full UDL [MW63 - D]: M = f MF at S = 2 f EI/((1-f) L) - tol 1e-9")
{
    const double w = 20e3, L = 6.0;
    const double MF = w * L * L / 12;
    for (double f : {0.2, 0.5, 0.8, 0.95}) {
        CAPTURE(f);
        const project p = udl_project(w / 1e3, f * MF / 1e3);
        const beam& b = p.beams.front();
        const auto ts = find_thresholds(p, b, {moving_end::both, stiffness::pinned()});
        for (const char* id : {"joint-moment-start", "joint-moment-end"}) {
            CAPTURE(id);
            const threshold* t = find(ts, id);
            REQUIRE(t != nullptr);
            CHECK(close(t->at.value(), 2 * f * b.EI() / ((1 - f) * L), 1e-9));
            CHECK(close(t->ratio, 2 * f / (1 - f), 1e-9));
            CHECK(t->below == check_status::pass);
            CHECK(t->above == check_status::fail);
        }
    }
}

TEST_CASE("stiffness class threshold [EC3 5.2.2.5(1) - AISC B3.4]: S = 0.5 EI/L and 2 EI/L - tol 1e-9")
{
    for (const auto& [standard, limit] : {std::pair<std::string, double>{"EN1993-1-8", 0.5}, {"AISC360", 2.0}}) {
        CAPTURE(standard);
        const project p = udl_project(20, 1000, standard);
        const beam& b = p.beams.front();
        const auto ts = find_thresholds(p, b, {moving_end::both, stiffness::pinned()});
        const threshold* t = find(ts, "stiffness-class-start");
        REQUIRE(t != nullptr);
        CHECK(close(t->at.value(), limit * b.EI() / b.span, 1e-9));
        CHECK(close(t->fixity, limit / (limit + 3), 1e-9));  // [MW63]
        CHECK(t->above == check_status::fail);
    }
}

TEST_CASE("deflection threshold - equal springs - UDL [D - pack 5]: wL^4/(384EI) [5 - 4k/(k+2)] = L/360 - tol 1e-9")
{
    const double w = 30e3, L = 6.0;
    const project p = udl_project(w / 1e3, 1000);
    const beam& b = p.beams.front();
    const double q = (L / 360) / (w * std::pow(L, 4) / (384 * b.EI()));
    REQUIRE(q > 1);
    REQUIRE(q < 5);
    const double a = (5 - q) / 4, kappa = 2 * a / (1 - a);
    const auto ts = find_thresholds(p, b, {moving_end::both, stiffness::pinned()});
    const threshold* t = find(ts, "deflection");
    REQUIRE(t != nullptr);
    CHECK(close(t->ratio, kappa, 1e-9));
    CHECK(t->below == check_status::fail);
    CHECK(t->above == check_status::pass);
}

TEST_CASE("rotation demand threshold - equal springs [D - pack 5]: theta_s 2/(k+2) = 0.03 rad - tol 1e-9")
{
    const double w = 60e3, L = 6.0;
    const project p = udl_project(w / 1e3, 1000, "EN1993-1-8", "span/100");
    const beam& b = p.beams.front();
    const double theta_s = w * L * L * L / (24 * b.EI());  // Roark Table 8.1 [M]; pack section 6 [C]
    REQUIRE(theta_s > 0.03);
    const double kappa = 2 * theta_s / 0.03 - 2;
    const auto ts = find_thresholds(p, b, {moving_end::both, stiffness::pinned()});
    const threshold* t = find(ts, "rotation-demand-start");
    REQUIRE(t != nullptr);
    CHECK(close(t->ratio, kappa, 1e-9));
    CHECK(t->below == check_status::warn);
    CHECK(t->above == check_status::pass);
}

TEST_CASE("checks that never change state report no threshold [common practice - no source]: support moment - exact")
{
    const project p = udl_project(20, 1000);
    const auto ts = find_thresholds(p, p.beams.front(), {moving_end::both, stiffness::pinned()});
    CHECK(find(ts, "support-moment-start") == nullptr);
    CHECK(find(ts, "support-moment-end") == nullptr);
    CHECK(find(ts, "joint-moment-start") == nullptr);  // 1000 kN*m is never reached
}

TEST_CASE("one end moving - the other rigid - UDL [MW63 - D]: M_A = (wL^2/4) rA/(4 - rA) at rB = 1 - tol 1e-9")
{
    const double w = 20e3, L = 6.0, mrd = 40e3;
    const project p = udl_project(w / 1e3, mrd / 1e3);
    const beam& b = p.beams.front();
    const auto ts = find_thresholds(p, b, {moving_end::start, stiffness::rigid()});
    const threshold* t = find(ts, "joint-moment-start");
    REQUIRE(t != nullptr);
    const double c = 4 * mrd / (w * L * L);
    const double rA = 4 * c / (1 + c);  // from rA/(4 - rA) = c
    CHECK(close(t->fixity, rA, 1e-9));
    CHECK(close(t->ratio, 3 * rA / (1 - rA), 1e-9));
    // The end joint is held rigid: its moment exceeds 40 kN*m whatever the start does.
    CHECK(find(ts, "joint-moment-end") == nullptr);
}

TEST_CASE("boundary curve in the two-end plane - UDL [MW63 - D]: M_A(rA - rB) = M_Rd on every point - tol 1e-8")
{
    const double w = 20e3, L = 6.0, mrd = 30e3;
    const project p = udl_project(w / 1e3, mrd / 1e3);
    const auto pts = boundary_curve(p, p.beams.front(), "joint-moment-start", 11);
    REQUIRE(pts.size() >= 5);
    for (const auto& pt : pts) {
        const double ra = pt.fixity_start, rb = pt.fixity_end;
        CAPTURE(ra);
        const double MA = w * L * L / 4 * ra * (2 - rb) / (4 - ra * rb);
        CHECK(close(MA, mrd, 1e-8));
    }
}

TEST_CASE("text report lines [EC3 5.2.2.5(1)]: the pinned assumption stops holding above S = 0.5 EI/L")
{
    const project p = udl_project(20, 1000);
    const auto lines = threshold_report_lines(p, p.beams.front());
    bool found = false;
    for (const auto& l : lines)
        if (l.find("stiffness-class-start: the pinned assumption stops holding above S = ") == 0) found = true;
    CHECK(found);
}

TEST_CASE("fixity factor [MW63]: r = kappa/(kappa + 3) - inverse exact for pin and rigid - tol 1e-14")
{
    const double EI = 17.5e6, L = 6;
    CHECK(fixity_factor(stiffness::pinned(), EI, L) == 0.0);
    CHECK(fixity_factor(stiffness::rigid(), EI, L) == 1.0);
    CHECK(stiffness_of_fixity(1.0, EI, L).is_rigid());
    CHECK(stiffness_of_fixity(0.0, EI, L).is_pinned());
    CHECK(close(fixity_factor(stiffness::spring(2 * EI / L), EI, L), 0.4, 1e-14));
    CHECK(close(stiffness_of_fixity(0.4, EI, L).value(), 2 * EI / L, 1e-14));
}

TEST_CASE("frequency threshold - equal springs - UDL [Blevins - natural_frequency]: f_1(S) = limit at the threshold - tol 1e-6")
{
    // 7.5 m IPE 360 vibrating under 4 kN/m: 8.1 Hz pinned, 18.3 Hz fixed (Blevins Table 8-1,
    // from memory): a least frequency of 12 Hz is reached between them, where the check
    // turns from fail to pass. The frequency there is the library's own eigenvalue
    // (its verification: tests/model/natural_frequency_test.cpp).
    const project p = parse_project(R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8",
      "frame": "braced", "beams": [{"id": "F", "span": "7.5 m", "section": "IPE 360",
        "loads": [{"case": "G", "kind": "udl", "w": "4 kN/m"}],
        "combinations": [{"name": "VIB", "use": "vibration", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": 0}, "end": {"stiffness": 0}}, "limits": {"frequency": "12 Hz"}}]})");
    const beam& b = p.beams[0];
    const auto ts = find_thresholds(p, b, stiffness_path{});
    const threshold* t = nullptr;
    for (const auto& x : ts)
        if (x.check == "frequency") t = &x;
    REQUIRE(t);
    CHECK(t->below == check_status::fail);
    CHECK(t->above == check_status::pass);
    const double f = first_natural_frequency(b.span, b.EI(), factored_loads(b.loads, b.combinations[0]), t->at, t->at);
    CHECK(std::abs(f / 12.0 - 1) <= 1e-6);
}

// ---------------------------------------------------------------------------
// Cantilevers and overhangs: the one joint moves alone (threshold.hpp).
//   [C8]  Cantilever, UDL w: tip deflection wL^4/(8EI) (1 + 4/kappa) with a spring
//         root, kappa = S L/EI (Roark's Formulas, 7th ed., Table 8.1, from memory;
//         reference pack 11.5 [D]): the increase over the rigid root is 4/kappa, so
//         root-flexibility changes state at kappa = 4/limit (40 for 10 %), and the
//         deflection check at kappa = 4/(delta_lim 8EI/(wL^4) - 1).
//   [EC3] the rigid boundary k_b = 8 (braced) of EN 1993-1-8 5.2.2.5(1) for root-class.
namespace {

project cantilever_udl(const std::string& deflection)
{
    return parse_project(R"({ "format": "pinproof-project/1", "title": "cantilever thresholds", "standard": "EN1993-1-8",
      "frame": "braced", "beams": [ { "id": "C1", "layout": "cantilever", "span": "2 m", "E": "210 GPa",
      "section": "IPE 240", "loads": [ { "case": "G", "kind": "udl", "w": "10 kN/m" } ],
      "combinations": [ { "name": "ULS", "use": "strength", "factors": { "G": 1.35 } },
                        { "name": "SLS", "use": "service", "factors": { "G": 1.0 } } ],
      "joints": { "start": { "stiffness": { "min": "10 EI/L", "max": "50 EI/L" }, "moment_resistance": "40 kN*m" } },
      "limits": { "deflection": ")" + deflection + R"(" } } ] })");
}

const threshold* of(const std::vector<threshold>& ts, const std::string& id)
{
    for (const auto& t : ts)
        if (t.check == id) return &t;
    return nullptr;
}

}  // namespace

TEST_CASE("cantilever thresholds - UDL [C8 - EC3]: root-class at kappa = 8 - root-flexibility at kappa = 40 - deflection at 4/(d_lim 8EI/(wL^4) - 1) - tol 1e-9")
{
    const project p = cantilever_udl("span/300");
    const beam& b = p.beams.at(0);
    const auto ts = find_thresholds(p, b, {moving_end::both, stiffness::pinned()});
    const threshold* cls = of(ts, "root-class");
    REQUIRE(cls);
    CHECK(cls->ratio == doctest::Approx(8.0).epsilon(1e-9));
    CHECK(cls->below == check_status::fail);
    CHECK(cls->above == check_status::pass);
    const threshold* flex = of(ts, "root-flexibility");
    REQUIRE(flex);
    CHECK(flex->ratio == doctest::Approx(40.0).epsilon(1e-9));
    const double L = 2.0, w = 10e3, rigid_tip = w * std::pow(L, 4) / (8 * b.EI()), limit = L / 300;
    const threshold* defl = of(ts, "deflection");
    REQUIRE(defl);
    CHECK(defl->ratio == doctest::Approx(4.0 / (limit / rigid_tip - 1.0)).epsilon(1e-9));
    // The scan never meets the pinned root (a mechanism): every threshold has S > 0.
    for (const auto& t : ts) CHECK(t.at.value() > 0);
    const auto lines = threshold_report_lines(p, b);
    REQUIRE_FALSE(lines.empty());
    CHECK(lines.front().find("the root moving") != std::string::npos);
}

TEST_CASE("overhang thresholds [EC3]: the start joint alone - stiffness-class-start at S = 0.5 EI/L with L the back span - tol 1e-9")
{
    const project p = parse_project(R"({ "format": "pinproof-project/1", "title": "overhang thresholds",
      "standard": "EN1993-1-8", "frame": "braced", "beams": [ { "id": "O1", "layout": "overhang", "span": "6 m",
      "overhang": "1.5 m", "section": "IPE 300", "loads": [ { "case": "G", "kind": "udl", "w": "10 kN/m" } ],
      "combinations": [ { "name": "ULS", "use": "strength", "factors": { "G": 1.35 } } ],
      "joints": { "start": { "stiffness": { "min": "0.1 EI/L", "max": "0.4 EI/L" } } } } ] })");
    const auto ts = find_thresholds(p, p.beams.at(0), {moving_end::both, stiffness::pinned()});
    const threshold* cls = of(ts, "stiffness-class-start");
    REQUIRE(cls);
    CHECK(cls->ratio == doctest::Approx(0.5).epsilon(1e-9));
    CHECK_THROWS_AS(boundary_curve(p, p.beams.at(0), "stiffness-class-start"), internal_error);
}
