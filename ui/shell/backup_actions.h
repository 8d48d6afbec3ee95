// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony_file_error.h"

#include <QObject>
#include <QString>

#include <chrono>
#include <functional>

class QAction;
class QMenu;
class QWidget;

namespace hierloom::ui {

class BackgroundBackup;
class ColonyDocument;
class ColonyEditFacade;

/// The desktop side of backups, restore and merge (issue 9): File > Back Up
/// Now, Restore from Backup..., Merge Another Colony...; the scheduled backup
/// and the audit user name when a file opens; and the offer to restore the
/// newest backup when a file turns out damaged. Errors and questions go
/// through the window's hooks, so tests answer them without modal boxes.
class BackupActions : public QObject {
    Q_OBJECT
public:
    using ReportError = std::function<void(const QString& title, const QString& message)>;
    using AskQuestion = std::function<bool(const QString& title, const QString& message)>;

    BackupActions(QMenu* file, QWidget* window, ColonyEditFacade* facade, ReportError reportError, AskQuestion ask);

    /// Takes a backup of the open colony now; the new file's path, or empty on failure.
    QString backUpNow();
    /// Asks for confirmation, then has the edit facade put `backupPath` back into the open colony and re-read it.
    bool restore(const QString& backupPath);
    /// Runs the merge dialog (file chooser, dry run, report, real merge).
    void mergeAnotherColony();

    /// After a colony opened: stamps the audit user name (the session
    /// observer, else the OS user) and takes the scheduled backup when due.
    void afterOpen();
    /// Takes the scheduled backup if it is due at `now` (also run every 15
    /// minutes, so a colony kept open for days still gets its backups). A
    /// failure is reported once per opened file, not at every check.
    void checkSchedule(std::chrono::system_clock::time_point now);
    /// The evening entry's observer, used as the audit user name while set.
    void setSessionObserver(const QString& observer);
    /// When opening `path` failed as damaged or not a colony file and backups
    /// exist, offers to restore the newest over it (the damaged file is kept
    /// in the backup folder). True when it was restored and may be opened.
    bool offerBackupFor(const QString& path, const core::ColonyFileError& error);

    QAction* backUpAction() const { return backUp_; }
    QAction* restoreAction() const { return restore_; }
    QAction* mergeAction() const { return merge_; }

private:
    void chooseAndRestore();
    void applyUserName();
    void updateEnabled();

    QWidget* window_;
    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    BackgroundBackup* background_; // the scheduled backup of a large file
    ReportError reportError_;
    AskQuestion ask_;
    QString observer_;
    bool scheduleFailureReported_ = false;
    QAction* backUp_;
    QAction* restore_;
    QAction* merge_;
};

} // namespace hierloom::ui
