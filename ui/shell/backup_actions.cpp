// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/backup_actions.h"

#include "ui/document/background_backup.h"

#include "core/store/colony_backup.h"
#include "core/store/colony_store.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/shell/merge_dialog.h"
#include "ui/document/qt_convert.h"

#include <QAction>
#include <QApplication>
#include <QDateTime>
#include <QDialog>
#include <QDialogButtonBox>
#include <QDir>
#include <QFileInfo>
#include <QHeaderView>
#include <QLabel>
#include <QLocale>
#include <QMenu>
#include <QPushButton>
#include <QScopeGuard>
#include <QTimer>
#include <QTreeWidget>
#include <QUndoStack>
#include <QVBoxLayout>

#include <chrono>

namespace hierloom::ui {

namespace {

QString takenText(std::chrono::system_clock::time_point taken)
{
    const auto seconds = std::chrono::duration_cast<std::chrono::seconds>(taken.time_since_epoch()).count();
    return QLocale().toString(QDateTime::fromSecsSinceEpoch(seconds).toLocalTime(), QLocale::LongFormat);
}

QString osUserName()
{
    const QString user = qEnvironmentVariable("USER", qEnvironmentVariable("USERNAME"));
    return user.isEmpty() ? QStringLiteral("unknown") : user;
}

/// The list of backups with dates and sizes; returns the chosen path or empty.
QString chooseBackup(QWidget* parent, const QString& colonyPath)
{
    const std::vector<core::BackupFile> backups = core::listBackups(toStdString(colonyPath));
    QDialog dialog(parent);
    dialog.setWindowTitle(BackupActions::tr("Restore from Backup"));
    auto* list = new QTreeWidget(&dialog);
    list->setHeaderLabels({BackupActions::tr("Taken"), BackupActions::tr("Size"), BackupActions::tr("File")});
    list->setRootIsDecorated(false);
    const QLocale locale;
    for (const core::BackupFile& b : backups) {
        const QString path = toQString(b.path);
        auto* item = new QTreeWidgetItem(
            list, {takenText(b.taken), locale.formattedDataSize(QFileInfo(path).size()), QFileInfo(path).fileName()});
        item->setData(0, Qt::UserRole, path);
    }
    list->header()->setSectionResizeMode(QHeaderView::ResizeToContents);
    if (list->topLevelItemCount() > 0) list->setCurrentItem(list->topLevelItem(0));
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, &dialog);
    buttons->button(QDialogButtonBox::Ok)->setText(BackupActions::tr("&Restore..."));
    buttons->button(QDialogButtonBox::Ok)->setEnabled(!backups.empty());
    QObject::connect(buttons, &QDialogButtonBox::accepted, &dialog, &QDialog::accept);
    QObject::connect(buttons, &QDialogButtonBox::rejected, &dialog, &QDialog::reject);
    QObject::connect(list, &QTreeWidget::itemDoubleClicked, &dialog, &QDialog::accept);
    auto* layout = new QVBoxLayout(&dialog);
    layout->addWidget(new QLabel(backups.empty() ? BackupActions::tr("There are no backups of this colony yet.")
                                                 : BackupActions::tr("Backups in %1, newest first:")
                                                       .arg(QDir::toNativeSeparators(toQString(core::backupFolder(toStdString(colonyPath))))),
                                 &dialog));
    layout->addWidget(list);
    layout->addWidget(buttons);
    dialog.resize(620, 360);
    if (dialog.exec() != QDialog::Accepted || !list->currentItem()) return {};
    return list->currentItem()->data(0, Qt::UserRole).toString();
}

} // namespace

BackupActions::BackupActions(QMenu* file, QWidget* window, ColonyEditFacade* facade, ReportError reportError,
                             AskQuestion ask)
    : QObject(window), window_(window), facade_(facade), document_(facade->document()),
      background_(new BackgroundBackup(this)), reportError_(std::move(reportError)), ask_(std::move(ask))
{
    connect(background_, &BackgroundBackup::finished, this, [this](const QString& error) {
        if (error.isEmpty() || scheduleFailureReported_) return;
        reportError_(tr("Scheduled Backup Failed"), error);
        scheduleFailureReported_ = true;
    });
    backUp_ = file->addAction(tr("&Back Up Now"), this, [this] { backUpNow(); });
    restore_ = file->addAction(tr("&Restore from Backup..."), this, &BackupActions::chooseAndRestore);
    merge_ = file->addAction(tr("&Merge Another Colony..."), this, &BackupActions::mergeAnotherColony);
    connect(document_, &ColonyDocument::changed, this, &BackupActions::updateEnabled);
    updateEnabled();
    auto* schedule = new QTimer(this);
    schedule->setInterval(15 * 60 * 1000);
    connect(schedule, &QTimer::timeout, this, [this] { checkSchedule(std::chrono::system_clock::now()); });
    schedule->start();
}

void BackupActions::updateEnabled()
{
    const bool writable = document_->isOpen() && !document_->isReadOnly();
    backUp_->setEnabled(document_->isOpen());
    restore_->setEnabled(writable);
    merge_->setEnabled(writable);
}

QString BackupActions::backUpNow()
{
    if (!document_->isOpen()) return {};
    try {
        QApplication::setOverrideCursor(Qt::WaitCursor);
        const auto restoreCursor = qScopeGuard([] { QApplication::restoreOverrideCursor(); });
        return toQString(core::backupColony(*document_->store(), std::chrono::system_clock::now()));
    } catch (const std::exception& e) {
        reportError_(tr("Cannot Back Up the Colony"), QString::fromUtf8(e.what()));
        return {};
    }
}

void BackupActions::chooseAndRestore()
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    const QString backup = chooseBackup(window_, document_->path());
    if (!backup.isEmpty()) restore(backup);
}

bool BackupActions::restore(const QString& backupPath)
{
    if (!document_->isOpen() || document_->isReadOnly()) return false;
    const QString path = document_->path();
    const QString name = QFileInfo(backupPath).fileName();
    if (!ask_(tr("Restore from Backup"),
              tr("Replace every record of %1 with the backup %2?\n\nThe colony as it is now is backed up first, "
                 "so this can be reversed by restoring that backup.")
                  .arg(QFileInfo(path).fileName(), name)))
        return false;
    QString failure;
    try {
        failure = facade_->restoreBackup(backupPath);
    } catch (const std::exception& e) {
        reportError_(tr("Cannot Open Colony"), QString::fromUtf8(e.what()));
        return false;
    }
    if (!failure.isEmpty()) reportError_(tr("Cannot Restore the Backup"), failure);
    afterOpen();
    return failure.isEmpty();
}

void BackupActions::mergeAnotherColony()
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    MergeDialog dialog(facade_, window_);
    dialog.exec();
}

void BackupActions::setSessionObserver(const QString& observer)
{
    observer_ = observer.trimmed();
    applyUserName();
}

void BackupActions::applyUserName()
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    document_->setAuditUserName(toStdString(observer_.isEmpty() ? osUserName() : observer_));
}

void BackupActions::afterOpen()
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    applyUserName();
    scheduleFailureReported_ = false;
    checkSchedule(std::chrono::system_clock::now());
}

void BackupActions::checkSchedule(std::chrono::system_clock::time_point now)
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    // A large file (opened in steps): copied and checked on a thread of its own.
    if (!document_->isComplete() ||
        static_cast<std::int64_t>(document_->encounters().size()) >= document_->progressiveFrom()) {
        background_->startIfDue(document_->path(), now);
        return;
    }
    try {
        core::backupIfDue(*document_->store(), now);
    } catch (const std::exception& e) {
        // The colony is open and usable; only the safety copy failed, so say so (once) and carry on.
        if (!scheduleFailureReported_) reportError_(tr("Scheduled Backup Failed"), QString::fromUtf8(e.what()));
        scheduleFailureReported_ = true;
    }
}

bool BackupActions::offerBackupFor(const QString& path, const core::ColonyFileError& error)
{
    using Kind = core::ColonyFileError::Kind;
    if (error.kind() != Kind::Damaged && error.kind() != Kind::NotAColonyFile) return false;
    std::vector<core::BackupFile> backups;
    try {
        backups = core::listBackups(toStdString(path));
    } catch (const std::exception&) {
        return false;
    }
    if (backups.empty()) return false;
    const core::BackupFile& newest = backups.front();
    if (!ask_(tr("Colony File Damaged"),
              tr("%1\n\nThe newest backup of this colony was taken %2. Restore it over the damaged file and open it? "
                 "The damaged file is kept in the backup folder.")
                  .arg(QString::fromUtf8(error.what()), takenText(newest.taken))))
        return false;
    try {
        facade_->restoreDamagedFile(toQString(newest.path), path);
    } catch (const std::exception& e) {
        reportError_(tr("Cannot Restore the Backup"), QString::fromUtf8(e.what()));
        return false;
    }
    return true;
}

} // namespace hierloom::ui
