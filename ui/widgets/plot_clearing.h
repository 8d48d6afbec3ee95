// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <qcustomplot.h>

namespace hierloom::ui {

/// Removes every graph and item of a plot. The legend is emptied first, in
/// one pass: QCustomPlot lays the whole legend out again after each graph
/// that leaves it, which with a few hundred lines (a centre group's
/// timeline) took most of a second on every group switch.
inline void clearPlot(QCustomPlot* plot)
{
    plot->legend->clearItems();
    plot->clearGraphs();
    plot->clearItems();
}

} // namespace hierloom::ui
