// Reading and validating the `detail` object of a joint.
//
// Defaults (docs/method/gap-geometry.md lists them with their sources):
//   gap 10 mm, gap_tolerance 0, support column-flange, plate or cleat top
//   50 mm below the beam top, first bolt 40 mm below the top of the fitting,
//   pitch 70 mm, M20 bolts in holes d + 2 mm (d <= 24 mm) or d + 3 mm,
//   plate and cleat thickness 10 mm, S275 plate, bolt line 50 mm from the
//   beam end; bolt rows and fitting depth from each other, or else the fewest
//   rows giving a fitting at least 0.6 x the beam depth.
#include <algorithm>
#include <cmath>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "io/json_fields.hpp"
#include "pinproof/io/connection_detail_input.hpp"
#include "pinproof/model/end_geometry.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

namespace {

using json = nlohmann::json;
namespace jf = json_fields;

constexpr double mm = 1e-3;

// Standard components of simple joints (Steel Buildings in Europe, Part 5: Joint design, MSB05 p. 14): first bolt
// 90 mm below the top of the beam with the fitting 50 mm below it, pitch
// 70 mm, M20 bolts in 22 mm holes, 10 mm plates and cleats.
constexpr double default_gap = 10 * mm;  // usual fin plate gap, from memory (SCI P212)
constexpr double default_plate_top = 50 * mm;
constexpr double default_first_bolt = 40 * mm;
constexpr double default_pitch = 70 * mm;
constexpr double default_bolt = 20 * mm;
constexpr double default_thickness = 10 * mm;
constexpr double default_bolt_line = 50 * mm;  // common practice, no source
constexpr double min_depth_ratio = 0.6;        // fitting depth >= 0.6 h (SBE Part 5, MSB05 p. 16, 32)

// Normal round clearance holes: d + 2 mm up to M24, d + 3 mm above (SBE Part 5, MSB05 p. 16).
double default_hole(double d) { return d <= 24 * mm + 1e-9 ? d + 2 * mm : d + 3 * mm; }

class reader {
public:
    reader(const json& obj, const std::string& pointer, problem_list& problems,
           design_standard standard = design_standard::en1993_1_8)
        : obj_(obj), ptr_(pointer), problems_(problems), standard_(standard)
    {
    }
    design_standard standard() const { return standard_; }

    std::string at(const std::string& key) const { return jf::child(ptr_, key); }
    bool has(const std::string& key) const { return obj_.contains(key); }
    std::string show(double metres) const { return format_quantity(metres, dims::length, system_); }
    void problem(const std::string& key, const std::string& message) { problems_.add(at(key), message); }

    // A length; `fallback` when absent. Checks the value is positive (or >= 0).
    std::optional<double> length(const std::string& key, std::optional<double> fallback, bool allow_zero = false)
    {
        auto v = jf::quantity_field(obj_, ptr_, key, dims::length, !fallback.has_value(), problems_, &system_);
        if (!has(key)) return fallback;
        if (!v) return std::nullopt;
        if (allow_zero ? *v < 0 : *v <= 0) {
            problem(key, std::string("expected a ") + (allow_zero ? "non-negative" : "positive") + " length, found " +
                             show(*v));
            return std::nullopt;
        }
        return v;
    }

    // A length that may be negative (a level).
    std::optional<double> level(const std::string& key, double fallback)
    {
        if (!has(key)) return fallback;
        return jf::quantity_field(obj_, ptr_, key, dims::length, false, problems_, &system_);
    }

    const json& obj() const { return obj_; }
    const std::string& pointer() const { return ptr_; }
    problem_list& problems() { return problems_; }
    unit_system system() const { return system_; }
    void inherit(unit_system s)
    {
        if (system_ == unit_system::neutral) system_ = s;
    }

private:
    const json& obj_;
    std::string ptr_;
    problem_list& problems_;
    unit_system system_ = unit_system::neutral;
    design_standard standard_ = design_standard::en1993_1_8;
};

std::optional<cope> read_cope(reader& parent, const std::string& key, double h)
{
    const json& v = parent.obj()[key];
    const std::string p = parent.at(key);
    if (!jf::expect_object(v, p, parent.problems())) return std::nullopt;
    jf::reject_unknown_keys(v, p, {"depth", "length"}, parent.problems());
    reader r(v, p, parent.problems());
    r.inherit(parent.system());
    const auto depth = r.length("depth", std::nullopt);
    const auto length = r.length("length", std::nullopt);
    if (!depth || !length) return std::nullopt;
    if (*depth >= h) {
        r.problem("depth", "a cope must be shallower than the beam (depth " + r.show(h) + "), found " + r.show(*depth));
        return std::nullopt;
    }
    return cope{*depth, *length};
}

std::optional<detail_point> read_point(const json& v, const std::string& p, problem_list& problems)
{
    if (!jf::expect_object(v, p, problems)) return std::nullopt;
    jf::reject_unknown_keys(v, p, {"x", "y"}, problems);
    const auto x = jf::quantity_field(v, p, "x", dims::length, true, problems);
    const auto y = jf::quantity_field(v, p, "y", dims::length, true, problems);
    if (!x || !y) return std::nullopt;
    return detail_point{*x, *y};
}

std::optional<supporting_beam> read_supporting_beam(reader& parent)
{
    const std::string key = "supporting_beam";
    const json& v = parent.obj()[key];
    const std::string p = parent.at(key);
    problem_list& problems = parent.problems();
    if (!jf::expect_object(v, p, problems)) return std::nullopt;
    jf::reject_unknown_keys(v, p, {"section", "top", "depth", "flange_width", "flange_thickness", "web_thickness", "root_radius"},
                            problems);
    reader r(v, p, problems);
    r.inherit(parent.system());
    supporting_beam sb;
    sb.name = "user-defined";
    std::optional<section> cat;
    if (auto name = jf::string_field(v, p, "section", false, problems)) {
        cat = find_catalogue_section(*name);
        if (!cat) {
            r.problem("section", "expected a section of the catalogue (for example \"IPE 400\"), found \"" + *name + "\"");
            return std::nullopt;
        }
        sb.name = cat->name;
    }
    if (!cat && !r.has("depth") && !r.has("flange_width") && !r.has("flange_thickness") && !r.has("web_thickness")) {
        problems.add(p, "give the supporting beam's \"section\", or its depth, flange_width, flange_thickness and "
                        "web_thickness");
        return std::nullopt;
    }
    // Explicit dimensions replace the catalogue's.
    const auto depth = r.length("depth", cat ? std::optional<double>(cat->depth) : std::nullopt);
    const auto b = r.length("flange_width", cat ? cat->flange_width : std::nullopt);
    const auto tf = r.length("flange_thickness", cat ? cat->flange_thickness : std::nullopt);
    const auto tw = r.length("web_thickness", cat ? cat->web_thickness : std::nullopt);
    const auto rr = r.length("root_radius", cat ? cat->root_radius.value_or(0.0) : 0.0, true);
    const auto top = r.level("top", 0.0);
    if (!depth || !b || !tf || !tw || !rr || !top) return std::nullopt;
    if (*tw >= *b) {
        r.problem("web_thickness", "expected less than the flange width " + r.show(*b) + ", found " + r.show(*tw));
        return std::nullopt;
    }
    if (2 * (*tf + *rr) >= *depth) {
        r.problem("depth", "expected more than twice the flange thickness plus root radius (" +
                               r.show(2 * (*tf + *rr)) + "), found " + r.show(*depth));
        return std::nullopt;
    }
    if (*rr >= 0.5 * (*b - *tw)) {
        r.problem("root_radius", "expected less than the flange outstand " + r.show(0.5 * (*b - *tw)) + ", found " +
                                     r.show(*rr));
        return std::nullopt;
    }
    sb.depth = *depth;
    sb.flange_width = *b;
    sb.flange_thickness = *tf;
    sb.web_thickness = *tw;
    sb.root_radius = *rr;
    sb.top = *top;
    return sb;
}

// Whether two outline edges (a, b) and (c, d) share any point.
bool edges_touch(point2 a, point2 b, point2 c, point2 d)
{
    auto orient = [](point2 p, point2 q, point2 r) {
        const double v = (q.x - p.x) * (r.y - p.y) - (q.y - p.y) * (r.x - p.x);
        return v > 0 ? 1 : (v < 0 ? -1 : 0);
    };
    auto on = [](point2 p, point2 q, point2 r) {  // r on segment pq, given collinear
        return std::min(p.x, q.x) <= r.x && r.x <= std::max(p.x, q.x) && std::min(p.y, q.y) <= r.y &&
               r.y <= std::max(p.y, q.y);
    };
    const int o1 = orient(a, b, c), o2 = orient(a, b, d), o3 = orient(c, d, a), o4 = orient(c, d, b);
    if (o1 != o2 && o3 != o4) return true;
    return (o1 == 0 && on(a, b, c)) || (o2 == 0 && on(a, b, d)) || (o3 == 0 && on(c, d, a)) || (o4 == 0 && on(c, d, b));
}

// Field names of the fitting, which differ by type.
struct fitting_keys {
    std::string top, depth, thickness;
};

fitting_keys keys_of(detail_type type)
{
    const bool cleats = type == detail_type::web_cleats;
    return {cleats ? "cleat_top" : "plate_top", cleats ? "cleat_depth" : "plate_depth",
            cleats ? "cleat_thickness" : "plate_thickness"};
}

// The fields a detail of this type may have.
std::vector<std::string> known_detail_fields(detail_type type, const fitting_keys& k)
{
    const bool fin = type == detail_type::fin_plate, end = type == detail_type::end_plate,
               custom = type == detail_type::custom;
    std::vector<std::string> known = {"type", "gap_tolerance", "support", "supporting_beam", "centre_of_rotation"};
    if (custom) {
        known.push_back("outline");
    } else {
        for (const char* key : {"cope_top", "cope_bottom", "bolt_diameter", "hole_diameter", "bolt_rows", "bolt_pitch",
                                "first_bolt"})
            known.push_back(key);
        known.push_back(k.top);
        known.push_back(k.depth);
        known.push_back(k.thickness);
        if (!end) known.push_back("gap");
        if (fin || end) known.push_back("plate_grade");
        if (fin)
            for (const char* key : {"bolt_line", "bolt_grade", "threads_in_shear_plane", "weld", "edge_distance",
                                    "end_distance"})
                known.push_back(key);
        if (end)
            for (const char* key : {"bolt_grade", "threads_in_shear_plane", "weld", "gauge", "plate_width"})
                known.push_back(key);
    }
    return known;
}

// The fitting of a standard detail (fin plate, cleats, end plate): gap, plate,
// bolts and their defaults, and whether the fitting fits the beam.
// EN projects take EN 10025-2 plates, US projects ASTM plates; the default
// (S275 or A36, common practice, no source) is marked as such.
void read_plate_grade(reader& r, connection_detail& d)
{
    const bool us = r.standard() == design_standard::aisc360;
    if (us) d.grade = plate_grade::a36;
    if (d.type != detail_type::fin_plate && d.type != detail_type::end_plate) return;
    const std::vector<std::string> names = us ? std::vector<std::string>{"A36", "A572-50"}
                                               : std::vector<std::string>{"S275", "S355"};
    const auto g = jf::choice_field(r.obj(), r.pointer(), "plate_grade", names, false, r.problems());
    if (!g) return;
    d.grade_is_default = false;
    d.grade = *g == "S355" ? plate_grade::s355 : *g == "A36" ? plate_grade::a36 : *g == "A572-50" ? plate_grade::a572_50
                                                                                                 : plate_grade::s275;
}

void read_fitting(reader& r, connection_detail& d, const fitting_keys& k, double h, std::size_t before)
{
    const json& value = r.obj();
    const std::string& pointer = r.pointer();
    problem_list& problems = r.problems();
    const bool fin = d.type == detail_type::fin_plate, cleats = d.type == detail_type::web_cleats,
               end = d.type == detail_type::end_plate;
    const auto gap = end ? std::optional<double>(0.0) : r.length("gap", default_gap);
    const auto thickness = r.length(k.thickness, default_thickness);
    const auto bolt = r.length("bolt_diameter", default_bolt);
    const auto hole = r.length("hole_diameter", default_hole(bolt.value_or(default_bolt)));
    const auto pitch = r.length("bolt_pitch", default_pitch);
    const auto first = r.length("first_bolt", default_first_bolt);
    const auto top = r.length(k.top, default_plate_top, true);
    const auto line = fin ? r.length("bolt_line", default_bolt_line) : std::optional<double>(0.0);
    long long rows = 0;  // 0: not given
    if (const auto v = jf::integer_field(value, pointer, "bolt_rows", false, problems)) {
        if (*v < 1)
            r.problem("bolt_rows", "expected at least 1 bolt row, found " + std::to_string(*v));
        else if (*v > 50)
            r.problem("bolt_rows", "expected at most 50 bolt rows, found " + std::to_string(*v));
        else
            rows = *v;
    }
    std::optional<double> depth;
    if (r.has(k.depth)) depth = r.length(k.depth, std::nullopt);
    read_plate_grade(r, d);

    if (!(gap && thickness && bolt && hole && pitch && first && top && line && problems.size() == before)) return;
    // Rows and depth from each other, or the fewest rows reaching 0.6 h.
    long long n = rows;
    if (n < 1 && depth)
        n = std::max(1LL, static_cast<long long>(std::floor((*depth - 2 * *first) / *pitch + 1e-9)) + 1);
    if (n < 1)
        for (n = 1; 2 * *first + (n - 1) * *pitch < min_depth_ratio * h - 1e-9 && n < 50;) ++n;
    const double hp = depth ? *depth : 2 * *first + (n - 1) * *pitch;

    d.gap = end ? *thickness : *gap;
    d.plate_top = *top;
    d.plate_depth = hp;
    d.plate_thickness = *thickness;
    d.bolts.diameter = *bolt;
    d.bolts.hole_diameter = *hole;
    d.bolts.rows = static_cast<int>(n);
    d.bolts.pitch = *pitch;
    d.bolts.first_bolt = *first;
    d.bolts.bolt_line = *line;

    if (*hole < *bolt)
        r.problem("hole_diameter", "expected a hole at least as large as the bolt (" + r.show(*bolt) +
                                       "), found " + r.show(*hole));
    const std::string what = fin ? "fin plate" : cleats ? "cleats" : "end plate";
    if (hp > h)
        r.problem(k.depth, "the " + what + " is deeper than the beam (depth " + r.show(h) + "): found " + r.show(hp));
    else if (d.plate_top + hp > h + 1e-12)
        r.problem(k.depth, "the " + what + " extends below the beam: top " + r.show(d.plate_top) + " + depth " +
                               r.show(hp) + " = " + r.show(d.plate_top + hp) + ", beam depth " + r.show(h));
    if (*first + (n - 1) * *pitch >= hp)
        r.problem(rows > 0 ? "bolt_rows" : k.depth,
                  std::to_string(n) + " bolt row(s) at " + r.show(*pitch) + " pitch from " + r.show(*first) +
                      " need a " + what + " deeper than " + r.show(*first + (n - 1) * *pitch) + ", found " +
                      r.show(hp));
}

// Whether the closed outline q has a repeated adjacent point or two edges that
// cross or touch; each such fault is a problem at `lp`.
bool outline_is_simple(const std::vector<point2>& q, const std::string& lp, problem_list& problems)
{
    const std::size_t n = q.size();
    bool ok = true;
    for (std::size_t i = 0; i < n && ok; ++i)
        for (std::size_t j = i + 1; j < n && ok; ++j) {
            const bool adjacent = j == i + 1 || (i == 0 && j == n - 1);
            if (adjacent) {
                if (q[i].x == q[j].x && q[i].y == q[j].y) {
                    problems.add(jf::child(lp, j), "repeats point " + std::to_string(i + 1));
                    ok = false;
                }
                continue;
            }
            if (edges_touch(q[i], q[(i + 1) % n], q[j], q[(j + 1) % n])) {
                problems.add(lp, "the outline crosses or touches itself (edges " + std::to_string(i + 1) + "-" +
                                     std::to_string((i + 1) % n + 1) + " and " + std::to_string(j + 1) + "-" +
                                     std::to_string((j + 1) % n + 1) + ")");
                ok = false;
            }
        }
    return ok;
}

// custom: the outline gives the gap.
void read_custom_outline(reader& r, connection_detail& d)
{
    const json& value = r.obj();
    const std::string& pointer = r.pointer();
    problem_list& problems = r.problems();
    if (!r.has("outline")) {
        problems.add(jf::child(pointer, "outline"), "missing required field \"outline\" (a list of points {x, y})");
    } else {
        const json& list = value["outline"];
        const std::string lp = jf::child(pointer, "outline");
        if (!list.is_array() || list.size() < 3) {
            problems.add(lp, "expected a list of at least 3 points {\"x\": ..., \"y\": ...}, found " + jf::shown(list));
        } else {
            bool ok = true;
            for (std::size_t i = 0; i < list.size(); ++i) {
                auto pnt = read_point(list[i], jf::child(lp, i), problems);
                if (pnt)
                    d.outline.push_back(*pnt);
                else
                    ok = false;
            }
            if (ok) {
                std::vector<point2> q;
                for (const auto& p : d.outline) q.push_back({p.from_support, p.below_top});
                ok = outline_is_simple(q, lp, problems);
            }
            if (ok) {
                d.gap = d.outline.front().from_support;
                for (const auto& p : d.outline) d.gap = std::min(d.gap, p.from_support);
                for (std::size_t i = 0; i < d.outline.size(); ++i)
                    if (d.outline[i].from_support <= d.gap_tolerance)
                        problems.add(jf::child(jf::child(lp, i), "x"),
                                     "every outline point must stand clear of the support face by more than "
                                     "gap_tolerance (" + r.show(d.gap_tolerance) + "), found " +
                                         r.show(d.outline[i].from_support));
            }
        }
    }
    if (!r.has("centre_of_rotation"))
        problems.add(jf::child(pointer, "centre_of_rotation"),
                     "missing required field \"centre_of_rotation\": a custom detail has no default centre");
}

// Copes of a standard detail, and whether the bolts or the fitting fall in them.
void read_copes(reader& r, connection_detail& d, const fitting_keys& k, double h, std::size_t before)
{
    const bool fin = d.type == detail_type::fin_plate, cleats = d.type == detail_type::web_cleats;
    if (r.has("cope_top")) d.cope_top = read_cope(r, "cope_top", h);
    if (r.has("cope_bottom")) d.cope_bottom = read_cope(r, "cope_bottom", h);
    if (d.cope_top && d.cope_bottom && d.cope_top->depth + d.cope_bottom->depth >= h)
        r.problem("cope_bottom", "the copes leave no web: top " + r.show(d.cope_top->depth) + " + bottom " +
                                     r.show(d.cope_bottom->depth) + " >= beam depth " + r.show(h));
    if (r.problems().size() != before) return;
    const double bottom = d.plate_top + d.plate_depth;
    const std::string what = fin ? "fin plate bolts" : cleats ? "cleats" : "end plate";
    if (fin) {
        // Bolts within the cope length must sit in the remaining web.
        for (int i = 0; i < d.bolts.rows; ++i) {
            const double y = d.plate_top + d.bolts.first_bolt + i * d.bolts.pitch;
            if (d.cope_top && d.bolts.bolt_line < d.cope_top->length && y <= d.cope_top->depth) {
                r.problem("first_bolt", "bolt row " + std::to_string(i + 1) + " (" + r.show(y) +
                                            " below the top) falls in the top cope (depth " +
                                            r.show(d.cope_top->depth) + ")");
                break;
            }
            if (d.cope_bottom && d.bolts.bolt_line < d.cope_bottom->length && y >= h - d.cope_bottom->depth) {
                r.problem("bolt_rows", "bolt row " + std::to_string(i + 1) + " (" + r.show(y) +
                                           " below the top) falls in the bottom cope (depth " +
                                           r.show(d.cope_bottom->depth) + ")");
                break;
            }
        }
    } else {
        if (d.cope_top && d.plate_top < d.cope_top->depth)
            r.problem(k.top, "the " + what + " start within the top cope: top " + r.show(d.plate_top) +
                                 ", cope depth " + r.show(d.cope_top->depth));
        if (d.cope_bottom && bottom > h - d.cope_bottom->depth)
            r.problem(k.depth, "the " + what + " reach into the bottom cope: bottom " + r.show(bottom) +
                                   " below the top, cope starts at " + r.show(h - d.cope_bottom->depth));
    }
}

void read_weld(reader& parent, connection_detail& d);
void read_end_plate_fields(reader& r, connection_detail& d, double web_thickness, std::size_t before);

// The fin plate's fields for its derivation (joints/joint_from_detail.hpp):
// bolt grade, threads, weld and the plate's edge distance, each checked
// against the rule it must meet where it is given.
// The fillet welds must leave the plate within its thickness (common practice, no
// source, EN) or within AISC 360-16 J2.2b's maximum (from memory).
void check_weld_size(reader& r, const connection_detail& d)
{
    const derivation_fields& f = d.derivation;
    if (f.weld && f.weld->leg_length() > maximum_fillet_leg(d.plate_thickness, r.standard()) + 1e-9)
        r.problem("weld", "the weld is larger than the plate allows: a fillet leg of " +
                              r.show(f.weld->leg_length()) + " on a " + r.show(d.plate_thickness) + " plate, at most " +
                              r.show(maximum_fillet_leg(d.plate_thickness, r.standard())) + " (" +
                              maximum_fillet_leg_rule(r.standard()) + ")");
}

// An end plate's gauge (cross-centres of its two bolt lines, one each side of
// the beam web) and width. The holes must clear the web and its fillets and
// stay inside the plate's side edges; the code's minimum edge distance is
// checked where the joint is derived ("from-detail": check_detail_derivable).
void read_end_plate_fields(reader& r, connection_detail& d, double web_thickness, std::size_t before)
{
    derivation_fields& f = d.derivation;
    if (r.has("weld")) read_weld(r, d);
    if (r.has("gauge")) f.gauge = r.length("gauge", std::nullopt);
    if (r.has("plate_width")) f.plate_width = r.length("plate_width", std::nullopt);
    if (r.problems().size() != before) return;
    const double d0 = d.bolts.hole_diameter;
    const double w = f.gauge.value_or(default_end_plate_gauge());
    const double bp = f.plate_width.value_or(default_end_plate_width(w));
    const double leg = f.weld ? f.weld->leg_length() : 0.0;
    const double room = 0.5 * (w - web_thickness) - leg;
    if (room < 0.5 * d0) {
        r.problem(r.has("gauge") ? "gauge" : "bolt_diameter",
                  "the bolt does not fit the plate: a gauge of " + r.show(w) + " leaves " + r.show(room) +
                      " from each hole's centre to the beam web's fillet weld (web " + r.show(web_thickness) +
                      ", weld leg " + r.show(leg) + "), less than the hole's radius " + r.show(0.5 * d0));
        return;
    }
    if (0.5 * (bp - w) < 0.5 * d0) {
        r.problem(r.has("plate_width") ? "plate_width" : "gauge",
                  "the bolt does not fit the plate: a plate " + r.show(bp) + " wide with the bolt lines " + r.show(w) +
                      " apart leaves " + r.show(0.5 * (bp - w)) + " from each hole's centre to the plate's side edge, "
                      "less than the hole's radius " + r.show(0.5 * d0));
        return;
    }
    check_weld_size(r, d);
}

void read_derivation_fields(reader& r, connection_detail& d, double web_thickness, std::size_t before)
{
    const json& value = r.obj();
    const std::string& pointer = r.pointer();
    problem_list& problems = r.problems();
    const bool us = r.standard() == design_standard::aisc360;
    derivation_fields& f = d.derivation;
    if (r.has("bolt_grade")) {
        const std::vector<std::string> names = us ? std::vector<std::string>{"A325", "A490"}
                                                   : std::vector<std::string>{"4.6", "8.8", "10.9"};
        const json& v = value["bolt_grade"];
        const std::string text = v.is_string() ? v.get<std::string>() : jf::shown(v);
        if (std::find(names.begin(), names.end(), text) != names.end())
            f.bolt_grade = text;
        else
            r.problem("bolt_grade", std::string("expected a bolt grade of ") +
                                        (us ? "an AISC 360 project: ASTM \"A325\" or \"A490\" (AISC 360-16 Table J3.2)"
                                            : "an EN 1993-1-8 project: property class \"4.6\", \"8.8\" or \"10.9\" "
                                              "(EN 1993-1-8 Table 3.1)") +
                                        ", found " + jf::shown(v));
    }
    f.threads_in_shear_plane = jf::bool_field(value, pointer, "threads_in_shear_plane", false, problems);
    if (d.type == detail_type::end_plate) {
        read_end_plate_fields(r, d, web_thickness, before);
        return;
    }
    if (r.has("end_distance"))
        r.problem("end_distance", "a fin plate's end distances are fixed by first_bolt and plate_depth (and the web's "
                                  "by bolt_line); give those instead of end_distance");
    if (r.has("weld")) read_weld(r, d);
    if (r.has("edge_distance")) {
        const auto e2 = r.length("edge_distance", std::nullopt);
        if (e2) f.edge_distance = *e2;
    }
    if (problems.size() != before) return;
    const double d0 = d.bolts.hole_diameter;
    if (f.edge_distance && *f.edge_distance < 0.5 * d0) {
        r.problem("edge_distance", "the bolt does not fit the plate: the edge distance " + r.show(*f.edge_distance) +
                                       " is less than the hole's radius " + r.show(0.5 * d0) +
                                       ", so the hole runs off the plate's free edge");
        return;
    }
    const double e_min = minimum_edge_distance(d.bolts, r.standard());
    if (f.edge_distance && *f.edge_distance < e_min - 1e-9)
        r.problem("edge_distance", "expected an edge distance of at least " + r.show(e_min) + " (" +
                                       minimum_edge_distance_rule(r.standard()) + "), found " +
                                       r.show(*f.edge_distance));
    check_weld_size(r, d);
}

// {"leg": "8 mm"} or {"throat": "5.6 mm"}: one of the two.
void read_weld(reader& parent, connection_detail& d)
{
    const json& v = parent.obj()["weld"];
    const std::string p = parent.at("weld");
    problem_list& problems = parent.problems();
    if (!jf::expect_object(v, p, problems)) return;
    jf::reject_unknown_keys(v, p, {"leg", "throat"}, problems);
    const bool leg = v.contains("leg"), throat = v.contains("throat");
    if (leg == throat) {
        problems.add(p, "expected the fillet weld's \"leg\" or its \"throat\" (one of the two), found " +
                            jf::shown(v));
        return;
    }
    reader r(v, p, problems, parent.standard());
    r.inherit(parent.system());
    if (const auto size = r.length(leg ? "leg" : "throat", std::nullopt)) d.derivation.weld = fillet_weld{*size, leg};
}

// The supporting beam of a beam-web support (and only of one).
void read_support(reader& r, connection_detail& d)
{
    if (d.support == support_type::beam_web) {
        if (!r.has("supporting_beam"))
            r.problems().add(jf::child(r.pointer(), "supporting_beam"),
                             "missing required field \"supporting_beam\" for a beam-web support (its \"section\" or "
                             "dimensions and \"top\", the level of its top below the top of this beam)");
        else
            d.support_beam = read_supporting_beam(r);
    } else if (r.has("supporting_beam")) {
        r.problem("supporting_beam", "applies only to a \"beam-web\" support, found support \"" + to_string(d.support) + "\"");
    }
}

// The centre of rotation, if given: on or beyond the support face, within the beam depth.
void read_centre_of_rotation(reader& r, connection_detail& d, double h)
{
    if (!r.has("centre_of_rotation")) return;
    problem_list& problems = r.problems();
    const std::string cp = jf::child(r.pointer(), "centre_of_rotation");
    if (auto c = read_point(r.obj()["centre_of_rotation"], cp, problems)) {
        if (c->from_support < 0)
            problems.add(jf::child(cp, "x"), "the centre of rotation lies inside the support: x is measured from "
                                             "the support face along the beam and must be 0 or more, found " +
                                                 r.show(c->from_support));
        else if (c->below_top < 0 || c->below_top > h)
            problems.add(jf::child(cp, "y"), "the centre of rotation lies outside the beam depth: expected 0 to " +
                                                 r.show(h) + " below the top, found " + r.show(c->below_top));
        else
            d.centre_of_rotation = c;
    }
}

// The beam end must stand clear of the support at rest, at the worst-case gap.
void check_clear_at_rest(reader& r, const connection_detail& d, const section& beam)
{
    const beam_end_geometry g = build_geometry(d, beam);
    const auto hit = overlap(g, rotation_sense::sagging, 0.0);
    if (!hit) return;
    std::string where = "gap";
    if (d.type == detail_type::custom)
        where = "outline";
    else if (d.support_beam)
        where = hit->support_part.find("bottom") != std::string::npos ? "cope_bottom" : "cope_top";
    std::string hint;
    if (d.support_beam) {
        const supporting_beam& sb = *d.support_beam;
        const auto level = [&](double v) {
            return r.show(std::abs(v)) + (v >= 0 ? " below" : " above") + " the top of this beam";
        };
        hint = "; a cope must clear the supporting beam's flanges and root fillets: its top flange with the "
               "fillet reaches down to " + level(sb.top_flange_underside() + sb.root_radius) +
               ", its bottom flange with the fillet rises to " + level(sb.bottom_flange_top() - sb.root_radius) +
               ", and the flange tips stand " + r.show(sb.flange_outstand()) +
               " out from the web face (worst-case gap " + r.show(d.worst_case_gap()) + ")";
    }
    r.problems().add(jf::child(r.pointer(), where), "the beam end overlaps the support at rest: " + hit->description() + hint);
}

}  // namespace

namespace {

// The fields the detail was read with, each given or defaulted, with the
// default's source (the constants above).
std::vector<detail_input> inputs_of(const json& value, const connection_detail& d, const fitting_keys& k,
                                    design_standard standard)
{
    std::vector<detail_input> out;
    const auto length = [&](const std::string& key, double v, const std::string& source) {
        out.push_back({key, v, "", !value.contains(key), value.contains(key) ? "" : source});
    };
    const auto text = [&](const std::string& key, const std::string& v, bool defaulted, const std::string& source) {
        out.push_back({key, std::nullopt, v, defaulted, defaulted ? source : ""});
    };
    const bool us = standard == design_standard::aisc360;
    const char* const components = "the standard components of simple joints (Steel Buildings in Europe, Part 5: "
                                   "Joint design, MSB05 p. 14)";
    text("support", to_string(d.support), !value.contains("support"),
         "a column flange, the usual support of a simple beam end (common practice, no source)");
    if (d.type != detail_type::end_plate && d.type != detail_type::custom)
        length("gap", d.gap, "10 mm, the usual gap of fin plate and cleat joints (SCI P212, from memory)");
    length("gap_tolerance", d.gap_tolerance,
           "0: none assumed, so the worst-case gap is the gap as detailed; give the fabrication and erection "
           "allowance (see the gap-tolerance detailing rule)");
    if (d.type == detail_type::custom) return out;
    length(k.top, d.plate_top, std::string("50 mm, ") + components);
    length(k.depth, d.plate_depth, "from the bolt rows: 2 x first_bolt + (rows - 1) x bolt_pitch");
    length(k.thickness, d.plate_thickness, std::string("10 mm, ") + components);
    if (d.type == detail_type::fin_plate || d.type == detail_type::end_plate)
        text("plate_grade", to_string(d.grade), d.grade_is_default,
             std::string(us ? "A36" : "S275") + ", the usual plate grade (common practice, no source)");
    length("bolt_diameter", d.bolts.diameter, std::string("M20 (20 mm), ") + components);
    length("hole_diameter", d.bolts.hole_diameter,
           "a normal clearance hole, d + 2 mm up to M24 and d + 3 mm above (Steel Buildings in Europe, Part 5, "
           "MSB05 p. 16)");
    text("bolt_rows", std::to_string(d.bolts.rows), !value.contains("bolt_rows"),
         value.contains(k.depth) ? "as many as the fitting's depth takes at the pitch"
                                 : "the fewest rows whose fitting reaches 0.6 x the beam depth (Steel Buildings in "
                                   "Europe, Part 5, MSB05 p. 16, 32)");
    length("bolt_pitch", d.bolts.pitch, std::string("70 mm, ") + components);
    length("first_bolt", d.bolts.first_bolt, std::string("40 mm below the top of the fitting, ") + components);
    if (d.type == detail_type::fin_plate)
        length("bolt_line", d.bolts.bolt_line, "50 mm from the beam end (common practice, no source)");
    if (d.type == detail_type::end_plate) {
        const double w = d.derivation.gauge.value_or(default_end_plate_gauge());
        length("gauge", w, "90 mm between the bolt lines, the standard components of simple joints (Steel Buildings "
                           "in Europe, Part 5: Joint design, MSB05 p. 14)");
        length("plate_width", d.derivation.plate_width.value_or(default_end_plate_width(w)),
               "the gauge + 60 mm, 30 mm from each bolt line to the side edge (common practice, no source)");
    }
    return out;
}

}  // namespace

connection_detail read_connection_detail(const nlohmann::json& value, const std::string& pointer, const section& beam,
                                         problem_list& problems, design_standard standard)
{
    connection_detail d;
    const std::size_t before = problems.size();
    if (!jf::expect_object(value, pointer, problems)) return d;
    reader r(value, pointer, problems, standard);

    const auto type_text = jf::choice_field(value, pointer, "type", detail_type_names(), true, problems);
    if (!type_text) return d;  // which fields apply depends on the type
    d.type = *parse_detail_type(*type_text);
    const bool end = d.type == detail_type::end_plate, custom = d.type == detail_type::custom;
    const fitting_keys k = keys_of(d.type);
    jf::reject_unknown_keys(value, pointer, known_detail_fields(d.type, k), problems);

    const double h = beam.depth;
    if (!(h > 0) || !std::isfinite(h)) {
        problems.add(pointer, "the beam's section must give its depth to check the detail");
        return d;
    }

    if (auto s = jf::choice_field(value, pointer, "support", support_type_names(), false, problems))
        d.support = *parse_support_type(*s);

    const auto tolerance = r.length("gap_tolerance", 0.0, true);
    if (tolerance) d.gap_tolerance = *tolerance;
    d.gap_tolerance_given = r.has("gap_tolerance");

    if (!custom)
        read_fitting(r, d, k, h, before);
    else
        read_custom_outline(r, d);

    // Gap and tolerance.
    if (!custom && problems.size() == before && d.gap_tolerance >= d.gap)
        r.problem("gap_tolerance", "expected less than the " + std::string(end ? "plate thickness" : "gap") + " (" +
                                       r.show(d.gap) + "), found " + r.show(d.gap_tolerance));

    if (!custom) read_copes(r, d, k, h, before);
    if (d.type == detail_type::fin_plate || d.type == detail_type::end_plate)
        read_derivation_fields(r, d, beam.web_thickness.value_or(0.0), before);
    read_support(r, d);
    read_centre_of_rotation(r, d, h);
    if (problems.size() == before) check_clear_at_rest(r, d, beam);
    if (problems.size() == before) d.inputs = inputs_of(value, d, k, standard);
    return d;
}

void check_fin_plate_derivable(const connection_detail& d, const std::string& pointer, design_standard standard,
                               problem_list& problems, unit_system units)
{
    const bolt_layout& b = d.bolts;
    const double d0 = b.hole_diameter;
    const auto show = [units](double v) { return format_quantity(v, dims::length, units); };
    const double top = b.first_bolt, bottom = d.plate_depth - b.first_bolt - (b.rows - 1) * b.pitch;
    const std::string rule = minimum_edge_distance_rule(standard);
    const double e_min = minimum_edge_distance(b, standard);
    const auto at = [&](const std::string& key) { return json_fields::child(pointer, key); };
    if (top < 0.5 * d0 || bottom < 0.5 * d0) {
        problems.add(at(top < 0.5 * d0 ? "first_bolt" : "plate_depth"),
                     "the bolt does not fit the plate: the " + std::string(top < 0.5 * d0 ? "top" : "bottom") +
                         " bolt's hole (" + show(d0) + ") runs off the plate's " +
                         (top < 0.5 * d0 ? "top" : "bottom") + " edge");
        return;
    }
    const auto minimum = [&](const std::string& key, const std::string& what, double value) {
        if (value < e_min - 1e-9)
            problems.add(at(key), "the joint is derived from the detail (\"from-detail\") only within the code's "
                                  "rules: expected the " + what + " of at least " + show(e_min) + " (" + rule +
                                      "), found " + show(value));
    };
    minimum("first_bolt", "plate's end distance above the top bolt", top);
    minimum("plate_depth", "plate's end distance below the bottom bolt", bottom);
    if (d.type == detail_type::end_plate) {
        const double w = d.derivation.gauge.value_or(default_end_plate_gauge());
        const double e2 = 0.5 * (d.derivation.plate_width.value_or(default_end_plate_width(w)) - w);
        minimum(d.derivation.plate_width ? "plate_width" : "gauge",
                std::string("plate's edge distance from each bolt line to its side edge, (plate_width - gauge) / 2") +
                    (d.derivation.plate_width ? "" : " with the default width"),
                e2);
        return;
    }
    minimum("bolt_line", "beam web's end distance from the bolt line to the beam end", b.bolt_line);
    const double e2 = d.derivation.edge_distance.value_or(standard == design_standard::en1993_1_8 ? 2 * b.diameter
                                                                                                  : 1.5 * b.diameter);
    if (!d.derivation.edge_distance) minimum("edge_distance", "plate's default edge distance", e2);
}

}  // namespace pinproof
