// Elevation drawing of a beam end and its support, to scale, as a
// self-contained SVG document: the support hatched, the beam end at rest and
// turned to the rotation demand (exaggerated by a stated factor so that the
// movement can be seen), the gap, the centre of rotation, the lever arm to the
// point that closes first, and the closure result.
#pragma once

#include <string>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/checks/gap_geometry.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

struct detail_drawing_options {
    std::string title;            // e.g. "Beam B1, end"; a default is made when empty
    bool mirror = false;          // true for the start end of a beam: support drawn on the left
    double shown_rotation = 0.1;  // rad the exaggerated rotation aims at
    unit_system units = unit_system::si;  // of the lengths in the labels and the scale bar
};

// `rotation_demand` is signed as in sign_conventions.hpp: positive is the
// sagging sense, negative hogging; zero draws the beam end at rest only.
// `detail` must be the one `g` was built from.
std::string detail_svg(const beam_end_geometry& g, const connection_detail& detail, double rotation_demand,
                       const detail_drawing_options& options = {});

// The exaggeration factor the drawing uses: a round number (1, 2, 5 x 10^k)
// bringing the shown rotation near options.shown_rotation without reaching
// the closure rotation when the demand passes; 1 when the demand does not pass
// or is zero.
double drawing_exaggeration(double demand, const closure& c, double shown_rotation);

}  // namespace pinproof
