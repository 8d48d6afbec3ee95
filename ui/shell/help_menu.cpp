// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/help_menu.h"

#include "ui/shell/about_dialog.h"
#include "ui/widgets/help_browser.h"

#include <QApplication>
#include <QMainWindow>
#include <QMenu>
#include <QMenuBar>

namespace hierloom::ui {

QMenu* addHelpMenu(QMainWindow* window, std::function<void()> openDemo)
{
    QMenu* help = window->menuBar()->addMenu(QCoreApplication::translate("hierloom::ui::HelpMenu", "&Help"));
    help->setObjectName(QStringLiteral("helpMenu"));
    QAction* contents = help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "Hierloom &Help"), window,
                                        [window] { showHelp(window, QStringLiteral("index.html")); });
    contents->setShortcut(QKeySequence::HelpContents);
    help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "&Methods and Figures"), window,
                    [window] { showHelp(window, QStringLiteral("methods.html")); });
    help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "&Keyboard Shortcuts"), window,
                    [window] { showHelp(window, QStringLiteral("shortcuts.html")); });
    help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "&Import File Formats"), window,
                    [window] { showHelp(window, QStringLiteral("import-formats.html")); });
    help->addSeparator();
    help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "Open the &Demo Colony"), window, std::move(openDemo));
    help->addSeparator();
    QAction* about = help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "&About Hierloom"), window, [window] {
        AboutDialog dialog(window);
        dialog.exec();
    });
    about->setMenuRole(QAction::AboutRole);
    QAction* aboutQt = help->addAction(QCoreApplication::translate("hierloom::ui::HelpMenu", "About &Qt"), qApp, &QApplication::aboutQt);
    aboutQt->setMenuRole(QAction::AboutQtRole);
    return help;
}

} // namespace hierloom::ui
