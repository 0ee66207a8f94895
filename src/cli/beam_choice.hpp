// Choosing a beam of a project by its id (--beam). An unknown id is refused
// naming the few known ids nearest to it, not the whole list: a project or a
// schedule of ten thousand beams would give a line of 80 KB.
#pragma once

#include <string>
#include <vector>

namespace pinproof {
struct beam;
struct project;
}

namespace pinproof::cli {

// The beam with id `id`. Throws input_error at "--beam" when there is none.
const beam& beam_by_id(const project& p, const std::string& id, const std::string& file);

// The ids nearest to `wanted` (edit distance, then input order), at most `count`.
std::vector<std::string> nearest_ids(const std::vector<std::string>& ids, const std::string& wanted, std::size_t count);

}  // namespace pinproof::cli
