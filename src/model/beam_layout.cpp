#include "pinproof/model/beam_layout.hpp"

#include <stdexcept>

namespace pinproof {

std::string to_string(beam_layout l)
{
    switch (l) {
    case beam_layout::two_supports: return "two-supports";
    case beam_layout::cantilever: return "cantilever";
    case beam_layout::overhang: return "overhang";
    }
    return "two-supports";
}

beam_layout parse_beam_layout(const std::string& s)
{
    if (s == "two-supports") return beam_layout::two_supports;
    if (s == "cantilever") return beam_layout::cantilever;
    if (s == "overhang") return beam_layout::overhang;
    throw std::invalid_argument("unknown beam layout \"" + s + "\"");
}

const std::vector<std::string>& beam_layout_names()
{
    static const std::vector<std::string> names{"two-supports", "cantilever", "overhang"};
    return names;
}

}  // namespace pinproof
