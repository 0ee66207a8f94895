// A stiffness sweep of one beam: every result and every check's status as the
// joint stiffness goes from a true pin to fully rigid
// (docs/method/sweep-and-probability.md).
//
// Points: the exact pin, `points` values of kappa = S*L/EI evenly spaced in
// log from 0.01 to 1000, and the exact rigid joint. Along a path both ends
// move together, or one end moves and the other is held (threshold.hpp);
// a grid evaluates every pair of those points for the two ends.
#pragma once

#include <nlohmann/json_fwd.hpp>

#include <string>
#include <vector>

#include "pinproof/checks/failure_probability.hpp"
#include "pinproof/checks/threshold.hpp"

namespace pinproof {

struct sweep_settings {
    stiffness_path path;
    int points = 41;           // log-spaced points between the exact ends, >= 2
    std::string combination;   // whose states are reported; empty: the beam's first
    bool grid = false;         // the two-end map (points + 2)^2 instead of a path
};

struct sweep_row {
    stiffness_pair at;
    double fixity_start = 0, fixity_end = 0;  // Monforton and Wu r
    beam_state state;                          // of the chosen combination
    std::vector<check> checks;                 // as assess_beam, at this pair
};

struct sweep_result {
    std::string beam_id;
    std::string combination;
    double EI = 0, span = 0;
    sweep_settings settings;
    // The chosen combination with ideal ends. A beam with one joint: its
    // joint pinned and rigid (a cantilever: `pinned` is the rigid root too,
    // its pinned root being a mechanism; its rows start at S*L/EI = 0.01).
    beam_state pinned, fixed;
    std::vector<sweep_row> rows;       // pin first, rigid last (row-major for a grid: start outer)
    std::vector<threshold> thresholds; // along the path (empty for a grid)
};

// Throws input_error naming the combination if `settings.combination` is not
// one of the beam's, or the beam has none, and naming --grid for a grid of a
// beam with one joint; internal_error for points < 2. A beam with one joint
// (cantilever, overhang) sweeps that joint (single_joint_path) whatever path
// is asked.
sweep_result sweep_beam(const project& p, const beam& b, const sweep_settings& settings);

// The stiffness values of a sweep's moving end, pin first and rigid last.
std::vector<stiffness> sweep_stiffnesses(double EI, double span, int points);

}  // namespace pinproof
