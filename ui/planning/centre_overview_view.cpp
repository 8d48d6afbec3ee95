// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/centre_overview_view.h"

#include "core/store/analysis_settings_store.h"
#include "core/store/centre_overview_reader.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"
#include "ui/document/reading_connection.h"
#include "ui/document/visible_refresh.h"
#include "ui/widgets/caution_label.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/help_button.h"
#include "ui/widgets/plot_export.h"
#include "ui/widgets/plot_palette.h"
#include "ui/widgets/progress_strip.h"
#include "ui/widgets/typed_date.h"

#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QSortFilterProxyModel>
#include <QSplitter>
#include <QTableView>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <algorithm>
#include <cmath>
#include <mutex>

namespace hierloom::ui {

namespace {
// Okabe-Ito blue for calm, the alert red of the stability view, grey for groups without encounters.
const QColor kStateColours[] = {QColor(0x99, 0x99, 0x99), QColor(0x00, 0x72, 0xB2), QColor(0xCC, 0x00, 0x00)};
} // namespace

/// Rows read by the worker and not yet shown; one per reading.
struct CentreOverviewView::Incoming {
    std::mutex mutex;
    std::optional<core::Day> day;
    std::vector<OverviewRow> rows;
};

CentreOverviewView::CentreOverviewView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the overview, group by group"), this)),
      day_(new QLineEdit(this)),
      problem_(new QLabel(this)),
      summary_(new QLabel(this)),
      caution_(makeCautionLabel(this)),
      model_(new CentreOverviewModel(this)),
      sorted_(new QSortFilterProxyModel(this)),
      table_(new QTableView(this)),
      plot_(new QCustomPlot(this))
{
    day_->setObjectName(QStringLiteral("overviewDay"));
    day_->setPlaceholderText(tr("last encounter"));
    day_->setToolTip(tr("The day of the overview (2026-10-05 or 20261005); empty: the colony's last encounter"));
    day_->setMaximumWidth(140);
    problem_->setObjectName(QStringLiteral("overviewProblem"));
    problem_->setStyleSheet(QStringLiteral("QLabel { color: #b00000; }"));
    problem_->hide();
    summary_->setObjectName(QStringLiteral("overviewSummary"));
    caution_->hide();

    auto* controls = new QHBoxLayout;
    auto* dayLabel = new QLabel(tr("O&n:"), this);
    dayLabel->setBuddy(day_);
    controls->addWidget(dayLabel);
    controls->addWidget(day_);
    controls->addWidget(problem_);
    controls->addWidget(summary_);
    for (const char* key : {"counter_dominance", "severe_aggression", "rank_changes"})
        controls->addWidget(new HelpButton(QString::fromLatin1(key), this));
    controls->addStretch();
    PlotFigure figure;
    figure.plot = plot_;
    figure.baseName = QStringLiteral("centre-overview");
    figure.title = tr("Centre overview");
    figure.caption = [this] {
        const std::optional<core::Day> day = model_->day();
        return caption::join({day ? tr("on %1").arg(formatDay(*day)) : QString(),
                              tr("encounters of each group in the 30 days up to the day"),
                              tr("colour: the stability watch's last month")});
    };
    // One bar per group: the figure grows with the groups, within a page.
    figure.height = [this](bool) { return std::clamp(35.0 + 4.5 * static_cast<double>(plotted_.size()), 70.0, 230.0); };
    controls->addWidget(makeExportButton(figure, this));

    sorted_->setSourceModel(model_);
    sorted_->setSortRole(CentreOverviewModel::SortRole);
    sorted_->setSortCaseSensitivity(Qt::CaseInsensitive);
    table_->setObjectName(QStringLiteral("overviewTable"));
    table_->setModel(sorted_);
    table_->setSortingEnabled(true);
    table_->sortByColumn(CentreOverviewModel::Group, Qt::AscendingOrder);
    table_->setSelectionBehavior(QAbstractItemView::SelectRows);
    table_->setSelectionMode(QAbstractItemView::SingleSelection);
    table_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table_->setAlternatingRowColors(true);
    table_->setWordWrap(false);
    table_->verticalHeader()->hide();
    table_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    table_->horizontalHeader()->setStretchLastSection(true);

    // Horizontal bars, one per group in the table's order (top row on top).
    plot_->setObjectName(QStringLiteral("overviewPlot"));
    plot_->yAxis->setRangeReversed(true);
    plot_->yAxis->setLabel(tr("Group"));
    plot_->yAxis->grid()->setVisible(false);
    plot_->xAxis->setLabel(tr("Encounters in the last 30 days"));
    for (int s = 0; s < 3; ++s) {
        auto* bars = new QCPBars(plot_->yAxis, plot_->xAxis);
        bars->setWidth(0.7);
        bars->setPen(Qt::NoPen);
        bars->setBrush(kStateColours[s]);
        bars->setName(overviewStateName(static_cast<OverviewState>(s)));
        bars_[static_cast<size_t>(s)] = bars;
    }
    bars_[static_cast<size_t>(OverviewState::Alert)]->setName(tr("alert in the last month"));
    // The legend in a row of its own above the bars, so it never covers one.
    plot_->plotLayout()->insertRow(0);
    plot_->plotLayout()->addElement(0, 0, plot_->legend);
    plot_->plotLayout()->setRowStretchFactor(0, 0.001);
    plot_->legend->setFillOrder(QCPLegend::foColumnsFirst);
    plot_->legend->setVisible(true);
    // In a narrow window the legend wraps to the plot's width instead of being cut at its sides.
    wrapLegendToPlotWidth(plot_);
    plot_->setMinimumWidth(360);
    followPlotPalette(plot_);

    auto* split = new QSplitter(Qt::Horizontal, this);
    split->addWidget(table_);
    split->addWidget(plot_);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 2);
    split->setSizes({800, 400}); // the table's columns first, whatever the bars' size hint
    split->setChildrenCollapsible(false);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(progress_); // a row of its own while computing: the controls keep their width
    layout->addWidget(caution_);
    layout->addWidget(split, 1);

    // Enter or a double-click on a row; a click on a bar.
    connect(table_, &QTableView::activated, this, [this](const QModelIndex& index) {
        if (index.isValid()) emit groupChosen(groupAt(index.row()));
    });
    connect(plot_, &QCustomPlot::plottableClick, this, [this](QCPAbstractPlottable* plottable, int dataIndex, QMouseEvent*) {
        auto* bars = qobject_cast<QCPBars*>(plottable);
        if (!bars || dataIndex < 0 || dataIndex >= bars->data()->size()) return;
        const int key = static_cast<int>(std::lround(bars->data()->at(dataIndex)->key));
        if (key < 0 || key >= plotted_.size()) return;
        table_->selectRow(key);
        emit groupChosen(plotted_[key]);
    });
    // The bars follow the table: new rows, a new order, a new reading.
    connect(sorted_, &QAbstractItemModel::layoutChanged, this, &CentreOverviewView::replot);
    connect(sorted_, &QAbstractItemModel::rowsInserted, this, &CentreOverviewView::replot);
    connect(sorted_, &QAbstractItemModel::modelReset, this, &CentreOverviewView::replot);
    connect(day_, &QLineEdit::editingFinished, this, [this] {
        if (day_->isModified()) recompute();
        day_->setModified(false);
    });
    connect(runner_, &ComputeRunner::progress, this, &CentreOverviewView::takeRows);
    connect(progress_, &ProgressStrip::retry, this, &CentreOverviewView::recompute);
    // Read again after a change only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] { recompute(); });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    refresh->request();
}

CentreOverviewView::~CentreOverviewView() = default;

QString CentreOverviewView::groupAt(int row) const
{
    return sorted_->data(sorted_->index(row, CentreOverviewModel::Group), CentreOverviewModel::SortRole).toString();
}

void CentreOverviewView::recompute()
{
    problem_->hide();
    std::optional<core::Day> day;
    if (!day_->text().trimmed().isEmpty()) {
        day = parseTypedDate(day_->text());
        if (!day) {
            problem_->setText(typedDateProblem(day_->text()));
            problem_->show();
            return;
        }
    }
    model_->reset(day);
    if (!document_->isOpen()) {
        runner_->cancel();
        incoming_.reset(); // rows a cancelled reading still reports are dropped
        showSummary();
        return;
    }
    // The job's own connection reads one group at a time: memory follows the
    // largest group and the rows come as they are read.
    auto incoming = std::make_shared<Incoming>();
    incoming_ = incoming;
    const QString path = document_->path();
    runner_->start([this, incoming, path, day](const std::atomic<bool>& cancel, const ComputeRunner::Progress& progress) {
        const core::ColonyStore store = openReadingConnection(path);
        const core::AnalysisSettings settings = core::readAnalysisSettings(store);
        core::CentreOverviewReader reader(store, settings.elo, settings.maturityYears);
        const std::optional<core::Day> at = day ? day : reader.lastEncounterDay();
        const int total = static_cast<int>(reader.groups().size());
        {
            const std::lock_guard lock(incoming->mutex);
            incoming->day = at;
        }
        progress(0, total);
        if (!at) return ComputeRunner::Apply([this] { takeRows(); });
        int done = 0;
        for (const std::string& group : reader.groups()) {
            if (cancel) return ComputeRunner::Apply{};
            OverviewRow row{toQString(group), reader.read(group, *at)};
            {
                const std::lock_guard lock(incoming->mutex);
                incoming->rows.push_back(std::move(row));
            }
            progress(++done, total);
        }
        return ComputeRunner::Apply([this] { takeRows(); });
    });
    showSummary();
}

void CentreOverviewView::takeRows()
{
    if (!incoming_) return;
    std::vector<OverviewRow> rows;
    {
        const std::lock_guard lock(incoming_->mutex);
        rows.swap(incoming_->rows);
        model_->setDay(incoming_->day);
    }
    model_->append(std::move(rows));
    showSummary();
}

void CentreOverviewView::waitForRows()
{
    runner_->wait();
    takeRows();
}

void CentreOverviewView::showSummary()
{
    int alerting = 0;
    for (const OverviewRow& r : model_->rows()) alerting += r.overview.alerts.empty() ? 0 : 1;
    caution_->setVisible(alerting > 0);
    if (!document_->isOpen()) {
        summary_->clear();
        return;
    }
    const std::optional<core::Day> day = model_->day();
    if (!day) {
        summary_->setText(runner_->busy() ? QString() : tr("No encounters yet: give a day."));
        return;
    }
    summary_->setText(tr("%1: groups %2, with alerts in their last month %3")
                          .arg(formatDay(*day))
                          .arg(model_->rowCount())
                          .arg(alerting));
}

void CentreOverviewView::replot()
{
    std::array<QVector<double>, 3> keys, values;
    plotted_.clear();
    QSharedPointer<QCPAxisTickerText> ticker(new QCPAxisTickerText);
    double top = 0;
    for (int i = 0; i < sorted_->rowCount(); ++i) {
        const OverviewRow& r = model_->row(sorted_->mapToSource(sorted_->index(i, 0)).row());
        const auto s = static_cast<size_t>(overviewState(r.overview));
        keys[s] << i;
        values[s] << r.overview.recentEncounters;
        top = std::max(top, static_cast<double>(r.overview.recentEncounters));
        plotted_ << r.group;
        ticker->addTick(i, r.group);
    }
    for (size_t s = 0; s < 3; ++s) bars_[s]->setData(keys[s], values[s], true);
    plot_->yAxis->setTicker(ticker);
    // Room for eight bars at least, so one or two groups do not fill the plot.
    plot_->yAxis->setRange(-0.6, std::max(7.4, plotted_.size() - 0.4));
    plot_->xAxis->setRange(0, top > 0 ? top * 1.1 : 1);
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

} // namespace hierloom::ui
