#include "pinproof/joints/bolt_group.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace pinproof {

std::vector<bolt_position> bolt_pattern(int rows, double pitch, int lines, double gauge)
{
    if (rows < 1 || lines < 1) throw std::invalid_argument("a bolt pattern needs at least one row and one line");
    std::vector<bolt_position> b;
    b.reserve(static_cast<std::size_t>(rows * lines));
    for (int l = 0; l < lines; ++l)
        for (int r = 0; r < rows; ++r) b.push_back({l * gauge, -r * pitch});
    return b;
}

bolt_group::bolt_group(std::vector<bolt_position> bolts) : bolts_(std::move(bolts))
{
    if (bolts_.empty()) throw std::invalid_argument("a bolt group needs at least one bolt");
    double cx = 0, cy = 0;
    for (const bolt_position& b : bolts_) {
        cx += b.x;
        cy += b.y;
    }
    cx /= static_cast<double>(bolts_.size());
    cy /= static_cast<double>(bolts_.size());
    for (bolt_position& b : bolts_) {
        b.x -= cx;
        b.y -= cy;
        const double r2 = b.x * b.x + b.y * b.y;
        polar_ += r2;
        r_max_ = std::max(r_max_, std::sqrt(r2));
    }
    if (!(polar_ > 0)) throw std::invalid_argument("the bolts of the group coincide: it carries no moment");
}

double bolt_group::largest_bolt_force(double V, double z) const
{
    // Bolt i carries V/n downward and, from the moment M = V z (clockwise),
    // M/sum(r^2) times r_i turned a quarter turn: (M y_i, -M x_i) / sum(r^2).
    const double n = static_cast<double>(bolts_.size()), M = V * z;
    double largest = 0;
    for (const bolt_position& b : bolts_) {
        const double fx = M * b.y / polar_, fy = -V / n - M * b.x / polar_;
        largest = std::max(largest, std::hypot(fx, fy));
    }
    return largest;
}

double bolt_group::shear_resistance(double F_Rd, double z) const
{
    // The largest bolt force is proportional to V.
    return F_Rd / largest_bolt_force(1.0, z);
}

double bolt_group::moment_resistance(double F_Rd) const { return F_Rd * polar_ / r_max_; }

double bolt_group::rotational_stiffness(double k) const { return k * polar_; }

double bolt_group::free_rotation(double clearance) const { return clearance / r_max_; }

double en_k11_bolt_shear(double diameter, double fub, double E)
{
    constexpr double d_M16 = 0.016;
    return 16 * diameter * diameter * fub / (E * d_M16);
}

double en_k12_bolt_bearing(double diameter, double fu, double thickness, double end_distance, double pitch, double E)
{
    constexpr double d_M16 = 0.016;
    const double kb1 = std::min(0.25 * end_distance / diameter + 0.5, 1.25);
    const double kb2 = std::min(0.25 * pitch / diameter + 0.375, 1.25);
    const double kt = std::min(1.5 * thickness / d_M16, 2.5);
    return 24 * std::min(kb1, kb2) * kt * diameter * fu / E;
}

}  // namespace pinproof
