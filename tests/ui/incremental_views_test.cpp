// SPDX-License-Identifier: GPL-3.0-or-later
// A line typed in the evening entry updates the other views of the main
// window without rebuilding them: the animal table is not reset (none of its
// columns comes from encounters), the encounter log's observer choice gains a
// new observer and its date range widens to the new day.
#include "tests/ui/entry_test_support.h"

#include "ui/records/animal_view.h"
#include "ui/records/encounter_view.h"
#include "ui/shell/main_window.h"

#include <QDateEdit>
#include <QSignalSpy>
#include <QTableView>

using namespace hierloom;
using namespace hierloom::test;

TEST(IncrementalViews, ATypedLineLeavesTheAnimalTableAndWidensTheLogsChoices)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    {
        // One earlier line, so the log has a date range to widen.
        core::ColonyStore store = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadWrite);
        std::vector<core::Encounter> one(1);
        one[0].date = core::dayFromCivil(2021, 5, 1);
        one[0].winner = "F1";
        one[0].loser = "F2";
        one[0].observer = "AB";
        ASSERT_TRUE(core::insertEncounters(store, one, core::today()).empty());
    }
    ui::MainWindow window;
    ASSERT_TRUE(window.openColony(ui::toQString(path)));
    window.show();
    QApplication::setActiveWindow(&window);
    const QAbstractItemModel* animals = window.animalView()->table()->model();
    QSignalSpy animalResets(animals, &QAbstractItemModel::modelReset);
    QSignalSpy animalLayouts(animals, &QAbstractItemModel::layoutChanged);

    // F6, the date, Alt+G and the group, Alt+B and a new observer, then the line.
    QTest::keyClick(focusIn(&window), Qt::Key_F6);
    QTest::keyClick(focusIn(&window), Qt::Key_D, Qt::AltModifier);
    QTest::keyClick(focusIn(&window), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(focusIn(&window), QStringLiteral("2021-06-15"));
    QTest::keyClick(focusIn(&window), Qt::Key_Return);
    QTest::keyClick(focusIn(&window), Qt::Key_G, Qt::AltModifier);
    QTest::keyClicks(focusIn(&window), QStringLiteral("A"));
    QTest::keyClick(focusIn(&window), Qt::Key_B, Qt::AltModifier);
    QTest::keyClicks(focusIn(&window), QStringLiteral("ZZ"));
    QTest::keyClick(focusIn(&window), Qt::Key_T, Qt::AltModifier);
    QTest::keyClicks(focusIn(&window), QStringLiteral("0930"));
    QTest::keyClick(focusIn(&window), Qt::Key_Tab);
    QTest::keyClicks(focusIn(&window), QStringLiteral("D1"));
    QTest::keyClick(focusIn(&window), Qt::Key_Tab);
    QTest::keyClicks(focusIn(&window), QStringLiteral("D2"));
    QTest::keyClick(focusIn(&window), Qt::Key_Return);
    ASSERT_EQ(inFile(path).size(), 2u) << window.entryPanel()->fieldMessage("line").toStdString()
                                       << window.entryPanel()->fieldMessage("observer").toStdString();

    EXPECT_EQ(animalResets.count(), 0);
    EXPECT_EQ(animalLayouts.count(), 0);
    EXPECT_EQ(animals->rowCount(), 6);
    ui::EncounterView* log = window.encounterView();
    EXPECT_EQ(log->visibleRowCount(), 2);
    log->setObserver(QStringLiteral("ZZ")); // an observer not offered would leave the log unfiltered
    EXPECT_EQ(log->visibleRowCount(), 1);
    QDate latest;
    for (const QDateEdit* edit : log->findChildren<QDateEdit*>()) latest = std::max(latest, edit->date());
    EXPECT_EQ(latest, QDate(2021, 6, 15));
}
