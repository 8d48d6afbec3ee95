// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/hierarchy_plots_view.h"

#include "ui/analysis/rank_flag_watch.h"

#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/help_button.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/compute_runner.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/plot_export.h"
#include "ui/widgets/progress_strip.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_queries.h"

#include "core/pedigree/inheritance_prediction.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QSignalBlocker>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <algorithm>

namespace hierloom::ui {

namespace {
// Okabe-Ito colours, one per panel.
const QColor panelColours[] = {QColor(0x00, 0x72, 0xB2), QColor(0xE6, 0x9F, 0x00), QColor(0x00, 0x9E, 0x73),
                               QColor(0xCC, 0x79, 0xA7), QColor(0x56, 0x56, 0x56)};
constexpr double secondsPerDay = 86400.0;
} // namespace

HierarchyPlotsView::HierarchyPlotsView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the monthly hierarchy figures"), this)),
      plot_(new QCustomPlot(this)),
      group_(new QComboBox(this)),
      flagLine_(new QLabel(this)),
      flags_(new RankFlagWatch(document, this))
{
    flagLine_->setObjectName(QStringLiteral("hierarchyFlagLine"));
    flagLine_->setWordWrap(true);
    auto* controls = new QHBoxLayout;
    controls->addWidget(new QLabel(tr("Month by month over the whole record of"), this));
    group_->setObjectName(QStringLiteral("hierarchyGroup"));
    group_->setToolTip(tr("Every group's encounters, or one group's (an encounter without a group counts for "
                          "the group both animals shared that day)"));
    controls->addWidget(group_);
    // One "?" per figure plotted, in the order of the panels.
    for (const char* key : {"h_prime", "steepness", "ttri", "conformity"})
        controls->addWidget(new HelpButton(QString::fromLatin1(key), this));
    controls->addStretch();
    PlotFigure figure;
    figure.plot = plot_;
    figure.baseName = QStringLiteral("hierarchy-by-month");
    figure.title = tr("The hierarchy month by month");
    figure.singleHeightMm = 170;
    figure.doubleHeightMm = 170;
    figure.caption = [this] {
        const core::AnalysisSettings settings = documentAnalysisSettings(document_);
        std::optional<core::Day> from, to;
        if (!series_.months.empty()) {
            from = series_.months.front().period.start;
            to = series_.months.back().period.end;
        }
        return caption::join({caption::group(group_->currentData().toString()), caption::window(from, to),
                              tr("calendar months; months without encounters left empty"),
                              tr("conformity of %1 ranks with youngest ascendancy, females from %2 years")
                                  .arg(caption::elo(settings.elo))
                                  .arg(settings.maturityYears)});
    };
    controls->addWidget(makeExportButton(figure, this));
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(progress_); // a row of its own while computing: the controls keep their width
    layout->addWidget(plot_, 1);
    layout->addWidget(flagLine_);

    // Five stacked panels sharing the date axis; a legend row on top.
    plot_->plotLayout()->clear();
    auto* legendRow = new QCPLayoutGrid;
    plot_->plotLayout()->addElement(0, 0, legendRow);
    // clear() deleted the default legend with the default axis rect: make a new one.
    plot_->legend = new QCPLegend;
    legendRow->addElement(0, 0, plot_->legend);
    plot_->legend->setLayer(QStringLiteral("legend"));
    plot_->legend->setFillOrder(QCPLegend::foColumnsFirst);
    plot_->legend->setVisible(true);
    // The five long names in one row held the plot at 1051 px: they wrap to its width instead.
    wrapLegendToPlotWidth(plot_);
    plot_->setMinimumWidth(400);
    plot_->plotLayout()->setRowStretchFactor(0, 0.001);
    auto* margins = new QCPMarginGroup(plot_);
    const QString labels[] = {tr("h'"), tr("Steepness"), tr("t_tri"), tr("Conformity"), tr("Encounters")};
    const QString names[] = {tr("h' (de Vries 1995)"), tr("steepness (David's score, Dij)"),
                             tr("triangle transitivity t_tri"), tr("conformity with the inheritance rule (Elo)"),
                             tr("encounters per month")};
    auto ticker = QSharedPointer<QCPAxisTickerDateTime>::create();
    ticker->setDateTimeSpec(Qt::UTC);
    ticker->setDateTimeFormat(QStringLiteral("MMM\nyyyy"));
    std::vector<QCPAxisRect*> rects;
    for (int p = 0; p < PanelCount; ++p) {
        auto* rect = new QCPAxisRect(plot_);
        plot_->plotLayout()->addElement(p + 1, 0, rect);
        rect->setMarginGroup(QCP::msLeft | QCP::msRight, margins);
        rect->axis(QCPAxis::atLeft)->setLabel(labels[p]);
        rect->axis(QCPAxis::atBottom)->setTicker(ticker);
        rect->axis(QCPAxis::atBottom)->setTickLabels(p == PanelCount - 1);
        rect->setRangeDrag(Qt::Horizontal);
        rect->setRangeZoom(Qt::Horizontal);
        for (QCPAxis* a : rect->axes()) a->setLayer(QStringLiteral("axes"));
        QCPAbstractPlottable* plottable = nullptr;
        if (p == Encounters) {
            auto* bars = new QCPBars(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
            bars->setWidth(26 * secondsPerDay);
            bars->setPen(Qt::NoPen);
            bars->setBrush(panelColours[p]);
            plottable = bars;
        } else {
            auto* graph = new QCPGraph(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
            graph->setPen(QPen(panelColours[p], 1.5));
            graph->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, panelColours[p], 3.5));
            plottable = graph;
        }
        plottable->setName(names[p]);
        plottables_[static_cast<size_t>(p)] = plottable;
        rects.push_back(rect);
    }
    rects.back()->axis(QCPAxis::atBottom)->setLabel(tr("Month"));
    // One pan or zoom moves every panel.
    for (QCPAxisRect* a : rects)
        for (QCPAxisRect* b : rects)
            if (a != b)
                connect(a->axis(QCPAxis::atBottom), qOverload<const QCPRange&>(&QCPAxis::rangeChanged),
                        b->axis(QCPAxis::atBottom), qOverload<const QCPRange&>(&QCPAxis::setRange));
    plot_->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);

    connect(progress_, &ProgressStrip::retry, this, &HierarchyPlotsView::recompute);
    connect(flags_, &RankFlagWatch::updated, this, &HierarchyPlotsView::showFlags);
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] { recompute(); });
    connect(document_, &ColonyDocument::changed, this, &HierarchyPlotsView::refillGroups);
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    connect(group_, &QComboBox::currentIndexChanged, this, &HierarchyPlotsView::recompute);
    refillGroups();
    recompute();
}

void HierarchyPlotsView::refillGroups()
{
    // Appended lines add a group to the choice only when one is new: no scan of every encounter per Enter.
    const ColonyDocument::Change& change = document_->lastChange();
    if (change.kind == ColonyDocument::ChangeKind::SettingsChanged || change.kind == ColonyDocument::ChangeKind::ListsChanged)
        return;
    if (change.kind == ColonyDocument::ChangeKind::EncountersAppended) {
        const core::EncounterRecords& encounters = document_->encounters();
        bool known = true;
        for (size_t i = change.firstAppended; i < encounters.size() && known; ++i)
            known = encounters.group(i).empty() || group_->findData(toQString(encounters.group(i))) >= 0;
        if (known) return;
    }
    const QSignalBlocker block(group_);
    const QString current = group_->currentData().toString();
    group_->clear();
    group_->addItem(tr("all groups"), QString());
    if (document_->isOpen())
        for (const QString& g : groupsWithEncounters(document_)) group_->addItem(g, g);
    group_->setCurrentIndex(std::max(0, group_->findData(current)));
}

void HierarchyPlotsView::setGroup(const QString& group)
{
    const int i = group_->findData(group);
    if (i >= 0) group_->setCurrentIndex(i);
}

HierarchyPlotsView::~HierarchyPlotsView() = default;

void HierarchyPlotsView::recompute()
{
    if (!document_->isOpen()) {
        runner_->cancel();
        flags_->clear();
        adopt({});
        return;
    }
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_->currentData().toString())) return;
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    core::InheritanceOptions options;
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    options.elo = settings.elo;
    options.maturityYears = settings.maturityYears;
    options.group = toStdString(group_->currentData().toString());
    runner_->start([this, snapshot = snapshot, options](const std::atomic<bool>& cancel, const ComputeRunner::Progress& progress) mutable {
        // The group's encounters only (its selection reads no other).
        const core::Colony colony = snapshot.colonyFor(options.group);
        snapshot.encounters.reset(); // an edit meanwhile need not copy the document's records
        const core::Matrilines lines(colony);
        auto s = std::make_shared<core::HierarchySeries>(
            core::computeHierarchySeries(colony, *snapshot.residences, lines, options, &cancel, progress));
        return ComputeRunner::Apply([this, s] { adopt(std::move(*s)); });
    });
}

int HierarchyPlotsView::pointCount(Panel panel) const
{
    const QCPAbstractPlottable* p = plottables_[static_cast<size_t>(panel)];
    if (const auto* g = qobject_cast<const QCPGraph*>(p)) return g->data()->size();
    if (const auto* b = qobject_cast<const QCPBars*>(p)) return b->data()->size();
    return 0;
}

void HierarchyPlotsView::adopt(core::HierarchySeries series)
{
    series_ = std::move(series);
    QVector<double> keys;
    std::array<QVector<double>, PanelCount> values;
    auto orGap = [](const std::optional<double>& v) { return v ? *v : qQNaN(); }; // NaN: QCustomPlot's gap
    for (const core::HierarchyMonth& m : series_.months) {
        keys << (m.period.start + m.period.end) / 2.0 * secondsPerDay;
        // A month without encounters is a gap in every figure (the conformity
        // would otherwise repeat the last month's ranks).
        const bool empty = m.encounters == 0;
        values[HPrime] << (empty ? qQNaN() : orGap(m.hPrime));
        values[Steepness] << (empty ? qQNaN() : orGap(m.steepness));
        values[TTri] << (empty ? qQNaN() : orGap(m.tTri));
        values[Conformity] << (empty ? qQNaN() : orGap(m.conformity));
        values[Encounters] << static_cast<double>(m.encounters);
    }
    for (int p = 0; p < PanelCount; ++p) {
        QCPAbstractPlottable* plottable = plottables_[static_cast<size_t>(p)];
        if (auto* g = qobject_cast<QCPGraph*>(plottable)) g->setData(keys, values[static_cast<size_t>(p)], true);
        if (auto* b = qobject_cast<QCPBars*>(plottable)) b->setData(keys, values[static_cast<size_t>(p)], true);
        QCPAxis* y = plottable->valueAxis();
        // Each panel scaled to its own values (with zero in view for the counts),
        // so a change such as a drop in conformity is visible.
        bool found = false;
        const QCPRange r = plottable->getValueRange(found);
        if (!found) y->setRange(0, 1);
        else if (p == Encounters) y->setRange(0, r.upper * 1.08);
        else {
            const double pad = std::max(0.1 * r.size(), 0.01);
            y->setRange(r.lower - pad, r.upper + pad);
        }
        if (!keys.isEmpty()) plottable->keyAxis()->setRange(keys.front() - 20 * secondsPerDay, keys.back() + 20 * secondsPerDay);
    }
    plot_->replot(QCustomPlot::rpQueuedReplot);
    // The flags of the window the other views open with: the default window ending with the last month.
    flagFrom_ = flagTo_ = std::nullopt;
    if (series_.months.empty() || !document_->isOpen()) {
        flags_->clear();
        return;
    }
    flagTo_ = std::min(series_.months.back().period.end,
                       document_->lastEncounterDay().value_or(series_.months.back().period.end));
    flagFrom_ = core::defaultWindowStart(documentAnalysisSettings(document_), flagTo_);
    flags_->request(flagFrom_, flagTo_, toStdString(group_->currentData().toString()));
}

void HierarchyPlotsView::showFlags()
{
    if (!flagTo_) {
        flagLine_->clear();
        flagLine_->setToolTip(QString());
        return;
    }
    // The flagged animals of the window, each with its count and interval width.
    QStringList named, tips;
    for (const core::Animal& a : document_->pedigree().animals) {
        if (!flags_->flagged(a.id) || flags_->encounters(a.id) == 0) continue;
        const QString name = a.name.empty() ? toQString(a.id) : tr("%1 (%2)").arg(toQString(a.name), toQString(a.id));
        const std::optional<double> width = flags_->intervalWidth(a.id);
        named << tr("%1 %2").arg(name).arg(flags_->encounters(a.id)) +
                     (width ? tr(", width %1").arg(*width, 0, 'f', 0) : QString());
        tips << name + QStringLiteral(": ") + flags_->describe(a.id);
    }
    const QString window = flagFrom_ ? tr("from %1 to %2").arg(formatDay(*flagFrom_), formatDay(*flagTo_))
                                     : tr("up to %1").arg(formatDay(*flagTo_));
    constexpr int shown = 8;
    QString list = QStringList(named.mid(0, shown)).join(QStringLiteral("; "));
    if (named.size() > shown) list += tr("; and %1 more (hover)").arg(named.size() - shown);
    flagLine_->setText(
        named.isEmpty()
            ? tr("Every animal with encounters %1 has at least %2.").arg(window).arg(flags_->threshold())
            : tr("%1 Too few encounters for a stable rank (under %2 %3); encounters and randomised-Elo interval "
                 "width%4: %5.")
                  .arg(RankFlagWatch::mark())
                  .arg(flags_->threshold())
                  .arg(window)
                  .arg(flags_->widthsReady() ? QString() : tr(" (widths being computed)"))
                  .arg(list));
    flagLine_->setToolTip(tips.join(QLatin1Char('\n')));
}

} // namespace hierloom::ui
