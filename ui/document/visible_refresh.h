// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>

#include <functional>

class QWidget;

namespace hierloom::ui {

/// Runs a view's (costly) refresh after a change only when the view is on
/// screen; a view on a hidden tab is marked stale and refreshed when it is
/// next shown. So typing an encounter does not recompute every analysis.
/// A view whose window has never been shown (tests, a view used on its own)
/// refreshes at once.
class VisibleRefresh : public QObject {
    Q_OBJECT
public:
    VisibleRefresh(QWidget* view, std::function<void()> refresh);

    /// Refreshes now if the view is on screen, else marks it stale.
    void request();
    bool isStale() const { return stale_; }

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    QWidget* view_;
    std::function<void()> refresh_;
    bool stale_ = false;
};

} // namespace hierloom::ui
