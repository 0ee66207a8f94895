#include "report_command.hpp"

#include <ctime>
#include <fstream>
#include <ostream>
#include <sstream>

#include "pinproof/assessment.hpp"
#include "pinproof/calculation_report.hpp"
#include "pinproof/errors.hpp"
#include "pinproof/output_file.hpp"
#include "pinproof/project.hpp"

namespace pinproof::cli {
namespace {

std::string today_iso()
{
    const std::time_t now = std::time(nullptr);
    std::tm utc{};
    gmtime_r(&now, &utc);
    char buf[16];
    std::strftime(buf, sizeof buf, "%Y-%m-%d", &utc);
    return buf;
}

}  // namespace

int report_command(const std::string& file, const std::string& out_path, std::ostream& out, std::ostream& /*err*/,
                   const std::string& details_file)
{
    const project p = load_project_file(file, details_file);
    // The hash is of the bytes the project was read from.
    std::ifstream in(file, std::ios::binary);
    std::ostringstream bytes;
    bytes << in.rdbuf();
    if (!in) throw input_error(file, "expected a readable project file, found one that cannot be read");
    const project_assessment a = assess_project(p);
    report_info info;
    info.input_file = file;
    info.input_sha256 = input_hash(bytes.str());
    info.date = today_iso();
    info.version = PINPROOF_VERSION;
    const std::string html = calculation_report_html(p, a, info);
    write_file_atomically(out_path, html);
    out << "Report written to " << out_path << ": " << (a.all_hold() ? "every verdict holds" : "a verdict does not hold")
        << ".\n";
    return a.all_hold() ? 0 : 1;
}

}  // namespace pinproof::cli
