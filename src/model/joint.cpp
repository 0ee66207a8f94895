#include "pinproof/model/joint.hpp"

namespace pinproof {

std::string to_string(beam_end e) { return e == beam_end::start ? "start" : "end"; }

}  // namespace pinproof
