#!/usr/bin/env bash
# Builds pinproof in Release and measures (docs/performance.md):
#   1. the engine over a joint-stiffness sweep against the closed-form floor (pinproof-bench);
#   2. a generated schedule of 100,000 beams end to end through `pinproof batch`
#      (CSV in, CSV out) on 2 threads, wall time.
# Usage: src/bench/run-bench.sh [BUILD_DIR]   (default: a directory under /tmp)
set -euo pipefail
root="$(cd "$(dirname "$0")/../.." && pwd)"
build="${1:-${TMPDIR:-/tmp}/pinproof-bench-build}"
work="$(mktemp -d "${TMPDIR:-/tmp}/pinproof-bench.XXXXXX")"
trap 'rm -rf "$work"' EXIT

if ! { cmake -S "$root" -B "$build" -DCMAKE_BUILD_TYPE=Release -DPINPROOF_BUILD_TESTS=OFF &&
       cmake --build "$build" -j2 --target pinproof pinproof-bench; } >"$work/build.log" 2>&1; then
  cat "$work/build.log" >&2
  exit 2
fi

echo "machine: $(nproc) hardware threads, $(lscpu | sed -n 's/^Model name: *//p' | head -1), load average $(cut -d' ' -f1-3 /proc/loadavg)"
"$build/pinproof-bench"

rows=100000
"$build/pinproof-bench" --schedule "$work/schedule.csv" "$rows"
catalogue="$root/catalog-examples/details-harbour-lane.json"
for run in 1 2; do
  start=$(date +%s.%N)
  status=0
  times_before=$(awk '{print $14 + $15 + $16 + $17}' /proc/$$/stat)
  "$build/pinproof" batch "$work/schedule.csv" --details "$catalogue" --out-csv "$work/summary.csv" --jobs 2 \
    >"$work/stdout.txt" 2>"$work/stderr.txt" || status=$?
  end=$(date +%s.%N)
  # CPU time of the finished child (user + system), from this shell's cutime/cstime, in clock ticks.
  times_after=$(awk '{print $14 + $15 + $16 + $17}' /proc/$$/stat)
  cpu=$(awk -v a="$times_before" -v b="$times_after" -v hz="$(getconf CLK_TCK)" 'BEGIN {printf "%.2f", (b - a) / hz}')
  if [ "$status" -gt 1 ]; then
    echo "pinproof batch failed with exit code $status:" >&2
    cat "$work/stderr.txt" >&2
    exit "$status"
  fi
  lines=$(($(grep -vc '^#' "$work/summary.csv") - 1))
  awk -v run="$run" -v cpu="$cpu" -v s="$start" -v e="$end" -v n="$rows" -v l="$lines" 'BEGIN {
    printf "  batch, %d beams, CSV in and CSV out, --jobs 2, run %s: %.2f s wall (%.0f beams/s), %s s CPU, %d summary rows\n",
      n, run, e - s, n / (e - s), cpu, l }'
done
tail -1 "$work/stdout.txt"
