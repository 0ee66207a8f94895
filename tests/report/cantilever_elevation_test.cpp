// The elevation sketch of a cantilever (src/report/cantilever_elevation.cpp): what it
// must show (the project's rules for its drawings; common practice, no source).
#include <doctest/doctest.h>

#include <string>

#include "pinproof/io/project_input.hpp"
#include "pinproof/report/cantilever_elevation.hpp"

using namespace pinproof;

namespace {
std::size_t count(const std::string& s, const std::string& what)
{
    std::size_t n = 0;
    for (auto i = s.find(what); i != std::string::npos; i = s.find(what, i + 1)) ++n;
    return n;
}

const char* const balcony = R"({"format": "pinproof-project/1", "title": "t", "standard": "EN1993-1-8", "frame": "braced",
  "beams": [{"id": "C", "layout": "cantilever", "span": "2 m", "section": "IPE 240",
    "loads": [{"case": "G", "kind": "udl", "w": "6 kN/m"}, {"case": "G", "kind": "point", "P": "1.5 kN", "at": "2 m"},
              {"case": "Q", "kind": "moment", "M": "-2 kN*m", "at": "1 m"}],
    "combinations": [{"name": "SLS", "use": "service", "factors": {"G": 1.0, "Q": 1.0}}],
    "joints": {"start": {"stiffness": {"min": "20000 kN*m/rad", "max": "40000 kN*m/rad"}}}}]})";
}  // namespace

TEST_CASE("cantilever elevation: hatched support at the root - its spring range - free tip - one label per load - length")
{
    const project p = parse_project(balcony);
    const std::string svg = cantilever_elevation_svg(p.beams[0], unit_system::si);
    CHECK(svg.rfind("<svg", 0) == 0);
    CHECK(count(svg, "url(#hatch)") == 1);
    CHECK(svg.find("free tip") != std::string::npos);
    CHECK(svg.find("root joint S = 20000 kN*m/rad .. 40000 kN*m/rad") != std::string::npos);
    CHECK(count(svg, "fill=\"#b03020\">G ") == 2);
    CHECK(svg.find("Q -2.000 kN*m (anticlockwise)") != std::string::npos);
    CHECK(svg.find("L = 2.000 m (IPE 240)") != std::string::npos);
}

TEST_CASE("cantilever elevation: a beam on two supports is refused")
{
    std::string text = balcony;
    const std::string layout = R"("layout": "cantilever", )", root_end = R"("max": "40000 kN*m/rad"}})";
    text.replace(text.find(layout), layout.size(), "");
    text.replace(text.find(root_end), root_end.size(), root_end + R"(, "end": {"stiffness": 0})");
    const project p = parse_project(text);
    CHECK_THROWS_AS(cantilever_elevation_svg(p.beams[0], unit_system::si), std::invalid_argument);
}
