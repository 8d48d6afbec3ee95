// SPDX-License-Identifier: GPL-3.0-or-later
// Reading a colony file's header must not cost the SQLite locks this process
// holds on it (core/store/database_header.h): closing any descriptor of a
// file drops every POSIX lock the process holds on it. A second process
// probes SQLite's shared-lock bytes of the file with F_GETLK while this one
// holds an open connection, before and after each reader of the header; as
// a control, a plain std::ifstream opened and closed does drop the lock.
#include "core/store/check_cache.h"
#include "core/store/colony_store.h"
#include "core/store/database_header.h"
#include "import_test_support.h"
#include "two_animal_colony.h"

#include <gtest/gtest.h>

#include <fcntl.h>
#include <fstream>
#include <sys/wait.h>
#include <unistd.h>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

/// True when another process holds a lock on the bytes SQLite uses for
/// shared locks (its "shared range" after the pending and reserved bytes),
/// asked from a child process: F_GETLK never reports one's own locks.
bool lockedFromOutside(const std::string& path)
{
    const pid_t pid = ::fork();
    if (pid == 0) {
        const int fd = ::open(path.c_str(), O_RDONLY);
        struct flock probe {};
        probe.l_type = F_WRLCK;
        probe.l_whence = SEEK_SET;
        probe.l_start = 0x40000002; // SQLite's SHARED_FIRST (PENDING_BYTE + 2)
        probe.l_len = 510;          // SHARED_SIZE
        const bool held = fd >= 0 && ::fcntl(fd, F_GETLK, &probe) == 0 && probe.l_type != F_UNLCK;
        ::_exit(held ? 1 : 0);
    }
    int status = 0;
    ::waitpid(pid, &status, 0);
    return WIFEXITED(status) && WEXITSTATUS(status) == 1;
}

} // namespace

TEST(DatabaseHeader, ReadingItKeepsTheLocksOfThisProcesssConnections)
{
    TempDir dir;
    const std::string path = dir.file("held.hierloom");
    { core::ColonyStore made = test::twoAnimalColony(path, 20); }
    core::ColonyStore store = core::ColonyStore::open(path);
    store.encounterCount(); // a read: the connection now holds its shared lock (WAL mode keeps it)
    ASSERT_TRUE(lockedFromOutside(path)) << "the probe must see this connection's lock at all";

    const auto header = core::readDatabaseHeader(path);
    ASSERT_TRUE(header);
    EXPECT_EQ(std::string(reinterpret_cast<const char*>(header->data()), 15), "SQLite format 3");
    EXPECT_TRUE(lockedFromOutside(path)) << "readDatabaseHeader";
    ASSERT_TRUE(core::colonyFileState(path));
    EXPECT_TRUE(lockedFromOutside(path)) << "colonyFileState (the check cache, around every write)";
    { core::ColonyStore second = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly); }
    EXPECT_TRUE(lockedFromOutside(path)) << "a second store opened and closed (the header check on opening)";

    // The control: a descriptor of our own, opened and closed, drops the lock.
    { std::ifstream plain(path, std::ios::binary); }
    EXPECT_FALSE(lockedFromOutside(path)) << "POSIX semantics: close() drops the process's locks on the file";
}

TEST(DatabaseHeader, AShortOrMissingFile)
{
    TempDir dir;
    EXPECT_FALSE(core::readDatabaseHeader(dir.file("none.hierloom")));
    std::ofstream(dir.file("short.txt")) << "SQLite";
    const auto h = core::readDatabaseHeader(dir.file("short.txt"));
    ASSERT_TRUE(h);
    EXPECT_EQ((*h)[0], 'S');
    EXPECT_EQ((*h)[6], 0) << "the bytes past the end read as zeros";
}
