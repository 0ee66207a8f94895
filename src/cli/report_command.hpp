// `pinproof report FILE -o report.html`: the calculation report of a project
// as one self-contained HTML file (calculation_report.hpp); for a schedule
// (a file named *.csv, with --details) the schedule's summary page
// (schedule_summary.hpp).
#pragma once

#include <iosfwd>
#include <string>

namespace pinproof::cli {

// Loads and assesses the project, writes the report atomically to `out_path`
// and prints one line naming it. Returns 0 when every verdict holds, 1 when
// one does not; for a schedule 2 when a row was refused (as `batch`). Bad input is thrown as input_error for the caller to report;
// nothing is written then.
int report_command(const std::string& file, const std::string& out_path, std::ostream& out, std::ostream& err,
                   const std::string& details_file = "");

}  // namespace pinproof::cli
