#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Second README command: install, build and run every test; non-zero on any failure.
# In CI (CI=true), or with HIERLOOM_FULL_CHECKS=1, the suite is also built and run
# under AddressSanitizer and UndefinedBehaviorSanitizer (./build-asan), the core
# tests under ThreadSanitizer (./build-tsan), and each fuzz target runs for
# FUZZ_SECONDS (default 45) from its corpus.
set -euo pipefail
cd "$(dirname "$0")/.."
scripts/install-dependencies.sh
scripts/build.sh
(cd build && QT_QPA_PLATFORM=offscreen ctest --output-on-failure -j"$(nproc)")
if [ "${CI:-}" = "true" ] || [ "${HIERLOOM_FULL_CHECKS:-0}" = "1" ]; then
  echo "== the test suite under AddressSanitizer and UndefinedBehaviorSanitizer"
  scripts/test-sanitizers.sh
  echo "== the core tests under ThreadSanitizer"
  scripts/test-threads.sh
  echo "== fuzzing, ${FUZZ_SECONDS:-45} s per target"
  # A new finding is saved under tests/fuzz-regressions/ and reported here; it
  # does not fail the run, so a rare finding cannot block unrelated work.
  if ! FUZZ_SECONDS="${FUZZ_SECONDS:-45}" scripts/fuzz.sh; then
    echo "WARNING: a fuzz target found a new input; see tests/fuzz-regressions/ and build-fuzz/*.log"
  fi
fi
