#include "batch_command.hpp"

#include <unistd.h>

#include <algorithm>
#include <atomic>
#include <chrono>
#include <ostream>

#include "cli.hpp"
#include "pinproof/core/printable_text.hpp"
#include "pinproof/batch/batch.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/io/schedule.hpp"

// After the library headers: <csignal> defines the macro si_value.
#include <csignal>

namespace pinproof::cli {
namespace {

// Set by SIGINT while a batch runs; the workers stop after their current row.
std::atomic<bool> interrupted{false};
static_assert(std::atomic<bool>::is_always_lock_free, "the SIGINT flag must be lock-free");

extern "C" void on_interrupt(int) { interrupted.store(true); }

// Installs the SIGINT handler for its lifetime and restores the previous one.
class interrupt_guard {
public:
    interrupt_guard()
    {
        interrupted.store(false);
        struct sigaction sa {};
        sa.sa_handler = on_interrupt;
        sigemptyset(&sa.sa_mask);
        sa.sa_flags = 0;
        installed_ = sigaction(SIGINT, &sa, &previous_) == 0;
    }
    ~interrupt_guard()
    {
        if (installed_) sigaction(SIGINT, &previous_, nullptr);
    }
    interrupt_guard(const interrupt_guard&) = delete;
    interrupt_guard& operator=(const interrupt_guard&) = delete;

private:
    struct sigaction previous_ {};
    bool installed_ = false;
};

constexpr int exit_interrupted = 130;  // 128 + SIGINT, the shell's convention
constexpr std::size_t problems_shown = 50;

// A bar on stderr, drawn only when stderr is a terminal and the run has taken
// more than about a second.
class progress_bar {
public:
    explicit progress_bar(std::ostream& err) : err_(err), terminal_(isatty(STDERR_FILENO) == 1) {}
    void operator()(std::size_t done, std::size_t total)
    {
        if (!terminal_ || total == 0) return;
        const auto elapsed = std::chrono::steady_clock::now() - start_;
        if (!drawn_ && elapsed < std::chrono::seconds(1)) return;
        const int width = 40;
        const int filled = static_cast<int>(width * done / total);
        std::string bar = "\r[" + std::string(filled, '#') + std::string(width - filled, '.') + "] " +
                          std::to_string(100 * done / total) + "% " + std::to_string(done) + "/" +
                          std::to_string(total) + " beams";
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
    cmd->add_option("SCHEDULE", o.schedule, "Schedule: CSV with a header row, one beam per row")->required();
    cmd->add_option("--details", o.details, "Detail catalogue (format pinproof-details/1)")
        ->type_name("FILE")
        ->required();
    cmd->add_option("--out-csv", o.out_csv, "Write the summary CSV to FILE ('-' for stdout; the default without --out-json)")
        ->type_name("FILE");
    cmd->add_option("--out-json", o.out_json, "Write the JSON result to FILE ('-' for stdout)")->type_name("FILE");
    cmd->add_option("--jobs", o.jobs, "Worker threads (default: one per hardware thread)")
        ->type_name("N")
        ->check(CLI::PositiveNumber);
    cmd->footer("Exit codes: 0 every beam holds, 1 a beam does not hold, 2 a row was refused or the input is bad, "
                "130 interrupted (nothing written).");
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
    try {
        const detail_catalogue catalogue = load_detail_catalogue_file(o.details);
        const schedule s = load_schedule_file(o.schedule);

        interrupt_guard guard;
        progress_bar bar(err);
        batch_options options;
        options.jobs = o.jobs;
        options.json = !o.out_json.empty();
        options.cancel = &interrupted;
        options.progress = [&bar](std::size_t done, std::size_t total) { bar(done, total); };
        const batch_result r = run_batch(s, catalogue, options);
        bar.clear();
        if (r.cancelled || interrupted.load()) {
            err << "pinproof: interrupted after " << std::count_if(r.rows.begin(), r.rows.end(), [](const batch_row& x) {
                return x.line != 0;
            }) << " of " << s.rows.size() << " beams; nothing was written.\n";
            return exit_interrupted;
        }

        // Everything is computed before anything is written.
        std::string csv_text, json_text;
        if (!csv_target.empty()) csv_text = batch_summary_csv(r);
        if (!o.out_json.empty()) json_text = batch_result_json(r, s, catalogue);
        if (!csv_target.empty()) {
            if (csv_target == "-") out << csv_text;
            else write_file_atomically(csv_target, csv_text);
        }
        if (!o.out_json.empty()) {
            if (o.out_json == "-") out << json_text;
            else write_file_atomically(o.out_json, json_text);
        }

        std::size_t shown = 0, refused_problems = 0;
        for (const auto& row : r.rows) {
            if (row.verdict != batch_verdict::refused) continue;
            for (const auto& p : row.problems) {
                ++refused_problems;
                if (shown++ < problems_shown) err << "error: " << message_text(p.where) << ": " << message_text(p.message) << "\n";
            }
        }
        if (refused_problems > problems_shown)
            err << "... and " << refused_problems - problems_shown << " more problems (see the summary).\n";
        const bool data_on_stdout = csv_target == "-" || o.out_json == "-";
        (data_on_stdout ? err : out) << "pinproof batch: " << batch_counts_text(r.summary) << ".\n";
        if (r.summary.refused > 0) return exit_error;
        return r.summary.failed > 0 ? exit_does_not_hold : exit_holds;
    } catch (const input_error& e) {
        report_problems(e.problems(), err);
        return exit_error;
    }
}

}  // namespace pinproof::cli
