// The beam with joints that follow moment-rotation laws (joint_law.hpp),
// loaded proportionally from zero to a load factor, and followed on to the
// collapse of the beam.
//
// Method (docs/method/joint-laws.md): the condensed form of the linear beam
// (beam_model.hpp) gives the end rotations for any pair of hogging end moments,
//   theta = lambda theta_0 - F m,
// so the nonlinear beam is two equations in the two end moments,
//   m_j = M_j(theta_j)   (a law), or theta_j = 0 (a rigid end),
// solved at each load step by Newton's method with the laws' tangent
// stiffnesses. Where Newton does not converge (a kink of a multilinear law, a
// cap), the step falls back to block Gauss-Seidel with each end's equation
// solved exactly by bisection: each such equation is strictly monotone in its
// own moment, and for a beam of uniform EI the sweep contracts by at least a
// factor 4 (|F_jk| <= F_jj / 2), so the fallback always converges. A step that
// still fails is halved. The laws are followed as loading curves (no
// unloading), which is what a proportionally loaded combination does.
// Signs: sign_conventions.hpp. Units: SI.
#pragma once

#include <optional>
#include <stdexcept>
#include <string>

#include "pinproof/joints/joint_law.hpp"
#include "pinproof/model/beam_model.hpp"

namespace pinproof {

// One end of the beam: a joint law, or a rigid joint. A rigid end may carry a
// cap too: the beam's own plastic hinge beside the joint.
struct nonlinear_end {
    std::optional<joint_law> law;  // nullopt: rigid
    std::optional<double> rigid_cap;

    static nonlinear_end following(joint_law l) { return {std::move(l), std::nullopt}; }
    static nonlinear_end rigid(std::optional<double> cap = std::nullopt) { return {std::nullopt, cap}; }
    // The largest moment the end can carry (nullopt: unbounded).
    std::optional<double> cap() const { return law ? law->moment_resistance() : rigid_cap; }
    // The same end with its moment also limited to cap.
    nonlinear_end capped_at(double cap) const;
};

struct nonlinear_solution {
    beam_state state;          // at the load factor; stiffness_* are the secant stiffnesses
    double load_factor = 1;
    int steps = 0;             // load steps taken (after any halving)
    int iterations = 0;        // Newton (or fallback) iterations over all steps
    double residual = 0;       // largest end residual at the end, relative to the moment scale
    bool start_at_cap = false; // the end reached its cap (the joint yields)
    bool end_at_cap = false;
    // The load factor at which each end first reached its cap (nullopt: never).
    std::optional<double> start_yield_factor, end_yield_factor;
};

// Raised when no state can be found: the caller refuses with a message, never
// a number.
class nonlinear_failure : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// The state of the beam (its loads at factor 1 are the model's) at load_factor,
// followed from zero in steps. With find_yield the load factor at which each
// end first reaches its cap is located too (start/end_yield_factor); without
// it those stay nullopt, and the state is the same.
nonlinear_solution solve_nonlinear(const beam_model& model, const nonlinear_end& start, const nonlinear_end& end,
                                   double load_factor = 1.0, bool find_yield = true);

// The beam line of one end (0 start, 1 end) when the far end follows its law:
// the rotation of this end when it carries the hogging moment m, at the load
// factor. For a linear far joint it is the straight line M = M_F (1 - theta/theta_s).
double beam_line_rotation(const beam_model& model, int end, double m, const nonlinear_end& far,
                          double load_factor = 1.0);

struct collapse_point {
    double load_factor = 0;     // times the model's loads
    double rotation_start = 0;  // rad, the joints' rotation demand for ductility
    double rotation_end = 0;
    double moment_start = 0;    // N*m, hogging
    double moment_end = 0;
};

// Beam collapse: the load factor at which the largest sagging moment reaches
// the beam's plastic moment M_pl, with each end's moment limited to M_pl as
// well (a hinge forms in the beam beside a stronger joint). For a pinned UDL
// beam this is M_pl / (w L^2 / 8) with end rotations M_pl L / (3 EI); for a
// fixed-ended one 16 M_pl / (w L^2) (plastic hinge theory). nullopt where the
// loads cause no sagging moment.
std::optional<collapse_point> beam_collapse(const beam_model& model, const nonlinear_end& start,
                                            const nonlinear_end& end, double plastic_moment);

}  // namespace pinproof
