// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/research_export_dialog.h"

#include "core/research/data_health.h"

#include "core/base/civil_date.h"
#include "core/ranks/rank_method_registry.h"
#include "core/research/species_profile.h"
#include "core/store/species_settings.h"
#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/widgets/help_button.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_queries.h"

#include <QApplication>
#include <QCheckBox>
#include <QComboBox>
#include <QDialogButtonBox>
#include <QDir>
#include <QFileDialog>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QMenu>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

#include <stdexcept>

namespace hierloom::ui {

ResearchExportDialog::ResearchExportDialog(ColonyDocument* document, QWidget* parent)
    : QDialog(parent),
      document_(document),
      period_(new QComboBox(this)),
      windows_(new QPlainTextEdit(this)),
      method_(new QComboBox(this)),
      group_(new QComboBox(this)),
      from_(new QLineEdit(this)),
      to_(new QLineEdit(this)),
      randomisations_(new QSpinBox(this)),
      folder_(new QLineEdit(this)),
      spreadsheet_(new QCheckBox(tr("Spreadsheet-friendly (UTF-8 byte-order mark in each file)"), this)),
      health_(new QCheckBox(tr("Data health in the rank table (encounters, too few for a stable rank)"), this)),
      report_(new QLabel(this))
{
    health_->setObjectName(QStringLiteral("exportHealth"));
    health_->setToolTip(tr("Ends ranks_by_period with encounters and few_encounters (fewer than %1 encounters behind "
                           "the rank), as export-tables --health")
                            .arg(core::kDefaultMinEncounters));
    setWindowTitle(tr("Export Research Tables"));
    period_->addItem(tr("Whole window as one period"), QStringLiteral("whole"));
    period_->addItem(tr("Days"), QStringLiteral("day"));
    period_->addItem(tr("Weeks"), QStringLiteral("week"));
    period_->addItem(tr("Months"), QStringLiteral("month"));
    period_->addItem(tr("Years"), QStringLiteral("year"));
    period_->addItem(tr("Custom windows"), QStringLiteral("custom"));
    windows_->setPlaceholderText(tr("One window per line: YYYY-MM-DD,YYYY-MM-DD"));
    windows_->setMaximumHeight(70);
    windows_->setEnabled(false);
    for (const core::RankMethodInfo& m : core::rankMethods())
        method_->addItem(QCoreApplication::translate("hierloom::core::RankMethod", m.displayName),
                         QString::fromLatin1(m.code));
    group_->addItem(tr("All groups"), QString());
    for (const QString& g : groupsWithEncounters(document_)) group_->addItem(g, g);
    from_->setPlaceholderText(tr("YYYY-MM-DD (empty: from the start)"));
    to_->setPlaceholderText(tr("YYYY-MM-DD (empty: to the end)"));
    randomisations_->setRange(0, 100000);
    randomisations_->setToolTip(tr("Randomisations of the per-period tests in the metrics table (0: tests skipped)"));
    auto* browse = new QPushButton(tr("Browse..."), this);
    auto* folderRow = new QHBoxLayout;
    folderRow->addWidget(folder_, 1);
    folderRow->addWidget(browse);
    report_->setObjectName(QStringLiteral("exportReport"));
    report_->setWordWrap(true);
    report_->setTextInteractionFlags(Qt::TextSelectableByMouse);

    auto* form = new QFormLayout;
    form->addRow(tr("Periods:"), period_);
    form->addRow(tr("Custom windows:"), windows_);
    form->addRow(tr("Rank method:"), method_);
    form->addRow(tr("Group:"), group_);
    form->addRow(tr("From:"), from_);
    form->addRow(tr("To:"), to_);
    form->addRow(tr("Randomisations:"), randomisations_);
    form->addRow(tr("Folder:"), folderRow);
    form->addRow(QString(), spreadsheet_);
    form->addRow(QString(), health_);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    QPushButton* exportButton = buttons->addButton(tr("Export"), QDialogButtonBox::ActionRole);
    auto* helpRow = new QHBoxLayout;
    helpRow->addWidget(new QLabel(tr("Gestation length and maturity age come from the colony's species setting "
                                     "(Sex Ratio tab)."),
                                  this),
                       1);
    helpRow->addWidget(new HelpButton(QStringLiteral("maternal_rank"), this));
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addLayout(helpRow);
    layout->addWidget(report_);
    layout->addWidget(buttons);

    connect(period_, &QComboBox::currentIndexChanged, this,
            [this] { windows_->setEnabled(period_->currentData().toString() == QLatin1String("custom")); });
    connect(browse, &QPushButton::clicked, this, &ResearchExportDialog::chooseFolder);
    connect(exportButton, &QPushButton::clicked, this, &ResearchExportDialog::exportTables);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
}

void ResearchExportDialog::setPeriod(const QString& period) { period_->setCurrentIndex(period_->findData(period)); }
void ResearchExportDialog::setCustomWindows(const QString& lines) { windows_->setPlainText(lines); }
void ResearchExportDialog::setMethod(const QString& method) { method_->setCurrentIndex(method_->findData(method)); }
void ResearchExportDialog::setGroup(const QString& group) { group_->setCurrentIndex(std::max(0, group_->findData(group))); }
void ResearchExportDialog::setWindow(const QString& from, const QString& to)
{
    from_->setText(from);
    to_->setText(to);
}
void ResearchExportDialog::setRandomisations(int n) { randomisations_->setValue(n); }
void ResearchExportDialog::setFolder(const QString& folder) { folder_->setText(folder); }
void ResearchExportDialog::setSpreadsheet(bool on) { spreadsheet_->setChecked(on); }

void ResearchExportDialog::chooseFolder()
{
    const QString dir = QFileDialog::getExistingDirectory(this, tr("Folder for the Research Tables"), folder_->text());
    if (!dir.isEmpty()) folder_->setText(QDir::toNativeSeparators(dir));
}

std::optional<core::ResearchExportOptions> ResearchExportDialog::options(QString* error) const
{
    core::ResearchExportOptions o;
    auto date = [&](QLineEdit* edit, const QString& what, std::optional<core::Day>& out) {
        const QString text = edit->text().trimmed();
        if (text.isEmpty()) return true;
        out = core::parseDate(toStdString(text));
        if (!out) *error = tr("%1: '%2' is not a date YYYY-MM-DD.").arg(what, text);
        return out.has_value();
    };
    if (!date(from_, tr("From"), o.selection.from) || !date(to_, tr("To"), o.selection.to)) return std::nullopt;
    if (o.selection.from && o.selection.to && *o.selection.from > *o.selection.to) {
        *error = tr("From is after To.");
        return std::nullopt;
    }
    o.selection.group = toStdString(group_->currentData().toString());
    o.ranks.method = *core::parseRankMethod(toStdString(method_->currentData().toString()));
    // The colony's analysis settings, as the `export-tables` command uses them.
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    o.ranks.elo = settings.elo;
    // Elo's start rule and the foresight's sibling rule follow the colony's setting, as export-tables does.
    if (o.ranks.method == core::RankMethod::Elo) o.ranks.startRule = settings.startRule;
    if (settings.startRule == core::EloStartRule::Eldest) o.foresightRule = core::SiblingRule::Eldest;
    o.selection.draws = settings.elo.draws;
    const QString period = period_->currentData().toString();
    if (period == QLatin1String("custom")) {
        for (const QString& raw : windows_->toPlainText().split(QLatin1Char('\n'))) {
            const QString line = raw.trimmed();
            if (line.isEmpty()) continue;
            const QStringList ends = line.split(QLatin1Char(','));
            const auto a = ends.size() == 2 ? core::parseDate(toStdString(ends[0].trimmed())) : std::nullopt;
            const auto b = ends.size() == 2 ? core::parseDate(toStdString(ends[1].trimmed())) : std::nullopt;
            if (!a || !b || *a > *b) {
                *error = tr("Custom window '%1' is not FROM,TO with two dates YYYY-MM-DD, FROM not after TO.").arg(line);
                return std::nullopt;
            }
            o.windows.push_back({*a, *b});
        }
        if (o.windows.empty()) {
            *error = tr("Enter at least one custom window, or choose regular periods.");
            return std::nullopt;
        }
    } else if (period != QLatin1String("whole")) {
        o.every = core::parsePeriodLength(toStdString(period));
    }
    o.randomisations = randomisations_->value();
    if (health_->isChecked()) o.healthMinEncounters = core::kDefaultMinEncounters;
    core::SpeciesSettings species;
    species.gestationDays = core::findSpecies(species.species)->gestationDays;
    species.maturityYears = core::findSpecies(species.species)->maturityYears;
    if (const core::ColonyStore* store = document_->store()) {
        try {
            species = core::readSpeciesSettings(*store);
        } catch (const std::invalid_argument& e) {
            *error = tr("The colony's species setting is not valid: %1").arg(QString::fromUtf8(e.what()));
            return std::nullopt;
        }
    }
    o.gestationDays = species.gestationDays;
    o.maturityYears = species.maturityYears;
    return o;
}

bool ResearchExportDialog::exportTables()
{
    written_.clear();
    QString error;
    const std::optional<core::ResearchExportOptions> o = options(&error);
    if (!o) {
        report_->setText(error);
        return false;
    }
    const QString folder = folder_->text().trimmed();
    if (folder.isEmpty()) {
        report_->setText(tr("Choose a folder for the tables."));
        return false;
    }
    // A large file not read whole: the tables need every encounter.
    document_->readEverything();
    document_->finishLoading();
    QApplication::setOverrideCursor(Qt::WaitCursor);
    try {
        const std::vector<core::ExportTable> tables = core::researchTables(document_->colonyFor({}), document_->residences(), *o);
        core::writeTableSet(tables, toStdString(QDir::fromNativeSeparators(folder)), spreadsheet_->isChecked());
        QStringList lines;
        for (const core::ExportTable& t : tables) {
            written_ << QDir(folder).filePath(toQString(t.name) + QStringLiteral(".csv"));
            lines << tr("%1.csv (%2 rows)").arg(toQString(t.name)).arg(t.rows.size());
        }
        report_->setText(tr("Wrote %1 files to %2:\n%3").arg(tables.size()).arg(folder, lines.join(QLatin1Char('\n'))));
    } catch (const std::exception& e) {
        report_->setText(tr("The tables could not be written: %1").arg(QString::fromUtf8(e.what())));
        QApplication::restoreOverrideCursor();
        return false;
    }
    QApplication::restoreOverrideCursor();
    return true;
}

QString ResearchExportDialog::report() const { return report_->text(); }

void addResearchExportAction(QMenu* menu, QWidget* window, ColonyDocument* document)
{
    QAction* action = menu->addAction(ResearchExportDialog::tr("Export &Research Tables..."), window, [window, document] {
        ResearchExportDialog dialog(document, window);
        dialog.exec();
    });
    action->setEnabled(document->isOpen());
    QObject::connect(document, &ColonyDocument::changed, action, [action, document] { action->setEnabled(document->isOpen()); });
}

} // namespace hierloom::ui
