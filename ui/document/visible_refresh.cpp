// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/visible_refresh.h"

#include <QEvent>
#include <QWidget>

namespace hierloom::ui {

VisibleRefresh::VisibleRefresh(QWidget* view, std::function<void()> refresh)
    : QObject(view), view_(view), refresh_(std::move(refresh))
{
    view_->installEventFilter(this);
}

void VisibleRefresh::request()
{
    const bool windowShown = view_->window()->isVisible();
    if (!windowShown || view_->isVisible()) {
        stale_ = false;
        refresh_();
    } else {
        stale_ = true;
    }
}

bool VisibleRefresh::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == view_ && event->type() == QEvent::Show && stale_) {
        stale_ = false;
        refresh_();
    }
    return QObject::eventFilter(watched, event);
}

} // namespace hierloom::ui
