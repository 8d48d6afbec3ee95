// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/life_event_dialog.h"

#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/records/animal_summary.h"
#include "ui/widgets/caution_label.h"
#include "ui/widgets/confirm.h"
#include "ui/widgets/typed_date.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QVBoxLayout>

#include <algorithm>

namespace hierloom::ui {

LifeEventDialog::LifeEventDialog(ColonyEditFacade* facade, Event event, const QString& animal, QWidget* parent)
    : QDialog(parent),
      facade_(facade),
      event_(event),
      animal_(new QComboBox(this)),
      who_(new QLabel(this)),
      date_(new QLineEdit(this)),
      group_(new QComboBox(this)),
      message_(new QLabel(this))
{
    const QStringList titles{tr("Record Death"), tr("Record Removal"), tr("Move Between Groups")};
    setWindowTitle(titles[static_cast<int>(event)]);
    // Wide enough that "who" (name, id, sex, age, group) reads on one line.
    setMinimumWidth(fontMetrics().horizontalAdvance(QLatin1Char('M')) * 36);
    const ColonyDocument* document = facade_->document();
    // Nothing chosen unless a view had an animal selected: never a default animal.
    animal_->addItem(QString(), QString());
    // Only animals still in the colony can die, leave or move.
    for (const core::Animal& a : document->pedigree().animals)
        if (!a.exit) animal_->addItem(nameAndId(document, a.id), toQString(a.id));
    animal_->setEditable(true);
    animal_->setInsertPolicy(QComboBox::NoInsert);
    animal_->setCurrentIndex(std::max(0, animal_->findData(animal)));
    who_->setTextFormat(Qt::PlainText);
    who_->setWordWrap(true);
    date_->setPlaceholderText(QStringLiteral("YYYY-MM-DD"));
    date_->setText(formatDay(facade_->today()));
    group_->setEditable(true);
    group_->setInsertPolicy(QComboBox::NoInsert);
    group_->addItem(QString());
    group_->addItems(groupNames(document));
    message_->setStyleSheet(QStringLiteral("color: #b00020;"));
    message_->setWordWrap(true);
    message_->setTextFormat(Qt::PlainText);
    message_->hide();

    auto* form = new QFormLayout;
    auto row = [&](const QString& text, QWidget* w) {
        auto* l = new QLabel(text, this);
        l->setBuddy(w);
        form->addRow(l, w);
    };
    row(tr("&Animal:"), animal_);
    form->addRow(QString(), who_);
    row(tr("&Date:"), date_);
    if (event == Event::Move) row(tr("To &group:"), group_);
    else group_->hide();
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    connect(buttons, &QDialogButtonBox::accepted, this, &LifeEventDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(form);
    // A removal changes who is in the group: the planning caution applies.
    if (event == Event::Removal) layout->addWidget(makeCautionLabel(this));
    layout->addWidget(message_);
    layout->addWidget(buttons);
    connect(animal_, &QComboBox::currentTextChanged, this, &LifeEventDialog::updateAnimal);
    connect(date_, &QLineEdit::textChanged, this, &LifeEventDialog::updateAnimal);
    updateAnimal();
}

std::string LifeEventDialog::chosenId() const
{
    // A chosen item carries its id; typed text is read as an id (or "Name (id)").
    const QString text = animal_->currentText().trimmed();
    const int i = animal_->findText(text, Qt::MatchFixedString);
    if (i >= 0) return toStdString(animal_->itemData(i).toString());
    return toStdString(text);
}

void LifeEventDialog::updateAnimal()
{
    const std::string id = chosenId();
    const core::Day day = parseTypedDate(date_->text()).value_or(facade_->today());
    if (id.empty()) who_->setText(tr("No animal chosen."));
    else {
        const QString who = describeAnimal(facade_->document(), id, day);
        who_->setText(who.isEmpty() ? tr("'%1' is not an animal of the colony").arg(toQString(id)) : who);
    }
}

QString LifeEventDialog::animalText() const { return who_->text(); }

QString LifeEventDialog::message() const { return !message_->isHidden() ? message_->text() : QString(); }

void LifeEventDialog::showMessage(const QString& text)
{
    message_->setText(text);
    message_->show();
}

void LifeEventDialog::accept()
{
    const std::string id = chosenId();
    const auto day = parseTypedDate(date_->text());
    if (id.empty()) {
        showMessage(tr("Choose the animal."));
        animal_->setFocus();
        return;
    }
    if (facade_->document()->pedigree().animalIndex(id) < 0) {
        showMessage(tr("'%1' is not an animal of the colony").arg(toQString(id)));
        animal_->setFocus();
        return;
    }
    if (!day) {
        showMessage(typedDateProblem(date_->text()));
        date_->setFocus();
        return;
    }
    const QString who = nameAndId(facade_->document(), id);
    const QString when = formatDay(*day);
    const QString group = group_->currentText().trimmed();
    QString question;
    switch (event_) {
    case Event::Death: question = tr("Record the death of %1 on %2?").arg(who, when); break;
    case Event::Removal: question = tr("Record the removal of %1 from the colony on %2?").arg(who, when); break;
    case Event::Move:
        if (group.isEmpty()) {
            showMessage(tr("Choose the group to move to."));
            group_->setFocus();
            return;
        }
        if (!confirmGroup(this, facade_->document(), group)) {
            group_->setFocus();
            return;
        }
        question = tr("Move %1 to group %2 on %3?").arg(who, group, when);
        break;
    }
    if (!confirm(this, windowTitle(), question, false)) return;
    core::FieldProblems problems;
    if (event_ == Event::Move) problems = facade_->moveAnimal(id, toStdString(group), *day);
    else problems = facade_->recordExit(id, *day, event_ == Event::Death ? core::ExitType::Died : core::ExitType::Removed);
    if (problems.empty()) {
        QDialog::accept();
        return;
    }
    QStringList lines;
    for (const auto& p : problems) lines << toQString(p.field.empty() ? p.message : p.field + ": " + p.message);
    showMessage(lines.join('\n'));
}

} // namespace hierloom::ui
