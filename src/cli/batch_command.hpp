// The `batch` subcommand: assesses every beam of a schedule against a detail
// catalogue and writes the summary (CSV) and, if asked, the JSON result.
#pragma once

#include <CLI/CLI.hpp>

#include <iosfwd>
#include <string>

namespace pinproof::cli {

// The most worker threads --jobs accepts.
inline constexpr unsigned max_jobs = 256;

struct batch_command_options {
    std::string schedule;  // CSV file
    std::string details;   // catalogue file (format pinproof-details/1)
    std::string out_csv;   // "" with no out_json: the CSV goes to stdout; "-": stdout
    std::string out_json;  // "": none; "-": stdout
    unsigned jobs = 0;     // 0: one worker per hardware thread
    bool quiet = false;    // no progress bar and no summary line
};

// Registers the subcommand on `app`, filling `options` when parsed.
CLI::App* add_batch_subcommand(CLI::App& app, batch_command_options& options);

// Runs it. Exit codes as for `check`: 0 every beam holds, 1 a beam does not
// hold, 2 a row was refused or the input is bad; 128 + the signal number when
// interrupted (130 SIGINT, 143 SIGTERM, 129 SIGHUP), in which case nothing is
// written.
int batch_command(const batch_command_options& options, std::ostream& out, std::ostream& err);

}  // namespace pinproof::cli
