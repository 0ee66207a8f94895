#include "pinproof/io/moment_rotation_points.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <stdexcept>

#include "pinproof/core/errors.hpp"

namespace pinproof {
namespace {

struct cell {
    std::string text;
    std::size_t column = 1;  // 1-based, of the cell's first character
};

std::string trimmed(std::string_view s)
{
    std::size_t b = 0, e = s.size();
    while (b < e && std::isspace(static_cast<unsigned char>(s[b]))) ++b;
    while (e > b && std::isspace(static_cast<unsigned char>(s[e - 1]))) --e;
    return std::string(s.substr(b, e - b));
}

std::vector<cell> cells_of(std::string_view line)
{
    std::vector<cell> out;
    std::size_t start = 0;
    for (;;) {
        const std::size_t comma = line.find(',', start);
        const std::string_view raw = line.substr(start, comma == std::string_view::npos ? line.npos : comma - start);
        out.push_back({trimmed(raw), start + 1});
        if (comma == std::string_view::npos) break;
        start = comma + 1;
    }
    return out;
}

std::string lower(std::string s)
{
    std::transform(s.begin(), s.end(), s.begin(), [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return s;
}

std::string where(std::size_t line, std::size_t column)
{
    return "line " + std::to_string(line) + ", column " + std::to_string(column);
}

// One cell as a quantity of dimension d; adds a problem and returns NaN otherwise.
double read_cell(const cell& c, std::size_t line, dimension d, const char* what, problem_list& problems,
                 unit_system* system)
{
    const std::string found = "\"" + c.text + "\"";
    try {
        const quantity q = parse_quantity(c.text);
        if (q.dim != d) {
            problems.add(where(line, c.column), std::string("expected ") + what + " (for example \"" +
                                                    example_of(d) + "\"), found " + found + ", a " + describe(q.dim));
            return std::nan("");
        }
        if (system && q.system != unit_system::neutral) *system = q.system;
        return q.value;
    } catch (const std::invalid_argument& e) {
        problems.add(where(line, c.column),
                     std::string("expected ") + what + " (for example \"" + example_of(d) + "\"), found " + found +
                         ": " + e.what());
        return std::nan("");
    }
}

}  // namespace

moment_rotation_points read_moment_rotation_points(std::string_view text)
{
    problem_list problems;
    moment_rotation_points out;
    std::size_t line_no = 0, pos = 0;
    bool header_seen = false;
    while (pos <= text.size()) {
        const std::size_t nl = text.find('\n', pos);
        std::string_view line = text.substr(pos, nl == std::string_view::npos ? text.npos : nl - pos);
        pos = nl == std::string_view::npos ? text.size() + 1 : nl + 1;
        ++line_no;
        if (!line.empty() && line.back() == '\r') line.remove_suffix(1);
        if (trimmed(line).empty()) continue;
        const std::vector<cell> cells = cells_of(line);
        if (!header_seen) {
            header_seen = true;
            if (cells.size() != 2 || lower(cells[0].text) != "rotation" || lower(cells[1].text) != "moment")
                problems.add(where(line_no, 1), "expected the header \"rotation,moment\", found \"" +
                                                    trimmed(line) + "\"");
            continue;
        }
        if (cells.size() != 2) {
            problems.add(where(line_no, 1), "expected two cells, a rotation and a moment, found " +
                                                std::to_string(cells.size()));
            continue;
        }
        const double theta = read_cell(cells[0], line_no, dims::angle, "a rotation", problems, nullptr);
        const double m = read_cell(cells[1], line_no, dims::moment, "a moment", problems, &out.system);
        if (std::isfinite(theta) && !(theta > 0))
            problems.add(where(line_no, cells[0].column), "expected a rotation > 0, found \"" + cells[0].text + "\"");
        if (std::isfinite(m) && !(m >= 0))
            problems.add(where(line_no, cells[1].column), "expected a moment >= 0, found \"" + cells[1].text + "\"");
        if (std::isfinite(theta) && std::isfinite(m)) out.points.push_back({theta, m});
    }
    if (!header_seen) problems.add("line 1", "expected the header \"rotation,moment\" and points, found an empty file");
    else if (problems.empty() && out.points.size() < 2)
        problems.add("line " + std::to_string(line_no), "expected at least two points, found " +
                                                             std::to_string(out.points.size()));
    problems.throw_if_any();
    return out;
}

}  // namespace pinproof
