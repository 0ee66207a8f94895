#include <CLI/CLI.hpp>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <chrono>
#include <new>
#include <ostream>
#include <sstream>

#include "batch_command.hpp"
#include "cli.hpp"
#include "report_command.hpp"
#include "sweep_command.hpp"
#include "detail_command.hpp"
#include "fit_command.hpp"
#include "new_command.hpp"
#include "interruption.hpp"
#include "verbosity.hpp"
#include "pinproof/joints/joint_from_detail.hpp"
#include "pinproof/core/printable_text.hpp"
#include "pinproof/core/spelling.hpp"
#include "pinproof/checks/assessment.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/core/input_file.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/report/result_json.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/report/text_report.hpp"
#include "pinproof/io/project_input.hpp"

namespace pinproof::cli {
namespace {

const char* const version = PINPROOF_VERSION;
const char* const exit_codes_text = "Exit codes: 0 every verdict holds, 1 a verdict does not hold, 2 bad input or an "
                                    "error; 129, 130, 143 ended by SIGHUP, SIGINT, SIGTERM (nothing written).";

void report_input_error(const input_error& e, std::ostream& err)
{
    err << "pinproof: the input has " << e.total() << " problem" << (e.total() == 1 ? "" : "s")
        << "; nothing was written.\n";
    for (const auto& p : e.problems()) err << "error: " << message_text(p.where) << ": " << message_text(p.message) << "\n";
}

int check_command(const std::string& file, const std::string& details, const std::string& json_out, bool quiet,
                  std::ostream& out)
{
    // The outputs are refused before any work when they name an input.
    output_set outputs;
    outputs.add_input(file);
    outputs.add_input(details);
    if (!json_out.empty() && json_out != "-") outputs.add("--json", json_out, "");
    outputs.check();

    project p = load_project_file(file, details);
    derive_joints(p);  // "from-detail" joints resolved before any analysis
    const project_assessment a = assess_project(p);
    // Everything is computed before anything is written.
    std::string json_text;
    if (!json_out.empty()) json_text = to_json(a).dump(2) + "\n";
    const std::string report = text_report(a, version);
    if (json_out == "-") {
        out << json_text;
    } else if (!json_out.empty()) {
        output_set final_outputs;
        final_outputs.add_input(file);
        final_outputs.add_input(details);
        final_outputs.add("--json", json_out, std::move(json_text));
        final_outputs.commit();
    }
    if (!quiet && json_out != "-") out << report;
    return a.all_hold() ? exit_holds : exit_does_not_hold;
}

// An option given with an empty value ("--json ''") is refused rather than
// read as "not given".
bool refuse_empty_values(const std::vector<const CLI::App*>& commands, std::ostream& err)
{
    for (const auto* cmd : commands) {
        if (!cmd->parsed()) continue;
        for (const auto* opt : cmd->get_options()) {
            if (opt->count() == 0 || opt->get_type_size() == 0) continue;
            for (const auto& v : opt->results()) {
                if (!v.empty()) continue;
                err << "pinproof: " << opt->get_name() << ": expected "
                    << (opt->get_type_name() == "FILE" ? "a file name (or '-' for standard output)" : "a value")
                    << ", found an empty text; nothing was written.\n";
                return true;
            }
        }
    }
    return false;
}

int sections_command(std::ostream& out)
{
    out << "Built-in section catalogue (properties computed from the dimensions, with root fillets)\n";
    out << "name          h (mm)    b (mm)   tw (mm)   tf (mm)    r (mm)     I (cm4)\n";
    for (const auto& d : catalogue()) {
        const section s = rolled_i_section(d);
        char line[160];
        std::snprintf(line, sizeof line, "%-12s %7.1f %9.1f %9.2f %9.2f %9.2f %11.1f\n", d.name.c_str(), d.h * 1e3,
                      d.b * 1e3, d.tw * 1e3, d.tf * 1e3, d.r * 1e3, s.I * 1e8);
        out << line;
    }
    return 0;
}

}  // namespace

namespace {

// The program's commands and their options, defined once; `dispatch` runs the
// one that was parsed.
struct command_line {
    CLI::App app{"pinproof: checks whether steel beam-end joints may be idealised as pins.\n"
                 "Analyses each beam with semi-rigid end springs over the given stiffness range, compares with\n"
                 "ideal pinned and fixed ends, classifies the joints (EN 1993-1-8, AISC 360) and gives a verdict.\n"
                 "Results support, and do not replace, the judgement of a qualified engineer.",
                 "pinproof"};
    std::string file, json_out, details;
    verbosity verb;  // of the one command parsed
    detail_options detail_opts;
    sweep_options sweep_opts;
    batch_command_options batch_options;
    std::string report_file, report_out, report_details;
    new_options new_opts;
    fit_options fit_opts;
    CLI::App *check = nullptr, *sections = nullptr, *detail = nullptr, *sweep = nullptr, *batch = nullptr,
             *report = nullptr, *starter = nullptr, *fit = nullptr;

    command_line();
    void define_check_and_detail(const char* details_help);
    void define_report(const char* details_help);
    int dispatch(std::ostream& out, std::ostream& err);
    int run_command(std::ostream& out, std::ostream& err);
    bool results_on_stdout() const;
    std::string command_name() const;
};

command_line::command_line()
{
    app.set_version_flag("--version", std::string("pinproof ") + version);
    // At most one command; a missing one is reported after parsing, so that an
    // unknown option or word is named rather than hidden behind "a command is required".
    app.require_subcommand(0, 1);
    app.footer(exit_codes_text);
    const char* details_help = "Detail catalogue (format pinproof-details/1) for joints given as detail ids; "
                               "overrides the project's \"details\" key ('-' for standard input)";
    define_check_and_detail(details_help);
    sweep = app.add_subcommand("sweep", "Sweep a beam's joint stiffness from a true pin to rigid: results, "
                                        "thresholds and failure probabilities");
    add_sweep_options(*sweep, sweep_opts);
    batch = add_batch_subcommand(app, batch_options);
    define_report(details_help);
    starter = add_new_subcommand(app, new_opts);
    fit = add_fit_subcommand(app, fit_opts);
    for (CLI::App* c : {check, sections, detail, sweep, batch, report, starter, fit}) add_verbosity_flags(*c, verb);
}

void command_line::define_check_and_detail(const char* details_help)
{
    check = app.add_subcommand("check", "Check every beam of a project file and print the report");
    check->add_option("FILE", file, "Project file (format pinproof-project/1; '-' for standard input)")->required();
    check->add_option("--json", json_out, "Also write the machine-readable result to FILE ('-' for stdout); "
                                          "refused if FILE is an input")
        ->type_name("FILE");
    check->add_option("--details", details, details_help)->type_name("FILE");
    check->footer(exit_codes_text);

    sections = app.add_subcommand("sections", "List the built-in section catalogue");
    sections->footer("Exit codes: 0 listed.");

    detail = app.add_subcommand("detail", "Check the end gap of one joint and draw its elevation (SVG)");
    detail->add_option("FILE", detail_opts.file, "Project file (format pinproof-project/1; '-' for standard input)")->required();
    detail->add_option("--beam", detail_opts.beam, "Beam id")->required();
    detail->add_option("--end", detail_opts.end, "Which joint: start or end")
        ->check(CLI::IsMember({"start", "end"}))
        ->capture_default_str();
    detail->add_option("--svg", detail_opts.svg, "Drawing to write ('-' for stdout)")->required()->type_name("FILE");
    detail->add_option("--details", detail_opts.details, details_help)->type_name("FILE");
}

void command_line::define_report(const char* details_help)
{
    report = app.add_subcommand("report", "Write the calculation report of a project file, or the summary page of a "
                                          "schedule, as one HTML file");
    report->add_option("FILE", report_file, "Project file (format pinproof-project/1; '-' for standard input), or a "
                                            "schedule named *.csv (with --details): its summary page")
        ->required();
    report->add_option("-o,--output", report_out, "HTML file to write ('-' for stdout)")->required()->type_name("FILE");
    report->add_option("--details", report_details, details_help)->type_name("FILE");
}

// Whether the parsed command writes the results asked for on standard output
// (then --quiet leaves standard output alone).
bool command_line::results_on_stdout() const
{
    if (check->parsed()) return json_out == "-";
    if (sweep->parsed()) return sweep_opts.csv_out == "-" || sweep_opts.svg_out == "-" || sweep_opts.json_out == "-";
    if (detail->parsed()) return detail_opts.svg == "-";
    if (report->parsed()) return report_out == "-";
    if (starter->parsed()) return new_opts.output == "-";
    return true;  // sections, fit and batch: their output is the result
}

std::string command_line::command_name() const
{
    for (const CLI::App* c : {check, sections, detail, sweep, batch, report, starter, fit})
        if (c->parsed()) return c->get_name();
    return "pinproof";
}

int command_line::dispatch(std::ostream& out, std::ostream& err)
{
    const auto started = std::chrono::steady_clock::now();
    forget_input_files_read();  // the inputs of this run only
    batch_options.quiet = verb.quiet;
    const int code = run_command(verb.quiet && !results_on_stdout() ? null_stream() : out, err);
    if (verb.verbose) {
        for (const auto& f : input_files_log())
            err << "pinproof: read the " << f.what << " " << message_text(f.path) << " (" << f.bytes << " bytes)\n";
        const double seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - started).count();
        err << "pinproof: " << command_name() << " took " << format_number(seconds, 3) << " s; exit code " << code
            << "\n";
    }
    return code;
}

int command_line::run_command(std::ostream& out, std::ostream& err)
{
    // SIGINT, SIGTERM and SIGHUP remove the temporaries and end the run with
    // 128 + the signal number (interruption.hpp).
    interruption_guard interruption;
    try {
        if (check->parsed()) return check_command(file, details, json_out, verb.quiet, out);
        if (sections->parsed()) return sections_command(out);
        if (sweep->parsed()) return sweep_command(sweep_opts, out, err);
        if (detail->parsed()) return detail_command(detail_opts, out, err);
        if (batch->parsed()) return batch_command(batch_options, out, err);
        if (report->parsed()) return report_command(report_file, report_out, out, err, report_details);
        if (fit->parsed()) return fit_command(fit_opts, out);
        if (starter->parsed()) return new_command(new_opts, out);
        err << "pinproof: a command is required (new, check, report, detail, sweep, batch, fit or sections)\nRun with --help for more information.\n";
        return exit_error;
    } catch (const input_error& e) {
        report_input_error(e, err);
        return exit_error;
    } catch (const internal_error& e) {
        err << "pinproof: internal error: " << message_text(e.what())
            << "\nThis is a fault of pinproof, not of the input; nothing was written. Please report it with the input file.\n";
        return exit_error;
    } catch (const std::bad_alloc&) {
        err << "pinproof: error: out of memory; nothing was written. Reduce the size of the run (fewer points, "
               "samples or beams).\n";
        return exit_error;
    } catch (const std::exception& e) {
        const std::string what = e.what();
        // A failure after some outputs were renamed says so itself.
        err << "pinproof: error: " << message_text(what)
            << (what.find("already in place") == std::string::npos ? "; nothing was written.\n" : "\n");
        return exit_error;
    }
}

}  // namespace

namespace {

// "Did you mean" for a misspelt command, before the parser calls it an
// unexpected argument.
bool refuse_unknown_command(const command_line& cl, const std::vector<std::string>& args, std::ostream& err)
{
    if (args.empty() || args[0].empty() || args[0][0] == '-') return false;
    std::vector<std::string> names;
    for (const CLI::App* c : cl.app.get_subcommands({})) names.push_back(c->get_name());
    if (std::find(names.begin(), names.end(), args[0]) != names.end()) return false;
    std::string list;
    for (std::size_t i = 0; i < names.size(); ++i)
        list += (i == 0 ? "" : i + 1 == names.size() ? " or " : ", ") + names[i];
    err << "pinproof: unknown command \"" << message_text(args[0]) << "\"" << did_you_mean(args[0], names)
        << " (the commands are " << list << ")\nRun with --help for more information.\n";
    return true;
}

// "Did you mean" for each unknown option of a command.
void suggest_options(const command_line& cl, const std::vector<std::string>& args, std::ostream& err)
{
    if (args.empty()) return;
    const CLI::App* cmd = nullptr;
    for (const CLI::App* c : cl.app.get_subcommands({}))
        if (c->get_name() == args[0]) cmd = c;
    if (!cmd) return;
    std::vector<std::string> names;
    for (const CLI::Option* o : cmd->get_options({}))
        for (const auto& l : o->get_lnames()) names.push_back("--" + l);
    for (std::size_t i = 1; i < args.size(); ++i) {
        const std::string word = args[i].substr(0, args[i].find('='));
        if (word.rfind("--", 0) != 0 || std::find(names.begin(), names.end(), word) != names.end()) continue;
        const std::string hint = did_you_mean(word, names);
        if (!hint.empty()) err << "pinproof " << cmd->get_name() << ": unknown option " << message_text(word) << hint << "\n";
    }
}

}  // namespace

int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    command_line cl;
    if (refuse_unknown_command(cl, args, err)) return exit_error;
    std::vector<std::string> reversed(args.rbegin(), args.rend());
    try {
        cl.app.parse(reversed);
    } catch (const CLI::ParseError& e) {
        // --help or --version (exit code 0): data on stdout.
        cl.app.exit(e, out, err);
        if (e.get_exit_code() != 0) suggest_options(cl, args, err);
        return e.get_exit_code() == 0 ? 0 : exit_error;
    }
    if (refuse_empty_values({cl.check, cl.detail, cl.sweep, cl.batch, cl.report, cl.starter, cl.fit}, err))
        return exit_error;
    return cl.dispatch(out, err);
}

}  // namespace pinproof::cli
