// SPDX-License-Identifier: GPL-3.0-or-later
#include "report/report_layout.h"

#include <QFontMetricsF>
#include <QObject>
#include <QPagedPaintDevice>
#include <QPainterPath>

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace hierloom::report {

namespace {
constexpr double kFooterMm = 8;
constexpr double kRowPadMm = 0.8;
} // namespace

ReportLayout::ReportLayout(QPagedPaintDevice& device) : device_(device)
{
    // QPdfWriter opens its file here: a folder that cannot be written fails now.
    if (!painter_.begin(&device_)) throw std::runtime_error("the report cannot be written (is the folder writable?)");
    dotsPerMm_ = device_.logicalDpiX() / 25.4;
    pageWidthMm_ = device_.width() / dotsPerMm_;
    pageHeightMm_ = device_.height() / dotsPerMm_;
    body_ = QFont(QStringLiteral("DejaVu Sans"), 9);
    small_ = QFont(QStringLiteral("DejaVu Sans"), 7.5);
    bold_ = body_;
    bold_.setBold(true);
    titleFont_ = QFont(QStringLiteral("DejaVu Sans"), 17, QFont::Bold);
    headingFont_ = QFont(QStringLiteral("DejaVu Sans"), 12, QFont::Bold);
    painter_.setRenderHint(QPainter::Antialiasing);
}

ReportLayout::~ReportLayout()
{
    if (painter_.isActive()) finish();
}

double ReportLayout::widthMm() const { return pageWidthMm_; }

double ReportLayout::remainingMm() const { return pageHeightMm_ - kFooterMm - yMm_; }

void ReportLayout::footer()
{
    painter_.setFont(small_);
    painter_.setPen(Qt::darkGray);
    painter_.drawText(QRectF(0, px(pageHeightMm_ - kFooterMm + 2), px(pageWidthMm_), px(kFooterMm - 2)),
                      Qt::AlignRight | Qt::AlignVCenter, QObject::tr("Page %1").arg(pages_));
    painter_.setPen(Qt::black);
}

void ReportLayout::newPage()
{
    footer();
    device_.newPage();
    ++pages_;
    yMm_ = 0;
}

void ReportLayout::finish()
{
    footer();
    painter_.end();
}

void ReportLayout::ensure(double mm)
{
    if (yMm_ > 0 && remainingMm() < mm) newPage();
}

void ReportLayout::space(double mm) { yMm_ += mm; }

double ReportLayout::textHeightMm(const QString& text, const QFont& font, double widthMm) const
{
    const QFontMetricsF fm(font, &device_);
    const QRectF r = fm.boundingRect(QRectF(0, 0, px(widthMm), 1e6), Qt::TextWordWrap, text);
    return r.height() / dotsPerMm_;
}

void ReportLayout::title(const QString& text, const QString& subtitle)
{
    const double h = textHeightMm(text, titleFont_, pageWidthMm_);
    ensure(h + 12);
    painter_.setFont(titleFont_);
    painter_.setPen(QColor(0x1f, 0x3a, 0x5f));
    painter_.drawText(QRectF(0, px(yMm_), px(pageWidthMm_), px(h)), Qt::TextWordWrap, text);
    yMm_ += h + 1;
    painter_.setPen(Qt::black);
    paragraph(subtitle, false, Qt::darkGray);
    painter_.setPen(QPen(QColor(0x1f, 0x3a, 0x5f), px(0.4)));
    painter_.drawLine(QPointF(0, px(yMm_)), QPointF(px(pageWidthMm_), px(yMm_)));
    painter_.setPen(Qt::black);
    yMm_ += 4;
}

void ReportLayout::heading(const QString& text)
{
    headings_ << text;
    const double h = textHeightMm(text, headingFont_, pageWidthMm_);
    ensure(h + 20); // keep a heading with the start of what follows
    yMm_ += 2;
    painter_.setFont(headingFont_);
    painter_.setPen(QColor(0x1f, 0x3a, 0x5f));
    painter_.drawText(QRectF(0, px(yMm_), px(pageWidthMm_), px(h)), Qt::TextWordWrap, text);
    painter_.setPen(Qt::black);
    yMm_ += h + 1.5;
}

void ReportLayout::paragraph(const QString& text, bool small, const QColor& color)
{
    const QFont& font = small ? small_ : body_;
    const double h = textHeightMm(text, font, pageWidthMm_);
    ensure(h);
    painter_.setFont(font);
    painter_.setPen(color);
    painter_.drawText(QRectF(0, px(yMm_), px(pageWidthMm_), px(h + 1)), Qt::TextWordWrap, text);
    painter_.setPen(Qt::black);
    yMm_ += h + 1.5;
}

void ReportLayout::caution(const QString& text)
{
    const double inner = pageWidthMm_ - 6;
    const double h = textHeightMm(text, small_, inner) + 4;
    ensure(h + 2);
    const QRectF box(0, px(yMm_), px(pageWidthMm_), px(h));
    painter_.setPen(QPen(QColor(0xb0, 0x7a, 0x00), px(0.3)));
    painter_.setBrush(QColor(0xff, 0xf4, 0xd6));
    painter_.drawRect(box);
    painter_.setBrush(Qt::NoBrush);
    painter_.setFont(small_);
    painter_.setPen(QColor(0x5a, 0x40, 0x00));
    painter_.drawText(box.adjusted(px(3), px(2), -px(3), -px(1)), Qt::TextWordWrap, text);
    painter_.setPen(Qt::black);
    yMm_ += h + 3;
}

double ReportLayout::drawTable(const ReportTable& t, double xMm, double widthMm, double yMm, size_t& row,
                               double bottomMm)
{
    const size_t cols = static_cast<size_t>(t.header.size());
    std::vector<double> w(cols, 1.0);
    if (t.widths.size() == cols) w = t.widths;
    double total = 0;
    for (double v : w) total += v;
    for (double& v : w) v = v / total * widthMm;
    const double rowH = QFontMetricsF(small_, &device_).height() / dotsPerMm_ + 2 * kRowPadMm;
    auto drawRow = [&](const QStringList& cells, double y, bool header, bool tint) {
        if (header || tint) {
            painter_.setPen(Qt::NoPen);
            painter_.setBrush(header ? QColor(0xdd, 0xe6, 0xf0) : QColor(0xfd, 0xe2, 0xdc));
            painter_.drawRect(QRectF(px(xMm), px(y), px(widthMm), px(rowH)));
            painter_.setBrush(Qt::NoBrush);
        }
        QFont f = small_;
        f.setBold(header);
        painter_.setFont(f);
        painter_.setPen(Qt::black);
        double x = xMm;
        for (size_t c = 0; c < cols; ++c) {
            const QString text = c < static_cast<size_t>(cells.size()) ? cells[static_cast<int>(c)] : QString();
            const QRectF r(px(x + 1), px(y), px(w[c] - 2), px(rowH));
            painter_.drawText(r, Qt::AlignVCenter | Qt::AlignLeft,
                              QFontMetricsF(f, &device_).elidedText(text, Qt::ElideRight, r.width()));
            x += w[c];
        }
        painter_.setPen(QPen(QColor(0xcc, 0xcc, 0xcc), px(0.15)));
        painter_.drawLine(QPointF(px(xMm), px(y + rowH)), QPointF(px(xMm + widthMm), px(y + rowH)));
        painter_.setPen(Qt::black);
    };
    double y = yMm;
    drawRow(t.header, y, true, false);
    y += rowH;
    while (row < t.rows.size() && y + rowH <= bottomMm) {
        drawRow(t.rows[row], y, false, row < t.highlighted.size() && t.highlighted[row]);
        y += rowH;
        ++row;
    }
    return y;
}

void ReportLayout::table(const ReportTable& t)
{
    ensure(20);
    size_t row = 0;
    for (;;) {
        const double end = drawTable(t, 0, pageWidthMm_, yMm_, row, pageHeightMm_ - kFooterMm);
        yMm_ = end + 3;
        if (row >= t.rows.size()) break;
        newPage();
    }
}

void ReportLayout::sideBySide(const ReportTable& left, const QString& leftTitle, const ReportTable& right,
                              const QString& rightTitle)
{
    const double gap = 6, half = (pageWidthMm_ - gap) / 2;
    ensure(30);
    size_t l = 0, r = 0;
    bool first = true;
    for (;;) {
        double top = yMm_;
        if (first) {
            painter_.setFont(bold_);
            const double h = textHeightMm(leftTitle, bold_, half);
            painter_.drawText(QRectF(0, px(top), px(half), px(h)), Qt::TextWordWrap, leftTitle);
            painter_.drawText(QRectF(px(half + gap), px(top), px(half), px(h)), Qt::TextWordWrap, rightTitle);
            top += h + 1;
            first = false;
        }
        const double bottom = pageHeightMm_ - kFooterMm;
        const double y1 = l < left.rows.size() || l == 0 ? drawTable(left, 0, half, top, l, bottom) : top;
        const double y2 = r < right.rows.size() || r == 0 ? drawTable(right, half + gap, half, top, r, bottom) : top;
        yMm_ = std::max(y1, y2) + 3;
        if (l >= left.rows.size() && r >= right.rows.size()) break;
        newPage();
    }
}

void ReportLayout::chart(const QString& caption, const std::vector<ChartSeries>& series, const QStringList& xLabels,
                         double heightMm)
{
    const double capH = textHeightMm(caption, bold_, pageWidthMm_);
    ensure(heightMm + capH + 14);
    painter_.setFont(bold_);
    painter_.drawText(QRectF(0, px(yMm_), px(pageWidthMm_), px(capH)), Qt::TextWordWrap, caption);
    yMm_ += capH + 1;
    const double left = 14, right = 2, bottom = 8;
    const QRectF plot(px(left), px(yMm_), px(pageWidthMm_ - left - right), px(heightMm - bottom));
    size_t n = 0;
    double lo = 0, hi = 0;
    for (const ChartSeries& s : series) {
        n = std::max(n, s.values.size());
        for (const auto& v : s.values)
            if (v) hi = std::max(hi, *v);
        if (s.threshold) hi = std::max(hi, *s.threshold);
    }
    if (hi <= lo) hi = lo + 1;
    // A round top so the tick labels read well.
    const double step = std::pow(10.0, std::floor(std::log10(hi / 4)));
    const double tick = hi / step > 20 ? step * 5 : hi / step > 8 ? step * 2 : step;
    hi = std::ceil(hi / tick) * tick;
    auto xAt = [&](size_t i) { return plot.left() + (n > 1 ? plot.width() * static_cast<double>(i) / (n - 1) : 0); };
    auto yAt = [&](double v) { return plot.bottom() - plot.height() * (v - lo) / (hi - lo); };
    painter_.setFont(small_);
    for (double v = lo; v <= hi + tick / 2; v += tick) {
        painter_.setPen(QPen(QColor(0xe4, 0xe4, 0xe4), px(0.15)));
        painter_.drawLine(QPointF(plot.left(), yAt(v)), QPointF(plot.right(), yAt(v)));
        painter_.setPen(Qt::darkGray);
        painter_.drawText(QRectF(0, yAt(v) - px(2), px(left - 1.5), px(4)), Qt::AlignRight | Qt::AlignVCenter,
                          QString::number(v, 'g', 3));
    }
    for (int i = 0; i < xLabels.size(); ++i) {
        if (xLabels[i].isEmpty()) continue;
        const double x = xAt(static_cast<size_t>(i));
        painter_.setPen(QPen(QColor(0xe4, 0xe4, 0xe4), px(0.15)));
        painter_.drawLine(QPointF(x, plot.top()), QPointF(x, plot.bottom()));
        painter_.setPen(Qt::darkGray);
        painter_.drawText(QRectF(x - px(10), plot.bottom() + px(0.5), px(20), px(4)), Qt::AlignCenter, xLabels[i]);
    }
    painter_.setPen(QPen(Qt::black, px(0.2)));
    painter_.drawRect(plot);
    double legendX = plot.left() + px(2);
    for (const ChartSeries& s : series) {
        if (s.threshold) {
            painter_.setPen(QPen(s.color, px(0.3), Qt::DashLine));
            painter_.drawLine(QPointF(plot.left(), yAt(*s.threshold)), QPointF(plot.right(), yAt(*s.threshold)));
        }
        QPainterPath path;
        bool open = false;
        for (size_t i = 0; i < s.values.size(); ++i) {
            if (!s.values[i]) {
                open = false;
                continue;
            }
            const QPointF p(xAt(i), yAt(*s.values[i]));
            if (open) path.lineTo(p);
            else path.moveTo(p);
            open = true;
        }
        painter_.setPen(QPen(s.color, px(0.35)));
        painter_.drawPath(path);
        painter_.setBrush(QColor(0xd0, 0x21, 0x1b));
        painter_.setPen(Qt::NoPen);
        for (size_t i = 0; i < s.values.size() && i < s.marked.size(); ++i)
            if (s.marked[i] && s.values[i]) painter_.drawEllipse(QPointF(xAt(i), yAt(*s.values[i])), px(0.9), px(0.9));
        painter_.setBrush(Qt::NoBrush);
        painter_.setPen(QPen(s.color, px(0.6)));
        painter_.drawLine(QPointF(legendX, plot.top() + px(3)), QPointF(legendX + px(5), plot.top() + px(3)));
        painter_.setPen(Qt::black);
        const QString label = s.threshold ? QObject::tr("%1 (dashed: threshold)").arg(s.name) : s.name;
        const double w = QFontMetricsF(small_, &device_).horizontalAdvance(label);
        painter_.drawText(QRectF(legendX + px(6), plot.top() + px(1), w + px(2), px(4)), Qt::AlignVCenter, label);
        legendX += px(10) + w;
    }
    yMm_ += heightMm + 3;
}

} // namespace hierloom::report
