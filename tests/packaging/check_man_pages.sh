#!/bin/sh
# SPDX-License-Identifier: GPL-3.0-or-later
# The man pages generated at build time exist, are compressed for installing,
# and carry what a reader looks for: every command with its options and
# defaults (hierloom-cli), the options and start screen (hierloom).
# Usage: check_man_pages.sh MAN_DIR [program ...]
set -eu
dir=$1
shift
fail=0
for program in "$@"; do
    [ -s "$dir/$program.1" ] || { echo "FAIL: $dir/$program.1 missing"; fail=1; continue; }
    gzip -t "$dir/$program.1.gz" || { echo "FAIL: $program.1.gz is not a gzip file"; fail=1; }
    grep -q '^\.SH NAME' "$dir/$program.1" || { echo "FAIL: $program.1 has no NAME section"; fail=1; }
    grep -q '^\.SH SYNOPSIS' "$dir/$program.1" || { echo "FAIL: $program.1 has no SYNOPSIS"; fail=1; }
done
case " $* " in *" hierloom-cli "*)
    for command in init import export demo ranks matrix metrics inherit scenario sex-ratio; do
        grep -q "^\.SS $command\$" "$dir/hierloom-cli.1" || { echo "FAIL: hierloom-cli.1 lacks $command"; fail=1; }
    done
    # A default from ranks --help, as the reader of the man page needs it.
    grep -q "elo: the k factor (default: the colony's setting, else 100)" "$dir/hierloom-cli.1" ||
        { echo "FAIL: hierloom-cli.1 lacks the defaults of ranks"; fail=1; } ;;
esac
case " $* " in *" hierloom "*)
    grep -q 'start screen' "$dir/hierloom.1" || { echo "FAIL: hierloom.1 lacks its description"; fail=1; } ;;
esac
[ "$fail" -eq 0 ] && echo "man pages present: $*"
exit "$fail"
