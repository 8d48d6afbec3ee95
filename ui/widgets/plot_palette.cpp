// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/plot_palette.h"

#include <QSettings>
#include <QWidget>

#include <qcustomplot.h>

namespace hierloom::ui {

namespace {
const char* const kProperty = "hierloomPlotPalette";
const char* const kSetting = "plotPalette";

void recolourPen(QPen& pen, const QColor& colour) { pen.setColor(colour); }
} // namespace

PlotColours plotColours(PlotPalette palette)
{
    if (palette == PlotPalette::Dark)
        return {QColor(0x20, 0x22, 0x26), QColor(0xE6, 0xE6, 0xE6), QColor(0xB0, 0xB0, 0xB0), QColor(0x44, 0x47, 0x4D)};
    return {Qt::white, Qt::black, Qt::black, QColor(0xC8, 0xC8, 0xC8)};
}

void applyPlotColours(QCustomPlot* plot, const PlotColours& c)
{
    plot->setBackground(QBrush(c.background));
    const PlotColours light = plotColours(PlotPalette::Light), dark = plotColours(PlotPalette::Dark);
    auto isText = [&](const QColor& colour) { return colour == light.text || colour == dark.text; };
    for (QCPAxisRect* rect : plot->axisRects()) {
        rect->setBackground(Qt::NoBrush);
        for (QCPAxis* a : rect->axes()) {
            QPen base = a->basePen(), tick = a->tickPen(), sub = a->subTickPen();
            for (QPen* p : {&base, &tick, &sub}) recolourPen(*p, c.axis);
            a->setBasePen(base);
            a->setTickPen(tick);
            a->setSubTickPen(sub);
            a->setTickLabelColor(c.text);
            a->setLabelColor(c.text);
            QPen grid = a->grid()->pen();
            grid.setColor(c.grid);
            a->grid()->setPen(grid);
            QPen zero = a->grid()->zeroLinePen();
            if (zero.style() != Qt::NoPen) {
                zero.setColor(c.grid);
                a->grid()->setZeroLinePen(zero);
            }
        }
    }
    if (QCPLegend* legend = plot->legend) {
        legend->setBrush(QBrush(c.background));
        QPen border = legend->borderPen();
        border.setColor(c.axis);
        legend->setBorderPen(border);
        legend->setTextColor(c.text);
        for (int i = 0; i < legend->itemCount(); ++i)
            if (QCPAbstractLegendItem* item = legend->item(i)) item->setTextColor(c.text);
    }
    for (QCPLayoutElement* e : plot->plotLayout()->elements(true))
        if (auto* text = qobject_cast<QCPTextElement*>(e)) text->setTextColor(c.text);
    for (int i = 0; i < plot->itemCount(); ++i)
        if (auto* text = qobject_cast<QCPItemText*>(plot->item(i)); text && isText(text->color())) text->setColor(c.text);
}

PlotPalette storedPlotPalette()
{
    return QSettings().value(QLatin1String(kSetting)).toString() == QLatin1String("dark") ? PlotPalette::Dark
                                                                                        : PlotPalette::Light;
}

PlotPalette plotPalette(const QCustomPlot* plot)
{
    return plot->property(kProperty).toString() == QLatin1String("dark") ? PlotPalette::Dark : PlotPalette::Light;
}

void followPlotPalette(QCustomPlot* plot)
{
    if (plot->property(kProperty).isValid()) return;
    plot->setProperty(kProperty, storedPlotPalette() == PlotPalette::Dark ? QStringLiteral("dark") : QStringLiteral("light"));
    QObject::connect(plot, &QCustomPlot::beforeReplot, plot,
                     [plot] { applyPlotColours(plot, plotColours(plotPalette(plot))); });
}

void setPlotPalette(QWidget* root, PlotPalette palette)
{
    const QString name = palette == PlotPalette::Dark ? QStringLiteral("dark") : QStringLiteral("light");
    QSettings().setValue(QLatin1String(kSetting), name);
    for (QCustomPlot* plot : root->findChildren<QCustomPlot*>()) {
        if (!plot->property(kProperty).isValid()) continue;
        plot->setProperty(kProperty, name);
        plot->replot(QCustomPlot::rpQueuedReplot);
    }
}

} // namespace hierloom::ui
