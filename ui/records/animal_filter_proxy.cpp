// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/animal_filter_proxy.h"

#include "ui/records/animal_table_model.h"

namespace hierloom::ui {

AnimalFilterProxy::AnimalFilterProxy(QObject* parent) : QSortFilterProxyModel(parent)
{
    setSortRole(AnimalTableModel::SortRole);
}

void AnimalFilterProxy::setText(const QString& text)
{
    if (text.trimmed() == text_) return;
    text_ = text.trimmed();
    invalidateFilter();
}

void AnimalFilterProxy::setPresentOnly(bool presentOnly)
{
    if (presentOnly == presentOnly_) return;
    presentOnly_ = presentOnly;
    invalidateFilter();
}

bool AnimalFilterProxy::filterAcceptsRow(int sourceRow, const QModelIndex& sourceParent) const
{
    const QModelIndex index = sourceModel()->index(sourceRow, 0, sourceParent);
    if (presentOnly_ && !index.data(AnimalTableModel::PresentRole).toBool()) return false;
    if (text_.isEmpty()) return true;
    return index.data(AnimalTableModel::SearchTextRole).toString().contains(text_, Qt::CaseInsensitive);
}

} // namespace hierloom::ui
