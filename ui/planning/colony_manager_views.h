// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
class QMainWindow;
class QMenu;
class QTabWidget;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;
class PlannerView;
class StabilityBadge;
class StabilityView;

/// The colony manager's tabs and the status-bar alert.
struct ColonyManagerViews {
    PlannerView* planner = nullptr;
    StabilityView* stability = nullptr;
    StabilityBadge* badge = nullptr;
};

/// Adds the Planner and Stability tabs (objectName "planner", "stability") and
/// the stability badge to the window's status bar (a click shows the Stability tab).
ColonyManagerViews addColonyManagerViews(QMainWindow* window, QTabWidget* tabs, ColonyEditFacade* facade);

/// Adds "Print Hierarchy Report..." and "Save Hierarchy Report as PDF..." to a menu.
void addReportActions(QMenu* menu, QMainWindow* window, ColonyDocument* document);

} // namespace hierloom::ui
