#include "pinproof/model/steel_grade.hpp"

#include <array>
#include <cstdio>
#include <stdexcept>

namespace pinproof {

namespace {

constexpr double MPa = 1e6;
constexpr double ksi = 6.894757293168361e6;  // 1000 lbf/in^2 in Pa (exact by definition of lbf and in)

const std::vector<std::string> names = {"S235", "S275", "S355", "S460", "A36", "A572-50", "A992"};

// EN 10025-2:2019 Table 7, minimum yield strength by nominal thickness (header).
constexpr std::array<double, 6> thickness_steps{16e-3, 40e-3, 63e-3, 80e-3, 100e-3, 150e-3};
constexpr std::array<std::array<double, 6>, 4> en_fy{{
    {235, 225, 215, 215, 215, 195},
    {275, 265, 255, 245, 235, 225},
    {355, 345, 335, 325, 315, 295},
    {460, 440, 430, 410, 400, 380},
}};
constexpr std::array<double, 4> en_fu{360, 410, 470, 540};  // 3 < t <= 100 mm, lower end of the range

int en_index(steel_grade g)
{
    switch (g) {
    case steel_grade::s235: return 0;
    case steel_grade::s275: return 1;
    case steel_grade::s355: return 2;
    case steel_grade::s460: return 3;
    default: return -1;
    }
}

std::size_t step_of(double t)
{
    if (!(t > 0)) throw std::invalid_argument("a steel thickness must be positive");
    for (std::size_t i = 0; i < thickness_steps.size(); ++i)
        if (t <= thickness_steps[i] * (1 + 1e-12)) return i;
    throw std::invalid_argument("a thickness above 150 mm is beyond the grade's table in EN 10025-2");
}

}  // namespace

std::string to_string(steel_grade g)
{
    if (g == steel_grade::user) return "user";
    return names.at(static_cast<std::size_t>(g));
}

std::optional<steel_grade> parse_steel_grade(std::string_view text)
{
    for (std::size_t i = 0; i < names.size(); ++i)
        if (text == names[i]) return static_cast<steel_grade>(i);
    return std::nullopt;
}

const std::vector<std::string>& steel_grade_names() { return names; }

bool is_us_grade(steel_grade g)
{
    return g == steel_grade::a36 || g == steel_grade::a572_50 || g == steel_grade::a992;
}

double steel_material::fy(double thickness) const
{
    if (const int i = en_index(grade); i >= 0) return en_fy[i][step_of(thickness)] * MPa;
    switch (grade) {
    case steel_grade::a36: return 36 * ksi;
    case steel_grade::a572_50:
    case steel_grade::a992: return 50 * ksi;
    default: return fy_given;
    }
}

std::optional<double> steel_material::fu(double thickness) const
{
    if (const int i = en_index(grade); i >= 0) {
        if (thickness > 100e-3 * (1 + 1e-12))
            throw std::invalid_argument("a thickness above 100 mm is beyond the tensile strengths of EN 10025-2");
        step_of(thickness);
        return en_fu[i] * MPa;
    }
    switch (grade) {
    case steel_grade::a36: return 58 * ksi;
    case steel_grade::a572_50:
    case steel_grade::a992: return 65 * ksi;
    default: return fu_given > 0 ? std::optional<double>(fu_given) : std::nullopt;
    }
}

std::string steel_material::name() const
{
    if (grade != steel_grade::user) return to_string(grade);
    char buf[64];
    std::snprintf(buf, sizeof buf, "fy = %.0f MPa (given)", fy_given / MPa);
    return buf;
}

}  // namespace pinproof
