// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/centre_overview_model.h"

#include "ui/document/qt_convert.h"
#include "ui/widgets/caution_label.h"

#include <QColor>
#include <QStringList>

#include <climits>

namespace hierloom::ui {

OverviewState overviewState(const core::GroupOverview& row)
{
    if (!row.watched) return OverviewState::NotWatched;
    return row.alerts.empty() ? OverviewState::Calm : OverviewState::Alert;
}

QString overviewStateName(OverviewState state)
{
    switch (state) {
    case OverviewState::NotWatched: return CentreOverviewModel::tr("no encounters");
    case OverviewState::Calm: return CentreOverviewModel::tr("calm");
    case OverviewState::Alert: return CentreOverviewModel::tr("alert");
    }
    return {};
}

QString overviewSignalName(core::StabilitySignal signal)
{
    switch (signal) {
    case core::StabilitySignal::CounterDominance: return CentreOverviewModel::tr("Counter-dominance");
    case core::StabilitySignal::RankChanges: return CentreOverviewModel::tr("Rank changes");
    case core::StabilitySignal::SevereAggression: return CentreOverviewModel::tr("Severe aggression");
    }
    return {};
}

CentreOverviewModel::CentreOverviewModel(QObject* parent) : QAbstractTableModel(parent) {}

void CentreOverviewModel::reset(std::optional<core::Day> day)
{
    beginResetModel();
    rows_.clear();
    day_ = day;
    endResetModel();
}

void CentreOverviewModel::append(std::vector<OverviewRow> rows)
{
    if (rows.empty()) return;
    const int first = static_cast<int>(rows_.size());
    beginInsertRows({}, first, first + static_cast<int>(rows.size()) - 1);
    for (OverviewRow& r : rows) rows_.push_back(std::move(r));
    endInsertRows();
}

int CentreOverviewModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : static_cast<int>(rows_.size());
}

int CentreOverviewModel::columnCount(const QModelIndex& parent) const { return parent.isValid() ? 0 : ColumnCount; }

QString CentreOverviewModel::stateToolTip(const core::GroupOverview& row) const
{
    const QString day = day_ ? formatDay(*day_) : QString();
    switch (overviewState(row)) {
    case OverviewState::NotWatched: return tr("No encounters of this group up to %1: there is nothing to watch.").arg(day);
    case OverviewState::Calm:
        return tr("The monthly stability watch raised no alert in the group's last month up to %1.").arg(day);
    case OverviewState::Alert:
        return tr("The monthly stability watch raised %n alert(s) in the group's last month up to %1; "
                  "the Alerts column says which.",
                  nullptr, static_cast<int>(row.alerts.size()))
            .arg(day);
    }
    return {};
}

QString CentreOverviewModel::alertsToolTip(const core::GroupOverview& row) const
{
    if (row.alerts.empty()) return {};
    QStringList lines;
    for (size_t i = 0; i < row.alerts.size(); ++i)
        lines << QStringLiteral("%1: %2").arg(overviewSignalName(row.alerts[i]),
                                             i < row.evidence.size() ? toQString(row.evidence[i]) : QString());
    lines << tr("The Stability view shows the evidence period by period.");
    lines << planningCaution();
    return lines.join(QStringLiteral("\n\n"));
}

QVariant CentreOverviewModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() >= rowCount()) return {};
    const OverviewRow& r = rows_[static_cast<size_t>(index.row())];
    const core::GroupOverview& g = r.overview;
    const OverviewState state = overviewState(g);
    if (role == Qt::DisplayRole) {
        switch (index.column()) {
        case Group: return r.group;
        case Animals: return g.composition.animals;
        case AdultFemales: return g.composition.adultFemales;
        case Matrilines: return g.composition.matrilines;
        case LastEncounter: return g.lastEncounter ? formatDay(*g.lastEncounter) : QString();
        case Recent: return g.recentEncounters;
        case Stability: return overviewStateName(state);
        case Alerts: {
            QStringList names;
            for (core::StabilitySignal s : g.alerts) names << overviewSignalName(s);
            return names.join(QStringLiteral(", "));
        }
        }
    }
    if (role == SortRole) {
        switch (index.column()) {
        case Group: return r.group;
        case Animals: return g.composition.animals;
        case AdultFemales: return g.composition.adultFemales;
        case Matrilines: return g.composition.matrilines;
        case LastEncounter: return g.lastEncounter ? static_cast<int>(*g.lastEncounter) : INT_MIN;
        case Recent: return g.recentEncounters;
        case Stability: return static_cast<int>(state);
        case Alerts: return static_cast<int>(g.alerts.size());
        }
    }
    if (role == Qt::ToolTipRole) {
        if (index.column() == Stability) return stateToolTip(g);
        if (index.column() == Alerts) return alertsToolTip(g);
        if (index.column() == Group) return tr("Enter or double-click: this group in the Hierarchy view");
    }
    if (role == Qt::TextAlignmentRole && index.column() >= Animals && index.column() <= Recent
        && index.column() != LastEncounter)
        return static_cast<int>(Qt::AlignRight | Qt::AlignVCenter);
    // An alert reads in light and dark palettes alike: both colours are set.
    if (state == OverviewState::Alert && (index.column() == Stability || index.column() == Alerts)) {
        if (role == Qt::BackgroundRole) return QColor(0xfd, 0xe2, 0xdc);
        if (role == Qt::ForegroundRole) return QColor(0x7a, 0x00, 0x00);
    }
    return {};
}

QVariant CentreOverviewModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal) return QAbstractTableModel::headerData(section, orientation, role);
    if (role == Qt::DisplayRole) {
        switch (section) {
        case Group: return tr("Group");
        case Animals: return tr("Animals");
        case AdultFemales: return tr("Adult females");
        case Matrilines: return tr("Matrilines");
        case LastEncounter: return tr("Last encounter");
        case Recent: return tr("Encounters, 30 days");
        case Stability: return tr("Stability");
        case Alerts: return tr("Alerts");
        }
    }
    // A first click sorts names and dates from the start (the longest unobserved
    // group first), counts, states and alerts with the most first.
    if (role == Qt::InitialSortOrderRole)
        return static_cast<int>(section == Group || section == LastEncounter ? Qt::AscendingOrder : Qt::DescendingOrder);
    if (role == Qt::ToolTipRole) {
        switch (section) {
        case Animals: return tr("Animals resident in the group on the day");
        case AdultFemales: return tr("Resident females at or past the maturity age on the day");
        case Matrilines: return tr("Distinct matrilines among the resident females");
        case LastEncounter: return tr("The group's last encounter up to the day");
        case Recent: return tr("The group's encounters in the 30 days ending on the day, draws included");
        case Stability: return tr("The monthly stability watch in the group's last month up to the day");
        case Alerts: return tr("The alerts of that month; the tooltip of a row gives the evidence");
        }
    }
    return {};
}

} // namespace hierloom::ui
