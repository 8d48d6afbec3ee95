// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/animal_editor_dialog.h"

#include "core/base/residence_index.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/records/animal_summary.h"
#include "ui/widgets/caution_label.h"
#include "ui/widgets/confirm.h"
#include "ui/widgets/typed_date.h"

#include <QComboBox>
#include <QCompleter>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QVBoxLayout>

namespace hierloom::ui {

namespace {

QLabel* messageLabel(QWidget* parent)
{
    auto* l = new QLabel(parent);
    l->setStyleSheet(QStringLiteral("color: #b00020;"));
    l->setWordWrap(true);
    l->setTextFormat(Qt::PlainText);
    l->hide();
    return l;
}

QLineEdit* newDateEdit(QWidget* parent)
{
    auto* e = new QLineEdit(parent);
    e->setPlaceholderText(QStringLiteral("YYYY-MM-DD"));
    return e;
}

QString dayText(const std::optional<core::Day>& d) { return d ? formatDay(*d) : QString(); }

} // namespace

AnimalEditorDialog::AnimalEditorDialog(ColonyEditFacade* facade, Mode mode, QWidget* parent)
    : QDialog(parent),
      facade_(facade),
      mode_(mode),
      id_(new QLineEdit(this)),
      name_(new QLineEdit(this)),
      sex_(new QComboBox(this)),
      birth_(newDateEdit(this)),
      mother_(new QComboBox(this)),
      father_(new QComboBox(this)),
      entry_(newDateEdit(this)),
      entryType_(new QComboBox(this)),
      group_(new QComboBox(this)),
      exit_(newDateEdit(this)),
      exitType_(new QComboBox(this)),
      general_(messageLabel(this)),
      motherInfo_(new QLabel(this)),
      form_(new QFormLayout)
{
    const QStringList titles{tr("Add Animal"), tr("Edit Animal"), tr("Record Birth"), tr("Record Introduction")};
    setWindowTitle(titles[static_cast<int>(mode)]);
    sex_->addItem(tr("female"), QStringLiteral("F"));
    sex_->addItem(tr("male"), QStringLiteral("M"));
    sex_->addItem(tr("unknown"), QStringLiteral("U"));
    entryType_->addItem(tr("founder"), QStringLiteral("founder"));
    entryType_->addItem(tr("born"), QStringLiteral("born"));
    entryType_->addItem(tr("introduced"), QStringLiteral("introduced"));
    entryType_->addItem(tr("(not recorded)"), QString());
    exitType_->addItem(tr("(still present)"), QString());
    exitType_->addItem(tr("died"), QStringLiteral("died"));
    exitType_->addItem(tr("removed"), QStringLiteral("removed"));
    // Groups are chosen from the colony's; a new name is confirmed on its own (confirmGroup).
    group_->setEditable(true);
    group_->setInsertPolicy(QComboBox::NoInsert);
    group_->addItem(QString());
    group_->addItems(groupNames(facade_->document()));
    group_->setCurrentText(QString());
    mother_->setEditable(false);

    addRow(tr("&Id:"), id_, QStringLiteral("id"));
    addRow(tr("&Name:"), name_, QStringLiteral("name"));
    addRow(tr("&Sex:"), sex_, QStringLiteral("sex"));
    addRow(mode == Mode::Birth ? tr("&Born on:") : tr("&Birth date:"), birth_, QStringLiteral("birth_date"));
    addRow(tr("&Mother:"), mother_, QStringLiteral("mother"));
    if (mode == Mode::Birth) form_->addRow(QString(), motherInfo_);
    addRow(tr("&Father:"), father_, QStringLiteral("father"));
    if (mode == Mode::Add || mode == Mode::Edit || mode == Mode::Introduction)
        addRow(mode == Mode::Introduction ? tr("&Introduced on:") : tr("&Entry date:"), entry_, QStringLiteral("entry_date"));
    if (mode == Mode::Add || mode == Mode::Edit) addRow(tr("Entry &type:"), entryType_, QStringLiteral("entry_type"));
    if (mode == Mode::Add || mode == Mode::Introduction) addRow(tr("&Group:"), group_, QStringLiteral("group"));
    if (mode == Mode::Edit) {
        addRow(tr("E&xit date:"), exit_, QStringLiteral("exit_date"));
        addRow(tr("Exit t&ype:"), exitType_, QStringLiteral("exit_type"));
        // Edit: the id picks the animal (ids are fixed; they are the notebooks' names).
        QStringList ids;
        for (const core::Animal& a : facade_->document()->pedigree().animals) ids << toQString(a.id);
        auto* completer = new QCompleter(ids, id_);
        completer->setCaseSensitivity(Qt::CaseInsensitive);
        id_->setCompleter(completer);
        connect(id_, &QLineEdit::editingFinished, this, [this] {
            if (toStdString(id_->text()) != loaded_.id) loadAnimal(id_->text());
        });
    }
    // Fields this mode does not use are hidden: left unplaced they sat over the
    // top of the form (Record Birth showed one across "Id:").
    for (QWidget* field : std::initializer_list<QWidget*>{entry_, entryType_, group_, exit_, exitType_})
        if (form_->indexOf(field->parentWidget()) < 0) field->hide();
    motherInfo_->setTextFormat(Qt::PlainText);
    motherInfo_->setWordWrap(true);
    if (mode != Mode::Birth) motherInfo_->hide();

    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    connect(buttons, &QDialogButtonBox::accepted, this, &AnimalEditorDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* layout = new QVBoxLayout(this);
    if (mode == Mode::Birth)
        layout->addWidget(new QLabel(tr("The newborn lives in the group its mother was in on that day."), this));
    layout->addLayout(form_);
    // An introduction changes who is in the group: the planning caution applies.
    if (mode == Mode::Introduction) layout->addWidget(makeCautionLabel(this));
    layout->addWidget(general_);
    layout->addWidget(buttons);

    connect(birth_, &QLineEdit::textChanged, this, &AnimalEditorDialog::refillParents);
    connect(id_, &QLineEdit::textChanged, this, &AnimalEditorDialog::refillParents);
    connect(mother_, &QComboBox::currentIndexChanged, this, &AnimalEditorDialog::updateMotherInfo);
    connect(birth_, &QLineEdit::textChanged, this, &AnimalEditorDialog::updateMotherInfo);
    refillParents();
    if (mode == Mode::Birth) {
        birth_->setText(formatDay(facade_->today()));
        entryType_->setCurrentIndex(1);
    }
    if (mode == Mode::Introduction) entryType_->setCurrentIndex(2);
    updateMotherInfo();
}

void AnimalEditorDialog::startFrom(const QString& id)
{
    // A birth starts from the selected animal as the mother, when she can be one.
    if (mode_ == Mode::Birth) {
        const int i = mother_->findData(id);
        if (i >= 0) mother_->setCurrentIndex(i);
    } else if (mode_ == Mode::Edit && !id.isEmpty()) {
        loadAnimal(id);
    }
}

void AnimalEditorDialog::updateMotherInfo()
{
    const std::string mother = toStdString(mother_->currentData().toString());
    const core::Day day = parseTypedDate(birth_->text()).value_or(facade_->today());
    motherInfo_->setText(mother.empty() ? tr("No mother chosen.") : describeAnimal(facade_->document(), mother, day));
}

void AnimalEditorDialog::addRow(const QString& label, QWidget* field, const QString& key)
{
    auto* box = new QWidget(this);
    auto* v = new QVBoxLayout(box);
    v->setContentsMargins(0, 0, 0, 0);
    v->setSpacing(1);
    v->addWidget(field);
    QLabel* message = messageLabel(box);
    v->addWidget(message);
    messages_.insert(key, message);
    auto* l = new QLabel(label, this);
    l->setBuddy(field);
    form_->addRow(l, box);
}

void AnimalEditorDialog::refillParents()
{
    // Only valid candidates: right sex, not the animal itself, born before it.
    const auto birth = core::parseDate(toStdString(birth_->text().trimmed()));
    const std::string self = toStdString(id_->text().trimmed());
    for (auto [box, sex] : {std::pair{mother_, core::Sex::Female}, std::pair{father_, core::Sex::Male}}) {
        const QString current = box->currentData().toString();
        box->clear();
        box->addItem(tr("(unknown)"), QString());
        for (const core::Animal& a : facade_->document()->pedigree().animals) {
            if (a.sex != sex || a.id == self) continue;
            if (birth && a.birth && *a.birth >= *birth) continue;
            box->addItem(a.name.empty() ? toQString(a.id) : toQString(a.id) + QStringLiteral(" (") + toQString(a.name) + ')',
                         toQString(a.id));
        }
        const int i = box->findData(current);
        box->setCurrentIndex(i < 0 ? 0 : i);
    }
}

void AnimalEditorDialog::loadAnimal(const QString& id)
{
    const auto& colony = facade_->document()->pedigree();
    const int i = colony.animalIndex(toStdString(id.trimmed()));
    if (i < 0) {
        show({{"id", "'" + toStdString(id.trimmed()) + "' is not an animal of the colony"}});
        return;
    }
    loaded_ = colony.animals[static_cast<size_t>(i)];
    uid_ = loaded_.uid;
    id_->setText(toQString(loaded_.id));
    name_->setText(toQString(loaded_.name));
    sex_->setCurrentIndex(sex_->findData(QString::fromLatin1(core::toString(loaded_.sex))));
    birth_->setText(dayText(loaded_.birth));
    entry_->setText(dayText(loaded_.entry));
    entryType_->setCurrentIndex(std::max(0, entryType_->findData(QString::fromLatin1(core::toString(loaded_.entryType)))));
    exit_->setText(dayText(loaded_.exit));
    exitType_->setCurrentIndex(std::max(0, exitType_->findData(QString::fromLatin1(core::toString(loaded_.exitType)))));
    refillParents();
    mother_->setCurrentIndex(std::max(0, mother_->findData(toQString(loaded_.mother))));
    father_->setCurrentIndex(std::max(0, father_->findData(toQString(loaded_.father))));
    show({});
}

std::optional<core::Day> AnimalEditorDialog::dateOf(QLineEdit* edit, const char* field, core::FieldProblems& problems) const
{
    const QString text = edit->text().trimmed();
    if (text.isEmpty()) return std::nullopt;
    const auto d = parseTypedDate(text);
    if (!d) problems.push_back({field, "'" + toStdString(text) + "' is not a real date in the form YYYY-MM-DD"});
    return d;
}

void AnimalEditorDialog::show(const core::FieldProblems& problems)
{
    for (QLabel* l : messages_) l->hide();
    general_->hide();
    for (const core::FieldProblem& p : problems) {
        QLabel* l = messages_.value(QString::fromStdString(p.field), general_);
        l->setText(!l->isHidden() ? l->text() + '\n' + toQString(p.message) : toQString(p.message));
        l->show();
    }
}

QString AnimalEditorDialog::motherText() const { return motherInfo_->text(); }

QString AnimalEditorDialog::fieldMessage(const QString& field) const
{
    const QLabel* l = messages_.value(field, general_);
    return !l->isHidden() ? l->text() : QString();
}

bool AnimalEditorDialog::confirmEvent(const core::Animal& a, const QString& group)
{
    // Life-history events name themselves before they are written.
    const QString who = a.name.empty() ? toQString(a.id) : toQString(a.name) + QStringLiteral(" (") + toQString(a.id) + ')';
    if (mode_ == Mode::Birth) {
        const QString mother = a.mother.empty() ? tr("an unknown mother") : nameAndId(facade_->document(), a.mother);
        return confirm(this, windowTitle(), tr("Record the birth of %1 to %2 on %3?").arg(who, mother, dayText(a.birth)), false);
    }
    if (mode_ == Mode::Introduction)
        return confirm(this, windowTitle(),
                       tr("Record the introduction of %1 into group %2 on %3?").arg(who, group, dayText(a.entry)), false);
    return true;
}

void AnimalEditorDialog::accept()
{
    core::FieldProblems problems;
    core::Animal a = mode_ == Mode::Edit ? loaded_ : core::Animal{};
    if (mode_ == Mode::Edit && uid_.empty()) problems.push_back({"id", "is empty; choose the animal to edit"});
    a.id = toStdString(id_->text().trimmed());
    a.name = toStdString(name_->text().trimmed());
    a.sex = core::parseSex(toStdString(sex_->currentData().toString())).value_or(core::Sex::Unknown);
    a.birth = dateOf(birth_, "birth_date", problems);
    a.mother = toStdString(mother_->currentData().toString());
    a.father = toStdString(father_->currentData().toString());
    a.entry = dateOf(entry_, "entry_date", problems);
    a.entryType = core::parseEntryType(toStdString(entryType_->currentData().toString())).value_or(core::EntryType::None);
    if (mode_ == Mode::Edit) {
        a.exit = dateOf(exit_, "exit_date", problems);
        a.exitType = core::parseExitType(toStdString(exitType_->currentData().toString())).value_or(core::ExitType::None);
    }
    const QString groupText = group_->currentText().trimmed();
    if (problems.empty() && (mode_ == Mode::Add || mode_ == Mode::Introduction) &&
        !confirmGroup(this, facade_->document(), groupText)) {
        group_->setFocus();
        return;
    }
    if (problems.empty() && !confirmEvent(a, groupText)) return;
    if (problems.empty()) {
        const std::string group = toStdString(groupText);
        switch (mode_) {
        case Mode::Add: problems = facade_->addAnimal(a, group); break;
        case Mode::Edit: problems = facade_->editAnimal(a); break;
        case Mode::Birth: problems = facade_->recordBirth(a); break;
        case Mode::Introduction: problems = facade_->introduceAnimal(a, group); break;
        }
    }
    show(problems);
    if (problems.empty()) QDialog::accept();
}

} // namespace hierloom::ui
