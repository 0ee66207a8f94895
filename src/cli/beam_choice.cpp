#include "beam_choice.hpp"

#include <algorithm>

#include "pinproof/core/edit_distance.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"

namespace pinproof::cli {
namespace {

std::string quoted_shortly(const std::string& s)
{
    return "\"" + (s.size() <= 60 ? s : s.substr(0, 57) + "...") + "\"";
}

}  // namespace

std::vector<std::string> nearest_ids(const std::vector<std::string>& ids, const std::string& wanted, std::size_t count)
{
    const std::string w = wanted.substr(0, 200);
    std::vector<std::pair<std::size_t, std::size_t>> scored;  // distance, index
    scored.reserve(ids.size());
    for (std::size_t i = 0; i < ids.size(); ++i) scored.emplace_back(edit_distance(ids[i].substr(0, 200), w), i);
    const std::size_t n = std::min(count, scored.size());
    std::partial_sort(scored.begin(), scored.begin() + static_cast<std::ptrdiff_t>(n), scored.end());
    std::vector<std::string> out;
    for (std::size_t i = 0; i < n; ++i) out.push_back(ids[scored[i].second]);
    return out;
}

const beam& beam_by_id(const project& p, const std::string& id, const std::string& file)
{
    std::vector<std::string> ids;
    ids.reserve(p.beams.size());
    for (const auto& b : p.beams) {
        if (b.id == id) return b;
        ids.push_back(b.id);
    }
    if (ids.empty()) throw input_error("/beams", "expected at least one beam, found none");
    std::string message = "expected the id of one of the " + std::to_string(ids.size()) + " beams in " + file +
                          ", found " + quoted_shortly(id);
    if (ids.size() <= 5) {
        message += "; the beams are";
    } else {
        message += "; the nearest ids are";
    }
    const auto near = nearest_ids(ids, id, 5);
    for (std::size_t i = 0; i < near.size(); ++i) message += (i ? ", " : " ") + quoted_shortly(near[i]);
    throw input_error("--beam", message);
}

}  // namespace pinproof::cli
