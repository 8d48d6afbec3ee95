// SPDX-License-Identifier: GPL-3.0-or-later
// The Data Health view and the report's data-health section on a hand-counted
// colony; the window is typed into the focused field.
#include "tests/ui/entry_test_support.h"

#include "report/health_section.h"
#include "ui/document/compute_runner.h"
#include "ui/planning/health_view.h"

#include <QLabel>
#include <QSpinBox>
#include <QTreeWidget>

using namespace hierloom;
using namespace hierloom::test;

namespace {

struct Watched {
    TempDir dir;
    std::string path = makeColony(dir);
    ui::ColonyDocument document;
    ui::ColonyEditFacade facade{&document};
    Watched()
    {
        document.open(ui::toQString(path));
        // Group A (F1, F2, D1, D2): two observers on 2021-05-02, one of them alone on 2021-05-20.
        add("2021-05-02", "09:00", "F1", "F2", "AB");
        add("2021-05-02", "09:02", "F1", "F2", "CD"); // matches: agree
        add("2021-05-02", "09:30", "F2", "D1", "AB");
        add("2021-05-02", "09:31", "D1", "F2", "CD"); // matches: disagree
        add("2021-05-20", "10:00", "F1", "D1", "AB");
    }
    void add(const char* date, const char* time, const char* w, const char* l, const char* observer)
    {
        core::Encounter e;
        e.date = *core::parseDate(date);
        e.time = core::parseTimeOfDay(time);
        e.winner = w;
        e.loser = l;
        e.observer = observer;
        const core::FieldProblems p = facade.addEncounter(e);
        EXPECT_TRUE(p.empty()) << (p.empty() ? "" : p.front().message);
    }
};

QString cell(QTreeWidget* list, int row, int column) { return list->topLevelItem(row)->text(column); }

} // namespace

// Without a last day the window ends on the file's last record (2021-05-20), not today:
// by hand, F2 last seen 2021-05-02 is 18 days unseen, D2 never (since 2017-06-04);
// F1 and D1 were seen that day.
TEST(HealthView, OpenWindowCountsToTheFilesLastRecord)
{
    Watched w;
    ui::HealthView view(&w.document);
    view.show();
    QApplication::setActiveWindow(&view);
    view.setGroup(QStringLiteral("A"));
    auto* to = view.findChild<QLineEdit*>(QStringLiteral("healthTo"));
    ASSERT_NE(to, nullptr);
    to->setFocus();
    QApplication::processEvents();
    QTest::keyClicks(focusIn(&view), QStringLiteral("2021-05-31"));
    QTest::keyClick(focusIn(&view), Qt::Key_Return);
    QTest::keyClick(focusIn(&view), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClick(focusIn(&view), Qt::Key_Backspace); // the window's end emptied again
    QTest::keyClick(focusIn(&view), Qt::Key_Return);
    view.runner()->wait(); // computed on a worker thread
    EXPECT_EQ(view.health().reference, *core::parseDate("2021-05-20"));
    EXPECT_EQ(view.health().referenceKind, core::ReferenceDay::LastRecord);
    QTreeWidget* unseen = view.unseenList();
    ASSERT_EQ(unseen->topLevelItemCount(), 2);
    EXPECT_EQ(cell(unseen, 1, 0), QStringLiteral("F2"));
    EXPECT_EQ(cell(unseen, 1, 3), QStringLiteral("18"));
    EXPECT_TRUE(view.unseenBanner()->text().contains(QStringLiteral("on 2021-05-20 (the file's last day of records, ")))
        << view.unseenBanner()->text().toStdString();
    EXPECT_TRUE(view.unseenBanner()->text().contains(QStringLiteral(" before today)")));
}

TEST(HealthView, EffortUnseenFlagsAndAgreementForATypedWindow)
{
    Watched w;
    ui::HealthView view(&w.document);
    view.show();
    QApplication::setActiveWindow(&view);
    view.setGroup(QStringLiteral("A"));
    auto* to = view.findChild<QLineEdit*>(QStringLiteral("healthTo"));
    ASSERT_NE(to, nullptr);
    to->setFocus();
    QApplication::processEvents();
    QTest::keyClicks(focusIn(&view), QStringLiteral("2021-05-31"));
    QTest::keyClick(focusIn(&view), Qt::Key_Return);
    view.runner()->wait(); // computed on a worker thread
    EXPECT_EQ(view.health().reference, *core::parseDate("2021-05-31"));

    // Counted by hand: F1 3 encounters on 2 days, F2 4 on 1, D1 3 on 2, D2 none; all below 10.
    QTreeWidget* animals = view.animalList();
    ASSERT_EQ(animals->topLevelItemCount(), 4);
    EXPECT_EQ(cell(animals, 0, 0), QStringLiteral("D1"));
    EXPECT_EQ(cell(animals, 0, 1), QStringLiteral("3"));
    EXPECT_EQ(cell(animals, 2, 0), QStringLiteral("F1"));
    EXPECT_EQ(cell(animals, 2, 2), QStringLiteral("2"));
    EXPECT_EQ(cell(animals, 3, 1), QStringLiteral("4"));
    EXPECT_EQ(cell(animals, 3, 4), QStringLiteral("too few"));
    EXPECT_FALSE(cell(animals, 3, 5).isEmpty()); // an interval width beside the flag
    EXPECT_TRUE(cell(animals, 1, 5).isEmpty());  // D2 has no bout: no interval

    // Unseen on 2021-05-31 after more than 14 days: D2 never (since 2017-06-04), F2 since 2021-05-02 (29 days).
    QTreeWidget* unseen = view.unseenList();
    ASSERT_EQ(unseen->topLevelItemCount(), 2);
    EXPECT_EQ(cell(unseen, 0, 0), QStringLiteral("D2"));
    EXPECT_EQ(cell(unseen, 1, 0), QStringLiteral("F2"));
    EXPECT_EQ(cell(unseen, 1, 3), QStringLiteral("29"));
    EXPECT_FALSE(view.unseenBanner()->isHidden());
    EXPECT_TRUE(view.unseenBanner()->text().contains(QStringLiteral("may be ill, injured or missing: check on it")));
    EXPECT_TRUE(view.unseenBanner()->text().contains(QStringLiteral("animal-care staff")));
    EXPECT_TRUE(view.unseenBanner()->text().contains(QStringLiteral("on 2021-05-31 (the window's last day)")))
        << view.unseenBanner()->text().toStdString();

    // Typing a longer threshold into its field leaves only D2.
    auto* days = view.findChild<QSpinBox*>(QStringLiteral("healthUnseenDays"));
    days->setFocus();
    days->selectAll();
    QTest::keyClicks(focusIn(&view), QStringLiteral("30"));
    view.runner()->wait();
    EXPECT_EQ(view.unseenList()->topLevelItemCount(), 1);

    // Observers and agreement: AB 3 encounters on 2 days, CD 2 on 1; 2 matched, 1 agreeing,
    // kappa over (0,0), (0,1): p_o = 1/2, p_e = 1/2, kappa 0.
    QTreeWidget* observers = view.observerList();
    ASSERT_EQ(observers->topLevelItemCount(), 2);
    EXPECT_EQ(cell(observers, 0, 1), QStringLiteral("3"));
    EXPECT_EQ(cell(observers, 0, 2), QStringLiteral("2"));
    QTreeWidget* agreement = view.agreementList();
    ASSERT_EQ(agreement->topLevelItemCount(), 1);
    EXPECT_EQ(cell(agreement, 0, 3), QStringLiteral("2"));
    EXPECT_EQ(cell(agreement, 0, 6), QStringLiteral("1"));
    EXPECT_EQ(cell(agreement, 0, 7), QStringLiteral("0.5"));
    EXPECT_EQ(cell(agreement, 0, 8), QStringLiteral("0"));
    ASSERT_EQ(view.monthList()->topLevelItemCount(), 1);
    EXPECT_EQ(cell(view.monthList(), 0, 0), QStringLiteral("2021-05"));
}

TEST(HealthReport, SectionTablesFollowTheHealthFigures)
{
    core::DataHealth h;
    h.minEncounters = 10;
    h.animals = {{"A1", 12, 5, *core::parseDate("2021-05-20"), false, 140.5},
                 {"B2", 3, 2, *core::parseDate("2021-05-02"), true, 612.0}};
    h.unseen = {{"B2", *core::parseDate("2021-05-02"), *core::parseDate("2021-05-02"), 29}};
    h.agreement = {{"AB", "CD", 1, 2, 0, 1, 1, 0.5, 0.0}};
    const report::HealthSection s = report::healthSection(h);
    ASSERT_EQ(s.animals.rows.size(), 2u);
    EXPECT_EQ(s.animals.rows[1][4], QStringLiteral("too few data"));
    EXPECT_EQ(s.animals.rows[1][5], QStringLiteral("612"));
    EXPECT_EQ(s.animals.highlighted, (std::vector<bool>{false, true}));
    EXPECT_EQ(s.unseen.rows[0][3], QStringLiteral("29"));
    EXPECT_EQ(s.agreement.rows[0][0], QStringLiteral("AB / CD"));
    EXPECT_EQ(s.agreement.rows[0][3], QStringLiteral("1"));
    EXPECT_EQ(s.agreement.rows[0][4], QStringLiteral("50%"));
    EXPECT_EQ(s.agreement.rows[0][5], QStringLiteral("0.00"));
}
