// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/records/encounter_filter.h"

#include <QAbstractTableModel>
#include <QStringList>

#include <vector>

namespace hierloom::ui {

class ColonyDocument;

/// The colony's encounters, newest first (the reverse of the analysis order:
/// date, time, entry order). Built for a million rows: cells are formatted
/// only when a view asks for them, and the filter keeps a vector of row
/// indices instead of testing rows one by one through a proxy.
class EncounterTableModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column { Date, Time, Winner, Loser, Outcome, Behaviour, Group, Observer, Note, WinnerSupport, LoserSupport, ColumnCount };

    explicit EncounterTableModel(const ColonyDocument* document, QObject* parent = nullptr);

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    void setFilter(const EncounterFilter& filter);
    const EncounterFilter& filter() const { return filter_; }

    /// Every encounter of the colony, whether shown or not.
    int totalCount() const { return static_cast<int>(known_); }
    /// The encounter shown in a row (made from the compact records on each call).
    core::Encounter encounterAt(int row) const;
    /// Distinct observers, sorted, for the observer choice.
    const QStringList& observers() const { return observers_; }

private:
    void rebuild();
    void applyFilter();

    const ColonyDocument* document_;
    EncounterFilter filter_;
    size_t known_ = 0;         // encounters().size() when rows_ was last made
    std::vector<size_t> rows_; // indices into encounters() of the rows shown, newest first
    QStringList observers_;
};

} // namespace hierloom::ui
