// Verification of the SVG chart writer.
//
// Sources: nice tick numbers of 1, 2 or 5 times a power of ten (common
// practice, no source); SVG 1.1 (W3C Recommendation) for the markup.
#include <doctest/doctest.h>

#include <cmath>
#include <regex>
#include <string>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/report/svg_chart.hpp"

using namespace pinproof;

TEST_CASE("linear ticks [common practice - no source]: 1-2-5 steps covering the range - exact")
{
    const auto u = nice_ticks(0, 1, false);
    REQUIRE(u.size() == 6);
    for (int i = 0; i < 6; ++i) CHECK(u[i] == doctest::Approx(0.2 * i).epsilon(1e-12));
    const auto t = nice_ticks(0, 37, false);  // 37/6 = 6.2: the next 1-2-5 step is 10
    CHECK(t.front() == 0);
    CHECK(t[1] == 10);
    CHECK(t.back() == 30);
    CHECK(nice_ticks(-3, 3, false)[1] - nice_ticks(-3, 3, false)[0] == 1);
}

TEST_CASE("log ticks [common practice - no source]: decades over five decades - 1-2-5 within two")
{
    CHECK(nice_ticks(0.01, 1000, true) == std::vector<double>{0.01, 0.1, 1, 10, 100, 1000});
    CHECK(nice_ticks(1, 50, true) == std::vector<double>{1, 2, 5, 10, 20, 50});
    CHECK(tick_label(0.01) == "0.01");
    CHECK(tick_label(1000) == "1000");
}

TEST_CASE("chart markup [SVG 1.1]: title - axis labels - legend outside the plot - text escaped")
{
    line_chart c;
    c.title = "A & B";
    c.x = {"x (m)", false, 0.0, 10.0};
    c.y = {"y (kN)", false, std::nullopt, std::nullopt};
    c.series.push_back({"line <1>", {{0, 0}, {5, 2}, {10, 1}}, "", false});
    c.bands.push_back({2, 4, "range", "#4a90d9", 0.15});
    const std::string s = to_svg(c);
    CHECK(s.find("<svg xmlns=\"http://www.w3.org/2000/svg\"") == 0);
    CHECK(s.find("A &amp; B") != std::string::npos);
    CHECK(s.find("line &lt;1&gt;") != std::string::npos);
    CHECK(s.find("x (m)") != std::string::npos);
    CHECK(s.find("y (kN)") != std::string::npos);
    CHECK(s.find("</svg>") != std::string::npos);
}

TEST_CASE("marker labels never overlap [issue]: close markers go to separate rows")
{
    line_chart c;
    c.x = {"S*L/EI (-)", true, 0.01, 1000.0};
    c.y = {"ratio (-)", false, 0.0, 1.0};
    c.series.push_back({"s", {{0.01, 0}, {1000, 1}}, "", false});
    for (double x : {0.5, 0.52, 0.55, 2.0, 8.0, 20.0, 25.0}) c.markers.push_back({x, "a long marker label", "#555", true});
    const std::string s = to_svg(c);
    // Collect (x centre, y) of each marker label and check that labels on the same
    // row are at least one label width apart.
    const std::regex label("<text x=\"([0-9.]+)\" y=\"([0-9.]+)\" text-anchor=\"middle\" fill=\"#555\" font-size");
    std::vector<std::pair<double, double>> pos;
    for (auto it = std::sregex_iterator(s.begin(), s.end(), label); it != std::sregex_iterator(); ++it)
        pos.emplace_back(std::stod((*it)[1]), std::stod((*it)[2]));
    REQUIRE(pos.size() == 7);
    const double width = 6.6 * std::string("a long marker label").size();
    for (std::size_t i = 0; i < pos.size(); ++i)
        for (std::size_t j = i + 1; j < pos.size(); ++j)
            if (pos[i].second == pos[j].second) CHECK(std::abs(pos[i].first - pos[j].first) >= width);
}

TEST_CASE("non-finite data [project rules]: internal_error - never drawn")
{
    line_chart c;
    c.series.push_back({"bad", {{0, 0}, {1, std::nan("")}}, "", false});
    CHECK_THROWS_AS(to_svg(c), internal_error);
}

TEST_CASE("marked points (common practice - no source): a diamond of fixed pixel size at each point - not joined - a diamond in the legend")
{
    line_chart c;
    c.x = {"x (-)", false, 0.0, 10.0};
    c.y = {"y (-)", false, 0.0, 100.0};
    chart_series marks{"two points", {{2, 10}, {8, 90}}, "#d62728", false};
    marks.marks_only = true;
    c.series.push_back(marks);
    const std::string s = to_svg(c);
    // Two diamonds on the plot and one in the legend: three closed paths, no line sample.
    const std::regex diamond("<path d=\"M[0-9.]+ [0-9.]+ L[0-9.]+ [0-9.]+ L[0-9.]+ [0-9.]+ L[0-9.]+ [0-9.]+ Z( M[^\"]*)?\" stroke=\"#d62728\"");
    std::size_t closed = 0;
    for (std::size_t at = s.find(" Z"); at != std::string::npos; at = s.find(" Z", at + 1)) ++closed;
    CHECK(closed == 3);
    CHECK(std::regex_search(s, diamond));
    CHECK_FALSE(std::regex_search(s, std::regex("<line [^>]*stroke=\"#d62728\"")));
}

TEST_CASE("stacked charts [SVG 1.1 7.9]: nested viewports one below the other - ids unique per chart - exact")
{
    line_chart a;
    a.title = "first";
    a.x = {"x", false, 0.0, 1.0};
    a.y = {"y", false, 0.0, 1.0};
    a.series.push_back({"s", {{0, 0}, {1, 1}}, "#000000", false});
    a.width = 700;
    a.height = 400;
    line_chart b = a;
    b.title = "second";
    b.width = 760;
    const std::string svg = to_svg(std::vector<line_chart>{a, b});
    // One root, as wide as the widest, as high as both.
    CHECK(svg.rfind("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"760.00\" height=\"800.00\"", 0) == 0);
    CHECK(svg.find("<svg x=\"0\" y=\"0.00\" width=\"700.00\"") != std::string::npos);
    CHECK(svg.find("<svg x=\"0\" y=\"400.00\" width=\"760.00\"") != std::string::npos);
    // Each chart clips to its own plot area.
    CHECK(svg.find("id=\"c0-plot-area\"") != std::string::npos);
    CHECK(svg.find("id=\"c1-plot-area\"") != std::string::npos);
    CHECK(svg.find("url(#c1-plot-area)") != std::string::npos);
    CHECK(svg.find("id=\"plot-area\"") == std::string::npos);
    CHECK_THROWS_AS(to_svg(std::vector<line_chart>{}), internal_error);
}
