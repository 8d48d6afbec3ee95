// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/progress_strip.h"

#include "ui/document/compute_runner.h"

#include <QHBoxLayout>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>

namespace hierloom::ui {

ProgressStrip::ProgressStrip(ComputeRunner* runner, const QString& what, QWidget* parent)
    : QWidget(parent),
      label_(new QLabel(this)),
      bar_(new QProgressBar(this)),
      cancel_(new QPushButton(tr("Cancel"), this)),
      retry_(new QPushButton(tr("Compute Again"), this))
{
    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(label_);
    layout->addWidget(bar_, 1);
    layout->addWidget(cancel_);
    layout->addWidget(retry_);
    bar_->setMaximumWidth(220);
    label_->setWordWrap(true); // a long failure message must not widen its view
    bar_->setTextVisible(false);
    retry_->hide();
    hide();
    connect(cancel_, &QPushButton::clicked, runner, &ComputeRunner::cancel);
    connect(retry_, &QPushButton::clicked, this, &ProgressStrip::retry);
    connect(runner, &ComputeRunner::started, this, [this, what] {
        label_->setText(tr("Computing %1...").arg(what));
        bar_->setRange(0, 0); // busy until the first progress report
        bar_->show();
        cancel_->show();
        retry_->hide();
        show();
    });
    connect(runner, &ComputeRunner::progress, this, [this](int done, int total) {
        bar_->setRange(0, total);
        bar_->setValue(done);
    });
    connect(runner, &ComputeRunner::failed, this, [this](const QString& message) {
        label_->setText(tr("Failed: %1").arg(message));
    });
    connect(runner, &ComputeRunner::finished, this, [this](bool stopped) {
        if (!stopped) {
            hide();
            return;
        }
        if (!label_->text().startsWith(tr("Failed"))) label_->setText(tr("Stopped; the view shows nothing new."));
        bar_->hide();
        cancel_->hide();
        retry_->show();
    });
}

} // namespace hierloom::ui
