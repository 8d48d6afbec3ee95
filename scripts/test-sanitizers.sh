#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Builds core, the command line and their tests with AddressSanitizer and
# UndefinedBehaviorSanitizer in ./build-asan (Debug) and runs the test suite
# there; any report fails the run. The desktop program is left out
# (HIERLOOM_BUILD_UI=OFF) to keep the build short; set
# HIERLOOM_ASAN_UI=ON to include it (Qt's own code is then exercised too).
set -euo pipefail
cd "$(dirname "$0")/.."
cmake -S . -B build-asan -G Ninja -DCMAKE_BUILD_TYPE=Debug \
  -DCMAKE_CXX_FLAGS="-fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=all" \
  -DHIERLOOM_BUILD_UI="${HIERLOOM_ASAN_UI:-OFF}" -DHIERLOOM_BUILD_BENCH=OFF
cmake --build build-asan -j"$(nproc)"
cd build-asan
export ASAN_OPTIONS="detect_leaks=1:abort_on_error=1:strict_string_checks=1"
export UBSAN_OPTIONS="print_stacktrace=1:halt_on_error=1"
QT_QPA_PLATFORM=offscreen ctest --output-on-failure -j"$(nproc)" --timeout 600
