// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/welcome_panel.h"

#include <QHBoxLayout>
#include <QLabel>
#include <QPushButton>
#include <QVBoxLayout>

namespace hierloom::ui {

WelcomePanel::WelcomePanel(QWidget* parent) : QWidget(parent)
{
    auto* title = new QLabel(tr("No colony is open"), this);
    QFont font = title->font();
    font.setPointSizeF(font.pointSizeF() * 1.5);
    title->setFont(font);
    auto* help = new QLabel(tr("Open a colony file (.hierloom), or create a new one and import CSV files into it."),
                            this);
    auto* open = new QPushButton(tr("&Open Colony..."), this);
    auto* create = new QPushButton(tr("&New Colony..."), this);
    connect(open, &QPushButton::clicked, this, &WelcomePanel::openRequested);
    connect(create, &QPushButton::clicked, this, &WelcomePanel::newRequested);

    auto* buttons = new QHBoxLayout;
    buttons->addStretch(1);
    buttons->addWidget(open);
    buttons->addWidget(create);
    buttons->addStretch(1);
    auto* layout = new QVBoxLayout(this);
    layout->addStretch(1);
    layout->addWidget(title, 0, Qt::AlignHCenter);
    layout->addWidget(help, 0, Qt::AlignHCenter);
    layout->addSpacing(12);
    layout->addLayout(buttons);
    layout->addStretch(2);
}

} // namespace hierloom::ui
