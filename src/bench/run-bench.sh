#!/usr/bin/env bash
# Builds pinproof in Release and measures, in one go (docs/performance.md):
#   1. the engine over a joint-stiffness sweep against the closed-form floor
#      (pinproof-bench, skipped with --no-engine);
#   2. for each schedule size, three programs on the same generated schedule
#      (pinproof-bench --schedule FILE N) and the same detail catalogue:
#        - the numpy peer (src/bench/numpy_peer.py, python3-numpy),
#        - the C++ read-compute-write floor (pinproof-bench --floor),
#        - pinproof batch (CSV in, CSV out, --jobs 2),
#      each timed by /usr/bin/time (CPU = user + system, wall, peak resident
#      memory); the peer's envelopes are compared with pinproof's summary CSV on
#      every row, and once to 1e-9 with pinproof's JSON result.
# Usage: src/bench/run-bench.sh [--no-engine] [--sizes "10000 100000 1000000"] [BUILD_DIR]
set -euo pipefail
root="$(cd "$(dirname "$0")/../.." && pwd)"
engine=1
sizes="10000 100000 1000000"
while [ $# -gt 0 ]; do
  case "$1" in
    --no-engine) engine=0; shift ;;
    --sizes) sizes="$2"; shift 2 ;;
    *) break ;;
  esac
done
build="${1:-${TMPDIR:-/tmp}/pinproof-bench-build}"
work="$(mktemp -d "${TMPDIR:-/tmp}/pinproof-bench.XXXXXX")"
trap 'rm -rf "$work"' EXIT

# The system's Python, with Debian's python3-numpy.
py=/usr/bin/python3
[ -x "$py" ] || py=python3
"$py" -c 'import numpy' 2>/dev/null || {
  echo "run-bench: the numpy peer needs python3-numpy (apt-get install python3-numpy)" >&2
  exit 2
}
[ -x /usr/bin/time ] || { echo "run-bench: needs /usr/bin/time (apt-get install time)" >&2; exit 2; }

if ! { cmake -S "$root" -B "$build" -DCMAKE_BUILD_TYPE=Release -DPINPROOF_BUILD_TESTS=OFF &&
       cmake --build "$build" -j2 --target pinproof pinproof-bench; } >"$work/build.log" 2>&1; then
  cat "$work/build.log" >&2
  exit 2
fi

echo "date: $(date -u '+%Y-%m-%d %H:%M UTC')"
echo "machine: $(nproc) hardware threads, $(lscpu | sed -n 's/^Model name: *//p' | head -1), load average $(cut -d' ' -f1-3 /proc/loadavg)"
[ "$engine" = 1 ] && "$build/pinproof-bench"

bench="$build/pinproof-bench"
peer="$root/src/bench/numpy_peer.py"
catalogue="$root/catalog-examples/details-harbour-lane.json"
sections="$root/src/model/data/sections.csv"

# Runs a command under /usr/bin/time; prints "cpu_s wall_s peak_MB". A pinproof
# exit code of 1 (a beam does not hold) is a result, not a failure.
timed() {
  local status=0
  /usr/bin/time -f '%U %S %e %M' -o "$work/time.txt" "$@" >"$work/stdout.txt" 2>"$work/stderr.txt" || status=$?
  if [ "$status" -gt 1 ]; then
    echo "run-bench: $* failed with exit code $status:" >&2
    cat "$work/stderr.txt" >&2
    exit 2
  fi
  # (/usr/bin/time writes "Command exited with non-zero status 1" first for pinproof's exit code 1.)
  awk '/^[0-9]/ { printf "%.3f %.3f %.1f\n", $1 + $2, $3, $4 / 1024 }' "$work/time.txt"
}

# Full-precision agreement: 2,000 rows through the JSON result.
"$bench" --schedule "$work/check.csv" 2000
status=0
"$build/pinproof" batch "$work/check.csv" --details "$catalogue" --out-json "$work/check.json" --quiet || status=$?
[ "$status" -le 1 ] || { echo "run-bench: pinproof batch failed on the check schedule" >&2; exit 2; }
"$py" "$peer" "$work/check.csv" "$catalogue" "$sections" "$work/check-peer.csv"
"$py" "$peer" --compare "$work/check-peer.csv" "$work/check.json" 1e-9

printf '\n%-9s | %-26s | %-26s | %-26s | %-7s | %-7s | %s\n' "rows" "numpy peer: CPU, wall, peak" \
  "C++ floor: CPU, wall, peak" "pinproof batch: CPU, wall, peak" "/numpy" "/floor" "pinproof us/beam (CPU)"
for n in $sizes; do
  "$bench" --schedule "$work/schedule.csv" "$n"
  read -r pc pw pm < <(timed "$py" "$peer" "$work/schedule.csv" "$catalogue" "$sections" "$work/peer.csv")
  read -r fc fw fm < <(timed "$bench" --floor "$work/schedule.csv" "$catalogue" "$work/floor.csv")
  read -r bc bw bm < <(timed "$build/pinproof" batch "$work/schedule.csv" --details "$catalogue" \
                         --out-csv "$work/summary.csv" --jobs 2 --quiet)
  agreement=$("$py" "$peer" --compare "$work/peer.csv" "$work/summary.csv") || { echo "$agreement" >&2; exit 1; }
  floor_agreement=$("$py" "$peer" --compare "$work/peer.csv" "$work/floor.csv" 1e-12) ||
    { echo "$floor_agreement" >&2; exit 1; }
  awk -v n="$n" -v pc="$pc" -v pw="$pw" -v pm="$pm" -v fc="$fc" -v fw="$fw" -v fm="$fm" \
      -v bc="$bc" -v bw="$bw" -v bm="$bm" 'BEGIN {
    # /usr/bin/time counts in hundredths: a floor under 0.01 s gives only a lower bound of the ratio.
    floor_ratio = fc > 0 ? sprintf("%7.1f", bc / fc) : sprintf(">%6.0f", bc / 0.01)
    printf "%-9d | %6.2f s %6.2f s %6.0f MB | %6.2f s %6.2f s %6.0f MB | %6.2f s %6.2f s %6.0f MB | %7.2f | %s | %.2f\n",
      n, pc, pw, pm, fc, fw, fm, bc, bw, bm, bc / pc, floor_ratio, 1e6 * bc / n }'
  echo "          ${agreement}"
  echo "          ${floor_agreement}; load average $(cut -d' ' -f1-3 /proc/loadavg)"
  rm -f "$work/schedule.csv" "$work/peer.csv" "$work/floor.csv" "$work/summary.csv"
done
