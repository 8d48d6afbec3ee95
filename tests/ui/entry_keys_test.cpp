// SPDX-License-Identifier: GPL-3.0-or-later
// The evening entry's own keys come from one list (ui/entry/entry_keys.h):
// every key of it, each of its sequences, pressed on the focused widget as a
// person would, does what the list says; and the help's shortcut sheet lists
// every one of them.
#include "tests/ui/entry_test_support.h"

#include "ui/entry/entry_keys.h"
#include "ui/shell/main_window.h"
#include "ui/widgets/help_browser.h"

#include <QCheckBox>
#include <QListWidget>
#include <QTableWidget>
#include <QTextBrowser>

using namespace hierloom;
using namespace hierloom::test;

namespace {

void press(Entry& e, const QKeySequence& seq)
{
    QTest::keyClick(e.focus(), seq[0].key(), seq[0].keyboardModifiers());
    ++e.keys;
}

template <typename Done>
bool waitFor(Done done)
{
    for (int i = 0; i < 100 && !done(); ++i) QTest::qWait(20);
    return done();
}

/// Presses `seq` where `key` acts and checks that it did what the list says.
void checkKey(ui::EntryKey key, const QKeySequence& seq)
{
    Entry e;
    e.panel->setUndoSessionQuestion([](const QString&) { return true; });
    using K = ui::EntryKey;
    auto* panel = e.panel.get();
    auto focusIs = [&](QWidget* w) { return QApplication::focusWidget() == w; };
    switch (key) {
    case K::SaveLine:
        e.type("0905");
        e.key(Qt::Key_Tab);
        e.type("F1");
        e.key(Qt::Key_Tab);
        e.type("D1");
        press(e, seq);
        EXPECT_EQ(inFile(e.path).size(), 1u);
        break;
    case K::ClearLine:
        e.key(Qt::Key_Tab);
        e.type("F1");
        press(e, seq);
        EXPECT_TRUE(panel->winnerEdit()->text().isEmpty());
        break;
    case K::ChangeRow:
        e.line("0905", "F1", "D1");
        panel->sessionList()->setFocus();
        panel->sessionList()->selectRow(0);
        press(e, seq);
        EXPECT_TRUE(focusIs(panel->timeEdit()));
        EXPECT_EQ(panel->winnerEdit()->text(), QStringLiteral("F1"));
        break;
    case K::DeleteRows:
        e.line("0905", "F1", "D1");
        panel->sessionList()->setFocus();
        panel->sessionList()->selectRow(0);
        press(e, seq);
        EXPECT_TRUE(inFile(e.path).empty());
        break;
    case K::RecallRefused:
        e.line("0905", "ZZ", "D1"); // refused: no such animal
        e.key(Qt::Key_Escape);
        ASSERT_EQ(panel->refusedList()->count(), 1);
        panel->refusedList()->setFocus();
        panel->refusedList()->setCurrentRow(0);
        press(e, seq);
        EXPECT_EQ(panel->winnerEdit()->text(), QStringLiteral("ZZ"));
        break;
    case K::UndoLine:
        e.line("0905", "F1", "D1");
        press(e, seq);
        EXPECT_TRUE(inFile(e.path).empty());
        break;
    case K::RedoLine:
        e.line("0905", "F1", "D1");
        QTest::keyClick(e.focus(), Qt::Key_Z, Qt::ControlModifier);
        ASSERT_TRUE(inFile(e.path).empty());
        press(e, seq);
        EXPECT_EQ(inFile(e.path).size(), 1u);
        break;
    case K::Date: press(e, seq); EXPECT_TRUE(focusIs(panel->dateEdit())); break;
    case K::Group: press(e, seq); EXPECT_TRUE(focusIs(panel->groupBox())); break;
    case K::Observer: press(e, seq); EXPECT_TRUE(panel->observerBox()->isAncestorOf(QApplication::focusWidget()) || focusIs(panel->observerBox())); break;
    case K::Time: e.key(Qt::Key_Tab); press(e, seq); EXPECT_TRUE(focusIs(panel->timeEdit())); break;
    case K::Winner: press(e, seq); EXPECT_TRUE(focusIs(panel->winnerEdit())); break;
    case K::Loser: press(e, seq); EXPECT_TRUE(focusIs(panel->loserEdit())); break;
    case K::Behaviour: press(e, seq); EXPECT_TRUE(focusIs(panel->behaviourBox())); break;
    case K::Note: press(e, seq); EXPECT_TRUE(focusIs(panel->noteEdit())); break;
    case K::WinnerSupport: press(e, seq); EXPECT_TRUE(focusIs(panel->winnerSupportEdit())); break;
    case K::LoserSupport: press(e, seq); EXPECT_TRUE(focusIs(panel->loserSupportEdit())); break;
    case K::RefusedList: press(e, seq); EXPECT_TRUE(focusIs(panel->refusedList())); break;
    case K::Draw:
        press(e, seq);
        EXPECT_TRUE(waitFor([&] { return panel->drawBox()->isChecked(); }));
        break;
    case K::EndSession:
        e.line("0905", "F1", "D1");
        press(e, seq);
        EXPECT_TRUE(waitFor([&] { return panel->summaryText().startsWith(QStringLiteral("Session ended")); }));
        break;
    case K::UndoSession:
        e.line("0905", "F1", "D1");
        press(e, seq);
        EXPECT_TRUE(waitFor([&] { return inFile(e.path).empty(); }));
        break;
    }
}

} // namespace

TEST(EntryKeys, EveryListedKeyDoesWhatTheListSays)
{
    int checked = 0;
    for (const ui::EntryKeyInfo& info : ui::entryKeys()) {
        for (const QKeySequence& seq : info.sequences) {
            SCOPED_TRACE(seq.toString().toStdString() + ": " + info.what);
            checkKey(info.key, seq);
            ++checked;
        }
    }
    EXPECT_EQ(checked, 25); // 21 keys, four of them with a second sequence
}

TEST(EntryKeys, TheLabelsAltLettersAreTheListed)
{
    // "Winner" with Alt+I is shown W_inner; a letter missing from a label would leave the key dead.
    EXPECT_EQ(ui::withEntryMnemonic(QStringLiteral("Winner"), ui::EntryKey::Winner), QStringLiteral("W&inner"));
    EXPECT_EQ(ui::withEntryMnemonic(QStringLiteral("Observer:"), ui::EntryKey::Observer), QStringLiteral("O&bserver:"));
    EXPECT_EQ(ui::withEntryMnemonic(QStringLiteral("End Session"), ui::EntryKey::EndSession), QStringLiteral("End &Session"));
}

TEST(EntryKeys, TheShortcutSheetListsEveryEntryKey)
{
    ui::MainWindow window;
    ui::showHelp(&window, QStringLiteral("shortcuts.html"));
    auto* browser = window.findChild<ui::HelpBrowser*>();
    ASSERT_NE(browser, nullptr);
    const QString sheet = browser->browser()->toPlainText();
    EXPECT_TRUE(sheet.contains(QStringLiteral("In the evening entry"))) << sheet.toStdString();
    for (const ui::EntryKeyInfo& info : ui::entryKeys()) {
        EXPECT_TRUE(sheet.contains(ui::entryKeyText(info))) << ui::entryKeyText(info).toStdString();
        EXPECT_TRUE(sheet.contains(ui::entryKeyWhat(info))) << info.what;
    }
    // The menu's keys are still there too (F6 opens the entry, Ctrl+Z undoes).
    EXPECT_TRUE(sheet.contains(QStringLiteral("Evening Entry")));
    EXPECT_TRUE(sheet.contains(QKeySequence(Qt::Key_F6).toString(QKeySequence::NativeText)));
    browser->close();
}

// Found typing under Xvfb: with the winner's completion list open, Alt+O
// (or any Alt letter) was taken by the list and the next letter went into
// the winner field. The keys go to the open list, as the window system
// sends them there.
TEST(EntryKeys, AnAltLetterTypedWhileTheCompletionListIsOpenMovesAtOnce)
{
    Entry e;
    e.key(Qt::Key_Tab); // time -> winner
    ASSERT_EQ(QApplication::focusWidget(), e.panel->winnerEdit());
    e.type("F");
    QWidget* popup = QApplication::activePopupWidget();
    ASSERT_NE(popup, nullptr) << "typing F opens the completion list";
    QTest::keyClick(popup, Qt::Key_O, Qt::AltModifier);
    EXPECT_EQ(QApplication::activePopupWidget(), nullptr);
    EXPECT_EQ(QApplication::focusWidget(), e.panel->noteEdit());
    QTest::keyClicks(e.focus(), QStringLiteral("x"));
    EXPECT_EQ(e.panel->winnerEdit()->text(), QStringLiteral("F"));
    EXPECT_EQ(e.panel->noteEdit()->text(), QStringLiteral("x"));
}

// Found under Xvfb: after a line with a supporter was saved, the supporters'
// completion list stayed open under the emptied field.
TEST(EntryKeys, NoCompletionListHangsUnderTheEmptiedLineAfterASave)
{
    Entry e;
    e.type("0905");
    e.key(Qt::Key_Tab);
    e.type("F1");
    e.key(Qt::Key_Tab);
    e.type("D1");
    QTest::keyClick(e.focus(), Qt::Key_P, Qt::AltModifier);
    ASSERT_EQ(QApplication::focusWidget(), e.panel->winnerSupportEdit());
    e.type("F2");
    ASSERT_NE(QApplication::activePopupWidget(), nullptr) << "typing F2 shows its completion";
    QTest::keyClick(e.panel->winnerSupportEdit(), Qt::Key_Enter);
    ASSERT_EQ(inFile(e.path).size(), 1u);
    EXPECT_TRUE(e.panel->winnerSupportEdit()->text().isEmpty());
    EXPECT_EQ(QApplication::activePopupWidget(), nullptr);
}
