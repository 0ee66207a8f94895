// Fuzz target: the detail-catalogue reader (parse_detail_catalogue), then the
// first and last entries of a catalogue that is read, used at the ends of one
// beam by a project file and by a schedule row (fuzz_entry.hpp).
// Built and run by tests/fuzz/run-fuzz.sh.
#include <cstdio>
#include <cstdlib>
#include <exception>

#include "fuzz_entry.hpp"

extern "C" int LLVMFuzzerTestOneInput(const unsigned char* data, std::size_t size)
{
    try {
        pinproof::fuzz::catalogue_input({reinterpret_cast<const char*>(data), size});
    } catch (const std::exception& e) {
        std::fprintf(stderr, "fuzz_catalogue: %s\n", e.what());
        std::abort();
    }
    return 0;
}
