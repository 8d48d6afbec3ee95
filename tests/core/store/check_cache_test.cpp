// SPDX-License-Identifier: GPL-3.0-or-later
// The checked-files cache (core/store/check_cache.h): what it remembers, what
// makes it forget, and that a cache it cannot read is no cache.
#include "core/store/check_cache.h"
#include "import_test_support.h"
#include "two_animal_colony.h"

#include <gtest/gtest.h>

#include <cstdlib>
#include <fstream>
#include <optional>
#include <string>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

constexpr std::int64_t kNs = 1'000'000'000;

ColonyFileState someState()
{
    ColonyFileState s;
    s.file = {2049, 1234, 65536, 1700000000 * kNs + 5, 1700000000 * kNs + 7};
    s.changeCounter = 3;
    s.schemaVersion = 3;
    return s;
}

/// Sets an environment variable for one scope and puts the old value back.
class ScopedEnv {
public:
    ScopedEnv(const char* name, const char* value) : name_(name)
    {
        if (const char* old = std::getenv(name)) old_ = old;
        if (value) ::setenv(name, value, 1);
        else ::unsetenv(name);
    }
    ~ScopedEnv()
    {
        if (old_) ::setenv(name_, old_->c_str(), 1);
        else ::unsetenv(name_);
    }

private:
    const char* name_;
    std::optional<std::string> old_;
};

} // namespace

TEST(CheckCache, VouchesOnlyForTheStateRecordedForThatPath)
{
    TempDir dir;
    const CheckCache cache(dir.file("cache"));
    const std::int64_t now = 1800000000;
    const ColonyFileState s = someState();
    EXPECT_FALSE(cache.vouchesFor("/colonies/a.hierloom", s, now)); // nothing recorded yet
    cache.record("/colonies/a.hierloom", s, now);
    EXPECT_TRUE(cache.vouchesFor("/colonies/a.hierloom", s, now));
    EXPECT_TRUE(cache.vouchesFor("/colonies/./x/../a.hierloom", s, now)); // the same file, named another way
    EXPECT_FALSE(cache.vouchesFor("/colonies/b.hierloom", s, now));
    // Any field that moves is a different state.
    auto changed = [&](auto&& change) {
        ColonyFileState t = s;
        change(t);
        return cache.vouchesFor("/colonies/a.hierloom", t, now);
    };
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.file.size += 16384; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.file.mtimeNs += 1; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.file.ctimeNs += 1; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.file.inode += 1; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.file.device += 1; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.changeCounter += 1; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.schemaVersion += 1; }));
    EXPECT_FALSE(changed([](ColonyFileState& t) { t.wal = FileStamp{2049, 1235, 4152, 1, 1}; }));
    // Trusted for a week at most, and never from a check dated after now (a wrong clock).
    EXPECT_TRUE(cache.vouchesFor("/colonies/a.hierloom", s, now + kCheckTrustSeconds - 1));
    EXPECT_FALSE(cache.vouchesFor("/colonies/a.hierloom", s, now + kCheckTrustSeconds));
    EXPECT_FALSE(cache.vouchesFor("/colonies/a.hierloom", s, now - 1));
    cache.forget("/colonies/a.hierloom");
    EXPECT_FALSE(cache.vouchesFor("/colonies/a.hierloom", s, now));
}

TEST(CheckCache, AWalStampAndAnyPathRoundTripThroughTheFile)
{
    TempDir dir;
    const CheckCache cache(dir.file("cache"));
    ColonyFileState s = someState();
    s.wal = FileStamp{2049, 99, 4152 + 16408, 1700000001 * kNs + 11, 1700000001 * kNs + 13};
    const std::string odd = "/colonies/tab\there\nnew line\\back.hierloom";
    cache.record(odd, s, 1800000000);
    cache.record("/colonies/plain.hierloom", someState(), 1800000000);
    const CheckCache again(dir.file("cache")); // another program reading the same file
    EXPECT_TRUE(again.vouchesFor(odd, s, 1800000000));
    EXPECT_TRUE(again.vouchesFor("/colonies/plain.hierloom", someState(), 1800000000));
    ColonyFileState withoutWal = s;
    withoutWal.wal.reset();
    EXPECT_FALSE(again.vouchesFor(odd, withoutWal, 1800000000));
    // One line per file, the newest first; the file is private to its owner.
    const std::string text = hierloom::test::fileBytes(cache.filePath());
    EXPECT_EQ(text.rfind("hierloom checked files\t1\n", 0), 0U) << text;
    EXPECT_LT(text.find("/colonies/plain.hierloom"), text.find("tab\\there\\nnew line\\\\back")) << text;
    EXPECT_EQ(std::filesystem::status(cache.filePath()).permissions() & std::filesystem::perms::all,
              std::filesystem::perms::owner_read | std::filesystem::perms::owner_write);
}

TEST(CheckCache, KeepsTheMostRecentlyCheckedFilesOnly)
{
    TempDir dir;
    const CheckCache cache(dir.file("cache"));
    const std::size_t n = kCheckCacheEntries + 6;
    for (std::size_t i = 0; i < n; ++i) cache.record("/c/" + std::to_string(i), someState(), 1800000000);
    for (std::size_t i = 0; i < n; ++i)
        EXPECT_EQ(cache.vouchesFor("/c/" + std::to_string(i), someState(), 1800000000), i >= 6) << i;
    // A file recorded again moves to the front and is kept.
    cache.record("/c/6", someState(), 1800000000);
    cache.record("/c/new", someState(), 1800000000);
    EXPECT_TRUE(cache.vouchesFor("/c/6", someState(), 1800000000));
    EXPECT_FALSE(cache.vouchesFor("/c/7", someState(), 1800000000));
}

TEST(CheckCache, ACacheFileItCannotReadIsNoCache)
{
    TempDir dir;
    const CheckCache cache(dir.file("cache"));
    std::filesystem::create_directories(dir.file("cache"));
    const ColonyFileState s = someState();
    for (const std::string& text :
         {std::string(), std::string("garbage\n"), std::string("hierloom checked files\t2\nanything\n"),
          std::string("hierloom checked files\t1\nchecked_at\tdevice\n1800000000\t2049\n")}) {
        { std::ofstream(cache.filePath(), std::ios::binary) << text; }
        EXPECT_FALSE(cache.vouchesFor("/colonies/a.hierloom", s, 1800000000)) << text;
    }
    // A line with a field that is not a number is left out; the others are read.
    cache.record("/colonies/a.hierloom", s, 1800000000);
    std::string text = hierloom::test::fileBytes(cache.filePath());
    text += "18000000x0\t1\t2\t3\t4\t5\t-\t-\t-\t-\t-\t3\t3\t/colonies/b.hierloom\n";
    { std::ofstream(cache.filePath(), std::ios::binary) << text; }
    EXPECT_TRUE(cache.vouchesFor("/colonies/a.hierloom", s, 1800000000));
    EXPECT_FALSE(cache.vouchesFor("/colonies/b.hierloom", ColonyFileState{{1, 2, 3, 4, 5}, {}, 3, 3}, 1800000000));
    // No folder: nothing is remembered and nothing is written.
    const CheckCache none{std::string()};
    none.record("/colonies/a.hierloom", s, 1800000000);
    EXPECT_FALSE(none.vouchesFor("/colonies/a.hierloom", s, 1800000000));
    EXPECT_EQ(none.filePath(), "");
}

TEST(CheckCache, ItsFolderComesFromTheEnvironment)
{
    ScopedEnv every("HIERLOOM_CHECK_EVERY_OPEN", nullptr);
    {
        ScopedEnv own("HIERLOOM_CACHE_DIR", "/tmp/own-cache");
        ScopedEnv xdg("XDG_CACHE_HOME", "/tmp/xdg");
        EXPECT_EQ(CheckCache::fromEnvironment().filePath(), "/tmp/own-cache/checked-files.tsv");
    }
    ScopedEnv own("HIERLOOM_CACHE_DIR", nullptr);
    {
        ScopedEnv xdg("XDG_CACHE_HOME", "/tmp/xdg");
        EXPECT_EQ(CheckCache::fromEnvironment().filePath(), "/tmp/xdg/hierloom/checked-files.tsv");
    }
    ScopedEnv relative("XDG_CACHE_HOME", "relative/path"); // the XDG rules ignore a relative path
    {
        ScopedEnv home("HOME", "/home/keeper");
        EXPECT_EQ(CheckCache::fromEnvironment().filePath(), "/home/keeper/.cache/hierloom/checked-files.tsv");
        ScopedEnv off("HIERLOOM_CHECK_EVERY_OPEN", "1");
        EXPECT_EQ(CheckCache::fromEnvironment().filePath(), "");
        ScopedEnv on("HIERLOOM_CHECK_EVERY_OPEN", "0");
        EXPECT_EQ(CheckCache::fromEnvironment().filePath(), "/home/keeper/.cache/hierloom/checked-files.tsv");
    }
    ScopedEnv home("HOME", nullptr);
    EXPECT_EQ(CheckCache::fromEnvironment().filePath(), "");
}

TEST(CheckCache, AStateIsSettledOnlyOneClockTickAfterItsLastChange)
{
    ColonyFileState fine = someState(); // stamps with fractions of a second: ticks of at most 10 ms
    const std::int64_t last = fine.file.ctimeNs;
    EXPECT_FALSE(settledBefore(fine, last));
    EXPECT_FALSE(settledBefore(fine, last + kNs / 10 - 1));
    EXPECT_TRUE(settledBefore(fine, last + kNs / 10));
    EXPECT_FALSE(settledBefore(fine, last - kNs)); // a stamp in the future (another host's clock)
    fine.wal = FileStamp{1, 2, 100, last + kNs, last + kNs};
    EXPECT_FALSE(settledBefore(fine, last + kNs / 2)); // the -wal changed later than the file
    EXPECT_TRUE(settledBefore(fine, last + kNs + kNs / 10));
    ColonyFileState coarse = someState(); // whole seconds only: FAT keeps two
    coarse.file.mtimeNs = coarse.file.ctimeNs = 1700000000 * kNs;
    EXPECT_FALSE(settledBefore(coarse, 1700000002 * kNs + kNs / 2));
    EXPECT_TRUE(settledBefore(coarse, 1700000003 * kNs));
}

TEST(CheckCache, TheStateOfAColonyFileIgnoresAWalWithoutTransactions)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 3);
    const auto s = colonyFileState(path);
    ASSERT_TRUE(s);
    EXPECT_EQ(s->file.size, static_cast<std::int64_t>(std::filesystem::file_size(path)));
    EXPECT_EQ(s->schemaVersion, static_cast<std::uint32_t>(ColonyStore::open(path, ColonyStore::Mode::ReadOnly).schemaVersion()));
    EXPECT_FALSE(s->wal); // closed: no -wal
    { std::ofstream(path + "-wal", std::ios::binary) << std::string(32, '\0'); } // a header, no frame
    EXPECT_EQ(colonyFileState(path), s);
    { std::ofstream(path + "-wal", std::ios::binary) << std::string(33, '\0'); }
    const auto withWal = colonyFileState(path);
    ASSERT_TRUE(withWal && withWal->wal);
    EXPECT_EQ(withWal->wal->size, 33);
    EXPECT_EQ(withWal->file, s->file);
    std::filesystem::remove(path + "-wal");
    EXPECT_FALSE(colonyFileState(dir.file("missing.hierloom")));
    EXPECT_FALSE(colonyFileState(dir.write("short.hierloom", "SQLite format 3")));
}
