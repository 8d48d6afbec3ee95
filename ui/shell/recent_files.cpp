// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/recent_files.h"

#include <QFileInfo>
#include <QSettings>

namespace hierloom::ui {

namespace {
const char* const key = "recentFiles";

QString canonical(const QString& path)
{
    const QFileInfo info(path);
    return info.exists() ? info.canonicalFilePath() : info.absoluteFilePath();
}
} // namespace

QStringList RecentFiles::list() const { return QSettings().value(key).toStringList(); }

void RecentFiles::add(const QString& path)
{
    const QString file = canonical(path);
    QStringList files = list();
    files.removeAll(file);
    files.prepend(file);
    while (files.size() > maxCount) files.removeLast();
    store(files);
}

void RecentFiles::remove(const QString& path)
{
    QStringList files = list();
    files.removeAll(canonical(path));
    files.removeAll(path);
    store(files);
}

void RecentFiles::clear() { store({}); }

void RecentFiles::store(const QStringList& files) { QSettings().setValue(key, files); }

} // namespace hierloom::ui
