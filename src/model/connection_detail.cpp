#include "pinproof/model/connection_detail.hpp"

#include <string>
#include <vector>

namespace pinproof {

namespace {
const std::vector<std::string> type_names = {"fin-plate", "web-cleats", "end-plate", "custom"};
const std::vector<std::string> support_names = {"column-flange", "column-web", "beam-web"};
}  // namespace

std::string to_string(detail_type t) { return type_names.at(static_cast<std::size_t>(t)); }

std::optional<detail_type> parse_detail_type(std::string_view text)
{
    for (std::size_t i = 0; i < type_names.size(); ++i)
        if (text == type_names[i]) return static_cast<detail_type>(i);
    return std::nullopt;
}

const std::vector<std::string>& detail_type_names() { return type_names; }

std::string to_string(support_type t) { return support_names.at(static_cast<std::size_t>(t)); }

std::optional<support_type> parse_support_type(std::string_view text)
{
    for (std::size_t i = 0; i < support_names.size(); ++i)
        if (text == support_names[i]) return static_cast<support_type>(i);
    return std::nullopt;
}

const std::vector<std::string>& support_type_names() { return support_names; }

std::string to_string(plate_grade g) { return g == plate_grade::s275 ? "S275" : "S355"; }

}  // namespace pinproof
