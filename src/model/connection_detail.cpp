#include "pinproof/model/connection_detail.hpp"

#include <cmath>

#include <string>
#include <vector>

namespace pinproof {

namespace {
const std::vector<std::string> type_names = {"fin-plate", "web-cleats", "end-plate", "custom"};
const std::vector<std::string> support_names = {"column-flange", "column-web", "beam-web"};
}  // namespace

std::string to_string(detail_type t) { return type_names.at(static_cast<std::size_t>(t)); }

std::optional<detail_type> parse_detail_type(std::string_view text)
{
    for (std::size_t i = 0; i < type_names.size(); ++i)
        if (text == type_names[i]) return static_cast<detail_type>(i);
    return std::nullopt;
}

const std::vector<std::string>& detail_type_names() { return type_names; }

std::string to_string(support_type t) { return support_names.at(static_cast<std::size_t>(t)); }

std::optional<support_type> parse_support_type(std::string_view text)
{
    for (std::size_t i = 0; i < support_names.size(); ++i)
        if (text == support_names[i]) return static_cast<support_type>(i);
    return std::nullopt;
}

const std::vector<std::string>& support_type_names() { return support_names; }

std::string to_string(plate_grade g)
{
    switch (g) {
    case plate_grade::s275: return "S275";
    case plate_grade::s355: return "S355";
    case plate_grade::a36: return "A36";
    case plate_grade::a572_50: return "A572-50";
    }
    return "S275";
}

// Equal-leg fillet: throat a = leg / sqrt 2 (EN 1993-1-8 4.5.2, AISC 360-16 J2.2a).
double fillet_weld::throat() const { return leg ? size / std::sqrt(2.0) : size; }
double fillet_weld::leg_length() const { return leg ? size : size * std::sqrt(2.0); }

namespace {
constexpr double inch = 0.0254;
}  // namespace

double minimum_edge_distance(const bolt_layout& b, design_standard s)
{
    if (s == design_standard::en1993_1_8) return 1.2 * b.hole_diameter;
    // AISC 360-16 Table J3.4, in sixteenths of an inch: {bolt, edge}.
    static const double rows[][2] = {{8, 12}, {10, 14}, {12, 16}, {14, 18}, {16, 20}, {18, 24}, {20, 26}};
    const double d16 = b.diameter / inch * 16;
    for (const auto& r : rows)
        if (d16 <= r[0] + 1e-6) return r[1] / 16 * inch;
    return 1.25 * b.diameter;
}

std::string minimum_edge_distance_rule(design_standard s)
{
    return s == design_standard::en1993_1_8
               ? "EN 1993-1-8 Table 3.3: end and edge distances e1, e2 of at least 1.2 d0"
               : "AISC 360-16 J3.4, Table J3.4: the minimum edge distance for the bolt diameter";
}

double maximum_fillet_leg(double plate_thickness, design_standard s)
{
    if (s == design_standard::en1993_1_8) return plate_thickness;
    return plate_thickness < 0.25 * inch - 1e-9 ? plate_thickness : plate_thickness - inch / 16;
}

std::string maximum_fillet_leg_rule(design_standard s)
{
    return s == design_standard::en1993_1_8
               ? "a fillet leg no larger than the thickness of the plate it joins (common practice, no source)"
               : "AISC 360-16 J2.2b: a fillet along a plate at most t below 1/4 in thick, else t - 1/16 in";
}

}  // namespace pinproof

namespace pinproof {

double default_end_plate_gauge() { return 90e-3; }
double default_end_plate_width(double gauge) { return gauge + 60e-3; }

}  // namespace pinproof
