// Reading a beam schedule (docs/batch-and-catalogues.md).
#include "pinproof/io/schedule.hpp"

#include "pinproof/model/connection_detail.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <cmath>
#include <cstdlib>
#include <fstream>
#include <map>
#include <sstream>
#include <stdexcept>

#include "pinproof/core/input_file.hpp"
#include "pinproof/io/joint_behaviour_input.hpp"
#include "io/input_text.hpp"
#include "io/plausibility.hpp"
#include "pinproof/core/printable_text.hpp"
#include "pinproof/core/spelling.hpp"
#include "pinproof/core/units.hpp"
#include "pinproof/io/connection_detail_input.hpp"
#include "pinproof/io/project_input.hpp"

namespace pinproof {
namespace {

// Default moduli when a row gives no E, as for a project file:
// EN 1993-1-1 3.2.6(1) E = 210 000 MPa; AISC 360-16 Symbols / B2 E = 29 000 ksi.
constexpr double default_E_en = 210e9;
constexpr double default_E_aisc = 29000.0 * 6894757.293168361;

std::string trimmed(std::string_view t)
{
    std::size_t b = 0, e = t.size();
    while (b < e && (t[b] == ' ' || t[b] == '\t')) ++b;
    while (e > b && (t[e - 1] == ' ' || t[e - 1] == '\t')) --e;
    return std::string(t.substr(b, e - b));
}

std::string in_quotes(const std::string& s)
{
    std::string t = s.size() > 60 ? s.substr(0, 57) + "..." : s;
    return "\"" + message_text(t) + "\"";
}

std::string found_cell(const std::string& s) { return s.empty() ? "an empty cell" : in_quotes(s); }

// A bare decimal number, as opposed to a number with a unit.
bool bare_number(const std::string& s)
{
    if (s.empty()) return false;
    char* end = nullptr;
    std::strtod(s.c_str(), &end);
    return end == s.c_str() + s.size();
}

}  // namespace

// Whether `s` is well-formed UTF-8 (RFC 3629: no overlong forms, no surrogates,
// nothing above U+10FFFF). Results are written as JSON, which must be UTF-8.
static bool valid_utf8(const std::string& s)
{
    std::size_t i = 0;
    const std::size_t n = s.size();
    while (i < n) {
        const unsigned char c = static_cast<unsigned char>(s[i]);
        std::size_t len = 0;
        unsigned int cp = 0;
        if (c < 0x80) { ++i; continue; }
        if ((c & 0xE0) == 0xC0) { len = 2; cp = c & 0x1F; }
        else if ((c & 0xF0) == 0xE0) { len = 3; cp = c & 0x0F; }
        else if ((c & 0xF8) == 0xF0) { len = 4; cp = c & 0x07; }
        else return false;
        if (i + len > n) return false;
        for (std::size_t k = 1; k < len; ++k) {
            const unsigned char d = static_cast<unsigned char>(s[i + k]);
            if ((d & 0xC0) != 0x80) return false;
            cp = (cp << 6) | (d & 0x3F);
        }
        const unsigned int min_cp[] = {0, 0, 0x80, 0x800, 0x10000};
        if (cp < min_cp[len] || cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF)) return false;
        i += len;
    }
    return true;
}

// Every byte outside ASCII replaced by '?', for a cell already refused.
static std::string replace_invalid_utf8(const std::string& s)
{
    std::string out = s;
    for (char& c : out)
        if (static_cast<unsigned char>(c) >= 0x80) c = '?';
    return out;
}

namespace {

// Reads the records of a CSV text one by one: line endings, blank and comment
// lines, quoted and unquoted cells.
class csv_reader {
public:
    explicit csv_reader(std::string_view text_, std::size_t first_line = 1, bool at_start = true)
        : text(text_), n(text_.size()), line(first_line)
    {
        if (at_start && n >= 3 && text.substr(0, 3) == "\xEF\xBB\xBF") pos = 3;
    }

    // The records that end within the text, for a text that is a part of a
    // file: unless `at_end`, a record is complete only once its line feed is
    // read (a CR at the end of the part may be the first half of a CRLF, a
    // quoted cell may go on in the next part).
    csv_part read_part(std::vector<csv_record>& out, bool at_end)
    {
        while (pos < n) {
            const std::size_t pos0 = pos, line0 = line;
            bool complete = true;
            try {
                if (!skip_blank_or_comment()) {
                    csv_record r = record();
                    complete = at_end || text[pos - 1] == '\n';
                    if (complete) out.push_back(std::move(r));
                } else {
                    complete = at_end || text[pos - 1] == '\n';
                }
            } catch (const input_error&) {
                if (at_end) throw;
                complete = false;  // a quoted cell open at the end of the part
            }
            if (!complete) {
                pos = pos0;
                line = line0;
                break;
            }
        }
        return {pos, line};
    }

    std::vector<csv_record> read()
    {
        std::vector<csv_record> out;
        while (pos < n) {
            if (skip_blank_or_comment()) continue;
            out.push_back(record());
        }
        return out;
    }

private:
    std::string_view text;
    const std::size_t n;
    std::size_t pos = 0, line = 1;

    bool at_line_end(std::size_t p) const
    {
        return p >= n || text[p] == '\n' || (text[p] == '\r' && p + 1 < n && text[p + 1] == '\n') ||
               (text[p] == '\r' && p + 1 == n);
    }

    void skip_line_end(std::size_t& p)
    {
        if (p < n && text[p] == '\r') ++p;
        if (p < n && text[p] == '\n') ++p;
        ++line;
    }

    // Blank lines and comment lines between records; returns whether one was skipped.
    bool skip_blank_or_comment()
    {
        std::size_t probe = pos;
        while (probe < n && (text[probe] == ' ' || text[probe] == '\t')) ++probe;
        if (at_line_end(probe)) {
            pos = probe;
            skip_line_end(pos);
            return true;
        }
        if (text[pos] == '#') {
            while (!at_line_end(pos)) ++pos;
            skip_line_end(pos);
            return true;
        }
        return false;
    }

    // One record, from pos to the end of its line (a quoted cell may span lines).
    csv_record record()
    {
        csv_record rec;
        rec.line = line;
        bool bad_record = false;
        for (;;) {
            std::string cell;
            std::size_t p = pos;
            while (p < n && (text[p] == ' ' || text[p] == '\t')) ++p;
            if (p < n && text[p] == '"') {
                cell = quoted_cell(p, rec, bad_record);
            } else {
                cell = unquoted_cell(p, rec, bad_record);
            }
            if (!valid_utf8(cell)) {
                if (!bad_record) {
                    rec.bad_column = rec.cells.size() + 1;
                    rec.bad_reason = "expected text in UTF-8, found bytes that are not (save the schedule as UTF-8)";
                }
                bad_record = true;
                cell = replace_invalid_utf8(cell);
            }
            rec.cells.push_back(std::move(cell));
            pos = p;
            if (pos < n && text[pos] == ',') {
                ++pos;
                continue;
            }
            skip_line_end(pos);
            break;
        }
        return rec;
    }

    // A cell in double quotes, from its opening quote at p; a doubled quote is one quote.
    std::string quoted_cell(std::size_t& p, csv_record& rec, bool& bad_record)
    {
        std::string cell;
        const std::size_t open_line = line, open_col = rec.cells.size() + 1;
        ++p;
        for (;;) {
            if (p >= n)
                throw input_error("line " + std::to_string(open_line) + ", column " + std::to_string(open_col),
                                  "expected a closing double quote for the quoted cell that starts here, "
                                  "found the end of the file");
            const char c = text[p];
            if (c == '"') {
                if (p + 1 < n && text[p + 1] == '"') {
                    cell += '"';
                    p += 2;
                    continue;
                }
                ++p;
                break;
            }
            if (c == '\n') ++line;
            cell += c;
            ++p;
        }
        while (p < n && (text[p] == ' ' || text[p] == '\t')) ++p;
        if (!(p >= n || text[p] == ',' || at_line_end(p))) {
            if (!bad_record) {
                rec.bad_column = rec.cells.size() + 1;
                rec.bad_reason = "expected a comma or the end of the line after the closing quote of a "
                                 "cell, found more text";
            }
            bad_record = true;
            while (p < n && text[p] != ',' && !at_line_end(p)) ++p;
        }
        return cell;
    }

    // A cell without quotes, trimmed; a quote inside it marks the record bad.
    std::string unquoted_cell(std::size_t& p, csv_record& rec, bool& bad_record)
    {
        std::string cell;
        const std::size_t start = p;
        bool stray_quote = false;
        while (p < n && text[p] != ',' && !at_line_end(p)) {
            if (text[p] == '"') stray_quote = true;
            ++p;
        }
        cell = trimmed(text.substr(start, p - start));
        if (stray_quote && !bad_record) {
            rec.bad_column = rec.cells.size() + 1;
            rec.bad_reason = "expected a cell either fully enclosed in double quotes or without any, found "
                             "a double quote inside an unquoted cell";
            bad_record = true;
        }
        return cell;
    }
};

}  // namespace

std::vector<csv_record> read_csv(std::string_view text) { return csv_reader(text).read(); }

csv_part read_csv_part(std::string_view text, std::size_t first_line, bool at_start, bool at_end,
                       std::vector<csv_record>& out)
{
    return csv_reader(text, first_line, at_start).read_part(out, at_end);
}

std::string to_string(combination_set c) { return c == combination_set::en1990 ? "EN1990" : "ASCE7"; }

std::optional<combination_set> parse_combination_set(std::string_view text)
{
    if (text == "EN1990") return combination_set::en1990;
    if (text == "ASCE7") return combination_set::asce7;
    return std::nullopt;
}

std::vector<combination> combinations_of(combination_set c)
{
    if (c == combination_set::en1990) {
        // EN 1990 Eq. 6.10, Table A1.2(B): 1.35 Gk + 1.5 Qk; Eq. 6.14b: Gk + Qk.
        return {{"EN1990 6.10: 1.35G+1.5Q", limit_state::strength, {{"G", 1.35}, {"Q", 1.5}}},
                {"EN1990 6.14b: G+Q", limit_state::service, {{"G", 1.0}, {"Q", 1.0}}}};
    }
    // ASCE 7-16 2.3.1: combination 1, 1.4D; combination 2, 1.2D + 1.6L + 0.5(Lr or S or R)
    // with no roof, snow or rain load; service D + L.
    return {{"ASCE7 2.3.1-1: 1.4D", limit_state::strength, {{"G", 1.4}}},
            {"ASCE7 2.3.1-2: 1.2D+1.6L", limit_state::strength, {{"G", 1.2}, {"Q", 1.6}}},
            {"ASCE7 service: D+L", limit_state::service, {{"G", 1.0}, {"Q", 1.0}}}};
}

std::optional<std::size_t> schedule::column(std::string_view name) const
{
    for (std::size_t i = 0; i < columns.size(); ++i)
        if (columns[i] == name) return i;
    return std::nullopt;
}

const std::vector<std::string>& schedule_required_columns()
{
    static const std::vector<std::string> c{"id", "span", "section", "g", "q", "start", "end"};
    return c;
}

const std::vector<std::string>& schedule_optional_columns()
{
    static const std::vector<std::string> c{"combinations", "deflection_limit", "E", "description", "standard", "frame",
                                            "layout", "overhang"};
    return c;
}

schedule parse_schedule(std::string_view text, const std::string& source)
{
    schedule s;
    s.source = source;
    input_text::refuse_non_utf8_encodings(text, "schedule");
    if (text.find('\r') != std::string_view::npos && text.find('\n') == std::string_view::npos)
        throw input_error("line 1", "expected lines ending in LF or CRLF, found lines ending in CR alone (an old "
                                    "Macintosh text format); save the schedule with LF or CRLF line endings");
    std::vector<csv_record> records = read_csv(text);
    if (records.empty())
        throw input_error("line 1", "expected a header row naming the columns (id, span, section, g, q, start, end), "
                                    "found no rows");
    const csv_record& header = records.front();
    s.header_line = header.line;
    problem_list problems;
    const std::string at_header = "line " + std::to_string(header.line);
    if (header.bad_column != 0)
        throw input_error(at_header + ", column " + std::to_string(header.bad_column), header.bad_reason);
    std::string known;
    for (const auto* list : {&schedule_required_columns(), &schedule_optional_columns()})
        for (const auto& c : *list) known += (known.empty() ? "" : ", ") + c;
    for (std::size_t i = 0; i < header.cells.size(); ++i) {
        const std::string name = trimmed(header.cells[i]);
        const std::string where = at_header + ", column " + std::to_string(i + 1);
        const auto& req = schedule_required_columns();
        const auto& opt = schedule_optional_columns();
        if (std::find(req.begin(), req.end(), name) == req.end() && std::find(opt.begin(), opt.end(), name) == opt.end()) {
            std::vector<std::string> names = req;
            names.insert(names.end(), opt.begin(), opt.end());
            problems.add(where, "expected a column name (" + known + "), found " + found_cell(name) +
                                    did_you_mean(name, names));
        } else if (std::find(s.columns.begin(), s.columns.end(), name) != s.columns.end())
            problems.add(where + " (" + name + ")", "expected each column once, found \"" + name + "\" a second time");
        s.columns.push_back(name);
    }
    for (const auto& r : schedule_required_columns())
        if (!s.column(r)) problems.add(at_header, "missing required column \"" + r + "\"");
    problems.throw_if_any();

    s.rows.assign(std::make_move_iterator(records.begin() + 1), std::make_move_iterator(records.end()));
    if (s.rows.empty())
        throw input_error("line " + std::to_string(header.line + 1), "expected at least one beam row after the header, "
                                                                     "found none");
    s.earlier_line_with_same_id.assign(s.rows.size(), 0);
    const std::size_t id_col = *s.column("id");
    std::map<std::string, std::size_t> first_line;
    for (std::size_t i = 0; i < s.rows.size(); ++i) {
        const auto& cells = s.rows[i].cells;
        if (id_col >= cells.size() || cells[id_col].empty()) continue;
        // Ids are compared as the row reads them: trimmed of spaces and tabs.
        const std::string id = trimmed(cells[id_col]);
        if (id.empty()) continue;
        auto [it, inserted] = first_line.emplace(id, s.rows[i].line);
        if (!inserted) s.earlier_line_with_same_id[i] = it->second;
    }
    return s;
}

schedule load_schedule_file(const std::string& path)
{
    const std::string text = read_input_file(path, "schedule");  // size, kind and identity checked (input_file.hpp)
    return parse_schedule(text, path);
}

namespace {

struct row_reader {
    const schedule& s;
    const csv_record& rec;
    std::vector<input_problem>& problems;
    unit_system system = unit_system::neutral;

    std::string where(std::size_t col) const
    {
        return "line " + std::to_string(rec.line) + ", column " + std::to_string(col + 1) + " (" + s.columns[col] + ")";
    }

    void add(std::size_t col, std::string message) { problems.push_back({where(col), std::move(message)}); }

    // The cell of a column, or nullopt when the column is absent or the cell is empty.
    std::optional<std::string> cell(const std::string& name, bool required)
    {
        auto col = s.column(name);
        if (!col) return std::nullopt;
        const std::string v = trimmed(rec.cells[*col]);
        if (v.empty()) {
            if (required) add(*col, "expected a value, found an empty cell");
            return std::nullopt;
        }
        return v;
    }

    std::optional<double> quantity_cell(const std::string& name, dimension d, bool required)
    {
        auto v = cell(name, required);
        if (!v) return std::nullopt;
        const std::size_t col = *s.column(name);
        const std::string want =
            "expected " + describe(d) + " (a number in SI base units or text such as \"" + example_of(d) + "\")";
        try {
            const quantity q = parse_quantity(*v);
            if (q.dim == dims::dimensionless && bare_number(*v)) return q.value;
            if (q.dim != d) {
                add(col, want + ", found " + in_quotes(*v) + ", which is " + describe(q.dim));
                return std::nullopt;
            }
            if (q.system != unit_system::neutral && system == unit_system::neutral) system = q.system;
            return q.value;
        } catch (const std::invalid_argument& e) {
            add(col, want + ", found " + in_quotes(*v) + ": " + e.what());
            return std::nullopt;
        }
    }

    // A positive quantity within a plausible range (io/plausibility.hpp), as in a project file.
    std::optional<double> plausible_cell(const std::string& name, dimension d, bool required,
                                         plausibility::plausible_range range)
    {
        auto v = positive_cell(name, d, required);
        if (!v) return v;
        if (auto m = plausibility::outside(*v, range, d, system, in_quotes(rec.cells[*s.column(name)]))) {
            add(*s.column(name), *m);
            return std::nullopt;
        }
        return v;
    }

    std::optional<double> positive_cell(const std::string& name, dimension d, bool required)
    {
        auto v = quantity_cell(name, d, required);
        if (v && !(*v > 0)) {
            add(*s.column(name), "expected a positive " + describe(d) + ", found " + in_quotes(rec.cells[*s.column(name)]));
            return std::nullopt;
        }
        return v;
    }

    std::optional<deflection_limit> deflection_cell()
    {
        auto v = cell("deflection_limit", false);
        if (!v) return std::nullopt;
        const std::size_t col = *s.column("deflection_limit");
        std::string compact;
        for (char ch : *v)
            if (!std::isspace(static_cast<unsigned char>(ch))) compact += ch;
        deflection_limit out;
        out.text = *v;
        for (const std::string prefix : {"span/", "L/"}) {
            if (compact.rfind(prefix, 0) != 0) continue;
            const std::string num = compact.substr(prefix.size());
            char* end = nullptr;
            const double r = std::strtod(num.c_str(), &end);
            if (num.empty() || end != num.c_str() + num.size() || !std::isfinite(r) || r <= 0) {
                add(col, "expected a deflection limit such as \"span/360\" or \"20 mm\", found " + in_quotes(*v));
                return std::nullopt;
            }
            out.span_ratio = r;
            return out;
        }
        auto len = positive_cell("deflection_limit", dims::length, false);
        if (!len) return std::nullopt;
        if (*len > plausibility::plausible_deflection_limit) {
            add(col, "expected a positive deflection limit of at most " +
                         format_quantity(plausibility::plausible_deflection_limit, dims::length, system) + ", found " +
                         in_quotes(*v));
            return std::nullopt;
        }
        out.absolute = *len;
        if (bare_number(*v)) out.text = format_quantity(*len, dims::length, unit_system::si);
        return out;
    }
};

// A record that cannot be read cell by cell: a misplaced quote, or a count of
// cells other than the header's. Adds the problem and returns true.
bool refuse_malformed_record(const schedule& s, const csv_record& rec, schedule_row& out)
{
    const std::string at_line = "line " + std::to_string(rec.line);
    if (rec.bad_column != 0) {
        std::string where = at_line + ", column " + std::to_string(rec.bad_column);
        if (rec.bad_column <= s.columns.size()) where += " (" + s.columns[rec.bad_column - 1] + ")";
        out.problems.push_back({where, rec.bad_reason});
        if (auto c = s.column("id"); c && *c < rec.cells.size()) out.id = message_text(trimmed(rec.cells[*c]));
        return true;
    }
    if (rec.cells.size() == s.columns.size()) {
        // Control characters (a line break in a quoted cell too): an id or a
        // description is one line of text, shown on a terminal and in files.
        bool refused = false;
        for (std::size_t col = 0; col < rec.cells.size(); ++col)
            if (const auto c = first_control_character(rec.cells[col])) {
                out.problems.push_back({at_line + ", column " + std::to_string(col + 1) + " (" + s.columns[col] + ")",
                                        "expected text without control characters, found " +
                                            describe_code_point(c->code_point) + " at byte " +
                                            std::to_string(c->offset + 1) + " of the cell"});
                refused = true;
            }
        if (refused)
            if (auto c = s.column("id"); c && *c < rec.cells.size()) out.id = message_text(trimmed(rec.cells[*c]));
        return refused;
    }
    if (rec.cells.size() < s.columns.size()) {
        const std::size_t col = rec.cells.size();
        out.problems.push_back({at_line + ", column " + std::to_string(col + 1) + " (" + s.columns[col] + ")",
                                "expected " + std::to_string(s.columns.size()) + " cells as in the header, found " +
                                    std::to_string(rec.cells.size()) + " cells in the row"});
    } else {
        out.problems.push_back({at_line + ", column " + std::to_string(s.columns.size() + 1),
                                "expected " + std::to_string(s.columns.size()) + " cells as in the header, found " +
                                    std::to_string(rec.cells.size()) + " cells in the row"});
    }
    if (auto c = s.column("id"); c && *c < rec.cells.size()) out.id = message_text(trimmed(rec.cells[*c]));
    return true;
}

// The row's combination set, standard and frame.
struct row_rules {
    combination_set set = combination_set::en1990;
    design_standard standard = design_standard::en1993_1_8;
    frame_bracing frame = frame_bracing::braced;
    beam_layout layout = beam_layout::two_supports;
};

row_rules read_row_rules(row_reader& r)
{
    const schedule& s = r.s;
    row_rules out;
    if (auto c = r.cell("combinations", false)) {
        auto parsed = parse_combination_set(*c);
        if (!parsed) r.add(*s.column("combinations"), "expected a combination set, \"EN1990\" or \"ASCE7\", found " + in_quotes(*c));
        else out.set = *parsed;
    }
    out.standard = out.set == combination_set::en1990 ? design_standard::en1993_1_8 : design_standard::aisc360;
    if (auto c = r.cell("standard", false)) {
        if (*c == "EN1993-1-8" || *c == "AISC360") out.standard = parse_design_standard(*c);
        else r.add(*s.column("standard"), "expected \"EN1993-1-8\" or \"AISC360\", found " + in_quotes(*c));
    }
    if (auto c = r.cell("frame", false)) {
        if (*c == "braced" || *c == "unbraced") out.frame = parse_frame_bracing(*c);
        else r.add(*s.column("frame"), "expected \"braced\" or \"unbraced\", found " + in_quotes(*c));
    }
    // "layout": empty or "two-supports" (the default), "cantilever" (the
    // start detail is the root, the end cell left empty: a free tip), or
    // "overhang" (the end cell left empty: the beam runs on over its end
    // support; its length beyond it in the "overhang" column).
    if (auto c = r.cell("layout", false)) {
        if (*c == "two-supports" || *c == "cantilever") out.layout = parse_beam_layout(*c);
        else if (*c == "overhang" && !s.column("overhang"))
            r.add(*s.column("layout"), "expected \"two-supports\" or \"cantilever\", found \"overhang\": an overhang "
                                       "needs an \"overhang\" column with its length beyond the end support, and the "
                                       "schedule has none");
        else if (*c == "overhang") out.layout = beam_layout::overhang;
        else r.add(*s.column("layout"), "expected \"two-supports\", \"cantilever\" or \"overhang\", found " + in_quotes(*c));
    }
    return out;
}

std::optional<section> read_row_section(row_reader& r)
{
    std::optional<section> sec;
    if (auto name = r.cell("section", true)) {
        sec = find_catalogue_section(*name);
        if (!sec)
            r.add(*r.s.column("section"),
                  "expected a section name from the built-in catalogue (IPE 80 to IPE 600, HE 100 A to HE 600 A, "
                  "HE 100 B to HE 600 B, W shapes such as W18x35; pinproof sections lists them), " +
                      unknown_section_text(*name));
    }
    return sec;
}

// The line loads of cases G and Q, downward, not both zero.
std::array<std::optional<double>, 2> read_row_line_loads(row_reader& r)
{
    std::array<std::optional<double>, 2> line_loads;
    const char* load_cols[2] = {"g", "q"};
    for (int i = 0; i < 2; ++i) {
        line_loads[i] = r.quantity_cell(load_cols[i], dims::line_load, true);
        if (line_loads[i])
            if (auto m = plausibility::load_too_large(*line_loads[i], dims::line_load, r.system,
                                                      in_quotes(r.rec.cells[*r.s.column(load_cols[i])]))) {
                r.add(*r.s.column(load_cols[i]), *m);
                line_loads[i].reset();
                continue;
            }
        if (line_loads[i] && *line_loads[i] < 0) {
            r.add(*r.s.column(load_cols[i]), std::string("expected a downward line load of zero or more, found ") +
                                                 in_quotes(r.rec.cells[*r.s.column(load_cols[i])]));
            line_loads[i].reset();
        }
    }
    if (line_loads[0] && line_loads[1] && *line_loads[0] + *line_loads[1] == 0.0)
        r.add(*r.s.column("g"), "expected a load on the beam (g or q above zero), found g = 0 and q = 0");
    return line_loads;
}

// The catalogue entries named by the start and end cells.
// A cantilever names its root's detail at "start"; its "end" cell stays empty (a free tip).
// An overhang names its start joint's detail; its "end" cell stays empty (no joint there).
std::array<const catalogue_detail*, 2> read_row_details(row_reader& r, const detail_catalogue& catalogue,
                                                        beam_layout layout)
{
    std::array<const catalogue_detail*, 2> details = {nullptr, nullptr};
    const char* end_cols[2] = {"start", "end"};
    const bool cantilever = layout != beam_layout::two_supports;  // one joint, the start
    if (cantilever)
        if (auto e = r.cell("end", false))
            r.add(*r.s.column("end"), layout == beam_layout::cantilever
                                          ? "expected an empty cell: the end of a cantilever is its free tip (the start "
                                            "detail is the root), found " + in_quotes(*e)
                                          : "expected an empty cell: an overhang runs on, continuous, over its end "
                                            "support (the start detail is its only joint), found " + in_quotes(*e));
    for (int i = 0; i < 2; ++i) {
        if (cantilever && i == 1) continue;
        auto d = r.cell(end_cols[i], true);
        if (!d) continue;
        details[i] = catalogue.find(*d);
        if (!details[i])
            r.add(*r.s.column(end_cols[i]), "expected a detail id from the catalogue" +
                                                (catalogue.source.empty() ? std::string() : " " + catalogue.source) +
                                                " (" + catalogue.id_list() + "), found " + in_quotes(*d) +
                                                did_you_mean(*d, catalogue.ids()));
    }
    return details;
}

// The catalogue entries' geometry, with their type, for the end-gap check. A
// problem in it is the catalogue's, named by its pointer there. Returns false
// (after adding the problems) when a geometry is refused.
bool attach_detail_geometry(beam& b, const std::array<const catalogue_detail*, 2>& details, const std::string& at_line,
                            schedule_row& out)
{
    // A schedule repeats few pairs of detail and section: each pair is read once
    // per thread (the reading depends on nothing else). The cache is found by
    // the entry's address and the section, and a hit is used only when the
    // entry still holds the same type, pointer and geometry (an address may be
    // reused by another catalogue).
    struct read_detail {
        std::string type, pointer;
        nlohmann::json geometry;
        connection_detail detail;
        problem_list problems;
    };
    thread_local std::map<std::pair<const catalogue_detail*, std::string>, read_detail> read_details;
    std::string section_key = b.sec.name;
    for (const auto& v : {std::optional<double>(b.sec.depth), b.sec.flange_thickness, b.sec.flange_width,
                          b.sec.web_thickness, b.sec.root_radius}) {
        const double x = v.value_or(-1.0);
        section_key.append(reinterpret_cast<const char*>(&x), sizeof x);
    }
    // The row's standard decides the detail's grades and edge-distance rules.
    section_key.push_back(out.settings.standard == design_standard::aisc360 ? 'U' : 'E');
    for (int i = 0; i < 2; ++i) {
        const catalogue_detail& d = *details[i];
        if (!d.geometry.is_object()) continue;
        auto cached = read_details.find({&d, section_key});
        if (cached == read_details.end() || cached->second.type != d.type || cached->second.pointer != d.pointer ||
            cached->second.geometry != d.geometry) {
            nlohmann::json g = d.geometry;
            g["type"] = d.type;
            read_detail r;
            r.type = d.type;
            r.pointer = d.pointer;
            r.geometry = d.geometry;
            r.detail = read_connection_detail(g, d.pointer + "/geometry", b.sec, r.problems, out.settings.standard);
            if (read_details.size() > 4096) read_details.clear();
            cached = read_details.insert_or_assign({&d, section_key}, std::move(r)).first;
        }
        const problem_list& problems = cached->second.problems;
        const connection_detail& detail = cached->second.detail;
        if (!problems.empty()) {
            for (const auto& pr : problems.problems())
                out.problems.push_back({at_line + " (" + (i == 0 ? "start" : "end") + " detail " + d.id + ", catalogue " +
                                            pr.where + ")",
                                        pr.message});
            return false;
        }
        (i == 0 ? b.start : b.end).detail = detail;
    }
    return true;
}

}  // namespace

schedule_row read_schedule_row(const schedule& s, std::size_t index, const detail_catalogue& catalogue)
{
    schedule_row out;
    const csv_record& rec = s.rows.at(index);
    out.line = rec.line;
    const std::string at_line = "line " + std::to_string(rec.line);
    if (refuse_malformed_record(s, rec, out)) return out;

    row_reader r{s, rec, out.problems};
    auto id = r.cell("id", true);
    if (id) out.id = *id;
    if (id && s.earlier_line_with_same_id[index] != 0)
        r.add(*s.column("id"), "expected a unique beam id, found " + in_quotes(*id) + ", already used on line " +
                                   std::to_string(s.earlier_line_with_same_id[index]));

    const row_rules rules = read_row_rules(r);
    auto span = r.plausible_cell("span", dims::length, true, plausibility::plausible_span);
    std::optional<double> E = r.plausible_cell("E", dims::pressure, false, plausibility::plausible_E);
    const bool E_default = !r.cell("E", false);
    if (E_default) E = rules.standard == design_standard::en1993_1_8 ? default_E_en : default_E_aisc;
    const std::optional<section> sec = read_row_section(r);
    const auto line_loads = read_row_line_loads(r);
    const bool cantilever = rules.layout == beam_layout::cantilever;
    const bool overhanging = rules.layout == beam_layout::overhang;
    const bool one_joint = cantilever || overhanging;
    const auto details = read_row_details(r, catalogue, rules.layout);
    // "overhang": its length beyond the end support, on that layout only.
    std::optional<double> overhang = 0.0;
    if (overhanging) overhang = r.plausible_cell("overhang", dims::length, true, plausibility::plausible_span);
    else if (auto c = r.cell("overhang", false))
        r.add(*s.column("overhang"), "expected an empty cell: only a row with layout \"overhang\" has an overhang, "
                                     "found " + in_quotes(*c));
    // An overhang's start detail: its end gap is checked as on two supports; a
    // derived stiffness or resistance and a law are not worked out for an overhang yet.
    if (overhanging && details[0] &&
        (details[0]->stiffness_from_detail || details[0]->moment_resistance_from_detail ||
         !details[0]->behaviour.is_null()))
        r.add(*s.column("start"), "expected a start detail with a stated stiffness and resistance and no "
                                  "moment-rotation law: \"from-detail\" and laws of an overhang's start are not "
                                  "supported yet, found detail " + in_quotes(details[0]->id));
    // A cantilever's root: a pin is a mechanism; a detail's geometry (the end gap) is not worked out for a root yet.
    if (cantilever && details[0]) {
        const catalogue_detail& d = *details[0];
        if (d.stiffness_min.form != catalogue_stiffness::kind::rigid && d.stiffness_min.value == 0.0)
            r.add(*s.column("start"), "expected a root detail with stiffness above 0: a cantilever whose root is a pin, "
                                      "or whose stiffness range reaches 0, is a mechanism, found detail " +
                                          in_quotes(d.id) + " with a lower bound of 0");
        if (d.geometry.is_object())
            r.add(*s.column("start"), "expected a root detail without a geometry: the end gap of a cantilever's root is "
                                      "not supported yet, found detail " + in_quotes(d.id) + " with one");
    }
    auto deflection = r.deflection_cell();
    std::string description;
    if (auto d = r.cell("description", false)) description = *d;

    out.settings.format = project_format;
    out.settings.title = s.source;
    out.settings.standard = rules.standard;
    out.settings.frame = rules.frame;
    out.settings.units = r.system == unit_system::us_customary ? unit_system::us_customary : unit_system::si;
    if (!out.problems.empty()) return out;

    beam b;
    b.id = *id;
    b.description = description;
    b.span = *span;
    b.E = *E;
    b.E_is_default = E_default;
    b.sec = *sec;
    for (int i = 0; i < 2; ++i) {
        load l;
        l.kind = load_kind::udl;
        l.value = *line_loads[i];
        l.from = 0.0;
        l.to = *span + *overhang;  // an overhang: to its tip
        l.load_case = i == 0 ? "G" : "Q";
        b.loads.push_back(l);
    }
    b.combinations = combinations_of(rules.set);
    b.layout = rules.layout;
    b.overhang = *overhang;
    b.start = joint_for_beam(*details[0], b.EI(), b.span);
    b.end = one_joint ? joint{} : joint_for_beam(*details[1], b.EI(), b.span);
    // A stiffness given as a multiple of EI/L meets the project file's ceiling here, with this beam's EI/L.
    bool stiffness_ok = true;
    for (int i = 0; i < (one_joint ? 1 : 2); ++i) {
        const joint& j = i == 0 ? b.start : b.end;
        for (const stiffness& k : {j.range.min, j.range.max})
            if (!k.is_rigid())
                if (auto m = plausibility::stiffness_too_large(k.value(), r.system,
                                                               "catalogue detail \"" + message_text(details[i]->id) + "\" = " +
                                                                   format_quantity(k.value(), dims::rotational_stiffness, r.system) +
                                                                   " on this beam")) {
                    r.add(*s.column(i == 0 ? "start" : "end"), *m);
                    stiffness_ok = false;
                    break;
                }
    }
    if (!stiffness_ok) return out;
    // A stiffness "from-detail" comes from the EN 1993-1-8 components; AISC 360
    // gives none, so a row under it needs the entry's stated range.
    const int ends = one_joint ? 1 : 2;
    // A cantilever's root takes neither a derived joint nor a law yet (as in a project file).
    if (cantilever && (details[0]->stiffness_from_detail || details[0]->moment_resistance_from_detail ||
                       !details[0]->behaviour.is_null())) {
        r.add(*s.column("start"), "expected a root detail with a stated stiffness and resistance and no moment-rotation "
                                  "law: \"from-detail\" and laws at a cantilever's root are not supported yet, found "
                                  "detail " + in_quotes(details[0]->id));
        stiffness_ok = false;
    }
    for (int i = 0; i < ends; ++i)
        if (details[i]->stiffness_from_detail && rules.standard == design_standard::aisc360) {
            r.add(*s.column(i == 0 ? "start" : "end"),
                  "catalogue detail \"" + message_text(details[i]->id) + "\" at " + details[i]->pointer +
                      "/stiffness: expected a stiffness range for a row under AISC 360 (AISC 360-16 gives no "
                      "component stiffness, so \"from-detail\" derives the moment resistance only), found "
                      "\"from-detail\"");
            stiffness_ok = false;
        }
    if (!stiffness_ok) return out;
    // The entry's law, read under this row's standard (an EN law is refused
    // under AISC 360) and fitted to the stiffness on this beam.
    for (int i = 0; i < ends; ++i) {
        if (details[i]->behaviour.is_null()) continue;
        joint& j = i == 0 ? b.start : b.end;
        problem_list found;
        const std::string at = details[i]->pointer;
        j.behaviour = read_joint_behaviour(details[i]->behaviour, at + "/behaviour", rules.standard, found);
        if (j.behaviour) check_behaviour_fits(j, at, found, r.system);
        for (const auto& p : found.problems())
            r.add(*s.column(i == 0 ? "start" : "end"), "catalogue detail \"" + message_text(details[i]->id) + "\" at " +
                                                             p.where + " on this beam: " + p.message);
        if (!found.empty()) stiffness_ok = false;
    }
    if (!stiffness_ok) return out;
    // A cantilever's root detail and an overhang's start detail have no geometry (refused above): nothing to attach.
    if (!one_joint && !attach_detail_geometry(b, details, at_line, out)) return out;
    b.deflection = deflection;
    b.pointer = at_line;
    out.input = std::move(b);
    return out;
}

}  // namespace pinproof
