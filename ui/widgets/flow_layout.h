// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QLayout>
#include <QList>

#include <initializer_list>

namespace hierloom::ui {

/// A row of controls that goes on in a second row (and more) when the next
/// control does not fit the width: one row on a wide screen, several on a
/// small one. Its minimum width is that of its widest control (or group).
/// Items keep their size hints, centred in the height of their row.
class FlowLayout : public QLayout {
public:
    explicit FlowLayout(QWidget* parent = nullptr);
    ~FlowLayout() override;

    /// Widgets that stay together on one row, such as a label and its field.
    void addGroup(std::initializer_list<QWidget*> widgets);

    void addItem(QLayoutItem* item) override;
    int count() const override;
    QLayoutItem* itemAt(int index) const override;
    QLayoutItem* takeAt(int index) override;
    Qt::Orientations expandingDirections() const override;
    bool hasHeightForWidth() const override;
    int heightForWidth(int width) const override;
    QSize minimumSize() const override;
    QSize sizeHint() const override;
    void setGeometry(const QRect& rect) override;

private:
    /// Places the items in `rect` (when `apply`) and returns the height they take.
    int arrange(const QRect& rect, bool apply) const;

    QList<QLayoutItem*> items_;
};

} // namespace hierloom::ui
