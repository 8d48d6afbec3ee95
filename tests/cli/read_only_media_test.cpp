// SPDX-License-Identifier: GPL-3.0-or-later
// A colony in a read-only folder, or a read-only file: every reading command
// works and leaves no file behind; writes are refused saying why.
//
// Permission bits do not bind root, and tests run as root in CI, so when run
// as root the checks run in a child process that has dropped to the user
// "nobody" (uid 65534) first; as any other user they run in a child as that user.
#include "cli_test_support.h"

#include <gtest/gtest.h>

#include <filesystem>
#include <functional>
#include <grp.h>
#include <set>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

using hierloom::test::CliResult;
using hierloom::test::CliTempDir;
using hierloom::test::runCli;
namespace fs = std::filesystem;

namespace {

constexpr uid_t kNobody = 65534;

/// Runs `checks` in a child process without root's powers; the child's
/// failures come back as lines on its standard error and its exit status.
int runWithoutPrivileges(const std::function<int()>& checks)
{
    const pid_t pid = ::fork();
    if (pid < 0) return -1;
    if (pid == 0) {
        if (::geteuid() == 0) {
            ::setgroups(0, nullptr);
            if (::setgid(kNobody) != 0 || ::setuid(kNobody) != 0) ::_exit(100);
        }
        int failures = 100;
        try {
            failures = checks();
        } catch (const std::exception& e) {
            std::fprintf(stderr, "exception: %s\n", e.what());
        }
        std::fflush(stderr);
        ::_exit(failures);
    }
    int status = 0;
    ::waitpid(pid, &status, 0);
    return WIFEXITED(status) ? WEXITSTATUS(status) : -1;
}

/// Counts a failed expectation, printing it.
int expect(bool ok, const std::string& what, const CliResult& r)
{
    if (ok) return 0;
    std::fprintf(stderr, "FAILED: %s (status %d)\n%s\n", what.c_str(), r.status, r.err.c_str());
    return 1;
}

std::set<std::string> namesIn(const std::string& folder)
{
    std::set<std::string> out;
    for (const auto& e : fs::directory_iterator(folder)) out.insert(e.path().filename().string());
    return out;
}

/// Every reading command works on `colony`, giving what it gave when writable; every write is refused.
int checkReadOnlyColony(const std::string& colony, const std::string& writable, const std::string& expectedRanks,
                        const std::string& why, bool folderWritable)
{
    int failures = 0;
    const std::string folder = fs::path(colony).parent_path().string();
    const auto before = namesIn(folder);
    const CliResult ranks = runCli({"ranks", colony});
    failures += expect(ranks.status == 0 && ranks.out == expectedRanks, "ranks reads the same table", ranks);
    for (const std::vector<std::string>& words :
         {std::vector<std::string>{"matrix", colony}, {"metrics", colony}, {"maternal-ranks", colony},
          {"history", colony, "--uid", "none"}, {"backup", colony, "--list"},
          {"export", colony, "--dir", writable + "/export"}}) {
        const CliResult r = runCli(words);
        failures += expect(r.status == 0, words[0] + " works on a read-only colony", r);
    }
    failures += expect(fs::exists(writable + "/export/encounters.csv"), "export wrote its files", ranks);
    const std::string csv = writable + "/e.csv";
    for (const std::vector<std::string>& words :
         {std::vector<std::string>{"import", colony, "--encounters", csv}, {"backup", colony, "--keep", "3"}}) {
        const CliResult r = runCli(words);
        failures += expect(r.status == 2, words[0] + " is refused with status 2", r);
        failures += expect(r.err.find("cannot be changed: " + why) != std::string::npos,
                           words[0] + " says why it is refused", r);
    }
    auto after = namesIn(folder);
    auto kept = before;
    if (folderWritable) {
        // SQLite may keep its (empty) -wal and -shm beside a read-only file in a writable folder.
        for (auto* names : {&after, &kept}) {
            names->erase(fs::path(colony).filename().string() + "-wal");
            names->erase(fs::path(colony).filename().string() + "-shm");
        }
    }
    std::string extra;
    for (const std::string& name : after)
        if (!kept.count(name)) extra += " " + name;
    failures += expect(after == kept, "no file appeared beside the colony:" + extra, ranks);
    return failures;
}

} // namespace

TEST(CliReadOnlyMedia, AColonyInAReadOnlyFolderIsReadAndNeverWritten)
{
    CliTempDir dir;
    const std::string folder = dir.file("media");
    fs::create_directories(folder);
    const std::string colony = folder + "/d.hierloom";
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string ranks = runCli({"ranks", colony}).out;
    ASSERT_FALSE(ranks.empty());
    const std::string writable = dir.file("writable");
    fs::create_directories(writable);
    dir.write("writable/e.csv", "date,winner,loser,group\n2020-01-01,F01,F02,main\n");
    ::chmod(writable.c_str(), 0777);
    ::chmod(dir.file("").c_str(), 0755);
    // The file stays writable to the user who runs the checks; only its folder is read-only.
    if (::geteuid() == 0) ASSERT_EQ(::chown(colony.c_str(), kNobody, kNobody), 0);
    ::chmod(folder.c_str(), 0555);
    const int failures =
        runWithoutPrivileges([&] { return checkReadOnlyColony(colony, writable, ranks, "its folder is read-only", false); });
    ::chmod(folder.c_str(), 0755);
    EXPECT_EQ(failures, 0) << "see the lines above";
}

TEST(CliReadOnlyMedia, AReadOnlyFileInAWritableFolderIsReadAndNeverWritten)
{
    CliTempDir dir;
    const std::string folder = dir.file("media");
    fs::create_directories(folder);
    const std::string colony = folder + "/d.hierloom";
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string ranks = runCli({"ranks", colony}).out;
    const std::string writable = dir.file("writable");
    fs::create_directories(writable);
    dir.write("writable/e.csv", "date,winner,loser,group\n2020-01-01,F01,F02,main\n");
    ::chmod(writable.c_str(), 0777);
    ::chmod(dir.file("").c_str(), 0755);
    ::chmod(folder.c_str(), 0777);
    ::chmod(colony.c_str(), 0444);
    const int failures =
        runWithoutPrivileges([&] { return checkReadOnlyColony(colony, writable, ranks, "the file is read-only", true); });
    EXPECT_EQ(failures, 0) << "see the lines above";
}
