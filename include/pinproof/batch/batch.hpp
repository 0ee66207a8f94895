// Assessing every beam of a schedule (schedule.hpp) on a pool of threads, and
// the summary of the run: one row per beam, in input order, as CSV text and as
// a JSON result (format "pinproof-batch-result/1", docs/batch-and-catalogues.md).
#pragma once

#include <atomic>
#include <chrono>
#include <functional>
#include <optional>
#include <string>
#include <vector>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/io/schedule.hpp"

namespace pinproof {

inline constexpr const char* batch_result_format = "pinproof-batch-result/1";

enum class batch_verdict { holds, does_not_hold, refused };
std::string to_string(batch_verdict v);  // "holds", "does-not-hold", "refused"

struct batch_row {
    std::size_t line = 0;  // line of the schedule
    std::string id;
    batch_verdict verdict = batch_verdict::refused;
    // The check that governs: a failed check if there is one, and among the
    // failed checks (or, if none failed, among the checks with a value and a
    // limit) the largest value/limit; a failed check without a ratio (a rigid
    // joint) comes first. "" for a refused row.
    std::string governing_check;
    std::optional<double> worst_ratio;  // value/limit of the governing check, when it has both
    std::string message;                // the governing check's message, or the row's problems
    // Largest |end moment| (N*m) under the strength combinations over the
    // stiffness range (the joint-moment checks), and largest |end rotation|
    // (rad) over every combination (the rotation-demand checks).
    std::optional<double> moment_start, moment_end;
    std::optional<double> rotation_start, rotation_end;
    // Rotation (rad) at which the end gap closes in sagging, at the worst-case
    // gap of the catalogue entry's geometry; empty where the entry gives no
    // geometry or nothing closes within 90 degrees.
    std::optional<double> closure_rotation_start, closure_rotation_end;
    // Largest end reaction (N) under the strength combinations over the
    // stiffness range: what the support and the joint's shear must carry.
    std::optional<double> reaction_start, reaction_end;
    // The id of every failed check, in the order of the checks.
    std::vector<std::string> failed_checks;
    std::vector<input_problem> problems;  // of a refused row
    // The row's line of the summary CSV (batch_summary_csv), with its newline,
    // formatted by the worker that assessed it in the row's units.
    std::string summary_line;
    unit_system units = unit_system::si;
    std::string json;                     // the row as JSON text, when batch_options::json
};

struct batch_summary {
    std::size_t rows = 0;     // beam rows in the schedule
    std::size_t checked = 0;  // assessed: passed + failed
    std::size_t passed = 0;   // every check holds
    std::size_t failed = 0;   // at least one check fails
    std::size_t refused = 0;  // bad data (or an internal error): not assessed
};

struct batch_options {
    unsigned jobs = 0;  // worker threads; 0: one per hardware thread
    bool json = false;  // build each row's JSON result text
    // The checks do not need the interior search of the range box.
    assessment_options assessment{false};
    // Called on the calling thread about every `progress_interval` while rows
    // are assessed, with the number of rows done and the total.
    std::function<void(std::size_t done, std::size_t total)> progress;
    std::chrono::milliseconds progress_interval{100};
    // When set to true, workers stop after their current row.
    const std::atomic<bool>* cancel = nullptr;
};

struct batch_result {
    std::vector<batch_row> rows;  // in input order
    // The summary CSV's units: US customary when every assessed row is,
    // else SI (one unit per column).
    unit_system units = unit_system::si;
    batch_summary summary;
    bool cancelled = false;       // the run was stopped; rows are incomplete
    unsigned workers_asked = 0;   // worker threads wanted (options.jobs, bounded by the rows)
    unsigned workers = 0;         // worker threads the system could start (at least 1: the caller's own)
};

// Reads and assesses one row. Never throws: bad data refuses the row.
batch_row assess_schedule_row(const schedule& s, std::size_t index, const detail_catalogue& catalogue,
                              const batch_options& options);

// Assesses every row on options.jobs threads; results are in input order.
batch_result run_batch(const schedule& s, const detail_catalogue& catalogue, const batch_options& options = {});

// The summary as CSV (RFC 4180): comment lines starting with '#' (the counts,
// and what the closure rotations are), a header row, then one row per beam.
// Moments in kN*m, rotations in mrad.
std::string batch_summary_csv(const batch_result& r);
// Its parts, for a summary written row by row: the header row (with its
// newline) and one row's line in the given units.
std::string batch_summary_csv_header(unit_system units);
std::string batch_summary_line(const batch_row& row, unit_system units);

// The JSON result: counts, and per beam the summary fields in SI base units
// and, for an assessed beam, its full result (result_json.hpp) under "result".
// Needs rows built with batch_options::json.
std::string batch_result_json(const batch_result& r, const schedule& s, const detail_catalogue& catalogue);
// Its parts, for a result written row by row: the text before the first beam,
// then each row's `json` indented by two spaces, separated by ",\n", then a
// newline and the tail.
std::string batch_result_json_head(const batch_summary& summary, const std::string& schedule_source,
                                  const detail_catalogue& catalogue);
inline constexpr const char* batch_result_json_tail = " ]\n}\n";

// One line: "312 rows: 300 checked (280 passed, 20 failed), 12 refused".
std::string batch_counts_text(const batch_summary& s);

}  // namespace pinproof
