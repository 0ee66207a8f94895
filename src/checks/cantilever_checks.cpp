#include "pinproof/checks/cantilever_checks.hpp"

#include <algorithm>
#include <cmath>
#include <string>

#include "pinproof/joints/classification.hpp"

namespace pinproof {
namespace {

struct formatter {
    unit_system system;
    std::string operator()(double v, dimension d) const { return format_quantity(v, d, system); }
};

std::string percent(double fraction) { return format_number(100.0 * fraction, 3) + " %"; }

}  // namespace

double root_rigid_limit(const project& p)
{
    return p.standard == design_standard::en1993_1_8 ? en_rigid_limit(p.frame) : aisc_fully_restrained_limit;
}

check root_class_check(const project& p, const beam& b, const joint_assessment& root)
{
    const formatter fmt{p.units};
    check c;
    c.id = "root-class";
    c.dim = dims::dimensionless;
    c.limit = root_rigid_limit(p);
    c.limit_is_minimum = true;
    const bool en = p.standard == design_standard::en1993_1_8;
    const std::string clause = en ? "EN 1993-1-8 5.2.2.5(1), k_b = " + format_number(*c.limit, 2) + " (" +
                                        to_string(p.frame) + " frame)"
                                  : std::string("AISC 360-16 Commentary B3.4 (fully restrained from 20)");
    const std::string rigid_word = en ? "rigid" : "fully restrained";
    const stiffness lower = root.range.min;
    if (!root.ratio_lower) {
        c.status = check_status::pass;
        c.message = "The root is declared rigid: " + rigid_word + " under " + clause + ".";
        return c;
    }
    c.value = *root.ratio_lower;
    const std::string ratio = "The root's lower-bound stiffness " + fmt(lower.value(), dims::rotational_stiffness) +
                              " gives S*L/EI = " + format_number(*c.value, 3) + " (L = " + fmt(b.span, dims::length) +
                              ", the cantilever's length)";
    if (*c.value >= *c.limit) {
        c.status = check_status::pass;
        c.message = ratio + " >= " + format_number(*c.limit, 2) + ": " + rigid_word + " under " + clause + ".";
    } else {
        c.status = check_status::fail;
        c.message = ratio + " < " + format_number(*c.limit, 2) + ": not " + rigid_word + " under " + clause +
                    ", so the root may not be idealised as fixed. Design the cantilever with the semi-rigid root "
                    "(its tip deflection and rotation are in this report), or stiffen the root.";
    }
    return c;
}

check root_flexibility_check(const project& p, const beam& b, const std::vector<combination_result>& combos)
{
    const formatter fmt{p.units};
    check c;
    c.id = "root-flexibility";
    c.dim = dims::dimensionless;
    c.limit = b.root_flexibility_limit;
    bool found = false;
    double worst = 0, flexible = 0, rigid = 0;
    std::string name;
    // Service combinations where there are any (the deflection that is
    // checked); otherwise every combination: the increase depends on the shape
    // of the load, not its size.
    const bool any_service = std::any_of(combos.begin(), combos.end(),
                                         [](const combination_result& r) { return r.comb.use == limit_state::service; });
    for (const auto& r : combos) {
        if (any_service && r.comb.use != limit_state::service) continue;
        const double d_rigid = std::abs(r.fixed.max_deflection);
        if (!(d_rigid > 0)) continue;
        const auto& range = r.envelope.of(&beam_state::max_deflection);
        const double d = std::max(std::abs(range.min), std::abs(range.max));
        const double increase = std::max(0.0, d / d_rigid - 1.0);
        if (!found || increase > worst) {
            found = true;
            worst = increase;
            flexible = d;
            rigid = d_rigid;
            name = r.comb.name;
        }
    }
    const std::string limit_text = percent(*c.limit) + (b.root_flexibility_is_default
                                                            ? " (the default; give limits.root_flexibility)"
                                                            : " (limits.root_flexibility)");
    if (!found) {
        c.status = check_status::not_applicable;
        c.message = "No combination deflects the cantilever, so the root's effect on its deflection is not found.";
        return c;
    }
    c.value = worst;
    const std::string text = "The root's flexibility raises the deflection by up to " + percent(worst) + " (" +
                             fmt(flexible, dims::length) + " against " + fmt(rigid, dims::length) +
                             " with a rigid root, combination " + name + "), against the limit " + limit_text;
    if (worst <= *c.limit) {
        c.status = check_status::pass;
        c.message = text + ": the root acts as fixed.";
    } else {
        c.status = check_status::fail;
        c.message = text + ": the root does not act as fixed. Design with the semi-rigid root, or stiffen it.";
    }
    return c;
}

check tip_deflection_check(const project& p, const beam& b, const std::vector<combination_result>& combos)
{
    const formatter fmt{p.units};
    check c;
    c.id = "deflection";
    c.dim = dims::length;
    const combination_result* gov = nullptr;
    double worst = 0;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::service) continue;
        const auto& range = r.envelope.of(&beam_state::max_deflection);
        const double d = std::max(std::abs(range.min), std::abs(range.max));
        if (!gov || d > worst) {
            gov = &r;
            worst = d;
        }
    }
    if (!b.deflection) {
        c.status = check_status::not_applicable;
        c.message = "No deflection limit is given (limits.deflection), so the tip deflection is not checked.";
        if (gov) c.value = worst;
        return c;
    }
    c.limit = b.deflection->value(b.span);
    if (!gov) {
        c.status = check_status::not_applicable;
        c.message = "No service combination is given, so the deflection limit " + b.deflection->text + " is not checked.";
        return c;
    }
    c.value = worst;
    const auto& rot = gov->envelope.of(&beam_state::rotation_end);
    const double tip_rotation = std::max(std::abs(rot.min), std::abs(rot.max));
    const std::string text =
        "The service deflection of the cantilever is up to " + fmt(worst, dims::length) + " over the root's stiffness range (" +
        fmt(std::abs(gov->fixed.max_deflection), dims::length) + " with a rigid root), combination " + gov->comb.name +
        "; the tip turns through up to " + fmt(tip_rotation, dims::angle) + " (" +
        fmt(std::abs(gov->fixed.rotation_end), dims::angle) + " with a rigid root). Limit " +
        (b.deflection->span_ratio ? b.deflection->text + " of the cantilever's length = " : std::string()) +
        fmt(*c.limit, dims::length);
    c.status = worst <= *c.limit ? check_status::pass : check_status::fail;
    c.message = text + (c.status == check_status::pass ? "." : ": the cantilever is too flexible.");
    return c;
}

check root_moment_check(const project& p, const beam& b, const std::vector<combination_result>& combos)
{
    const formatter fmt{p.units};
    check c;
    c.id = "root-moment";
    c.dim = dims::moment;
    bool found = false;
    std::string name;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::strength) continue;
        const auto& range = r.envelope.of(&beam_state::moment_start);
        const double m = std::max(std::abs(range.min), std::abs(range.max));
        if (!found || m > *c.value) {
            found = true;
            c.value = m;
            name = r.comb.name;
        }
    }
    if (!found) {
        c.status = check_status::not_applicable;
        c.message = "No strength combination is given, so the root moment is not checked.";
        return c;
    }
    // The cantilever is statically determinate: the root moment is the loads'
    // moment about the root, whatever the root's stiffness.
    const std::string demand = "Under strength combinations the root carries " + fmt(*c.value, dims::moment) +
                               " (combination " + name + "; from statics, whatever the root's stiffness)";
    const auto& mrd = b.start.moment_resistance;
    if (!mrd) {
        c.status = check_status::warn;
        c.message = demand + "; no moment resistance is declared for the root joint (moment_resistance), so it "
                             "cannot be shown to carry it.";
        return c;
    }
    c.limit = *mrd;
    if (*c.value <= *mrd) {
        c.status = check_status::pass;
        c.message = demand + ", within the root joint's declared moment resistance " + fmt(*mrd, dims::moment) + ".";
    } else {
        c.status = check_status::fail;
        c.message = demand + ", more than the root joint's declared moment resistance " + fmt(*mrd, dims::moment) +
                    ": the root would yield and the cantilever has no other load path. Strengthen the root joint.";
    }
    return c;
}

}  // namespace pinproof
