// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/demo_colony_copy.h"

#include "core/demo/demo_colony_file.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QStandardPaths>

#include <stdexcept>

namespace hierloom::ui {

QString demoColonyCopyPath()
{
    return QStandardPaths::writableLocation(QStandardPaths::AppDataLocation) + QStringLiteral("/demo.hierloom");
}

QString prepareDemoColonyCopy()
{
    const QString path = demoColonyCopyPath();
    const QString folder = QFileInfo(path).absolutePath();
    if (!QDir().mkpath(folder))
        throw std::runtime_error(QCoreApplication::translate("hierloom::ui::DemoColony",
                                                             "Cannot create the folder %1 for the demo colony.")
                                     .arg(QDir::toNativeSeparators(folder))
                                     .toStdString());
    // SQLite keeps a write-ahead log beside the file: remove it with the old copy.
    for (const QString& suffix : {QString(), QStringLiteral("-wal"), QStringLiteral("-shm")}) {
        QFile old(path + suffix);
        if (old.exists() && !old.remove())
            throw std::runtime_error(QCoreApplication::translate("hierloom::ui::DemoColony",
                                                                 "Cannot replace the old demo colony %1: %2")
                                         .arg(QDir::toNativeSeparators(old.fileName()), old.errorString())
                                         .toStdString());
    }
    core::createDemoColonyFile(QFile::encodeName(path).toStdString());
    return path;
}

} // namespace hierloom::ui
