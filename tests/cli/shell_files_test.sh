#!/usr/bin/env bash
# The generated bash completion completes every command and each command's
# options, and the man page has a section for every command.
# Usage: shell_files_test.sh BUILD_DIR BIN
set -euo pipefail
share=$1/share
bin=$2
source "$share/pinproof.bash"
complete_words() { COMP_WORDS=("$@"); COMP_CWORD=$(($# - 1)); COMPREPLY=(); _pinproof; echo "${COMPREPLY[*]}"; }
fail=0
commands=$("$bin" --help | sed -n '/^Subcommands:/,$p' | awk 'NR > 1 && /^  [a-z]/ {print $1}')
for c in $commands; do
  [[ " $(complete_words pinproof "") " == *" $c "* ]] || { echo "completion lacks the command $c"; fail=1; }
  for opt in $("$bin" "$c" --help | sed -n '/^Options:/,$p' | grep -oE -- '--[a-z-]+'); do
    [[ " $(complete_words pinproof "$c" "--") " == *" $opt "* ]] || { echo "completion lacks $c $opt"; fail=1; }
  done
  grep -q "^\.SS $c\$" "$share/pinproof.1" || { echo "man page lacks $c"; fail=1; }
done
[[ "$(complete_words pinproof detail --end s)" == "start" ]] || { echo "completion lacks the values of --end"; fail=1; }
grep -q '^\.TH PINPROOF 1' "$share/pinproof.1" || { echo "man page has no .TH"; fail=1; }
grep -q 'qualified engineer' "$share/pinproof.1" || { echo "man page has no caution"; fail=1; }
[ "$fail" -eq 0 ] && echo "1 passed, 0 failed"
exit $fail
