// SHA-256 (FIPS 180-4, Secure Hash Standard, 2015, sections 4.1.2, 4.2.2,
// 5.1.1, 5.3.3 and 6.2), used to identify an input file in a report.
#pragma once

#include <string>
#include <string_view>

namespace pinproof {

// The digest of `bytes` as 64 lower-case hexadecimal digits.
std::string sha256_hex(std::string_view bytes);

}  // namespace pinproof
