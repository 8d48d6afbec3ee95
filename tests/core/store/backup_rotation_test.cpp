// SPDX-License-Identifier: GPL-3.0-or-later
// Backups when clocks were wrong, two programs back up at once, or a backup was killed.
#include "core/store/colony_backup.h"
#include "core/store/colony_store.h"
#include "core/store/partial_files.h"
#include "import_test_support.h"
#include "two_animal_colony.h"

#include <gtest/gtest.h>

#include <filesystem>
#include <sys/wait.h>
#include <unistd.h>
#include <utime.h>

using namespace hierloom::core;
using hierloom::test::TempDir;
using Clock = std::chrono::system_clock;
namespace fs = std::filesystem;

namespace {

const Clock::time_point noon = hierloom::test::kNoon;

ColonyStore colonyWithTwoAnimals(const std::string& path)
{
    return hierloom::test::twoAnimalColony(path, 0);
}

std::vector<std::string> namesIn(const std::string& folder)
{
    std::vector<std::string> out;
    for (const auto& e : fs::directory_iterator(folder)) out.push_back(e.path().filename().string());
    std::sort(out.begin(), out.end());
    return out;
}

} // namespace

TEST(BackupRotation, BackupsNamedInTheFutureNeitherEvictTheNewOneNorStopTheSchedule)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    ColonyStore store = colonyWithTwoAnimals(path);
    // A laptop whose clock ran a year ahead left two backups.
    backupColony(store, noon + std::chrono::hours(24 * 365));
    backupColony(store, noon + std::chrono::hours(24 * 366));
    const std::string fresh = backupColony(store, noon, 2);
    EXPECT_TRUE(fs::exists(fresh)) << "rotation deleted the backup just taken";
    auto all = listBackups(path, noon);
    ASSERT_EQ(all.size(), 3U);
    EXPECT_EQ(all[0].path, fresh); // the real backups first
    EXPECT_FALSE(all[0].future);
    EXPECT_TRUE(all[1].future);
    EXPECT_TRUE(all[2].future);
    // Two more real backups with keep 2: the first real one goes, the future ones stay.
    backupColony(store, noon + std::chrono::hours(1), 2);
    backupColony(store, noon + std::chrono::hours(2), 2);
    all = listBackups(path, noon + std::chrono::hours(2));
    ASSERT_EQ(all.size(), 4U);
    EXPECT_FALSE(fs::exists(fresh));
    EXPECT_EQ(all[0].taken, noon + std::chrono::hours(2));
    EXPECT_EQ(all[1].taken, noon + std::chrono::hours(1));
    // The schedule (24 h) counts from the newest real backup, not from next year.
    EXPECT_FALSE(backupIfDue(store, noon + std::chrono::hours(20)));
    EXPECT_TRUE(backupIfDue(store, noon + std::chrono::hours(26)));
}

TEST(BackupRotation, PartialFilesAreUniquePerProcessAndCall)
{
    const std::string a = partialPathFor("/x/c-20240501-120000.hierloom");
    const std::string b = partialPathFor("/x/c-20240501-120000.hierloom");
    EXPECT_NE(a, b);
    EXPECT_NE(a.find(".partial-"), std::string::npos);
    EXPECT_NE(a.find("-" + std::to_string(::getpid()) + "-"), std::string::npos);
}

TEST(BackupRotation, TwoProcessesBackingUpAtOnceBothSucceed)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    colonyWithTwoAnimals(path);
    std::vector<pid_t> children;
    for (int child = 0; child < 2; ++child) {
        const pid_t pid = ::fork();
        ASSERT_GE(pid, 0);
        if (pid == 0) {
            int failures = 0;
            try {
                const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
                for (int i = 0; i < 5; ++i) backupColony(store, noon, 100); // the same second each time
            } catch (const std::exception& e) {
                std::fprintf(stderr, "child: %s\n", e.what());
                failures = 1;
            }
            ::_exit(failures);
        }
        children.push_back(pid);
    }
    for (pid_t pid : children) {
        int status = 0;
        ::waitpid(pid, &status, 0);
        EXPECT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0) << "a backup failed while another ran";
    }
    // Ten backups, none lost to a shared name, no partial file left.
    EXPECT_EQ(listBackups(path, noon).size(), 10U);
    for (const std::string& name : namesIn(backupFolder(path))) EXPECT_EQ(name.find(".partial"), std::string::npos) << name;
}

TEST(BackupRotation, PartialFilesOfAKilledBackupAreRemovedByTheNextOne)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    ColonyStore store = colonyWithTwoAnimals(path);
    backupColony(store, noon);
    const std::string folder = backupFolder(path);
    char host[256] = {};
    ::gethostname(host, sizeof host - 1);
    // A writer on this host whose process is gone (a child that has exited).
    const pid_t gone = ::fork();
    if (gone == 0) ::_exit(0);
    ::waitpid(gone, nullptr, 0);
    std::string hostPart(host);
    for (char& c : hostPart)
        if (c == '-') c = '_';
    const std::string deadWriter = folder + "/c-20240501-130000.hierloom.partial-" + hostPart + "-" +
                                   std::to_string(gone) + "-0badf00d";
    std::ofstream(deadWriter) << "half a backup";
    std::ofstream(deadWriter + "-journal") << "its journal";
    // A writer on another machine, last written an hour ago: abandoned by age.
    const std::string oldRemote = folder + "/c-20240501-140000.hierloom.partial-otherhost-12345-00000001";
    std::ofstream(oldRemote) << "older";
    const std::time_t hourAgo = Clock::to_time_t(Clock::now() - std::chrono::hours(1));
    const struct utimbuf times {hourAgo, hourAgo};
    ASSERT_EQ(::utime(oldRemote.c_str(), &times), 0);
    // A writer on another machine still writing (modified just now): kept.
    const std::string liveRemote = folder + "/c-20240501-150000.hierloom.partial-otherhost-12345-00000002";
    std::ofstream(liveRemote) << "being written";
    // This process's own partial file (a writer that is alive): kept.
    const std::string alive = partialPathFor(folder + "/c-20240501-160000.hierloom");
    std::ofstream(alive) << "being written";
    // Another colony's partial file in the same folder is not this colony's business.
    const std::string otherColony = folder + "/d-20240501-130000.hierloom.partial-" + hostPart + "-" +
                                    std::to_string(gone) + "-0badf00d";
    std::ofstream(otherColony) << "not ours";

    backupColony(store, noon + std::chrono::hours(1));
    EXPECT_FALSE(fs::exists(deadWriter));
    EXPECT_FALSE(fs::exists(deadWriter + "-journal"));
    EXPECT_FALSE(fs::exists(oldRemote));
    EXPECT_TRUE(fs::exists(liveRemote));
    EXPECT_TRUE(fs::exists(alive));
    EXPECT_TRUE(fs::exists(otherColony));
    EXPECT_EQ(listBackups(path, noon + std::chrono::hours(1)).size(), 2U);
}
