// SPDX-License-Identifier: GPL-3.0-or-later
// Numbers that are not numbers, half-written outputs, damaged inputs and
// backups named by a wrong clock, through the command line.
#include "cli_test_support.h"

#include "core/store/check_cache.h"
#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"

#include <gtest/gtest.h>

#include <chrono>
#include <filesystem>
#include <fstream>
#include <regex>
#include <set>
#include <thread>

using hierloom::test::CliResult;
using hierloom::test::CliTempDir;
using hierloom::test::lines;
using hierloom::test::runCli;
namespace fs = std::filesystem;

namespace {

/// The commands listed by --help.
std::vector<std::string> commands()
{
    const std::string help = runCli({"--help"}).out;
    std::vector<std::string> out;
    const std::regex line(R"(^  ([a-z][a-z-]+)\s)");
    for (const std::string& l : lines(help)) {
        std::smatch m;
        if (std::regex_search(l, m, line)) out.push_back(m[1]);
    }
    return out;
}

/// The options of `command` whose value is a floating-point number.
std::vector<std::string> floatOptions(const std::string& command)
{
    std::vector<std::string> out;
    const std::regex option(R"((--[a-z][a-z-]*) FLOAT)");
    const std::string help = runCli({command, "--help"}).out;
    for (auto it = std::sregex_iterator(help.begin(), help.end(), option); it != std::sregex_iterator(); ++it)
        out.push_back((*it)[1]);
    return out;
}

/// Breaks the page of the audit trail's index (records still read, a check fails).
void breakAnIndex(const std::string& path)
{
    int page = 0;
    {
        const auto store = hierloom::core::ColonyStore::open(path, hierloom::core::ColonyStore::Mode::ReadOnly);
        hierloom::core::SqliteStatement q(store.handle(), "SELECT rootpage FROM sqlite_schema WHERE type = 'index' "
                                                          "AND tbl_name = 'audit' ORDER BY name LIMIT 1");
        ASSERT_TRUE(q.step());
        page = static_cast<int>(q.integer(0));
    }
    std::fstream f(path, std::ios::in | std::ios::out | std::ios::binary);
    f.seekp(static_cast<std::streamoff>(page - 1) * 16384);
    const char bad = 0x7F;
    f.write(&bad, 1);
}

/// Writes the demo colony and waits until its state has settled (its time
/// stamps are older than now), so the checked-files cache may vouch for it.
std::string settledDemo(const CliTempDir& dir)
{
    const std::string colony = dir.file("d.hierloom");
    EXPECT_EQ(runCli({"demo", colony}).status, 0);
    const auto now = [] { return std::chrono::system_clock::now().time_since_epoch(); };
    while (!hierloom::core::settledBefore(*hierloom::core::colonyFileState(colony),
                                          std::chrono::nanoseconds(now()).count()))
        std::this_thread::sleep_for(std::chrono::milliseconds(20));
    return colony;
}

} // namespace

TEST(CliFileSafety, EveryFloatingOptionRefusesNanAndInfinities)
{
    CliTempDir dir;
    const std::string colony = dir.file("d.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    std::set<std::string> seen;
    for (const std::string& command : commands())
        for (const std::string& option : floatOptions(command)) {
            seen.insert(command + " " + option);
            for (const char* value : {"nan", "NaN", "inf", "-inf", "infinity", "1e999"}) {
                const CliResult r = runCli({command, colony, option, value});
                EXPECT_EQ(r.status, 2) << command << " " << option << " " << value << "\n" << r.err;
                // A range check, where the option has one, may name an infinity first; NaN passes any range.
                const bool nan = std::string(value) == "nan" || std::string(value) == "NaN";
                EXPECT_NE(r.err.find(nan ? std::string("not a finite number") : option), std::string::npos)
                    << command << " " << option << " " << value << "\n" << r.err;
            }
        }
    // The walk found the options the brief names (and so the help shows their type).
    for (const char* known : {"ranks --k", "ranks --start", "inherit --k", "backup --schedule"})
        EXPECT_TRUE(seen.count(known)) << known;
    // Ordinary values still pass.
    EXPECT_EQ(runCli({"ranks", colony, "--k", "50", "--start", "-20.5"}).status, 0);
}

TEST(CliFileSafety, ExportWritesItsThreeFilesAllOrNothing)
{
    CliTempDir dir;
    const std::string colony = dir.file("d.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string out = dir.file("out");
    fs::create_directories(out);
    std::ofstream(out + "/animals.csv") << "old animals\n";
    // The third file cannot be written: its temporary name is taken by a folder.
    fs::create_directories(out + "/encounters.csv.part-" + std::to_string(::getpid()) + "/x");
    const CliResult r = runCli({"export", colony, "--dir", out});
    EXPECT_EQ(r.status, 2) << r.err;
    EXPECT_EQ(CliTempDir::read(out + "/animals.csv"), "old animals\n"); // not replaced
    EXPECT_FALSE(fs::exists(out + "/residences.csv"));
    for (const auto& e : fs::directory_iterator(out)) {
        const std::string name = e.path().filename().string();
        EXPECT_TRUE(name == "animals.csv" || name.rfind("encounters.csv.part-", 0) == 0) << name;
    }
}

TEST(CliFileSafety, AFailedOutLeavesNoPartFile)
{
    CliTempDir dir;
    const std::string colony = dir.file("d.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string target = dir.file("taken");
    fs::create_directories(target + "/inside"); // --out names a folder: the final rename fails
    const CliResult r = runCli({"ranks", colony, "--out", target});
    EXPECT_EQ(r.status, 2) << r.err;
    for (const auto& e : fs::directory_iterator(dir.file("")))
        EXPECT_EQ(e.path().filename().string().find(".part"), std::string::npos) << e.path();
}

TEST(CliFileSafety, DamagedFilesAreNamedAndNeverExported)
{
    CliTempDir dir;
    const std::string colony = dir.file("d.hierloom");
    const std::string other = dir.file("other.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    ASSERT_EQ(runCli({"demo", other}).status, 0);
    breakAnIndex(other);
    const CliResult merge = runCli({"merge", colony, "--from", other});
    EXPECT_EQ(merge.status, 2) << merge.err;
    EXPECT_NE(merge.err.find(other + ": is damaged"), std::string::npos) << merge.err;
    EXPECT_LT(lines(merge.err).size(), 3U) << merge.err;
    const CliResult exported = runCli({"export", other, "--dir", dir.file("out")});
    EXPECT_EQ(exported.status, 2) << exported.err;
    EXPECT_FALSE(fs::exists(dir.file("out/encounters.csv")));
    // The colony's own backups are offered when it is damaged.
    const CliResult backup = runCli({"backup", colony});
    ASSERT_EQ(backup.status, 0) << backup.err;
    breakAnIndex(colony);
    const CliResult refused = runCli({"import", colony, "--encounters", dir.write("e.csv", "date,winner,loser\n")});
    EXPECT_EQ(refused.status, 2) << refused.err;
    EXPECT_NE(refused.err.find("The newest good backup is " + lines(backup.out).at(0)), std::string::npos)
        << refused.err;
}

TEST(CliFileSafety, BackupsNamedInTheFutureAreNamedInAWarningAndTheNewBackupStays)
{
    CliTempDir dir;
    const std::string colony = dir.file("d.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string folder = dir.file("d.hierloom-backups");
    fs::create_directories(folder);
    fs::copy_file(colony, folder + "/d-20990101-000000.hierloom");
    fs::copy_file(colony, folder + "/d-20990102-000000.hierloom");
    const CliResult r = runCli({"backup", colony, "--keep", "2"});
    ASSERT_EQ(r.status, 0) << r.err;
    const std::string fresh = lines(r.out).at(0);
    EXPECT_TRUE(fs::exists(fresh)) << "the backup just reported was rotated away";
    EXPECT_NE(r.err.find("warning: " + folder + "/d-20990101-000000.hierloom is named with a time in the future"),
              std::string::npos)
        << r.err;
    EXPECT_NE(r.err.find(folder + "/d-20990102-000000.hierloom"), std::string::npos) << r.err;
    const auto listed = lines(runCli({"backup", colony, "--list"}).out);
    ASSERT_EQ(listed.size(), 4U);
    EXPECT_EQ(listed[1], fresh);
}

TEST(CliFileSafety, ALoopThroughTheFatherColumnIsReportedAsOne)
{
    CliTempDir dir;
    const std::string colony = dir.file("c.hierloom");
    ASSERT_EQ(runCli({"init", colony}).status, 0);
    // M1's father is M2 and M2's father is M1; the mothers are fine.
    const std::string animals = dir.write("animals.csv", "id,sex,mother,father,entry_date,entry_type\n"
                                                         "F1,F,,,2010-01-01,founder\n"
                                                         "M1,M,F1,M2,2010-01-01,founder\n"
                                                         "M2,M,F1,M1,2010-01-01,founder\n");
    const CliResult r = runCli({"import", colony, "--animals", animals});
    EXPECT_EQ(r.status, 2);
    bool fatherLoop = false;
    for (const std::string& l : lines(r.err)) {
        if (l.find("own ancestor") == std::string::npos) continue;
        EXPECT_EQ(l.find(": mother:"), std::string::npos) << l;
        fatherLoop = fatherLoop || l.find(": father:") != std::string::npos;
    }
    EXPECT_TRUE(fatherLoop) << r.err;
}

TEST(CliFileSafety, CheckReadsTheWholeFileWhateverAnEarlierCheckFound)
{
    using namespace hierloom::core;
    CliTempDir dir;
    const std::string colony = settledDemo(dir);
    ASSERT_FALSE(::testing::Test::HasFailure());
    auto now = [] { return std::chrono::system_clock::now().time_since_epoch(); };
    const CliResult intact = runCli({"check", colony});
    EXPECT_EQ(intact.status, 0) << intact.err;
    EXPECT_EQ(intact.err, colony + ": intact (SQLite's integrity check of the whole file found no problem)\n");
    EXPECT_EQ(intact.out, "");
    const CheckCache cache = CheckCache::fromEnvironment();
    const auto seconds = [&] { return std::chrono::duration_cast<std::chrono::seconds>(now()).count(); };
    EXPECT_TRUE(cache.vouchesFor(colony, *colonyFileState(colony), seconds())); // a pass is remembered
    // Damage the cache cannot see (as from a disk that decays: no time stamp moves).
    breakAnIndex(colony);
    cache.record(colony, *colonyFileState(colony), seconds());
    EXPECT_EQ(runCli({"ranks", colony}).status, 0); // trusted as recorded
    const CliResult damaged = runCli({"check", colony});
    EXPECT_EQ(damaged.status, 2);
    EXPECT_EQ(damaged.err.rfind("hierloom-cli: " + colony + ": is damaged (", 0), 0U) << damaged.err;
    const CliResult after = runCli({"ranks", colony});
    EXPECT_EQ(after.status, 2);
    EXPECT_NE(after.err.find(colony + ": is damaged ("), std::string::npos) << after.err;
    EXPECT_EQ(runCli({"check", dir.file("missing.hierloom")}).status, 2);
}

// The first open of a file (no pass in the checked-files cache) reads and
// computes while the whole-file check runs alongside: the same output as a
// trusted open, and nothing at all of a damaged file, whose refusal reads as
// that of a check before reading (export's, which checks first).
TEST(CliFileSafety, AFirstOpenComputesDuringTheCheckAndShowsNothingOfADamagedFile)
{
    using namespace hierloom::core;
    CliTempDir dir;
    const std::string colony = settledDemo(dir);
    ASSERT_FALSE(::testing::Test::HasFailure());
    auto now = [] { return std::chrono::system_clock::now().time_since_epoch(); };
    const auto vouched = [&] {
        return CheckCache::fromEnvironment().vouchesFor(
            colony, *colonyFileState(colony), std::chrono::duration_cast<std::chrono::seconds>(now()).count());
    };
    const std::vector<std::vector<std::string>> commands = {
        {"ranks", colony, "--method", "elo", "--group", "North Corral"},
        {"stability", colony, "--group", "North Corral"},
        {"inherit", colony, "--at", "2023-08-01", "--group", "North Corral"},
        {"overview", colony}};
    for (const auto& args : commands) {
        CheckCache::fromEnvironment().forget(colony);
        const CliResult first = runCli(args);
        EXPECT_EQ(first.status, 0) << first.err;
        EXPECT_TRUE(vouched()) << args[0]; // the check alongside passed and was recorded
        const CliResult trusted = runCli(args);
        EXPECT_EQ(first.out, trusted.out) << args[0];
        EXPECT_EQ(first.err, trusted.err) << args[0];
        EXPECT_FALSE(first.out.empty()) << args[0];
    }
    breakAnIndex(colony);
    const CliResult exported = runCli({"export", colony, "--dir", dir.file("out")});
    ASSERT_EQ(exported.status, 2);
    ASSERT_EQ(exported.err.rfind("hierloom-cli: " + colony + ": is damaged (", 0), 0U) << exported.err;
    for (auto args : commands) {
        args.insert(args.end(), {"--out", dir.file("table.csv")});
        const CliResult refused = runCli(args);
        EXPECT_EQ(refused.status, exported.status) << args[0];
        EXPECT_EQ(refused.err, exported.err) << args[0];
        EXPECT_EQ(refused.out, "") << args[0];
        EXPECT_FALSE(fs::exists(dir.file("table.csv"))) << args[0];
    }
}
