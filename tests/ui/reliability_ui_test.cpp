// SPDX-License-Identifier: GPL-3.0-or-later
// The desktop side of issue 9: a damaged file is offered its newest backup,
// opening takes the scheduled backup, Back Up Now writes one, a merge driven
// through its dialog adds the other file's records, and History lists the
// audit trail of the selected animal.
#include "core/store/colony_backup.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"
#include "tests/core/import_test_support.h"
#include "ui/records/animal_table_model.h"
#include "ui/records/animal_view.h"
#include "ui/shell/backup_actions.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/entry/encounter_entry_panel.h"
#include "ui/records/encounter_view.h"
#include "ui/shell/main_window.h"
#include "ui/shell/merge_dialog.h"
#include "ui/records/record_history_dialog.h"

#include <QAction>
#include <QComboBox>
#include <QStatusBar>
#include <QTableView>
#include <QTableWidget>
#include <QUndoStack>

#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

const char* const animalsCsv = "id,name,sex,birth_date,mother,entry_type,exit_date,exit_type\n"
                               "F1,Ada,F,2010-03-01,,founder,,\n"
                               "F2,Bea,F,2012-05-02,,founder,,\n"
                               "D1,Cleo,F,2015-04-03,F1,born,,\n";

const char* const encountersCsv = "date,time,winner,loser,behaviour,observer\n"
                                  "2020-01-01,09:00,F1,F2,displace,AB\n"
                                  "2021-05-01,10:30,F1,D1,threat,AB\n"
                                  "2022-02-02,12:00,F2,D1,displace,AB\n";

std::string makeColony(const TempDir& dir, const std::string& name)
{
    const std::string path = dir.file(name);
    core::ColonyStore store = core::ColonyStore::create(path);
    core::ImportPaths paths{dir.write("animals.csv", animalsCsv), {}, dir.write("encounters.csv", encountersCsv)};
    const core::ImportResult plan = core::importFiles(store, paths, core::today());
    EXPECT_TRUE(plan.ok()) << plan.problems.text();
    return path;
}

std::string bytesOf(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream out;
    out << in.rdbuf();
    return out.str();
}

/// Records errors and answers questions without modal boxes.
class TestWindow : public ui::MainWindow {
public:
    QStringList errors;
    QStringList questions;
    bool answer = true;

protected:
    void reportError(const QString& title, const QString& message) override
    {
        errors << title + QStringLiteral(": ") + message;
    }
    bool askQuestion(const QString& title, const QString& message) override
    {
        questions << title + QStringLiteral(": ") + message;
        return answer;
    }
};

} // namespace

TEST(ReliabilityUi, DamagedFileIsOfferedItsNewestBackup)
{
    TempDir dir;
    const std::string path = makeColony(dir, "colony.hierloom");
    {
        const core::ColonyStore store = core::ColonyStore::open(path);
        core::backupColony(store, std::chrono::system_clock::now());
    }
    // The header page alone: SQLite reads it as a database, the colony tables are gone (as in colony_store_test).
    const std::string damaged = bytesOf(path).substr(0, 300);
    std::ofstream(path, std::ios::binary | std::ios::trunc) << damaged;
    ASSERT_EQ(core::listBackups(path).size(), 1u);

    // Declined: the error is shown and the damaged file is left as it was.
    {
        TestWindow window;
        window.answer = false;
        EXPECT_FALSE(window.openColony(QString::fromStdString(path)));
        ASSERT_EQ(window.questions.size(), 1);
        EXPECT_TRUE(window.questions[0].contains(QStringLiteral("backup"))) << window.questions[0].toStdString();
        EXPECT_EQ(window.errors.size(), 1);
        EXPECT_FALSE(window.document()->isOpen());
        EXPECT_EQ(bytesOf(path), damaged);
    }
    // Accepted: the backup's records open, and the damaged file is kept in the backup folder.
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path))) << window.errors.join('\n').toStdString();
    EXPECT_EQ(window.questions.size(), 1);
    EXPECT_TRUE(window.errors.isEmpty()) << window.errors.join('\n').toStdString();
    EXPECT_EQ(window.document()->pedigree().animals.size(), 3u);
    EXPECT_EQ(window.document()->encounters().size(), 3u);
    EXPECT_EQ(window.encounterView()->visibleRowCount(), 3);
    bool keptDamaged = false;
    for (const auto& entry : std::filesystem::directory_iterator(core::backupFolder(path)))
        if (entry.path().filename().string().find("-damaged-") != std::string::npos)
            keptDamaged = bytesOf(entry.path().string()) == damaged;
    EXPECT_TRUE(keptDamaged);
}

TEST(ReliabilityUi, OpeningTakesTheScheduledBackupAndBackUpNowAddsOne)
{
    TempDir dir;
    const std::string path = makeColony(dir, "colony.hierloom");
    ASSERT_TRUE(core::listBackups(path).empty());
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    // No backup yet, so the 24-hour schedule is due at once (colony_backup.h default).
    EXPECT_EQ(core::listBackups(path).size(), 1u);
    // Opened again within the interval: no second scheduled backup.
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    EXPECT_EQ(core::listBackups(path).size(), 1u);

    ASSERT_TRUE(window.backupActions()->backUpAction()->isEnabled());
    window.backupActions()->backUpAction()->trigger();
    const auto backups = core::listBackups(path);
    ASSERT_EQ(backups.size(), 2u);
    EXPECT_TRUE(std::filesystem::exists(backups.front().path));
    // The backup is a colony file with the same records.
    const core::ColonyStore copy = core::ColonyStore::open(backups.front().path, core::ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(copy.encounterCount(), 3);
    EXPECT_TRUE(window.errors.isEmpty()) << window.errors.join('\n').toStdString();
}

// A colony kept open for days: the periodic check takes the next backup once
// the 24-hour interval has passed, and only then.
TEST(ReliabilityUi, AColonyKeptOpenGetsItsScheduledBackups)
{
    TempDir dir;
    const std::string path = makeColony(dir, "colony.hierloom");
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    ASSERT_EQ(core::listBackups(path).size(), 1u);
    const auto now = std::chrono::system_clock::now();
    window.backupActions()->checkSchedule(now + std::chrono::hours(23));
    EXPECT_EQ(core::listBackups(path).size(), 1u);
    window.backupActions()->checkSchedule(now + std::chrono::hours(25));
    EXPECT_EQ(core::listBackups(path).size(), 2u);
    window.backupActions()->checkSchedule(now + std::chrono::hours(26));
    EXPECT_EQ(core::listBackups(path).size(), 2u);
    EXPECT_TRUE(window.errors.isEmpty()) << window.errors.join('\n').toStdString();
}

TEST(ReliabilityUi, MergeDialogAddsTheOtherFilesNewEncounter)
{
    TempDir dir;
    const std::string ours = makeColony(dir, "ours.hierloom");
    const std::string theirs = dir.file("theirs.hierloom");
    std::filesystem::copy_file(ours, theirs);
    {
        core::ColonyStore other = core::ColonyStore::open(theirs);
        core::Encounter e;
        e.date = *core::parseDate("2023-03-03");
        e.winner = "D1";
        e.loser = "F2";
        e.behaviour = "chase";
        e.observer = "CD";
        e.group = "main"; // the group the import gave these animals (an empty one is filled in by the merge)
        other.append({}, {}, {e});
    }
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(ours)));
    ASSERT_EQ(window.encounterView()->visibleRowCount(), 3);
    // An edit in the undo history, which the merge will have to clear.
    ASSERT_TRUE(window.editFacade()->setObservers({"GW"}).empty());
    ASSERT_EQ(window.document()->undoStack()->count(), 1);

    ui::MergeDialog dialog(window.editFacade(), &window);
    ASSERT_TRUE(dialog.check(QString::fromStdString(theirs))) << dialog.errorText().toStdString();
    // The dry run: one new encounter, everything else already here, nothing written yet.
    EXPECT_FALSE(dialog.report().written);
    ASSERT_EQ(dialog.report().addedEncounters.size(), 1u);
    EXPECT_EQ(dialog.report().skippedEncounters, 3u);
    EXPECT_EQ(dialog.report().skippedAnimals, 3u);
    EXPECT_TRUE(dialog.report().conflicts.empty());
    EXPECT_TRUE(dialog.reportText().contains(QStringLiteral("1 encounter"))) << dialog.reportText().toStdString();
    EXPECT_EQ(window.document()->store()->encounterCount(), 3);

    ASSERT_TRUE(dialog.canMerge());
    ASSERT_TRUE(dialog.merge()) << dialog.errorText().toStdString();
    EXPECT_TRUE(dialog.report().written);
    EXPECT_EQ(window.document()->encounters().size(), 4u);
    EXPECT_EQ(window.encounterView()->visibleRowCount(), 4);
    EXPECT_EQ(window.document()->undoStack()->count(), 0);
    EXPECT_TRUE(window.statusBar()->currentMessage().contains(QStringLiteral("merge")))
        << window.statusBar()->currentMessage().toStdString();
    const auto& added = window.document()->encounters().expand().back();
    EXPECT_EQ(added.winner, "D1");
    EXPECT_EQ(added.loser, "F2");

    // Merging the same file again adds nothing.
    ui::MergeDialog again(window.editFacade(), &window);
    ASSERT_TRUE(again.check(QString::fromStdString(theirs)));
    EXPECT_TRUE(again.report().addedEncounters.empty());
    EXPECT_EQ(again.report().skippedEncounters, 4u) << again.reportText().toStdString();
    EXPECT_TRUE(again.report().conflicts.empty()) << again.reportText().toStdString();
}

// The merge dialog shows a field changed in both files with both values and
// the common one, and a deletion made in the other file, before anything is written.
TEST(ReliabilityUi, MergeDialogShowsConflictsFieldByFieldAndDeletions)
{
    TempDir dir;
    const std::string ours = makeColony(dir, "ours.hierloom");
    const std::string theirs = dir.file("theirs.hierloom");
    std::filesystem::copy_file(ours, theirs);
    std::string goneUid;
    {
        core::ColonyStore other = core::ColonyStore::open(theirs);
        other.exec("UPDATE animal SET name = 'Tilly' WHERE id = 'D1'");
        goneUid = other.loadEncounters().at(0).uid;
        other.exec(("DELETE FROM encounter WHERE uid = " + core::uidSqlLiteral(goneUid)).c_str());
    }
    {
        core::ColonyStore here = core::ColonyStore::open(ours);
        here.exec("UPDATE animal SET name = 'Tess' WHERE id = 'D1'");
    }
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(ours)));
    ui::MergeDialog dialog(window.editFacade(), &window);
    ASSERT_TRUE(dialog.check(QString::fromStdString(theirs))) << dialog.errorText().toStdString();
    ASSERT_EQ(dialog.report().conflicts.size(), 1u);
    ASSERT_EQ(dialog.report().deleted.size(), 1u);
    const QString text = dialog.reportText();
    EXPECT_TRUE(text.contains(QStringLiteral("name: here 'Tess', in the other file 'Tilly', before 'Cleo'"))) << text.toStdString();
    EXPECT_TRUE(text.contains(QStringLiteral("Deleted in the other file, would be deleted here (1)"))) << text.toStdString();
    EXPECT_FALSE(dialog.canMerge());
    const size_t backups = core::listBackups(ours).size();
    dialog.setPreference(core::MergePreference::Ours);
    ASSERT_TRUE(dialog.merge()) << dialog.errorText().toStdString();
    EXPECT_EQ(window.document()->encounters().size(), 2u);
    EXPECT_EQ(core::listBackups(ours).size(), backups + 1) << "the merge took no backup";
    EXPECT_TRUE(dialog.reportText().contains(QStringLiteral("backed up first"))) << dialog.reportText().toStdString();
}

TEST(ReliabilityUi, HistoryListsTheInsertOfANewAnimal)
{
    TempDir dir;
    const std::string path = makeColony(dir, "colony.hierloom");
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    // The session observer becomes the audit user name.
    window.entryPanel()->observerBox()->setCurrentText(QStringLiteral("GW"));
    EXPECT_EQ(window.document()->store()->userName(), "GW");

    core::Animal a;
    a.id = "N1";
    a.name = "Nell";
    a.sex = core::Sex::Female;
    a.entry = core::parseDate("2023-01-01");
    a.entryType = core::EntryType::Founder;
    const core::FieldProblems added = window.editFacade()->addAnimal(a, "");
    ASSERT_TRUE(added.empty()) << added.front().message;

    ui::AnimalView* view = window.animalView();
    QAbstractItemModel* model = view->table()->model();
    int row = -1;
    for (int r = 0; r < model->rowCount(); ++r)
        if (model->index(r, ui::AnimalTableModel::Id).data().toString() == QStringLiteral("N1")) row = r;
    ASSERT_GE(row, 0);
    view->table()->setCurrentIndex(model->index(row, ui::AnimalTableModel::Id));

    auto* history = view->findChild<QAction*>(QStringLiteral("historyAction"));
    ASSERT_NE(history, nullptr);
    EXPECT_EQ(history->shortcut(), QKeySequence(QStringLiteral("Ctrl+H")));
    history->trigger();
    auto* dialog = view->findChild<ui::RecordHistoryDialog*>();
    ASSERT_NE(dialog, nullptr);
    QTableWidget* table = dialog->table();
    ASSERT_EQ(table->rowCount(), 1);
    EXPECT_EQ(table->item(0, ui::RecordHistoryDialog::Action)->text(), QStringLiteral("added"));
    EXPECT_EQ(table->item(0, ui::RecordHistoryDialog::Who)->text(), QStringLiteral("GW"));
    const QString changes = table->item(0, ui::RecordHistoryDialog::Changes)->text();
    EXPECT_TRUE(changes.contains(QStringLiteral("N1"))) << changes.toStdString();
    EXPECT_TRUE(changes.contains(QStringLiteral("Nell"))) << changes.toStdString();
    dialog->close();

    // The encounter log has the same action; the imported encounters were audited one row each.
    ui::EncounterView* encounters = window.encounterView();
    encounters->table()->setCurrentIndex(encounters->table()->model()->index(0, 0));
    auto* encounterHistory = encounters->findChild<QAction*>(QStringLiteral("historyAction"));
    ASSERT_NE(encounterHistory, nullptr);
    encounterHistory->trigger();
    auto* encounterDialog = encounters->findChild<ui::RecordHistoryDialog*>();
    ASSERT_NE(encounterDialog, nullptr);
    ASSERT_EQ(encounterDialog->table()->rowCount(), 1);
    EXPECT_EQ(encounterDialog->table()->item(0, ui::RecordHistoryDialog::Action)->text(), QStringLiteral("added"));
    encounterDialog->close();

    // An update lists only the changed field, old → new.
    core::AuditEntry update;
    update.action = "update";
    update.oldValues = R"({"id":"N1","name":"Nell"})";
    update.newValues = R"({"id":"N1","name":"Nellie"})";
    EXPECT_EQ(ui::RecordHistoryDialog::changesText(update), QStringLiteral("name: Nell \u2192 Nellie"));
}

TEST(ReliabilityUi, RestoreFromBackupAsksThenPutsTheBackupBack)
{
    TempDir dir;
    const std::string path = makeColony(dir, "colony.hierloom");
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    const QString backup = window.backupActions()->backUpNow();
    ASSERT_FALSE(backup.isEmpty());
    core::Animal a;
    a.id = "N1";
    a.sex = core::Sex::Male;
    a.entry = core::parseDate("2023-01-01");
    a.entryType = core::EntryType::Founder;
    const core::FieldProblems added = window.editFacade()->addAnimal(a, "");
    ASSERT_TRUE(added.empty()) << added.front().message;
    ASSERT_EQ(window.document()->pedigree().animals.size(), 4u);

    // Declined: nothing changes.
    window.answer = false;
    EXPECT_FALSE(window.backupActions()->restore(backup));
    EXPECT_EQ(window.questions.size(), 1);
    EXPECT_EQ(window.document()->pedigree().animals.size(), 4u);
    // Confirmed: the backup's three animals are back and the file is open for writing again.
    window.answer = true;
    EXPECT_TRUE(window.backupActions()->restore(backup)) << window.errors.join('\n').toStdString();
    EXPECT_EQ(window.questions.size(), 2);
    EXPECT_TRUE(window.document()->isOpen());
    EXPECT_FALSE(window.document()->isReadOnly());
    EXPECT_EQ(window.document()->pedigree().animals.size(), 3u);
    EXPECT_EQ(window.animalView()->visibleRowCount(), 3);
    EXPECT_TRUE(window.errors.isEmpty()) << window.errors.join('\n').toStdString();
    // The added animal's undo step is gone, and the status bar says why.
    EXPECT_EQ(window.document()->undoStack()->count(), 0);
    EXPECT_TRUE(window.statusBar()->currentMessage().contains(QStringLiteral("restored from a backup")))
        << window.statusBar()->currentMessage().toStdString();
}
