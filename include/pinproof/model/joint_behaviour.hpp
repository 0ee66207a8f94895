// How a joint behaves beyond a linear spring, as a project file gives it: its
// moment-rotation law and the law's parameters, in SI. The laws themselves
// are in joints/joint_law.hpp; docs/method/joint-laws.md gives their sources.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace pinproof {

enum class joint_law_kind { linear, ec3_curve, ec3_eta, power, richard_abbott, multilinear };
std::string to_string(joint_law_kind k);  // "linear", "ec3-curve", "ec3-eta", "power", "richard-abbott", "multilinear"
std::optional<joint_law_kind> parse_joint_law_kind(std::string_view text);
const std::vector<std::string>& joint_law_names();

// The connection types of EN 1993-1-8 Tables 5.2 and 6.8.
enum class ec3_joint_type { welded, bolted_end_plate, bolted_flange_cleats };
enum class ec3_joint_location { beam_to_column, beam_to_beam };
std::string to_string(ec3_joint_type t);      // "welded", "bolted-end-plate", "bolted-flange-cleats"
std::string to_string(ec3_joint_location l);  // "beam-to-column", "beam-to-beam"
std::optional<ec3_joint_type> parse_ec3_joint_type(std::string_view text);
std::optional<ec3_joint_location> parse_ec3_joint_location(std::string_view text);

// EN 1993-1-8 Table 6.8: psi = 2.7 welded, 2.7 bolted end plate, 3.1 bolted
// angle flange cleats.
double ec3_psi(ec3_joint_type t);
// EN 1993-1-8 Table 5.2 (from memory): eta = 2 for every beam-to-column type;
// beam-to-beam (other joints) 3 welded or end plate, 3.5 flange cleats.
double ec3_eta(ec3_joint_type t, ec3_joint_location l);

struct joint_behaviour {
    joint_law_kind law = joint_law_kind::linear;
    double psi = 0;  // ec3-curve (given, or by Table 6.8 from joint_type)
    double eta = 0;  // ec3-eta (given, or by Table 5.2 from joint_type and joint_location)
    bool psi_from_table = false, eta_from_table = false;
    std::optional<ec3_joint_type> joint_type;
    std::optional<ec3_joint_location> joint_location;
    double ultimate_moment = 0;   // N*m, power
    double reference_moment = 0;  // N*m, richard-abbott
    double plastic_stiffness = 0; // N*m/rad, richard-abbott
    double shape = 0;             // n, power and richard-abbott
    std::vector<std::pair<double, double>> points;  // multilinear (rotation rad, moment N*m), after the slip
    double slip = 0;              // rad, multilinear
};

}  // namespace pinproof
