// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/load_progress.h"

#include "ui/document/colony_document.h"

#include <QHBoxLayout>
#include <QLabel>
#include <QProgressBar>

namespace hierloom::ui {

LoadProgress::LoadProgress(ColonyDocument* document, QWidget* parent)
    : QWidget(parent), document_(document), label_(new QLabel(this)), bar_(new QProgressBar(this))
{
    setObjectName(QStringLiteral("loadProgress"));
    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(label_);
    layout->addWidget(bar_);
    bar_->setMaximumWidth(160);
    bar_->setTextVisible(false);
    label_->setText(tr("Reading every group's encounters…"));
    label_->setToolTip(tr("A large colony opens with one group; views of every group fill in when all are read."));
    connect(document_, &ColonyDocument::changed, this, &LoadProgress::update);
    connect(document_, &ColonyDocument::loadFinished, this, &LoadProgress::update);
    connect(document_, &ColonyDocument::loadFailed, this, &LoadProgress::update);
    connect(document_, &ColonyDocument::loadProgress, this, [this](int done, int total) {
        bar_->setRange(0, total);
        bar_->setValue(done);
        bar_->setToolTip(tr("%1 of %2 groups read").arg(done).arg(total));
    });
    update();
}

void LoadProgress::update()
{
    const bool loading = document_->isLoading();
    if (loading && !isVisible()) {
        bar_->setRange(0, 0); // busy until the first group is counted
        bar_->setValue(0);
    }
    setVisible(loading);
}

} // namespace hierloom::ui
