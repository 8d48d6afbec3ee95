// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QString>
#include <QToolButton>

#include <functional>
#include <optional>

class QCPLayoutGrid;
class QCPLegend;
class QCPPainter;
class QCustomPlot;
class QWidget;

namespace hierloom::ui {

/// Journal figure widths: one column and two columns.
constexpr double kSingleColumnMm = 85;
constexpr double kDoubleColumnMm = 175;
/// No text of an exported figure is smaller than this at print size.
constexpr double kMinimumFigureTextPt = 7;

/// Size of an exported figure in millimetres, and the PNG resolution.
struct FigureSize {
    double widthMm = kDoubleColumnMm;
    double heightMm = 110;
    int dpi = 300;
};

/// A plot as a figure for a paper: what the export menu and the tests need.
/// The view keeps it: `caption` is asked at export time, so it always names the
/// group, window, method and parameters on screen.
struct PlotFigure {
    QCustomPlot* plot = nullptr;
    QString baseName;                 ///< suggested file name, without suffix
    QString title;                    ///< printed above the plot
    std::function<QString()> caption; ///< group, window, method and parameters; the program version is added
    double singleHeightMm = 70;       ///< height at one column (85 mm wide)
    double doubleHeightMm = 110;      ///< height at two columns (175 mm wide)
    /// Called after the print style is set and the layout computed at print
    /// size, before the second layout and the drawing: the view may hide what
    /// cannot be read at that size (everything it changes is put back after).
    std::function<void()> preparePrint;
    /// When set, the height in mm at one or two columns (true), for plots
    /// whose height follows what they show (one line per animal).
    std::function<double(bool doubleColumn)> height;

    FigureSize size(bool doubleColumn, int dpi = 300) const;
};

enum class FigureFormat { Png, Svg, Pdf };

/// The format of a file name's suffix (png, svg, pdf; any case).
std::optional<FigureFormat> figureFormatOf(const QString& path);

/// The caption line printed under an exported figure: the view's caption and
/// "Hierloom VERSION".
QString figureCaption(const PlotFigure& figure);

/// Lays the figure out at `size` in the print style (white paper, text at
/// least kMinimumFigureTextPt, legend wrapped to the width, title and caption
/// lines) and draws it on `painter`, in units of 1/96 inch. The plot is put back
/// as it was afterwards.
void paintFigure(const PlotFigure& figure, QCPPainter* painter, const FigureSize& size);

/// Writes the figure as PNG (pixels = mm / 25.4 * dpi, resolution stored),
/// SVG or PDF (page of `size` in millimetres), chosen by the file's suffix;
/// false when the suffix is unknown or the file cannot be written.
bool exportFigure(const PlotFigure& figure, const QString& path, const FigureSize& size);

/// Puts the figure on the clipboard as an image of `size`.
void copyFigure(const PlotFigure& figure, const FigureSize& size);

/// The Export button of a plot: a menu with a one-column figure, a two-column
/// figure (each as PNG, SVG or PDF by the chosen file type) and Copy. It also
/// makes the plot follow the light/dark palette on screen.
class FigureExportButton : public QToolButton {
    Q_OBJECT
public:
    FigureExportButton(PlotFigure figure, QWidget* parent);
    const PlotFigure& figure() const { return figure_; }

private:
    void save(bool doubleColumn);
    PlotFigure figure_;
};

QToolButton* makeExportButton(const PlotFigure& figure, QWidget* parent);

/// Arranges a legend above or below a plot in as many columns as fit in
/// `width` pixels (at least one), filled row by row: a legend wider than its
/// plot wraps instead of being cut at the sides.
void fitLegendToWidth(QCPLegend* legend, int width);

/// Keeps the legend above or below a plot on screen within the plot's width:
/// before every replot (a resize replots too) it takes the columns that fit.
/// The legend then no longer sets the plot's minimum width.
void wrapLegendToPlotWidth(QCustomPlot* plot);

/// Arranges a legend beside a plot in as many columns as it needs so that no
/// entry falls below `height` pixels (the plot's height): a long legend is
/// never clipped.
void fitLegendToHeight(QCPLegend* legend, int height);

/// Keeps a plot's legend in `beside` (a grid right of the plot) while its
/// entries fit one column of the plot's height, and otherwise in `under` (a
/// grid below the plot) wrapped to the plot's width, so that a long legend
/// (a centre's many matrilines) leaves the plot its width. Decided before
/// every replot; the legend starts in either grid, and each grid keeps a
/// filler element below the legend's row (an empty grid would cap its
/// column's width at nothing).
void placeLegendBesideOrUnder(QCustomPlot* plot, QCPLayoutGrid* beside, QCPLayoutGrid* under);

} // namespace hierloom::ui
