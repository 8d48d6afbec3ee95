#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Builds the libFuzzer targets with clang in ./build-fuzz and runs each for
# FUZZ_SECONDS (default 60). The working corpus lives in build-fuzz/corpus/<target>
# (seeded from fuzz/seeds/<target>); inputs that crash are written to
# tests/fuzz-regressions/<target>/, where the normal test suite replays them
# (FuzzRegressions.*). Exits non-zero when a target found something.
# Usage: scripts/fuzz.sh [target ...]   (targets: import_animals import_residences
#        import_encounters scenario_file; default all)
set -euo pipefail
cd "$(dirname "$0")/.."
seconds="${FUZZ_SECONDS:-60}"
targets=("$@")
[ ${#targets[@]} -gt 0 ] || targets=(import_animals import_residences import_encounters scenario_file)
cmake -S . -B build-fuzz -G Ninja -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DHIERLOOM_BUILD_FUZZERS=ON -DHIERLOOM_BUILD_UI=OFF -DHIERLOOM_BUILD_TESTS=OFF -DHIERLOOM_BUILD_BENCH=OFF
cmake --build build-fuzz -j"$(nproc)" --target "${targets[@]/#/fuzz_}"
status=0
for t in "${targets[@]}"; do
  corpus="build-fuzz/corpus/$t"
  found="tests/fuzz-regressions/$t"
  mkdir -p "$corpus" "$found"
  [ -d "fuzz/seeds/$t" ] && cp -n fuzz/seeds/"$t"/* "$corpus"/ 2>/dev/null || true
  echo "== fuzz_$t for ${seconds} s"
  rc=0
  "build-fuzz/fuzz/fuzz_$t" -max_total_time="$seconds" -timeout=10 -rss_limit_mb=2048 -max_len=4096 \
    -print_final_stats=1 -artifact_prefix="$found/" "$corpus" >"build-fuzz/fuzz_$t.log" 2>&1 || rc=$?
  grep -E "stat::number_of_executed_units|^#[0-9]+ +DONE|ERROR|SUMMARY|Test unit written" "build-fuzz/fuzz_$t.log" || true
  if [ "$rc" -ne 0 ]; then
    echo "fuzz_$t found a problem (exit $rc); the input is in $found/ (log: build-fuzz/fuzz_$t.log)"
    status=1
  fi
done
exit $status
