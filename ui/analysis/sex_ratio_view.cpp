// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/sex_ratio_view.h"

#include "core/research/export_tables.h"
#include "core/store/species_settings.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/help_button.h"
#include "core/base/display_names.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/flow_layout.h"
#include "ui/widgets/plot_export.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_queries.h"
#include "ui/document/visible_refresh.h"

#include <QComboBox>
#include <QGridLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPushButton>
#include <QSpinBox>
#include <QSplitter>
#include <QTableWidget>
#include <QTreeWidget>
#include <QVBoxLayout>

#include <QCoreApplication>

#include <qcustomplot.h>

namespace hierloom::ui {

namespace {

const QColor kPoint(0x00, 0x72, 0xB2);

QString nameOf(core::CodeKind kind, const std::string& code)
{
    return QCoreApplication::translate("hierloom::core::DisplayName", core::displayName(kind, code).c_str());
}

/// A number as people read it: up to four significant digits (the exports keep every digit).
QString readable(const std::string& cell)
{
    bool ok = false;
    const double v = QString::fromStdString(cell).toDouble(&ok);
    if (!ok || cell.find_first_of(".eE") == std::string::npos) return toQString(cell);
    return QString::number(v, 'g', 4);
}

/// A read-only table of the cells the exports write, headers by their display
/// names, numbers rounded for reading (the tooltip has the exported value).
void fillTable(QTableWidget* table, const core::ExportTable& t)
{
    table->clear();
    table->setColumnCount(static_cast<int>(t.header.size()));
    table->setRowCount(static_cast<int>(t.rows.size()));
    for (size_t c = 0; c < t.header.size(); ++c) {
        auto* head = new QTableWidgetItem(nameOf(core::CodeKind::Column, t.header[c]));
        head->setToolTip(toQString(t.header[c]));
        table->setHorizontalHeaderItem(static_cast<int>(c), head);
    }
    for (size_t r = 0; r < t.rows.size(); ++r)
        for (size_t c = 0; c < t.rows[r].size(); ++c) {
            const std::string& cell = t.rows[r][c];
            const bool reason = t.header[c] == "left_out_reason" && !cell.empty();
            auto* item = new QTableWidgetItem(reason ? nameOf(core::CodeKind::Reason, cell) : readable(cell));
            item->setToolTip(toQString(cell));
            item->setFlags(Qt::ItemIsSelectable | Qt::ItemIsEnabled);
            table->setItem(static_cast<int>(r), static_cast<int>(c), item);
        }
    table->resizeColumnsToContents();
}

QTableWidget* makeTable(QWidget* parent)
{
    auto* t = new QTableWidget(parent);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->setAlternatingRowColors(true);
    t->verticalHeader()->hide();
    return t;
}

/// A caption with its "?" help button.
QWidget* captioned(const QString& caption, const QString& helpKey, QWidget* extra, QWidget* parent)
{
    auto* w = new QWidget(parent);
    auto* l = new QHBoxLayout(w);
    l->setContentsMargins(0, 0, 0, 0);
    auto* label = new QLabel(QStringLiteral("<b>%1</b>").arg(caption), w);
    l->addWidget(label);
    l->addWidget(new HelpButton(helpKey, w));
    l->addStretch();
    if (extra) l->addWidget(extra);
    return w;
}

} // namespace

core::MaternalRankOptions documentMaternalOptions(const std::string& group, int gestationDays, int maturityYears,
                                                 const core::EloSettings& elo)
{
    // As the `sex-ratio` command: every birth, the colony's Elo settings.
    core::MaternalRankOptions m;
    m.group = group;
    m.gestationDays = gestationDays;
    m.maturityYears = maturityYears;
    m.elo = elo;
    return m;
}

SexRatioView::SexRatioView(ColonyEditFacade* facade, QWidget* parent)
    : QWidget(parent),
      facade_(facade),
      document_(facade->document()),
      species_(new QComboBox(this)),
      gestation_(new QSpinBox(this)),
      maturity_(new QSpinBox(this)),
      group_(new QComboBox(this)),
      save_(new QPushButton(tr("Save Species Setting"), this)),
      message_(new QLabel(this)),
      figures_(makeTable(this)),
      leftOut_(new QTreeWidget(this)),
      maternal_(makeTable(this)),
      plot_(new QCustomPlot(this))
{
    setObjectName(QStringLiteral("sex-ratio"));
    for (const core::SpeciesProfile& p : core::knownSpecies())
        species_->addItem(tr("%1 (%2)").arg(toQString(p.commonName), toQString(p.scientificName)), toQString(p.key));
    gestation_->setRange(1, 1000);
    gestation_->setSuffix(tr(" days"));
    maturity_->setRange(0, 50);
    maturity_->setSuffix(tr(" years"));
    save_->setToolTip(tr("Store the species, gestation length and maturity age in the colony file"));

    // One row on a wide screen; on a small one the controls go on in a second row.
    auto* controls = new FlowLayout;
    controls->addGroup({new QLabel(tr("Species:"), this), species_});
    controls->addGroup({new QLabel(tr("Gestation:"), this), gestation_});
    controls->addGroup({new QLabel(tr("Females ranked from:"), this), maturity_,
                        new HelpButton(QStringLiteral("maternal_rank"), this)});
    controls->addWidget(save_);
    controls->addGroup({new QLabel(tr("Group:"), this), group_});

    message_->setObjectName(QStringLiteral("sexRatioMessage"));
    message_->setWordWrap(true);

    figures_->setObjectName(QStringLiteral("sexRatioFigures"));
    figures_->horizontalHeader()->setStretchLastSection(true);
    leftOut_->setObjectName(QStringLiteral("sexRatioLeftOut"));
    leftOut_->setHeaderLabels({tr("Offspring"), tr("Mother"), tr("Born"), tr("Reason left out")});
    leftOut_->setRootIsDecorated(false);
    leftOut_->setAlternatingRowColors(true);
    leftOut_->header()->setSectionResizeMode(3, QHeaderView::Stretch);
    maternal_->setObjectName(QStringLiteral("maternalRanks"));
    plot_->setObjectName(QStringLiteral("sexRatioPlot"));
    plot_->setMinimumHeight(260);

    auto box = [this](QWidget* caption, QWidget* body) {
        auto* w = new QWidget(this);
        auto* l = new QVBoxLayout(w);
        l->setContentsMargins(2, 2, 2, 2);
        l->addWidget(caption);
        l->addWidget(body, 1);
        return w;
    };
    auto* top = new QSplitter(Qt::Horizontal, this);
    top->addWidget(box(captioned(tr("Figures"), QStringLiteral("sex_ratio_logistic"), nullptr, this), figures_));
    top->addWidget(box(captioned(tr("Proportion of sons by maternal rank third"), QStringLiteral("sex_ratio"),
                                 makeExportButton(figure(), this), this),
                       plot_));
    top->setStretchFactor(0, 2);
    top->setStretchFactor(1, 3);
    auto* bottom = new QSplitter(Qt::Horizontal, this);
    bottom->addWidget(box(captioned(tr("Births left out"), QStringLiteral("sex_ratio"), nullptr, this), leftOut_));
    bottom->addWidget(box(captioned(tr("Maternal rank at conception and at birth"), QStringLiteral("maternal_rank"),
                                    nullptr, this),
                          maternal_));
    bottom->setStretchFactor(0, 2);
    bottom->setStretchFactor(1, 3);
    auto* split = new QSplitter(Qt::Vertical, this);
    split->addWidget(top);
    split->addWidget(bottom);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 2);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(message_);
    layout->addWidget(split, 1);

    // The plot: three points with Wilson 95 % intervals as error bars.
    auto* graph = plot_->addGraph();
    graph->setLineStyle(QCPGraph::lsNone);
    graph->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, kPoint, kPoint, 9));
    graph->setName(tr("Proportion of sons"));
    auto* bars = new QCPErrorBars(plot_->xAxis, plot_->yAxis);
    bars->setDataPlottable(graph);
    bars->setPen(QPen(kPoint, 1.5));
    bars->setWhiskerWidth(12);
    bars->setName(tr("Wilson 95 % interval"));
    auto ticker = QSharedPointer<QCPAxisTickerText>::create();
    ticker->addTick(1, tr("Low\n(rel. rank < 1/3)"));
    ticker->addTick(2, tr("Middle\n(1/3 to < 2/3)"));
    ticker->addTick(3, tr("High\n(2/3 and above)"));
    plot_->xAxis->setTicker(ticker);
    plot_->xAxis->setRange(0.4, 3.6);
    plot_->xAxis->setLabel(tr("Mother's relative rank at conception"));
    plot_->yAxis->setRange(0, 1);
    plot_->yAxis->setLabel(tr("Proportion of sons"));

    connect(species_, &QComboBox::currentIndexChanged, this, &SexRatioView::speciesChosen);
    connect(gestation_, &QSpinBox::valueChanged, this, [this] {
        if (!loading_) recompute();
    });
    connect(maturity_, &QSpinBox::valueChanged, this, [this] {
        if (!loading_) recompute();
    });
    connect(group_, &QComboBox::currentIndexChanged, this, [this] {
        if (!loading_) recompute();
    });
    connect(save_, &QPushButton::clicked, this, &SexRatioView::saveSpeciesSetting);
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] {
        loadSettings();
        recompute();
    });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    loadSettings();
    recompute();
}

PlotFigure SexRatioView::figure()
{
    PlotFigure f;
    f.plot = plot_;
    f.baseName = QStringLiteral("sex-ratio-by-rank-third");
    f.title = tr("Proportion of sons by the mother's rank third at conception");
    f.singleHeightMm = 75;
    f.doubleHeightMm = 100;
    f.caption = [this] {
        // Every group's encounters: the record begins with the file's first encounter, in any group.
        const core::BirthCounting counting = core::countNonBirths(
            document_->encounters().compact(), document_->pedigree(), document_->residences(),
            documentMaternalOptions(toStdString(group_->currentData().toString()), gestation_->value(),
                                    maturity_->value(), documentAnalysisSettings(document_).elo));
        return caption::join(
            {caption::group(group_->currentData().toString()),
             tr("births from %1 (founders excluded): %2 used")
                 .arg(counting.recordStart ? formatDay(*counting.recordStart) : tr("the record's start"))
                 .arg(analysis_.birthsUsed),
             tr("%1, gestation %2 days, females ranked from %3 years")
                 .arg(species_->currentText())
                 .arg(gestation_->value())
                 .arg(maturity_->value()),
             tr("mother's relative %1 rank at conception").arg(caption::elo(documentAnalysisSettings(document_).elo)),
             tr("bars: Wilson 95 % intervals")});
    };
    return f;
}

void SexRatioView::loadSettings()
{
    loading_ = true;
    core::SpeciesSettings s;
    s.gestationDays = core::findSpecies(s.species)->gestationDays;
    s.maturityYears = core::findSpecies(s.species)->maturityYears;
    if (const core::ColonyStore* store = document_->store()) {
        try {
            s = core::readSpeciesSettings(*store);
        } catch (const std::invalid_argument& e) {
            message_->setText(tr("The colony's species setting is not valid (%1); the default species applies.")
                                  .arg(QString::fromUtf8(e.what())));
        }
    }
    species_->setCurrentIndex(std::max(0, species_->findData(toQString(s.species))));
    gestation_->setValue(s.gestationDays);
    maturity_->setValue(s.maturityYears);
    save_->setEnabled(document_->isOpen() && !document_->isReadOnly());
    refreshGroups();
    loading_ = false;
}

void SexRatioView::refreshGroups()
{
    const QString current = group_->currentData().toString();
    const QSignalBlocker block(group_);
    group_->clear();
    group_->addItem(tr("All groups"), QString());
    for (const QString& g : groupsWithEncounters(document_)) group_->addItem(g, g);
    group_->setCurrentIndex(std::max(0, group_->findData(current)));
}

void SexRatioView::speciesChosen()
{
    if (loading_) return;
    if (const core::SpeciesProfile* p = core::findSpecies(toStdString(species_->currentData().toString()))) {
        loading_ = true;
        gestation_->setValue(p->gestationDays);
        maturity_->setValue(p->maturityYears);
        loading_ = false;
    }
    recompute();
}

void SexRatioView::setSpecies(const QString& key) { species_->setCurrentIndex(species_->findData(key)); }
void SexRatioView::setGestationDays(int days) { gestation_->setValue(days); }
void SexRatioView::setMaturityYears(int years) { maturity_->setValue(years); }
void SexRatioView::setGroup(const QString& group) { group_->setCurrentIndex(std::max(0, group_->findData(group))); }

bool SexRatioView::saveSpeciesSetting()
{
    if (!document_->isOpen() || document_->isReadOnly()) return false;
    const std::string key = toStdString(species_->currentData().toString());
    const core::SpeciesProfile* p = core::findSpecies(key);
    if (!p) return false;
    // Only values that differ from the species default are stored as overrides.
    const std::optional<int> g = gestation_->value() != p->gestationDays ? std::optional<int>(gestation_->value()) : std::nullopt;
    const std::optional<int> m = maturity_->value() != p->maturityYears ? std::optional<int>(maturity_->value()) : std::nullopt;
    const core::FieldProblems problems = facade_->setSpeciesSetting(key, g, m);
    if (!problems.empty()) message_->setText(toQString(problems.front().message));
    return problems.empty();
}

void SexRatioView::recompute()
{
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_->currentData().toString())) return;
    // Every group's encounters, read from the document's compact records.
    births_ = core::computeMaternalRanks(
        document_->encounters().compact(), document_->pedigree(), document_->residences(),
        documentMaternalOptions(toStdString(group_->currentData().toString()), gestation_->value(), maturity_->value(),
                                documentAnalysisSettings(document_).elo));
    analysis_ = core::analyseSexRatio(births_);

    // The figures: the rows of the `sex-ratio` command, empty where undefined.
    const auto rows = core::sexRatioRows(analysis_);
    figures_->clear();
    figures_->setColumnCount(2);
    figures_->setRowCount(static_cast<int>(rows.size()));
    figures_->setHorizontalHeaderLabels({tr("Figure"), tr("Value")});
    for (size_t i = 0; i < rows.size(); ++i) {
        // The figure's name and a rounded value; the tooltips hold the code and the exported value.
        auto* name = new QTableWidgetItem(nameOf(core::CodeKind::Metric, rows[i].first));
        name->setToolTip(toQString(rows[i].first));
        auto* value = new QTableWidgetItem(readable(rows[i].second));
        value->setToolTip(toQString(rows[i].second));
        for (QTableWidgetItem* item : {name, value}) item->setFlags(Qt::ItemIsSelectable | Qt::ItemIsEnabled);
        figures_->setItem(static_cast<int>(i), 0, name);
        figures_->setItem(static_cast<int>(i), 1, value);
    }
    figures_->resizeColumnToContents(0);

    leftOut_->clear();
    for (const core::MaternalRankRow& b : births_) {
        if (b.exclusion == core::BirthExclusion::None) continue;
        auto* item = new QTreeWidgetItem(leftOut_);
        item->setText(0, toQString(b.offspring));
        item->setText(1, toQString(b.mother));
        item->setText(2, formatDay(b.birth));
        item->setText(3, b.detail.empty() ? nameOf(core::CodeKind::Reason, core::toString(b.exclusion))
                                          : toQString(b.detail));
        item->setToolTip(3, toQString(core::toString(b.exclusion)));
    }
    for (int c = 0; c < 3; ++c) leftOut_->resizeColumnToContents(c);

    fillTable(maternal_, core::maternalRankTable(births_));

    // Clear messages for the cases in which figures stay empty (as the command line).
    QStringList notes;
    if (!document_->isOpen()) notes << tr("No colony is open.");
    else if (births_.empty()) notes << tr("No births with a recorded birth date: every figure is empty.");
    else {
        // Every group's encounters: the record begins with the file's first encounter, in any group.
        const core::BirthCounting counting = core::countNonBirths(
            document_->encounters().compact(), document_->pedigree(), document_->residences(),
            documentMaternalOptions(toStdString(group_->currentData().toString()), gestation_->value(),
                                    maturity_->value(), documentAnalysisSettings(document_).elo));
        if (counting.recordStart)
            notes << tr("Births are counted from the record's first encounter, %1; %2 founders and %3 animals born "
                        "before then are not births.")
                         .arg(formatDay(*counting.recordStart))
                         .arg(counting.founders)
                         .arg(counting.bornBefore);
        notes << tr("%1 births used, %2 left out.").arg(analysis_.birthsUsed).arg(analysis_.birthsLeftOut);
        if (analysis_.birthsUsed == 0) notes << tr("No birth could be used: every figure is empty.");
        else if (!analysis_.fit.slope)
            notes << ((analysis_.sons == 0 || analysis_.daughters == 0)
                          ? tr("The offspring are all of one sex: the logistic regression is undefined.")
                          : tr("The logistic regression is undefined (fewer than two births, one maternal rank "
                               "only, or complete separation)."));
    }
    message_->setText(notes.join(QLatin1Char(' ')));
    showPlot();
}

void SexRatioView::showPlot()
{
    QVector<double> x, y, minus, plus;
    plot_->clearItems();
    auto* half = new QCPItemStraightLine(plot_);
    half->point1->setCoords(0, 0.5);
    half->point2->setCoords(1, 0.5);
    half->setPen(QPen(Qt::gray, 1, Qt::DashLine));
    // The counts under each third's name, where no point or interval can cover them.
    const QString names[] = {tr("Low\n(rel. rank < 1/3)"), tr("Middle\n(1/3 to < 2/3)"), tr("High\n(2/3 and above)")};
    auto ticker = QSharedPointer<QCPAxisTickerText>::create();
    for (int k = 0; k < 3; ++k) {
        const core::RankThird& t = analysis_.thirds[static_cast<size_t>(k)];
        ticker->addTick(k + 1, tr("%1\n%2 sons\nof %3 births").arg(names[k]).arg(t.sons).arg(t.births));
        if (!t.proportion) continue; // no births in this third: nothing to draw
        x << k + 1;
        y << *t.proportion;
        minus << *t.proportion - t.low.value_or(*t.proportion);
        plus << t.high.value_or(*t.proportion) - *t.proportion;
    }
    plot_->xAxis->setTicker(ticker);
    plot_->graph(0)->setData(x, y, true);
    if (auto* bars = qobject_cast<QCPErrorBars*>(plot_->plottable(1))) bars->setData(minus, plus);
    plot_->replot();
}

} // namespace hierloom::ui
