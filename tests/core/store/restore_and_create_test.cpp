// SPDX-License-Identifier: GPL-3.0-or-later
// A restore keeps the replaced state's audit trail; a killed create leaves nothing in the way.
#include "core/demo/demo_colony_file.h"
#include "core/store/colony_backup.h"
#include "core/store/colony_store.h"
#include "core/store/record_history.h"
#include "core/store/sqlite_statement.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <filesystem>
#include <sys/wait.h>
#include <unistd.h>

using namespace hierloom::core;
using hierloom::test::TempDir;
using Clock = std::chrono::system_clock;
namespace fs = std::filesystem;

namespace {

const Clock::time_point noon = Clock::from_time_t(1714564800);

Animal female(const char* id)
{
    Animal a;
    a.id = id;
    a.sex = Sex::Female;
    a.entry = parseDate("2010-01-01");
    return a;
}

std::vector<std::string> partialsIn(const std::string& folder)
{
    std::vector<std::string> out;
    for (const auto& e : fs::directory_iterator(folder))
        if (e.path().filename().string().find(".partial") != std::string::npos) out.push_back(e.path().string());
    return out;
}

} // namespace

TEST(RestoreAuditTrail, TheReplacedStatesHistoryStaysReadableAfterARestore)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    std::string backup;
    {
        ColonyStore store = ColonyStore::create(path);
        store.append({female("F1")}, {{"F1", "main", *parseDate("2010-01-01"), std::nullopt, ""}}, {});
        backup = backupColony(store, noon);
        // After the backup: a new animal, whose history only the replaced state holds.
        store.append({female("F2")}, {{"F2", "main", *parseDate("2010-01-01"), std::nullopt, ""}}, {});
    }
    std::string uidOfF2;
    {
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        uidOfF2 = *animalUid(store, "F2");
        ASSERT_FALSE(recordHistory(store, uidOfF2).empty());
    }
    restoreBackup(backup, path, noon + std::chrono::hours(1));
    const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(store.loadAnimals().size(), 1U); // the records are the backup's
    const auto history = recordHistory(store, uidOfF2);
    ASSERT_EQ(history.size(), 1U) << "the animal's insert was lost with the replaced state";
    EXPECT_EQ(history[0].action, "insert");
    EXPECT_EQ(history[0].table, "animal");
    EXPECT_EQ(*animalUid(store, "F2"), uidOfF2); // found by id through the audit trail
    // F1's insert is not doubled, and the restore itself is recorded last.
    SqliteStatement q(store.handle(), "SELECT count(*) FROM audit WHERE tbl = 'animal' AND action = 'insert'");
    ASSERT_TRUE(q.step());
    EXPECT_EQ(q.integer(0), 2);
    SqliteStatement last(store.handle(), "SELECT action FROM audit ORDER BY id DESC LIMIT 1");
    ASSERT_TRUE(last.step());
    EXPECT_EQ(last.text(0), "restore");
    EXPECT_TRUE(partialsIn(backupFolder(path)).empty());
}

TEST(AtomicCreate, AKilledDemoLeavesNothingThatBlocksARerun)
{
    TempDir dir;
    const std::string path = dir.file("demo.hierloom");
    int pipeFds[2];
    ASSERT_EQ(::pipe(pipeFds), 0);
    const pid_t pid = ::fork();
    ASSERT_GE(pid, 0);
    if (pid == 0) {
        ::close(pipeFds[0]);
        // Killed while the file is being filled: signal the parent, then wait to be killed.
        ColonyStore::create(path, [&](ColonyStore&) {
            const char ready = 'r';
            (void)!::write(pipeFds[1], &ready, 1);
            ::pause();
        });
        ::_exit(0);
    }
    ::close(pipeFds[1]);
    char ready = 0;
    ASSERT_EQ(::read(pipeFds[0], &ready, 1), 1);
    ::kill(pid, SIGKILL);
    ::waitpid(pid, nullptr, 0);
    ::close(pipeFds[0]);
    EXPECT_FALSE(fs::exists(path)) << "a half-made file took the name";
    EXPECT_FALSE(partialsIn(dir.file("")).empty()); // the killed writer's partial file is there...
    const ColonyStore demo = createDemoColonyFile(path); // ...and does not block a re-run
    EXPECT_GT(demo.encounterCount(), 100);
    const auto left = partialsIn(dir.file(""));
    EXPECT_TRUE(left.empty()) << "the dead writer's partial file was not cleaned up: " << left.front();
    EXPECT_THROW(ColonyStore::create(path), ColonyFileError); // an existing file is still never replaced
}
