// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QString>

class QCustomPlot;
class QToolButton;
class QWidget;

namespace hierloom::ui {

/// Size of an exported figure: a two-column journal figure by default
/// (180 mm wide) at 300 dots per inch.
struct FigureSize {
    double widthMm = 180;
    double heightMm = 120;
    int dpi = 300;
};

/// Writes the plot as a PNG of `size` (pixels = mm / 25.4 * dpi) with the
/// resolution stored in the file; false when the file cannot be written.
bool exportPng(QCustomPlot* plot, const QString& path, const FigureSize& size = {});
/// Writes the plot as a vector PDF whose page is `size` in millimetres.
bool exportPdf(QCustomPlot* plot, const QString& path, const FigureSize& size = {});
/// Puts the plot on the clipboard as an image of `size`.
void copyPlot(QCustomPlot* plot, const FigureSize& size = {});

/// A tool button with a menu: Save as PNG..., Save as PDF..., Copy; the file
/// dialogs suggest `baseName` and report a failed write in a message box.
QToolButton* makeExportButton(QCustomPlot* plot, const QString& baseName, QWidget* parent);

} // namespace hierloom::ui
