// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>
#include <QString>

#include <atomic>
#include <functional>
#include <memory>
#include <thread>

namespace hierloom::ui {

/// Runs one long computation at a time on a worker thread and hands its
/// result back to the interface thread. A view starts a job with copies of
/// the data it needs; the job returns a closure that the runner calls on the
/// interface thread to show the result. Starting a new job cancels the old
/// one, whose result is then dropped, so a view never shows stale figures.
class ComputeRunner : public QObject {
    Q_OBJECT
public:
    using Apply = std::function<void()>;
    using Progress = std::function<void(int done, int total)>;
    /// The work: checks `cancel` between its steps and reports progress.
    using Job = std::function<Apply(const std::atomic<bool>& cancel, const Progress& progress)>;

    explicit ComputeRunner(QObject* parent = nullptr);
    /// Cancels a running job and waits for its thread.
    ~ComputeRunner() override;

    void start(Job job);
    /// Asks the running job to stop at its next step; finished(true) follows.
    void cancel();
    bool busy() const { return busy_; }
    /// Blocks until the running job ended and its result was applied (tests, exports).
    void wait();

signals:
    void started();
    void progress(int done, int total);
    /// The job ended; when it was cancelled, or failed, nothing was applied.
    void finished(bool cancelled);
    /// The job threw; the message is for the person.
    void failed(const QString& message);

private:
    struct Run {
        std::atomic<bool> cancel{false};
        quint64 generation = 0;
    };
    void join();

    std::thread thread_;
    std::shared_ptr<Run> run_;
    quint64 generation_ = 0;
    bool busy_ = false;
};

} // namespace hierloom::ui
