#!/usr/bin/env bash
# Writes the bash completion and the man page of pinproof from the program's
# own --help texts, so that both always list the commands and options the
# program has. Run at build time (CMakeLists.txt). Usage: shell_files.sh BIN OUTDIR VERSION
set -euo pipefail
bin=$1
out=$2
version=$3
mkdir -p "$out"

commands=$("$bin" --help | sed -n '/^Subcommands:/,$p' | awk 'NR > 1 && /^  [a-z]/ {print $1}')

# --- bash completion -------------------------------------------------------
{
  echo "# bash completion for pinproof $version (generated from its --help; do not edit)"
  echo "_pinproof() {"
  echo "    local cur=\${COMP_WORDS[COMP_CWORD]} prev=\${COMP_WORDS[COMP_CWORD-1]} opts=\"\""
  echo "    if [ \"\$COMP_CWORD\" -eq 1 ]; then"
  echo "        COMPREPLY=(\$(compgen -W \"$(echo $commands) --help --version\" -- \"\$cur\"))"
  echo "        return"
  echo "    fi"
  echo "    case \${COMP_WORDS[1]} in"
  for c in $commands; do
    help=$("$bin" "$c" --help | sed -n '/^Options:/,$p')
    opts=$(echo "$help" | grep -oE '^ +(-[a-zA-Z],)?--[a-z-]+' | sed 's/^ *//; s/,/ /' | tr '\n' ' ')
    echo "        $c) opts=\"$opts\""
    # Options with a fixed set of values, e.g. "--end TEXT:{start,end}".
    { echo "$help" | grep -oE -- '--[a-z-]+ [A-Z]+:\{[^}]*\}' || true; } | while read -r opt spec; do
      values=$(echo "$spec" | sed 's/.*{//; s/}//; s/,/ /g')
      echo "            if [ \"\$prev\" = \"$opt\" ]; then COMPREPLY=(\$(compgen -W \"$values\" -- \"\$cur\")); return; fi"
    done
    echo "            ;;"
  done
  echo "    esac"
  echo "    if [[ \$cur == -* ]]; then"
  echo "        COMPREPLY=(\$(compgen -W \"\$opts\" -- \"\$cur\"))"
  echo "    else"
  echo "        COMPREPLY=(\$(compgen -f -- \"\$cur\"))"
  echo "    fi"
  echo "}"
  echo "complete -o filenames -F _pinproof pinproof"
} > "$out/pinproof.bash.tmp"
mv "$out/pinproof.bash.tmp" "$out/pinproof.bash"

# --- man page (troff) ------------------------------------------------------
esc() { sed -e 's/\\/\\e/g' -e 's/^\./\\\&./' -e "s/^'/\\\\\\&'/"; }
{
  echo ".TH PINPROOF 1 \"\" \"pinproof $version\" \"User Commands\""
  echo ".SH NAME"
  echo "pinproof \\- check whether steel beam-end joints may be idealised as pins"
  echo ".SH SYNOPSIS"
  echo ".B pinproof"
  echo "\\fICOMMAND\\fR [\\fIOPTIONS\\fR] [\\fIFILE\\fR]"
  echo ".SH DESCRIPTION"
  echo ".nf"
  "$bin" --help | sed -n '1,/^Usage:/p' | sed '$d' | esc
  echo ".fi"
  echo ".SH COMMANDS"
  for c in $commands; do
    echo ".SS $c"
    echo ".nf"
    "$bin" "$c" --help | esc
    echo ".fi"
  done
  echo ".SH EXIT STATUS"
  echo "0 every verdict holds (or the command did its work); 1 a verdict does not hold; 2 bad input or an"
  echo "error, with nothing written; 129, 130 or 143 when stopped by SIGHUP, SIGINT or SIGTERM."
  echo ".SH CAUTION"
  echo "Results support, and do not replace, the judgement of a qualified engineer. Local codes and"
  echo "licensed practice govern. Check the input against the drawings before relying on any result."
  echo ".SH SEE ALSO"
  echo "The project's docs/ folder: file formats, methods and their sources."
} > "$out/pinproof.1.tmp"
mv "$out/pinproof.1.tmp" "$out/pinproof.1"
