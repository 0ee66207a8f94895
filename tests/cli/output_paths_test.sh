#!/usr/bin/env bash
# Output paths, signals and resource limits of the command line, as a user
# meets them: one case per promise of docs/robustness.md ("Outputs: where and
# how they are written", "Signals", "Resources").
#   bash tests/cli/output_paths_test.sh PINPROOF SOURCE_DIR
# Cases that need root (setpriv, mount, RLIMIT_NPROC as another user) are
# skipped with a message where they cannot run; CI runs as root.
#
# References:
#   [POSIX] POSIX.1-2017 rename() and open() with O_CREAT|O_EXCL; Linux open(2)
#           O_NOFOLLOW; setrlimit(2) RLIMIT_NPROC (not enforced for root).
#   [SH]    Exit status 128 + N for a process ended by signal N (common
#           practice of POSIX shells, no source): 129 SIGHUP, 130 SIGINT, 143 SIGTERM.
set -uo pipefail
bin=$(readlink -f "$1")
src=$(readlink -f "$2")
work=$(mktemp -d)
mounted=""
cleanup() {
    [ -n "$mounted" ] && umount "$mounted" 2>/dev/null
    rm -rf "$work"
}
trap cleanup EXIT
failures=0
pass() { echo "ok    $1"; }
fail() { echo "FAIL  $1"; failures=$((failures + 1)); }
skip() { echo "skip  $1"; }

ex="$src/catalog-examples"
cd "$work" || exit 2

# A fresh folder with the inputs: project, catalogue, schedule.
fresh() {
    rm -rf "$work/d" && mkdir "$work/d" && cd "$work/d" || exit 2
    cp "$ex/mezzanine-fin-plates.json" p.json
    cp "$ex/details-harbour-lane.json" d.json
    cp "$ex/schedule-harbour-lane.csv" s.csv
    ln -s p.json p-link.json
    ln p.json p-hard.json
    ln -s d.json d-link.json
    ln -s s.csv s-link.csv
    sha256sum p.json d.json s.csv >../inputs.sum
    ls -A | sort >../listing
}
# After a refused run: exit 2, every input unchanged, no file added or removed.
expect_refused() {  # NAME CODE
    local name=$1 code=$2
    if [ "$code" != 2 ]; then fail "$name: exit $code, expected 2"; return; fi
    if ! sha256sum -c --quiet ../inputs.sum; then fail "$name: an input changed"; return; fi
    if ! ls -A | sort | cmp -s - ../listing; then fail "$name: files changed: $(ls -A | sort | diff ../listing - | tr '\n' ' ')"; return; fi
    pass "$name"
}

# --- Data loss: an output that is an input, under any name [POSIX] ---------
same_file_case() {  # NAME ARGS...
    local name=$1; shift
    fresh
    "$bin" "$@" >/dev/null 2>../err
    local code=$?
    grep -q "is an input of this run" ../err || { fail "$name: message: $(head -3 ../err)"; return; }
    expect_refused "$name" "$code"
}
for out in p.json p-link.json p-hard.json ./p.json; do
    same_file_case "check --json $out (the project)" check p.json --json "$out"
    same_file_case "report -o $out (the project)" report p.json -o "$out"
    same_file_case "detail --svg $out (the project)" detail p.json --beam MZ-C/3-4 --svg "$out"
    same_file_case "sweep --csv $out (the project)" sweep p.json --csv "$out"
    same_file_case "sweep --svg $out with --json elsewhere (the project)" sweep p.json --json other.json --svg "$out"
    same_file_case "sweep --json $out (the project)" sweep p.json --json "$out"
done
for out in d.json d-link.json; do
    same_file_case "check --json $out (the --details catalogue)" check p.json --details d.json --json "$out"
    same_file_case "report -o $out (the --details catalogue)" report p.json --details d.json -o "$out"
    same_file_case "batch --out-json $out (the catalogue)" batch s.csv --details d.json --out-json "$out"
    same_file_case "batch --out-csv x --out-json $out (the catalogue)" batch s.csv --details d.json --out-csv x.csv --out-json "$out"
done
same_file_case "detail --svg d.json (the --details catalogue)" detail p.json --details d.json --beam MZ-C/3-4 --svg d.json
same_file_case "sweep --json d-link.json (the --details catalogue)" sweep p.json --details d.json --json d-link.json
for out in s.csv s-link.csv; do
    same_file_case "batch --out-csv $out (the schedule)" batch s.csv --details d.json --out-csv "$out"
done
# A catalogue named by the project's "details" key is an input too.
fresh
sed 's/"format": "pinproof-project\/1",/"format": "pinproof-project\/1", "details": "d.json",/' p.json >pd.json
sha256sum p.json d.json s.csv pd.json >../inputs.sum; ls -A | sort >../listing
"$bin" check pd.json --json d.json >/dev/null 2>../err
expect_refused "check --json onto the catalogue named by the project's details key" $?

# --- Outputs refused by kind; empty names; two on standard output ----------
fresh
mkfifo fifo; ls -A | sort >../listing
"$bin" check p.json --json fifo >/dev/null 2>../err; expect_refused "check --json onto a FIFO" $?
"$bin" check p.json --json /dev/null >/dev/null 2>../err; expect_refused "check --json onto a device" $?
"$bin" check p.json --json '' >/dev/null 2>../err; expect_refused "check --json '' (an empty name)" $?
grep -q "empty" ../err || fail "check --json '': message does not say empty: $(cat ../err)"
"$bin" sweep p.json --csv - --json - >../out 2>../err; expect_refused "sweep --csv - --json - (two on stdout)" $?
[ -s ../out ] && fail "sweep --csv - --json -: wrote to stdout"
"$bin" batch s.csv --details d.json --out-csv - --out-json - >../out 2>../err
expect_refused "batch --out-csv - --out-json - (two on stdout)" $?
"$bin" sweep p.json --csv same.out --json ./same.out >/dev/null 2>../err; expect_refused "sweep --csv and --json on one file" $?
echo "previous run" >prev.csv; sha256sum p.json d.json s.csv prev.csv >../inputs.sum; ls -A | sort >../listing
"$bin" batch s.csv --details d.json --out-csv prev.csv --out-json missing/b.json >/dev/null 2>../err
expect_refused "batch: the second output's folder is missing, the first output keeps the previous run" $?
"$bin" sweep p.json --csv prev.csv --json missing/s.json >/dev/null 2>../err
expect_refused "sweep: the second output's folder is missing, the first output keeps the previous run" $?

# --- Security: symbolic links planted by another user [POSIX] -------------
if [ "$(id -u)" = 0 ] && command -v setpriv >/dev/null; then
    chmod 755 "$work"  # the other user reaches the shared folder through it
    shared="$work/shared"; mkdir "$shared"; chmod 1777 "$shared"
    victim="$work/victim"; echo "root's file" >"$victim"; chmod 600 "$victim"
    as_nobody() { setpriv --reuid=nobody --regid=nogroup --clear-groups "$@"; }
    # The old predictable names and a link at the target itself.
    as_nobody /usr/bin/python3 -c "
import os
for i in range(1000): os.symlink('$victim', '$shared/result.json.tmp-%d' % i)
os.symlink('$victim', '$shared/planted.json')"
    cp "$ex/mezzanine-fin-plates.json" "$work/p.json"
    "$bin" check "$work/p.json" -q --json "$shared/result.json"; code=$?
    if [ "$code" -le 1 ] && [ -f "$shared/result.json" ] && [ ! -L "$shared/result.json" ] &&
        [ "$(cat "$victim")" = "root's file" ] && [ "$(find "$shared" -maxdepth 1 -type l | wc -l)" = 1001 ] &&
        [ "$(find "$shared" -maxdepth 1 -name '.result.json.pinproof-*' | wc -l)" = 0 ]; then
        pass "root run beside 1000 planted links: result written as a new file, nothing through a link"
    else
        fail "root run beside planted links (exit $code): victim '$(cat "$victim")'"
    fi
    "$bin" check "$work/p.json" -q --json "$shared/planted.json" 2>"$work/err"; code=$?
    if [ "$code" = 2 ] && grep -q "owned by another user" "$work/err" && [ "$(cat "$victim")" = "root's file" ] &&
        [ -L "$shared/planted.json" ]; then
        pass "an output that is another user's symbolic link is refused (exit 2), its target untouched"
    else
        fail "another user's link as output: exit $code, $(cat "$work/err")"
    fi
    # The mode of a file replaced is kept.
    echo old >"$work/kept.json"; chmod 640 "$work/kept.json"
    "$bin" check "$work/p.json" -q --json "$work/kept.json"
    [ "$(stat -c %a "$work/kept.json")" = 640 ] && pass "the mode 640 of a replaced file is kept" ||
        fail "mode of a replaced file: $(stat -c %a "$work/kept.json")"
else
    skip "planted links (needs root and setpriv)"
fi

# --- Disk full: a tiny tmpfs ----------------------------------------------
tiny="$work/tiny"; mkdir "$tiny"
if [ "$(id -u)" = 0 ] && mount -t tmpfs -o size=64k tmpfs "$tiny" 2>/dev/null; then
    mounted="$tiny"
    echo "previous csv" >"$tiny/s.csv"; echo "previous json" >"$tiny/s.json"
    "$bin" sweep "$ex/mezzanine-fin-plates.json" --points 400 --csv "$tiny/s.csv" --json "$tiny/s.json" \
        >/dev/null 2>"$work/err"; code=$?
    if [ "$code" = 2 ] && grep -q "No space left" "$work/err" && [ "$(cat "$tiny/s.csv")" = "previous csv" ] &&
        [ "$(cat "$tiny/s.json")" = "previous json" ] && [ "$(ls -A "$tiny" | wc -l)" = 2 ]; then
        pass "disk full (64 KiB tmpfs): exit 2, both previous outputs untouched, no temporary left"
    else
        fail "disk full: exit $code, $(cat "$work/err"); files: $(ls -A "$tiny")"
    fi
    umount "$tiny" && mounted=""
else
    skip "disk full (mount -t tmpfs not permitted here)"
fi

# --- Signals [SH] -----------------------------------------------------------
# During the computation: the run ends at once with 128 + N, previous outputs kept.
fresh
echo previous >g.csv; echo previous >g.json
for sig in TERM:143 HUP:129 INT:130; do
    name=${sig%:*}; want=${sig#*:}
    # The largest grid takes seconds to compute (11 s measured), so the signal comes while it computes.
    "$bin" sweep p.json --grid --points 100 --csv g.csv --json g.json >/dev/null 2>../err &
    pid=$!
    sleep 1
    kill -s "$name" $pid
    wait $pid; code=$?
    # The message shows that pinproof's handler ran, not the default action.
    if [ "$code" = "$want" ] && grep -q "interrupted by SIG$name" ../err &&
        [ "$(cat g.csv g.json)" = "$(printf 'previous\nprevious')" ] &&
        [ -z "$(ls -A | grep pinproof-)" ]; then
        pass "SIG$name while computing: exit $want, previous outputs untouched, no temporary"
    else
        fail "SIG$name while computing: exit $code (expected $want); $(cat ../err); $(ls -A)"
    fi
done
# During the write: the process is stopped as soon as its first temporary
# appears (inotify), then sent SIGTERM. A try where the write had already
# finished is repeated; after three such tries the case is skipped.
caught=0
for try in 1 2 3; do
    fresh
    echo previous >g.csv; echo previous >g.json
    /usr/bin/python3 - "$bin" "$work/d" >../signal.out 2>&1 <<'EOF'
import ctypes, os, signal, struct, subprocess, sys
binary, folder = sys.argv[1], sys.argv[2]
libc = ctypes.CDLL(None, use_errno=True)
fd = libc.inotify_init()
libc.inotify_add_watch(fd, folder.encode(), 0x100)  # IN_CREATE
p = subprocess.Popen([binary, "sweep", "p.json", "--grid", "--points", "60", "--csv", "g.csv", "--json", "g.json"],
                     cwd=folder, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE)
while True:
    data = os.read(fd, 4096)
    names = [data[i + 16:i + 16 + struct.unpack_from("iIII", data, i)[3]].rstrip(b"\0") for i in [0]]
    if any(b".pinproof-" in n for n in names):
        p.send_signal(signal.SIGSTOP)
        break
temps = [n for n in os.listdir(folder) if ".pinproof-" in n]
p.send_signal(signal.SIGTERM)
p.send_signal(signal.SIGCONT)
err = p.communicate()[1].decode()
print("temporaries while stopped:", len(temps))
print("exit", p.returncode)
print("left", len([n for n in os.listdir(folder) if ".pinproof-" in n]))
print(err.strip())
EOF
    if grep -q "temporaries while stopped: 0" ../signal.out; then continue; fi
    caught=1
    if grep -q "^exit 143" ../signal.out && grep -q "^left 0" ../signal.out &&
        grep -q "interrupted by SIGTERM; no output of this run was written" ../signal.out &&
        [ "$(cat g.csv g.json)" = "$(printf 'previous\nprevious')" ]; then
        pass "SIGTERM during the write: exit 143, temporaries removed, previous outputs untouched"
    else
        fail "SIGTERM during the write: $(cat ../signal.out); g.csv: $(head -c 40 g.csv)"
    fi
    break
done
[ $caught = 1 ] || skip "SIGTERM during the write (the write finished before the process could be stopped, 3 tries)"

# --- Batch with fewer threads than asked [POSIX] ---------------------------
if [ "$(id -u)" = 0 ] && command -v setpriv >/dev/null; then
    pub="$work/pub"; mkdir "$pub"; cp "$bin" "$ex/details-harbour-lane.json" "$ex/schedule-harbour-lane.csv" "$pub/"
    chmod -R a+rX "$pub"
    # detect_leaks=0: a sanitizer build's leak check needs a thread of its own at exit.
    ASAN_OPTIONS=${ASAN_OPTIONS:-}:detect_leaks=0 setpriv --reuid=nobody --regid=nogroup --clear-groups bash -c \
        "ulimit -u 8; cd '$pub' && ./pinproof batch schedule-harbour-lane.csv --details details-harbour-lane.json --jobs 16" \
        >"$work/batch.out" 2>"$work/batch.err"; code=$?
    if { [ "$code" = 0 ] || [ "$code" = 1 ]; } && cmp -s "$work/batch.out" "$src/tests/expected/schedule.summary.csv"; then
        pass "batch --jobs 16 under ulimit -u 8: exit $code, the full summary ($(grep -o 'only [0-9]* of 16' "$work/batch.err" || echo 'all threads'))"
    else
        fail "batch --jobs 16 under ulimit -u 8: exit $code; $(head -3 "$work/batch.err")"
    fi
else
    skip "thread limit (needs root to run as another user)"
fi

# --- Resources: count options, inputs -------------------------------------
fresh
one_line_refusal() {  # NAME ARGS...
    local name=$1; shift
    "$bin" "$@" >/dev/null 2>../err; local code=$?
    local first; first=$(head -1 ../err)
    if [ "$code" = 2 ] && [ ${#first} -lt 200 ] && grep -q "expected" ../err; then pass "$name: $first"
    else fail "$name: exit $code, $(head -c 300 ../err)"; fi
}
one_line_refusal "--monte-carlo -1" sweep p.json --monte-carlo -1
one_line_refusal "--monte-carlo 1000001" sweep p.json --monte-carlo 1000001
one_line_refusal "--points 1" sweep p.json --points 1
one_line_refusal "--points 1001" sweep p.json --points 1001
one_line_refusal "--points 1e3" sweep p.json --points 1e3
one_line_refusal "--grid --points 101" sweep p.json --grid --points 101
one_line_refusal "--grid --points 1000" sweep p.json --grid --points 1000
one_line_refusal "--jobs 257" batch s.csv --details d.json --jobs 257
one_line_refusal "--jobs -1" batch s.csv --details d.json --jobs -1
one_line_refusal "--jobs of 400 digits" batch s.csv --details d.json --jobs "$(printf '9%.0s' $(seq 400))"
"$bin" batch s.csv --details d.json --jobs 0 >/dev/null 2>&1; code=$?
[ "$code" -le 1 ] && pass "--jobs 0 accepted (one worker per hardware thread)" || fail "--jobs 0: exit $code"
for h in "sweep --help" "batch --help"; do
    # shellcheck disable=SC2086
    "$bin" $h | grep -q -e "2 to 1000" -e "0 to 256" && pass "$h states the ranges" || fail "$h lacks the ranges"
done
one_line_refusal "check /dev/zero" check /dev/zero
grep -q "character device" ../err || fail "check /dev/zero: not named as a device"
one_line_refusal "check a directory" check "$work"
grep -q "found a directory" ../err || fail "check DIR: not named as a directory"
truncate -s 513M big.json
one_line_refusal "check a 513 MiB file" check big.json
grep -q "512 MiB" ../err || fail "check 513 MiB: limit not named"
rm -f big.json
# An unknown --beam among 10,000 beams names a few ids, not all of them.
/usr/bin/python3 - <<'EOF'
import json
p = json.load(open("p.json"))
b = p["beams"][0]
beams = []
for i in range(10000):
    c = json.loads(json.dumps(b)); c["id"] = "B-%05d" % i; beams.append(c)
p["beams"] = beams
json.dump(p, open("many.json", "w"))
EOF
"$bin" sweep many.json --beam B-1234X >/dev/null 2>../err; code=$?
size=$(wc -c <../err)
if [ "$code" = 2 ] && [ "$size" -lt 600 ] && grep -q '"B-01234"' ../err; then
    pass "unknown --beam among 10,000 beams: $size bytes, nearest ids named"
else
    fail "unknown --beam among 10,000 beams: exit $code, $size bytes"
fi

# --- Standard input and output: '-' wherever a file is read or written ------
# (common practice of command-line tools, no source.)
fresh
"$bin" check p.json >../by-name.txt 2>/dev/null
"$bin" check - <p.json >../by-stdin.txt 2>/dev/null; code=$?
if [ "$code" = 0 ] && cmp -s ../by-name.txt ../by-stdin.txt; then pass "check - reads the project from standard input"
else fail "check -: exit $code or a report that differs from check p.json"; fi
"$bin" report - -o - <p.json >../r.html 2>../err; code=$?
if [ "$code" = 0 ] && head -c 15 ../r.html | grep -q '<!DOCTYPE html>' && grep -q '(standard input)' ../r.html \
    && ! grep -q 'Report written' ../r.html; then
    expect_refused_listing=$(ls -A | sort | cmp -s - ../listing && echo same)
    if [ "$expect_refused_listing" = same ]; then pass "report - -o -: the HTML on standard output, no file named '-'"
    else fail "report - -o -: files changed"; fi
else fail "report - -o -: exit $code, $(head -c 80 ../r.html)"; fi
"$bin" batch - --details d.json <s.csv >../b-stdin.csv 2>/dev/null; c1=$?
"$bin" batch s.csv --details d.json >../b-name.csv 2>/dev/null; c2=$?
if [ "$c1" = "$c2" ] && cmp -s ../b-stdin.csv ../b-name.csv; then pass "batch - reads the schedule from standard input"
else fail "batch -: exit $c1 vs $c2 or a different summary"; fi
"$bin" batch s.csv --details - <d.json >../b-cat.csv 2>/dev/null
if cmp -s ../b-cat.csv ../b-name.csv; then pass "batch --details - reads the catalogue from standard input"
else fail "batch --details -: a different summary"; fi
"$bin" check - --details - <p.json >/dev/null 2>../err; code=$?
if [ "$code" = 2 ] && grep -q "standard input can be read once" ../err; then pass "two inputs named '-' refused"
else fail "two inputs named '-': exit $code, $(head -2 ../err)"; fi
"$bin" batch - --details - <s.csv >/dev/null 2>../err; code=$?
if [ "$code" = 2 ] && grep -q "standard input can be read once" ../err; then pass "batch - --details - refused"
else fail "batch - --details -: exit $code, $(head -2 ../err)"; fi
"$bin" sweep - --beam MZ-C/3-4 --csv - <p.json >../sw.csv 2>/dev/null; code=$?
if [ "$code" -le 1 ] && head -1 ../sw.csv | grep -q 'kappa\|stiffness'; then pass "sweep - --csv -"
else fail "sweep - --csv -: exit $code, $(head -c 80 ../sw.csv)"; fi

# The schedule's summary page: report on a *.csv with its catalogue; exit codes as batch.
fresh
"$bin" report s.csv --details d.json -o ../summary.html >../out 2>../err; code=$?
if [ "$code" = 1 ] && grep -q 'class="sortable"' ../summary.html && grep -q "Schedule summary written" ../out; then
    pass "report s.csv --details d.json: the summary page, exit 1 (a beam does not hold)"
else fail "report s.csv: exit $code, $(head -2 ../err)"; fi
"$bin" report s.csv -o ../summary2.html >/dev/null 2>../err; code=$?
if [ "$code" = 2 ] && grep -q -- "--details" ../err && [ ! -e ../summary2.html ]; then pass "report s.csv without --details refused"
else fail "report s.csv without --details: exit $code"; fi

if [ $failures -gt 0 ]; then echo "output paths: $failures failed"; exit 1; fi
echo "output paths: all passed"
