#include "new_command.hpp"

#include <CLI/CLI.hpp>

#include <filesystem>
#include <ostream>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/output_file.hpp"

namespace pinproof::cli {

CLI::App* add_new_subcommand(CLI::App& app, new_options& o)
{
    auto* cmd = app.add_subcommand("new", "Write a starter project file: one invented beam, every field explained "
                                          "in its notes, ready for 'pinproof check'");
    cmd->add_option("--units", o.units, "SI (EN 1993-1-8, kN and m) or US (AISC 360, kip and ft)")
        ->check(CLI::IsMember({"SI", "US"}, CLI::ignore_case))
        ->capture_default_str();
    cmd->add_option("-o,--output", o.output, "File to write ('-' for standard output); an existing file is refused")
        ->type_name("FILE")
        ->capture_default_str();
    cmd->footer("Exit codes: 0 written, 2 the file exists already or cannot be written.");
    return cmd;
}

int new_command(const new_options& o, std::ostream& out)
{
    const bool us = o.units == "US" || o.units == "us";
    const std::string text = starter_project(us);
    if (o.output == "-") {
        out << text;
        return 0;
    }
    // A starter never replaces a file: it may be the user's project.
    std::error_code ec;
    if (std::filesystem::symlink_status(o.output, ec).type() != std::filesystem::file_type::not_found)
        throw input_error(o.output, "exists already: pinproof new never replaces a file; choose another name");
    output_set outputs;
    outputs.add("-o", o.output, text);
    outputs.commit();
    out << "pinproof new: wrote " << o.output << " (" << (us ? "US customary, AISC 360" : "SI, EN 1993-1-8")
        << "). Edit it, then run: pinproof check " << o.output << "\n";
    return 0;
}

}  // namespace pinproof::cli
