// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/compute_runner.h"

#include "core/base/vector_state.h"

#include <QCoreApplication>

#include <exception>

namespace hierloom::ui {

ComputeRunner::ComputeRunner(QObject* parent) : QObject(parent) {}

ComputeRunner::~ComputeRunner()
{
    if (run_) run_->cancel = true;
    join();
}

void ComputeRunner::join()
{
    if (thread_.joinable()) thread_.join();
}

void ComputeRunner::start(Job job)
{
    if (run_) run_->cancel = true;
    // The old job stops at its next step; its queued result is dropped by generation.
    join();
    auto run = std::make_shared<Run>();
    run->generation = ++generation_;
    run_ = run;
    busy_ = true;
    emit started();
    thread_ = std::thread([this, run, job = std::move(job)] {
        // A thread inherits its starter's registers; Qt's painting leaves them dirty (vector_state.h).
        core::clearUpperVectorState();
        const Progress report = [this, run](int done, int total) {
            QMetaObject::invokeMethod(
                this, [this, run, done, total] {
                    if (run->generation == generation_) emit progress(done, total);
                },
                Qt::QueuedConnection);
        };
        Apply apply;
        QString error;
        try {
            apply = job(run->cancel, report);
        } catch (const std::exception& e) {
            error = QString::fromUtf8(e.what());
        }
        QMetaObject::invokeMethod(
            this, [this, run, apply = std::move(apply), error] {
                if (run->generation != generation_) return;
                busy_ = false;
                const bool stopped = run->cancel.load() || !error.isEmpty();
                if (!error.isEmpty()) emit failed(error);
                if (!stopped && apply) apply();
                emit finished(stopped);
            },
            Qt::QueuedConnection);
    });
}

void ComputeRunner::cancel()
{
    if (run_) run_->cancel = true;
}

void ComputeRunner::wait()
{
    join();
    QCoreApplication::sendPostedEvents(this);
}

} // namespace hierloom::ui
