// Plane geometry of the elevation of a beam end (the frame of
// model/end_geometry.hpp): vector arithmetic, rotation about a centre,
// distances, polygon tests. Internal to the library; shared by the at-rest
// geometry (model) and the closure search (checks).
#pragma once

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <vector>

#include "pinproof/model/end_geometry.hpp"

namespace pinproof::plane {

// Chords per root-fillet arc in the material polygon of a support. The chords
// lie on the free side of the arc, so clearances from the polygon err on the
// safe side by at most the sagitta r (1 - cos(pi/4/n)): 1.9e-5 r for n = 128.
inline constexpr int chords_per_arc = 128;

inline point2 operator+(point2 a, point2 b) { return {a.x + b.x, a.y + b.y}; }
inline point2 operator-(point2 a, point2 b) { return {a.x - b.x, a.y - b.y}; }
inline point2 operator*(double k, point2 a) { return {k * a.x, k * a.y}; }
inline double dot(point2 a, point2 b) { return a.x * b.x + a.y * b.y; }
inline double cross(point2 a, point2 b) { return a.x * b.y - a.y * b.x; }
inline double norm(point2 a) { return std::hypot(a.x, a.y); }
inline point2 perp(point2 a) { return {-a.y, a.x}; }  // a turned by +90 degrees

inline point2 rotated(point2 p, point2 c, double angle)
{
    const double cs = std::cos(angle), sn = std::sin(angle);
    const point2 r = p - c;
    return {c.x + cs * r.x - sn * r.y, c.y + sn * r.x + cs * r.y};
}

// Sign of the geometric rotation angle for a sense, in the frame of the header.
inline double sense_sign(rotation_sense s) { return s == rotation_sense::sagging ? 1.0 : -1.0; }

inline double distance_to_segment(point2 p, point2 a, point2 b)
{
    const point2 ab = b - a;
    const double len2 = dot(ab, ab);
    double t = len2 > 0 ? dot(p - a, ab) / len2 : 0.0;
    t = std::clamp(t, 0.0, 1.0);
    return norm(p - (a + t * ab));
}

inline bool segments_cross(point2 a, point2 b, point2 c, point2 d)
{
    // Proper crossing only: each segment's ends strictly on both sides of the other.
    const double d1 = cross(b - a, c - a), d2 = cross(b - a, d - a);
    const double d3 = cross(d - c, a - c), d4 = cross(d - c, b - c);
    return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
}

inline double segment_distance(point2 a, point2 b, point2 c, point2 d)
{
    if (segments_cross(a, b, c, d)) return 0.0;
    return std::min({distance_to_segment(a, c, d), distance_to_segment(b, c, d), distance_to_segment(c, a, b),
                     distance_to_segment(d, a, b)});
}

inline bool inside_polygon(point2 p, const std::vector<point2>& poly)
{
    bool in = false;
    const std::size_t n = poly.size();
    for (std::size_t i = 0, j = n - 1; i < n; j = i++) {
        const point2 a = poly[i], b = poly[j];
        if ((a.y > p.y) != (b.y > p.y)) {
            const double x = a.x + (p.y - a.y) * (b.x - a.x) / (b.y - a.y);
            if (p.x < x) in = !in;
        }
    }
    return in;
}

inline double signed_area(const std::vector<point2>& poly)
{
    double a = 0;
    for (std::size_t i = 0, n = poly.size(); i < n; ++i) a += cross(poly[i], poly[(i + 1) % n]);
    return 0.5 * a;
}

inline bool within_arc(point2 p, const support_arc& arc)
{
    // Quarter arcs: p's direction from the centre must lie between the two ends.
    const point2 a = arc.from - arc.centre, b = arc.to - arc.centre, u = p - arc.centre;
    const double sense = cross(a, b) > 0 ? 1.0 : -1.0;
    const double tol = 1e-9 * arc.radius * norm(u);
    return sense * cross(a, u) >= -tol && sense * cross(u, b) >= -tol;
}

inline bool vertex_is_real(const beam_outline& o, std::size_t i)
{
    const std::size_t n = o.points.size();
    return !o.edge_cut[i] && !o.edge_cut[(i + n - 1) % n];
}

}  // namespace pinproof::plane
