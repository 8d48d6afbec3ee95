// SPDX-License-Identifier: GPL-3.0-or-later
// Another program writing to the colony file while the desktop has it open
// (the command line importing an evening, a second window): the desktop
// notices before its next write, on Undo / Redo and when its window is
// activated, reads the file again, empties its undo history with a message,
// and loses neither side's lines. The other program is a second connection
// to the same file, as `hierloom-cli import` is; keystrokes go to the
// focused widget.
#include "tests/ui/entry_test_support.h"

#include "core/store/colony_edits.h"
#include "ui/shell/main_window.h"

#include <QLabel>
#include <QListWidget>
#include <QStatusBar>
#include <QTableWidget>
#include <QUndoStack>

using namespace hierloom;
using namespace hierloom::test;

namespace {

/// Another program appends one encounter of group A on 2021-05-01 and closes the file.
core::Encounter outsideLine(const std::string& path, const std::string& time, const std::string& winner,
                            const std::string& loser)
{
    core::ColonyStore other = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadWrite);
    core::Encounter e;
    e.date = core::dayFromCivil(2021, 5, 1);
    e.time = core::parseTimeOfDay(time);
    e.winner = winner;
    e.loser = loser;
    e.group = "A";
    e.observer = "CLI";
    std::vector<core::Animal> animals;
    std::vector<core::Residence> stays;
    std::vector<core::Encounter> one{e};
    other.append(animals, stays, one);
    return one.front();
}

bool hasUid(const std::vector<core::Encounter>& rows, const std::string& uid)
{
    return std::any_of(rows.begin(), rows.end(), [&](const core::Encounter& e) { return e.uid == uid; });
}

void ctrl(Entry& e, Qt::Key k, Qt::KeyboardModifiers more = Qt::NoModifier)
{
    QTest::keyClick(e.focus(), k, Qt::ControlModifier | more);
}

} // namespace

TEST(OutsideWrite, ALineTypedAfterAnotherProgramWroteIsSavedOnTopAndUndoNeverTouchesTheOtherLines)
{
    Entry e;
    e.panel->setUndoSessionQuestion([](const QString&) { return true; });
    QStringList cleared;
    QObject::connect(&e.document, &ui::ColonyDocument::historyCleared, [&](const QString& r) { cleared << r; });
    e.line("0905", "F1", "D1");
    ASSERT_EQ(e.document.undoStack()->count(), 1);

    const core::Encounter theirs = outsideLine(e.path, "07:30", "F2", "D2");
    EXPECT_TRUE(e.document.writtenElsewhere());
    // The next line is typed as if nothing happened: it is saved on top of the file as it is now.
    e.line("0910", "D1", "D2");
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 3u);
    EXPECT_TRUE(hasUid(rows, theirs.uid));
    EXPECT_EQ(rows.back().winner, "D1");
    EXPECT_FALSE(e.document.writtenElsewhere());
    // The history before the other program's write is gone, with a message naming what happened.
    EXPECT_EQ(e.document.undoStack()->count(), 1);
    ASSERT_EQ(cleared.size(), 1);
    EXPECT_EQ(cleared[0], QStringLiteral("another program changed entry.hierloom"));
    EXPECT_TRUE(e.panel->summaryText().startsWith(
        QStringLiteral("Another program changed entry.hierloom; it was read again and the undo history emptied "
                      "(encounters 1 → 2, animals 6 → 6)")))
        << e.panel->summaryText().toStdString();
    // The table mirrors the file: the other program's line is an earlier one.
    ASSERT_EQ(e.panel->sessionList()->rowCount(), 3);
    EXPECT_EQ(e.panel->countText(), QStringLiteral("2 lines · 3 animals · 0 warnings · 1 earlier"));
    EXPECT_EQ(e.document.encounters().size(), 3u);

    // Ctrl+Z takes back the line typed after the re-read, and no further.
    ctrl(e, Qt::Key_Z);
    EXPECT_EQ(inFile(e.path).size(), 2u);
    ctrl(e, Qt::Key_Z);
    ASSERT_EQ(inFile(e.path).size(), 2u);
    EXPECT_TRUE(hasUid(inFile(e.path), theirs.uid));
    // Undo Whole Session takes back this session's remaining line, never the other program's.
    QTest::keyClick(e.focus(), Qt::Key_U, Qt::AltModifier);
    for (int i = 0; i < 100 && inFile(e.path).size() != 1u; ++i) QTest::qWait(20);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path).front().uid, theirs.uid);
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 1);
}

TEST(OutsideWrite, RedoAfterAnotherProgramWroteWritesNothingAndSaysWhy)
{
    Entry e;
    e.line("0905", "F1", "D1");
    ctrl(e, Qt::Key_Z);
    ASSERT_TRUE(inFile(e.path).empty());
    ASSERT_TRUE(e.document.undoStack()->canRedo());
    QStringList failures;
    QObject::connect(&e.document, &ui::ColonyDocument::writeFailed, [&](const QString& m) { failures << m; });
    const core::Encounter theirs = outsideLine(e.path, "09:05", "F1", "D1");
    // Redo would put back a line by its old number next to the other program's: it does nothing.
    ctrl(e, Qt::Key_Z, Qt::ShiftModifier);
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 1u);
    EXPECT_EQ(rows.front().uid, theirs.uid);
    EXPECT_TRUE(failures.isEmpty()) << failures.join('\n').toStdString();
    EXPECT_FALSE(e.document.undoStack()->canRedo());
    EXPECT_FALSE(e.document.undoStack()->canUndo());
    EXPECT_TRUE(e.panel->summaryText().startsWith(QStringLiteral("Another program changed entry.hierloom")));
    ASSERT_EQ(e.panel->sessionList()->rowCount(), 1);
    EXPECT_EQ(e.panel->sessionList()->item(0, 7)->text(), QStringLiteral("earlier (CLI)"));
}

TEST(OutsideWrite, AnUndoStepReachedByTheStackItselfWritesNothingAndTheHistoryGoes)
{
    // The menu and the entry's keys go through ColonyDocument::undo(); the
    // command checks again in case anything calls the stack directly.
    Entry e;
    e.line("0905", "F1", "D1");
    e.line("0910", "F2", "D2");
    const core::Encounter theirs = outsideLine(e.path, "09:20", "D1", "D2");
    e.document.undoStack()->undo();
    EXPECT_EQ(inFile(e.path).size(), 3u); // nothing taken back
    for (int i = 0; i < 50 && e.document.undoStack()->count() > 0; ++i) QTest::qWait(10);
    EXPECT_EQ(e.document.undoStack()->count(), 0);
    EXPECT_EQ(e.document.encounters().size(), 3u);
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 3);
}

TEST(OutsideWrite, TheOtherProgramsLineCountsForTheDuplicateQuestionAndADeclinedLineStaysTyped)
{
    Entry e;
    e.line("0905", "F1", "D1");
    outsideLine(e.path, "09:30", "F2", "D2");
    e.answer = false;
    e.line("0930", "D2", "F2");
    ASSERT_EQ(e.questions.size(), 1);
    EXPECT_TRUE(e.questions[0].contains(QStringLiteral("in the file for this day"))) << e.questions[0].toStdString();
    EXPECT_EQ(inFile(e.path).size(), 2u);
    // The line is still on the entry line, to be saved with one more Enter.
    EXPECT_EQ(e.panel->winnerEdit()->text(), QStringLiteral("D2"));
    EXPECT_EQ(e.panel->loserEdit()->text(), QStringLiteral("F2"));
    e.answer = true;
    e.key(Qt::Key_Return);
    EXPECT_EQ(inFile(e.path).size(), 3u);
}

TEST(OutsideWrite, ChangingALineAnotherProgramDeletedIsRefusedAndTheTypedLineStays)
{
    Entry e;
    e.line("0905", "F1", "D1");
    // F2 on the day's table: the line is put on the entry line to be changed.
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->selectRow(0);
    e.key(Qt::Key_F2);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->timeEdit());
    {
        // Meanwhile another program deletes that encounter.
        core::ColonyStore other = core::ColonyStore::open(e.path, core::ColonyStore::Mode::ReadWrite);
        core::deleteEncounters(other, {inFile(e.path).front().uid});
    }
    e.key(Qt::Key_Tab);
    QTest::keyClick(e.focus(), Qt::Key_A, Qt::ControlModifier);
    e.type("F2");
    e.key(Qt::Key_Return);
    EXPECT_TRUE(inFile(e.path).empty()); // neither brought back nor written anew
    EXPECT_TRUE(e.panel->fieldMessage("winner").contains(QStringLiteral("no longer in the file")) ||
                e.panel->fieldMessage("line").contains(QStringLiteral("no longer in the file")))
        << e.panel->fieldMessage("line").toStdString();
    EXPECT_EQ(e.panel->winnerEdit()->text(), QStringLiteral("F2"));
    EXPECT_EQ(e.panel->loserEdit()->text(), QStringLiteral("D1"));
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 0);
}

TEST(OutsideWrite, DelAfterAnotherProgramWroteDeletesNothingUntilTheLineIsChosenAgain)
{
    Entry e;
    e.line("0905", "F1", "D1");
    e.line("0910", "F2", "D2");
    outsideLine(e.path, "08:00", "D1", "D2");
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->selectRow(1);
    e.key(Qt::Key_Delete);
    EXPECT_EQ(inFile(e.path).size(), 3u);
    EXPECT_TRUE(e.panel->fieldMessage("line").contains(QStringLiteral("Choose the line again")))
        << e.panel->fieldMessage("line").toStdString();
    // Chosen again on the table as it is now, Del deletes just it.
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->selectRow(1);
    e.key(Qt::Key_Delete);
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 2u);
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 2);
}

TEST(OutsideWrite, TheMainWindowReadsTheFileAgainWhenItIsActivated)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    ui::MainWindow window;
    ASSERT_TRUE(window.openColony(ui::toQString(path)));
    window.show();
    QApplication::setActiveWindow(&window);
    ASSERT_EQ(window.document()->encounters().size(), 0u);
    // The person goes to a terminal (another window has the keyboard) and imports there.
    QWidget terminal;
    terminal.show();
    QApplication::setActiveWindow(&terminal);
    outsideLine(path, "07:00", "F1", "F2");
    outsideLine(path, "07:05", "F1", "D1");
    EXPECT_EQ(window.document()->encounters().size(), 0u); // nothing read while away
    // Back to the window: read again at once, and said in the status bar.
    QApplication::setActiveWindow(&window);
    EXPECT_EQ(window.document()->encounters().size(), 2u);
    EXPECT_TRUE(window.statusBar()->currentMessage().startsWith(
        QStringLiteral("Another program changed entry.hierloom; it was read again and the undo history emptied "
                      "(encounters 0 → 2, animals 6 → 6)")))
        << window.statusBar()->currentMessage().toStdString();
    // Activated again with nothing new: nothing is read.
    window.statusBar()->clearMessage();
    QApplication::setActiveWindow(&terminal);
    QApplication::setActiveWindow(&window);
    EXPECT_TRUE(window.statusBar()->currentMessage().isEmpty());
}

TEST(OutsideWrite, OpeningTheFileElsewhereToReadItIsNoWrite)
{
    // A program that only reads (a report, `hierloom-cli ranks`) must not cost the person their undo history.
    Entry e;
    e.line("0905", "F1", "D1");
    {
        const core::ColonyStore reader = core::ColonyStore::open(e.path, core::ColonyStore::Mode::ReadOnly);
        EXPECT_EQ(reader.loadEncounters().size(), 1u);
    }
    {
        core::ColonyStore writerThatReads = core::ColonyStore::open(e.path, core::ColonyStore::Mode::ReadWrite);
        EXPECT_EQ(writerThatReads.loadEncounters().size(), 1u);
    }
    EXPECT_FALSE(e.document.writtenElsewhere());
    ctrl(e, Qt::Key_Z);
    EXPECT_TRUE(inFile(e.path).empty());
}
