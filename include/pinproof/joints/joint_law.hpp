// Moment-rotation laws of beam-end joints: the moment M a joint carries at a
// rotation theta, for a joint that is not a linear spring.
//
// Every law is odd (M(-theta) = -M(theta): hogging and sagging alike), starts
// after an optional free slip (bolts taking up their hole clearance carry no
// moment), and is capped at the joint's design moment resistance M_j,Rd where
// one is given: past the cap the joint rotates at constant moment, an
// elastic-plastic joint. Sources (reference pack sections 2 and 4):
//   linear          M = S_j,ini theta
//   ec3-curve       EN 1993-1-8 6.3.1(4)-(6): S_j = S_j,ini / mu with
//                   mu = 1 for M <= 2/3 M_j,Rd and mu = (1.5 M / M_j,Rd)^psi
//                   above, up to M_j,Rd; psi by Table 6.8
//   ec3-eta         EN 1993-1-8 5.1.2(4): S_j,ini / eta at every level, eta by
//                   Table 5.2
//   power           Kishi and Chen (1990), three-parameter power model:
//                   M = R_ki theta / [1 + (theta/theta_0)^n]^(1/n), theta_0 = M_u / R_ki
//   richard-abbott  Richard and Abbott (1975), four-parameter model:
//                   M = (k - k_p) theta / [1 + |(k - k_p) theta / M_0|^n]^(1/n) + k_p theta
//   multilinear     a measured or published curve through the origin, monotone,
//                   its last segment extended flat
// Units: SI (rad, N*m, N*m/rad).
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "pinproof/model/joint_behaviour.hpp"

namespace pinproof {

struct law_point {
    double rotation = 0;  // rad, measured after the free slip
    double moment = 0;    // N*m
};

class joint_law {
public:
    // Each factory throws std::invalid_argument for a parameter out of its
    // domain (the input reader reports these with the field's pointer first).
    static joint_law linear(double initial_stiffness, std::optional<double> moment_resistance = {});
    static joint_law ec3_curve(double initial_stiffness, double moment_resistance, double psi);
    static joint_law ec3_eta(double initial_stiffness, double eta, std::optional<double> moment_resistance = {});
    static joint_law power(double initial_stiffness, double ultimate_moment, double shape,
                           std::optional<double> moment_resistance = {});
    static joint_law richard_abbott(double initial_stiffness, double reference_moment, double plastic_stiffness,
                                    double shape, std::optional<double> moment_resistance = {});
    // Points with strictly increasing rotation > 0 and non-decreasing moment >= 0;
    // the origin is implied. slip >= 0 is the free rotation before the curve starts.
    static joint_law multilinear(std::vector<law_point> points, double slip = 0,
                                 std::optional<double> moment_resistance = {});

    joint_law_kind kind() const noexcept { return kind_; }
    // S_j,ini: the slope at the start of the curve (after the slip). For
    // ec3-eta the law's own slope is S_j,ini / eta at every level.
    double initial_stiffness() const noexcept { return k_; }
    std::optional<double> moment_resistance() const noexcept { return cap_; }
    double free_slip() const noexcept { return slip_; }
    // The parameters as named in the project file, in SI, for the result file.
    std::vector<std::pair<std::string, double>> parameters() const;

    double moment(double rotation) const;
    // dM/dtheta; at a kink the slope of the side away from zero (the loading side).
    double tangent(double rotation) const;
    // M / theta; the initial stiffness at theta = 0 (0 within the slip).
    double secant(double rotation) const;
    // The rotation at which the law reaches its cap (nullopt without a cap or
    // where it never reaches it).
    std::optional<double> rotation_at_cap() const;

    // The same law with its rotation axis stretched so that its initial
    // stiffness is s (the moments, the cap and the slip kept): how a law
    // follows S_j,ini over a stiffness range.
    joint_law with_initial_stiffness(double s) const;
    // The same law capped at min(its cap, cap).
    joint_law capped_at(double cap) const;

    // The law a project file's joint declares, at initial stiffness S_j,ini
    // (for multilinear, the curve's own) and with its moment resistance.
    static joint_law from(const joint_behaviour& b, double initial_stiffness, std::optional<double> moment_resistance);

private:
    joint_law() = default;
    // Magnitude of the moment for a rotation magnitude a >= 0 measured after
    // the slip, before the cap, and its slope.
    double uncapped(double a) const;
    double uncapped_slope(double a) const;

    joint_law_kind kind_ = joint_law_kind::linear;
    double k_ = 0;                // initial stiffness
    double a_ = 0, b_ = 0, c_ = 0;  // law parameters (see the factories)
    double ec3_log_term_ = 0;       // ec3-curve: psi ln(M_j,Rd / 1.5), formed once (uncapped evaluates it often)
    double slip_ = 0;
    std::optional<double> cap_;
    std::vector<law_point> points_;  // multilinear, with the origin first
};

}  // namespace pinproof
