// The beam elevation drawing: each end drawn as the analysis idealises it,
// loads to scale within their kind, labels with units, dimensions.
//
// Reference: the symbols (triangle = pin, triangle on rollers = free
// horizontal support, hatching = fixed end, coil = rotational spring) are
// the conventions of structural analysis textbooks: common practice, no
// source. The drawing's numbers are the input's, formatted by the unit layer
// (core/units.hpp, verified in units_test.cpp).
#include <doctest/doctest.h>

#include <regex>
#include <string>
#include <vector>

#include "detail_fixtures.hpp"
#include "pinproof/report/beam_elevation.hpp"

using namespace pinproof;

namespace {

beam two_udls_and_a_point_load()
{
    beam b;
    b.id = "B<1>";
    b.span = 6.0;
    b.E = 210e9;
    b.sec = test_data::ipe300();
    b.sec.name = "IPE 300";
    b.loads.push_back({load_kind::udl, 8500, 0, 0, 6.0, "G"});
    b.loads.push_back({load_kind::udl, 17000, 0, 0, 6.0, "Q"});
    b.loads.push_back({load_kind::point, 20000, 0, 2.0, 0, "G"});
    b.loads.push_back({load_kind::point, 10000, 0, 2.0, 0, "Q"});
    b.start.range = {stiffness::spring(300e3), stiffness::spring(1.4e6)};
    b.end.range = {stiffness::pinned(), stiffness::pinned()};
    return b;
}

// The heights of the line-load bands: the first segment of each band's top line.
std::vector<double> band_heights(const std::string& svg)
{
    std::vector<double> h;
    const std::regex top("class=\"line-load\"[^>]*>\\n<path d=\"M[0-9.]+ ([0-9.]+) L");
    double base = 172.0;  // beam axis 176 px less the 4 px gap under the first band
    for (std::sregex_iterator it(svg.begin(), svg.end(), top), e; it != e; ++it) {
        const double y = std::stod((*it)[1]);
        h.push_back(base - y);
        base = y - 20.0;  // the next band starts 20 px above this one's top
    }
    return h;
}

}  // namespace

TEST_CASE("beam_elevation - each end as its idealisation")
{
    beam b = two_udls_and_a_point_load();
    // | joint range            | idealisation |
    // | 300 to 1400 kN*m/rad   | spring       |
    // | 0 to 0                 | pin          |
    // | rigid to rigid         | fixed        |
    CHECK(idealisation_of(b.start) == end_idealisation::spring);
    CHECK(idealisation_of(b.end) == end_idealisation::pin);
    joint fixed;
    fixed.range = {stiffness::rigid(), stiffness::rigid()};
    CHECK(idealisation_of(fixed) == end_idealisation::fixed);

    const std::string svg = beam_elevation_svg(b, unit_system::si);
    CHECK(svg.find("data-end=\"start\" data-idealisation=\"spring\"") != std::string::npos);
    CHECK(svg.find("data-end=\"end\" data-idealisation=\"pin\"") != std::string::npos);
    CHECK(svg.find("spring 300.0 kN*m/rad to 1400 kN*m/rad") != std::string::npos);
    CHECK(svg.find("roller (true pin)") != std::string::npos);
    b.end = fixed;
    CHECK(beam_elevation_svg(b, unit_system::si).find("fixed (rigid joint)") != std::string::npos);
}

TEST_CASE("beam_elevation - loads to scale within their kind with values and units")
{
    const std::string svg = beam_elevation_svg(two_udls_and_a_point_load(), unit_system::si);
    // Line loads 8.5 and 17 kN/m: the larger band is 34 px, the other half of it (to 0.1 px).
    const auto h = band_heights(svg);
    REQUIRE(h.size() == 2);
    CHECK(h[0] == doctest::Approx(17.0).epsilon(0.01));
    CHECK(h[1] == doctest::Approx(34.0).epsilon(0.01));
    CHECK(svg.find("G: 8.500 kN/m") != std::string::npos);
    CHECK(svg.find("Q: 17.00 kN/m") != std::string::npos);
    CHECK(svg.find("G: 20.00 kN") != std::string::npos);
    CHECK(svg.find("Q: 10.00 kN") != std::string::npos);
    // Point loads 20 and 10 kN at one position: arrows 70 and 35 px long.
    const std::regex shaft("class=\"point-load\"[^>]*>\\n<line x1=\"[0-9.]+\" y1=\"([0-9.]+)\"");
    std::vector<double> lengths;
    for (std::sregex_iterator it(svg.begin(), svg.end(), shaft), e; it != e; ++it)
        lengths.push_back(173.0 - std::stod((*it)[1]));  // the tip sits 3 px above the axis
    REQUIRE(lengths.size() == 2);
    CHECK(lengths[0] == doctest::Approx(70.0).epsilon(0.01));
    CHECK(lengths[1] == doctest::Approx(35.0).epsilon(0.01));
}

TEST_CASE("beam_elevation - dimensions in the project's units and user text escaped")
{
    const std::string si = beam_elevation_svg(two_udls_and_a_point_load(), unit_system::si);
    CHECK(si.find("L = 6.000 m") != std::string::npos);
    CHECK(si.find(">2.000 m<") != std::string::npos);  // start to the point loads
    CHECK(si.find(">4.000 m<") != std::string::npos);  // the point loads to the end
    CHECK(si.find("Beam B&lt;1&gt;") != std::string::npos);
    CHECK(si.find("B<1>") == std::string::npos);
    const std::string us = beam_elevation_svg(two_udls_and_a_point_load(), unit_system::us_customary);
    CHECK(us.find("L = 19.69 ft") != std::string::npos);  // 6 m / 0.3048 m/ft
    CHECK(us.find("kip/ft") != std::string::npos);
}

TEST_CASE("beam_elevation - an overhang: the end support under the beam at L - the free tip at L + a - L and a dimensioned - an uplift drawn upward")
{
    beam b = two_udls_and_a_point_load();
    b.layout = beam_layout::overhang;
    b.overhang = 2.0;
    b.loads.push_back({load_kind::udl, -5000, 0, 0, 8.0, "W"});
    const std::string svg = beam_elevation_svg(b, unit_system::si);
    // The member spans the 540 px between the margins (90 .. 630): 8 m, so the end support
    // sits at 90 + 540 * 6/8 = 495 px and the tip at 630 px.
    CHECK(svg.find("class=\"beam\" x1=\"90.0\" y1=\"176.0\" x2=\"630.0\"") != std::string::npos);
    CHECK(svg.find("<path d=\"M495.0 178.0 l-9 16 h18 z\"") != std::string::npos);
    CHECK(svg.find("roller, beam continuous over it") != std::string::npos);
    CHECK(svg.find("class=\"free-tip\"") != std::string::npos);
    CHECK(svg.find("L = 6.000 m") != std::string::npos);
    CHECK(svg.find("a = 2.000 m") != std::string::npos);
    // The uplift's arrow heads point up (the head's apex above its base: "l-3.5 7").
    CHECK(svg.find("l-3.5 7 h7 z") != std::string::npos);
    // A beam on two supports keeps its downward heads only.
    CHECK(beam_elevation_svg(two_udls_and_a_point_load(), unit_system::si).find("l-3.5 7 h7 z") == std::string::npos);
}
