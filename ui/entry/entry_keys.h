// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QKeySequence>
#include <QList>
#include <QString>

#include <vector>

class QKeyEvent;

namespace hierloom::ui {

/// What a key of the evening entry does.
enum class EntryKey {
    SaveLine,      ///< Enter on the line
    ClearLine,     ///< Esc on the line (and leaves a change of a row unsaved)
    ChangeRow,     ///< F2 or Enter on the day's table
    DeleteRows,    ///< Del or Backspace on the day's table
    RecallRefused, ///< Enter or F2 on a refused line
    UndoLine,      ///< Ctrl+Z anywhere in the panel
    RedoLine,      ///< Ctrl+Shift+Z or Ctrl+Y anywhere in the panel
    Date,          ///< Alt+letter: to the field or button
    Group,
    Observer,
    Time,
    Winner,
    Loser,
    Draw,
    Behaviour,
    Note,
    WinnerSupport,
    LoserSupport,
    RefusedList,
    EndSession,
    UndoSession,
};

/// One key of the evening entry: its keys, where they act and what they do.
struct EntryKeyInfo {
    EntryKey key;
    QList<QKeySequence> sequences;
    const char* where; ///< untranslated; entryKeyWhere() translates
    const char* what;  ///< untranslated; entryKeyWhat() translates
};

/// The evening entry's own keys, the one list of them: the panel's key
/// filter, its labels' Alt letters and its undo keys are made from it, and
/// the help's shortcut sheet lists it (so no key can be missing there).
const std::vector<EntryKeyInfo>& entryKeys();
const EntryKeyInfo& entryKeyInfo(EntryKey key);
QString entryKeyWhere(const EntryKeyInfo& info);
QString entryKeyWhat(const EntryKeyInfo& info);
/// The keys as the help shows them ("Del, Backspace").
QString entryKeyText(const EntryKeyInfo& info);

/// True when `event` is one of `key`'s sequences (the keypad's Enter counts as Enter).
bool entryKeyMatches(EntryKey key, const QKeyEvent* event);

/// `text` with the Alt letter of `key` marked for Qt ("Winner" and Alt+I give
/// "W&inner"): the letter shown underlined is the one in the list.
QString withEntryMnemonic(const QString& text, EntryKey key);

} // namespace hierloom::ui
