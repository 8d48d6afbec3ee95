// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "report/hierarchy_report.h"

#include <QDialog>

class QComboBox;
class QDateEdit;
class QWidget;

namespace hierloom::ui {

class ColonyDocument;

/// Where a hierarchy report goes.
enum class ReportTarget { Printer, Pdf };

/// Asks for the group and date of a hierarchy report.
class ReportDialog : public QDialog {
    Q_OBJECT
public:
    ReportDialog(ColonyDocument* document, QWidget* parent = nullptr);
    /// The report options for the chosen group and date, with the colony file's thresholds.
    report::HierarchyReportOptions options() const;

private:
    ColonyDocument* document_;
    QComboBox* group_;
    QDateEdit* date_;
};

/// The hierarchy report options for a document (thresholds and severities from its file).
report::HierarchyReportOptions documentReportOptions(ColonyDocument* document, const std::string& group,
                                                     std::optional<core::Day> at);

/// Asks for group and date, then prints the report or saves it as a PDF; errors are shown in a message box.
void runReportDialog(QWidget* parent, ColonyDocument* document, ReportTarget target);

} // namespace hierloom::ui
