#include "pinproof/model/design_standard.hpp"

#include <stdexcept>

namespace pinproof {

std::string to_string(design_standard s) { return s == design_standard::en1993_1_8 ? "EN1993-1-8" : "AISC360"; }
std::string to_string(frame_bracing f) { return f == frame_bracing::braced ? "braced" : "unbraced"; }

design_standard parse_design_standard(const std::string& s)
{
    if (s == "EN1993-1-8") return design_standard::en1993_1_8;
    if (s == "AISC360") return design_standard::aisc360;
    throw std::invalid_argument("unknown standard \"" + s + "\"");
}

frame_bracing parse_frame_bracing(const std::string& s)
{
    if (s == "braced") return frame_bracing::braced;
    if (s == "unbraced") return frame_bracing::unbraced;
    throw std::invalid_argument("unknown frame type \"" + s + "\"");
}

}  // namespace pinproof
