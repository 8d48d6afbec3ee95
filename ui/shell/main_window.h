// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/shell/recent_files.h"
#include "ui/shell/view_registry.h"

#include <QMainWindow>

class QAction;
class QLabel;
class QMenu;
class QStackedWidget;
class QTabWidget;

namespace hierloom::ui {

class AnimalView;
class BackupActions;
class ColonyDocument;
class ColonyEditFacade;
class EncounterEntryPanel;
class EncounterView;
class WelcomePanel;

/// The desktop window: menus, the animal and encounter views and a status
/// bar, assembled around one ColonyDocument. It computes nothing itself.
class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    /// Opens `colonyPath` (if given) once the event loop runs.
    explicit MainWindow(const QString& colonyPath = {}, QWidget* parent = nullptr);
    ~MainWindow() override;

    /// Opens a colony file; on failure reports the error and keeps the current one.
    bool openColony(const QString& path, bool readOnly = false);
    /// Creates a new colony file and opens it; reports an error on failure.
    bool createColony(const QString& path);
    /// Opens a fresh read-only copy of the bundled demo colony (first-run path).
    bool openDemoColony();

    ColonyDocument* document() const { return document_; }
    AnimalView* animalView() const { return views_.animals; }
    EncounterView* encounterView() const { return views_.encounters; }
    /// The one writer of the desktop (undo commands) and the evening entry tab ("--view entry").
    ColonyEditFacade* editFacade() const { return facade_; }
    EncounterEntryPanel* entryPanel() const { return views_.entry; }
    const AnalysisViews& analysisViews() const { return views_.analysis; }
    /// The Planner and Stability tabs and the status-bar stability alert.
    const ColonyManagerViews& managerViews() const { return views_.manager; }
    /// The View menu's actions, one per registered view in registry order.
    const QList<QAction*>& viewActions() const { return viewActions_; }
    /// Analysis > Analysis Settings...
    QAction* analysisSettingsAction() const { return settingsAction_; }
    /// Shows the view with this registry id (e.g. "timeline", "sex-ratio") or tab
    /// title; false when there is none.
    bool showView(const QString& name);
    /// File > Back Up Now, Restore from Backup..., Merge Another Colony... (issue 9).
    BackupActions* backupActions() const { return backups_; }

signals:
    /// Every error shown to the person, also as a signal (for tests and logs).
    void errorReported(const QString& title, const QString& message);

protected:
    /// Shows an error; tests override it to observe errors without a modal box.
    virtual void reportError(const QString& title, const QString& message);
    /// Asks a yes/no question (offer of a backup, restore confirmation); tests override it.
    virtual bool askQuestion(const QString& title, const QString& message);
    void closeEvent(QCloseEvent* event) override;
    /// Coming back to the window (another program may have written to the file meanwhile).
    void changeEvent(QEvent* event) override;

private:
    void buildMenus();
    void newColonyDialog();
    void openDialog(bool readOnly);
    void importCsv();
    void closeColony();
    void refresh();
    void fillRecentMenu();
    QString lastFolder() const;
    void setLastFolder(const QString& fileOrFolder);

    ColonyDocument* document_;
    RecentFiles recent_;
    QStackedWidget* stack_;
    WelcomePanel* welcome_;
    QTabWidget* tabs_;
    ViewParts views_;
    ColonyEditFacade* facade_ = nullptr;
    BackupActions* backups_ = nullptr;
    QLabel* fileLabel_;
    QLabel* animalCount_;
    QLabel* encounterCount_;
    QMenu* recentMenu_ = nullptr;
    QAction* importAction_ = nullptr;
    QAction* closeAction_ = nullptr;
    QAction* settingsAction_ = nullptr;
    QList<QAction*> viewActions_;
};

} // namespace hierloom::ui
