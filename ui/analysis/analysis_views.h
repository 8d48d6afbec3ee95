// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
class QObject;
class QTabWidget;

namespace hierloom::ui {

class AnimalSelection;
class ColonyEditFacade;
class HierarchyPlotsView;
class MatrixView;
class PredictionView;
class RankTimelineView;
class SexRatioView;

/// The plot views of the main window and the selection that links them.
struct AnalysisViews {
    AnimalSelection* selection = nullptr;
    RankTimelineView* timeline = nullptr;
    PredictionView* prediction = nullptr;
    MatrixView* matrix = nullptr;
    HierarchyPlotsView* hierarchy = nullptr;
    SexRatioView* sexRatio = nullptr;
};

/// Creates the Timeline, Prediction, Matrix, Hierarchy and Sex Ratio tabs (in that
/// order, named by objectName "timeline", "prediction", "matrix", "hierarchy", "sex-ratio").
/// The Sex Ratio tab stores its species setting through `facade`.
AnalysisViews addAnalysisViews(QTabWidget* tabs, ColonyEditFacade* facade, QObject* owner);

} // namespace hierloom::ui
