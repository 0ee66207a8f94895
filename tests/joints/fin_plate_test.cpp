// A fin plate worked out from its detail, against the same formulas worked by
// hand for the mezzanine example's detail (3 M20 8.8 at 60 mm, 10 mm S275 plate
// 190 mm deep, first bolt 35 mm, bolt line 50 mm, gap 10 mm, IPE 300 S275 web 7.1 mm).
//
// Sources:
//   [T3.4]    EN 1993-1-8:2005 Table 3.4 (bolt shear and bearing), gamma_M2 = 1.25 (reference
//             pack 10.1).
//   [guide]   the simple-joints design guides' bolt group formula, beta = 6 z/(n (n + 1) p1)
//             (pack 10.2, confirmed).
//   [3.10.2]  EN 1993-1-8 3.10.2(3), block tearing under eccentric loading (from memory).
//   [T6.11]   EN 1993-1-8 Table 6.11, k_11 and k_12 (from memory; pack 2.3).
//   [EN10025] S275 f_y 275 MPa to 16 mm, f_u 410 MPa (EN 10025-2; from memory, pack 10.4).
#include <doctest/doctest.h>

#include <cmath>
#include <stdexcept>

#include "pinproof/joints/bolt_group.hpp"
#include "pinproof/joints/fin_plate.hpp"

using namespace pinproof;

namespace {
constexpr double mm = 1e-3, MPa = 1e6, kN = 1e3;

connection_detail mezzanine_fin_plate()
{
    connection_detail d;
    d.type = detail_type::fin_plate;
    d.support = support_type::column_flange;
    d.gap = 10 * mm;
    d.plate_top = 50 * mm;
    d.plate_depth = 190 * mm;
    d.plate_thickness = 10 * mm;
    d.grade = plate_grade::s275;
    d.bolts.diameter = 20 * mm;
    d.bolts.hole_diameter = 22 * mm;
    d.bolts.rows = 3;
    d.bolts.pitch = 60 * mm;
    d.bolts.first_bolt = 35 * mm;
    d.bolts.bolt_line = 50 * mm;
    return d;
}

section ipe300()
{
    return *find_catalogue_section("IPE 300");
}

fin_plate_inputs s275_beam()
{
    fin_plate_inputs in;
    in.beam_steel.grade = steel_grade::s275;
    return in;
}

const joint_component& of(const fin_plate_joint& j, const std::string& id)
{
    for (const auto& c : j.components)
        if (c.id == id) return c;
    throw std::runtime_error("no component " + id);
}

bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::abs(b); }
}  // namespace

TEST_CASE("bolt shear of the group [T3.4] [guide] [hand]: z = 60 mm - beta = 0.5 - V = 3 x 94.08/sqrt(1 + 1.5^2) kN - tol 1e-12")
{
    const fin_plate_joint j = derive_fin_plate(mezzanine_fin_plate(), ipe300(), s275_beam());
    CHECK(close(j.lever_arm, 0.060, 1e-12));
    const double Fv = 0.6 * 800 * MPa * 245 * mm * mm / 1.25;
    CHECK(close(*of(j, "bolt-shear").per_bolt, Fv, 1e-12));
    CHECK(close(*of(j, "bolt-shear").resistance, 3 * Fv / std::sqrt(1 + 1.5 * 1.5), 1e-12));
}

TEST_CASE("bearing [T3.4] [hand]: plate 84.2 kN horizontally - web 74.7 kN horizontally - tol 1e-12")
{
    const fin_plate_joint j = derive_fin_plate(mezzanine_fin_plate(), ipe300(), s275_beam());
    // Plate, horizontal: alpha_d = e2/(3 d0) = 40/66 (e2 = 2d by default), k1 = 1.4 p1/d0 - 1.7 = 1.4*60/22 - 1.7;
    // vertical: alpha_d = e1/(3 d0) = 35/66, k1 = 2.5: 2.5 * 35/66 = 1.326 > 2.118 * 0.6061 = 1.284.
    const double plate = (1.4 * 60 / 22 - 1.7) * (40.0 / 66) * 410 * MPa * 20 * mm * 10 * mm / 1.25;
    CHECK(close(*of(j, "bolt-bearing-plate").per_bolt, plate, 1e-12));
    CHECK(j.plate_edge_distance_default);
    // Web 7.1 mm, horizontal: alpha_d = 50/66, k1 = 1.4*60/22 - 1.7; vertical: alpha_d = 60/66 - 1/4, k1 = 2.5.
    const double web = (1.4 * 60 / 22 - 1.7) * (50.0 / 66) * 410 * MPa * 20 * mm * 7.1 * mm / 1.25;
    CHECK(close(*of(j, "bolt-bearing-web").per_bolt, web, 1e-12));
    CHECK(std::abs(web - 74.74 * kN) <= 0.01 * kN);
}

TEST_CASE("moment resistance [hand]: the web's bearing governs - 74.74 kN x 2 (60 mm)^2/60 mm = 8.97 kN*m - tol 1e-12")
{
    const fin_plate_joint j = derive_fin_plate(mezzanine_fin_plate(), ipe300(), s275_beam());
    CHECK(j.moment_governing == "bolt-bearing-web");
    CHECK(close(j.moment_resistance, *of(j, "bolt-bearing-web").per_bolt * 0.12, 1e-12));
    CHECK(j.moment_resistance < 18 * kN);  // the example's declared 18 kN*m is not reached by the bolts
}

TEST_CASE("plate shear and block tearing [3.10.2] [hand] - tol 1e-12")
{
    const fin_plate_joint j = derive_fin_plate(mezzanine_fin_plate(), ipe300(), s275_beam());
    const double gross = 190 * mm * 10 * mm * 275 * MPa / (1.27 * std::sqrt(3.0));
    const double net = (190 - 3 * 22) * mm * 10 * mm * 410 * MPa / (std::sqrt(3.0) * 1.25);
    CHECK(close(*of(j, "plate-shear").resistance, std::min(gross, net), 1e-12));
    const double Ant = 10 * mm * (40 - 11) * mm, Anv = 10 * mm * (190 - 35 - 2.5 * 22) * mm;
    CHECK(close(*of(j, "plate-block-tearing").resistance, 0.5 * 410 * MPa * Ant / 1.25 + 275 * MPa * Anv / std::sqrt(3.0),
                1e-12));
    // h_p = 190 mm >= 2.73 z = 163.8 mm: bending not critical.
    CHECK_FALSE(of(j, "plate-bending").resistance);
    CHECK_FALSE(of(j, "weld").resistance);  // no weld size given: not derived
}

TEST_CASE("stiffness [T6.11] [hand]: k11 and k12 of plate and web in series times sum r^2 - free rotation 2/60 - tol 1e-12")
{
    const fin_plate_joint j = derive_fin_plate(mezzanine_fin_plate(), ipe300(), s275_beam());
    const double E = 210e9;
    const double k11 = 16 * 0.02 * 0.02 * 800e6 / (E * 0.016);
    // Plate: e_b = min(35, 40) = 35 mm: k_b1 = 0.25*35/20 + 0.5 = 0.9375, k_b2 = 0.25*60/20 + 0.375 = 1.125,
    // k_t = 1.5*10/16 = 0.9375. Web: e_b = 50: k_b1 = 1.125, k_b2 = 1.125, k_t = 1.5*7.1/16 = 0.665625.
    const double k12p = 24 * 0.9375 * 0.9375 * 0.02 * 410e6 / E;
    const double k12w = 24 * 1.125 * 0.665625 * 0.02 * 410e6 / E;
    const double k = E / (1 / k11 + 1 / k12p + 1 / k12w);
    CHECK(close(j.initial_stiffness, k * 2 * 0.06 * 0.06, 1e-12));
    CHECK(close(j.free_rotation, 2.0 / 60.0, 1e-12));
}

TEST_CASE("property: resistances grow with the plate thickness and the bolt diameter - nothing NaN [project rules]")
{
    double previous_bearing = 0, previous_shear = 0;
    for (double t : {6.0, 8.0, 10.0, 12.0, 15.0}) {
        connection_detail d = mezzanine_fin_plate();
        d.plate_thickness = t * mm;
        const fin_plate_joint j = derive_fin_plate(d, ipe300(), s275_beam());
        CHECK(*of(j, "bolt-bearing-plate").resistance > previous_bearing);
        CHECK(*of(j, "plate-shear").resistance > previous_shear);
        CHECK(std::isfinite(j.initial_stiffness));
        previous_bearing = *of(j, "bolt-bearing-plate").resistance;
        previous_shear = *of(j, "plate-shear").resistance;
    }
    double previous = 0;
    for (double dia : {16.0, 20.0, 24.0}) {
        connection_detail d = mezzanine_fin_plate();
        d.bolts.diameter = dia * mm;
        d.bolts.hole_diameter = (dia + 2) * mm;
        const fin_plate_joint j = derive_fin_plate(d, ipe300(), s275_beam());
        CHECK(*of(j, "bolt-shear").resistance > previous);
        previous = *of(j, "bolt-shear").resistance;
    }
    double previous_S = 0;
    for (int rows : {2, 3, 4}) {
        connection_detail d = mezzanine_fin_plate();
        d.bolts.rows = rows;
        d.plate_depth = (70 + 60 * (rows - 1)) * mm;
        const fin_plate_joint j = derive_fin_plate(d, ipe300(), s275_beam());
        CHECK(j.initial_stiffness > previous_S);
        previous_S = j.initial_stiffness;
    }
}

TEST_CASE("a bolt outside the plate or a US bolt grade is refused [project rules]")
{
    connection_detail d = mezzanine_fin_plate();
    d.plate_depth = 150 * mm;  // the third row at 155 mm falls outside
    CHECK_THROWS_AS(derive_fin_plate(d, ipe300(), s275_beam()), std::invalid_argument);
    fin_plate_inputs us = s275_beam();
    us.bolts = bolt_grade::a325;
    CHECK_THROWS_AS(derive_fin_plate(mezzanine_fin_plate(), ipe300(), us), std::invalid_argument);
}

// ---------------------------------------------------------------------------
// US single plate (AISC 360-16): an invented W16x31 detail, 3 bolts 3/4 in A325-N
// at 3 in, 3/8 in A36 plate 9 in deep, first bolt 1.5 in, bolt line 2 in, gap 1/2 in,
// standard holes 13/16 in. Each strength worked by hand from the clause
// (AISC 360-16 J3.6, J3.10, J4.2, J4.3, G2.1; from memory) in the test.

namespace {
constexpr double in_ = 0.0254, ksi = 6.894757293168361e6, kip = 4448.2216152605;

connection_detail us_single_plate()
{
    connection_detail d;
    d.type = detail_type::fin_plate;
    d.gap = 0.5 * in_;
    d.plate_top = 2 * in_;
    d.plate_depth = 9 * in_;
    d.plate_thickness = 0.375 * in_;
    d.bolts.diameter = 0.75 * in_;
    d.bolts.hole_diameter = 0.8125 * in_;
    d.bolts.rows = 3;
    d.bolts.pitch = 3 * in_;
    d.bolts.first_bolt = 1.5 * in_;
    d.bolts.bolt_line = 2 * in_;
    return d;
}

const joint_component& of_us(const single_plate_joint& j, const std::string& id)
{
    for (const auto& c : j.components)
        if (c.id == id) return c;
    throw std::runtime_error("no component " + id);
}
}  // namespace

TEST_CASE("US single plate [J3.6] [J3.10] [hand]: bolt 17.9 kips - bearing on the plate 0.75 x 1.2 x 1.0938 x 0.375 x 58 kips - tol 1e-9")
{
    single_plate_inputs in;
    in.weld_leg = 0.25 * in_;
    const single_plate_joint j = derive_single_plate(us_single_plate(), *find_catalogue_section("W16x31"), in);
    CHECK(std::abs(*of_us(j, "bolt-shear").per_bolt - 0.75 * 54 * ksi * M_PI * 0.75 * 0.75 / 4 * in_ * in_) <= 1e-6);
    // Plate, edge distance 1.5 d = 1.125 in: horizontal l_c = 1.125 - 0.40625 = 0.71875 in governs
    // over the bottom end (9 - 1.5 - 6 = 1.5 in, l_c = 1.09375 in) and the pitch (3 - 0.8125 in).
    const double rb = 0.75 * 1.2 * 0.71875 * 0.375 * 58 * kip;
    CHECK(std::abs(*of_us(j, "bolt-bearing-plate").per_bolt / rb - 1) <= 1e-9);
    // Shear yielding 0.6 * 36 * 9 * 0.375 = 72.9 kips; rupture 0.75 * 0.6 * 58 * (9 - 3 * 0.8125) * 0.375 = 64.3 kips.
    CHECK(std::abs(*of_us(j, "plate-shear").resistance / (0.75 * 0.6 * 58 * (9 - 3 * 0.8125) * 0.375 * kip) - 1) <= 1e-9);
    // z = 2.5 in is within 3 1/2 in; 3/8 in <= 3/8 + 1/16 in; the 1/4 in weld >= 5/8 x 3/8 = 0.234 in.
    CHECK(j.limits_exceeded.empty());
}

TEST_CASE("US single plate [reference pack 10.3]: the conventional limits are reported - EN bolts refused")
{
    connection_detail d = us_single_plate();
    d.plate_thickness = 0.5 * in_;  // > 3/8 + 1/16 in
    d.bolts.bolt_line = 3.5 * in_;  // z = 4 in > 3 1/2 in
    single_plate_inputs in;
    in.weld_leg = 0.25 * in_;       // < 5/8 x 1/2 in
    const single_plate_joint j = derive_single_plate(d, *find_catalogue_section("W16x31"), in);
    CHECK(j.limits_exceeded.size() == 3);
    in.bolts = bolt_grade::g8_8;
    CHECK_THROWS_AS(derive_single_plate(us_single_plate(), *find_catalogue_section("W16x31"), in),
                    std::invalid_argument);
}
