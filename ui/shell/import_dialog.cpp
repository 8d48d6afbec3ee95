// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/import_dialog.h"

#include "core/store/colony_import.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/widgets/help_browser.h"
#include "ui/document/qt_convert.h"

#include <QDialogButtonBox>
#include <QFileDialog>
#include <QFileInfo>
#include <QGridLayout>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QVBoxLayout>

namespace hierloom::ui {

ImportDialog::ImportDialog(ColonyEditFacade* facade, QWidget* parent)
    : QDialog(parent), facade_(facade), document_(facade->document()), result_(new QLabel(this)), problems_(new QPlainTextEdit(this))
{
    setWindowTitle(tr("Import CSV Files"));
    auto* intro = new QLabel(tr("Choose the files to add to the colony. Each is optional; "
                                "the import is all or nothing: if any row is wrong, nothing is written."),
                             this);
    intro->setWordWrap(true);

    auto* grid = new QGridLayout;
    animals_ = addFileRow(grid, 0, tr("&Animals:"));
    residences_ = addFileRow(grid, 1, tr("&Residences:"));
    encounters_ = addFileRow(grid, 2, tr("&Encounters:"));

    result_->setWordWrap(true);
    result_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    problems_->setReadOnly(true);
    problems_->setLineWrapMode(QPlainTextEdit::NoWrap);
    problems_->setPlaceholderText(tr("Problems found in the files are listed here."));
    problems_->setAccessibleName(tr("Import problems"));

    buttons_ = new QDialogButtonBox(QDialogButtonBox::Close | QDialogButtonBox::Help, this);
    // Help shows the columns of each file with an example, beside the dialog.
    connect(buttons_, &QDialogButtonBox::helpRequested, this,
            [this] { showHelp(this, QStringLiteral("import-formats.html")); });
    importButton_ = buttons_->addButton(tr("&Import"), QDialogButtonBox::AcceptRole);
    importButton_->setDefault(true);
    connect(importButton_, &QPushButton::clicked, this, &ImportDialog::runImport);
    connect(buttons_, &QDialogButtonBox::rejected, this, &QDialog::reject);

    auto* layout = new QVBoxLayout(this);
    layout->addWidget(intro);
    layout->addLayout(grid);
    layout->addWidget(result_);
    layout->addWidget(problems_, 1);
    layout->addWidget(buttons_);
    resize(720, 420);
    updateButtons();
}

QLineEdit* ImportDialog::addFileRow(QGridLayout* grid, int row, const QString& label)
{
    auto* edit = new QLineEdit(this);
    edit->setPlaceholderText(tr("not imported"));
    edit->setClearButtonEnabled(true);
    auto* caption = new QLabel(label, this);
    caption->setBuddy(edit);
    auto* browse = new QPushButton(tr("Browse..."), this);
    browse->setAutoDefault(false);
    connect(browse, &QPushButton::clicked, this, [this, edit, caption] {
        const QString start = edit->text().isEmpty() ? startFolder_ : QFileInfo(edit->text()).absolutePath();
        const QString file = QFileDialog::getOpenFileName(this, caption->text().remove(u'&').remove(u':'), start,
                                                          tr("CSV files (*.csv);;All files (*)"));
        if (file.isEmpty()) return;
        edit->setText(file);
        startFolder_ = QFileInfo(file).absolutePath();
    });
    connect(edit, &QLineEdit::textChanged, this, &ImportDialog::updateButtons);
    grid->addWidget(caption, row, 0);
    grid->addWidget(edit, row, 1);
    grid->addWidget(browse, row, 2);
    return edit;
}

void ImportDialog::setAnimalsPath(const QString& path) { animals_->setText(path); }
void ImportDialog::setResidencesPath(const QString& path) { residences_->setText(path); }
void ImportDialog::setEncountersPath(const QString& path) { encounters_->setText(path); }

QString ImportDialog::problemText() const { return problems_->toPlainText(); }
QString ImportDialog::resultText() const { return result_->text(); }

void ImportDialog::updateButtons()
{
    const bool writable = document_->isOpen() && !document_->isReadOnly();
    const bool any = !animals_->text().trimmed().isEmpty() || !residences_->text().trimmed().isEmpty() ||
                     !encounters_->text().trimmed().isEmpty();
    importButton_->setEnabled(writable && any);
}

bool ImportDialog::runImport()
{
    problems_->clear();
    problemCount_ = 0;
    if (!document_->isOpen() || document_->isReadOnly()) {
        result_->setText(tr("No colony is open for writing; nothing was imported."));
        return false;
    }
    const core::ImportPaths paths{toStdString(animals_->text().trimmed()), toStdString(residences_->text().trimmed()),
                                  toStdString(encounters_->text().trimmed())};
    core::ImportResult result;
    QString readBackError;
    try {
        // The facade writes, re-reads the records and clears the undo history.
        result = facade_->importFiles(paths, &readBackError);
    } catch (const core::ColonyFileError& error) {
        result_->setText(tr("The colony file could not be written; nothing was imported.\n%1")
                             .arg(toQString(error.what())));
        return false;
    }
    if (!result.ok()) {
        const auto& list = result.problems.list();
        problemCount_ = static_cast<int>(list.size() + result.problems.dropped());
        QStringList lines;
        for (const core::ImportProblem& p : list) lines << toQString(p.text());
        if (result.problems.dropped() > 0)
            lines << tr("... and %1 more problems not listed; fix these first.").arg(result.problems.dropped());
        problems_->setPlainText(lines.join(u'\n'));
        result_->setText(tr("Problems found: %1. Nothing was imported.").arg(problemCount_));
        return false;
    }
    result_->setText(tr("Imported %1 animals, %2 residences and %3 encounters.")
                         .arg(result.animals)
                         .arg(result.residences)
                         .arg(result.encounters));
    if (!readBackError.isEmpty())
        result_->setText(result_->text() + u'\n' + tr("The colony could not be read back: %1").arg(readBackError));
    return true;
}

} // namespace hierloom::ui
