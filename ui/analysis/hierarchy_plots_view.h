// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/hierarchy_series.h"

#include <QWidget>

#include <array>

class QCPAbstractPlottable;
class QComboBox;
class QCustomPlot;
class QLabel;

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;
class ProgressStrip;
class RankFlagWatch;

/// The hierarchy month by month over the whole record, of every group or
/// of one, five panels sharing one date axis: h', steepness, t_tri, conformity with the inheritance
/// prediction and the number of encounters (core::computeHierarchySeries,
/// computed off the interface thread).
class HierarchyPlotsView : public QWidget {
    Q_OBJECT
public:
    enum Panel { HPrime, Steepness, TTri, Conformity, Encounters, PanelCount };

    explicit HierarchyPlotsView(ColonyDocument* document, QWidget* parent = nullptr);
    ~HierarchyPlotsView() override;

    QCustomPlot* plot() const { return plot_; }
    ComputeRunner* runner() const { return runner_; }
    const core::HierarchySeries& series() const { return series_; }
    /// The plottable of a panel (a graph, or bars for encounters).
    QCPAbstractPlottable* plottable(Panel panel) const { return plottables_[panel]; }
    /// Points in a panel's series (one per month; undefined months are gaps).
    int pointCount(Panel panel) const;
    /// Chooses the group ("" for all groups); unknown names are ignored.
    void setGroup(const QString& group);
    QComboBox* groupBox() const { return group_; }
    /// The data-health flags (docs/methods.md, "Data health") of the analysis
    /// settings' default window ending with the last month shown.
    RankFlagWatch* flags() const { return flags_; }
    /// The line under the panels naming each flagged animal.
    QLabel* flagLine() const { return flagLine_; }

public slots:
    void recompute();

private:
    void adopt(core::HierarchySeries series);
    void refillGroups();
    void showFlags();

    ColonyDocument* document_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QCustomPlot* plot_;
    QComboBox* group_;
    QLabel* flagLine_;
    RankFlagWatch* flags_;
    std::optional<core::Day> flagFrom_, flagTo_;
    core::HierarchySeries series_;
    std::array<QCPAbstractPlottable*, PanelCount> plottables_{};
};

} // namespace hierloom::ui
