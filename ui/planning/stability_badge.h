// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QStringList>
#include <QTimer>
#include <QToolButton>

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;

/// The main window's visible stability alert: a red status-bar button shown
/// while the latest week or month of some group crosses a threshold; its
/// tooltip carries the evidence and a click opens the Stability tab. The
/// check runs on a worker thread (seconds on a colony of a million
/// encounters), so the window stays responsive while it runs.
class StabilityBadge : public QToolButton {
    Q_OBJECT
public:
    explicit StabilityBadge(ColonyDocument* document, QWidget* parent = nullptr);
    ~StabilityBadge() override;
    /// Starts a new check of the latest periods of every group (after edits or new thresholds).
    void refresh();
    /// Blocks until the check started last has been shown (tests).
    void waitForCheck();
    /// The groups whose latest period alerts, as of the last finished check.
    const QStringList& alertedGroups() const { return groups_; }

private:
    void show(const QStringList& groups, const QStringList& evidence);

    ColonyDocument* document_;
    ComputeRunner* runner_;
    QStringList groups_;
    QTimer debounce_;
};

} // namespace hierloom::ui
