// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/session_table.h"

#include "ui/document/qt_convert.h"

#include <QCoreApplication>
#include <QHeaderView>
#include <QPalette>
#include <QTableWidget>

namespace hierloom::ui {

namespace {
QString tr(const char* text) { return QCoreApplication::translate("hierloom::ui::SessionTable", text); }
} // namespace

void setUpSessionTable(QTableWidget* table)
{
    table->setColumnCount(9);
    table->setHorizontalHeaderLabels({tr("Line"), tr("Time"), tr("Winner"), tr("Loser"), tr("Outcome"),
                                      tr("Behaviour"), tr("Note"), tr("Entered"), tr("Supporters")});
    table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table->setSelectionBehavior(QAbstractItemView::SelectRows);
    table->verticalHeader()->hide();
    table->horizontalHeader()->setStretchLastSection(true);
    table->setAlternatingRowColors(true);
}

/// "winner's side: F2 · loser's side: D1", or empty without supporters.
static QString supportersText(const core::Encounter& e)
{
    QStringList parts;
    if (!e.winnerSupport.empty()) parts << tr("winner's side: %1").arg(toQString(core::joinSupporters(e.winnerSupport)));
    if (!e.loserSupport.empty()) parts << tr("loser's side: %1").arg(toQString(core::joinSupporters(e.loserSupport)));
    return parts.join(QStringLiteral(" · "));
}

QString idAndName(const std::string& id, const core::Colony& colony)
{
    const int i = colony.animalIndex(id);
    if (i < 0 || colony.animals[static_cast<size_t>(i)].name.empty()) return toQString(id);
    return toQString(id) + QLatin1Char(' ') + toQString(colony.animals[static_cast<size_t>(i)].name);
}

void fillSessionTable(QTableWidget* table, const std::vector<core::Encounter>& rows,
                      const std::set<std::string>& ours, const core::Colony& colony)
{
    table->setRowCount(static_cast<int>(rows.size()));
    const QBrush earlierText = table->palette().brush(QPalette::Disabled, QPalette::Text);
    for (int r = 0; r < static_cast<int>(rows.size()); ++r) {
        const core::Encounter& e = rows[static_cast<size_t>(r)];
        const bool earlier = !ours.count(e.uid);
        const QString who = e.observer.empty() ? tr("no observer") : toQString(e.observer);
        const QStringList cells{QString::number(r + 1),
                                e.time ? toQString(core::formatTimeOfDay(*e.time)) : QString(),
                                idAndName(e.winner, colony),
                                idAndName(e.loser, colony),
                                e.outcome == core::Outcome::Draw ? tr("draw") : tr("decided"),
                                toQString(e.behaviour),
                                toQString(e.note),
                                earlier ? tr("earlier (%1)").arg(who) : tr("this session"),
                                supportersText(e)};
        for (int c = 0; c < cells.size(); ++c) {
            auto* item = new QTableWidgetItem(cells[c]);
            item->setData(Qt::UserRole, toQString(e.uid));
            if (earlier) item->setForeground(earlierText);
            table->setItem(r, c, item);
        }
    }
    if (!rows.empty()) table->scrollToBottom();
}

} // namespace hierloom::ui
