// SPDX-License-Identifier: GPL-3.0-or-later
// The import assistant driven with keystrokes sent to the focused widget: a
// semicolon sheet with actor/recipient codes, names, ambiguous dates and a
// name that matches no animal; the preview, the date question, the new
// animal, the import through the facade and the mapping saved and reused.
#include "tests/ui/entry_test_support.h"

#include "core/store/saved_mappings.h"
#include "ui/records/import_assistant_dialog.h"

#include <QCheckBox>
#include <QLabel>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QTableWidget>

#include <map>

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
    EXPECT_EQ(cell(dialog.unknownTable(), 0, 1), QStringLiteral("1")); // still counted once chosen for
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
    EXPECT_EQ(o.document.pedigree().animalIndex("N9") >= 0, true);

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
    pressOn(dialog, dialog.checkButton(), Qt::Key_Space); // checks without writing
    EXPECT_TRUE(dialog.problemText()->toPlainText().contains(ui::toQString(sheet) + QStringLiteral(":3: ")))
        << dialog.problemText()->toPlainText().toStdString();
    pressOn(dialog, dialog.importButton(), Qt::Key_Space);
    EXPECT_NE(dialog.result(), QDialog::Accepted);
    EXPECT_TRUE(dialog.problemText()->toPlainText().startsWith(QStringLiteral("Nothing was imported")));
    EXPECT_EQ(fileBytes(o.path), before);
}

namespace {

/// The mapping of a plain winner,loser sheet with ISO dates, named `name`.
void fillPlainMapping(QDialog& dialog, ui::ImportAssistantDialog& d, const std::string& sheet, const QString& name)
{
    typeInto(dialog, d.pathField(), ui::toQString(sheet));
    QTest::keyClick(focusIn(&dialog), Qt::Key_Return);
    typeInto(dialog, d.nameField(), name);
}

std::vector<std::string> savedNames(const std::string& path)
{
    return core::savedMappingNames(core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly));
}

} // namespace

// "Save the mapping with the import": saved in the import's transaction, so a
// refused import saves nothing and a refused save imports nothing.
TEST(ImportAssistant, MappingIsSavedWithTheImportOrNotAtAll)
{
    Open o;
    const std::string bad = o.dir.write("bad.csv", "date,winner,loser,group\n2021-05-04,F1,F2,A\n2021-05-05,F1,M1,A\n");
    const std::string good = o.dir.write("good.csv", "date,winner,loser,group\n2021-05-04,F1,F2,A\n");
    {
        ui::ImportAssistantDialog dialog(&o.facade);
        present(dialog);
        EXPECT_FALSE(dialog.saveWithImportField()->isEnabled()); // no name yet
        fillPlainMapping(dialog, dialog, bad, QStringLiteral("plain"));
        EXPECT_TRUE(dialog.saveWithImportField()->isEnabled());
        EXPECT_TRUE(dialog.saveWithImportField()->isChecked());
        pressOn(dialog, dialog.importButton(), Qt::Key_Space);
        EXPECT_NE(dialog.result(), QDialog::Accepted);
        EXPECT_TRUE(dialog.problemText()->toPlainText().startsWith(
            QStringLiteral("Nothing was imported and the mapping was not saved")))
            << dialog.problemText()->toPlainText().toStdString();
        EXPECT_TRUE(savedNames(o.path).empty());
        EXPECT_TRUE(inFile(o.path).empty());
    }
    // A trigger of the file refuses saved mappings: the good sheet is not imported either.
    core::ColonyStore::open(o.path).exec(
        "CREATE TRIGGER refuse_mappings BEFORE INSERT ON setting WHEN substr(NEW.key, 1, 15) = 'import_mapping:' "
        "BEGIN SELECT RAISE(ABORT, 'refused'); END");
    {
        ui::ImportAssistantDialog dialog(&o.facade);
        present(dialog);
        fillPlainMapping(dialog, dialog, good, QStringLiteral("plain"));
        pressOn(dialog, dialog.importButton(), Qt::Key_Space);
        EXPECT_NE(dialog.result(), QDialog::Accepted);
        EXPECT_TRUE(dialog.problemText()->toPlainText().contains(QStringLiteral("the mapping 'plain' could not be saved")))
            << dialog.problemText()->toPlainText().toStdString();
        EXPECT_TRUE(inFile(o.path).empty());
        // Unticked (Space on the focused box), the same sheet imports and nothing is saved.
        pressOn(dialog, dialog.saveWithImportField(), Qt::Key_Space);
        EXPECT_FALSE(dialog.saveWithImportField()->isChecked());
        pressOn(dialog, dialog.importButton(), Qt::Key_Space);
        EXPECT_EQ(dialog.result(), QDialog::Accepted) << dialog.problemText()->toPlainText().toStdString();
        EXPECT_EQ(inFile(o.path).size(), 1u);
        EXPECT_TRUE(savedNames(o.path).empty());
    }
    core::ColonyStore::open(o.path).exec("DROP TRIGGER refuse_mappings");
    {
        ui::ImportAssistantDialog dialog(&o.facade);
        present(dialog);
        fillPlainMapping(dialog, dialog, good, QStringLiteral("plain"));
        pressOn(dialog, dialog.importButton(), Qt::Key_Space);
        EXPECT_EQ(dialog.result(), QDialog::Accepted) << dialog.problemText()->toPlainText().toStdString();
        EXPECT_EQ(inFile(o.path).size(), 2u);
        EXPECT_EQ(savedNames(o.path), std::vector<std::string>{"plain"});
        // The dialog stays open with the outcome; a second press cannot import the sheet twice.
        EXPECT_TRUE(dialog.isVisible());
        EXPECT_TRUE(dialog.problemText()->toPlainText().contains(QStringLiteral("Saved the mapping as \"plain\"")))
            << dialog.problemText()->toPlainText().toStdString();
        EXPECT_FALSE(dialog.importButton()->isEnabled());
    }
}

// Tab walks the form in reading order (the column boxes before the tables and
// buttons; the read-only preview is one stop), and every Alt letter is used once.
TEST(ImportAssistant, TabOrderFollowsTheFormAndAltLettersAreUnique)
{
    Open o;
    ui::ImportAssistantDialog dialog(&o.facade);
    present(dialog);
    dialog.pathField()->setFocus();
    QApplication::processEvents();
    auto tab = [&] {
        QTest::keyClick(focusIn(&dialog), Qt::Key_Tab);
        return QApplication::focusWidget();
    };
    // Browse, saved mapping, name (the save box is off without a name), layout,
    // naming, date order, separator, group, win and draw codes (loss codes are
    // off in a winner-loser sheet): 10 stops, then the date column.
    QWidget* w = nullptr;
    for (int i = 0; i < 10; ++i) {
        w = tab();
        for (QWidget* later : std::initializer_list<QWidget*>{dialog.previewTable(), dialog.unknownTable(),
                                                              dialog.problemText(), dialog.importButton()})
            EXPECT_NE(w, later) << "stop " << i;
    }
    EXPECT_NE(qobject_cast<QLineEdit*>(w), nullptr); // the draw codes
    w = tab();
    EXPECT_EQ(w, dialog.columnField(core::ColumnMeaning::Date)) << (w ? w->objectName().toStdString() : "");
    for (int i = 0; i < 8; ++i) w = tab(); // time, winner, loser, outcome, ... note (actor and recipient are off)
    EXPECT_EQ(w, dialog.columnField(core::ColumnMeaning::Note)) << (w ? w->objectName().toStdString() : "");
    EXPECT_EQ(tab(), dialog.previewTable());
    EXPECT_EQ(tab(), dialog.unknownTable());

    // Alt+U: the outcome column, as its label says.
    QTest::keyClick(focusIn(&dialog), Qt::Key_U, Qt::AltModifier);
    EXPECT_EQ(QApplication::focusWidget(), dialog.columnField(core::ColumnMeaning::Outcome));

    std::map<QChar, QString> letters;
    auto note = [&](const QString& text) {
        const int at = text.indexOf(QLatin1Char('&'));
        if (at < 0 || at + 1 >= text.size()) return;
        const QChar c = text.at(at + 1).toLower();
        EXPECT_TRUE(letters.emplace(c, text).second)
            << "Alt+" << QString(c).toStdString() << ": " << text.toStdString() << " and "
            << letters[c].toStdString();
    };
    for (QLabel* l : dialog.findChildren<QLabel*>())
        if (l->buddy()) note(l->text());
    for (QAbstractButton* b : dialog.findChildren<QAbstractButton*>()) note(b->text());
    EXPECT_GE(letters.size(), 20u);
}
