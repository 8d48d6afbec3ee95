// SPDX-License-Identifier: GPL-3.0-or-later
// The evening entry as a tired assistant uses it: dates typed in the usual
// forms, Ctrl+Z from any field, the day's earlier lines, refused lines and the
// session's confirmation; keystrokes go to the focused widget and every check
// reads the colony file back through a separate store.
#include "tests/ui/entry_test_support.h"

#include <QCheckBox>
#include <QComboBox>
#include <QListWidget>
#include <QTableWidget>

using namespace hierloom;
using namespace hierloom::test;

namespace {

/// Alt+D, then the date as typed, then Enter (the field is selected by Alt+D).
void typeDate(Entry& e, const QString& date)
{
    QTest::keyClick(e.focus(), Qt::Key_D, Qt::AltModifier);
    EXPECT_EQ(QApplication::focusWidget(), e.panel->dateEdit());
    QTest::keyClick(e.focus(), Qt::Key_A, Qt::ControlModifier); // in case the field had the focus already
    e.type(date);
    e.key(Qt::Key_Return);
}

/// Lets the event loop run (a button's mnemonic clicks after a short animation) until `done`.
template <typename Done>
void waitFor(Done done)
{
    for (int i = 0; i < 100 && !done(); ++i) QTest::qWait(20);
}

void ctrl(Entry& e, Qt::Key k, Qt::KeyboardModifiers more = Qt::NoModifier)
{
    QTest::keyClick(e.focus(), k, Qt::ControlModifier | more);
}

} // namespace

TEST(EveningEntry, DatesTypedWithHyphensOrDigitsAreStoredAsShown)
{
    Entry e;
    typeDate(e, "2021-04-28");
    EXPECT_EQ(e.panel->dateEdit()->text(), QStringLiteral("2021-04-28"));
    EXPECT_EQ(QApplication::focusWidget(), e.panel->timeEdit()); // Enter on the date goes on to the line
    e.line("0905", "F1", "D1");
    typeDate(e, "20210503");
    EXPECT_EQ(e.panel->dateEdit()->text(), QStringLiteral("2021-05-03")); // shown as stored
    e.line("0910", "F2", "D2");
    auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 2u);
    EXPECT_EQ(core::formatDate(rows[0].date), "2021-04-28");
    EXPECT_EQ(core::formatDate(rows[1].date), "2021-05-03");
    // The summary of the first session names the date its line was stored under.
    typeDate(e, "2021-05-04");
    EXPECT_TRUE(e.panel->summaryText().startsWith(QStringLiteral("Session ended: 2021-05-03, group A")))
        << e.panel->summaryText().toStdString();

    // Anything else is refused beside the field and no line is stored under any date.
    for (const QString bad : {QStringLiteral("2021-13-05"), QStringLiteral("2021-5-4"), QStringLiteral("2021-02-30"),
                              QStringLiteral("05.04.2021")}) {
        typeDate(e, bad);
        EXPECT_EQ(e.panel->dateEdit()->text(), bad); // never turned into another date
        EXPECT_TRUE(e.panel->fieldMessage("date").contains(QStringLiteral("is not a real date"))) << bad.toStdString();
        QTest::keyClick(e.focus(), Qt::Key_T, Qt::AltModifier);
        e.key(Qt::Key_Escape);
        e.line("0920", "F1", "F2");
        EXPECT_EQ(QApplication::focusWidget(), e.panel->dateEdit()); // the cursor goes to the field at fault
        EXPECT_EQ(inFile(e.path).size(), 2u) << bad.toStdString();
    }
}

TEST(EveningEntry, CtrlZAndCtrlShiftZUndoAndRedoWholeLinesFromAnyField)
{
    Entry e;
    e.line("0905", "F1", "D1");
    e.line("0910", "F2", "D2");
    ASSERT_EQ(inFile(e.path).size(), 2u);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->timeEdit()); // where the cursor is after Enter
    ctrl(e, Qt::Key_Z);
    EXPECT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 1);
    // Half-way through typing a winner, Ctrl+Z still takes back a line, not the letters.
    e.key(Qt::Key_Tab);
    e.type("F");
    ctrl(e, Qt::Key_Z);
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->winnerEdit()->text(), QStringLiteral("F"));
    ctrl(e, Qt::Key_Z, Qt::ShiftModifier);
    EXPECT_EQ(inFile(e.path).size(), 1u);
    ctrl(e, Qt::Key_Y);
    ASSERT_EQ(inFile(e.path).size(), 2u);
    EXPECT_EQ(inFile(e.path)[1].winner, "F2");
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 2);
}

TEST(EveningEntry, TheDaysEarlierLinesAreShownAndAnIdenticalLineAsksFirst)
{
    Entry e;
    e.line("0905", "F1", "D1");
    e.line("0910", "F2", "D2");
    e.line("", "ZZ", "D1"); // refused: counted
    e.key(Qt::Key_Escape);
    e.panel->endSession();
    ASSERT_FALSE(e.panel->summaryText().isEmpty());
    // Close the file and open it again: the day's lines are there, as earlier ones, and the session is new.
    e.document.close();
    e.document.open(ui::toQString(e.path));
    EXPECT_TRUE(e.panel->summaryText().isEmpty());
    EXPECT_EQ(e.panel->refusedList()->count(), 0);
    ASSERT_EQ(e.panel->sessionList()->rowCount(), 2);
    EXPECT_EQ(e.panel->sessionList()->item(1, 2)->text(), QStringLiteral("F2 Bea"));
    EXPECT_EQ(e.panel->sessionList()->item(1, 7)->text(), QStringLiteral("earlier (AB)"));
    EXPECT_EQ(e.panel->countText(), QStringLiteral("0 lines · 0 animals · 0 warnings · 2 earlier"));
    // Away to another date and back: still shown.
    typeDate(e, "2021-05-02");
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 0);
    typeDate(e, "2021-05-01");
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 2);
    // The identical line typed again asks before it is saved; declined, nothing is written.
    e.answer = false;
    e.line("0910", "F2", "D2");
    ASSERT_EQ(e.questions.size(), 1);
    EXPECT_TRUE(e.questions[0].contains(QStringLiteral("in the file for this day")));
    EXPECT_EQ(inFile(e.path).size(), 2u);
    e.answer = true;
    e.key(Qt::Key_Return);
    EXPECT_EQ(inFile(e.path).size(), 3u);
    EXPECT_EQ(e.panel->sessionList()->item(2, 7)->text(), QStringLiteral("this session"));
}

TEST(EveningEntry, UndoWholeSessionNamesTheLinesAsksAndTheTableMirrorsTheFile)
{
    Entry e;
    e.line("0905", "F1", "D1");
    e.line("0910", "F2", "D2");
    QStringList asked;
    answerNextBox(Qt::Key_N, &asked); // first declined
    QTest::keyClick(e.focus(), Qt::Key_U, Qt::AltModifier);
    waitFor([&] { return asked.size() == 1; });
    ASSERT_EQ(asked.size(), 1);
    EXPECT_TRUE(asked[0].startsWith(QStringLiteral("Take back the 2 lines entered in this session for 2021-05-01")))
        << asked[0].toStdString();
    QTest::qWait(200);
    EXPECT_EQ(inFile(e.path).size(), 2u);
    answerNextBox(Qt::Key_Y, &asked);
    QTest::keyClick(e.focus(), Qt::Key_U, Qt::AltModifier);
    waitFor([&] { return inFile(e.path).empty(); });
    ASSERT_EQ(asked.size(), 2);
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 0);
    // One new line: one row, and deleting it deletes just it.
    e.line("0930", "D1", "D2"); // the cursor is back on the time field
    ASSERT_EQ(inFile(e.path).size(), 1u) << e.panel->fieldMessage("line").toStdString() << "|"
                                         << e.panel->fieldMessage("winner").toStdString() << "|"
                                         << e.panel->fieldMessage("time").toStdString() << "|"
                                         << e.panel->timeEdit()->text().toStdString() << "|"
                                         << e.panel->winnerEdit()->text().toStdString();
    ASSERT_EQ(e.panel->sessionList()->rowCount(), 1);
    EXPECT_EQ(e.panel->sessionList()->item(0, 2)->text(), QStringLiteral("D1 Cleo"));
    EXPECT_EQ(e.panel->sessionList()->item(0, 3)->text(), QStringLiteral("D2 Dot"));
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->selectRow(0);
    e.key(Qt::Key_Delete);
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 0);
}

TEST(EveningEntry, ABlankObserverIsRefusedAndUnknownIsAccepted)
{
    Entry e;
    QTest::keyClick(e.focus(), Qt::Key_B, Qt::AltModifier);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->observerBox());
    QTest::keyClick(e.focus(), Qt::Key_A, Qt::ControlModifier);
    e.key(Qt::Key_Backspace);
    QTest::keyClick(e.focus(), Qt::Key_T, Qt::AltModifier);
    e.line("0905", "F1", "D1");
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_TRUE(e.panel->fieldMessage("observer").startsWith(QStringLiteral("Choose the observer")));
    EXPECT_EQ(QApplication::focusWidget(), e.panel->observerBox());
    EXPECT_EQ(e.panel->refusedList()->count(), 1);
    e.type("unknown");
    QTest::keyClick(e.focus(), Qt::Key_T, Qt::AltModifier);
    e.key(Qt::Key_Return); // the refused line is still on the entry line
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path)[0].observer, "unknown");
    EXPECT_EQ(e.panel->refusedList()->count(), 0); // saved now, so no longer listed as refused
}

TEST(EveningEntry, RefusedLinesAreListedAndCanBeRecalled)
{
    Entry e;
    e.line("0905", "F1", "ZZ");
    EXPECT_EQ(QApplication::focusWidget(), e.panel->loserEdit()); // the field at fault
    EXPECT_EQ(e.panel->fieldMessage("loser"), QStringLiteral("'ZZ' is not an animal of the colony"));
    ASSERT_EQ(e.panel->refusedList()->count(), 1);
    EXPECT_EQ(e.panel->refusedList()->item(0)->text(), QStringLiteral("0905 F1 > ZZ: 'ZZ' is not an animal of the colony"));
    EXPECT_EQ(e.panel->countText(), QStringLiteral("0 lines · 0 animals · 1 warning"));
    // Escape clears the line; the next line goes in.
    e.key(Qt::Key_Escape);
    EXPECT_TRUE(e.panel->timeEdit()->text().isEmpty());
    EXPECT_TRUE(e.panel->winnerEdit()->text().isEmpty());
    EXPECT_TRUE(e.panel->loserEdit()->text().isEmpty());
    EXPECT_EQ(QApplication::focusWidget(), e.panel->timeEdit());
    e.line("0910", "F2", "D2");
    // Alt+R, Enter: the refused line is back on the entry line; fix the loser and save it.
    QTest::keyClick(e.focus(), Qt::Key_R, Qt::AltModifier);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->refusedList());
    e.key(Qt::Key_Down);
    e.key(Qt::Key_Return);
    EXPECT_EQ(e.panel->refusedList()->count(), 0);
    EXPECT_EQ(e.panel->timeEdit()->text(), QStringLiteral("0905"));
    EXPECT_EQ(e.panel->loserEdit()->text(), QStringLiteral("ZZ"));
    QTest::keyClick(e.focus(), Qt::Key_L, Qt::AltModifier);
    e.type("D1");
    e.key(Qt::Key_Return);
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 2u);
    EXPECT_EQ(rows[1].loser, "D1");
    EXPECT_EQ(rows[1].time, 9 * 60 + 5);
}

TEST(EveningEntry, AMessageDoesNotMoveTheFields)
{
    Entry e;
    e.panel->resize(1000, 640);
    QApplication::processEvents();
    const QRect winner = e.panel->winnerEdit()->geometry();
    const QRect loser = e.panel->loserEdit()->geometry();
    const QRect table = e.panel->sessionList()->geometry();
    e.key(Qt::Key_Tab);
    e.type("Zebediah-the-very-long-unknown-animal-name");
    e.key(Qt::Key_Tab);
    e.type("Another-very-long-unknown-name-for-the-loser");
    e.key(Qt::Key_Return);
    QApplication::processEvents();
    ASSERT_FALSE(e.panel->fieldMessage("winner").isEmpty());
    ASSERT_FALSE(e.panel->fieldMessage("loser").isEmpty());
    EXPECT_EQ(e.panel->winnerEdit()->geometry(), winner);
    EXPECT_EQ(e.panel->loserEdit()->geometry(), loser);
    EXPECT_EQ(e.panel->sessionList()->geometry().top(), table.top());
    EXPECT_TRUE(inFile(e.path).empty());
}

TEST(EveningEntry, ARefusedLineFixedInPlaceLeavesTheRefusedList)
{
    // Typed as a person does: the loser is refused twice, typed again on the
    // entry row each time, then saved; the listed refusals were of that line.
    Entry e;
    e.line("0905", "F1", "ZZ");
    ASSERT_EQ(QApplication::focusWidget(), e.panel->loserEdit());
    ASSERT_EQ(e.panel->refusedList()->count(), 1);
    e.type("YY"); // the refused text is selected: typing replaces it
    e.key(Qt::Key_Return);
    ASSERT_EQ(e.panel->refusedList()->count(), 2);
    e.type("D1");
    e.key(Qt::Key_Return);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path)[0].loser, "D1");
    EXPECT_EQ(e.panel->refusedList()->count(), 0);
    // A refused line cleared with Escape stays listed when the next line is saved.
    e.line("0910", "F2", "ZZ");
    e.key(Qt::Key_Escape);
    e.line("0915", "F2", "D2");
    ASSERT_EQ(inFile(e.path).size(), 2u);
    ASSERT_EQ(e.panel->refusedList()->count(), 1);
    EXPECT_TRUE(e.panel->refusedList()->item(0)->text().startsWith(QStringLiteral("0910 F2 > ZZ")));
}

TEST(EveningEntry, AnotherLineTypedOverARefusedOneLeavesItListed)
{
    // Seen typing an evening: a refused line, then two other lines typed over
    // it on the entry row (Shift+Tab back to the time), the last one saved.
    // The first two were never saved: they stay in the refused list.
    Entry e;
    e.line("0840", "F1", "ZZ");
    ASSERT_EQ(e.panel->refusedList()->count(), 1);
    e.key(Qt::Key_Backtab);
    e.key(Qt::Key_Backtab);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->timeEdit());
    e.line("0905", "F2", "YY");
    ASSERT_EQ(e.panel->refusedList()->count(), 2);
    e.type("XX"); // the same line, its loser typed again: still refused
    e.key(Qt::Key_Return);
    ASSERT_EQ(e.panel->refusedList()->count(), 3);
    e.type("D2");
    e.key(Qt::Key_Return);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    ASSERT_EQ(e.panel->refusedList()->count(), 1) << "only the 0905 line's refusals were fixed";
    EXPECT_TRUE(e.panel->refusedList()->item(0)->text().startsWith(QStringLiteral("0840 F1 > ZZ")));
}
