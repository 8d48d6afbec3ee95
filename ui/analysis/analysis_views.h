// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::ui {

class AnimalSelection;
class ColonyEditFacade;
class HierarchyPlotsView;
class MatrixView;
class PredictionView;
class RankTimelineView;
class SexRatioView;
class SupportView;

/// The plot views of the main window and the selection that links them
/// (made by ui/shell/view_registry.h).
struct AnalysisViews {
    AnimalSelection* selection = nullptr;
    RankTimelineView* timeline = nullptr;
    PredictionView* prediction = nullptr;
    MatrixView* matrix = nullptr;
    HierarchyPlotsView* hierarchy = nullptr;
    SexRatioView* sexRatio = nullptr;
    SupportView* support = nullptr;
};

} // namespace hierloom::ui
