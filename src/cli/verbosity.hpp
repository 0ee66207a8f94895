// How much a command says besides its results: --quiet and --verbose, on
// every command.
//
//   --quiet    prints only the results asked for on standard output (a JSON
//              or CSV written to '-', the section list, a fit) and the
//              errors; the exit code still gives the verdict.
//   --verbose  adds, on standard error, each input file read (its kind, name
//              and size) and the command's running time.
#pragma once

#include <CLI/CLI.hpp>

#include <ostream>

namespace pinproof::cli {

struct verbosity {
    bool quiet = false;
    bool verbose = false;
};

// Adds -q,--quiet and -v,--verbose to `cmd` (each excluding the other).
void add_verbosity_flags(CLI::App& cmd, verbosity& v);

// A stream that discards what is written to it.
std::ostream& null_stream();

}  // namespace pinproof::cli
