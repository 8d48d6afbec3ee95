// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/colony_manager_views.h"

#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/planning/planner_view.h"
#include "ui/planning/report_dialog.h"
#include "ui/planning/stability_badge.h"
#include "ui/planning/stability_view.h"

#include <QMainWindow>
#include <QMenu>
#include <QStatusBar>
#include <QTabWidget>

namespace hierloom::ui {

ColonyManagerViews addColonyManagerViews(QMainWindow* window, QTabWidget* tabs, ColonyEditFacade* facade)
{
    ColonyManagerViews v;
    v.planner = new PlannerView(facade, window);
    v.stability = new StabilityView(facade, window);
    tabs->addTab(v.planner, QObject::tr("Planner"));
    tabs->addTab(v.stability, QObject::tr("Stability"));
    v.badge = new StabilityBadge(facade->document(), window);
    window->statusBar()->addPermanentWidget(v.badge);
    QObject::connect(v.badge, &QToolButton::clicked, tabs, [tabs, v] { tabs->setCurrentWidget(v.stability); });
    return v;
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
