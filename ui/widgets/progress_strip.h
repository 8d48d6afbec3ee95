// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

class QLabel;
class QProgressBar;
class QPushButton;

namespace hierloom::ui {

class ComputeRunner;

/// A one-line progress indicator with a Cancel button for a ComputeRunner;
/// after a cancel it offers to compute again (the `retry` signal).
class ProgressStrip : public QWidget {
    Q_OBJECT
public:
    ProgressStrip(ComputeRunner* runner, const QString& what, QWidget* parent = nullptr);

signals:
    void retry();

private:
    QLabel* label_;
    QProgressBar* bar_;
    QPushButton* cancel_;
    QPushButton* retry_;
};

} // namespace hierloom::ui
