// Detailing rules of common practice for nominally pinned beam ends, checked
// as warnings, each stating the rule and where it comes from; and the rule of
// thumb for the rotation a simple connection must accommodate when no analysis
// gives it.
//
// Sources are those of docs/method/gap-geometry.md: Steel Buildings in Europe,
// Part 5 "Joint design" (SBE) and SCI P212 "Joints in steel construction:
// simple connections" where the rule is published there, otherwise marked
// 'from memory' or 'common practice, no source'.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/design_standard.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

enum class finding_status { pass, warn, not_applicable };
std::string to_string(finding_status s);  // "pass", "warn", "not-applicable"

struct detailing_finding {
    // Stable rule id, the same for both ends: "min-gap", "gap-tolerance", "plate-depth",
    // "plate-ductility", "bolt-hole-clearance", "bolt-edge-distance",
    // "long-fin-plate", "end-plate-thickness".
    std::string id;
    finding_status status = finding_status::not_applicable;
    std::optional<double> value;  // SI, of dimension `unit`
    std::optional<double> limit;
    dimension unit = dims::length;
    std::string rule;     // the rule, stated
    std::string source;   // where it comes from, with its status
    std::string message;  // what was found
};

// Every rule, in a fixed order, for one beam end; the lengths in the messages
// are shown in `units`. Each standard in its own terms: an EN 1993-1-8 project
// gets the rules of the European simple-joint guides, an AISC 360 project
// those of US practice (AISC 360 and the steel manual's Part 10), under the
// same rule ids.
std::vector<detailing_finding> check_detailing_rules(const connection_detail& detail, const section& beam,
                                                     unit_system units = unit_system::si,
                                                     design_standard standard = design_standard::en1993_1_8);

// The rotation a simple connection is commonly required to accommodate when no
// analysis gives the end rotation. Used only as a fallback demand.
struct rule_of_thumb {
    double value;
    std::string_view label;
    std::string_view source;
};

inline constexpr rule_of_thumb fallback_rotation_demand{
    0.03,
    "fallback rotation demand: 0.03 rad, the rule of thumb for the rotation a simple connection must accommodate, "
    "used because no analysis gives the end rotation",
    "AISC 360 Commentary (rotation capacity of about 0.03 rad described as adequate ductility) and the AISC Manual "
    "Part 10 single-plate procedure, whose tests and design rotation are 0.03 rad (Astaneh-Asl, Liu and McMullin, "
    "J. Constr. Steel Res. 58 (2002) 1121-1141); from memory"};

}  // namespace pinproof
