// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/encounter_view.h"

#include "ui/document/colony_document.h"
#include "ui/widgets/table_columns.h"
#include "ui/records/encounter_table_model.h"
#include "ui/document/qt_convert.h"

#include <QCheckBox>
#include <QComboBox>
#include <QDateEdit>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QLocale>
#include <QSignalBlocker>
#include <QTableView>
#include <QVBoxLayout>

#include <algorithm>

namespace hierloom::ui {

namespace {

QDateEdit* makeDateEdit(QWidget* parent)
{
    auto* edit = new QDateEdit(parent);
    edit->setCalendarPopup(true);
    edit->setDisplayFormat(QStringLiteral("yyyy-MM-dd"));
    edit->setEnabled(false);
    return edit;
}

} // namespace

EncounterView::EncounterView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      model_(new EncounterTableModel(document, this)),
      fromCheck_(new QCheckBox(tr("Fr&om"), this)),
      from_(makeDateEdit(this)),
      toCheck_(new QCheckBox(tr("&To"), this)),
      to_(makeDateEdit(this)),
      animal_(new QComboBox(this)),
      observer_(new QComboBox(this)),
      summary_(new QLabel(this)),
      table_(new QTableView(this))
{
    animal_->setMinimumContentsLength(8);
    animal_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
    auto* animalLabel = new QLabel(tr("A&nimal:"), this);
    animalLabel->setBuddy(animal_);
    auto* observerLabel = new QLabel(tr("O&bserver:"), this);
    observerLabel->setBuddy(observer_);

    search_ = new QLineEdit(this);
    search_->setObjectName(QStringLiteral("encounterSearch"));
    search_->setPlaceholderText(tr("Search encounters and notes"));
    search_->setToolTip(tr("Shows the encounters whose animal ids, behaviour, group, observer or note contain this text "
                           "(upper or lower case alike)"));
    search_->setClearButtonEnabled(true);
    auto* filters = new QHBoxLayout;
    filters->addWidget(fromCheck_);
    filters->addWidget(from_);
    filters->addWidget(toCheck_);
    filters->addWidget(to_);
    filters->addSpacing(12);
    filters->addWidget(animalLabel);
    filters->addWidget(animal_);
    filters->addSpacing(12);
    filters->addWidget(observerLabel);
    filters->addWidget(observer_);
    filters->addSpacing(12);
    filters->addWidget(search_, 1);
    filters->addWidget(summary_);

    table_->setModel(model_);
    table_->setSelectionBehavior(QAbstractItemView::SelectRows);
    table_->setAlternatingRowColors(true);
    table_->setWordWrap(false);
    table_->verticalHeader()->hide();
    // Compact rows: a colony's tables are read like a ledger.
    table_->verticalHeader()->setDefaultSectionSize(table_->fontMetrics().height() + 8);
    // Fixed row heights keep scrolling through a million rows cheap.
    table_->verticalHeader()->setSectionResizeMode(QHeaderView::Fixed);
    table_->horizontalHeader()->setStretchLastSection(true);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(filters);
    layout->addWidget(table_, 1);

    connect(fromCheck_, &QCheckBox::toggled, from_, &QWidget::setEnabled);
    connect(toCheck_, &QCheckBox::toggled, to_, &QWidget::setEnabled);
    for (QCheckBox* check : {fromCheck_, toCheck_}) connect(check, &QCheckBox::toggled, this, &EncounterView::applyFilter);
    for (QDateEdit* edit : {from_, to_}) connect(edit, &QDateEdit::dateChanged, this, &EncounterView::applyFilter);
    for (QComboBox* combo : {animal_, observer_})
        connect(combo, &QComboBox::currentIndexChanged, this, &EncounterView::applyFilter);
    connect(search_, &QLineEdit::textChanged, this, &EncounterView::applyFilter);
    connect(model_, &QAbstractItemModel::modelReset, this, &EncounterView::updateSummary);
    // The model rebuilt itself on the same signal first (it connected earlier).
    connect(document_, &ColonyDocument::changed, this, &EncounterView::refillChoices);
    refillChoices();
}

void EncounterView::refillChoices()
{
    const ColonyDocument::Change& change = document_->lastChange();
    if (change.kind == ColonyDocument::ChangeKind::SettingsChanged) return; // nothing here comes from settings
    if (change.kind == ColonyDocument::ChangeKind::EncountersAppended) {
        // An evening's line: the table placed its row already; only a new
        // observer and a later or earlier date can change the choices. No
        // scan of every encounter and no re-fitting of the columns per Enter.
        const QSignalBlocker blockObserver(observer_), blockFrom(from_), blockTo(to_);
        if (observer_->count() - 1 != static_cast<int>(model_->observers().size())) {
            const QVariant observer = observer_->currentData();
            observer_->clear();
            observer_->addItem(tr("Any observer"));
            for (const QString& name : model_->observers())
                observer_->addItem(name.isEmpty() ? tr("(none recorded)") : name, name);
            observer_->setCurrentIndex(observer.isValid() ? std::max(0, observer_->findData(observer)) : 0);
        }
        const core::EncounterRecords& encounters = document_->encounters();
        for (size_t i = change.firstAppended; i < encounters.size(); ++i) {
            const QDate day = toQDate(encounters.record(i).date);
            const bool first = i == 0; // the colony's first encounter: the range is its day
            if (!fromCheck_->isChecked() && (first || day < from_->date())) from_->setDate(day);
            if (!toCheck_->isChecked() && (first || day > to_->date())) to_->setDate(day);
        }
        updateSummary();
        return;
    }
    const QSignalBlocker blockAnimal(animal_), blockObserver(observer_), blockFrom(from_), blockTo(to_);
    const QString animal = animal_->currentData().toString();
    const QVariant observer = observer_->currentData();

    // The animal list comes from the animals alone (thousands in a centre):
    // not rebuilt when only encounters changed, or a group was read.
    if (change.kind != ColonyDocument::ChangeKind::EncountersChanged || animal_->count() == 1) {
        std::vector<QString> ids;
        for (const core::Animal& a : document_->pedigree().animals) ids.push_back(toQString(a.id));
        std::sort(ids.begin(), ids.end());
        animal_->clear();
        animal_->addItem(tr("Any animal"), QString());
        for (const QString& id : ids) animal_->addItem(id, id);
        animal_->setCurrentIndex(std::max(0, animal_->findData(animal)));
    }

    observer_->clear();
    observer_->addItem(tr("Any observer"));
    for (const QString& name : model_->observers())
        observer_->addItem(name.isEmpty() ? tr("(none recorded)") : name, name);
    observer_->setCurrentIndex(observer.isValid() ? std::max(0, observer_->findData(observer)) : 0);

    // Offer the recorded span as the range, keeping a range the user set.
    const auto& encounters = document_->encounters().compact().records;
    if (!encounters.empty()) {
        const auto [first, last] = std::minmax_element(encounters.begin(), encounters.end(),
                                                       [](const auto& a, const auto& b) { return a.date < b.date; });
        if (!fromCheck_->isChecked()) from_->setDate(toQDate(first->date));
        if (!toCheck_->isChecked()) to_->setDate(toQDate(last->date));
    }
    applyFilter();
    fitColumns(table_);
}

void EncounterView::applyFilter()
{
    EncounterFilter filter;
    if (fromCheck_->isChecked()) filter.from = toDay(from_->date());
    if (toCheck_->isChecked()) filter.to = toDay(to_->date());
    filter.animal = toStdString(animal_->currentData().toString());
    const QVariant observer = observer_->currentData();
    if (observer.isValid()) filter.observer = toStdString(observer.toString());
    filter.text = toStdString(search_->text().trimmed().toLower());
    model_->setFilter(filter);
    updateSummary();
}

void EncounterView::updateSummary()
{
    summary_->setText(tr("%1 of %2 encounters").arg(QLocale().toString(model_->rowCount()),
                                                     QLocale().toString(model_->totalCount())));
}

int EncounterView::visibleRowCount() const { return model_->rowCount(); }

void EncounterView::setDateRange(const QDate& from, const QDate& to)
{
    fromCheck_->setChecked(from.isValid());
    if (from.isValid()) from_->setDate(from);
    toCheck_->setChecked(to.isValid());
    if (to.isValid()) to_->setDate(to);
}

void EncounterView::setAnimal(const QString& id) { animal_->setCurrentIndex(std::max(0, animal_->findData(id))); }

void EncounterView::setObserver(const QString& name)
{
    observer_->setCurrentIndex(name.isNull() ? 0 : std::max(0, observer_->findData(name)));
}

} // namespace hierloom::ui
