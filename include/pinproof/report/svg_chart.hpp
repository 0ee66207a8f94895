// A small self-contained SVG line-chart writer: linear or log axes with
// 1-2-5 tick numbers, axis labels with units, lines or marked points, a legend outside the plot area,
// vertical marker lines whose labels are staggered so that they never
// overlap, and shaded x-ranges. Text is escaped; non-finite points are an
// internal_error, never drawn.
#pragma once

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace pinproof {

// The project's colours, chosen by meaning: ideal bounds in neutral tones,
// the stiffness range as one blue hue (darker for the upper bound), the two
// standards' boundaries in two colours of their own, red only for a failure.
namespace chart_colour {
inline constexpr const char* pinned = "#6b7178";      // neutral slate, dashed
inline constexpr const char* fixed = "#a3a8ad";       // lighter neutral, dashed
inline constexpr const char* range_lower = "#6c9bd2"; // the stiffness range, lower bound
inline constexpr const char* range_upper = "#1d4e89"; // the stiffness range, upper bound
inline constexpr const char* range_band = "#6c9bd2";  // the range as a band
inline constexpr const char* other_band = "#8fb996";  // a second joint's range
inline constexpr const char* beam_line = "#2b2f33";   // the beam line
inline constexpr const char* en = "#6a3d9a";          // EN 1993-1-8 boundaries
inline constexpr const char* aisc = "#b15928";        // AISC 360 boundaries
inline constexpr const char* failure = "#c0392b";     // a failure, nothing else
}  // namespace chart_colour

struct chart_series {
    std::string label;
    std::vector<std::pair<double, double>> points;  // (x, y); x ascending
    std::string colour;    // any SVG colour; empty: from the default palette
    bool dashed = false;
    bool marks_only = false;  // each point drawn as a diamond, the points not joined
};

struct chart_marker {
    double x = 0;
    std::string label;
    std::string colour = "#555555";
    bool dashed = true;
};

struct chart_band {
    double x0 = 0, x1 = 0;
    std::string label;
    std::string colour = "#4a90d9";
    double opacity = 0.15;
};

struct chart_axis {
    std::string label;  // with its unit, e.g. "S*L/EI (-)"
    bool log = false;
    std::optional<double> min, max;  // default: the data range (padded for a linear axis)
};

struct line_chart {
    std::string title;
    chart_axis x, y;
    std::vector<chart_series> series;
    std::vector<chart_marker> markers;
    std::vector<chart_band> bands;
    double width = 960, height = 600;  // px, the whole picture
    // Prefix of the ids in the drawing, so that charts sharing one document
    // never share a clip path.
    std::string id_prefix;
};

// Tick values covering [lo, hi]: multiples of 1, 2 or 5 times a power of ten
// (linear), or powers of ten (log, with 2 and 5 between when the range is
// under three decades). lo < hi, both > 0 for a log axis.
std::vector<double> nice_ticks(double lo, double hi, bool log);

// A tick label: "0.01", "2", "1000", "1e+06" (compact, no trailing zeros).
std::string tick_label(double v);

std::string to_svg(const line_chart& chart);

// Charts one below the other in one SVG document, as wide as the widest.
std::string to_svg(const std::vector<line_chart>& charts);

}  // namespace pinproof
