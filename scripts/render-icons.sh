#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Renders resources/icons/hierloom.svg into the PNG sizes of the icon theme
# (committed, so a build needs no SVG tool). Run after editing the SVG.
set -euo pipefail
cd "$(dirname "$0")/../resources/icons"
for size in 16 22 24 32 48 64 128 256; do
  rsvg-convert -w "$size" -h "$size" hierloom.svg -o "hierloom-$size.png"
done
echo "rendered $(ls hierloom-*.png | wc -l) PNG sizes"
