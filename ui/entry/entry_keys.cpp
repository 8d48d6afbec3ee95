// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/entry_keys.h"

#include <QCoreApplication>
#include <QKeyEvent>

#include <algorithm>

namespace hierloom::ui {

namespace {

const char* const kContext = "hierloom::ui::EntryKeys";

QKeySequence alt(Qt::Key k) { return QKeySequence(Qt::ALT | k); }

} // namespace

const std::vector<EntryKeyInfo>& entryKeys()
{
    static const std::vector<EntryKeyInfo> keys = {
        {EntryKey::SaveLine, {QKeySequence(Qt::Key_Enter)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "On the line"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Save the line (it is in the file at once)")},
        {EntryKey::ClearLine, {QKeySequence(Qt::Key_Escape)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "On the line"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Clear the line; leave a changed row as it was")},
        {EntryKey::ChangeRow, {QKeySequence(Qt::Key_F2), QKeySequence(Qt::Key_Enter)},
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "In the day's table"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Put the row on the line to change it")},
        {EntryKey::DeleteRows, {QKeySequence(Qt::Key_Delete), QKeySequence(Qt::Key_Backspace)},
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "In the day's table"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Delete the selected rows (one undoable step)")},
        {EntryKey::RecallRefused, {QKeySequence(Qt::Key_Enter), QKeySequence(Qt::Key_F2)},
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "In the refused lines"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Put the refused line back on the line")},
        {EntryKey::UndoLine, {QKeySequence(Qt::CTRL | Qt::Key_Z)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Undo the last line (not the letters of a field)")},
        {EntryKey::RedoLine, {QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_Z), QKeySequence(Qt::CTRL | Qt::Key_Y)},
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Redo the line undone last")},
        {EntryKey::Date, {alt(Qt::Key_D)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the date (2026-10-05 or 20261005; Enter goes on to the line)")},
        {EntryKey::Group, {alt(Qt::Key_G)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the group")},
        {EntryKey::Observer, {alt(Qt::Key_B)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the observer")},
        {EntryKey::Time, {alt(Qt::Key_T)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the time")},
        {EntryKey::Winner, {alt(Qt::Key_I)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the winner")},
        {EntryKey::Loser, {alt(Qt::Key_L)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the loser")},
        {EntryKey::Draw, {alt(Qt::Key_W)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Mark the line a draw, or not")},
        {EntryKey::Behaviour, {alt(Qt::Key_H)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the behaviour (here Alt+H is not the Help menu; F1 opens help)")},
        {EntryKey::Note, {alt(Qt::Key_O)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the note")},
        {EntryKey::WinnerSupport, {alt(Qt::Key_P)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the winner's supporters (ids separated by spaces)")},
        {EntryKey::LoserSupport, {alt(Qt::Key_E)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the loser's supporters (ids separated by spaces)")},
        {EntryKey::RefusedList, {alt(Qt::Key_R)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "To the refused lines")},
        {EntryKey::EndSession, {alt(Qt::Key_S)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "End the session and show its summary")},
        {EntryKey::UndoSession, {alt(Qt::Key_U)}, QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Anywhere in the entry"),
         QT_TRANSLATE_NOOP("hierloom::ui::EntryKeys", "Take back this session's lines, after a question")},
    };
    return keys;
}

const EntryKeyInfo& entryKeyInfo(EntryKey key)
{
    const auto& keys = entryKeys();
    return *std::find_if(keys.begin(), keys.end(), [key](const EntryKeyInfo& k) { return k.key == key; });
}

QString entryKeyWhere(const EntryKeyInfo& info) { return QCoreApplication::translate(kContext, info.where); }

QString entryKeyWhat(const EntryKeyInfo& info) { return QCoreApplication::translate(kContext, info.what); }

QString entryKeyText(const EntryKeyInfo& info)
{
    QStringList shown;
    for (const QKeySequence& k : info.sequences) shown << k.toString(QKeySequence::NativeText);
    return shown.join(QStringLiteral(", "));
}

bool entryKeyMatches(EntryKey key, const QKeyEvent* event)
{
    // Return and the keypad's Enter are one key to a person (the list says Enter).
    const auto same = [](int k) { return k == Qt::Key_Enter ? int(Qt::Key_Return) : k; };
    const auto mods = event->modifiers() & (Qt::ShiftModifier | Qt::ControlModifier | Qt::AltModifier | Qt::MetaModifier);
    for (const QKeySequence& s : entryKeyInfo(key).sequences)
        if (same(s[0].key()) == same(event->key()) && s[0].keyboardModifiers() == mods) return true;
    return false;
}

QString withEntryMnemonic(const QString& text, EntryKey key)
{
    const QKeySequence& seq = entryKeyInfo(key).sequences.front();
    const QChar letter = QChar(seq[0].key()).toLower();
    QString out = text;
    const qsizetype at = out.indexOf(letter, 0, Qt::CaseInsensitive);
    if (at >= 0) out.insert(at, QLatin1Char('&'));
    return out;
}

} // namespace hierloom::ui
