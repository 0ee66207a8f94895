// Reading a schedule part by part (schedule_stream.hpp).
#include "pinproof/io/schedule_stream.hpp"

#include <algorithm>
#include <functional>
#include <string_view>
#include <vector>

#include "io/input_text.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/core/input_file.hpp"

namespace pinproof {
namespace {

// Bytes read from the file at a time after the first part.
constexpr std::size_t read_bytes = std::size_t{1} << 20;

std::string_view trimmed(std::string_view t)
{
    std::size_t b = 0, e = t.size();
    while (b < e && (t[b] == ' ' || t[b] == '\t')) ++b;
    while (e > b && (t[e - 1] == ' ' || t[e - 1] == '\t')) --e;
    return t.substr(b, e - b);
}

// Every beam id seen, with the line of its first row, held compactly: the ids'
// bytes one after another and an open-addressing table of indices (a million
// short ids take about 30 MB, where a std::map of strings takes over 80).
// The file is at most max_input_bytes (512 MiB), so 32-bit offsets and lines serve.
class id_register {
public:
    void reserve(std::size_t ids, std::size_t bytes)
    {
        entries_.reserve(ids);
        text_.reserve(bytes);
        std::size_t slots = 64;
        while (slots < 2 * ids) slots *= 2;
        if (slots > slots_.size()) rehash(slots);
    }

    // The line of an earlier row with this id, or 0 after recording it as first seen on `line`.
    std::size_t first_line_or_add(std::string_view id, std::size_t line)
    {
        if (2 * (entries_.size() + 1) > slots_.size()) rehash(std::max<std::size_t>(64, 2 * slots_.size()));
        const std::size_t mask = slots_.size() - 1;
        for (std::size_t i = std::hash<std::string_view>{}(id) & mask;; i = (i + 1) & mask) {
            const std::uint32_t slot = slots_[i];
            if (slot == 0) {
                entries_.push_back({static_cast<std::uint32_t>(text_.size()), static_cast<std::uint32_t>(id.size()),
                                    static_cast<std::uint32_t>(line)});
                text_.append(id);
                slots_[i] = static_cast<std::uint32_t>(entries_.size());
                return 0;
            }
            const entry& e = entries_[slot - 1];
            if (std::string_view(text_).substr(e.offset, e.length) == id) return e.line;
        }
    }

private:
    struct entry {
        std::uint32_t offset, length, line;
    };
    std::string text_;
    std::vector<entry> entries_;
    std::vector<std::uint32_t> slots_;  // 0: empty, else an index into entries_ plus 1

    void rehash(std::size_t slots)
    {
        std::vector<std::uint32_t> fresh(slots, 0);
        const std::size_t mask = slots - 1;
        for (std::size_t k = 0; k < entries_.size(); ++k) {
            const std::string_view id = std::string_view(text_).substr(entries_[k].offset, entries_[k].length);
            std::size_t i = std::hash<std::string_view>{}(id) & mask;
            while (fresh[i] != 0) i = (i + 1) & mask;
            fresh[i] = static_cast<std::uint32_t>(k + 1);
        }
        slots_.swap(fresh);
    }
};

}  // namespace

struct schedule_stream::state {
    input_file_stream file;
    schedule head;                     // source, header line and columns; no rows
    std::size_t id_column = 0;
    std::vector<csv_record> records;   // read and not yet handed out
    std::size_t next_record = 0;
    std::string text;                  // bytes read and not yet split into records
    std::size_t next_line = 1;         // the line `text` starts on
    bool at_end = false;               // the whole file has been read into `text`
    id_register ids;

    explicit state(const std::string& path) : file(path, "schedule") {}

    void read_more(std::size_t bytes)
    {
        if (!at_end && file.read_more(text, bytes) == 0) at_end = true;
    }

    // Splits the complete records of `text` into `records`; reads more of the
    // file until at least one record is complete or the file ends.
    void split()
    {
        records.clear();
        next_record = 0;
        while (records.empty()) {
            if (text.empty() && at_end) return;
            const csv_part part = read_csv_part(text, next_line, false, at_end, records);
            refuse_nul(std::string_view(text).substr(0, part.bytes));
            text.erase(0, part.bytes);
            next_line = part.next_line;
            if (records.empty()) {
                if (at_end) return;  // blank and comment lines only
                read_more(std::max(read_bytes, text.size()));
            }
        }
    }

    // A NUL byte after the first part, refused as parse_schedule refuses it in
    // the first (input_text.hpp).
    void refuse_nul(std::string_view part) const
    {
        const std::size_t nul = part.find('\0');
        if (nul == std::string_view::npos) return;
        const std::size_t line_start = part.rfind('\n', nul) == std::string_view::npos ? 0 : part.rfind('\n', nul) + 1;
        const auto lines = static_cast<std::size_t>(std::count(part.begin(), part.begin() + static_cast<std::ptrdiff_t>(nul), '\n'));
        const std::string within = input_text::line_column(part.substr(line_start), nul - line_start);  // "line 1, column C"
        throw input_error("line " + std::to_string(next_line + lines) + within.substr(within.find(',')),
                          "expected a schedule as text, found a NUL byte (0x00), which no text file holds (is it a "
                          "binary file, or was it cut short while being written?)");
    }
};

schedule_stream::schedule_stream(const std::string& path) : s_(std::make_unique<state>(path))
{
    state& s = *s_;
    // The first part: the whole of a file of up to first_part_bytes, and in
    // any case the header and at least one row (or the end of the file).
    s.read_more(first_part_bytes);
    while (!s.at_end && s.text.size() < first_part_bytes) s.read_more(first_part_bytes - s.text.size());
    std::size_t bytes = s.text.size();
    if (!s.at_end) {
        for (;;) {
            std::vector<csv_record> probe;
            const csv_part part = read_csv_part(s.text, 1, true, false, probe);
            if (probe.size() >= 2) {
                bytes = part.bytes;
                s.next_line = part.next_line;
                break;
            }
            s.read_more(std::max(read_bytes, s.text.size()));
            if (s.at_end) {
                bytes = s.text.size();
                break;
            }
        }
    }
    schedule first = parse_schedule(std::string_view(s.text).substr(0, bytes), path);
    s.text.erase(0, bytes);
    s.records = std::move(first.rows);
    s.head = std::move(first);
    s.head.rows.clear();
    s.head.earlier_line_with_same_id.clear();
    s.id_column = *s.head.column("id");
    // Room for the ids of the whole file, at the first part's bytes per row.
    if (!s.at_end && s.file.size() > 0 && !s.records.empty())
        s.ids.reserve(static_cast<std::size_t>(static_cast<double>(s.file.size()) / static_cast<double>(bytes) *
                                               static_cast<double>(s.records.size()) * 1.05),
                      static_cast<std::size_t>(s.file.size() / 8));
}

schedule_stream::~schedule_stream() = default;

bool schedule_stream::next(schedule& part, std::size_t max_rows)
{
    state& s = *s_;
    part.source = s.head.source;
    part.header_line = s.head.header_line;
    part.columns = s.head.columns;
    part.rows.clear();
    part.earlier_line_with_same_id.clear();
    max_rows = std::max<std::size_t>(1, max_rows);
    while (part.rows.size() < max_rows) {
        if (s.next_record == s.records.size()) {
            if (s.text.empty() && s.at_end) break;
            if (!s.at_end && s.text.size() < read_bytes) s.read_more(read_bytes);
            s.split();
            if (s.records.empty()) break;
        }
        const std::size_t take = std::min(max_rows - part.rows.size(), s.records.size() - s.next_record);
        for (std::size_t k = 0; k < take; ++k) {
            csv_record& r = s.records[s.next_record++];
            // Ids are compared as the row reads them: trimmed of spaces and tabs (as parse_schedule).
            std::size_t earlier = 0;
            if (s.id_column < r.cells.size()) {
                const std::string_view id = trimmed(r.cells[s.id_column]);
                if (!id.empty()) earlier = s.ids.first_line_or_add(id, r.line);
            }
            part.earlier_line_with_same_id.push_back(earlier);
            part.rows.push_back(std::move(r));
        }
    }
    rows_read_ += part.rows.size();
    return !part.rows.empty();
}

double schedule_stream::fraction_read() const
{
    const auto size = s_->file.size();
    if (size == 0) return 0.0;
    const double read = static_cast<double>(s_->file.bytes_read()) - static_cast<double>(s_->text.size());
    return std::clamp(read / static_cast<double>(size), 0.0, 1.0);
}

}  // namespace pinproof
