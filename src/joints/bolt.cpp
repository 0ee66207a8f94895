#include "pinproof/joints/bolt.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace pinproof {
namespace {

constexpr double MPa = 1e6;
constexpr double ksi = 6.894757293168361e6;  // 1000 lbf/in^2 in Pa (exact by definition of the pound and inch)
constexpr double pi = 3.14159265358979323846;

}  // namespace

std::string to_string(bolt_grade g)
{
    switch (g) {
    case bolt_grade::g4_6: return "4.6";
    case bolt_grade::g8_8: return "8.8";
    case bolt_grade::g10_9: return "10.9";
    case bolt_grade::a325: return "A325";
    case bolt_grade::a490: return "A490";
    }
    return "8.8";
}

const std::vector<std::string>& bolt_grade_names()
{
    static const std::vector<std::string> names{"4.6", "8.8", "10.9", "A325", "A490"};
    return names;
}

std::optional<bolt_grade> parse_bolt_grade(std::string_view text)
{
    for (auto g : {bolt_grade::g4_6, bolt_grade::g8_8, bolt_grade::g10_9, bolt_grade::a325, bolt_grade::a490})
        if (text == to_string(g)) return g;
    return std::nullopt;
}

bool is_us_grade(bolt_grade g) { return g == bolt_grade::a325 || g == bolt_grade::a490; }

double bolt_fub(bolt_grade g)
{
    switch (g) {
    case bolt_grade::g4_6: return 400 * MPa;
    case bolt_grade::g8_8: return 800 * MPa;
    case bolt_grade::g10_9: return 1000 * MPa;
    case bolt_grade::a325: return 120 * ksi;
    case bolt_grade::a490: return 150 * ksi;
    }
    return 0;
}

double bolt_fyb(bolt_grade g)
{
    switch (g) {
    case bolt_grade::g4_6: return 240 * MPa;
    case bolt_grade::g8_8: return 640 * MPa;
    case bolt_grade::g10_9: return 900 * MPa;
    case bolt_grade::a325: return 92 * ksi;   // from memory
    case bolt_grade::a490: return 130 * ksi;  // from memory
    }
    return 0;
}

std::optional<double> metric_stress_area(double diameter)
{
    struct row {
        double d_mm, As_mm2;
    };
    static constexpr row table[] = {{12, 84.3}, {16, 157}, {20, 245}, {22, 303}, {24, 353}, {27, 459}, {30, 561}};
    for (const row& r : table)
        if (std::abs(diameter * 1e3 - r.d_mm) < 1e-6) return r.As_mm2 * 1e-6;
    return std::nullopt;
}

double shank_area(double diameter) { return pi * diameter * diameter / 4; }

double en_bolt_shear_resistance(bolt_grade g, double diameter, bool threads_in_shear_plane, double gamma_M2)
{
    if (is_us_grade(g)) throw std::invalid_argument("EN 1993-1-8 Table 3.4 applies to the EN bolt classes");
    double area = shank_area(diameter);
    double alpha_v = 0.6;
    if (threads_in_shear_plane) {
        const auto As = metric_stress_area(diameter);
        if (!As) throw std::invalid_argument("no tensile stress area for this bolt diameter");
        area = *As;
        if (g == bolt_grade::g10_9) alpha_v = 0.5;
    }
    return alpha_v * bolt_fub(g) * area / gamma_M2;
}

bearing_factors en_bearing_factors(const bearing_geometry& g, double diameter, double fub, double fu)
{
    if (!g.e1 && !g.p1) throw std::invalid_argument("bearing needs the end distance e1 or the pitch p1");
    if (!g.e2 && !g.p2) throw std::invalid_argument("bearing needs the edge distance e2 or the pitch p2");
    const double d0 = g.hole;
    double alpha_d = 1e300;
    if (g.e1) alpha_d = std::min(alpha_d, *g.e1 / (3 * d0));
    if (g.p1) alpha_d = std::min(alpha_d, *g.p1 / (3 * d0) - 0.25);
    double k1 = 2.5;
    if (g.e2) k1 = std::min(k1, 2.8 * *g.e2 / d0 - 1.7);
    if (g.p2) k1 = std::min(k1, 1.4 * *g.p2 / d0 - 1.7);
    (void)diameter;
    return {std::max(0.0, std::min({alpha_d, fub / fu, 1.0})), std::max(0.0, k1)};
}

double en_bolt_bearing_resistance(const bearing_geometry& g, double diameter, double fub, double fu, double thickness,
                                  double gamma_M2)
{
    const bearing_factors f = en_bearing_factors(g, diameter, fub, fu);
    return f.k1 * f.alpha_b * fu * diameter * thickness / gamma_M2;
}

double aisc_bolt_shear_strength(bolt_grade g, double diameter, bool threads_in_shear_plane)
{
    if (!is_us_grade(g)) throw std::invalid_argument("AISC 360 Table J3.2 applies to the ASTM bolt grades");
    // Table J3.2: Group A (A325) N 54 / X 68 ksi, Group B (A490) N 68 / X 84 ksi.
    const double Fnv = g == bolt_grade::a325 ? (threads_in_shear_plane ? 54 : 68) : (threads_in_shear_plane ? 68 : 84);
    return 0.75 * Fnv * ksi * shank_area(diameter);
}

double aisc_bolt_bearing_strength(double diameter, double clear_distance, double thickness, double Fu)
{
    // J3.10(a)(i): tear-out 1.2 l_c t F_u, bearing 2.4 d t F_u; phi = 0.75.
    return 0.75 * std::min(1.2 * clear_distance * thickness * Fu, 2.4 * diameter * thickness * Fu);
}

}  // namespace pinproof
