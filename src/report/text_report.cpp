#include "pinproof/report/text_report.hpp"

#include <algorithm>
#include <cmath>
#include <sstream>

#include "pinproof/core/printable_text.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/checks/failure_probability.hpp"
#include "pinproof/checks/threshold.hpp"

namespace pinproof {
namespace {

std::string pad(const std::string& s, std::size_t w)
{
    // Width in characters, counting UTF-8 continuation bytes as none.
    std::size_t n = 0;
    for (unsigned char c : s) n += (c & 0xC0) != 0x80;
    // A cell wider than its column still keeps one space before the next.
    return n >= w ? s + " " : s + std::string(w - n, ' ');
}

std::string rpad(const std::string& s, std::size_t w)
{
    std::size_t n = 0;
    for (unsigned char c : s) n += (c & 0xC0) != 0x80;
    return n >= w ? " " + s : std::string(w - n, ' ') + s;
}

// Wraps text to `width` columns, every line after the first indented.
std::string wrap(const std::string& text, std::size_t width, const std::string& indent)
{
    std::istringstream words(text);
    std::string word, line, out;
    while (words >> word) {
        if (!line.empty() && line.size() + 1 + word.size() > width) {
            out += line + "\n" + indent;
            line.clear();
        }
        line += (line.empty() ? "" : " ") + word;
    }
    return out + line;
}

struct units_view {
    unit_system system;
    std::string unit(dimension d) const { return display_unit_for(d, system).symbol; }
    std::string num(double si, dimension d, int sig = 4) const
    {
        const double v = si / display_unit_for(d, system).si_per_unit;
        return format_number(std::abs(v) < 1e-12 ? 0.0 : v, sig);
    }
    // Positions along the beam are shown in m (ft), not in the length unit of
    // deflections.
    std::string pos_unit() const { return system == unit_system::us_customary ? "ft" : "m"; }
    std::string pos(double m) const
    {
        return format_number(std::abs(m) < 1e-12 ? 0.0 : (system == unit_system::us_customary ? m / 0.3048 : m), 4);
    }
    std::string cell(double si, const result_field& f) const
    {
        return is_position(f) ? pos(si) : num(si, f.dim);
    }
    static bool is_position(const result_field& f)
    {
        return f.member == &beam_state::max_sagging_at || f.member == &beam_state::max_hogging_at ||
               f.member == &beam_state::max_deflection_at;
    }
    std::string span(double m) const
    {
        if (system == unit_system::us_customary) return format_number(m / 0.3048, 4) + " ft";
        return format_number(m, 4) + " m";
    }
    std::string stiff(stiffness s) const
    {
        return s.is_rigid() ? std::string("rigid") : num(s.value(), dims::rotational_stiffness);
    }
};

std::string ratio_text(const std::optional<double>& r) { return r ? format_number(*r, 3) : std::string("rigid"); }

// The beam, its section and stiffness boundaries, its steel and the notes.
void beam_heading(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const beam& b = *a.input;
    const units_view u{p.units};
    o << std::string(100, '=') << "\n";
    o << "Beam " << b.id << (b.description.empty() ? "" : "  " + b.description) << "\n";
    const bool cantilever = b.layout == beam_layout::cantilever;
    if (cantilever) o << "  Cantilever: root at the start (its joint the only restraint), free tip at the end\n";
    if (b.layout == beam_layout::overhang)
        o << "  Overhang: supports at the start (its joint) and at " << u.span(b.span)
          << " (the beam runs on, continuous, over it), free tip " << u.span(b.overhang) << " beyond; positions from the start\n";
    o << "  " << b.sec.name << (cantilever ? ", length " : ", span ") << u.span(b.span) << ", E = " << u.num(b.E, dims::pressure) << " "
      << u.unit(dims::pressure) << ", I = " << u.num(b.sec.I, dims::second_moment) << " "
      << u.unit(dims::second_moment) << ", depth " << u.num(b.sec.depth, dims::length) << " "
      << u.unit(dims::length) << "\n";
    o << "  EI/L = " << u.num(b.EI() / b.span, dims::rotational_stiffness) << " " << u.unit(dims::rotational_stiffness)
      << "; the boundaries S*L/EI = 0.5, " << format_number(en_rigid_limit(p.frame), 2)
      << " (EN 1993-1-8) and 2, 20 (AISC 360) are "
      << u.num(0.5 * b.EI() / b.span, dims::rotational_stiffness, 4) << ", "
      << u.num(en_rigid_limit(p.frame) * b.EI() / b.span, dims::rotational_stiffness, 4) << ", "
      << u.num(2 * b.EI() / b.span, dims::rotational_stiffness, 4) << ", "
      << u.num(20 * b.EI() / b.span, dims::rotational_stiffness, 4) << " " << u.unit(dims::rotational_stiffness) << "\n";
    if (a.plastic_moment)
        o << "  steel " << b.steel->name() << ", plastic moment " << u.num(*a.plastic_moment, dims::moment) << " "
          << u.unit(dims::moment) << "\n";
    for (const auto& n : a.notes) o << "  Note: " << wrap(n, 92, "        ") << "\n";
}

// Each joint: its range, class, resistance and law.
void joint_table(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const beam& b = *a.input;
    const units_view u{p.units};
    o << "\n  Joints (stiffness in " << u.unit(dims::rotational_stiffness) << ")\n";
    o << "    " << pad("end", 7) << pad("S min .. S max", 22) << pad("S*L/EI", 18) << pad("fixity r", 18) << "class (lower .. upper bound)\n";
    const bool cantilever = b.layout == beam_layout::cantilever;
    for (const auto* j : {&a.start, &a.end}) {
        if (cantilever && j->end == beam_end::end) {
            o << "    " << pad("end", 7) << "free tip: no joint\n";
            continue;
        }
        if (b.layout == beam_layout::overhang && j->end == beam_end::end) {
            o << "    " << pad("end", 7) << "no joint: the beam runs on, continuous, over the end support to its tip\n";
            continue;
        }
        o << "    " << pad(cantilever ? std::string("root") : to_string(j->end), 7) << pad(u.stiff(j->range.min) + " .. " + u.stiff(j->range.max), 22)
          << pad(ratio_text(j->ratio_lower) + " .. " + ratio_text(j->ratio_upper), 18)
          << pad(format_number(j->fixity_lower, 3) + " .. " + format_number(j->fixity_upper, 3), 18)
          << "EN 1993-1-8 (" << to_string(p.frame) << "): " << to_string(j->en_lower) << " .. " << to_string(j->en_upper)
          << "\n" << std::string(4 + 7 + 22 + 18 + 18, ' ') << "AISC 360: " << to_string(j->aisc_lower) << " .. "
          << to_string(j->aisc_upper) << "\n";
        const auto& mr = b.at(j->end).moment_resistance;
        if (mr) o << "    " << pad("", 7) << "moment resistance " << u.num(*mr, dims::moment) << " " << u.unit(dims::moment) << "\n";
        if (const auto& bh = b.at(j->end).behaviour) {
            o << "    " << pad("", 7) << "behaviour: " << to_string(bh->law) << " law";
            if (bh->law == joint_law_kind::ec3_curve)
                o << ", psi = " << format_number(bh->psi, 3) << (bh->psi_from_table ? " (EN 1993-1-8 Table 6.8)" : "");
            if (bh->law == joint_law_kind::ec3_eta)
                o << ", eta = " << format_number(bh->eta, 3) << (bh->eta_from_table ? " (EN 1993-1-8 Table 5.2)" : "");
            if (j->law)
                o << "; under " << j->law->combination << " it carries " << u.num(j->law->moment, dims::moment) << " "
                  << u.unit(dims::moment) << " at a secant stiffness of "
                  << u.num(j->law->secant_stiffness, dims::rotational_stiffness) << " "
                  << u.unit(dims::rotational_stiffness) << (j->law->yields ? ", and yields" : "");
            o << "\n";
        }
        if (const auto& rc = b.at(j->end).rotation_capacity)
            o << "    " << pad("", 7) << "rotation capacity " << u.num(*rc, dims::angle) << " " << u.unit(dims::angle) << "\n";
    }
}

// Each joint derived from its detail: its components, the governing one
// marked, the resistances and stiffness, and every default taken.
void derived_joints(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const beam& b = *a.input;
    const units_view u{p.units};
    for (const beam_end e : {beam_end::start, beam_end::end}) {
        const joint& jt = b.at(e);
        if (!jt.derived) continue;
        const derived_joint& d = *jt.derived;
        o << "\n  Joint at the " << to_string(e) << " from its detail (" << d.basis << ", "
          << to_string(jt.detail->type) << "; forces in " << u.unit(dims::force) << ")\n";
        o << "    " << pad("component", 22) << pad("resistance", 13) << pad("per bolt", 11) << "source\n";
        for (const joint_component& c : d.components) {
            const bool governs = c.id == d.governing;
            o << "  " << (governs ? "> " : "  ") << pad(c.id, 22)
              << pad(c.resistance ? u.num(*c.resistance, dims::force) : std::string("-"), 13)
              << pad(c.per_bolt ? u.num(*c.per_bolt, dims::force) : std::string("-"), 11)
              << wrap(c.source, 60, std::string(4 + 22 + 13 + 11, ' ')) << "\n";
        }
        o << "    > governs: shear resistance " << u.num(d.shear_resistance, dims::force) << " " << u.unit(dims::force)
          << " (" << d.governing << ")\n";
        o << "    moment resistance " << u.num(d.moment_resistance, dims::moment) << " " << u.unit(dims::moment) << " ("
          << d.moment_governing << ")" << (jt.moment_resistance_from_detail ? ", used as the joint's (from-detail)" : "")
          << "\n";
        if (d.initial_stiffness)
            o << "    initial stiffness S_j,ini " << u.num(*d.initial_stiffness, dims::rotational_stiffness) << " "
              << u.unit(dims::rotational_stiffness) << "; range " << format_number(d.scatter_min, 3) << " to "
              << format_number(d.scatter_max, 3) << " times it" << (d.scatter_default ? " (default)" : "") << " = "
              << u.num(*d.stiffness_min, dims::rotational_stiffness) << " .. "
              << u.num(*d.stiffness_max, dims::rotational_stiffness) << " " << u.unit(dims::rotational_stiffness)
              << (jt.stiffness_from_detail ? ", used as the joint's range (from-detail)" : "") << "\n";
        else
            o << "    initial stiffness: not derived (" << d.basis << " gives no component stiffness)\n";
        o << "    free rotation before the bolts bear " << u.num(d.free_rotation, dims::angle) << " " << u.unit(dims::angle)
          << "; rotation capacity "
          << (d.rotation_capacity_basis.empty() ? std::string("not derived") : d.rotation_capacity_basis) << "\n";
        for (std::size_t i = 0; i < d.tension_rows.size(); ++i) {
            const derived_tension_row& r = d.tension_rows[i];
            o << "    bolt row " << i + 1 << " in tension: lever arm " << u.num(r.lever_arm, dims::length) << " "
              << u.unit(dims::length) << ", F_tr,Rd " << u.num(r.resistance, dims::force) << " " << u.unit(dims::force)
              << " (" << r.governing << ")\n";
        }
        for (const auto& s : d.defaults) o << "    assumed: " << s << "\n";
        for (const auto& s : d.limits_exceeded) o << "    beyond the conventional configuration: " << s << "\n";
    }
}

// The end gap of each joint with a detail, and the state after closure.
void end_gaps(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const beam& b = *a.input;
    const units_view u{p.units};
    for (const auto* j : {&a.start, &a.end}) {
        if (!j->detail) continue;
        const auto& d = *j->detail;
        const joint& jt = b.at(j->end);
        o << "\n  End gap at the " << to_string(j->end) << ": " << to_string(jt.detail->type) << " to "
          << to_string(jt.detail->support) << ", gap " << u.num(d.gap.gap, dims::length) << " " << u.unit(dims::length)
          << " as detailed less " << u.num(d.gap.gap_tolerance, dims::length) << " " << u.unit(dims::length) << " tolerance = "
          << u.num(d.gap.worst_case_gap, dims::length) << " " << u.unit(dims::length) << " worst case\n";
        o << "    " << pad("sense", 10) << pad("demand (" + u.unit(dims::angle) + ")", 16)
          << pad("closure (" + u.unit(dims::angle) + ")", 17) << pad("margin", 9)
          << pad("clearance (" + u.unit(dims::length) + ")", 17) << "critical point\n";
        for (const auto* sc : {&d.gap.sagging, &d.gap.hogging}) {
            const double demand = sc->sense == rotation_sense::sagging ? d.demand_sagging : d.demand_hogging;
            o << "    " << pad(to_string(sc->sense), 10) << pad(u.num(demand, dims::angle), 16)
              << pad(sc->closing.rotation ? u.num(*sc->closing.rotation, dims::angle) : std::string("none < 90 deg"), 17)
              << pad(sc->margin ? (sc->margin_is_lower_bound ? ">" : "") + format_number(*sc->margin, 3) : std::string("-"), 9)
              << pad(demand > 0 ? u.num(sc->clearance_at_demand, dims::length) : std::string("-"), 17)
              << (sc->closing.contact ? sc->closing.contact->description() : std::string("-")) << "\n";
        }
        o << "    demand basis: " << (d.credits_lower_bound
                                         ? "rotation at the joints' lower-bound stiffness (declared dependable)"
                                         : "pinned beam's rotation (no joint stiffness credited at the gap)")
          << "\n";
        if (d.free_slip > 0)
            o << "    demand includes the joint law's free slip " << u.num(d.free_slip, dims::angle) << " "
              << u.unit(dims::angle) << "\n";
        if (jt.support_rotation > 0)
            o << "    demand includes the support's own rotation " << u.num(jt.support_rotation, dims::angle) << " "
              << u.unit(dims::angle) << " in each sense (its sense is not given)\n";
        if (d.gap.min_gap_required)
            o << "    smallest as-detailed gap that passes: " << u.num(*d.gap.min_gap_required, dims::length) << " "
              << u.unit(dims::length) << "\n";
        else if (!d.gap.min_gap_note.empty())
            o << "    smallest gap that passes: " << wrap(d.gap.min_gap_note, 80, "      ") << "\n";
        o << "    the 30 mrad rule of thumb for simple connections (comparison only): "
          << (d.clears_rule_of_thumb ? "cleared" : "NOT cleared") << "\n";
        if (!jt.detail->inputs.empty()) {
            // Every field the detail was read with; a default is marked and its source given.
            std::string given;
            for (const auto& i : jt.detail->inputs)
                given += (given.empty() ? "" : ", ") + i.field + " " +
                         (i.length ? u.num(*i.length, dims::length) + " " + u.unit(dims::length) : i.text) +
                         (i.is_default ? "*" : "");
            o << "    connection input (* a default): " << wrap(given, 80, "      ") << "\n";
            for (const auto& i : jt.detail->inputs)
                if (i.is_default) o << "      * " << i.field << ": " << wrap(i.source, 80, "        ") << "\n";
        }
        if (d.consequence) {
            const auto& c = *d.consequence;
            const double M = j->end == beam_end::start ? c.result.state.moment_start : c.result.state.moment_end;
            o << "    after closure (" << c.combination << ", each joint at the stiffness its gap check credits): joint moment "
              << u.num(M, dims::moment) << " " << u.unit(dims::moment) << ", bearing force "
              << u.num(c.contact_force, dims::force) << " " << u.unit(dims::force) << " at an arm of "
              << u.num(c.lever_arm, dims::length) << " " << u.unit(dims::length) << ", max sagging moment "
              << u.num(c.result.state.max_sagging_moment, dims::moment) << " " << u.unit(dims::moment)
              << ", max hogging moment " << u.num(c.result.state.max_hogging_moment, dims::moment) << " "
              << u.unit(dims::moment) << "\n";
            o << "      " << wrap(c.assumptions, 88, "      ") << "\n";
        }
    }
}

// The engineers' estimate 18/sqrt(delta) of a state's frequency (natural_frequency.hpp).
std::string estimate_cell(double deflection)
{
    return deflection > 0 ? format_number(frequency_from_deflection(deflection), 4) : std::string("-");
}

// An overhang's tip: deflection and rotation, pinned, over the range (the
// corners hold the extremes: linear in the start moment) and fixed.
void overhang_rows(std::ostringstream& o, const units_view& u, const combination_result& r)
{
    const struct {
        const char* label;
        dimension dim;
        double beam_state::*member;
    } rows[] = {{"tip deflection (down +)", dims::length, &beam_state::tip_deflection},
                {"tip rotation (-dw/dx)", dims::angle, &beam_state::rotation_tip}};
    for (const auto& row : rows) {
        const value_range range = corner_range(r, row.member);
        const double lo = range.min, hi = range.max;
        o << "    " << pad(row.label, 32) << pad(u.unit(row.dim), 10)
          << (r.pinned ? rpad(u.num(r.pinned.value().*(row.member), row.dim), 11) : std::string())
          << rpad(u.num(lo, row.dim), 12) << rpad(u.num(hi, row.dim), 12) << rpad(u.num(r.fixed.*(row.member), row.dim), 11)
          << "\n";
    }
}

// Each combination: every result pinned, over the range and fixed (a
// cantilever: over the range and with a rigid root; its pinned bound is a
// mechanism and has no column).
void combination_tables(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const units_view u{p.units};
    const bool cantilever = a.input->layout == beam_layout::cantilever;
    for (const auto& r : a.combinations) {
        o << "\n  Combination " << r.comb.name << " (" << to_string(r.comb.use) << "): " << combination_text(r.comb)
          << "\n";
        o << "    " << pad("result", 32) << pad("unit", 10) << (cantilever ? "" : rpad("pinned", 11)) << rpad("range min", 12)
          << rpad("range max", 12) << rpad(cantilever ? "rigid root" : "fixed", 11) << "\n";
        const auto& f = result_fields();
        for (std::size_t i = 0; i < f.size(); ++i) {
            // A free tip has neither reaction nor moment: their rows are left out.
            if (cantilever && (f[i].member == &beam_state::reaction_end || f[i].member == &beam_state::moment_end))
                continue;
            o << "    " << pad(f[i].label, 32) << pad(units_view::is_position(f[i]) ? u.pos_unit() : u.unit(f[i].dim), 10)
              << (r.pinned ? rpad(u.cell(r.pinned.value().*(f[i].member), f[i]), 11) : std::string())
              << rpad(u.cell(r.envelope.ranges[i].min, f[i]), 12)
              << rpad(u.cell(r.envelope.ranges[i].max, f[i]), 12)
              << rpad(u.cell(r.fixed.*(f[i].member), f[i]), 11) << "\n";
        }
        if (a.input->layout == beam_layout::overhang) overhang_rows(o, u, r);
        if (r.frequency) {
            const auto& fr = *r.frequency;
            o << "    " << pad("first natural frequency", 32) << pad(u.unit(dims::frequency), 10)
              << (fr.pinned ? rpad(u.num(*fr.pinned, dims::frequency), 11) : std::string())
              << rpad(u.num(fr.range.min, dims::frequency), 12)
              << rpad(u.num(fr.range.max, dims::frequency), 12) << rpad(u.num(fr.fixed, dims::frequency), 11) << "\n";
            // The estimate is for a beam on two supports (natural_frequency.hpp).
            if (!r.pinned || a.input->layout != beam_layout::two_supports) continue;
            o << "    " << pad("  estimate 18/sqrt(delta mm)", 32) << pad(u.unit(dims::frequency), 10)
              << rpad(estimate_cell(r.pinned->max_deflection), 11)
              << rpad(estimate_cell(r.envelope.of(&beam_state::max_deflection).max), 12)
              << rpad(estimate_cell(r.envelope.of(&beam_state::max_deflection).min), 12)
              << rpad(estimate_cell(r.fixed.max_deflection), 11) << "\n";
        }
        if (r.collapse)
            o << "    collapse of the beam (largest sagging moment at M_pl, both joints at their lower bound): at "
              << format_number(r.collapse->load_factor, 4) << " times these loads, end rotations "
              << u.num(r.collapse->rotation_start, dims::angle) << " and " << u.num(r.collapse->rotation_end, dims::angle)
              << " " << u.unit(dims::angle) << "\n";
    }
}

// Every check with its value, limit and message.
void check_list(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const units_view u{p.units};
    o << "\n  Checks\n";
    int hidden = 0;
    for (const auto& c : a.checks) {
        // Detailing rules that do not apply to this kind of detail are in the JSON result only.
        if (c.status == check_status::not_applicable && c.id.rfind("detailing-", 0) == 0) {
            ++hidden;
            continue;
        }
        std::string vl;
        if (c.value) {
            const bool ratio = c.dim == dims::dimensionless;
            vl = ratio ? format_number(*c.value, 3) : u.num(*c.value, c.dim) + " " + u.unit(c.dim);
            if (c.limit) vl += std::string(c.limit_is_minimum ? " / min " : " / ") + (ratio ? format_number(*c.limit, 3) : u.num(*c.limit, c.dim) + " " + u.unit(c.dim));
        }
        o << "    " << pad(status_label(c.status), 6) << pad(c.id + "  ", 38) << vl << "\n";
        o << "          " << wrap(c.message, 88, "          ") << "\n";
    }
    if (hidden > 0)
        o << "    (" << hidden << " detailing rule" << (hidden == 1 ? " does" : "s do")
          << " not apply to these details and " << (hidden == 1 ? "is" : "are") << " not listed)\n";
}

// The thresholds and the failure probabilities of the checks.
void sensitivity(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    const beam& b = *a.input;
    const auto thresholds = threshold_report_lines(p, b);
    if (!thresholds.empty()) {
        o << "\n  Thresholds ("
          << (b.layout == beam_layout::cantilever ? "the root's stiffness"
              : b.layout == beam_layout::overhang ? "the start joint's stiffness"
                                                  : "the stiffness, both joints together,")
          << " at which a check changes its answer)\n";
        for (const auto& line : thresholds)
            if (line.rfind("Stiffness thresholds", 0) != 0) o << "    " << wrap(line, 94, "      ") << "\n";
    }
    if (b.start.distribution || b.end.distribution) {
        const stiffness_uncertainty unc{b.start.distribution, b.end.distribution, b.stiffness_correlation};
        const auto probabilities = failure_probabilities(p, b, unc);
        o << "\n  Probability that a check does not pass, over the stiffness distribution"
          << (b.start.distribution && b.end.distribution
                  ? (b.stiffness_correlation == 1 ? "s (ends fully correlated)" : "s (ends independent)")
                  : " of the " + std::string(b.layout == beam_layout::cantilever ? "root"
                                             : b.start.distribution              ? "start joint"
                                                                                 : "end joint"))
          << "\n";
        for (const auto& f : probabilities) {
            if (f.p_fail <= 0.0) continue;
            o << "    " << pad(f.check + "  ", 38) << "P = " << format_number(f.p_fail, 3) << " (error "
              << format_number(f.error, 1) << ")\n" << "      " << wrap(f.method, 92, "      ") << "\n";
        }
        if (std::none_of(probabilities.begin(), probabilities.end(),
                         [](const failure_probability& f) { return f.p_fail > 0.0; }))
            o << "    no check fails anywhere in the distribution\n";
    }
}

// The verdict and the checks that fail.
void verdict_line(std::ostringstream& o, const beam_assessment& a)
{
    const beam& b = *a.input;
    const auto failed = std::count_if(a.checks.begin(), a.checks.end(),
                                      [](const check& c) { return c.status == check_status::fail; });
    o << "\n  Verdict for beam " << b.id << ": ";
    const std::string assumption = b.layout == beam_layout::cantilever ? "the fixed-root assumption"
                                                                       : "the simple-support (pinned) assumption";
    if (a.holds()) {
        o << assumption << " HOLDS; no check fails.\n";
    } else {
        std::string ids;
        for (const auto& c : a.checks)
            if (c.status == check_status::fail) ids += (ids.empty() ? "" : ", ") + c.id;
        o << assumption << " DOES NOT HOLD.\n    " << failed << " check"
          << (failed == 1 ? " fails" : "s fail") << ": " << wrap(ids, 90, "    ") << "\n";
    }
}

void beam_block(std::ostringstream& o, const project& p, const beam_assessment& a)
{
    beam_heading(o, p, a);
    joint_table(o, p, a);
    derived_joints(o, p, a);
    end_gaps(o, p, a);
    combination_tables(o, p, a);
    check_list(o, p, a);
    sensitivity(o, p, a);
    verdict_line(o, a);
}

}  // namespace

std::string combination_text(const combination& c)
{
    std::string s;
    for (const auto& [name, f] : c.factors) {
        if (!s.empty()) s += f < 0 ? " - " : " + ";
        else if (f < 0) s += "-";
        s += format_number(std::abs(f), 3) + " " + name;
    }
    return s;
}

std::string text_report(const project_assessment& a, const std::string& version)
{
    const project& p = *a.input;
    std::ostringstream o;
    o << "pinproof " << version << ": check of the simple-support assumption for beams on semi-rigid joints\n";
    if (p.job) {
        const job_info& j = *p.job;
        std::string line;
        const std::pair<const char*, const std::string*> parts[] = {
            {"job ", &j.number}, {"", &j.title}, {"made by ", &j.made_by}, {"checked by ", &j.checked_by},
            {"rev ", &j.revision}, {"", &j.date}};
        for (const auto& [label, value] : parts)
            if (!value->empty()) line += (line.empty() ? "" : "; ") + std::string(label) + *value;
        if (!line.empty()) o << "Job:      " << line << "\n";
    }
    o << "Project:  " << p.title << "\n";
    o << "Standard: " << (p.standard == design_standard::en1993_1_8 ? "EN 1993-1-8" : "AISC 360") << ", "
      << to_string(p.frame) << " frame; units " << (p.units == unit_system::us_customary ? "US customary" : "SI")
      << "\n";
    for (const auto& b : a.beams) beam_block(o, p, b);
    o << std::string(100, '=') << "\n";
    const auto holding = std::count_if(a.beams.begin(), a.beams.end(), [](const beam_assessment& b) { return b.holds(); });
    o << "Summary: " << a.beams.size() << " beam" << (a.beams.size() == 1 ? "" : "s") << " checked, " << holding
      << " hold, " << a.beams.size() - holding << " do not hold.\n\n";
    o << "Legend\n"
         "  pinned, fixed    ideal end conditions at both ends. Fixed ends are not an upper bound of an end\n"
         "                   moment in general: the largest end moment comes with that joint rigid and the far\n"
         "                   joint pinned (docs/method/beam-model.md)\n"
         "  range min, max   envelope over the four corners of the joint-stiffness range box; the maximum sagging\n"
         "                   and hogging moments and the deflection are also searched inside the box\n"
         "  max hogging      the most hogging span moment, ends included, negative (sagging +); 0 where the\n"
         "                   beam nowhere hogs\n"
         "  S*L/EI           joint stiffness relative to the beam; fixity r = 1/(1 + 3EI/(S*L)) (0 pin, 1 fixed)\n"
         "  signs            reactions up +, end moments hogging +, deflection down +, end rotations + in the\n"
         "                   sense a simply supported beam rotates under gravity load\n"
         "  statuses         pass, FAIL, warn (to pass on or to look at; does not change the verdict),\n"
         "                   n/a (not applicable: the reason is given)\n";
    if (std::any_of(p.beams.begin(), p.beams.end(), [](const beam& b) { return b.layout == beam_layout::cantilever; }))
        o << "  cantilever       the start joint is the root, the end a free tip; rigid root is the ideal bound, a\n"
             "                   pinned root a mechanism (no column); the tip deflection is down +, the tip's\n"
             "                   rotation_end is -dw/dx, negative as a tip drops under gravity\n";
    if (std::any_of(p.beams.begin(), p.beams.end(), [](const beam& b) { return b.layout == beam_layout::overhang; }))
        o << "  overhang         supports at the start and at the span, the beam continuous over the end support\n"
             "                   to a free tip; positions from the start; end moment = hogging over the end\n"
             "                   support; max deflection and rotation_end belong to the back span and the end\n"
             "                   support, the tip rows to the tip (rotation -dw/dx, negative as a tip drops)\n";
    o << "\n";
    o << "Caution: " << wrap(caution_text, 90, "         ") << "\n";
    // Ids, titles and descriptions come from the input: nothing in them may act on a terminal.
    return terminal_text(o.str());
}

}  // namespace pinproof
