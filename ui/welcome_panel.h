// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

namespace hierloom::ui {

/// What the window shows while no colony is open: a line of help and the two ways in.
class WelcomePanel : public QWidget {
    Q_OBJECT
public:
    explicit WelcomePanel(QWidget* parent = nullptr);

signals:
    void openRequested();
    void newRequested();
};

} // namespace hierloom::ui
