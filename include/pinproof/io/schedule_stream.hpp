// A schedule read part by part, for a run over a schedule too large to hold
// whole (a building of a million beams): memory stays flat whatever the
// number of rows.
//
// The file is checked and its header read as load_schedule_file does (a file
// of up to first_part_bytes is read whole and refused or accepted exactly as
// parse_schedule refuses or accepts it). The rows then come in parts, each a
// `schedule` of its own with the source, header line and columns of the file,
// whose earlier_line_with_same_id looks back over every row read before, in
// every part.
#pragma once

#include <cstdint>
#include <memory>
#include <string>

#include "pinproof/io/schedule.hpp"

namespace pinproof {

class schedule_stream {
public:
    // The first part read and checked with the header.
    static constexpr std::size_t first_part_bytes = std::size_t{1} << 20;

    // Opens and checks the file (input_file.hpp) and reads its header; throws
    // input_error as load_schedule_file does.
    explicit schedule_stream(const std::string& path);
    ~schedule_stream();
    schedule_stream(const schedule_stream&) = delete;
    schedule_stream& operator=(const schedule_stream&) = delete;

    // The next part, of at most `max_rows` (at least 1) rows, in file order;
    // false, with `part` holding no rows, after the last. Throws input_error
    // for a fault that refuses the whole file (a NUL byte, a quoted cell never
    // closed, a file grown past the size limit).
    bool next(schedule& part, std::size_t max_rows);

    // Of the file read so far: rows handed out, and the share of the file's
    // bytes read (0 to 1; 0 for a pipe, whose size is not known).
    std::size_t rows_read() const { return rows_read_; }
    double fraction_read() const;

private:
    struct state;
    std::unique_ptr<state> s_;
    std::size_t rows_read_ = 0;
};

}  // namespace pinproof
