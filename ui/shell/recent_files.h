// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QStringList>

namespace hierloom::ui {

/// The most recently opened colony files, newest first, kept in QSettings.
class RecentFiles {
public:
    static constexpr int maxCount = 8;

    QStringList list() const;
    /// Puts a file at the top, dropping its older entry and the oldest beyond maxCount.
    void add(const QString& path);
    void remove(const QString& path);
    void clear();

private:
    void store(const QStringList& files);
};

} // namespace hierloom::ui
