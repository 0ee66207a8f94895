// Text placed in an SVG or XML document: the five markup characters escaped
// and the C0 controls XML 1.0 forbids (section 2.2: all but tab, LF, CR)
// replaced by U+FFFD, so that any user text yields a well-formed document.
#pragma once

#include <string>
#include <string_view>

namespace pinproof {

std::string xml_text(std::string_view s);

}  // namespace pinproof
