// SPDX-License-Identifier: GPL-3.0-or-later
// The desktop program: argument handling only; everything else lives in ui/.
#include "ui/shell/about_dialog.h"
#include "ui/shell/main_window.h"
#include "ui/shell/translations.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QTimer>

#include <cstring>
#include <memory>

namespace {

/// --help and --version must work without a display (help2man runs them at build time).
bool onlyAsksForText(int argc, char* argv[])
{
    for (int i = 1; i < argc; ++i)
        for (const char* flag : {"-h", "--help", "--help-all", "-?", "-v", "--version"})
            if (std::strcmp(argv[i], flag) == 0) return true;
    return false;
}

} // namespace

int main(int argc, char* argv[])
{
    const std::unique_ptr<QCoreApplication> app(onlyAsksForText(argc, argv) ? new QCoreApplication(argc, argv)
                                                                              : new QApplication(argc, argv));
    QCoreApplication::setOrganizationName(QStringLiteral("Hierloom"));
    QCoreApplication::setApplicationName(QStringLiteral("Hierloom"));
    QCoreApplication::setApplicationVersion(QStringLiteral(HIERLOOM_VERSION));
    hierloom::ui::installTranslations(*app);

    QCommandLineParser parser;
    parser.setApplicationDescription(QCoreApplication::translate(
        "main", "Hierloom: dominance ranks and their inheritance in animal colonies.\n"
                "Without a colony file it opens on a start screen that offers the demo colony."));
    parser.addHelpOption();
    parser.addVersionOption();
    parser.addPositionalArgument(QStringLiteral("colony"),
                                 QCoreApplication::translate("main", "A colony file (.hierloom) to open."),
                                 QStringLiteral("[colony]"));
    const QCommandLineOption viewOption(
        QStringLiteral("view"),
        QCoreApplication::translate("main", "Open on this view: %1.").arg(hierloom::ui::viewIdList()),
        QStringLiteral("name"));
    parser.addOption(viewOption);
    parser.process(*app);
    const QStringList args = parser.positionalArguments();
    if (args.size() > 1) {
        parser.showHelp(2);
    }

    // Ties the windows to hierloom.desktop (its icon and name on Wayland docks).
    QGuiApplication::setDesktopFileName(QStringLiteral("hierloom"));
    QApplication::setWindowIcon(hierloom::ui::applicationIcon());
    hierloom::ui::MainWindow window(args.isEmpty() ? QString() : args.front());
    window.show();
    if (parser.isSet(viewOption)) {
        // After the colony given on the command line has been opened (queued the same way).
        const QString view = parser.value(viewOption);
        QTimer::singleShot(0, &window, [&window, view] { window.showView(view); });
    }
    return QApplication::exec();
}
