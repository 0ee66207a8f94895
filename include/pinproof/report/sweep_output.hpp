// The outputs of a stiffness sweep (checks/sweep.hpp): its CSV table, its
// chart, and the thresholds and probabilities as JSON.
#pragma once

#include <nlohmann/json.hpp>

#include <string>
#include <vector>

#include "pinproof/checks/sweep.hpp"

namespace pinproof {

// CSV text in the display units of `units` (kN, kN*m, mm, mrad, kN*m/rad;
// kip, kip*ft, in, mrad, kip*ft/rad), each header "name [unit]" as in the
// batch CSV; a rigid stiffness is written "rigid" (its S*L/EI is unbounded
// and is left empty). Columns: stiffness_start, ratio_start [1],
// fixity_start [1], the same for the end, reaction_start, ..., rotation_end,
// then one status column per check id.
std::string sweep_csv(const sweep_result& s, unit_system units = unit_system::si);

// The chart of a path sweep (svg_chart.hpp): every result normalised by its
// pinned (reactions, span moment, deflection, rotations) or fixed (end
// moments) value against S*L/EI on a log axis, the code boundaries, the
// user's stiffness ranges shaded and the thresholds marked.
std::string sweep_svg(const project& p, const beam& b, const sweep_result& s);

// The "sensitivity" member of a beam in the result of `pinproof check --json`:
//   "thresholds": [{"check", "stiffness" (N*m/rad), "ratio" (S*L/EI),
//                   "fixity_factor", "below", "above", "path": "both"}]
//     along the path with both ends equal;
//   "probability": [{"check", "p_fail", "error", "method"}], empty without
//     a stiffness distribution;
//   "stiffness_correlation" (0 or 1) and "distributions" {"start", "end"}
//     (descriptions, null where none is given).
nlohmann::json sensitivity_json(const project& p, const beam& b, const stiffness_uncertainty& u = {});

// Thresholds and probabilities as JSON arrays (shared by the sweep output).
nlohmann::json thresholds_json(const std::vector<threshold>& t, const std::string& path);
nlohmann::json probabilities_json(const std::vector<failure_probability>& f);

}  // namespace pinproof
