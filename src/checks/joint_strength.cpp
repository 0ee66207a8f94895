#include "pinproof/checks/joint_strength.hpp"

#include <algorithm>
#include <cmath>

#include "pinproof/joints/joint_law.hpp"

namespace pinproof {
namespace {

std::string fmt(const project& p, double v, dimension d) { return format_quantity(v, d, p.units); }

std::string stiffness_of(const project& p, stiffness s)
{
    return s.is_rigid() ? std::string("rigid") : fmt(p, s.value(), dims::rotational_stiffness);
}

}  // namespace

std::optional<joint_assessment::law_response> law_response_of(const beam& b, const std::vector<combination_result>& combos,
                                                              beam_end e, bool find_yield_factor)
{
    const joint& j = b.at(e);
    if (!j.behaviour) return std::nullopt;
    const bool start = e == beam_end::start;
    std::optional<joint_assessment::law_response> best;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::strength) continue;
        // Corners: (min,min), (min,max), (max,min), (max,max) for (start, end).
        const beam_state& s = start ? r.corners[2] : r.corners[1];
        const double m = std::abs(start ? s.moment_start : s.moment_end);
        if (best && m <= best->moment) continue;
        joint_assessment::law_response lr;
        lr.combination = r.comb.name;
        lr.moment = m;
        const stiffness sec = start ? s.stiffness_start : s.stiffness_end;
        lr.secant_stiffness = sec.is_rigid() ? 0.0 : sec.value();
        lr.yields = j.moment_resistance && m >= *j.moment_resistance * (1 - 1e-9);
        if (lr.yields && find_yield_factor) {
            // The load factor at which it reached its cap, from the same corner.
            const beam_model model(b.span, b.EI(), factored_loads(b.loads, r.comb));
            const stiffness here = j.range.max, far = b.at(start ? beam_end::end : beam_end::start).range.min;
            const nonlinear_solution sol = start ? solve_nonlinear(model, end_for(b.start, here), end_for(b.end, far))
                                                 : solve_nonlinear(model, end_for(b.start, far), end_for(b.end, here));
            lr.yield_factor = start ? sol.start_yield_factor : sol.end_yield_factor;
        }
        best = lr;
    }
    return best;
}

check joint_moment_law_check(const project& p, const beam& b, const joint_assessment& ja)
{
    const joint& j = b.at(ja.end);
    check c;
    c.id = "joint-moment-" + to_string(ja.end);
    c.dim = dims::moment;
    if (!ja.law) {
        c.status = check_status::not_applicable;
        c.message = "No strength combination is given, so the moment the joint attracts under design loads is not checked.";
        return c;
    }
    const auto& lr = *ja.law;
    c.value = lr.moment;
    const std::string law = to_string(j.behaviour->law);
    const std::string attracted = "Under its " + law + " law the joint carries up to " + fmt(p, lr.moment, dims::moment) +
                                  " (combination " + lr.combination +
                                  ", this joint at its upper-bound stiffness, the far joint at its lower bound; "
                                  "secant stiffness there " + fmt(p, lr.secant_stiffness, dims::rotational_stiffness) + ")";
    if (!j.moment_resistance) {
        c.status = check_status::not_applicable;
        c.message = attracted + "; no moment resistance is declared for the joint, so this is not checked.";
        return c;
    }
    const double mrd = *j.moment_resistance;
    c.limit = mrd;
    if (lr.yields) {
        c.status = check_status::warn;
        c.message = attracted + ": it reaches its moment resistance " + fmt(p, mrd, dims::moment) + " and yields" +
                    (lr.yield_factor ? " at " + format_number(*lr.yield_factor, 3) + " times the combination's loads" : "") +
                    ", then turns at constant moment. A simple joint that yields is what the codes intend provided it "
                    "is ductile: see joint-ductility-" + to_string(ja.end) + ".";
        return c;
    }
    c.status = check_status::pass;
    const bool en = p.standard == design_standard::en1993_1_8;
    const bool elastic_range = lr.moment <= 2.0 / 3.0 * mrd;
    c.message = attracted + ", below its moment resistance " + fmt(p, mrd, dims::moment);
    if (en)
        c.message += elastic_range ? ", and below 2/3 of it, where the initial stiffness applies (EN 1993-1-8 5.1.2(3))."
                                   : "; above 2/3 of it the law's reduced stiffness applies (EN 1993-1-8 5.1.2(3), 6.3.1(6)).";
    else
        c.message += ".";
    return c;
}

check strength_class_check(const project& p, const beam& b, beam_end e)
{
    const joint& j = b.at(e);
    check c;
    c.id = "strength-class-" + to_string(e);
    c.dim = dims::dimensionless;
    const auto Mpl = b.plastic_moment();
    const bool en = p.standard == design_standard::en1993_1_8;
    if (!Mpl) {
        c.status = check_status::not_applicable;
        c.message = "The beam's steel is not given (\"steel\"), so its plastic moment and the joint's strength class "
                    "are not known.";
        return c;
    }
    if (en) {
        // EN 1993-1-8 5.2.3.2(2): nominally pinned if M_j,Rd <= 0.25 x the full-strength resistance.
        if (!j.moment_resistance) {
            c.status = check_status::not_applicable;
            c.message = "No moment resistance is declared for the joint, so it is not classified by strength "
                        "(EN 1993-1-8 5.2.3).";
            return c;
        }
        c.value = *j.moment_resistance / *Mpl;
        c.limit = 0.25;
        const std::string ratio = "M_j,Rd = " + fmt(p, *j.moment_resistance, dims::moment) + " is " +
                                  format_number(*c.value, 3) + " of the beam's M_pl,Rd = " + fmt(p, *Mpl, dims::moment);
        if (*c.value <= 0.25) {
            c.status = check_status::pass;
            c.message = ratio + ", at most 0.25: nominally pinned by strength under EN 1993-1-8 5.2.3.2, provided it has "
                                "the rotation capacity (see joint-ductility-" + to_string(e) + ").";
        } else {
            c.status = check_status::fail;
            c.message = ratio + ", more than 0.25: partial-strength under EN 1993-1-8 5.2.3.3, not nominally pinned. "
                                "Design the beam and the support with the joint's moment, or use a weaker detail.";
        }
        return c;
    }
    // AISC 360-16 Commentary B3: the moment the connection carries at 0.02 rad.
    const double theta = 0.02;
    double m = 0;
    std::string how;
    if (j.behaviour) {
        m = std::abs(end_for(j, j.range.max).law ? end_for(j, j.range.max).law->moment(theta)
                                                  : j.moment_resistance.value_or(*Mpl));
        how = "under its " + to_string(j.behaviour->law) + " law at the upper-bound stiffness";
    } else if (j.range.max.is_rigid()) {
        c.status = check_status::fail;
        c.message = "The upper-bound stiffness is rigid: the connection carries the beam's full moment at any "
                    "rotation, not a simple connection by strength (AISC 360-16 Commentary B3).";
        return c;
    } else {
        m = j.range.max.value() * theta;
        if (j.moment_resistance) m = std::min(m, *j.moment_resistance);
        how = "at the upper-bound stiffness " + stiffness_of(p, j.range.max) +
              (j.moment_resistance ? ", capped at its moment resistance" : "");
    }
    c.value = m / *Mpl;
    c.limit = 0.2;
    const std::string ratio = "At 0.02 rad the connection carries " + fmt(p, m, dims::moment) + " (" + how + "), " +
                              format_number(*c.value, 3) + " of the beam's M_p = " + fmt(p, *Mpl, dims::moment);
    if (*c.value < 0.2) {
        c.status = check_status::pass;
        c.message = ratio + ", less than 0.2: it may be treated as having no flexural strength (AISC 360-16 "
                            "Commentary B3, from memory).";
    } else {
        c.status = check_status::fail;
        c.message = ratio + ", at least 0.2: it has flexural strength (AISC 360-16 Commentary B3, from memory) and is "
                            "not a simple connection by strength.";
    }
    return c;
}

check joint_ductility_check(const project& p, const beam& b, const std::vector<combination_result>& combos, beam_end e)
{
    const joint& j = b.at(e);
    check c;
    c.id = "joint-ductility-" + to_string(e);
    c.dim = dims::angle;
    if (!j.behaviour) {
        c.status = check_status::not_applicable;
        c.message = "The joint has no behaviour (moment-rotation law): as a linear spring it never yields, so its "
                    "ductility is not checked.";
        return c;
    }
    double demand = 0;
    std::string combination;
    for (const auto& r : combos) {
        if (!r.collapse) continue;
        const double rot = std::abs(e == beam_end::start ? r.collapse->rotation_start : r.collapse->rotation_end);
        if (combination.empty() || rot > demand) {
            demand = rot;
            combination = r.comb.name;
        }
    }
    if (combination.empty()) {
        c.status = check_status::not_applicable;
        c.message = b.plastic_moment() ? "No strength combination loads the beam in sagging, so no collapse rotation "
                                         "is found."
                                       : "The beam's steel is not given (\"steel\"), so the rotation at the beam's "
                                         "collapse, the joint's rotation demand, is not known.";
        return c;
    }
    c.value = demand;
    const std::string what = "At the collapse of the beam (its largest sagging moment at M_pl, both joints at their "
                             "lower-bound stiffness, combination " + combination + ") the joint turns " +
                             fmt(p, demand, dims::angle);
    if (!j.rotation_capacity) {
        c.status = check_status::warn;
        c.limit = 0.03;
        c.message = what + "; no rotation capacity is declared (\"rotation_capacity\"). The about 30 mrad a simple "
                           "connection is commonly expected to reach (rule of thumb) is " +
                    std::string(demand <= 0.03 ? "not exceeded" : "EXCEEDED") +
                    ": declare the capacity from tests or a published method to check it.";
        return c;
    }
    c.limit = *j.rotation_capacity;
    if (demand <= *j.rotation_capacity) {
        c.status = check_status::pass;
        c.message = what + ", within its declared rotation capacity " + fmt(p, *j.rotation_capacity, dims::angle) +
                    ": ductile enough to yield as a simple joint should.";
    } else {
        c.status = check_status::fail;
        c.message = what + ", more than its declared rotation capacity " + fmt(p, *j.rotation_capacity, dims::angle) +
                    ": it would fracture before the beam reaches its plastic moment. Use a more ductile detail.";
    }
    return c;
}

}  // namespace pinproof
