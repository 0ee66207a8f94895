#include "pinproof/model/joint_behaviour.hpp"

namespace pinproof {

std::string to_string(joint_law_kind k)
{
    switch (k) {
    case joint_law_kind::linear: return "linear";
    case joint_law_kind::ec3_curve: return "ec3-curve";
    case joint_law_kind::ec3_eta: return "ec3-eta";
    case joint_law_kind::power: return "power";
    case joint_law_kind::richard_abbott: return "richard-abbott";
    case joint_law_kind::multilinear: return "multilinear";
    }
    return "linear";
}

const std::vector<std::string>& joint_law_names()
{
    static const std::vector<std::string> names{"linear", "ec3-curve", "ec3-eta", "power", "richard-abbott",
                                                "multilinear"};
    return names;
}

std::optional<joint_law_kind> parse_joint_law_kind(std::string_view text)
{
    for (auto k : {joint_law_kind::linear, joint_law_kind::ec3_curve, joint_law_kind::ec3_eta, joint_law_kind::power,
                   joint_law_kind::richard_abbott, joint_law_kind::multilinear})
        if (text == to_string(k)) return k;
    return std::nullopt;
}

std::string to_string(ec3_joint_type t)
{
    switch (t) {
    case ec3_joint_type::welded: return "welded";
    case ec3_joint_type::bolted_end_plate: return "bolted-end-plate";
    case ec3_joint_type::bolted_flange_cleats: return "bolted-flange-cleats";
    }
    return "welded";
}

std::string to_string(ec3_joint_location l)
{
    return l == ec3_joint_location::beam_to_column ? "beam-to-column" : "beam-to-beam";
}

std::optional<ec3_joint_type> parse_ec3_joint_type(std::string_view text)
{
    for (auto t : {ec3_joint_type::welded, ec3_joint_type::bolted_end_plate, ec3_joint_type::bolted_flange_cleats})
        if (text == to_string(t)) return t;
    return std::nullopt;
}

std::optional<ec3_joint_location> parse_ec3_joint_location(std::string_view text)
{
    for (auto l : {ec3_joint_location::beam_to_column, ec3_joint_location::beam_to_beam})
        if (text == to_string(l)) return l;
    return std::nullopt;
}

double ec3_psi(ec3_joint_type t) { return t == ec3_joint_type::bolted_flange_cleats ? 3.1 : 2.7; }

double ec3_eta(ec3_joint_type t, ec3_joint_location l)
{
    if (l == ec3_joint_location::beam_to_column) return 2.0;
    return t == ec3_joint_type::bolted_flange_cleats ? 3.5 : 3.0;
}

}  // namespace pinproof
