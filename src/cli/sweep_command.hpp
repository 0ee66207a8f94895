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

// The largest --points with --grid: (N+2)^2 states are held in memory with
// their results: about 290 MB and 11 s at N = 100 (measured: see
// docs/robustness.md; 1.1 GB at N = 200).
inline constexpr int max_grid_points = 100;
// The most Monte Carlo samples: about 45 s for one beam with two distributed
// joints (measured: see docs/robustness.md); the memory does not grow with N.
inline constexpr std::size_t max_monte_carlo_samples = 1'000'000;

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
