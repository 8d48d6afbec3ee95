// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QHeaderView>
#include <QTableView>

namespace hierloom::ui {

/// Sizes columns to their contents plus a little air. Qt samples at most
/// 1,000 rows for this, so it stays quick on a million-row table.
inline void fitColumns(QTableView* table)
{
    table->resizeColumnsToContents();
    const int air = table->fontMetrics().averageCharWidth() * 2;
    for (int c = 0; c < table->model()->columnCount(); ++c) table->setColumnWidth(c, table->columnWidth(c) + air);
}

} // namespace hierloom::ui
