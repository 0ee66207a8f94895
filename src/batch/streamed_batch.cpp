// A batch run over a schedule read part by part (streamed_batch.hpp).
#include "pinproof/batch/streamed_batch.hpp"

#include <algorithm>
#include <atomic>
#include <exception>
#include <system_error>
#include <thread>

#include "pinproof/core/errors.hpp"

namespace pinproof {
namespace {

// Rows per part: enough that starting the workers of a part costs nothing
// beside the part's work, few enough that a part's results (with the JSON
// result, some kilobytes a row) stay a few megabytes.
constexpr std::size_t part_rows = 4096, part_rows_json = 256;

class row_writer {
public:
    row_writer(const streamed_batch_options& o, const streamed_batch_outputs& out, streamed_batch_result& r)
        : options_(o), out_(out), r_(r)
    {
    }

    void write(const batch_result& part)
    {
        for (const batch_row& row : part.rows) {
            ++r_.summary.rows;
            if (row.verdict == batch_verdict::refused) ++r_.summary.refused;
            else ++r_.summary.checked;
            if (row.verdict == batch_verdict::holds) ++r_.summary.passed;
            if (row.verdict == batch_verdict::does_not_hold) ++r_.summary.failed;
            // As run_batch: US customary only when every assessed row is.
            if (row.verdict != batch_verdict::refused) {
                if (row.units != unit_system::us_customary) {
                    if (us_possible_ && out_.csv_us) out_.csv_us->clear();
                    us_possible_ = false;
                } else {
                    any_us_ = true;
                }
            }
            if (out_.csv_si) out_.csv_si->append(batch_summary_line(row, unit_system::si));
            if (out_.csv_us && us_possible_) out_.csv_us->append(batch_summary_line(row, unit_system::us_customary));
            if (out_.json) {
                if (row.json.empty()) throw internal_error("batch row has no JSON result");
                out_.json->append(first_ ? "  " : ",\n  ");
                out_.json->append(row.json);
            }
            first_ = false;
            if (row.verdict == batch_verdict::refused)
                for (const auto& p : row.problems) {
                    if (r_.problems.size() < options_.problems_kept) r_.problems.push_back(p);
                    ++r_.problem_count;
                }
        }
    }

    void finish()
    {
        if (out_.json && !first_) out_.json->append("\n");
        r_.units = us_possible_ && any_us_ ? unit_system::us_customary : unit_system::si;
    }

private:
    const streamed_batch_options& options_;
    const streamed_batch_outputs& out_;
    streamed_batch_result& r_;
    bool us_possible_ = true, any_us_ = false, first_ = true;
};

}  // namespace

streamed_batch_result run_streamed_batch(schedule_stream& in, const detail_catalogue& catalogue,
                                         const streamed_batch_options& options, const streamed_batch_outputs& out)
{
    streamed_batch_result r;
    row_writer writer(options, out, r);
    const std::size_t rows_per_part = options.batch.json ? part_rows_json : part_rows;
    batch_options bo = options.batch;
    std::size_t done_before = 0;
    // Read by the thread that runs a part, set by this one between parts.
    std::atomic<double> fraction{0.0};
    if (options.progress)
        bo.progress = [&](std::size_t done, std::size_t) { options.progress(done_before + done, fraction.load()); };
    else
        bo.progress = nullptr;

    schedule current, following;
    bool have = in.next(current, rows_per_part);
    fraction = in.fraction_read();
    batch_result assessed, written;
    bool have_written = false;
    bool first_part = true;
    while (have || have_written) {
        // The workers assess this part while this thread writes the part
        // before and reads the part after.
        std::exception_ptr fault;
        std::thread part;
        if (have) {
            try {
                part = std::thread([&] {
                    try {
                        assessed = run_batch(current, catalogue, bo);
                    } catch (...) {
                        fault = std::current_exception();
                    }
                });
            } catch (const std::system_error&) {
                assessed = run_batch(current, catalogue, bo);  // no thread to spare: in this one
            }
        }
        std::exception_ptr here;
        bool have_following = false;
        try {
            if (have_written) writer.write(written);
            if (have) have_following = in.next(following, rows_per_part);
            fraction = in.fraction_read();
        } catch (...) {
            here = std::current_exception();
        }
        if (part.joinable()) part.join();
        if (fault) std::rethrow_exception(fault);
        if (here) std::rethrow_exception(here);
        have_written = have;
        if (!have) break;
        written = std::move(assessed);
        done_before += written.rows.size();
        r.workers_asked = std::max(r.workers_asked, written.workers_asked);
        r.workers = first_part ? written.workers : std::min(r.workers, written.workers);
        first_part = false;
        if (written.cancelled) {
            r.cancelled = true;
            // The rows done so far (those of the parts before, and of this part
            // those assessed), for the message; nothing is written.
            for (const auto& row : written.rows) r.summary.rows += row.line != 0 ? 1 : 0;
            return r;
        }
        std::swap(current, following);
        have = have_following;
    }
    writer.finish();
    if (options.progress) options.progress(r.summary.rows, 1.0);
    return r;
}

}  // namespace pinproof
