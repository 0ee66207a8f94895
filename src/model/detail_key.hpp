// The identity of a connection detail on a beam section, as a key for the
// per-thread caches of results that depend on nothing else: the closure
// geometry (gap_geometry.cpp) and the detailing rules (detailing_rules.cpp).
// A schedule repeats few pairs of detail and section over many beams.
#pragma once

#include <string>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/section.hpp"

namespace pinproof {

// Every field of the detail and the section, by value: equal keys mean
// bit-identical inputs.
std::string detail_key(const connection_detail& d, const section& beam);

}  // namespace pinproof
