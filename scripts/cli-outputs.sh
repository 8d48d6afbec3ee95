#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Writes the output of every command-line command on the demo colony into OUT_DIR,
# one file per command (standard output, standard error and exit status), so two
# builds can be compared byte for byte:
#   scripts/cli-outputs.sh build-old/app/hierloom-cli /tmp/before
#   scripts/cli-outputs.sh build/app/hierloom-cli /tmp/after
#   diff -r /tmp/before /tmp/after && echo identical
# Record identities (uids) and wall-clock times differ from run to run, so the
# export's uid column and the audit trail's times are left out of the comparison.
set -uo pipefail
cli="$(realpath "$1")"
out="$2"
rm -rf "$out"; mkdir -p "$out"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
colony="$work/demo.hierloom"
run() {  # run NAME ARGS...: saves stdout, stderr and the exit status
  local name="$1"; shift
  (cd "$work" && "$cli" "$@" >"$out/$name.out" 2>"$out/$name.err"; echo "exit $?" >"$out/$name.status")
}
run demo demo "$colony"
cat >"$work/scenario.txt" <<'SCEN'
# remove the top female of the demo colony, add a birth and split a line off
date 2025-06-01
group North Corral
remove NC001
birth NC015 F BABY1
introduce NEW1
split NC021 -> South Pen
SCEN
run ranks-elo ranks "$colony"
run ranks-elo-at ranks "$colony" --at 2023-06-30 --k 80 --start 900 --curve normal
run ranks-elo-optimised ranks "$colony" --optimise-k --from 2022-01-01 --to 2022-12-31
run ranks-elo-randomised ranks "$colony" --randomise 200 --seed 7 --threads 2 --from 2024-01-01
run ranks-ds ranks "$colony" --method ds
run ranks-ds-corrected ranks "$colony" --method ds --corrected --draws ignore
run ranks-isi ranks "$colony" --method isi --from 2024-01-01
run ranks-monthly ranks "$colony" --every month --from 2024-01-01
run ranks-yearly-ds ranks "$colony" --method ds --every year
run matrix matrix "$colony" --from 2024-01-01
run matrix-elo matrix "$colony" --order elo --from 2025-01-01
run matrix-id matrix "$colony" --order id --from 2025-01-01
run metrics metrics "$colony" --randomisations 200 --seed 3 --threads 2
run metrics-window metrics "$colony" --from 2023-01-01 --to 2023-12-31 --randomisations 100 --threads 1 --include-residents
run inherit inherit "$colony"
run inherit-at inherit "$colony" --at 2023-06-30 --rule eldest --maturity-years 3
run inherit-dyads inherit "$colony" --dyads
run inherit-monthly inherit "$colony" --monthly
run inherit-acquisition inherit "$colony" --acquisition
run scenario scenario "$colony" --file scenario.txt
run scenario-dyads scenario "$colony" --file scenario.txt --dyads
run stability stability "$colony" --group "North Corral"
run stability-weekly stability "$colony" --group "North Corral" --every week --from 2023-04-01 --to 2023-09-30
run sex-ratio sex-ratio "$colony" --births births.csv --thirds thirds.csv
run maternal-ranks maternal-ranks "$colony"
run export-tables export-tables "$colony" --dir tables --every year --randomisations 50
run export export "$colony" --dir exported
run history history "$colony" --help
# One group and windows: these read only the encounters they can use.
run ranks-group ranks "$colony" --group "North Corral" --from 2023-01-01 --to 2024-06-30
run ranks-window ranks "$colony" --method ds --from 2023-03-01 --to 2023-09-30
run matrix-group matrix "$colony" --group "North Corral" --order id --from 2025-01-01
run metrics-group metrics "$colony" --group "North Corral" --randomisations 50 --threads 1
run inherit-group inherit "$colony" --group "North Corral"
run inherit-group-at inherit "$colony" --group "North Corral" --at 2024-03-31 --dyads
run inherit-group-acquisition inherit "$colony" --group "North Corral" --acquisition --at 2024-12-31
run inherit-group-monthly inherit "$colony" --group "North Corral" --monthly --at 2024-12-31
run report-group report "$colony" --group "North Corral" --at 2024-12-31 --out report.pdf
run bad-date ranks "$colony" --from 2023-02-30
run bad-group ranks "$colony" --group nowhere
run missing-file ranks "$work/missing.hierloom"
for f in births.csv thirds.csv; do [ -f "$work/$f" ] && cp "$work/$f" "$out/sex-ratio-$f"; done
[ -d "$work/tables" ] && for f in "$work"/tables/*; do cp "$f" "$out/table-$(basename "$f")"; done
# The export's last column is the record's uid, new in every file: cut it off.
[ -d "$work/exported" ] && for f in "$work"/exported/*.csv; do
  if head -1 "$f" | grep -q ',uid$'; then sed 's/,[^,]*$//' "$f" >"$out/export-$(basename "$f")"; else cp "$f" "$out/export-$(basename "$f")"; fi
done
# Paths of the temporary folder appear in some messages.
sed -i "s|$work|WORK|g" "$out"/* 2>/dev/null
exit 0
