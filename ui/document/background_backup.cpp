// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/background_backup.h"

#include "core/store/colony_backup.h"
#include "core/store/colony_store.h"
#include "ui/document/qt_convert.h"

namespace hierloom::ui {

BackgroundBackup::BackgroundBackup(QObject* parent) : QObject(parent) {}

BackgroundBackup::~BackgroundBackup()
{
    if (thread_.joinable()) thread_.join();
}

void BackgroundBackup::startIfDue(const QString& path, std::chrono::system_clock::time_point now)
{
    if (running_) return;
    if (thread_.joinable()) thread_.join();
    running_ = true;
    thread_ = std::thread([this, file = toStdString(path), now] {
        QString error;
        try {
            // Opened for writing only to skip the read-only open's check: the backup checks the file itself.
            const core::ColonyStore store = core::ColonyStore::open(file);
            core::backupIfDue(store, now);
        } catch (const std::exception& e) {
            error = QString::fromUtf8(e.what());
        }
        QMetaObject::invokeMethod(
            this,
            [this, error] {
                running_ = false;
                emit finished(error);
            },
            Qt::QueuedConnection);
    });
}

} // namespace hierloom::ui
