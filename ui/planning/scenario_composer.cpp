// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/scenario_composer.h"

#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "ui/document/colony_document.h"
#include "ui/document/document_settings.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_queries.h"
#include "ui/planning/stability_view.h"

#include <QComboBox>
#include <QDateEdit>
#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QStackedWidget>
#include <QVBoxLayout>

#include <map>

namespace hierloom::ui {

ScenarioComposer::ScenarioComposer(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      date_(new QDateEdit(this)),
      group_(new QComboBox(this)),
      rule_(new QComboBox(this)),
      kind_(new QComboBox(this)),
      pages_(new QStackedWidget(this)),
      animal_(new QComboBox(this)),
      introduceId_(new QLineEdit(this)),
      mother_(new QComboBox(this)),
      sex_(new QComboBox(this)),
      newId_(new QLineEdit(this)),
      matriarchs_(new QListWidget(this)),
      newGroup_(new QLineEdit(this)),
      changes_(new QListWidget(this))
{
    date_->setCalendarPopup(true);
    date_->setDisplayFormat(QStringLiteral("yyyy-MM-dd"));
    rule_->addItem(tr("youngest ascendancy"), static_cast<int>(core::SiblingRule::Youngest));
    rule_->addItem(tr("eldest first"), static_cast<int>(core::SiblingRule::Eldest));
    auto* form = new QFormLayout;
    form->addRow(tr("Starting date:"), date_);
    form->addRow(tr("Group:"), group_);
    form->addRow(tr("Sibling rule:"), rule_);

    kind_->addItems({tr("Remove an animal"), tr("Introduce an unrelated female"), tr("Add an expected birth"),
                     tr("Split: move whole matrilines to a new group")});
    // One page of fields per kind of change.
    auto* removePage = new QWidget(this);
    auto* rf = new QFormLayout(removePage);
    rf->addRow(tr("Animal:"), animal_);
    auto* introducePage = new QWidget(this);
    auto* inf = new QFormLayout(introducePage);
    introduceId_->setPlaceholderText(tr("new id, e.g. NEW1"));
    inf->addRow(tr("New female's id:"), introduceId_);
    auto* birthPage = new QWidget(this);
    auto* bf = new QFormLayout(birthPage);
    sex_->addItem(tr("female"), static_cast<int>(core::Sex::Female));
    sex_->addItem(tr("male"), static_cast<int>(core::Sex::Male));
    sex_->addItem(tr("unknown"), static_cast<int>(core::Sex::Unknown));
    newId_->setPlaceholderText(tr("optional; default new-1, new-2, ..."));
    bf->addRow(tr("Mother:"), mother_);
    bf->addRow(tr("Sex:"), sex_);
    bf->addRow(tr("Id:"), newId_);
    auto* splitPage = new QWidget(this);
    auto* sf = new QVBoxLayout(splitPage);
    sf->setContentsMargins(0, 0, 0, 0);
    sf->addWidget(new QLabel(tr("Matrilines that move (each whole, named by its matriarch):"), splitPage));
    matriarchs_->setMaximumHeight(110);
    sf->addWidget(matriarchs_);
    auto* ng = new QHBoxLayout;
    ng->addWidget(new QLabel(tr("New group:"), splitPage));
    newGroup_->setPlaceholderText(tr("e.g. South Pen"));
    ng->addWidget(newGroup_);
    sf->addLayout(ng);
    for (QWidget* w : {removePage, introducePage, birthPage, splitPage}) pages_->addWidget(w);
    auto* add = new QPushButton(tr("Add Change"), this);
    auto* drop = new QPushButton(tr("Remove Selected Change"), this);
    auto* composeBox = new QGroupBox(tr("Changes (applied in order; the records are never changed)"), this);
    auto* cb = new QVBoxLayout(composeBox);
    cb->addWidget(kind_);
    cb->addWidget(pages_);
    cb->addWidget(add);
    cb->addWidget(changes_);
    cb->addWidget(drop);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addLayout(form);
    layout->addWidget(composeBox, 1);

    connect(kind_, &QComboBox::currentIndexChanged, pages_, &QStackedWidget::setCurrentIndex);
    connect(add, &QPushButton::clicked, this, &ScenarioComposer::addComposedChange);
    connect(drop, &QPushButton::clicked, this, [this] {
        const int row = changes_->currentRow();
        if (row < 0 || row >= static_cast<int>(list_.size())) return;
        list_.erase(list_.begin() + row);
        refreshChangeList();
        emit changed();
    });
    connect(date_, &QDateEdit::dateChanged, this, [this] {
        refreshChoices();
        emit changed();
    });
    connect(group_, &QComboBox::currentTextChanged, this, [this] {
        refreshChoices();
        emit changed();
    });
    connect(rule_, &QComboBox::currentIndexChanged, this, &ScenarioComposer::changed);
    // A new file starts a new scenario; an edit of the record (an evening's
    // entries) keeps the changes composed so far and refreshes the choices.
    connect(document_, &ColonyDocument::changed, this, [this] {
        const auto kind = document_->lastChange().kind;
        if (kind == ColonyDocument::ChangeKind::Reset) {
            reset();
        } else {
            // The choices are the residents and matrilines: an evening's lines leave them as they are.
            if (kind == ColonyDocument::ChangeKind::AnimalsChanged) refreshChoices();
            emit changed();
        }
    });
    reset();
}

void ScenarioComposer::reset()
{
    {
        const QSignalBlocker b1(group_), b2(date_);
        group_->clear();
        group_->addItems(groupsWithEncounters(document_));
        if (const auto last = document_->lastEncounterDay()) date_->setDate(toQDate(*last));
    }
    list_.clear();
    base_ = core::Scenario{};
    const core::AnalysisSettings settings = documentAnalysisSettings(document_);
    base_.maturityYears = settings.maturityYears;
    base_.elo = settings.elo;
    newcomers_ = 0;
    refreshChoices();
    refreshChangeList();
    emit changed();
}

void ScenarioComposer::refreshChoices()
{
    const core::Colony& colony = document_->pedigree();
    const core::ResidenceIndex& where = document_->residences();
    const core::Day day = toDay(date_->date());
    const int g = where.group(toStdString(group_->currentText()));
    const core::Matrilines lines(colony);
    const QSignalBlocker b1(animal_), b2(mother_);
    animal_->clear();
    mother_->clear();
    matriarchs_->clear();
    std::map<std::string, int> lineSize;
    for (const core::Animal& a : colony.animals) {
        const int k = where.animal(a.id);
        if (g < 0 || k < 0 || where.groupOn(k, day) != g) continue;
        const QString id = toQString(a.id);
        animal_->addItem(QStringLiteral("%1 (%2)").arg(id, toQString(core::toString(a.sex))), id);
        if (a.sex == core::Sex::Female) mother_->addItem(id, id);
        ++lineSize[lines.id(lines.matriarch(lines.index(a.id)))];
    }
    for (const auto& [head, n] : lineSize) {
        const int node = lines.index(head);
        // Only real matriarchs can be split off (a founder male heads a line of his own).
        if (node < 0 || !lines.recorded(node) || lines.sex(node) == core::Sex::Male) continue;
        auto* item = new QListWidgetItem(tr("%1 (%n resident member(s))", nullptr, n).arg(toQString(head)), matriarchs_);
        item->setData(Qt::UserRole, toQString(head));
        item->setFlags(item->flags() | Qt::ItemIsUserCheckable);
        item->setCheckState(Qt::Unchecked);
    }
}

QString ScenarioComposer::describe(const core::ScenarioChange& c)
{
    switch (c.kind) {
    case core::ScenarioChange::Kind::Remove: return tr("Remove %1").arg(toQString(c.animal));
    case core::ScenarioChange::Kind::Introduce: return tr("Introduce unrelated female %1").arg(toQString(c.animal));
    case core::ScenarioChange::Kind::Birth:
        return tr("Expected birth: %1 of %2%3")
            .arg(c.sex == core::Sex::Female ? tr("daughter") : c.sex == core::Sex::Male ? tr("son") : tr("infant"),
                 toQString(c.animal), c.newId.empty() ? QString() : tr(" (id %1)").arg(toQString(c.newId)));
    case core::ScenarioChange::Kind::Split: {
        QStringList heads;
        for (const std::string& m : c.matriarchs) heads << toQString(m);
        return tr("Split: lines of %1 move to %2").arg(heads.join(QStringLiteral(", ")), toQString(c.toGroup));
    }
    }
    return {};
}

void ScenarioComposer::refreshChangeList()
{
    changes_->clear();
    for (const core::ScenarioChange& c : list_) changes_->addItem(describe(c));
}

void ScenarioComposer::addChange(const core::ScenarioChange& change)
{
    list_.push_back(change);
    refreshChangeList();
    emit changed();
}

bool ScenarioComposer::addComposedChange()
{
    core::ScenarioChange c;
    switch (kind_->currentIndex()) {
    case RemoveAnimal:
        if (animal_->currentIndex() < 0) return false;
        c.kind = core::ScenarioChange::Kind::Remove;
        c.animal = toStdString(animal_->currentData().toString());
        break;
    case IntroduceFemale: {
        c.kind = core::ScenarioChange::Kind::Introduce;
        QString id = introduceId_->text().trimmed();
        if (id.isEmpty()) id = tr("NEW%1").arg(++newcomers_);
        c.animal = toStdString(id);
        introduceId_->clear();
        break;
    }
    case ExpectedBirth:
        if (mother_->currentIndex() < 0) return false;
        c.kind = core::ScenarioChange::Kind::Birth;
        c.animal = toStdString(mother_->currentData().toString());
        c.sex = static_cast<core::Sex>(sex_->currentData().toInt());
        c.newId = toStdString(newId_->text().trimmed());
        newId_->clear();
        break;
    case SplitMatrilines:
        c.kind = core::ScenarioChange::Kind::Split;
        for (int i = 0; i < matriarchs_->count(); ++i)
            if (matriarchs_->item(i)->checkState() == Qt::Checked)
                c.matriarchs.push_back(toStdString(matriarchs_->item(i)->data(Qt::UserRole).toString()));
        c.toGroup = toStdString(newGroup_->text().trimmed());
        if (c.matriarchs.empty() || c.toGroup.empty()) return false;
        break;
    default: return false;
    }
    addChange(c);
    return true;
}

core::Scenario ScenarioComposer::scenario() const
{
    core::Scenario s = base_;
    s.at = toDay(date_->date());
    s.group = toStdString(group_->currentText());
    s.rule = static_cast<core::SiblingRule>(rule_->currentData().toInt());
    s.changes = list_;
    return s;
}

void ScenarioComposer::setScenario(const core::Scenario& s)
{
    {
        const QSignalBlocker b1(group_), b2(date_), b3(rule_);
        if (s.at) date_->setDate(toQDate(*s.at));
        if (!s.group.empty()) {
            if (group_->findText(toQString(s.group)) < 0) group_->addItem(toQString(s.group));
            group_->setCurrentText(toQString(s.group));
        }
        rule_->setCurrentIndex(rule_->findData(static_cast<int>(s.rule)));
    }
    list_ = s.changes;
    base_ = s;
    refreshChoices();
    refreshChangeList();
    emit changed();
}

} // namespace hierloom::ui
