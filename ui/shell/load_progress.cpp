// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/load_progress.h"

#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"

#include <QHBoxLayout>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>

namespace hierloom::ui {

LoadProgress::LoadProgress(ColonyDocument* document, QWidget* parent)
    : QWidget(parent), document_(document), label_(new QLabel(this)), bar_(new QProgressBar(this)),
      readAll_(new QPushButton(tr("Read Every Group"), this))
{
    setObjectName(QStringLiteral("loadProgress"));
    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(label_);
    layout->addWidget(bar_);
    layout->addWidget(readAll_);
    bar_->setMaximumWidth(160);
    bar_->setTextVisible(false);
    readAll_->setToolTip(tr("Reads every group's encounters in the background, for views of all groups "
                            "(a large centre takes several seconds and much more memory)."));
    connect(readAll_, &QPushButton::clicked, document_, &ColonyDocument::readEverything);
    connect(document_, &ColonyDocument::changed, this, &LoadProgress::update);
    connect(document_, &ColonyDocument::loadFinished, this, &LoadProgress::update);
    connect(document_, &ColonyDocument::loadFailed, this, &LoadProgress::update);
    connect(document_, &ColonyDocument::loadProgress, this, [this](int done, int total) {
        update();
        bar_->setRange(0, total);
        bar_->setValue(done);
        bar_->setToolTip(tr("%1% of the encounters read").arg(total > 0 ? done * 100 / total : 100));
    });
    update();
}

void LoadProgress::update()
{
    const bool loading = document_->isLoading();
    const bool partial = document_->isOpen() && !document_->isComplete();
    if (loading && bar_->isHidden()) {
        bar_->setRange(0, 0); // busy until the first group is counted
        bar_->setValue(0);
    }
    bar_->setVisible(loading);
    readAll_->setVisible(partial && !loading);
    if (loading) {
        label_->setText(tr("Reading every group's encounters…"));
        label_->setToolTip(tr("A large colony opens with one group; views of all groups fill in when every one is read."));
    } else if (partial) {
        QStringList groups;
        for (const std::string& g : document_->heldGroups()) groups << toQString(g);
        label_->setText(tr("Groups in memory: %1").arg(groups.join(QStringLiteral(", "))));
        label_->setToolTip(tr("This centre is read group by group as views turn to them; "
                              "\"All groups\" covers only the groups in memory until every group is read."));
    }
    setVisible(loading || partial);
}

} // namespace hierloom::ui
