// Loads on a beam, load cases and combinations. Signs: sign_conventions.hpp.
#pragma once

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace pinproof {

enum class load_kind { point, udl, linear, moment };

std::string to_string(load_kind k);  // "point", "udl", "linear", "moment"

// One load. Positions are measured from the start support, in m.
//   point : force `value` (N, downward positive) at `from`
//   moment: couple `value` (N*m, clockwise positive) at `from`
//   udl   : line load `value` (N/m) from `from` to `to`
//   linear: line load varying linearly from `value` at `from` to `value_end` at `to`
struct load {
    load_kind kind = load_kind::point;
    double value = 0;
    double value_end = 0;  // linear only
    double from = 0;
    double to = 0;         // distributed loads only
    std::string load_case; // e.g. "G", "Q"
};

// A position along the span as read from input (m), or nullopt when it lies
// outside [0, span]. A position within a relative 1e-9 of the span from 0 or
// from the span is that end exactly: "7100 mm" on a span of "7.1 m" converts
// to one unit in the last place above the span, and is the span end.
std::optional<double> position_on_span(double x, double span);

// Line load intensity of a distributed load at x (N/m); 0 outside it.
double intensity_at(const load& l, double x);
// Total downward force of a load (N); 0 for a point moment.
double total_force(const load& l);
// Clockwise moment of a load about x = 0 (N*m): force * lever + couple.
double moment_about_start(const load& l);

// A vibration combination (for example G + 0.1 Q) gives the mass that vibrates
// with the beam: its downward loads over g (model/natural_frequency.hpp). It is
// neither a strength nor a service combination for the other checks.
enum class limit_state { strength, service, vibration };

std::string to_string(limit_state u);  // "strength", "service", "vibration"

struct combination {
    std::string name;
    limit_state use = limit_state::strength;
    std::map<std::string, double> factors;  // load case -> factor
};

// The loads of `all` scaled by the combination's factors; loads of cases the
// combination does not name are left out.
std::vector<load> factored_loads(const std::vector<load>& all, const combination& c);

}  // namespace pinproof
