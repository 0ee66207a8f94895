// `pinproof sweep`: every result and check of one beam as the joint stiffness
// goes from a true pin to fully rigid, the thresholds where checks change
// their answer and, for stiffness distributions, the failure probabilities.
#pragma once

#include <cstddef>
#include <iosfwd>
#include <string>

namespace CLI {
class App;
}

namespace pinproof::cli {

struct sweep_options {
    std::string file;
    std::string beam_id;        // empty: the first beam
    std::string combination;    // empty: the beam's first combination
    int points = 41;
    std::string end;            // "", "start" or "end": the one end that moves
    std::string hold;           // stiffness of the held end; empty: its upper bound
    bool grid = false;
    std::string csv_out, svg_out, json_out;  // "-" for stdout
    std::size_t monte_carlo = 0;             // samples; 0: none
    std::string details;                     // detail catalogue for joints given as ids
};

// Declares the sweep subcommand's arguments on `sub`, bound to `o`.
void add_sweep_options(CLI::App& sub, sweep_options& o);

// Runs the sweep. Throws input_error for bad input (the caller reports it).
// Returns 0: a sweep reports, it gives no verdict.
int sweep_command(const sweep_options& o, std::ostream& out, std::ostream& err);

}  // namespace pinproof::cli
