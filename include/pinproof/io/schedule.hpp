// A beam schedule: one beam per row of a CSV file with a header row
// (docs/batch-and-catalogues.md). Each row names its span, section, uniform
// line loads of cases G and Q, a combination set and the catalogue details at
// its two ends.
//
// CSV follows RFC 4180: cells separated by commas, a cell may be enclosed in
// double quotes (then it may hold commas, line breaks and "" for a quote),
// records end with CRLF or LF. Also accepted: a UTF-8 byte-order mark, blank
// lines and lines starting with '#' (comments), which are skipped.
//
// Places are given as "line L, column C (name)": L counts lines of the file
// from 1 (a record spanning lines is at the line where it starts), C counts
// cells of the record from 1, and name is the header of that column.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "pinproof/io/detail_catalogue.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/loads.hpp"
#include "pinproof/model/project.hpp"

namespace pinproof {

struct csv_record {
    std::size_t line = 0;  // line of the file where the record starts
    std::vector<std::string> cells;
    // A misplaced double quote in cell `bad_column` (from 1; 0: none) makes the
    // record unreadable; `bad_reason` says why ("expected ..., found ...").
    std::size_t bad_column = 0;
    std::string bad_reason;
};

// Splits CSV text into records. Unquoted cells are trimmed of spaces and tabs.
// Throws input_error at "line L, column C" for a quote that is never closed
// (the rest of the file cannot be read); a quote misplaced inside one record
// marks only that record.
std::vector<csv_record> read_csv(std::string_view text);

// The records of a part of a CSV file (a file read part by part): `text`
// starts at the start of a record, on line `first_line`; `at_start` when it is
// the start of the file (a byte-order mark is skipped), `at_end` when it ends
// the file. Appends the records that end within `text` to `out`; a record that
// may go on past the end of the part is left for the next part. Returns the
// bytes read and the line the next part starts on. Throws as read_csv, and for
// an open quote only `at_end`.
struct csv_part {
    std::size_t bytes = 0;
    std::size_t next_line = 1;
};
csv_part read_csv_part(std::string_view text, std::size_t first_line, bool at_start, bool at_end,
                       std::vector<csv_record>& out);

// Named sets of load combinations for the cases G (permanent, "D" in ASCE 7)
// and Q (imposed, "L" in ASCE 7):
//   EN1990: strength 1.35G + 1.5Q (EN 1990 Eq. 6.10 with Table A1.2(B):
//           gamma_G,sup = 1.35, gamma_Q = 1.5); service G + Q (characteristic,
//           Eq. 6.14b).
//   ASCE7 : strength 1.4D and 1.2D + 1.6L (ASCE 7-16 2.3.1, combinations 1
//           and 2, with no roof, snow or rain load); service D + L.
enum class combination_set { en1990, asce7 };
std::string to_string(combination_set c);  // "EN1990", "ASCE7"
std::optional<combination_set> parse_combination_set(std::string_view text);
std::vector<combination> combinations_of(combination_set c);

struct schedule {
    std::string source;                // file name, or ""
    std::size_t header_line = 0;
    std::vector<std::string> columns;  // header names, trimmed
    std::vector<csv_record> rows;
    // For each row, the line of an earlier row with the same id (0: none).
    std::vector<std::size_t> earlier_line_with_same_id;
    // Index of a column by its header name.
    std::optional<std::size_t> column(std::string_view name) const;
};

// Required and optional column names, in documentation order.
const std::vector<std::string>& schedule_required_columns();
const std::vector<std::string>& schedule_optional_columns();

// Reads the records and checks the header: every required column present, no
// unknown or repeated column. Header problems refuse the whole schedule
// (input_error); problems of a row are found by read_schedule_row.
schedule parse_schedule(std::string_view text, const std::string& source = "");
schedule load_schedule_file(const std::string& path);

// One row read into a beam and the settings it is assessed with.
struct schedule_row {
    std::size_t line = 0;
    std::string id;        // the id cell as written (may be empty in a refused row)
    project settings;      // standard, frame and unit system; no beams
    std::optional<beam> input;            // set exactly when problems is empty
    std::vector<input_problem> problems;  // "line L, column C (name)", "expected ..., found ..."
};

// Reads row `index` of `s`. Never throws for bad data: every problem of the
// row is returned in `problems`.
schedule_row read_schedule_row(const schedule& s, std::size_t index, const detail_catalogue& catalogue);

}  // namespace pinproof
