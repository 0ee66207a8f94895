// A batch run over a schedule read part by part (schedule_stream.hpp), its
// outputs written row by row into scratch files (output_file.hpp) as the parts
// are done: memory stays flat whatever the number of rows, the rows keep their
// input order, and the outputs are byte for byte those of run_batch with
// batch_summary_csv and batch_result_json.
//
// While the workers assess one part, the calling thread writes the part
// before and reads the part after.
#pragma once

#include <cstddef>
#include <functional>
#include <memory>
#include <vector>

#include "pinproof/batch/batch.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/io/schedule_stream.hpp"

namespace pinproof {

// Where the rows go; each may be null.
struct streamed_batch_outputs {
    // The summary CSV's rows in SI units, and in US customary units (which the
    // run empties as soon as an assessed row is in SI units: the summary is in
    // US customary units only when every assessed row is).
    std::shared_ptr<scratch_file> csv_si, csv_us;
    std::shared_ptr<scratch_file> json;  // the JSON result's beams
};

struct streamed_batch_result {
    batch_summary summary;
    unit_system units = unit_system::si;  // of the summary CSV
    bool cancelled = false;
    unsigned workers_asked = 0, workers = 0;  // the fewest started in any part
    std::vector<input_problem> problems;      // of the refused rows, the first `problems_kept`
    std::size_t problem_count = 0;            // of the refused rows, all
};

struct streamed_batch_options {
    batch_options batch;  // jobs, json, cancel; batch.progress is not used
    std::size_t problems_kept = 50;
    // Called about every batch.progress_interval with the rows done and the share of the file read (0 to 1).
    std::function<void(std::size_t done, double fraction)> progress;
};

// The summary CSV is batch_summary_csv_header(result.units) followed by the
// bytes of csv_si or csv_us as result.units says; the JSON result is
// batch_result_json_head(result.summary, ...), the bytes of json, then
// batch_result_json_tail. Throws input_error for a fault of the file that
// refuses it whole (schedule_stream::next).
streamed_batch_result run_streamed_batch(schedule_stream& in, const detail_catalogue& catalogue,
                                         const streamed_batch_options& options, const streamed_batch_outputs& out);

}  // namespace pinproof
