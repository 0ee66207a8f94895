// Elevation of a beam as the analysis idealises it, as a self-contained SVG
// document: the beam as a line, each end drawn as the support the analysis
// assumes (a pin or a roller where the joint is a true pin, a fixed end where
// it is rigid, a rotational spring with its stiffness range otherwise), the
// unfactored loads of every load case drawn to scale within their kind (line
// loads by intensity, point loads by force) and labelled with their values,
// and the dimensions: the span and the positions of the loads.
//
// The symbols follow the conventions of structural analysis textbooks (a
// triangle for a pin, a triangle on rollers for a free horizontal support,
// hatching for a fixed end, a coil for a rotational spring): common practice,
// no source.
#pragma once

#include <string>

#include "pinproof/core/units.hpp"
#include "pinproof/model/project.hpp"

namespace pinproof {

// How an end is idealised in the drawing, from the joint's stiffness range.
enum class end_idealisation { pin, spring, fixed };
end_idealisation idealisation_of(const joint& j);

// The drawing; `units` are those of the labels (the project's).
std::string beam_elevation_svg(const beam& b, unit_system units);

}  // namespace pinproof
