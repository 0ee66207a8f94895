#include "pinproof/joints/joint_from_detail.hpp"

#include <cmath>
#include <stdexcept>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/joints/bolt.hpp"
#include "pinproof/joints/end_plate.hpp"
#include "pinproof/joints/fin_plate.hpp"

namespace pinproof {
namespace {

std::string joint_pointer(const beam& b, beam_end end) { return b.pointer + "/joints/" + to_string(end); }

// A length in the units of the standard's practice (mm for EN, in for AISC).
std::string length_text(double metres, bool us)
{
    return format_quantity(metres, dims::length, us ? unit_system::us_customary : unit_system::si);
}

// The fields common to both standards, with their defaults noted.
struct common_inputs {
    bolt_grade bolts;
    bool threads = true;
    steel_material beam_steel;
    std::vector<std::string> defaults;
};

common_inputs common_of(const connection_detail& d, const beam& b, bool us)
{
    common_inputs c;
    const derivation_fields& f = d.derivation;
    c.bolts = f.bolt_grade ? *parse_bolt_grade(*f.bolt_grade) : (us ? bolt_grade::a325 : bolt_grade::g8_8);
    if (!f.bolt_grade) c.defaults.push_back("bolt grade " + to_string(c.bolts) + " (default)");
    c.threads = f.threads_in_shear_plane.value_or(true);
    if (!f.threads_in_shear_plane) c.defaults.push_back("threads in the shear plane (default)");
    if (b.steel && (b.steel->grade != steel_grade::user || b.steel->fu_given > 0)) {
        c.beam_steel = *b.steel;
    } else {
        c.beam_steel.grade = us ? steel_grade::a992 : steel_grade::s275;
        c.defaults.push_back("beam web " + c.beam_steel.name() + " (default" +
                             (b.steel ? std::string(": the beam's steel gives no f_u") : std::string()) + ")");
    }
    if (d.grade_is_default) c.defaults.push_back("plate " + to_string(d.grade) + " (default)");
    if (!f.weld) c.defaults.push_back("no weld given: the weld is not derived");
    return c;
}

derived_joint from_fin_plate(const fin_plate_joint& f, const std::string& basis)
{
    derived_joint out;
    out.basis = basis;
    if (f.initial_stiffness > 0) out.initial_stiffness = f.initial_stiffness;
    out.free_rotation = f.free_rotation;
    out.shear_resistance = f.shear_resistance;
    out.governing = f.governing;
    out.moment_resistance = f.moment_resistance;
    out.moment_governing = f.moment_governing;
    out.components = f.components;
    return out;
}

derived_joint derive_en(const connection_detail& d, const beam& b)
{
    common_inputs c = common_of(d, b, false);
    fin_plate_inputs in;
    in.bolts = c.bolts;
    in.threads_in_shear_plane = c.threads;
    in.plate_edge_distance = d.derivation.edge_distance;
    if (d.derivation.weld) in.weld_throat = d.derivation.weld->throat();
    in.beam_steel = c.beam_steel;
    in.E = b.E;
    const fin_plate_joint f = derive_fin_plate(d, b.sec, in);
    derived_joint out = from_fin_plate(f, "EN 1993-1-8");
    out.defaults = std::move(c.defaults);
    if (f.plate_edge_distance_default) out.defaults.push_back("plate edge distance 2 d = " + length_text(f.plate_edge_distance, false) + " (default)");
    return out;
}

std::string row_governing(const tension_row& r)
{
    std::string out = r.governing;
    if (r.governing == "end-plate-t-stub") out += " mode " + std::to_string(r.mode);
    if (r.as_group) out += ", as part of a group of rows";
    if (r.triangular) out += ", limited by EN 1993-1-8 6.2.7.2(9)";
    return out;
}

// The support's ply under the bolts: a supporting beam's web where the detail
// gives it, else taken as the end plate's thickness (reported as a default).
std::optional<double> support_ply(const connection_detail& d)
{
    if (d.support_beam) return d.support_beam->web_thickness;
    return std::nullopt;
}

derived_joint derive_en_end_plate(const connection_detail& d, const beam& b, beam_end end)
{
    common_inputs c = common_of(d, b, false);
    end_plate_inputs in;
    in.bolts = c.bolts;
    in.threads_in_shear_plane = c.threads;
    in.gauge = d.derivation.gauge;
    in.plate_width = d.derivation.plate_width;
    if (d.derivation.weld) in.weld_throat = d.derivation.weld->throat();
    in.support_ply = support_ply(d);
    in.beam_steel = c.beam_steel;
    const joint& j = b.at(end);
    const bool column_known = d.support == support_type::column_flange && j.column && j.column->sec.flange_thickness &&
                              j.column->sec.flange_width && j.column->sec.web_thickness;
    if (column_known) {
        const section& s = j.column->sec;
        column_flange cf;
        cf.flange_thickness = *s.flange_thickness;
        cf.flange_width = *s.flange_width;
        cf.web_thickness = *s.web_thickness;
        cf.root_radius = s.root_radius.value_or(0.0);
        cf.fy = c.beam_steel.fy(cf.flange_thickness);
        in.column = cf;
    }
    in.E = b.E;
    const end_plate_joint f = derive_end_plate(d, b.sec, in);
    derived_joint out;
    out.basis = "EN 1993-1-8";
    out.initial_stiffness = f.initial_stiffness;
    out.free_rotation = 0;  // an end plate turns by bending, not by slip in its holes
    out.shear_resistance = f.shear_resistance;
    out.governing = f.governing;
    out.moment_resistance = f.moment_resistance;
    out.moment_governing = f.moment_governing;
    out.components = f.components;
    for (const tension_row& r : f.rows)
        out.tension_rows.push_back({r.lever_arm, r.resistance, row_governing(r), b.E / (1 / r.k5 + 1 / r.k10)});
    const std::string limit = "t = " + length_text(f.bending_thickness, false) + (f.rotation_capacity_adequate ? " <= " : ", ") +
                              "0.36 d sqrt(f_ub / f_y) = " + length_text(f.thickness_limit, false);
    if (f.moment_governing != "end-plate-t-stub" && f.moment_governing != "column-flange-t-stub") {
        out.rotation_capacity_basis = "not derived: EN 1993-1-8 6.4.2(2) applies where the end plate or the column "
                                      "flange in bending governs the moment resistance; here " + f.moment_governing +
                                      " governs";
    } else {
        out.rotation_capacity_adequate = f.rotation_capacity_adequate;
        out.rotation_capacity_basis =
            std::string(f.rotation_capacity_adequate ? "adequate" : "not shown adequate") + " by EN 1993-1-8 6.4.2(2): the " +
            f.bending_part + " in bending governs and " + limit + "; the clause gives no value of the rotation capacity";
    }
    out.defaults = std::move(c.defaults);
    if (f.gauge_default) out.defaults.push_back("gauge " + length_text(f.gauge, false) + " (default)");
    if (f.width_default) out.defaults.push_back("plate width " + length_text(f.plate_width, false) + " (default: the gauge + 60 mm)");
    if (f.ply_default)
        out.defaults.push_back("support ply under the bolts taken as the plate's thickness for the bolts' elongation "
                               "length (default: the support is not described)");
    if (column_known)
        out.defaults.push_back("column flange of the joint's column " + j.column->sec.name + " in bending (k_4 and its "
                               "T-stub) included, its steel taken as the beam's (" + c.beam_steel.name() +
                               "); column web (k_1, k_2, k_3) not included: taken as rigid");
    else
        out.defaults.push_back("the support taken as rigid: column flange in bending (k_4) and column web (k_1, k_2, "
                               "k_3) not included, as the detail does not describe the column (give the joint's "
                               "\"column\" for a column-flange support to include k_4)");
    return out;
}

derived_joint derive_us(const connection_detail& d, const beam& b)
{
    common_inputs c = common_of(d, b, true);
    single_plate_inputs in;
    in.bolts = c.bolts;
    in.threads_in_shear_plane = c.threads;
    in.plate_edge_distance = d.derivation.edge_distance;
    if (d.derivation.weld) in.weld_leg = d.derivation.weld->leg_length();
    in.plate_steel.grade = d.grade == plate_grade::a572_50 ? steel_grade::a572_50 : steel_grade::a36;
    in.beam_steel = c.beam_steel;
    const single_plate_joint f = derive_single_plate(d, b.sec, in);
    derived_joint out = from_fin_plate(f, "AISC 360-16");
    out.defaults = std::move(c.defaults);
    if (f.plate_edge_distance_default) out.defaults.push_back("plate edge distance 1.5 d = " + length_text(f.plate_edge_distance, true) + " (default)");
    out.limits_exceeded = f.limits_exceeded;
    return out;
}

// The joint's range and moment resistance from its derivation, where asked.
void resolve(joint& j, const derived_joint& dj, const std::string& ptr, problem_list& problems)
{
    if (j.moment_resistance_from_detail) j.moment_resistance = dj.moment_resistance;
    if (!j.stiffness_from_detail) return;
    if (!dj.initial_stiffness) {
        // The project reader refuses this already; a joint built another way is refused here.
        problems.add(ptr + "/stiffness", "expected a stiffness range: " + dj.basis + " gives no component stiffness, so "
                                         "\"from-detail\" derives the moment resistance only");
        return;
    }
    const auto [lo, hi] = j.stiffness_scatter.value_or(std::make_pair(0.5, 2.0));
    j.range = {stiffness::spring(lo * *dj.initial_stiffness), stiffness::spring(hi * *dj.initial_stiffness)};
    if (j.behaviour && j.behaviour->law == joint_law_kind::richard_abbott &&
        !(j.behaviour->plastic_stiffness < j.range.min.value()))
        problems.add(ptr + "/behaviour/plastic_stiffness",
                     "expected a plastic stiffness below the joint's lower-bound initial stiffness " +
                         format_quantity(j.range.min.value(), dims::rotational_stiffness, unit_system::si) +
                         " (the derived S_j,ini times the scatter's min), found " +
                         format_quantity(j.behaviour->plastic_stiffness, dims::rotational_stiffness, unit_system::si));
}

}  // namespace

std::optional<derived_joint> derive_joint(const beam& b, beam_end end, design_standard standard, std::string* why_not)
{
    const joint& j = b.at(end);
    if (!j.detail) return std::nullopt;
    const bool fin = j.detail->type == detail_type::fin_plate, end_plate = j.detail->type == detail_type::end_plate;
    const bool us = standard == design_standard::aisc360;
    if (!fin && !(end_plate && !us)) {
        if (why_not && end_plate)
            *why_not = "AISC 360 gives no component method for the moment of an end plate; its resistance is not "
                       "derived in AISC terms";
        return std::nullopt;
    }
    const bool asked = j.stiffness_from_detail || j.moment_resistance_from_detail;
    try {
        derived_joint out = end_plate ? derive_en_end_plate(*j.detail, b, end)
                                      : (us ? derive_us(*j.detail, b) : derive_en(*j.detail, b));
        if (fin) out.rotation_capacity_basis = "not derived: no published method gives a fin plate's rotation capacity "
                                               "(the gap check covers the rotation)";
        if (out.initial_stiffness) {
            const auto [lo, hi] = j.stiffness_scatter.value_or(std::make_pair(0.5, 2.0));
            out.scatter_min = lo;
            out.scatter_max = hi;
            out.scatter_default = !j.stiffness_scatter;
            out.stiffness_min = lo * *out.initial_stiffness;
            out.stiffness_max = hi * *out.initial_stiffness;
        }
        return out;
    } catch (const std::invalid_argument& e) {
        if (!asked) {
            if (why_not) *why_not = e.what();
            return std::nullopt;
        }
        throw input_error(joint_pointer(b, end) + "/detail",
                          std::string("the joint cannot be derived from this detail (\"from-detail\"): ") + e.what());
    }
}

namespace {

void derive_beam_joints(beam& b, design_standard standard, problem_list& problems)
{
    for (const beam_end end : {beam_end::start, beam_end::end}) {
        joint& j = end == beam_end::start ? b.start : b.end;
        try {
            j.derived = derive_joint(b, end, standard, &j.not_derived_reason);
        } catch (const input_error& e) {
            problems.add_all(e);
            continue;
        }
        if (j.derived) resolve(j, *j.derived, joint_pointer(b, end), problems);
    }
}

}  // namespace

void derive_beam_joints(beam& b, design_standard standard)
{
    problem_list problems;
    derive_beam_joints(b, standard, problems);
    problems.throw_if_any();
}

void derive_joints(project& p)
{
    problem_list problems;
    for (beam& b : p.beams) derive_beam_joints(b, p.standard, problems);
    problems.throw_if_any();
}

}  // namespace pinproof
