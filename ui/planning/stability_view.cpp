// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/stability_view.h"

#include "core/pedigree/matriline.h"
#include "core/store/stability_settings.h"
#include "ui/widgets/caution_label.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/help_button.h"
#include "ui/widgets/plot_export.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/qt_convert.h"
#include "ui/planning/stability_thresholds_dialog.h"
#include "ui/document/document_queries.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QSplitter>
#include <QTreeWidget>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <set>

namespace hierloom::ui {

namespace {
constexpr double secondsPerDay = 86400.0;
const QColor kCounter(0x00, 0x72, 0xB2), kSevere(0xD5, 0x5E, 0x00), kRank(0x00, 0x9E, 0x73), kAlert(0xCC, 0x00, 0x00);

double midpoint(const core::CalendarPeriod& p) { return (p.start + p.end + 1) / 2.0 * secondsPerDay; }

QString signalName(core::StabilitySignal s)
{
    switch (s) {
    case core::StabilitySignal::CounterDominance: return StabilityView::tr("Counter-dominance");
    case core::StabilitySignal::RankChanges: return StabilityView::tr("Rank changes");
    case core::StabilitySignal::SevereAggression: return StabilityView::tr("Severe aggression");
    }
    return {};
}
} // namespace

core::StabilityOptions documentStabilityOptions(const ColonyDocument* document, const std::string& group,
                                                core::PeriodLength length)
{
    core::StabilityOptions o;
    o.group = group;
    o.length = length;
    o.elo = documentAnalysisSettings(document).elo;
    if (const core::ColonyStore* store = document->store()) {
        o.thresholds = core::readStabilityThresholds(*store);
        o.severity = core::behaviourSeverities(*store);
    }
    return o;
}

core::StabilitySeries documentStability(const ColonyDocument* document, const std::string& group, core::PeriodLength length)
{
    const core::Matrilines lines(document->pedigree());
    return core::stabilityWatch(document->encounters().compact(), document->pedigree().animals, document->residences(),
                                lines, documentStabilityOptions(document, group, length));
}

StabilityView::StabilityView(ColonyEditFacade* facade, QWidget* parent)
    : QWidget(parent),
      facade_(facade),
      document_(facade->document()),
      group_(new QComboBox(this)),
      length_(new QComboBox(this)),
      thresholdsButton_(new QPushButton(tr("Thresholds..."), this)),
      banner_(new QLabel(this)),
      plot_(new QCustomPlot(this)),
      alerts_(new QTreeWidget(this)),
      evidence_(new QPlainTextEdit(this))
{
    setObjectName(QStringLiteral("stability"));
    length_->addItem(tr("Weeks"), static_cast<int>(core::PeriodLength::Week));
    length_->addItem(tr("Months"), static_cast<int>(core::PeriodLength::Month));
    length_->setCurrentIndex(1);
    auto* controls = new QHBoxLayout;
    controls->addWidget(new QLabel(tr("Group:"), this));
    controls->addWidget(group_);
    controls->addWidget(new QLabel(tr("Per:"), this));
    controls->addWidget(length_);
    for (const char* key : {"counter_dominance", "severe_aggression", "rank_changes"})
        controls->addWidget(new HelpButton(QString::fromLatin1(key), this));
    controls->addStretch();
    controls->addWidget(thresholdsButton_);
    PlotFigure figure;
    figure.plot = plot_;
    figure.baseName = QStringLiteral("stability");
    figure.title = tr("Stability watch");
    figure.singleHeightMm = 100;
    figure.doubleHeightMm = 120;
    figure.caption = [this] {
        std::optional<core::Day> from, to;
        if (!series_.periods.empty()) {
            from = series_.periods.front().period.start;
            to = series_.periods.back().period.end;
        }
        const core::StabilityOptions o = documentStabilityOptions(document_, {}, core::PeriodLength::Month);
        return caption::join({caption::group(group_->currentText()), caption::window(from, to),
                              length_->currentText().toLower(), caption::elo(o.elo),
                              tr("severe: behaviour severity %1 or more; dashed: alert thresholds")
                                  .arg(o.thresholds.severeAtLeast)});
    };
    controls->addWidget(makeExportButton(figure, this));
    banner_->setObjectName(QStringLiteral("stabilityBanner"));
    banner_->setWordWrap(true);
    banner_->setStyleSheet(QStringLiteral("QLabel { background: #fde2dc; color: #7a0000; border: 1px solid #cc0000;"
                                          " border-radius: 3px; padding: 4px 6px; font-weight: bold; }"));
    banner_->hide();

    alerts_->setHeaderLabels({tr("Period"), tr("Signal"), tr("Value"), tr("Evidence")});
    alerts_->setRootIsDecorated(false);
    alerts_->setAlternatingRowColors(true);
    alerts_->header()->setSectionResizeMode(3, QHeaderView::Stretch);
    evidence_->setReadOnly(true);
    evidence_->setPlaceholderText(tr("Choose an alert to see its evidence: the dyads and dates behind it."));
    auto* lower = new QSplitter(Qt::Horizontal, this);
    lower->addWidget(alerts_);
    lower->addWidget(evidence_);
    lower->setStretchFactor(0, 3);
    lower->setStretchFactor(1, 2);
    auto* split = new QSplitter(Qt::Vertical, this);
    split->addWidget(plot_);
    split->addWidget(lower);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 2);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(banner_);
    auto* key = new QLabel(tr("Severe rate, times the median: severe encounters per animal-day in the period divided by "
                              "the median of that rate over the group's periods of the same length (1 = a usual "
                              "period). Dashed lines: alert thresholds; red dots: periods that raised an alert; "
                              "periods without encounters are left empty."),
                           this);
    key->setObjectName(QStringLiteral("stabilityKey"));
    key->setWordWrap(true);
    layout->addWidget(split, 1);
    layout->addWidget(key);
    layout->addWidget(makeCautionLabel(this));

    // Three stacked panels sharing the date axis.
    plot_->plotLayout()->clear();
    auto* margins = new QCPMarginGroup(plot_);
    auto ticker = QSharedPointer<QCPAxisTickerDateTime>::create();
    ticker->setDateTimeSpec(Qt::UTC);
    ticker->setDateTimeFormat(QStringLiteral("MMM\nyyyy"));
    const QString labels[] = {tr("Counter-\ndominance\nshare"), tr("Severe rate,\ntimes the\nmedian"),
                              tr("Mean rank\nchange per\nanimal")};
    for (int p = 0; p < 3; ++p) {
        auto* rect = new QCPAxisRect(plot_);
        plot_->plotLayout()->addElement(p, 0, rect);
        rect->setMarginGroup(QCP::msLeft | QCP::msRight, margins);
        rect->axis(QCPAxis::atLeft)->setLabel(labels[p]);
        rect->axis(QCPAxis::atBottom)->setTicker(ticker);
        rect->axis(QCPAxis::atBottom)->setTickLabels(p == 2);
        rect->setRangeDrag(Qt::Horizontal);
        rect->setRangeZoom(Qt::Horizontal);
    }
    plot_->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);

    connect(group_, &QComboBox::currentTextChanged, this, &StabilityView::recompute);
    connect(length_, &QComboBox::currentIndexChanged, this, &StabilityView::recompute);
    connect(thresholdsButton_, &QPushButton::clicked, this, &StabilityView::editThresholds);
    connect(alerts_, &QTreeWidget::currentItemChanged, this, &StabilityView::showEvidence);
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] {
        refreshGroups();
        recompute();
    });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    refreshGroups();
    recompute();
}

void StabilityView::setGroup(const QString& group) { group_->setCurrentText(group); }

void StabilityView::setPeriodLength(core::PeriodLength length)
{
    length_->setCurrentIndex(length_->findData(static_cast<int>(length)));
}

void StabilityView::refreshGroups()
{
    const QString current = group_->currentText();
    const QSignalBlocker block(group_);
    group_->clear();
    group_->addItems(groupsWithEncounters(document_));
    if (group_->findText(current) >= 0) group_->setCurrentText(current);
}

void StabilityView::editThresholds()
{
    const core::ColonyStore* store = document_->store();
    if (!store) return;
    StabilityThresholdsDialog dialog(core::readStabilityThresholds(*store), this);
    if (document_->isReadOnly()) dialog.setWindowTitle(tr("Stability Thresholds (read-only colony: not saved)"));
    if (dialog.exec() == QDialog::Accepted && !document_->isReadOnly()) applyThresholds(dialog.thresholds());
}

void StabilityView::applyThresholds(const core::StabilityThresholds& thresholds)
{
    if (!document_->isOpen() || document_->isReadOnly()) return;
    facade_->setStabilityThresholds(thresholds);
}

void StabilityView::recompute()
{
    thresholdsButton_->setEnabled(document_->isOpen());
    thresholdsButton_->setToolTip(document_->isReadOnly() ? tr("The colony is open read-only: thresholds cannot be saved")
                                                          : QString());
    const auto length = static_cast<core::PeriodLength>(length_->currentData().toInt());
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_->currentText())) return;
    series_ = document_->isOpen() && !group_->currentText().isEmpty()
                  ? documentStability(document_, toStdString(group_->currentText()), length)
                  : core::StabilitySeries{};

    const QStringList names = {tr("counter-dominance share"), tr("severe per animal-day / median"),
                               tr("rank change per animal")};
    const QColor colours[] = {kCounter, kSevere, kRank};
    const auto& t = [this] {
        const core::ColonyStore* store = document_->store();
        return store ? core::readStabilityThresholds(*store) : core::StabilityThresholds{};
    }();
    const double median = series_.medianSevereRate.value_or(0);
    std::set<std::pair<size_t, int>> alerted;
    for (const core::StabilityAlert& a : series_.alerts) alerted.insert({a.period, static_cast<int>(a.signal)});
    double lo = 0, hi = 1;
    for (int p = 0; p < 3; ++p) {
        QCPAxisRect* rect = plot_->axisRect(p);
        for (QCPGraph* g : rect->graphs()) plot_->removeGraph(g);
        auto* line = plot_->addGraph(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
        line->setName(names[p]);
        line->setPen(QPen(colours[p], 1.5));
        auto* marks = plot_->addGraph(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
        marks->setLineStyle(QCPGraph::lsNone);
        marks->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, kAlert, kAlert, 7));
        auto* threshold = plot_->addGraph(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
        threshold->setPen(QPen(colours[p], 1, Qt::DashLine));
        const core::StabilitySignal signal = p == 0 ? core::StabilitySignal::CounterDominance
                                             : p == 1 ? core::StabilitySignal::SevereAggression
                                                      : core::StabilitySignal::RankChanges;
        double top = 0;
        for (size_t i = 0; i < series_.periods.size(); ++i) {
            const core::StabilityPeriod& sp = series_.periods[i];
            std::optional<double> v = p == 0 ? sp.counterShare
                                      : p == 1 ? (sp.severePerAnimalDay && median > 0
                                                      ? std::optional<double>(*sp.severePerAnimalDay / median)
                                                      : std::nullopt)
                                               : sp.rankChangePerAnimal;
            const double x = midpoint(sp.period);
            // A period without encounters is a gap, never a zero.
            if (sp.encounters == 0) v.reset();
            line->addData(x, v ? *v : qQNaN());
            if (v) top = std::max(top, *v);
            if (v && alerted.count({i, static_cast<int>(signal)})) marks->addData(x, *v);
        }
        const double limit = p == 0 ? t.counterShare : p == 1 ? t.severeFactor : t.rankChangePerAnimal;
        if (!series_.periods.empty() && limit > 0) {
            threshold->addData(series_.periods.front().period.start * secondsPerDay, limit);
            threshold->addData((series_.periods.back().period.end + 1) * secondsPerDay, limit);
            top = std::max(top, limit);
        }
        rect->axis(QCPAxis::atLeft)->setRange(0, top > 0 ? top * 1.1 : 1);
        if (!series_.periods.empty()) {
            lo = series_.periods.front().period.start * secondsPerDay;
            hi = (series_.periods.back().period.end + 1) * secondsPerDay;
        }
        rect->axis(QCPAxis::atBottom)->setRange(lo, hi);
    }
    plot_->replot();

    alerts_->clear();
    for (size_t k = series_.alerts.size(); k-- > 0;) { // newest first
        const core::StabilityAlert& a = series_.alerts[k];
        const core::StabilityPeriod& sp = series_.periods[a.period];
        const QString text = toQString(core::describeAlert(series_, a));
        auto* item = new QTreeWidgetItem(alerts_, {formatDay(sp.period.start) + QStringLiteral(" - ") + formatDay(sp.period.end),
                                                   signalName(a.signal), QString::number(a.value, 'g', 3), text});
        item->setToolTip(3, text);
        item->setData(0, Qt::UserRole, static_cast<qulonglong>(k));
    }
    for (int c = 0; c < 3; ++c) alerts_->resizeColumnToContents(c);

    const auto latest = series_.latestAlerts();
    if (latest.empty()) {
        banner_->hide();
    } else {
        QStringList what;
        for (const core::StabilityAlert& a : latest) what << signalName(a.signal).toLower();
        const core::StabilityPeriod& sp = series_.periods.back();
        banner_->setText(tr("Stability alert for %1 in the latest period (%2 - %3): %4. See the evidence below.")
                             .arg(group_->currentText(), formatDay(sp.period.start), formatDay(sp.period.end),
                                  what.join(tr(", "))));
        banner_->show();
    }
    evidence_->clear();
    // The newest alert's evidence at once.
    if (alerts_->topLevelItemCount() > 0) alerts_->setCurrentItem(alerts_->topLevelItem(0));
}

void StabilityView::showEvidence()
{
    QTreeWidgetItem* item = alerts_->currentItem();
    if (!item) {
        evidence_->clear();
        return;
    }
    const auto k = static_cast<size_t>(item->data(0, Qt::UserRole).toULongLong());
    if (k >= series_.alerts.size()) return;
    const core::StabilityAlert& a = series_.alerts[k];
    const core::StabilityPeriod& sp = series_.periods[a.period];
    QStringList lines{toQString(core::describeAlert(series_, a)), QString()};
    if (a.signal == core::StabilitySignal::SevereAggression) {
        lines << tr("Severe encounters (date, winner, loser, behaviour):");
        for (const core::SevereEncounter& e : sp.severeEncounters)
            lines << QStringLiteral("  %1  %2 > %3  %4").arg(formatDay(e.date), toQString(e.winner), toQString(e.loser),
                                                            toQString(e.behaviour));
    } else {
        lines << tr("Counter-dominant dyads (winner below loser before the encounter; matrilines; dates):");
        for (const core::CounterDominantDyad& d : sp.dyads) {
            QStringList dates;
            for (core::Day day : d.dates) dates << formatDay(day);
            lines << QStringLiteral("  %1 (%2) over %3 (%4): %5x on %6")
                         .arg(toQString(d.winner), toQString(d.winnerLine), toQString(d.loser), toQString(d.loserLine))
                         .arg(d.count)
                         .arg(dates.join(QStringLiteral(", ")));
        }
    }
    evidence_->setPlainText(lines.join(QLatin1Char('\n')));
}

} // namespace hierloom::ui
