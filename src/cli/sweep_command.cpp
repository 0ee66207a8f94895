#include "sweep_command.hpp"

#include <CLI/CLI.hpp>
#include <nlohmann/json.hpp>

#include <cctype>
#include <cstdlib>
#include <fstream>
#include <ostream>
#include <sstream>

#include "beam_choice.hpp"
#include "count_option.hpp"
#include "pinproof/joints/joint_from_detail.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/checks/failure_probability.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/report/result_json.hpp"
#include "pinproof/checks/sweep.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/report/sweep_output.hpp"

namespace pinproof::cli {

void add_sweep_options(CLI::App& sub, sweep_options& o)
{
    sub.add_option("FILE", o.file, "Project file (format pinproof-project/1; '-' for standard input)")->required();
    sub.add_option("--details", o.details, "Detail catalogue for joints given as detail ids")->type_name("FILE");
    sub.add_option("--beam", o.beam_id, "Id of the beam to sweep (default: the first beam)")->type_name("ID");
    sub.add_option("--combination", o.combination,
                   "Combination whose results are tabulated (default: the beam's first); the checks use all")
        ->type_name("NAME");
    sub.add_option("--points", o.points,
                   "Stiffness values between 0.01 and 1000 EI/L, log spaced: 2 to 1000 (default 41); with --grid "
                   "at most " + std::to_string(max_grid_points) + ", as the grid holds (N+2) x (N+2) states")
        ->check(count_range(2, 1000))
        ->type_name("N");
    sub.add_option("--end", o.end, "Move only this end (default: both ends together)")
        ->check(CLI::IsMember({"start", "end"}))
        ->type_name("start|end");
    sub.add_option("--hold", o.hold,
                   "Stiffness of the end that does not move, e.g. \"2500 kN*m/rad\", \"0.5 EI/L\" or \"rigid\" "
                   "(default: its upper bound)")
        ->type_name("STIFFNESS");
    sub.add_flag("--grid", o.grid, "Evaluate the two-end map: every pair of sweep values, (N+2) x (N+2)");
    sub.add_option("--csv", o.csv_out, "Write the sweep table as CSV to FILE ('-' for stdout)")->type_name("FILE");
    sub.add_option("--svg", o.svg_out, "Write the chart as SVG to FILE ('-' for stdout)")->type_name("FILE");
    sub.add_option("--json", o.json_out, "Write the sweep, thresholds and probabilities as JSON ('-' for stdout)")
        ->type_name("FILE");
    sub.add_option("--monte-carlo", o.monte_carlo,
                   "Also estimate the failure probabilities by N Monte Carlo samples (fixed seed): 0 (none, the "
                   "default) to " + std::to_string(max_monte_carlo_samples))
        ->check(count_range(0, max_monte_carlo_samples))
        ->type_name("N");
    sub.footer("At most one output on standard output ('-'); no output may be an input. The outputs are written "
               "together, only when all succeed.\nExit codes: 0 the sweep was written (whatever the checks say along "
               "it), 2 bad input or an error; 129, 130, 143 ended by SIGHUP, SIGINT, SIGTERM (nothing written).");
}

namespace {

stiffness parse_hold(const std::string& text, double EI_over_L)
{
    std::string t = text;
    while (!t.empty() && std::isspace(static_cast<unsigned char>(t.back()))) t.pop_back();
    if (t == "rigid") return stiffness::rigid();
    const std::string rel = "EI/L";
    if (t.size() >= rel.size() && t.compare(t.size() - rel.size(), rel.size(), rel) == 0) {
        const std::string num = t.substr(0, t.size() - rel.size());
        char* end = nullptr;
        const double k = std::strtod(num.c_str(), &end);
        bool ok = end != num.c_str() && std::isfinite(k) && k >= 0;
        while (ok && end && *end) ok = std::isspace(static_cast<unsigned char>(*end++));
        if (ok) return stiffness::spring(k * EI_over_L);
    } else {
        try {
            const quantity q = parse_quantity(t);
            if (q.dim == dims::rotational_stiffness && q.value >= 0) return stiffness::spring(q.value);
        } catch (const std::invalid_argument&) {
        }
    }
    throw input_error("--hold", "expected a rotational stiffness of zero or more such as \"2500 kN*m/rad\", a "
                                "multiple such as \"0.5 EI/L\" or \"rigid\", found \"" + text + "\"");
}

std::string stiffness_text(stiffness s, unit_system u)
{
    return s.is_rigid() ? std::string("rigid") : format_quantity(s.value(), dims::rotational_stiffness, u);
}

}  // namespace

namespace {

using boundary_curves = std::vector<std::pair<std::string, std::vector<boundary_point>>>;

// The outputs are refused before any work: two on standard output, one naming
// an input, or a grid too large to hold. Returns the option writing to
// standard output, if any.
const char* refuse_outputs(const sweep_options& o)
{
    const std::pair<const char*, const std::string*> targets[] = {
        {"--csv", &o.csv_out}, {"--svg", &o.svg_out}, {"--json", &o.json_out}};
    const char* on_stdout = nullptr;
    output_set outputs;
    outputs.add_input(o.file);
    outputs.add_input(o.details);
    for (const auto& [option, path] : targets) {
        if (*path != "-") {
            if (!path->empty()) outputs.add(option, *path, "");
            continue;
        }
        if (on_stdout)
            throw input_error(option, std::string("expected at most one output on standard output ('-'), found ") +
                                          on_stdout + " and " + option + " both '-'; name a file for one of them");
        on_stdout = option;
    }
    outputs.check();
    if (o.grid && o.points > max_grid_points)
        throw input_error("--points", "expected at most " + std::to_string(max_grid_points) +
                                          " points with --grid (a grid of (N+2) x (N+2) = " +
                                          std::to_string((max_grid_points + 2) * (max_grid_points + 2)) +
                                          " stiffness pairs, each held in memory with its results), found " +
                                          std::to_string(o.points));
    return on_stdout;
}

sweep_settings settings_for(const sweep_options& o, const beam* b)
{
    sweep_settings settings;
    settings.points = o.points;
    settings.combination = o.combination;
    settings.grid = o.grid;
    if (o.grid && (!o.end.empty() || !o.hold.empty()))
        throw input_error("--grid", "expected either --grid or --end/--hold, found both: a grid moves both ends");
    if (!o.end.empty()) {
        settings.path.moving = o.end == "start" ? moving_end::start : moving_end::end;
        const joint& held = o.end == "start" ? b->end : b->start;
        settings.path.held = o.hold.empty() ? held.range.max : parse_hold(o.hold, b->EI() / b->span);
    } else if (!o.hold.empty()) {
        throw input_error("--hold", "expected --end start|end with --hold (both ends move otherwise)");
    }
    return settings;
}

nlohmann::json sweep_document(const sweep_options& o, const sweep_result& s,
                              const boundary_curves& curves, const std::vector<failure_probability>& probabilities,
                              const std::vector<monte_carlo_estimate>& mc)
{
    nlohmann::json j;
    j["format"] = "pinproof-sweep/1";
    j["beam"] = s.beam_id;
    j["combination"] = s.combination;
    j["moving"] = o.grid ? "grid" : to_string(s.settings.path.moving);
    if (!o.grid && s.settings.path.moving != moving_end::both)
        j["held"] = s.settings.path.held.is_rigid() ? nlohmann::json(nullptr) : nlohmann::json(s.settings.path.held.value());
    j["EI_over_L"] = s.EI / s.span;
    nlohmann::json rows = nlohmann::json::array();
    for (const auto& r : s.rows) {
        nlohmann::json row = to_json(r.state);
        row["fixity_start"] = r.fixity_start;
        row["fixity_end"] = r.fixity_end;
        for (const auto& c : r.checks) row["status"][c.id] = to_string(c.status);
        rows.push_back(row);
    }
    j["rows"] = rows;
    j["thresholds"] = thresholds_json(s.thresholds, to_string(s.settings.path.moving));
    nlohmann::json bc = nlohmann::json::object();
    for (const auto& [id, pts] : curves) {
        nlohmann::json a = nlohmann::json::array();
        for (const auto& pt : pts)
            a.push_back({{"stiffness_start", pt.start.is_rigid() ? nlohmann::json(nullptr) : nlohmann::json(pt.start.value())},
                         {"stiffness_end", pt.end.is_rigid() ? nlohmann::json(nullptr) : nlohmann::json(pt.end.value())},
                         {"fixity_start", pt.fixity_start},
                         {"fixity_end", pt.fixity_end}});
        bc[id] = a;
    }
    if (o.grid) j["boundary_curves"] = bc;
    j["probability"] = probabilities_json(probabilities);
    nlohmann::json m = nlohmann::json::array();
    for (const auto& e : mc)
        m.push_back({{"check", e.check},
                     {"p_fail", e.p_fail},
                     {"standard_error", e.standard_error},
                     {"samples", e.samples},
                     {"seed", e.seed}});
    j["monte_carlo"] = m;
    return j;
}

// Every file output is written, or none; then standard output.
void write_outputs(const sweep_options& o, std::string csv, std::string svg, std::string json_text, std::ostream& out)
{
    const std::pair<const char*, const std::string*> targets[] = {
        {"--csv", &o.csv_out}, {"--svg", &o.svg_out}, {"--json", &o.json_out}};
    output_set files;
    files.add_input(o.file);
    files.add_input(o.details);
    std::string* texts[] = {&csv, &svg, &json_text};
    for (std::size_t i = 0; i < 3; ++i)
        if (!targets[i].second->empty() && *targets[i].second != "-")
            files.add(targets[i].first, *targets[i].second, std::move(*texts[i]));
    if (!files.empty()) files.commit();
    for (std::size_t i = 0; i < 3; ++i)
        if (*targets[i].second == "-") out << *texts[i];
}

beam_layout layout_of(const project& p, const std::string& id)
{
    for (const beam& b : p.beams)
        if (b.id == id) return b.layout;
    return beam_layout::two_supports;
}

void summary(std::ostream& out, const project& p, const sweep_options& o, const sweep_result& s,
             const sweep_settings& settings, const boundary_curves& curves,
             const std::vector<failure_probability>& probabilities, const std::vector<monte_carlo_estimate>& mc,
             const stiffness_uncertainty& uncertainty)
{
    const unit_system u = p.units;
    const beam_layout layout = p.beams.empty() ? beam_layout::two_supports : layout_of(p, s.beam_id);
    const bool cantilever = layout == beam_layout::cantilever;
    out << "Stiffness sweep of beam " << s.beam_id << ", combination " << s.combination << ": " << s.rows.size()
        << (o.grid ? " stiffness pairs" : " points")
        << (cantilever ? " of the root from S*L/EI = 0.01 to rigid (a pinned root is a mechanism)"
                       : " from a true pin to rigid");
    if (layout == beam_layout::overhang) out << ", the start joint moving (an overhang has no end joint)";
    if (!o.grid && layout == beam_layout::two_supports && settings.path.moving != moving_end::both)
        out << ", " << to_string(settings.path.moving) << " joint moving, the other held at "
            << stiffness_text(settings.path.held, u);
    out << " (EI/L = " << format_quantity(s.EI / s.span, dims::rotational_stiffness, u) << ").\n";
    if (!o.grid) {
        if (s.thresholds.empty())
            out << "No check changes its answer between " << (cantilever ? "S*L/EI = 0.01" : "a true pin")
                << " and a rigid joint.\n";
        for (const auto& t : s.thresholds)
            out << "  " << t.check << ": " << to_string(t.below) << " below, " << to_string(t.above) << " above S = "
                << format_quantity(t.at.value(), dims::rotational_stiffness, u)
                << " (S*L/EI = " << format_number(t.ratio, 4) << ")\n";
    } else {
        for (const auto& [id, pts] : curves)
            if (!pts.empty()) out << "  " << id << ": " << pts.size() << " points on the boundary curve in the two-end plane\n";
    }
    if (!probabilities.empty()) {
        out << "Probability that each check does not pass (the stiffness distributions given"
            << (uncertainty.start && uncertainty.end ? (uncertainty.correlation ? ", ends fully correlated"
                                                                                : ", ends independent")
                                                     : "")
            << "):\n";
        for (const auto& f : probabilities)
            out << "  " << f.check << ": " << format_number(f.p_fail, 4) << " (error estimate "
                << format_number(f.error, 2) << ")\n";
        for (const auto& e : mc)
            out << "  Monte Carlo " << e.check << ": " << format_number(e.p_fail, 4) << " +- "
                << format_number(e.standard_error, 2) << " (" << e.samples << " samples, seed " << e.seed << ")\n";
    }
}

}  // namespace

int sweep_command(const sweep_options& o, std::ostream& out, std::ostream& /*err*/)
{
    const char* on_stdout = refuse_outputs(o);
    project p = load_project_file(o.file, o.details);
    derive_joints(p);  // "from-detail" joints resolved before any analysis
    if (p.beams.empty()) throw input_error("/beams", "expected at least one beam to sweep, found none");
    const beam* b = o.beam_id.empty() ? &p.beams.front() : &beam_by_id(p, o.beam_id, o.file);
    // A cantilever or an overhang has one joint, the start: it alone moves.
    if (b->layout != beam_layout::two_supports && (!o.end.empty() || !o.hold.empty()))
        throw input_error(o.end.empty() ? "--hold" : "--end",
                          "expected no --end or --hold for a " + to_string(b->layout) + " (beam " + b->id +
                              "): it has one joint, the start, and the sweep moves it alone");
    const stiffness_uncertainty uncertainty{b->start.distribution, b->end.distribution, b->stiffness_correlation};
    const sweep_settings settings = settings_for(o, b);

    // Everything is computed before anything is written.
    const sweep_result s = sweep_beam(p, *b, settings);
    const auto probabilities = failure_probabilities(p, *b, uncertainty);
    const auto mc = o.monte_carlo ? monte_carlo_probabilities(p, *b, uncertainty, o.monte_carlo)
                                  : std::vector<monte_carlo_estimate>{};
    boundary_curves curves;
    if (o.grid)
        for (const auto& c : s.rows.front().checks)
            if (c.status != check_status::not_applicable) curves.emplace_back(c.id, boundary_curve(p, *b, c.id));

    std::string csv, svg, json_text;
    if (!o.csv_out.empty()) csv = sweep_csv(s, p.units);
    if (!o.svg_out.empty()) {
        if (o.grid) throw input_error("--svg", "the chart is drawn for a path sweep; leave out --grid for --svg");
        svg = sweep_svg(p, *b, s);
    }
    if (!o.json_out.empty()) json_text = sweep_document(o, s, curves, probabilities, mc).dump(2) + "\n";
    write_outputs(o, std::move(csv), std::move(svg), std::move(json_text), out);
    if (on_stdout) return 0;
    summary(out, p, o, s, settings, curves, probabilities, mc, uncertainty);
    return 0;
}

}  // namespace pinproof::cli
