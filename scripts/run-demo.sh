#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# First README command: install, build, write the demo colony and open it.
set -euo pipefail
cd "$(dirname "$0")/.."
scripts/install-dependencies.sh
scripts/build.sh
demo="${HIERLOOM_DEMO:-$HOME/hierloom-demo.hierloom}"
if [ ! -f "$demo" ]; then
  build/app/hierloom-cli demo "$demo"
fi
exec build/app/hierloom "$demo"
