// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/encounter_entry_panel.h"

#include "core/rules/encounter_rules.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/entry/entry_words.h"
#include "ui/entry/session_table.h"
#include "ui/entry/entry_keys.h"
#include "ui/entry/undo_keys.h"
#include "ui/entry/word_completer.h"
#include "ui/widgets/key_sheet.h"
#include "ui/widgets/confirm.h"
#include "ui/widgets/typed_date.h"

#include <QApplication>
#include <QCheckBox>
#include <QComboBox>
#include <QCompleter>
#include <QGridLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QKeyEvent>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QMessageBox>
#include <QPushButton>
#include <QShortcut>
#include <QSignalBlocker>
#include <QStringListModel>
#include <QTableWidget>
#include <QUndoStack>
#include <QVBoxLayout>

#include <algorithm>

namespace hierloom::ui {

namespace {

QLabel* infoLabel(QWidget* parent)
{
    auto* label = new QLabel(parent);
    label->setWordWrap(true);
    label->setTextFormat(Qt::PlainText);
    // Two lines, always: a message never moves the fields, nor widens its column.
    label->setFixedHeight(label->fontMetrics().lineSpacing() * 2 + 2);
    label->setSizePolicy(QSizePolicy::Ignored, QSizePolicy::Fixed);
    label->setAlignment(Qt::AlignLeft | Qt::AlignTop);
    return label;
}

void showError(QLabel* label, const QString& text)
{
    label->setStyleSheet(QStringLiteral("color: #b00020;"));
    label->setText(text);
}

void showHint(QLabel* label, const QString& text)
{
    label->setStyleSheet(QStringLiteral("color: palette(mid);"));
    label->setText(text);
}


bool isError(const QLabel* label) { return label->styleSheet().contains(QLatin1String("b00020")); }

/// The first key of `key` as a button shows it ("F2").
QString keyName(EntryKey key) { return entryKeyInfo(key).sequences.front().toString(QKeySequence::NativeText); }

QString samePairKey(const std::string& a, const std::string& b)
{
    return a < b ? toQString(a + '\n' + b) : toQString(b + '\n' + a);
}

} // namespace

EncounterEntryPanel::EncounterEntryPanel(ColonyEditFacade* facade, QWidget* parent)
    : QWidget(parent),
      facade_(facade),
      document_(facade->document()),
      askDuplicate_([this](const QString& q) { return confirm(this, tr("Possible Duplicate"), q, false); }),
      askUndoSession_([this](const QString& q) { return confirm(this, tr("Undo Whole Session"), q, false); }),
      date_(new QLineEdit(this)),
      group_(new QComboBox(this)),
      observer_(new QComboBox(this)),
      endButton_(new QPushButton(withEntryMnemonic(tr("End Session"), EntryKey::EndSession), this)),
      dateInfo_(infoLabel(this)),
      time_(new QLineEdit(this)),
      winner_(new QLineEdit(this)),
      loser_(new QLineEdit(this)),
      draw_(new QCheckBox(withEntryMnemonic(tr("Draw"), EntryKey::Draw), this)),
      behaviour_(new QComboBox(this)),
      note_(new QLineEdit(this)),
      winnerSupport_(new QLineEdit(this)),
      loserSupport_(new QLineEdit(this)),
      addButton_(new QPushButton(tr("Add Line (%1)").arg(keyName(EntryKey::SaveLine)), this)),
      timeInfo_(infoLabel(this)),
      winnerInfo_(infoLabel(this)),
      loserInfo_(infoLabel(this)),
      winnerSupportInfo_(infoLabel(this)),
      loserSupportInfo_(infoLabel(this)),
      lineInfo_(infoLabel(this)),
      mode_(new QLabel(this)),
      completions_(new QStringListModel(this)),
      list_(new QTableWidget(this)),
      count_(new QLabel(this)),
      summary_(new QLabel(this)),
      undoSession_(new QPushButton(withEntryMnemonic(tr("Undo Whole Session"), EntryKey::UndoSession), this)),
      refused_(new QListWidget(this)),
      undoKeys_(nullptr),
      matcher_(document_),
      day_(facade->today())
{
    // A plain field read by parseTypedDate: what is shown is what is stored.
    date_->setText(formatDay(day_));
    date_->setPlaceholderText(tr("YYYY-MM-DD"));
    date_->setMaximumWidth(date_->fontMetrics().horizontalAdvance(QStringLiteral("0000-00-00")) * 2);
    observer_->setEditable(true);
    observer_->setInsertPolicy(QComboBox::NoInsert);
    observer_->setMinimumContentsLength(8);
    group_->setMinimumContentsLength(8);
    time_->setPlaceholderText(tr("HH:MM"));
    time_->setMaximumWidth(time_->fontMetrics().horizontalAdvance(QStringLiteral("00:00")) * 2);
    winner_->setPlaceholderText(tr("id or name"));
    loser_->setPlaceholderText(tr("id or name"));
    note_->setPlaceholderText(tr("note"));
    for (QLineEdit* edit : {winner_, loser_}) {
        auto* completer = new QCompleter(completions_, edit);
        completer->setCaseSensitivity(Qt::CaseInsensitive);
        completer->setCompletionMode(QCompleter::PopupCompletion);
        edit->setCompleter(completer);
    }
    for (QLineEdit* edit : {winnerSupport_, loserSupport_}) {
        // Several animals, one word each: the word being typed is completed.
        edit->setPlaceholderText(tr("ids or names, separated by spaces"));
        auto* completer = new WordCompleter(completions_, edit);
        completer->setCaseSensitivity(Qt::CaseInsensitive);
        completer->setCompletionMode(QCompleter::PopupCompletion);
        edit->setCompleter(completer);
    }
    summary_->setWordWrap(true);
    mode_->setStyleSheet(QStringLiteral("font-weight: bold;"));
    mode_->setFixedHeight(mode_->fontMetrics().lineSpacing() + 2);
    refused_->setMaximumHeight(refused_->fontMetrics().lineSpacing() * 4 + 6);

    // Session header.
    auto* header = new QHBoxLayout;
    auto addLabelled = [&](QHBoxLayout* row, const QString& text, QWidget* field) {
        auto* label = new QLabel(text, this);
        label->setBuddy(field);
        row->addWidget(label);
        row->addWidget(field);
    };
    // Every Alt letter comes from the entry's one list of keys (entry_keys.h), which the help lists.
    addLabelled(header, withEntryMnemonic(tr("Date:"), EntryKey::Date), date_);
    addLabelled(header, withEntryMnemonic(tr("Group:"), EntryKey::Group), group_);
    addLabelled(header, withEntryMnemonic(tr("Observer:"), EntryKey::Observer), observer_);
    header->addWidget(endButton_);
    header->addStretch(1);

    // The entry line, in the notebook's column order, with a message under each field.
    auto* line = new QGridLayout;
    const QList<QPair<QString, QWidget*>> fields{{withEntryMnemonic(tr("Time"), EntryKey::Time), time_},
                                                 {withEntryMnemonic(tr("Winner"), EntryKey::Winner), winner_},
                                                 {withEntryMnemonic(tr("Loser"), EntryKey::Loser), loser_},
                                                 {QString(), draw_},
                                                 {withEntryMnemonic(tr("Behaviour"), EntryKey::Behaviour), behaviour_},
                                                 {withEntryMnemonic(tr("Note"), EntryKey::Note), note_}};
    for (int c = 0; c < fields.size(); ++c) {
        if (!fields[c].first.isEmpty()) {
            auto* label = new QLabel(fields[c].first, this);
            label->setBuddy(fields[c].second);
            line->addWidget(label, 0, c);
        }
        line->addWidget(fields[c].second, 1, c);
    }
    line->addWidget(addButton_, 1, fields.size());
    line->addWidget(timeInfo_, 2, 0);
    line->addWidget(winnerInfo_, 2, 1);
    line->addWidget(loserInfo_, 2, 2);
    line->addWidget(lineInfo_, 2, 3, 1, 4);
    // The supporters of each side, under the winner and the loser.
    auto* winnerSupportLabel = new QLabel(withEntryMnemonic(tr("Winner's supporters"), EntryKey::WinnerSupport), this);
    winnerSupportLabel->setBuddy(winnerSupport_);
    auto* loserSupportLabel = new QLabel(withEntryMnemonic(tr("Loser's supporters"), EntryKey::LoserSupport), this);
    loserSupportLabel->setBuddy(loserSupport_);
    line->addWidget(winnerSupportLabel, 3, 0);
    line->addWidget(winnerSupport_, 3, 1);
    line->addWidget(loserSupportLabel, 3, 2, Qt::AlignRight);
    line->addWidget(loserSupport_, 3, 3, 1, 3);
    line->addWidget(winnerSupportInfo_, 4, 1);
    line->addWidget(loserSupportInfo_, 4, 3, 1, 3);
    line->setColumnStretch(1, 2);
    line->setColumnStretch(2, 2);
    line->setColumnStretch(5, 4);

    setUpSessionTable(list_);
    list_->setTabKeyNavigation(false); // Tab leaves the table for the refused lines

    auto* footer = new QHBoxLayout;
    footer->addWidget(count_, 1);
    auto* editButton = new QPushButton(tr("Edit Line (%1)").arg(keyName(EntryKey::ChangeRow)), this);
    auto* deleteButton = new QPushButton(tr("Delete Line (%1)").arg(keyName(EntryKey::DeleteRows)), this);
    footer->addWidget(editButton);
    footer->addWidget(deleteButton);
    footer->addWidget(undoSession_);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(header);
    layout->addWidget(dateInfo_);
    layout->addWidget(mode_);
    layout->addLayout(line);
    auto* refusedLabel = new QLabel(
        withEntryMnemonic(tr("Refused lines (Enter on one puts it back on the line; Esc clears the line):"), EntryKey::RefusedList),
        this);
    refusedLabel->setBuddy(refused_);
    layout->addWidget(refusedLabel);
    layout->addWidget(refused_);
    layout->addWidget(new QLabel(tr("This date and group in the file (each line is saved as it is entered):"), this));
    layout->addWidget(list_, 1);
    layout->addLayout(footer);
    layout->addWidget(summary_);

    setTabOrder(date_, group_);
    setTabOrder(group_, observer_);
    setTabOrder(observer_, time_);
    setTabOrder(time_, winner_);
    setTabOrder(winner_, loser_);
    setTabOrder(loser_, draw_);
    setTabOrder(draw_, behaviour_);
    setTabOrder(behaviour_, note_);
    setTabOrder(note_, winnerSupport_);
    setTabOrder(winnerSupport_, loserSupport_);
    setTabOrder(loserSupport_, list_);
    setTabOrder(list_, refused_);
    for (QWidget* w : {static_cast<QWidget*>(time_), static_cast<QWidget*>(winner_), static_cast<QWidget*>(loser_),
                       static_cast<QWidget*>(draw_), static_cast<QWidget*>(behaviour_), static_cast<QWidget*>(note_),
                       static_cast<QWidget*>(winnerSupport_), static_cast<QWidget*>(loserSupport_)})
        w->installEventFilter(this);
    list_->installEventFilter(this);
    refused_->installEventFilter(this);
    for (QLineEdit* edit : {winner_, loser_, winnerSupport_, loserSupport_}) {
        QWidget* popup = edit->completer()->popup();
        popup->installEventFilter(this); // after QCompleter's own filter, so it runs first
        completionPopups_.insert(popup);
    }
    date_->installEventFilter(this);
    addButton_->setAutoDefault(false);
    endButton_->setAutoDefault(false);
    endButton_->setFocusPolicy(Qt::NoFocus); // Alt+S; keeps Tab going from the header straight to the line
    addButton_->setFocusPolicy(Qt::NoFocus);

    connect(addButton_, &QPushButton::clicked, this, &EncounterEntryPanel::commitLine);
    // Enter on an open completion list reaches the field directly (not through the filter).
    for (QLineEdit* edit : {winner_, loser_, winnerSupport_, loserSupport_})
        connect(edit, &QLineEdit::returnPressed, this, &EncounterEntryPanel::commitLine);
    connect(endButton_, &QPushButton::clicked, this, &EncounterEntryPanel::endSession);
    connect(editButton, &QPushButton::clicked, this, &EncounterEntryPanel::editSelectedRow);
    connect(deleteButton, &QPushButton::clicked, this, &EncounterEntryPanel::deleteSelectedRows);
    connect(undoSession_, &QPushButton::clicked, this, &EncounterEntryPanel::undoWholeSession);
    connect(list_, &QTableWidget::cellDoubleClicked, this, &EncounterEntryPanel::editSelectedRow);
    connect(date_, &QLineEdit::textChanged, this, &EncounterEntryPanel::dateTyped);
    connect(group_, &QComboBox::currentTextChanged, this, &EncounterEntryPanel::headerChanged);
    connect(observer_, &QComboBox::currentTextChanged, this, &EncounterEntryPanel::headerChanged);
    connect(winner_, &QLineEdit::textChanged, this, [this] { checkAnimalField(winner_, winnerInfo_); });
    connect(loser_, &QLineEdit::textChanged, this, [this] { checkAnimalField(loser_, loserInfo_); });
    connect(winnerSupport_, &QLineEdit::textChanged, this, [this] { checkSupportField(winnerSupport_, winnerSupportInfo_); });
    connect(loserSupport_, &QLineEdit::textChanged, this, [this] { checkSupportField(loserSupport_, loserSupportInfo_); });
    connect(time_, &QLineEdit::textChanged, this, &EncounterEntryPanel::checkTime);
    connect(document_, &ColonyDocument::changed, this, &EncounterEntryPanel::documentChanged);
    // Said where the person typing looks, besides the status bar.
    connect(document_, &ColonyDocument::changedOutside, summary_, &QLabel::setText);
    undoKeys_ = new UndoKeys(this, document_);
    QList<KeySheetRow> sheet;
    for (const EntryKeyInfo& k : entryKeys()) sheet.push_back({entryKeyText(k), entryKeyWhere(k), entryKeyWhat(k)});
    publishKeySheet(this, tr("In the evening entry"), sheet);
    documentChanged();
}

void EncounterEntryPanel::documentChanged()
{
    // Another file, or the same one closed and opened again: a new session.
    const QString path = document_->isOpen() ? document_->path() : QString();
    if (path != openPath_) {
        openPath_ = path;
        resetSession();
    }
    // Encounter and settings changes leave the groups, residents and lists as they were.
    const auto kind = document_->lastChange().kind;
    if (kind == ColonyDocument::ChangeKind::EncountersAppended && dayIndexValid_) {
        // Appended rows come last: only they need looking at.
        const core::EncounterRecords& all = document_->encounters();
        const std::int32_t group = all.compact().groups.find(toStdString(group_->currentText()));
        for (size_t i = document_->lastChange().firstAppended; i < all.size(); ++i)
            if (all.record(i).date == day_ && all.record(i).group == group) dayIndex_.push_back(i);
    } else {
        dayIndexValid_ = false;
    }
    if (kind != ColonyDocument::ChangeKind::EncountersAppended && kind != ColonyDocument::ChangeKind::EncountersChanged &&
        kind != ColonyDocument::ChangeKind::SettingsChanged)
        refreshChoices();
    refreshList();
}

void EncounterEntryPanel::resetSession()
{
    summary_->clear();
    sessionUids_.clear();
    warned_.clear();
    refused_->clear();
    refusals_ = 0;
    editing_.reset();
    mode_->clear();
    clearLine();
}

void EncounterEntryPanel::refreshChoices()
{
    const QSignalBlocker b1(group_), b2(observer_);
    const QString group = group_->currentText();
    group_->clear();
    QStringList groups;
    for (const std::string& g : document_->residences().groups()) groups << toQString(g);
    groups.sort();
    group_->addItems(groups);
    if (!group.isEmpty() && groups.contains(group)) group_->setCurrentText(group);

    const QString observer = observer_->currentText();
    const QString code = behaviour_->currentText();
    observer_->clear();
    behaviour_->clear();
    behaviour_->addItem(QString());
    if (const core::ColonyStore* store = document_->store()) {
        for (const std::string& o : store->observers()) observer_->addItem(toQString(o));
        for (const auto& c : store->behaviourCodes()) {
            behaviour_->addItem(toQString(c.code));
            behaviour_->setItemData(behaviour_->count() - 1, toQString(c.description), Qt::ToolTipRole);
        }
    }
    observer_->setCurrentText(observer);
    behaviour_->setCurrentText(code);
    refreshResidents();
    checkDate();
}

void EncounterEntryPanel::refreshResidents()
{
    // The completions and the prefix matching offer only the animals in the
    // session's group on the session's day.
    completions_->setStringList(matcher_.setSession(toStdString(group_->currentText()), sessionDay()));
}

void EncounterEntryPanel::headerChanged()
{
    // A new date, group or observer is a new notebook page: close the session.
    // (A new date closed it under its own date before it took over, in dateTyped.)
    if (sessionRowCount() > 0) endSession();
    // A large file read group by group: the duplicate check needs this group's rows.
    document_->holdGroup(group_->currentText());
    dayIndexValid_ = false;
    refreshResidents();
    refreshList();
    checkDate();
    checkAnimalField(winner_, winnerInfo_);
    checkAnimalField(loser_, loserInfo_);
    checkSupportField(winnerSupport_, winnerSupportInfo_);
    checkSupportField(loserSupport_, loserSupportInfo_);
}

std::vector<std::string> EncounterEntryPanel::supporterIds(const QLineEdit* edit, std::optional<std::string>& problem) const
{
    std::vector<std::string> ids;
    for (const std::string& word : core::splitSupporters(toStdString(edit->text()))) {
        const AnimalMatcher::Match m = matcher_.resolve(toQString(word));
        if (m.error && !problem) problem = toStdString(*m.error);
        ids.push_back(m.id);
    }
    return ids;
}

void EncounterEntryPanel::checkSupportField(QLineEdit* edit, QLabel* info)
{
    std::optional<std::string> problem;
    const std::vector<std::string> ids = supporterIds(edit, problem);
    if (ids.empty()) {
        info->clear();
        return;
    }
    if (problem) {
        showError(info, toQString(*problem));
        return;
    }
    // Each one in the session's group that day, in the encounter rules' words.
    for (const std::string& id : ids)
        if (auto m = core::checkEncounterAnimal(id, toStdString(group_->currentText()), sessionDay(), document_->residences())) {
            showError(info, toQString(*m));
            return;
        }
    showHint(info, toQString(core::joinSupporters(ids)));
}

void EncounterEntryPanel::checkAnimalField(QLineEdit* edit, QLabel* info)
{
    const QString text = edit->text().trimmed();
    if (text.isEmpty()) {
        info->clear();
        return;
    }
    const AnimalMatcher::Match r = matcher_.resolve(text);
    if (r.partial) {
        showHint(info, *r.error); // still typing: a hint, not a mistake
        return;
    }
    if (r.error) {
        showError(info, *r.error);
        return;
    }
    if (auto m = core::checkEncounterAnimal(r.id, toStdString(group_->currentText()), sessionDay(), document_->residences())) {
        showError(info, toQString(*m));
        return;
    }
    const AnimalMatcher::Match other = matcher_.resolve(edit == winner_ ? loser_->text() : winner_->text());
    if (edit == loser_ && !winner_->text().trimmed().isEmpty() && other.id == r.id) {
        showError(info, toQString("'" + r.id + "' is also the winner; an encounter needs two animals"));
        return;
    }
    showHint(info, r.hint);
}

std::optional<int> EncounterEntryPanel::parsedTime(bool& bad) const
{
    bad = false;
    QString t = time_->text().trimmed();
    if (t.isEmpty()) return std::nullopt;
    // "930" and "0930" save the colon key on a long evening.
    if (!t.contains(QLatin1Char(':')) && (t.size() == 3 || t.size() == 4)) t.insert(t.size() - 2, QLatin1Char(':'));
    if (t.size() == 4) t.prepend(QLatin1Char('0'));
    const auto minutes = core::parseTimeOfDay(toStdString(t));
    bad = !minutes;
    return minutes;
}

void EncounterEntryPanel::checkTime()
{
    bool bad = false;
    const auto minutes = parsedTime(bad);
    if (bad) showError(timeInfo_, tr("'%1' is not a time of day in the form HH:MM (24 h)").arg(time_->text().trimmed()));
    else if (minutes) showHint(timeInfo_, toQString(core::formatTimeOfDay(*minutes)));
    else timeInfo_->clear();
}

void EncounterEntryPanel::dateTyped()
{
    const auto day = parseTypedDate(date_->text());
    dateValid_ = day.has_value();
    if (!day) {
        showError(dateInfo_, typedDateProblem(date_->text()));
        return;
    }
    if (*day == day_) {
        checkDate();
        return;
    }
    // Close the session under its own date before the new one takes over.
    if (sessionRowCount() > 0) endSession();
    day_ = *day;
    dayIndexValid_ = false;
    headerChanged();
}

void EncounterEntryPanel::checkDate()
{
    if (!dateValid_)
        showError(dateInfo_, typedDateProblem(date_->text()));
    else if (sessionDay() > facade_->today())
        showError(dateInfo_, toQString("'" + core::formatDate(sessionDay()) + "' is in the future"));
    else if (document_->isOpen() && group_->count() == 0)
        showHint(dateInfo_, tr("The colony has no groups yet: add animals first."));
    else if (document_->isOpen() && matcher_.noResidents())
        showHint(dateInfo_, tr("No animal lived in this group on that day."));
    else dateInfo_->clear();
}

void EncounterEntryPanel::clearMessages()
{
    for (QLabel* l : {timeInfo_, winnerInfo_, loserInfo_, winnerSupportInfo_, loserSupportInfo_, lineInfo_}) l->clear();
}

void EncounterEntryPanel::showProblems(const core::FieldProblems& problems)
{
    for (const core::FieldProblem& p : problems) {
        QLabel* target = p.field == "winner" ? winnerInfo_
                         : p.field == "loser" ? loserInfo_
                         : p.field == "winner_support" ? winnerSupportInfo_
                         : p.field == "loser_support" ? loserSupportInfo_
                         : p.field == "time"  ? timeInfo_
                         : p.field == "date" || p.field == "observer" ? dateInfo_
                                              : lineInfo_;
        showError(target, toQString(p.message));
    }
    if (problems.empty()) return;
    // The cursor goes to the field at fault, so the fix is typed where it belongs.
    const std::string& f = problems.front().field;
    QWidget* fault = f == "time" ? static_cast<QWidget*>(time_)
                     : f == "loser" ? static_cast<QWidget*>(loser_)
                     : f == "winner_support" ? static_cast<QWidget*>(winnerSupport_)
                     : f == "loser_support" ? static_cast<QWidget*>(loserSupport_)
                     : f == "date" ? static_cast<QWidget*>(date_)
                     : f == "observer" ? static_cast<QWidget*>(observer_)
                     : f == "behaviour" ? static_cast<QWidget*>(behaviour_)
                     : f == "note" ? static_cast<QWidget*>(note_)
                                        : static_cast<QWidget*>(winner_);
    fault->setFocus();
    if (auto* edit = qobject_cast<QLineEdit*>(fault)) edit->selectAll();
}

QString EncounterEntryPanel::fieldMessage(const QString& field) const
{
    const QLabel* label = field == QLatin1String("date") || field == QLatin1String("observer") ? dateInfo_
                          : field == QLatin1String("time")   ? timeInfo_
                          : field == QLatin1String("winner") ? winnerInfo_
                          : field == QLatin1String("loser")  ? loserInfo_
                          : field == QLatin1String("winner_support") ? winnerSupportInfo_
                          : field == QLatin1String("loser_support")  ? loserSupportInfo_
                                                             : lineInfo_;
    return isError(label) ? label->text() : QString();
}

bool EncounterEntryPanel::commitLine()
{
    lineInfo_->clear();
    // Another program may have written to the file: read it first, so the
    // checks below (duplicates, residents) see what the file holds now; the
    // typed line stays on the line whatever happens.
    if (auto p = facade_->catchUp(); !p.empty()) {
        refuse(p);
        return false;
    }
    core::Encounter e;
    e.date = sessionDay();
    bool badTime = false;
    e.time = parsedTime(badTime);
    const AnimalMatcher::Match w = matcher_.resolve(winner_->text());
    const AnimalMatcher::Match l = matcher_.resolve(loser_->text());
    e.winner = w.id;
    e.loser = l.id;
    e.outcome = draw_->isChecked() ? core::Outcome::Draw : core::Outcome::Decided;
    e.behaviour = toStdString(behaviour_->currentText());
    e.group = toStdString(group_->currentText());
    e.observer = toStdString(observer_->currentText().trimmed());
    e.note = toStdString(note_->text().trimmed());
    std::optional<std::string> winnerSideProblem, loserSideProblem;
    e.winnerSupport = supporterIds(winnerSupport_, winnerSideProblem);
    e.loserSupport = supporterIds(loserSupport_, loserSideProblem);

    core::FieldProblems problems;
    if (!dateValid_) problems.push_back({"date", toStdString(typedDateProblem(date_->text()))});
    if (e.observer.empty() && !editing_)
        problems.push_back({"observer", toStdString(tr("Choose the observer (or type 'unknown'); a line needs one"))});
    if (badTime) problems.push_back({"time", toStdString(tr("'%1' is not a time of day in the form HH:MM (24 h)").arg(time_->text().trimmed()))});
    if (w.partial) problems.push_back({"winner", toStdString(*w.error)});
    if (l.partial) problems.push_back({"loser", toStdString(*l.error)});
    if (winnerSideProblem) problems.push_back({"winner_support", *winnerSideProblem});
    if (loserSideProblem) problems.push_back({"loser_support", *loserSideProblem});
    // The session's group: each animal must be in it that day (same words as the import otherwise).
    for (const auto& [id, field] : {std::pair{e.winner, "winner"}, std::pair{e.loser, "loser"}})
        if (!id.empty() && problemFor(problems, field).empty())
            if (auto m = core::checkEncounterAnimal(id, e.group, e.date, document_->residences()))
                problems.push_back({field, *m});
    if (problems.empty()) problems = facade_->checkEncounter(e);
    if (!problems.empty()) {
        refuse(problems);
        return false;
    }

    // Same pair at the same time on this day, in this session or earlier: probably entered twice.
    bool warned = false;
    for (const core::Encounter& row : dayRows()) {
        if (editing_ && row.uid == editing_->uid) continue;
        if (samePairKey(row.winner, row.loser) == samePairKey(e.winner, e.loser) && row.time == e.time) {
            const QString when = e.time ? tr("at %1").arg(toQString(core::formatTimeOfDay(*e.time))) : tr("without a time");
            const QString where = sessionUids_.count(row.uid) ? tr("in this session") : tr("in the file for this day");
            if (!askDuplicate_(tr("%1 and %2 %3 are already %4. Save this line as another encounter?")
                                   .arg(toQString(e.winner), toQString(e.loser), when, where))) {
                showError(lineInfo_, tr("Not saved: a possible duplicate."));
                return false;
            }
            warned = true;
            break;
        }
    }

    core::FieldProblems written;
    if (editing_) {
        e.seq = editing_->seq;
        e.uid = editing_->uid;
        e.observer = editing_->observer;
        written = facade_->editEncounter(e);
    } else {
        written = facade_->addEncounter(e);
        if (written.empty()) sessionUids_.insert(e.uid);
    }
    if (!written.empty()) {
        refuse(written);
        return false;
    }
    if (warned) warned_.insert(e.uid);
    // A refused line saved once its fault was fixed leaves the refused list:
    // fixed in place (the loser typed again on the entry row), or elsewhere
    // (the observer, the date) with the same fields.
    const QStringList saved = typedFields();
    for (int i = refused_->count() - 1; i >= 0; --i) {
        const QListWidgetItem* item = refused_->item(i);
        if (item->data(Qt::UserRole).toStringList() == saved || item->data(kEntryLineRole).toULongLong() == entryLine_)
            delete refused_->takeItem(i);
    }
    const bool hadTime = e.time.has_value();
    editing_.reset();
    mode_->clear();
    clearLine();
    refreshList();
    (hadTime ? time_ : winner_)->setFocus();
    return true;
}

void EncounterEntryPanel::clearLine()
{
    ++entryLine_; // the next line is another: what was refused of this one stays listed
    for (QLineEdit* edit : {time_, winner_, loser_, note_, winnerSupport_, loserSupport_}) edit->clear();
    // A completion list left open by the last field would hang under an empty field.
    for (QObject* popup : completionPopups_) static_cast<QWidget*>(popup)->hide();
    draw_->setChecked(false);
    clearMessages();
}

void EncounterEntryPanel::cancelEdit()
{
    editing_.reset();
    mode_->clear();
    clearLine();
    focusEntry();
}

void EncounterEntryPanel::focusEntry() { time_->setFocus(); }

void EncounterEntryPanel::showEvent(QShowEvent* event)
{
    QWidget::showEvent(event);
    // Coming to this tab means typing a notebook: start on the entry line.
    if (!isAncestorOf(QApplication::focusWidget())) focusEntry();
}

} // namespace hierloom::ui
