// Reading a project file (docs/file-format.md). Every problem is collected
// with its JSON pointer so that one run reports all of them.
#include <nlohmann/json.hpp>

#include <cctype>
#include <cmath>
#include <fstream>
#include <set>
#include <sstream>

#include "io/json_document.hpp"
#include "io/json_fields.hpp"
#include "pinproof/core/input_file.hpp"
#include "io/plausibility.hpp"
#include "pinproof/model/connection_detail.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/model/stiffness_distribution.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/io/joint_behaviour_input.hpp"
#include "pinproof/io/stiffness_distribution_input.hpp"
#include "pinproof/io/connection_detail_input.hpp"

namespace pinproof {
namespace {

using json = nlohmann::json;
using namespace json_fields;

// Default moduli when a beam gives no E: EN 1993-1-1 3.2.6(1) E = 210 000 MPa;
// AISC 360-16 Symbols / B2: E = 29 000 ksi.
constexpr double default_E_en = 210e9;
constexpr double default_E_aisc = 29000.0 * 6894757.293168361;

using namespace plausibility;  // the ranges of every input path (io/plausibility.hpp)

// A plain decimal number (no unit), by the units parser's number rules: no
// hexadecimal, nan or inf.
std::optional<double> plain_number(const std::string& text)
{
    try {
        const pinproof::quantity q = parse_quantity(text);
        if (q.dim != dims::dimensionless) return std::nullopt;
        return q.value;
    } catch (const std::invalid_argument&) {
        return std::nullopt;
    }
}

struct reader {
    problem_list& problems;
    unit_system system = unit_system::neutral;

    std::optional<double> q(const json& obj, const std::string& ptr, const std::string& key, dimension d,
                            bool required)
    {
        return quantity_field(obj, ptr, key, d, required, problems, &system);
    }

    std::optional<double> positive(const json& obj, const std::string& ptr, const std::string& key, dimension d,
                                   bool required)
    {
        auto v = q(obj, ptr, key, d, required);
        if (v && !(*v > 0)) {
            problems.add(child(ptr, key), "expected a positive " + describe(d) + ", found " + shown(obj.at(key)));
            return std::nullopt;
        }
        return v;
    }

    // A positive quantity that must also lie in a plausible range.
    std::optional<double> plausible(const json& obj, const std::string& ptr, const std::string& key, dimension d,
                                    bool required, plausible_range r)
    {
        auto v = positive(obj, ptr, key, d, required);
        if (!v) return v;
        if (auto m = outside(*v, r, d, system, shown(obj.at(key)))) {
            problems.add(child(ptr, key), *m);
            return std::nullopt;
        }
        return v;
    }

    // A load value whose magnitude must stay below plausible_load_magnitude.
    std::optional<double> load_value(const json& obj, const std::string& ptr, const std::string& key, dimension d)
    {
        auto v = q(obj, ptr, key, d, true);
        if (!v) return v;
        if (auto m = load_too_large(*v, d, system, shown(obj.at(key)))) {
            problems.add(child(ptr, key), *m);
            return std::nullopt;
        }
        return v;
    }

    std::optional<section> read_section(const json& b, const std::string& ptr)
    {
        auto it = b.find("section");
        const std::string sp = child(ptr, "section");
        if (it == b.end()) {
            problems.add(sp, "missing required field \"section\" (a catalogue name such as \"IPE 300\", or an "
                             "object with at least I and depth)");
            return std::nullopt;
        }
        if (it->is_string()) {
            const auto name = it->get<std::string>();
            auto s = find_catalogue_section(name);
            if (!s) {
                problems.add(sp, "expected a section name from the built-in catalogue (IPE 80 to IPE 600, HE 100 A "
                                 "to HE 600 A, HE 100 B to HE 600 B, W shapes such as W18x35; pinproof sections "
                                 "lists them) or an object with I and depth, " + unknown_section_text(name));
            }
            return s;
        }
        if (!it->is_object()) {
            problems.add(sp, "expected a section name or an object with I and depth, found " + shown(*it));
            return std::nullopt;
        }
        const json& o = *it;
        reject_unknown_keys(o, sp, {"name", "I", "depth", "area", "flange_width", "flange_thickness",
                                    "web_thickness", "root_radius"},
                            problems);
        section s;
        s.name = string_field(o, sp, "name", false, problems).value_or("user-defined");
        auto I = plausible(o, sp, "I", dims::second_moment, true, plausible_I);
        auto depth = plausible(o, sp, "depth", dims::length, true, plausible_section_size);
        s.area = plausible(o, sp, "area", dims::area, false, plausible_section_area);
        s.flange_width = plausible(o, sp, "flange_width", dims::length, false, plausible_section_size);
        s.flange_thickness = plausible(o, sp, "flange_thickness", dims::length, false, plausible_section_size);
        s.web_thickness = plausible(o, sp, "web_thickness", dims::length, false, plausible_section_size);
        s.root_radius = q(o, sp, "root_radius", dims::length, false);
        if (s.root_radius && !(*s.root_radius <= plausible_section_size.hi)) {
            problems.add(child(sp, "root_radius"), "expected a root radius of at most " +
                                                       format_quantity(plausible_section_size.hi, dims::length, system) +
                                                       ", found " + shown(o.at("root_radius")));
            s.root_radius.reset();
        }
        if (s.root_radius && *s.root_radius < 0) {
            problems.add(child(sp, "root_radius"), "expected a root radius of zero or more, found " +
                                                       shown(o.at("root_radius")));
        }
        if (depth && s.flange_thickness && 2 * *s.flange_thickness >= *depth)
            problems.add(child(sp, "flange_thickness"), "expected two flange thicknesses to be less than the depth");
        if (!I || !depth) return std::nullopt;
        s.I = *I;
        s.depth = *depth;
        return s;
    }

    // "rigid", a rotational stiffness, or a multiple of EI/L such as "0.5 EI/L".
    std::optional<stiffness> read_stiffness(const json& v, const std::string& ptr, std::optional<double> EI_over_L)
    {
        if (v.is_string()) {
            std::string t = v.get<std::string>();
            while (!t.empty() && std::isspace(static_cast<unsigned char>(t.back()))) t.pop_back();
            std::size_t b = 0;
            while (b < t.size() && std::isspace(static_cast<unsigned char>(t[b]))) ++b;
            t = t.substr(b);
            if (t == "rigid") return stiffness::rigid();
            const auto relative = read_EI_over_L_multiple(v, ptr, problems);
            if (relative.relative) {
                if (!relative.multiple) return std::nullopt;
                const double k = *relative.multiple;
                if (!EI_over_L) return std::nullopt;  // span, E or I already reported
                if (!(k * *EI_over_L <= plausible_stiffness)) {
                    problems.add(ptr, "expected a rotational stiffness of at most " +
                                          format_quantity(plausible_stiffness, dims::rotational_stiffness, system) +
                                          " (write \"rigid\" for a fixed end), found \"" + v.get<std::string>() + "\"");
                    return std::nullopt;
                }
                return stiffness::spring(k * *EI_over_L);
            }
        }
        const auto s = absolute_stiffness(v, ptr, problems, &system);
        if (!s) return std::nullopt;
        if (*s > plausible_stiffness) {
            problems.add(ptr, "expected a rotational stiffness of at most " +
                                  format_quantity(plausible_stiffness, dims::rotational_stiffness, system) +
                                  " (write \"rigid\" for a fixed end), found " + shown(v));
            return std::nullopt;
        }
        return stiffness::spring(*s);
    }

    // What the joint passes to its support (checks/support_demand.hpp): the
    // eccentricity of the reaction, the column and the support's resistance.
    void read_support(const json& j, const std::string& ptr, joint& out)
    {
        if (auto e = q(j, ptr, "support_eccentricity", dims::length, false)) {
            if (*e < 0 || *e > plausible_support_eccentricity)
                problems.add(child(ptr, "support_eccentricity"),
                             "expected an eccentricity of the reaction from 0 to " +
                                 format_quantity(plausible_support_eccentricity, dims::length, system) + ", found " +
                                 shown(j.at("support_eccentricity")));
            else out.support_eccentricity = *e;
        }
        if (auto m = q(j, ptr, "support_moment_resistance", dims::moment, false)) {
            if (!(*m > 0))
                problems.add(child(ptr, "support_moment_resistance"),
                             "expected a positive moment resistance of the support, found " +
                                 shown(j.at("support_moment_resistance")));
            else out.support_moment_resistance = *m;
        }
        auto it = j.find("column");
        if (it == j.end()) return;
        const std::string cp = child(ptr, "column");
        if (!expect_object(*it, cp, problems)) return;
        reject_unknown_keys(*it, cp, {"section", "length_above", "length_below"}, problems);
        auto sec = read_section(*it, cp);
        // A length of 0 above is a roof: the column stops at the joint.
        const auto length = [&](const char* key) -> std::optional<double> {
            auto v = q(*it, cp, key, dims::length, true);
            if (!v) return v;
            if (*v == 0.0 && std::string(key) == "length_above") return v;
            if (auto m = outside(*v, plausible_column_length, dims::length, system, shown(it->at(key)))) {
                problems.add(child(cp, key), *m + (std::string(key) == "length_above" ? " (0 for a roof)" : ""));
                return std::nullopt;
            }
            return v;
        };
        auto above = length("length_above");
        auto below = length("length_below");
        const json* detail = j.contains("detail") && j.at("detail").is_object() ? &j.at("detail") : nullptr;
        if (detail && detail->contains("support") && detail->at("support") == "beam-web")
            problems.add(cp, "expected no column for a joint on the web of a supporting beam (its detail's support is "
                             "\"beam-web\": the moment twists that beam), found a column");
        if (sec && above && below) out.column = joint_column{*sec, *above, *below};
    }

    std::optional<joint> read_joint(const json& j, const std::string& ptr, std::optional<double> EI_over_L,
                                    const std::optional<section>& sec, design_standard standard)
    {
        if (j.is_string()) {
            problems.add(ptr, "expected an inline joint object, found the detail id \"" + j.get<std::string>() +
                                  "\": a detail id needs a detail catalogue (--details FILE, or a \"details\" key "
                                  "naming the catalogue file)");
            return std::nullopt;
        }
        if (!expect_object(j, ptr, problems)) return std::nullopt;
        reject_unknown_keys(j, ptr, {"stiffness", "stiffness_distribution", "moment_resistance", "description", "detail",
                                     "support_rotation", "stiffness_scatter",
                                     "contact_stiffness", "designed_for_closure", "dependable_lower_bound", "behaviour",
                                     "rotation_capacity", "support_eccentricity", "column", "support_moment_resistance"},
                            problems);
        joint out;
        const std::string sp = child(ptr, "stiffness");
        auto it = j.find("stiffness");
        bool ok = true;
        if (j.contains("behaviour"))
            out.behaviour = read_joint_behaviour(j.at("behaviour"), child(ptr, "behaviour"), standard, problems, &system);
        // A multilinear curve gives the stiffness itself (also when the curve has a mistake, reported already).
        const auto* bh = j.contains("behaviour") && j.at("behaviour").is_object() ? &j.at("behaviour") : nullptr;
        const bool curve_gives_stiffness = bh && bh->contains("law") && bh->at("law") == "multilinear";
        std::optional<stiffness_distribution> dist;
        if (j.contains("stiffness_distribution"))
            dist = read_stiffness_distribution(j.at("stiffness_distribution"), child(ptr, "stiffness_distribution"),
                                               EI_over_L.value_or(0.0), problems);
        out.distribution = dist;
        out.stiffness_from_detail = it != j.end() && it->is_string() && *it == "from-detail";
        out.moment_resistance_from_detail =
            j.contains("moment_resistance") && j.at("moment_resistance").is_string() && j.at("moment_resistance") == "from-detail";
        if (out.stiffness_from_detail) {
            // The range is set once the joint is derived (joints/joint_from_detail.hpp).
            if (curve_gives_stiffness) {
                problems.add(sp, "expected no \"stiffness\" with a multilinear law (the curve gives the stiffness), "
                                 "found \"from-detail\"");
                ok = false;
            }
            if (dist) {
                problems.add(sp, "expected either \"from-detail\" or a \"stiffness_distribution\", found both: the "
                                 "derived stiffness and its scatter replace a distribution");
                ok = false;
            }
        } else if (curve_gives_stiffness) {
            // A multilinear curve is the joint's stiffness itself: the slope of its first segment.
            if (it != j.end()) {
                problems.add(sp, "expected no \"stiffness\" with a multilinear law (the curve gives the stiffness: "
                                 "the slope of its first segment), found " + shown(*it));
                ok = false;
            } else if (!out.behaviour) {
                ok = false;
            } else {
                const auto& first = out.behaviour->points.front();
                out.range = {stiffness::spring(first.second / first.first), stiffness::spring(first.second / first.first)};
            }
        } else if (it == j.end() && dist) {
            // Only a distribution: the range is its 5 % to 95 % fractiles.
            const auto f = dist->fractile_range();
            out.range = {stiffness::spring(f.p05), stiffness::spring(f.p95)};
        } else if (it == j.end()) {
            if (!j.contains("stiffness_distribution"))
                problems.add(sp, "missing required field \"stiffness\" (an object {\"min\": ..., \"max\": ...} of "
                                 "rotational stiffnesses, \"rigid\" or multiples of EI/L), or a "
                                 "\"stiffness_distribution\"");
            ok = false;
        } else if (it->is_object()) {
            const auto [lo, hi] = read_bounds<stiffness>(
                *it, sp, [&](const json& v, const std::string& at) { return read_stiffness(v, at, EI_over_L); },
                problems);
            if (lo && hi && *hi < *lo) {
                problems.add(child(sp, "min"), "expected min not above max, found min " + shown(it->at("min")) +
                                                   " above max " + shown(it->at("max")));
                ok = false;
            }
            ok = ok && lo && hi;
            if (ok) out.range = {*lo, *hi};
        } else {
            // A single value: the stiffness is known exactly.
            auto s = read_stiffness(*it, sp, EI_over_L);
            ok = s.has_value();
            if (ok) out.range = {*s, *s};
        }
        read_stiffness_scatter(j, ptr, out);
        auto mr = out.moment_resistance_from_detail ? std::nullopt : q(j, ptr, "moment_resistance", dims::moment, false);
        if (mr && *mr < 0)
            problems.add(child(ptr, "moment_resistance"), "expected a moment resistance of zero or more, found " +
                                                              shown(j.at("moment_resistance")));
        else out.moment_resistance = mr;
        out.description = string_field(j, ptr, "description", false, problems).value_or("");
        if (j.contains("detail")) {
            // The reader needs the beam's section; a bad section is reported already.
            if (sec) out.detail = read_connection_detail(j.at("detail"), child(ptr, "detail"), *sec, problems, standard);
        }
        check_derivable(j, ptr, out, standard);
        auto sr = q(j, ptr, "support_rotation", dims::angle, false);
        if (sr && *sr > plausible_support_rotation)
            problems.add(child(ptr, "support_rotation"), "expected a support rotation of at most " +
                                                             format_quantity(plausible_support_rotation, dims::angle, system) +
                                                             ", found " + shown(j.at("support_rotation")));
        else if (sr && *sr < 0)
            problems.add(child(ptr, "support_rotation"), "expected a support rotation of zero or more, found " +
                                                             shown(j.at("support_rotation")));
        else if (sr) out.support_rotation = *sr;
        if (j.contains("contact_stiffness")) {
            auto cs = read_stiffness(j.at("contact_stiffness"), child(ptr, "contact_stiffness"), EI_over_L);
            if (cs) out.contact_stiffness = *cs;
        }
        out.designed_for_closure = bool_field(j, ptr, "designed_for_closure", false, problems).value_or(false);
        out.dependable_lower_bound = bool_field(j, ptr, "dependable_lower_bound", false, problems).value_or(false);
        read_support(j, ptr, out);
        if (auto rc = q(j, ptr, "rotation_capacity", dims::angle, false)) {
            if (!(*rc > 0) || *rc > 0.5)
                problems.add(child(ptr, "rotation_capacity"), "expected a rotation capacity above 0 and at most 0.5 rad, "
                                                              "found " + shown(j.at("rotation_capacity")));
            else out.rotation_capacity = *rc;
        }
        if (out.behaviour && ok) check_behaviour_fits(out, ptr, problems, system);
        if (!ok) return std::nullopt;
        return out;
    }

    // "stiffness_scatter": {"min": 0.5, "max": 2}, the factors on the derived
    // S_j,ini that bound the joint's range; only with "stiffness": "from-detail".
    void read_stiffness_scatter(const json& j, const std::string& ptr, joint& out)
    {
        if (!j.contains("stiffness_scatter")) return;
        const std::string p = child(ptr, "stiffness_scatter");
        if (!out.stiffness_from_detail) {
            problems.add(p, "applies only to \"stiffness\": \"from-detail\" (it bounds the derived stiffness), found "
                            "a stiffness given directly");
            return;
        }
        const json& v = j.at("stiffness_scatter");
        if (!expect_object(v, p, problems)) return;
        reject_unknown_keys(v, p, {"min", "max"}, problems);
        const auto lo = number_field(v, p, "min", true, problems);
        const auto hi = number_field(v, p, "max", true, problems);
        if (lo && !(*lo > 0 && *lo <= 1))
            problems.add(child(p, "min"), "expected a factor above 0 and at most 1 on the derived stiffness, found " +
                                              shown(v.at("min")));
        else if (hi && !(*hi >= 1 && *hi <= 100))
            problems.add(child(p, "max"), "expected a factor of at least 1 and at most 100 on the derived stiffness, "
                                          "found " + shown(v.at("max")));
        else if (lo && hi)
            out.stiffness_scatter = std::make_pair(*lo, *hi);
    }

    // "from-detail" needs a detail the library derives: a fin plate, within the
    // code's edge-distance rules; an AISC 360 project derives the moment
    // resistance only (AISC 360 gives no component stiffness).
    void check_derivable(const json& j, const std::string& ptr, const joint& out, design_standard standard)
    {
        if (!out.stiffness_from_detail && !out.moment_resistance_from_detail) return;
        const std::string field = out.stiffness_from_detail ? "stiffness" : "moment_resistance";
        if (!j.contains("detail")) {
            problems.add(child(ptr, field), "\"from-detail\" needs the joint's \"detail\" (a fin plate), found none");
            return;
        }
        if (!out.detail || !j.at("detail").is_object()) return;  // reported already
        const std::string dp = child(ptr, "detail");
        const bool en_end_plate = out.detail->type == detail_type::end_plate && standard != design_standard::aisc360;
        if (out.detail->type != detail_type::fin_plate && !en_end_plate) {
            problems.add(child(dp, "type"), "\"from-detail\" derives fin plates (EN 1993-1-8 components; AISC 360 "
                                            "single plates) and, in EN 1993-1-8 projects, end plates (AISC 360 gives "
                                            "no component method for an end plate's moment); give the " + field +
                                                " of a \"" + to_string(out.detail->type) + "\" joint directly");
            return;
        }
        if (out.stiffness_from_detail && standard == design_standard::aisc360)
            problems.add(child(ptr, "stiffness"), "expected a stiffness range in an AISC 360 project: AISC 360 gives no "
                                                  "component stiffness for a single plate, so \"from-detail\" derives "
                                                  "the moment resistance only; found \"from-detail\"");
        check_fin_plate_derivable(*out.detail, dp, standard, problems, system);
    }

    // `span` is the length loads may lie on: the span, or for an overhang
    // (`whole_length`) the span plus the overhang, positions from the start.
    std::vector<load> read_loads(const json& b, const std::string& ptr, std::optional<double> span,
                                 bool whole_length = false)
    {
        std::vector<load> out;
        const std::string lp = child(ptr, "loads");
        auto it = b.find("loads");
        if (it == b.end()) {
            problems.add(lp, "missing required field \"loads\" (an array of loads)");
            return out;
        }
        if (!it->is_array() || it->empty()) {
            problems.add(lp, "expected a non-empty array of loads, found " + shown(*it));
            return out;
        }
        for (std::size_t i = 0; i < it->size(); ++i) {
            const json& l = (*it)[i];
            const std::string p = child(lp, i);
            if (!expect_object(l, p, problems)) continue;
            auto c = string_field(l, p, "case", true, problems);
            auto kind = choice_field(l, p, "kind", {"point", "udl", "linear", "moment"}, true, problems);
            if (c && c->empty()) problems.add(child(p, "case"), "expected a load case name, found an empty string");
            if (!kind) continue;
            load ld;
            ld.load_case = c.value_or("");
            bool ok = c.has_value();
            const auto position = [&](const std::string& key, bool required, double fallback) -> std::optional<double> {
                auto x = q(l, p, key, dims::length, required);
                if (!x) return l.contains(key) || required ? std::nullopt : std::optional<double>(fallback);
                if (!span) return x;
                const auto on_span = position_on_span(*x, *span);
                if (!on_span && whole_length)
                    problems.add(child(p, key), "expected a position on the beam, 0 to " +
                                                    format_quantity(*span, dims::length, system) +
                                                    " from the start (the span plus the overhang: the free tip is the "
                                                    "end), found " + shown(l.at(key)));
                else if (!on_span)
                    problems.add(child(p, key), "expected a position within the span, 0 to " +
                                                    format_quantity(*span, dims::length, system) + " from the start, found " +
                                                    shown(l.at(key)));
                return on_span;
            };
            if (*kind == "point" || *kind == "moment") {
                const bool point = *kind == "point";
                reject_unknown_keys(l, p, {"case", "kind", point ? "P" : "M", "at"}, problems);
                ld.kind = point ? load_kind::point : load_kind::moment;
                auto v = load_value(l, p, point ? "P" : "M", point ? dims::force : dims::moment);
                auto at = position("at", true, 0.0);
                ok = ok && v && at;
                if (ok) {
                    ld.value = *v;
                    ld.from = ld.to = *at;
                }
            } else {
                const bool udl = *kind == "udl";
                if (udl) reject_unknown_keys(l, p, {"case", "kind", "w", "from", "to"}, problems);
                else reject_unknown_keys(l, p, {"case", "kind", "w_start", "w_end", "from", "to"}, problems);
                ld.kind = udl ? load_kind::udl : load_kind::linear;
                auto w0 = load_value(l, p, udl ? "w" : "w_start", dims::line_load);
                auto w1 = udl ? w0 : load_value(l, p, "w_end", dims::line_load);
                auto from = position("from", false, 0.0);
                // Without a valid span the default "to" is unknown (the span is reported).
                auto to = span || l.contains("to") ? position("to", false, span.value_or(0.0)) : std::nullopt;
                // beam_model needs a length above 1e-9 of the span; a shorter one is a point load.
                if (from && to && span && !(*to - *from > 1e-9 * *span)) {
                    problems.add(child(p, l.contains("to") ? "to" : "from"),
                                 "expected \"to\" to lie beyond \"from\" by more than 1e-9 of the span (a distributed load "
                                 "needs a length), found from " +
                                     format_quantity(*from, dims::length, system) + " and to " +
                                     format_quantity(*to, dims::length, system));
                    ok = false;
                }
                ok = ok && w0 && w1 && from && to && span;
                if (ok) {
                    ld.value = *w0;
                    ld.value_end = *w1;
                    ld.from = *from;
                    ld.to = *to;
                }
            }
            if (ok) out.push_back(ld);
        }
        return out;
    }

    // `cases_known`: every load names its case, so a factor of another case is a mistake.
    std::vector<combination> read_combinations(const json& b, const std::string& ptr, const std::set<std::string>& cases,
                                               bool cases_known)
    {
        std::vector<combination> out;
        const std::string cp = child(ptr, "combinations");
        auto it = b.find("combinations");
        if (it == b.end()) {
            problems.add(cp, "missing required field \"combinations\" (an array of named load combinations)");
            return out;
        }
        if (!it->is_array() || it->empty()) {
            problems.add(cp, "expected a non-empty array of combinations, found " + shown(*it));
            return out;
        }
        std::set<std::string> names;
        for (std::size_t i = 0; i < it->size(); ++i) {
            const json& c = (*it)[i];
            const std::string p = child(cp, i);
            if (!expect_object(c, p, problems)) continue;
            reject_unknown_keys(c, p, {"name", "use", "factors"}, problems);
            combination out_c;
            auto name = string_field(c, p, "name", true, problems);
            auto use = choice_field(c, p, "use", {"strength", "service", "vibration"}, true, problems);
            if (name && name->empty()) problems.add(child(p, "name"), "expected a combination name, found an empty string");
            if (name && !names.insert(*name).second)
                problems.add(child(p, "name"), "expected a unique combination name, found \"" + *name +
                                                   "\" a second time");
            bool ok = name && use;
            const std::string fp = child(p, "factors");
            auto f = c.find("factors");
            if (f == c.end()) {
                problems.add(fp, "missing required field \"factors\" (an object such as {\"G\": 1.35, \"Q\": 1.5})");
                ok = false;
            } else if (!f->is_object() || f->empty()) {
                problems.add(fp, "expected an object of load-case factors such as {\"G\": 1.35, \"Q\": 1.5}, found " +
                                     shown(*f));
                ok = false;
            } else {
                for (auto e = f->begin(); e != f->end(); ++e) {
                    if (!e->is_number() || !std::isfinite(e->get<double>())) {
                        problems.add(child(fp, e.key()), "expected a finite number, found " + shown(*e));
                        ok = false;
                        continue;
                    }
                    if (std::abs(e->get<double>()) > plausible_factor_magnitude) {
                        problems.add(child(fp, e.key()), "expected a factor between -" +
                                                             format_number(plausible_factor_magnitude) + " and " +
                                                             format_number(plausible_factor_magnitude) + ", found " +
                                                             shown(*e));
                        ok = false;
                        continue;
                    }
                    if (cases_known && !cases.count(e.key())) {
                        std::string list;
                        for (const auto& k : cases) list += (list.empty() ? "\"" : ", \"") + k + "\"";
                        problems.add(child(fp, e.key()), "expected a load case used by this beam's loads (" + list +
                                                             "), found \"" + e.key() + "\"");
                        ok = false;
                        continue;
                    }
                    out_c.factors[e.key()] = e->get<double>();
                }
            }
            if (!ok) continue;
            out_c.name = *name;
            out_c.use = *use == "strength"  ? limit_state::strength
                        : *use == "service" ? limit_state::service
                                            : limit_state::vibration;
            out.push_back(out_c);
        }
        return out;
    }

    std::optional<deflection_limit> read_deflection_limit(const json& lim, const std::string& ptr)
    {
        const std::string p = child(ptr, "deflection");
        auto it = lim.find("deflection");
        if (it == lim.end()) return std::nullopt;
        deflection_limit out;
        if (it->is_string()) {
            std::string t = it->get<std::string>();
            out.text = t;
            std::string compact;
            for (char ch : t)
                if (!std::isspace(static_cast<unsigned char>(ch))) compact += ch;
            for (const std::string prefix : {"span/", "L/"}) {
                if (compact.rfind(prefix, 0) == 0) {
                    const std::string num = compact.substr(prefix.size());
                    const auto r = plain_number(num);
                    if (!r || *r <= 0) {
                        problems.add(p, "expected a deflection limit such as \"span/360\" or \"20 mm\", found \"" + t + "\"");
                        return std::nullopt;
                    }
                    out.span_ratio = *r;
                    return out;
                }
            }
        }
        auto v = json_fields::quantity(*it, p, dims::length, problems, &system);
        if (!v) return std::nullopt;
        if (!(*v > 0) || *v > plausible_deflection_limit) {
            problems.add(p, "expected a positive deflection limit of at most " +
                                format_quantity(plausible_deflection_limit, dims::length, system) + ", found " + shown(*it));
            return std::nullopt;
        }
        out.absolute = *v;
        if (out.text.empty()) out.text = format_quantity(*v, dims::length, unit_system::si);
        return out;
    }

    // A vibration combination gives the mass that vibrates (natural_frequency.hpp):
    // each of its factored loads must weigh down (a mass is never negative) and
    // together they must weigh something. A frequency limit needs such a
    // combination, or it would silently check nothing.
    void check_vibration(const json& b, const std::string& ptr, const std::vector<combination>& combos,
                         const std::vector<load>& loads, bool has_limit)
    {
        bool any = false;
        for (std::size_t i = 0; i < combos.size(); ++i) {
            const combination& c = combos[i];
            if (c.use != limit_state::vibration) continue;
            any = true;
            // The pointer of the combination as written (invalid ones were skipped).
            std::string cp = child(child(ptr, "combinations"), i);
            const json& arr = b.at("combinations");
            for (std::size_t k = 0; k < arr.size(); ++k)
                if (arr[k].is_object() && arr[k].contains("name") && arr[k]["name"] == c.name)
                    cp = child(child(ptr, "combinations"), k);
            double total = 0;
            std::string upward;
            for (const load& l : factored_loads(loads, c)) {
                if (l.kind == load_kind::moment) continue;
                const bool up = l.value < 0 || (l.kind == load_kind::linear && l.value_end < 0);
                if (up && upward.empty()) upward = l.load_case;
                total += total_force(l);
            }
            if (!upward.empty())
                problems.add(child(cp, "factors"),
                             "expected factors that leave every load of a vibration combination downward (its mass, "
                             "load / g, cannot be negative), found an upward load of case \"" + upward + "\"");
            else if (!(total > 0))
                problems.add(child(cp, "factors"),
                             "expected a vibration combination that carries some mass (downward load), found none");
        }
        if (has_limit && !any)
            problems.add(child(child(ptr, "limits"), "frequency"),
                         "expected a combination with \"use\": \"vibration\" (the mass that vibrates, for example "
                         "{\"G\": 1.0, \"Q\": 0.1}) to check the frequency limit against, found none");
    }

    // "layout": "two-supports" (the default) or "cantilever" (beam_layout.hpp).
    beam_layout read_layout(const json& b, const std::string& ptr)
    {
        auto it = b.find("layout");
        if (it == b.end()) return beam_layout::two_supports;
        const auto l = choice_field(b, ptr, "layout", beam_layout_names(), false, problems);
        return l ? parse_beam_layout(*l) : beam_layout::two_supports;
    }

    // A share written as a fraction (0.1) or a percentage ("10 %"), above 0 and at most 1.
    std::optional<double> read_fraction(const json& v, const std::string& ptr)
    {
        std::optional<double> f;
        if (v.is_number()) f = v.get<double>();
        if (v.is_string()) {
            std::string t = v.get<std::string>();
            while (!t.empty() && t.back() == ' ') t.pop_back();
            if (!t.empty() && t.back() == '%') {
                t.pop_back();
                try {
                    std::size_t used = 0;
                    const double p = std::stod(t, &used);
                    if (t.find_first_not_of(' ', used) == std::string::npos) f = p / 100.0;
                } catch (const std::exception&) {
                }
            }
        }
        if (!f || !std::isfinite(*f) || !(*f > 0) || *f > 1) {
            problems.add(ptr, "expected a share above 0 and at most 1, as a fraction (0.1) or a percentage (\"10 %\"), "
                              "found " + shown(v));
            return std::nullopt;
        }
        return f;
    }

    // A cantilever's root: its only restraint, so it must have stiffness (a
    // pin or a range reaching 0 is a mechanism), and the features of a beam-end
    // joint on two supports that have no meaning at a root, or are not yet
    // worked out for one, are refused by name.
    void check_root(const json& j, const std::string& ptr, const std::optional<joint>& root)
    {
        for (const char* key : {"behaviour", "detail", "support_rotation", "contact_stiffness",
                                "designed_for_closure", "dependable_lower_bound", "rotation_capacity",
                                "stiffness_scatter"})
            if (j.contains(key))
                problems.add(child(ptr, key), std::string("expected no \"") + key + "\" on a cantilever's root: it is "
                                              "not supported yet for a cantilever, found " + shown(j.at(key)));
        // A normal distribution truncated at zero reaches a pinned root, a mechanism.
        if (root && root->distribution && root->distribution->kind() == distribution_kind::normal)
            problems.add(child(ptr, "stiffness_distribution"),
                         "expected a \"lognormal\" or \"uniform-log\" root stiffness (above 0 everywhere): a \"normal\" "
                         "distribution truncated at zero reaches a pinned root, a mechanism, found \"normal\"");
        for (const char* key : {"stiffness", "moment_resistance"})
            if (j.contains(key) && j.at(key).is_string() && j.at(key) == "from-detail")
                problems.add(child(ptr, key), "expected a declared value on a cantilever's root: \"from-detail\" is "
                                              "not supported yet for a cantilever, found \"from-detail\"");
        if (!root || !root->range.min.is_pinned()) return;
        const std::string sp = child(ptr, "stiffness");
        const bool range = j.contains("stiffness") && j.at("stiffness").is_object();
        problems.add(range ? child(sp, "min") : sp,
                     std::string("expected a root stiffness above 0 (a spring, or \"rigid\"): a cantilever whose root ") +
                         (range ? "stiffness range reaches 0" : "is a pin") +
                         " is a mechanism and cannot carry its load, found " +
                         shown(range ? j.at("stiffness").at("min") : j.at("stiffness")));
    }

    // An overhang's start joint: restrained as on two supports, its end gap
    // included, but the features that need a moment-rotation law, the collapse
    // load or a derived stiffness are not worked out for an overhang yet, and
    // are refused by name.
    void check_overhang_start(const json& j, const std::string& ptr)
    {
        for (const char* key : {"behaviour", "rotation_capacity", "stiffness_scatter"})
            if (j.contains(key))
                problems.add(child(ptr, key), std::string("expected no \"") + key + "\" on the start joint of an "
                                              "overhang: it is not supported yet for an overhang, found " + shown(j.at(key)));
        for (const char* key : {"stiffness", "moment_resistance"})
            if (j.contains(key) && j.at(key).is_string() && j.at(key) == "from-detail")
                problems.add(child(ptr, key), "expected a declared value on the start joint of an overhang: "
                                              "\"from-detail\" is not supported yet for an overhang, found \"from-detail\"");
    }

    // "overhang": the length beyond the end support, on that layout only.
    std::optional<double> read_overhang(const json& b, const std::string& ptr, beam_layout layout)
    {
        if (layout != beam_layout::overhang) {
            if (b.contains("overhang"))
                problems.add(child(ptr, "overhang"), "expected \"overhang\" only on a beam with \"layout\": \"overhang\" "
                                                     "(the length beyond its end support), found it on a beam with layout \"" +
                                                         to_string(layout) + "\"");
            return 0.0;
        }
        if (!b.contains("overhang")) {
            problems.add(child(ptr, "overhang"), "missing required field \"overhang\" (the length beyond the end "
                                                 "support to the free tip, such as \"1.5 m\") for \"layout\": \"overhang\"");
            return std::nullopt;
        }
        return plausible(b, ptr, "overhang", dims::length, true, plausible_span);
    }

    std::optional<beam> read_beam(const json& b, const std::string& ptr, design_standard standard)
    {
        if (!expect_object(b, ptr, problems)) return std::nullopt;
        reject_unknown_keys(b, ptr, {"id", "description", "layout", "span", "overhang", "E", "section", "loads",
                                     "combinations", "joints", "limits", "stiffness_correlation", "steel"},
                            problems);
        beam out;
        out.pointer = ptr;
        const std::size_t problems_before = problems.size();
        out.layout = read_layout(b, ptr);
        const bool cantilever = out.layout == beam_layout::cantilever;
        const bool overhanging = out.layout == beam_layout::overhang;
        // A refused layout leaves the joints it needs unknown: a missing end joint is not reported then.
        const bool layout_refused = problems.size() > problems_before;
        auto id = string_field(b, ptr, "id", true, problems);
        if (id && id->empty()) problems.add(child(ptr, "id"), "expected a beam id, found an empty string");
        out.description = string_field(b, ptr, "description", false, problems).value_or("");
        auto span = plausible(b, ptr, "span", dims::length, true, plausible_span);
        auto E = plausible(b, ptr, "E", dims::pressure, false, plausible_E);
        if (!b.contains("E")) E = standard == design_standard::en1993_1_8 ? default_E_en : default_E_aisc;
        auto sec = read_section(b, ptr);
        std::optional<double> EI_over_L;
        if (span && E && sec) EI_over_L = *E * sec->I / *span;

        const auto overhang = read_overhang(b, ptr, out.layout);
        auto loads = overhanging ? read_loads(b, ptr, span && overhang ? std::optional<double>(*span + *overhang)
                                                                      : std::nullopt,
                                              true)
                                 : read_loads(b, ptr, span);
        std::set<std::string> cases;
        for (const auto& l : loads) cases.insert(l.load_case);
        bool cases_known = b.contains("loads") && b["loads"].is_array() && !b["loads"].empty();
        if (cases_known)
            for (const auto& l : b["loads"]) {
                if (l.is_object() && l.contains("case") && l["case"].is_string() && !l["case"].get<std::string>().empty())
                    cases.insert(l["case"].get<std::string>());
                else cases_known = false;
            }
        auto combos = read_combinations(b, ptr, cases, cases_known);

        const std::string jp = child(ptr, "joints");
        std::optional<joint> js, je;
        auto jit = b.find("joints");
        if (jit == b.end()) {
            problems.add(jp, "missing required field \"joints\" (an object with \"start\" and \"end\")");
        } else if (expect_object(*jit, jp, problems)) {
            reject_unknown_keys(*jit, jp, {"start", "end"}, problems);
            if (cantilever) {
                // The tip is free: no joint, a pin by construction (beam_layout.hpp).
                if (jit->contains("end"))
                    problems.add(child(jp, "end"), "expected no end joint: the end of a cantilever is its free tip "
                                                   "(the start joint is the root), found " + shown(jit->at("end")));
                je = joint{};
            }
            if (overhanging) {
                // The beam runs on over its end support: no joint there.
                if (jit->contains("end"))
                    problems.add(child(jp, "end"), "expected no end joint: an overhang runs on, continuous, over its "
                                                   "end support to a free tip (the start joint is its only joint), found " +
                                                       shown(jit->at("end")));
                je = joint{};
            }
            for (const char* e : {"start", "end"}) {
                if ((cantilever || overhanging) && std::string(e) == "end") continue;
                if (!jit->contains(e) && layout_refused && std::string(e) == "end") continue;
                if (!jit->contains(e)) {
                    problems.add(child(jp, e), std::string("missing required field \"") + e + "\"");
                    continue;
                }
                (std::string(e) == "start" ? js : je) = read_joint(jit->at(e), child(jp, e), EI_over_L, sec, standard);
            }
            if (cantilever && jit->contains("start") && jit->at("start").is_object())
                check_root(jit->at("start"), child(jp, "start"), js);
            if (overhanging && jit->contains("start") && jit->at("start").is_object())
                check_overhang_start(jit->at("start"), child(jp, "start"));
        }
        auto lim = b.find("limits");
        if (lim != b.end() && expect_object(*lim, child(ptr, "limits"), problems)) {
            reject_unknown_keys(*lim, child(ptr, "limits"), {"deflection", "frequency", "root_flexibility"}, problems);
            out.deflection = read_deflection_limit(*lim, child(ptr, "limits"));
            if (lim->contains("root_flexibility")) {
                const std::string rp = child(child(ptr, "limits"), "root_flexibility");
                if (!cantilever)
                    problems.add(rp, "expected \"root_flexibility\" only on a beam with \"layout\": \"cantilever\" "
                                     "(it limits the tip deflection added by the root's flexibility), found it on a "
                                     "beam with layout \"" + to_string(out.layout) + "\"");
                else if (const auto f = read_fraction(lim->at("root_flexibility"), rp)) {
                    out.root_flexibility_limit = *f;
                    out.root_flexibility_is_default = false;
                }
            }
            if (lim->contains("frequency"))
                out.frequency_limit = plausible(*lim, child(ptr, "limits"), "frequency", dims::frequency, true,
                                                plausible_frequency_limit);
        }
        check_vibration(b, ptr, combos, loads, out.frequency_limit.has_value());
        out.stiffness_correlation = read_stiffness_correlation(b, ptr, problems).value_or(1);
        if (b.contains("steel")) out.steel = read_steel(b.at("steel"), child(ptr, "steel"), standard, problems, &system);
        if (!id || !span || !E || !sec || !js || !je || !overhang) return std::nullopt;
        out.overhang = *overhang;
        out.id = *id;
        out.span = *span;
        out.E = *E;
        out.E_is_default = !b.contains("E");
        out.sec = *sec;
        out.loads = std::move(loads);
        out.combinations = std::move(combos);
        out.start = *js;
        out.end = *je;
        return out;
    }
};

}  // namespace

namespace {

// The job block: short texts, each optional (a calc sheet's header fields).
std::optional<job_info> read_job(const json& j, problem_list& problems)
{
    if (!expect_object(j, "/job", problems)) return std::nullopt;
    reject_unknown_keys(j, "/job", {"number", "title", "made_by", "checked_by", "revision", "date"}, problems);
    job_info out;
    const std::pair<const char*, std::string*> fields[] = {
        {"number", &out.number},         {"title", &out.title},       {"made_by", &out.made_by},
        {"checked_by", &out.checked_by}, {"revision", &out.revision}, {"date", &out.date}};
    for (const auto& [key, target] : fields) {
        auto v = string_field(j, "/job", key, false, problems);
        if (!v) continue;
        // A header line holds a short text; a long one would overrun the page.
        if (v->size() > 120) {
            problems.add(child("/job", key), "expected a text of at most 120 characters for the sheet header, found " +
                                                 std::to_string(v->size()) + " characters");
            continue;
        }
        *target = *v;
    }
    return out;
}

}  // namespace

project read_project(const json& doc)
{
    problem_list problems;
    reader r{problems};
    project out;
    if (!expect_object(doc, "", problems)) problems.throw_if_any();
    reject_unknown_keys(doc, "", {"format", "title", "job", "standard", "frame", "units", "beams", "$schema"}, problems);
    format_field(doc, project_format, problems);
    out.format = project_format;
    out.title = string_field(doc, "", "title", true, problems).value_or("");
    if (doc.contains("job")) out.job = read_job(doc.at("job"), problems);
    auto standard = choice_field(doc, "", "standard", {"EN1993-1-8", "AISC360"}, true, problems);
    auto frame = choice_field(doc, "", "frame", {"braced", "unbraced"}, true, problems);
    auto units = choice_field(doc, "", "units", {"SI", "US"}, false, problems);
    if (standard) out.standard = parse_design_standard(*standard);
    if (frame) out.frame = parse_frame_bracing(*frame);

    if (const json* beams = non_empty_array_field(doc, "beams", problems)) {
        unique_ids ids("beam id");
        for (std::size_t i = 0; i < beams->size(); ++i) {
            const std::string p = child("/beams", i);
            auto b = r.read_beam((*beams)[i], p, out.standard);
            ids.note((*beams)[i], p, problems);
            if (b) out.beams.push_back(std::move(*b));
        }
    }
    problems.throw_if_any();
    if (units) out.units = *units == "US" ? unit_system::us_customary : unit_system::si;
    else out.units = r.system == unit_system::us_customary ? unit_system::us_customary : unit_system::si;
    return out;
}

project parse_project(std::string_view text, const project_sources& sources)
{
    json doc = json_document::parse(text, "file");
    // Joints given as detail ids are replaced by the catalogue's entries first:
    // the catalogue named on the command line, or the file named by "details".
    std::string catalogue_path = sources.details_file;
    if (catalogue_path.empty() && doc.is_object() && doc.contains("details")) {
        if (!doc["details"].is_string() || doc["details"].get<std::string>().empty())
            throw input_error("/details", "expected the path of a detail catalogue file (format pinproof-details/1), found " +
                                              json_fields::shown(doc["details"]));
        catalogue_path = doc["details"].get<std::string>();
        if (!catalogue_path.empty() && catalogue_path.front() != '/' && !sources.base_dir.empty())
            catalogue_path = sources.base_dir + "/" + catalogue_path;
    }
    if (doc.is_object()) doc.erase("details");
    if (!catalogue_path.empty()) {
        const detail_catalogue catalogue = load_detail_catalogue_file(catalogue_path);
        problem_list problems;
        resolve_detail_references(doc, catalogue, problems);
        problems.throw_if_any();
    }
    return read_project(doc);
}

project load_project_file(const std::string& path, const std::string& details_file)
{
    const std::string text = read_input_file(path, "project file");  // size, kind and identity checked (input_file.hpp)
    project_sources sources;
    sources.details_file = details_file;
    const auto slash = path.find_last_of('/');
    sources.base_dir = slash == std::string::npos ? "." : path.substr(0, slash == 0 ? 1 : slash);
    return parse_project(text, sources);
}

}  // namespace pinproof
