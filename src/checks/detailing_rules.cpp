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
constexpr double inch = 0.0254;
constexpr double rel = 1e-9;  // a value at its limit passes

// Sources (see docs/method/gap-geometry.md).
constexpr const char* sbe_fin = "Steel Buildings in Europe, Part 5: Joint design, fin plates (MSB05 p. 32)";
constexpr const char* sbe_end =
    "Steel Buildings in Europe, Part 5: Joint design, partial-depth end plates (MSB05 p. 16)";
constexpr const char* sbe_cleats = "SCI P212 Joints in steel construction: simple connections, and Steel Buildings in "
                                   "Europe, Part 5: Joint design, double angle web cleats (MSB05 p. 81)";

// The rules of US practice (AISC 360-16 and the steel manual's Part 10) for a
// project under AISC 360: each standard in its own terms, so an AISC project
// is never held to a European guide's rule, nor the reverse.
constexpr const char* manual_part10 = "AISC Steel Construction Manual, Part 10 (design of simple shear connections)";

// Lengths in the messages are shown in the project's unit system; the rules
// themselves are stated in the units of their source.
struct text {
    unit_system system = unit_system::si;
    design_standard standard = design_standard::en1993_1_8;
    bool us() const { return standard == design_standard::aisc360; }
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

detailing_finding min_gap_us(const text& t, const connection_detail& d)
{
    const std::string rule = "the setback between the beam end and the support should be at least 1/2 in";
    const std::string source = std::string(manual_part10) +
                               ": the usual setback of simple shear connections is 1/2 in, detailed as 3/4 in where "
                               "the beam may be cut short; from memory";
    if (d.type == detail_type::end_plate)
        return not_applicable("min-gap", rule, source,
                              "the flanges of an end-plate beam stand the plate thickness clear of the face; see the "
                              "closure check");
    auto f = at_least(t, "min-gap", d.gap, 0.5 * inch, dims::length, rule, source, "setback as detailed");
    f.message += " (worst case with the tolerance: " + t.length(d.worst_case_gap()) + ")";
    return f;
}

detailing_finding min_gap(const text& t, const connection_detail& d)
{
    if (t.us()) return min_gap_us(t, d);
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
    const std::string source = t.us() ? "common practice, no source: beam lengths and the positions of supports vary "
                                        "by a fraction of an inch (the AISC Code of Standard Practice gives the "
                                        "permitted deviations, from memory)"
                                      : "common practice, no source: beam lengths and the positions of supports vary by "
                                        "a few millimetres (EN 1090-2 gives the permitted deviations)";
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

// US practice: the connection's length at least half the beam's T
// dimension (the web's clear depth between the fillets), for the stability of
// the beam end.
detailing_finding plate_depth_us(const text& t, const connection_detail& d, const section& beam)
{
    const std::string name = d.type == detail_type::fin_plate ? "single plate" : d.type == detail_type::web_cleats
                                                                                      ? "angle"
                                                                                      : fitting_name(d.type);
    const std::string rule = "the " + name +
                             " length should be at least half the beam's T dimension (the clear web depth between "
                             "the fillets), for the stability of the beam end";
    const std::string source = std::string(manual_part10) + "; from memory";
    if (d.type == detail_type::custom) return not_applicable("plate-depth", rule, source, "a custom detail gives no fitting");
    const double T = beam.depth - 2 * (beam.flange_thickness.value_or(0.0) + beam.root_radius.value_or(0.0));
    auto f = at_least(t, "plate-depth", d.plate_depth, 0.5 * T, dims::length, rule, source, name + " length");
    if (!beam.flange_thickness || !beam.root_radius)
        f.message += " (the section gives no flange thickness or fillet: T taken as the overall depth less what is given)";
    return f;
}

detailing_finding plate_depth(const text& t, const connection_detail& d, const section& beam)
{
    if (t.us()) return plate_depth_us(t, d, beam);
    const std::string rule = "the " + fitting_name(d.type) +
                             " depth should be at least 0.6 x the beam depth, for nominal torsional restraint";
    if (d.type == detail_type::custom)
        return not_applicable("plate-depth", rule, sbe_fin, "a custom detail gives no fitting");
    const char* source = d.type == detail_type::fin_plate ? sbe_fin : d.type == detail_type::end_plate ? sbe_end
                                                                                                       : sbe_cleats;
    return at_least(t, "plate-depth", d.plate_depth, 0.6 * beam.depth, dims::length, rule, source,
                    fitting_name(d.type) + " depth");
}

// US practice: the conventional single-plate configuration limits the plate
// or the beam web to d_b/2 + 1/16 in, so that either yields in bearing
// before the bolts shear; double angles are kept thin (5/8 in at most) so
// that their outstanding legs bend and let the beam end rotate.
detailing_finding plate_ductility_us(const text& t, const connection_detail& d, const section& beam)
{
    const double dia = d.bolts.diameter;
    if (d.type == detail_type::fin_plate) {
        const std::string rule = "in the conventional single-plate configuration the plate or the beam web should be no "
                                 "thicker than d_b/2 + 1/16 in, so that one of them deforms in bearing before the "
                                 "bolts shear";
        const std::string source = std::string(manual_part10) + ", conventional configuration; from memory";
        double thinner = d.plate_thickness;
        std::string what = "single plate thickness";
        if (beam.web_thickness && *beam.web_thickness < thinner) {
            thinner = *beam.web_thickness;
            what = "beam web thickness (the plate, " + t.length(d.plate_thickness) + ", is thicker)";
        }
        auto f = at_most(t, "plate-ductility", thinner, dia / 2 + inch / 16, dims::length, rule, source, what);
        if (!beam.web_thickness) f.message += " (the section gives no web thickness; only the plate was checked)";
        return f;
    }
    if (d.type == detail_type::web_cleats) {
        const std::string rule = "double angles should be no thicker than 5/8 in, so that the outstanding legs bend "
                                 "and let the beam end rotate";
        return at_most(t, "plate-ductility", d.plate_thickness, 0.625 * inch, dims::length, rule,
                       std::string(manual_part10) + "; the limit from memory", "angle thickness");
    }
    return not_applicable("plate-ductility", "no thickness-to-bolt rule of US practice is applied to this detail type",
                          std::string(manual_part10) + "; from memory",
                          d.type == detail_type::end_plate
                              ? "no US thickness rule for shear end plates is applied (the European 0.5 d rule is not "
                                "used in an AISC 360 project)"
                              : "a custom detail gives no fitting");
}

detailing_finding plate_ductility(const text& t, const connection_detail& d, const section& beam)
{
    if (t.us()) return plate_ductility_us(t, d, beam);
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
        t.us() ? "bolts should sit in the standard holes of AISC 360 (d + 1/16 in below 1 in, d + 1/8 in from 1 in), "
                 "so that slip and hole bearing give the joint its rotation"
               : "bolts should sit in normal clearance holes, so that slip and hole bearing give the joint its rotation: "
                 "d0 = d + 2 mm up to M24 and d + 3 mm above, or the standard holes of AISC 360 (d + 1/16 in below 1 "
                 "in, d + 1/8 in from 1 in)";
    const std::string source =
        t.us() ? std::string("AISC 360-16 Table J3.3, standard hole dimensions, from memory; ") + manual_part10
               : std::string(sbe_end) + " for the hole sizes; 8.8 bolts untorqued in clearance holes: " + sbe_fin +
                     "; AISC 360-16 Table J3.3, standard hole dimensions, from memory";
    if (d.type == detail_type::custom)
        return not_applicable("bolt-hole-clearance", rule, source, "a custom detail gives no bolts");
    detailing_finding f;
    f.id = "bolt-hole-clearance";
    f.rule = rule;
    f.source = source;
    f.unit = dims::length;
    const double dia = d.bolts.diameter;
    const double normal_en = dia <= 24 * mm + 1e-9 ? 2 * mm : 3 * mm;
    const double normal_aisc = dia < 1 * inch - 1e-9 ? inch / 16 : inch / 8;
    const double c = d.bolts.hole_diameter - dia;
    const auto matches = [&](double normal) { return std::abs(c - normal) <= 0.01 * mm; };
    const double normal = t.us() ? normal_aisc : matches(normal_aisc) && !matches(normal_en) ? normal_aisc : normal_en;
    f.value = c;
    f.limit = normal;
    const std::string found = "hole clearance " + t.length(c) + " (hole " + t.length(d.bolts.hole_diameter) +
                              ", bolt " + t.length(dia) + ")";
    // A US project knows only the standard holes of AISC 360; an EN project
    // also takes a US bolt in its standard hole.
    const bool normal_found = t.us() ? matches(normal_aisc) : matches(normal_en) || matches(normal_aisc);
    const double least = t.us() ? normal_aisc : std::min(normal_en, normal_aisc);
    const double most = t.us() ? normal_aisc : std::max(normal_en, normal_aisc);
    if (normal_found) {
        f.status = finding_status::pass;
        f.message = found + " is the normal clearance: " + rule;
    } else if (c < least) {
        f.status = finding_status::warn;
        f.message = found + " is less than the normal " + t.length(normal) +
                    ": close-fitting bolts make the joint stiffer and less able to rotate than assumed; " + rule;
    } else if (c > most) {
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

// AISC 360-16 Table J3.4, minimum edge distance from the centre of a standard
// hole (from memory): 1 in for 3/4 in bolts, 1 1/8 in for 7/8 in, 1 1/4 in
// for 1 in, 1 1/2 in for 1 1/8 in, 1 5/8 in for 1 1/4 in, 1 1/4 d above.
double aisc_min_edge_distance(double dia)
{
    const double d_in = dia / inch;
    if (d_in <= 0.5 + 1e-6) return 0.75 * inch;
    if (d_in <= 0.625 + 1e-6) return 0.875 * inch;
    if (d_in <= 0.75 + 1e-6) return 1.0 * inch;
    if (d_in <= 0.875 + 1e-6) return 1.125 * inch;
    if (d_in <= 1.0 + 1e-6) return 1.25 * inch;
    if (d_in <= 1.125 + 1e-6) return 1.5 * inch;
    if (d_in <= 1.25 + 1e-6) return 1.625 * inch;
    return 1.25 * dia;
}

detailing_finding bolt_edge_distance_us(const text& t, const connection_detail& d)
{
    const std::string rule = "the edge distance of the plate bolts should be at least the minimum of AISC 360 Table J3.4";
    const std::string source = "AISC 360-16 J3.4 and Table J3.4, minimum edge distance; the values from memory";
    if (d.type != detail_type::fin_plate) return not_applicable("bolt-edge-distance", rule, source, "applies to single plates");
    const double top = d.bolts.first_bolt;
    const double bottom = d.plate_depth - d.bolts.first_bolt - (d.bolts.rows - 1) * d.bolts.pitch;
    auto f = at_least(t, "bolt-edge-distance", std::min(top, bottom), aisc_min_edge_distance(d.bolts.diameter),
                      dims::length, rule, source,
                      std::string("vertical edge distance of the plate bolts (") + (top <= bottom ? "top" : "bottom") +
                          " of the plate)");
    f.message += "; the horizontal edge distance of the plate is not given and not checked";
    return f;
}

detailing_finding bolt_edge_distance(const text& t, const connection_detail& d)
{
    if (t.us()) return bolt_edge_distance_us(t, d);
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

// US practice: the conventional configuration keeps the bolt line within
// 3 1/2 in of the weld line; beyond it the plate is an extended single plate.
detailing_finding long_fin_plate_us(const text& t, const connection_detail& d)
{
    const std::string rule = "in the conventional single-plate configuration the bolt line is at most 3 1/2 in from "
                             "the weld line; beyond it the plate is an extended single plate, to be checked for "
                             "flexure and buckling";
    const std::string source = std::string(manual_part10) + ", conventional and extended configurations; from memory";
    if (d.type != detail_type::fin_plate) return not_applicable("long-fin-plate", rule, source, "applies to single plates");
    return at_most(t, "long-fin-plate", d.gap + d.bolts.bolt_line, 3.5 * inch, dims::length, rule, source,
                   "distance from the weld line (the support face) to the bolt line");
}

detailing_finding long_fin_plate(const text& t, const connection_detail& d)
{
    if (t.us()) return long_fin_plate_us(t, d);
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
    if (t.us())
        return not_applicable("end-plate-thickness", "no thickness range of US practice is applied to shear end plates",
                              std::string(manual_part10) + "; from memory",
                              d.type == detail_type::end_plate
                                  ? "the European guides' 10 or 12 mm rule is not used in an AISC 360 project"
                                  : "applies to end plates");
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
                                                     unit_system units, design_standard standard)
{
    // The findings depend on the detail, the section and the units of their
    // messages alone; a schedule repeats few pairs, so each is worked out once per thread.
    thread_local std::map<std::string, std::vector<detailing_finding>> cache;
    std::string key = detail_key(detail, beam);
    key += static_cast<char>('0' + static_cast<int>(units));
    key += static_cast<char>('0' + static_cast<int>(standard));
    const auto it = cache.find(key);
    if (it != cache.end()) return it->second;
    if (cache.size() > 1024) cache.clear();
    const text t{units, standard};
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
