#include "pinproof/report/svg_chart.hpp"

#include "report/svg_number.hpp"

#include "pinproof/report/xml_text.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <sstream>
#include <string>
#include <tuple>
#include <vector>

#include "pinproof/core/errors.hpp"

namespace pinproof {

namespace {

// Series without a colour of their own take these in turn: the project's
// own sequence of distinct hues (no red: red marks failures).
const char* const palette[] = {"#1d4e89", "#6a3d9a", "#2e7d6b", "#b15928", "#4a4a8a",
                               "#8c6d1f", "#7a3b5e", "#3d6e8c", "#5b6b2f", "#2b2f33"};

constexpr double font = 12;          // px, tick and legend text
constexpr double char_width = 6.6;   // px, a generous estimate of one character at `font`
constexpr double row_height = 15;    // px, one row of marker labels

double text_width(const std::string& s) { return char_width * static_cast<double>(s.size()); }

std::string escape(const std::string& s) { return xml_text(s); }

std::string num(double v) { return svg_number(v, 2); }

// A closed diamond path of half-width 5 px centred on (x, y), in pixels, so
// that it keeps its shape whatever the axis scales.
std::string diamond(double x, double y)
{
    constexpr double h = 5;
    return "M" + num(x - h) + " " + num(y) + " L" + num(x) + " " + num(y - h) + " L" + num(x + h) + " " + num(y) +
           " L" + num(x) + " " + num(y + h) + " Z";
}

struct axis_map {
    double lo, hi, p0, p1;  // data range -> pixel range
    bool log;
    double operator()(double v) const
    {
        const double t = log ? (std::log10(v) - std::log10(lo)) / (std::log10(hi) - std::log10(lo)) : (v - lo) / (hi - lo);
        return p0 + t * (p1 - p0);
    }
};

void check_finite(double v)
{
    if (!std::isfinite(v)) throw internal_error("a chart value is not finite");
}

// The axis range: given bounds, else the data range (linear axes padded to ticks).
std::pair<double, double> axis_range(const chart_axis& a, const std::vector<double>& data)
{
    double lo = a.min.value_or(0), hi = a.max.value_or(1);
    std::vector<double> d;
    for (double v : data)
        if (!a.log || v > 0) d.push_back(v);
    if (!d.empty()) {
        if (!a.min) lo = *std::min_element(d.begin(), d.end());
        if (!a.max) hi = *std::max_element(d.begin(), d.end());
    } else if (a.log) {
        if (!a.min) lo = 1;
        if (!a.max) hi = 10;
    }
    if (a.log) {
        if (!(lo > 0)) lo = hi > 0 ? hi / 10 : 1;
        if (!(hi > lo)) hi = lo * 10;
        return {lo, hi};
    }
    if (!(hi > lo)) {
        const double pad = lo == 0 ? 1 : std::abs(lo) * 0.1;
        lo -= pad;
        hi += pad;
    }
    if (!a.min || !a.max) {
        const auto t = nice_ticks(lo, hi, false);
        const double step = t.size() > 1 ? t[1] - t[0] : (hi - lo);
        if (!a.min) lo = std::floor(lo / step + 1e-9) * step;
        if (!a.max) hi = std::ceil(hi / step - 1e-9) * step;
    }
    return {lo, hi};
}

}  // namespace

std::vector<double> nice_ticks(double lo, double hi, bool log)
{
    std::vector<double> out;
    if (!(std::isfinite(lo) && std::isfinite(hi) && hi > lo)) return out;
    if (log) {
        if (!(lo > 0)) return out;
        const int d0 = static_cast<int>(std::floor(std::log10(lo) + 1e-9));
        const int d1 = static_cast<int>(std::ceil(std::log10(hi) - 1e-9));
        const bool fine = (std::log10(hi) - std::log10(lo)) < 3;
        for (int d = d0; d <= d1; ++d)
            for (double m : {1.0, 2.0, 5.0}) {
                if (m != 1.0 && !fine) continue;
                const double v = m * std::pow(10.0, d);
                if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) out.push_back(v);
            }
        return out;
    }
    const double raw = (hi - lo) / 6;
    const double mag = std::pow(10.0, std::floor(std::log10(raw)));
    double step = mag;
    for (double m : {1.0, 2.0, 5.0, 10.0})
        if (m * mag >= raw) {
            step = m * mag;
            break;
        }
    for (double v = std::ceil(lo / step - 1e-9) * step; v <= hi + step * 1e-9; v += step)
        out.push_back(std::abs(v) < step * 1e-9 ? 0.0 : v);
    return out;
}

std::string tick_label(double v)
{
    char b[32];
    if (v != 0 && (std::abs(v) >= 1e5 || std::abs(v) < 1e-3)) std::snprintf(b, sizeof b, "%.3g", v);
    else std::snprintf(b, sizeof b, "%.6g", v);
    return b;
}
namespace {

// A marker label placed in its row above the plot.
struct placed {
    const chart_marker* m;
    double px;
    int row;
};

// One chart being drawn: the axis ranges and the plot area in pixels, worked
// out first, then each part of the picture written in the order it is drawn.
class chart_drawing {
public:
    explicit chart_drawing(const line_chart& chart) : c(chart) {}
    std::string write();

private:
    void axis_ranges();
    void legend_width();
    void horizontal_layout();
    void place_marker_labels();
    void vertical_layout();
    void open_document();
    void bands();
    void grid_and_axes();
    void markers();
    void series();
    void legend();

    const line_chart& c;
    double x_lo = 0, x_hi = 0, y_lo = 0, y_hi = 0;  // data ranges of the axes
    double legend_w = 0;                             // px, and below
    double left = 0, bottom = 0, right = 0, title_h = 0, plot_w = 0;
    axis_map X{};
    std::vector<placed> labels;
    std::vector<double> row_right;
    double labels_h = 0, top = 0, height = 0, plot_h = 0;
    axis_map Y{};
    std::ostringstream o;
    std::vector<std::string> colours;
};

std::string chart_drawing::write()
{
    axis_ranges();
    legend_width();
    horizontal_layout();
    place_marker_labels();
    vertical_layout();
    open_document();
    bands();
    grid_and_axes();
    markers();
    series();
    legend();
    o << "</svg>\n";
    return o.str();
}

// Every value finite, then the range of each axis.
void chart_drawing::axis_ranges()
{
    std::vector<double> xs, ys;
    for (const auto& s : c.series)
        for (const auto& [x, y] : s.points) {
            check_finite(x);
            check_finite(y);
            xs.push_back(x);
            ys.push_back(y);
        }
    for (const auto& m : c.markers) check_finite(m.x);
    for (const auto& b : c.bands) {
        check_finite(b.x0);
        check_finite(b.x1);
    }
    std::tie(x_lo, x_hi) = axis_range(c.x, xs);
    std::tie(y_lo, y_hi) = axis_range(c.y, ys);
}

// Legend: to the right of the plot area.
void chart_drawing::legend_width()
{
    std::vector<std::string> legend_labels;
    for (const auto& s : c.series) legend_labels.push_back(s.label);
    for (const auto& b : c.bands)
        if (!b.label.empty()) legend_labels.push_back(b.label);
    for (const auto& l : legend_labels) legend_w = std::max(legend_w, text_width(l));
    legend_w = legend_labels.empty() ? 0 : legend_w + 50;
}

void chart_drawing::horizontal_layout()
{
    left = 78, bottom = 62, right = 20 + legend_w;
    title_h = c.title.empty() ? 12 : 34;
    plot_w = std::max(120.0, c.width - left - right);
    X = axis_map{x_lo, x_hi, left, left + plot_w, c.x.log};
}

// Marker labels in rows above the plot, each in the first row where it
// clears its neighbours, so that no two labels overlap.
void chart_drawing::place_marker_labels()
{
    for (const auto& m : c.markers) {
        if (c.x.log && !(m.x > 0)) continue;
        if (m.x < x_lo || m.x > x_hi) continue;
        labels.push_back({&m, X(m.x), 0});
    }
    std::sort(labels.begin(), labels.end(), [](const placed& a, const placed& b) { return a.px < b.px; });
    for (auto& l : labels) {
        const double w = text_width(l.m->label);
        double x0 = l.px - w / 2;
        x0 = std::clamp(x0, 2.0, c.width - w - 2);
        int row = 0;
        while (row < static_cast<int>(row_right.size()) && row_right[row] + 6 > x0) ++row;
        if (row == static_cast<int>(row_right.size())) row_right.push_back(0);
        row_right[row] = x0 + w;
        l.row = row;
    }
}

void chart_drawing::vertical_layout()
{
    labels_h = row_right.size() * row_height + (row_right.empty() ? 0 : 8);
    top = title_h + labels_h + 6;
    height = std::max(c.height, top + bottom + 200);
    plot_h = height - top - bottom;
    Y = axis_map{y_lo, y_hi, top + plot_h, top, c.y.log};
}

void chart_drawing::open_document()
{
    o << "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"" << num(c.width) << "\" height=\"" << num(height)
      << "\" viewBox=\"0 0 " << num(c.width) << " " << num(height) << "\" font-family=\"sans-serif\" font-size=\""
      << font << "\">\n";
    o << "<rect x=\"0\" y=\"0\" width=\"" << num(c.width) << "\" height=\"" << num(height) << "\" fill=\"white\"/>\n";
    o << "<defs><clipPath id=\"" << c.id_prefix << "plot-area\"><rect x=\"" << num(left) << "\" y=\"" << num(top) << "\" width=\""
      << num(plot_w) << "\" height=\"" << num(plot_h) << "\"/></clipPath></defs>\n";
    if (!c.title.empty())
        o << "<text x=\"" << num(c.width / 2) << "\" y=\"22\" text-anchor=\"middle\" font-size=\"15\" font-weight=\"bold\">"
          << escape(c.title) << "</text>\n";
}

// Bands first, under everything.
void chart_drawing::bands()
{
    for (const auto& b : c.bands) {
        double a0 = std::clamp(std::min(b.x0, b.x1), x_lo, x_hi), a1 = std::clamp(std::max(b.x0, b.x1), x_lo, x_hi);
        if (c.x.log && !(a0 > 0)) a0 = x_lo;
        o << "<rect x=\"" << num(X(a0)) << "\" y=\"" << num(top) << "\" width=\"" << num(std::max(1.0, X(a1) - X(a0)))
          << "\" height=\"" << num(plot_h) << "\" fill=\"" << escape(b.colour) << "\" fill-opacity=\"" << b.opacity
          << "\"/>\n";
    }
}

// Grid and ticks, the frame of the plot and the axis labels.
void chart_drawing::grid_and_axes()
{
    for (double t : nice_ticks(x_lo, x_hi, c.x.log)) {
        const double px = X(t);
        o << "<line x1=\"" << num(px) << "\" y1=\"" << num(top) << "\" x2=\"" << num(px) << "\" y2=\""
          << num(top + plot_h) << "\" stroke=\"#e3e3e3\"/>\n";
        o << "<text x=\"" << num(px) << "\" y=\"" << num(top + plot_h + 17) << "\" text-anchor=\"middle\">"
          << escape(tick_label(t)) << "</text>\n";
    }
    for (double t : nice_ticks(y_lo, y_hi, c.y.log)) {
        const double py = Y(t);
        o << "<line x1=\"" << num(left) << "\" y1=\"" << num(py) << "\" x2=\"" << num(left + plot_w) << "\" y2=\""
          << num(py) << "\" stroke=\"#e3e3e3\"/>\n";
        o << "<text x=\"" << num(left - 6) << "\" y=\"" << num(py + 4) << "\" text-anchor=\"end\">"
          << escape(tick_label(t)) << "</text>\n";
    }
    o << "<rect x=\"" << num(left) << "\" y=\"" << num(top) << "\" width=\"" << num(plot_w) << "\" height=\""
      << num(plot_h) << "\" fill=\"none\" stroke=\"#333333\"/>\n";
    o << "<text x=\"" << num(left + plot_w / 2) << "\" y=\"" << num(top + plot_h + 44)
      << "\" text-anchor=\"middle\" font-size=\"13\">" << escape(c.x.label) << "</text>\n";
    o << "<text transform=\"translate(20 " << num(top + plot_h / 2) << ") rotate(-90)\" text-anchor=\"middle\" "
      << "font-size=\"13\">" << escape(c.y.label) << "</text>\n";
}

// Markers: a line through the plot and a leader up to its label row.
void chart_drawing::markers()
{
    for (const auto& l : labels) {
        const double ly = title_h + (l.row + 1) * row_height;
        o << "<line x1=\"" << num(l.px) << "\" y1=\"" << num(top) << "\" x2=\"" << num(l.px) << "\" y2=\""
          << num(top + plot_h) << "\" stroke=\"" << escape(l.m->colour) << "\" stroke-width=\"1.2\""
          << (l.m->dashed ? " stroke-dasharray=\"5 3\"" : "") << "/>\n";
        o << "<line x1=\"" << num(l.px) << "\" y1=\"" << num(ly + 3) << "\" x2=\"" << num(l.px) << "\" y2=\""
          << num(top) << "\" stroke=\"" << escape(l.m->colour) << "\" stroke-width=\"0.6\"/>\n";
    }
    // Labels after every leader, with a white halo, so no line crosses a label's text.
    for (const auto& l : labels) {
        const double w = text_width(l.m->label);
        const double x0 = std::clamp(l.px - w / 2, 2.0, c.width - w - 2);
        const double ly = title_h + (l.row + 1) * row_height;
        o << "<text x=\"" << num(x0 + w / 2) << "\" y=\"" << num(ly) << "\" text-anchor=\"middle\" fill=\""
          << escape(l.m->colour) << "\" font-size=\"11\" stroke=\"white\" stroke-width=\"4\" paint-order=\"stroke\">"
          << escape(l.m->label) << "</text>\n";
    }
}

// Series, clipped to the plot area.
void chart_drawing::series()
{
    o << "<g clip-path=\"url(#" << c.id_prefix << "plot-area)\" fill=\"none\" stroke-width=\"2\">\n";
    std::size_t colour_index = 0;
    for (const auto& s : c.series) {
        const std::string col = s.colour.empty() ? palette[colour_index++ % 10] : s.colour;
        colours.push_back(col);
        std::string d;
        for (const auto& [x, y] : s.points) {
            if ((c.x.log && !(x > 0)) || (c.y.log && !(y > 0))) continue;
            if (s.marks_only) {
                d += (d.empty() ? "" : " ") + diamond(X(x), Y(y));
                continue;
            }
            d += (d.empty() ? "M" : " L") + num(X(x)) + " " + num(Y(y));
        }
        if (d.empty()) continue;
        if (s.marks_only) {
            o << "<path d=\"" << d << "\" stroke=\"" << escape(col) << "\" fill=\"#ffffff\"/>\n";
            continue;
        }
        o << "<path d=\"" << d << "\" stroke=\"" << escape(col) << "\"" << (s.dashed ? " stroke-dasharray=\"7 4\"" : "")
          << "/>\n";
    }
    o << "</g>\n";
}

void chart_drawing::legend()
{
    double ly = top + 8;
    const double lx = left + plot_w + 18;
    for (std::size_t i = 0; i < c.series.size(); ++i) {
        ly += 18;
        if (c.series[i].marks_only)
            o << "<path d=\"" << diamond(lx + 15, ly - 4) << "\" stroke=\"" << escape(colours[i])
              << "\" stroke-width=\"2\" fill=\"#ffffff\"/>\n";
        else
            o << "<line x1=\"" << num(lx) << "\" y1=\"" << num(ly - 4) << "\" x2=\"" << num(lx + 30) << "\" y2=\""
              << num(ly - 4) << "\" stroke=\"" << escape(colours[i]) << "\" stroke-width=\"2\""
              << (c.series[i].dashed ? " stroke-dasharray=\"7 4\"" : "") << "/>\n";
        o << "<text x=\"" << num(lx + 38) << "\" y=\"" << num(ly) << "\">" << escape(c.series[i].label) << "</text>\n";
    }
    for (const auto& b : c.bands) {
        if (b.label.empty()) continue;
        ly += 18;
        o << "<rect x=\"" << num(lx) << "\" y=\"" << num(ly - 11) << "\" width=\"30\" height=\"12\" fill=\""
          << escape(b.colour) << "\" fill-opacity=\"" << std::max(b.opacity, 0.25) << "\"/>\n";
        o << "<text x=\"" << num(lx + 38) << "\" y=\"" << num(ly) << "\">" << escape(b.label) << "</text>\n";
    }
}

}  // namespace

std::string to_svg(const line_chart& c) { return chart_drawing(c).write(); }

std::string to_svg(const std::vector<line_chart>& charts)
{
    if (charts.empty()) throw internal_error("no chart to draw");
    // Each chart is drawn whole, then nested as an <svg> element at its offset
    // (SVG 1.1 7.9: a nested svg establishes its own viewport).
    const std::string root = "<svg xmlns=\"http://www.w3.org/2000/svg\" ";
    std::string body;
    double y = 0, width = 0;
    for (std::size_t i = 0; i < charts.size(); ++i) {
        line_chart c = charts[i];
        c.id_prefix = "c" + std::to_string(i) + "-";
        std::string one = chart_drawing(c).write();
        if (one.compare(0, root.size(), root) != 0) throw internal_error("a chart does not start with its svg element");
        const std::size_t h = one.find(" height=\"");
        const double height = std::strtod(one.c_str() + h + 9, nullptr);
        one.replace(0, root.size(), "<svg x=\"0\" y=\"" + num(y) + "\" ");
        body += one;
        y += height;
        width = std::max(width, c.width);
    }
    return root + "width=\"" + num(width) + "\" height=\"" + num(y) + "\" viewBox=\"0 0 " + num(width) + " " +
           num(y) + "\">\n" + body + "</svg>\n";
}

}  // namespace pinproof
