// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/import_assistant_dialog.h"

#include "core/base/csv_reader.h"
#include "core/store/saved_mappings.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"

#include <QCheckBox>
#include <QComboBox>
#include <QFileDialog>
#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

#include <algorithm>

namespace hierloom::ui {

namespace {

constexpr int kPreviewRows = 12;

QString meaningTitle(core::ColumnMeaning m)
{
    switch (m) {
    case core::ColumnMeaning::Date: return ImportAssistantDialog::tr("&Date:");
    case core::ColumnMeaning::Time: return ImportAssistantDialog::tr("&Time:");
    case core::ColumnMeaning::Winner: return ImportAssistantDialog::tr("&Winner:");
    case core::ColumnMeaning::Loser: return ImportAssistantDialog::tr("&Loser:");
    case core::ColumnMeaning::Actor: return ImportAssistantDialog::tr("&Actor:");
    case core::ColumnMeaning::Recipient: return ImportAssistantDialog::tr("&Recipient:");
    case core::ColumnMeaning::Outcome: return ImportAssistantDialog::tr("O&utcome:");
    case core::ColumnMeaning::Behaviour: return ImportAssistantDialog::tr("&Behaviour:");
    case core::ColumnMeaning::Group: return ImportAssistantDialog::tr("&Group column:");
    case core::ColumnMeaning::Observer: return ImportAssistantDialog::tr("Obs&erver:");
    case core::ColumnMeaning::Note: return ImportAssistantDialog::tr("Note:");
    }
    return {};
}

std::vector<std::string> codeList(const QString& text)
{
    std::vector<std::string> out;
    for (const QString& part : text.split(QLatin1Char(','), Qt::SkipEmptyParts))
        if (!part.trimmed().isEmpty()) out.push_back(toStdString(part.trimmed()));
    return out;
}

QString codeText(const std::vector<std::string>& codes)
{
    QStringList parts;
    for (const std::string& c : codes) parts << toQString(c);
    return parts.join(QStringLiteral(", "));
}

void setComboData(QComboBox* combo, int value) { combo->setCurrentIndex(std::max(0, combo->findData(value))); }

} // namespace

ImportAssistantDialog::ImportAssistantDialog(ColonyEditFacade* facade, QWidget* parent)
    : QDialog(parent),
      facade_(facade),
      document_(facade->document()),
      path_(new QLineEdit(this)),
      browse_(new QPushButton(tr("Browse..."), this)),
      saved_(new QComboBox(this)),
      name_(new QLineEdit(this)),
      saveWith_(new QCheckBox(tr("Save the mapping under this name with the import"), this)),
      layout_(new QComboBox(this)),
      naming_(new QComboBox(this)),
      dates_(new QComboBox(this)),
      delimiter_(new QComboBox(this)),
      group_(new QLineEdit(this)),
      winCodes_(new QLineEdit(this)),
      lossCodes_(new QLineEdit(this)),
      drawCodes_(new QLineEdit(this)),
      dateNote_(new QLabel(this)),
      preview_(new QTableWidget(this)),
      unknown_(new QTableWidget(this)),
      problems_(new QPlainTextEdit(this)),
      check_(new QPushButton(tr("Chec&k"), this)),
      save_(new QPushButton(tr("&Save Mapping"), this)),
      import_(new QPushButton(tr("&Import"), this)),
      close_(new QPushButton(tr("Close"), this))
{
    setWindowTitle(tr("Import a Spreadsheet"));
    setObjectName(QStringLiteral("importAssistant"));
    path_->setObjectName(QStringLiteral("sheetPath"));
    path_->setPlaceholderText(tr("a CSV or TSV file saved from the spreadsheet"));
    name_->setObjectName(QStringLiteral("mappingName"));
    saved_->setObjectName(QStringLiteral("savedMapping"));
    layout_->addItem(tr("winner and loser columns"), static_cast<int>(core::SheetLayout::WinnerLoser));
    layout_->addItem(tr("actor, recipient and an outcome code"), static_cast<int>(core::SheetLayout::ActorRecipient));
    naming_->addItem(tr("ids"), static_cast<int>(core::AnimalNaming::Ids));
    naming_->addItem(tr("names"), static_cast<int>(core::AnimalNaming::Names));
    dates_->addItem(tr("decided by the file's dates"), static_cast<int>(core::DateOrder::Unset));
    dates_->addItem(tr("year-month-day (2023-10-05)"), static_cast<int>(core::DateOrder::Iso));
    dates_->addItem(tr("day/month/year (05/10/2023 = 5 October)"), static_cast<int>(core::DateOrder::DayMonthYear));
    dates_->addItem(tr("month/day/year (10/05/2023 = 5 October)"), static_cast<int>(core::DateOrder::MonthDayYear));
    dates_->setObjectName(QStringLiteral("dateOrder"));
    delimiter_->addItem(tr("found from the header"), static_cast<int>(core::SheetDelimiter::Auto));
    delimiter_->addItem(tr("comma"), static_cast<int>(core::SheetDelimiter::Comma));
    delimiter_->addItem(tr("tab"), static_cast<int>(core::SheetDelimiter::Tab));
    delimiter_->addItem(tr("semicolon"), static_cast<int>(core::SheetDelimiter::Semicolon));
    group_->setPlaceholderText(tr("one group for the whole file (when no column holds it)"));
    winCodes_->setPlaceholderText(tr("codes, separated by commas"));
    dateNote_->setObjectName(QStringLiteral("dateNote"));
    dateNote_->setWordWrap(true);

    auto* fileRow = new QHBoxLayout;
    fileRow->addWidget(path_, 1);
    fileRow->addWidget(browse_);
    auto* top = new QFormLayout;
    auto* sheetLabel = new QLabel(tr("S&heet:"), this); // a row of two widgets gets no buddy from the form
    sheetLabel->setBuddy(path_);
    top->addRow(sheetLabel, fileRow);
    top->addRow(tr("Sa&ved mapping:"), saved_);
    top->addRow(tr("&Mapping name:"), name_);
    top->addRow(QString(), saveWith_);

    auto* how = new QFormLayout;
    how->addRow(tr("La&yout:"), layout_);
    how->addRow(tr("Animals &named by:"), naming_);
    how->addRow(tr("Date &order:"), dates_);
    how->addRow(tr("Se&parator:"), delimiter_);
    how->addRow(tr("One group for the &file:"), group_);
    how->addRow(tr("Win &codes (actor won):"), winCodes_);
    how->addRow(tr("Loss codes (recipient won):"), lossCodes_);
    how->addRow(tr("Draw codes:"), drawCodes_);
    auto* columnsBox = new QGroupBox(tr("Columns"), this);
    auto* columnsForm = new QFormLayout(columnsBox);
    for (int k = 0; k < core::kColumnMeanings; ++k) {
        auto* combo = new QComboBox(columnsBox);
        combo->setObjectName(QStringLiteral("column-") + QString::fromLatin1(toString(static_cast<core::ColumnMeaning>(k))));
        columns_[static_cast<size_t>(k)] = combo;
        columnsForm->addRow(meaningTitle(static_cast<core::ColumnMeaning>(k)), combo);
    }
    auto* choices = new QHBoxLayout;
    auto* howBox = new QGroupBox(tr("How the sheet is written"), this);
    howBox->setLayout(how);
    choices->addWidget(howBox, 1);
    choices->addWidget(columnsBox, 1);

    preview_->setObjectName(QStringLiteral("preview"));
    preview_->setColumnCount(8);
    preview_->setHorizontalHeaderLabels({tr("Line"), tr("Date"), tr("Time"), tr("Winner"), tr("Loser"), tr("Outcome"),
                                         tr("Group"), tr("Problem")});
    preview_->horizontalHeader()->setStretchLastSection(true);
    preview_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    preview_->verticalHeader()->hide();
    unknown_->setObjectName(QStringLiteral("unknownNames"));
    unknown_->setColumnCount(5);
    unknown_->setHorizontalHeaderLabels({tr("Name in the sheet"), tr("Rows"), tr("Animal id"), tr("Add as new animal"),
                                         tr("Sex of a new animal (F, M, U)")});
    unknown_->horizontalHeader()->setStretchLastSection(true);
    unknown_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    unknown_->setEditTriggers(QAbstractItemView::AllEditTriggers);
    unknown_->verticalHeader()->hide();
    problems_->setObjectName(QStringLiteral("importProblems"));
    problems_->setReadOnly(true);
    problems_->setMaximumBlockCount(400);

    auto* buttons = new QHBoxLayout;
    buttons->addStretch();
    auto* cancel = close_;
    browse_->setAutoDefault(false); // Enter in the path field reads the sheet, never opens the file chooser
    for (QPushButton* b : {check_, save_, import_, cancel}) {
        b->setAutoDefault(false);
        buttons->addWidget(b);
    }
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(top);
    layout->addLayout(choices);
    layout->addWidget(dateNote_);
    layout->addWidget(new QLabel(tr("The first rows as they will be imported:"), this));
    layout->addWidget(preview_, 2);
    layout->addWidget(new QLabel(tr("Names that match no animal: give the id of the animal they are, or tick "
                                    "\"Add as new animal\" and give the new animal's id and sex:"),
                                 this));
    layout->addWidget(unknown_, 1);
    layout->addWidget(problems_, 1);
    layout->addLayout(buttons);
    resize(1000, 800);

    saved_->addItem(tr("(a new mapping)"));
    if (const core::ColonyStore* store = document_->store())
        for (const std::string& n : core::savedMappingNames(*store)) saved_->addItem(toQString(n));

    connect(browse_, &QPushButton::clicked, this, [this] {
        const QString file = QFileDialog::getOpenFileName(this, tr("Spreadsheet to import"), QString(),
                                                          tr("CSV or TSV (*.csv *.tsv *.txt);;All files (*)"));
        if (file.isEmpty()) return;
        path_->setText(file);
        loadSheet();
    });
    connect(path_, &QLineEdit::editingFinished, this, &ImportAssistantDialog::loadSheet);
    connect(saved_, &QComboBox::activated, this, &ImportAssistantDialog::useSavedMapping);
    for (QComboBox* c : {layout_, naming_, dates_})
        connect(c, &QComboBox::currentIndexChanged, this, &ImportAssistantDialog::refresh);
    connect(delimiter_, &QComboBox::currentIndexChanged, this, &ImportAssistantDialog::loadSheet);
    for (QComboBox* c : columns_) connect(c, &QComboBox::currentIndexChanged, this, &ImportAssistantDialog::refresh);
    for (QLineEdit* e : {group_, winCodes_, lossCodes_, drawCodes_})
        connect(e, &QLineEdit::textChanged, this, &ImportAssistantDialog::refresh);
    connect(unknown_, &QTableWidget::itemChanged, this, [this] {
        if (filling_) return;
        names_.clear();
        for (int r = 0; r < unknown_->rowCount(); ++r) {
            core::NameChoice c;
            c.sheetName = toStdString(unknown_->item(r, 0)->text());
            c.animalId = toStdString(unknown_->item(r, 2)->text().trimmed());
            c.addNew = unknown_->item(r, 3)->checkState() == Qt::Checked;
            c.sex = core::parseSex(toStdString(unknown_->item(r, 4)->text().trimmed())).value_or(core::Sex::Unknown);
            names_.push_back(std::move(c));
        }
        refresh();
    });
    connect(check_, &QPushButton::clicked, this, &ImportAssistantDialog::check);
    connect(save_, &QPushButton::clicked, this, &ImportAssistantDialog::saveMapping);
    connect(import_, &QPushButton::clicked, this, &ImportAssistantDialog::runImport);
    connect(cancel, &QPushButton::clicked, this, [this] { done(result()); }); // Accepted once something was imported
    saveWith_->setObjectName(QStringLiteral("saveWithImport"));
    saveWith_->setChecked(true);
    saveWith_->setToolTip(tr("Saved in the same write as the records: a refused import saves nothing."));
    connect(name_, &QLineEdit::textChanged, this,
            [this](const QString& text) { saveWith_->setEnabled(!text.trimmed().isEmpty()); });
    saveWith_->setEnabled(false);

    // Tab follows the form as it reads: the sheet, how it is written, its
    // columns, then the tables and the buttons (the column boxes are made
    // last, so creation order would put them after the buttons). The preview
    // is read-only: Tab leaves it instead of walking its cells.
    preview_->setTabKeyNavigation(false);
    std::vector<QWidget*> order{path_, browse_, saved_, name_, saveWith_, layout_, naming_, dates_, delimiter_,
                                group_, winCodes_, lossCodes_, drawCodes_};
    order.insert(order.end(), columns_.begin(), columns_.end());
    for (QWidget* w : std::initializer_list<QWidget*>{preview_, unknown_, problems_, check_, save_, import_, cancel})
        order.push_back(w);
    for (size_t i = 1; i < order.size(); ++i) setTabOrder(order[i - 1], order[i]);
    refreshHeaders();
    refresh();
}

core::ImportMapping ImportAssistantDialog::mapping() const
{
    core::ImportMapping m;
    m.name = toStdString(name_->text().trimmed());
    m.layout = static_cast<core::SheetLayout>(layout_->currentData().toInt());
    m.naming = static_cast<core::AnimalNaming>(naming_->currentData().toInt());
    m.dates = static_cast<core::DateOrder>(dates_->currentData().toInt());
    m.delimiter = static_cast<core::SheetDelimiter>(delimiter_->currentData().toInt());
    for (size_t k = 0; k < columns_.size(); ++k)
        if (columns_[k]->currentIndex() > 0) m.columns[k] = toStdString(columns_[k]->currentText());
    m.fileGroup = toStdString(group_->text().trimmed());
    m.winCodes = codeList(winCodes_->text());
    m.lossCodes = codeList(lossCodes_->text());
    m.drawCodes = codeList(drawCodes_->text());
    for (const core::NameChoice& c : names_)
        if (!c.animalId.empty()) m.names.push_back(c);
    return m;
}

void ImportAssistantDialog::setMapping(const core::ImportMapping& m)
{
    {
        const QSignalBlocker b1(layout_), b2(naming_), b3(dates_), b4(delimiter_);
        filling_ = true;
        name_->setText(toQString(m.name));
        setComboData(layout_, static_cast<int>(m.layout));
        setComboData(naming_, static_cast<int>(m.naming));
        setComboData(dates_, static_cast<int>(m.dates));
        setComboData(delimiter_, static_cast<int>(m.delimiter));
        group_->setText(toQString(m.fileGroup));
        winCodes_->setText(codeText(m.winCodes));
        lossCodes_->setText(codeText(m.lossCodes));
        drawCodes_->setText(codeText(m.drawCodes));
        names_ = m.names;
        filling_ = false;
    }
    loadSheet();
    for (size_t k = 0; k < columns_.size(); ++k) {
        const QSignalBlocker block(columns_[k]);
        const int at = m.columns[k].empty() ? 0 : columns_[k]->findText(toQString(m.columns[k]), Qt::MatchFixedString);
        columns_[k]->setCurrentIndex(std::max(0, at));
    }
    refresh();
}

void ImportAssistantDialog::useSavedMapping()
{
    if (saved_->currentIndex() <= 0 || !document_->store()) return;
    const auto text = core::savedMappingText(*document_->store(), toStdString(saved_->currentText()));
    if (!text) return;
    const core::MappingFile file = core::readMappingFile(toStdString(saved_->currentText()), *text);
    if (!file.ok()) {
        problems_->setPlainText(toQString(file.problems.text()));
        return;
    }
    setMapping(file.mapping);
}

void ImportAssistantDialog::loadSheet()
{
    sheet_ = {};
    const QString path = path_->text().trimmed();
    if (!path.isEmpty()) {
        try {
            sheet_ = {toStdString(path), core::readWholeFile(toStdString(path))};
        } catch (const std::exception&) {
            problems_->setPlainText(tr("%1 cannot be read (no such file, or no permission to read it).").arg(path));
            sheet_ = {};
        }
    }
    refreshHeaders();
    refresh();
}

void ImportAssistantDialog::refreshHeaders()
{
    const std::vector<std::string> header =
        sheet_.name.empty() ? std::vector<std::string>{}
                            : core::sheetHeader(sheet_, static_cast<core::SheetDelimiter>(delimiter_->currentData().toInt()));
    for (size_t k = 0; k < columns_.size(); ++k) {
        QComboBox* combo = columns_[k];
        const QString current = combo->currentIndex() > 0 ? combo->currentText() : QString();
        const QSignalBlocker block(combo);
        combo->clear();
        combo->addItem(tr("(not in the sheet)"));
        for (const std::string& h : header) combo->addItem(toQString(h));
        int at = current.isEmpty() ? -1 : combo->findText(current, Qt::MatchFixedString);
        // A header spelled like the meaning itself is offered (dates are never guessed: their order is asked).
        if (at < 0) at = combo->findText(QString::fromLatin1(toString(static_cast<core::ColumnMeaning>(k))), Qt::MatchFixedString);
        combo->setCurrentIndex(std::max(0, at));
    }
}

void ImportAssistantDialog::refresh()
{
    if (filling_) return;
    const core::ImportMapping m = mapping();
    const bool actor = m.layout == core::SheetLayout::ActorRecipient;
    for (auto meaning : {core::ColumnMeaning::Winner, core::ColumnMeaning::Loser})
        columns_[static_cast<size_t>(meaning)]->setEnabled(!actor);
    for (auto meaning : {core::ColumnMeaning::Actor, core::ColumnMeaning::Recipient})
        columns_[static_cast<size_t>(meaning)]->setEnabled(actor);
    lossCodes_->setEnabled(actor);
    translation_ = {};
    preview_->setRowCount(0);
    if (sheet_.name.empty()) {
        dateNote_->setText(tr("Choose the sheet to import."));
        import_->setEnabled(false);
        refreshUnknownNames();
        return;
    }
    translation_ = core::translateSheet(m, sheet_, document_->pedigree().animals);

    // The date order: said plainly, never guessed.
    const core::DateOrderFinding& f = translation_.dateFinding;
    QString note;
    if (m.dates == core::DateOrder::Unset) {
        if (!f.ambiguousDate.empty())
            note = tr("Choose the date order: %1 (line %2), and no date of the sheet reads only one way.")
                       .arg(toQString(core::bothReadings(f.ambiguousDate)))
                       .arg(f.ambiguousLine);
        else if (f.decided && !f.decidingDate.empty())
            note = tr("Dates read as %1: '%2' (line %3) reads no other way.")
                       .arg(QString::fromLatin1(core::datePattern(*f.decided)), toQString(f.decidingDate))
                       .arg(f.decidingLine);
        else if (f.decided)
            note = tr("Dates read as %1 (every date reads the same either way).")
                       .arg(QString::fromLatin1(core::datePattern(*f.decided)));
        else if (!f.fitting.empty() || !translation_.rows.empty())
            note = tr("The dates fit none of the forms YYYY-MM-DD, DD/MM/YYYY, MM/DD/YYYY throughout.");
    } else {
        note = tr("Dates read as %1, as chosen.").arg(QString::fromLatin1(core::datePattern(m.dates)));
        if (f.decided && *f.decided != m.dates && !f.decidingDate.empty())
            note += QLatin1Char(' ') + tr("But '%1' (line %2) can only be %3.")
                                           .arg(toQString(f.decidingDate))
                                           .arg(f.decidingLine)
                                           .arg(QString::fromLatin1(core::datePattern(*f.decided)));
    }
    dateNote_->setText(note);

    const int shown = std::min<int>(kPreviewRows, static_cast<int>(translation_.rows.size()));
    preview_->setRowCount(shown);
    for (int r = 0; r < shown; ++r) {
        const core::SheetRow& row = translation_.rows[static_cast<size_t>(r)];
        const core::Encounter& e = row.encounter;
        QStringList problems;
        for (const core::FieldProblem& p : row.problems) problems << toQString(p.field + ": " + p.message);
        const QStringList cells = {QString::number(row.line),
                                   row.dateRead ? toQString(core::formatDate(e.date)) : QString(),
                                   e.time ? toQString(core::formatTimeOfDay(*e.time)) : QString(),
                                   toQString(e.winner),
                                   toQString(e.loser),
                                   QString::fromLatin1(toString(e.outcome)),
                                   toQString(e.group),
                                   problems.join(QStringLiteral("; "))};
        for (int c = 0; c < cells.size(); ++c) preview_->setItem(r, c, new QTableWidgetItem(cells[c]));
    }
    problems_->setPlainText(
        translation_.problems.empty()
            ? tr("Rows read without a problem: %1. Check tests them against the import's rules without writing; "
                 "Import writes them.")
                  .arg(translation_.rows.size())
            : toQString(translation_.problems.text()));
    import_->setEnabled(translation_.problems.empty() && !document_->isReadOnly());
    refreshUnknownNames();
}

void ImportAssistantDialog::refreshUnknownNames()
{
    filling_ = true;
    std::vector<core::NameChoice> rows = names_;
    std::vector<int> counts(rows.size(), 0);
    for (const core::UnknownName& u : translation_.unknownNames) {
        bool known = false;
        for (const core::NameChoice& c : rows) known = known || core::sameSheetText(c.sheetName, u.name);
        if (known) continue;
        rows.push_back({u.name, {}, false, core::Sex::Unknown});
        counts.push_back(u.rows);
    }
    // A name already chosen for is no longer unknown: its rows are counted in the sheet itself.
    std::vector<size_t> nameColumns;
    for (size_t c = 0; c < translation_.header.size(); ++c)
        if (translation_.header[c] == translation_.firstHeader || translation_.header[c] == translation_.secondHeader)
            nameColumns.push_back(c);
    for (size_t i = 0; i < names_.size(); ++i)
        for (const core::SheetRow& row : translation_.rows)
            if (std::any_of(nameColumns.begin(), nameColumns.end(), [&](size_t c) {
                    return c < row.cells.size() && core::sameSheetText(row.cells[c], names_[i].sheetName);
                }))
                ++counts[i];
    unknown_->setRowCount(static_cast<int>(rows.size()));
    for (int r = 0; r < static_cast<int>(rows.size()); ++r) {
        const core::NameChoice& c = rows[static_cast<size_t>(r)];
        auto* name = new QTableWidgetItem(toQString(c.sheetName));
        name->setFlags(name->flags() & ~Qt::ItemIsEditable);
        auto* count = new QTableWidgetItem(counts[static_cast<size_t>(r)] ? QString::number(counts[static_cast<size_t>(r)])
                                                                            : QString());
        count->setFlags(count->flags() & ~Qt::ItemIsEditable);
        auto* addNew = new QTableWidgetItem;
        addNew->setFlags((addNew->flags() | Qt::ItemIsUserCheckable) & ~Qt::ItemIsEditable);
        addNew->setCheckState(c.addNew ? Qt::Checked : Qt::Unchecked);
        unknown_->setItem(r, 0, name);
        unknown_->setItem(r, 1, count);
        unknown_->setItem(r, 2, new QTableWidgetItem(toQString(c.animalId)));
        unknown_->setItem(r, 3, addNew);
        unknown_->setItem(r, 4, new QTableWidgetItem(c.addNew ? QString::fromLatin1(toString(c.sex)) : QString()));
    }
    filling_ = false;
}

bool ImportAssistantDialog::check()
{
    refresh();
    if (sheet_.name.empty()) return false;
    const core::Colony& colony = document_->pedigree();
    const core::ImportPlan plan =
        core::planSheetImport(mapping(), sheet_, colony.animals, colony.residences, facade_->today());
    if (!plan.ok()) {
        problems_->setPlainText(toQString(plan.problems.text()));
        return false;
    }
    problems_->setPlainText(tr("Every row passes: %1 encounters and %2 new animals would be imported.")
                                .arg(plan.encounters.size())
                                .arg(plan.animals.size()));
    return true;
}

bool ImportAssistantDialog::runImport()
{
    QString readBack;
    const core::ImportMapping m = mapping();
    const bool save = saveWith_->isEnabled() && saveWith_->isChecked();
    const core::ImportResult r = facade_->importSheet(m, path_->text().trimmed(), &readBack, save);
    if (!r.ok()) {
        problems_->setPlainText((save ? tr("Nothing was imported and the mapping was not saved; the colony is "
                                           "unchanged.\n")
                                      : tr("Nothing was imported; the colony is unchanged.\n")) +
                                toQString(r.problems.text()));
        return false;
    }
    QString done = tr("Imported %1 encounters and %2 new animals.").arg(r.encounters).arg(r.animals);
    if (save) {
        done += QLatin1Char(' ') + tr("Saved the mapping as \"%1\" in the colony file.").arg(toQString(m.name));
        if (saved_->findText(toQString(m.name)) < 0) saved_->addItem(toQString(m.name));
    }
    problems_->setPlainText(done + (readBack.isEmpty() ? QString() : QLatin1Char('\n') + readBack));
    // The dialog stays open so the outcome can be read; the same sheet is not imported twice by a second press.
    setResult(QDialog::Accepted);
    import_->setEnabled(false);
    close_->setFocus();
    return true;
}

bool ImportAssistantDialog::saveMapping()
{
    const core::ImportMapping m = mapping();
    const auto structural = core::mappingProblems(m);
    if (!structural.empty()) {
        QStringList lines;
        for (const std::string& p : structural) lines << toQString(p);
        problems_->setPlainText(tr("The mapping is not complete:\n") + lines.join(QLatin1Char('\n')));
        return false;
    }
    const core::FieldProblems problems = facade_->saveMapping(m);
    if (!problems.empty()) {
        problems_->setPlainText(toQString(problems.front().message));
        return false;
    }
    if (saved_->findText(toQString(m.name)) < 0) saved_->addItem(toQString(m.name));
    problems_->setPlainText(tr("Saved the mapping as \"%1\" in the colony file.").arg(toQString(m.name)));
    return true;
}

} // namespace hierloom::ui
