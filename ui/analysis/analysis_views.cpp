// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/analysis_views.h"

#include "ui/document/animal_selection.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/prediction_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/analysis/sex_ratio_view.h"

#include <QTabWidget>

namespace hierloom::ui {

AnalysisViews addAnalysisViews(QTabWidget* tabs, ColonyEditFacade* facade, QObject* owner)
{
    ColonyDocument* document = facade->document();
    AnalysisViews v;
    v.selection = new AnimalSelection(owner);
    v.timeline = new RankTimelineView(document, v.selection, tabs);
    v.prediction = new PredictionView(document, v.selection, tabs);
    v.matrix = new MatrixView(document, tabs);
    v.hierarchy = new HierarchyPlotsView(document, tabs);
    v.timeline->setObjectName(QStringLiteral("timeline"));
    v.prediction->setObjectName(QStringLiteral("prediction"));
    v.matrix->setObjectName(QStringLiteral("matrix"));
    v.hierarchy->setObjectName(QStringLiteral("hierarchy"));
    tabs->addTab(v.timeline, QObject::tr("Timeline"));
    tabs->addTab(v.prediction, QObject::tr("Prediction"));
    tabs->addTab(v.matrix, QObject::tr("Matrix"));
    tabs->addTab(v.hierarchy, QObject::tr("Hierarchy"));
    v.sexRatio = new SexRatioView(facade, tabs);
    tabs->addTab(v.sexRatio, QObject::tr("Sex Ratio"));
    return v;
}

} // namespace hierloom::ui
