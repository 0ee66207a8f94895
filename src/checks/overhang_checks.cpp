#include "pinproof/checks/overhang_checks.hpp"

#include <algorithm>
#include <cmath>
#include <string>

namespace pinproof {
namespace {

struct formatter {
    unit_system system;
    std::string operator()(double v, dimension d) const { return format_quantity(v, d, system); }
};

}  // namespace

double overhang_limit_length(const beam& b) { return 2.0 * b.overhang; }

check overhang_tip_deflection_check(const project& p, const beam& b, const std::vector<combination_result>& combos)
{
    const formatter fmt{p.units};
    check c;
    c.id = "tip-deflection";
    c.dim = dims::length;
    // The tip's deflection is linear in the start moment, which is monotone
    // in the start stiffness: its extremes over the range are at the corners.
    const combination_result* gov = nullptr;
    double worst = 0, worst_rotation = 0;
    for (const auto& r : combos) {
        if (r.comb.use != limit_state::service) continue;
        double d = 0, rot = 0;
        for (const auto& s : r.corners) {
            d = std::max(d, std::abs(s.tip_deflection));
            rot = std::max(rot, std::abs(s.rotation_tip));
        }
        if (!gov || d > worst) {
            gov = &r;
            worst = d;
            worst_rotation = rot;
        }
    }
    if (!b.deflection) {
        c.status = check_status::not_applicable;
        c.message = "No deflection limit is given (limits.deflection), so the deflection of the overhang's tip is "
                    "not checked.";
        if (gov) c.value = worst;
        return c;
    }
    c.limit = b.deflection->value(overhang_limit_length(b));
    if (!gov) {
        c.status = check_status::not_applicable;
        c.message = "No service combination is given, so the deflection limit " + b.deflection->text +
                    " is not checked at the overhang's tip.";
        return c;
    }
    c.value = worst;
    const std::string text =
        "The service deflection of the overhang's tip is up to " + fmt(worst, dims::length) +
        " (up or down) over the start joint's stiffness range (" +
        fmt(std::abs(gov->pinned.value().tip_deflection), dims::length) + " with a pinned start, " +
        fmt(std::abs(gov->fixed.tip_deflection), dims::length) + " with a fixed start), combination " + gov->comb.name +
        "; the tip turns through up to " + fmt(worst_rotation, dims::angle) + ". Limit " +
        (b.deflection->span_ratio ? b.deflection->text + " taken with twice the overhang, 2 x " +
                                        fmt(b.overhang, dims::length) + " (the tip as a cantilever: common practice, "
                                        "no source) = "
                                  : std::string()) +
        fmt(*c.limit, dims::length);
    c.status = worst <= *c.limit ? check_status::pass : check_status::fail;
    c.message = text + (c.status == check_status::pass ? "." : ": the overhang is too flexible.");
    return c;
}

}  // namespace pinproof
