#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Builds core and its tests with ThreadSanitizer in ./build-tsan and runs the
# core tests there: the bulk import's checking and writing threads, the
# randomisation tests' worker threads and the Elo optimisation's pool. Any
# report fails the run. The crash test is left out: it forks a million-row
# import two dozen times and is run under AddressSanitizer already.
set -euo pipefail
cd "$(dirname "$0")/.."
cmake -S . -B build-tsan -G Ninja -DCMAKE_BUILD_TYPE=RelWithDebInfo -DCMAKE_CXX_FLAGS="-fsanitize=thread" \
  -DHIERLOOM_BUILD_UI=OFF -DHIERLOOM_BUILD_BENCH=OFF
cmake --build build-tsan -j"$(nproc)" --target core_tests
TSAN_OPTIONS="halt_on_error=1:second_deadlock_stack=1" build-tsan/tests/core_tests --gtest_filter='-ColonyCrash.*'
