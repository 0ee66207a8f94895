#!/usr/bin/env bash
# Prints the calculation report of catalog-examples/mezzanine-fin-plates.json
# to PDF in headless Chromium and reads the PDF's text page by page (poppler's
# pdftotext) as a checker would read the printed sheets (docs/report.md):
#   - every sheet carries the running header (job number and title, the
#     calculation's title) and footer (made by, checked by, revision, date,
#     "Sheet k of N" with the right k and N);
#   - no heading is the last line of a sheet (orphaned from what follows);
#   - the sheet count stays within a bound (a regression net for the layout).
#   $1  the pinproof program    $2  the source directory
# Chromium and poppler-utils are installed when missing (as root); where they
# cannot be, the test says so and is skipped (exit 0).
set -u
binary=${1:?usage: print_test.sh PINPROOF SOURCE_DIR}
source_dir=${2:?usage: print_test.sh PINPROOF SOURCE_DIR}
input="$source_dir/catalog-examples/mezzanine-fin-plates.json"

need() {
    command -v "$1" >/dev/null 2>&1 && return 0
    if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null 2>&1; then
        echo "$1 is missing: installing $2"
        DEBIAN_FRONTEND=noninteractive apt-get install -y "$2" >/dev/null 2>&1 ||
            { apt-get update >/dev/null 2>&1 && DEBIAN_FRONTEND=noninteractive apt-get install -y "$2" >/dev/null 2>&1; }
    fi
    command -v "$1" >/dev/null 2>&1
}
if ! need chromium chromium || ! need pdftotext poppler-utils; then
    echo "skipped: chromium or pdftotext cannot be installed here"
    exit 0
fi

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
"$binary" report "$input" -o "$work/report.html" >/dev/null 2>"$work/err.txt" ||
    { echo "FAIL report: $(cat "$work/err.txt")"; exit 1; }
timeout 180 chromium --headless --no-sandbox --disable-gpu --disable-quic --no-first-run \
    --disable-background-networking --disable-component-update --disable-sync --no-pdf-header-footer \
    --user-data-dir="$work/profile" --print-to-pdf="$work/report.pdf" "file://$work/report.html" \
    >/dev/null 2>"$work/chromium.log"
[ -s "$work/report.pdf" ] || { echo "FAIL printing to PDF"; tail -5 "$work/chromium.log"; exit 1; }
pages=$(pdfinfo "$work/report.pdf" | awk '/^Pages:/ {print $2}')
for ((k = 1; k <= pages; ++k)); do pdftotext -f "$k" -l "$k" "$work/report.pdf" "$work/page-$k.txt"; done

/usr/bin/python3 - "$work" "$pages" <<'PY'
import html, re, sys
work, pages = sys.argv[1], int(sys.argv[2])
source = open(f"{work}/report.html", encoding="utf-8").read()
headings = {html.unescape(re.sub(r"<[^>]+>", "", h)).strip()
            for h in re.findall(r"<h[1-4][^>]*>(.*?)</h[1-4]>", source, re.S)}
header = ["Job HL-2417", "Harbour Lane workshop refurbishment",
          "Harbour Lane workshop, mezzanine floor beams on fin plates"]
footer = ["Made by R. Okafor", "Checked by M. Lindqvist", "Rev P2", "2026-11-30"]
failed = 0
def check(ok, what):
    global failed
    print(("ok   " if ok else "FAIL ") + what)
    failed += not ok
# Two beams with two joints each: the layout bound (docs/report.md).
check(pages <= 24, f"{pages} sheets for two beams (at most 24)")
for k in range(1, pages + 1):
    text = open(f"{work}/page-{k}.txt", encoding="utf-8").read()
    missing = [t for t in header + footer + [f"Sheet {k} of {pages}"] if t not in text]
    check(not missing, f"sheet {k}: header and footer" + (f" (missing {missing})" if missing else ""))
    lines = [l.strip() for l in text.splitlines() if l.strip()]
    body = [l for l in lines if not any(l.startswith(t) for t in header + footer + ["Sheet "])]
    last = body[-1] if body else ""
    orphan = any(last and (h == last or h.endswith(last) or h.startswith(last)) for h in headings)
    check(not orphan, f"sheet {k}: no heading orphaned at its foot" + (f" (\"{last}\")" if orphan else ""))
sys.exit(1 if failed else 0)
PY
