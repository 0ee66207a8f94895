// The check that governs a beam: what a summary names first. A failed check
// governs over any other; among failed checks, or among the others with a
// value and a limit, the largest utilisation governs; a failed check without
// a utilisation (a rigid joint) outranks every utilisation. Checks that only
// report (informative) and the detailing rules (advice, some of them least
// values) never govern.
#pragma once

#include <optional>

#include "pinproof/checks/assessment.hpp"

namespace pinproof {

// value / limit, or limit / value for a least limit (the floor frequency);
// nullopt without both, or where it would not be finite.
std::optional<double> utilisation(const check& c);

// nullptr when no check has a utilisation and none fails.
const check* governing_check(const beam_assessment& a);

}  // namespace pinproof
