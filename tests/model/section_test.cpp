// Verification of section properties and the section catalogue.
//
// Sources:
//   [EN10365]  EN 10365:2017, Hot rolled steel channels, I and H sections -
//              Dimensions and masses (IPE as Euronorm 19-57, HE A as
//              DIN 1025-3, HE B as DIN 1025-2). Tabulated A, Iy, Wel,y, Wpl,y.
//   [AISC]     AISC Steel Construction Manual, Table 1-1 (W shapes).
//              Tabulated A, Ix, Sx, Zx.
//   All handbook property values below are from memory of these tables,
//   except W18x35, IPE 300, IPE 400 and HE 300 A, which are in the reference
//   pack (section 8). The catalogue stores and uses the W shapes' tabulated
//   A, Ix, Sx, Zx; IPE and HE properties are computed from the dimensions.
//   [sympy]    python3-sympy exact integration of the section outline.
//   [strips]   strip integration of the section outline, written here.
#include <doctest/doctest.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <sstream>
#include <stdexcept>
#include <string>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/section.hpp"
#include "model/section_catalogue_data.hpp"

using namespace pinproof;

namespace {

constexpr double cm2 = 1e-4;
constexpr double cm3 = 1e-6;
constexpr double cm4 = 1e-8;
constexpr double in = 0.0254;
constexpr double in2 = in * in;
constexpr double in3 = in2 * in;
constexpr double in4 = in2 * in2;

double rel_diff(double computed, double reference) { return std::abs(computed / reference - 1.0); }

struct handbook_row {
    const char* name;
    const char* source;
    double A, I, W_el, W_pl;  // SI
};

section lookup(const char* name)
{
    const auto s = find_catalogue_section(name);
    REQUIRE_MESSAGE(s.has_value(), "catalogue has no section " << name);
    return *s;
}

// The properties computed from the catalogue row's dimensions alone (the
// check on the stored tabulated values, and on the dimensions).
section computed(const char* name)
{
    for (const auto& d : catalogue())
        if (d.name == name) return rolled_i_section(d);
    FAIL("catalogue has no section " << name);
    return {};
}

}  // namespace

TEST_CASE("section properties against handbook tables (from memory) - tolerance 0.5 %")
{
    // Tolerance 0.5 % on A, Iy, Wel,y and Wpl,y: the tables round to 3-4
    // significant figures, and for W shapes r = k_des - tf is only an
    // equivalent fillet radius.
    const handbook_row rows[] = {
        {"IPE 300", "EN 10365:2017 (from memory)", 53.8 * cm2, 8356 * cm4, 557 * cm3, 628 * cm3},
        {"IPE 400", "EN 10365:2017 (from memory)", 84.5 * cm2, 23130 * cm4, 1156 * cm3, 1307 * cm3},
        {"HE 300 A", "EN 10365:2017 (from memory)", 112.5 * cm2, 18260 * cm4, 1260 * cm3, 1383 * cm3},
        {"W18x35", "AISC Manual Table 1-1 (from memory)", 10.3 * in2, 510 * in4, 57.6 * in3, 66.5 * in3},
        {"IPE 200", "EN 10365:2017 (from memory)", 28.5 * cm2, 1943 * cm4, 194 * cm3, 221 * cm3},
        {"IPE 600", "EN 10365:2017 (from memory)", 156 * cm2, 92080 * cm4, 3069 * cm3, 3512 * cm3},
        {"HE 200 B", "EN 10365:2017 (from memory)", 78.1 * cm2, 5696 * cm4, 570 * cm3, 642 * cm3},
        {"HE 500 A", "EN 10365:2017 (from memory)", 197.5 * cm2, 86970 * cm4, 3550 * cm3, 3949 * cm3},
        {"W16x40", "AISC Manual Table 1-1 (from memory)", 11.8 * in2, 518 * in4, 64.7 * in3, 73.0 * in3},
    };
    constexpr double tol = 0.005;
    for (const auto& row : rows) {
        CAPTURE(row.name);
        CAPTURE(row.source);
        const section s = computed(row.name);
        CHECK(rel_diff(*s.area, row.A) <= tol);
        CHECK(rel_diff(s.I, row.I) <= tol);
        CHECK(rel_diff(*s.W_el, row.W_el) <= tol);
        CHECK(rel_diff(*s.W_pl, row.W_pl) <= tol);
    }
}

TEST_CASE("W shapes use the tabulated A Ix Sx Zx of AISC Manual Table 1-1 - exact to 1e-12")
{
    // Issue 11: the values computed from the rounded dimensions and the
    // equivalent fillet r = k_des - tf differ from the manual by up to 0.8 %,
    // so the catalogue stores and uses the manual's. W18x35: reference pack
    // section 8 (A 10.3 in2, Ix 510 in4, Sx 57.6 in3, Zx 66.5 in3); the other
    // rows from memory of AISC Manual Table 1-1.
    const handbook_row rows[] = {
        {"W18x35", "AISC Table 1-1, reference pack section 8", 10.3 * in2, 510 * in4, 57.6 * in3, 66.5 * in3},
        {"W16x40", "AISC Table 1-1 (from memory)", 11.8 * in2, 518 * in4, 64.7 * in3, 73.0 * in3},
        {"W14x30", "AISC Table 1-1 (from memory)", 8.85 * in2, 291 * in4, 42.0 * in3, 47.3 * in3},
        {"W10x22", "AISC Table 1-1 (from memory)", 6.49 * in2, 118 * in4, 23.2 * in3, 26.0 * in3},
        {"W33x118", "AISC Table 1-1 (from memory)", 34.7 * in2, 5900 * in4, 359 * in3, 415 * in3},
    };
    for (const auto& row : rows) {
        CAPTURE(row.name);
        const section s = lookup(row.name);
        CHECK(*s.area == doctest::Approx(row.A).epsilon(1e-12));
        CHECK(s.I == doctest::Approx(row.I).epsilon(1e-12));
        CHECK(*s.W_el == doctest::Approx(row.W_el).epsilon(1e-12));
        CHECK(*s.W_pl == doctest::Approx(row.W_pl).epsilon(1e-12));
    }
    // Every W row stores all four; every European row none (computed, below).
    for (const auto& d : catalogue()) {
        CAPTURE(d.name);
        const bool w = d.name.rfind("W", 0) == 0;
        CHECK(d.A.has_value() == w);
        CHECK(d.I.has_value() == w);
        CHECK(d.W_el.has_value() == w);
        CHECK(d.W_pl.has_value() == w);
    }
}

TEST_CASE("the stored W values agree with the values computed from the dimensions within 0.9 % (from memory)")
{
    // The computation from dimensions is the check on each stored value: a
    // mistyped or misremembered value moves by more than the 0.8 % the
    // equivalent fillet explains.
    for (const auto& d : catalogue()) {
        if (!d.A) continue;
        CAPTURE(d.name);
        const section c = rolled_i_section(d);
        CHECK(rel_diff(*c.area, *d.A) <= 0.009);
        CHECK(rel_diff(c.I, *d.I) <= 0.009);
        CHECK(rel_diff(*c.W_el, *d.W_el) <= 0.009);
        CHECK(rel_diff(*c.W_pl, *d.W_pl) <= 0.009);
    }
}

TEST_CASE("IPE and HE sections use the computed values - within 0.1 % of the EN 10365 values of the reference pack")
{
    // Reference pack section 8: IPE 300 53.8 cm2 / 8356 cm4 / 557 cm3 / 628 cm3,
    // IPE 400 84.5 / 23 130 / 1156 / 1307, HE 300 A 112.5 / 18 260 / 1260 / 1383
    // ([M] there, each reproduced by the formula within 0.1 % [D]). Tolerance:
    // 0.1 %, the bound for keeping the computed values, widened by the
    // table's rounding of W_el, W_pl to whole cm3 where that is larger.
    const handbook_row rows[] = {
        {"IPE 300", "pack 8", 53.8 * cm2, 8356 * cm4, 557 * cm3, 628 * cm3},
        {"IPE 400", "pack 8", 84.5 * cm2, 23130 * cm4, 1156 * cm3, 1307 * cm3},
        {"HE 300 A", "pack 8", 112.5 * cm2, 18260 * cm4, 1260 * cm3, 1383 * cm3},
    };
    for (const auto& row : rows) {
        CAPTURE(row.name);
        const section s = lookup(row.name);
        const section c = computed(row.name);
        CHECK(*s.area == *c.area);  // the catalogue uses the computed value
        CHECK(s.I == c.I);
        CHECK(rel_diff(*s.area, row.A) <= 0.001);
        CHECK(rel_diff(s.I, row.I) <= 0.001);
        CHECK(rel_diff(*s.W_el, row.W_el) <= std::max(0.001, 0.5 * cm3 / row.W_el));
        CHECK(rel_diff(*s.W_pl, row.W_pl) <= std::max(0.001, 0.5 * cm3 / row.W_pl));
    }
}

TEST_CASE("every catalogue row computed from its dimensions reproduces its tabulated A and Iy (from memory)")
{
    // A transcription guard for the whole catalogue: a mistyped dimension
    // moves A or Iy by more than the rounding of the tables.
    // European rows: EN 10365:2017 (from memory), tolerance 0.5 %.
    // W rows: AISC Manual Table 1-1 (from memory), tolerance 1 %: the table
    // lists rounded decimal dimensions (d to 0.1 in) while its properties come
    // from the unrounded ones, and r = k_des - tf is an equivalent radius.
    struct row {
        const char* name;
        double A, I;  // cm2, cm4 for European rows; in2, in4 for W rows
    };
    const row european[] = {
        {"IPE 80", 7.64, 80.1},      {"IPE 100", 10.3, 171},      {"IPE 120", 13.2, 318},
        {"IPE 140", 16.4, 541},      {"IPE 160", 20.1, 869},      {"IPE 180", 23.9, 1317},
        {"IPE 200", 28.5, 1943},     {"IPE 220", 33.4, 2772},     {"IPE 240", 39.1, 3892},
        {"IPE 270", 45.9, 5790},     {"IPE 300", 53.8, 8356},     {"IPE 330", 62.6, 11770},
        {"IPE 360", 72.7, 16270},    {"IPE 400", 84.5, 23130},    {"IPE 450", 98.8, 33740},
        {"IPE 500", 116, 48200},     {"IPE 550", 134, 67120},     {"IPE 600", 156, 92080},
        {"HE 100 A", 21.2, 349},     {"HE 120 A", 25.3, 606},     {"HE 140 A", 31.4, 1033},
        {"HE 160 A", 38.8, 1673},    {"HE 180 A", 45.3, 2510},    {"HE 200 A", 53.8, 3692},
        {"HE 220 A", 64.3, 5410},    {"HE 240 A", 76.8, 7763},    {"HE 260 A", 86.8, 10450},
        {"HE 280 A", 97.3, 13670},   {"HE 300 A", 112.5, 18260},  {"HE 320 A", 124.4, 22930},
        {"HE 340 A", 133.5, 27690},  {"HE 360 A", 142.8, 33090},  {"HE 400 A", 159, 45070},
        {"HE 450 A", 178, 63720},    {"HE 500 A", 197.5, 86970},  {"HE 550 A", 211.8, 111900},
        {"HE 600 A", 226.5, 141200}, {"HE 100 B", 26.0, 450},     {"HE 120 B", 34.0, 864},
        {"HE 140 B", 43.0, 1509},    {"HE 160 B", 54.3, 2492},    {"HE 180 B", 65.3, 3831},
        {"HE 200 B", 78.1, 5696},    {"HE 220 B", 91.0, 8091},    {"HE 240 B", 106, 11260},
        {"HE 260 B", 118.4, 14920},  {"HE 280 B", 131.4, 19270},  {"HE 300 B", 149.1, 25170},
        {"HE 320 B", 161.3, 30820},  {"HE 340 B", 170.9, 36660},  {"HE 360 B", 180.6, 43190},
        {"HE 400 B", 197.8, 57680},  {"HE 450 B", 218, 79890},    {"HE 500 B", 238.6, 107200},
        {"HE 550 B", 254.1, 136700}, {"HE 600 B", 270, 171000},
    };
    const row w_shapes[] = {
        {"W8x10", 2.96, 30.8},  {"W8x18", 5.26, 61.9},  {"W10x12", 3.54, 53.8},  {"W10x22", 6.49, 118},
        {"W12x14", 4.16, 88.6}, {"W12x26", 7.65, 204},  {"W14x22", 6.49, 199},   {"W14x30", 8.85, 291},
        {"W16x26", 7.68, 301},  {"W16x31", 9.13, 375},  {"W16x40", 11.8, 518},   {"W18x35", 10.3, 510},
        {"W18x50", 14.7, 800},  {"W21x44", 13.0, 843},  {"W21x50", 14.7, 984},   {"W24x55", 16.2, 1350},
        {"W24x68", 20.1, 1830}, {"W27x84", 24.8, 2850}, {"W30x99", 29.1, 3990},  {"W33x118", 34.7, 5900},
    };
    for (const auto& r : european) {
        CAPTURE(r.name);
        const section s = computed(r.name);
        CHECK(rel_diff(*s.area, r.A * cm2) <= 0.005);
        CHECK(rel_diff(s.I, r.I * cm4) <= 0.005);
    }
    for (const auto& r : w_shapes) {
        CAPTURE(r.name);
        const section s = computed(r.name);
        CHECK(rel_diff(*s.area, r.A * in2) <= 0.01);
        CHECK(rel_diff(s.I, r.I * in4) <= 0.01);
    }
    // Every catalogue row is covered by one of the two tables above.
    CHECK(catalogue().size() == std::size(european) + std::size(w_shapes));
}

namespace {

// Width of the I-section outline at height y above the major axis, with the
// root fillets drawn as circular arcs tangent to web and flange.
double outline_width(const section_dimensions& d, double y)
{
    const double a = std::abs(y);
    const double hw2 = d.h / 2.0 - d.tf;  // inner flange face
    if (a >= hw2) return d.b;
    const double s = hw2 - a;  // distance below the inner flange face
    if (s >= d.r) return d.tw;
    const double c = d.r - s;
    return d.tw + 2.0 * (d.r - std::sqrt(d.r * d.r - c * c));
}

struct integrated {
    double A, I, W_pl;
};

// Midpoint strips across the half depth, each region (web, fillet zone,
// flange) with its own strips so that no strip straddles a kink.
integrated strip_integration(const section_dimensions& d, int strips_per_region)
{
    const double hw2 = d.h / 2.0 - d.tf;
    const double edges[4] = {0.0, hw2 - d.r, hw2, d.h / 2.0};
    integrated out{0, 0, 0};
    for (int k = 0; k < 3; ++k) {
        const double dy = (edges[k + 1] - edges[k]) / strips_per_region;
        for (int i = 0; i < strips_per_region; ++i) {
            const double y = edges[k] + (i + 0.5) * dy;
            const double w = outline_width(d, y);
            out.A += 2.0 * w * dy;
            out.I += 2.0 * w * y * y * dy;
            out.W_pl += 2.0 * w * y * dy;
        }
    }
    return out;
}

}  // namespace

TEST_CASE("closed forms against strip integration of the outline [strips] - tolerance 1e-6")
{
    // Independent numerical check: the width of the real outline (arcs of
    // radius r) integrated with 1e5 midpoint strips per region, so the
    // fillet terms Af, centroid and If of the closed forms are not used.
    // The midpoint rule error with 1e5 strips is far below 1e-6.
    for (const char* name : {"IPE 300", "HE 300 A", "HE 600 B", "W18x35", "IPE 80"}) {
        CAPTURE(name);
        const section s = computed(name);
        section_dimensions d{name, s.depth, *s.flange_width, *s.web_thickness, *s.flange_thickness, *s.root_radius};
        const integrated n = strip_integration(d, 100000);
        CHECK(rel_diff(*s.area, n.A) <= 1e-6);
        CHECK(rel_diff(s.I, n.I) <= 1e-6);
        CHECK(rel_diff(*s.W_pl, n.W_pl) <= 1e-6);
    }
}

TEST_CASE("closed forms against exact integrals by python3-sympy [sympy] - tolerance 1e-12")
{
    // Independent symbolic check of IPE 300 (h 300, b 150, tw 7.1, tf 10.7,
    // r 15 mm): sympy integrates the outline width exactly over the half depth.
    const std::string python = "/usr/bin/python3";
    const std::string probe = python + " -c 'import sympy' >/dev/null 2>&1";
    if (std::system(probe.c_str()) != 0) {
        MESSAGE("skipped: " << python << " with sympy is not available");
        return;
    }
    const std::string script =
        "from sympy import *\n"
        "y = symbols(\"y\", real=True)\n"
        "h, b, tw, tf, r = Integer(300), Integer(150), Rational(71, 10), Rational(107, 10), Integer(15)\n"
        "a = h/2 - tf - r\n"
        "pieces = [(tw, 0, a), (tw + 2*(r - sqrt(r**2 - (y - a)**2)), a, h/2 - tf), (b, h/2 - tf, h/2)]\n"
        "A = 2*sum(integrate(w, (y, lo, hi)) for w, lo, hi in pieces)\n"
        "I = 2*sum(integrate(w*y**2, (y, lo, hi)) for w, lo, hi in pieces)\n"
        "Z = 2*sum(integrate(w*y, (y, lo, hi)) for w, lo, hi in pieces)\n"
        "print(N(A, 20), N(I, 20), N(Z, 20))\n";
    const std::string command = python + " -c '" + script + "' 2>&1";
    FILE* pipe = popen(command.c_str(), "r");
    REQUIRE(pipe != nullptr);
    std::string output;
    char buffer[256];
    while (std::fgets(buffer, sizeof buffer, pipe) != nullptr) output += buffer;
    const int status = pclose(pipe);
    CAPTURE(output);
    REQUIRE(status == 0);
    std::istringstream in_stream(output);
    double A_mm2 = 0, I_mm4 = 0, Z_mm3 = 0;
    REQUIRE(static_cast<bool>(in_stream >> A_mm2 >> I_mm4 >> Z_mm3));

    const section s = rolled_i_section({"IPE 300", 0.300, 0.150, 0.0071, 0.0107, 0.015});
    CHECK(rel_diff(*s.area, A_mm2 * 1e-6) <= 1e-12);
    CHECK(rel_diff(s.I, I_mm4 * 1e-12) <= 1e-12);
    CHECK(rel_diff(*s.W_pl, Z_mm3 * 1e-9) <= 1e-12);
}

TEST_CASE("identities of the closed forms (common practice - no source)")
{
    const section s = lookup("IPE 400");
    // Wel,y = Iy / (h/2), exactly.
    CHECK(*s.W_el == doctest::Approx(s.I / (s.depth / 2.0)).epsilon(1e-15));
    // Without fillets the forms reduce to the three-rectangle section.
    const section p = rolled_i_section({"plain", 0.4, 0.18, 0.0086, 0.0135, 0.0});
    const double hw = 0.4 - 2 * 0.0135;
    CHECK(*p.area == doctest::Approx(2 * 0.18 * 0.0135 + hw * 0.0086).epsilon(1e-14));
    CHECK(p.I == doctest::Approx((0.18 * 0.4 * 0.4 * 0.4 - (0.18 - 0.0086) * hw * hw * hw) / 12).epsilon(1e-14));
    // Section fields are carried through.
    CHECK(s.name == "IPE 400");
    CHECK(s.depth == doctest::Approx(0.400).epsilon(1e-15));
    CHECK(*s.flange_width == doctest::Approx(0.180).epsilon(1e-15));
    CHECK(*s.web_thickness == doctest::Approx(0.0086).epsilon(1e-15));
    CHECK(*s.flange_thickness == doctest::Approx(0.0135).epsilon(1e-15));
    CHECK(*s.root_radius == doctest::Approx(0.021).epsilon(1e-15));
}

TEST_CASE("catalogue content and unit conversion")
{
    int ipe = 0, hea = 0, heb = 0, w = 0;
    for (const auto& d : catalogue()) {
        if (d.name.rfind("IPE ", 0) == 0) ++ipe;
        else if (d.name.rfind("HE ", 0) == 0 && d.name.back() == 'A') ++hea;
        else if (d.name.rfind("HE ", 0) == 0 && d.name.back() == 'B') ++heb;
        else if (d.name.rfind("W", 0) == 0) ++w;
    }
    CHECK(ipe == 18);
    CHECK(hea == 19);
    CHECK(heb == 19);
    CHECK(w == 20);
    // mm rows are stored in metres; in rows use 1 in = 25.4 mm exactly.
    const section ipe300 = lookup("IPE 300");
    CHECK(ipe300.depth == doctest::Approx(0.300).epsilon(1e-15));
    const section w18 = lookup("W18x35");
    CHECK(w18.depth == doctest::Approx(17.7 * 0.0254).epsilon(1e-15));
    CHECK(*w18.root_radius == doctest::Approx((0.827 - 0.425) * 0.0254).epsilon(1e-12));
}

TEST_CASE("catalogue lookup spellings")
{
    struct spelling {
        const char* asked;
        const char* listed;
    };
    const spelling cases[] = {
        {"IPE300", "IPE 300"},   {"IPE 300", "IPE 300"},   {"ipe 300", "IPE 300"},   {" IPE  300 ", "IPE 300"},
        {"HE 300 A", "HE 300 A"}, {"HEA300", "HE 300 A"},  {"HEA 300", "HE 300 A"},  {"HE300A", "HE 300 A"},
        {"hea300", "HE 300 A"},  {"HE A 300", "HE 300 A"}, {"HE 300 B", "HE 300 B"}, {"HEB300", "HE 300 B"},
        {"HE300B", "HE 300 B"},  {"W18x35", "W18x35"},     {"W 18 X 35", "W18x35"},  {"W18X35", "W18x35"},
        {"w18x35", "W18x35"},
    };
    for (const auto& c : cases) {
        CAPTURE(c.asked);
        const auto s = find_catalogue_section(c.asked);
        REQUIRE(s.has_value());
        CHECK(s->name == c.listed);
    }
    // Not listed, or not a section name at all.
    for (const char* absent : {"IPE 310", "HE 300 M", "HEC300", "W18x36", "", "   ", "300", "IPE"}) {
        CAPTURE(absent);
        CHECK_FALSE(find_catalogue_section(absent).has_value());
    }
    // HE A and HE B of the same size are different sections.
    CHECK(lookup("HEA 300").I < lookup("HEB 300").I);
}

TEST_CASE("invalid dimensions are rejected with a message naming the dimension")
{
    struct bad {
        section_dimensions d;
        const char* expected_in_message;
    };
    const double nan = std::nan("");
    const bad cases[] = {
        {{"t", 0.0, 0.15, 0.0071, 0.0107, 0.015}, "depth h"},
        {{"t", -0.3, 0.15, 0.0071, 0.0107, 0.015}, "depth h"},
        {{"t", nan, 0.15, 0.0071, 0.0107, 0.015}, "depth h"},
        {{"t", 0.3, 0.0, 0.0071, 0.0107, 0.015}, "flange width b"},
        {{"t", 0.3, 0.15, 0.0, 0.0107, 0.015}, "web thickness tw"},
        {{"t", 0.3, 0.15, 0.0071, -0.01, 0.015}, "flange thickness tf"},
        {{"t", 0.3, 0.15, 0.0071, 0.0107, -0.001}, "root radius r"},
        {{"t", 0.3, 0.15, 0.0071, 0.0107, HUGE_VAL}, "root radius r"},
        {{"t", 0.3, 0.15, 0.16, 0.0107, 0.0}, "web thickness tw"},
        {{"t", 0.3, 0.15, 0.0071, 0.15, 0.0}, "2*tf"},
        {{"t", 0.3, 0.15, 0.0071, 0.0107, 0.08}, "tw + 2*r"},
        {{"t", 0.1, 0.15, 0.0071, 0.0107, 0.04}, "2*(tf + r)"},
    };
    for (const auto& c : cases) {
        CAPTURE(c.expected_in_message);
        try {
            (void)rolled_i_section(c.d);
            FAIL("accepted invalid dimensions");
        } catch (const std::invalid_argument& e) {
            CHECK(std::string(e.what()).find(c.expected_in_message) != std::string::npos);
            CHECK(std::string(e.what()).find("section 't'") != std::string::npos);
        }
    }
}

TEST_CASE("a malformed catalogue line is an internal error naming the line")
{
    struct bad {
        const char* text;
        const char* expected_in_message;
    };
    const std::string header = "# comment\nname,unit,h,b,tw,tf,r\n";
    const bad cases[] = {
        {"IPE 300,mm,300,150,7.1,10.7\n", "line 3, column 1: expected 7 fields"},
        {"IPE 300,cm,300,150,7.1,10.7,15\n", "line 3, column 2: expected unit"},
        {"IPE 300,mm,300,150,7.1,abc,15\n", "line 3, column 6: expected a positive number for tf, found 'abc'"},
        {"IPE 300,mm,300,150,,10.7,15\n", "line 3, column 5"},
        {"IPE 300,mm,300,150,7.1,10.7,-15\n", "line 3, column 7"},
        {"IPE 300,mm,300,150,7.1,10.7,15x\n", "line 3, column 7"},
        {"IPE 300,mm,30,150,7.1,10.7,15\n", "line 3, column 1: section 'IPE 300'"},
        {"IPE 300,mm,300,150,7.1,10.7,15\n\nIPE300,mm,300,150,7.1,10.7,15\n", "line 5, column 1: section 'IPE300' is listed twice"},
        {",mm,300,150,7.1,10.7,15\n", "line 3, column 1: expected a section name"},
    };
    for (const auto& c : cases) {
        CAPTURE(c.text);
        try {
            (void)detail::parse_section_catalogue(header + c.text);
            FAIL("accepted a malformed catalogue");
        } catch (const internal_error& e) {
            CHECK(std::string(e.what()).find(c.expected_in_message) != std::string::npos);
            CHECK(std::string(e.what()).find("section catalogue") != std::string::npos);
        }
    }
    CHECK_THROWS_AS(detail::parse_section_catalogue("name,h,b,tw,tf,r\nIPE 300,300,150,7.1,10.7,15\n"), internal_error);
    CHECK_THROWS_AS(detail::parse_section_catalogue("# only comments\n"), internal_error);
    // A well-formed text parses, in metres.
    const auto rows = detail::parse_section_catalogue(header + "IPE 300, mm, 300, 150, 7.1, 10.7, 15\r\n");
    REQUIRE(rows.size() == 1);
    CHECK(rows[0].name == "IPE 300");
    CHECK(rows[0].tw == doctest::Approx(0.0071).epsilon(1e-15));
}

TEST_CASE("unknown section names get the nearest catalogue names (common practice - no source): one edit away before two - none when nothing is near")
{
    CHECK(similar_catalogue_sections("IPE 301") == std::vector<std::string>{"IPE 300"});
    CHECK(similar_catalogue_sections("w18x36") == std::vector<std::string>{"W18x35"});
    CHECK(similar_catalogue_sections("HE300C") == std::vector<std::string>{"HE 300 A", "HE 300 B"});
    CHECK(similar_catalogue_sections("UB 305x165x40").empty());
    CHECK(similar_catalogue_sections("").empty());
    CHECK(unknown_section_text("IPE 301") == "found \"IPE 301\"; did you mean \"IPE 300\"?");
    CHECK(unknown_section_text("UB 305x165x40") == "found \"UB 305x165x40\"");
}
