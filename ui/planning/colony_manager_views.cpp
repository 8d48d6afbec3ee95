// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/colony_manager_views.h"

#include "ui/document/colony_document.h"
#include "ui/planning/report_dialog.h"
#include "ui/planning/stability_badge.h"
#include "ui/planning/stability_view.h"

#include <QMainWindow>
#include <QMenu>
#include <QStatusBar>
#include <QTabWidget>

namespace hierloom::ui {

void addStabilityBadge(QMainWindow* window, QTabWidget* tabs, ColonyDocument* document, ColonyManagerViews& views)
{
    views.badge = new StabilityBadge(document, window);
    window->statusBar()->addPermanentWidget(views.badge);
    StabilityView* stability = views.stability;
    QObject::connect(views.badge, &QToolButton::clicked, tabs, [tabs, stability] { tabs->setCurrentWidget(stability); });
}

void addReportActions(QMenu* menu, QMainWindow* window, ColonyDocument* document)
{
    QAction* print = menu->addAction(QObject::tr("&Print Hierarchy Report..."), window,
                                     [window, document] { runReportDialog(window, document, ReportTarget::Printer); });
    print->setShortcut(QKeySequence::Print);
    QAction* pdf = menu->addAction(QObject::tr("Save Hierarchy Report as P&DF..."), window,
                                   [window, document] { runReportDialog(window, document, ReportTarget::Pdf); });
    auto enable = [document, print, pdf] {
        print->setEnabled(document->isOpen());
        pdf->setEnabled(document->isOpen());
    };
    QObject::connect(document, &ColonyDocument::changed, menu, enable);
    enable();
}

} // namespace hierloom::ui
