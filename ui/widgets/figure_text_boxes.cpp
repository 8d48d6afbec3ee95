// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/figure_text_boxes.h"

#include <QFontMetricsF>
#include <QPaintDevice>
#include <QPaintEngine>
#include <QPainter>
#include <QTextItem>

#include <qcustomplot.h>

#include <cmath>

namespace hierloom::ui {

namespace {

constexpr double layoutDpi = 96.0;

/// A paint engine that draws nothing and keeps the box of every text item.
class TextRecorder : public QPaintEngine {
public:
    TextRecorder() : QPaintEngine(QPaintEngine::AllFeatures) {}
    std::vector<FigureTextBox> boxes;

    bool begin(QPaintDevice*) override { return true; }
    bool end() override { return true; }
    void updateState(const QPaintEngineState&) override {}
    void drawPixmap(const QRectF&, const QPixmap&, const QRectF&) override {}
    void drawPolygon(const QPointF*, int, PolygonDrawMode) override {}
    void drawPath(const QPainterPath&) override {}
    void drawLines(const QLineF*, int) override {}
    void drawRects(const QRectF*, int) override {}
    void drawEllipse(const QRectF&) override {}
    void drawImage(const QRectF&, const QImage&, const QRectF&, Qt::ImageConversionFlags) override {}
    Type type() const override { return QPaintEngine::User; }

    void drawTextItem(const QPointF& p, const QTextItem& item) override
    {
        const QString text = item.text();
        if (text.trimmed().isEmpty()) return;
        const QFont font = item.font();
        const QFontMetricsF metrics(font, paintDevice());
        const QRectF local(p.x(), p.y() - metrics.ascent(), metrics.horizontalAdvance(text),
                           metrics.ascent() + metrics.descent());
        const QTransform t = painter()->combinedTransform();
        const double scale = std::sqrt(std::abs(t.determinant()));
        const double pixels = font.pixelSize() > 0 ? font.pixelSize() : font.pointSizeF() * layoutDpi / 72.0;
        boxes.push_back({text, t.mapRect(local), pixels * scale * 72.0 / layoutDpi});
    }
};

/// A page of the figure's size, at the layout's 96 units per inch.
class TextRecordingDevice : public QPaintDevice {
public:
    TextRecordingDevice(int width, int height) : width_(width), height_(height) {}
    QPaintEngine* paintEngine() const override { return &engine_; }
    std::vector<FigureTextBox>& boxes() { return engine_.boxes; }

protected:
    int metric(PaintDeviceMetric m) const override
    {
        switch (m) {
        case PdmWidth: return width_;
        case PdmHeight: return height_;
        case PdmWidthMM: return static_cast<int>(std::lround(width_ * 25.4 / layoutDpi));
        case PdmHeightMM: return static_cast<int>(std::lround(height_ * 25.4 / layoutDpi));
        case PdmNumColors: return 0x7fffffff;
        case PdmDepth: return 32;
        case PdmDpiX:
        case PdmDpiY:
        case PdmPhysicalDpiX:
        case PdmPhysicalDpiY: return static_cast<int>(layoutDpi);
        case PdmDevicePixelRatio: return 1;
        case PdmDevicePixelRatioScaled: return static_cast<int>(devicePixelRatioFScale());
        }
        return 0;
    }

private:
    int width_, height_;
    mutable TextRecorder engine_;
};

} // namespace

std::vector<FigureTextBox> figureTextBoxes(const PlotFigure& figure, const FigureSize& size)
{
    TextRecordingDevice device(static_cast<int>(std::lround(size.widthMm / 25.4 * layoutDpi)),
                               static_cast<int>(std::lround(size.heightMm / 25.4 * layoutDpi)));
    {
        QCPPainter painter;
        if (!painter.begin(&device)) return {};
        paintFigure(figure, &painter, size);
        painter.end();
    }
    return device.boxes();
}

QStringList figureLayoutProblems(const std::vector<FigureTextBox>& boxes, const FigureSize& size, double minimumPoints)
{
    QStringList problems;
    const QRectF page(0, 0, size.widthMm / 25.4 * layoutDpi, size.heightMm / 25.4 * layoutDpi);
    // Half a unit of slack for rounding of glyph positions.
    auto inner = [](const QRectF& r) { return r.adjusted(0.5, 0.5, -0.5, -0.5); };
    auto describe = [](const FigureTextBox& b) {
        return QStringLiteral("\"%1\" at (%2, %3, %4 x %5)")
            .arg(b.text)
            .arg(b.box.x(), 0, 'f', 1)
            .arg(b.box.y(), 0, 'f', 1)
            .arg(b.box.width(), 0, 'f', 1)
            .arg(b.box.height(), 0, 'f', 1);
    };
    for (size_t i = 0; i < boxes.size(); ++i) {
        const FigureTextBox& a = boxes[i];
        if (!page.contains(inner(a.box))) problems << QStringLiteral("leaves the page: %1").arg(describe(a));
        if (a.points + 1e-9 < minimumPoints)
            problems << QStringLiteral("%1 pt, under %2 pt: %3").arg(a.points, 0, 'f', 2).arg(minimumPoints).arg(describe(a));
        for (size_t j = i + 1; j < boxes.size(); ++j)
            if (inner(a.box).intersects(inner(boxes[j].box)))
                problems << QStringLiteral("overlap: %1 and %2").arg(describe(a), describe(boxes[j]));
    }
    return problems;
}

} // namespace hierloom::ui
