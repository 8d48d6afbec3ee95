// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/stability_badge.h"

#include "ui/caution_label.h"
#include "ui/colony_document.h"
#include "ui/qt_convert.h"
#include "ui/stability_view.h"

namespace hierloom::ui {

StabilityBadge::StabilityBadge(ColonyDocument* document, QWidget* parent) : QToolButton(parent), document_(document)
{
    setObjectName(QStringLiteral("stabilityBadge"));
    setAutoRaise(true);
    setStyleSheet(QStringLiteral("QToolButton { color: white; background: #c00000; border-radius: 3px;"
                                 " padding: 1px 8px; font-weight: bold; }"));
    // A burst of edits (an evening's typing) re-checks the alerts once, after a pause.
    debounce_.setSingleShot(true);
    debounce_.setInterval(3000);
    connect(&debounce_, &QTimer::timeout, this, &StabilityBadge::refresh);
    connect(document_, &ColonyDocument::changed, this, [this] {
        if (document_->lastChange().kind == ColonyDocument::Change::Reset) refresh();
        else debounce_.start();
    });
    refresh();
}

void StabilityBadge::refresh()
{
    groups_.clear();
    QStringList evidence;
    if (document_->isOpen()) {
        for (const QString& g : groupsWithEncounters(document_)) {
            bool alerted = false;
            for (core::PeriodLength length : {core::PeriodLength::Week, core::PeriodLength::Month}) {
                const core::StabilitySeries s = documentStability(document_, toStdString(g), length);
                for (const core::StabilityAlert& a : s.latestAlerts()) {
                    alerted = true;
                    evidence << QStringLiteral("%1: %2").arg(g, toQString(core::describeAlert(s, a)));
                }
            }
            if (alerted) groups_ << g;
        }
    }
    setVisible(!groups_.isEmpty());
    setText(tr("Stability alert: %1").arg(groups_.join(QStringLiteral(", "))));
    setToolTip(evidence.join(QStringLiteral("\n\n")) + QStringLiteral("\n\n") + planningCaution());
}

} // namespace hierloom::ui
