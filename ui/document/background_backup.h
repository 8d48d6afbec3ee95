// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>
#include <QString>

#include <chrono>
#include <memory>
#include <thread>

namespace hierloom::ui {

/// The scheduled backup of a large colony file (core::backupIfDue) on a
/// thread and a connection of its own: copying and checking hundreds of
/// megabytes takes seconds, which the window does not wait for. One at a
/// time; the owner's destruction waits for a running one.
class BackgroundBackup : public QObject {
    Q_OBJECT
public:
    explicit BackgroundBackup(QObject* parent = nullptr);
    ~BackgroundBackup() override;

    /// Starts a backup of `path` if one is due at `now`; nothing when one is running.
    void startIfDue(const QString& path, std::chrono::system_clock::time_point now);
    bool isRunning() const { return running_; }

signals:
    /// The backup (or the decision that none was due) finished; `error` empty on success.
    void finished(const QString& error);

private:
    std::thread thread_;
    bool running_ = false;
};

} // namespace hierloom::ui
