// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/planning/stability_watch.h"

#include <QWidget>

class QComboBox;
class QCustomPlot;
class QLabel;
class QPlainTextEdit;
class QPushButton;
class QTreeWidget;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// The options of the stability watch of one group with the thresholds and
/// behaviour severities stored in the open document's file.
core::StabilityOptions documentStabilityOptions(const ColonyDocument* document, const std::string& group,
                                                core::PeriodLength length);
/// The stability watch of one group (core/planning/stability_watch.h) computed for the open document.
core::StabilitySeries documentStability(const ColonyDocument* document, const std::string& group, core::PeriodLength length);

/// The Stability tab: the weekly or monthly series plotted, the alerts with
/// their evidence, a banner when the latest period alerts, and the thresholds.
class StabilityView : public QWidget {
    Q_OBJECT
public:
    explicit StabilityView(ColonyEditFacade* facade, QWidget* parent = nullptr);

    const core::StabilitySeries& series() const { return series_; }
    void setGroup(const QString& group);
    void setPeriodLength(core::PeriodLength length);
    /// Opens the thresholds dialog and stores what is accepted in the colony file.
    void editThresholds();
    /// Stores thresholds in the colony file through the edit facade (what the dialog does on OK);
    /// the view and the badge follow the document's change signal.
    void applyThresholds(const core::StabilityThresholds& thresholds);

    QCustomPlot* plot() const { return plot_; }
    QTreeWidget* alertList() const { return alerts_; }
    QLabel* banner() const { return banner_; }

private:
    void refreshGroups();
    void recompute();
    void showEvidence();

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    QComboBox* group_;
    QComboBox* length_;
    QPushButton* thresholdsButton_;
    QLabel* banner_;
    QCustomPlot* plot_;
    QTreeWidget* alerts_;
    QPlainTextEdit* evidence_;
    core::StabilitySeries series_;
};

} // namespace hierloom::ui
