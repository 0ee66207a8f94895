#include "pinproof/model/end_geometry.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <string>
#include <utility>

#include "model/plane_geometry.hpp"
#include "pinproof/core/errors.hpp"

namespace pinproof {

using namespace plane;

namespace {

constexpr double pi = 3.14159265358979323846;

// ---------------------------------------------------------------------------
// Building the geometry.

void add_point(beam_outline& o, point2 p, std::string point_label, std::string edge_label, bool cut = false)
{
    o.points.push_back(p);
    o.point_labels.push_back(std::move(point_label));
    o.edge_labels.push_back(std::move(edge_label));
    o.edge_cut.push_back(cut);
}

std::vector<point2> arc_chords(point2 centre, double radius, double from_angle, double to_angle)
{
    std::vector<point2> pts;
    for (int k = 0; k <= chords_per_arc; ++k) {
        const double t = from_angle + (to_angle - from_angle) * k / chords_per_arc;
        pts.push_back({centre.x + radius * std::cos(t), centre.y + radius * std::sin(t)});
    }
    return pts;
}

support_geometry column_support(const std::string& face, double reach)
{
    support_geometry s;
    const double top = reach, bottom = -reach;
    const double width = 0.25 * reach;
    s.segments.push_back({{0, top}, {0, bottom}, face});
    s.material = {{0, bottom}, {width, bottom}, {width, top}, {0, top}};
    s.material_edge_cut = {true, true, true, false};
    s.description = face;
    return s;
}

support_geometry beam_web_support(const supporting_beam& sb)
{
    support_geometry s;
    const double o = sb.flange_outstand(), tw = sb.web_thickness, r = sb.root_radius;
    const double yT = -sb.top, yTu = -sb.top_flange_underside(), yBt = -sb.bottom_flange_top(), yB = -(sb.top + sb.depth);
    const std::string who = "supporting beam ";
    auto seg = [&](point2 a, point2 b, const std::string& label) { s.segments.push_back({a, b, who + label}); };
    auto corner = [&](point2 p, const std::string& label) { s.corners.push_back({p, who + label}); };

    seg({tw + o, yT}, {-o, yT}, "top flange top face");
    seg({-o, yT}, {-o, yTu}, "top flange tip");
    seg({-o, yTu}, {-r, yTu}, "top flange underside");
    seg({0, yTu - r}, {0, yBt + r}, "web face");
    seg({-r, yBt}, {-o, yBt}, "bottom flange top face");
    seg({-o, yBt}, {-o, yB}, "bottom flange tip");
    seg({-o, yB}, {tw + o, yB}, "bottom flange underside");
    corner({-o, yT}, "top flange tip, upper corner");
    corner({-o, yTu}, "top flange tip, lower corner");
    corner({-o, yBt}, "bottom flange tip, upper corner");
    corner({-o, yB}, "bottom flange tip, lower corner");
    if (r > 0) {
        s.arcs.push_back({{-r, yTu - r}, r, {-r, yTu}, {0, yTu - r}, who + "top root fillet"});
        s.arcs.push_back({{-r, yBt + r}, r, {0, yBt + r}, {-r, yBt}, who + "bottom root fillet"});
        corner({-r, yTu}, "top root fillet, flange end");
        corner({0, yTu - r}, "top root fillet, web end");
        corner({0, yBt + r}, "bottom root fillet, web end");
        corner({-r, yBt}, "bottom root fillet, flange end");
    } else {
        corner({0, yTu}, "top flange to web corner");
        corner({0, yBt}, "bottom flange to web corner");
    }

    // Material polygon of the whole cross-section, counterclockwise. Only the
    // half facing the supported beam is real for contact; the far half is
    // flagged as cut.
    std::vector<point2>& m = s.material;
    std::vector<bool>& cut = s.material_edge_cut;
    auto push = [&](point2 p, bool edge_cut) {
        m.push_back(p);
        cut.push_back(edge_cut);
    };
    // Interior chord points of a fillet arc; the caller pushes its two ends.
    auto push_arc = [&](point2 c, double a0, double a1, bool edge_cut) {
        const auto pts = arc_chords(c, r, a0, a1);
        for (std::size_t k = 1; k + 1 < pts.size(); ++k) push(pts[k], edge_cut);
    };
    push({-o, yB}, false);               // bottom flange underside
    push({tw + o, yB}, true);            // far bottom flange tip
    push({tw + o, yBt}, true);
    if (r > 0) {
        push({tw + r, yBt}, true);
        push_arc({tw + r, yBt + r}, -pi / 2, -pi, true);
        push({tw, yBt + r}, true);
        push({tw, yTu - r}, true);
        push_arc({tw + r, yTu - r}, pi, pi / 2, true);
        push({tw + r, yTu}, true);
    } else {
        push({tw, yBt}, true);
        push({tw, yTu}, true);
    }
    push({tw + o, yTu}, true);           // far top flange tip
    push({tw + o, yT}, false);           // top face
    push({-o, yT}, false);               // near top flange tip
    push({-o, yTu}, false);              // near top flange underside
    if (r > 0) {
        push({-r, yTu}, false);
        push_arc({-r, yTu - r}, pi / 2, 0, false);
        push({0, yTu - r}, false);       // web face
        push({0, yBt + r}, false);
        push_arc({-r, yBt + r}, 0, -pi / 2, false);
        push({-r, yBt}, false);          // near bottom flange top face
    } else {
        push({0, yTu}, false);
        push({0, yBt}, false);
    }
    push({-o, yBt}, false);
    // the last edge, from (-o, yBt) to (-o, yB), is the bottom flange tip
    s.description = "web of " + sb.name + " with its flanges";
    return s;
}

point2 frame_point(const detail_point& p, double shift) { return {-(p.from_support - shift), -p.below_top}; }

// Reach of the drawn beam: far enough behind the end that no real contact
// can lie on the drawing's cut.
double drawing_reach(const connection_detail& d, double h)
{
    double reach = 2.0 * h;
    for (const auto& c : {d.cope_top, d.cope_bottom})
        if (c) reach = std::max(reach, c->length + h);
    if (d.support_beam) reach = std::max(reach, d.support_beam->flange_outstand() + h);
    reach = std::max(reach, d.bolts.bolt_line + d.gap + h);
    return reach;
}

void add_custom_outline(beam_outline& o, const connection_detail& d, double shift)
{
    std::vector<point2> pts;
    for (const auto& p : d.outline) pts.push_back(frame_point(p, shift));
    std::vector<std::size_t> order(pts.size());
    for (std::size_t i = 0; i < pts.size(); ++i) order[i] = i;
    if (signed_area(pts) < 0) std::reverse(order.begin(), order.end());
    for (std::size_t k = 0; k < order.size(); ++k) {
        const std::size_t i = order[k], j = order[(k + 1) % order.size()];
        add_point(o, pts[i], "outline point " + std::to_string(i + 1),
                  "outline edge " + std::to_string(std::min(i, j) + 1) + "-" + std::to_string(std::max(i, j) + 1));
    }
}

void add_rolled_outline(beam_outline& o, const connection_detail& d, double h, double gap_in_place, double reach)
{
    const double xe = -gap_in_place;
    const double xf = xe - reach;
    add_point(o, {xf, -h}, "beam bottom at the drawing cut", "bottom flange");
    if (d.cope_bottom) {
        const auto& c = *d.cope_bottom;
        add_point(o, {xe - c.length, -h}, "bottom flange end at the bottom cope", "bottom cope end");
        add_point(o, {xe - c.length, -h + c.depth}, "bottom cope re-entrant corner", "bottom cope edge");
        add_point(o, {xe, -h + c.depth}, "bottom cope corner", "beam end");
    } else {
        add_point(o, {xe, -h}, "bottom flange corner", "beam end");
    }
    if (d.cope_top) {
        const auto& c = *d.cope_top;
        add_point(o, {xe, -c.depth}, "top cope corner", "top cope edge");
        add_point(o, {xe - c.length, -c.depth}, "top cope re-entrant corner", "top cope end");
        add_point(o, {xe - c.length, 0}, "top flange end at the top cope", "top flange");
    } else {
        add_point(o, {xe, 0}, "top flange corner", "top flange");
    }
    add_point(o, {xf, 0}, "beam top at the drawing cut", "drawing cut", true);
}

void place_support(beam_end_geometry& g, const connection_detail& d, const beam_outline& o, double h)
{
    double support_reach = 0;
    for (const auto& p : o.points) support_reach = std::max({support_reach, std::abs(p.x), std::abs(p.y)});
    support_reach = 2.0 * support_reach + h;
    switch (d.support) {
    case support_type::column_flange: g.support = column_support("column flange face", support_reach); break;
    case support_type::column_web: g.support = column_support("column web face", support_reach); break;
    case support_type::beam_web:
        if (!d.support_beam) throw internal_error("build_geometry: beam-web support without its supporting beam");
        g.support = beam_web_support(*d.support_beam);
        break;
    }
}

// Fittings, bolts and the centre of rotation.
void place_fittings(beam_end_geometry& g, const connection_detail& d, double gap_in_place, double shift)
{
    const double pt = d.plate_top, hp = d.plate_depth;
    const auto bolt_level = [&](int i) { return -(pt + d.bolts.first_bolt + i * d.bolts.pitch); };
    bool centre_moves_with_beam = true;
    switch (d.type) {
    case detail_type::fin_plate: {
        const double xb = -(gap_in_place + d.bolts.bolt_line);
        // Drawn with an end distance of 2d past the bolt line.
        const double xp = xb - 2.0 * d.bolts.diameter;
        g.fittings.push_back({"fin plate", {{xp, -pt - hp}, {0, -pt - hp}, {0, -pt}, {xp, -pt}}, false});
        for (int i = 0; i < d.bolts.rows; ++i) g.bolts.push_back({xb, bolt_level(i)});
        // Centroid of the bolt group (common practice, no source).
        g.centre_sagging = g.centre_hogging = {xb, -(pt + d.bolts.first_bolt + 0.5 * (d.bolts.rows - 1) * d.bolts.pitch)};
        g.centre_basis = "centroid of the bolt group (common practice, no source)";
        break;
    }
    case detail_type::web_cleats: {
        // Drawn as a 90 mm leg on the beam web, or longer to reach past the gap.
        const double leg = std::max(0.090, gap_in_place + 3.0 * d.bolts.diameter);
        g.fittings.push_back({"web cleats", {{-leg, -pt - hp}, {0, -pt - hp}, {0, -pt}, {-leg, -pt}}, false});
        for (int i = 0; i < d.bolts.rows; ++i) g.bolts.push_back({-0.55 * leg, bolt_level(i)});
        // The cleats bear on the support face at their edge on the closing
        // side (common practice, no source).
        g.centre_sagging = {0, -(pt + hp)};
        g.centre_hogging = {0, -pt};
        g.centre_basis = "edge of the cleats bearing on the support face: bottom edge in sagging, top edge in "
                         "hogging (common practice, no source)";
        centre_moves_with_beam = false;
        break;
    }
    case detail_type::end_plate: {
        g.fittings.push_back(
            {"end plate", {{-gap_in_place, -pt - hp}, {0, -pt - hp}, {0, -pt}, {-gap_in_place, -pt}}, true});
        g.centre_sagging = {0, -(pt + hp)};
        g.centre_hogging = {0, -pt};
        g.centre_basis = "edge of the end plate bearing on the support face: bottom edge in sagging, top edge in "
                         "hogging (common practice, no source)";
        centre_moves_with_beam = false;
        break;
    }
    case detail_type::custom: g.centre_basis = "given by the user"; break;
    }
    if (d.centre_of_rotation) {
        g.centre_sagging = g.centre_hogging = frame_point(*d.centre_of_rotation, centre_moves_with_beam ? shift : 0.0);
        g.centre_basis = "given by the user";
    } else if (d.type == detail_type::custom) {
        throw internal_error("build_geometry: a custom detail needs its centre of rotation (validated at input)");
    }
}

}  // namespace

std::string to_string(rotation_sense s) { return s == rotation_sense::sagging ? "sagging" : "hogging"; }

std::string contact_point::description() const { return outline_part + " against " + support_part; }

beam_end_geometry build_geometry(const connection_detail& detail, const section& beam)
{
    return build_geometry(detail, beam, detail.worst_case_gap());
}

beam_end_geometry build_geometry(const connection_detail& d, const section& beam, double gap_in_place)
{
    if (!(beam.depth > 0) || !std::isfinite(gap_in_place) || !(gap_in_place > 0))
        throw internal_error("build_geometry: beam depth and gap must be positive (validated at input)");
    beam_end_geometry g;
    const double h = beam.depth;
    g.depth = h;
    g.flange_thickness = beam.flange_thickness.value_or(0.0);
    g.gap = gap_in_place;
    const double shift = d.gap - gap_in_place;  // how far the beam has moved towards the support

    const double reach = drawing_reach(d, h);

    beam_outline& o = g.outline;
    if (d.type == detail_type::custom) {
        add_custom_outline(o, d, shift);
    } else {
        add_rolled_outline(o, d, h, gap_in_place, reach);
    }

    // Support.
    place_support(g, d, o, h);

    place_fittings(g, d, gap_in_place, shift);

    if (signed_area(o.points) <= 0) throw internal_error("build_geometry: beam outline is not counterclockwise");
    return g;
}

// ---------------------------------------------------------------------------
// Clearance.

namespace {

struct body_edges {
    std::vector<std::pair<point2, point2>> edges;  // real edges only
    std::vector<point2> vertices;                   // real vertices only
};

body_edges outline_edges(const beam_outline& o, point2 c, double angle)
{
    body_edges b;
    const std::size_t n = o.points.size();
    std::vector<point2> p(n);
    for (std::size_t i = 0; i < n; ++i) p[i] = rotated(o.points[i], c, angle);
    for (std::size_t i = 0; i < n; ++i) {
        if (!o.edge_cut[i]) b.edges.push_back({p[i], p[(i + 1) % n]});
        if (vertex_is_real(o, i)) b.vertices.push_back(p[i]);
    }
    return b;
}

body_edges support_edges(const support_geometry& s)
{
    body_edges b;
    const std::size_t n = s.material.size();
    for (std::size_t i = 0; i < n; ++i) {
        const bool real_in = !s.material_edge_cut[(i + n - 1) % n], real_out = !s.material_edge_cut[i];
        if (real_out) b.edges.push_back({s.material[i], s.material[(i + 1) % n]});
        if (real_in || real_out) b.vertices.push_back(s.material[i]);
    }
    return b;
}

double distance_to_edges(point2 p, const body_edges& b)
{
    double d = std::numeric_limits<double>::max();
    for (const auto& e : b.edges) d = std::min(d, distance_to_segment(p, e.first, e.second));
    return d;
}

// p less its nearest point on the segment ab, formed as distance_to_segment
// (plane_geometry.hpp) forms it.
point2 offset_to_segment(point2 p, point2 a, point2 b)
{
    const point2 ab = b - a;
    const double len2 = dot(ab, ab);
    double t = len2 > 0 ? dot(p - a, ab) / len2 : 0.0;
    t = std::clamp(t, 0.0, 1.0);
    return p - (a + t * ab);
}

// The axis-aligned box of an edge.
struct edge_box {
    double x0, y0, x1, y1;
};

std::vector<edge_box> boxes_of(const body_edges& b)
{
    std::vector<edge_box> out;
    out.reserve(b.edges.size());
    for (const auto& e : b.edges)
        out.push_back({std::min(e.first.x, e.second.x), std::min(e.first.y, e.second.y),
                       std::max(e.first.x, e.second.x), std::max(e.first.y, e.second.y)});
    return out;
}

// The squared distance between two boxes: a lower bound of the squared
// distance between the edges inside them, zero where the boxes overlap.
double box_gap2(const edge_box& a, const edge_box& b)
{
    const double dx = std::max({0.0, a.x0 - b.x1, b.x0 - a.x1});
    const double dy = std::max({0.0, a.y0 - b.y1, b.y0 - a.y1});
    return dx * dx + dy * dy;
}

// The least of segment_distance over every pair of a moving and a fixed edge,
// to the bit, and whether two edges cross. The clearance is asked for at every
// step of the closure search: the pairs are compared by squared length (no
// root), and hypot is taken only of the offsets within round-off of the least
// (a relative 1e-12 of the square, far above the error of either form). A pair
// whose boxes lie further apart than the least found so far (with a margin of
// 1e-9 relative, far above round-off) can neither cross nor come nearer, and
// is skipped: the answer is the same, found with a fraction of the pairs.
double nearest_edges(const body_edges& moving, const body_edges& fixed, bool& crossing)
{
    const std::vector<edge_box> moving_boxes = boxes_of(moving), fixed_boxes = boxes_of(fixed);
    double least2 = std::numeric_limits<double>::max();
    const auto each_offset = [&](auto&& bound2, auto&& use) {
        for (std::size_t i = 0; i < moving.edges.size(); ++i)
            for (std::size_t j = 0; j < fixed.edges.size(); ++j) {
                if (box_gap2(moving_boxes[i], fixed_boxes[j]) > bound2() * (1.0 + 1e-9)) continue;
                const auto& e = moving.edges[i];
                const auto& f = fixed.edges[j];
                if (segments_cross(e.first, e.second, f.first, f.second)) {
                    crossing = true;
                    continue;
                }
                use(offset_to_segment(e.first, f.first, f.second));
                use(offset_to_segment(e.second, f.first, f.second));
                use(offset_to_segment(f.first, e.first, e.second));
                use(offset_to_segment(f.second, e.first, e.second));
            }
    };
    each_offset([&] { return least2; }, [&](point2 v) { least2 = std::min(least2, dot(v, v)); });
    if (crossing) return 0.0;
    double nearest = std::numeric_limits<double>::max();
    const double within = least2 * (1.0 + 1e-12);
    each_offset([&] { return within; }, [&](point2 v) {
        if (dot(v, v) <= within) nearest = std::min(nearest, norm(v));
    });
    return nearest;
}

}  // namespace

double clearance(const beam_end_geometry& g, rotation_sense sense, double rotation)
{
    const double angle = sense_sign(sense) * rotation;
    const point2 c = g.centre(sense);
    const body_edges moving = outline_edges(g.outline, c, angle);
    const body_edges fixed = support_edges(g.support);
    std::vector<point2> moving_polygon;
    for (const auto& p : g.outline.points) moving_polygon.push_back(rotated(p, c, angle));

    constexpr double touch = 1e-12;
    double depth = 0;
    bool overlap = false;
    for (const auto& p : moving.vertices)
        if (inside_polygon(p, g.support.material)) {
            const double dd = distance_to_edges(p, fixed);
            if (dd > touch) {
                overlap = true;
                depth = std::max(depth, dd);
            }
        }
    for (const auto& p : fixed.vertices)
        if (inside_polygon(p, moving_polygon)) {
            const double dd = distance_to_edges(p, moving);
            if (dd > touch) {
                overlap = true;
                depth = std::max(depth, dd);
            }
        }
    bool crossing = false;
    const double nearest = nearest_edges(moving, fixed, crossing);
    if (overlap || crossing) return -std::max(depth, 1e-9);
    return nearest;
}

namespace {

struct support_part {
    std::string label;
    double distance = 0;
    point2 normal;  // unit normal of the part at its point nearest p
};

// Nearest labelled part of the support boundary to a point.
support_part nearest_support_part(const support_geometry& s, point2 p)
{
    support_part best{s.description, std::numeric_limits<double>::max(), {1, 0}};
    for (const auto& seg : s.segments) {
        const double d = distance_to_segment(p, seg.from, seg.to);
        if (d < best.distance) best = {seg.label, d, (1.0 / norm(seg.to - seg.from)) * perp(seg.to - seg.from)};
    }
    for (const auto& arc : s.arcs) {
        const double d = within_arc(p, arc) ? std::abs(norm(p - arc.centre) - arc.radius)
                                            : std::min(norm(p - arc.from), norm(p - arc.to));
        const double r = norm(p - arc.centre);
        if (d < best.distance && r > 0) best = {arc.label, d, (1.0 / r) * (p - arc.centre)};
    }
    return best;
}

}  // namespace

std::optional<contact_point> overlap(const beam_end_geometry& g, rotation_sense sense, double rotation)
{
    if (clearance(g, sense, rotation) > 0) return std::nullopt;
    const double angle = sense_sign(sense) * rotation;
    const point2 c = g.centre(sense);
    const beam_outline& o = g.outline;
    const std::size_t n = o.points.size();
    const body_edges fixed = support_edges(g.support);
    std::vector<point2> moving_polygon;
    for (const auto& p : o.points) moving_polygon.push_back(rotated(p, c, angle));

    // The deepest vertex of either body inside the other; else the nearest pair.
    contact_point best;
    best.centre = c;
    double score = std::numeric_limits<double>::max();  // lower is deeper
    for (std::size_t i = 0; i < n; ++i) {
        if (!vertex_is_real(o, i)) continue;
        const point2 p = moving_polygon[i];
        const double d = distance_to_edges(p, fixed);
        const double v = inside_polygon(p, g.support.material) ? -d : d;
        if (v < score) {
            score = v;
            const support_part part = nearest_support_part(g.support, p);
            best.outline_part = o.point_labels[i];
            best.support_part = part.label;
            best.at = o.points[i];
            best.normal = part.normal;
            best.lever_arm = std::abs(cross(p - c, part.normal));
        }
    }
    for (const auto& corner : g.support.corners) {
        const bool inside = inside_polygon(corner.at, moving_polygon);
        double nearest = std::numeric_limits<double>::max();
        std::size_t edge = 0;
        // Support corners against outline edges: the force acts along the
        // edge's normal through the corner.
        for (std::size_t i = 0; i < n; ++i) {
            if (o.edge_cut[i]) continue;
            const double d = distance_to_segment(corner.at, moving_polygon[i], moving_polygon[(i + 1) % n]);
            if (d < nearest) {
                nearest = d;
                edge = i;
            }
        }
        const double v = inside ? -nearest : nearest;
        if (v < score) {
            score = v;
            best.outline_part = o.edge_labels[edge];
            best.support_part = corner.label;
            best.at = rotated(corner.at, c, -angle);
            const point2 ab = moving_polygon[(edge + 1) % n] - moving_polygon[edge];
            best.normal = (1.0 / norm(ab)) * perp(ab);
            best.lever_arm = std::abs(cross(corner.at - c, best.normal));
        }
    }
    best.distance = norm(best.at - c);
    return best;
}

}  // namespace pinproof
