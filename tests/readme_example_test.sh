#!/usr/bin/env bash
# The minimal project file shown in README.md is accepted by `pinproof check`
# as written (exit 0 or 1, never 2). Usage: readme_example_test.sh BIN SOURCE_DIR
set -euo pipefail
bin=$1
src=$2
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
/usr/bin/python3 - "$src/README.md" "$work/minimal.json" <<'PY'
import re, sys
text = open(sys.argv[1], encoding="utf-8").read()
m = re.search(r"```json\n(.*?)```", text, re.S)
if not m:
    sys.exit("README.md shows no JSON project file")
open(sys.argv[2], "w", encoding="utf-8").write(m.group(1))
PY
set +e
"$bin" check "$work/minimal.json" >/dev/null
code=$?
set -e
if [ "$code" -gt 1 ]; then echo "README's minimal project refused (exit $code)"; "$bin" check "$work/minimal.json"; exit 1; fi
echo "1 passed, 0 failed"
