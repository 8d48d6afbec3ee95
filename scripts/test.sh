#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Second README command: install, build and run every test; non-zero on any failure.
set -euo pipefail
cd "$(dirname "$0")/.."
scripts/install-dependencies.sh
scripts/build.sh
cd build
QT_QPA_PLATFORM=offscreen ctest --output-on-failure -j"$(nproc)"
