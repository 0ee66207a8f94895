#include "fit_command.hpp"

#include <CLI/CLI.hpp>

#include <algorithm>
#include <cmath>
#include <iostream>
#include <iterator>
#include <sstream>
#include <stdexcept>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/input_file.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/io/moment_rotation_points.hpp"
#include "pinproof/joints/law_fit.hpp"
#include "pinproof/report/svg_chart.hpp"

namespace pinproof::cli {
namespace {

// The points file, or standard input for "-"; the input edge refuses a
// directory, a device or a file over its size limit (core/input_file.hpp).
std::string read_all(const std::string& file)
{
    if (file == "-") return std::string(std::istreambuf_iterator<char>(std::cin), {});
    return read_input_file(file, "points file");
}

struct parameter_row {
    const char* name;
    double value;
    dimension dim;
};

std::string chart_of(const std::vector<law_point>& points, const joint_law& law, unit_system system,
                     const std::string& title)
{
    const display_unit mu = display_unit_for(dims::moment, system);
    line_chart c;
    c.title = title;
    c.x.label = "rotation (mrad)";
    c.y.label = "moment (" + mu.symbol + ")";
    chart_series measured{"measured points", {}, "#1b1b1b", false, true};
    double largest = 0;
    for (const law_point& p : points) {
        measured.points.emplace_back(p.rotation * 1e3, p.moment / mu.si_per_unit);
        largest = std::max(largest, p.rotation);
    }
    std::sort(measured.points.begin(), measured.points.end());
    chart_series fitted{"fitted " + to_string(law.kind()) + " law", {}, "#2f6db5", false, false};
    for (int i = 0; i <= 200; ++i) {
        const double theta = largest * 1.1 * i / 200;
        fitted.points.emplace_back(theta * 1e3, law.moment(theta) / mu.si_per_unit);
    }
    c.series = {fitted, measured};
    return to_svg(c);
}

}  // namespace

CLI::App* add_fit_subcommand(CLI::App& app, fit_options& o)
{
    auto* fit = app.add_subcommand("fit", "Fit a moment-rotation law (power or Richard-Abbott) to the measured "
                                          "points of a joint test");
    fit->add_option("POINTS", o.file, "CSV of measured points: header rotation,moment, then e.g. "
                                      "\"2.5 mrad,10.4 kN*m\" ('-' for standard input)")
        ->required();
    fit->add_option("--law", o.law, "Law to fit")
        ->check(CLI::IsMember({"power", "richard-abbott"}))
        ->capture_default_str();
    fit->add_option("--svg", o.svg, "Also write a chart of the points and the fitted law ('-' for stdout)")
        ->type_name("FILE");
    fit->footer("Exit codes: 0 fitted, 2 bad input (every problem listed with its line and column) or an error.");
    return fit;
}

int fit_command(const fit_options& o, std::ostream& out)
{
    const moment_rotation_points read = read_moment_rotation_points(read_all(o.file));
    std::vector<law_point> points;
    for (const measured_point& p : read.points) points.push_back({p.rotation, p.moment});
    const bool power = o.law == "power";
    law_fit f{joint_law::linear(0), 0, 0};
    try {
        f = power ? fit_power_law(points) : fit_richard_abbott_law(points);
    } catch (const std::exception& e) {
        throw input_error(o.file, std::string("no ") + o.law + " law could be fitted: " + e.what());
    }
    const unit_system sys = read.system;
    const auto p = f.law.parameters();
    const std::vector<parameter_row> rows =
        power ? std::vector<parameter_row>{{"initial stiffness R_ki", p[0].second, dims::rotational_stiffness},
                                           {"ultimate moment M_u", p[1].second, dims::moment},
                                           {"shape n", p[2].second, dims::dimensionless}}
              : std::vector<parameter_row>{{"initial stiffness k", p[0].second, dims::rotational_stiffness},
                                           {"reference moment M_0", p[1].second, dims::moment},
                                           {"plastic stiffness k_p", p[2].second, dims::rotational_stiffness},
                                           {"shape n", p[3].second, dims::dimensionless}};
    double largest = 0, theta_min = 1e300, theta_max = 0;
    for (const law_point& q : points) {
        largest = std::max(largest, q.moment);
        theta_min = std::min(theta_min, q.rotation);
        theta_max = std::max(theta_max, q.rotation);
    }
    std::string svg;
    if (!o.svg.empty())
        svg = chart_of(points, f.law, sys, "Fitted " + o.law + " law and the measured points");

    std::ostringstream s;
    s << "pinproof fit: a moment-rotation law fitted to measured points\n";
    s << "Points:  " << (o.file == "-" ? "standard input" : o.file) << ", " << points.size()
      << " points, rotation " << format_quantity(theta_min, dims::angle, sys) << " to "
      << format_quantity(theta_max, dims::angle, sys) << ", moment up to "
      << format_quantity(largest, dims::moment, sys) << "\n";
    if (power)
        s << "Law:     power (Kishi and Chen 1990): M = R_ki theta / [1 + (theta/theta_0)^n]^(1/n), theta_0 = M_u / R_ki\n";
    else
        s << "Law:     Richard-Abbott (1975): M = (k - k_p) theta / [1 + |(k - k_p) theta / M_0|^n]^(1/n) + k_p theta\n";
    for (const parameter_row& r : rows) {
        char line[160];
        std::snprintf(line, sizeof line, "  %-24s %s\n", r.name,
                      r.dim == dims::dimensionless ? format_number(r.value).c_str()
                                                   : format_quantity(r.value, r.dim, sys).c_str());
        s << line;
    }
    s << "RMS error: " << format_quantity(f.rms_error, dims::moment, sys) << " ("
      << format_number(100 * f.rms_error / largest, 3) << " % of the largest measured moment), " << f.iterations
      << " iterations (least squares on the moments, Levenberg-Marquardt)\n";
    s << "The law holds within the measured rotations only; beyond "
      << format_quantity(theta_max, dims::angle, sys) << " it is an extrapolation.\n";
    s << "Caution: Results support, and do not replace, the judgement of a qualified engineer. Local codes and\n"
         "         licensed practice govern. Check the test data and its conditions before relying on the fit.\n";

    if (!o.svg.empty()) {
        if (o.svg == "-") {
            out << svg;
            return 0;
        }
        output_set outputs;
        outputs.add_input(o.file);
        outputs.add("--svg", o.svg, svg);
        outputs.commit();
    }
    out << s.str();
    return 0;
}

}  // namespace pinproof::cli
