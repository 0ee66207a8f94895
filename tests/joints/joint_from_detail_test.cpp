// The joint derived from its detail through a project file ("from-detail"):
// the derivation reaches the joint's range and moment resistance, each
// standard in its own terms, and the reader refuses what cannot be derived.
//
// Sources:
//   [T3.4]    EN 1993-1-8:2005 Table 3.4; a steel producer's published bolt table: M20 8.8
//             single shear 94.1 kN (reference pack 10.1).
//   [guide]   the simple-joints design guides' worked example, fin plate of 3 M20 8.8,
//             p1 = 70 mm, z = 60 mm: V_Rd = 173 kN (reference pack 10.2).
//   [J3.2]    AISC 360-16 J3.6, Table J3.2: 3/4 in A325-N phi r_n = 17.9 kips (pack 10.3).
//   [T3.3]    EN 1993-1-8 Table 3.3: e1, e2 >= 1.2 d0 (from memory).
//   [J3.4]    AISC 360-16 Table J3.4: 3/4 in bolt, 1 in minimum edge distance (from memory).
#include <doctest/doctest.h>

#include <cmath>
#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/joints/fin_plate.hpp"
#include "pinproof/joints/joint_from_detail.hpp"

using namespace pinproof;

namespace {
constexpr double mm = 1e-3, kN = 1e3, kip = 4448.2216152605;

// The worked example's fin plate on an IPE 300 (gap 10 + bolt line 50 = z 60 mm).
const std::string worked_detail = R"({"type": "fin-plate", "gap": "10 mm", "plate_top": "50 mm", "plate_depth": "210 mm",
    "plate_thickness": "10 mm", "bolt_diameter": "20 mm", "bolt_rows": 3, "bolt_pitch": "70 mm", "first_bolt": "35 mm",
    "bolt_line": "50 mm", "bolt_grade": "8.8"})";

std::string project_text(const std::string& joint, const std::string& standard = "EN1993-1-8",
                         const std::string& section = "IPE 300")
{
    return R"({"format": "pinproof-project/1", "title": "t", "standard": ")" + standard +
           R"(", "frame": "braced", "beams": [{"id": "B1", "span": "6 m", "section": ")" + section + R"(",
      "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m"}],
      "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35}}],
      "joints": {"start": )" + joint + R"(, "end": {"stiffness": "0 kN*m/rad"}}}]})";
}

project derived(const std::string& joint, const std::string& standard = "EN1993-1-8", const std::string& section = "IPE 300")
{
    project p = parse_project(project_text(joint, standard, section));
    derive_joints(p);
    return p;
}

const joint_component& component(const derived_joint& d, const std::string& id)
{
    for (const auto& c : d.components)
        if (c.id == id) return c;
    throw std::runtime_error("no component " + id);
}

// The first problem's pointer and message of a project that is refused.
input_problem refusal(const std::string& joint, const std::string& standard = "EN1993-1-8",
                      const std::string& section = "IPE 300")
{
    try {
        derived(joint, standard, section);
    } catch (const input_error& e) {
        return e.problems().front();
    }
    return {"", "accepted"};
}
}  // namespace

TEST_CASE("worked example through a project [T3.4] [guide]: 94.1 kN per bolt - bolt group 173 kN - rounding 0.05 and 0.5 kN")
{
    const project p = derived(R"({"stiffness": "from-detail", "moment_resistance": "from-detail", "detail": )" +
                              worked_detail + "}");
    const joint& j = p.beams[0].start;
    REQUIRE(j.derived);
    const auto& shear = component(*j.derived, "bolt-shear");
    CHECK(std::abs(*shear.per_bolt - 94.1 * kN) <= 0.05 * kN);
    CHECK(std::abs(*shear.resistance - 173 * kN) <= 0.5 * kN);
    CHECK(j.derived->basis == "EN 1993-1-8");
}

TEST_CASE("from-detail fills the range [hand]: 0.5 and 2 times the initial stiffness - the moment resistance the derived one - tol 1e-12")
{
    const project p = derived(R"({"stiffness": "from-detail", "moment_resistance": "from-detail", "detail": )" +
                              worked_detail + "}");
    const joint& j = p.beams[0].start;
    REQUIRE(j.derived);
    REQUIRE(j.derived->initial_stiffness);
    const double S = *j.derived->initial_stiffness;
    CHECK(S > 0);
    CHECK(j.range.min.value() == doctest::Approx(0.5 * S).epsilon(1e-12));
    CHECK(j.range.max.value() == doctest::Approx(2.0 * S).epsilon(1e-12));
    CHECK(*j.derived->stiffness_min == doctest::Approx(0.5 * S).epsilon(1e-12));
    CHECK(j.derived->scatter_default);
    REQUIRE(j.moment_resistance);
    CHECK(*j.moment_resistance == doctest::Approx(j.derived->moment_resistance).epsilon(1e-12));
    // The same as the fin plate derived directly (8.8 given; beam web S275 and plate S275 by default).
    fin_plate_inputs in;
    in.beam_steel.grade = steel_grade::s275;
    CHECK(derive_fin_plate(*j.detail, p.beams[0].sec, in).initial_stiffness == doctest::Approx(S).epsilon(1e-12));
}

TEST_CASE("stiffness_scatter [hand]: 0.8 and 1.25 times the initial stiffness - tol 1e-12")
{
    const project p = derived(R"({"stiffness": "from-detail", "stiffness_scatter": {"min": 0.8, "max": 1.25},
        "moment_resistance": "9 kN*m", "detail": )" + worked_detail + "}");
    const joint& j = p.beams[0].start;
    const double S = *j.derived->initial_stiffness;
    CHECK(j.range.min.value() == doctest::Approx(0.8 * S).epsilon(1e-12));
    CHECK(j.range.max.value() == doctest::Approx(1.25 * S).epsilon(1e-12));
    CHECK_FALSE(j.derived->scatter_default);
    CHECK(*j.moment_resistance == doctest::Approx(9 * kN).epsilon(1e-12));  // declared, kept
}

TEST_CASE("defaults are named [project rules]: bolt grade 8.8 - threads in the shear plane - S275 plate and web")
{
    const project p = derived(R"({"stiffness": {"min": "1 MN*m/rad", "max": "2 MN*m/rad"},
        "detail": {"type": "fin-plate", "bolt_rows": 3}})");
    const joint& j = p.beams[0].start;
    REQUIRE(j.derived);  // derived for the report and the checks, the stiffness stays the user's
    CHECK(j.range.min.value() == doctest::Approx(1e6));
    std::string all;
    for (const auto& d : j.derived->defaults) all += d + "; ";
    CHECK(all.find("bolt grade 8.8 (default)") != std::string::npos);
    CHECK(all.find("threads in the shear plane (default)") != std::string::npos);
    CHECK(all.find("plate S275 (default)") != std::string::npos);
    CHECK(all.find("beam web S275 (default)") != std::string::npos);
}

TEST_CASE("US project [J3.2]: 3/4 in A325-N 17.9 kips per bolt - AISC rules only - no stiffness derived - rounding 0.05 kips")
{
    const std::string us_detail = R"({"type": "fin-plate", "gap": "0.5 in", "plate_top": "3 in", "plate_depth": "9 in",
        "plate_thickness": "0.375 in", "bolt_diameter": "0.75 in", "hole_diameter": "0.8125 in", "bolt_rows": 3,
        "bolt_pitch": "3 in", "first_bolt": "1.5 in", "bolt_line": "2 in", "bolt_grade": "A325",
        "plate_grade": "A36"})";
    const project p = derived(R"({"stiffness": {"min": "1000 kip*in/rad", "max": "20000 kip*in/rad"},
        "moment_resistance": "from-detail", "detail": )" + us_detail + "}", "AISC360", "W18x35");
    const joint& j = p.beams[0].start;
    REQUIRE(j.derived);
    CHECK(j.derived->basis == "AISC 360-16");
    CHECK(std::abs(*component(*j.derived, "bolt-shear").per_bolt - 17.9 * kip) <= 0.05 * kip);
    CHECK_FALSE(j.derived->initial_stiffness);
    CHECK(*j.moment_resistance == doctest::Approx(j.derived->moment_resistance).epsilon(1e-12));
    // A stiffness cannot be derived under AISC 360.
    const auto r = refusal(R"({"stiffness": "from-detail", "detail": )" + us_detail + "}", "AISC360", "W18x35");
    CHECK(r.where == "/beams/0/joints/start/stiffness");
    CHECK(r.message.find("AISC 360 gives no component stiffness") != std::string::npos);
    // An EN bolt class in a US project is refused, naming the field.
    const auto g = refusal(R"({"stiffness": "1000 kip*in/rad", "detail": {"type": "fin-plate", "bolt_grade": "8.8"}})",
                           "AISC360", "W18x35");
    CHECK(g.where == "/beams/0/joints/start/detail/bolt_grade");
}

TEST_CASE("refusals name the field [T3.3] [J3.4] [project rules]")
{
    SUBCASE("a detail type not derived yet")
    {
        const auto r = refusal(R"({"stiffness": "from-detail", "detail": {"type": "web-cleats"}})");
        CHECK(r.where == "/beams/0/joints/start/detail/type");
        CHECK(r.message.find("derives fin plates (EN 1993-1-8 components") != std::string::npos);
    }
    SUBCASE("no detail")
    {
        CHECK(refusal(R"({"stiffness": "from-detail"})").where == "/beams/0/joints/start/stiffness");
    }
    SUBCASE("the plate's end distance below 1.2 d0 = 26.4 mm")
    {
        const auto r = refusal(R"({"stiffness": "from-detail", "detail": {"type": "fin-plate", "first_bolt": "25 mm",
            "bolt_rows": 3, "plate_depth": "190 mm"}})");
        CHECK(r.where == "/beams/0/joints/start/detail/first_bolt");
        CHECK(r.message.find("Table 3.3") != std::string::npos);
    }
    SUBCASE("edge distance given below 1.2 d0, with or without from-detail")
    {
        const auto r = refusal(R"({"stiffness": "1 MN*m/rad", "detail": {"type": "fin-plate", "edge_distance": "25 mm"}})");
        CHECK(r.where == "/beams/0/joints/start/detail/edge_distance");
        CHECK(r.message.find("Table 3.3") != std::string::npos);
    }
    SUBCASE("US edge distance below 1 in for a 3/4 in bolt")
    {
        const auto r = refusal(R"({"stiffness": "1000 kip*in/rad", "detail": {"type": "fin-plate",
            "bolt_diameter": "0.75 in", "edge_distance": "0.875 in"}})", "AISC360", "W18x35");
        CHECK(r.where == "/beams/0/joints/start/detail/edge_distance");
        CHECK(r.message.find("Table J3.4") != std::string::npos);
    }
    SUBCASE("a weld leg above the 10 mm plate")
    {
        const auto r = refusal(R"({"stiffness": "1 MN*m/rad", "detail": {"type": "fin-plate", "weld": {"leg": "12 mm"}}})");
        CHECK(r.where == "/beams/0/joints/start/detail/weld");
        CHECK(r.message.find("larger than the plate allows") != std::string::npos);
    }
    SUBCASE("stiffness_scatter without from-detail")
    {
        const auto r = refusal(R"({"stiffness": "1 MN*m/rad", "stiffness_scatter": {"min": 0.5, "max": 2}})");
        CHECK(r.where == "/beams/0/joints/start/stiffness_scatter");
    }
}

TEST_CASE("property: the derived stiffness grows with the number of bolt rows - nothing NaN [project rules]")
{
    double previous = 0;
    for (int rows = 2; rows <= 5; ++rows) {
        const std::string joint = R"({"stiffness": "from-detail", "moment_resistance": "from-detail",
            "detail": {"type": "fin-plate", "bolt_rows": )" + std::to_string(rows) + "}}";
        const project p = derived(joint, "EN1993-1-8", "IPE 500");
        const derived_joint& d = *p.beams[0].start.derived;
        CHECK(*d.initial_stiffness > previous);
        CHECK(std::isfinite(d.moment_resistance));
        CHECK(std::isfinite(d.shear_resistance));
        previous = *d.initial_stiffness;
    }
}

TEST_CASE("a law on a derived joint [project rules]: ec3-curve starts from the derived range and is capped at the derived resistance")
{
    const project p = derived(R"({"stiffness": "from-detail", "moment_resistance": "from-detail",
        "behaviour": {"law": "ec3-curve", "psi": 2.7}, "detail": )" + worked_detail + "}");
    const joint& j = p.beams[0].start;
    REQUIRE(j.behaviour);
    REQUIRE(j.derived);
    CHECK(j.range.min.value() == doctest::Approx(0.5 * *j.derived->initial_stiffness).epsilon(1e-12));
    CHECK(*j.moment_resistance == doctest::Approx(j.derived->moment_resistance).epsilon(1e-12));
    // A Richard-Abbott plastic stiffness above the derived lower bound is refused at its field.
    const auto r = refusal(R"({"stiffness": "from-detail", "moment_resistance": "from-detail",
        "behaviour": {"law": "richard-abbott", "reference_moment": "40 kN*m", "plastic_stiffness": "100 MN*m/rad", "shape": 2}, "detail": )" +
                           worked_detail + "}");
    CHECK(r.where == "/beams/0/joints/start/behaviour/plastic_stiffness");
}

namespace {
// The invented header plate of joints/end_plate_test.cpp through a project file.
const std::string end_plate_detail = R"({"type": "end-plate", "plate_top": "40 mm", "plate_depth": "220 mm",
    "plate_thickness": "10 mm", "bolt_diameter": "20 mm", "bolt_rows": 3, "bolt_pitch": "70 mm", "first_bolt": "40 mm",
    "gauge": "90 mm", "plate_width": "150 mm", "weld": {"throat": "4 mm"}, "bolt_grade": "8.8"})";
}  // namespace

TEST_CASE("end plate through a project [hand]: from-detail gives 0.5 and 2 times S_jini and M_jRd = 24.03 kN*m - rounding 0.01 kN*m")
{
    const project p = derived(R"({"stiffness": "from-detail", "moment_resistance": "from-detail", "detail": )" +
                              end_plate_detail + "}");
    const joint& j = p.beams[0].start;
    REQUIRE(j.derived);
    REQUIRE(j.derived->initial_stiffness);
    CHECK(std::abs(j.range.min.value() - 0.5 * *j.derived->initial_stiffness) <= 1e-9 * *j.derived->initial_stiffness);
    CHECK(std::abs(j.range.max.value() - 2 * *j.derived->initial_stiffness) <= 1e-9 * *j.derived->initial_stiffness);
    CHECK(std::abs(*j.moment_resistance - 24.03 * kN) <= 0.01 * kN);  // joints/end_plate_test.cpp
    CHECK(j.derived->tension_rows.size() == 3);
    CHECK(j.derived->rotation_capacity_adequate == std::optional<bool>(true));
    CHECK(j.derived->rotation_capacity_basis.find("6.4.2(2)") != std::string::npos);
    CHECK_FALSE(j.derived->rotation_capacity);  // the clause gives no value
    CHECK(component(*j.derived, "bolt-tension").per_bolt);
}

TEST_CASE("end plate defaults are named [project rules]: gauge 90 mm - width 150 mm - support ply - rigid support")
{
    const project p = derived(R"({"stiffness": "from-detail", "detail": {"type": "end-plate", "plate_depth": "220 mm",
        "bolt_rows": 3, "first_bolt": "40 mm"}})");
    const auto& defaults = p.beams[0].start.derived->defaults;
    const auto has = [&](const std::string& text) {
        for (const auto& s : defaults)
            if (s.find(text) != std::string::npos) return true;
        return false;
    };
    CHECK(has("gauge 90"));
    CHECK(has("plate width 150"));
    CHECK(has("support ply"));
    CHECK(has("k_4"));
    CHECK(has("no weld given"));
}

TEST_CASE("end plate refusals name the field [T3.3] [project rules]: US project - edge distance - bolt off the plate")
{
    auto r = refusal(R"({"stiffness": {"min": "300 kN*m/rad", "max": "1400 kN*m/rad"}, "moment_resistance": "from-detail",
        "detail": {"type": "end-plate"}})", "AISC360", "W18x35");
    CHECK(r.where == "/beams/0/joints/start/detail/type");
    CHECK(r.message.find("AISC 360 gives no component method") != std::string::npos);
    // (150 - 110)/2 = 20 mm < 1.2 x 22 = 26.4 mm.
    r = refusal(R"({"stiffness": "from-detail", "detail": {"type": "end-plate", "gauge": "110 mm", "plate_width": "150 mm"}})");
    CHECK(r.where == "/beams/0/joints/start/detail/plate_width");
    CHECK(r.message.find("Table 3.3") != std::string::npos);
    r = refusal(R"({"stiffness": "from-detail", "detail": {"type": "end-plate", "gauge": "100 mm", "plate_width": "110 mm"}})");
    CHECK(r.where == "/beams/0/joints/start/detail/plate_width");
    CHECK(r.message.find("does not fit the plate") != std::string::npos);
    r = refusal(R"({"stiffness": "from-detail", "detail": {"type": "end-plate", "gauge": "25 mm"}})");
    CHECK(r.where == "/beams/0/joints/start/detail/gauge");
    CHECK(r.message.find("does not fit the plate") != std::string::npos);
}

TEST_CASE("end plate without from-detail is derived for the report [project rules]: declared values kept")
{
    const project p = derived(R"({"stiffness": {"min": "1000 kN*m/rad", "max": "5000 kN*m/rad"}, "moment_resistance": "10 kN*m", "detail": )" +
                              end_plate_detail + "}");
    const joint& j = p.beams[0].start;
    REQUIRE(j.derived);
    CHECK(std::abs(*j.moment_resistance - 10 * kN) <= 1e-9);
}

TEST_CASE("end plate to a given column [T6.11] [project rules]: k4 of the column flange lowers S_jini - named in the defaults")
{
    const std::string with_column = R"({"stiffness": "from-detail", "column": {"section": "HE 200 B", "length_above": "3.5 m",
        "length_below": "3.5 m"}, "detail": )" + end_plate_detail + "}";
    const project p = derived(with_column);
    const project q = derived(R"({"stiffness": "from-detail", "detail": )" + end_plate_detail + "}");
    REQUIRE(p.beams[0].start.derived);
    CHECK(*p.beams[0].start.derived->initial_stiffness < *q.beams[0].start.derived->initial_stiffness);
    bool named = false;
    for (const auto& s : p.beams[0].start.derived->defaults) named = named || s.find("HE 200 B in bending (k_4") != std::string::npos;
    CHECK(named);
    bool component = false;
    for (const auto& c : p.beams[0].start.derived->components) component = component || c.id == "column-flange-t-stub";
    CHECK(component);
}
