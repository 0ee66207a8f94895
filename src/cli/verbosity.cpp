#include "verbosity.hpp"

#include <streambuf>

namespace pinproof::cli {

void add_verbosity_flags(CLI::App& cmd, verbosity& v)
{
    auto* q = cmd.add_flag("-q,--quiet", v.quiet,
                           "Print only the results asked for on standard output, and errors (the exit code still "
                           "gives the verdict)");
    auto* w = cmd.add_flag("-v,--verbose", v.verbose,
                           "Also print, on standard error, each input file read and the running time");
    q->excludes(w);
}

std::ostream& null_stream()
{
    struct discard : std::streambuf {
        int overflow(int c) override { return c; }
        std::streamsize xsputn(const char*, std::streamsize n) override { return n; }
    };
    static discard buffer;
    static std::ostream stream(&buffer);
    return stream;
}

}  // namespace pinproof::cli
