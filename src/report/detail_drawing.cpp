#include "pinproof/report/detail_drawing.hpp"

#include "report/svg_number.hpp"

#include "pinproof/report/xml_text.hpp"

#include <algorithm>
#include <cmath>
#include <sstream>
#include <string>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {
namespace {

constexpr double font = 12.0;          // px
constexpr double line_height = 15.0;   // px
constexpr double char_width = 6.6;     // px, a conservative average for 12 px sans-serif
constexpr double label_column = 340.0; // px
constexpr double max_draw_w = 620.0, max_draw_h = 520.0;

std::string esc(const std::string& s) { return xml_text(s); }

std::string num(double v) { return svg_number(v); }

std::string rad(double r) { return format_number(r, 4) + " rad"; }

// Exaggeration factors are round numbers: "5", "20", "1".
std::string factor_text(double f)
{
    if (f >= 1 && f < 1e9 && f == std::floor(f)) return std::to_string(static_cast<long long>(f));
    return format_number(f, 3);
}

std::vector<std::string> wrap(const std::string& text, std::size_t width)
{
    std::vector<std::string> lines;
    std::istringstream in(text);
    std::string word, line;
    while (in >> word) {
        if (!line.empty() && line.size() + 1 + word.size() > width) {
            lines.push_back(line);
            line.clear();
        }
        line += (line.empty() ? "" : " ") + word;
    }
    if (!line.empty()) lines.push_back(line);
    return lines;
}

point2 turn(point2 p, point2 c, double angle)
{
    const double cs = std::cos(angle), sn = std::sin(angle);
    return {c.x + cs * (p.x - c.x) - sn * (p.y - c.y), c.y + sn * (p.x - c.x) + cs * (p.y - c.y)};
}

struct view {
    double scale = 1;  // px per metre
    double ox = 0, oy = 0;
    bool mirror = false;
    double X(double x) const { return ox + (mirror ? -x : x) * scale; }
    double Y(double y) const { return oy - y * scale; }
};

struct label {
    double ax = 0, ay = 0;  // anchor, px
    std::vector<std::string> lines;
    std::string colour = "#222";
    double top = 0;  // placed
};

double nice_floor(double x)
{
    if (!(x >= 1)) return 1;
    const double p = std::pow(10.0, std::floor(std::log10(x)));
    for (double m : {5.0, 2.0, 1.0})
        if (m * p <= x * (1 + 1e-12)) return m * p;
    return p;
}

}  // namespace

double drawing_exaggeration(double demand, const closure& c, double shown_rotation)
{
    if (!(demand > 0)) return 1;
    double f = shown_rotation / demand;
    if (c.rotation) {
        if (*c.rotation <= demand) return 1;  // fails: draw the true position and its overlap
        f = std::min(f, 0.9 * *c.rotation / demand);
    }
    return nice_floor(f);
}

namespace {

constexpr double margin = 20, header = 64;  // px

// One drawing of a beam end: the view of the detail, the SVG written so far
// and the labels waiting for their place in the column beside the elevation.
// Each part of the drawing is one step of write(), in the order it is drawn.
class detail_sheet {
public:
    detail_sheet(const beam_end_geometry& g, const connection_detail& d, double rotation_demand,
                 const detail_drawing_options& options);
    std::string write();

private:
    std::string len(double metres) const { return format_quantity(metres, dims::length, options.units, 3); }
    void frame_view();
    void flange_inner_faces();
    void notes_below();
    void defs();
    void heading();
    void elevation();
    void break_line();
    void gap_dimension();
    void centre_and_contact();
    void part_labels();
    void place_labels();
    void write_labels();
    void notes_and_scale_bar();
    std::string document() const;

    void poly(const std::vector<point2>& pts, double turned_by, point2 c, const std::string& style);
    void line(point2 a, point2 b, const std::string& style);
    void circle(point2 c, double r_px, const std::string& style);
    void add_label(point2 anchor, const std::string& text, const std::string& colour = "#222");

    const beam_end_geometry& g;
    const connection_detail& d;
    const detail_drawing_options& options;
    rotation_sense sense;
    double demand, sgn;
    closure cl, other;
    double factor, shown;
    bool fails;
    point2 centre;
    double h;

    double reach_x = 0, x0 = 0, x1 = 0, y0 = 0, y1 = 0, pad = 0;  // world extent of the view, m
    view v;
    double draw_w = 0, draw_h = 0, draw_left = 0, column_left = 0, width = 0, height = 0;  // px
    std::ostringstream svg;
    std::vector<label> labels;
    std::vector<std::pair<point2, point2>> flange_lines;
    double angle = 0;
    std::string turned_colour;
    std::vector<std::string> note_lines;
};

detail_sheet::detail_sheet(const beam_end_geometry& g_, const connection_detail& d_, double rotation_demand,
                           const detail_drawing_options& options_)
    : g(g_), d(d_), options(options_)
{
    sense = rotation_demand < 0 ? rotation_sense::hogging : rotation_sense::sagging;
    demand = std::abs(rotation_demand);
    sgn = sense == rotation_sense::sagging ? 1.0 : -1.0;
    cl = find_closure(g, sense);
    other = find_closure(g, sense == rotation_sense::sagging ? rotation_sense::hogging : rotation_sense::sagging);
    factor = drawing_exaggeration(demand, cl, options.shown_rotation);
    shown = demand * factor;
    fails = demand > 0 && cl.rotation && *cl.rotation < demand;
    centre = g.centre(sense);
    h = g.depth;
}

std::string detail_sheet::write()
{
    frame_view();
    flange_inner_faces();
    angle = sgn * shown;
    turned_colour = fails ? "#c0392b" : "#1f4fbf";
    notes_below();
    defs();
    heading();
    elevation();
    break_line();
    gap_dimension();
    centre_and_contact();
    part_labels();
    place_labels();
    write_labels();
    notes_and_scale_bar();
    return document();
}

void detail_sheet::poly(const std::vector<point2>& pts, double turned_by, point2 c, const std::string& style)
{
    svg << "<polygon points=\"";
    for (const auto& p0 : pts) {
        const point2 p = turned_by == 0 ? p0 : turn(p0, c, turned_by);
        svg << num(v.X(p.x)) << ',' << num(v.Y(p.y)) << ' ';
    }
    svg << "\" " << style << "/>\n";
}

void detail_sheet::line(point2 a, point2 b, const std::string& style)
{
    svg << "<line x1=\"" << num(v.X(a.x)) << "\" y1=\"" << num(v.Y(a.y)) << "\" x2=\"" << num(v.X(b.x))
        << "\" y2=\"" << num(v.Y(b.y)) << "\" " << style << "/>\n";
}

void detail_sheet::circle(point2 c, double r_px, const std::string& style)
{
    svg << "<circle cx=\"" << num(v.X(c.x)) << "\" cy=\"" << num(v.Y(c.y)) << "\" r=\"" << num(r_px) << "\" "
        << style << "/>\n";
}

void detail_sheet::add_label(point2 anchor, const std::string& text, const std::string& colour)
{
    label l;
    l.ax = v.X(anchor.x);
    l.ay = v.Y(anchor.y);
    l.lines = wrap(text, static_cast<std::size_t>((label_column - 10) / char_width));
    l.colour = colour;
    labels.push_back(l);
}

// World extent of the view, and the view that maps it to the page.
void detail_sheet::frame_view()
{
    reach_x = 0.9 * h;
    for (const auto& c : {d.cope_top, d.cope_bottom})
        if (c) reach_x = std::max(reach_x, g.gap + c->length + 0.25 * h);
    for (const auto& f : g.fittings)
        for (const auto& p : f.points) reach_x = std::max(reach_x, -p.x + 0.25 * h);
    if (d.type == detail_type::custom)
        for (const auto& p : g.outline.points) reach_x = std::max(reach_x, std::min(-p.x, 2.0 * h) + 0.05 * h);
    x0 = -reach_x - 0.05 * h, x1 = 0.2 * h, y0 = -h, y1 = 0;
    if (d.type == detail_type::custom)
        for (const auto& p : g.outline.points) {
            y0 = std::min(y0, p.y);
            y1 = std::max(y1, p.y);
        }
    if (d.support_beam) {
        const auto& sb = *d.support_beam;
        x0 = std::min(x0, -sb.flange_outstand() - 0.1 * h);
        x1 = sb.web_thickness + sb.flange_outstand() + 0.03 * h;
        y0 = std::min(y0, -(sb.top + sb.depth));
        y1 = std::max(y1, -sb.top);
    }
    pad = 0.08 * h;
    y0 -= pad;
    y1 += pad;

    v.mirror = options.mirror;
    v.scale = std::min(max_draw_w / (x1 - x0), max_draw_h / (y1 - y0));
    draw_w = (x1 - x0) * v.scale, draw_h = (y1 - y0) * v.scale;
    draw_left = options.mirror ? margin + label_column + 30 : margin;
    column_left = options.mirror ? margin : margin + draw_w + 30;
    v.ox = options.mirror ? draw_left + x1 * v.scale : draw_left - x0 * v.scale;
    v.oy = header + y1 * v.scale;
    width = margin + draw_w + 30 + label_column + margin;
}

// Flange inner faces of the beam, for drawing only.
void detail_sheet::flange_inner_faces()
{
    if (g.flange_thickness > 0 && d.type != detail_type::custom) {
        const double tf = g.flange_thickness;
        const double top_end = d.cope_top ? -g.gap - d.cope_top->length : -g.gap;
        const double bottom_end = d.cope_bottom ? -g.gap - d.cope_bottom->length : -g.gap;
        if (!d.cope_top || d.cope_top->depth < tf) flange_lines.push_back({{-2 * reach_x, -tf}, {-g.gap, -tf}});
        else flange_lines.push_back({{-2 * reach_x, -tf}, {top_end, -tf}});
        if (!d.cope_bottom || d.cope_bottom->depth < tf)
            flange_lines.push_back({{-2 * reach_x, -h + tf}, {-g.gap, -h + tf}});
        else flange_lines.push_back({{-2 * reach_x, -h + tf}, {bottom_end, -h + tf}});
    }
}

// The notes under the drawing: demand, closure, margin, centre, review.
void detail_sheet::notes_below()
{
    std::vector<std::string> notes;
    {
        const std::string sense_name = to_string(sense);
        if (demand > 0) {
            notes.push_back("Rotation demand " + rad(demand) + " (" + sense_name + "). Rotation drawn at " +
                            factor_text(factor) + " x the demand (" + rad(shown) + " shown); lengths to scale.");
        } else {
            notes.push_back("No rotation demand: the beam end is drawn at rest; lengths to scale.");
        }
        auto closure_text = [&](const closure& c) {
            if (!c.rotation) return to_string(c.sense) + ": no contact within pi/2 rad";
            return to_string(c.sense) + " " + rad(*c.rotation) + " (" + c.contact->description() + ")";
        };
        notes.push_back("Closure rotation at the worst-case gap " + len(g.gap) + ": " + closure_text(cl) + "; " +
                        closure_text(other) + ".");
        if (demand > 0) {
            const double m = cl.rotation.value_or(max_searched_rotation) / demand;
            const double c = clearance(g, sense, demand);
            notes.push_back(std::string(fails ? "FAILS: " : "") + "margin closure / demand " +
                            (cl.rotation ? "" : "at least ") + format_number(m, 3) +
                            (c >= 0 ? "; clearance left at the demand " + len(c)
                                    : "; at the demand the outline overlaps the support by " + len(-c)) +
                            ".");
        }
        notes.push_back("Centre of rotation: " + g.centre_basis + ".");
        notes.push_back("For review by a qualified engineer.");
    }
    for (const auto& n : notes)
        for (const auto& l : wrap(n, static_cast<std::size_t>((width - 2 * margin) / char_width))) note_lines.push_back(l);
}

// The hatch of the support and the clip paths of the view and of the beam.
void detail_sheet::defs()
{
    svg << "<defs>\n"
        << "<pattern id=\"hatch\" patternUnits=\"userSpaceOnUse\" width=\"7\" height=\"7\" patternTransform=\"rotate(45)\">"
        << "<line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"7\" stroke=\"#666\" stroke-width=\"1\"/></pattern>\n"
        << "<clipPath id=\"view\"><rect x=\"" << num(draw_left) << "\" y=\"" << num(header) << "\" width=\""
        << num(draw_w) << "\" height=\"" << num(draw_h) << "\"/></clipPath>\n";
    {
        // The beam is drawn only up to its break line.
        const double xa = std::min(v.X(-reach_x), v.X(x1)), xb = std::max(v.X(-reach_x), v.X(x1));
        svg << "<clipPath id=\"beam\"><rect x=\"" << num(xa) << "\" y=\"" << num(header) << "\" width=\"" << num(xb - xa)
            << "\" height=\"" << num(draw_h) << "\"/></clipPath>\n";
    }
    svg << "</defs>\n";
}

// Title, subtitle and the frame of the view.
void detail_sheet::heading()
{
    auto words = [](std::string s) {
        std::replace(s.begin(), s.end(), '-', ' ');
        return s;
    };
    const std::string title = options.title.empty()
                                  ? "Beam end detail: " +
                                        (d.type == detail_type::custom ? std::string("custom outline")
                                                                       : words(to_string(d.type))) +
                                        " to " + words(to_string(d.support))
                                  : options.title;
    svg << "<text x=\"" << margin << "\" y=\"28\" font-size=\"17\" font-weight=\"bold\">" << esc(title) << "</text>\n";
    svg << "<text x=\"" << margin << "\" y=\"48\" fill=\"#444\">Elevation, " << (options.mirror ? "start" : "end")
        << " of the beam; " << esc(to_string(sense)) << " sense; "
        << (demand > 0 ? "rotation exaggerated x" + factor_text(factor) : std::string("at rest, no rotation demand"))
        << "</text>\n";
    svg << "<rect x=\"" << num(draw_left) << "\" y=\"" << num(header) << "\" width=\"" << num(draw_w) << "\" height=\""
        << num(draw_h) << "\" fill=\"none\" stroke=\"#ccc\"/>\n";
}

// The support, the fittings, the beam end at rest and turned.
void detail_sheet::elevation()
{
    svg << "<g clip-path=\"url(#view)\">\n";
    // Support.
    poly(g.support.material, 0, centre, "fill=\"url(#hatch)\" stroke=\"#333\" stroke-width=\"1.5\"");
    // Fittings at rest.
    for (const auto& f : g.fittings)
        poly(f.points, 0, centre,
             f.moves_with_beam ? "fill=\"#eee\" stroke=\"#888\" stroke-width=\"1\" stroke-dasharray=\"4 3\""
                               : "fill=\"#e4e4e4\" stroke=\"#444\" stroke-width=\"1.2\"");
    svg << "<g clip-path=\"url(#beam)\">\n";
    // Beam at rest.
    poly(g.outline.points, 0, centre, "fill=\"none\" stroke=\"#777\" stroke-width=\"1\" stroke-dasharray=\"5 3\"");
    for (const auto& fl : flange_lines) line(fl.first, fl.second, "stroke=\"#999\" stroke-width=\"0.8\" stroke-dasharray=\"5 3\"");
    for (const auto& b : g.bolts) circle(b, 0.5 * d.bolts.diameter * v.scale, "fill=\"none\" stroke=\"#777\"");
    // Beam turned.
    if (demand > 0) {
        poly(g.outline.points, angle, centre,
             "fill=\"" + turned_colour + "\" fill-opacity=\"0.10\" stroke=\"" + turned_colour + "\" stroke-width=\"2\"");
        for (const auto& fl : flange_lines)
            line(turn(fl.first, centre, angle), turn(fl.second, centre, angle),
                 "stroke=\"" + turned_colour + "\" stroke-width=\"0.8\"");
        for (const auto& f : g.fittings)
            if (f.moves_with_beam)
                poly(f.points, angle, centre, "fill=\"#eee\" stroke=\"" + turned_colour + "\" stroke-width=\"1.5\"");
        for (const auto& b : g.bolts)
            circle(turn(b, centre, angle), 0.5 * d.bolts.diameter * v.scale,
                   "fill=\"none\" stroke=\"" + turned_colour + "\" stroke-width=\"1.2\"");
    }
    svg << "</g>\n</g>\n";
}

// Break line where the drawing cuts the beam.
void detail_sheet::break_line()
{
    const double xb = v.X(-reach_x);
    if (d.type != detail_type::custom && xb > draw_left && xb < draw_left + draw_w) {
        const double ya = v.Y(0) - 8, yb = v.Y(-h) + 8, ym = 0.5 * (ya + yb);
        svg << "<polyline points=\"" << num(xb) << ',' << num(ya) << ' ' << num(xb) << ',' << num(ym - 6) << ' '
            << num(xb - 6) << ',' << num(ym - 2) << ' ' << num(xb + 6) << ',' << num(ym + 2) << ' ' << num(xb) << ','
            << num(ym + 6) << ' ' << num(xb) << ',' << num(yb) << "\" fill=\"none\" stroke=\"#333\"/>\n";
    }
}

// Gap dimension, at a level where the beam end is free.
void detail_sheet::gap_dimension()
{
    double level;
    double end_x = -g.gap;
    if (d.type == detail_type::custom) {
        std::size_t k = 0;
        for (std::size_t i = 0; i < g.outline.points.size(); ++i)
            if (g.outline.points[i].x > g.outline.points[k].x) k = i;
        level = g.outline.points[k].y;
        end_x = g.outline.points[k].x;
    } else {
        const double top_of_end = d.cope_top ? d.cope_top->depth : 0.0;
        level = -0.5 * (top_of_end + std::max(top_of_end, d.plate_top));
        if (d.plate_top - top_of_end < 0.02) level = -0.5 * (d.plate_top + d.plate_depth + h);  // below the fitting
        if (d.cope_bottom && -level > h - d.cope_bottom->depth) level = -(top_of_end + 0.25 * h);
    }
    const point2 a{end_x, level}, b{0, level};
    line(a, b, "stroke=\"#0a7d2c\" stroke-width=\"1.2\"");
    for (const auto& p : {a, b}) {
        svg << "<line x1=\"" << num(v.X(p.x)) << "\" y1=\"" << num(v.Y(p.y) - 6) << "\" x2=\"" << num(v.X(p.x))
            << "\" y2=\"" << num(v.Y(p.y) + 6) << "\" stroke=\"#0a7d2c\" stroke-width=\"1.2\"/>\n";
    }
    std::string text = "gap " + len(d.gap) + " as detailed";
    if (d.gap_tolerance > 0) text += ", " + len(g.gap) + " worst case (tolerance " + len(d.gap_tolerance) + ")";
    if (d.type == detail_type::end_plate) text += " (the end plate thickness)";
    add_label({0.5 * (a.x + b.x), level}, text, "#0a7d2c");
}

// Centre, contact point and the line between them (the force arm is in the text: it is normal to the contact).
void detail_sheet::centre_and_contact()
{
    circle(centre, 6, "fill=\"white\" stroke=\"#000\" stroke-width=\"1.5\"");
    line({centre.x - 9 / v.scale, centre.y}, {centre.x + 9 / v.scale, centre.y}, "stroke=\"#000\" stroke-width=\"1.2\"");
    line({centre.x, centre.y - 9 / v.scale}, {centre.x, centre.y + 9 / v.scale}, "stroke=\"#000\" stroke-width=\"1.2\"");
    add_label(centre, "centre of rotation (" + to_string(sense) + ")");
    if (cl.contact) {
        const point2 p = cl.contact->at;
        line(centre, p, "stroke=\"#8e1b1b\" stroke-width=\"1.2\" stroke-dasharray=\"6 3\"");
        circle(p, 4, "fill=\"#c0392b\" stroke=\"none\"");
        if (demand > 0) circle(turn(p, centre, angle), 3.5, "fill=\"none\" stroke=\"#c0392b\" stroke-width=\"1.2\"");
        add_label(p, "first contact at " + rad(*cl.rotation) + ": " + cl.contact->description(), "#8e1b1b");
        add_label({0.5 * (centre.x + p.x), 0.5 * (centre.y + p.y)}, "centre to contact " + len(cl.contact->distance),
                  "#8e1b1b");
    } else {
        add_label(centre, "no contact within pi/2 rad in this sense", "#8e1b1b");
    }
}

// What is what: the support, each fitting, the beam end at rest and turned.
void detail_sheet::part_labels()
{
    {
        std::string s = "support: " + g.support.description + " (hatched)";
        point2 anchor{0.5 * x1, y1 - 0.3 * pad};
        if (d.support_beam) anchor = {0.5 * d.support_beam->web_thickness, -(d.support_beam->top + 0.5 * d.support_beam->depth)};
        add_label(anchor, s);
    }
    for (const auto& f : g.fittings) {
        point2 c{0, 0};
        for (const auto& p : f.points) c = {c.x + p.x / f.points.size(), c.y + p.y / f.points.size()};
        c.x = std::max(c.x, x0);
        std::string s = f.label + " " + len(d.plate_thickness) + ", " + std::to_string(d.bolts.rows) + " bolt row" +
                        (d.bolts.rows > 1 ? "s" : "") + " of " + len(d.bolts.diameter);
        if (d.type == detail_type::web_cleats) s += " (leg length drawn, not given)";
        add_label({c.x, f.points.front().y + 0.15 * (f.points.back().y - f.points.front().y)}, s);
    }
    {
        // Anchors on the flanges behind any cope, within the drawn length.
        auto behind = [&](const std::optional<cope>& c) {
            const double start = -g.gap - (c ? c->length : 0.0);
            return start - 0.3 * (start + reach_x);
        };
        const point2 rest = d.type == detail_type::custom ? point2{x0 + 0.3 * (-g.gap - x0), y1 - pad}
                                                          : point2{behind(d.cope_top), 0};
        add_label(rest, "beam end at rest (dashed)", "#555");
        if (demand > 0) {
            const point2 bottom = d.type == detail_type::custom ? point2{x0 + 0.55 * (-g.gap - x0), y0 + pad}
                                                                : point2{behind(d.cope_bottom), -h};
            add_label(turn(bottom, centre, angle),
                      std::string("beam end turned ") +
                          (fails ? "to the demand: it overlaps the support"
                                 : "x" + factor_text(factor) + " (" + rad(shown) + " shown)"),
                      turned_colour);
        }
    }
}

// Place the labels in the column, in the order of their anchors, apart.
void detail_sheet::place_labels()
{
    std::sort(labels.begin(), labels.end(), [](const label& a, const label& b) { return a.ay < b.ay; });
    double next = header;
    for (auto& l : labels) {
        const double hgt = l.lines.size() * line_height;
        l.top = std::max(next, l.ay - 0.5 * hgt);
        next = l.top + hgt + 8;
    }
    // Labels that would run below the drawing move up as a block, but not above its top.
    if (!labels.empty()) {
        const double overflow = next - 8 - (header + draw_h);
        const double room = labels.front().top - header;
        const double shift = std::min(std::max(overflow, 0.0), std::max(room, 0.0));
        if (shift > 0) {
            double n2 = header;
            for (auto& l : labels) {
                l.top = std::max(l.top - shift, n2);
                n2 = l.top + l.lines.size() * line_height + 8;
            }
        }
    }
}

// Each label with its leader to its anchor.
void detail_sheet::write_labels()
{
    for (const auto& l : labels) {
        const double text_x = options.mirror ? column_left + label_column - 4 : column_left + 4;
        const double edge_x = options.mirror ? column_left + label_column + 2 : column_left - 2;
        const double ly = l.top + 0.7 * line_height;
        svg << "<polyline points=\"" << num(l.ax) << ',' << num(l.ay) << ' ' << num(edge_x + (options.mirror ? 8 : -8))
            << ',' << num(ly - 4) << ' ' << num(edge_x) << ',' << num(ly - 4) << "\" fill=\"none\" stroke=\"#aaa\" "
            << "stroke-width=\"0.8\"/>\n";
        svg << "<circle cx=\"" << num(l.ax) << "\" cy=\"" << num(l.ay) << "\" r=\"1.8\" fill=\"#aaa\"/>\n";
        for (std::size_t i = 0; i < l.lines.size(); ++i)
            svg << "<text x=\"" << num(text_x) << "\" y=\"" << num(ly + i * line_height) << "\" fill=\"" << l.colour
                << "\"" << (options.mirror ? " text-anchor=\"end\"" : "") << ">" << esc(l.lines[i]) << "</text>\n";
    }
}

// Notes and scale bar, below the drawing and the labels.
void detail_sheet::notes_and_scale_bar()
{
    double labels_bottom = header + draw_h;
    for (const auto& l : labels) labels_bottom = std::max(labels_bottom, l.top + l.lines.size() * line_height);
    const double footer_top = labels_bottom + 20;
    const double scale_bar_top = footer_top + note_lines.size() * line_height + 14;
    height = scale_bar_top + 40;
    for (std::size_t i = 0; i < note_lines.size(); ++i)
        svg << "<text x=\"" << margin << "\" y=\"" << num(footer_top + 12 + i * line_height) << "\""
            << (note_lines[i].rfind("FAILS", 0) == 0 ? " fill=\"#c0392b\" font-weight=\"bold\"" : "") << ">"
            << esc(note_lines[i]) << "</text>\n";
    {
        // A round length of the drawing's unit system: 100 mm or 4 in, halved or doubled to fit.
        double bar = options.units == unit_system::us_customary ? 4 * 0.0254 : 0.1;  // m
        while (bar * v.scale > 250) bar /= 2;
        while (bar * v.scale < 60) bar *= 2;
        const double bx = margin, by = scale_bar_top + 10;
        svg << "<rect x=\"" << num(bx) << "\" y=\"" << num(by) << "\" width=\"" << num(bar * v.scale)
            << "\" height=\"5\" fill=\"#333\"/>\n";
        svg << "<text x=\"" << num(bx + bar * v.scale + 8) << "\" y=\"" << num(by + 6) << "\">" << esc(len(bar))
            << (demand > 0 ? " (lengths to scale; rotation exaggerated x" + factor_text(factor) + ")"
                           : std::string(" (lengths to scale)"))
            << "</text>\n";
    }
    svg << "</svg>\n";
}

// The SVG document: its size is known only once everything is placed.
std::string detail_sheet::document() const
{
    std::ostringstream out;
    out << "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";
    out << "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"" << num(width) << "\" height=\"" << num(height)
        << "\" viewBox=\"0 0 " << num(width) << ' ' << num(height) << "\" font-family=\"sans-serif\" font-size=\""
        << font << "\">\n";
    out << "<rect x=\"0\" y=\"0\" width=\"" << num(width) << "\" height=\"" << num(height) << "\" fill=\"white\"/>\n";
    out << svg.str();
    return out.str();
}

}  // namespace

std::string detail_svg(const beam_end_geometry& g, const connection_detail& d, double rotation_demand,
                       const detail_drawing_options& options)
{
    if (!std::isfinite(rotation_demand)) throw internal_error("detail_svg: the rotation demand is not finite");
    return detail_sheet(g, d, rotation_demand, options).write();
}

}  // namespace pinproof
