// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/flow_layout.h"

#include <QHBoxLayout>
#include <QWidget>

#include <algorithm>
#include <vector>

namespace hierloom::ui {

FlowLayout::FlowLayout(QWidget* parent) : QLayout(parent) {}

FlowLayout::~FlowLayout()
{
    while (QLayoutItem* item = takeAt(0)) delete item;
}

void FlowLayout::addGroup(std::initializer_list<QWidget*> widgets)
{
    auto* group = new QHBoxLayout;
    group->setContentsMargins(0, 0, 0, 0);
    addChildLayout(group);
    for (QWidget* w : widgets) group->addWidget(w);
    addItem(group);
}

void FlowLayout::addItem(QLayoutItem* item)
{
    items_.append(item);
    invalidate();
}

int FlowLayout::count() const { return static_cast<int>(items_.size()); }

QLayoutItem* FlowLayout::itemAt(int index) const
{
    return index >= 0 && index < items_.size() ? items_.at(index) : nullptr;
}

QLayoutItem* FlowLayout::takeAt(int index)
{
    if (index < 0 || index >= items_.size()) return nullptr;
    QLayoutItem* item = items_.takeAt(index);
    invalidate();
    return item;
}

Qt::Orientations FlowLayout::expandingDirections() const { return {}; }

bool FlowLayout::hasHeightForWidth() const { return true; }

int FlowLayout::heightForWidth(int width) const { return arrange(QRect(0, 0, width, 0), false); }

QSize FlowLayout::minimumSize() const
{
    QSize size;
    for (const QLayoutItem* item : items_)
        if (!item->isEmpty()) size = size.expandedTo(item->minimumSize());
    const QMargins m = contentsMargins();
    return size + QSize(m.left() + m.right(), m.top() + m.bottom());
}

QSize FlowLayout::sizeHint() const
{
    // All on one row.
    int width = 0, height = 0, shown = 0;
    for (const QLayoutItem* item : items_) {
        if (item->isEmpty()) continue;
        width += item->sizeHint().width();
        height = std::max(height, item->sizeHint().height());
        ++shown;
    }
    const QMargins m = contentsMargins();
    return {width + std::max(0, shown - 1) * std::max(0, spacing()) + m.left() + m.right(), height + m.top() + m.bottom()};
}

void FlowLayout::setGeometry(const QRect& rect)
{
    QLayout::setGeometry(rect);
    arrange(rect, true);
}

int FlowLayout::arrange(const QRect& rect, bool apply) const
{
    const QMargins m = contentsMargins();
    const QRect area = rect.marginsRemoved(m);
    const int gap = std::max(0, spacing());
    struct Placed {
        QLayoutItem* item;
        int x, width;
    };
    std::vector<Placed> row;
    int y = area.y(), x = area.x(), rowHeight = 0;
    auto finishRow = [&] {
        if (apply)
            for (const Placed& p : row) {
                const int h = std::min(rowHeight, p.item->sizeHint().height());
                p.item->setGeometry(QRect(p.x, y + (rowHeight - h) / 2, p.width, h));
            }
        if (!row.empty()) y += rowHeight + gap;
        row.clear();
        x = area.x();
        rowHeight = 0;
    };
    for (QLayoutItem* item : items_) {
        if (item->isEmpty()) continue;
        const int width = std::max(item->minimumSize().width(), std::min(item->sizeHint().width(), area.width()));
        if (!row.empty() && x + width > area.x() + area.width()) finishRow();
        row.push_back({item, x, width});
        x += width + gap;
        rowHeight = std::max(rowHeight, item->sizeHint().height());
    }
    finishRow();
    return std::max(0, y - gap - area.y()) + m.top() + m.bottom();
}

} // namespace hierloom::ui
