// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/planning/centre_overview.h"

#include <QAbstractTableModel>
#include <QString>

#include <optional>
#include <vector>

namespace hierloom::ui {

/// One group's row of the centre overview.
struct OverviewRow {
    QString group;
    core::GroupOverview overview;
};

/// How a group's stability watch stands on the overview's day.
enum class OverviewState { NotWatched, Calm, Alert };
OverviewState overviewState(const core::GroupOverview& row);
/// "calm", "alert", "no encounters" (translated).
QString overviewStateName(OverviewState state);
/// The signal's name on screen ("Counter-dominance"; translated).
QString overviewSignalName(core::StabilitySignal signal);

/// The rows of the centre overview (core/planning/centre_overview.h) as a
/// table: group, animals, adult females, matrilines, last encounter,
/// encounters in the last 30 days, stability state and alerts. Rows are added
/// as they are read; SortRole gives each column's value to sort by (numbers
/// and days, not their text).
class CentreOverviewModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column { Group, Animals, AdultFemales, Matrilines, LastEncounter, Recent, Stability, Alerts, ColumnCount };
    static constexpr int SortRole = Qt::UserRole;

    explicit CentreOverviewModel(QObject* parent = nullptr);

    /// Empties the table for an overview on `day` (none: not known yet).
    void reset(std::optional<core::Day> day);
    void setDay(std::optional<core::Day> day) { day_ = day; }
    std::optional<core::Day> day() const { return day_; }
    void append(std::vector<OverviewRow> rows);
    const OverviewRow& row(int i) const { return rows_.at(static_cast<size_t>(i)); }
    const std::vector<OverviewRow>& rows() const { return rows_; }

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role) const override;

private:
    QString alertsToolTip(const core::GroupOverview& row) const;
    QString stateToolTip(const core::GroupOverview& row) const;

    std::vector<OverviewRow> rows_;
    std::optional<core::Day> day_;
};

} // namespace hierloom::ui
