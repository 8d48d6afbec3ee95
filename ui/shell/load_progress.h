// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

class QLabel;
class QProgressBar;
class QPushButton;

namespace hierloom::ui {

class ColonyDocument;

/// The status bar's part for a large colony file that is not read whole: a
/// "Reading every group" bar while the background load runs
/// (ColonyDocument::loadProgress), or, for a centre kept group by group, which
/// groups are in memory and a button that reads every group. Hidden otherwise.
/// The load stops by itself when the colony is closed or the window goes.
class LoadProgress : public QWidget {
    Q_OBJECT
public:
    explicit LoadProgress(ColonyDocument* document, QWidget* parent = nullptr);

    QProgressBar* bar() const { return bar_; }
    QPushButton* readEverythingButton() const { return readAll_; }

private:
    void update();

    ColonyDocument* document_;
    QLabel* label_;
    QProgressBar* bar_;
    QPushButton* readAll_;
};

} // namespace hierloom::ui
