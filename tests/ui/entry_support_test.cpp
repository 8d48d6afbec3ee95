// SPDX-License-Identifier: GPL-3.0-or-later
// The supporters of each side in the evening entry, typed key by key.
#include "tests/ui/entry_test_support.h"

#include <QCompleter>
#include <QTableWidget>

using namespace hierloom;
using namespace hierloom::test;

namespace {

/// Time, winner and loser typed, then Tab to the winner's supporters (past
/// draw, behaviour and note).
void typePairThenGoToSupporters(Entry& e, const QString& time, const QString& winner, const QString& loser)
{
    e.type(time);
    e.key(Qt::Key_Tab);
    e.type(winner);
    e.key(Qt::Key_Tab);
    e.type(loser);
    for (int i = 0; i < 4; ++i) e.key(Qt::Key_Tab); // draw, behaviour, note, winner's supporters
}

} // namespace

TEST(EntrySupport, SupportersOfBothSidesAreTypedAndStored)
{
    Entry e;
    typePairThenGoToSupporters(e, "0905", "F1", "D2");
    ASSERT_EQ(QApplication::focusWidget(), e.panel->winnerSupportEdit());
    e.type("F2");
    e.key(Qt::Key_Tab);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->loserSupportEdit());
    // D2's mother Cleo (D1), typed by a prefix of her name, as in the winner field.
    e.type("Cle");
    // The completion offers the word being typed, not the whole field.
    EXPECT_EQ(e.panel->loserSupportEdit()->completer()->completionPrefix(), QStringLiteral("Cle"));
    EXPECT_EQ(e.panel->loserSupportEdit()->completer()->currentCompletion(), QStringLiteral("Cleo"));
    e.key(Qt::Key_Return);
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 1u);
    EXPECT_EQ(rows[0].winnerSupport, std::vector<std::string>{"F2"});
    EXPECT_EQ(rows[0].loserSupport, std::vector<std::string>{"D1"});
    EXPECT_TRUE(e.panel->winnerSupportEdit()->text().isEmpty()); // the line is cleared for the next one
    // The day's table shows them in its last column.
    EXPECT_EQ(e.panel->sessionList()->item(0, 8)->text(), QStringLiteral("winner's side: F2 · loser's side: D1"));
}

TEST(EntrySupport, TheSecondWordIsCompletedAloneAndTwoSupportersAreKept)
{
    Entry e;
    typePairThenGoToSupporters(e, "0910", "D1", "D2");
    e.type("F1 B");
    QCompleter* c = e.panel->winnerSupportEdit()->completer();
    // Only "B" is matched (Bea alone among the residents of A), and taking the
    // completion replaces that word and keeps F1.
    EXPECT_EQ(c->completionCount(), 1);
    EXPECT_EQ(c->currentCompletion(), QStringLiteral("F1 Bea"));
    e.type("ea");
    e.key(Qt::Key_Return);
    const auto rows = inFile(e.path);
    ASSERT_EQ(rows.size(), 1u);
    EXPECT_EQ(rows[0].winnerSupport, (std::vector<std::string>{"F1", "F2"}));
}

TEST(EntrySupport, ASupporterFromAnotherGroupOrTheLoserIsRefusedBesideTheField)
{
    Entry e;
    typePairThenGoToSupporters(e, "0915", "F1", "D1");
    e.type("M1"); // in group B
    EXPECT_EQ(e.panel->fieldMessage("winner_support"),
              QStringLiteral("'M1' was in group 'B' on 2021-05-01, not in 'A'"));
    e.key(Qt::Key_Return);
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(QApplication::focusWidget(), e.panel->winnerSupportEdit()); // the cursor goes to the field at fault
    // The loser as her own supporter: the import's words.
    e.panel->winnerSupportEdit()->clear();
    e.key(Qt::Key_Tab);
    e.type("D1");
    e.key(Qt::Key_Return);
    EXPECT_TRUE(inFile(e.path).empty());
    EXPECT_EQ(e.panel->fieldMessage("loser_support"), QStringLiteral("'D1' is the loser of this encounter, not a supporter"));
}

TEST(EntrySupport, ChangingARowLoadsItsSupportersAndAnUndoRestoresThem)
{
    Entry e;
    typePairThenGoToSupporters(e, "0920", "F1", "D2");
    e.type("F2");
    e.key(Qt::Key_Return);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    // F2 on the row, then change the supporter to D1 (Cleo).
    e.panel->sessionList()->setFocus();
    e.panel->sessionList()->setCurrentCell(0, 0);
    QTest::keyClick(e.panel->sessionList(), Qt::Key_F2);
    EXPECT_EQ(e.panel->winnerSupportEdit()->text(), QStringLiteral("F2"));
    e.panel->winnerSupportEdit()->setFocus();
    e.panel->winnerSupportEdit()->selectAll();
    e.type("D1");
    e.key(Qt::Key_Return);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path)[0].winnerSupport, std::vector<std::string>{"D1"});
    QTest::keyClick(e.focus(), Qt::Key_Z, Qt::ControlModifier);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_EQ(inFile(e.path)[0].winnerSupport, std::vector<std::string>{"F2"});
}
