// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/research/export_tables.h"
#include "core/research/support_analysis.h"

#include <QWidget>

class QComboBox;
class QLabel;
class QSpinBox;
class QTableWidget;

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;
class MatrilinePalette;
class ProgressStrip;
class RankFlagWatch;
class VisibleRefresh;

/// The Support tab (docs/methods.md "Kin support"): who joins whose fights.
/// The figures of the `support` command for a group, the per-pair table, the
/// support matrix ordered by rank with a matriline colour strip beside the
/// rows and above the columns, and the daughters' rise beside their mothers'
/// support. Recomputed when shown after a change (ui/document/visible_refresh.h),
/// on a worker thread (ui/document/compute_runner.h): until it ends the
/// tables are empty and a progress strip shows.
class SupportView : public QWidget {
    Q_OBJECT
public:
    explicit SupportView(ColonyDocument* document, QWidget* parent = nullptr);
    ~SupportView() override;

    /// Empty: every group.
    void setGroup(const QString& group);
    void setPermutations(int n);

    const core::SupportAnalysis& analysis() const { return analysis_; }
    QLabel* summary() const { return summary_; }
    QTableWidget* pairTable() const { return pairs_; }
    QTableWidget* matrixTable() const { return matrix_; }
    QTableWidget* daughterTable() const { return daughters_; }
    ComputeRunner* runner() const { return runner_; }
    ProgressStrip* progressStrip() const { return progress_; }
    /// The data-health flags of the group's whole record: the matrix's rank-ordered names carry the mark.
    RankFlagWatch* flags() const { return flags_; }

private:
    void refreshGroups();
    void recompute();
    struct Result;
    void adopt(const Result& result);
    void showMatrix(const core::ExportTable& table, const MatrilinePalette& palette);
    /// The matrix's row and column names, flagged ones with the mark.
    void markNames();

    ColonyDocument* document_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    RankFlagWatch* flags_;
    QComboBox* group_;
    QSpinBox* permutations_;
    QLabel* summary_;
    QLabel* flagLegend_;
    QTableWidget* pairs_;
    QTableWidget* matrix_;
    QTableWidget* daughters_;
    VisibleRefresh* refresh_;
    core::SupportAnalysis analysis_;
    bool loading_ = false;
};

} // namespace hierloom::ui
