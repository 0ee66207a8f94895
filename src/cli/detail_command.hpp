// `pinproof detail FILE --beam ID --end start|end --svg OUT`: the end-gap check
// of one joint, with its elevation drawing.
#pragma once

#include <iosfwd>
#include <string>

namespace pinproof::cli {

struct detail_options {
    std::string file;
    std::string beam;
    std::string end = "end";
    std::string svg;  // output drawing; "-" for stdout
    std::string details;  // detail catalogue for joints given as ids
};

// Exit code as `check`: 0 when the beam's verdict holds, 1 when not. Input
// problems are thrown as input_error.
int detail_command(const detail_options& o, std::ostream& out, std::ostream& err);

}  // namespace pinproof::cli
