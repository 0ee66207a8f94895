// The summary page of a building's schedule (`pinproof report SCHEDULE.csv
// --details CATALOGUE`): one self-contained HTML page, printable on A4 and
// Letter, with the counts by verdict, the checks that fail and govern most
// often, and a table of every beam that can be sorted by any column (a short
// inline script; without it the table reads in schedule order). The full
// calculation of any one beam is `pinproof report` on a project file.
#pragma once

#include <string>

#include "pinproof/batch/batch.hpp"

namespace pinproof {

struct schedule_summary_info {
    std::string schedule_file, schedule_sha256;  // as given, and the SHA-256 of its bytes
    std::string catalogue_file, catalogue_title;
    std::string date;     // ISO 8601; passed in so that pages are reproducible
    std::string version;  // of pinproof
};

// `r` must be run_batch over the schedule named in `info`.
std::string schedule_summary_html(const batch_result& r, const schedule_summary_info& info);

}  // namespace pinproof
