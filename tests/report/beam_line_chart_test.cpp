// Verification of the beam-line chart of a joint with a moment-rotation law.
//
// Sources:
//   [PACK5] reference pack §5 (beam line): a symmetric beam on two equal
//           springs k' = kappa' EI/L carries the end moment M = M_F kappa'/(kappa' + 2),
//           M_F = wL^2/12 for a full-span UDL (handbook fixed-end moment).
//   [EC3-5.1.2] EN 1993-1-8 5.1.2(4): the ec3-eta law is S_j,ini / eta at every level.
#include <doctest/doctest.h>

#include <string>

#include "pinproof/io/project_input.hpp"
#include "pinproof/report/beam_line_chart.hpp"

using namespace pinproof;

namespace {
std::string project_text(const char* behaviour)
{
    return std::string(R"({"format": "pinproof-project/1", "title": "beam lines", "standard": "EN1993-1-8",
      "frame": "braced", "beams": [{"id": "B", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": "20 kN/m"}],
        "combinations": [{"name": "ULS-a", "use": "strength", "factors": {"G": 1.35}},
                         {"name": "ULS-b", "use": "strength", "factors": {"G": 1.0}},
                         {"name": "SLS", "use": "service", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": "0.45 EI/L", "behaviour": )") +
           behaviour + R"(}, "end": {"stiffness": "0.45 EI/L", "behaviour": )" + behaviour + R"(}}}]})";
}
}  // namespace

TEST_CASE("beam lines of a law joint [PACK5] [EC3-5.1.2]: one line per strength combination - working points M_F k/(k+2) - tol 1e-9")
{
    const project p = parse_project(project_text(R"({"law": "ec3-eta", "eta": 2})"));
    const auto chart = joint_law_beam_lines(p, p.beams[0], beam_end::start);
    REQUIRE(chart);
    int lines = 0, points = 0;
    const double kappa = 0.45 / 2;  // S_j,ini / eta in EI/L
    for (const auto& s : chart->chart.series) {
        if (s.label.rfind("beam line, ", 0) == 0) ++lines;
        if (!s.marks_only) continue;
        ++points;
        const double w = s.label.find("ULS-a") != std::string::npos ? 1.35 * 20.0 : 20.0;  // kN/m
        const double MF = w * 36.0 / 12.0;                                                  // kN*m
        REQUIRE(s.points.size() == 1);
        CHECK(s.points[0].second == doctest::Approx(MF * kappa / (kappa + 2)).epsilon(1e-9));
    }
    CHECK(lines == 2);   // the service combination has no beam line here
    CHECK(points == 4);  // two bounds (equal here) times two strength combinations
    CHECK(chart->caption.find("every strength combination") != std::string::npos);
}

TEST_CASE("beam lines [project rules]: none for a linear joint")
{
    const project p = parse_project(project_text(R"({"law": "ec3-eta", "eta": 2})"));
    beam b = p.beams[0];
    b.start.behaviour.reset();
    CHECK_FALSE(joint_law_beam_lines(p, b, beam_end::start));
}
