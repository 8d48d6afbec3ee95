// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/widgets/plot_export.h"

#include <QRectF>
#include <QString>
#include <QStringList>

#include <vector>

namespace hierloom::ui {

/// One line of text as an exported figure draws it: its box on the page
/// (units of 1/96 inch, rotated text as its bounding box) and its size at
/// print size in points.
struct FigureTextBox {
    QString text;
    QRectF box;
    double points = 0;
};

/// Every line of text the figure draws at `size`, recorded by drawing it
/// exactly as paintFigure does onto a device that keeps only the text boxes.
std::vector<FigureTextBox> figureTextBoxes(const PlotFigure& figure, const FigureSize& size);

/// What is wrong with the laid-out text: a box that leaves the page, two boxes
/// that overlap, text under `minimumPoints`. Empty when all is well.
QStringList figureLayoutProblems(const std::vector<FigureTextBox>& boxes, const FigureSize& size,
                                 double minimumPoints = kMinimumFigureTextPt);

} // namespace hierloom::ui
