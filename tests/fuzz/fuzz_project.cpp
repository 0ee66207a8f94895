// Fuzz target: the project-file loader (parse_project), then the engine and
// the text and JSON outputs for a project that is accepted (fuzz_entry.hpp).
// Built and run by tests/fuzz/run-fuzz.sh.
#include <cstdio>
#include <cstdlib>
#include <exception>

#include "fuzz_entry.hpp"
#include "pinproof/io/project_input.hpp"

#ifndef PINPROOF_SOURCE_DIR
#error "PINPROOF_SOURCE_DIR must name the source tree (for the example catalogue)"
#endif

namespace {
// Joints given as detail ids are looked up in the example catalogue.
const char* const details_file = PINPROOF_SOURCE_DIR "/catalog-examples/details-harbour-lane.json";
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const unsigned char* data, std::size_t size)
{
    try {
        pinproof::fuzz::project_input({reinterpret_cast<const char*>(data), size}, details_file);
    } catch (const std::exception& e) {
        std::fprintf(stderr, "fuzz_project: %s\n", e.what());
        std::abort();
    }
    return 0;
}
