#include "pinproof/report/beam_elevation.hpp"

#include "report/svg_number.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <sstream>
#include <vector>

#include "pinproof/report/xml_text.hpp"
#include "report/load_arrow.hpp"

namespace pinproof {
namespace {

// Page geometry (px of the SVG user space). The beam spans the width between
// the margins, whatever its length: the horizontal scale is the span's.
constexpr double width = 720.0;
constexpr double margin = 90.0;          // room for the end symbols and their labels
constexpr double beam_y = 176.0;         // the beam's axis
constexpr double band_height = 34.0;     // the largest line load
constexpr double band_gap = 20.0;        // between stacked line loads (room for the label)
constexpr double arrow_max = 70.0;       // the largest point load
constexpr double arrow_min = 22.0;       // the smallest point load still reads as an arrow
constexpr double font = 11.0;

std::string num(double v) { return svg_number(v); }

// Positions along the beam in m, or ft in US customary units (as the report).
std::string position_text(double m, unit_system units)
{
    const bool us = units == unit_system::us_customary;
    const double v = us ? m / 0.3048 : m;
    return format_number(std::abs(v) < 1e-12 ? 0.0 : v, 4) + (us ? " ft" : " m");
}

std::string stiffness_text(const stiffness& s, unit_system units)
{
    return s.is_rigid() ? std::string("rigid") : format_quantity(s.value(), dims::rotational_stiffness, units);
}

class drawing {
public:
    // The whole member spans the width: an overhang's tip is at the right.
    drawing(const beam& b, unit_system units)
        : b_(b), units_(units), length_(b.span + b.overhang), scale_((width - 2 * margin) / length_)
    {
    }
    std::string svg();

private:
    double x_of(double pos) const { return margin + pos * scale_; }
    void text(double x, double y, const std::string& s, const char* anchor = "middle", const char* extra = "");
    // Down for a load that acts downward, up (head away from the beam) for an uplift (load_arrow.hpp).
    void load_arrow(double x, double y, double length, const char* colour, bool down)
    {
        o_ << load_arrow_svg(x, y, length, down, colour, "1.4");
    }
    void line_loads(double& top);
    void point_loads(double& top);
    void moments();
    void support(beam_end e);
    void dimensions();
    void free_tip();
    bool overhang() const { return b_.layout == beam_layout::overhang; }

    const beam& b_;
    unit_system units_;
    double length_;  // m, the whole member (an overhang: to its tip)
    double scale_;
    std::ostringstream o_;
    double bottom_ = beam_y;
};

void drawing::text(double x, double y, const std::string& s, const char* anchor, const char* extra)
{
    o_ << "<text x=\"" << num(x) << "\" y=\"" << num(y) << "\" text-anchor=\"" << anchor << "\"" << extra << ">"
       << xml_text(s) << "</text>\n";
}

// Line loads (uniform and linearly varying) as bands of arrows above the beam,
// stacked one above the other, their height proportional to the intensity:
// the largest intensity of the beam is band_height.
void drawing::line_loads(double& top)
{
    double largest = 0;
    for (const auto& l : b_.loads)
        if (l.kind == load_kind::udl || l.kind == load_kind::linear)
            largest = std::max({largest, std::abs(l.value), l.kind == load_kind::linear ? std::abs(l.value_end) : 0.0});
    if (largest <= 0) return;
    double base = beam_y - 4;
    for (const auto& l : b_.loads) {
        if (l.kind != load_kind::udl && l.kind != load_kind::linear) continue;
        const double w0 = l.value, w1 = l.kind == load_kind::linear ? l.value_end : l.value;
        const double h0 = band_height * std::abs(w0) / largest, h1 = band_height * std::abs(w1) / largest;
        const double xa = x_of(l.from), xb = x_of(l.to);
        o_ << "<g class=\"line-load\" data-case=\"" << xml_text(l.load_case) << "\">\n";
        o_ << "<path d=\"M" << num(xa) << " " << num(base - h0) << " L" << num(xb) << " " << num(base - h1)
           << "\" stroke=\"#1d4e89\" stroke-width=\"1.4\" fill=\"none\"/>\n";
        const int n = std::max(2, static_cast<int>((xb - xa) / 28.0) + 1);
        for (int i = 0; i < n; ++i) {
            const double t = static_cast<double>(i) / (n - 1);
            const double h = h0 + (h1 - h0) * t;
            // An uplift's arrows point up, away from the beam.
            if (h > 3) load_arrow(xa + (xb - xa) * t, base, h, "#1d4e89", w0 + (w1 - w0) * t >= 0);
        }
        std::string label = l.load_case + ": " + format_quantity(w0, dims::line_load, units_);
        if (l.kind == load_kind::linear) label += " to " + format_quantity(w1, dims::line_load, units_);
        const double band_top = base - std::max(h0, h1);
        text((xa + xb) / 2, band_top - 4, label);
        o_ << "</g>\n";
        base = band_top - band_gap;
    }
    top = base;
}

// Point loads as arrows onto the beam, their length proportional to the force
// (the largest point load of the beam is arrow_max), each labelled. They are
// drawn in front of the line loads.
void drawing::point_loads(double& top)
{
    double largest = 0;
    for (const auto& l : b_.loads)
        if (l.kind == load_kind::point) largest = std::max(largest, std::abs(l.value));
    if (largest <= 0) return;
    // Loads at one position (to 1 mm) are drawn side by side, 7 px apart, and
    // labelled one line each above the longest of them.
    std::map<long, std::vector<const load*>> at_position;
    for (const auto& l : b_.loads)
        if (l.kind == load_kind::point) at_position[std::lround(l.from * 1000)].push_back(&l);
    for (const auto& [mm, group] : at_position) {
        const double x = x_of(group.front()->from);
        double longest = 0;
        for (std::size_t k = 0; k < group.size(); ++k) {
            const load& l = *group[k];
            const double len = std::max(arrow_min, arrow_max * std::abs(l.value) / largest);
            longest = std::max(longest, len);
            const double dx = (static_cast<double>(k) - 0.5 * static_cast<double>(group.size() - 1)) * 7.0;
            o_ << "<g class=\"point-load\" data-case=\"" << xml_text(l.load_case) << "\">\n";
            load_arrow(x + dx, beam_y - 3, len, "#6a3d9a", l.value >= 0);
            o_ << "</g>\n";
        }
        double y = beam_y - 3 - longest - 5;
        for (auto it = group.rbegin(); it != group.rend(); ++it, y -= font + 3)
            text(x, y, (*it)->load_case + ": " + format_quantity((*it)->value, dims::force, units_));
        top = std::min(top, y);
    }
}

// A couple as a three-quarter circle with an arrow head, clockwise positive
// (sign_conventions.hpp).
void drawing::moments()
{
    for (const auto& l : b_.loads) {
        if (l.kind != load_kind::moment) continue;
        const double x = x_of(l.from), r = 14;
        const bool cw = l.value >= 0;
        // From the top of the circle round three quarters in the load's sense.
        const double ex = x + (cw ? -r : r), ey = beam_y;
        o_ << "<g class=\"moment-load\" data-case=\"" << xml_text(l.load_case) << "\">\n"
           << "<path d=\"M" << num(x) << " " << num(beam_y - r) << " A" << num(r) << " " << num(r) << " 0 1 "
           << (cw ? 1 : 0) << " " << num(ex) << " " << num(ey) << "\" stroke=\"#8c6d1f\" stroke-width=\"1.4\" fill=\"none\"/>\n"
           << "<path d=\"M" << num(ex) << " " << num(ey - 1) << " l-4 -6 l8 0 z\" fill=\"#8c6d1f\"/>\n";
        text(x, beam_y + r + font + 2,
             l.load_case + ": " + format_quantity(std::abs(l.value), dims::moment, units_) + (cw ? " clockwise" : " anticlockwise"));
        o_ << "</g>\n";
    }
}

// The end as the analysis idealises it. The start end carries the horizontal
// restraint (a pin), the end a roller: the beam model has no axial terms, so
// which end it is does not change any result (beam_model.hpp).
void drawing::support(beam_end e)
{
    const joint& j = b_.at(e);
    const bool start = e == beam_end::start;
    const double x = x_of(start ? 0.0 : b_.span);
    const double out = start ? -1.0 : 1.0;  // away from the span
    // An overhang's end support carries the beam on, continuous, over a roller.
    const end_idealisation kind = overhang() && !start ? end_idealisation::pin : idealisation_of(j);
    o_ << "<g class=\"support\" data-end=\"" << to_string(e) << "\" data-idealisation=\""
       << (kind == end_idealisation::pin ? "pin" : kind == end_idealisation::fixed ? "fixed" : "spring") << "\">\n";
    std::string label;
    if (kind == end_idealisation::fixed) {
        // A wall with hatching behind it.
        const double wx = x;
        o_ << "<line x1=\"" << num(wx) << "\" y1=\"" << num(beam_y - 26) << "\" x2=\"" << num(wx) << "\" y2=\""
           << num(beam_y + 26) << "\" stroke=\"#2b2f33\" stroke-width=\"2\"/>\n";
        for (int i = 0; i < 6; ++i) {
            const double y = beam_y - 26 + i * 10;
            o_ << "<line x1=\"" << num(wx) << "\" y1=\"" << num(y) << "\" x2=\"" << num(wx + out * 8) << "\" y2=\""
               << num(y + 8) << "\" stroke=\"#2b2f33\"/>\n";
        }
        label = "fixed (rigid joint)";
    } else {
        // A triangle under the beam end, on rollers at the end support.
        o_ << "<path d=\"M" << num(x) << " " << num(beam_y + 2) << " l-9 16 h18 z\" fill=\"#ffffff\" stroke=\"#2b2f33\" "
              "stroke-width=\"1.4\"/>\n";
        double ground = beam_y + 18;
        if (!start) {
            for (double dx : {-5.0, 5.0})
                o_ << "<circle cx=\"" << num(x + dx) << "\" cy=\"" << num(ground + 3.5) << "\" r=\"3\" fill=\"#ffffff\" "
                      "stroke=\"#2b2f33\"/>\n";
            ground += 7;
        }
        o_ << "<line x1=\"" << num(x - 15) << "\" y1=\"" << num(ground) << "\" x2=\"" << num(x + 15) << "\" y2=\""
           << num(ground) << "\" stroke=\"#2b2f33\" stroke-width=\"1.4\"/>\n";
        for (int i = 0; i < 4; ++i)
            o_ << "<line x1=\"" << num(x - 12 + i * 8) << "\" y1=\"" << num(ground) << "\" x2=\"" << num(x - 17 + i * 8)
               << "\" y2=\"" << num(ground + 5) << "\" stroke=\"#2b2f33\"/>\n";
        if (kind == end_idealisation::spring) {
            // A coil around the joint: two and a half turns of a growing spiral,
            // its tail tied to a short post, the usual symbol of a rotational spring.
            std::ostringstream d;
            const int steps = 60;
            for (int i = 0; i <= steps; ++i) {
                const double a = 2.5 * 2 * M_PI * i / steps;
                const double r = 3 + 9 * static_cast<double>(i) / steps;
                d << (i == 0 ? "M" : " L") << num(x + r * std::cos(a)) << " " << num(beam_y - r * std::sin(a));
            }
            o_ << "<path d=\"" << d.str() << "\" stroke=\"#3d6e8c\" stroke-width=\"1.3\" fill=\"none\"/>\n";
            label = "spring " + stiffness_text(j.range.min, units_) + " to " + stiffness_text(j.range.max, units_);
        } else {
            label = start ? "pin (true pin)" : overhang() ? "roller, beam continuous over it" : "roller (true pin)";
        }
    }
    // Labels hang under the support, away from the span (an overhang's end
    // support: centred under it, the overhang to its right).
    const bool centred = overhang() && !start;
    const char* anchor = start ? "start" : centred ? "middle" : "end";
    std::string name = start ? "Start" : centred ? "End support" : "End";
    if (j.detail) name += ": " + to_string(j.detail->type);
    const double tx = start ? x - 20 : centred ? x : x + 20;
    text(tx, beam_y + 44, name, anchor, " font-weight=\"bold\"");
    text(tx, beam_y + 44 + font + 3, label, anchor);
    o_ << "</g>\n";
    bottom_ = std::max(bottom_, beam_y + 44 + font + 3);
}

// An overhang's free tip: an open end, named under it.
void drawing::free_tip()
{
    const double x = x_of(length_);
    o_ << "<g class=\"free-tip\">\n<circle cx=\"" << num(x) << "\" cy=\"" << num(beam_y) << "\" r=\"3\" fill=\"#ffffff\" "
          "stroke=\"#2b2f33\" stroke-width=\"1.4\"/>\n";
    text(x + 20, beam_y + 44, "Tip", "end", " font-weight=\"bold\"");
    text(x + 20, beam_y + 44 + font + 3, "free", "end");
    o_ << "</g>\n";
}

// A dimension line under the supports: the span, and a chain through every
// load position (point loads, couples and the ends of line loads).
void drawing::dimensions()
{
    std::set<double> stations{0.0, b_.span, length_};
    for (const auto& l : b_.loads) {
        stations.insert(l.from);
        if (l.kind == load_kind::udl || l.kind == load_kind::linear) stations.insert(l.to);
    }
    auto dim_line = [&](double y, const std::vector<double>& at, bool label_parts) {
        o_ << "<line x1=\"" << num(x_of(at.front())) << "\" y1=\"" << num(y) << "\" x2=\"" << num(x_of(at.back()))
           << "\" y2=\"" << num(y) << "\" stroke=\"#555555\"/>\n";
        for (std::size_t i = 0; i < at.size(); ++i) {
            const double x = x_of(at[i]);
            o_ << "<line x1=\"" << num(x) << "\" y1=\"" << num(y - 5) << "\" x2=\"" << num(x) << "\" y2=\"" << num(y + 5)
               << "\" stroke=\"#555555\"/>\n"
               << "<line x1=\"" << num(x - 3) << "\" y1=\"" << num(y + 3) << "\" x2=\"" << num(x + 3) << "\" y2=\""
               << num(y - 3) << "\" stroke=\"#555555\" stroke-width=\"1.4\"/>\n";
            if (label_parts && i + 1 < at.size() && x_of(at[i + 1]) - x > 34)
                text((x + x_of(at[i + 1])) / 2, y - 4, position_text(at[i + 1] - at[i], units_));
        }
    };
    double y = bottom_ + 22;
    std::vector<double> chain(stations.begin(), stations.end());
    // Stations closer than 1 mm are one.
    chain.erase(std::unique(chain.begin(), chain.end(), [](double a, double b) { return std::abs(a - b) < 1e-3; }),
                chain.end());
    o_ << "<g class=\"dimensions\">\n";
    // The chain, where it has more than the span (and an overhang's) stations.
    if (chain.size() > (overhang() ? 3u : 2u)) {
        dim_line(y, chain, true);
        y += 28;
    }
    dim_line(y, overhang() ? std::vector<double>{0.0, b_.span, length_} : std::vector<double>{0.0, b_.span}, false);
    text(x_of(b_.span / 2), y - 4, "L = " + position_text(b_.span, units_));
    if (overhang()) text(x_of(b_.span + b_.overhang / 2), y - 4, "a = " + position_text(b_.overhang, units_));
    o_ << "</g>\n";
    bottom_ = y + 8;
}

std::string drawing::svg()
{
    double top = beam_y - 10;
    line_loads(top);
    point_loads(top);
    moments();
    // The beam in front of the load arrows' tails, behind nothing.
    o_ << "<line class=\"beam\" x1=\"" << num(x_of(0)) << "\" y1=\"" << num(beam_y) << "\" x2=\"" << num(x_of(length_))
       << "\" y2=\"" << num(beam_y) << "\" stroke=\"#2b2f33\" stroke-width=\"4\"/>\n";
    text(x_of(b_.span / 2), beam_y + 16, b_.sec.name, "middle", " font-style=\"italic\"");
    support(beam_end::start);
    support(beam_end::end);
    if (overhang()) free_tip();
    dimensions();
    const double shift = top - 24;  // room above the tallest label for the title
    const double height = bottom_ - shift + 6;
    std::ostringstream doc;
    doc << "<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 " << num(shift) << " " << num(width) << " "
        << num(height) << "\" width=\"" << num(width) << "\" height=\"" << num(height) << "\" font-family=\"sans-serif\" "
        << "font-size=\"" << num(font) << "\">\n"
        << "<title>" << xml_text("Beam " + b_.id + ": elevation, supports as analysed, unfactored loads") << "</title>\n"
        << "<text x=\"8\" y=\"" << num(shift + 16) << "\" font-weight=\"bold\">"
        << xml_text("Beam " + b_.id + ": elevation as analysed (loads unfactored, to scale within each kind)")
        << "</text>\n"
        << o_.str() << "</svg>\n";
    return doc.str();
}

}  // namespace

end_idealisation idealisation_of(const joint& j)
{
    if (j.range.max.is_pinned()) return end_idealisation::pin;
    if (j.range.min.is_rigid()) return end_idealisation::fixed;
    return end_idealisation::spring;
}

std::string beam_elevation_svg(const beam& b, unit_system units)
{
    drawing d(b, units);
    return d.svg();
}

}  // namespace pinproof
