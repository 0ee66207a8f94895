// `pinproof fit POINTS.csv [--law power|richard-abbott] [--svg OUT]`: fits a
// moment-rotation law to the measured points of a joint test and prints its
// parameters, the RMS error and, with --svg, a chart of the points and the law.
#pragma once

#include <iosfwd>
#include <string>

namespace CLI {
class App;
}

namespace pinproof::cli {

struct fit_options {
    std::string file;             // the points (CSV); "-" for standard input
    std::string law = "power";    // "power" or "richard-abbott"
    std::string svg;              // chart to write; "-" for standard output
};

CLI::App* add_fit_subcommand(CLI::App& app, fit_options& o);

// 0 when fitted; input problems (the file, too few points, a fit that does not
// converge) are thrown as input_error.
int fit_command(const fit_options& o, std::ostream& out);

}  // namespace pinproof::cli
