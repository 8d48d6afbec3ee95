// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/analysis/analysis_views.h"
#include "ui/planning/colony_manager_views.h"

#include <QKeySequence>
#include <QString>

#include <functional>
#include <vector>

class QMainWindow;
class QWidget;

namespace hierloom::ui {

class AnimalView;
class ColonyDocument;
class ColonyEditFacade;
class EncounterEntryPanel;
class EncounterView;

/// The views the factories made, for the main window's accessors and tests.
struct ViewParts {
    AnimalView* animals = nullptr;
    EncounterView* encounters = nullptr;
    AnalysisViews analysis; ///< analysis.selection is made before the views
    EncounterEntryPanel* entry = nullptr;
    ColonyManagerViews manager; ///< the badge is added after the views
};

/// What a view's factory may use.
struct ViewContext {
    QMainWindow* window;
    ColonyDocument* document;
    ColonyEditFacade* facade;
    ViewParts& parts;
};

/// One tab of the main window. The registry order is the tab order, the View
/// menu order and the shortcut order (Ctrl+1 ... Ctrl+9, Ctrl+0, then Ctrl+K, Ctrl+D, Ctrl+G).
struct ViewEntry {
    const char* id;    ///< objectName and `hierloom --view NAME`
    const char* title; ///< menu text with its mnemonic; translated in the "hierloom::ui::ViewRegistry" context
    Qt::Key key;       ///< pressed with Ctrl to show the view
    std::function<QWidget*(const ViewContext&)> create;
};

/// Every view, in tab order: animals, encounters, timeline, prediction, matrix,
/// hierarchy, sex-ratio, entry, planner, stability, support, health, overview.
const std::vector<ViewEntry>& viewRegistry();

/// The translated title; without the mnemonic '&' for tab labels.
QString viewTitle(const ViewEntry& view, bool withMnemonic);

/// Ctrl + the entry's key.
QKeySequence viewShortcut(const ViewEntry& view);

/// The ids joined for help texts: "animals, encounters, ... or stability".
QString viewIdList();

} // namespace hierloom::ui
