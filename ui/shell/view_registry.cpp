// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/view_registry.h"

#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/prediction_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/analysis/sex_ratio_view.h"
#include "ui/analysis/support_view.h"
#include "ui/entry/encounter_entry_panel.h"
#include "ui/planning/centre_overview_view.h"
#include "ui/planning/health_view.h"
#include "ui/planning/planner_view.h"
#include "ui/planning/stability_view.h"
#include "ui/records/animal_view.h"
#include "ui/records/encounter_view.h"

#include <QCoreApplication>
#include <QMainWindow>

namespace hierloom::ui {

const std::vector<ViewEntry>& viewRegistry()
{
    // Adding a view: one entry here; the tab, the View menu, its shortcut,
    // `--view` and the help's shortcut sheet follow from it.
    static const std::vector<ViewEntry> views = {
        {"animals", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Animals"), Qt::Key_1,
         [](const ViewContext& c) { return c.parts.animals = new AnimalView(c.document, c.window); }},
        {"encounters", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Encounters"), Qt::Key_2,
         [](const ViewContext& c) { return c.parts.encounters = new EncounterView(c.document, c.window); }},
        {"timeline", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Timeline"), Qt::Key_3,
         [](const ViewContext& c) {
             return c.parts.analysis.timeline = new RankTimelineView(c.document, c.parts.analysis.selection, c.window);
         }},
        {"prediction", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Prediction"), Qt::Key_4,
         [](const ViewContext& c) {
             return c.parts.analysis.prediction = new PredictionView(c.document, c.parts.analysis.selection, c.window);
         }},
        {"matrix", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Matrix"), Qt::Key_5,
         [](const ViewContext& c) { return c.parts.analysis.matrix = new MatrixView(c.document, c.window); }},
        {"hierarchy", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Hierarchy"), Qt::Key_6,
         [](const ViewContext& c) { return c.parts.analysis.hierarchy = new HierarchyPlotsView(c.document, c.window); }},
        {"sex-ratio", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "Se&x Ratio"), Qt::Key_7,
         [](const ViewContext& c) { return c.parts.analysis.sexRatio = new SexRatioView(c.facade, c.window); }},
        {"entry", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "Evening E&ntry"), Qt::Key_8,
         [](const ViewContext& c) { return c.parts.entry = new EncounterEntryPanel(c.facade, c.window); }},
        {"planner", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "P&lanner"), Qt::Key_9,
         [](const ViewContext& c) { return c.parts.manager.planner = new PlannerView(c.facade, c.window); }},
        {"stability", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Stability"), Qt::Key_0,
         [](const ViewContext& c) { return c.parts.manager.stability = new StabilityView(c.facade, c.window); }},
        // Ctrl+1 ... Ctrl+0 are taken: kin support takes Ctrl+K.
        {"support", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "Supp&ort"), Qt::Key_K,
         [](const ViewContext& c) { return c.parts.analysis.support = new SupportView(c.document, c.window); }},
        {"health", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Data Health"), Qt::Key_D,
         [](const ViewContext& c) { return new HealthView(c.document, c.window); }},
        // Every group of a centre in one table; Ctrl+G for "groups".
        {"overview", QT_TRANSLATE_NOOP("hierloom::ui::ViewRegistry", "&Centre Overview"), Qt::Key_G,
         [](const ViewContext& c) { return c.parts.manager.overview = new CentreOverviewView(c.document, c.window); }},
    };
    return views;
}

QString viewTitle(const ViewEntry& view, bool withMnemonic)
{
    QString title = QCoreApplication::translate("hierloom::ui::ViewRegistry", view.title);
    if (!withMnemonic) title.remove(QLatin1Char('&'));
    return title;
}

QKeySequence viewShortcut(const ViewEntry& view) { return QKeySequence(Qt::CTRL | view.key); }

QString viewIdList()
{
    const std::vector<ViewEntry>& views = viewRegistry();
    QString out;
    for (size_t i = 0; i < views.size(); ++i) {
        if (i > 0) out += i + 1 == views.size() ? QStringLiteral(" or ") : QStringLiteral(", ");
        out += QString::fromLatin1(views[i].id);
    }
    return out;
}

} // namespace hierloom::ui
