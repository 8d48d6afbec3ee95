// SPDX-License-Identifier: GPL-3.0-or-later
// The pedigree dialogs (death, removal, move, birth, introduction) driven with
// keystrokes: they start from the animal given or from none, say who it is,
// ask by name before writing, and never make a group from a typo unasked.
#include "tests/ui/entry_test_support.h"

#include "core/base/residence_index.h"
#include "ui/records/animal_editor_dialog.h"
#include "ui/records/life_event_dialog.h"
#include "ui/records/animal_table_model.h"
#include "ui/records/animal_view.h"
#include "ui/shell/main_window.h"
#include "ui/widgets/caution_label.h"

#include <QComboBox>
#include <QLabel>
#include <QTableView>

using namespace hierloom;
using namespace hierloom::test;

namespace {

core::Colony colonyIn(const std::string& path)
{
    return core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly).load();
}

const core::Animal& animal(const core::Colony& c, const std::string& id)
{
    return c.animals[static_cast<size_t>(c.animalIndex(id))];
}

std::string groupOf(const core::Colony& c, const std::string& id, const char* day)
{
    const core::ResidenceIndex where(c.animals, c.residences);
    const int g = where.groupOn(where.animal(id), *core::parseDate(day));
    return g < 0 ? std::string() : where.groups()[static_cast<size_t>(g)];
}

/// Shows the dialog as a window of its own and gives it the keyboard.
void present(QDialog& dialog)
{
    dialog.show();
    QApplication::setActiveWindow(&dialog);
    QApplication::processEvents();
}

} // namespace

TEST(LifeHistoryDialogs, DeathStartsFromNothingAndAsksByName)
{
    Entry e;
    ui::LifeEventDialog dialog(&e.facade, ui::LifeEventDialog::Event::Death);
    present(dialog);
    EXPECT_TRUE(dialog.animalBox()->currentText().isEmpty()); // never the first animal of the list
    EXPECT_EQ(dialog.animalText(), QStringLiteral("No animal chosen."));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    EXPECT_EQ(dialog.message(), QStringLiteral("Choose the animal."));
    EXPECT_TRUE(dialog.isVisible());
    // Typed id, typed date (digits only), Enter: asked, declined, nothing written.
    QTest::keyClick(focusIn(&dialog), Qt::Key_A, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("D2"));
    EXPECT_TRUE(dialog.animalText().startsWith(QStringLiteral("Dot (D2) · female · ")));
    QTest::keyClick(focusIn(&dialog), Qt::Key_D, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("20210601"));
    EXPECT_EQ(dialog.animalText(), QStringLiteral("Dot (D2) · female · 3 years · group A"));
    QStringList asked;
    answerNextBox(Qt::Key_N, &asked);
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 1);
    EXPECT_EQ(asked[0], QStringLiteral("Record the death of Dot (D2) on 2021-06-01?"));
    EXPECT_FALSE(animal(colonyIn(e.path), "D2").exit.has_value());
    answerNextBox(Qt::Key_Y, &asked);
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 2);
    const core::Animal& dot = animal(colonyIn(e.path), "D2");
    ASSERT_TRUE(dot.exit.has_value());
    EXPECT_EQ(core::formatDate(*dot.exit), "2021-06-01");
    EXPECT_EQ(dot.exitType, core::ExitType::Died);
    EXPECT_EQ(dialog.result(), QDialog::Accepted);
}

TEST(LifeHistoryDialogs, RemovalStartsFromTheSelectedAnimalAndShowsTheCaution)
{
    Entry e;
    ui::LifeEventDialog dialog(&e.facade, ui::LifeEventDialog::Event::Removal, QStringLiteral("M1"));
    present(dialog);
    EXPECT_EQ(dialog.animalBox()->currentText(), QStringLiteral("Eli (M1)"));
    EXPECT_TRUE(dialog.animalText().startsWith(QStringLiteral("Eli (M1) · male · ")));
    EXPECT_TRUE(dialog.animalText().endsWith(QStringLiteral(" · group B")));
    auto* caution = dialog.findChild<QLabel*>(QStringLiteral("planningCaution"));
    ASSERT_NE(caution, nullptr);
    EXPECT_EQ(caution->text(), ui::planningCaution());
    QTest::keyClick(focusIn(&dialog), Qt::Key_D, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("2021-07-02"));
    QStringList asked;
    answerNextBox(Qt::Key_Y, &asked);
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 1);
    EXPECT_EQ(asked[0], QStringLiteral("Record the removal of Eli (M1) from the colony on 2021-07-02?"));
    EXPECT_EQ(animal(colonyIn(e.path), "M1").exitType, core::ExitType::Removed);
}

TEST(LifeHistoryDialogs, AMoveToAGroupNotInTheColonyNeedsItsOwnConfirmation)
{
    Entry e;
    ui::LifeEventDialog dialog(&e.facade, ui::LifeEventDialog::Event::Move, QStringLiteral("F2"));
    present(dialog);
    QTest::keyClick(focusIn(&dialog), Qt::Key_D, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("2021-07-02"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_G, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("Bb")); // a typo of B
    QStringList asked;
    answerNextBox(Qt::Key_Return, &asked); // Enter on the new-group question: No is its default
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 1);
    EXPECT_EQ(asked[0], QStringLiteral("There is no group 'Bb' in the colony. Create a new group named 'Bb'?"));
    EXPECT_EQ(groupOf(colonyIn(e.path), "F2", "2021-07-03"), "A");
    // Corrected to the existing group: one question, naming the move.
    QTest::keyClick(focusIn(&dialog), Qt::Key_Backspace);
    answerNextBox(Qt::Key_Y, &asked);
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 2);
    EXPECT_EQ(asked[1], QStringLiteral("Move Bea (F2) to group B on 2021-07-02?"));
    EXPECT_EQ(groupOf(colonyIn(e.path), "F2", "2021-07-03"), "B");
}

TEST(LifeHistoryDialogs, BirthStartsFromTheSelectedMotherAndNoFieldCoversTheLabels)
{
    Entry e;
    ui::AnimalEditorDialog dialog(&e.facade, ui::AnimalEditorDialog::Mode::Birth);
    dialog.startFrom(QStringLiteral("D1"));
    present(dialog);
    EXPECT_EQ(dialog.motherBox()->currentData().toString(), QStringLiteral("D1"));
    // Fields a birth does not use stay hidden instead of lying over "Id:".
    for (QWidget* unused : {static_cast<QWidget*>(dialog.entryEdit()), static_cast<QWidget*>(dialog.groupBox()),
                            static_cast<QWidget*>(dialog.exitEdit()), static_cast<QWidget*>(dialog.exitTypeBox())})
        EXPECT_FALSE(unused->isVisible());
    const QRect idLabel = [&] {
        for (QLabel* l : dialog.findChildren<QLabel*>())
            if (l->buddy() == dialog.idEdit()) return l->geometry();
        return QRect();
    }();
    ASSERT_FALSE(idLabel.isNull());
    for (QWidget* w : dialog.findChildren<QWidget*>()) {
        if (!w->isVisible() || w->parentWidget() != &dialog || qobject_cast<QLabel*>(w)) continue;
        EXPECT_FALSE(w->geometry().intersects(idLabel)) << w->metaObject()->className();
    }
    QTest::keyClick(focusIn(&dialog), Qt::Key_I, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("N2"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_N, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("Nell"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_B, Qt::AltModifier);
    QTest::keyClick(focusIn(&dialog), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("20210610"));
    EXPECT_EQ(dialog.motherText(), QStringLiteral("Cleo (D1) · female · 6 years · group A"));
    QStringList asked;
    answerNextBox(Qt::Key_Y, &asked);
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 1);
    EXPECT_EQ(asked[0], QStringLiteral("Record the birth of Nell (N2) to Cleo (D1) on 2021-06-10?"));
    const core::Colony c = colonyIn(e.path);
    ASSERT_GE(c.animalIndex("N2"), 0);
    EXPECT_EQ(animal(c, "N2").mother, "D1");
    EXPECT_EQ(groupOf(c, "N2", "2021-06-10"), "A");
}

TEST(LifeHistoryDialogs, IntroductionShowsTheCautionAndAsksBeforeANewGroup)
{
    Entry e;
    ui::AnimalEditorDialog dialog(&e.facade, ui::AnimalEditorDialog::Mode::Introduction);
    present(dialog);
    auto* caution = dialog.findChild<QLabel*>(QStringLiteral("planningCaution"));
    ASSERT_NE(caution, nullptr);
    EXPECT_TRUE(caution->isVisible());
    QTest::keyClick(focusIn(&dialog), Qt::Key_I, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("X1"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_I, Qt::AltModifier); // second &I: "Introduced on"
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("2021-08-01"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_G, Qt::AltModifier);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("C"));
    QStringList asked;
    answerNextBox(Qt::Key_Y, &asked); // the new group C, confirmed on its own
    answerNextBox(Qt::Key_Y, &asked); // then the introduction
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    ASSERT_EQ(asked.size(), 2);
    EXPECT_EQ(asked[0], QStringLiteral("There is no group 'C' in the colony. Create a new group named 'C'?"));
    EXPECT_EQ(asked[1], QStringLiteral("Record the introduction of X1 into group C on 2021-08-01?"));
    EXPECT_EQ(groupOf(colonyIn(e.path), "X1", "2021-08-02"), "C");
}

TEST(LifeHistoryDialogs, PedigreeMenuDialogsStartFromTheAnimalSelectedInTheAnimalsView)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    ui::MainWindow window;
    ASSERT_TRUE(window.openColony(ui::toQString(path)));
    window.show();
    QApplication::setActiveWindow(&window);
    QTableView* table = window.animalView()->table();
    window.showView(QStringLiteral("animals"));
    // Nothing selected: the death dialog names nobody (it once proposed the first animal).
    QStringList shown;
    auto readDialog = [&shown](int tries, auto&& self) -> void {
        QTimer::singleShot(10, [&shown, tries, self] {
            auto* dialog = qobject_cast<ui::LifeEventDialog*>(QApplication::activeModalWidget());
            if (!dialog) {
                if (tries > 0) self(tries - 1, self);
                return;
            }
            shown << dialog->animalText();
            QTest::keyClick(dialog, Qt::Key_Escape);
        });
    };
    readDialog(300, readDialog);
    QTest::keyClick(focusIn(&window), Qt::Key_D, Qt::ControlModifier | Qt::ShiftModifier);
    ASSERT_EQ(shown.size(), 1);
    EXPECT_EQ(shown[0], QStringLiteral("No animal chosen."));
    // A click on Dot's row, then Ctrl+Shift+D: the dialog is about Dot.
    int row = -1;
    for (int r = 0; r < table->model()->rowCount(); ++r)
        if (table->model()->index(r, ui::AnimalTableModel::Id).data().toString() == QStringLiteral("D2")) row = r;
    ASSERT_GE(row, 0);
    table->scrollTo(table->model()->index(row, 1));
    QTest::mouseClick(table->viewport(), Qt::LeftButton, {}, table->visualRect(table->model()->index(row, 1)).center());
    readDialog(300, readDialog);
    QTest::keyClick(focusIn(&window), Qt::Key_D, Qt::ControlModifier | Qt::ShiftModifier);
    ASSERT_EQ(shown.size(), 2);
    EXPECT_TRUE(shown[1].startsWith(QStringLiteral("Dot (D2) · female · "))) << shown[1].toStdString();
    EXPECT_FALSE(animal(colonyIn(path), "D2").exit.has_value()); // Escape wrote nothing
}

TEST(LifeHistoryDialogs, AnAnimalChosenWithTheKeyboardInTheAnimalsViewIsTheOneWhoseDeathIsRecorded)
{
    // Keys only: Ctrl+1 to the Animals view, Alt+I to its search, "Dot",
    // Tab to the table, Space on her row (the only one left); then, with the
    // search cleared, Down from the first row (D1) to the second (D2, sorted
    // by id) as a person scrolling the ledger would. Ctrl+Shift+D, Enter, Y.
    TempDir dir;
    const std::string path = makeColony(dir);
    ui::MainWindow window;
    ASSERT_TRUE(window.openColony(ui::toQString(path)));
    window.show();
    QApplication::setActiveWindow(&window);
    QTableView* table = window.animalView()->table();
    QTest::keyClick(focusIn(&window), Qt::Key_1, Qt::ControlModifier);
    ASSERT_TRUE(window.animalView()->isVisible());
    QTest::keyClick(focusIn(&window), Qt::Key_I, Qt::AltModifier);
    QTest::keyClicks(focusIn(&window), QStringLiteral("Dot"));
    ASSERT_EQ(window.animalView()->visibleRowCount(), 1);
    for (int i = 0; i < 5 && QApplication::focusWidget() != table; ++i) QTest::keyClick(focusIn(&window), Qt::Key_Tab);
    ASSERT_EQ(QApplication::focusWidget(), table);
    QTest::keyClick(focusIn(&window), Qt::Key_Space);
    QModelIndexList selected = table->selectionModel()->selectedRows(ui::AnimalTableModel::Id);
    ASSERT_EQ(selected.size(), 1);
    EXPECT_EQ(selected.front().data().toString(), QStringLiteral("D2"));
    // The search emptied again: Tab back to the table, Down from the first row.
    QTest::keyClick(focusIn(&window), Qt::Key_I, Qt::AltModifier);
    QTest::keyClick(focusIn(&window), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClick(focusIn(&window), Qt::Key_Backspace);
    ASSERT_EQ(window.animalView()->visibleRowCount(), 6);
    for (int i = 0; i < 5 && QApplication::focusWidget() != table; ++i) QTest::keyClick(focusIn(&window), Qt::Key_Tab);
    ASSERT_EQ(QApplication::focusWidget(), table);
    QTest::keyClick(focusIn(&window), Qt::Key_Home, Qt::ControlModifier);
    QTest::keyClick(focusIn(&window), Qt::Key_Down);
    selected = table->selectionModel()->selectedRows(ui::AnimalTableModel::Id);
    ASSERT_EQ(selected.size(), 1);
    EXPECT_EQ(selected.front().data().toString(), QStringLiteral("D2"));

    QStringList shown;
    QStringList asked;
    QTimer::singleShot(50, [&] {
        auto* dialog = qobject_cast<ui::LifeEventDialog*>(QApplication::activeModalWidget());
        if (!dialog) return;
        shown << dialog->animalText();
        answerNextBox(Qt::Key_Y, &asked);
        QTest::keyClick(focusIn(dialog), Qt::Key_Return);
    });
    QTest::keyClick(focusIn(&window), Qt::Key_D, Qt::ControlModifier | Qt::ShiftModifier);
    ASSERT_EQ(shown.size(), 1);
    EXPECT_TRUE(shown[0].startsWith(QStringLiteral("Dot (D2) · female · "))) << shown[0].toStdString();
    ASSERT_EQ(asked.size(), 1);
    EXPECT_TRUE(asked[0].startsWith(QStringLiteral("Record the death of Dot (D2) on "))) << asked[0].toStdString();
    const core::Colony after = colonyIn(path);
    EXPECT_TRUE(animal(after, "D2").exit.has_value());
    EXPECT_EQ(animal(after, "D2").exitType, core::ExitType::Died);
    for (const char* other : {"F1", "F2", "D1", "M1", "G1"}) EXPECT_FALSE(animal(after, other).exit.has_value()) << other;
}
