#!/usr/bin/env bash
# Builds the fuzz targets with clang (libFuzzer, AddressSanitizer and
# UndefinedBehaviorSanitizer) and runs each for a given time
# (docs/robustness.md).
#
#   bash tests/fuzz/run-fuzz.sh SECONDS [TARGET ...]
#
# TARGET is fuzz_project, fuzz_units, fuzz_schedule, fuzz_catalogue or
# fuzz_distribution (default: all five, one after the other). Seed corpora come from catalog-examples/, tests/bad-input/,
# a list of unit texts and the regression inputs. An input that crashes, leaks,
# hangs or exhausts memory is copied to tests/fuzz/regressions/TARGET/ (where
# tests/fuzz/fuzz_regression_test.cpp replays it) and the script exits with 1.
#
# Environment: PINPROOF_FUZZ_BUILD_DIR (default build-fuzz), PINPROOF_JOBS
# (compile jobs, default: all cores), CXX_FUZZ (default clang++).
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$PWD

if [ $# -lt 1 ] || ! [[ $1 =~ ^[0-9]+$ ]]; then
  echo "usage: bash tests/fuzz/run-fuzz.sh SECONDS [fuzz_project|fuzz_units|fuzz_schedule|fuzz_catalogue|fuzz_distribution ...]" >&2
  exit 2
fi
seconds=$1
shift
targets=("$@")
[ ${#targets[@]} -gt 0 ] || targets=(fuzz_project fuzz_units fuzz_schedule fuzz_catalogue fuzz_distribution)
for t in "${targets[@]}"; do
  case "$t" in
    fuzz_project|fuzz_units|fuzz_schedule|fuzz_catalogue|fuzz_distribution) ;;
    *) echo "run-fuzz: unknown target $t" >&2; exit 2 ;;
  esac
done

build=${PINPROOF_FUZZ_BUILD_DIR:-build-fuzz}
case "$build" in /*) ;; *) build=$root/$build ;; esac
jobs=${PINPROOF_JOBS:-$(nproc)}
cxx=${CXX_FUZZ:-clang++}
command -v "$cxx" >/dev/null || { echo "run-fuzz: $cxx not found (install clang and libclang-rt-14-dev)" >&2; exit 2; }

# The library, instrumented for coverage and sanitized, built from the same
# CMakeLists.txt as every other build; the targets are linked against it.
echo "run-fuzz: building the library in $build/lib" >&2
cmake -S . -B "$build/lib" -DCMAKE_CXX_COMPILER="$cxx" -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DPINPROOF_SANITIZE=ON -DPINPROOF_BUILD_TESTS=OFF -DCMAKE_CXX_FLAGS="-fsanitize=fuzzer-no-link" >/dev/null
cmake --build "$build/lib" --target pinproof_core -j"$jobs" >/dev/null

for t in "${targets[@]}"; do
  echo "run-fuzz: building $t" >&2
  "$cxx" -std=c++17 -g -O1 -fno-omit-frame-pointer \
    -fsanitize=fuzzer,address,undefined -fno-sanitize-recover=all \
    -I include -I tests/fuzz -DPINPROOF_SOURCE_DIR="\"$root\"" \
    "tests/fuzz/$t.cpp" "$build/lib/libpinproof.a" -pthread -o "$build/$t"
done

# Seed corpora, rebuilt on every run; the corpus the fuzzer grows is kept in
# $build/corpus/TARGET between runs.
seed_project() {
  cp catalog-examples/*.json tests/bad-input/*.json "$1"/
}
seed_schedule() {
  cp catalog-examples/*.csv "$1"/
  local f
  for f in catalog-examples/*.csv; do
    head -n 12 "$f" >"$1/head-$(basename "$f")"
  done
}
seed_catalogue() {
  cp catalog-examples/details-*.json tests/bad-input/catalogue/*.json "$1"/
}
seed_distribution() {
  local i=0 s
  for s in '{"kind": "lognormal", "median": "1000 kN*m/rad", "cov": 0.4}' \
           '{"kind": "lognormal", "p05": "300 kN*m/rad", "p95": "3000 kN*m/rad"}' \
           '{"kind": "uniform-log", "min": "0.1 EI/L", "max": "8 EI/L"}' \
           '{"kind": "normal", "mean": "1 MN*m/rad", "sd": "200 kN*m/rad"}' \
           '{"kind": "lognormal", "median": "0.5 EI/L", "cov": 1e300}' \
           '{"kind": "lognormal", "p05": "1e-300 N*m/rad", "p95": 1e39}'; do
    printf '%s' "$s" >"$1/distribution-$i"
    i=$((i + 1))
  done
}
seed_units() {
  local i=0 s
  for s in "12.5 kN/m" "8356 cm4" "2500 kN*m/rad" "-2.5E-3 m" "20kN/m" "25 kN.m" "1 N/mm^2" "300 mm4" \
           "1 m**4" "3 kN/(m*rad)" "9.81 m*s^-2" "4 m²" "5 kN·m" "6 kN⋅m" "0.375 in" "29000 ksi" \
           "50 psi" "3 kip*ft/rad" "12 lbf*in" "2 lb" "15 deg" "2 mrad" "0.01 rad" "1e308 GN" "7" \
           "210 GPa" "4.5 kip/ft" "100 kN*ft" "1 kg" "2 s" "800 in4" "1.5 MN*m/rad" "0.5 EI/L" "rigid"; do
    printf '%s' "$s" >"$1/unit-$i"
    i=$((i + 1))
  done
}

status=0
for t in "${targets[@]}"; do
  kind=${t#fuzz_}
  corpus=$build/corpus/$t
  seeds=$build/seeds/$t
  artifacts=$build/artifacts/$t
  regressions=tests/fuzz/regressions/$t
  rm -rf "$seeds" "$artifacts"
  mkdir -p "$corpus" "$seeds" "$artifacts"
  "seed_$kind" "$seeds"
  [ -d "$regressions" ] && cp "$regressions"/* "$seeds"/ 2>/dev/null || true
  case "$kind" in
    project) max_len=16384 ;;
    schedule) max_len=8192 ;;
    units) max_len=256 ;;
    catalogue) max_len=16384 ;;
    distribution) max_len=512 ;;
  esac

  echo "run-fuzz: $t for $seconds s (log: $build/$t.log)" >&2
  set +e
  (cd "$artifacts" && "$build/$t" -max_total_time="$seconds" -timeout=25 -rss_limit_mb=2048 -max_len="$max_len" \
     -dict="$root/tests/fuzz/$kind.dict" -artifact_prefix="$artifacts/" -print_final_stats=1 \
     "$corpus" "$seeds") >"$build/$t.log" 2>&1
  code=$?
  set -e
  grep -E '^(#[0-9]+ +DONE|stat::number_of_executed_units|stat::new_units_added)' "$build/$t.log" >&2 || true

  found=$(find "$artifacts" -maxdepth 1 -type f \( -name 'crash-*' -o -name 'leak-*' -o -name 'timeout-*' \
           -o -name 'oom-*' \) | sort)
  if [ -n "$found" ] || [ "$code" -ne 0 ]; then
    status=1
    mkdir -p "$regressions"
    for f in $found; do
      cp "$f" "$regressions/"
      echo "run-fuzz: $t: FAILED on input $regressions/$(basename "$f")" >&2
    done
    [ -n "$found" ] || echo "run-fuzz: $t exited with $code and left no input; see $build/$t.log" >&2
    grep -E -A30 '^(==[0-9]+==ERROR|.*runtime error|fuzz_[a-z]+: )' "$build/$t.log" | head -60 >&2 || true
  else
    echo "run-fuzz: $t: no failure" >&2
  fi
done
exit $status
