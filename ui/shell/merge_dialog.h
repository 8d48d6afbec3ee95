// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_merge.h"

#include <QDialog>

class QDialogButtonBox;
class QGroupBox;
class QLabel;
class QPlainTextEdit;
class QRadioButton;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// File > Merge Another Colony (issue 9): a dry run against the other file
/// first, its report (added, skipped, conflicts), a choice for conflicts
/// (keep ours, take theirs, or cancel), then the real merge, all or nothing.
/// Every step is a public call, so scripts and tests drive it without clicks.
class MergeDialog : public QDialog {
    Q_OBJECT
public:
    explicit MergeDialog(ColonyEditFacade* facade, QWidget* parent = nullptr);

    /// Dry-runs the merge of `otherPath` into the open colony and shows the
    /// report; false (with errorText()) when the other file cannot be read.
    bool check(const QString& otherPath);
    /// How conflicts are settled; None merges only when there are none.
    void setPreference(core::MergePreference preference);
    core::MergePreference preference() const;
    /// True when check() ran and the merge may be run (no conflicts left undecided).
    bool canMerge() const;
    /// Runs the merge for real; on success the document reloads, the undo
    /// history is cleared (the merge is not in it) and the dialog accepts.
    bool merge();

    const core::MergeReport& report() const { return report_; }
    QString reportText() const;
    QString errorText() const { return error_; }

    /// A person-readable account of a merge report.
    static QString describe(const core::MergeReport& report, bool dryRun);

private:
    void chooseFile();
    void showState();

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    QString otherPath_;
    core::MergeReport report_;
    bool checked_ = false;
    QString error_;
    QLabel* fileLabel_;
    QPlainTextEdit* text_;
    QGroupBox* conflictBox_;
    QRadioButton* none_;
    QRadioButton* ours_;
    QRadioButton* theirs_;
    QDialogButtonBox* buttons_;
};

} // namespace hierloom::ui
