// Fuzz target: the CSV beam-schedule reader (parse_schedule,
// read_schedule_row), then the engine, the outputs and the batch summary for
// the rows that are read (fuzz_entry.hpp). The rows refer to the details of
// the example catalogue catalog-examples/details-harbour-lane.json.
// Built and run by tests/fuzz/run-fuzz.sh.
#include <cstdio>
#include <cstdlib>
#include <exception>

#include "fuzz_entry.hpp"

#ifndef PINPROOF_SOURCE_DIR
#error "PINPROOF_SOURCE_DIR must name the source tree (for the example catalogue)"
#endif

namespace {

const pinproof::detail_catalogue& catalogue()
{
    static const pinproof::detail_catalogue c =
        pinproof::load_detail_catalogue_file(PINPROOF_SOURCE_DIR "/catalog-examples/details-harbour-lane.json");
    return c;
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const unsigned char* data, std::size_t size)
{
    const auto& c = catalogue();
    try {
        pinproof::fuzz::schedule_input({reinterpret_cast<const char*>(data), size}, c);
    } catch (const std::exception& e) {
        std::fprintf(stderr, "fuzz_schedule: %s\n", e.what());
        std::abort();
    }
    return 0;
}
