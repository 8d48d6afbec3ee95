// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/record_history.h"

#include <QDialog>

#include <vector>

class QTableWidget;

namespace hierloom::ui {

class AnimalView;
class ColonyDocument;
class EncounterView;

/// The audit trail of one record (issue 9): who changed it, when, how, and
/// which values went from what to what, oldest first.
class RecordHistoryDialog : public QDialog {
    Q_OBJECT
public:
    enum Column { When, Who, Action, Changes, ColumnCount };

    RecordHistoryDialog(const std::vector<core::AuditEntry>& history, const QString& record, QWidget* parent = nullptr);

    QTableWidget* table() const { return table_; }

    /// "field: old → new" lines of one audit row (insert: the new values, delete: the old ones).
    static QString changesText(const core::AuditEntry& entry);

private:
    QTableWidget* table_;
};

/// Adds "History..." (Ctrl+H and the context menu) to the animal and encounter
/// tables; it opens a RecordHistoryDialog for the selected record.
void addHistoryActions(AnimalView* animals, EncounterView* encounters, ColonyDocument* document);

/// Opens the history of the animal or encounter selected in the view; false when none is selected.
bool showSelectedAnimalHistory(AnimalView* animals, ColonyDocument* document);
bool showSelectedEncounterHistory(EncounterView* encounters, ColonyDocument* document);

} // namespace hierloom::ui
