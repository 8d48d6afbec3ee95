// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

class QLabel;
class QListWidget;

namespace hierloom::ui {

/// What the window shows while no colony is open. The first time (no recent
/// files) it offers, in a few plain words, the three ways in: explore the
/// demo colony (read-only copy), create a new colony, or import CSV files.
/// Once there are recent files it lists them above the same choices.
class WelcomePanel : public QWidget {
    Q_OBJECT
public:
    explicit WelcomePanel(QWidget* parent = nullptr);

    /// Shows the recent colonies (newest first); an empty list means first run.
    void setRecentFiles(const QStringList& files);
    bool isFirstRun() const { return firstRun_; }

signals:
    void demoRequested();
    void newRequested();
    void importRequested();
    void openRequested();
    void recentRequested(const QString& path);

private:
    QLabel* title_;
    QLabel* intro_;
    QLabel* recentTitle_;
    QListWidget* recent_;
    bool firstRun_ = true;
};

} // namespace hierloom::ui
