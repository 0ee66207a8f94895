// The demand a beam end passes to its supporting member: the joint's attracted
// moment plus the reaction times its eccentricity from the support's axis or
// face, and, for a continuous column, its share above and below the joint.
//
// Common practice of simple construction (BS 5950-1:2000 4.7.7 and the
// non-contradictory complementary information for Eurocode simple construction;
// reference pack 11.3, confirmed): the reaction of a nominally pinned beam is
// taken to act 100 mm from the face of the column (flange or web), whatever the
// connection; the net moment on a continuous column is shared between the
// lengths above and below in proportion to their stiffness EI/L. For a beam
// framing into the web of another beam the same moment twists the supporting
// beam: its torsion, with the reaction taken at the bolt line (common practice,
// no source).
// Signs: sign_conventions.hpp; the moment on the support is positive in the
// sense a hogging joint moment and a downward load on the support's bracket
// both turn it (they add for gravity loads).
// Units: SI.
#pragma once

#include <optional>

#include "pinproof/model/connection_detail.hpp"

namespace pinproof {

// The column the joint frames into, where the user gives it.
struct support_column {
    double I_above = 0, length_above = 0;  // m^4, m; length 0 with I 0: no column above (a roof)
    double I_below = 0, length_below = 0;
};

struct support_demand {
    double eccentricity = 0;  // m, from the face of the support (or the bolt line) to the reaction
    double moment = 0;        // N*m, joint moment + reaction * eccentricity
    std::optional<double> moment_above, moment_below;  // where a column is given
    std::optional<double> torsion;                     // for a beam-web support
};

// The default eccentricity of the reaction: 100 mm from the face of a column
// (flange or web), or the bolt line's distance from the supporting beam's web
// for a beam-web support (gap plus the bolt line of a fin plate; the fitting's
// own lever arm otherwise is not known and 100 mm is used).
double default_support_eccentricity(const connection_detail* detail);

// Throws std::invalid_argument for a column with neither length above nor
// below, or a non-finite value.
support_demand demand_on_support(double joint_moment, double reaction, double eccentricity,
                                 const std::optional<support_column>& column, bool beam_web_support);

}  // namespace pinproof
