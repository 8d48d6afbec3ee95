#!/bin/sh
# SPDX-License-Identifier: GPL-3.0-or-later
# Builds the Debian package from a finished build and checks its declared
# dependencies (dpkg-deb -I), its file list (dpkg-deb -c), and that the files
# really unpack (dpkg -x into a scratch root).
# Usage: check_package.sh BUILD_DIR [CPACK]
set -eu
build=$1
cpack=${2:-cpack}
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
fail=0
problem() { echo "FAIL: $*"; fail=1; }

# A separate output folder keeps the build tree free of package files.
"$cpack" -G DEB --config "$build/CPackConfig.cmake" -B "$work/out" >"$work/cpack.log" 2>&1 || {
    cat "$work/cpack.log"; echo "FAIL: cpack did not build the package"; exit 1; }
deb=$(ls "$work"/out/hierloom_*.deb 2>/dev/null | head -n 1)
[ -n "$deb" ] || { cat "$work/cpack.log"; echo "FAIL: no hierloom_*.deb written"; exit 1; }
echo "package: $(basename "$deb"), $(wc -c <"$deb") bytes"

info=$(dpkg-deb -I "$deb")
depends=$(printf '%s\n' "$info" | sed -n 's/^ Depends: //p')
echo "Depends: $depends"
for pkg in libqt6core6 libqt6gui6 libqt6widgets6 libqt6printsupport6 libqt6svg6 libqcustomplot2.1-qt6 libsqlite3-0; do
    # Whole package names only: libqt6core6 must not match libqt6core6t64-something else.
    printf '%s\n' "$depends" | tr ',' '\n' | sed 's/^ *//; s/ .*//; s/|.*//' | grep -qx "$pkg" ||
        problem "Depends lacks $pkg"
done
printf '%s\n' "$info" | grep -q '^ Section: science$' || problem "Section is not science"
printf '%s\n' "$info" | grep -q '^ Maintainer: .*<.*@.*>$' || problem "no Maintainer with an e-mail address"
printf '%s\n' "$info" | grep -q '^ Package: hierloom$' || problem "Package is not hierloom"

expected="./usr/bin/hierloom
./usr/bin/hierloom-cli
./usr/share/applications/hierloom.desktop
./usr/share/mime/packages/hierloom.xml
./usr/share/icons/hicolor/scalable/apps/hierloom.svg
./usr/share/icons/hicolor/16x16/apps/hierloom.png
./usr/share/icons/hicolor/48x48/apps/hierloom.png
./usr/share/icons/hicolor/256x256/apps/hierloom.png
./usr/share/man/man1/hierloom.1.gz
./usr/share/man/man1/hierloom-cli.1.gz
./usr/share/doc/hierloom/copyright
./usr/share/hierloom/demo-colony/encounters.csv"
listing=$(dpkg-deb -c "$deb" | awk '{print $6}')
for f in $expected; do
    printf '%s\n' "$listing" | grep -qx "$f" || problem "package lacks $f"
done

# Unpack into a scratch root: the files exist, the programs run, the texts are sound.
dpkg -x "$deb" "$work/root"
for f in $expected; do
    [ -s "$work/root/${f#./}" ] || problem "unpacked $f is missing or empty"
done
[ -x "$work/root/usr/bin/hierloom-cli" ] || problem "hierloom-cli is not executable"
"$work/root/usr/bin/hierloom-cli" --version | grep -q '^hierloom-cli [0-9]' || problem "hierloom-cli --version"
grep -q '^Exec=hierloom %f$' "$work/root/usr/share/applications/hierloom.desktop" || problem "desktop Exec line"
grep -q '^MimeType=application/x-hierloom-colony;$' "$work/root/usr/share/applications/hierloom.desktop" ||
    problem "desktop MimeType line"
grep -q 'glob pattern="\*.hierloom"' "$work/root/usr/share/mime/packages/hierloom.xml" || problem "MIME glob"
if command -v desktop-file-validate >/dev/null 2>&1; then
    desktop-file-validate "$work/root/usr/share/applications/hierloom.desktop" || problem "desktop-file-validate"
fi
if command -v xmllint >/dev/null 2>&1; then
    xmllint --noout "$work/root/usr/share/mime/packages/hierloom.xml" || problem "MIME xml is not well-formed"
fi
gzip -dc "$work/root/usr/share/man/man1/hierloom-cli.1.gz" | grep -q '^\.SS metrics' ||
    problem "hierloom-cli man page lacks the metrics command"
gzip -dc "$work/root/usr/share/man/man1/hierloom.1.gz" | grep -q 'Displays version information' ||
    problem "hierloom man page lacks --version"

[ "$fail" -eq 0 ] && echo "package checks passed"
exit "$fail"
