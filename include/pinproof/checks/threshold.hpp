// Where each check of a beam changes its answer as the joint stiffness goes
// from a true pin to fully rigid (docs/method/sweep-and-probability.md).
//
// The checks are those of assess_beam(), evaluated at one exact stiffness
// pair (a copy of the beam whose joints have the degenerate range {S, S}).
// Each check's continuous margin is value - limit (SI; limit - value for a
// least limit such as the floor frequency): adverse (fail or
// warn) when positive, pass when zero or negative. Along a path the search
// parameter is the fixity factor r = kappa / (kappa + 3) in [0, 1]
// (Monforton and Wu, 1963), r = 1 being the exact rigid state, so the bracket
// is finite; sign changes are bracketed on a scan and refined with
// boost::math::tools::toms748_solve until S is known to 1e-10 relative.
#pragma once

#include <functional>
#include <optional>
#include <string>
#include <vector>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

// Which ends move along a stiffness path.
enum class moving_end { both, start, end };
std::string to_string(moving_end m);  // "both", "start", "end"

struct stiffness_path {
    moving_end moving = moving_end::both;
    stiffness held = stiffness::pinned();  // the other end, when only one moves
};

struct stiffness_pair {
    stiffness start = stiffness::pinned(), end = stiffness::pinned();
};

// Fixity factor and its inverse (Monforton and Wu, 1963): r = 1/(1 + 3EI/(S L)).
double fixity_factor(stiffness s, double EI, double span);
stiffness stiffness_of_fixity(double r, double EI, double span);  // r in [0, 1]

stiffness_pair point_on_path(const stiffness_path& path, stiffness s);

// The path of a beam with one joint (a cantilever's root, an overhang's
// start): the start moves, the end is a pin by construction (a free tip, or
// a beam continuous over its end support). find_thresholds and sweep_beam
// take it for such a beam whatever path is asked; a cantilever's scan starts
// at S*L/EI = 0.01, its pinned root being a mechanism.
stiffness_path single_joint_path();

// The checks (ids and order as assess_beam) and the states of every
// combination at one stiffness pair.
struct point_evaluation {
    stiffness_pair at;
    std::vector<check> checks;
    std::vector<beam_state> states;  // in the order of beam::combinations
};
point_evaluation evaluate_at(const project& p, const beam& b, stiffness_pair at);

// Whether a status counts against the assumption (fail, or warn for an
// advisory check).
bool is_adverse(check_status s);

// The continuous margin of a check: value - limit (SI) where both exist
// (limit - value for a least limit, check::limit_is_minimum);
// otherwise +1 for an adverse and -1 for a passing status (a rigid joint has
// no finite S*L/EI); nullopt for a check that does not apply.
std::optional<double> check_margin(const check& c);

struct threshold {
    std::string check;                 // check id as in assess_beam
    check_status below, above;         // status just below and just above
    stiffness at = stiffness::pinned();  // the stiffness of the moving end(s)
    double ratio = 0;                  // S*L/EI
    double fixity = 0;                 // r
};

// Every state change of every check along the path within [pin, rigid].
// `scan` is the bracketing scan in S*L/EI (log spaced 0.01..1000 with the
// exact pin and rigid ends added); checks that never change state report none.
std::vector<threshold> find_thresholds(const project& p, const beam& b, const stiffness_path& path,
                                       int scan_points = 41);

// A point of the boundary curve of a check in the two-end plane.
struct boundary_point {
    stiffness start = stiffness::pinned(), end = stiffness::pinned();
    double fixity_start = 0, fixity_end = 0;
};
// A beam on two supports only (internal_error otherwise).
// Points where the check changes state: on each line of constant start
// fixity and of constant end fixity (fixity factors evenly spaced on [0, 1],
// `points` of each), sorted by start fixity.
std::vector<boundary_point> boundary_curve(const project& p, const beam& b, const std::string& check_id,
                                           int points = 41);

// Sign changes of f on [lo, hi]: f is scanned at `grid` (ascending, inside
// [lo, hi], including both ends) and each sign change refined by toms748
// until tolerance(a, b) holds. Used by the threshold and probability searches.
struct root_bracket {
    double lower = 0, upper = 0;  // final bracket; the root is their mean
    double root() const { return 0.5 * (lower + upper); }
};
std::vector<root_bracket> sign_changes(const std::function<double(double)>& f, const std::vector<double>& grid,
                                       const std::function<bool(double, double)>& tolerance);

// The scan of S*L/EI used by sweeps and thresholds: `points` values evenly
// spaced in log from 0.01 to 1000 (points >= 2).
std::vector<double> ratio_scan(int points);

// Lines for the text report of `pinproof check`, one per threshold along the
// path with both ends equal, e.g. "stiffness-class-start: the pinned
// assumption stops holding above S = 1462 kN*m/rad (S*L/EI = 0.500)".
std::vector<std::string> threshold_report_lines(const project& p, const beam& b);

}  // namespace pinproof
