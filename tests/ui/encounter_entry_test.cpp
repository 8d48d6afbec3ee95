// SPDX-License-Identifier: GPL-3.0-or-later
// Evening entry driven through the real widgets with simulated keystrokes;
// every check reads the colony file back through a separate store.
#include "ui/entry/encounter_entry_panel.h"

#include "tests/ui/entry_test_support.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"
#include "tests/core/import_test_support.h"
#include "ui/records/animal_editor_dialog.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"

#include <QApplication>
#include <QCheckBox>
#include <QComboBox>
#include <QDateEdit>
#include <QLineEdit>
#include <QProcess>
#include <QTableWidget>
#include <QTest>
#include <QUndoStack>

#include <QClipboard>

#include <gtest/gtest.h>

using namespace hierloom;
using namespace hierloom::test;

TEST(EncounterEntry, TabOrderFollowsTheNotebook)
{
    Entry e;
    // time, winner, loser, outcome, behaviour, note (issue 5, "Keyboard").
    const QList<QWidget*> order{e.panel->timeEdit(), e.panel->winnerEdit(), e.panel->loserEdit(),
                                e.panel->drawBox(),  e.panel->behaviourBox(), e.panel->noteEdit()};
    ASSERT_EQ(QApplication::focusWidget(), order[0]);
    for (int i = 1; i < order.size(); ++i) {
        e.key(Qt::Key_Tab);
        EXPECT_EQ(QApplication::focusWidget(), order[i]) << i;
    }
}

TEST(EncounterEntry, FiveTypedLinesAreInTheFileAtOnce)
{
    Entry e;
    e.line("0905", "F1", "D1");
    const int oneLine = e.keys;
    e.line("09:20", "Cleo", "D2"); // a name works as well as an id
    e.line("930", "d2", "F2");     // ids are matched without regard to case; 930 = 09:30
    const int before = e.keys;
    e.line("", "F2", "F1");
    const int untimed = e.keys - before;
    e.line("", "D1", "Dot");
    // Each Enter wrote its row: a second connection finds all five (hand-counted above).
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 5u);
    EXPECT_EQ(rows[0].winner, "F1");
    EXPECT_EQ(rows[0].time, 9 * 60 + 5);
    EXPECT_EQ(rows[1].winner, "D1");
    EXPECT_EQ(rows[2].winner, "D2");
    EXPECT_EQ(rows[2].time, 9 * 60 + 30);
    EXPECT_FALSE(rows[3].time.has_value());
    EXPECT_EQ(rows[4].loser, "D2");
    EXPECT_EQ(rows[4].group, "A");
    EXPECT_EQ(rows[4].observer, "AB");
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 5);
    // Five lines among F1, F2, D1, D2: four animals, no warnings.
    EXPECT_EQ(e.panel->countText(), QStringLiteral("5 lines · 4 animals · 0 warnings"));
    // After an untimed line, focus comes back to the winner field.
    EXPECT_EQ(QApplication::focusWidget(), e.panel->winnerEdit());
    e.panel->endSession();
    EXPECT_TRUE(e.panel->summaryText().contains(QStringLiteral("5 lines, 4 animals, 0 warnings")))
        << e.panel->summaryText().toStdString();
    std::printf("[measure] keystrokes per line: timed %d (0905 Tab F1 Tab D1 Enter), untimed %d (F2 Tab F1 Enter)\n",
                oneLine, untimed);
}

TEST(EncounterEntry, UnknownAndNonResidentAnimalsAreRefusedBesideTheField)
{
    Entry e;
    e.line("", "ZZ", "D1");
    // The import's wording (core/store/colony_import.cpp) for an unknown id.
    EXPECT_EQ(e.panel->fieldMessage("winner"), QStringLiteral("'ZZ' is not an animal of the colony"));
    EXPECT_TRUE(inFile(e.path).empty());
    e.panel->winnerEdit()->clear();
    e.panel->loserEdit()->clear();
    e.panel->winnerEdit()->setFocus();
    e.line("", "F1", "M1");
    // M1 lives in group B (residences above), not in the session's group A.
    EXPECT_EQ(e.panel->fieldMessage("loser"), QStringLiteral("'M1' was in group 'B' on 2021-05-01, not in 'A'"));
    EXPECT_TRUE(inFile(e.path).empty());
    // Shown as typed, before Enter: the same animal twice.
    e.panel->loserEdit()->clear();
    QTest::keyClicks(e.panel->loserEdit(), QStringLiteral("F1"));
    EXPECT_EQ(e.panel->fieldMessage("loser"), QStringLiteral("'F1' is also the winner; an encounter needs two animals"));
    // A date in the future.
    e.panel->dateEdit()->setText(QDate::currentDate().addDays(2).toString(Qt::ISODate));
    EXPECT_TRUE(e.panel->fieldMessage("date").endsWith(QStringLiteral("is in the future")));
    EXPECT_FALSE(e.panel->commitLine());
    EXPECT_TRUE(inFile(e.path).empty());
}

TEST(EncounterEntry, PossibleDuplicateAsksFirst)
{
    Entry e;
    e.line("10:00", "F1", "D1");
    e.answer = false;
    e.panel->timeEdit()->setFocus();
    e.line("10:00", "D1", "F1"); // same pair, same time: asked, declined
    ASSERT_EQ(e.questions.size(), 1);
    EXPECT_EQ(inFile(e.path).size(), 1u);
    e.answer = true;
    e.panel->commitLine();
    EXPECT_EQ(inFile(e.path).size(), 2u);
    EXPECT_EQ(e.panel->countText(), QStringLiteral("2 lines · 2 animals · 1 warning"));
}

TEST(EncounterEntry, UndoAndRedoOfAnEntryAnEditADeleteAndASession)
{
    Entry e;
    QUndoStack* stack = e.document.undoStack();
    e.line("", "F1", "D1");
    ASSERT_EQ(inFile(e.path).size(), 1u);
    stack->undo(); // single entry
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 0);
    stack->redo();
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 1);
    const std::string uid = inFile(e.path)[0].uid;

    // Edit: F2 on the session row, change the loser, Enter.
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->selectRow(0);
    QTest::keyClick(e.panel->sessionList(), Qt::Key_F2);
    e.panel->loserEdit()->selectAll();
    QTest::keyClicks(e.panel->loserEdit(), QStringLiteral("F2"));
    QTest::keyClick(e.panel->loserEdit(), Qt::Key_Return);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path)[0].loser, "F2");
    EXPECT_EQ(inFile(e.path)[0].uid, uid); // the same record, changed
    stack->undo();
    EXPECT_EQ(inFile(e.path)[0].loser, "D1");
    stack->redo();
    EXPECT_EQ(inFile(e.path)[0].loser, "F2");

    // Delete with Del.
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->selectRow(0);
    QTest::keyClick(e.panel->sessionList(), Qt::Key_Delete);
    EXPECT_TRUE(inFile(e.path).empty());
    stack->undo();
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path)[0].uid, uid);
    stack->redo();
    EXPECT_TRUE(inFile(e.path).empty());
    stack->undo();

    // A whole session at once.
    e.panel->winnerEdit()->setFocus();
    e.line("", "F2", "D2");
    e.line("", "D2", "D1");
    ASSERT_EQ(inFile(e.path).size(), 3u);
    answerNextBox(Qt::Key_Y); // it asks first, naming the lines
    e.panel->undoWholeSession();
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 0);
    stack->undo();
    EXPECT_EQ(inFile(e.path).size(), 3u);
    EXPECT_EQ(e.panel->sessionList()->rowCount(), 3);
    stack->redo();
    EXPECT_TRUE(inFile(e.path).empty());
}

TEST(EncounterEntry, BirthGivesTheNewbornTheMothersMatrilineAndGroup)
{
    Entry e;
    ui::AnimalEditorDialog dialog(&e.facade, ui::AnimalEditorDialog::Mode::Birth);
    QTest::keyClicks(dialog.idEdit(), QStringLiteral("N1"));
    QTest::keyClicks(dialog.nameEdit(), QStringLiteral("Nia"));
    dialog.birthEdit()->selectAll();
    QTest::keyClicks(dialog.birthEdit(), QStringLiteral("2021-06-01"));
    // Only valid candidates: females born before 2021-06-01; M1 (male) is not offered.
    EXPECT_LT(dialog.motherBox()->findData(QStringLiteral("M1")), 0);
    dialog.motherBox()->setCurrentIndex(dialog.motherBox()->findData(QStringLiteral("D2")));
    QStringList asked;
    answerNextBox(Qt::Key_Y, &asked);
    dialog.accept();
    ASSERT_EQ(asked.size(), 1);
    EXPECT_EQ(asked[0], QStringLiteral("Record the birth of Nia (N1) to Dot (D2) on 2021-06-01?"));
    ASSERT_EQ(dialog.result(), QDialog::Accepted) << dialog.fieldMessage("mother").toStdString();
    const core::Colony colony = core::ColonyStore::open(e.path, core::ColonyStore::Mode::ReadOnly).load();
    const core::Matrilines lines(colony);
    // D2's mother is D1, whose mother is F1: the newborn's matriarch is F1.
    EXPECT_EQ(lines.id(lines.matriarch(lines.index("N1"))), "F1");
    const core::ResidenceIndex where(colony.animals, colony.residences);
    EXPECT_EQ(where.groups()[static_cast<size_t>(where.groupOn(where.animal("N1"), *core::parseDate("2021-06-01")))], "A");
    // Undone, the newborn is gone from the file.
    e.document.undoStack()->undo();
    EXPECT_EQ(core::ColonyStore::open(e.path, core::ColonyStore::Mode::ReadOnly).load().animalIndex("N1"), -1);
}

TEST(EncounterEntry, AnimalDialogShowsTheImportMessageBesideTheField)
{
    Entry e;
    ui::AnimalEditorDialog dialog(&e.facade, ui::AnimalEditorDialog::Mode::Add);
    QTest::keyClicks(dialog.idEdit(), QStringLiteral("F1"));
    QTest::keyClicks(dialog.birthEdit(), QStringLiteral("2019-01-01"));
    dialog.groupBox()->setCurrentText(QStringLiteral("A"));
    dialog.accept();
    EXPECT_NE(dialog.result(), QDialog::Accepted);
    EXPECT_EQ(dialog.fieldMessage("id"), QStringLiteral("'F1' is already in the colony"));
}

// Issue 16: control characters reached the file from the desktop too. A line
// edit ignores a typed control key, so they come in by pasting (Ctrl+V into the
// focused field) text copied from elsewhere; the entry refuses them beside the
// line with the import's words, escaped, and the cursor goes to the note.
TEST(EncounterEntry, AControlCharacterPastedIntoTheNoteIsRefusedBesideTheField)
{
    Entry e;
    if (e.focus() == e.panel->timeEdit()) e.key(Qt::Key_Tab);
    e.type(QStringLiteral("F1"));
    e.key(Qt::Key_Tab);
    e.type(QStringLiteral("F2"));
    // Tab on through the draw box and the behaviour to the note.
    while (e.focus() != e.panel->noteEdit() && e.keys < 40) e.key(Qt::Key_Tab);
    ASSERT_EQ(e.focus(), e.panel->noteEdit());
    QApplication::clipboard()->setText(QStringLiteral("limp\x1b[31m"));
    QTest::keyClick(e.focus(), Qt::Key_V, Qt::ControlModifier);
    ASSERT_EQ(e.panel->noteEdit()->text(), QStringLiteral("limp\x1b[31m"));
    e.key(Qt::Key_Return);
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->fieldMessage("note"),
              QStringLiteral("'limp\\x1b[31m' holds the control character \\x1b (only tab may appear in text)"));
    EXPECT_EQ(QApplication::focusWidget(), e.panel->noteEdit());
}

// The animal dialog refuses a name holding a NUL byte beside the name field.
TEST(EncounterEntry, AnimalDialogRefusesAControlCharacterInTheName)
{
    Entry e;
    ui::AnimalEditorDialog dialog(&e.facade, ui::AnimalEditorDialog::Mode::Add);
    dialog.QWidget::show();
    QApplication::setActiveWindow(&dialog);
    dialog.idEdit()->setFocus();
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("N1"));
    dialog.nameEdit()->setFocus();
    QApplication::clipboard()->setText(QStringLiteral("Nia") + QChar(0) + QStringLiteral("x"));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_V, Qt::ControlModifier);
    dialog.birthEdit()->setFocus();
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("2019-01-01"));
    dialog.groupBox()->setCurrentText(QStringLiteral("A"));
    dialog.accept();
    EXPECT_NE(dialog.result(), QDialog::Accepted);
    EXPECT_EQ(dialog.fieldMessage("name"),
              QStringLiteral("'Nia\\x00x' holds the control character \\x00 (only tab may appear in text)"));
    EXPECT_EQ(core::ColonyStore::open(e.path, core::ColonyStore::Mode::ReadOnly).load().animalIndex("N1"), -1);
}

TEST(EncounterEntry, LinesCommittedBeforeAKillAreInTheFile)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    QProcess helper;
    helper.start(QStringLiteral(HIERLOOM_ENTRY_CRASH_HELPER),
                 {ui::toQString(path), QStringLiteral("2021-05-01"), QStringLiteral("F1:D1"), QStringLiteral("D1:D2"),
                  QStringLiteral("F2:F1"), QStringLiteral("D2:F2"), QStringLiteral("F1:F2")});
    ASSERT_TRUE(helper.waitForFinished(30000));
    // It died by SIGKILL right after the fifth commit, closing nothing.
    EXPECT_EQ(helper.exitStatus(), QProcess::CrashExit);
    EXPECT_EQ(helper.readAllStandardOutput().count("committed"), 5);
    const auto rows = inFile(path);
    ASSERT_EQ(rows.size(), 5u);
    EXPECT_EQ(rows[4].winner, "F1");
    EXPECT_EQ(rows[4].loser, "F2");
}
