// SPDX-License-Identifier: GPL-3.0-or-later
// The evening entry's table of the day's lines, its refused lines and its keys
// (the fields and the commit are in encounter_entry_panel.cpp).
#include "ui/entry/encounter_entry_panel.h"

#include <QAbstractButton>
#include <QAbstractItemView>
#include <QCompleter>
#include <QLabel>
#include <QLineEdit>

#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/entry/entry_keys.h"
#include "ui/entry/entry_words.h"
#include "ui/entry/session_table.h"
#include "ui/widgets/typed_date.h"

#include <QCheckBox>
#include <QComboBox>
#include <QKeyEvent>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QTableWidget>

namespace hierloom::ui {

std::vector<core::Encounter> EncounterEntryPanel::dayRows() const
{
    // Read from the document every time, so the table can never drift from the file.
    std::vector<core::Encounter> out;
    if (!dateValid_) return out;
    const core::EncounterRecords& all = document_->encounters();
    if (!dayIndexValid_) {
        const std::int32_t group = all.compact().groups.find(toStdString(group_->currentText()));
        dayIndex_.clear();
        for (size_t i = 0; i < all.size(); ++i)
            if (all.record(i).date == day_ && all.record(i).group == group) dayIndex_.push_back(i);
        dayIndexValid_ = true;
    }
    for (size_t i : dayIndex_) out.push_back(all.at(i));
    return out;
}

std::vector<core::Encounter> EncounterEntryPanel::sessionRows() const
{
    std::vector<core::Encounter> out;
    for (core::Encounter& e : dayRows())
        if (sessionUids_.count(e.uid)) out.push_back(std::move(e));
    return out;
}

int EncounterEntryPanel::sessionRowCount() const { return static_cast<int>(sessionRows().size()); }

void EncounterEntryPanel::refreshList()
{
    const auto all = dayRows();
    fillSessionTable(list_, all, sessionUids_, document_->pedigree());
    std::set<std::string> animals;
    int ours = 0;
    int warnings = 0;
    for (const core::Encounter& e : all) {
        if (!sessionUids_.count(e.uid)) continue;
        ++ours;
        animals.insert(e.winner);
        animals.insert(e.loser);
        warnings += warned_.count(e.uid) ? 1 : 0;
    }
    const int earlier = static_cast<int>(all.size()) - ours;
    count_->setText(lines(ours) + QStringLiteral(" · ") + animalsText(static_cast<int>(animals.size())) +
                    QStringLiteral(" · ") + warningsText(warnings + refusals_) +
                    (earlier > 0 ? QStringLiteral(" · ") + tr("%1 earlier").arg(earlier) : QString()));
    undoSession_->setEnabled(ours > 0);
}

QString EncounterEntryPanel::countText() const { return count_->text(); }

QString EncounterEntryPanel::summaryText() const { return summary_->text(); }

QStringList EncounterEntryPanel::typedFields() const
{
    return {time_->text(), winner_->text(), loser_->text(), draw_->isChecked() ? QStringLiteral("1") : QString(),
            behaviour_->currentText(), note_->text(), winnerSupport_->text(), loserSupport_->text()};
}

void EncounterEntryPanel::refuse(const core::FieldProblems& problems)
{
    clearMessages();
    ++refusals_;
    // Listed with its reason, so a line refused late in the evening is not lost.
    const QStringList fields = typedFields();
    QString text = QStringLiteral("%1 %2 > %3").arg(fields[0].trimmed(), fields[1].trimmed(), fields[2].trimmed()).trimmed();
    text += QStringLiteral(": ") + toQString(problems.front().message);
    if (refused_->count() > 0 && refused_->item(refused_->count() - 1)->data(Qt::UserRole).toStringList() == fields)
        delete refused_->takeItem(refused_->count() - 1); // the same line refused again: listed once
    // Another line typed over a refused one (another time, or neither animal
    // kept) does not fix it: the refused line stays listed when this one is
    // saved. The same line typed again (a field fixed) stays tied to the row.
    const auto sameLine = [&fields](const QStringList& other) {
        return other.size() == fields.size() && other[0].trimmed() == fields[0].trimmed() &&
               (other[1].trimmed() == fields[1].trimmed() || other[2].trimmed() == fields[2].trimmed());
    };
    for (int i = 0; i < refused_->count(); ++i) {
        QListWidgetItem* old = refused_->item(i);
        if (old->data(kEntryLineRole).toULongLong() == entryLine_ && !sameLine(old->data(Qt::UserRole).toStringList()))
            old->setData(kEntryLineRole, QVariant::fromValue<quint64>(0)); // no entry line is 0
    }
    auto* item = new QListWidgetItem(text, refused_);
    item->setData(Qt::UserRole, fields);
    item->setData(kEntryLineRole, QVariant::fromValue<quint64>(entryLine_));
    refused_->scrollToBottom();
    refreshList();
    showProblems(problems);
}

void EncounterEntryPanel::recallRefused()
{
    QListWidgetItem* item = refused_->currentItem();
    if (!item) return;
    const QStringList f = item->data(Qt::UserRole).toStringList();
    delete refused_->takeItem(refused_->row(item));
    ++entryLine_; // a line of its own now: its next refusal is listed again
    editing_.reset();
    mode_->clear();
    time_->setText(f.value(0));
    winner_->setText(f.value(1));
    loser_->setText(f.value(2));
    draw_->setChecked(!f.value(3).isEmpty());
    behaviour_->setCurrentText(f.value(4));
    note_->setText(f.value(5));
    winnerSupport_->setText(f.value(6));
    loserSupport_->setText(f.value(7));
    time_->setFocus();
}

void EncounterEntryPanel::editSelectedRow()
{
    const int row = list_->currentRow();
    const auto rows = dayRows();
    if (row < 0 || row >= static_cast<int>(rows.size())) return;
    const core::Encounter& e = rows[static_cast<size_t>(row)];
    editing_ = e;
    time_->setText(e.time ? toQString(core::formatTimeOfDay(*e.time)) : QString());
    winner_->setText(toQString(e.winner));
    loser_->setText(toQString(e.loser));
    draw_->setChecked(e.outcome == core::Outcome::Draw);
    behaviour_->setCurrentText(toQString(e.behaviour));
    note_->setText(toQString(e.note));
    winnerSupport_->setText(toQString(core::joinSupporters(e.winnerSupport)));
    loserSupport_->setText(toQString(core::joinSupporters(e.loserSupport)));
    mode_->setText(tr("Changing line %1: Enter saves it, Esc cancels.").arg(row + 1));
    time_->setFocus();
}

void EncounterEntryPanel::deleteSelectedRows()
{
    // The selected rows are named by the table as it was; if another program
    // wrote meanwhile, the table is re-read instead and nothing is deleted.
    bool reread = false;
    if (auto p = facade_->catchUp(&reread); !p.empty() || reread) {
        if (p.empty()) p.push_back({"line", toStdString(tr("The table was read again from the file; nothing was "
                                                            "deleted. Choose the line again."))});
        showProblems(p);
        return;
    }
    const auto rows = dayRows();
    std::vector<core::Encounter> gone;
    for (const QModelIndex& index : list_->selectionModel()->selectedRows())
        if (index.row() < static_cast<int>(rows.size())) gone.push_back(rows[static_cast<size_t>(index.row())]);
    if (gone.empty()) return;
    const auto problems = facade_->deleteEncounters(gone);
    if (!problems.empty()) showProblems(problems);
}

void EncounterEntryPanel::undoWholeSession()
{
    // The session's own lines as the file holds them now, never another program's.
    if (auto p = facade_->catchUp(); !p.empty()) {
        showProblems(p);
        return;
    }
    const std::vector<core::Encounter> all = sessionRows();
    if (all.empty()) return;
    const QString what = lines(static_cast<int>(all.size()));
    if (!askUndoSession_(tr("Take back the %1 entered in this session for %2, group %3? Earlier lines stay.")
                             .arg(what, formatDay(day_), group_->currentText()))) {
        focusEntry();
        return;
    }
    const auto problems = facade_->deleteEncounters(all, tr("Delete the session of %1 (%2)").arg(formatDay(day_), what));
    if (!problems.empty()) showProblems(problems);
    focusEntry();
}

void EncounterEntryPanel::endSession()
{
    const auto rows = sessionRows();
    std::set<std::string> animals;
    int warnings = 0;
    for (const core::Encounter& e : rows) {
        animals.insert(e.winner);
        animals.insert(e.loser);
        warnings += warned_.count(e.uid) ? 1 : 0;
    }
    // The date the lines were stored under, read from them when there are any.
    const core::Day stored = rows.empty() ? day_ : rows.front().date;
    summary_->setText(tr("Session ended: %1, group %2, observer %3: %4, %5, %6.")
                          .arg(formatDay(stored), group_->currentText(),
                               observer_->currentText().isEmpty() ? tr("(none)") : observer_->currentText(),
                               lines(static_cast<int>(rows.size())),
                               animalsText(static_cast<int>(animals.size())),
                               warningsText(warnings + refusals_)));
    sessionUids_.clear();
    warned_.clear();
    refusals_ = 0;
    editing_.reset();
    mode_->clear();
    refreshList();
}

bool EncounterEntryPanel::eventFilter(QObject* watched, QEvent* event)
{
    // The keys come from the entry's one list (entry_keys.h), which the help lists too.
    if (event->type() != QEvent::KeyPress) return QWidget::eventFilter(watched, event);
    const auto* key = static_cast<QKeyEvent*>(event);
    // An open completion list takes the keys of the window: an Alt letter
    // typed there closes it and moves to its field at once, so the next
    // letter lands in that field, not in the one just left.
    if (completionPopups_.contains(watched) && (key->modifiers() & Qt::AltModifier) &&
        !(key->modifiers() & Qt::ControlModifier)) {
        static_cast<QWidget*>(watched)->hide();
        if (jumpToMnemonic(QKeySequence(key->modifiers() | key->key()))) return true;
        return QWidget::eventFilter(watched, event);
    }
    if (watched == list_) {
        if (entryKeyMatches(EntryKey::DeleteRows, key)) {
            deleteSelectedRows();
            return true;
        }
        if (entryKeyMatches(EntryKey::ChangeRow, key)) {
            editSelectedRow();
            return true;
        }
        return QWidget::eventFilter(watched, event);
    }
    if (watched == refused_) {
        if (entryKeyMatches(EntryKey::RecallRefused, key)) {
            recallRefused();
            return true;
        }
        return QWidget::eventFilter(watched, event);
    }
    if (watched == date_) {
        if (entryKeyMatches(EntryKey::SaveLine, key)) {
            // Enter on the date: show it as stored and go on to the line.
            if (dateValid_) {
                date_->setText(formatDay(day_));
                focusEntry();
            }
            return true;
        }
        return QWidget::eventFilter(watched, event);
    }
    if (entryKeyMatches(EntryKey::SaveLine, key)) {
        commitLine();
        return true;
    }
    if (entryKeyMatches(EntryKey::ClearLine, key)) {
        cancelEdit(); // clears the line, and leaves a change of a row unsaved
        return true;
    }
    return QWidget::eventFilter(watched, event);
}

} // namespace hierloom::ui

namespace hierloom::ui {

bool EncounterEntryPanel::jumpToMnemonic(const QKeySequence& pressed)
{
    for (QLabel* label : findChildren<QLabel*>())
        if (label->buddy() && label->isVisible() && QKeySequence::mnemonic(label->text()) == pressed) {
            label->buddy()->setFocus(Qt::ShortcutFocusReason);
            return true;
        }
    for (QAbstractButton* button : findChildren<QAbstractButton*>())
        if (button->isVisible() && button->isEnabled() && QKeySequence::mnemonic(button->text()) == pressed) {
            if (button->focusPolicy() != Qt::NoFocus) button->setFocus(Qt::ShortcutFocusReason);
            button->animateClick();
            return true;
        }
    return false;
}

} // namespace hierloom::ui
