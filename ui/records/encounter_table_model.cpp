// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/encounter_table_model.h"

#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"

#include <algorithm>
#include <set>
#include <string_view>
#include <tuple>

namespace hierloom::ui {

EncounterTableModel::EncounterTableModel(const ColonyDocument* document, QObject* parent)
    : QAbstractTableModel(parent), document_(document)
{
    connect(document_, &ColonyDocument::changed, this, &EncounterTableModel::rebuild);
    rebuild();
}

void EncounterTableModel::rebuild()
{
    const core::EncounterRecords& encounters = document_->encounters();
    const ColonyDocument::Change& change = document_->lastChange();
    if (change.kind == ColonyDocument::ChangeKind::EncountersAppended && change.firstAppended == known_) {
        // An evening entry appends a row: place it (and tell the view of one
        // inserted row) instead of re-sorting and resetting a million.
        const auto key = [&](size_t i) {
            const core::CompactEncounter& r = encounters.record(i);
            return std::tuple(r.date, r.time < 0 ? 24 * 60 : r.time, r.seq);
        };
        const auto newer = [&](size_t a, size_t b) { return key(b) < key(a); };
        const EncounterFilterOnRecords accepts(filter_, encounters);
        for (size_t i = change.firstAppended; i < encounters.size(); ++i) {
            if (accepts.accepts(i)) {
                const auto at = std::upper_bound(rows_.begin(), rows_.end(), i, newer);
                const int row = static_cast<int>(at - rows_.begin());
                beginInsertRows(QModelIndex(), row, row);
                rows_.insert(at, i);
                endInsertRows();
            }
            const QString name = toQString(encounters.compact().observers.name(encounters.record(i).observer));
            const auto o = std::lower_bound(observers_.begin(), observers_.end(), name);
            if (o == observers_.end() || *o != name) observers_.insert(o, name);
        }
        known_ = encounters.size();
        return;
    }
    if (change.kind == ColonyDocument::ChangeKind::AnimalsChanged || change.kind == ColonyDocument::ChangeKind::ListsChanged ||
        change.kind == ColonyDocument::ChangeKind::SettingsChanged) {
        if (known_ == encounters.size()) return; // the encounters are as they were
    }
    beginResetModel();
    known_ = encounters.size();
    // The observers of the records held (a code table may keep a name no record uses now).
    const core::CompactEncounters& compact = encounters.compact();
    std::vector<bool> used(static_cast<size_t>(compact.observers.size()), false);
    for (const core::CompactEncounter& r : compact.records) used[static_cast<size_t>(r.observer)] = true;
    std::set<std::string_view> names;
    for (std::int32_t o = 0; o < compact.observers.size(); ++o)
        if (used[static_cast<size_t>(o)]) names.insert(compact.observers.name(o));
    observers_.clear();
    for (std::string_view n : names) observers_.append(QString::fromUtf8(n.data(), static_cast<qsizetype>(n.size())));
    applyFilter();
    endResetModel();
}

void EncounterTableModel::setFilter(const EncounterFilter& filter)
{
    if (filter == filter_) return;
    beginResetModel();
    filter_ = filter;
    applyFilter();
    endResetModel();
}

void EncounterTableModel::applyFilter()
{
    // The rows shown are picked first and only they are sorted: a group's
    // log in a file kept group by group sorts that group, not every row held.
    const core::EncounterRecords& encounters = document_->encounters();
    const EncounterFilterOnRecords accepts(filter_, encounters);
    std::vector<size_t> shown;
    for (size_t i = 0; i < encounters.size(); ++i)
        if (accepts.accepts(i)) shown.push_back(i);
    rows_ = encounters.chronologicalOrder(std::move(shown));
    std::reverse(rows_.begin(), rows_.end());
}

core::Encounter EncounterTableModel::encounterAt(int row) const
{
    return document_->encounters().at(rows_.at(static_cast<size_t>(row)));
}

int EncounterTableModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : static_cast<int>(rows_.size());
}

int EncounterTableModel::columnCount(const QModelIndex& parent) const { return parent.isValid() ? 0 : ColumnCount; }

QVariant EncounterTableModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() >= rowCount()) return {};
    if (role == Qt::ToolTipRole && index.column() == Note)
        return toQString(document_->encounters().note(rows_[static_cast<size_t>(index.row())]));
    if (role != Qt::DisplayRole) return {};
    const core::Encounter e = encounterAt(index.row());
    switch (index.column()) {
    case Date: return formatDay(e.date);
    case Time: return e.time ? toQString(core::formatTimeOfDay(*e.time)) : QString();
    case Winner: return toQString(e.winner);
    case Loser: return toQString(e.loser);
    case Outcome: return e.outcome == core::Outcome::Draw ? tr("draw") : tr("decided");
    case Behaviour: return toQString(e.behaviour);
    case Group: return toQString(e.group);
    case Observer: return toQString(e.observer);
    case Note: return toQString(e.note);
    case WinnerSupport: return toQString(core::joinSupporters(e.winnerSupport));
    case LoserSupport: return toQString(core::joinSupporters(e.loserSupport));
    default: return {};
    }
}

QVariant EncounterTableModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole) return {};
    switch (section) {
    case Date: return tr("Date");
    case Time: return tr("Time");
    case Winner: return tr("Winner");
    case Loser: return tr("Loser");
    case Outcome: return tr("Outcome");
    case Behaviour: return tr("Behaviour");
    case Group: return tr("Group");
    case Observer: return tr("Observer");
    case Note: return tr("Note");
    case WinnerSupport: return tr("Winner's supporters");
    case LoserSupport: return tr("Loser's supporters");
    default: return {};
    }
}

} // namespace hierloom::ui
