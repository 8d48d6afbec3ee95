// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/rank_timeline_view.h"

#include "ui/analysis/rank_flag_watch.h"

#include "ui/document/animal_selection.h"
#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/help_button.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/compute_runner.h"
#include "ui/analysis/pedigree_view.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/plot_clearing.h"
#include "ui/widgets/plot_export.h"
#include "ui/widgets/progress_strip.h"
#include "ui/document/qt_convert.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QSlider>
#include <QSplitter>
#include <QToolTip>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <algorithm>
#include <cmath>
#include <set>

namespace hierloom::ui {

namespace {

constexpr double hoverPixels = 10;

struct EventStyle {
    core::LifeEventKind kind;
    QCPScatterStyle::ScatterShape shape;
    const char* name;
};
const EventStyle eventStyles[] = {
    {core::LifeEventKind::Birth, QCPScatterStyle::ssTriangle, QT_TRANSLATE_NOOP("hierloom::ui::RankTimelineView", "Birth")},
    {core::LifeEventKind::Maturity, QCPScatterStyle::ssDiamond, QT_TRANSLATE_NOOP("hierloom::ui::RankTimelineView", "Maturity")},
    {core::LifeEventKind::Introduction, QCPScatterStyle::ssTriangleInverted,
     QT_TRANSLATE_NOOP("hierloom::ui::RankTimelineView", "Introduction")},
    {core::LifeEventKind::Removal, QCPScatterStyle::ssSquare, QT_TRANSLATE_NOOP("hierloom::ui::RankTimelineView", "Removal")},
    {core::LifeEventKind::Death, QCPScatterStyle::ssCross, QT_TRANSLATE_NOOP("hierloom::ui::RankTimelineView", "Death")},
};

QCPScatterStyle discordanceStyle(const QColor& fill)
{
    return QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(discordanceColour(), 1), QBrush(fill), 5);
}

} // namespace

RankTimelineView::RankTimelineView(ColonyDocument* document, AnimalSelection* selection, QWidget* parent)
    : QWidget(parent),
      document_(document),
      selection_(selection),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the rank timeline"), this)),
      plot_(new QCustomPlot(this)),
      pedigree_(new PedigreeView(document, selection, this)),
      scaleBox_(new QComboBox(this)),
      stepBox_(new QComboBox(this)),
      lineBox_(new QComboBox(this)),
      groupBox_(new QComboBox(this)),
      ageBox_(new QComboBox(this)),
      marksBox_(new QComboBox(this)),
      changeBox_(new QComboBox(this)),
      slider_(new QSlider(Qt::Horizontal, this)),
      dateLabel_(new QLabel(this)),
      flagLegend_(new QLabel(this)),
      flags_(new RankFlagWatch(document, this))
{
    slider_->setObjectName(QStringLiteral("timelineDate"));
    flagLegend_->setObjectName(QStringLiteral("timelineFlagLegend"));
    flagLegend_->setWordWrap(true);
    scaleBox_->addItems({tr("Rank"), tr("Elo rating")});
    stepBox_->addItems({tr("Monthly"), tr("Weekly")});
    ageBox_->addItems({tr("All ages"), tr("Young adults (under 8)"), tr("Prime (8 to 15)"), tr("Old (16 and over)")});
    marksBox_->addItems({tr("Discordance: selected female"), tr("Discordance: all females"), tr("Discordance: none")});
    changeBox_->setObjectName(QStringLiteral("changeColouring"));
    changeBox_->addItems({tr("Changes: plain"), tr("Changes: active/passive")});
    changeBox_->setToolTip(tr("Mark each change of rank between checkpoints: active (won or lost among the females "
                              "ranked before and after), passive (females above her left or entered), or both"));
    lineBox_->addItem(tr("All matrilines"), QString());
    groupBox_->addItem(tr("All groups"), QString());
    auto* controls = new QHBoxLayout;
    controls->addWidget(new QLabel(tr("Show:"), this));
    controls->addWidget(scaleBox_);
    controls->addWidget(new HelpButton(QStringLiteral("elo"), this));
    controls->addWidget(stepBox_);
    controls->addWidget(lineBox_);
    controls->addWidget(groupBox_);
    controls->addWidget(ageBox_);
    controls->addWidget(marksBox_);
    controls->addStretch();
    PlotFigure figure;
    figure.plot = plot_;
    figure.baseName = QStringLiteral("rank-timeline");
    figure.title = tr("Ranks over time");
    figure.singleHeightMm = 100;
    figure.doubleHeightMm = 130;
    figure.caption = [this] {
        std::optional<core::Day> from, to;
        if (!timeline_.checkpoints.empty()) {
            from = timeline_.checkpoints.front();
            to = timeline_.checkpoints.back();
        }
        return caption::join({caption::group(group_), caption::window(from, to), stepBox_->currentText().toLower(),
                              caption::elo(documentAnalysisSettings(document_).elo)});
    };
    controls->addWidget(makeExportButton(figure, this));

    auto* split = new QSplitter(Qt::Horizontal, this);
    split->addWidget(plot_);
    split->addWidget(pedigree_);
    split->setStretchFactor(0, 2);
    split->setStretchFactor(1, 1);
    split->setSizes({700, 350});
    auto* dates = new QHBoxLayout;
    dates->addWidget(new QLabel(tr("Date:"), this));
    dates->addWidget(slider_, 1);
    dates->addWidget(dateLabel_);
    // Beside the dates (the row above is full): colour each change of rank by its kind.
    dates->addWidget(changeBox_);
    dates->addWidget(new HelpButton(QStringLiteral("active_passive"), this));
    dateLabel_->setMinimumWidth(90);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(progress_); // a row of its own while computing: the controls keep their width
    layout->addWidget(split, 1);
    layout->addWidget(flagLegend_);
    layout->addLayout(dates);

    plot_->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);
    // Hundreds of lines: draw them as plain polylines, and without antialiasing
    // while dragging, so panning keeps up with the mouse.
    plot_->setPlottingHint(QCP::phFastPolylines, true);
    plot_->setNoAntialiasingOnDrag(true);
    plot_->axisRect()->setRangeDrag(Qt::Horizontal);
    plot_->axisRect()->setRangeZoom(Qt::Horizontal);
    auto ticker = QSharedPointer<QCPAxisTickerDateTime>::create();
    ticker->setDateTimeSpec(Qt::UTC);
    ticker->setDateTimeFormat(QStringLiteral("MMM\nyyyy"));
    plot_->xAxis->setTicker(ticker);
    plot_->xAxis->setLabel(tr("Date"));
    // The legend in a column of its own, top-aligned (a filler below takes
    // the rest); or, when its entries would need a second column there (a
    // centre's many matrilines), in a row under the plot, wrapped to its width.
    auto* side = new QCPLayoutGrid;
    plot_->plotLayout()->addElement(0, 1, side);
    plot_->plotLayout()->setColumnStretchFactor(1, 0.001);
    side->addElement(0, 0, plot_->legend);
    side->addElement(1, 0, new QCPLayoutElement(plot_));
    side->setRowStretchFactor(0, 0.001);
    side->setMargins(QMargins(2, 0, 4, 2)); // the legend's frame stays inside the plot's edge
    auto* under = new QCPLayoutGrid;
    plot_->plotLayout()->addElement(1, 0, under);
    under->addElement(0, 0, new QCPLayoutElement(plot_)); // an empty grid would cap the plot's width at nothing
    plot_->plotLayout()->setRowStretchFactor(1, 0.001);
    plot_->legend->setVisible(true);
    QFont legendFont = font();
    legendFont.setPointSizeF(legendFont.pointSizeF() * 0.85);
    plot_->legend->setFont(legendFont);
    placeLegendBesideOrUnder(plot_, side, under);
    plot_->setMouseTracking(true);
    plot_->addLayer(QStringLiteral("selected"), plot_->layer(QStringLiteral("main")), QCustomPlot::limAbove);
    plot_->setMinimumWidth(400);

    connect(scaleBox_, &QComboBox::currentIndexChanged, this, [this](int i) { setScale(i == 0 ? Scale::Rank : Scale::Elo); });
    connect(stepBox_, &QComboBox::currentIndexChanged, this,
            [this](int i) { setStep(i == 0 ? core::TimelineStep::Month : core::TimelineStep::Week); });
    connect(lineBox_, &QComboBox::currentIndexChanged, this, [this] { setMatriline(lineBox_->currentData().toString()); });
    connect(groupBox_, &QComboBox::currentIndexChanged, this, [this] { setGroup(groupBox_->currentData().toString()); });
    connect(ageBox_, &QComboBox::currentIndexChanged, this, [this](int i) { setAgeClass(static_cast<AgeClass>(i)); });
    connect(marksBox_, &QComboBox::currentIndexChanged, this, [this](int i) { setMarks(static_cast<Marks>(i)); });
    connect(changeBox_, &QComboBox::currentIndexChanged, this, [this](int i) { setChangeColouring(i == 1); });
    connect(slider_, &QSlider::valueChanged, this, [this](int k) {
        if (k >= 0 && k < static_cast<int>(timeline_.checkpoints.size()))
            selection_->setDay(timeline_.checkpoints[static_cast<size_t>(k)]);
    });
    connect(progress_, &ProgressStrip::retry, this, &RankTimelineView::recompute);
    connect(flags_, &RankFlagWatch::updated, this, [this] {
        fillFlagMarks();
        plot_->replot(QCustomPlot::rpQueuedReplot);
    });
    connect(plot_, &QCustomPlot::mouseMove, this, &RankTimelineView::hover);
    connect(plot_, &QCustomPlot::mousePress, this, [this](QMouseEvent* e) { pressedAt_ = e->pos(); });
    connect(plot_, &QCustomPlot::mouseRelease, this, &RankTimelineView::click);
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] { recompute(); });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    connect(selection_, &AnimalSelection::dayChanged, this, &RankTimelineView::showDay);
    connect(selection_, &AnimalSelection::animalChanged, this, &RankTimelineView::applySelection);
    recompute();
}

RankTimelineView::~RankTimelineView() = default;

void RankTimelineView::recompute()
{
    if (!document_->isOpen()) {
        runner_->cancel();
        flags_->clear();
        shownKey_.clear();
        adopt({}, {});
        return;
    }
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_)) return;
    core::RankTimelineOptions options;
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    options.inheritance.elo = settings.elo;
    options.inheritance.maturityYears = settings.maturityYears;
    options.step = step_;
    options.inheritance.group = toStdString(group_);
    // A timeline computed at this revision is shown at once. "All groups" of a
    // file kept group by group changes as groups are read: never kept.
    const std::string key = resultKey();
    const std::uint64_t revision = document_->revision();
    const bool keep = !group_.isEmpty() || document_->isComplete();
    if (keep) {
        if (const auto hit = results_.find(key, revision)) {
            runner_->cancel();
            ++resultsReused_;
            shownKey_ = key;
            adopt(hit->timeline, hit->palette);
            return;
        }
    }
    if (key != shownKey_) showComputing();
    // Shared, unchanging records: the worker must not read the document while an edit changes it.
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    runner_->start([this, snapshot = snapshot, options, key, revision, keep](const std::atomic<bool>& cancel,
                                                                 const ComputeRunner::Progress& progress) mutable {
        // The group's encounters only (its selection reads no other).
        const core::Colony colony = snapshot.colonyFor(options.inheritance.group);
        snapshot.encounters.reset(); // an edit meanwhile need not copy the document's records
        const core::Matrilines lines(colony);
        auto result = std::make_shared<Result>();
        result->timeline = core::computeRankTimeline(colony, *snapshot.residences, lines, options, &cancel, progress);
        result->palette = MatrilinePalette(lines);
        return ComputeRunner::Apply([this, result, key, revision, keep] {
            // Records changed meanwhile: this result is not theirs (the change
            // has started a new computation, or marked a hidden view stale).
            if (document_->revision() != revision) return;
            if (keep && !result->timeline.cancelled) results_.store(key, revision, result);
            shownKey_ = key;
            adopt(result->timeline, result->palette);
        });
    });
}

std::string RankTimelineView::resultKey() const
{
    return toStdString(group_) + (step_ == core::TimelineStep::Month ? "\nmonth" : "\nweek");
}

void RankTimelineView::showComputing()
{
    clearPlot(plot_);
    lines_.clear();
    events_.clear();
    changes_.clear();
    flagMarks_ = nullptr;
    dayLine_ = nullptr;
    computingText_ = new QCPItemText(plot_);
    computingText_->position->setType(QCPItemPosition::ptAxisRectRatio);
    computingText_->position->setCoords(0.5, 0.5);
    computingText_->setText(group_.isEmpty() ? tr("Computing the ranks of every group…")
                                             : tr("Computing the ranks in %1…").arg(group_));
    computingText_->setColor(plot_->xAxis->labelColor()); // the plot's own text colour (light or dark plots)
    // Empty axes without numbers: their range is not the group's yet (before a first result, dates of 1970).
    plot_->xAxis->setTickLabels(false);
    plot_->yAxis->setTickLabels(false);
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

void RankTimelineView::adopt(core::RankTimeline timeline, MatrilinePalette palette)
{
    timeline_ = std::move(timeline);
    palette_ = std::move(palette);
    rankChanges_ = core::timelineRankChanges(timeline_);
    // Matriline and group choices, keeping the current ones where they still exist.
    {
        const QSignalBlocker block(lineBox_);
        lineBox_->clear();
        lineBox_->addItem(tr("All matrilines"), QString());
        std::set<std::string> shown; // the lines with a female on the plot, as in the legend
        for (const core::RankTimelineFemale& f : timeline_.females) shown.insert(f.matriarch);
        for (const std::string& m : palette_.matriarchs()) {
            if (!shown.count(m)) continue;
            const int f = timeline_.find(m);
            const QString name = f >= 0 ? toQString(timeline_.females[static_cast<size_t>(f)].name) : QString();
            lineBox_->addItem(tr("Line of %1").arg(name.isEmpty() ? toQString(m) : name), toQString(m));
        }
        const int at = lineBox_->findData(matriline_);
        lineBox_->setCurrentIndex(std::max(at, 0));
        if (at < 0) matriline_.clear();
    }
    {
        const QSignalBlocker block(groupBox_);
        groupBox_->clear();
        groupBox_->addItem(tr("All groups"), QString());
        for (const std::string& g : document_->residences().groups()) groupBox_->addItem(toQString(g), toQString(g));
        groupBox_->setCurrentIndex(std::max(groupBox_->findData(group_), 0));
    }
    {
        const QSignalBlocker block(slider_);
        slider_->setRange(0, std::max(0, static_cast<int>(timeline_.checkpoints.size()) - 1));
    }
    rebuildPlot();
    if (!timeline_.checkpoints.empty()) {
        const std::optional<core::Day> day = selection_->day();
        if (!day || *day < timeline_.checkpoints.front() || *day > timeline_.checkpoints.back())
            selection_->setDay(timeline_.checkpoints.back());
        showDay(*selection_->day());
    }
}

std::optional<double> RankTimelineView::valueOf(const core::RankTimelinePoint& p) const
{
    if (scale_ == Scale::Elo) return p.elo;
    if (p.rank) return static_cast<double>(*p.rank);
    return std::nullopt;
}

void RankTimelineView::rebuildPlot()
{
    clearPlot(plot_);
    computingText_ = nullptr;
    lines_.clear();
    events_.clear();
    changes_.clear();
    const size_t nCheck = timeline_.checkpoints.size();
    // Legend: one entry per matriline, then the markers.
    // Only the lines with a female on the plot: a centre's palette holds every
    // group's matrilines (hundreds), and each colour stays the palette's.
    std::set<std::string> shown;
    for (const core::RankTimelineFemale& f : timeline_.females) shown.insert(f.matriarch);
    for (int l = 0; l < palette_.lineCount(); ++l) {
        if (!shown.count(palette_.matriarchs()[static_cast<size_t>(l)])) continue;
        QCPGraph* key = plot_->addGraph();
        key->setPen(MatrilinePalette::penAt(l, 2));
        const std::string& m = palette_.matriarchs()[static_cast<size_t>(l)];
        const int f = timeline_.find(m);
        const QString name = f >= 0 ? toQString(timeline_.females[static_cast<size_t>(f)].name) : QString();
        key->setName(tr("Line of %1").arg(name.isEmpty() ? toQString(m) : name));
    }
    for (size_t i = 0; i < timeline_.females.size(); ++i) {
        const core::RankTimelineFemale& f = timeline_.females[i];
        Line line;
        line.female = static_cast<int>(i);
        line.pointAt.assign(nCheck, -1);
        QVector<double> keys, values, markKeys, markValues;
        size_t k = 0;
        size_t previous = 0;
        for (size_t p = 0; p < f.points.size(); ++p) {
            const core::RankTimelinePoint& pt = f.points[p];
            while (k < nCheck && timeline_.checkpoints[k] < pt.day) ++k;
            if (k < nCheck) line.pointAt[k] = static_cast<int>(p);
            // A checkpoint where she was not ranked breaks her line (NaN is QCustomPlot's gap).
            if (p > 0 && k > previous + 1) {
                keys << (keyOf(pt.day) - 1);
                values << qQNaN();
            }
            previous = k;
            const std::optional<double> v = valueOf(pt);
            keys << keyOf(pt.day);
            values << (v ? *v : qQNaN());
            if (pt.discordant() && v) {
                markKeys << keyOf(pt.day);
                markValues << *v;
            }
        }
        line.graph = plot_->addGraph();
        line.graph->setData(keys, values, true);
        line.graph->setPen(palette_.pen(f.matriarch, 1));
        line.graph->setName(toQString(f.animal));
        line.graph->removeFromLegend();
        if (!markKeys.isEmpty()) {
            line.marks = plot_->addGraph();
            line.marks->setData(markKeys, markValues, true);
            line.marks->setLineStyle(QCPGraph::lsNone);
            line.marks->setScatterStyle(discordanceStyle(palette_.colour(f.matriarch)));
            line.marks->setLayer(QStringLiteral("selected"));
            line.marks->removeFromLegend();
        }
        lines_.push_back(std::move(line));
    }
    for (const EventStyle& s : eventStyles) {
        QCPGraph* g = plot_->addGraph();
        g->setLineStyle(QCPGraph::lsNone);
        g->setScatterStyle(QCPScatterStyle(s.shape, QPen(Qt::black, 1.2), QBrush(Qt::white), 8));
        g->setName(tr(s.name));
        events_[s.kind] = g;
    }
    if (colourChanges_) {
        const std::pair<ChangeKind, const char*> kinds[] = {
            {ChangeKind::Active, QT_TR_NOOP("Rank change: active")},
            {ChangeKind::Passive, QT_TR_NOOP("Rank change: passive")},
            {ChangeKind::Both, QT_TR_NOOP("Rank change: both")}};
        for (const auto& [kind, name] : kinds) {
            QCPGraph* g = plot_->addGraph();
            g->setLineStyle(QCPGraph::lsNone);
            // Okabe-Ito vermillion, sky blue and reddish purple: told apart with any colour vision.
            const QColor c = kind == ChangeKind::Active    ? QColor(0xD5, 0x5E, 0x00)
                             : kind == ChangeKind::Passive ? QColor(0x56, 0xB4, 0xE9)
                                                           : QColor(0xCC, 0x79, 0xA7);
            g->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(c.darker(160), 0.8), QBrush(c), 6));
            g->setName(tr(name));
            g->setLayer(QStringLiteral("selected"));
            changes_[kind] = g;
        }
    }
    QCPGraph* discordKey = plot_->addGraph();
    discordKey->setLineStyle(QCPGraph::lsNone);
    discordKey->setScatterStyle(discordanceStyle(QColor(0xBB, 0xBB, 0xBB)));
    discordKey->setName(tr("In a discordant dyad"));
    // Okabe-Ito orange rings, larger than every other marker, around the flagged females at the date.
    flagMarks_ = plot_->addGraph();
    flagMarks_->setLineStyle(QCPGraph::lsNone);
    flagMarks_->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(QColor(0xE6, 0x9F, 0x00), 2), QBrush(), 13));
    flagMarks_->setName(tr("%1 Too few encounters (at the date)").arg(RankFlagWatch::mark()));
    flagMarks_->removeFromLegend(); // listed only while a female is ringed
    flagMarks_->setLayer(QStringLiteral("selected"));

    dayLine_ = new QCPItemStraightLine(plot_);
    dayLine_->setPen(QPen(QColor(0x55, 0x55, 0x55), 1, Qt::DashLine));
    dayLine_->setVisible(false);

    if (scale_ == Scale::Rank) {
        plot_->yAxis->setLabel(tr("Observed rank (1 = top)"));
        plot_->yAxis->setRangeReversed(true);
        stripValue_ = std::max(1, timeline_.maxRank) + 1.5;
        plot_->yAxis->setRange(0.5, stripValue_ + 0.7);
    } else {
        plot_->yAxis->setLabel(tr("Elo rating"));
        plot_->yAxis->setRangeReversed(false);
    }
    if (!timeline_.checkpoints.empty()) {
        const double from = keyOf(timeline_.checkpoints.front()), to = keyOf(timeline_.checkpoints.back());
        plot_->xAxis->setRange(from - 20 * 86400.0, to + 20 * 86400.0);
    }
    plot_->xAxis->setTickLabels(!timeline_.checkpoints.empty()); // no dates of 1970 on an empty timeline
    plot_->yAxis->setTickLabels(true);
    applyFilters();
    if (scale_ == Scale::Elo) {
        bool found = false;
        QCPRange range;
        for (const Line& l : lines_) {
            const QCPRange r = l.graph->getValueRange(found);
            if (!found) continue;
            range = range.size() == 0 && range.lower == 0 ? r : QCPRange(std::min(range.lower, r.lower), std::max(range.upper, r.upper));
        }
        if (range.size() > 0) {
            stripValue_ = range.lower - 0.06 * range.size();
            plot_->yAxis->setRange(stripValue_ - 0.04 * range.size(), range.upper + 0.04 * range.size());
            applyFilters(); // the events far from a line moved with the strip
        }
    }
    applySelection();
}

void RankTimelineView::applyFilters()
{
    const std::optional<core::Day> day = selection_->day();
    std::map<core::LifeEventKind, std::pair<QVector<double>, QVector<double>>> events;
    for (const Line& line : lines_) {
        const core::RankTimelineFemale& f = timeline_.females[static_cast<size_t>(line.female)];
        bool show = matriline_.isEmpty() || toQString(f.matriarch) == matriline_;
        if (show && ageClass_ != AgeClass::All) {
            // Her age on the selected date, or on her last ranked day if she was gone by then.
            show = f.birth.has_value() && day.has_value() && !f.points.empty();
            if (show) {
                const int age = core::ageInYears(*f.birth, std::min(*day, f.points.back().day));
                const AgeClass c = age < 8 ? AgeClass::Young : (age < 16 ? AgeClass::Prime : AgeClass::Old);
                show = c == ageClass_;
            }
        }
        line.graph->setVisible(show);
        if (line.marks) line.marks->setVisible(marksShown(line));
        if (!show) continue;
        for (const core::LifeEvent& e : f.events) {
            // The marker sits on her line at the nearest point with a value; an
            // event far from her line (a birth years before she is ranked) goes
            // on the strip below the lines instead.
            std::optional<double> v;
            int best = -1;
            for (size_t p = 0; p < f.points.size(); ++p) {
                const std::optional<double> pv = valueOf(f.points[p]);
                if (!pv) continue;
                if (best < 0 || std::abs(f.points[p].day - e.day) < std::abs(f.points[static_cast<size_t>(best)].day - e.day)) {
                    best = static_cast<int>(p);
                    v = pv;
                }
            }
            if (!v || std::abs(f.points[static_cast<size_t>(best)].day - e.day) > 45) v = stripValue_;
            events[e.kind].first << keyOf(e.day);
            events[e.kind].second << *v;
        }
    }
    for (auto& [kind, graph] : events_) graph->setData(events[kind].first, events[kind].second);
    fillChangeMarks();
    fillFlagMarks();
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

void RankTimelineView::requestFlags()
{
    const std::optional<core::Day> day = selection_->day();
    if (!document_->isOpen() || !day || timeline_.checkpoints.empty()) {
        flags_->clear();
        return;
    }
    const core::Day to = timeline_.checkpoints[static_cast<size_t>(nearestCheckpoint(keyOf(*day)))];
    flags_->request(core::defaultWindowStart(documentAnalysisSettings(document_), to), to, toStdString(group_));
}

void RankTimelineView::fillFlagMarks()
{
    if (!flagMarks_) return;
    const std::optional<core::Day> day = selection_->day();
    const int k = day && !timeline_.checkpoints.empty() ? nearestCheckpoint(keyOf(*day)) : -1;
    QVector<double> keys, values;
    int ranked = 0;
    if (k >= 0) {
        for (const Line& line : lines_) {
            const int p = line.pointAt[static_cast<size_t>(k)];
            if (p < 0 || !line.graph->visible()) continue;
            const core::RankTimelineFemale& f = timeline_.females[static_cast<size_t>(line.female)];
            const std::optional<double> v = valueOf(f.points[static_cast<size_t>(p)]);
            if (!v) continue;
            ++ranked;
            if (!flags_->flagged(f.animal)) continue;
            keys << keyOf(f.points[static_cast<size_t>(p)].day);
            values << *v;
        }
    }
    flagMarks_->setData(keys, values);
    if (keys.isEmpty()) flagMarks_->removeFromLegend();
    else flagMarks_->addToLegend();
    if (k < 0 || ranked == 0) {
        flagLegend_->clear();
        return;
    }
    const core::Day to = timeline_.checkpoints[static_cast<size_t>(k)];
    const std::optional<core::Day> from = core::defaultWindowStart(documentAnalysisSettings(document_), to);
    const QString window = from ? tr("from %1 to %2").arg(formatDay(*from), formatDay(to)) : tr("up to %1").arg(formatDay(to));
    flagLegend_->setText(tr("%1 On %2, %3 of %4 females shown have fewer than %5 encounters %6: ringed, their ranks "
                            "are not stable; hover the point at that date for its encounters and randomised-Elo "
                            "interval width%7.")
                             .arg(RankFlagWatch::mark(), formatDay(to))
                             .arg(keys.size())
                             .arg(ranked)
                             .arg(flags_->threshold())
                             .arg(window)
                             .arg(flags_->widthsReady() ? QString() : tr(" (widths being computed)")));
}

void RankTimelineView::fillChangeMarks()
{
    if (!colourChanges_) return;
    // The selected female's changes when one is selected, else every shown line's.
    const QString selected = selection_->animal();
    const bool any = lineIndexOf(selected) >= 0;
    std::map<ChangeKind, std::pair<QVector<double>, QVector<double>>> marks;
    std::vector<bool> shown(timeline_.females.size(), false);
    for (const Line& line : lines_) {
        const auto& f = timeline_.females[static_cast<size_t>(line.female)];
        shown[static_cast<size_t>(line.female)] = line.graph->visible() && (!any || toQString(f.animal) == selected);
    }
    for (const core::TimelineRankChange& c : rankChanges_) {
        if (c.change.total == 0 || !shown[static_cast<size_t>(c.female)]) continue;
        const core::RankTimelinePoint& pt =
            timeline_.females[static_cast<size_t>(c.female)].points[static_cast<size_t>(c.point)];
        const std::optional<double> v = valueOf(pt);
        if (!v) continue;
        auto& m = marks[kindOf(c.change)];
        m.first << keyOf(pt.day);
        m.second << *v;
    }
    for (auto& [kind, graph] : changes_) graph->setData(marks[kind].first, marks[kind].second);
}

void RankTimelineView::applySelection()
{
    const QString selected = selection_->animal();
    const bool any = lineIndexOf(selected) >= 0;
    for (const Line& line : lines_) {
        const core::RankTimelineFemale& f = timeline_.females[static_cast<size_t>(line.female)];
        const bool me = toQString(f.animal) == selected;
        QPen pen = palette_.pen(f.matriarch, me ? 3.5 : 1);
        if (any && !me) {
            QColor c = pen.color();
            c.setAlpha(70);
            pen.setColor(c);
        }
        line.graph->setPen(pen);
        if (line.marks) line.marks->setVisible(marksShown(line));
        // The selected line is drawn on a layer of its own, above the others.
        line.graph->setLayer(me ? QStringLiteral("selected") : QStringLiteral("main"));
    }
    fillChangeMarks();
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

void RankTimelineView::showDay(core::Day day)
{
    if (timeline_.checkpoints.empty()) {
        dateLabel_->clear();
        return;
    }
    const int k = nearestCheckpoint(keyOf(day));
    {
        const QSignalBlocker block(slider_);
        slider_->setValue(k);
    }
    dateLabel_->setText(formatDay(day));
    requestFlags();
    if (dayLine_) {
        dayLine_->point1->setCoords(keyOf(day), 0);
        dayLine_->point2->setCoords(keyOf(day), 1);
        dayLine_->setVisible(true);
    }
    if (ageClass_ != AgeClass::All) applyFilters();
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

int RankTimelineView::nearestCheckpoint(double key) const
{
    const auto& c = timeline_.checkpoints;
    if (c.empty()) return -1;
    const auto day = static_cast<core::Day>(std::lround(key / 86400.0));
    const auto it = std::lower_bound(c.begin(), c.end(), day);
    if (it == c.begin()) return 0;
    if (it == c.end()) return static_cast<int>(c.size()) - 1;
    const auto k = static_cast<int>(it - c.begin());
    return (*it - day) < (day - *(it - 1)) ? k : k - 1;
}

int RankTimelineView::lineIndexOf(const QString& id) const
{
    if (id.isEmpty()) return -1;
    const int f = timeline_.find(toStdString(id));
    if (f < 0) return -1;
    for (size_t i = 0; i < lines_.size(); ++i)
        if (lines_[i].female == f) return static_cast<int>(i);
    return -1;
}

void RankTimelineView::setScale(Scale scale)
{
    if (scale == scale_) return;
    scale_ = scale;
    const QSignalBlocker block(scaleBox_);
    scaleBox_->setCurrentIndex(scale == Scale::Rank ? 0 : 1);
    rebuildPlot();
    if (selection_->day()) showDay(*selection_->day());
}

void RankTimelineView::setStep(core::TimelineStep step)
{
    if (step == step_) return;
    step_ = step;
    const QSignalBlocker block(stepBox_);
    stepBox_->setCurrentIndex(step == core::TimelineStep::Month ? 0 : 1);
    recompute();
}

void RankTimelineView::setMatriline(const QString& matriarch)
{
    matriline_ = matriarch;
    const QSignalBlocker block(lineBox_);
    lineBox_->setCurrentIndex(std::max(lineBox_->findData(matriarch), 0));
    applyFilters();
}

void RankTimelineView::setGroup(const QString& group)
{
    if (group == group_) return;
    group_ = group;
    const QSignalBlocker block(groupBox_);
    groupBox_->setCurrentIndex(std::max(groupBox_->findData(group), 0));
    recompute();
}

void RankTimelineView::setMarks(Marks marks)
{
    marks_ = marks;
    const QSignalBlocker block(marksBox_);
    marksBox_->setCurrentIndex(static_cast<int>(marks));
    applySelection();
}

bool RankTimelineView::marksShown(const Line& line) const
{
    if (!line.marks || !line.graph->visible() || marks_ == Marks::None) return false;
    return marks_ == Marks::All ||
           toQString(timeline_.females[static_cast<size_t>(line.female)].animal) == selection_->animal();
}

void RankTimelineView::setChangeColouring(bool on)
{
    const QSignalBlocker block(changeBox_);
    changeBox_->setCurrentIndex(on ? 1 : 0);
    if (on == colourChanges_) return;
    colourChanges_ = on;
    rebuildPlot();
}

QCPGraph* RankTimelineView::changesOf(ChangeKind kind) const
{
    const auto it = changes_.find(kind);
    return it == changes_.end() ? nullptr : it->second;
}

RankTimelineView::ChangeKind RankTimelineView::kindOf(const core::RankChange& c)
{
    if (c.active != 0 && c.passive != 0) return ChangeKind::Both;
    return c.active != 0 ? ChangeKind::Active : ChangeKind::Passive;
}

void RankTimelineView::setAgeClass(AgeClass ageClass)
{
    ageClass_ = ageClass;
    const QSignalBlocker block(ageBox_);
    ageBox_->setCurrentIndex(static_cast<int>(ageClass));
    applyFilters();
}

int RankTimelineView::visibleLineCount() const
{
    return static_cast<int>(std::count_if(lines_.begin(), lines_.end(), [](const Line& l) { return l.graph->visible(); }));
}

QCPGraph* RankTimelineView::lineOf(const QString& id) const
{
    const int i = lineIndexOf(id);
    return i < 0 ? nullptr : lines_[static_cast<size_t>(i)].graph;
}

QCPGraph* RankTimelineView::discordanceOf(const QString& id) const
{
    const int i = lineIndexOf(id);
    return i < 0 ? nullptr : lines_[static_cast<size_t>(i)].marks;
}

QCPGraph* RankTimelineView::eventsOf(core::LifeEventKind kind) const
{
    const auto it = events_.find(kind);
    return it == events_.end() ? nullptr : it->second;
}

QString RankTimelineView::describe(const QString& id, core::Day day) const
{
    const int i = lineIndexOf(id);
    const int k = nearestCheckpoint(keyOf(day));
    if (i < 0 || k < 0) return {};
    const Line& line = lines_[static_cast<size_t>(i)];
    const int p = line.pointAt[static_cast<size_t>(k)];
    if (p < 0) return {};
    const core::RankTimelineFemale& f = timeline_.females[static_cast<size_t>(line.female)];
    const core::RankTimelinePoint& pt = f.points[static_cast<size_t>(p)];
    const int m = timeline_.find(f.matriarch);
    const QString lineName = m >= 0 && !timeline_.females[static_cast<size_t>(m)].name.empty()
                                 ? toQString(timeline_.females[static_cast<size_t>(m)].name)
                                 : toQString(f.matriarch);
    QStringList text;
    text << (f.name.empty() ? toQString(f.animal) : tr("%1 (%2)").arg(toQString(f.name), toQString(f.animal)));
    text << tr("Date: %1").arg(formatDay(pt.day));
    text << tr("Rank: %1").arg(pt.rank ? QString::number(*pt.rank) : tr("none (no rating yet)"));
    text << tr("Predicted rank: %1").arg(pt.predictedRank);
    if (pt.elo) text << tr("Elo rating: %1").arg(*pt.elo, 0, 'f', 0);
    text << tr("Matriline: %1").arg(lineName);
    if (pt.discordant()) text << tr("Discordant dyads: %1").arg(pt.discordantDyads);
    // The flag is for the window ending at the selected date.
    const std::optional<core::Day> selected = selection_->day();
    if (selected && nearestCheckpoint(keyOf(*selected)) == k) text << flags_->describe(f.animal);
    return text.join(QLatin1Char('\n'));
}

void RankTimelineView::hover(QMouseEvent* event)
{
    const int k = nearestCheckpoint(plot_->xAxis->pixelToCoord(event->pos().x()));
    if (k < 0 || (event->buttons() & Qt::LeftButton)) return;
    const double x = plot_->xAxis->coordToPixel(keyOf(timeline_.checkpoints[static_cast<size_t>(k)]));
    int best = -1;
    double bestDistance = hoverPixels;
    for (size_t i = 0; i < lines_.size(); ++i) {
        const Line& line = lines_[i];
        const int p = line.pointAt[static_cast<size_t>(k)];
        if (p < 0 || !line.graph->visible()) continue;
        const std::optional<double> v = valueOf(timeline_.females[static_cast<size_t>(line.female)].points[static_cast<size_t>(p)]);
        if (!v) continue;
        const double d = QLineF(QPointF(x, plot_->yAxis->coordToPixel(*v)), event->position()).length();
        if (d < bestDistance) {
            bestDistance = d;
            best = static_cast<int>(i);
        }
    }
    if (best < 0) {
        QToolTip::hideText();
        return;
    }
    const core::RankTimelineFemale& f = timeline_.females[static_cast<size_t>(lines_[static_cast<size_t>(best)].female)];
    QToolTip::showText(event->globalPosition().toPoint(),
                       describe(toQString(f.animal), timeline_.checkpoints[static_cast<size_t>(k)]), plot_);
}

void RankTimelineView::click(QMouseEvent* event)
{
    if ((event->pos() - pressedAt_).manhattanLength() > 3) return; // a drag, not a click
    const int k = nearestCheckpoint(plot_->xAxis->pixelToCoord(event->pos().x()));
    if (k < 0) return;
    const double x = plot_->xAxis->coordToPixel(keyOf(timeline_.checkpoints[static_cast<size_t>(k)]));
    QString hit;
    double bestDistance = hoverPixels;
    for (const Line& line : lines_) {
        const int p = line.pointAt[static_cast<size_t>(k)];
        if (p < 0 || !line.graph->visible()) continue;
        const core::RankTimelineFemale& f = timeline_.females[static_cast<size_t>(line.female)];
        const std::optional<double> v = valueOf(f.points[static_cast<size_t>(p)]);
        if (!v) continue;
        const double d = QLineF(QPointF(x, plot_->yAxis->coordToPixel(*v)), event->position()).length();
        if (d < bestDistance) {
            bestDistance = d;
            hit = toQString(f.animal);
        }
    }
    if (!hit.isEmpty()) selection_->setAnimal(hit);
    selection_->setDay(timeline_.checkpoints[static_cast<size_t>(k)]);
}

} // namespace hierloom::ui
