// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/ranks/rank_method_registry.h"
#include "core/ranks/rank_table.h"
#include "core/ranks/win_matrix.h"
#include "ui/widgets/matriline_palette.h"

#include <QStringList>
#include <QWidget>

#include <optional>
#include <string>
#include <vector>

class QCPColorMap;
class QCPGraph;
class QCPItemText;
class QComboBox;
class QCustomPlot;
class QDateEdit;
class QLabel;
class QMouseEvent;

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;
class ProgressStrip;
class RankFlagWatch;

/// The win matrix of a window (rows winners, columns losers) with the animals
/// in the order of a rank method (core::orderByMethod, any method of the
/// registry, with the colony's analysis settings) or by id, cells shaded by count, wins against that order (below the
/// diagonal) marked, lines between consecutive animals of different
/// matrilines, a colour strip per matriline and the row (won) and column
/// (lost) totals.
class MatrixView : public QWidget {
    Q_OBJECT
public:
    explicit MatrixView(ColonyDocument* document, QWidget* parent = nullptr);
    ~MatrixView() override;

    QCustomPlot* plot() const { return plot_; }
    ComputeRunner* runner() const { return runner_; }

    /// Orders by a rank method, or by animal id when empty.
    void setMethod(std::optional<core::RankMethod> method);
    /// The order choices offered, as codes: the rank method registry's, then "id".
    QStringList orderCodes() const;
    /// Inclusive window; an empty end means the record's first or last day.
    void setWindow(std::optional<core::Day> from, std::optional<core::Day> to);
    void setGroup(const QString& group);

    /// Animal ids in the displayed order, top row first.
    QStringList order() const;
    /// The displayed matrix: s(i, j) = wins of order()[i] over order()[j].
    const core::WinMatrix& matrix() const { return matrix_; }
    /// Cells below the diagonal with a win, each marked.
    int markedCount() const;
    /// Matriline boundaries drawn (between consecutive rows).
    int boundaryCount() const { return boundaries_; }
    /// The hover text of a cell: both animals' full names and ids, both counts.
    QString describeCell(int row, int column) const;
    /// The hover text of a row or column label: the animal's full name and id,
    /// its encounters in the window and, when flagged, the data-health flag.
    QString describeAnimal(int index) const;
    /// The data-health flags of the window's animals (docs/methods.md, "Data health").
    RankFlagWatch* flags() const { return flags_; }
    /// The legend line of the flag under the matrix.
    QLabel* flagLegend() const { return flagLegend_; }
    /// Names shown on the left (row) axis after thinning: every k-th animal
    /// when the rows are too close for every name. The right axis shows the
    /// same rows' totals won, the bottom axis the columns' totals lost.
    QStringList rowLabels() const;
    /// The same for the top (column) axis.
    QStringList columnLabels() const;
    /// The method box (its items are drawn as plain text: "I&SI").
    QComboBox* methodBox() const { return methodBox_; }
    /// Shows the whole matrix (after zooming in).
    void fitAll();
    /// Zooms around the matrix's centre (factor < 1 zooms in).
    void zoomBy(double factor);

public slots:
    void recompute();

private:
    struct Result {
        std::vector<std::string> ids;
        std::vector<std::string> names;
        std::vector<std::string> matriarchs;
        core::WinMatrix matrix;
        MatrilinePalette palette;
        std::optional<core::Day> firstDay, lastDay;
    };
    void adopt(Result result);
    void rebuildPlot();
    void hover(QMouseEvent* event);
    /// Labels and totals as many as the rows' and columns' pixel sizes allow.
    void relabel();
    /// An animal's full name and id.
    QString animalName(int index) const;

    ColonyDocument* document_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QCustomPlot* plot_;
    QComboBox* methodBox_;
    QComboBox* groupBox_;
    QDateEdit* fromEdit_;
    QDateEdit* toEdit_;
    QLabel* summary_;
    QLabel* flagLegend_;
    RankFlagWatch* flags_;

    std::optional<core::RankMethod> method_ = core::kDefaultMatrixOrder; ///< empty: by animal id
    std::optional<core::Day> from_, to_;
    QString group_;
    std::vector<std::string> ids_, names_, matriarchs_;
    core::WinMatrix matrix_;
    MatrilinePalette palette_;
    QCPGraph* marks_ = nullptr;
    int boundaries_ = 0;
    QStringList rowTotals_, columnTotals_; ///< wins per row, losses per column, as shown
    QList<QCPItemText*> cellCounts_;
    int rowStep_ = 1, columnStep_ = 1; ///< every k-th label shown
};

} // namespace hierloom::ui
