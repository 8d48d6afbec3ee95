// SPDX-License-Identifier: GPL-3.0-or-later
// The desktop program: argument handling only; everything else lives in ui/.
#include "ui/main_window.h"

#include <QApplication>
#include <QCommandLineParser>

int main(int argc, char* argv[])
{
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("Hierloom"));
    QApplication::setApplicationName(QStringLiteral("Hierloom"));
    QApplication::setApplicationVersion(QStringLiteral("0.1.0"));

    QCommandLineParser parser;
    parser.setApplicationDescription(
        QApplication::translate("main", "Hierloom: dominance ranks and their inheritance in animal colonies."));
    parser.addHelpOption();
    parser.addVersionOption();
    parser.addPositionalArgument(QStringLiteral("colony"),
                                 QApplication::translate("main", "A colony file (.hierloom) to open."),
                                 QStringLiteral("[colony]"));
    parser.process(app);
    const QStringList args = parser.positionalArguments();
    if (args.size() > 1) {
        parser.showHelp(2);
    }

    hierloom::ui::MainWindow window(args.isEmpty() ? QString() : args.front());
    window.show();
    return QApplication::exec();
}
