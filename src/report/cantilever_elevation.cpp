#include "pinproof/report/cantilever_elevation.hpp"

#include "report/svg_number.hpp"

#include <algorithm>
#include <cmath>
#include <sstream>
#include <stdexcept>

#include "pinproof/report/xml_text.hpp"
#include "report/load_arrow.hpp"

namespace pinproof {
namespace {

constexpr double width = 760, height = 250;
constexpr double x_root = 110, x_tip = 640;  // px: the member's ends
constexpr double y_beam = 130;               // px: the member's axis

std::string esc(const std::string& s) { return xml_text(s); }

std::string num(double v) { return svg_number(v); }

double x_at(const beam& b, double x) { return x_root + (x_tip - x_root) * x / b.span; }

// A downward arrow whose head touches the member's top, or an upward one standing on it for an uplift.
void arrow(std::ostringstream& o, double x, double length, bool down)
{
    o << load_arrow_svg(x, y_beam - 6, length, down, "#b03020", "1.5");
}

void loads(std::ostringstream& o, const beam& b, unit_system units)
{
    int row = 0;  // labels stacked so that loads at one place stay readable
    for (const load& l : b.loads) {
        const double x0 = x_at(b, l.from);
        std::string label = l.load_case + " ";
        double label_x = x0;
        switch (l.kind) {
        case load_kind::point:
            arrow(o, x0, 46, l.value >= 0);
            label += format_quantity(l.value, dims::force, units);
            break;
        case load_kind::moment: {
            // A curved arrow round the point: clockwise for a positive couple.
            const bool cw = l.value >= 0;
            o << "<path d=\"M " << num(x0 - 14) << " " << num(y_beam - 8) << " A 14 14 0 1 1 " << num(x0 + 14) << " "
              << num(y_beam - 8) << "\" fill=\"none\" stroke=\"#b03020\" stroke-width=\"1.5\"/>\n";
            const double hx = cw ? x0 + 14 : x0 - 14;
            o << "<path d=\"M " << num(hx - 4) << " " << num(y_beam - 14) << " L " << num(hx + 4) << " "
              << num(y_beam - 14) << " L " << num(hx) << " " << num(y_beam - 6) << " Z\" fill=\"#b03020\"/>\n";
            label += format_quantity(l.value, dims::moment, units) + (cw ? " (clockwise)" : " (anticlockwise)");
            break;
        }
        case load_kind::udl:
        case load_kind::linear: {
            const double x1 = x_at(b, l.to);
            const double peak = std::max(std::abs(l.value), std::abs(l.value_end));
            const int n = std::max(2, static_cast<int>((x1 - x0) / 28));
            for (int i = 0; i <= n; ++i) {
                const double x = l.from + (l.to - l.from) * i / n;
                const double q = intensity_at(l, x);
                const double length = peak > 0 ? 8 + 24 * std::abs(q) / peak : 8;
                arrow(o, x_at(b, x), length, q >= 0);
            }
            label += l.kind == load_kind::udl ? format_quantity(l.value, dims::line_load, units)
                                              : format_quantity(l.value, dims::line_load, units) + " to " +
                                                    format_quantity(l.value_end, dims::line_load, units);
            label_x = 0.5 * (x0 + x1);
            break;
        }
        }
        o << "<text x=\"" << num(label_x) << "\" y=\"" << num(y_beam - 62 - 14 * row) << "\" font-size=\"11\" "
          << "text-anchor=\"middle\" fill=\"#b03020\">" << esc(label) << "</text>\n";
        ++row;
    }
}

// The supporting member hatched, the joint's spring as a coil at the root.
void root(std::ostringstream& o, const beam& b, unit_system units)
{
    o << "<defs><pattern id=\"hatch\" patternUnits=\"userSpaceOnUse\" width=\"7\" height=\"7\" "
         "patternTransform=\"rotate(45)\"><line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"7\" stroke=\"#666\" "
         "stroke-width=\"1\"/></pattern></defs>\n";
    o << "<rect x=\"" << num(x_root - 40) << "\" y=\"40\" width=\"28\" height=\"170\" fill=\"url(#hatch)\" "
         "stroke=\"#333\" stroke-width=\"1.5\"/>\n";
    // The coil: a rotational spring between the support's face and the member.
    o << "<path d=\"M " << num(x_root - 12) << " " << num(y_beam) << " C " << num(x_root - 12) << " "
      << num(y_beam - 14) << " " << num(x_root + 8) << " " << num(y_beam - 14) << " " << num(x_root + 8) << " "
      << num(y_beam) << " C " << num(x_root + 8) << " " << num(y_beam + 10) << " " << num(x_root - 6) << " "
      << num(y_beam + 10) << " " << num(x_root - 6) << " " << num(y_beam) << "\" fill=\"none\" stroke=\"#1f4e9a\" "
      << "stroke-width=\"2\"/>\n";
    const auto stiff = [&](stiffness s) {
        return s.is_rigid() ? std::string("rigid") : format_quantity(s.value(), dims::rotational_stiffness, units);
    };
    const auto& r = b.start.range;
    const std::string range = r.min == r.max ? stiff(r.min) : stiff(r.min) + " .. " + stiff(r.max);
    o << "<text x=\"" << num(x_root - 40) << "\" y=\"232\" font-size=\"11\">root joint S = " << esc(range)
      << "</text>\n";
}

}  // namespace

std::string cantilever_elevation_svg(const beam& b, unit_system units)
{
    if (b.layout != beam_layout::cantilever) throw std::invalid_argument("the elevation sketch is of a cantilever");
    std::ostringstream o;
    o << "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"" << num(width) << "\" height=\"" << num(height)
      << "\" viewBox=\"0 0 " << num(width) << " " << num(height)
      << "\" font-family=\"'DejaVu Sans', Arial, sans-serif\">\n";
    o << "<title>" << esc("Beam " + b.id + ": cantilever, elevation") << "</title>\n";
    root(o, b, units);
    // The member, root to free tip.
    o << "<rect x=\"" << num(x_root) << "\" y=\"" << num(y_beam - 6) << "\" width=\"" << num(x_tip - x_root)
      << "\" height=\"12\" fill=\"#d8dde6\" stroke=\"#333\" stroke-width=\"1.5\"/>\n";
    o << "<text x=\"" << num(x_tip + 10) << "\" y=\"" << num(y_beam + 4) << "\" font-size=\"12\">free tip</text>\n";
    loads(o, b, units);
    // The length, dimensioned below.
    const double yd = y_beam + 40;
    o << "<line x1=\"" << num(x_root) << "\" y1=\"" << num(yd) << "\" x2=\"" << num(x_tip) << "\" y2=\"" << num(yd)
      << "\" stroke=\"#333\" stroke-width=\"1\"/>\n";
    for (double x : {x_root, x_tip})
        o << "<line x1=\"" << num(x) << "\" y1=\"" << num(yd - 6) << "\" x2=\"" << num(x) << "\" y2=\"" << num(yd + 6)
          << "\" stroke=\"#333\" stroke-width=\"1\"/>\n";
    o << "<text x=\"" << num(0.5 * (x_root + x_tip)) << "\" y=\"" << num(yd + 18)
      << "\" font-size=\"12\" text-anchor=\"middle\">L = "
      << esc(units == unit_system::us_customary ? format_number(b.span / 0.3048, 4) + " ft" : format_number(b.span, 4) + " m")
      << " (" << esc(b.sec.name) << ")</text>\n";
    o << "</svg>\n";
    return o.str();
}

}  // namespace pinproof
