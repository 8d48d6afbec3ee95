// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/entry/animal_matcher.h"
#include "core/base/colony.h"
#include "core/base/field_problem.h"

#include <QWidget>

#include <cstdint>
#include <functional>
#include <optional>
#include <set>
#include <vector>

class QCheckBox;
class QComboBox;
class QCompleter;
class QDateEdit;
class QLabel;
class QLineEdit;
class QPushButton;
class QStringListModel;
class QTableWidget;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// Evening entry of one observer's notebook: a session header (date, group,
/// observer) chosen once, then one line per encounter in the notebook's order
/// (time, winner, loser, draw, behaviour, note). Enter commits the line through
/// the edit facade, so it is in the file at once; ids complete from the
/// animals resident in the group that day, and mistakes are shown beside the
/// field as they are typed. The session list below can be edited (F2), rows
/// deleted (Del) and the whole session taken back in one undoable step.
class EncounterEntryPanel : public QWidget {
    Q_OBJECT
public:
    explicit EncounterEntryPanel(ColonyEditFacade* facade, QWidget* parent = nullptr);

    /// Asks whether to save a possible duplicate; tests replace the modal question.
    using Question = std::function<bool(const QString& question)>;
    void setDuplicateQuestion(Question question) { askDuplicate_ = std::move(question); }

    /// Commits the entry line (what Enter does); false when refused or declined.
    bool commitLine();
    /// Loads the selected session row into the entry line for changing (F2).
    void editSelectedRow();
    /// Deletes the selected session rows (Del).
    void deleteSelectedRows();
    /// Removes every row of this session as one undoable step.
    void undoWholeSession();
    /// Closes the session: shows its summary and starts an empty one.
    void endSession();
    /// Puts the keyboard focus on the first field of the entry line.
    void focusEntry();

    /// The message shown beside a field ("date", "time", "winner", "loser", "line"), or empty.
    QString fieldMessage(const QString& field) const;
    /// Rows of the session now in the file.
    int sessionRowCount() const;
    QString countText() const;
    QString summaryText() const;

    QDateEdit* dateEdit() const { return date_; }
    QComboBox* groupBox() const { return group_; }
    QComboBox* observerBox() const { return observer_; }
    QLineEdit* timeEdit() const { return time_; }
    QLineEdit* winnerEdit() const { return winner_; }
    QLineEdit* loserEdit() const { return loser_; }
    QCheckBox* drawBox() const { return draw_; }
    QComboBox* behaviourBox() const { return behaviour_; }
    QLineEdit* noteEdit() const { return note_; }
    QTableWidget* sessionList() const { return list_; }

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;
    void showEvent(QShowEvent* event) override;

private:
    void refreshChoices();
    void refreshResidents();
    void refreshList();
    void headerChanged();
    void checkAnimalField(QLineEdit* edit, QLabel* info);
    void checkTime();
    void checkDate();
    void showProblems(const core::FieldProblems& problems);
    void clearMessages();
    void clearLine();
    void cancelEdit();
    std::optional<int> parsedTime(bool& bad) const;
    std::vector<const core::Encounter*> sessionRows() const;
    core::Day sessionDay() const;

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    Question askDuplicate_;

    QDateEdit* date_;
    QComboBox* group_;
    QComboBox* observer_;
    QPushButton* endButton_;
    QLabel* dateInfo_;
    QLineEdit* time_;
    QLineEdit* winner_;
    QLineEdit* loser_;
    QCheckBox* draw_;
    QComboBox* behaviour_;
    QLineEdit* note_;
    QPushButton* addButton_;
    QLabel* timeInfo_;
    QLabel* winnerInfo_;
    QLabel* loserInfo_;
    QLabel* lineInfo_;
    QLabel* mode_;
    QStringListModel* completions_;
    QTableWidget* list_;
    QLabel* count_;
    QLabel* summary_;
    QPushButton* undoSession_;

    AnimalMatcher matcher_;
    std::vector<std::int64_t> sessionSeqs_;  // rows entered in this session (kept when undone, for redo)
    std::set<std::int64_t> warned_;          // rows saved despite a duplicate warning
    std::optional<core::Encounter> editing_; // the row being changed, if any
    int refusals_ = 0;                       // lines refused in this session
};

} // namespace hierloom::ui
