// Verification of the detail catalogue reader.
//
// Sources:
//   [SI]   SI Brochure, 9th ed. (BIPM 2019), Table 7: prefix k = 1e3, M = 1e6
//          (exact conversions of the catalogue's units).
//   [EN]   EN 1993-1-8:2005 5.2.2.5(1): stiffness boundaries in terms of
//          S_j,ini L_b / (E I_b), the form "k EI/L" of a relative stiffness.
//   [RFC]  RFC 6901, JSON Pointer, for the places of problems.
// Tolerances: exact (==) where the value is a product of exact factors,
// otherwise relative 1e-12.
#include <doctest/doctest.h>

#include <nlohmann/json.hpp>

#include <string>

#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/io/project_input.hpp"

using namespace pinproof;
using json = nlohmann::json;

namespace {

std::vector<input_problem> problems_of(const std::string& text)
{
    try {
        parse_detail_catalogue(text);
    } catch (const input_error& e) {
        return e.problems();
    }
    return {};
}

bool has_problem_at(const std::vector<input_problem>& ps, const std::string& where, const std::string& part = "")
{
    for (const auto& p : ps)
        if (p.where == where && p.message.find(part) != std::string::npos) return true;
    return false;
}

const char* const small_catalogue = R"({
  "format": "pinproof-details/1",
  "title": "test",
  "details": [
    { "id": "FP-3-M20", "type": "fin-plate", "stiffness": { "min": "300 kN*m/rad", "max": "1.4 MN*m/rad" },
      "moment_resistance": "18 kN*m", "geometry": { "gap": "20 mm", "bolt_rows": 3 } },
    { "id": "SL-1", "type": "fin-plate", "stiffness": { "min": "0.05 EI/L", "max": "0.3 EI/L" },
      "stiffness_distribution": { "kind": "lognormal", "median": "0.15 EI/L", "cov": 0.3 } },
    { "id": "R", "type": "end-plate", "stiffness": "rigid" },
    { "id": "P", "type": "web-cleats", "stiffness": 0 }
  ]
})";

}  // namespace

TEST_CASE("catalogue: absolute stiffness and moment resistance in SI [SI prefixes k and M] - exact")
{
    const detail_catalogue c = parse_detail_catalogue(small_catalogue);
    REQUIRE(c.details.size() == 4);
    const catalogue_detail* d = c.find("FP-3-M20");
    REQUIRE(d != nullptr);
    CHECK(d->type == "fin-plate");
    const joint j = joint_for_beam(*d, 1.0e7, 6.0);
    CHECK(j.range.min.value() == 300e3);
    CHECK(j.range.max.value() == 1.4e6);
    REQUIRE(j.moment_resistance.has_value());
    CHECK(*j.moment_resistance == 18e3);
    // The geometry is kept as written, for the connection-detail reader.
    CHECK(d->geometry.at("gap") == "20 mm");
    CHECK(d->geometry.at("bolt_rows") == 3);
    CHECK(c.find("fp-3-m20") == nullptr);  // ids match exactly
}

TEST_CASE("catalogue: relative stiffness resolved per beam as k EI/L [EN 1993-1-8 5.2.2.5] - tol 1e-12")
{
    const detail_catalogue c = parse_detail_catalogue(small_catalogue);
    const catalogue_detail* d = c.find("SL-1");
    REQUIRE(d != nullptr);
    for (const auto& [EI, span] : {std::pair{210e9 * 8356e-8, 6.0}, std::pair{210e9 * 23130e-8, 8.0}}) {
        const joint j = joint_for_beam(*d, EI, span);
        CHECK(j.range.min.value() == doctest::Approx(0.05 * EI / span).epsilon(1e-12));
        CHECK(j.range.max.value() == doctest::Approx(0.3 * EI / span).epsilon(1e-12));
        CHECK_FALSE(j.moment_resistance.has_value());
    }
    CHECK(d->stiffness_distribution.at("kind") == "lognormal");
    CHECK(joint_for_beam(*c.find("R"), 1e7, 6).range.max.is_rigid());
    CHECK(joint_for_beam(*c.find("P"), 1e7, 6).range.max.is_pinned());
}

TEST_CASE("catalogue: the shipped example reads without problems [common practice and no source] - exact")
{
    const detail_catalogue c =
        load_detail_catalogue_file(std::string(PINPROOF_SOURCE_DIR) + "/catalog-examples/details-harbour-lane.json");
    CHECK(c.details.size() >= 10);
    REQUIRE(c.find("FP-3-M20") != nullptr);
    CHECK(c.find("FP-3-M20")->type == "fin-plate");
    CHECK(c.find("FP-3-M20")->geometry.is_object());
}

TEST_CASE("catalogue: problems carry their JSON pointer [RFC 6901]")
{
    const auto ps = problems_of(R"({
      "format": "pinproof-details/1",
      "details": [
        { "id": "A", "type": "fin-plate", "stiffness": { "min": "25 kN*m", "max": "1 MN*m/rad" } },
        { "id": "A", "type": "gusset", "stiffness": { "min": "2 MN*m/rad", "max": "1 MN*m/rad" } },
        { "id": "B", "type": "fin-plate", "stiffness": { "min": "0.1 EI/L", "max": "1 MN*m/rad" }, "colour": 1 },
        { "id": "C", "type": "fin-plate", "stiffness": "-0.5 EI/L", "moment_resistance": "-3 kN*m" },
        { "id": "D", "type": "fin-plate", "stiffness": 1000, "geometry": "deep" }
      ]
    })");
    CHECK(has_problem_at(ps, "/details/0/stiffness/min", "rotational stiffness"));
    CHECK(has_problem_at(ps, "/details/1/id", "unique"));
    CHECK(has_problem_at(ps, "/details/1/type", "\"gusset\""));
    CHECK(has_problem_at(ps, "/details/1/stiffness/min", "not above max"));
    CHECK(has_problem_at(ps, "/details/2/stiffness", "same form"));
    CHECK(has_problem_at(ps, "/details/2/colour", "unknown field"));
    CHECK(has_problem_at(ps, "/details/3/stiffness", "multiple of EI/L"));
    CHECK(has_problem_at(ps, "/details/3/moment_resistance", "zero or more"));
    CHECK(has_problem_at(ps, "/details/4/geometry", "expected an object"));

    CHECK(has_problem_at(problems_of(R"({"format": "pinproof-details/2", "details": []})"), "/format"));
    CHECK(has_problem_at(problems_of(R"({"format": "pinproof-details/1"})"), "/details", "missing"));
    CHECK(has_problem_at(problems_of("{\"format\": \n  \"pinproof-details/1\",, }"), "line 2, column 24", "not valid JSON"));
}

TEST_CASE("catalogue: a file's problems name the file and the pointer [RFC 6901 section 6 fragment form]")
{
    try {
        parse_detail_catalogue(R"({"format": "pinproof-details/1", "details": [{"id": "X"}]})", "firm.json");
        FAIL("expected an input_error");
    } catch (const input_error& e) {
        CHECK(has_problem_at(e.problems(), "firm.json#/details/0/type", "missing"));
        CHECK(has_problem_at(e.problems(), "firm.json#/details/0/stiffness", "missing"));
    }
}

TEST_CASE("catalogue: a project joint given by detail id equals the same joint written inline [same reader] - exact")
{
    const detail_catalogue c = parse_detail_catalogue(small_catalogue);
    const auto project_text = [](const std::string& start, const std::string& end) {
        return R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced",
          "beams": [{"id": "B1", "span": "6 m", "section": "IPE 300",
            "loads": [{"case": "G", "kind": "udl", "w": "10 kN/m"}],
            "combinations": [{"name": "U", "use": "strength", "factors": {"G": 1.35}}],
            "joints": {"start": )" + start + R"(, "end": )" + end + "}}]}";
    };
    json by_id = json::parse(project_text("\"FP-3-M20\"", "\"SL-1\""));
    problem_list problems;
    CHECK(resolve_detail_references(by_id, c, problems) == 2);
    CHECK(problems.empty());
    const project a = read_project(by_id);
    const project b = parse_project(project_text(
        R"({"stiffness": {"min": "300 kN*m/rad", "max": "1.4 MN*m/rad"}, "moment_resistance": "18 kN*m"})",
        R"({"stiffness": {"min": "0.05 EI/L", "max": "0.3 EI/L"}})"));
    REQUIRE(a.beams.size() == 1);
    CHECK(a.beams[0].start.range.min == b.beams[0].start.range.min);
    CHECK(a.beams[0].start.range.max == b.beams[0].start.range.max);
    CHECK(a.beams[0].start.moment_resistance == b.beams[0].start.moment_resistance);
    CHECK(a.beams[0].end.range.min == b.beams[0].end.range.min);
    CHECK(a.beams[0].end.range.max == b.beams[0].end.range.max);
    CHECK_FALSE(a.beams[0].end.moment_resistance.has_value());

    // Inline joints are left alone; an unknown id is a problem at the joint.
    json mixed = json::parse(project_text(R"({"stiffness": "rigid"})", "\"NOPE\""));
    problem_list p2;
    CHECK(resolve_detail_references(mixed, c, p2) == 0);
    REQUIRE(p2.size() == 1);
    CHECK(p2.problems()[0].where == "/beams/0/joints/end");
    CHECK(p2.problems()[0].message.find("\"NOPE\"") != std::string::npos);
    CHECK(mixed["beams"][0]["joints"]["start"]["stiffness"] == "rigid");
}
