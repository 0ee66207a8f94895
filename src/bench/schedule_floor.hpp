// The read-compute-write floor of a schedule run (schedule_floor.cpp).
#pragma once

#include <string>

// Reads a generated schedule (pinproof-bench --schedule) and the detail
// catalogue, writes the envelopes of numpy_peer.py to `out_path`. Returns 0,
// or 2 when a file cannot be read or written.
int schedule_floor(const std::string& schedule_path, const std::string& details_path, const std::string& out_path);
