#!/usr/bin/env bash
# Installs pinproof from the build tree into a temporary prefix, then builds and
# runs a consumer that finds it with find_package(pinproof) and links
# pinproof::core. Usage: consumer_test.sh BUILD_DIR SOURCE_DIR
set -euo pipefail
build=$1
src=$2
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
cmake --install "$build" --prefix "$work/prefix" >/dev/null
test -x "$work/prefix/bin/pinproof"
test -f "$work/prefix/include/pinproof/model/beam_model.hpp"
test -f "$work/prefix/share/pinproof/schema/pinproof-project-1.schema.json"
cmake -S "$src/tests/package/consumer" -B "$work/consumer" -DCMAKE_PREFIX_PATH="$work/prefix" \
  -DCMAKE_BUILD_TYPE=Release >/dev/null
cmake --build "$work/consumer" >/dev/null
"$work/consumer/consumer"
