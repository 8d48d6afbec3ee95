// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/report_dialog.h"

#include "core/pedigree/inheritance_prediction.h"
#include "core/store/stability_settings.h"
#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_queries.h"
#include "ui/planning/stability_view.h"

#include <QComboBox>
#include <QDateEdit>
#include <QDialogButtonBox>
#include <QFileDialog>
#include <QFileInfo>
#include <QFormLayout>
#include <QMessageBox>
#include <QPrintDialog>
#include <QPrinter>
#include <QVBoxLayout>

namespace hierloom::ui {

report::HierarchyReportOptions documentReportOptions(ColonyDocument* document, const std::string& group,
                                                     std::optional<core::Day> at)
{
    report::HierarchyReportOptions o;
    o.group = group;
    o.at = at;
    o.colonyName = toStdString(QFileInfo(document->path()).fileName());
    const core::AnalysisSettings settings = documentAnalysisSettings(document);
    o.elo = settings.elo;
    o.startRule = settings.startRule;
    o.maturityYears = settings.maturityYears;
    if (const core::ColonyStore* store = document->store()) {
        o.thresholds = core::readStabilityThresholds(*store);
        o.severity = core::behaviourSeverities(*store);
    }
    return o;
}

ReportDialog::ReportDialog(ColonyDocument* document, QWidget* parent)
    : QDialog(parent), document_(document), group_(new QComboBox(this)), date_(new QDateEdit(this))
{
    setWindowTitle(tr("Hierarchy Report"));
    group_->addItems(groupsWithEncounters(document));
    date_->setCalendarPopup(true);
    date_->setDisplayFormat(QStringLiteral("yyyy-MM-dd"));
    if (const auto last = document->lastEncounterDay()) date_->setDate(toQDate(*last));
    auto* form = new QFormLayout;
    form->addRow(tr("Group:"), group_);
    form->addRow(tr("At:"), date_);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(buttons);
}

report::HierarchyReportOptions ReportDialog::options() const
{
    return documentReportOptions(document_, toStdString(group_->currentText()), toDay(date_->date()));
}

void runReportDialog(QWidget* parent, ColonyDocument* document, ReportTarget target)
{
    if (!document->isOpen()) return;
    ReportDialog dialog(document, parent);
    if (dialog.exec() != QDialog::Accepted) return;
    const report::HierarchyReportOptions o = dialog.options();
    // A large file not read whole: the report needs every encounter (progress in the status bar).
    document->readEverything();
    document->finishLoading();
    try {
        if (target == ReportTarget::Pdf) {
            QString path = QFileDialog::getSaveFileName(parent, QObject::tr("Save Hierarchy Report"),
                                                        QStringLiteral("hierarchy-report.pdf"), QObject::tr("PDF (*.pdf)"));
            if (path.isEmpty()) return;
            if (QFileInfo(path).suffix().isEmpty()) path += QStringLiteral(".pdf");
            report::writeHierarchyReportPdf(path, document->encounters().compact(), document->pedigree(), o);
        } else {
            QPrinter printer;
            QPrintDialog print(&printer, parent);
            if (print.exec() != QDialog::Accepted) return;
            report::paintHierarchyReport(printer, document->encounters().compact(), document->pedigree(), o);
        }
    } catch (const std::exception& e) {
        QMessageBox::warning(parent, QObject::tr("Cannot Make the Report"), toQString(e.what()));
    }
}

} // namespace hierloom::ui
