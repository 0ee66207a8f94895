#include "report/load_arrow.hpp"

#include "report/svg_number.hpp"

#include <cmath>
#include <sstream>

namespace pinproof {
namespace {

std::string num(double v) { return svg_number(v); }

}  // namespace

std::string load_arrow_svg(double x, double y, double length, bool down, const std::string& colour,
                           const std::string& stroke_width)
{
    std::ostringstream o;
    if (down) {
        o << "<line x1=\"" << num(x) << "\" y1=\"" << num(y - length) << "\" x2=\"" << num(x) << "\" y2=\""
          << num(y - 5) << "\" stroke=\"" << colour << "\" stroke-width=\"" << stroke_width << "\"/>\n"
          << "<path d=\"M" << num(x) << " " << num(y) << " l-3.5 -7 h7 z\" fill=\"" << colour << "\"/>\n";
    } else {
        o << "<line x1=\"" << num(x) << "\" y1=\"" << num(y) << "\" x2=\"" << num(x) << "\" y2=\""
          << num(y - length + 5) << "\" stroke=\"" << colour << "\" stroke-width=\"" << stroke_width << "\"/>\n"
          << "<path d=\"M" << num(x) << " " << num(y - length) << " l-3.5 7 h7 z\" fill=\"" << colour << "\"/>\n";
    }
    return o.str();
}

}  // namespace pinproof
