#include "pinproof/checks/detailing_rules.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <map>
#include <string>
#include <utility>

#include "model/detail_key.hpp"

namespace pinproof {
namespace {

constexpr double mm = 1e-3;
constexpr double rel = 1e-9;  // a value at its limit passes

// Sources (see docs/method/gap-geometry.md).
constexpr const char* sbe_fin = "Steel Buildings in Europe, Part 5: Joint design, fin plates (MSB05 p. 32)";
constexpr const char* sbe_end =
    "Steel Buildings in Europe, Part 5: Joint design, partial-depth end plates (MSB05 p. 16)";
constexpr const char* sbe_cleats = "SCI P212 Joints in steel construction: simple connections, and Steel Buildings in "
                                   "Europe, Part 5: Joint design, double angle web cleats (MSB05 p. 81)";

// Lengths in the messages are shown in the project's unit system; the rules
// themselves are stated in the units of their source.
struct text {
    unit_system system = unit_system::si;
    std::string length(double v) const { return format_quantity(v, dims::length, system); }
    std::string ratio(double v) const { return format_quantity(v, dims::dimensionless, system, 3); }
};

std::string fitting_name(detail_type t)
{
    switch (t) {
    case detail_type::fin_plate: return "fin plate";
    case detail_type::web_cleats: return "cleat";
    case detail_type::end_plate: return "end plate";
    case detail_type::custom: return "fitting";
    }
    return "fitting";
}

detailing_finding not_applicable(std::string id, std::string rule, std::string source, std::string why)
{
    detailing_finding f;
    f.id = std::move(id);
    f.status = finding_status::not_applicable;
    f.rule = std::move(rule);
    f.source = std::move(source);
    f.message = std::move(why);
    return f;
}

// A rule with a limit: `value` against `limit`, a bound from below (at least)
// or from above (at most); a value at its limit passes.
enum class bound { at_least, at_most };

detailing_finding limited(const text& t, bound kind, std::string id, double value, double limit, dimension unit, std::string rule,
                          std::string source, const std::string& what)
{
    detailing_finding f;
    f.id = std::move(id);
    f.value = value;
    f.limit = limit;
    f.unit = unit;
    f.rule = std::move(rule);
    f.source = std::move(source);
    const bool below = kind == bound::at_least;
    const bool ok = below ? value >= limit * (1 - rel) : value <= limit * (1 + rel);
    f.status = ok ? finding_status::pass : finding_status::warn;
    const auto show = [&](double v) { return unit == dims::length ? t.length(v) : t.ratio(v); };
    const char* verb = below ? (ok ? " is at least " : " is less than ") : (ok ? " is at most " : " exceeds ");
    f.message = what + " " + show(value) + verb + show(limit) + ": " + f.rule;
    return f;
}

detailing_finding at_least(const text& t, std::string id, double value, double limit, dimension unit, std::string rule,
                           std::string source, const std::string& what)
{
    return limited(t, bound::at_least, std::move(id), value, limit, unit, std::move(rule), std::move(source), what);
}

detailing_finding at_most(const text& t, std::string id, double value, double limit, dimension unit, std::string rule,
                          std::string source, const std::string& what)
{
    return limited(t, bound::at_most, std::move(id), value, limit, unit, std::move(rule), std::move(source), what);
}

detailing_finding min_gap(const text& t, const connection_detail& d)
{
    const std::string rule = "the gap between the beam end and the support face should be at least 10 mm";
    const std::string source =
        "10 mm is the usual gap of fin plate and cleat joints (SCI P212, from memory); the deep, many-row fin plates "
        "of the P212 tables need 20 mm (SCI P212)";
    if (d.type == detail_type::end_plate)
        return not_applicable("min-gap", rule, source,
                              "the flanges of an end-plate beam stand the plate thickness clear of the face; see "
                              "end-plate-thickness and the closure check");
    auto f = at_least(t, "min-gap", d.gap, 10 * mm, dims::length, rule, source, "gap as detailed");
    f.message += " (worst case with the tolerance: " + t.length(d.worst_case_gap()) + ")";
    return f;
}

// A tolerance left out is 0: the check then takes the gap as detailed as the
// worst case, which fabrication and erection rarely deliver.
detailing_finding gap_tolerance(const text& t, const connection_detail& d)
{
    const std::string rule = "the gap tolerance (fabrication and erection allowance) should be given";
    const std::string source = "common practice, no source: beam lengths and the positions of supports vary by a "
                               "few millimetres (EN 1090-2 gives the permitted deviations)";
    detailing_finding f;
    f.id = "gap-tolerance";
    f.rule = rule;
    f.source = source;
    f.value = d.gap_tolerance;
    f.unit = dims::length;
    if (d.gap_tolerance_given) {
        f.status = finding_status::pass;
        f.message = "the gap tolerance is given: " + t.length(d.gap_tolerance) + ", worst-case gap " +
                    t.length(d.worst_case_gap());
    } else {
        f.status = finding_status::warn;
        f.message = "no gap_tolerance is given, so it is taken as 0 and the end-gap check uses the gap as detailed (" +
                    t.length(d.gap) + ") as the worst case; give the fabrication and erection allowance";
    }
    return f;
}

detailing_finding plate_depth(const text& t, const connection_detail& d, const section& beam)
{
    const std::string rule = "the " + fitting_name(d.type) +
                             " depth should be at least 0.6 x the beam depth, for nominal torsional restraint";
    if (d.type == detail_type::custom)
        return not_applicable("plate-depth", rule, sbe_fin, "a custom detail gives no fitting");
    const char* source = d.type == detail_type::fin_plate ? sbe_fin : d.type == detail_type::end_plate ? sbe_end
                                                                                                       : sbe_cleats;
    return at_least(t, "plate-depth", d.plate_depth, 0.6 * beam.depth, dims::length, rule, source,
                    fitting_name(d.type) + " depth");
}

detailing_finding plate_ductility(const text& t, const connection_detail& d, const section& beam)
{
    const double dia = d.bolts.diameter;
    if (d.type == detail_type::fin_plate) {
        const bool s355 = d.grade == plate_grade::s355;
        const double k = s355 ? 0.42 : 0.5;
        const std::string rule =
            std::string("for ductility (bearing deformation before bolt shear failure), the fin plate or the beam web "
                        "should be no thicker than ") +
            (s355 ? "0.42" : "0.5") + " x the bolt diameter; the rule assumes " + (s355 ? "S355" : "S275") + " steel";
        const std::string source = s355 ? std::string(sbe_fin) + " for 0.5 d in S275; 0.42 d for S355 from memory"
                                        : std::string(sbe_fin) + "; the ductility reason from memory";
        // The thinner of the two decides: either one deforming in bearing gives the rotation.
        double thinner = d.plate_thickness;
        std::string what = "fin plate thickness";
        if (beam.web_thickness && *beam.web_thickness < thinner) {
            thinner = *beam.web_thickness;
            what = "beam web thickness (the fin plate, " + t.length(d.plate_thickness) + ", is thicker)";
        }
        auto f = at_most(t, "plate-ductility", thinner, k * dia, dims::length, rule, source, what);
        if (!beam.web_thickness) f.message += " (the section gives no web thickness; only the plate was checked)";
        return f;
    }
    if (d.type == detail_type::end_plate) {
        const std::string rule = "for ductility the end plate should be no thicker than about 0.5 x the bolt diameter "
                                 "(10 mm with M20, 12 mm with M24); the rule assumes S275 steel";
        return at_most(t, "plate-ductility", d.plate_thickness, 0.5 * dia, dims::length, rule,
                       "SCI P358 Simple joints to Eurocode 3, end plate thickness for the bolt size; from memory",
                       "end plate thickness");
    }
    return not_applicable("plate-ductility", "no thickness-to-bolt rule is applied to this detail type",
                          "common practice, no source",
                          d.type == detail_type::web_cleats
                              ? "thin cleats and large cross-centres give flexibility (Steel Buildings in Europe, Part 5); no limit applied"
                              : "a custom detail gives no fitting");
}

detailing_finding bolt_hole_clearance(const text& t, const connection_detail& d)
{
    const std::string rule =
        "bolts should sit in normal clearance holes, so that slip and hole bearing give the joint its rotation: "
        "d0 = d + 2 mm up to M24 and d + 3 mm above, or the standard holes of AISC 360 (d + 1/16 in below 1 in, "
        "d + 1/8 in from 1 in)";
    const std::string source = std::string(sbe_end) + " for the hole sizes; 8.8 bolts untorqued in clearance holes: " +
                               sbe_fin + "; AISC 360-16 Table J3.3, standard hole dimensions, from memory";
    if (d.type == detail_type::custom)
        return not_applicable("bolt-hole-clearance", rule, source, "a custom detail gives no bolts");
    detailing_finding f;
    f.id = "bolt-hole-clearance";
    f.rule = rule;
    f.source = source;
    f.unit = dims::length;
    constexpr double inch = 0.0254;
    const double dia = d.bolts.diameter;
    const double normal_en = dia <= 24 * mm + 1e-9 ? 2 * mm : 3 * mm;
    const double normal_aisc = dia < 1 * inch - 1e-9 ? inch / 16 : inch / 8;
    const double c = d.bolts.hole_diameter - dia;
    const auto matches = [&](double normal) { return std::abs(c - normal) <= 0.01 * mm; };
    const double normal = matches(normal_aisc) && !matches(normal_en) ? normal_aisc : normal_en;
    f.value = c;
    f.limit = normal;
    const std::string found = "hole clearance " + t.length(c) + " (hole " + t.length(d.bolts.hole_diameter) +
                              ", bolt " + t.length(dia) + ")";
    if (matches(normal_en) || matches(normal_aisc)) {
        f.status = finding_status::pass;
        f.message = found + " is the normal clearance: " + rule;
    } else if (c < std::min(normal_en, normal_aisc)) {
        f.status = finding_status::warn;
        f.message = found + " is less than the normal " + t.length(normal) +
                    ": close-fitting bolts make the joint stiffer and less able to rotate than assumed; " + rule;
    } else if (c > std::max(normal_en, normal_aisc)) {
        f.status = finding_status::warn;
        f.message = found + " is more than the normal " + t.length(normal) +
                    ": oversize holes lie outside the standard detail and slip more; " + rule;
    } else {
        f.status = finding_status::warn;
        f.message = found + " is neither normal clearance (" + t.length(normal_en) + " or " + t.length(normal_aisc) +
                    "); " + rule;
    }
    return f;
}

detailing_finding bolt_edge_distance(const text& t, const connection_detail& d)
{
    const std::string rule = "the end and edge distances of the fin plate bolts should be at least 2 x the bolt diameter";
    if (d.type != detail_type::fin_plate)
        return not_applicable("bolt-edge-distance", rule, sbe_fin, "applies to fin plates");
    const double top = d.bolts.first_bolt;
    const double bottom = d.plate_depth - d.bolts.first_bolt - (d.bolts.rows - 1) * d.bolts.pitch;
    const double e = std::min(top, bottom);
    auto f = at_least(t, "bolt-edge-distance", e, 2 * d.bolts.diameter, dims::length, rule, sbe_fin,
                      std::string("vertical end distance of the fin plate bolts (") +
                          (top <= bottom ? "top" : "bottom") + " of the plate)");
    f.message += "; the horizontal edge distance of the plate is not given and not checked";
    return f;
}

detailing_finding long_fin_plate(const text& t, const connection_detail& d)
{
    const std::string rule = "a fin plate is long when tp / z < 0.15, z being the distance from the support face to "
                             "the bolt line; a long fin plate must be checked for lateral-torsional buckling";
    const std::string source = std::string(sbe_fin) + "; z as the support face to bolt line distance from memory";
    if (d.type != detail_type::fin_plate)
        return not_applicable("long-fin-plate", rule, source, "applies to fin plates");
    const double z = d.gap + d.bolts.bolt_line;
    auto f = at_least(t, "long-fin-plate", d.plate_thickness / z, 0.15, dims::dimensionless, rule, source,
                      "the ratio tp / z = " + t.length(d.plate_thickness) + " / " + t.length(z) + " =");
    return f;
}

detailing_finding end_plate_thickness(const text& t, const connection_detail& d)
{
    const std::string rule = "a partial-depth end plate should be 10 or 12 mm thick; less than 8 mm is not advised";
    if (d.type != detail_type::end_plate)
        return not_applicable("end-plate-thickness", rule, sbe_end, "applies to end plates");
    return at_least(t, "end-plate-thickness", d.plate_thickness, 8 * mm, dims::length, rule, sbe_end,
                    "end plate thickness");
}

}  // namespace

std::string to_string(finding_status s)
{
    switch (s) {
    case finding_status::pass: return "pass";
    case finding_status::warn: return "warn";
    case finding_status::not_applicable: return "not-applicable";
    }
    return "not-applicable";
}

std::vector<detailing_finding> check_detailing_rules(const connection_detail& detail, const section& beam,
                                                     unit_system units)
{
    // The findings depend on the detail, the section and the units of their
    // messages alone; a schedule repeats few pairs, so each is worked out once per thread.
    thread_local std::map<std::string, std::vector<detailing_finding>> cache;
    std::string key = detail_key(detail, beam);
    key += static_cast<char>('0' + static_cast<int>(units));
    const auto it = cache.find(key);
    if (it != cache.end()) return it->second;
    if (cache.size() > 1024) cache.clear();
    const text t{units};
    std::vector<detailing_finding> findings{
        min_gap(t, detail),           gap_tolerance(t, detail),       plate_depth(t, detail, beam),
        plate_ductility(t, detail, beam),
        bolt_hole_clearance(t, detail), bolt_edge_distance(t, detail), long_fin_plate(t, detail),
        end_plate_thickness(t, detail)};
    // Each message is a sentence: it starts with a capital and ends with a full stop.
    for (auto& f : findings) {
        if (f.message.empty()) continue;
        f.message[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(f.message[0])));
        if (f.message.back() != '.') f.message += '.';
    }
    return cache.emplace(std::move(key), std::move(findings)).first->second;
}

}  // namespace pinproof
