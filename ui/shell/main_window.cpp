// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/main_window.h"

#include "ui/widgets/plot_palette.h"

#include "core/base/colony_file_error.h"
#include "ui/records/animal_view.h"
#include "ui/shell/backup_actions.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/shell/edit_menus.h"
#include "ui/shell/group_follower.h"
#include "ui/shell/load_progress.h"
#include "ui/entry/encounter_entry_panel.h"
#include "ui/shell/demo_colony_copy.h"
#include "ui/records/encounter_view.h"
#include "ui/shell/help_menu.h"
#include "ui/records/import_assistant_dialog.h"
#include "ui/shell/import_dialog.h"
#include "ui/records/record_history_dialog.h"
#include "ui/analysis/analysis_settings_dialog.h"
#include "ui/analysis/research_export_dialog.h"
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/planning/centre_overview_view.h"
#include "ui/planning/stability_view.h"
#include "ui/document/animal_selection.h"
#include "ui/shell/welcome_panel.h"

#include <QAction>
#include <QApplication>
#include <QCloseEvent>
#include <QComboBox>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QLabel>
#include <QLocale>
#include <QMenuBar>
#include <QMessageBox>
#include <QSettings>
#include <QStackedWidget>
#include <QStatusBar>
#include <QTabWidget>
#include <QScopeGuard>
#include <QScreen>
#include <QTimer>
#include <QActionGroup>
#include <QUndoStack>

namespace hierloom::ui {

namespace {
const char* const colonyFilter = QT_TRANSLATE_NOOP("hierloom::ui::MainWindow", "Hierloom colonies (*.hierloom);;All files (*)");
}

MainWindow::MainWindow(const QString& colonyPath, QWidget* parent)
    : QMainWindow(parent),
      document_(new ColonyDocument(this)),
      stack_(new QStackedWidget(this)),
      welcome_(new WelcomePanel(this)),
      tabs_(new QTabWidget(this)),
      fileLabel_(new QLabel(this)),
      animalCount_(new QLabel(this)),
      encounterCount_(new QLabel(this))
{
    facade_ = new ColonyEditFacade(document_, this);
    views_.analysis.selection = new AnimalSelection(this);
    const ViewContext context{this, document_, facade_, views_};
    for (const ViewEntry& entry : viewRegistry()) {
        QWidget* view = entry.create(context);
        view->setObjectName(QString::fromLatin1(entry.id));
        tabs_->addTab(view, viewTitle(entry, false));
    }
    tabs_->setDocumentMode(true);
    stack_->addWidget(welcome_);
    stack_->addWidget(tabs_);
    setCentralWidget(stack_);

    statusBar()->addWidget(fileLabel_, 1);
    statusBar()->addPermanentWidget(new LoadProgress(document_, this));
    statusBar()->addPermanentWidget(animalCount_);
    statusBar()->addPermanentWidget(encounterCount_);

    addStabilityBadge(this, tabs_, document_, views_.manager);
    // A group chosen in the centre overview: every view with a group choice
    // turns to it (the document's one "go to this group"), the hierarchy shows.
    connect(views_.manager.overview, &CentreOverviewView::groupChosen, this, [this](const QString& group) {
        document_->showGroup(group);
        showView(QStringLiteral("hierarchy"));
    });

    buildMenus();
    new EditMenus(this, facade_, [this] {
        showView(QStringLiteral("entry"));
        views_.entry->focusEntry();
    });
    addHistoryActions(views_.animals, views_.encounters, document_);
    connect(views_.entry->observerBox(), &QComboBox::currentTextChanged, backups_, &BackupActions::setSessionObserver);
    connect(document_, &ColonyDocument::writeFailed, this,
            [this](const QString& message) { reportError(tr("Cannot Save the Change"), message); });
    connect(document_, &ColonyDocument::historyCleared, this, [this](const QString& reason) {
        statusBar()->showMessage(tr("Undo history cleared: %1.").arg(reason), 10000);
    });
    new GroupFollower(document_, tabs_);
    connect(document_, &ColonyDocument::loadFailed, this,
            [this](const QString& message) { reportError(tr("Cannot Read the Whole Colony"), message); });
    connect(document_, &ColonyDocument::changedOutside, this,
            [this](const QString& message) { statusBar()->showMessage(message, 30000); });
    // Undo and Redo (menu, keys or the entry panel) say what they did.
    connect(document_, &ColonyDocument::historyStepped, this, [this](bool undone, const QString& text) {
        statusBar()->showMessage(undone ? tr("Undone: %1.").arg(text) : tr("Redone: %1.").arg(text), 10000);
    });
    connect(welcome_, &WelcomePanel::openRequested, this, [this] { openDialog(false); });
    connect(welcome_, &WelcomePanel::newRequested, this, &MainWindow::newColonyDialog);
    connect(welcome_, &WelcomePanel::demoRequested, this, &MainWindow::openDemoColony);
    connect(welcome_, &WelcomePanel::recentRequested, this, [this](const QString& path) { openColony(path); });
    connect(welcome_, &WelcomePanel::importRequested, this, [this] {
        // Importing needs a colony to import into: make one first, then ask for the files.
        newColonyDialog();
        if (document_->isOpen() && !document_->isReadOnly()) importCsv();
    });
    connect(document_, &ColonyDocument::changed, this, &MainWindow::refresh);

    QSettings settings;
    if (!restoreGeometry(settings.value("mainWindow/geometry").toByteArray())) resize(1200, 760);
    // A size from a larger screen (or the default on a 1024x768 one) is cut
    // to the screen's room, less a margin for the frame; the views fit
    // 1008x708 (screen_fit_test.cpp).
    if (const QScreen* s = screen()) {
        const QSize room = s->availableGeometry().size() - QSize(16, 60);
        if (!room.isEmpty() && (width() > room.width() || height() > room.height())) resize(size().boundedTo(room));
    }
    restoreState(settings.value("mainWindow/state").toByteArray());
    tabs_->setCurrentIndex(settings.value("mainWindow/view", 0).toInt());
    refresh();

    if (!colonyPath.isEmpty())
        QTimer::singleShot(0, this, [this, colonyPath] { openColony(colonyPath); });
}

MainWindow::~MainWindow() = default;

void MainWindow::buildMenus()
{
    QMenu* file = menuBar()->addMenu(tr("&File"));
    QAction* create = file->addAction(tr("&New Colony..."), this, &MainWindow::newColonyDialog);
    create->setShortcut(QKeySequence::New);
    QAction* open = file->addAction(tr("&Open..."), this, [this] { openDialog(false); });
    open->setShortcut(QKeySequence::Open);
    QAction* openReadOnly = file->addAction(tr("Open &Read-Only..."), this, [this] { openDialog(true); });
    openReadOnly->setShortcut(QKeySequence(tr("Ctrl+Shift+O")));
    recentMenu_ = file->addMenu(tr("Open Re&cent"));
    connect(recentMenu_, &QMenu::aboutToShow, this, &MainWindow::fillRecentMenu);
    file->addSeparator();
    importAction_ = file->addAction(tr("&Import CSV..."), this, &MainWindow::importCsv);
    importAction_->setShortcut(QKeySequence(tr("Ctrl+I")));
    // A team's own spreadsheet through an import mapping; enabled with the plain import.
    QAction* importSheet = file->addAction(tr("Import &Spreadsheet..."), this, [this] {
        ImportAssistantDialog dialog(facade_, this);
        dialog.exec();
    });
    importSheet->setObjectName(QStringLiteral("importSpreadsheet"));
    connect(importAction_, &QAction::enabledChanged, importSheet, &QAction::setEnabled);
    addReportActions(file, this, document_);
    addResearchExportAction(file, this, document_);
    file->addSeparator();
    backups_ = new BackupActions(
        file, this, facade_, [this](const QString& title, const QString& message) { reportError(title, message); },
        [this](const QString& title, const QString& message) { return askQuestion(title, message); });
    file->addSeparator();
    closeAction_ = file->addAction(tr("&Close"), this, &MainWindow::closeColony);
    closeAction_->setShortcut(QKeySequence::Close);
    QAction* quit = file->addAction(tr("&Quit"), qApp, &QApplication::closeAllWindows);
    quit->setShortcut(QKeySequence::Quit);
    quit->setMenuRole(QAction::QuitRole);

    // Every registered view, with Ctrl+1 ... Ctrl+0 in registry (= tab) order.
    QMenu* view = menuBar()->addMenu(tr("&View"));
    for (int i = 0; i < static_cast<int>(viewRegistry().size()); ++i) {
        const ViewEntry& entry = viewRegistry()[static_cast<size_t>(i)];
        QAction* show = view->addAction(viewTitle(entry, true), this, [this, i] { tabs_->setCurrentIndex(i); });
        show->setShortcut(viewShortcut(entry));
        show->setObjectName(QStringLiteral("view-") + QString::fromLatin1(entry.id));
        viewActions_ << show;
    }
    // Plots on a light or a dark background on screen; exported figures are always on white.
    view->addSeparator();
    QMenu* plots = view->addMenu(tr("&Plot Background"));
    auto* palettes = new QActionGroup(plots);
    const PlotPalette stored = storedPlotPalette();
    for (const auto& [text, palette] : {std::pair{tr("&Light"), PlotPalette::Light}, std::pair{tr("&Dark"), PlotPalette::Dark}}) {
        QAction* a = plots->addAction(text, this, [this, palette = palette] { setPlotPalette(this, palette); });
        a->setCheckable(true);
        a->setChecked(palette == stored);
        a->setObjectName(palette == PlotPalette::Dark ? QStringLiteral("plot-palette-dark")
                                                      : QStringLiteral("plot-palette-light"));
        palettes->addAction(a);
    }
    QMenu* analysis = menuBar()->addMenu(tr("&Analysis"));
    settingsAction_ = analysis->addAction(tr("Analysis &Settings..."), this,
                                          [this] { runAnalysisSettingsDialog(this, facade_); });
    addHelpMenu(this, [this] { openDemoColony(); });
}

bool MainWindow::showView(const QString& name)
{
    for (int i = 0; i < tabs_->count(); ++i) {
        const QString text = tabs_->tabText(i).remove(QLatin1Char('&'));
        if (tabs_->widget(i)->objectName() == name || text.compare(name, Qt::CaseInsensitive) == 0) {
            tabs_->setCurrentIndex(i);
            return true;
        }
    }
    return false;
}

void MainWindow::fillRecentMenu()
{
    recentMenu_->clear();
    const QStringList files = recent_.list();
    for (int i = 0; i < files.size(); ++i) {
        const QString& path = files[i];
        // Number the entries 1-8 so each is one key press away.
        QAction* action = recentMenu_->addAction(tr("&%1 %2").arg(i + 1).arg(QDir::toNativeSeparators(path)));
        connect(action, &QAction::triggered, this, [this, path] { openColony(path); });
    }
    if (files.isEmpty()) recentMenu_->addAction(tr("(none)"))->setEnabled(false);
    recentMenu_->addSeparator();
    QAction* clear = recentMenu_->addAction(tr("C&lear List"), this, [this] {
        recent_.clear();
        refresh();
    });
    clear->setEnabled(!files.isEmpty());
}

void MainWindow::reportError(const QString& title, const QString& message)
{
    emit errorReported(title, message);
    QMessageBox::warning(this, title, message);
}

bool MainWindow::askQuestion(const QString& title, const QString& message)
{
    return QMessageBox::question(this, title, message) == QMessageBox::Yes;
}

bool MainWindow::openColony(const QString& path, bool readOnly)
{
    // A large colony takes a few seconds to read; say so with the cursor.
    QApplication::setOverrideCursor(Qt::WaitCursor);
    const auto restoreCursor = qScopeGuard([] { QApplication::restoreOverrideCursor(); });
    try {
        document_->open(path, readOnly);
    } catch (const core::ColonyFileError& error) {
        if (error.kind() == core::ColonyFileError::Kind::Missing) recent_.remove(path);
        // A damaged file with backups: the person may take the newest backup instead.
        if (!backups_->offerBackupFor(path, error)) {
            reportError(tr("Cannot Open Colony"), QString::fromUtf8(error.what()));
            return false;
        }
        try {
            document_->open(path, readOnly);
        } catch (const std::exception& again) {
            reportError(tr("Cannot Open Colony"), QString::fromUtf8(again.what()));
            return false;
        }
    } catch (const std::exception& error) {
        reportError(tr("Cannot Open Colony"),
                    tr("%1 could not be read: %2").arg(QDir::toNativeSeparators(path), QString::fromUtf8(error.what())));
        return false;
    }
    backups_->afterOpen();
    recent_.add(path);
    setLastFolder(path);
    return true;
}

bool MainWindow::openDemoColony()
{
    // A fresh copy, opened read-only: a newcomer can explore but not damage it.
    QString path;
    try {
        QApplication::setOverrideCursor(Qt::WaitCursor);
        const auto restoreCursor = qScopeGuard([] { QApplication::restoreOverrideCursor(); });
        path = prepareDemoColonyCopy();
    } catch (const std::exception& error) {
        reportError(tr("Cannot Open the Demo Colony"), QString::fromUtf8(error.what()));
        return false;
    }
    // The copy is replaced on every visit, so it does not belong in the recent list.
    const bool opened = openColony(path, true);
    recent_.remove(path);
    return opened;
}

bool MainWindow::createColony(const QString& path)
{
    try {
        document_->create(path);
    } catch (const std::exception& error) {
        reportError(tr("Cannot Create Colony"), QString::fromUtf8(error.what()));
        return false;
    }
    recent_.add(path);
    setLastFolder(path);
    return true;
}

void MainWindow::newColonyDialog()
{
    // The store refuses to overwrite, so let it say so instead of asking twice.
    QString path = QFileDialog::getSaveFileName(this, tr("New Colony"), lastFolder(), tr(colonyFilter),
                                                nullptr, QFileDialog::DontConfirmOverwrite);
    if (path.isEmpty()) return;
    if (QFileInfo(path).suffix().isEmpty()) path += QStringLiteral(".hierloom");
    createColony(path);
}

void MainWindow::openDialog(bool readOnly)
{
    const QString path = QFileDialog::getOpenFileName(this, readOnly ? tr("Open Colony Read-Only") : tr("Open Colony"),
                                                      lastFolder(), tr(colonyFilter));
    if (!path.isEmpty()) openColony(path, readOnly);
}

void MainWindow::importCsv()
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    // The facade imports and clears the undo history when the import added records.
    ImportDialog dialog(facade_, this);
    dialog.setStartFolder(lastFolder());
    dialog.exec();
    setLastFolder(dialog.startFolder());
}

void MainWindow::closeColony() { document_->close(); }

void MainWindow::refresh()
{
    const bool open = document_->isOpen();
    stack_->setCurrentWidget(open ? static_cast<QWidget*>(tabs_) : welcome_);
    importAction_->setEnabled(open && !document_->isReadOnly());
    closeAction_->setEnabled(open);
    for (QAction* action : viewActions_) action->setEnabled(open);
    settingsAction_->setEnabled(open);

    const QLocale locale;
    if (!open) {
        welcome_->setRecentFiles(recent_.list());
        setWindowTitle(tr("Hierloom"));
        fileLabel_->setText(tr("No colony open"));
        animalCount_->clear();
        encounterCount_->clear();
        return;
    }
    const QString name = QFileInfo(document_->path()).fileName();
    const QString shown = document_->isReadOnly() ? tr("%1 (read-only)").arg(name) : name;
    setWindowTitle(tr("%1 - Hierloom").arg(shown));
    fileLabel_->setText(shown);
    fileLabel_->setToolTip(QDir::toNativeSeparators(document_->path()));
    animalCount_->setText(tr("Animals: %1").arg(locale.toString(static_cast<qlonglong>(document_->pedigree().animals.size()))));
    const QString encounters = locale.toString(static_cast<qlonglong>(document_->encounters().size()));
    encounterCount_->setText(document_->isComplete() ? tr("Encounters: %1").arg(encounters)
                                                     : tr("Encounters: %1 read so far").arg(encounters));
}

QString MainWindow::lastFolder() const
{
    return QSettings().value("lastFolder", QDir::homePath()).toString();
}

void MainWindow::setLastFolder(const QString& fileOrFolder)
{
    if (fileOrFolder.isEmpty()) return;
    const QFileInfo info(fileOrFolder);
    QSettings().setValue("lastFolder", info.isDir() ? info.absoluteFilePath() : info.absolutePath());
}

void MainWindow::changeEvent(QEvent* event)
{
    QMainWindow::changeEvent(event);
    if (event->type() != QEvent::ActivationChange || !isActiveWindow() || !document_->isOpen()) return;
    // The command line may have imported into the file while the person was
    // away: read it again now, not only at the next write.
    try {
        document_->catchUpWithFile();
    } catch (const std::exception&) {
        // Said in the status bar (changedOutside); a box here would come back
        // each time the window is activated after closing it.
    }
}

void MainWindow::closeEvent(QCloseEvent* event)
{
    QSettings settings;
    settings.setValue("mainWindow/geometry", saveGeometry());
    settings.setValue("mainWindow/state", saveState());
    settings.setValue("mainWindow/view", tabs_->currentIndex());
    event->accept();
}

} // namespace hierloom::ui
