// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/plot_export.h"

#include "ui/widgets/plot_palette.h"

#include <QApplication>
#include <QClipboard>
#include <QFileDialog>
#include <QFileInfo>
#include <QFontMetricsF>
#include <QImage>
#include <QMenu>
#include <QMessageBox>
#include <QPageSize>
#include <QPdfWriter>
#include <QSettings>
#include <QSvgGenerator>
#include <QToolButton>

#include <qcustomplot.h>

#include <algorithm>
#include <cmath>
#include <vector>

#ifndef HIERLOOM_VERSION
#define HIERLOOM_VERSION "unknown"
#endif

namespace hierloom::ui {

namespace {

// Figures are laid out at 96 units per inch, the unit of screen layouts, so
// that lines and marks keep their on-screen proportions; fonts are set in
// those units (10 units = 7.5 pt) and only the output is scaled.
constexpr double layoutDpi = 96.0;
constexpr int tickPx = 10;    // 7.5 pt
constexpr int labelPx = 11;   // 8.25 pt
constexpr int titlePx = 12;   // 9 pt

int logical(double mm) { return static_cast<int>(std::lround(mm / 25.4 * layoutDpi)); }

QFont printFont(int pixels, bool bold = false)
{
    QFont f = QApplication::font();
    f.setPixelSize(pixels);
    f.setBold(bold);
    return f;
}

/// Words of `text` broken into lines no wider than `width` units.
QString wrapped(const QString& text, const QFont& font, double width)
{
    const QFontMetricsF m(font);
    QStringList lines;
    QString line;
    for (const QString& word : text.split(QLatin1Char(' '), Qt::SkipEmptyParts)) {
        const QString longer = line.isEmpty() ? word : line + QLatin1Char(' ') + word;
        if (!line.isEmpty() && m.horizontalAdvance(longer) > width) {
            lines << line;
            line = word;
        } else {
            line = longer;
        }
    }
    if (!line.isEmpty()) lines << line;
    return lines.join(QLatin1Char('\n'));
}

/// The legend's items (a wrapped legend's grid may hold empty cells).
std::vector<QCPAbstractLegendItem*> legendItems(QCPLegend* legend)
{
    std::vector<QCPAbstractLegendItem*> out;
    for (int i = 0; i < legend->itemCount(); ++i)
        if (QCPAbstractLegendItem* item = legend->item(i)) out.push_back(item);
    return out;
}

void layOut(QCustomPlot* plot, const QRect& viewport)
{
    plot->setViewport(viewport);
    QCPLayoutGrid* layout = plot->plotLayout();
    layout->update(QCPLayoutElement::upPreparation);
    layout->update(QCPLayoutElement::upMargins);
    layout->update(QCPLayoutElement::upLayout);
}

/// The print style of a plot while it is drawn for export; the destructor puts
/// back every font, tick count, legend arrangement and visibility it changed,
/// and removes the title and caption lines.
class PrintStyle {
public:
    PrintStyle(const PlotFigure& figure, const QRect& viewport) : plot_(figure.plot), viewport_(viewport)
    {
        QCustomPlot* plot = plot_;
        oldViewport_ = plot->viewport();
        applyPlotColours(plot, plotColours(PlotPalette::Light));
        for (QCPAxisRect* rect : plot->axisRects())
            for (QCPAxis* a : rect->axes()) {
                const QFont tick = a->tickLabelFont(), label = a->labelFont();
                later([a, tick, label] {
                    a->setTickLabelFont(tick);
                    a->setLabelFont(label);
                });
                a->setTickLabelFont(printFont(tickPx));
                a->setLabelFont(printFont(labelPx));
            }
        for (int i = 0; i < plot->itemCount(); ++i) {
            QCPAbstractItem* item = plot->item(i);
            const bool visible = item->visible();
            later([item, visible] { item->setVisible(visible); });
            if (auto* text = qobject_cast<QCPItemText*>(item)) {
                const QFont font = text->font();
                later([text, font] { text->setFont(font); });
                QFont f = printFont(tickPx);
                f.setBold(font.bold());
                text->setFont(f);
            }
        }
        for (QCPLayoutElement* e : plot->plotLayout()->elements(true))
            if (auto* text = qobject_cast<QCPTextElement*>(e)) {
                const QFont font = text->font();
                later([text, font] { text->setFont(font); });
                text->setFont(printFont(labelPx, font.bold()));
            }
        if (QCPLegend* legend = plot->legend) {
            const QFont font = legend->font();
            const int wrap = legend->wrap();
            const QCPLayoutGrid::FillOrder order = legend->fillOrder();
            const QSize icon = legend->iconSize();
            later([legend, font, wrap, icon, order] {
                legend->setFont(font);
                for (QCPAbstractLegendItem* item : legendItems(legend)) item->setFont(font);
                legend->setIconSize(icon);
                legend->setWrap(wrap);
                legend->setFillOrder(order, true);
            });
            legend->setFont(printFont(tickPx));
            for (QCPAbstractLegendItem* item : legendItems(legend)) item->setFont(printFont(tickPx));
            legend->setIconSize(18, 9);
            // A legend beside the plot (a layout of several columns) goes under it on paper,
            // where the plot keeps the page's width; it is put back afterwards.
            auto* parent = qobject_cast<QCPLayoutGrid*>(legend->layout());
            QCPLayoutGrid* top = plot->plotLayout();
            if (top->columnCount() > 1 && parent && legend->visible()) {
                int index = -1;
                for (int i = 0; i < parent->elementCount(); ++i)
                    if (parent->elementAt(i) == legend) index = i;
                int row = 0, column = 0;
                parent->indexToRowCol(index, row, column);
                parent->take(legend);
                const int below = top->rowCount();
                top->insertRow(below);
                top->addElement(below, 0, legend);
                top->setRowStretchFactor(below, 0.001);
                later([top, parent, legend, row, column] {
                    top->take(legend);
                    parent->addElement(row, column, legend);
                });
            }
            fitLegendToWidth(legend, viewport.width() - 8);
        }
        // First wrapped to the first column's share of the page, then to the width that column got.
        const double lineWidth = (viewport.width() - 12.0) / std::max(1, plot->plotLayout()->columnCount());
        if (!figure.title.isEmpty()) addLine(0, figure.title, printFont(titlePx, true), lineWidth);
        addLine(plot->plotLayout()->rowCount(), figureCaption(figure), printFont(tickPx), lineWidth);

        layOut(plot, viewport);
        for (size_t i = 0; i < lines_.size(); ++i)
            lines_[i]->setText(wrapped(texts_[i], lines_[i]->font(), lines_[i]->outerRect().width() - 12.0));
        layOut(plot, viewport);
        fitTickCounts();
        // Twice: what the view hides or thins changes the margins, and so the room it judged by.
        for (int pass = 0; pass < 2 && figure.preparePrint; ++pass) {
            figure.preparePrint();
            layOut(plot, viewport);
        }
        layOut(plot, viewport);
    }

    ~PrintStyle()
    {
        for (auto it = undo_.rbegin(); it != undo_.rend(); ++it) (*it)();
        for (QCPTextElement* line : lines_) {
            plot_->plotLayout()->take(line);
            delete line;
        }
        if (!lines_.empty()) plot_->plotLayout()->simplify();
        plot_->setViewport(oldViewport_);
        plot_->replot(QCustomPlot::rpQueuedReplot);
    }

    PrintStyle(const PrintStyle&) = delete;
    PrintStyle& operator=(const PrintStyle&) = delete;

private:
    void later(std::function<void()> undo) { undo_.push_back(std::move(undo)); }

    void addLine(int row, const QString& text, const QFont& font, double width)
    {
        QCPLayoutGrid* layout = plot_->plotLayout();
        layout->insertRow(row);
        auto* line = new QCPTextElement(plot_, wrapped(text, font, width), font);
        texts_.push_back(text);
        line->setTextColor(Qt::black);
        line->setMargins(QMargins(4, 3, 4, 3));
        layout->addElement(row, 0, line);
        layout->setRowStretchFactor(row, 0.001);
        lines_.push_back(line);
    }

    /// Fewer ticks on short or narrow axes, so their labels stay apart.
    void fitTickCounts()
    {
        const double line = QFontMetricsF(printFont(tickPx)).height();
        for (QCPAxisRect* rect : plot_->axisRects())
            for (QCPAxis* a : rect->axes()) {
                QSharedPointer<QCPAxisTicker> ticker = a->ticker();
                if (!ticker || ticker.dynamicCast<QCPAxisTickerText>()) continue;
                const int count = ticker->tickCount();
                const QCPAxisTicker::TickStepStrategy strategy = ticker->tickStepStrategy();
                const bool vertical = a->orientation() == Qt::Vertical;
                const double room = vertical ? rect->height() / (2.5 * line) : rect->width() / (6.5 * line);
                const int wanted = std::clamp(static_cast<int>(room), 2, std::max(2, count));
                if (wanted == count) continue;
                later([ticker, count, strategy] {
                    ticker->setTickCount(count);
                    ticker->setTickStepStrategy(strategy);
                });
                ticker->setTickCount(wanted);
                ticker->setTickStepStrategy(QCPAxisTicker::tssMeetTickCount);
            }
    }

    QCustomPlot* plot_;
    QRect viewport_;
    QRect oldViewport_;
    std::vector<std::function<void()>> undo_;
    std::vector<QCPTextElement*> lines_;
    QStringList texts_; ///< the lines' texts before wrapping
};

} // namespace

void fitLegendToWidth(QCPLegend* legend, int width)
{
    const std::vector<QCPAbstractLegendItem*> items = legendItems(legend);
    const int n = static_cast<int>(items.size());
    if (n == 0) return;
    for (int columns = n; columns >= 1; --columns) {
        std::vector<int> widest(static_cast<size_t>(columns), 0);
        for (int i = 0; i < n; ++i)
            widest[static_cast<size_t>(i % columns)] =
                std::max(widest[static_cast<size_t>(i % columns)], items[static_cast<size_t>(i)]->minimumOuterSizeHint().width());
        int total = legend->margins().left() + legend->margins().right() + (columns - 1) * legend->columnSpacing();
        for (int w : widest) total += w;
        if (total <= width || columns == 1) {
            if (legend->wrap() == columns && legend->fillOrder() == QCPLayoutGrid::foColumnsFirst) return;
            legend->setWrap(columns);
            legend->setFillOrder(QCPLayoutGrid::foColumnsFirst, true);
            return;
        }
    }
}

void wrapLegendToPlotWidth(QCustomPlot* plot)
{
    QObject::connect(plot, &QCustomPlot::beforeReplot, plot, [plot] {
        if (!plot->legend || !plot->legend->visible()) return;
        const QMargins m = plot->plotLayout()->margins();
        fitLegendToWidth(plot->legend, plot->viewport().width() - m.left() - m.right());
    });
}

void fitLegendToHeight(QCPLegend* legend, int height)
{
    const std::vector<QCPAbstractLegendItem*> items = legendItems(legend);
    if (items.empty() || height <= 0) return;
    int itemHeight = 1;
    for (QCPAbstractLegendItem* item : items) itemHeight = std::max(itemHeight, item->minimumOuterSizeHint().height());
    const int room = height - legend->margins().top() - legend->margins().bottom();
    const int perColumn = std::max(1, (room + legend->rowSpacing()) / (itemHeight + legend->rowSpacing()));
    if (legend->fillOrder() == QCPLayoutGrid::foRowsFirst && legend->wrap() == perColumn) return;
    legend->setWrap(perColumn);
    legend->setFillOrder(QCPLayoutGrid::foRowsFirst, true);
}

void placeLegendBesideOrUnder(QCustomPlot* plot, QCPLayoutGrid* beside, QCPLayoutGrid* under)
{
    QObject::connect(plot, &QCustomPlot::beforeReplot, plot, [plot, beside, under] {
        QCPLegend* legend = plot->legend;
        if (!legend || !legend->visible()) return;
        // One column's height, from the entries alone (not from where the
        // legend is now), so the choice cannot swing from one replot to the next.
        const std::vector<QCPAbstractLegendItem*> items = legendItems(legend);
        int column = legend->margins().top() + legend->margins().bottom();
        for (QCPAbstractLegendItem* item : items) column += item->minimumOuterSizeHint().height() + legend->rowSpacing();
        const QMargins m = plot->plotLayout()->margins();
        const int height = plot->viewport().height() - m.top() - m.bottom();
        const bool fitsBeside = column <= height;
        QCPLayoutGrid* place = fitsBeside ? beside : under;
        if (legend->layout() != place) {
            if (auto* grid = qobject_cast<QCPLayoutGrid*>(legend->layout())) {
                grid->take(legend);
                grid->simplify();
            }
            place->insertRow(0);
            place->addElement(0, 0, legend);
            place->setRowStretchFactor(0, 0.001); // the legend's row as low as its entries
        }
        // The plot's full height beside it (the row under it is empty then),
        // not the height of the last layout, which may have had the legend under it.
        if (fitsBeside) fitLegendToHeight(legend, height);
        else fitLegendToWidth(legend, plot->viewport().width() - m.left() - m.right());
    });
}

namespace {

QString exportFolder()
{
    return QSettings().value(QStringLiteral("plotExportFolder"), QDir::homePath()).toString();
}

QImage figureImage(const PlotFigure& figure, const FigureSize& size)
{
    const int w = logical(size.widthMm), h = logical(size.heightMm);
    const double scale = size.dpi / layoutDpi;
    QImage image(static_cast<int>(std::lround(w * scale)), static_cast<int>(std::lround(h * scale)),
                 QImage::Format_ARGB32_Premultiplied);
    const int dotsPerMetre = static_cast<int>(std::lround(layoutDpi / 0.0254));
    image.setDotsPerMeterX(dotsPerMetre); // fonts in points (if any) measured at the layout's 96 per inch
    image.setDotsPerMeterY(dotsPerMetre);
    image.fill(Qt::white);
    {
        QCPPainter painter(&image);
        painter.scale(scale, scale);
        paintFigure(figure, &painter, size);
    }
    image.setDotsPerMeterX(static_cast<int>(std::lround(size.dpi / 0.0254)));
    image.setDotsPerMeterY(static_cast<int>(std::lround(size.dpi / 0.0254)));
    return image;
}

} // namespace

FigureSize PlotFigure::size(bool doubleColumn, int dpi) const
{
    const double h = height ? height(doubleColumn) : doubleColumn ? doubleHeightMm : singleHeightMm;
    return {doubleColumn ? kDoubleColumnMm : kSingleColumnMm, h, dpi};
}

std::optional<FigureFormat> figureFormatOf(const QString& path)
{
    const QString suffix = QFileInfo(path).suffix().toLower();
    if (suffix == QLatin1String("png")) return FigureFormat::Png;
    if (suffix == QLatin1String("svg")) return FigureFormat::Svg;
    if (suffix == QLatin1String("pdf")) return FigureFormat::Pdf;
    return std::nullopt;
}

QString figureCaption(const PlotFigure& figure)
{
    QString text = figure.caption ? figure.caption() : QString();
    const QString version = QObject::tr("Hierloom %1").arg(QStringLiteral(HIERLOOM_VERSION));
    return text.isEmpty() ? version : text + QStringLiteral(" \u00b7 ") + version;
}

void paintFigure(const PlotFigure& figure, QCPPainter* painter, const FigureSize& size)
{
    const QRect viewport(0, 0, logical(size.widthMm), logical(size.heightMm));
    const PrintStyle style(figure, viewport);
    painter->setMode(QCPPainter::pmVectorized);
    painter->setMode(QCPPainter::pmNoCaching);
    painter->fillRect(viewport, Qt::white);
    figure.plot->toPainter(painter, viewport.width(), viewport.height());
}

bool exportFigure(const PlotFigure& figure, const QString& path, const FigureSize& size)
{
    const std::optional<FigureFormat> format = figureFormatOf(path);
    if (!format) return false;
    if (*format == FigureFormat::Png) return figureImage(figure, size).save(path, "PNG");
    if (*format == FigureFormat::Svg) {
        QSvgGenerator svg;
        svg.setFileName(path);
        svg.setSize(QSize(logical(size.widthMm), logical(size.heightMm)));
        svg.setViewBox(QRect(0, 0, logical(size.widthMm), logical(size.heightMm)));
        svg.setResolution(static_cast<int>(layoutDpi));
        svg.setTitle(figure.title);
        svg.setDescription(figureCaption(figure));
        QCPPainter painter;
        if (!painter.begin(&svg)) return false;
        paintFigure(figure, &painter, size);
        return painter.end() && QFileInfo(path).size() > 0;
    }
    // PDF through QPdfWriter, so the page is exactly the figure size in mm.
    QPdfWriter pdf(path);
    if (!pdf.setPageSize(QPageSize(QSizeF(size.widthMm, size.heightMm), QPageSize::Millimeter))) return false;
    pdf.setPageMargins(QMarginsF(0, 0, 0, 0));
    pdf.setResolution(static_cast<int>(layoutDpi));
    pdf.setCreator(QStringLiteral("Hierloom"));
    pdf.setTitle(figure.title);
    QCPPainter painter;
    if (!painter.begin(&pdf)) return false;
    paintFigure(figure, &painter, size);
    return painter.end();
}

void copyFigure(const PlotFigure& figure, const FigureSize& size)
{
    QApplication::clipboard()->setImage(figureImage(figure, size));
}

FigureExportButton::FigureExportButton(PlotFigure figure, QWidget* parent) : QToolButton(parent), figure_(std::move(figure))
{
    followPlotPalette(figure_.plot);
    setObjectName(QStringLiteral("exportFigure"));
    setText(tr("Export"));
    setToolTip(tr("Save the plot as a journal figure (one column, 85 mm, or two columns, 175 mm; PNG at 300 dpi, "
                  "SVG or PDF) with a caption line naming group, window, method and parameters, or copy it"));
    setPopupMode(QToolButton::InstantPopup);
    auto* menu = new QMenu(this);
    menu->addAction(tr("One-Column Figure (85 mm)..."), this, [this] { save(false); });
    menu->addAction(tr("Two-Column Figure (175 mm)..."), this, [this] { save(true); });
    menu->addAction(tr("&Copy to Clipboard"), this, [this] { copyFigure(figure_, figure_.size(true)); });
    setMenu(menu);
}

void FigureExportButton::save(bool doubleColumn)
{
    const QString png = tr("PNG image, 300 dpi (*.png)"), svg = tr("SVG drawing (*.svg)"), pdf = tr("PDF document (*.pdf)");
    QString chosen = png;
    const QString suggested = exportFolder() + QLatin1Char('/') + figure_.baseName +
                              (doubleColumn ? QStringLiteral("-175mm.png") : QStringLiteral("-85mm.png"));
    QString path = QFileDialog::getSaveFileName(this, tr("Export Figure"), suggested,
                                                QStringList{png, svg, pdf}.join(QStringLiteral(";;")), &chosen);
    if (path.isEmpty()) return;
    if (!figureFormatOf(path))
        path += chosen == svg ? QStringLiteral(".svg") : chosen == pdf ? QStringLiteral(".pdf") : QStringLiteral(".png");
    QSettings().setValue(QStringLiteral("plotExportFolder"), QFileInfo(path).absolutePath());
    if (!exportFigure(figure_, path, figure_.size(doubleColumn)))
        QMessageBox::warning(this, tr("Export Failed"), tr("%1 could not be written.").arg(QDir::toNativeSeparators(path)));
}

QToolButton* makeExportButton(const PlotFigure& figure, QWidget* parent) { return new FigureExportButton(figure, parent); }

} // namespace hierloom::ui
