#include "pinproof/batch/batch.hpp"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <charconv>
#include <cmath>
#include <condition_variable>
#include <cstdio>
#include <limits>
#include <mutex>
#include <system_error>
#include <thread>

#include "pinproof/core/csv_cell.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/report/result_json.hpp"
#include "pinproof/checks/governing_check.hpp"
#include "pinproof/joints/joint_from_detail.hpp"

namespace pinproof {
namespace {

using json = nlohmann::json;

const char* const closure_note =
    "Closure rotations are the sagging closure at the worst-case gap of the catalogue entry's geometry; empty where "
    "the entry gives no geometry or nothing closes within 90 degrees.";


std::optional<double> check_value(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return c.value;
    return std::nullopt;
}

json number_or_null(const std::optional<double>& v)
{
    if (!v) return nullptr;
    if (!std::isfinite(*v)) throw internal_error("a batch result value is not finite");
    return *v;
}

void summarise(batch_row& row, const beam_assessment& a)
{
    row.verdict = a.holds() ? batch_verdict::holds : batch_verdict::does_not_hold;
    // The governing check: checks/governing_check.hpp.
    const check* governing = governing_check(a);
    if (governing) {
        row.governing_check = governing->id;
        row.worst_ratio = utilisation(*governing);
        row.message = governing->message;
    }
    row.moment_start = check_value(a, "joint-moment-start");
    if (!row.moment_start) row.moment_start = check_value(a, "root-moment");  // a cantilever's root
    row.moment_end = check_value(a, "joint-moment-end");
    row.rotation_start = check_value(a, "rotation-demand-start");
    row.rotation_end = check_value(a, "rotation-demand-end");
    if (a.start.detail) row.closure_rotation_start = a.start.detail->gap.sagging.closing.rotation;
    if (a.end.detail) row.closure_rotation_end = a.end.detail->gap.sagging.closing.rotation;
    for (const auto& c : a.combinations) {
        if (c.comb.use != limit_state::strength) continue;
        const auto largest = [&](double beam_state::*member, std::optional<double>& out) {
            const auto& r = c.envelope.of(member);
            const double v = std::max(std::abs(r.min), std::abs(r.max));
            if (!out || v > *out) out = v;
        };
        largest(&beam_state::reaction_start, row.reaction_start);
        largest(&beam_state::reaction_end, row.reaction_end);
    }
    for (const auto& c : a.checks)
        if (c.status == check_status::fail) row.failed_checks.push_back(c.id);
}

std::string joined(const std::vector<std::string>& ids)
{
    std::string out;
    for (const auto& id : ids) out += (out.empty() ? "" : " ") + id;
    return out;
}

json row_json(const batch_row& row, const beam_assessment* a)
{
    json out;
    out["line"] = row.line;
    out["id"] = row.id;
    out["verdict"] = to_string(row.verdict);
    if (row.verdict == batch_verdict::refused) {
        json problems = json::array();
        for (const auto& p : row.problems) problems.push_back({{"where", p.where}, {"message", p.message}});
        out["problems"] = problems;
        return out;
    }
    out["governing_check"] = row.governing_check;
    out["worst_ratio"] = number_or_null(row.worst_ratio);
    out["moment_start"] = number_or_null(row.moment_start);
    out["moment_end"] = number_or_null(row.moment_end);
    out["rotation_start"] = number_or_null(row.rotation_start);
    out["rotation_end"] = number_or_null(row.rotation_end);
    out["closure_rotation_start"] = number_or_null(row.closure_rotation_start);
    out["closure_rotation_end"] = number_or_null(row.closure_rotation_end);
    out["reaction_start"] = number_or_null(row.reaction_start);
    out["reaction_end"] = number_or_null(row.reaction_end);
    out["failed_checks"] = row.failed_checks;
    if (a) out["result"] = to_json(*a);
    return out;
}

void refuse(batch_row& row, std::vector<input_problem> problems)
{
    row.verdict = batch_verdict::refused;
    row.problems = std::move(problems);
    row.governing_check.clear();
    row.worst_ratio.reset();
    row.failed_checks.clear();
    row.message.clear();
    for (const auto& p : row.problems) row.message += (row.message.empty() ? "" : "; ") + p.where + ": " + p.message;
}

std::string fixed(const std::optional<double>& v, double scale, int decimals)
{
    if (!v) return "";
    const double x = *v * scale;
    if (!std::isfinite(x)) throw internal_error("a batch result value is not finite");
    char buf[400];  // the longest fixed text of a finite double with a few decimals
    const auto r = std::to_chars(buf, buf + sizeof buf, x, std::chars_format::fixed, decimals);
    if (r.ec != std::errc()) throw internal_error("a batch result value does not fit its text");
    std::string s(buf, r.ptr);
    if (s.find_first_not_of("-0.") == std::string::npos && s[0] == '-') s.erase(0, 1);  // no "-0.000"
    return s;
}

// The summary CSV's quantities in the schedule's units: factor from SI and
// the unit's symbol (docs/batch-and-catalogues.md).
struct csv_units {
    double force, moment, angle;
    std::string force_symbol, moment_symbol, angle_symbol;
    explicit csv_units(unit_system u)
    {
        const auto f = display_unit_for(dims::force, u), m = display_unit_for(dims::moment, u),
                   a = display_unit_for(dims::angle, u);
        force = 1.0 / f.si_per_unit;
        moment = 1.0 / m.si_per_unit;
        angle = 1.0 / a.si_per_unit;
        force_symbol = f.symbol;
        moment_symbol = m.symbol;
        angle_symbol = a.symbol;
    }
};

// One row of the summary CSV, with its newline.
std::string summary_line(const batch_row& row, unit_system units)
{
    const csv_units u(units);
    std::string out;
    out.reserve(320 + row.message.size());
    out += std::to_string(row.line);
    out += ',';
    out += csv_cell(row.id);
    out += ',';
    out += to_string(row.verdict);
    out += ',';
    out += row.governing_check;
    out += ',';
    out += fixed(row.worst_ratio, 1.0, 4);
    for (const auto* v : {&row.reaction_start, &row.reaction_end}) {
        out += ',';
        out += fixed(*v, u.force, 4);
    }
    for (const auto* v : {&row.moment_start, &row.moment_end}) {
        out += ',';
        out += fixed(*v, u.moment, 4);
    }
    for (const auto* v : {&row.rotation_start, &row.rotation_end, &row.closure_rotation_start, &row.closure_rotation_end}) {
        out += ',';
        out += fixed(*v, u.angle, 4);
    }
    out += ',';
    out += csv_cell(joined(row.failed_checks));
    out += ',';
    out += csv_cell(row.message);
    out += '\n';
    return out;
}

}  // namespace

std::string to_string(batch_verdict v)
{
    switch (v) {
    case batch_verdict::holds: return "holds";
    case batch_verdict::does_not_hold: return "does-not-hold";
    case batch_verdict::refused: return "refused";
    }
    return "unknown";
}

batch_row assess_schedule_row(const schedule& s, std::size_t index, const detail_catalogue& catalogue,
                              const batch_options& options)
{
    batch_row row;
    row.line = s.rows.at(index).line;
    try {
        schedule_row in = read_schedule_row(s, index, catalogue);
        row.units = in.settings.units == unit_system::us_customary ? unit_system::us_customary : unit_system::si;
        row.line = in.line;
        row.id = in.id;
        if (!in.input) {
            refuse(row, std::move(in.problems));
        } else {
            // The smallest passing gap is only written to the JSON result.
            assessment_options ao = options.assessment;
            ao.find_min_gap = ao.find_min_gap && options.json;
            // Each fin plate of the catalogue derived, for the report and the checks.
            derive_beam_joints(*in.input, in.settings.standard);
            const beam_assessment a = assess_beam(in.settings, *in.input, ao);
            summarise(row, a);
            if (options.json) row.json = row_json(row, &a).dump();
        }
    } catch (const input_error& e) {
        refuse(row, e.problems());
    } catch (const std::exception& e) {
        refuse(row, {{"line " + std::to_string(row.line),
                      std::string("internal error (a fault of pinproof, not of the input): ") + e.what()}});
    }
    if (options.json && row.verdict == batch_verdict::refused) row.json = row_json(row, nullptr).dump();
    row.summary_line = summary_line(row, row.units);
    return row;
}

batch_result run_batch(const schedule& s, const detail_catalogue& catalogue, const batch_options& options)
{
    batch_result out;
    const std::size_t total = s.rows.size();
    out.rows.resize(total);
    unsigned jobs = options.jobs ? options.jobs : std::max(1u, std::thread::hardware_concurrency());
    jobs = static_cast<unsigned>(std::min<std::size_t>(jobs, std::max<std::size_t>(1, total)));

    // Rows are handed out in small chunks from a shared counter; each worker
    // writes only the rows it took, so the results stay in input order.
    constexpr std::size_t chunk = 16;
    std::atomic<std::size_t> next{0}, done{0};
    std::atomic<bool> stopped{false};
    std::mutex m;
    std::condition_variable finished;
    unsigned running = 0;  // workers started and not yet finished
    const auto work = [&] {
        for (;;) {
            const std::size_t first = next.fetch_add(chunk);
            if (first >= total) break;
            const std::size_t last = std::min(total, first + chunk);
            for (std::size_t i = first; i < last; ++i) {
                if (options.cancel && options.cancel->load()) {
                    stopped = true;
                    break;
                }
                out.rows[i] = assess_schedule_row(s, i, catalogue, options);
                done.fetch_add(1, std::memory_order_relaxed);
            }
            if (stopped) break;
        }
        std::lock_guard<std::mutex> lock(m);
        if (--running == 0) finished.notify_all();
    };
    // The system may refuse a thread (RLIMIT_NPROC, memory): the batch then
    // runs with the workers it has, or in this thread, rather than terminate.
    std::vector<std::thread> pool;
    pool.reserve(jobs);
    for (unsigned j = 0; j < jobs; ++j) {
        {
            std::lock_guard<std::mutex> lock(m);
            ++running;
        }
        try {
            pool.emplace_back(work);
        } catch (const std::system_error&) {
            std::lock_guard<std::mutex> lock(m);
            --running;
            break;
        }
    }
    out.workers_asked = jobs;
    out.workers = std::max<unsigned>(1, static_cast<unsigned>(pool.size()));
    if (pool.empty()) {
        {
            std::lock_guard<std::mutex> lock(m);
            ++running;
        }
        work();
    }
    {
        std::unique_lock<std::mutex> lock(m);
        while (running > 0) {
            finished.wait_for(lock, options.progress_interval);
            if (running > 0 && options.progress) {
                lock.unlock();
                options.progress(done.load(), total);
                lock.lock();
            }
        }
    }
    for (auto& t : pool) t.join();
    if (options.progress) options.progress(done.load(), total);

    bool all_us = false;
    for (const auto& r : out.rows) {
        if (r.verdict == batch_verdict::refused) continue;
        if (r.units != unit_system::us_customary) {
            all_us = false;
            break;
        }
        all_us = true;
    }
    out.units = all_us ? unit_system::us_customary : unit_system::si;
    out.cancelled = stopped.load() || done.load() != total;
    out.summary.rows = total;
    for (const auto& r : out.rows) {
        if (r.verdict == batch_verdict::refused) ++out.summary.refused;
        else ++out.summary.checked;
        if (r.verdict == batch_verdict::holds) ++out.summary.passed;
        if (r.verdict == batch_verdict::does_not_hold) ++out.summary.failed;
    }
    return out;
}

std::string batch_counts_text(const batch_summary& s)
{
    return std::to_string(s.rows) + " row" + (s.rows == 1 ? "" : "s") + ": " + std::to_string(s.checked) +
           " checked (" + std::to_string(s.passed) + " passed, " + std::to_string(s.failed) + " failed), " +
           std::to_string(s.refused) + " refused";
}

std::string batch_summary_csv_header(unit_system units)
{
    // The header first, so that a spreadsheet reads it as the header; the
    // run's counts go to standard error and the JSON result, the meaning of
    // each column to docs/batch-and-catalogues.md. Units as in the sweep CSV.
    const csv_units u(units);
    const auto col = [](const std::string& name, const std::string& unit) { return name + " [" + unit + "]"; };
    return "line,id,verdict,governing_check," + col("worst_ratio", "1") + "," + col("reaction_start", u.force_symbol) +
           "," + col("reaction_end", u.force_symbol) + "," + col("moment_start", u.moment_symbol) + "," +
           col("moment_end", u.moment_symbol) + "," + col("rotation_start", u.angle_symbol) + "," +
           col("rotation_end", u.angle_symbol) + "," + col("closure_rotation_start", u.angle_symbol) + "," +
           col("closure_rotation_end", u.angle_symbol) + ",failed_checks,message\n";
}

std::string batch_summary_line(const batch_row& row, unit_system units)
{
    return row.summary_line.empty() || row.units != units ? summary_line(row, units) : row.summary_line;
}

std::string batch_summary_csv(const batch_result& r)
{
    std::string out;
    out.reserve(r.rows.size() * 160 + 512);
    out += batch_summary_csv_header(r.units);
    for (const auto& row : r.rows) out += batch_summary_line(row, r.units);
    return out;
}

std::string batch_result_json_head(const batch_summary& summary, const std::string& schedule_source,
                                  const detail_catalogue& catalogue)
{
    json head;
    head["format"] = batch_result_format;
    head["schedule"] = schedule_source;
    head["details"] = {{"source", catalogue.source}, {"title", catalogue.title}};
    head["summary"] = {{"rows", summary.rows},
                       {"checked", summary.checked},
                       {"passed", summary.passed},
                       {"failed", summary.failed},
                       {"refused", summary.refused}};
    head["verdict"] = summary.refused ? "refused" : summary.failed ? "does-not-hold" : "holds";
    head["notes"] = json::array({closure_note});
    head["caution"] = "Results support, and do not replace, the judgement of a qualified engineer; local codes and "
                      "licensed practice govern.";
    // The beams are already JSON text: splice them in rather than re-parse.
    std::string text = head.dump(1);
    text.pop_back();  // the closing brace
    while (!text.empty() && (text.back() == '\n' || text.back() == ' ')) text.pop_back();
    text += ",\n \"beams\": [\n";
    return text;
}

std::string batch_result_json(const batch_result& r, const schedule& s, const detail_catalogue& catalogue)
{
    std::string text = batch_result_json_head(r.summary, s.source, catalogue);
    for (std::size_t i = 0; i < r.rows.size(); ++i) {
        if (r.rows[i].json.empty()) throw internal_error("batch row has no JSON result");
        text += "  ";
        text += r.rows[i].json;
        text += i + 1 < r.rows.size() ? ",\n" : "\n";
    }
    text += batch_result_json_tail;
    return text;
}

}  // namespace pinproof
