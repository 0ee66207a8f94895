#include "pinproof/checks/gap_geometry.hpp"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <limits>
#include <map>
#include <string>
#include <sstream>
#include <utility>

#include <boost/math/tools/toms748_solve.hpp>

#include "model/detail_key.hpp"
#include "pinproof/core/errors.hpp"

#include "model/plane_geometry.hpp"

namespace pinproof {

using namespace plane;

namespace {

constexpr double pi = 3.14159265358979323846;

// Roots closer to zero than this are contacts present at rest.
constexpr double rest_angle = 1e-9;

// Angles in (rest_angle, max_searched_rotation] solving A cos t + B sin t = d.
// With rho = hypot(A, B) and phi = atan2(B, A) the equation is
// rho cos(t - phi) = d, so t = phi -/+ acos(d / rho) (first principles).
std::vector<double> trig_roots(double A, double B, double d)
{
    std::vector<double> out;
    // Most pairs of an outline point and a support edge never touch, |d| far
    // above rho: a squared comparison (with a margin far above round-off, so
    // that it settles only what the test below would) spares them the hypot.
    const double rho2 = A * A + B * B;
    if (rho2 > 1e-280 && rho2 < 1e280 && d * d > rho2 * (1.0 + 1e-7)) return out;
    const double rho = std::hypot(A, B);
    if (!(rho > 1e-300)) return out;
    double x = d / rho;
    if (x > 1.0 + 1e-12 || x < -1.0 - 1e-12) return out;
    x = std::clamp(x, -1.0, 1.0);
    const double phi = std::atan2(B, A);
    const double alpha = std::acos(x);
    for (double t : {phi - alpha, phi + alpha}) {
        t = std::fmod(t, 2.0 * pi);
        if (t < 0) t += 2.0 * pi;
        if (t > 2.0 * pi - 1e-13) t = 0.0;  // a root at 2 pi is the root at 0
        if (t > rest_angle && t <= max_searched_rotation) out.push_back(t);
    }
    return out;
}

struct candidate {
    double angle = 0;
    contact_point contact;
};

// Keeps a contact found at `angle`.
// `where` is the contact point and `normal` the unit normal of the touching
// surfaces there, both in the position at contact; the arm of the bearing
// force about the centre is the perpendicular distance to its line of
// action (frictionless contact).
struct candidate_keeper {
    point2 c;
    std::vector<candidate>& found;

    void operator()(double angle, std::string outline_part, std::string support_part, point2 at, point2 where,
                    point2 normal) const
    {
        candidate k;
        k.angle = angle;
        k.contact.outline_part = std::move(outline_part);
        k.contact.support_part = std::move(support_part);
        k.contact.at = at;
        k.contact.centre = c;
        k.contact.normal = normal;
        k.contact.lever_arm = std::abs(cross(where - c, normal));
        k.contact.distance = norm(at - c);
        found.push_back(std::move(k));
    }
};

// Outline vertices against support segments and arcs.
void vertex_contacts(const beam_end_geometry& g, double s, point2 c, const candidate_keeper& keep)
{
    const beam_outline& o = g.outline;
    const std::size_t n = o.points.size();
    for (std::size_t i = 0; i < n; ++i) {
        if (!vertex_is_real(o, i)) continue;
        const point2 p = o.points[i];
        const point2 r = p - c;
        if (norm(r) < 1e-12) continue;  // the centre itself does not move
        for (const auto& seg : g.support.segments) {
            const point2 ab = seg.to - seg.from;
            const point2 nrm = (1.0 / norm(ab)) * perp(ab);
            // n . (c + R(s t) r) = n . a
            for (double t : trig_roots(dot(nrm, r), s * dot(nrm, perp(r)), dot(nrm, seg.from - c))) {
                const point2 q = rotated(p, c, s * t);
                const double u = dot(q - seg.from, ab) / dot(ab, ab);
                if (u >= -1e-12 && u <= 1.0 + 1e-12) keep(t, o.point_labels[i], seg.label, p, q, nrm);
            }
        }
        for (const auto& arc : g.support.arcs) {
            // |c - centre + R(s t) r|^2 = radius^2
            const point2 dd = c - arc.centre;
            const double rhs = 0.5 * (arc.radius * arc.radius - dot(dd, dd) - dot(r, r));
            for (double t : trig_roots(dot(dd, r), s * dot(dd, perp(r)), rhs)) {
                const point2 q = rotated(p, c, s * t);
                if (within_arc(q, arc)) keep(t, o.point_labels[i], arc.label, p, q, (1.0 / arc.radius) * (q - arc.centre));
            }
        }
    }
}

// Support corners against outline edges, solved in the beam's frame where
// the corner turns by -s t about the centre.
void corner_contacts(const beam_end_geometry& g, double s, point2 c, const candidate_keeper& keep)
{
    const beam_outline& o = g.outline;
    const std::size_t n = o.points.size();
    for (const auto& corner : g.support.corners) {
        const point2 q = corner.at - c;
        if (norm(q) < 1e-12) continue;
        for (std::size_t i = 0; i < n; ++i) {
            if (o.edge_cut[i]) continue;
            const point2 a = o.points[i], b = o.points[(i + 1) % n];
            const point2 ab = b - a;
            const point2 nrm = (1.0 / norm(ab)) * perp(ab);
            for (double t : trig_roots(dot(nrm, q), -s * dot(nrm, perp(q)), dot(nrm, a - c))) {
                const point2 w = rotated(corner.at, c, -s * t);
                const double u = dot(w - a, ab) / dot(ab, ab);
                // In the beam's frame: the corner at w against the edge of normal nrm,
                // the same perpendicular distance as in the position at contact.
                if (u >= -1e-12 && u <= 1.0 + 1e-12)
                    keep(t, o.edge_labels[i], corner.label, w, w, nrm);
            }
        }
    }
}

// Touching or overlapping at rest: closure is zero if the first movement presses in.
// Returns whether that is so, with the result set.
bool closed_at_rest(const beam_end_geometry& g, rotation_sense sense, closure& result)
{
    const double rest = clearance(g, sense, 0.0);
    if (rest < 0 || (rest < 1e-12 && clearance(g, sense, 1e-7) < 0)) {
        result.rotation = 0.0;
        result.contact = overlap(g, sense, rest < 0 ? 0.0 : 1e-7);
        if (!result.contact) throw internal_error("gap closure: overlap at rest not located");
        return true;
    }
    return false;
}

// Tolerance of the engine's own check: the chord sagitta of the fillets.
double check_tolerance(const beam_end_geometry& g)
{
    double sagitta = 0;
    for (const auto& arc : g.support.arcs)
        sagitta = std::max(sagitta, arc.radius * (1.0 - std::cos(pi / 2.0 / chords_per_arc)));
    const double tol = 1e-7 + 2.0 * sagitta;
    return tol;
}

// The engine's own check: nothing overlaps before the contact found.
void check_no_overlap_before(const beam_end_geometry& g, rotation_sense sense, const candidate* first, double tol)
{
    const double end = first ? first->angle : max_searched_rotation;
    for (int k = 1; k <= 8; ++k) {
        const double t = end * (k / 8.0) * (1.0 - 1e-6);
        if (clearance(g, sense, t) < -tol) {
            std::ostringstream m;
            m << "gap closure: the outline overlaps the support at " << t << " rad, before the first contact found ("
              << end << " rad)";
            throw internal_error(m.str());
        }
    }
}

}  // namespace

rotation_demand rotation_demand::from_end_rotation(double signed_rotation)
{
    rotation_demand d;
    if (signed_rotation >= 0)
        d.sagging = signed_rotation;
    else
        d.hogging = -signed_rotation;
    return d;
}

// ---------------------------------------------------------------------------
// Closure.

closure find_closure(const beam_end_geometry& g, rotation_sense sense, bool verify)
{
    closure result;
    result.sense = sense;
    const double s = sense_sign(sense);
    const point2 c = g.centre(sense);

    std::vector<candidate> found;
    const candidate_keeper keep{c, found};

    vertex_contacts(g, s, c, keep);
    corner_contacts(g, s, c, keep);

    if (closed_at_rest(g, sense, result)) return result;

    const candidate* first = nullptr;
    for (const auto& k : found)
        if (!first || k.angle < first->angle) first = &k;

    // The engine's own check: nothing overlaps before the contact found, and
    // the outline touches at it.
    const double tol = check_tolerance(g);
    if (verify) check_no_overlap_before(g, sense, first, tol);
    if (first) {
        const double at_contact = verify ? clearance(g, sense, first->angle) : 0.0;
        if (std::abs(at_contact) > tol) {
            std::ostringstream m;
            m << "gap closure: clearance at the contact found is " << at_contact << " m, expected zero";
            throw internal_error(m.str());
        }
        result.rotation = first->angle;
        result.contact = first->contact;
    }
    return result;
}

// ---------------------------------------------------------------------------
// Checks.

double margin(const closure& c, double demand)
{
    if (!(demand > 0)) throw internal_error("margin: the demand must be positive");
    return c.rotation.value_or(max_searched_rotation) / demand;
}

namespace {

double closure_or_max(const closure& c) { return c.rotation.value_or(max_searched_rotation); }

// Worst shortfall of closure below demand over the senses with a demand, at a
// worst-case gap `gap_in_place`.
double shortfall(const connection_detail& d, const section& beam, const rotation_demand& demand, double gap_in_place,
                 bool verify)
{
    const beam_end_geometry g = build_geometry(d, beam, gap_in_place);
    double worst = std::numeric_limits<double>::max();
    if (demand.sagging > 0)
        worst = std::min(worst, closure_or_max(find_closure(g, rotation_sense::sagging, verify)) - demand.sagging);
    if (demand.hogging > 0)
        worst = std::min(worst, closure_or_max(find_closure(g, rotation_sense::hogging, verify)) - demand.hogging);
    return worst;
}

std::string mm(double metres)
{
    std::ostringstream s;
    s.precision(4);
    s << metres * 1e3 << " mm";
    return s.str();
}

}  // namespace

std::optional<double> min_gap_required(const connection_detail& d, const section& beam, const rotation_demand& demand,
                                       std::string* note)
{
    auto say = [&](const std::string& text) {
        if (note) *note = text;
    };
    if (!(demand.sagging > 0) && !(demand.hogging > 0)) {
        say("no rotation demand");
        return std::nullopt;
    }
    // Searched range of the worst-case gap: up to the larger of 50 mm and
    // three times the detailed gap; a larger gap is no longer a detail of
    // this kind.
    const double lo = 1e-5;
    const double hi = std::max(0.05, 3.0 * d.gap);
    constexpr int steps = 64;
    // The trial geometries skip the engine's own check; the answer is
    // verified at the end.
    auto f = [&](double gap) { return shortfall(d, beam, demand, gap, false); };
    double a = lo, fa = f(lo);
    if (fa >= 0) {
        say("passes at any gap down to " + mm(lo) + " in place");
        return lo + d.gap_tolerance;
    }
    // The closure grows with the gap: moving the support away from the beam
    // end only removes material from the beam end's path (every support
    // outline is closed under a shift away from the beam). So the first of
    // the `steps` equal steps that passes is found by doubling the step
    // (1, 2, 4, ...; the answer is usually within the first few) and then
    // halving, in at most 2 log2(steps) trials instead of up to `steps`, and
    // the root is refined inside that one step.
    const auto at_step = [&](int k) { return lo + (hi - lo) * k / steps; };
    int failing = 0, passing = 1;  // f(step failing) < 0 <= f(step passing)
    double f_passing = f(at_step(passing));
    while (f_passing < 0 && passing < steps) {
        failing = passing;
        fa = f_passing;
        passing = std::min(2 * passing, steps);
        f_passing = f(at_step(passing));
    }
    if (f_passing < 0) {
        say("no gap up to " + mm(hi) + " in place passes; the closure is limited by something the gap does not move");
        return std::nullopt;
    }
    while (passing - failing > 1) {
        const int mid = (failing + passing) / 2;
        const double fm = f(at_step(mid));
        if (fm >= 0) {
            passing = mid;
            f_passing = fm;
        } else {
            failing = mid;
            fa = fm;
        }
    }
    a = at_step(failing);
    const double b = at_step(passing);
    std::uintmax_t iterations = 200;
    const auto tol = [](double x, double y) { return std::abs(x - y) <= 1e-10 * std::max(std::abs(x), std::abs(y)); };
    const auto bracket = boost::math::tools::toms748_solve(f, a, b, fa, f_passing, tol, iterations);
    if (shortfall(d, beam, demand, bracket.second, true) < 0)
        throw internal_error("gap search: the gap found does not pass on the verified geometry");
    say("");
    // The upper end of the bracket passes.
    return bracket.second + d.gap_tolerance;
}

std::string gap_check::critical_point() const
{
    const sense_check& s = of(governing);
    if (!s.closing.contact) return "no contact within pi/2 rad (" + to_string(governing) + ")";
    return s.closing.contact->description() + " (" + to_string(governing) + ")";
}

namespace {

// The geometry at the worst-case gap and its closures depend only on the
// detail and the section, not on the demand: a schedule repeats few pairs, so
// each is built once per thread.
struct closing_geometry {
    beam_end_geometry g;
    closure sagging, hogging;
};

const closing_geometry& geometry_of(const connection_detail& d, const section& beam)
{
    thread_local std::map<std::string, closing_geometry> cache;
    const std::string key = detail_key(d, beam);
    auto it = cache.find(key);
    if (it != cache.end()) return it->second;
    if (cache.size() > 1024) cache.clear();
    closing_geometry cg;
    cg.g = build_geometry(d, beam);
    cg.sagging = find_closure(cg.g, rotation_sense::sagging);
    cg.hogging = find_closure(cg.g, rotation_sense::hogging);
    return cache.emplace(key, std::move(cg)).first->second;
}

}  // namespace

namespace {

gap_check compute_gap_check(const connection_detail& d, const section& beam, const rotation_demand& demand,
                            bool find_min_gap)
{
    gap_check r;
    r.gap = d.gap;
    r.gap_tolerance = d.gap_tolerance;
    r.worst_case_gap = d.worst_case_gap();
    const closing_geometry& cg = geometry_of(d, beam);
    const beam_end_geometry& g = cg.g;
    // At zero rotation both senses have the same clearance: computed once, on demand.
    std::optional<double> at_rest;
    auto one = [&](rotation_sense sense, double dem) {
        sense_check s;
        s.sense = sense;
        s.closing = sense == rotation_sense::sagging ? cg.sagging : cg.hogging;
        s.demand = dem;
        if (dem > 0) {
            s.margin = margin(s.closing, dem);
            s.margin_is_lower_bound = !s.closing.rotation.has_value();
        }
        if (dem > 0) {
            s.clearance_at_demand = clearance(g, sense, std::min(dem, max_searched_rotation));
        } else {
            if (!at_rest) at_rest = clearance(g, sense, 0.0);
            s.clearance_at_demand = *at_rest;
        }
        s.passes = closure_or_max(s.closing) >= dem && dem <= max_searched_rotation;
        return s;
    };
    r.sagging = one(rotation_sense::sagging, demand.sagging);
    r.hogging = one(rotation_sense::hogging, demand.hogging);
    if (r.sagging.margin && r.hogging.margin)
        r.governing = *r.hogging.margin < *r.sagging.margin ? rotation_sense::hogging : rotation_sense::sagging;
    else if (r.hogging.margin)
        r.governing = rotation_sense::hogging;
    else if (r.sagging.margin)
        r.governing = rotation_sense::sagging;
    else
        r.governing = closure_or_max(r.hogging.closing) < closure_or_max(r.sagging.closing) ? rotation_sense::hogging
                                                                                              : rotation_sense::sagging;
    r.passes = r.sagging.passes && r.hogging.passes;
    if (find_min_gap) r.min_gap_required = min_gap_required(d, beam, demand, &r.min_gap_note);
    else r.min_gap_note.clear();  // not searched: nothing to say
    return r;
}

}  // namespace

// The check depends on nothing but the detail, the section and the demand,
// and the demand of the default basis (the pinned beam's rotation) does not
// change with the joint's stiffness: a threshold search or a sweep asks for
// the same check at every probe. Kept per thread, keyed by the bits of every
// input, so a repeat is bit-identical to the first answer.
gap_check check_gap(const connection_detail& d, const section& beam, const rotation_demand& demand, bool find_min_gap)
{
    thread_local std::map<std::string, gap_check> cache;
    std::string key = detail_key(d, beam);
    const double parts[2] = {demand.sagging, demand.hogging};
    key.append(reinterpret_cast<const char*>(parts), sizeof parts);
    key.push_back(find_min_gap ? '1' : '0');
    const auto it = cache.find(key);
    if (it != cache.end()) return it->second;
    if (cache.size() > 4096) cache.clear();
    gap_check r = compute_gap_check(d, beam, demand, find_min_gap);
    cache.emplace(std::move(key), r);
    return r;
}

}  // namespace pinproof
