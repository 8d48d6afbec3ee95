// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/planning/centre_overview_model.h"

#include <QWidget>

#include <array>
#include <memory>
#include <optional>

class QCPBars;
class QCustomPlot;
class QLabel;
class QLineEdit;
class QSortFilterProxyModel;
class QTableView;

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;
class ProgressStrip;

/// The Centre Overview tab: every group of the colony in one table (animals,
/// adult females, matrilines, last encounter, encounters in the last 30
/// days, stability state and alerts; core/planning/centre_overview.h) and one
/// picture (each group's encounters of the last 30 days as a bar coloured by
/// its stability state, in the table's order). The rows are read from the
/// file group by group on a worker thread through a connection of their own
/// (core/store/centre_overview_reader.h, the command line's `overview`), so
/// they appear as they are read and the window never waits. Enter or a
/// double-click on a row, or a click on a group's bar, emits groupChosen.
class CentreOverviewView : public QWidget {
    Q_OBJECT
public:
    explicit CentreOverviewView(ColonyDocument* document, QWidget* parent = nullptr);
    ~CentreOverviewView() override;

    QTableView* table() const { return table_; }
    QCustomPlot* plot() const { return plot_; }
    QLineEdit* dayField() const { return day_; }
    QLabel* caution() const { return caution_; }
    const CentreOverviewModel* model() const { return model_; }
    /// The group in the table's row `row` as shown (sorted).
    QString groupAt(int row) const;
    /// Reads the overview again from the file (also on every change while on screen).
    void recompute();
    /// Blocks until the reading started last has been shown (tests).
    void waitForRows();

signals:
    /// The person chose a group to look at in the group's views.
    void groupChosen(const QString& group);

private:
    struct Incoming;
    void takeRows();
    void finish();
    void replot();
    void showSummary();

    ColonyDocument* document_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QLineEdit* day_;
    QLabel* problem_;
    QLabel* summary_;
    QLabel* caution_;
    CentreOverviewModel* model_;
    QSortFilterProxyModel* sorted_;
    QTableView* table_;
    QCustomPlot* plot_;
    std::array<QCPBars*, 3> bars_{}; ///< by OverviewState
    QStringList plotted_;             ///< the groups of the plot's keys 0, 1, ...
    std::shared_ptr<Incoming> incoming_;
};

} // namespace hierloom::ui
