// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Counts in words for the evening entry; spelled out so the English reads right without a translation file.
#include "ui/entry/encounter_entry_panel.h"

namespace hierloom::ui {

inline QString lines(int n) { return n == 1 ? EncounterEntryPanel::tr("1 line") : EncounterEntryPanel::tr("%1 lines").arg(n); }
inline QString animalsText(int n)
{
    return n == 1 ? EncounterEntryPanel::tr("1 animal") : EncounterEntryPanel::tr("%1 animals").arg(n);
}
inline QString warningsText(int n)
{
    return n == 1 ? EncounterEntryPanel::tr("1 warning") : EncounterEntryPanel::tr("%1 warnings").arg(n);
}

} // namespace hierloom::ui
