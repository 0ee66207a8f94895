// Reading a catalogue of standard details (docs/batch-and-catalogues.md).
// Every problem is collected with its JSON pointer so that one run reports all.
#include "pinproof/io/detail_catalogue.hpp"

#include <cctype>
#include <cmath>
#include <cstdlib>
#include <fstream>
#include <sstream>

#include "io/json_document.hpp"
#include "io/json_fields.hpp"
#include "pinproof/core/input_file.hpp"
#include "io/plausibility.hpp"
#include "pinproof/io/joint_behaviour_input.hpp"
#include "pinproof/io/stiffness_distribution_input.hpp"
#include "pinproof/core/spelling.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {
namespace {

using json = nlohmann::json;
using namespace json_fields;

std::string trimmed(std::string t)
{
    while (!t.empty() && std::isspace(static_cast<unsigned char>(t.back()))) t.pop_back();
    std::size_t b = 0;
    while (b < t.size() && std::isspace(static_cast<unsigned char>(t[b]))) ++b;
    return t.substr(b);
}

// "rigid", a rotational stiffness (number in N*m/rad or text with a unit), or
// a non-negative multiple of EI/L such as "0.5 EI/L".
std::optional<catalogue_stiffness> read_bound(const json& v, const std::string& ptr, problem_list& problems)
{
    catalogue_stiffness out;
    if (v.is_string()) {
        const std::string t = trimmed(v.get<std::string>());
        if (t == "rigid") {
            out.form = catalogue_stiffness::kind::rigid;
            return out;
        }
        const auto relative = read_EI_over_L_multiple(v, ptr, problems);
        if (relative.relative) {
            if (!relative.multiple) return std::nullopt;
            out.form = catalogue_stiffness::kind::relative;
            out.value = *relative.multiple;
            return out;
        }
    }
    const auto s = absolute_stiffness(v, ptr, problems);
    if (!s) return std::nullopt;
    // The ceiling of every stiffness, as in a project file (io/plausibility.hpp).
    if (auto m = plausibility::stiffness_too_large(*s, unit_system::si, shown(v))) {
        problems.add(ptr, *m);
        return std::nullopt;
    }
    out.value = *s;
    return out;
}

// Whether two bounds of one entry can be ordered without knowing the beam.
bool comparable(const catalogue_stiffness& a, const catalogue_stiffness& b)
{
    using k = catalogue_stiffness::kind;
    return a.form == k::rigid || b.form == k::rigid || a.form == b.form;
}

// a <= b for comparable bounds; rigid is above every finite value.
bool not_above(const catalogue_stiffness& a, const catalogue_stiffness& b)
{
    using k = catalogue_stiffness::kind;
    if (b.form == k::rigid) return true;
    if (a.form == k::rigid) return false;
    return a.value <= b.value;
}

// An entry's moment-rotation law, checked here with its pointer in the
// catalogue: its form (under EN 1993-1-8, which knows every law; a row under
// AISC 360 reads it again in its own terms, schedule.cpp) and its fit with the
// entry's resistance and, for absolute bounds, its stiffness. A multilinear
// curve gives the stiffness itself, which a catalogue entry always states, so
// it is not taken here.
bool read_entry_behaviour(const json& b, const std::string& ptr, catalogue_detail& d, problem_list& problems)
{
    const std::size_t before = problems.size();
    const std::string bp = child(ptr, "behaviour");
    const auto law = read_joint_behaviour(b, bp, design_standard::en1993_1_8, problems);
    if (!law) return false;
    if (law->law == joint_law_kind::multilinear) {
        problems.add(child(bp, "law"), "expected a law that starts from the entry's stiffness (linear, ec3-curve, "
                                       "ec3-eta, power or richard-abbott), found \"multilinear\": a catalogue entry "
                                       "states its stiffness, so give the curve in a project file's joint");
        return false;
    }
    joint j;
    j.moment_resistance = d.moment_resistance;
    j.behaviour = law;
    const bool absolute = !d.stiffness_from_detail && d.stiffness_min.form == catalogue_stiffness::kind::absolute &&
                          d.stiffness_max.form == catalogue_stiffness::kind::absolute;
    j.moment_resistance_from_detail = d.moment_resistance_from_detail;
    // Bounds in EI/L meet the stiffness checks on each beam; here only the resistance.
    j.range.min = absolute ? stiffness::spring(d.stiffness_min.value) : stiffness::spring(1.0);
    j.range.max = absolute ? stiffness::spring(d.stiffness_max.value) : stiffness::spring(1.0);
    if (!absolute && law->law == joint_law_kind::richard_abbott) j.behaviour->plastic_stiffness = 0.0;
    if (d.stiffness_min.form == catalogue_stiffness::kind::rigid || d.stiffness_max.form == catalogue_stiffness::kind::rigid)
        j.range.min = j.range.max = stiffness::rigid();
    check_behaviour_fits(j, ptr, problems, unit_system::neutral);
    if (problems.size() != before) return false;
    d.behaviour = b;
    return true;
}

std::optional<catalogue_detail> read_entry(const json& e, const std::string& ptr, problem_list& problems)
{
    if (!expect_object(e, ptr, problems)) return std::nullopt;
    reject_unknown_keys(e, ptr, {"id", "type", "description", "stiffness", "stiffness_distribution",
                                 "moment_resistance", "behaviour", "geometry", "notes"},
                        problems);
    catalogue_detail d;
    d.pointer = ptr;
    auto id = string_field(e, ptr, "id", true, problems);
    if (id && trimmed(*id).empty()) problems.add(child(ptr, "id"), "expected a detail id, found an empty string");
    if (id && trimmed(*id) != *id)
        problems.add(child(ptr, "id"), "expected a detail id without leading or trailing spaces, found \"" + *id + "\"");
    auto type = choice_field(e, ptr, "type", catalogue_detail_types(), true, problems);
    d.description = string_field(e, ptr, "description", false, problems).value_or("");
    d.notes = string_field(e, ptr, "notes", false, problems).value_or("");

    bool ok = id.has_value() && type.has_value();
    const std::string sp = child(ptr, "stiffness");
    auto it = e.find("stiffness");
    if (it == e.end()) {
        problems.add(sp, "missing required field \"stiffness\" (an object {\"min\": ..., \"max\": ...} of rotational "
                         "stiffnesses, \"rigid\" or multiples of EI/L)");
        ok = false;
    } else if (it->is_object()) {
        const auto [lo, hi] = read_bounds<catalogue_stiffness>(
            *it, sp, [&](const json& v, const std::string& at) { return read_bound(v, at, problems); }, problems);
        if (lo && hi && !comparable(*lo, *hi)) {
            problems.add(sp, "expected min and max in the same form (both absolute stiffnesses or both multiples of "
                             "EI/L), found min " + shown(it->at("min")) + " and max " + shown(it->at("max")));
            ok = false;
        } else if (lo && hi && !not_above(*lo, *hi)) {
            problems.add(child(sp, "min"), "expected min not above max, found min " + shown(it->at("min")) +
                                               " above max " + shown(it->at("max")));
            ok = false;
        }
        ok = ok && lo && hi;
        if (lo && hi) {
            d.stiffness_min = *lo;
            d.stiffness_max = *hi;
        }
    } else if (it->is_string() && trimmed(it->get<std::string>()) == "from-detail") {
        // Worked out for each beam from the entry's geometry (joints/joint_from_detail.hpp).
        d.stiffness_from_detail = true;
    } else {
        auto s = read_bound(*it, sp, problems);
        ok = ok && s.has_value();
        if (s) d.stiffness_min = d.stiffness_max = *s;
    }
    if (it != e.end()) d.stiffness_text = *it;

    const bool mr_from_detail = e.contains("moment_resistance") && e.at("moment_resistance").is_string() &&
                                trimmed(e.at("moment_resistance").get<std::string>()) == "from-detail";
    auto mr = mr_from_detail ? std::nullopt : quantity_field(e, ptr, "moment_resistance", dims::moment, false, problems);
    if (mr_from_detail) {
        d.moment_resistance_from_detail = true;
        d.moment_resistance_text = e.at("moment_resistance");
    } else if (mr && *mr < 0) {
        problems.add(child(ptr, "moment_resistance"),
                     "expected a moment resistance of zero or more, found " + shown(e.at("moment_resistance")));
        ok = false;
    } else if (e.contains("moment_resistance") && !mr) {
        ok = false;
    } else {
        d.moment_resistance = mr;
        if (mr) d.moment_resistance_text = e.at("moment_resistance");
    }

    for (const char* key : {"geometry", "stiffness_distribution"}) {
        auto g = e.find(key);
        if (g == e.end()) continue;
        if (!g->is_object()) {
            problems.add(child(ptr, key), "expected an object, found " + shown(*g));
            ok = false;
            continue;
        }
        // A distribution is checked here too, so that its problems are named at
        // the catalogue's pointer; values written as multiples of EI/L wait
        // for a beam (EI/L = 0 leaves them unresolved, without a problem).
        if (std::string(key) == "stiffness_distribution") {
            const std::size_t before = problems.size();
            (void)read_stiffness_distribution(*g, child(ptr, key), 0.0, problems);
            if (problems.size() != before) {
                ok = false;
                continue;
            }
        }
        (std::string(key) == "geometry" ? d.geometry : d.stiffness_distribution) = *g;
    }
    // "from-detail" needs a detail the library derives: a fin plate with its geometry.
    if ((d.stiffness_from_detail || d.moment_resistance_from_detail) && ok) {
        const std::string field = d.stiffness_from_detail ? "stiffness" : "moment_resistance";
        if (type && *type != "fin-plate") {
            problems.add(child(ptr, field), "expected a stiffness and a moment resistance for a " + *type +
                                                " entry (\"from-detail\" derives fin plates only), found \"from-detail\"");
            ok = false;
        } else if (d.geometry.is_null()) {
            problems.add(child(ptr, field), "expected a \"geometry\" to derive the joint from, found \"from-detail\" "
                                            "without one");
            ok = false;
        }
    }
    if (ok && e.contains("behaviour")) ok = read_entry_behaviour(e.at("behaviour"), ptr, d, problems);
    if (!ok) return std::nullopt;
    d.id = *id;
    d.type = *type;
    return d;
}

std::string located(const std::string& source, const std::string& where)
{
    return source.empty() ? where : source + "#" + where;
}

}  // namespace

stiffness catalogue_stiffness::for_beam(double EI, double span) const
{
    switch (form) {
    case kind::rigid: return stiffness::rigid();
    case kind::relative: return stiffness::spring(value * EI / span);
    case kind::absolute: break;
    }
    return stiffness::spring(value);
}

const catalogue_detail* detail_catalogue::find(std::string_view id) const
{
    auto it = index_.find(id);
    return it == index_.end() ? nullptr : &details[it->second];
}

void detail_catalogue::rebuild_index()
{
    index_.clear();
    for (std::size_t i = 0; i < details.size(); ++i) index_.emplace(details[i].id, i);
}

std::vector<std::string> detail_catalogue::ids() const
{
    std::vector<std::string> out;
    out.reserve(details.size());
    for (const auto& d : details) out.push_back(d.id);
    return out;
}

std::string detail_catalogue::id_list(std::size_t limit) const
{
    std::string out;
    for (std::size_t i = 0; i < details.size() && i < limit; ++i) out += (i ? ", \"" : "\"") + details[i].id + "\"";
    if (details.size() > limit) out += ", ... (" + std::to_string(details.size()) + " in all)";
    return out;
}

const std::vector<std::string>& catalogue_detail_types()
{
    static const std::vector<std::string> names{"fin-plate", "web-cleats", "end-plate", "custom"};
    return names;
}

detail_catalogue read_detail_catalogue(const json& doc, const std::string& source)
{
    problem_list problems;
    detail_catalogue out;
    out.source = source;
    if (expect_object(doc, "", problems)) {
        reject_unknown_keys(doc, "", {"format", "title", "description", "details", "$schema"}, problems);
        format_field(doc, detail_catalogue_format, problems);
        out.format = detail_catalogue_format;
        out.title = string_field(doc, "", "title", false, problems).value_or("");
        string_field(doc, "", "description", false, problems);
        if (const json* details = non_empty_array_field(doc, "details", problems)) {
            unique_ids ids("detail id");
            for (std::size_t i = 0; i < details->size(); ++i) {
                const std::string p = child("/details", i);
                const json& e = (*details)[i];
                ids.note(e, p, problems);
                auto d = read_entry(e, p, problems);
                if (d) out.details.push_back(std::move(*d));
            }
        }
    }
    if (!problems.empty()) {
        std::vector<input_problem> located_problems;
        for (const auto& p : problems.problems()) located_problems.push_back({located(source, p.where), p.message});
        throw input_error(std::move(located_problems));
    }
    out.rebuild_index();
    return out;
}

detail_catalogue parse_detail_catalogue(std::string_view text, const std::string& source)
{
    const json doc = json_document::parse(text, "catalogue", source);
    return read_detail_catalogue(doc, source);
}

detail_catalogue load_detail_catalogue_file(const std::string& path)
{
    const std::string text = read_input_file(path, "detail catalogue");  // size, kind and identity checked (input_file.hpp)
    return parse_detail_catalogue(text, path);
}

joint joint_for_beam(const catalogue_detail& d, double EI, double span)
{
    joint j;
    // A derived stiffness or resistance is set when the joint is derived
    // (joints/joint_from_detail.hpp), before any analysis.
    j.stiffness_from_detail = d.stiffness_from_detail;
    j.moment_resistance_from_detail = d.moment_resistance_from_detail;
    if (!d.stiffness_from_detail) {
        j.range.min = d.stiffness_min.for_beam(EI, span);
        j.range.max = d.stiffness_max.for_beam(EI, span);
    }
    j.moment_resistance = d.moment_resistance;
    return j;
}

std::size_t resolve_detail_references(json& doc, const detail_catalogue& catalogue, problem_list& problems)
{
    std::size_t rewritten = 0;
    if (!doc.is_object()) return 0;
    auto beams = doc.find("beams");
    if (beams == doc.end() || !beams->is_array()) return 0;
    for (std::size_t i = 0; i < beams->size(); ++i) {
        json& b = (*beams)[i];
        if (!b.is_object()) continue;
        auto joints = b.find("joints");
        if (joints == b.end() || !joints->is_object()) continue;
        for (const char* e : {"start", "end"}) {
            auto j = joints->find(e);
            if (j == joints->end() || !j->is_string()) continue;
            const std::string id = j->get<std::string>();
            const std::string ptr = child(child(child("/beams", i), "joints"), e);
            const catalogue_detail* d = catalogue.find(id);
            if (!d) {
                problems.add(ptr, "expected an inline joint or a detail id from the catalogue" +
                                      (catalogue.source.empty() ? std::string() : " " + catalogue.source) + " (" +
                                      catalogue.id_list() + "), found \"" + id + "\", which is not in it" +
                                      did_you_mean(id, catalogue.ids()));
                continue;
            }
            json inline_joint = json::object();
            if (!d->stiffness_text.is_null()) inline_joint["stiffness"] = d->stiffness_text;
            if (!d->moment_resistance_text.is_null()) inline_joint["moment_resistance"] = d->moment_resistance_text;
            inline_joint["description"] =
                "catalogue detail " + d->id + (d->description.empty() ? std::string() : ": " + d->description);
            // The gap geometry, with the entry's type, for the end-gap check.
            if (d->geometry.is_object()) {
                json g = d->geometry;
                g["type"] = d->type;
                inline_joint["detail"] = std::move(g);
            }
            if (!d->stiffness_distribution.is_null()) inline_joint["stiffness_distribution"] = d->stiffness_distribution;
            if (!d->behaviour.is_null()) inline_joint["behaviour"] = d->behaviour;
            *j = std::move(inline_joint);
            ++rewritten;
        }
    }
    return rewritten;
}

}  // namespace pinproof
