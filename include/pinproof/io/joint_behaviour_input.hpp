// Reading a joint's "behaviour" object (its moment-rotation law, docs/file-format.md
// and docs/method/joint-laws.md) and a beam's "steel".
#pragma once

#include <nlohmann/json_fwd.hpp>

#include <optional>
#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/model/design_standard.hpp"
#include "pinproof/model/joint.hpp"
#include "pinproof/model/joint_behaviour.hpp"
#include "pinproof/model/steel_grade.hpp"

namespace pinproof {

// Each standard in its own terms: the ec3-curve and ec3-eta laws are refused
// in an AISC 360 project. Every problem is added with its JSON pointer;
// nullopt if any was found.
std::optional<joint_behaviour> read_joint_behaviour(const nlohmann::json& value, const std::string& pointer,
                                                    design_standard standard, problem_list& problems,
                                                    unit_system* system = nullptr);

// The law and the rest of the joint must agree: a law that needs the moment
// resistance has one, the stiffness range is finite and, where the law needs
// it, above zero (a Richard-Abbott plastic stiffness below it). `ptr` is the
// joint's pointer; problems are added under it.
void check_behaviour_fits(const joint& j, const std::string& ptr, problem_list& problems, unit_system system);

// A beam's "steel": a grade name ("S275", "A992", ...; EN grades in an EN
// project, ASTM grades in an AISC project) or {"fy": ..., "fu": ...}.
std::optional<steel_material> read_steel(const nlohmann::json& value, const std::string& pointer,
                                         design_standard standard, problem_list& problems,
                                         unit_system* system = nullptr);

}  // namespace pinproof
