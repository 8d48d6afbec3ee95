// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/entry/animal_matcher.h"
#include "core/base/colony.h"
#include "core/base/field_problem.h"

#include <QSet>
#include <QWidget>

#include <cstdint>
#include <functional>
#include <optional>
#include <set>
#include <vector>

class QCheckBox;
class QComboBox;
class QCompleter;
class QLabel;
class QLineEdit;
class QListWidget;
class QPushButton;
class QStringListModel;
class QTableWidget;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;
class UndoKeys;

/// Evening entry of one observer's notebook: a session header (date, group,
/// observer) chosen once, then one line per encounter in the notebook's order
/// (time, winner, loser, draw, behaviour, note). Enter commits the line through
/// the edit facade, so it is in the file at once; ids complete from the
/// animals resident in the group that day, and mistakes are shown beside the
/// field as they are typed. The table below mirrors the file: every line of
/// the date and group, earlier ones marked; rows can be edited (F2), deleted
/// (Del) and this session's lines taken back in one undoable step. Refused
/// lines are listed and can be put back on the line; Ctrl+Z / Ctrl+Shift+Z
/// undo and redo whole lines from any field (ui/entry/undo_keys.h).
class EncounterEntryPanel : public QWidget {
    Q_OBJECT
public:
    explicit EncounterEntryPanel(ColonyEditFacade* facade, QWidget* parent = nullptr);

    /// Asks whether to save a possible duplicate; tests replace the modal question.
    using Question = std::function<bool(const QString& question)>;
    void setDuplicateQuestion(Question question) { askDuplicate_ = std::move(question); }
    /// Asks before taking back the whole session.
    void setUndoSessionQuestion(Question question) { askUndoSession_ = std::move(question); }

    /// Commits the entry line (what Enter does); false when refused or declined.
    bool commitLine();
    /// Loads the selected session row into the entry line for changing (F2).
    void editSelectedRow();
    /// Deletes the selected session rows (Del).
    void deleteSelectedRows();
    /// Removes every row of this session as one undoable step, after asking.
    void undoWholeSession();
    /// Closes the session: shows its summary and starts an empty one.
    void endSession();
    /// Puts the keyboard focus on the first field of the entry line.
    void focusEntry();

    /// The message shown beside a field ("date", "observer", "time", "winner", "loser",
    /// "winner_support", "loser_support", "line"), or empty.
    QString fieldMessage(const QString& field) const;
    /// Lines entered in this session that are now in the file.
    int sessionRowCount() const;
    /// The day lines are stored under (the last valid date typed).
    core::Day sessionDay() const { return day_; }
    QString countText() const;
    QString summaryText() const;

    QLineEdit* dateEdit() const { return date_; }
    QComboBox* groupBox() const { return group_; }
    QComboBox* observerBox() const { return observer_; }
    QLineEdit* timeEdit() const { return time_; }
    QLineEdit* winnerEdit() const { return winner_; }
    QLineEdit* loserEdit() const { return loser_; }
    QCheckBox* drawBox() const { return draw_; }
    QComboBox* behaviourBox() const { return behaviour_; }
    QLineEdit* noteEdit() const { return note_; }
    /// The supporters of each side: ids or names separated by spaces, completed like the winner and loser.
    QLineEdit* winnerSupportEdit() const { return winnerSupport_; }
    QLineEdit* loserSupportEdit() const { return loserSupport_; }
    QTableWidget* sessionList() const { return list_; }
    QListWidget* refusedList() const { return refused_; }

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;
    void showEvent(QShowEvent* event) override;

private:
    /// Focuses the field whose label, or clicks the button whose text, carries `pressed` (Alt+letter).
    bool jumpToMnemonic(const QKeySequence& pressed);
    QSet<QObject*> completionPopups_; ///< the completers' lists, watched for Alt letters
    void refreshChoices();
    void refreshResidents();
    void refreshList();
    void headerChanged();
    void checkAnimalField(QLineEdit* edit, QLabel* info);
    void checkSupportField(QLineEdit* edit, QLabel* info);
    /// The ids typed in a supporters field; `problem` gets the first word that is not one animal.
    std::vector<std::string> supporterIds(const QLineEdit* edit, std::optional<std::string>& problem) const;
    void checkTime();
    void dateTyped();
    void checkDate();
    void documentChanged();
    void resetSession();
    void showProblems(const core::FieldProblems& problems);
    void refuse(const core::FieldProblems& problems);
    void recallRefused();
    /// The entry line as typed: time, winner, loser, draw, behaviour, note, supporters of each side.
    QStringList typedFields() const;
    void clearMessages();
    void clearLine();
    void cancelEdit();
    std::optional<int> parsedTime(bool& bad) const;
    /// Every line in the file for the session's date and group, in entry order.
    std::vector<core::Encounter> dayRows() const;
    std::vector<core::Encounter> sessionRows() const;

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    Question askDuplicate_;
    Question askUndoSession_;

    QLineEdit* date_;
    QComboBox* group_;
    QComboBox* observer_;
    QPushButton* endButton_;
    QLabel* dateInfo_; // messages of the header: date, observer, group
    QLineEdit* time_;
    QLineEdit* winner_;
    QLineEdit* loser_;
    QCheckBox* draw_;
    QComboBox* behaviour_;
    QLineEdit* note_;
    QLineEdit* winnerSupport_;
    QLineEdit* loserSupport_;
    QPushButton* addButton_;
    QLabel* timeInfo_;
    QLabel* winnerInfo_;
    QLabel* loserInfo_;
    QLabel* winnerSupportInfo_;
    QLabel* loserSupportInfo_;
    QLabel* lineInfo_;
    QLabel* mode_;
    QStringListModel* completions_;
    QTableWidget* list_;
    QLabel* count_;
    QLabel* summary_;
    QPushButton* undoSession_;
    QListWidget* refused_;
    UndoKeys* undoKeys_;

    AnimalMatcher matcher_;
    // Positions in the document's encounters of the date and group's lines, kept
    // up to date on appends so Enter does not scan a million rows.
    mutable std::vector<size_t> dayIndex_;
    mutable bool dayIndexValid_ = false;
    core::Day day_ = 0;                      // the session's date, as stored and shown
    bool dateValid_ = true;                  // false while the date field holds no real date
    QString openPath_;                       // the file the session belongs to
    std::set<std::string> sessionUids_;      // lines entered in this session (kept when undone, for redo)
    std::set<std::string> warned_;           // lines saved despite a duplicate warning
    std::optional<core::Encounter> editing_; // the row being changed, if any
    int refusals_ = 0;                       // lines refused in this session
    static constexpr int kEntryLineRole = Qt::UserRole + 1; // a refused item: the entryLine_ it came from
    std::uint64_t entryLine_ = 1; // which line is on the entry row: a refused line fixed in place and saved leaves the refused list
};

} // namespace hierloom::ui
