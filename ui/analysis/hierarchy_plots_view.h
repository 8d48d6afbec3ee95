// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/hierarchy_series.h"

#include <QWidget>

#include <array>

class QCPAbstractPlottable;
class QComboBox;
class QCustomPlot;

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;
class ProgressStrip;

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

public slots:
    void recompute();

private:
    void adopt(core::HierarchySeries series);
    void refillGroups();

    ColonyDocument* document_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QCustomPlot* plot_;
    QComboBox* group_;
    core::HierarchySeries series_;
    std::array<QCPAbstractPlottable*, PanelCount> plottables_{};
};

} // namespace hierloom::ui
