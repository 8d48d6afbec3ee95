// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QTimer>
#include <QToolButton>

namespace hierloom::ui {

class ColonyDocument;

/// The main window's visible stability alert: a red status-bar button shown
/// while the latest week or month of some group crosses a threshold; its
/// tooltip carries the evidence and a click opens the Stability tab.
class StabilityBadge : public QToolButton {
    Q_OBJECT
public:
    explicit StabilityBadge(ColonyDocument* document, QWidget* parent = nullptr);
    /// Recomputes the latest periods of every group (after edits or new thresholds).
    void refresh();
    /// The groups whose latest period alerts.
    const QStringList& alertedGroups() const { return groups_; }

private:
    ColonyDocument* document_;
    QStringList groups_;
    QTimer debounce_;
};

} // namespace hierloom::ui
