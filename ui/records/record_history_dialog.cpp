// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/record_history_dialog.h"

#include "ui/records/animal_table_model.h"
#include "ui/records/animal_view.h"
#include "ui/document/colony_document.h"
#include "ui/records/encounter_table_model.h"
#include "ui/records/encounter_view.h"
#include "ui/document/qt_convert.h"

#include <QAction>
#include <QDateTime>
#include <QDialogButtonBox>
#include <QHeaderView>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QLabel>
#include <QLocale>
#include <QTableView>
#include <QTableWidget>
#include <QVBoxLayout>

#include <functional>

namespace hierloom::ui {

namespace {

QJsonObject objectOf(const std::string& json)
{
    return json.empty() ? QJsonObject{} : QJsonDocument::fromJson(QByteArray::fromStdString(json)).object();
}

QString valueText(const QJsonValue& value)
{
    if (value.isNull() || value.isUndefined()) return QStringLiteral("\u2014");
    if (value.isString()) return value.toString();
    return QString::fromUtf8(QJsonDocument(QJsonArray{value}).toJson(QJsonDocument::Compact)).mid(1).chopped(1);
}

QString actionText(const std::string& action)
{
    if (action == "insert") return RecordHistoryDialog::tr("added");
    if (action == "update") return RecordHistoryDialog::tr("changed");
    if (action == "delete") return RecordHistoryDialog::tr("removed");
    if (action == "import") return RecordHistoryDialog::tr("imported");
    if (action == "restore") return RecordHistoryDialog::tr("restored from backup");
    return QString::fromStdString(action);
}

QString whenText(const std::string& utc)
{
    const QDateTime time = QDateTime::fromString(QString::fromStdString(utc), Qt::ISODate);
    return time.isValid() ? QLocale().toString(time.toLocalTime(), QLocale::ShortFormat) : QString::fromStdString(utc);
}

void showHistory(QWidget* parent, ColonyDocument* document, const std::string& uid, const QString& record)
{
    auto* dialog = new RecordHistoryDialog(core::recordHistory(*document->store(), uid), record, parent);
    dialog->setAttribute(Qt::WA_DeleteOnClose);
    dialog->show();
}

/// Ctrl+H and the table's context menu, both acting on the selected row.
void addAction(QTableView* table, QWidget* view, std::function<void()> run)
{
    auto* action = new QAction(RecordHistoryDialog::tr("&History..."), view);
    action->setObjectName(QStringLiteral("historyAction"));
    action->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_H));
    action->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    QObject::connect(action, &QAction::triggered, view, std::move(run));
    table->setContextMenuPolicy(Qt::ActionsContextMenu);
    table->addAction(action);
    view->addAction(action);
}

} // namespace

RecordHistoryDialog::RecordHistoryDialog(const std::vector<core::AuditEntry>& history, const QString& record,
                                         QWidget* parent)
    : QDialog(parent), table_(new QTableWidget(static_cast<int>(history.size()), ColumnCount, this))
{
    setWindowTitle(tr("History of %1").arg(record));
    table_->setHorizontalHeaderLabels({tr("When"), tr("Who"), tr("Action"), tr("Changes")});
    table_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table_->verticalHeader()->hide();
    table_->horizontalHeader()->setStretchLastSection(true);
    for (int row = 0; row < static_cast<int>(history.size()); ++row) {
        const core::AuditEntry& entry = history[row];
        table_->setItem(row, When, new QTableWidgetItem(whenText(entry.time)));
        table_->setItem(row, Who,
                        new QTableWidgetItem(entry.user.empty() ? tr("(another program)") : QString::fromStdString(entry.user)));
        table_->setItem(row, Action, new QTableWidgetItem(actionText(entry.action)));
        table_->setItem(row, Changes, new QTableWidgetItem(changesText(entry)));
    }
    table_->resizeColumnsToContents();
    table_->resizeRowsToContents();

    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* layout = new QVBoxLayout(this);
    if (history.empty()) layout->addWidget(new QLabel(tr("No changes are recorded for %1.").arg(record), this));
    layout->addWidget(table_);
    layout->addWidget(buttons);
    resize(720, 360);
}

QString RecordHistoryDialog::changesText(const core::AuditEntry& entry)
{
    const QJsonObject before = objectOf(entry.oldValues);
    const QJsonObject after = objectOf(entry.newValues);
    QStringList lines;
    if (before.isEmpty() || after.isEmpty()) {
        const QJsonObject& only = before.isEmpty() ? after : before;
        for (auto it = only.begin(); it != only.end(); ++it)
            lines << QStringLiteral("%1 = %2").arg(it.key(), valueText(it.value()));
    } else {
        // An update: only the fields whose value changed.
        QStringList keys = before.keys();
        for (const QString& key : after.keys())
            if (!keys.contains(key)) keys << key;
        for (const QString& key : keys)
            if (before.value(key) != after.value(key))
                lines << QStringLiteral("%1: %2 \u2192 %3").arg(key, valueText(before.value(key)), valueText(after.value(key)));
    }
    return lines.join(QLatin1Char('\n'));
}

bool showSelectedAnimalHistory(AnimalView* animals, ColonyDocument* document)
{
    const QModelIndex current = animals->table()->currentIndex();
    if (!current.isValid() || !document->isOpen()) return false;
    const QString id = current.siblingAtColumn(AnimalTableModel::Id).data().toString();
    const std::optional<std::string> uid = core::animalUid(*document->store(), toStdString(id));
    if (!uid) return false;
    showHistory(animals, document, *uid, id);
    return true;
}

bool showSelectedEncounterHistory(EncounterView* encounters, ColonyDocument* document)
{
    const QModelIndex current = encounters->table()->currentIndex();
    if (!current.isValid() || !document->isOpen()) return false;
    const core::Encounter& e = encounters->model()->encounterAt(current.row());
    const QString record = RecordHistoryDialog::tr("encounter %1 over %2 on %3")
                               .arg(QString::fromStdString(e.winner), QString::fromStdString(e.loser),
                                    formatDay(e.date));
    showHistory(encounters, document, e.uid, record);
    return true;
}

void addHistoryActions(AnimalView* animals, EncounterView* encounters, ColonyDocument* document)
{
    addAction(animals->table(), animals, [animals, document] { showSelectedAnimalHistory(animals, document); });
    addAction(encounters->table(), encounters,
              [encounters, document] { showSelectedEncounterHistory(encounters, document); });
}

} // namespace hierloom::ui
