// The named results of a beam state, in one table, so that the JSON result,
// the text report and the envelopes share one spelling and one unit.
#pragma once

#include <array>

#include "pinproof/model/beam_model.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

struct result_field {
    const char* key;    // JSON key, e.g. "moment_start"
    const char* label;  // report label, e.g. "end moment, start (hogging +)"
    dimension dim;
    double beam_state::*member;
};

inline const std::array<result_field, 12>& result_fields()
{
    static const std::array<result_field, 12> fields{{
        {"reaction_start", "reaction, start (up +)", dims::force, &beam_state::reaction_start},
        {"reaction_end", "reaction, end (up +)", dims::force, &beam_state::reaction_end},
        {"moment_start", "end moment, start (hogging +)", dims::moment, &beam_state::moment_start},
        {"moment_end", "end moment, end (hogging +)", dims::moment, &beam_state::moment_end},
        {"max_sagging_moment", "max sagging moment", dims::moment, &beam_state::max_sagging_moment},
        {"max_sagging_at", "  at, from start", dims::length, &beam_state::max_sagging_at},
        {"max_hogging_moment", "max hogging moment (0: none)", dims::moment, &beam_state::max_hogging_moment},
        {"max_hogging_at", "  at, from start", dims::length, &beam_state::max_hogging_at},
        {"max_deflection", "max deflection (down +)", dims::length, &beam_state::max_deflection},
        {"max_deflection_at", "  at, from start", dims::length, &beam_state::max_deflection_at},
        {"rotation_start", "end rotation, start", dims::angle, &beam_state::rotation_start},
        {"rotation_end", "end rotation, end", dims::angle, &beam_state::rotation_end},
    }};
    return fields;
}

}  // namespace pinproof
