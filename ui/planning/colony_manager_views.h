// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
class QMainWindow;
class QMenu;
class QTabWidget;

namespace hierloom::ui {

class CentreOverviewView;
class ColonyDocument;
class ColonyEditFacade;
class PlannerView;
class StabilityBadge;
class StabilityView;

/// The colony manager's tabs (planner, stability, centre overview) (made by ui/shell/view_registry.h) and the status-bar alert.
struct ColonyManagerViews {
    PlannerView* planner = nullptr;
    StabilityView* stability = nullptr;
    StabilityBadge* badge = nullptr;
    CentreOverviewView* overview = nullptr;
};

/// Adds the stability badge to the window's status bar (a click shows the
/// Stability tab of `views`, which must exist) and sets views.badge.
void addStabilityBadge(QMainWindow* window, QTabWidget* tabs, ColonyDocument* document, ColonyManagerViews& views);

/// Adds "Print Hierarchy Report..." and "Save Hierarchy Report as PDF..." to a menu.
void addReportActions(QMenu* menu, QMainWindow* window, ColonyDocument* document);

} // namespace hierloom::ui
