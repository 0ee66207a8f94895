// Fuzz target: a stiffness distribution object (the JSON value of a joint's
// "stiffness_distribution"), read and assessed inside a fixed project file
// (fuzz_entry.hpp).
// Built and run by tests/fuzz/run-fuzz.sh.
#include <cstdio>
#include <cstdlib>
#include <exception>

#include "fuzz_entry.hpp"

#ifndef PINPROOF_SOURCE_DIR
#error "PINPROOF_SOURCE_DIR must name the source tree (for the example catalogue)"
#endif

extern "C" int LLVMFuzzerTestOneInput(const unsigned char* data, std::size_t size)
{
    try {
        pinproof::fuzz::distribution_input({reinterpret_cast<const char*>(data), size},
                                           PINPROOF_SOURCE_DIR "/catalog-examples/details-harbour-lane.json");
    } catch (const std::exception& e) {
        std::fprintf(stderr, "fuzz_distribution: %s\n", e.what());
        std::abort();
    }
    return 0;
}
