// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QColor>

class QCustomPlot;
class QWidget;

namespace hierloom::ui {

/// The colours plots are drawn with on screen. Exported figures are always
/// drawn with the light palette (white paper).
enum class PlotPalette { Light, Dark };

struct PlotColours {
    QColor background;
    QColor text;
    QColor axis;
    QColor grid;
};

PlotColours plotColours(PlotPalette palette);

/// Recolours background, axes, grid, legend, text elements and black or white
/// text items of `plot` (coloured marks and lines keep their colours).
void applyPlotColours(QCustomPlot* plot, const PlotColours& colours);

/// The palette stored in the user's settings ("plotPalette"), light by default.
PlotPalette storedPlotPalette();

/// Makes `plot` follow the palette on screen: the stored one now, and the one
/// setPlotPalette gives later; applied before every replot, so items a view
/// adds later take the palette too.
void followPlotPalette(QCustomPlot* plot);

/// The palette a following plot is drawn with.
PlotPalette plotPalette(const QCustomPlot* plot);

/// Stores the choice and redraws every following plot under `root` with it.
void setPlotPalette(QWidget* root, PlotPalette palette);

} // namespace hierloom::ui
