// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/prediction_view.h"

#include "ui/analysis/rank_flag_watch.h"

#include "ui/document/animal_selection.h"
#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/help_button.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/compute_runner.h"
#include "core/base/display_names.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/plot_clearing.h"
#include "ui/widgets/plot_export.h"
#include "ui/widgets/progress_strip.h"
#include "ui/document/qt_convert.h"

#include <QComboBox>
#include <QDateEdit>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QSplitter>
#include <QCoreApplication>
#include <QTableWidget>
#include <QVBoxLayout>

#include <cmath>
#include <iterator>

#include <qcustomplot.h>

#include <algorithm>

namespace hierloom::ui {

namespace {
QString categoryText(core::DiscordanceCategory c)
{
    // One vocabulary with the report and the command line's help (core/base/display_names.h).
    return QCoreApplication::translate("hierloom::core::DisplayName",
                                       core::displayName(core::CodeKind::Category, core::toString(c)).c_str());
}
} // namespace

PredictionView::PredictionView(ColonyDocument* document, AnimalSelection* selection, QWidget* parent)
    : QWidget(parent),
      document_(document),
      selection_(selection),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the prediction"), this)),
      plot_(new QCustomPlot(this)),
      dyads_(new QTableWidget(0, 3, this)),
      ruleBox_(new QComboBox(this)),
      dateEdit_(new QDateEdit(this)),
      summaryLabel_(new QLabel(this)),
      flagLegend_(new QLabel(this)),
      flags_(new RankFlagWatch(document, this)),
      foresightLabel_(new QLabel(this)),
      foresightTable_(new QTableWidget(0, 5, this)),
      foresightPlot_(new QCustomPlot(this))
{
    ruleBox_->setObjectName(QStringLiteral("rule"));
    ruleBox_->addItems({tr("Youngest ascendancy"), tr("Eldest first")});
    dateEdit_->setCalendarPopup(true);
    dateEdit_->setDisplayFormat(QStringLiteral("yyyy-MM-dd"));
    auto* controls = new QHBoxLayout;
    controls->addWidget(new QLabel(tr("Date:"), this));
    controls->addWidget(dateEdit_);
    controls->addWidget(new QLabel(tr("Rule:"), this));
    controls->addWidget(ruleBox_);
    for (const char* key : {"conformity", "tau_b", "discordant_dyads"})
        controls->addWidget(new HelpButton(QString::fromLatin1(key), this));
    controls->addStretch();
    PlotFigure figure;
    figure.plot = plot_;
    figure.baseName = QStringLiteral("predicted-vs-observed");
    figure.title = tr("Predicted and observed order of the females");
    // One printed line (about 3.6 mm) per ranked female, plus title, axis and caption.
    figure.height = [this](bool doubleColumn) {
        return std::max(doubleColumn ? 110.0 : 90.0, 45.0 + 3.6 * static_cast<double>(prediction_.females.size()));
    };
    figure.caption = [this] {
        const core::AnalysisSettings settings = documentAnalysisSettings(document_);
        return caption::join({tr("on %1").arg(formatDay(prediction_.at)),
                              tr("rule: %1").arg(ruleBox_->currentText().toLower()),
                              tr("observed: %1").arg(caption::elo(settings.elo)),
                              tr("females from %1 years").arg(settings.maturityYears)});
    };
    controls->addWidget(makeExportButton(figure, this));

    dyads_->setHorizontalHeaderLabels({tr("Observed above"), tr("Observed below"), tr("Category")});
    dyads_->horizontalHeader()->setStretchLastSection(true);
    dyads_->verticalHeader()->hide();
    dyads_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    dyads_->setSelectionBehavior(QAbstractItemView::SelectRows);
    auto* side = new QWidget(this);
    auto* sideLayout = new QVBoxLayout(side);
    sideLayout->setContentsMargins(0, 0, 0, 0);
    sideLayout->addWidget(summaryLabel_);
    sideLayout->addWidget(flagLegend_);
    flagLegend_->setObjectName(QStringLiteral("predictionFlagLegend"));
    flagLegend_->setWordWrap(true);
    connect(flags_, &RankFlagWatch::updated, this, [this] {
        flagLegend_->setText(prediction_.females.empty() ? QString() : flags_->legend());
        rebuildPlot();
    });
    sideLayout->addWidget(dyads_, 1);
    summaryLabel_->setWordWrap(true);
    // How much the rule explains: each model's foresight of the record's encounters.
    auto* foresightHeader = new QHBoxLayout;
    auto* foresightTitle = new QLabel(tr("<b>How much does inheritance explain?</b>"), this);
    foresightHeader->addWidget(foresightTitle);
    foresightHeader->addWidget(new HelpButton(QStringLiteral("foresight"), this));
    foresightHeader->addStretch();
    PlotFigure foresightFigure;
    foresightFigure.plot = foresightPlot_;
    foresightFigure.baseName = QStringLiteral("foresight");
    foresightFigure.title = tr("How much does inheritance explain: foresight of each model per year");
    foresightFigure.caption = [] {
        return tr("Whole record, every group; rule alone, plain Elo and rule-informed Elo (docs: Foresight)");
    };
    foresightHeader->addWidget(makeExportButton(foresightFigure, this));
    sideLayout->addLayout(foresightHeader);
    foresightLabel_->setWordWrap(true);
    sideLayout->addWidget(foresightLabel_);
    foresightTable_->setObjectName(QStringLiteral("foresight"));
    foresightTable_->setHorizontalHeaderLabels(
        {tr("Model"), tr("Log-lik."), tr("Per enc."), tr("Brier"), tr("Pred.")});
    const QString headerTips[] = {tr("The model"), tr("Log-likelihood: the sum of ln p over the winners (higher is better)"),
                                  tr("Log-likelihood per encounter (a coin: -0.693)"),
                                  tr("Brier score: the mean of (1 - p) squared (lower is better; a coin: 0.25)"),
                                  tr("Share of winners given more than 1/2")};
    for (int c = 0; c < 5; ++c) foresightTable_->horizontalHeaderItem(c)->setToolTip(headerTips[c]);
    foresightTable_->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    foresightTable_->horizontalHeader()->setSectionResizeMode(0, QHeaderView::ResizeToContents);
    foresightTable_->verticalHeader()->hide();
    foresightTable_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    foresightTable_->setSelectionBehavior(QAbstractItemView::SelectRows);
    foresightTable_->setMaximumHeight(130);
    sideLayout->addWidget(foresightTable_);
    foresightPlot_->setMinimumHeight(170);
    foresightPlot_->yAxis->setLabel(tr("Winners predicted"));
    foresightPlot_->yAxis->setRange(0, 1);
    foresightPlot_->xAxis->setLabel(tr("Year"));
    // The legend in a row of its own under the plot, so it hides no line.
    auto* foresightLegend = new QCPLayoutGrid;
    foresightPlot_->plotLayout()->addElement(1, 0, foresightLegend);
    foresightPlot_->plotLayout()->setRowStretchFactor(1, 0.001);
    foresightLegend->addElement(0, 0, foresightPlot_->legend);
    foresightPlot_->legend->setFillOrder(QCPLegend::foColumnsFirst);
    foresightPlot_->legend->setVisible(true);
    QFont small = font();
    small.setPointSizeF(small.pointSizeF() * 0.8);
    foresightPlot_->legend->setFont(small);
    wrapLegendToPlotWidth(foresightPlot_);
    foresightPlot_->setMinimumWidth(250);
    sideLayout->addWidget(foresightPlot_, 1);
    auto* split = new QSplitter(Qt::Horizontal, this);
    split->addWidget(plot_);
    split->addWidget(side);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 2);
    split->setSizes({900, 560});
    split->setChildrenCollapsible(false);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(progress_); // a row of its own while computing: the controls keep their width
    layout->addWidget(split, 1);

    plot_->yAxis->setRangeReversed(true);
    plot_->yAxis->setLabel(tr("Rank (1 = top)"));
    plot_->xAxis->setRange(-0.75, 1.75);
    auto ticker = QSharedPointer<QCPAxisTickerText>::create();
    ticker->addTick(0, tr("Predicted"));
    ticker->addTick(1, tr("Observed (Elo)"));
    plot_->xAxis->setTicker(ticker);
    plot_->xAxis->grid()->setVisible(false);
    plot_->yAxis->grid()->setVisible(false);
    auto* legendRow = new QCPLayoutGrid;
    plot_->plotLayout()->addElement(1, 0, legendRow);
    plot_->plotLayout()->setRowStretchFactor(1, 0.001);
    legendRow->addElement(0, 0, plot_->legend);
    plot_->legend->setFillOrder(QCPLegend::foColumnsFirst);
    plot_->legend->setVisible(true);
    // The legend (a key per matriline) wraps to the plot's width; it used to hold the plot at 859 px or more.
    wrapLegendToPlotWidth(plot_);
    plot_->setMinimumWidth(300);

    connect(ruleBox_, &QComboBox::currentIndexChanged, this,
            [this](int i) { setRule(i == 0 ? core::SiblingRule::Youngest : core::SiblingRule::Eldest); });
    connect(dateEdit_, &QDateEdit::dateChanged, this, [this](const QDate& d) { selection_->setDay(toDay(d)); });
    connect(dyads_, &QTableWidget::cellClicked, this, [this](int row, int column) {
        if (QTableWidgetItem* item = dyads_->item(row, column == 1 ? 1 : 0))
            selection_->setAnimal(item->data(Qt::UserRole).toString());
    });
    connect(progress_, &ProgressStrip::retry, this, &PredictionView::recompute);
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] { recompute(); });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    // The timeline's date slider moves the day too: a hidden tab catches up when shown.
    connect(selection_, &AnimalSelection::dayChanged, refresh, &VisibleRefresh::request);
    connect(selection_, &AnimalSelection::animalChanged, this, &PredictionView::rebuildPlot);
    recompute();
}

PredictionView::~PredictionView() = default;

void PredictionView::showEvent(QShowEvent* event)
{
    document_->readEverything();
    QWidget::showEvent(event);
}

void PredictionView::setRule(core::SiblingRule rule)
{
    if (rule == rule_) return;
    rule_ = rule;
    const QSignalBlocker block(ruleBox_);
    ruleBox_->setCurrentIndex(rule == core::SiblingRule::Youngest ? 0 : 1);
    recompute();
}

void PredictionView::recompute()
{
    if (!document_->isOpen() || document_->encounters().empty()) {
        runner_->cancel();
        flags_->clear();
        adopt({}, {}, {}, {});
        adoptForesight({});
        return;
    }
    core::InheritanceOptions options;
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    options.elo = settings.elo;
    options.maturityYears = settings.maturityYears;
    options.rule = rule_;
    if (selection_->day()) options.at = *selection_->day();
    else options.at = document_->lastEncounterDay();
    {
        const QSignalBlocker block(dateEdit_);
        dateEdit_->setDate(toQDate(*options.at));
    }
    flags_->request(core::defaultWindowStart(settings, *options.at), *options.at, options.group);
    core::ForesightOptions foresightOptions;
    foresightOptions.rule = rule_;
    foresightOptions.maturityYears = settings.maturityYears;
    foresightOptions.elo = settings.elo;
    core::SelectionOptions record;
    record.draws = settings.elo.draws;
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    runner_->start([this, snapshot = snapshot, options, foresightOptions, record](const std::atomic<bool>& cancel,
                                                                     const ComputeRunner::Progress& progress) mutable {
        // Every group (the prediction and the record's foresight span the
        // colony), read from the shared compact records without expanding them.
        const std::shared_ptr<const core::CompactEncounters> records = snapshot.takeScope({});
        // The animals with an index of this thread's own (the pedigree has no encounters).
        const auto colony = std::make_shared<core::Colony>(*snapshot.pedigree);
        colony->reindex();
        const core::ResidenceIndex* where = snapshot.residences.get();
        const core::Matrilines lines(*colony);
        progress(0, 3);
        auto p = std::make_shared<core::InheritancePrediction>(
            core::predictInheritance(*records, colony->animals, *where, lines, options));
        if (cancel) return ComputeRunner::Apply();
        progress(1, 3);
        auto s = std::make_shared<core::DiscordanceSummary>(core::summariseDiscordance(lines, *p));
        auto palette = std::make_shared<MatrilinePalette>(lines);
        auto names = std::make_shared<std::vector<std::string>>();
        auto lineNames = std::make_shared<std::map<std::string, std::string>>();
        for (const std::string& m : palette->matriarchs()) {
            const int a = colony->animalIndex(m);
            (*lineNames)[m] = a >= 0 && !colony->animals[static_cast<size_t>(a)].name.empty()
                                  ? colony->animals[static_cast<size_t>(a)].name
                                  : m;
        }
        for (const core::PredictedFemale& f : p->females) {
            const int a = colony->animalIndex(f.animal);
            names->push_back(a >= 0 && !colony->animals[static_cast<size_t>(a)].name.empty()
                                 ? colony->animals[static_cast<size_t>(a)].name
                                 : f.animal);
        }
        if (cancel) return ComputeRunner::Apply();
        progress(2, 3);
        auto f = std::make_shared<core::Foresight>(core::computeForesight(*records, *colony, *where, record, foresightOptions));
        progress(3, 3);
        return ComputeRunner::Apply([this, p, s, palette, names, lineNames, f] {
            lineNames_ = *lineNames;
            adopt(std::move(*p), std::move(*s), *palette, *names);
            adoptForesight(std::move(*f));
        });
    });
}

void PredictionView::adopt(core::InheritancePrediction prediction, core::DiscordanceSummary summary,
                           MatrilinePalette palette, std::vector<std::string> names)
{
    prediction_ = std::move(prediction);
    summary_ = std::move(summary);
    palette_ = std::move(palette);
    names_ = std::move(names);
    auto nameOf = [this](const std::string& id) {
        const int i = prediction_.find(id);
        return i >= 0 ? toQString(names_[static_cast<size_t>(i)]) : toQString(id);
    };
    dyads_->setRowCount(static_cast<int>(summary_.dyads.size()));
    for (int r = 0; r < dyads_->rowCount(); ++r) {
        const core::DiscordantDyad& d = summary_.dyads[static_cast<size_t>(r)];
        const std::string* ids[] = {&d.above, &d.below};
        for (int c = 0; c < 2; ++c) {
            auto* item = new QTableWidgetItem(tr("%1 (%2)").arg(nameOf(*ids[c]), toQString(*ids[c])));
            item->setData(Qt::UserRole, toQString(*ids[c]));
            dyads_->setItem(r, c, item);
        }
        dyads_->setItem(r, 2, new QTableWidgetItem(categoryText(d.category)));
    }
    dyads_->resizeColumnsToContents();
    if (prediction_.females.empty()) summaryLabel_->setText(tr("No ranked females on this date."));
    else
        summaryLabel_->setText(
            tr("%1 ranked females, %2 with an observed rank. Discordant dyads: %3 of %4 comparable; conformity %5, "
               "Kendall's tau-b %6.")
                .arg(summary_.ranked)
                .arg(summary_.observed)
                .arg(summary_.discordant)
                .arg(summary_.comparable)
                .arg(summary_.conformity ? QString::number(*summary_.conformity, 'f', 3) : tr("undefined"))
                .arg(summary_.tauB ? QString::number(*summary_.tauB, 'f', 3) : tr("undefined")));
    flagLegend_->setText(prediction_.females.empty() ? QString() : flags_->legend());
    rebuildPlot();
}

void PredictionView::adoptForesight(core::Foresight foresight)
{
    foresight_ = std::move(foresight);
    // The view shows the scores and the counts, not each encounter: the list
    // (every decided encounter of a centre, hundreds of MB) is let go.
    decidedEncounters_ = foresight_.encounters.size();
    foresight_.encounters = {};
    static const QColor colours[] = {QColor(0xE6, 0x9F, 0x00), QColor(0x00, 0x72, 0xB2), QColor(0x00, 0x9E, 0x73)};
    auto modelName = [](core::ForesightModel m) {
        switch (m) {
        case core::ForesightModel::Elo: return tr("Elo");
        case core::ForesightModel::InformedElo: return tr("Rule-informed Elo");
        case core::ForesightModel::Rule: break;
        }
        return tr("Rule alone");
    };
    foresightTable_->setRowCount(0);
    foresightPlot_->clearGraphs();
    double firstYear = 0, lastYear = 0;
    for (size_t m = 0; m < std::size(core::kForesightModels); ++m) {
        const core::ForesightModel model = core::kForesightModels[m];
        QCPGraph* g = foresightPlot_->addGraph();
        g->setName(modelName(model));
        g->setPen(QPen(colours[m], 2));
        g->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, 5));
        for (const core::ForesightRow& r : foresight_.rows) {
            if (r.model != model) continue;
            const core::ForesightScore& sc = r.score;
            if (r.year) {
                if (sc.sharePredicted) g->addData(*r.year, *sc.sharePredicted);
                firstYear = firstYear == 0 ? *r.year : std::min<double>(firstYear, *r.year);
                lastYear = std::max<double>(lastYear, *r.year);
                continue;
            }
            const int row = foresightTable_->rowCount();
            foresightTable_->insertRow(row);
            const QString cells[] = {
                modelName(model),
                sc.encounters ? QString::number(sc.logLikelihood, 'f', 0) : QString(),
                sc.encounters ? QString::number(sc.logLikelihood / sc.encounters, 'f', 3) : QString(),
                sc.brier ? QString::number(*sc.brier, 'f', 3) : QString(),
                sc.sharePredicted ? tr("%1%").arg(*sc.sharePredicted * 100, 0, 'f', 1) : QString()};
            for (int c = 0; c < 5; ++c) {
                auto* item = new QTableWidgetItem(cells[c]);
                if (c == 4) item->setToolTip(tr("%1 of %2 winners given more than 1/2").arg(sc.predicted).arg(sc.encounters));
                if (c == 0) item->setForeground(colours[m].darker(120));
                foresightTable_->setItem(row, c, item);
            }
        }
    }
    foresightPlot_->xAxis->setRange(firstYear - 0.5, std::max(lastYear, firstYear) + 0.5);
    auto ticker = QSharedPointer<QCPAxisTickerFixed>::create();
    ticker->setTickStep(1);
    ticker->setScaleStrategy(QCPAxisTickerFixed::ssMultiples);
    foresightPlot_->xAxis->setTicker(ticker);
    foresightPlot_->xAxis->setNumberFormat(QStringLiteral("f"));
    foresightPlot_->xAxis->setNumberPrecision(0);
    foresightPlot_->replot(QCustomPlot::rpQueuedReplot);
    if (decidedEncounters_ == 0) {
        foresightLabel_->setText(tr("No decided encounters."));
        return;
    }
    foresightLabel_->setText(
        tr("Every decided encounter of the record, each model's chance for its winner beforehand. The %1 rule "
           "could compare %2 of %3; the animal it places higher won %4 of them (its fitted win probability). "
           "A coin scores %5 per encounter and a Brier score of 0.25.")
            .arg(toQString(core::toString(foresight_.rule)))
            .arg(foresight_.comparable)
            .arg(decidedEncounters_)
            .arg(foresight_.ruleWinProbability ? QString::number(*foresight_.ruleWinProbability * 100, 'f', 1) +
                                                     QStringLiteral("%")
                                               : tr("none"))
            .arg(std::log(0.5), 0, 'f', 3));
}

void PredictionView::rebuildPlot()
{
    clearPlot(plot_);
    connectors_.assign(prediction_.females.size(), nullptr);
    observedLabels_.clear();
    const QString selected = selection_->animal();
    QFont labelFont = font();
    labelFont.setPointSizeF(labelFont.pointSizeF() * 0.8);
    for (size_t i = 0; i < prediction_.females.size(); ++i) {
        const core::PredictedFemale& f = prediction_.females[i];
        const bool me = toQString(f.animal) == selected;
        const QColor colour = palette_.colour(f.matriarch);
        auto label = [&](double x, double y, Qt::Alignment align, const QString& name) {
            auto* text = new QCPItemText(plot_);
            text->position->setCoords(x, y);
            text->setPositionAlignment(align | Qt::AlignVCenter);
            text->setText(name);
            QFont fnt = labelFont;
            fnt.setBold(me);
            text->setFont(fnt);
            text->setColor(f.observedRank ? colour.darker(130) : QColor(0x99, 0x99, 0x99));
            text->setClipToAxisRect(true);
        };
        label(-0.04, f.predictedRank, Qt::AlignRight, toQString(names_[i]));
        if (!f.observedRank) continue;
        // The observed order rests on the encounters: a flagged female's name carries the mark.
        observedLabels_ << flags_->marked(toQString(names_[i]), f.animal);
        label(1.04, *f.observedRank, Qt::AlignLeft, observedLabels_.back());
        QCPGraph* g = plot_->addGraph();
        g->setData({0.0, 1.0}, {static_cast<double>(f.predictedRank), static_cast<double>(*f.observedRank)}, true);
        QColor c = colour;
        if (f.discordantDyads == 0) c.setAlpha(110);
        QPen pen(c, me ? 4 : (f.discordantDyads > 0 ? 2.4 : 1));
        g->setPen(pen);
        g->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, 4));
        g->setName(toQString(f.animal));
        g->removeFromLegend();
        connectors_[i] = g;
    }
    // Legend: the two line styles and the matrilines.
    QCPGraph* bold = plot_->addGraph();
    bold->setPen(QPen(QColor(0x44, 0x44, 0x44), 2.4));
    bold->setName(tr("in a discordant dyad"));
    QCPGraph* faint = plot_->addGraph();
    QColor grey(0x44, 0x44, 0x44);
    grey.setAlpha(110);
    faint->setPen(QPen(grey, 1));
    faint->setName(tr("concordant"));
    for (int l = 0; l < palette_.lineCount(); ++l) {
        const std::string& m = palette_.matriarchs()[static_cast<size_t>(l)];
        bool shown = false;
        for (const core::PredictedFemale& f : prediction_.females) shown = shown || f.matriarch == m;
        if (!shown) continue;
        QCPGraph* key = plot_->addGraph();
        key->setPen(MatrilinePalette::penAt(l, 3));
        const auto name = lineNames_.find(m);
        key->setName(tr("line of %1").arg(name != lineNames_.end() ? toQString(name->second) : toQString(m)));
    }
    plot_->yAxis->setRange(0.3, std::max<size_t>(prediction_.females.size(), 1) + 0.7);
    plot_->xAxis->setLabel(prediction_.females.empty()
                               ? QString()
                               : tr("Order on %1 (%2)").arg(formatDay(prediction_.at), toQString(core::toString(prediction_.rule))));
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

QCPGraph* PredictionView::connectorOf(const QString& id) const
{
    const int i = prediction_.find(toStdString(id));
    return i < 0 || static_cast<size_t>(i) >= connectors_.size() ? nullptr : connectors_[static_cast<size_t>(i)];
}

QStringList PredictionView::observedLabels() const { return observedLabels_; }

int PredictionView::connectorCount() const
{
    return static_cast<int>(std::count_if(connectors_.begin(), connectors_.end(), [](QCPGraph* g) { return g != nullptr; }));
}

bool PredictionView::isEmphasised(const QString& id) const
{
    const QCPGraph* g = connectorOf(id);
    return g && g->pen().widthF() > 2;
}

} // namespace hierloom::ui
