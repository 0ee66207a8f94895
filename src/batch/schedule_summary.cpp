#include "pinproof/batch/schedule_summary.hpp"

#include <algorithm>
#include <map>
#include <sstream>
#include <vector>

#include "pinproof/core/units.hpp"
#include "pinproof/report/calculation_report.hpp"
#include "pinproof/report/report_style.hpp"
#include "pinproof/report/text_report.hpp"

namespace pinproof {
namespace {

std::string esc(const std::string& s) { return html_escape(s); }

// Sorting by a column: a click on its header sorts the body by the cells'
// data-v (numbers) or text, a second click reverses. Rows keep their
// schedule order among equals (Array.prototype.sort is stable, ECMAScript
// 2019). Nothing is fetched; without scripts the table stays in schedule order.
constexpr const char* sort_script = R"(<script>
document.querySelectorAll('table.sortable').forEach(function (t) {
  t.querySelectorAll('thead th').forEach(function (th, col) {
    th.addEventListener('click', function () {
      var body = t.tBodies[0], rows = Array.from(body.rows);
      var down = th.getAttribute('aria-sort') === 'ascending';
      t.querySelectorAll('thead th').forEach(function (h) { h.removeAttribute('aria-sort'); });
      th.setAttribute('aria-sort', down ? 'descending' : 'ascending');
      var key = function (r) { var c = r.cells[col]; return c.hasAttribute('data-v') ? parseFloat(c.getAttribute('data-v')) : c.textContent; };
      rows.sort(function (a, b) {
        var x = key(a), y = key(b);
        if (typeof x === 'number' && typeof y === 'number') { if (isNaN(x)) return 1; if (isNaN(y)) return -1; return down ? y - x : x - y; }
        return down ? String(y).localeCompare(String(x)) : String(x).localeCompare(String(y));
      });
      rows.forEach(function (r) { body.appendChild(r); });
    });
  });
});
</script>
)";

class summary_page {
public:
    summary_page(const batch_result& r, const schedule_summary_info& info) : r_(r), info_(info) {}
    std::string html();

private:
    void head();
    void title_block();
    void verdicts();
    void check_counts();
    void table();
    void refused();
    std::string quantity_cell(const std::optional<double>& si, dimension d, int sig = 4) const;

    const batch_result& r_;
    const schedule_summary_info& info_;
    std::ostringstream o_;
};

std::string summary_page::quantity_cell(const std::optional<double>& si, dimension d, int sig) const
{
    if (!si) return "<td class=\"num\" data-v=\"NaN\">-</td>";
    const display_unit u = display_unit_for(d, r_.units);
    const double v = *si / u.si_per_unit;
    return "<td class=\"num\" data-v=\"" + format_number(v, 9) + "\">" + format_number(v, sig) + "</td>";
}

void summary_page::head()
{
    const std::string title = "Schedule summary: " + info_.schedule_file;
    o_ << "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
       << "<meta name=\"generator\" content=\"pinproof " << esc(info_.version) << "\">\n"
       << "<title>" << esc(title) << "</title>\n<style>\n"
       << page_margin_boxes(r_.units, title, "", "pinproof " + info_.version + " schedule summary") << report_stylesheet()
       << "table.sortable th { cursor: pointer; white-space: nowrap; }\n"
          "table.sortable th[aria-sort=ascending]::after { content: \" \\25B2\"; }\n"
          "table.sortable th[aria-sort=descending]::after { content: \" \\25BC\"; }\n"
          "table.sortable td, table.sortable th { font-size: 8pt; padding: 0.6mm 1mm; }\n"
          "table.sortable code { white-space: nowrap; }\n"
          "table.counts { width: auto; min-width: 50%; }\n"
          "body.wide { max-width: 260mm; }\n"
          "@media print { body.wide { max-width: none; } }\n"
       << "</style>\n</head>\n<body class=\"wide\">\n";
}

void summary_page::title_block()
{
    o_ << "<header>\n<h1>Schedule summary: simple-support assumption of every beam</h1>\n<table class=\"kv\">\n"
       << "<tr><th>Schedule</th><td>" << esc(info_.schedule_file) << " (SHA-256 <span class=\"hash\">"
       << esc(info_.schedule_sha256) << "</span>)</td></tr>\n"
       << "<tr><th>Detail catalogue</th><td>" << esc(info_.catalogue_file)
       << (info_.catalogue_title.empty() ? "" : ": " + esc(info_.catalogue_title)) << "</td></tr>\n"
       << "<tr><th>Date of the run</th><td>" << esc(info_.date) << "</td></tr>\n"
       << "<tr><th>Program</th><td>pinproof " << esc(info_.version) << "</td></tr>\n"
       << "<tr><th>Units shown</th><td>"
       << (r_.units == unit_system::us_customary ? "US customary (kip, kip*ft, mrad)" : "SI (kN, kN*m, mrad)")
       << "</td></tr>\n</table>\n</header>\n";
}

void summary_page::verdicts()
{
    const batch_summary& s = r_.summary;
    const bool holds = s.failed == 0 && s.refused == 0;
    o_ << "<section id=\"verdict\">\n<h2>Verdict</h2>\n<div class=\"verdict " << (holds ? "pass" : "fail") << "\">";
    if (holds) o_ << "The simple-support (pinned) assumption holds for every one of the " << s.rows << " beams.";
    else
        o_ << "The simple-support (pinned) assumption DOES NOT HOLD for " << s.failed << " of " << s.rows << " beams"
           << (s.refused ? "; " + std::to_string(s.refused) + (s.refused == 1 ? " row was" : " rows were") +
                               " refused and not assessed"
                         : std::string())
           << ".";
    o_ << "</div>\n<table class=\"counts\">\n<thead><tr><th>Verdict</th><th>Beams</th><th>Share</th></tr></thead>\n<tbody>\n";
    const auto row = [&](const char* name, std::size_t n) {
        o_ << "<tr><td>" << name << "</td><td class=\"num\">" << n << "</td><td class=\"num\">"
           << (s.rows ? format_number(100.0 * static_cast<double>(n) / static_cast<double>(s.rows), 3) : "0")
           << " %</td></tr>\n";
    };
    row("holds", s.passed);
    row("does not hold", s.failed);
    row("refused (bad data, not assessed)", s.refused);
    o_ << "</tbody>\n</table>\n<div class=\"caution\">" << esc(caution_text) << "</div>\n</section>\n";
}

// How often each check fails, and how often each governs (the largest ratio
// of a beam): where the schedule's problems lie.
void summary_page::check_counts()
{
    std::map<std::string, std::size_t> failing, governing;
    for (const auto& row : r_.rows) {
        for (const auto& id : row.failed_checks) ++failing[id];
        if (!row.governing_check.empty()) ++governing[row.governing_check];
    }
    const auto table_of = [&](const char* heading, const char* what, const std::map<std::string, std::size_t>& m) {
        o_ << "<h3>" << heading << "</h3>\n";
        if (m.empty()) {
            o_ << "<p>None.</p>\n";
            return;
        }
        std::vector<std::pair<std::string, std::size_t>> v(m.begin(), m.end());
        std::stable_sort(v.begin(), v.end(), [](const auto& a, const auto& b) { return a.second > b.second; });
        o_ << "<table class=\"counts\">\n<thead><tr><th>Check</th><th>" << what << "</th></tr></thead>\n<tbody>\n";
        for (const auto& [id, n] : v)
            o_ << "<tr><td class=\"id\"><code>" << esc(id) << "</code></td><td class=\"num\">" << n << "</td></tr>\n";
        o_ << "</tbody>\n</table>\n";
    };
    o_ << "<section id=\"checks\">\n<h2>Checks</h2>\n";
    table_of("Failed checks", "Beams where it fails", failing);
    table_of("Governing checks", "Beams it governs", governing);
    o_ << "</section>\n";
}

void summary_page::table()
{
    const auto sym = [&](dimension d) { return esc(display_unit_for(d, r_.units).symbol); };
    o_ << "<section id=\"beams\">\n<h2>Every beam</h2>\n<p class=\"note\">Click a column's header to sort by it; "
          "again to reverse. Moments and reactions are the largest over the stiffness range under the strength "
          "combinations; rotations the largest under any combination; the closure rotation is where the end gap "
          "closes (docs/batch-and-catalogues.md).</p>\n"
       << "<table class=\"sortable\">\n<thead><tr><th>Line</th><th>Beam</th><th>Verdict</th><th>Governing check</th>"
       << "<th>Ratio</th><th>R start [" << sym(dims::force) << "]</th><th>R end [" << sym(dims::force) << "]</th>"
       << "<th>M start [" << sym(dims::moment) << "]</th><th>M end [" << sym(dims::moment) << "]</th>"
       << "<th>&theta; start [mrad]</th><th>&theta; end [mrad]</th><th>Failed checks</th></tr></thead>\n<tbody>\n";
    for (const auto& row : r_.rows) {
        const char* cls = row.verdict == batch_verdict::holds ? "pass" : row.verdict == batch_verdict::refused ? "warn" : "fail";
        std::string failed;
        for (const auto& id : row.failed_checks) failed += (failed.empty() ? "" : ", ") + ("<code>" + esc(id) + "</code>");
        const auto mrad = [](const std::optional<double>& r) { return r ? std::optional<double>(*r * 1e3) : std::nullopt; };
        o_ << "<tr><td class=\"num\" data-v=\"" << row.line << "\">" << row.line << "</td><td class=\"id\">"
           << esc(row.id) << "</td><td class=\"status " << cls << "\">" << esc(to_string(row.verdict)) << "</td><td><code>"
           << esc(row.governing_check) << "</code></td>";
        if (row.worst_ratio)
            o_ << "<td class=\"num\" data-v=\"" << format_number(*row.worst_ratio, 9) << "\">"
               << format_number(*row.worst_ratio, 3) << "</td>";
        else o_ << "<td class=\"num\" data-v=\"NaN\">-</td>";
        o_ << quantity_cell(row.reaction_start, dims::force) << quantity_cell(row.reaction_end, dims::force)
           << quantity_cell(row.moment_start, dims::moment) << quantity_cell(row.moment_end, dims::moment);
        // Rotations in mrad in either unit system.
        for (const auto& rot : {mrad(row.rotation_start), mrad(row.rotation_end)}) {
            if (rot) o_ << "<td class=\"num\" data-v=\"" << format_number(*rot, 9) << "\">" << format_number(*rot, 4) << "</td>";
            else o_ << "<td class=\"num\" data-v=\"NaN\">-</td>";
        }
        o_ << "<td>" << failed << "</td></tr>\n";
    }
    o_ << "</tbody>\n</table>\n</section>\n";
}

void summary_page::refused()
{
    if (r_.summary.refused == 0) return;
    o_ << "<section id=\"refused\">\n<h2>Refused rows</h2>\n<p>These rows were not assessed: correct them and run "
          "again.</p>\n<table>\n<thead><tr><th>Line</th><th>Beam</th><th>Where</th><th>Problem</th></tr></thead>\n<tbody>\n";
    for (const auto& row : r_.rows) {
        if (row.verdict != batch_verdict::refused) continue;
        for (const auto& p : row.problems)
            o_ << "<tr><td class=\"num\">" << row.line << "</td><td class=\"id\">" << esc(row.id) << "</td><td><code>"
               << esc(p.where) << "</code></td><td>" << esc(p.message) << "</td></tr>\n";
    }
    o_ << "</tbody>\n</table>\n</section>\n";
}

std::string summary_page::html()
{
    head();
    title_block();
    verdicts();
    check_counts();
    table();
    refused();
    o_ << "<section id=\"cautions\">\n<h2>Cautions</h2>\n<div class=\"caution\">" << esc(caution_text)
       << "</div>\n</section>\n"
       << sort_script << "</body>\n</html>\n";
    return o_.str();
}

}  // namespace

std::string schedule_summary_html(const batch_result& r, const schedule_summary_info& info)
{
    summary_page page(r, info);
    return page.html();
}

}  // namespace pinproof
