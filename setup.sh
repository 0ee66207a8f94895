#!/usr/bin/env bash
# pinproof set-up: installs what is missing (Debian 12 packages), builds, and
#   bash setup.sh        runs `pinproof check` on a bundled example
#   bash setup.sh test   runs the whole test suite (CTest)
# Run as root, or as a user with sudo, on Debian 12.
set -euo pipefail
cd "$(dirname "$0")"

mode=${1:-run}
build=${PINPROOF_BUILD_DIR:-build}

packages=(g++ cmake make libeigen3-dev libboost-math-dev libcli11-dev nlohmann-json3-dev doctest-dev)
if [ "$mode" = test ]; then
  # Independent solvers used by some tests (python3-sympy, python3-scipy).
  packages+=(python3 python3-sympy python3-scipy python3-numpy python3-jsonschema)
  # The report rendered and printed as a user would (report.render, report.print).
  packages+=(chromium poppler-utils)
  # The fuzz targets of the robustness checks (.ci/run): clang with libFuzzer.
  packages+=(clang libclang-rt-14-dev)
fi

missing=()
for p in "${packages[@]}"; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p")
done
if [ ${#missing[@]} -gt 0 ]; then
  echo "setup: installing ${missing[*]}" >&2
  sudo=""
  [ "$(id -u)" -eq 0 ] || sudo="sudo"
  $sudo apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq --no-install-recommends "${missing[@]}" >&2
fi

cmake -S . -B "$build" -DCMAKE_BUILD_TYPE=Release >/dev/null
if [ "$mode" = run ]; then
  # The program alone (with its man page and shell completion): the tests
  # and the benchmark are built by `bash setup.sh test`.
  cmake --build "$build" --target pinproof -j"$(nproc)"
else
  cmake --build "$build" -j"$(nproc)"
fi

case "$mode" in
  run)
    echo
    echo "== pinproof check catalog-examples/mezzanine-fin-plates.json"
    set +e
    "$build/pinproof" check catalog-examples/mezzanine-fin-plates.json
    code=$?
    set -e
    echo "(exit code $code: 0 every verdict holds, 1 a verdict does not hold, 2 bad input)"
    [ "$code" -le 1 ]
    ;;
  test)
    ctest --test-dir "$build" --output-on-failure -j"$(nproc)"
    ;;
  *)
    echo "usage: bash setup.sh [run|test]" >&2
    exit 2
    ;;
esac
