#!/usr/bin/env bash
# Renders the calculation report of catalog-examples/mezzanine-fin-plates.json
# in headless Chromium: the screenshot must not be blank, and the page must
# hold the verdict and every chart (docs/report.md).
#   $1  the pinproof program    $2  the source directory
# Chromium (Debian package "chromium") is installed when missing; where it
# cannot be installed the test says so and is skipped (exit 0).
set -u
binary=${1:?usage: report_render_test.sh PINPROOF SOURCE_DIR}
source_dir=${2:?usage: report_render_test.sh PINPROOF SOURCE_DIR}
input="$source_dir/catalog-examples/mezzanine-fin-plates.json"
python=/usr/bin/python3
[ -x "$python" ] || python=python3

if ! command -v chromium >/dev/null 2>&1; then
    if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null 2>&1; then
        echo "chromium is missing: installing it (apt-get install -y chromium)"
        DEBIAN_FRONTEND=noninteractive apt-get install -y chromium >/dev/null 2>&1 ||
            { apt-get update >/dev/null 2>&1 && DEBIAN_FRONTEND=noninteractive apt-get install -y chromium >/dev/null 2>&1; }
    fi
    if ! command -v chromium >/dev/null 2>&1; then
        echo "skipped: chromium cannot be installed here"
        exit 0
    fi
fi

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
passed=0
failed=0
pass() { passed=$((passed + 1)); echo "ok   $1"; }
fail() { failed=$((failed + 1)); echo "FAIL $1"; }

report="$work/report.html"
"$binary" report "$input" -o "$report" >"$work/out.txt" 2>"$work/err.txt"
rc=$?
if [ "$rc" = 0 ] && [ -s "$report" ]; then pass "report written (exit 0: the example's verdicts hold)"
else fail "report written: exit $rc, $(cat "$work/err.txt")"; fi

chromium_run() {
    timeout 180 chromium --headless --no-sandbox --disable-gpu --disable-quic --no-first-run \
        --disable-background-networking --disable-component-update --disable-sync \
        --user-data-dir="$(mktemp -d "$work/profile.XXXXXX")" "$@" 2>>"$work/chromium.log"
}

chromium_run --screenshot="$work/page.png" --window-size=1240,1754 "file://$report" >/dev/null
if [ -s "$work/page.png" ]; then pass "screenshot taken"; else fail "screenshot taken (see the chromium log below)"; tail -5 "$work/chromium.log"; fi

# Distinct colours of the screenshot, from the PNG itself (zlib and the
# PNG filters, ISO/IEC 15948 / PNG specification 2nd ed., section 9).
colours=$("$python" - "$work/page.png" <<'PY'
import struct, sys, zlib
data = open(sys.argv[1], "rb").read()
if data[:8] != b"\x89PNG\r\n\x1a\n":
    print(0); sys.exit()
pos, idat, width = 8, b"", 0
while pos < len(data):
    length, kind = struct.unpack(">I4s", data[pos:pos + 8])
    body = data[pos + 8:pos + 8 + length]
    if kind == b"IHDR":
        width, height, depth, ctype = struct.unpack(">IIBB", body[:10])
    elif kind == b"IDAT":
        idat += body
    pos += 12 + length
if depth != 8 or ctype not in (2, 6):
    print(0); sys.exit()
bpp = 3 if ctype == 2 else 4
raw = zlib.decompress(idat)
stride = width * bpp
prev = bytearray(stride)
seen = set()
for y in range(height):
    f = raw[y * (stride + 1)]
    line = bytearray(raw[y * (stride + 1) + 1:(y + 1) * (stride + 1)])
    if f == 1:
        for i in range(bpp, stride): line[i] = (line[i] + line[i - bpp]) & 255
    elif f == 2:
        for i in range(stride): line[i] = (line[i] + prev[i]) & 255
    elif f == 3:
        for i in range(stride):
            a = line[i - bpp] if i >= bpp else 0
            line[i] = (line[i] + ((a + prev[i]) >> 1)) & 255
    elif f == 4:
        for i in range(stride):
            a = line[i - bpp] if i >= bpp else 0
            b = prev[i]
            c = prev[i - bpp] if i >= bpp else 0
            p = a + b - c
            pa, pb, pc = abs(p - a), abs(p - b), abs(p - c)
            line[i] = (line[i] + (a if pa <= pb and pa <= pc else b if pb <= pc else c)) & 255
    if y % 4 == 0:
        for x in range(0, stride, bpp * 2):
            seen.add(bytes(line[x:x + 3]))
    prev = line
print(len(seen))
PY
)
if [ "${colours:-0}" -gt 8 ]; then pass "screenshot is not blank ($colours distinct colours)"
else fail "screenshot is not blank: ${colours:-0} distinct colours"; fi

chromium_run --dump-dom "file://$report" >"$work/dom.html"
if grep -q "Verdict: the simple-support (pinned) assumption HOLDS for every beam" "$work/dom.html"; then pass "verdict text in the page"
else fail "verdict text in the page"; fi
grep -q "local codes and licensed practice govern" "$work/dom.html" && pass "caution in the page" || fail "caution in the page"

# Charts: per beam its elevation, a moment and a shear diagram per strength combination, a
# deflection diagram per other combination, the stiffness sweep and a beam
# line per end, and a gap drawing per detailed joint.
expected=$("$python" - "$input" <<'PY'
import json, sys
p = json.load(open(sys.argv[1]))
n = 0
for b in p["beams"]:
    n += sum(2 if c.get("use") == "strength" else 1 for c in b.get("combinations", [])) + 4
    n += sum(1 for e in ("start", "end") if "detail" in b.get("joints", {}).get(e, {}))
print(n)
PY
)
found=$(grep -o "<svg" "$work/dom.html" | wc -l)
if [ "$found" = "$expected" ]; then pass "every chart in the page ($found <svg> elements)"
else fail "every chart in the page: $found <svg> elements, expected $expected"; fi
for kind in moment deflection sweep beam-line; do
    n=$(grep -o "data-chart=\"$kind\"" "$work/dom.html" | wc -l)
    if [ "$n" -gt 0 ]; then pass "$kind charts present ($n)"; else fail "$kind charts present"; fi
done
if grep -Eq "https?://|<script" "$work/dom.html"; then fail "nothing fetched: a link or script in the page"
else pass "nothing fetched (no links to other places, no scripts)"; fi

echo "$passed passed, $failed failed"
[ "$failed" = 0 ]
