#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Checks the direction of the layers (docs/architecture.md) from the #include
# lines of the sources: a folder may include only itself and the folders
# listed for it. Also: no SQLite outside core/store (and the tests), no Qt in
# core/, no colony writes in ui/ outside ui/document. Prints every violation
# as FILE:LINE: what; exits 1 if there is any.
set -uo pipefail
cd "${1:-$(dirname "$0")/../..}"
declare -A allowed=(
  [core/base]=""
  [core/stats]=""
  [core/rules]="core/base"
  [core/ranks]="core/base"
  [core/pedigree]="core/base core/stats core/ranks"
  [core/research]="core/base core/stats core/ranks core/pedigree"
  [core/planning]="core/base core/ranks core/pedigree"
  [core/store]="core/base core/rules core/ranks core/pedigree core/planning core/research"
  [core/demo]="core/base core/store"
  [ui/document]="core"
  [ui/widgets]="core ui/document"
  [ui/records]="core ui/document ui/widgets"
  [ui/entry]="core ui/document ui/widgets"
  [ui/analysis]="core report ui/document ui/widgets"
  [ui/planning]="core report ui/document ui/widgets"
  [ui/shell]="core report ui/document ui/widgets ui/records ui/entry ui/analysis ui/planning"
)
status=0
for folder in "${!allowed[@]}"; do
  [ -d "$folder" ] || { echo "$folder: missing folder"; status=1; continue; }
  while IFS= read -r hit; do
    file="${hit%%:*}"; rest="${hit#*:}"; line="${rest%%:*}"
    inc="$(sed -E 's/.*#include "([^"]+)".*/\1/' <<<"$rest")"; inc="$(dirname "$inc")"
    inc_root="${inc%%/*}"
    [ "$inc" = "$folder" ] && continue
    ok=0
    for a in ${allowed[$folder]}; do
      if [ "$a" = "$inc" ] || [ "$a" = "$inc_root" ]; then ok=1; fi
    done
    # ui/ folders may include any core layer; core layers only those listed.
    [ $ok -eq 1 ] || { echo "$file:$line: includes from $inc/, which $folder/ may not use"; status=1; }
  done < <(grep -n '#include "\(core\|ui\|cli\|report\)/' "$folder"/*.h "$folder"/*.cpp 2>/dev/null)
done
# Files directly in core/ or ui/ (outside a layer folder) are not allowed.
for f in core/*.h core/*.cpp ui/*.h ui/*.cpp; do
  [ -e "$f" ] && { echo "$f: outside the layer folders"; status=1; }
done
# SQLite is spoken only by core/store.
while IFS= read -r hit; do echo "$hit: SQLite outside core/store"; status=1; done \
  < <(grep -rn 'sqlite3' core ui cli report app tools fuzz --include=*.h --include=*.cpp | grep -v '^core/store/')
# core/ knows nothing of Qt.
while IFS= read -r hit; do echo "$hit: Qt in core/"; status=1; done \
  < <(grep -rn '#include <Q' core --include=*.h --include=*.cpp)
# In the desktop only ui/document writes to a colony file: ColonyDocument
# hands out a const store, so the compiler refuses a write elsewhere; this
# catches the ways around that (casting const away, the writer side of the
# document, a second connection of one's own, core writes on a path).
while IFS= read -r hit; do echo "$hit: writes outside ui/document (go through ColonyEditFacade)"; status=1; done \
  < <(grep -rnE 'const_cast|writableStore|ColonyStore::(open|create)\(|core::(writeEncounterChange|writeAnimalChange|commitAnimalChange|insertEncounters|updateEncounter|deleteEncounters|writeBehaviourCodes|writeObservers|writeStabilityThresholds|writeSpeciesSettings|saveScenarioText|deleteSavedScenario|writeSettingValues|importFiles|mergeColonies|restoreBackup)\b|setSetting\(|setUserName\(' \
        ui --include=*.h --include=*.cpp | grep -v '^ui/document/')
# ... and the store it hands out stays const.
grep -qE '^ *const core::ColonyStore\* store\(\) const' ui/document/colony_document.h ||
  { echo "ui/document/colony_document.h: store() must return a const store"; status=1; }
[ $status -eq 0 ] && echo "layers: every #include follows docs/architecture.md; only ui/document writes"
exit $status
