#!/usr/bin/env bash
# The whole test suite built with the address and undefined-behaviour
# sanitizers (docs/robustness.md). Fails on any failing test and on any
# sanitizer report (leaks included).
#   bash tests/sanitize.sh [BUILD_DIR]      default BUILD_DIR: build-asan
# PINPROOF_JOBS sets the number of parallel compile and test jobs (default: all cores).
set -euo pipefail
cd "$(dirname "$0")/.."

build=${1:-build-asan}
jobs=${PINPROOF_JOBS:-$(nproc)}

# -O1 with line tables: readable sanitizer reports at a fraction of the build
# time of a full debug-information build.
cmake -S . -B "$build" -DCMAKE_BUILD_TYPE=None -DCMAKE_CXX_FLAGS="-O1 -g1" -DPINPROOF_SANITIZE=ON >/dev/null
cmake --build "$build" -j"$jobs"

export ASAN_OPTIONS=detect_leaks=1:abort_on_error=1:strict_string_checks=1:detect_stack_use_after_return=1
export UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1
# The browser rendering of the report is the same test as in the normal build
# and has nothing to sanitize (it runs Chromium on the report file).
ctest --test-dir "$build" --output-on-failure -j"$jobs" -E '^report\.render$'
