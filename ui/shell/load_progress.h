// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

class QLabel;
class QProgressBar;

namespace hierloom::ui {

class ColonyDocument;

/// The status bar's "Reading encounters" bar while a large colony file loads
/// in the background (ColonyDocument::loadProgress); hidden otherwise. The load
/// stops by itself when the colony is closed or the window goes.
class LoadProgress : public QWidget {
    Q_OBJECT
public:
    explicit LoadProgress(ColonyDocument* document, QWidget* parent = nullptr);

    QProgressBar* bar() const { return bar_; }

private:
    void update();

    ColonyDocument* document_;
    QLabel* label_;
    QProgressBar* bar_;
};

} // namespace hierloom::ui
