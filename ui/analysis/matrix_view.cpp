// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/matrix_view.h"

#include "core/ranks/compact_selection.h"

#include "ui/analysis/rank_flag_watch.h"

#include "core/ranks/encounter_selection.h"
#include "core/ranks/rank_method_registry.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/help_button.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/compute_runner.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/plot_export.h"
#include "ui/widgets/progress_strip.h"
#include "ui/document/qt_convert.h"

#include <QComboBox>
#include <QCoreApplication>
#include <QDateEdit>
#include <QHBoxLayout>
#include <QLabel>
#include <QFontMetricsF>
#include <QStyledItemDelegate>
#include <QToolButton>
#include <QToolTip>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <cmath>
#include <numeric>
#include <optional>
#include <utility>

namespace hierloom::ui {

namespace {
// Okabe-Ito vermillion: stands out on the blue count scale.
const QColor againstOrder(0xD5, 0x5E, 0x00);

QString countText(double v)
{
    return std::floor(v) == v ? QString::number(static_cast<long long>(v)) : QString::number(v, 'f', 1);
}

/// A name cut to a label's length; the hover shows it whole.
QString labelText(const std::string& name)
{
    const QString full = toQString(name);
    return full.size() > 14 ? full.left(13) + QChar(0x2026) : full;
}

/// Every `step`-th of the n labels (0, step, 2 step...).
QMap<double, QString> thinned(const QStringList& labels, int step)
{
    QMap<double, QString> ticks;
    for (int i = 0; i < labels.size(); i += step) ticks.insert(i, labels[i]);
    return ticks;
}

/// The smallest step that keeps labels one text line (plus a little) apart.
int labelStep(QCPAxis* axis, const QFont& font)
{
    const double perUnit = std::abs(axis->coordToPixel(1) - axis->coordToPixel(0));
    const double line = QFontMetricsF(font).height() * 1.05;
    if (perUnit <= 0) return 1;
    return std::max(1, static_cast<int>(std::ceil(line / perUnit)));
}
} // namespace

MatrixView::MatrixView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the matrix"), this)),
      plot_(new QCustomPlot(this)),
      methodBox_(new QComboBox(this)),
      groupBox_(new QComboBox(this)),
      fromEdit_(new QDateEdit(this)),
      toEdit_(new QDateEdit(this)),
      summary_(new QLabel(this)),
      flagLegend_(new QLabel(this)),
      flags_(new RankFlagWatch(document, this))
{
    flagLegend_->setObjectName(QStringLiteral("matrixFlagLegend"));
    flagLegend_->setWordWrap(true);
    summary_->setWordWrap(true); // its method name and counts must not widen the view
    for (const core::RankMethodInfo& m : core::rankMethods())
        methodBox_->addItem(QCoreApplication::translate("hierloom::core::RankMethod", m.displayName),
                            QString::fromLatin1(m.code));
    methodBox_->addItem(QCoreApplication::translate("hierloom::core::DisplayName", "animal id"), QStringLiteral("id"));
    // Plain item text: the default popup of some styles doubles "&" (it showed "I&&SI").
    methodBox_->setItemDelegate(new QStyledItemDelegate(methodBox_));
    methodBox_->setCurrentIndex(methodBox_->findData(QString::fromLatin1(core::rankMethodInfo(*method_).code)));
    methodBox_->setToolTip(tr("Order of rows and columns; the command line's `matrix` uses the same default (%1)")
                               .arg(QString::fromLatin1(core::rankMethodInfo(core::kDefaultMatrixOrder).code)));
    groupBox_->addItem(tr("All groups"), QString());
    groupBox_->setObjectName(QStringLiteral("matrixGroup"));
    for (QDateEdit* e : {fromEdit_, toEdit_}) {
        e->setCalendarPopup(true);
        e->setDisplayFormat(QStringLiteral("yyyy-MM-dd"));
    }
    auto* controls = new QHBoxLayout;
    controls->addWidget(new QLabel(tr("Order by:"), this));
    controls->addWidget(methodBox_);
    // The "?" follows the ordering method chosen (setMethod shows the matching one).
    for (const core::RankMethodInfo& m : core::rankMethods()) {
        auto* help = new HelpButton(QString::fromLatin1(m.helpKey), this);
        help->setProperty("rankMethod", static_cast<int>(m.method));
        help->setVisible(method_ == m.method);
        controls->addWidget(help);
    }
    controls->addWidget(new QLabel(tr("From:"), this));
    controls->addWidget(fromEdit_);
    controls->addWidget(new QLabel(tr("To:"), this));
    controls->addWidget(toEdit_);
    controls->addWidget(groupBox_);
    controls->addStretch();
    auto* fit = new QToolButton(this);
    fit->setObjectName(QStringLiteral("matrixFit"));
    fit->setText(tr("Fit"));
    fit->setToolTip(tr("Show the whole matrix (the mouse wheel zooms, dragging moves)"));
    connect(fit, &QToolButton::clicked, this, &MatrixView::fitAll);
    auto* zoomIn = new QToolButton(this);
    zoomIn->setObjectName(QStringLiteral("matrixZoomIn"));
    zoomIn->setText(QStringLiteral("+"));
    zoomIn->setToolTip(tr("Zoom in"));
    connect(zoomIn, &QToolButton::clicked, this, [this] { zoomBy(0.5); });
    auto* zoomOut = new QToolButton(this);
    zoomOut->setObjectName(QStringLiteral("matrixZoomOut"));
    zoomOut->setText(QStringLiteral("\u2212"));
    zoomOut->setToolTip(tr("Zoom out"));
    connect(zoomOut, &QToolButton::clicked, this, [this] { zoomBy(2.0); });
    controls->addWidget(zoomIn);
    controls->addWidget(zoomOut);
    controls->addWidget(fit);
    PlotFigure figure;
    figure.plot = plot_;
    figure.baseName = QStringLiteral("win-matrix");
    figure.title = tr("Win matrix (rows: winners, columns: losers)");
    figure.singleHeightMm = 100;
    figure.doubleHeightMm = 175;
    figure.caption = [this] {
        const QString order = method_ ? caption::method(*method_, documentAnalysisSettings(document_).elo)
                                      : QCoreApplication::translate("hierloom::core::DisplayName", "animal id");
        return caption::join({caption::group(group_), caption::window(toDay(fromEdit_->date()), toDay(toEdit_->date())),
                              tr("ordered by %1").arg(order), tr("%1 animals").arg(matrix_.n),
                              tr("crosses: wins against the order"),
                              flags_->flaggedCount() > 0
                                  ? tr("%1 after a name: fewer than %2 encounters in the window (rank not stable)")
                                        .arg(RankFlagWatch::mark())
                                        .arg(flags_->threshold())
                                  : QString(),
                              std::max(rowStep_, columnStep_) > 1
                                  ? tr("one name (and total) in %1 shown where rows are narrow")
                                        .arg(std::max(rowStep_, columnStep_))
                                  : QString()});
    };
    figure.preparePrint = [this] { relabel(); };
    controls->addWidget(makeExportButton(figure, this));
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(progress_); // a row of its own while computing: the controls keep their width
    layout->addWidget(plot_, 1);
    layout->addWidget(summary_);
    layout->addWidget(flagLegend_);

    plot_->yAxis->setRangeReversed(true);
    plot_->xAxis2->setVisible(true);
    plot_->xAxis2->setTickLabelRotation(-90);
    plot_->xAxis2->setLabel(tr("Loser"));
    plot_->yAxis->setLabel(tr("Winner"));
    // Totals as the labels of the other two sides, laid out (and thinned) like the names.
    plot_->yAxis2->setVisible(true);
    plot_->yAxis2->setRangeReversed(true);
    plot_->yAxis2->setLabel(tr("Won (row total)"));
    plot_->xAxis->setTickLabels(true);
    plot_->xAxis->setTickLabelRotation(-90);
    plot_->xAxis->setLabel(tr("Lost (column total)"));
    connect(plot_->yAxis, qOverload<const QCPRange&>(&QCPAxis::rangeChanged), plot_->yAxis2,
            qOverload<const QCPRange&>(&QCPAxis::setRange));
    for (QCPAxis* a : {plot_->xAxis, plot_->xAxis2, plot_->yAxis, plot_->yAxis2}) {
        a->grid()->setVisible(false);
        a->setSubTicks(false);
    }
    // The legend in a row under the matrix, where it hides no cell.
    auto* legendRow = new QCPLayoutGrid;
    plot_->plotLayout()->addElement(1, 0, legendRow);
    plot_->plotLayout()->setRowStretchFactor(1, 0.001);
    legendRow->addElement(0, 0, plot_->legend);
    plot_->legend->setFillOrder(QCPLegend::foColumnsFirst);
    wrapLegendToPlotWidth(plot_);
    plot_->setMinimumWidth(300);
    plot_->setMouseTracking(true);
    plot_->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);

    connect(methodBox_, &QComboBox::currentIndexChanged, this, [this] {
        const core::RankMethodInfo* m = core::findRankMethod(toStdString(methodBox_->currentData().toString()));
        setMethod(m ? std::optional<core::RankMethod>(m->method) : std::nullopt);
    });
    connect(groupBox_, &QComboBox::currentIndexChanged, this, [this] { setGroup(groupBox_->currentData().toString()); });
    connect(fromEdit_, &QDateEdit::editingFinished, this, [this] { setWindow(toDay(fromEdit_->date()), to_); });
    connect(toEdit_, &QDateEdit::editingFinished, this, [this] { setWindow(from_, toDay(toEdit_->date())); });
    connect(progress_, &ProgressStrip::retry, this, &MatrixView::recompute);
    // The flag's counts come at once, the interval widths later: names and legend follow.
    connect(flags_, &RankFlagWatch::updated, this, [this] {
        flagLegend_->setText(matrix_.n > 0 ? flags_->legend() : QString());
        plot_->replot(QCustomPlot::rpQueuedReplot);
    });
    connect(plot_, &QCustomPlot::mouseMove, this, &MatrixView::hover);
    // Labels follow zoom and size: thinned before each replot, and once more
    // when the layout that replot made changes the room between rows.
    connect(plot_, &QCustomPlot::beforeReplot, this, &MatrixView::relabel);
    connect(plot_, &QCustomPlot::afterReplot, this, [this] {
        const int rows = rowStep_, columns = columnStep_;
        relabel();
        if (rows != rowStep_ || columns != columnStep_) plot_->replot(QCustomPlot::rpQueuedReplot);
    });
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] { recompute(); });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    recompute();
}

MatrixView::~MatrixView() = default;

void MatrixView::setMethod(std::optional<core::RankMethod> method)
{
    if (method == method_) return;
    method_ = method;
    const QSignalBlocker block(methodBox_);
    methodBox_->setCurrentIndex(
        methodBox_->findData(method ? QString::fromLatin1(core::rankMethodInfo(*method).code) : QStringLiteral("id")));
    for (HelpButton* help : findChildren<HelpButton*>())
        help->setVisible(method && help->property("rankMethod").toInt() == static_cast<int>(*method));
    recompute();
}

QStringList MatrixView::orderCodes() const
{
    QStringList out;
    for (int i = 0; i < methodBox_->count(); ++i) out << methodBox_->itemData(i).toString();
    return out;
}

void MatrixView::setWindow(std::optional<core::Day> from, std::optional<core::Day> to)
{
    if (from == from_ && to == to_) return;
    from_ = from;
    to_ = to;
    recompute();
}

void MatrixView::setGroup(const QString& group)
{
    if (group == group_) return;
    group_ = group;
    const QSignalBlocker block(groupBox_);
    groupBox_->setCurrentIndex(std::max(groupBox_->findData(group), 0));
    recompute();
}

void MatrixView::recompute()
{
    if (!document_->isOpen()) {
        runner_->cancel();
        flags_->clear();
        adopt({});
        return;
    }
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_)) return;
    core::SelectionOptions options;
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    options.from = from_;
    options.to = to_;
    if (!from_ && !to_) options.from = core::defaultWindowStart(settings, document_->lastEncounterDay());
    options.group = toStdString(group_);
    options.draws = settings.elo.draws;
    const core::EloSettings elo = settings.elo;
    const std::optional<core::RankMethod> method = method_;
    flags_->request(options.from, options.to, options.group);
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    runner_->start([this, snapshot = snapshot, options, method, elo](const std::atomic<bool>& cancel,
                                                        const ComputeRunner::Progress& progress) mutable {
        progress(0, 3);
        const core::Colony* colony = snapshot.pedigree.get();
        // The selection costs the group, and the document's records are let go sooner.
        std::shared_ptr<const core::CompactEncounters> scope = snapshot.takeScope(options.group);
        const core::EncounterSelection sel = core::selectEncounters(*scope, colony->animals, *snapshot.residences, options);
        scope.reset();
        snapshot.encounters.reset(); // an edit meanwhile need not copy the document's records
        if (cancel) return ComputeRunner::Apply();
        progress(1, 3);
        std::vector<int> order(static_cast<size_t>(sel.size()));
        std::iota(order.begin(), order.end(), 0); // by id
        if (method) order = core::orderByMethod(sel, *method, elo);
        if (cancel) return ComputeRunner::Apply();
        progress(2, 3);
        const core::WinMatrix all = core::WinMatrix::fromBouts(sel.size(), sel.bouts, options.draws);
        const core::Matrilines lines(*colony);
        auto r = std::make_shared<Result>();
        r->palette = MatrilinePalette(lines);
        r->firstDay = sel.firstDay;
        r->lastDay = sel.lastDay;
        r->matrix = core::WinMatrix(static_cast<int>(order.size()));
        for (size_t i = 0; i < order.size(); ++i) {
            const std::string& id = sel.ids[static_cast<size_t>(order[i])];
            r->ids.push_back(id);
            const int a = colony->animalIndex(id);
            r->names.push_back(a >= 0 && !colony->animals[static_cast<size_t>(a)].name.empty()
                                   ? colony->animals[static_cast<size_t>(a)].name
                                   : id);
            const int node = lines.index(id);
            r->matriarchs.push_back(node >= 0 ? lines.id(lines.matriarch(node)) : id);
            for (size_t j = 0; j < order.size(); ++j)
                r->matrix.s(static_cast<int>(i), static_cast<int>(j)) = all.s(order[i], order[j]);
        }
        progress(3, 3);
        return ComputeRunner::Apply([this, r] { adopt(std::move(*r)); });
    });
}

void MatrixView::adopt(Result r)
{
    ids_ = std::move(r.ids);
    names_ = std::move(r.names);
    matriarchs_ = std::move(r.matriarchs);
    matrix_ = std::move(r.matrix);
    palette_ = std::move(r.palette);
    {
        const QSignalBlocker a(fromEdit_), b(toEdit_);
        if (r.firstDay) fromEdit_->setDate(toQDate(from_.value_or(*r.firstDay)));
        if (r.lastDay) toEdit_->setDate(toQDate(to_.value_or(*r.lastDay)));
    }
    {
        const QSignalBlocker block(groupBox_);
        groupBox_->clear();
        groupBox_->addItem(tr("All groups"), QString());
        for (const std::string& g : document_->residences().groups()) groupBox_->addItem(toQString(g), toQString(g));
        groupBox_->setCurrentIndex(std::max(groupBox_->findData(group_), 0));
    }
    rebuildPlot();
}

void MatrixView::rebuildPlot()
{
    plot_->clearPlottables();
    plot_->clearItems();
    cellCounts_.clear(); // the items are gone with clearItems
    const int n = matrix_.n;
    boundaries_ = 0;
    marks_ = nullptr;
    flagLegend_->setText(n > 0 ? flags_->legend() : QString());
    if (n == 0) {
        summary_->setText(tr("No encounters in this window."));
        plot_->replot(QCustomPlot::rpQueuedReplot);
        return;
    }
    // Counts on a square-root colour scale: a few heavy dyads would otherwise wash out the rest.
    auto* map = new QCPColorMap(plot_->xAxis, plot_->yAxis);
    map->data()->setSize(n, n);
    map->data()->setRange(QCPRange(0, n - 1), QCPRange(0, n - 1));
    double most = 0;
    QVector<double> markX, markY;
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j) {
            const double v = matrix_.s(i, j);
            most = std::max(most, v);
            map->data()->setCell(j, i, std::sqrt(v));
            if (i > j && v > 0) {
                markX << j;
                markY << i;
            }
        }
    QCPColorGradient gradient;
    gradient.setColorStopAt(0, Qt::white);
    gradient.setColorStopAt(0.0001, QColor(0xEF, 0xF3, 0xFF));
    gradient.setColorStopAt(0.5, QColor(0x6B, 0xAE, 0xD6));
    gradient.setColorStopAt(1, QColor(0x08, 0x30, 0x6B));
    map->setGradient(gradient);
    map->setInterpolate(false);
    map->setDataRange(QCPRange(0, std::max(1.0, std::sqrt(most))));
    map->setName(tr("wins (cell shade, square-root scale)"));

    marks_ = new QCPGraph(plot_->xAxis, plot_->yAxis);
    marks_->setData(markX, markY);
    marks_->setLineStyle(QCPGraph::lsNone);
    const double cellPixels = std::min(plot_->axisRect()->width(), plot_->axisRect()->height()) / (n + 2.0);
    marks_->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCross, QPen(againstOrder, 1.3), QBrush(),
                                            std::clamp(cellPixels * 0.6, 3.0, 9.0)));
    marks_->setName(tr("wins against the order (below the diagonal)"));

    // Diagonal, matriline boundaries and colour strips.
    auto segment = [this](double x1, double y1, double x2, double y2, const QPen& pen) {
        auto* line = new QCPItemLine(plot_);
        line->start->setCoords(x1, y1);
        line->end->setCoords(x2, y2);
        line->setPen(pen);
    };
    segment(-0.5, -0.5, n - 0.5, n - 0.5, QPen(QColor(0xAA, 0xAA, 0xAA), 1, Qt::DotLine));
    for (int i = 0; i + 1 < n; ++i) {
        if (matriarchs_[static_cast<size_t>(i)] == matriarchs_[static_cast<size_t>(i) + 1]) continue;
        ++boundaries_;
        const QPen pen(QColor(0x55, 0x55, 0x55), 0.8);
        segment(-0.5, i + 0.5, n - 0.5, i + 0.5, pen);
        segment(i + 0.5, -0.5, i + 0.5, n - 0.5, pen);
    }
    for (int i = 0; i < n; ++i) {
        const QColor c = palette_.colour(matriarchs_[static_cast<size_t>(i)]);
        for (const auto& [x1, y1, x2, y2] : {std::tuple{-1.3, i - 0.5, -0.7, i + 0.5}, std::tuple{i - 0.5, -1.3, i + 0.5, -0.7}}) {
            auto* strip = new QCPItemRect(plot_);
            strip->topLeft->setCoords(x1, y1);
            strip->bottomRight->setCoords(x2, y2);
            strip->setPen(Qt::NoPen);
            strip->setBrush(c);
        }
    }
    // Totals: wins at the end of each row, losses under each column.
    QFont small = font();
    small.setPointSizeF(small.pointSizeF() * (n > 40 ? 0.7 : 0.8));
    auto text = [&](double x, double y, const QString& s, Qt::Alignment align) {
        auto* t = new QCPItemText(plot_);
        t->position->setCoords(x, y);
        t->setPositionAlignment(align);
        t->setText(s);
        t->setFont(small);
        t->setClipToAxisRect(true);
        return t;
    };
    rowTotals_.clear();
    columnTotals_.clear();
    double all = 0;
    for (int i = 0; i < n; ++i) {
        double won = 0, lost = 0;
        for (int j = 0; j < n; ++j) {
            won += matrix_.s(i, j);
            lost += matrix_.s(j, i);
        }
        all += won;
        rowTotals_ << countText(won);
        columnTotals_ << countText(lost);
    }
    if (n <= 40) // larger matrices: the counts are in the hover text
        for (int i = 0; i < n; ++i)
            for (int j = 0; j < n; ++j)
                if (matrix_.s(i, j) > 0) cellCounts_ << text(j, i, countText(matrix_.s(i, j)), Qt::AlignCenter);

    // Names on separate tickers per axis (rows and columns are thinned apart);
    // the headers of the totals are ticks of their own, so no axis line crosses them.
    QFont tickFont = font();
    tickFont.setPointSizeF(tickFont.pointSizeF() * 0.85);
    for (QCPAxis* a : {plot_->xAxis, plot_->xAxis2, plot_->yAxis, plot_->yAxis2}) {
        a->setTicker(QSharedPointer<QCPAxisTickerText>::create());
        a->setTickLabelFont(tickFont);
    }
    plot_->xAxis->setRange(-1.5, n - 0.5);
    plot_->xAxis2->setRange(-1.5, n - 0.5);
    plot_->yAxis->setRange(-1.5, n - 0.5);
    connect(plot_->xAxis, qOverload<const QCPRange&>(&QCPAxis::rangeChanged), plot_->xAxis2,
            qOverload<const QCPRange&>(&QCPAxis::setRange), Qt::UniqueConnection);
    plot_->legend->setVisible(true);
    const QString method = method_ ? QCoreApplication::translate("hierloom::core::RankMethod",
                                                                 core::rankMethodInfo(*method_).displayName)
                                   : tr("animal id");
    int below = static_cast<int>(markX.size());
    summary_->setText(tr("%1 animals, %2 encounters counted; ordered by %3; %4 cells with wins against the order.")
                          .arg(n)
                          .arg(countText(all))
                          .arg(method)
                          .arg(below));
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

QStringList MatrixView::order() const
{
    QStringList out;
    for (const std::string& id : ids_) out << toQString(id);
    return out;
}

void MatrixView::relabel()
{
    const int n = matrix_.n;
    if (n == 0) {
        // An empty window: no names or totals left over from the last one.
        for (QCPAxis* a : {plot_->xAxis, plot_->xAxis2, plot_->yAxis, plot_->yAxis2})
            if (auto t = a->ticker().dynamicCast<QCPAxisTickerText>()) t->clear();
        return;
    }
    QStringList labels;
    for (size_t i = 0; i < names_.size(); ++i) labels << flags_->marked(labelText(names_[i]), ids_[i]);
    rowStep_ = labelStep(plot_->yAxis, plot_->yAxis->tickLabelFont());
    columnStep_ = labelStep(plot_->xAxis2, plot_->xAxis2->tickLabelFont());
    auto set = [](QCPAxis* axis, const QMap<double, QString>& ticks) {
        if (auto t = axis->ticker().dynamicCast<QCPAxisTickerText>()) t->setTicks(ticks);
    };
    set(plot_->yAxis, thinned(labels, rowStep_));
    set(plot_->xAxis2, thinned(labels, columnStep_));
    // Totals where their row or column is labelled; counts only in cells wide enough for them.
    set(plot_->yAxis2, thinned(rowTotals_, rowStep_));
    set(plot_->xAxis, thinned(columnTotals_, columnStep_));
    const double cellWidth = std::abs(plot_->xAxis->coordToPixel(1) - plot_->xAxis->coordToPixel(0));
    const double cellHeight = std::abs(plot_->yAxis->coordToPixel(1) - plot_->yAxis->coordToPixel(0));
    // Crosses no larger than the cells (a figure's cells can be a few pixels).
    if (marks_) {
        QCPScatterStyle style = marks_->scatterStyle();
        style.setSize(std::clamp(std::min(cellWidth, cellHeight) * 0.7, 1.5, 9.0));
        QPen pen = style.pen();
        pen.setWidthF(std::clamp(std::min(cellWidth, cellHeight) * 0.15, 0.4, 1.3));
        style.setPen(pen);
        marks_->setScatterStyle(style);
    }
    for (QCPItemText* t : cellCounts_) {
        const QFontMetricsF m(t->font());
        t->setVisible(m.horizontalAdvance(t->text()) + 2 <= cellWidth && m.height() <= cellHeight);
    }
}

QStringList MatrixView::rowLabels() const
{
    QStringList out;
    if (auto t = plot_->yAxis->ticker().dynamicCast<QCPAxisTickerText>())
        for (const QString& label : t->ticks()) out << label;
    return out;
}

QStringList MatrixView::columnLabels() const
{
    QStringList out;
    if (auto t = plot_->xAxis2->ticker().dynamicCast<QCPAxisTickerText>())
        for (const QString& label : t->ticks()) out << label;
    return out;
}

void MatrixView::fitAll()
{
    const int n = matrix_.n;
    plot_->xAxis->setRange(-1.5, n - 0.5);
    plot_->yAxis->setRange(-1.5, n - 0.5);
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

void MatrixView::zoomBy(double factor)
{
    plot_->xAxis->scaleRange(factor, plot_->xAxis->range().center());
    plot_->yAxis->scaleRange(factor, plot_->yAxis->range().center());
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

QString MatrixView::animalName(int index) const
{
    if (index < 0 || index >= matrix_.n) return {};
    const QString id = toQString(ids_[static_cast<size_t>(index)]), name = toQString(names_[static_cast<size_t>(index)]);
    return name == id ? id : tr("%1 (%2)").arg(name, id);
}

QString MatrixView::describeAnimal(int index) const
{
    if (index < 0 || index >= matrix_.n) return {};
    return animalName(index) + QLatin1Char('\n') + flags_->describe(ids_[static_cast<size_t>(index)]);
}

int MatrixView::markedCount() const { return marks_ ? marks_->data()->size() : 0; }

QString MatrixView::describeCell(int row, int column) const
{
    const int n = matrix_.n;
    if (row < 0 || column < 0 || row >= n || column >= n || row == column) return {};
    const QString a = animalName(row), b = animalName(column);
    QString s = tr("%1 beat %2: %3\n%2 beat %1: %4")
                    .arg(a, b, countText(matrix_.s(row, column)), countText(matrix_.s(column, row)));
    if (row > column && matrix_.s(row, column) > 0) s += tr("\n(wins against the order)");
    return s;
}

void MatrixView::hover(QMouseEvent* event)
{
    const int column = static_cast<int>(std::lround(plot_->xAxis->pixelToCoord(event->pos().x())));
    const int row = static_cast<int>(std::lround(plot_->yAxis->pixelToCoord(event->pos().y())));
    // Over a label (left of or above the cells): the animal's full name.
    const QRect cells = plot_->axisRect()->rect();
    QString text;
    if (event->pos().x() < cells.left() && event->pos().y() >= cells.top()) text = describeAnimal(row);
    else if (event->pos().y() < cells.top() && event->pos().x() >= cells.left()) text = describeAnimal(column);
    else text = describeCell(row, column);
    if (text.isEmpty()) QToolTip::hideText();
    else QToolTip::showText(event->globalPosition().toPoint(), text, plot_);
}

} // namespace hierloom::ui
