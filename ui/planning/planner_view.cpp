// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/planner_view.h"

#include "core/pedigree/group_composition.h"
#include "core/store/saved_scenarios.h"
#include "core/planning/scenario_file.h"
#include "report/scenario_report.h"
#include "ui/widgets/caution_label.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/document_settings.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/qt_convert.h"
#include "ui/planning/scenario_composer.h"

#include <QComboBox>
#include <QFileDialog>
#include <QFileInfo>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QInputDialog>
#include <QLabel>
#include <QPageLayout>
#include <QPdfWriter>
#include <QPrintDialog>
#include <QPrinter>
#include <QPushButton>
#include <QScrollArea>
#include <QSplitter>
#include <QTabWidget>
#include <QTableWidget>
#include <QVBoxLayout>

#include <map>

namespace hierloom::ui {

namespace {

/// "Name (ID)", or the id of an animal without a name (as the Prediction view shows them).
QString animalText(const core::Colony& colony, const std::string& id)
{
    const int k = colony.animalIndex(id);
    const std::string& name = k >= 0 ? colony.animals[static_cast<size_t>(k)].name : std::string();
    return name.empty() || name == id ? toQString(id) : QStringLiteral("%1 (%2)").arg(toQString(name), toQString(id));
}

/// The matriline of an animal for people: its matriarch's name, or nothing
/// for a male without a recorded mother (he heads no line).
QString lineText(const core::Colony& colony, const std::string& animal, const std::string& matriarch)
{
    const int k = colony.animalIndex(animal);
    if (matriarch.empty() || (matriarch == animal && k >= 0 && colony.animals[static_cast<size_t>(k)].sex == core::Sex::Male))
        return {};
    return animalText(colony, matriarch);
}

QTableWidget* makeTable(const QStringList& header, QWidget* parent)
{
    auto* t = new QTableWidget(0, static_cast<int>(header.size()), parent);
    t->setHorizontalHeaderLabels(header);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->verticalHeader()->hide();
    t->setAlternatingRowColors(true);
    t->horizontalHeader()->setStretchLastSection(true);
    return t;
}

void setRow(QTableWidget* t, int row, const QStringList& cells, const QColor& tint = {})
{
    if (t->rowCount() <= row) t->setRowCount(row + 1);
    for (int c = 0; c < cells.size(); ++c) {
        auto* item = new QTableWidgetItem(cells[c]);
        if (tint.isValid()) item->setBackground(tint);
        t->setItem(row, c, item);
    }
}

QString rankIn(const std::string& group, const std::optional<int>& rank)
{
    return rank ? QStringLiteral("%1 #%2").arg(toQString(group)).arg(*rank) : QString();
}

QString ratio(const core::GroupComposition& g)
{
    return g.adultSexRatio ? QString::number(*g.adultSexRatio, 'f', 2) : PlannerView::tr("no adult male");
}

} // namespace

PlannerView::PlannerView(ColonyEditFacade* facade, QWidget* parent)
    : QWidget(parent),
      facade_(facade),
      document_(facade->document()),
      composer_(new ScenarioComposer(document_, this)),
      savedBox_(new QComboBox(this)),
      saveButton_(new QPushButton(tr("Save As..."), this)),
      deleteButton_(new QPushButton(tr("Delete"), this)),
      problems_(new QLabel(this)),
      tabs_(new QTabWidget(this)),
      ordersPage_(new QWidget(this)),
      ordersLayout_(new QVBoxLayout(ordersPage_)),
      moves_(makeTable({tr("Animal"), tr("Matriline"), tr("Before"), tr("After"), tr("Predicted move")}, this)),
      reversals_(makeTable({tr("Group"), tr("Predicted above"), tr("Predicted below"), tr("Observed wins above"),
                            tr("Observed wins below"), tr("Already predicted so before")},
                           this)),
      compareA_(new QComboBox(this)),
      compareB_(new QComboBox(this)),
      compare_(makeTable({tr("Group"), tr("Rank"), tr("Scenario A"), tr("Scenario B")}, this)),
      compareSummary_(new QLabel(this))
{
    setObjectName(QStringLiteral("planner"));
    auto* openButton = new QPushButton(tr("Open"), this);
    auto* newButton = new QPushButton(tr("New"), this);
    auto* printButton = new QPushButton(tr("Print..."), this);
    auto* pdfButton = new QPushButton(tr("Save PDF..."), this);
    auto* savedRow = new QHBoxLayout;
    savedRow->addWidget(new QLabel(tr("Saved:"), this));
    savedRow->addWidget(savedBox_, 1);
    savedRow->addWidget(openButton);
    savedRow->addWidget(deleteButton_);
    auto* actionRow = new QHBoxLayout;
    actionRow->addWidget(newButton);
    actionRow->addWidget(saveButton_);
    actionRow->addStretch();
    actionRow->addWidget(printButton);
    actionRow->addWidget(pdfButton);
    auto* left = new QWidget(this);
    auto* ll = new QVBoxLayout(left);
    ll->setContentsMargins(0, 0, 0, 0);
    ll->addLayout(savedRow);
    ll->addWidget(composer_, 1);
    ll->addLayout(actionRow);

    problems_->setWordWrap(true);
    problems_->setStyleSheet(QStringLiteral("QLabel { color: #a00000; }"));
    auto* scroll = new QScrollArea(this);
    scroll->setWidgetResizable(true);
    scroll->setWidget(ordersPage_);
    tabs_->addTab(scroll, tr("Orders and Groups"));
    tabs_->addTab(moves_, tr("Predicted Moves"));
    tabs_->addTab(reversals_, tr("Relationships to Reverse"));
    auto* comparePage = new QWidget(this);
    auto* cl = new QVBoxLayout(comparePage);
    auto* pick = new QHBoxLayout;
    auto* compareButton = new QPushButton(tr("Compare"), this);
    pick->addWidget(new QLabel(tr("A:"), this));
    pick->addWidget(compareA_, 1);
    pick->addWidget(new QLabel(tr("B:"), this));
    pick->addWidget(compareB_, 1);
    pick->addWidget(compareButton);
    cl->addLayout(pick);
    compareSummary_->setWordWrap(true);
    cl->addWidget(compareSummary_);
    cl->addWidget(compare_, 1);
    tabs_->addTab(comparePage, tr("Compare"));
    auto* right = new QWidget(this);
    auto* rl = new QVBoxLayout(right);
    rl->setContentsMargins(0, 0, 0, 0);
    rl->addWidget(problems_);
    rl->addWidget(tabs_, 1);

    auto* split = new QSplitter(Qt::Horizontal, this);
    split->addWidget(left);
    split->addWidget(right);
    split->setStretchFactor(0, 1);
    split->setStretchFactor(1, 3);
    auto* layout = new QVBoxLayout(this);
    layout->addWidget(makeCautionLabel(this));
    layout->addWidget(split, 1);

    // The prediction is recomputed only while the planner is on screen.
    auto* refresh = new VisibleRefresh(this, [this] { rerun(); });
    connect(composer_, &ScenarioComposer::changed, refresh, &VisibleRefresh::request);
    connect(document_, &ColonyDocument::changed, this, &PlannerView::refreshSaved);
    connect(newButton, &QPushButton::clicked, composer_, &ScenarioComposer::reset);
    connect(openButton, &QPushButton::clicked, this, [this] { openScenario(savedBox_->currentText()); });
    connect(deleteButton_, &QPushButton::clicked, this, [this] { deleteScenario(savedBox_->currentText()); });
    connect(saveButton_, &QPushButton::clicked, this, [this] {
        bool ok = false;
        const QString name = QInputDialog::getText(this, tr("Save Scenario"), tr("Name:"), QLineEdit::Normal,
                                                   savedBox_->currentText(), &ok);
        if (ok && !name.trimmed().isEmpty()) saveScenario(name.trimmed());
    });
    connect(compareButton, &QPushButton::clicked, this,
            [this] { compare(compareA_->currentData().toString(), compareB_->currentData().toString()); });
    connect(printButton, &QPushButton::clicked, this, &PlannerView::printDialog);
    connect(pdfButton, &QPushButton::clicked, this, &PlannerView::savePdfDialog);
    refreshSaved();
    rerun();
}

QString PlannerView::problems() const { return problems_->text(); }

QStringList PlannerView::savedNames() const
{
    QStringList out;
    if (const core::ColonyStore* store = document_->store())
        for (const std::string& n : core::savedScenarioNames(*store)) out << toQString(n);
    return out;
}

void PlannerView::waitForEveryEncounter()
{
    document_->readEverything();
    document_->finishLoading();
}

void PlannerView::refreshSaved()
{
    const QString current = savedBox_->currentText();
    const QStringList names = savedNames();
    savedBox_->clear();
    savedBox_->addItems(names);
    if (names.contains(current)) savedBox_->setCurrentText(current);
    for (QComboBox* box : {compareA_, compareB_}) {
        const QVariant was = box->currentData();
        box->clear();
        box->addItem(tr("(being composed)"), QString());
        for (const QString& n : names) box->addItem(n, n);
        const int i = box->findData(was);
        if (i >= 0) box->setCurrentIndex(i);
    }
    const bool writable = document_->isOpen() && !document_->isReadOnly();
    saveButton_->setEnabled(writable);
    deleteButton_->setEnabled(writable && !names.isEmpty());
    saveButton_->setToolTip(writable ? QString() : tr("The colony is open read-only"));
}

bool PlannerView::saveScenario(const QString& name)
{
    if (!document_->isOpen() || document_->isReadOnly() || name.isEmpty()) return false;
    const auto problems = facade_->saveScenario(toStdString(name), core::formatScenarioText(composer_->scenario()));
    if (!problems.empty()) {
        problems_->setText(toQString(problems.front().message));
        return false;
    }
    refreshSaved();
    savedBox_->setCurrentText(name);
    return true;
}

std::optional<core::Scenario> PlannerView::savedScenario(const QString& name, QString* error) const
{
    const core::ColonyStore* store = document_->store();
    if (!store) return std::nullopt;
    const auto text = core::savedScenarioText(*store, toStdString(name));
    if (!text) {
        if (error) *error = tr("No saved scenario named %1.").arg(name);
        return std::nullopt;
    }
    core::Scenario defaults;
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    defaults.maturityYears = settings.maturityYears;
    defaults.elo = settings.elo;
    const core::ScenarioFileResult parsed =
        core::parseScenarioText(*text, toStdString(name), document_->encounters().compact(), document_->pedigree(),
                                defaults);
    if (!parsed.scenario && error) {
        QStringList lines;
        for (const std::string& e : parsed.errors) lines << toQString(e);
        *error = tr("The saved scenario no longer fits the record:\n%1").arg(lines.join(QLatin1Char('\n')));
    }
    return parsed.scenario;
}

bool PlannerView::openScenario(const QString& name)
{
    QString error;
    const auto s = savedScenario(name, &error);
    if (!s) {
        problems_->setText(error);
        return false;
    }
    composer_->setScenario(*s);
    return true;
}

bool PlannerView::deleteScenario(const QString& name)
{
    if (!document_->isOpen() || document_->isReadOnly() || name.isEmpty()) return false;
    if (!facade_->deleteScenario(toStdString(name)).empty()) return false;
    refreshSaved();
    return true;
}

void PlannerView::rerun()
{
    result_.reset();
    moves_->setRowCount(0);
    reversals_->setRowCount(0);
    while (QLayoutItem* item = ordersLayout_->takeAt(0)) {
        delete item->widget();
        delete item;
    }
    problems_->clear();
    if (!document_->isOpen() || composer_->scenario().group.empty()) {
        problems_->setText(document_->isOpen() ? tr("The colony has no group with encounters.") : QString());
        return;
    }
    core::Scenario s = composer_->scenario();
    s.elo = documentAnalysisSettings(document_).elo; // Elo is no part of a scenario's text
    waitForEveryEncounter();
    try {
        result_ = core::runScenario(document_->encounters().compact(), document_->pedigree(), s);
    } catch (const core::ScenarioError& e) {
        QStringList lines;
        for (const core::ScenarioProblem& p : e.problems()) lines << toQString(p.message);
        problems_->setText(lines.join(QLatin1Char('\n')));
        return;
    } catch (const std::exception& e) {
        problems_->setText(toQString(e.what()));
        return;
    }
    fillOrders(s);
    int row = 0;
    for (const core::ScenarioMove& m : result_->moves) {
        const QColor tint = m.status == "unchanged" ? QColor() : m.status == "falls" || m.status == "removed"
                                                                     ? QColor(0xfd, 0xe2, 0xdc)
                                                                     : QColor(0xe2, 0xf0, 0xdc);
        setRow(moves_, row++,
               {animalText(document_->pedigree(), m.animal), lineText(document_->pedigree(), m.animal, m.matriarch),
                rankIn(m.groupBefore, m.rankBefore),
                rankIn(m.groupAfter, m.rankAfter), toQString(m.status)},
               tint);
    }
    row = 0;
    for (const core::ScenarioReversal& v : result_->reversals)
        setRow(reversals_, row++,
               {toQString(v.group), animalText(document_->pedigree(), v.predictedAbove),
                animalText(document_->pedigree(), v.predictedBelow),
                QString::number(v.winsPredictedAbove), QString::number(v.winsPredictedBelow),
                v.againstPredictionBefore ? tr("yes") : tr("no")});
    // Observed wins count the decided encounters of a window before the scenario's date: say which.
    const QString window = tr("%1 days to %2").arg(s.recentDays).arg(formatDay(result_->at));
    reversals_->setHorizontalHeaderLabels({tr("Group"), tr("Predicted above"), tr("Predicted below"),
                                           tr("Observed wins above\n(%1)").arg(window),
                                           tr("Observed wins below\n(%1)").arg(window), tr("Already predicted so before")});
    reversals_->setToolTip(tr("Adult females only. Observed wins: decided encounters between the two in the %1 up to "
                              "the scenario's date.")
                               .arg(tr("%1 days").arg(s.recentDays)));
    moves_->setToolTip(tr("Adult females only (at least %1 years old on %2): the rule predicts their order.")
                           .arg(s.maturityYears)
                           .arg(formatDay(result_->at)));
    tabs_->setTabText(1, tr("Predicted Moves (adult females)"));
    moves_->resizeColumnsToContents();
    reversals_->resizeColumnsToContents();
    tabs_->setTabText(2, tr("Relationships to Reverse (%1)").arg(result_->reversals.size()));
}

void PlannerView::fillOrders(const core::Scenario& s)
{
    const core::Colony& colony = document_->pedigree();
    const core::Colony after = core::scenarioColony(colony, s);
    const core::ResidenceIndex whereAfter(after.animals, after.residences);
    std::vector<std::string> groups;
    for (const core::ScenarioGroup& g : result_->groups) groups.push_back(g.group);
    const auto before = core::groupComposition(colony, document_->residences(), result_->at, groups, s.maturityYears);
    const auto now = core::groupComposition(after, whereAfter, result_->at, groups, s.maturityYears);
    std::map<std::string, const core::ScenarioMove*> moveOf;
    for (const core::ScenarioMove& m : result_->moves) moveOf[m.animal] = &m;

    auto* row = new QHBoxLayout;
    auto* holder = new QWidget(ordersPage_);
    holder->setLayout(row);
    for (size_t gi = 0; gi < result_->groups.size(); ++gi) {
        const core::ScenarioGroup& g = result_->groups[gi];
        auto* box = new QGroupBox(tr("Group %1").arg(toQString(g.group)), holder);
        auto* bl = new QVBoxLayout(box);
        auto* summary = new QLabel(
            tr("Animals %1 -> %2; adult females/males %3/%4 -> %5/%6; adult sex ratio (F:M) %7 -> %8; "
               "matrilines %9 -> %10")
                .arg(before[gi].animals)
                .arg(now[gi].animals)
                .arg(before[gi].adultFemales)
                .arg(before[gi].adultMales)
                .arg(now[gi].adultFemales)
                .arg(now[gi].adultMales)
                .arg(ratio(before[gi]), ratio(now[gi]))
                .arg(before[gi].matrilines)
                .arg(now[gi].matrilines),
            box);
        summary->setObjectName(QStringLiteral("composition"));
        summary->setWordWrap(true);
        bl->addWidget(summary);
        auto* table = makeTable({tr("#"), tr("Observed now (Elo)"), tr("Matriline"), tr("Predicted after"),
                                 tr("Matriline"), tr("Move")},
                                box);
        table->setObjectName(QStringLiteral("orders"));
        // Observed: the group's females after the change in their current Elo order; newcomers last.
        std::vector<core::PredictedFemale> observed = g.after.females;
        std::stable_sort(observed.begin(), observed.end(), [](const auto& a, const auto& b) {
            return a.observedRank.value_or(1 << 20) < b.observedRank.value_or(1 << 20);
        });
        for (size_t i = 0; i < g.after.females.size(); ++i) {
            const core::PredictedFemale& o = observed[i];
            const core::PredictedFemale& p = g.after.females[i];
            QString move;
            if (const auto it = moveOf.find(p.animal); it != moveOf.end()) {
                const core::ScenarioMove& m = *it->second;
                move = m.rankBefore && m.groupBefore == m.groupAfter
                           ? QStringLiteral("%1 (%2 -> %3)").arg(toQString(m.status)).arg(*m.rankBefore).arg(*m.rankAfter)
                           : toQString(m.status);
            }
            // Tint the females the changes move, so they stand out from the unchanged.
            const bool differs = !move.isEmpty() && !move.startsWith(QStringLiteral("unchanged"));
            setRow(table, static_cast<int>(i),
                   {QString::number(i + 1),
                    animalText(colony, o.animal) + (o.observedRank ? QString() : tr(" (new)")),
                    lineText(colony, o.animal, o.matriarch), animalText(colony, p.animal),
                    lineText(colony, p.animal, p.matriarch), move},
                   differs ? QColor(0xff, 0xf4, 0xd6) : QColor());
        }
        table->resizeColumnsToContents();
        // As wide as its columns, so that after a split the scroll area scrolls rather than cutting "Move".
        table->setMinimumWidth(table->horizontalHeader()->length() + table->verticalHeader()->width() +
                               2 * table->frameWidth() + 24);
        table->setMinimumHeight(260);
        auto* only = new QLabel(tr("Adult females only (at least %1 years old on %2); observed order by Elo.")
                                    .arg(s.maturityYears)
                                    .arg(formatDay(result_->at)),
                                box);
        only->setObjectName(QStringLiteral("adultFemalesOnly"));
        only->setWordWrap(true);
        bl->addWidget(only);
        bl->addWidget(table, 1);
        row->addWidget(box, 1);
    }
    ordersLayout_->addWidget(holder, 1);
}

void PlannerView::compare(const QString& first, const QString& second)
{
    compare_->setRowCount(0);
    std::optional<core::ScenarioResult> results[2];
    QStringList notes;
    const QString names[2] = {first, second};
    for (int k = 0; k < 2; ++k) {
        QString error;
        std::optional<core::Scenario> s = names[k].isEmpty() ? composer_->scenario() : savedScenario(names[k], &error);
        if (s) s->elo = documentAnalysisSettings(document_).elo;
        const QString label = names[k].isEmpty() ? tr("the scenario being composed") : names[k];
        if (!s) {
            notes << tr("%1: %2").arg(label, error);
            continue;
        }
        waitForEveryEncounter();
        try {
            results[k] = core::runScenario(document_->encounters().compact(), document_->pedigree(), *s);
            QStringList groups;
            for (const core::ScenarioGroup& g : results[k]->groups)
                groups << tr("%1 %2 females").arg(toQString(g.group)).arg(g.after.females.size());
            notes << tr("%1 %2: %3; %4 observed relationships to reverse")
                         .arg(k == 0 ? QStringLiteral("A") : QStringLiteral("B"), label,
                              groups.join(QStringLiteral(", ")))
                         .arg(results[k]->reversals.size());
        } catch (const std::exception& e) {
            notes << tr("%1: %2").arg(label, toQString(e.what()));
        }
    }
    compareSummary_->setText(notes.join(QLatin1Char('\n')));
    if (!results[0] || !results[1]) return;
    std::vector<std::string> groups;
    for (int k = 0; k < 2; ++k)
        for (const core::ScenarioGroup& g : results[k]->groups)
            if (std::find(groups.begin(), groups.end(), g.group) == groups.end()) groups.push_back(g.group);
    int row = 0;
    for (const std::string& name : groups) {
        const core::ScenarioGroup* sg[2] = {nullptr, nullptr};
        for (int k = 0; k < 2; ++k)
            for (const core::ScenarioGroup& g : results[k]->groups)
                if (g.group == name) sg[k] = &g;
        const size_t n = std::max(sg[0] ? sg[0]->after.females.size() : 0, sg[1] ? sg[1]->after.females.size() : 0);
        for (size_t i = 0; i < n; ++i) {
            QString cell[2];
            for (int k = 0; k < 2; ++k)
                if (sg[k] && i < sg[k]->after.females.size()) cell[k] = toQString(sg[k]->after.females[i].animal);
            setRow(compare_, row++, {toQString(name), QString::number(i + 1), cell[0], cell[1]},
                   cell[0] != cell[1] ? QColor(0xff, 0xf4, 0xd6) : QColor());
        }
    }
    compare_->resizeColumnsToContents();
    tabs_->setCurrentIndex(3);
}

int PlannerView::paint(QPagedPaintDevice& device, bool comparison)
{
    std::vector<report::NamedScenario> list;
    if (comparison) {
        for (QComboBox* box : {compareA_, compareB_}) {
            const QString name = box->currentData().toString();
            if (name.isEmpty()) list.push_back({tr("(being composed)"), composer_->scenario()});
            else if (const auto s = savedScenario(name)) list.push_back({name, *s});
        }
    } else {
        list.push_back({savedBox_->currentText().isEmpty() ? tr("(unsaved)") : savedBox_->currentText(),
                        composer_->scenario()});
    }
    return report::paintScenarioReport(device, document_->encounters().compact(), document_->pedigree(), list,
                                       QFileInfo(document_->path()).fileName());
}

void PlannerView::printDialog()
{
    if (!result_) return;
    QPrinter printer;
    QPrintDialog dialog(&printer, this);
    if (dialog.exec() != QDialog::Accepted) return;
    paint(printer, tabs_->currentIndex() == 3);
}

void PlannerView::savePdfDialog()
{
    if (!result_) return;
    const QString path = QFileDialog::getSaveFileName(this, tr("Save Scenario as PDF"), QString(), tr("PDF (*.pdf)"));
    if (path.isEmpty()) return;
    QPdfWriter writer(path);
    writer.setResolution(300);
    writer.setPageLayout(QPageLayout(QPageSize(QPageSize::A4), QPageLayout::Portrait, QMarginsF(16, 16, 16, 12),
                                     QPageLayout::Millimeter));
    try {
        paint(writer, tabs_->currentIndex() == 3);
    } catch (const std::exception& e) {
        problems_->setText(toQString(e.what()));
    }
}

} // namespace hierloom::ui
