// `pinproof fit`: the parameters of a law recovered from points generated with
// known parameters (Kishi and Chen 1990 power model, reference pack 4), the
// chart, and bad input with its line and column [project rules].
#include <doctest/doctest.h>

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <sstream>

#include "cli/cli.hpp"
#include "temp_dir.hpp"

using pinproof::cli::run;

namespace {
std::string power_points(double R_kNm, double Mu_kNm, double n)
{
    std::string csv = "rotation,moment\n";
    for (int i = 1; i <= 12; ++i) {
        const double t = 3e-3 * i;
        char line[80];
        std::snprintf(line, sizeof line, "%.17g rad,%.17g kN*m\n", t,
                      R_kNm * t / std::pow(1 + std::pow(t * R_kNm / Mu_kNm, n), 1 / n));
        csv += line;
    }
    return csv;
}
}  // namespace

TEST_CASE("fit recovers a power law from its own points [KC1990 - pack 4] - printed to 4 figures")
{
    pinproof::testing::temp_dir dir("fit");
    const std::string file = dir.write("points.csv", power_points(6000, 45, 1.3));
    const std::string svg = (dir.path / "fit.svg").string();
    std::ostringstream out, err;
    CHECK(run({"fit", file, "--svg", svg}, out, err) == 0);
    CHECK(out.str().find("initial stiffness R_ki   6000 kN*m/rad") != std::string::npos);
    CHECK(out.str().find("ultimate moment M_u      45.00 kN*m") != std::string::npos);
    CHECK(out.str().find("shape n                  1.300") != std::string::npos);
    CHECK(out.str().find("qualified engineer") != std::string::npos);
    CHECK(std::filesystem::file_size(svg) > 1000);
}

TEST_CASE("fit refuses bad points with their line and column - exit 2 - no chart written [project rules]")
{
    pinproof::testing::temp_dir dir("fit");
    const std::string file = dir.write("points.csv", "rotation,moment\n2 mrad,5 kN\n");
    const std::string svg = (dir.path / "fit.svg").string();
    std::ostringstream out, err;
    CHECK(run({"fit", file, "--svg", svg}, out, err) == 2);
    CHECK(err.str().find("line 2, column 8") != std::string::npos);
    CHECK_FALSE(std::filesystem::exists(svg));
    // Too few points for the four parameters of Richard-Abbott.
    const std::string few = dir.write("few.csv", "rotation,moment\n1 mrad,1 kN*m\n2 mrad,2 kN*m\n3 mrad,2.5 kN*m\n");
    std::ostringstream out2, err2;
    CHECK(run({"fit", few, "--law", "richard-abbott"}, out2, err2) == 2);
    CHECK(err2.str().find("at least 5 points") != std::string::npos);
}
