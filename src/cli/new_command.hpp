// `pinproof new [--units SI|US] [-o FILE]`: writes a starter project file, one
// invented beam with each joint form shown and every object explained in its
// "notes", that `pinproof check` accepts as it is.
#pragma once

#include <iosfwd>
#include <string>

namespace CLI {
class App;
}

namespace pinproof::cli {

struct new_options {
    std::string units = "SI";  // "SI" (EN 1993-1-8) or "US" (AISC 360)
    std::string output = "-";  // file to write; "-" for standard output
};

CLI::App* add_new_subcommand(CLI::App& app, new_options& o);
int new_command(const new_options& o, std::ostream& out);

// The starter file's text (starter_project.cpp).
const char* starter_project(bool us_customary);

}  // namespace pinproof::cli
