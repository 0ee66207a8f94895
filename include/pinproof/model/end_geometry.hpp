// The elevation of a beam end and its support, at rest and turned as a rigid
// body: the outline of the beam end, the support's material, the centres of
// rotation, and the clearance or overlap between the two at a given rotation.
// Pure geometry of the detail as drawn; the closure search and the end-gap
// check built on it are checks/gap_geometry.hpp.
//
// Frame (the elevation, looking at the beam web, support on the right):
//   origin  on the support face, at the level of the top of the supported beam;
//   x       horizontal, positive towards the support: the beam lies at x < 0,
//           the support face is the line x = 0 and the support is at x >= 0;
//   y       vertical, positive upwards: the beam top is y = 0, its bottom y = -h;
//   angles  positive counterclockwise.
// A sagging end rotation (the sense a simply supported beam turns under
// downward load) turns the beam end counterclockwise, so its bottom moves
// towards the support; a hogging rotation turns it clockwise, its top moves
// towards the support. The start end of a beam is the mirror image of this
// elevation; the geometry is the same.
//
// The rotation is exact (no small-angle form): a point p turns to
// c + R(theta) (p - c).
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/section.hpp"

namespace pinproof {

struct point2 {
    double x = 0;
    double y = 0;
};

enum class rotation_sense { sagging, hogging };
std::string to_string(rotation_sense s);  // "sagging", "hogging"

// The beam end as a simple polygon, counterclockwise. Edges flagged `cut` are
// where the drawing ends the beam; they and their vertices never make contact.
struct beam_outline {
    std::vector<point2> points;
    std::vector<std::string> point_labels;  // "bottom flange corner", "top cope corner", ...
    std::vector<std::string> edge_labels;   // edge i runs from point i to point i+1
    std::vector<bool> edge_cut;
};

// A quarter-circle root fillet of the supporting beam; its material lies
// outside the circle (the free side is the circle's inside).
struct support_arc {
    point2 centre;
    double radius = 0;
    point2 from;  // ends of the arc
    point2 to;
    std::string label;
};

struct support_segment {
    point2 from;
    point2 to;
    std::string label;
};

struct support_corner {
    point2 at;
    std::string label;
};

// The support as the boundary of its material facing the beam, plus the
// closed polygon of that material (arcs replaced by fine chords) used for
// clearances, overlap tests and drawing.
struct support_geometry {
    std::vector<support_segment> segments;
    std::vector<support_arc> arcs;
    std::vector<support_corner> corners;
    std::vector<point2> material;           // closed polygon, counterclockwise
    std::vector<bool> material_edge_cut;    // edges where the drawing ends the support
    std::string description;                // "column flange face", "web of IPE 400 with its flanges"
};

// A plate or cleat, for drawing. `moves_with_beam`: an end plate turns with
// the beam; a fin plate stays with the support; web cleats are drawn at rest.
struct fitting_outline {
    std::string label;
    std::vector<point2> points;
    bool moves_with_beam = false;
};

struct beam_end_geometry {
    double depth = 0;
    double flange_thickness = 0;  // 0 when the section does not give it
    double gap = 0;               // beam end to support face, as placed
    beam_outline outline;
    support_geometry support;
    point2 centre_sagging;        // centre of rotation for each sense
    point2 centre_hogging;
    std::string centre_basis;     // how the centre was chosen, with its status
    std::vector<fitting_outline> fittings;
    std::vector<point2> bolts;    // bolt positions in the beam web, at rest
    const point2& centre(rotation_sense s) const
    {
        return s == rotation_sense::sagging ? centre_sagging : centre_hogging;
    }
};

// Outline and support of a detail with the beam end placed `gap_in_place` from
// the support face. The centre of rotation moves with the beam where it lies in
// the beam (fin plate bolt group, custom) and stays on the support face where
// the fitting bears on it (web cleats, end plate). Default centres (common
// practice, no source): fin plate, the centroid of the bolt group; web cleats
// and end plate, the edge of the fitting that bears on the support face (its
// bottom edge in sagging, its top edge in hogging). A user centre replaces both.
beam_end_geometry build_geometry(const connection_detail& detail, const section& beam, double gap_in_place);
// The same at the worst-case gap, gap - gap_tolerance.
beam_end_geometry build_geometry(const connection_detail& detail, const section& beam);

// The place of first contact.
struct contact_point {
    std::string outline_part;  // "bottom flange corner", "top cope edge", ...
    std::string support_part;  // "support face", "supporting beam top flange tip", ...
    point2 at;                 // on the outline, at rest
    point2 centre;
    // Contact model: frictionless, so the bearing force acts along the normal
    // to the touching surfaces at the contact point (the support face, a root
    // fillet's radius, or the beam outline's edge where a support corner
    // touches it), in the position at contact. Its arm about the centre of
    // rotation is the perpendicular distance from the centre to that line of
    // action (docs/method/gap-geometry.md), never longer than `distance`.
    point2 normal;             // unit normal at contact, in the position at contact
    double lever_arm = 0;      // m, perpendicular distance from the centre to the line of action
    double distance = 0;       // m, straight distance from the centre to `at`
    std::string description() const;  // "bottom flange corner against support face"
};

// Smallest distance (m) from the outline, turned by `rotation` (rad, >= 0) in
// `sense`, to the support. Negative when they overlap: then the depth of the
// deepest vertex inside the other body.
double clearance(const beam_end_geometry& g, rotation_sense sense, double rotation);

// Where the outline, turned by `rotation` in `sense`, overlaps or touches the
// support (clearance <= 0): the outline part and the support part nearest each
// other there. nullopt when they stand clear.
std::optional<contact_point> overlap(const beam_end_geometry& g, rotation_sense sense, double rotation);

}  // namespace pinproof
