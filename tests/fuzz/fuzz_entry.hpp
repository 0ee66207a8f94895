// The entry points of the fuzz targets (tests/fuzz/fuzz_*.cpp), shared with
// the regression test (tests/fuzz_regression_test.cpp) so that a crash input
// is replayed through exactly the code that found it.
//
// Each entry point feeds arbitrary bytes to one input edge, and, for input
// that is accepted, runs the engine and the outputs on it. It returns normally
// for accepted input and for input refused the documented way (input_error,
// or std::invalid_argument from parse_quantity). Anything else escapes: an
// internal_error, any other exception, a refusal that does not name a place,
// a non-finite number in an output. The fuzz targets abort on it; the
// regression test fails on it. Sanitizers catch what escapes silently.
#pragma once

#include <nlohmann/json.hpp>

#include <cmath>
#include <cstddef>
#include <cstdlib>
#include <stdexcept>
#include <string>
#include <string_view>

#include "pinproof/joints/joint_from_detail.hpp"
#include "pinproof/checks/assessment.hpp"
#include "pinproof/batch/batch.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/report/result_json.hpp"
#include "pinproof/io/schedule.hpp"
#include "pinproof/report/text_report.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/io/project_input.hpp"

namespace pinproof::fuzz {

// A breach of what docs/robustness.md promises.
class broken_promise : public std::logic_error {
public:
    using std::logic_error::logic_error;
};

inline void require(bool ok, const std::string& what)
{
    if (!ok) throw broken_promise(what);
}

// Every number in an output document is finite (nlohmann_json would write a
// NaN as null, hiding it).
inline void require_finite(const nlohmann::json& j, const std::string& where = "")
{
    if (j.is_number_float()) require(std::isfinite(j.get<double>()), "non-finite number in output at " + where);
    if (j.is_object())
        for (auto it = j.begin(); it != j.end(); ++it) require_finite(*it, where + "/" + it.key());
    if (j.is_array())
        for (std::size_t i = 0; i < j.size(); ++i) require_finite(j[i], where + "/" + std::to_string(i));
}

// A refusal names each problem's place ("/beams/0/span", "line 3, column 9",
// "/" for the document itself) and says what is wrong. At most 200 are
// listed, then one line "(input)" giving the number left out (errors.cpp).
inline void require_well_formed(const input_error& e, bool csv)
{
    const auto& all = e.problems();
    require(!all.empty(), "input_error without a problem");
    require(all.size() <= 201, "more than 200 problems listed");
    for (std::size_t i = 0; i < all.size(); ++i) {
        const auto& p = all[i];
        require(!p.message.empty(), "problem without a message at " + p.where);
        if (i == 200) {
            require(p.where == "(input)", "a 201st problem that is not the count of those left out");
            continue;
        }
        const bool pointer = !p.where.empty() && p.where[0] == '/';
        const bool line = p.where.rfind("line ", 0) == 0;
        require(line || (!csv && pointer), "problem without a JSON pointer or line: \"" + p.where + "\"");
    }
}

inline void outputs_of(const project_assessment& a)
{
    const nlohmann::json j = to_json(a);
    require_finite(j);
    (void)j.dump();
    (void)text_report(a, "fuzz");
}

// Project files: parse_project, then assess_project and both outputs. Joints
// given as detail ids are looked up in `details_file` (a catalogue), never in
// a file the input names.
inline void project_input(std::string_view text, const std::string& details_file)
{
    project p;
    try {
        project_sources sources;
        sources.details_file = details_file;
        p = parse_project(text, sources);
        derive_joints(p);
    } catch (const input_error& e) {
        require_well_formed(e, false);
        return;
    }
    project_assessment a;
    try {
        a = assess_project(p);
    } catch (const input_error& e) {
        // Some problems show only when the beam is assessed (a detail that
        // cannot be built on the section); they are refusals too.
        require_well_formed(e, false);
        return;
    }
    outputs_of(a);
}

// Quantity texts: parse_quantity, then formatting the value back.
inline void unit_text(std::string_view text)
{
    quantity q;
    try {
        q = parse_quantity(text);
    } catch (const std::invalid_argument& e) {
        require(*e.what() != '\0', "refusal without a message");
        return;
    }
    require(std::isfinite(q.value), "parse_quantity returned a non-finite value");
    (void)describe(q.dim);
    (void)example_of(q.dim);
    for (unit_system s : {unit_system::neutral, unit_system::si, unit_system::us_customary}) {
        (void)format_quantity(q.value, q.dim, s);
        (void)display_unit_for(q.dim, s);
    }
    for (int digits : {1, 4, 17}) {
        const std::string f = format_number(q.value, digits);
        char* end = nullptr;
        const double back = std::strtod(f.c_str(), &end);
        require(end == f.c_str() + f.size() && std::isfinite(back), "format_number wrote \"" + f + "\"");
    }
}

// Beam schedules: parse_schedule, read_schedule_row for every row, and for a
// row that is read, assess_project and both outputs; then the batch summary
// of the rows. At most `max_rows` rows are assessed, to keep one run short.
inline void schedule_input(std::string_view text, const detail_catalogue& catalogue, std::size_t max_rows = 4)
{
    schedule s;
    try {
        s = parse_schedule(text, "fuzz.csv");
    } catch (const input_error& e) {
        require_well_formed(e, true);
        return;
    }
    batch_result batch;
    batch_options options;
    options.json = true;
    for (std::size_t i = 0; i < s.rows.size() && i < max_rows; ++i) {
        schedule_row row = read_schedule_row(s, i, catalogue);
        require(row.input.has_value() == row.problems.empty(), "a row with a beam and problems, or neither");
        // The text report and the result file of an accepted beam are the
        // project target's work; here the reader and the batch path are fuzzed,
        // so that each input runs fast enough for the fuzzer to explore.
        if (!row.input) require_well_formed(input_error(row.problems), true);
        // The batch path catches every exception into a refused row; an
        // internal error there is still a fault.
        batch_row b = assess_schedule_row(s, i, catalogue, options);
        require(b.message.find("internal error") == std::string::npos, "batch row: " + b.message);
        batch.rows.push_back(std::move(b));
    }
    batch.summary.rows = batch.rows.size();
    (void)batch_summary_csv(batch);
    const std::string j = batch_result_json(batch, s, catalogue);
    require_finite(nlohmann::json::parse(j));
}

// Detail catalogues: parse_detail_catalogue, then, for a catalogue that is
// read, its first and last entries used at the two ends of one beam, by a
// project file (resolve_detail_references, read_project, assess_project and
// both outputs) and by a schedule row (the batch path).
inline void catalogue_input(std::string_view text)
{
    detail_catalogue c;
    try {
        c = parse_detail_catalogue(text);
    } catch (const input_error& e) {
        require_well_formed(e, false);
        return;
    }
    require(!c.details.empty(), "a catalogue read without details");
    const std::string first = c.details.front().id, last = c.details.back().id;
    nlohmann::json doc = nlohmann::json::parse(R"({"format": "pinproof-project/1", "title": "fuzz",
        "standard": "EN1993-1-8", "frame": "braced", "beams": [{"id": "B1", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": "10 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35}},
                         {"name": "SLS", "use": "service", "factors": {"G": 1.0}}]}]})");
    doc["beams"][0]["joints"] = {{"start", first}, {"end", last}};
    problem_list problems;
    resolve_detail_references(doc, c, problems);
    require(problems.empty(), "an id of the catalogue not found in it");
    try {
        project p = read_project(doc);
        derive_joints(p);
        outputs_of(assess_project(p));
    } catch (const input_error& e) {
        require_well_formed(e, false);
    }
    // The ids go into a CSV cell: quoted, with quotes doubled.
    const auto cell = [](const std::string& id) {
        std::string q = "\"";
        for (char ch : id) q += ch == '"' ? std::string("\"\"") : std::string(1, ch);
        return q + "\"";
    };
    schedule_input("id,span,section,g,q,start,end\nB1,6 m,IPE 300,10 kN/m,5 kN/m," + cell(first) + "," + cell(last) + "\n",
                   c, 1);
}

// Stiffness distribution objects: the text is put in a project file as the
// start joint's "stiffness_distribution", then read and assessed as a project.
inline void distribution_input(std::string_view text, const std::string& details_file)
{
    const std::string head = R"({"format": "pinproof-project/1", "title": "fuzz", "standard": "EN1993-1-8",
        "frame": "braced", "beams": [{"id": "B1", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": "10 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35}},
                         {"name": "SLS", "use": "service", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": {"min": "500 kN*m/rad", "max": "2000 kN*m/rad"},
                             "stiffness_distribution": )";
    const std::string tail = R"(}, "end": {"stiffness": "1000 kN*m/rad"}}}]})";
    project_input(head + std::string(text) + tail, details_file);
}

}  // namespace pinproof::fuzz
