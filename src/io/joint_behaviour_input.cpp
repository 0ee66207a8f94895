#include "pinproof/io/joint_behaviour_input.hpp"

#include <cmath>

#include "io/json_fields.hpp"

namespace pinproof {

using namespace json_fields;

namespace {

std::optional<double> bounded_number(const json& o, const std::string& ptr, const std::string& key, double lo,
                                     double hi, bool lo_open, const char* what, problem_list& problems)
{
    auto v = number_field(o, ptr, key, false, problems);
    if (!v) return std::nullopt;
    if (!(lo_open ? *v > lo : *v >= lo) || !(*v <= hi)) {
        problems.add(child(ptr, key), std::string("expected ") + what + ", found " + shown(o.at(key)));
        return std::nullopt;
    }
    return v;
}

std::optional<double> positive_quantity(const json& o, const std::string& ptr, const std::string& key, dimension d,
                                        bool allow_zero, problem_list& problems, unit_system* system)
{
    auto v = quantity_field(o, ptr, key, d, true, problems, system);
    if (!v) return std::nullopt;
    if (!(allow_zero ? *v >= 0 : *v > 0) || !(*v <= 1e12)) {
        problems.add(child(ptr, key), std::string("expected a ") + describe(d) + (allow_zero ? " of zero or more" : " above zero") +
                                          ", found " + shown(o.at(key)));
        return std::nullopt;
    }
    return v;
}

std::optional<ec3_joint_type> read_joint_type(const json& o, const std::string& ptr, problem_list& problems)
{
    auto t = choice_field(o, ptr, "joint_type", {"welded", "bolted-end-plate", "bolted-flange-cleats"}, false, problems);
    return t ? parse_ec3_joint_type(*t) : std::nullopt;
}

bool read_points(const json& o, const std::string& ptr, joint_behaviour& b, problem_list& problems,
                 unit_system* system)
{
    const std::string pp = child(ptr, "points");
    auto it = o.find("points");
    if (it == o.end()) {
        problems.add(pp, "missing required field \"points\" (an array of {\"rotation\", \"moment\"})");
        return false;
    }
    if (!it->is_array() || it->empty()) {
        problems.add(pp, "expected a non-empty array of points {\"rotation\": ..., \"moment\": ...}, found " +
                             shown(*it));
        return false;
    }
    bool ok = true;
    double last_rotation = 0, last_moment = 0;
    for (std::size_t i = 0; i < it->size(); ++i) {
        const json& p = (*it)[i];
        const std::string at = child(pp, i);
        if (!expect_object(p, at, problems)) {
            ok = false;
            continue;
        }
        reject_unknown_keys(p, at, {"rotation", "moment", "notes"}, problems);
        auto r = quantity_field(p, at, "rotation", dims::angle, true, problems, system);
        auto m = quantity_field(p, at, "moment", dims::moment, true, problems, system);
        if (!r || !m) {
            ok = false;
            continue;
        }
        if (!(*r > last_rotation) || *r > 1.0) {
            problems.add(child(at, "rotation"), "expected rotations rising from zero, each above the last and at "
                                                "most 1 rad, found " + shown(p.at("rotation")));
            ok = false;
        }
        if (!(*m >= last_moment) || *m > 1e12) {
            problems.add(child(at, "moment"), "expected moments that never fall (the curve is monotone), found " +
                                                  shown(p.at("moment")) + " after a larger moment");
            ok = false;
        }
        last_rotation = std::max(last_rotation, *r);
        last_moment = std::max(last_moment, *m);
        b.points.emplace_back(*r, *m);
    }
    if (ok && !(last_moment > 0)) {
        problems.add(pp, "expected a curve that carries some moment, found only zero moments");
        ok = false;
    }
    return ok;
}

}  // namespace

std::optional<joint_behaviour> read_joint_behaviour(const json& value, const std::string& pointer,
                                                    design_standard standard, problem_list& problems,
                                                    unit_system* system)
{
    if (!expect_object(value, pointer, problems)) return std::nullopt;
    const std::size_t before = problems.size();
    auto law = choice_field(value, pointer, "law", joint_law_names(), true, problems);
    if (!law) return std::nullopt;
    joint_behaviour b;
    b.law = *parse_joint_law_kind(*law);
    const bool en_law = b.law == joint_law_kind::ec3_curve || b.law == joint_law_kind::ec3_eta;
    if (en_law && standard != design_standard::en1993_1_8) {
        problems.add(child(pointer, "law"), "expected a law of this project's standard (AISC 360: linear, power, "
                                            "richard-abbott or multilinear), found \"" + *law +
                                                "\", a rule of EN 1993-1-8");
        return std::nullopt;
    }
    switch (b.law) {
    case joint_law_kind::linear: reject_unknown_keys(value, pointer, {"law", "notes"}, problems); break;
    case joint_law_kind::ec3_curve: {
        reject_unknown_keys(value, pointer, {"law", "psi", "joint_type", "notes"}, problems);
        auto psi = bounded_number(value, pointer, "psi", 0, 10, true, "psi above 0 and at most 10", problems);
        b.joint_type = read_joint_type(value, pointer, problems);
        if (psi) b.psi = *psi;
        else if (b.joint_type) {
            b.psi = ec3_psi(*b.joint_type);
            b.psi_from_table = true;
        } else if (!value.contains("psi")) {
            problems.add(child(pointer, "psi"), "missing \"psi\", or a \"joint_type\" (welded, bolted-end-plate, "
                                                "bolted-flange-cleats) to take it from EN 1993-1-8 Table 6.8");
        }
        break;
    }
    case joint_law_kind::ec3_eta: {
        reject_unknown_keys(value, pointer, {"law", "eta", "joint_type", "joint_location", "notes"}, problems);
        auto eta = bounded_number(value, pointer, "eta", 1, 10, false, "eta from 1 to 10", problems);
        b.joint_type = read_joint_type(value, pointer, problems);
        if (auto l = choice_field(value, pointer, "joint_location", {"beam-to-column", "beam-to-beam"}, false, problems))
            b.joint_location = parse_ec3_joint_location(*l);
        if (eta) b.eta = *eta;
        else if (b.joint_type && b.joint_location) {
            b.eta = ec3_eta(*b.joint_type, *b.joint_location);
            b.eta_from_table = true;
        } else if (!value.contains("eta")) {
            problems.add(child(pointer, "eta"), "missing \"eta\", or a \"joint_type\" and a \"joint_location\" "
                                                "(beam-to-column, beam-to-beam) to take it from EN 1993-1-8 Table 5.2");
        }
        break;
    }
    case joint_law_kind::power: {
        reject_unknown_keys(value, pointer, {"law", "ultimate_moment", "shape", "notes"}, problems);
        if (auto m = positive_quantity(value, pointer, "ultimate_moment", dims::moment, false, problems, system))
            b.ultimate_moment = *m;
        if (!value.contains("shape")) problems.add(child(pointer, "shape"), "missing required field \"shape\" (n, above 0)");
        else if (auto n = bounded_number(value, pointer, "shape", 0, 50, true, "a shape n above 0 and at most 50", problems))
            b.shape = *n;
        break;
    }
    case joint_law_kind::richard_abbott: {
        reject_unknown_keys(value, pointer, {"law", "reference_moment", "plastic_stiffness", "shape", "notes"}, problems);
        if (auto m = positive_quantity(value, pointer, "reference_moment", dims::moment, false, problems, system))
            b.reference_moment = *m;
        if (auto k = positive_quantity(value, pointer, "plastic_stiffness", dims::rotational_stiffness, true, problems,
                                       system))
            b.plastic_stiffness = *k;
        if (!value.contains("shape")) problems.add(child(pointer, "shape"), "missing required field \"shape\" (n, above 0)");
        else if (auto n = bounded_number(value, pointer, "shape", 0, 50, true, "a shape n above 0 and at most 50", problems))
            b.shape = *n;
        break;
    }
    case joint_law_kind::multilinear: {
        reject_unknown_keys(value, pointer, {"law", "points", "slip", "notes"}, problems);
        read_points(value, pointer, b, problems, system);
        if (value.contains("slip")) {
            auto s = quantity_field(value, pointer, "slip", dims::angle, false, problems, system);
            if (s && (!(*s >= 0) || *s > 0.5))
                problems.add(child(pointer, "slip"), "expected a free slip from 0 to 0.5 rad, found " +
                                                         shown(value.at("slip")));
            else if (s) b.slip = *s;
        }
        break;
    }
    }
    if (problems.size() != before) return std::nullopt;
    return b;
}

std::optional<steel_material> read_steel(const json& value, const std::string& pointer, design_standard standard,
                                         problem_list& problems, unit_system* system)
{
    const bool en = standard == design_standard::en1993_1_8;
    if (value.is_string()) {
        const auto g = parse_steel_grade(value.get<std::string>());
        if (!g || *g == steel_grade::user) {
            problems.add(pointer, std::string("expected a steel grade (") +
                                      (en ? "S235, S275, S355 or S460" : "A36, A572-50 or A992") +
                                      ") or {\"fy\": ...}, found " + shown(value));
            return std::nullopt;
        }
        if (is_us_grade(*g) == en) {
            problems.add(pointer, std::string("expected a grade of this project's standard (") +
                                      (en ? "EN 10025: S235, S275, S355 or S460" : "ASTM: A36, A572-50 or A992") +
                                      "), found " + shown(value));
            return std::nullopt;
        }
        steel_material s;
        s.grade = *g;
        return s;
    }
    if (!expect_object(value, pointer, problems)) return std::nullopt;
    reject_unknown_keys(value, pointer, {"fy", "fu", "notes"}, problems);
    steel_material s;
    s.grade = steel_grade::user;
    auto fy = quantity_field(value, pointer, "fy", dims::pressure, true, problems, system);
    auto fu = quantity_field(value, pointer, "fu", dims::pressure, false, problems, system);
    if (fy && !(*fy >= 100e6 && *fy <= 1500e6)) {
        problems.add(child(pointer, "fy"), "expected a yield strength from 100 to 1500 MPa, found " +
                                               shown(value.at("fy")));
        fy.reset();
    }
    if (fu && fy && !(*fu >= *fy && *fu <= 2000e6)) {
        problems.add(child(pointer, "fu"), "expected a tensile strength from fy to 2000 MPa, found " +
                                               shown(value.at("fu")));
        fu.reset();
    }
    if (!fy) return std::nullopt;
    s.fy_given = *fy;
    s.fu_given = fu.value_or(0.0);
    return s;
}

// The law and the rest of the joint must agree: a law that needs the
// moment resistance has one, the stiffness range is finite and, where the
// law needs it, above zero.
void check_behaviour_fits(const joint& out, const std::string& ptr, problem_list& problems, unit_system system)
{
    const joint_behaviour& b = *out.behaviour;
    const std::string bp = child(ptr, "behaviour");
    if (b.law == joint_law_kind::ec3_curve && !out.moment_resistance && !out.moment_resistance_from_detail)
        problems.add(child(bp, "law"), "expected a \"moment_resistance\" on the joint with the ec3-curve law (EN "
                                       "1993-1-8 6.3.1(6) defines it up to M_j,Rd), found none");
    // A derived stiffness is finite and above zero; the plastic stiffness is
    // checked against it once derived (joints/joint_from_detail.hpp).
    if (out.stiffness_from_detail) return;
    if (out.range.min.is_rigid() || out.range.max.is_rigid()) {
        problems.add(child(ptr, "stiffness"), "expected a finite stiffness with a behaviour (a law starts from "
                                              "S_j,ini), found \"rigid\"");
        return;
    }
    const bool needs_positive = b.law == joint_law_kind::ec3_curve || b.law == joint_law_kind::power ||
                                b.law == joint_law_kind::richard_abbott;
    if (needs_positive && !(out.range.min.value() > 0))
        problems.add(child(ptr, "stiffness"), "expected an initial stiffness above zero for the " + to_string(b.law) +
                                              " law, found a lower bound of zero (a pin)");
    if (b.law == joint_law_kind::richard_abbott && !(b.plastic_stiffness < out.range.min.value()))
        problems.add(child(bp, "plastic_stiffness"), "expected a plastic stiffness below the joint's lower-bound "
                                                     "initial stiffness " +
                                                         format_quantity(out.range.min.value(),
                                                                         dims::rotational_stiffness, system) +
                                                         ", found " + format_quantity(b.plastic_stiffness,
                                                                                      dims::rotational_stiffness, system));
}

}  // namespace pinproof
