// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QColor>
#include <QFont>
#include <QPainter>
#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

class QPagedPaintDevice;

namespace hierloom::report {

/// One series of a line chart: y values (empty: a gap) over x positions.
struct ChartSeries {
    QString name;
    QColor color;
    std::vector<std::optional<double>> values;
    std::optional<double> threshold; ///< drawn as a dashed line
    std::vector<bool> marked;        ///< points drawn as filled red dots (alerts)
};

/// A table: column titles, rows of cells, relative column widths.
struct ReportTable {
    QStringList header;
    std::vector<QStringList> rows;
    std::vector<double> widths; ///< relative; empty: equal
    std::vector<bool> highlighted; ///< rows drawn on a tinted background
};

/// Lays a report out page by page on a paged device (a QPdfWriter or a
/// QPrinter): a cursor moves down the page and a new page starts when the
/// next block does not fit. Sizes are in millimetres.
class ReportLayout {
public:
    explicit ReportLayout(QPagedPaintDevice& device);
    ~ReportLayout();

    void title(const QString& text, const QString& subtitle);
    void heading(const QString& text);
    void paragraph(const QString& text, bool small = false, const QColor& color = Qt::black);
    /// A framed note (the planning caution).
    void caution(const QString& text);
    void table(const ReportTable& table);
    /// Two tables next to each other (each half the width); they may run onto following pages together.
    void sideBySide(const ReportTable& left, const QString& leftTitle, const ReportTable& right, const QString& rightTitle);
    /// A line chart of one or more series sharing an x axis with labels under some points.
    void chart(const QString& caption, const std::vector<ChartSeries>& series, const QStringList& xLabels,
               double heightMm = 50);
    void space(double mm);
    void newPage();
    void finish();

    int pages() const { return pages_; }
    /// Every heading painted so far, in order (what a test can check without reading the PDF back).
    const QStringList& headings() const { return headings_; }
    double widthMm() const;

private:
    QStringList headings_;
    double px(double mm) const { return mm * dotsPerMm_; }
    double remainingMm() const;
    void ensure(double mm);
    double textHeightMm(const QString& text, const QFont& font, double widthMm) const;
    double drawTable(const ReportTable& t, double xMm, double widthMm, double yMm, size_t& row, double bottomMm);
    void footer();

    QPagedPaintDevice& device_;
    QPainter painter_;
    double dotsPerMm_ = 1;
    double pageWidthMm_ = 0, pageHeightMm_ = 0;
    double yMm_ = 0;
    int pages_ = 1;
    QFont body_, small_, bold_, titleFont_, headingFont_;
};

} // namespace hierloom::report
