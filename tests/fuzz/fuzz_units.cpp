// Fuzz target: the quantity parser (parse_quantity) and formatting the parsed
// value back (fuzz_entry.hpp). Built and run by tests/fuzz/run-fuzz.sh.
#include <cstdio>
#include <cstdlib>
#include <exception>

#include "fuzz_entry.hpp"

extern "C" int LLVMFuzzerTestOneInput(const unsigned char* data, std::size_t size)
{
    try {
        pinproof::fuzz::unit_text({reinterpret_cast<const char*>(data), size});
    } catch (const std::exception& e) {
        std::fprintf(stderr, "fuzz_units: %s\n", e.what());
        std::abort();
    }
    return 0;
}
