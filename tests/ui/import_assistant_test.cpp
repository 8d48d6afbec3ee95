// SPDX-License-Identifier: GPL-3.0-or-later
// The import assistant driven with keystrokes sent to the focused widget: a
// semicolon sheet with actor/recipient codes, names, ambiguous dates and a
// name that matches no animal; the preview, the date question, the new
// animal, the import through the facade and the mapping saved and reused.
#include "tests/ui/entry_test_support.h"

#include "core/store/saved_mappings.h"
#include "ui/records/import_assistant_dialog.h"

#include <QLabel>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QTableWidget>

using namespace hierloom;
using namespace hierloom::test;

namespace {

struct Open {
    TempDir dir;
    std::string path = makeColony(dir);
    ui::ColonyDocument document;
    ui::ColonyEditFacade facade{&document};
    Open() { document.open(ui::toQString(path)); }
};

void present(QDialog& dialog)
{
    dialog.show();
    QApplication::setActiveWindow(&dialog);
    QApplication::processEvents();
}

/// Gives `w` the keyboard (as a click or Tab would) and types into whatever has the focus.
void typeInto(QDialog& dialog, QWidget* w, const QString& text)
{
    w->setFocus();
    QApplication::processEvents();
    QTest::keyClicks(focusIn(&dialog), text);
}

void pressOn(QDialog& dialog, QWidget* w, Qt::Key key)
{
    w->setFocus();
    QApplication::processEvents();
    QTest::keyClick(focusIn(&dialog), key);
}

QString cell(QTableWidget* t, int row, int column)
{
    auto* item = t->item(row, column);
    return item ? item->text() : QString();
}

} // namespace

TEST(ImportAssistant, TypedMappingPreviewDateQuestionNewAnimalImportAndReuse)
{
    Open o;
    // Ada = F1, Bea = F2, Cleo = D1, Dot = D2 live in group A.
    const std::string sheet = o.dir.write("north.csv", "Datum;Von;An;Res;Trupp\n"
                                                       "04/05/2021;Ada;Bea;+;A\n"
                                                       "06/05/2021;Cleo;Ada;-;A\n"
                                                       "07/05/2021;Nina;Dot;+;A\n");
    ui::ImportAssistantDialog dialog(&o.facade);
    present(dialog);
    typeInto(dialog, dialog.pathField(), ui::toQString(sheet));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    typeInto(dialog, dialog.layoutField(), QStringLiteral("a"));     // actor, recipient and an outcome code
    typeInto(dialog, dialog.namingField(), QStringLiteral("n"));     // names
    typeInto(dialog, dialog.columnField(core::ColumnMeaning::Date), QStringLiteral("Datum"));
    typeInto(dialog, dialog.columnField(core::ColumnMeaning::Actor), QStringLiteral("Von"));
    typeInto(dialog, dialog.columnField(core::ColumnMeaning::Recipient), QStringLiteral("An"));
    typeInto(dialog, dialog.columnField(core::ColumnMeaning::Outcome), QStringLiteral("Res"));
    typeInto(dialog, dialog.columnField(core::ColumnMeaning::Group), QStringLiteral("Trupp"));
    const core::ImportMapping typed = dialog.mapping();
    EXPECT_EQ(typed.layout, core::SheetLayout::ActorRecipient);
    EXPECT_EQ(typed.naming, core::AnimalNaming::Names);
    EXPECT_EQ(typed.column(core::ColumnMeaning::Recipient), "An");
    EXPECT_EQ(typed.column(core::ColumnMeaning::Group), "Trupp");

    // Codes, typed into their fields (found by their order in the form).
    QList<QLineEdit*> edits = dialog.findChildren<QLineEdit*>();
    QLineEdit* win = nullptr;
    QLineEdit* loss = nullptr;
    for (QLineEdit* e : edits)
        if (e->placeholderText() == QStringLiteral("codes, separated by commas")) win = e;
    ASSERT_NE(win, nullptr);
    typeInto(dialog, win, QStringLiteral("+"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Tab); // to the loss codes
    loss = qobject_cast<QLineEdit*>(QApplication::focusWidget());
    ASSERT_NE(loss, nullptr);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("-"));
    EXPECT_EQ(dialog.mapping().winCodes, std::vector<std::string>{"+"});
    EXPECT_EQ(dialog.mapping().lossCodes, std::vector<std::string>{"-"});

    // Every date reads both ways: the assistant asks, showing one, and will not import.
    EXPECT_TRUE(dialog.dateNote()->text().contains(
        QStringLiteral("'04/05/2021' reads as 2021-05-04 (day/month/year) or 2021-04-05 (month/day/year)")))
        << dialog.dateNote()->text().toStdString();
    EXPECT_FALSE(dialog.importButton()->isEnabled());
    typeInto(dialog, dialog.dateOrderField(), QStringLiteral("da")); // day/month/year
    EXPECT_EQ(dialog.mapping().dates, core::DateOrder::DayMonthYear);

    // The preview: '-' means the recipient (Ada) won; Nina matches no animal.
    QTableWidget* preview = dialog.previewTable();
    ASSERT_EQ(preview->rowCount(), 3);
    EXPECT_EQ(cell(preview, 0, 1), QStringLiteral("2021-05-04"));
    EXPECT_EQ(cell(preview, 0, 3), QStringLiteral("F1"));
    EXPECT_EQ(cell(preview, 0, 4), QStringLiteral("F2"));
    EXPECT_EQ(cell(preview, 1, 3), QStringLiteral("F1"));
    EXPECT_EQ(cell(preview, 1, 4), QStringLiteral("D1"));
    EXPECT_TRUE(cell(preview, 2, 7).contains(QStringLiteral("'Nina' is not the name of an animal")));
    EXPECT_FALSE(dialog.importButton()->isEnabled());

    // Nina becomes a new female, id N9: typed into the unknown-names table.
    QTableWidget* unknown = dialog.unknownTable();
    ASSERT_EQ(unknown->rowCount(), 1);
    EXPECT_EQ(cell(unknown, 0, 0), QStringLiteral("Nina"));
    EXPECT_EQ(cell(unknown, 0, 1), QStringLiteral("1"));
    unknown->setFocus();
    unknown->setCurrentCell(0, 2);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("N9"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    QApplication::processEvents();
    EXPECT_EQ(dialog.mapping().names.size(), 1u); // N9 is taken on Enter
    unknown = dialog.unknownTable();
    unknown->setFocus();
    unknown->setCurrentCell(0, 3);
    QTest::keyClick(focusIn(&dialog), Qt::Key_Space);
    unknown->setCurrentCell(0, 4);
    QTest::keyClicks(focusIn(&dialog), QStringLiteral("F"));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    QApplication::processEvents(); // the item delegate commits an edit on Enter through the event loop
    const core::ImportMapping chosen = dialog.mapping();
    ASSERT_EQ(chosen.names.size(), 1u) << dialog.problemText()->toPlainText().toStdString();
    EXPECT_EQ(chosen.names[0].animalId, "N9");
    EXPECT_TRUE(chosen.names[0].addNew);
    EXPECT_EQ(chosen.names[0].sex, core::Sex::Female);
    EXPECT_TRUE(dialog.importButton()->isEnabled()) << dialog.problemText()->toPlainText().toStdString();

    // Saved by name in the colony file, then imported, all through the facade.
    typeInto(dialog, dialog.nameField(), QStringLiteral("North sheet"));
    pressOn(dialog, dialog.saveButton(), Qt::Key_Space);
    ASSERT_NE(o.document.store(), nullptr);
    EXPECT_EQ(core::savedMappingNames(*o.document.store()), std::vector<std::string>{"North sheet"});
    pressOn(dialog, dialog.importButton(), Qt::Key_Space);
    EXPECT_EQ(dialog.result(), QDialog::Accepted) << dialog.problemText()->toPlainText().toStdString();
    const std::vector<core::Encounter> encounters = inFile(o.path);
    ASSERT_EQ(encounters.size(), 3u);
    EXPECT_EQ(core::formatDate(encounters[2].date), "2021-05-07");
    EXPECT_EQ(encounters[2].winner, "N9");
    EXPECT_EQ(o.document.colony().animalIndex("N9") >= 0, true);

    // A second sheet: the saved mapping chosen by typing its name fills every field.
    ui::ImportAssistantDialog again(&o.facade);
    present(again);
    typeInto(again, again.pathField(), ui::toQString(sheet));
    QTest::keyClick(focusIn(&again), Qt::Key_Return);
    typeInto(again, again.savedField(), QStringLiteral("N"));
    const core::ImportMapping reused = again.mapping();
    EXPECT_EQ(reused.dates, core::DateOrder::DayMonthYear);
    EXPECT_EQ(reused.column(core::ColumnMeaning::Actor), "Von");
    EXPECT_EQ(reused.lossCodes, std::vector<std::string>{"-"});
    EXPECT_EQ(reused.name, "North sheet");
}

// A refused import writes nothing and lists the problems in the sheet's terms.
TEST(ImportAssistant, RefusedImportWritesNothing)
{
    Open o;
    const std::string sheet = o.dir.write("bad.csv", "date,winner,loser\n2021-05-04,F1,F2\n2021-05-05,F1,M1\n");
    const std::string before = fileBytes(o.path);
    ui::ImportAssistantDialog dialog(&o.facade);
    present(dialog);
    typeInto(dialog, dialog.pathField(), ui::toQString(sheet));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    // The headers are spelled like the meanings, so they are offered at once.
    EXPECT_EQ(dialog.mapping().column(core::ColumnMeaning::Winner), "winner");
    EXPECT_TRUE(dialog.dateNote()->text().contains(QStringLiteral("YYYY-MM-DD")));
    EXPECT_FALSE(dialog.check());
    EXPECT_TRUE(dialog.problemText()->toPlainText().contains(ui::toQString(sheet) + QStringLiteral(":3: ")))
        << dialog.problemText()->toPlainText().toStdString();
    pressOn(dialog, dialog.importButton(), Qt::Key_Space);
    EXPECT_NE(dialog.result(), QDialog::Accepted);
    EXPECT_TRUE(dialog.problemText()->toPlainText().startsWith(QStringLiteral("Nothing was imported")));
    EXPECT_EQ(fileBytes(o.path), before);
}
