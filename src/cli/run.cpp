#include <CLI/CLI.hpp>
#include <nlohmann/json.hpp>

#include <ostream>
#include <sstream>

#include "cli.hpp"
#include "pinproof/assessment.hpp"
#include "pinproof/errors.hpp"
#include "pinproof/output_file.hpp"
#include "pinproof/project.hpp"
#include "pinproof/result_json.hpp"
#include "pinproof/section.hpp"
#include "pinproof/text_report.hpp"

namespace pinproof::cli {
namespace {

const char* const version = PINPROOF_VERSION;

void report_input_error(const input_error& e, std::ostream& err)
{
    err << "pinproof: the input has " << e.problems().size() << " problem" << (e.problems().size() == 1 ? "" : "s")
        << "; nothing was written.\n";
    for (const auto& p : e.problems()) err << "error: " << p.where << ": " << p.message << "\n";
}

// Writes `text` to FILE, or to `out` for "-".
void emit(const std::string& target, const std::string& text, std::ostream& out)
{
    if (target == "-") out << text;
    else write_file_atomically(target, text);
}

int check_command(const std::string& file, const std::string& json_out, bool quiet, std::ostream& out)
{
    const project p = load_project_file(file);
    const project_assessment a = assess_project(p);
    // Everything is computed before anything is written.
    std::string json_text;
    if (!json_out.empty()) json_text = to_json(a).dump(2) + "\n";
    const std::string report = text_report(a, version);
    if (!json_out.empty()) emit(json_out, json_text, out);
    if (!quiet && json_out != "-") out << report;
    return a.all_hold() ? exit_holds : exit_does_not_hold;
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

int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    CLI::App app{"pinproof: checks whether steel beam-end joints may be idealised as pins.\n"
                 "Analyses each beam with semi-rigid end springs over the given stiffness range, compares with\n"
                 "ideal pinned and fixed ends, classifies the joints (EN 1993-1-8, AISC 360) and gives a verdict.\n"
                 "Results support, and do not replace, the judgement of a qualified engineer.",
                 "pinproof"};
    app.set_version_flag("--version", std::string("pinproof ") + version);
    app.require_subcommand(1);
    app.footer("Exit codes: 0 every verdict holds, 1 a verdict does not hold, 2 bad input or an error.");

    std::string file, json_out;
    bool quiet = false;
    auto* check = app.add_subcommand("check", "Check every beam of a project file and print the report");
    check->add_option("FILE", file, "Project file (format pinproof-project/1)")->required();
    check->add_option("--json", json_out, "Also write the machine-readable result to FILE ('-' for stdout)")
        ->type_name("FILE");
    check->add_flag("-q,--quiet", quiet, "Print no text report (the exit code still gives the verdict)");
    check->footer("Exit codes: 0 every verdict holds, 1 a verdict does not hold, 2 bad input or an error.");

    auto* sections = app.add_subcommand("sections", "List the built-in section catalogue");

    std::vector<std::string> reversed(args.rbegin(), args.rend());
    try {
        app.parse(reversed);
    } catch (const CLI::ParseError& e) {
        if (e.get_exit_code() == 0) {
            // --help or --version: data on stdout.
            app.exit(e, out, err);
            return 0;
        }
        app.exit(e, out, err);
        return exit_error;
    }

    try {
        if (check->parsed()) return check_command(file, json_out, quiet, out);
        if (sections->parsed()) return sections_command(out);
    } catch (const input_error& e) {
        report_input_error(e, err);
        return exit_error;
    } catch (const internal_error& e) {
        err << "pinproof: internal error: " << e.what()
            << "\nThis is a fault of pinproof, not of the input; nothing was written. Please report it with the input file.\n";
        return exit_error;
    } catch (const std::exception& e) {
        err << "pinproof: error: " << e.what() << "; nothing was written.\n";
        return exit_error;
    }
    return exit_error;
}

}  // namespace pinproof::cli
