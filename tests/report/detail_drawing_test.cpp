// The beam-end elevation drawing: content, exaggeration factor, label layout.
//
// Reference: the closure values it prints are those verified in
// gap_geometry_test.cpp (closed forms, first principles); this test checks the
// drawing states them, states its exaggeration, and keeps its labels apart.
#include <doctest/doctest.h>

#include <algorithm>
#include <map>
#include <string>
#include <vector>

#include "detail_fixtures.hpp"
#include "pinproof/model/connection_detail.hpp"
#include "pinproof/report/detail_drawing.hpp"
#include "pinproof/checks/gap_geometry.hpp"

using namespace pinproof;

namespace {

using test_data::fin_plate;
using test_data::ipe300;
using test_data::mm;

// Baselines of the text lines, grouped by their x position.
std::map<std::string, std::vector<double>> text_rows(const std::string& svg)
{
    std::map<std::string, std::vector<double>> rows;
    const std::string open = "<text x=\"";
    for (std::size_t at = svg.find(open); at != std::string::npos; at = svg.find(open, at + 1)) {
        const std::size_t x0 = at + open.size(), x1 = svg.find('"', x0);
        const std::size_t y0 = svg.find("y=\"", x1) + 3, y1 = svg.find('"', y0);
        rows[svg.substr(x0, x1 - x0)].push_back(std::stod(svg.substr(y0, y1 - y0)));
    }
    return rows;
}

}  // namespace

TEST_CASE("exaggeration factor: round - near the shown rotation - short of the closure")
{
    closure c;
    c.rotation = 0.0675;
    CHECK(drawing_exaggeration(0.01, c, 0.1) == 5);     // 10 would pass the closure; 0.9 x 6.75 -> 5
    CHECK(drawing_exaggeration(0.002, c, 0.1) == 20);   // 0.9 x 0.0675 / 0.002 = 30 -> 20
    CHECK(drawing_exaggeration(0.08, c, 0.1) == 1);     // fails: drawn as it is
    CHECK(drawing_exaggeration(0.0, c, 0.1) == 1);      // nothing to turn
    closure none;                                       // no closure within pi/2
    CHECK(drawing_exaggeration(0.001, none, 0.1) == 100);
    CHECK(drawing_exaggeration(0.2, none, 0.1) == 1);
}

TEST_CASE("the drawing states its factor - the closure and the review note")
{
    const auto d = fin_plate();
    const auto g = build_geometry(d, ipe300());
    const std::string svg = detail_svg(g, d, 0.0103);
    CHECK(svg.rfind("<?xml", 0) == 0);
    CHECK(svg.find("</svg>") != std::string::npos);
    CHECK(svg.find("rotation exaggerated x5") != std::string::npos);
    CHECK(svg.find("For review by a qualified engineer.") != std::string::npos);
    CHECK(svg.find("0.06748 rad") != std::string::npos);  // closure of the pack's fin plate case
    CHECK(svg.find("bottom flange corner against column flange face") != std::string::npos);
    CHECK(svg.find("centre to contact 158 mm") != std::string::npos);
    CHECK(svg.find("centre of rotation") != std::string::npos);
    CHECK(svg.find("gap 10.0 mm") != std::string::npos);
    CHECK(svg.find("nan") == std::string::npos);
    CHECK(svg.find("inf") == std::string::npos);
}

TEST_CASE("labels do not overlap - at either end and in either sense")
{
    auto d = fin_plate();
    d.support = support_type::beam_web;
    d.support_beam = supporting_beam{"IPE 400", 0.0, 400 * mm, 180 * mm, 13.5 * mm, 8.6 * mm, 21 * mm};
    d.cope_top = cope{40 * mm, 85 * mm};
    const auto g = build_geometry(d, ipe300());
    for (double demand : {0.0103, -0.02, 0.0}) {
        for (bool mirror : {false, true}) {
            detail_drawing_options o;
            o.mirror = mirror;
            const std::string svg = detail_svg(g, d, demand, o);
            for (auto& [x, ys] : text_rows(svg)) {
                std::sort(ys.begin(), ys.end());
                for (std::size_t i = 1; i < ys.size(); ++i) {
                    INFO("demand " << demand << ", mirror " << mirror << ", column x = " << x);
                    CHECK(ys[i] - ys[i - 1] >= 14.9);
                }
            }
        }
    }
}

TEST_CASE("a failing demand is drawn unexaggerated and said to fail")
{
    const auto d = fin_plate();
    const auto g = build_geometry(d, ipe300());
    const std::string svg = detail_svg(g, d, 0.08);
    CHECK(svg.find("rotation exaggerated x1") != std::string::npos);
    CHECK(svg.find("FAILS") != std::string::npos);
    CHECK(svg.find("overlaps the support") != std::string::npos);
}

TEST_CASE("labels and scale bar in the project's units (exact unit definitions: 1 in = 25.4 mm): US customary shows inches - SI shows millimetres")
{
    const auto d = fin_plate();
    const auto g = build_geometry(d, ipe300());
    detail_drawing_options us;
    us.units = unit_system::us_customary;
    const std::string svg_us = detail_svg(g, d, 0.01, us);
    CHECK(svg_us.find("gap 0.394 in as detailed") != std::string::npos);  // 10 mm
    CHECK(svg_us.find(" in (lengths to scale") != std::string::npos);
    CHECK(svg_us.find(" mm") == std::string::npos);
    const std::string svg_si = detail_svg(g, d, 0.01);
    CHECK(svg_si.find("gap 10.0 mm as detailed") != std::string::npos);
    CHECK(svg_si.find(" in (lengths") == std::string::npos);
}
