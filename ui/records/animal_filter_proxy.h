// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QSortFilterProxyModel>
#include <QString>

namespace hierloom::ui {

/// Narrows the animal table by free text (id, name, mother, matriarch) and
/// by status, and sorts it by each column's natural order.
class AnimalFilterProxy : public QSortFilterProxyModel {
    Q_OBJECT
public:
    explicit AnimalFilterProxy(QObject* parent = nullptr);

    void setText(const QString& text);
    void setPresentOnly(bool presentOnly);

protected:
    bool filterAcceptsRow(int sourceRow, const QModelIndex& sourceParent) const override;

private:
    QString text_;
    bool presentOnly_ = false;
};

} // namespace hierloom::ui
