// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/list_editor_dialog.h"

#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"

#include <QDialogButtonBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

namespace hierloom::ui {

ListEditorDialog::ListEditorDialog(ColonyEditFacade* facade, List list, QWidget* parent)
    : QDialog(parent), facade_(facade), list_(list), table_(new QTableWidget(this)), message_(new QLabel(this))
{
    const bool codes = list == List::BehaviourCodes;
    setWindowTitle(codes ? tr("Behaviour Codes") : tr("Observers"));
    table_->setColumnCount(codes ? 3 : 1);
    table_->setHorizontalHeaderLabels(codes ? QStringList{tr("Code"), tr("Severity (0-5)"), tr("Description")}
                                            : QStringList{tr("Name or initials")});
    table_->horizontalHeader()->setStretchLastSection(true);
    table_->verticalHeader()->hide();
    if (const core::ColonyStore* store = facade_->document()->store()) {
        if (codes) {
            for (const auto& c : store->behaviourCodes()) {
                const int r = table_->rowCount();
                table_->insertRow(r);
                table_->setItem(r, 0, new QTableWidgetItem(toQString(c.code)));
                table_->setItem(r, 1, new QTableWidgetItem(QString::number(c.severity)));
                table_->setItem(r, 2, new QTableWidgetItem(toQString(c.description)));
            }
        } else {
            for (const std::string& o : store->observers()) {
                const int r = table_->rowCount();
                table_->insertRow(r);
                table_->setItem(r, 0, new QTableWidgetItem(toQString(o)));
            }
        }
    }
    message_->setStyleSheet(QStringLiteral("color: #b00020;"));
    message_->setWordWrap(true);
    message_->hide();

    auto* add = new QPushButton(tr("&Add"), this);
    auto* remove = new QPushButton(tr("&Remove"), this);
    add->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_Plus));
    connect(add, &QPushButton::clicked, this, [this] {
        const int r = table_->rowCount();
        table_->insertRow(r);
        for (int c = 0; c < table_->columnCount(); ++c) table_->setItem(r, c, new QTableWidgetItem(c == 1 ? "1" : ""));
        table_->setCurrentCell(r, 0);
        table_->editItem(table_->item(r, 0));
    });
    connect(remove, &QPushButton::clicked, this, [this] {
        if (table_->currentRow() >= 0) table_->removeRow(table_->currentRow());
    });
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    connect(buttons, &QDialogButtonBox::accepted, this, &ListEditorDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* row = new QHBoxLayout;
    row->addWidget(add);
    row->addWidget(remove);
    row->addStretch(1);
    auto* layout = new QVBoxLayout(this);
    layout->addWidget(table_);
    layout->addLayout(row);
    layout->addWidget(message_);
    layout->addWidget(buttons);
    resize(codes ? 560 : 320, 360);
}

QString ListEditorDialog::message() const { return !message_->isHidden() ? message_->text() : QString(); }

void ListEditorDialog::accept()
{
    auto text = [this](int r, int c) {
        const QTableWidgetItem* item = table_->item(r, c);
        return item ? item->text().trimmed() : QString();
    };
    core::FieldProblems problems;
    if (list_ == List::BehaviourCodes) {
        std::vector<core::ColonyStore::BehaviourCode> codes;
        for (int r = 0; r < table_->rowCount(); ++r) {
            bool ok = false;
            const int severity = text(r, 1).toInt(&ok);
            if (!ok) problems.push_back({"severity", "'" + toStdString(text(r, 1)) + "' must be a whole number from 0 to 5"});
            codes.push_back({toStdString(text(r, 0)), severity, toStdString(text(r, 2))});
        }
        if (problems.empty()) problems = facade_->setBehaviourCodes(codes);
    } else {
        std::vector<std::string> names;
        for (int r = 0; r < table_->rowCount(); ++r) names.push_back(toStdString(text(r, 0)));
        problems = facade_->setObservers(names);
    }
    if (problems.empty()) {
        QDialog::accept();
        return;
    }
    QStringList lines;
    for (const auto& p : problems) lines << toQString(p.field + ": " + p.message);
    message_->setText(lines.join('\n'));
    message_->show();
}

} // namespace hierloom::ui
