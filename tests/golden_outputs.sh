#!/usr/bin/env bash
# Regression net: the outputs of every command on the bundled examples,
# compared byte for byte with the stored files in tests/expected/.
#   bash tests/golden_outputs.sh PINPROOF SOURCE_DIR           compare
#   bash tests/golden_outputs.sh PINPROOF SOURCE_DIR --update  rewrite the stored files
# A change to a stored file is reviewed in its commit, which says why it changed.
# SOURCE_DATE_EPOCH fixes the date printed in the reports (2026-01-01).
set -uo pipefail
bin=$1
src=$2
mode=${3:-compare}
expected="$src/tests/expected"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
export SOURCE_DATE_EPOCH=1767225600
# Run in a scratch folder with relative paths, so that no absolute path reaches an output.
cp -r "$src/catalog-examples" "$work/catalog-examples"
out="$work/out"
mkdir "$out"
cd "$work" || exit 2

run() {  # run NAME CMD...: stdout to NAME.out, the exit code to NAME.code
    local name=$1; shift
    "$@" >"out/$name.out" 2>"out/$name.err"
    echo "$?" >"out/$name.code"
}

for f in mezzanine-fin-plates roof-web-cleats-us transfer-end-plates-fails; do
    run "$f.check" "$bin" check "catalog-examples/$f.json" --json "out/$f.result.json"
    run "$f.report" "$bin" report "catalog-examples/$f.json" -o "out/$f.report.html"
    run "$f.sweep" "$bin" sweep "catalog-examples/$f.json" --csv "out/$f.sweep.csv" --svg "out/$f.sweep.svg" \
        --json "out/$f.sweep.json"
done
# A cantilever: check and report (its sweep is not supported yet).
run balcony-cantilevers.check "$bin" check catalog-examples/balcony-cantilevers.json --json "out/balcony-cantilevers.result.json"
run balcony-cantilevers.report "$bin" report catalog-examples/balcony-cantilevers.json -o "out/balcony-cantilevers.report.html"
# An overhang: check and report (its sweep is not supported yet).
run loading-dock-canopy.check "$bin" check catalog-examples/loading-dock-canopy.json --json "out/loading-dock-canopy.result.json"
run loading-dock-canopy.report "$bin" report catalog-examples/loading-dock-canopy.json -o "out/loading-dock-canopy.report.html"
run mezzanine.detail-start "$bin" detail catalog-examples/mezzanine-fin-plates.json --beam MZ-C/3-4 --end start \
    --svg "out/mezzanine.detail-start.svg"
run mezzanine.detail-end "$bin" detail catalog-examples/mezzanine-fin-plates.json --beam MZ-D/3-4 --end end \
    --svg "out/mezzanine.detail-end.svg"
run schedule.batch "$bin" batch catalog-examples/schedule-harbour-lane.csv \
    --details catalog-examples/details-harbour-lane.json --out-csv "out/schedule.summary.csv" --jobs 2
rm -f "$out"/*.err

if [ "$mode" = --update ]; then
    rm -rf "$expected"
    mkdir -p "$expected"
    cp "$out"/* "$expected"/
    echo "golden outputs: $(ls "$expected" | wc -l) files written to tests/expected/"
    exit 0
fi

status=0
for f in "$expected"/*; do
    name=$(basename "$f")
    if [ ! -f "$out/$name" ]; then
        echo "missing output: $name"; status=1
    elif ! cmp -s "$f" "$out/$name"; then
        echo "changed: $name"; diff "$f" "$out/$name" | head -20; status=1
    fi
done
for f in "$out"/*; do
    [ -f "$expected/$(basename "$f")" ] || { echo "new output not stored: $(basename "$f")"; status=1; }
done
[ $status -eq 0 ] && echo "golden outputs: $(ls "$expected" | wc -l) files identical"
exit $status
