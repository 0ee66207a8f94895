#include "batch_command.hpp"

#include <unistd.h>

#include <algorithm>
#include <atomic>
#include <chrono>
#include <memory>
#include <ostream>

#include "cli.hpp"
#include "count_option.hpp"
#include "interruption.hpp"
#include "pinproof/core/printable_text.hpp"
#include "pinproof/batch/batch.hpp"
#include "pinproof/batch/streamed_batch.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/io/schedule_stream.hpp"

namespace pinproof::cli {
namespace {

constexpr std::size_t problems_shown = 50;

// A bar on stderr, drawn only when stderr is a terminal and the run has taken
// more than about a second.
class progress_bar {
public:
    explicit progress_bar(std::ostream& err) : err_(err), terminal_(isatty(STDERR_FILENO) == 1) {}
    void operator()(std::size_t done, double fraction)
    {
        if (!terminal_) return;
        const auto elapsed = std::chrono::steady_clock::now() - start_;
        if (!drawn_ && elapsed < std::chrono::seconds(1)) return;
        const int width = 40;
        const int filled = static_cast<int>(width * std::clamp(fraction, 0.0, 1.0));
        std::string bar = "\r[" + std::string(filled, '#') + std::string(width - filled, '.') + "] " +
                          std::to_string(static_cast<int>(100 * std::clamp(fraction, 0.0, 1.0))) + "% " +
                          std::to_string(done) + " beams";
        err_ << bar << std::flush;
        drawn_ = true;
    }
    void clear()
    {
        if (drawn_) err_ << "\r" << std::string(72, ' ') << "\r" << std::flush;
        drawn_ = false;
    }

private:
    std::ostream& err_;
    bool terminal_;
    bool drawn_ = false;
    std::chrono::steady_clock::time_point start_ = std::chrono::steady_clock::now();
};

void report_problems(const std::vector<input_problem>& problems, std::ostream& err)
{
    err << "pinproof: the input has " << problems.size() << " problem" << (problems.size() == 1 ? "" : "s")
        << "; nothing was written.\n";
    for (const auto& p : problems) err << "error: " << message_text(p.where) << ": " << message_text(p.message) << "\n";
}

}  // namespace

CLI::App* add_batch_subcommand(CLI::App& app, batch_command_options& o)
{
    auto* cmd = app.add_subcommand("batch", "Check every beam of a schedule (CSV) against a detail catalogue");
    cmd->add_option("SCHEDULE", o.schedule, "Schedule: CSV with a header row, one beam per row ('-' for standard input)")->required();
    cmd->add_option("--details", o.details, "Detail catalogue (format pinproof-details/1; '-' for standard input)")
        ->type_name("FILE")
        ->required();
    cmd->add_option("--out-csv", o.out_csv, "Write the summary CSV to FILE ('-' for stdout; the default without --out-json)")
        ->type_name("FILE");
    cmd->add_option("--out-json", o.out_json, "Write the JSON result to FILE ('-' for stdout)")->type_name("FILE");
    cmd->add_option("--jobs", o.jobs,
                    "Worker threads, 0 to " + std::to_string(max_jobs) +
                        "; 0 (the default) means one per hardware thread. Fewer are used when the system "
                        "cannot start as many")
        ->type_name("N")
        ->check(count_range(0, max_jobs));
    cmd->footer("Exit codes: 0 every beam holds, 1 a beam does not hold, 2 a row was refused or the input is bad; "
                "129, 130, 143 ended by SIGHUP, SIGINT, SIGTERM (nothing written). No output may be an input; "
                "the outputs are written together, only when all succeed.");
    return cmd;
}

int batch_command(const batch_command_options& o, std::ostream& out, std::ostream& err)
{
    std::string csv_target = o.out_csv;
    if (csv_target.empty() && o.out_json.empty()) csv_target = "-";
    if (csv_target == "-" && o.out_json == "-") {
        err << "pinproof: --out-csv and --out-json cannot both write to stdout ('-'); nothing was written.\n";
        return exit_error;
    }
    if (o.schedule == "-" && o.details == "-") {
        err << "pinproof: the input has 1 problem; nothing was written.\n"
            << "error: --details: standard input can be read once, and the schedule is read from it ('-'); give the "
               "detail catalogue as a file\n";
        return exit_error;
    }
    try {
        // The outputs are refused before any work when they name an input.
        output_set outputs;
        outputs.add_input(o.schedule);
        outputs.add_input(o.details);
        if (!csv_target.empty() && csv_target != "-") outputs.add("--out-csv", csv_target, "");
        if (!o.out_json.empty() && o.out_json != "-") outputs.add("--out-json", o.out_json, "");
        outputs.check();

        const detail_catalogue catalogue = load_detail_catalogue_file(o.details);
        // The schedule is read part by part and the rows written to scratch
        // files as they are done (streamed_batch.hpp): memory stays flat.
        schedule_stream in(o.schedule);

        progress_bar bar(err);
        streamed_batch_options options;
        options.batch.jobs = o.jobs;
        options.batch.json = !o.out_json.empty();
        options.batch.cancel = &interruption_requested();
        options.problems_kept = problems_shown;
        if (!o.quiet) options.progress = [&bar](std::size_t done, double fraction) { bar(done, fraction); };
        streamed_batch_outputs scratch;
        if (!csv_target.empty()) {
            scratch.csv_si = std::make_shared<scratch_file>(csv_target);
            scratch.csv_us = std::make_shared<scratch_file>(csv_target);
        }
        if (!o.out_json.empty()) scratch.json = std::make_shared<scratch_file>(o.out_json);
        // A signal stops the workers after their current row (interruption.hpp).
        stop_cooperatively(true);
        const streamed_batch_result r = run_streamed_batch(in, catalogue, options, scratch);
        bar.clear();
        if (r.cancelled || interruption_requested().load()) {
            err << "pinproof: interrupted by " << interruption_name() << " after " << r.summary.rows
                << " beams; nothing was written.\n";
            return interruption_exit_code();
        }
        // From here a signal ends the run at once, removing the temporaries.
        stop_cooperatively(false);
        if (r.workers < r.workers_asked)
            err << "pinproof: note: the system could start only " << r.workers << " of " << r.workers_asked
                << " worker threads; the batch ran with " << r.workers << ".\n";

        // Every row is done before anything is written.
        std::string csv_head, json_head;
        const auto csv_body = r.units == unit_system::us_customary ? scratch.csv_us : scratch.csv_si;
        if (!csv_target.empty()) csv_head = batch_summary_csv_header(r.units);
        if (!o.out_json.empty()) json_head = batch_result_json_head(r.summary, o.schedule, catalogue);
        // Every file output is written, or none; then standard output.
        output_set files;
        files.add_input(o.schedule);
        files.add_input(o.details);
        if (!csv_target.empty() && csv_target != "-") files.add("--out-csv", csv_target, csv_head, csv_body, "");
        if (!o.out_json.empty() && o.out_json != "-")
            files.add("--out-json", o.out_json, json_head, scratch.json, batch_result_json_tail);
        if (!files.empty()) files.commit();
        if (csv_target == "-") {
            out << csv_head;
            csv_body->copy_to(out);
        }
        if (o.out_json == "-") {
            out << json_head;
            scratch.json->copy_to(out);
            out << batch_result_json_tail;
        }

        for (const auto& p : r.problems)
            err << "error: " << message_text(p.where) << ": " << message_text(p.message) << "\n";
        if (r.problem_count > problems_shown)
            err << "... and " << r.problem_count - problems_shown << " more problems (see the summary).\n";
        const bool data_on_stdout = csv_target == "-" || o.out_json == "-";
        if (!o.quiet) (data_on_stdout ? err : out) << "pinproof batch: " << batch_counts_text(r.summary) << ".\n";
        if (r.summary.refused > 0) return exit_error;
        return r.summary.failed > 0 ? exit_does_not_hold : exit_holds;
    } catch (const input_error& e) {
        report_problems(e.problems(), err);
        return exit_error;
    }
}

}  // namespace pinproof::cli
