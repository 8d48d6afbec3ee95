// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/support_view.h"

#include "ui/analysis/rank_flag_watch.h"

#include "core/base/number_format.h"
#include "core/pedigree/matriline.h"
#include "core/ranks/parallel_randomisation.h"
#include "core/research/support_tables.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/document_settings.h"
#include "ui/document/qt_convert.h"
#include "ui/document/visible_refresh.h"
#include "ui/widgets/matriline_palette.h"
#include "ui/widgets/progress_strip.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QSignalBlocker>
#include <QSpinBox>
#include <QTabWidget>
#include <QTableWidget>
#include <QVBoxLayout>

#include <set>

namespace hierloom::ui {

namespace {

/// Fills a table from the cells of a research table (the same text the exports write).
void fill(QTableWidget* table, const core::ExportTable& t)
{
    table->clear();
    table->setColumnCount(static_cast<int>(t.header.size()));
    table->setRowCount(static_cast<int>(t.rows.size()));
    QStringList header;
    for (const std::string& h : t.header) header << toQString(h);
    table->setHorizontalHeaderLabels(header);
    for (int r = 0; r < static_cast<int>(t.rows.size()); ++r)
        for (int c = 0; c < static_cast<int>(t.rows[static_cast<size_t>(r)].size()); ++c)
            table->setItem(r, c, new QTableWidgetItem(toQString(t.rows[static_cast<size_t>(r)][static_cast<size_t>(c)])));
    table->resizeColumnsToContents();
}

QTableWidget* readOnlyTable(QWidget* parent)
{
    auto* t = new QTableWidget(parent);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->setSelectionBehavior(QAbstractItemView::SelectItems);
    return t;
}

} // namespace

/// What the worker hands back: the analysis, its tables and the matriline colours.
struct SupportView::Result {
    core::SupportAnalysis analysis;
    core::ExportTable pairs, daughters, matrix;
    MatrilinePalette palette;
};

SupportView::SupportView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the support figures"), this)),
      flags_(new RankFlagWatch(document, this)),
      group_(new QComboBox(this)),
      permutations_(new QSpinBox(this)),
      summary_(new QLabel(this)),
      flagLegend_(new QLabel(this)),
      pairs_(readOnlyTable(this)),
      matrix_(readOnlyTable(this)),
      daughters_(readOnlyTable(this)),
      refresh_(nullptr)
{
    setObjectName(QStringLiteral("support"));
    permutations_->setRange(0, 100000);
    permutations_->setValue(199);
    summary_->setWordWrap(true);
    summary_->setTextInteractionFlags(Qt::TextSelectableByMouse);

    auto* options = new QHBoxLayout;
    auto addLabelled = [&](const QString& text, QWidget* field) {
        auto* label = new QLabel(text, this);
        label->setBuddy(field);
        options->addWidget(label);
        options->addWidget(field);
    };
    addLabelled(tr("&Group:"), group_);
    addLabelled(tr("&Permutations:"), permutations_);
    options->addStretch(1);

    auto* tabs = new QTabWidget(this);
    tabs->addTab(matrix_, tr("Support matrix (row for column: given/opportunities)"));
    tabs->addTab(pairs_, tr("Pairs"));
    tabs->addTab(daughters_, tr("Daughters' rise"));

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(options);
    layout->addWidget(progress_);
    layout->addWidget(summary_);
    auto* note = new QLabel(tr("Rank figures use the winner and the loser only; supporters enter these figures "
                               "alone (docs/methods.md, \"Kin support\")."),
                            this);
    note->setWordWrap(true);
    layout->addWidget(note);
    layout->addWidget(tabs, 1);
    flagLegend_->setObjectName(QStringLiteral("supportFlagLegend"));
    flagLegend_->setWordWrap(true);
    layout->addWidget(flagLegend_);
    connect(flags_, &RankFlagWatch::updated, this, &SupportView::markNames);

    refresh_ = new VisibleRefresh(this, [this] { recompute(); });
    connect(progress_, &ProgressStrip::retry, this, [this] { recompute(); });
    connect(group_, &QComboBox::currentIndexChanged, this, [this] {
        if (!loading_) recompute();
    });
    connect(permutations_, &QSpinBox::editingFinished, this, [this] { recompute(); });
    connect(document_, &ColonyDocument::changed, this, [this] {
        refreshGroups();
        refresh_->request();
    });
    refreshGroups();
    refresh_->request();
}

SupportView::~SupportView()
{
    // Closing the window takes the focus out of a field, whose editingFinished
    // must not recompute a view whose members are already gone.
    for (QWidget* child : findChildren<QWidget*>()) disconnect(child, nullptr, this, nullptr);
}

void SupportView::refreshGroups()
{
    loading_ = true;
    const QString current = group_->currentData().toString();
    const QSignalBlocker block(group_);
    group_->clear();
    group_->addItem(tr("every group"), QString());
    std::set<std::string> groups;
    for (const core::Residence& r : document_->pedigree().residences) groups.insert(r.group);
    for (const std::string& g : groups) group_->addItem(toQString(g), toQString(g));
    const int at = group_->findData(current);
    group_->setCurrentIndex(at < 0 ? 0 : at);
    loading_ = false;
}

void SupportView::setGroup(const QString& group)
{
    const int at = group_->findData(group);
    group_->setCurrentIndex(at < 0 ? 0 : at);
    recompute();
}

void SupportView::setPermutations(int n)
{
    permutations_->setValue(n);
    recompute();
}

void SupportView::recompute()
{
    for (QTableWidget* t : {pairs_, matrix_, daughters_}) {
        t->clear();
        t->setRowCount(0);
        t->setColumnCount(0);
    }
    summary_->clear();
    analysis_ = {};
    if (!document_->isOpen()) {
        runner_->cancel();
        flags_->clear();
        return;
    }
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_->currentData().toString())) return;
    core::SupportOptions o;
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    o.group = toStdString(group_->currentData().toString());
    o.iterations = permutations_->value();
    o.threads = core::defaultThreadCount(); // the result is the same with any count
    o.maturityYears = settings.maturityYears;
    o.elo = settings.elo;
    flags_->request(std::nullopt, std::nullopt, o.group);
    // The permutation test takes a while: off the interface thread, on the document's snapshot.
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    runner_->start([this, snapshot = snapshot, o](const std::atomic<bool>& cancel, const ComputeRunner::Progress&) mutable {
        auto r = std::make_shared<Result>();
        // Every group's encounters (with no end date the window ends on the
        // file's last encounter, in any group), read from the shared compact
        // records without expanding them; the animals with an index of this
        // thread's own.
        const std::shared_ptr<const core::CompactEncounters> records = snapshot.takeScope({});
        core::Colony pedigree = *snapshot.pedigree;
        pedigree.reindex();
        r->analysis = core::analyseSupport(*records, pedigree, *snapshot.residences, o);
        if (cancel) return ComputeRunner::Apply();
        r->pairs = core::supportPairsTable(r->analysis);
        r->daughters = core::supportDaughtersTable(r->analysis);
        r->matrix = core::supportMatrixTable(r->analysis);
        r->palette = MatrilinePalette(core::Matrilines(*snapshot.pedigree));
        return ComputeRunner::Apply([this, r] { adopt(*r); });
    });
}

void SupportView::adopt(const Result& r)
{
    analysis_ = r.analysis;
    const auto& mother = analysis_.classes[static_cast<size_t>(core::KinClass::Mother)];
    const auto& unrelated = analysis_.classes[static_cast<size_t>(core::KinClass::Unrelated)];
    // Three significant digits on screen; the tables below and the exports keep every digit.
    auto number = [](const std::optional<double>& v) { return v ? QString::number(*v, 'g', 3) : QStringLiteral("-"); };
    summary_->setText(
        analysis_.acts == 0
            ? tr("%1 encounters, no supporters recorded.").arg(analysis_.encounters)
            : tr("%1 encounters, %2 support acts. Rate of mothers for their offspring %3, of pairs with r < 0.125 "
                 "%4; nepotism index %5, permutation p %6 (%7 permutations, seed %8). Mothers' acts for a daughter "
                 "against a female the rule puts below her: %9 of %10.")
                  .arg(analysis_.encounters)
                  .arg(analysis_.acts)
                  .arg(number(mother.rate), number(unrelated.rate), number(analysis_.nepotismIndex),
                       number(analysis_.test.p))
                  .arg(analysis_.test.iterations)
                  .arg(analysis_.test.seed)
                  .arg(analysis_.motherActsAgainstBelow)
                  .arg(analysis_.motherActsAgainstFemales));
    fill(pairs_, r.pairs);
    fill(daughters_, r.daughters);
    showMatrix(r.matrix, r.palette);
}

void SupportView::showMatrix(const core::ExportTable& t, const MatrilinePalette& palette)
{
    // Rank order; a coloured strip of the row animal's matriline in column 0
    // and of the column animal's above the first row.
    const int n = static_cast<int>(analysis_.order.size());
    matrix_->clear();
    matrix_->setRowCount(n + 1);
    matrix_->setColumnCount(n + 1);
    QStringList columns{QString()}, rows{tr("line")};
    for (const std::string& id : analysis_.order) {
        columns << toQString(id);
        rows << toQString(id);
    }
    matrix_->setHorizontalHeaderLabels(columns);
    matrix_->setVerticalHeaderLabels(rows);
    for (int i = 0; i < n; ++i) {
        const QColor colour = palette.colour(analysis_.matriarchs[static_cast<size_t>(i)]);
        const QString tip = tr("matriline of %1").arg(toQString(analysis_.matriarchs[static_cast<size_t>(i)]));
        auto* rowStrip = new QTableWidgetItem;
        rowStrip->setBackground(colour);
        rowStrip->setToolTip(tip);
        matrix_->setItem(i + 1, 0, rowStrip);
        auto* columnStrip = new QTableWidgetItem;
        columnStrip->setBackground(colour);
        columnStrip->setToolTip(tip);
        matrix_->setItem(0, i + 1, columnStrip);
        const auto& cells = t.rows[static_cast<size_t>(i)];
        for (int j = 0; j < n; ++j)
            matrix_->setItem(i + 1, j + 1, new QTableWidgetItem(toQString(cells[static_cast<size_t>(j) + 2])));
    }
    markNames();
    matrix_->setColumnWidth(0, matrix_->fontMetrics().horizontalAdvance(QStringLiteral("MM")));
    matrix_->setRowHeight(0, matrix_->fontMetrics().height() / 2 + 2);
}

void SupportView::markNames()
{
    const int n = static_cast<int>(analysis_.order.size());
    flagLegend_->setText(n > 0 ? flags_->legend() : QString());
    if (matrix_->rowCount() != n + 1) return;
    for (int i = 0; i < n; ++i) {
        const std::string& id = analysis_.order[static_cast<size_t>(i)];
        const QString name = flags_->marked(toQString(id), id);
        for (QTableWidgetItem* header : {matrix_->horizontalHeaderItem(i + 1), matrix_->verticalHeaderItem(i + 1)}) {
            if (!header) continue;
            header->setText(name);
            header->setToolTip(flags_->describe(id));
        }
    }
    matrix_->resizeColumnsToContents();
    matrix_->setColumnWidth(0, matrix_->fontMetrics().horizontalAdvance(QStringLiteral("MM")));
}

} // namespace hierloom::ui
