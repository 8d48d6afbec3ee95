// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/merge_dialog.h"

#include "core/store/colony_store.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"

#include <QApplication>
#include <QDialogButtonBox>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QRadioButton>
#include <QScopeGuard>
#include <QUndoStack>
#include <QVBoxLayout>

namespace hierloom::ui {

MergeDialog::MergeDialog(ColonyEditFacade* facade, QWidget* parent)
    : QDialog(parent),
      facade_(facade),
      document_(facade->document()),
      fileLabel_(new QLabel(tr("No file chosen"), this)),
      text_(new QPlainTextEdit(this)),
      conflictBox_(new QGroupBox(tr("Records edited differently in the two files"), this)),
      none_(new QRadioButton(tr("&Decide nothing: do not merge"), conflictBox_)),
      ours_(new QRadioButton(tr("Keep &this colony's version"), conflictBox_)),
      theirs_(new QRadioButton(tr("Take the &other file's version"), conflictBox_)),
      buttons_(new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this))
{
    setWindowTitle(tr("Merge Another Colony"));
    text_->setReadOnly(true);
    none_->setChecked(true);
    auto* choose = new QPushButton(tr("&Choose File..."), this);
    connect(choose, &QPushButton::clicked, this, &MergeDialog::chooseFile);
    auto* fileRow = new QHBoxLayout;
    fileRow->addWidget(fileLabel_, 1);
    fileRow->addWidget(choose);
    auto* conflictLayout = new QVBoxLayout(conflictBox_);
    for (QRadioButton* b : {none_, ours_, theirs_}) {
        conflictLayout->addWidget(b);
        connect(b, &QRadioButton::toggled, this, &MergeDialog::showState);
    }
    buttons_->button(QDialogButtonBox::Ok)->setText(tr("&Merge"));
    connect(buttons_, &QDialogButtonBox::accepted, this, &MergeDialog::merge);
    connect(buttons_, &QDialogButtonBox::rejected, this, &QDialog::reject);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(fileRow);
    layout->addWidget(text_, 1);
    layout->addWidget(conflictBox_);
    layout->addWidget(buttons_);
    resize(640, 480);
    showState();
}

void MergeDialog::chooseFile()
{
    const QString path = QFileDialog::getOpenFileName(this, tr("Merge Another Colony"),
                                                      QFileInfo(document_->path()).absolutePath(),
                                                      tr("Hierloom colonies (*.hierloom);;All files (*)"));
    if (!path.isEmpty()) check(path);
}

bool MergeDialog::check(const QString& otherPath)
{
    otherPath_ = otherPath;
    checked_ = false;
    error_.clear();
    report_ = core::MergeReport{};
    fileLabel_->setText(QDir::toNativeSeparators(otherPath));
    if (!document_->isOpen() || document_->isReadOnly()) {
        error_ = tr("Open a colony for writing first.");
    } else if (QFileInfo(otherPath).canonicalFilePath() == QFileInfo(document_->path()).canonicalFilePath()) {
        error_ = tr("This is the colony already open; choose another file.");
    } else {
        QApplication::setOverrideCursor(Qt::WaitCursor);
        const auto restoreCursor = qScopeGuard([] { QApplication::restoreOverrideCursor(); });
        try {
            report_ = facade_->checkMerge(otherPath);
            checked_ = true;
        } catch (const std::exception& e) {
            error_ = QString::fromUtf8(e.what());
        }
    }
    showState();
    return checked_;
}

void MergeDialog::setPreference(core::MergePreference preference)
{
    (preference == core::MergePreference::Ours ? ours_ : preference == core::MergePreference::Theirs ? theirs_ : none_)
        ->setChecked(true);
}

core::MergePreference MergeDialog::preference() const
{
    if (ours_->isChecked()) return core::MergePreference::Ours;
    if (theirs_->isChecked()) return core::MergePreference::Theirs;
    return core::MergePreference::None;
}

bool MergeDialog::canMerge() const
{
    return checked_ && report_.problems.empty() &&
           (report_.conflicts.empty() || preference() != core::MergePreference::None);
}

bool MergeDialog::merge()
{
    if (!canMerge()) return false;
    error_.clear();
    core::MergeReport done;
    try {
        QApplication::setOverrideCursor(Qt::WaitCursor);
        const auto restoreCursor = qScopeGuard([] { QApplication::restoreOverrideCursor(); });
        done = facade_->merge(otherPath_, preference());
    } catch (const std::exception& e) {
        error_ = QString::fromUtf8(e.what());
        showState();
        return false;
    }
    report_ = std::move(done);
    if (!report_.written) {
        // The other file changed since the dry run: show what stops it now.
        showState();
        return false;
    }
    // The facade re-read the records and cleared the undo history, saying why.
    text_->setPlainText(describe(report_, false));
    accept();
    return true;
}

QString MergeDialog::reportText() const { return text_->toPlainText(); }

QString MergeDialog::describe(const core::MergeReport& report, bool dryRun)
{
    QStringList lines;
    lines << (dryRun ? tr("Merging would add:") : tr("Added:"));
    lines << tr("  %n animal(s)", nullptr, static_cast<int>(report.addedAnimals.size()))
          << tr("  %n stay(s) in groups", nullptr, static_cast<int>(report.addedResidences.size()))
          << tr("  %n encounter(s)", nullptr, static_cast<int>(report.addedEncounters.size()));
    lines << tr("Already here, skipped: %1 animals, %2 stays, %3 encounters")
                 .arg(report.skippedAnimals)
                 .arg(report.skippedResidences)
                 .arg(report.skippedEncounters);
    for (const auto& a : report.addedAnimals) lines << tr("  + animal %1").arg(toQString(a.id));
    auto changes = [&lines](const QString& title, const std::vector<core::MergeChange>& list) {
        if (list.empty()) return;
        lines << QString() << title.arg(list.size());
        for (const core::MergeChange& c : list)
            lines << (c.detail.empty() ? QStringLiteral("  %1").arg(toQString(c.record))
                                       : QStringLiteral("  %1: %2").arg(toQString(c.record), toQString(c.detail)));
    };
    changes(dryRun ? tr("Edited only in the other file, would be taken (%1):") : tr("Edited only in the other file, taken (%1):"),
            report.updated);
    changes(dryRun ? tr("Deleted in the other file, would be deleted here (%1):")
                   : tr("Deleted in the other file, deleted here (%1):"),
            report.deleted);
    changes(tr("Deleted here, stay deleted (%1):"), report.keptDeleted);
    changes(tr("Recognised by their content under another uid (%1):"), report.matched);
    if (!report.conflicts.empty()) {
        lines << QString() << tr("Changed differently in both files since they parted (%n):", nullptr,
                                 static_cast<int>(report.conflicts.size()));
        for (const core::MergeConflict& c : report.conflicts) {
            lines << QStringLiteral("  %1 %2").arg(toQString(c.table), toQString(c.record));
            for (const core::FieldConflict& f : c.fields) {
                QString line = tr("    %1: here '%2', in the other file '%3'")
                                   .arg(toQString(f.field), toQString(f.ours), toQString(f.theirs));
                if (f.base) line += tr(", before '%1'").arg(toQString(*f.base));
                lines << line;
            }
        }
    }
    for (const std::string& t : report.takenFromOther) lines << tr("  taken from the other file: %1").arg(toQString(t));
    if (!report.problems.empty())
        lines << QString() << tr("Records that cannot be added:") << toQString(report.problems.text());
    if (!report.backup.empty())
        lines << QString() << tr("The colony was backed up first into %1").arg(QDir::toNativeSeparators(toQString(report.backup)));
    return lines.join(QLatin1Char('\n'));
}

void MergeDialog::showState()
{
    if (!error_.isEmpty())
        text_->setPlainText(error_);
    else if (checked_)
        text_->setPlainText(describe(report_, !report_.written));
    else
        text_->setPlainText(tr("Choose the other colony file; nothing is written until you press Merge."));
    conflictBox_->setVisible(checked_ && !report_.conflicts.empty());
    buttons_->button(QDialogButtonBox::Ok)->setEnabled(canMerge());
}

} // namespace hierloom::ui
