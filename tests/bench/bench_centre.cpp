// SPDX-License-Identifier: GPL-3.0-or-later
// A breeding centre at scale: whole-process time and peak memory of the
// command-line program on a large colony file (tools/make_centre), each row
// side by side with the sqlite3 shell on the same file in the same run.
//
//   bench_centre --cli build/app/hierloom-cli --colony /tmp/centre.hierloom
//                [--csv DIR] [--group G01] [--at 2025-06-30] [--runs 3]
//
// Each command and its shell baseline run once to warm the page cache, then
// `--runs` times alternating; the medians are compared. Time and peak resident
// memory come from wait4() on the child (ru_maxrss), so they cover the whole
// process: start, opening the file, reading, computing and printing (output
// goes to /dev/null). Every command is measured twice: with the checked-files
// cache emptied before each run ("first open": the whole-file check runs, as
// after any change to the file) and with the cache left as the warm-up run
// wrote it ("trusted open": the file is unchanged since it passed). The
// children use a cache folder of the benchmark's own (HIERLOOM_CACHE_DIR),
// never the person's. With --csv DIR (make_centre --csv DIR) the import row
// is measured too: `hierloom-cli import` of DIR/encounters.csv into a copy of
// the centre's animals and residences against the shell's bare `.import`.
#include <fcntl.h>
#include <spawn.h>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <functional>
#include <string>
#include <vector>

extern char** environ;

namespace fs = std::filesystem;

namespace {

struct Run {
    double seconds = -1;
    double peakMiB = 0;
    int status = -1;
};

/// Runs argv with stdout (and stderr unless `keepErr`) sent to /dev/null.
Run runProcess(const std::vector<std::string>& args)
{
    std::vector<char*> argv;
    for (const std::string& a : args) argv.push_back(const_cast<char*>(a.c_str()));
    argv.push_back(nullptr);
    posix_spawn_file_actions_t files;
    posix_spawn_file_actions_init(&files);
    posix_spawn_file_actions_addopen(&files, 1, "/dev/null", O_WRONLY, 0);
    posix_spawn_file_actions_addopen(&files, 2, "/dev/null", O_WRONLY, 0);
    const auto t0 = std::chrono::steady_clock::now();
    pid_t pid = 0;
    Run r;
    if (posix_spawnp(&pid, argv[0], &files, nullptr, argv.data(), environ) != 0) {
        posix_spawn_file_actions_destroy(&files);
        return r;
    }
    posix_spawn_file_actions_destroy(&files);
    int status = 0;
    rusage usage{};
    wait4(pid, &status, 0, &usage);
    r.seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    r.peakMiB = static_cast<double>(usage.ru_maxrss) / 1024.0;
    r.status = WIFEXITED(status) ? WEXITSTATUS(status) : 128;
    return r;
}

double median(std::vector<double> v)
{
    std::sort(v.begin(), v.end());
    return v.empty() ? -1 : v[v.size() / 2];
}

struct Summary {
    double seconds;
    double peakMiB;
};

/// Warm-up, then `runs` runs alternating with the baseline; medians.
std::pair<Summary, Summary> measure(const std::vector<std::string>& ours, const std::vector<std::string>& shell,
                                    int runs, const std::function<void()>& before = {})
{
    if (before) before();
    runProcess(ours);
    runProcess(shell);
    std::vector<double> ot, om, st, sm;
    for (int i = 0; i < runs; ++i) {
        if (before) before();
        const Run o = runProcess(ours);
        if (o.status != 0) {
            std::fprintf(stderr, "failed (exit %d):", o.status);
            for (const std::string& a : ours) std::fprintf(stderr, " %s", a.c_str());
            std::fprintf(stderr, "\n");
            std::exit(1);
        }
        const Run s = runProcess(shell);
        ot.push_back(o.seconds);
        om.push_back(o.peakMiB);
        st.push_back(s.seconds);
        sm.push_back(s.peakMiB);
    }
    return {{median(ot), median(om)}, {median(st), median(sm)}};
}

void printRow(const char* work, const char* baseline, const std::pair<Summary, Summary>& m)
{
    std::printf("%-50s %7.3f s %7.1f MiB | %-38s %7.3f s %6.1f MiB | x%.2f\n", work, m.first.seconds,
                m.first.peakMiB, baseline, m.second.seconds, m.second.peakMiB, m.first.seconds / m.second.seconds);
    std::fflush(stdout);
}

std::string shellValue(const std::string& db, const std::string& sql)
{
    const std::string cmd = "sqlite3 -readonly '" + db + "' \"" + sql + "\"";
    std::string out;
    if (FILE* p = popen(cmd.c_str(), "r")) {
        char buf[256];
        while (std::fgets(buf, sizeof buf, p)) out += buf;
        pclose(p);
    }
    while (!out.empty() && (out.back() == '\n' || out.back() == '\r')) out.pop_back();
    return out;
}

} // namespace

int main(int argc, char** argv)
{
    std::string cli = "build/app/hierloom-cli", colony, csv, group = "G01", at = "2025-06-30";
    int runs = 3;
    for (int i = 1; i + 1 < argc; i += 2) {
        const std::string k = argv[i], v = argv[i + 1];
        if (k == "--cli") cli = v;
        else if (k == "--colony") colony = v;
        else if (k == "--csv") csv = v;
        else if (k == "--group") group = v;
        else if (k == "--at") at = v;
        else if (k == "--runs") runs = std::max(1, std::atoi(v.c_str()));
        else {
            std::fprintf(stderr, "unknown option %s\n", k.c_str());
            return 2;
        }
    }
    if (colony.empty() || !fs::exists(colony)) {
        std::fprintf(stderr, "usage: bench_centre --cli PATH --colony FILE [--csv DIR] [--group G] [--at DATE] [--runs N]\n"
                             "(make the colony with build/tools/make_centre)\n");
        return 2;
    }
    cli = fs::absolute(cli).string();
    const long long encounters = std::atoll(shellValue(colony, "SELECT count(*) FROM encounter").c_str());
    const long long inGroup =
        std::atoll(shellValue(colony, "SELECT count(*) FROM encounter WHERE grp = '" + group + "'").c_str());
    const long long animals = std::atoll(shellValue(colony, "SELECT count(*) FROM animal").c_str());
    const auto bytes = static_cast<long long>(fs::file_size(colony));
    std::printf("colony %s: %lld animals, %lld encounters (%lld in %s), schema version %s, page size %s\n",
                colony.c_str(), animals, encounters, inGroup, group.c_str(),
                shellValue(colony, "PRAGMA user_version").c_str(), shellValue(colony, "PRAGMA page_size").c_str());
    std::printf("file: %lld bytes, %.1f bytes per encounter\n", bytes, static_cast<double>(bytes) / encounters);
    std::printf("medians of %d runs after one warm-up run; whole process (wait4): wall time, peak RSS\n\n", runs);

    const fs::path dir = fs::temp_directory_path() / "bench-centre";
    fs::remove_all(dir);
    fs::create_directories(dir);
    const fs::path cache = dir / "cache";
    ::setenv("HIERLOOM_CACHE_DIR", cache.c_str(), 1);
    ::unsetenv("HIERLOOM_CHECK_EVERY_OPEN");
    const auto forgetChecks = [&] { fs::remove_all(cache); };

    // From schema version 5 `encounter` is a view over `encounter_row`: the
    // full scan reads the table itself (a view takes no NOT INDEXED).
    const bool rowTable = shellValue(colony, "SELECT count(*) FROM sqlite_schema WHERE name = 'encounter_row'") == "1";
    const std::vector<std::string> groupScan = {
        "sqlite3", "-readonly", colony,
        rowTable ? "SELECT * FROM encounter_row NOT INDEXED WHERE grp = (SELECT code FROM encounter_term WHERE text = '" +
                       group + "')"
                 : "SELECT * FROM encounter NOT INDEXED WHERE grp = '" + group + "'"};
    const std::vector<std::string> groupRows = {"sqlite3", "-readonly", colony,
                                                "SELECT * FROM encounter WHERE grp = '" + group + "'"};
    const std::vector<std::string> everything = {"sqlite3", "-readonly", colony, "SELECT * FROM encounter"};
    const std::string pdf = (fs::temp_directory_path() / "bench-centre-report.pdf").string();

    struct Row {
        std::string work;
        std::vector<std::string> args;
    };
    const std::vector<Row> groupRowsOfTable = {
        {"ranks --method elo --group " + group, {cli, "ranks", colony, "--method", "elo", "--group", group}},
        {"inherit --at " + at + " --group " + group, {cli, "inherit", colony, "--at", at, "--group", group}},
        {"metrics --group " + group + " --randomisations 100",
         {cli, "metrics", colony, "--group", group, "--randomisations", "100", "--threads", "1"}},
        {"stability --group " + group, {cli, "stability", colony, "--group", group}},
        {"report --group " + group, {cli, "report", colony, "--group", group, "--out", pdf}},
    };
    // A first open after a change runs PRAGMA quick_check over the whole file
    // (DEVELOPERS.md, "Checked once, trusted until it changes"): the floor under
    // every [first open] row.
    const auto check = measure({"sqlite3", "-readonly", colony, "PRAGMA quick_check"}, groupScan, runs);
    printRow("shell: PRAGMA quick_check (a first open's check)", "shell: group's rows, full scan", check);
    for (const Row& row : groupRowsOfTable) {
        const auto first = measure(row.args, groupScan, runs, forgetChecks);
        printRow((row.work + " [first open]").c_str(), "shell: group's rows, full scan", first);
        const auto m = measure(row.args, groupScan, runs);
        printRow((row.work + " [trusted open]").c_str(), "shell: group's rows, full scan", m);
        const auto indexed = measure(row.args, groupRows, 1);
        std::printf("%-50s %19s | %-38s %7.3f s %6.1f MiB | x%.2f\n", "", "", "shell: group's rows (its own plan)",
                    indexed.second.seconds, indexed.second.peakMiB, m.first.seconds / indexed.second.seconds);
    }
    const std::vector<std::string> wholeRanks = {cli, "ranks", colony, "--method", "elo"};
    printRow("ranks --method elo (whole file) [first open]", "shell: select * from encounter",
             measure(wholeRanks, everything, runs, forgetChecks));
    const auto whole = measure(wholeRanks, everything, runs);
    printRow("ranks --method elo (whole file) [trusted open]", "shell: select * from encounter", whole);

    // Memory per encounter held: the whole-file ranks against the same command
    // on a colony with the same animals and residences but no encounters.
    const std::string empty = (dir / "no-encounters.hierloom").string();
    fs::copy_file(colony, empty);
    std::system(("sqlite3 '" + empty + "' "
                 "'INSERT INTO audit_pause VALUES (1); DELETE FROM " + (rowTable ? "encounter_row" : "encounter") +
                 "; DELETE FROM audit_pause; VACUUM;' >/dev/null").c_str());
    const Run bare = runProcess({cli, "ranks", empty, "--method", "elo"});
    std::printf("memory per encounter held (whole-file ranks, peak RSS %.1f MiB, minus %.1f MiB without "
                "encounters): %.0f bytes\n",
                whole.first.peakMiB, bare.peakMiB,
                (whole.first.peakMiB - bare.peakMiB) * 1024 * 1024 / static_cast<double>(encounters));

    if (!csv.empty()) {
        const std::string enc = (fs::path(csv) / "encounters.csv").string();
        const std::string target = (dir / "import.hierloom").string();
        const std::string bareDb = (dir / "bare.db").string();
        auto fresh = [&] {
            for (const char* s : {"", "-wal", "-shm"}) {
                fs::remove(target + s);
                fs::remove(bareDb + s);
            }
            fs::copy_file(empty, target);
            ::sync();
        };
        const auto import = measure({cli, "import", target, "--encounters", enc},
                                    {"sqlite3", bareDb, ".mode csv", ".import " + enc + " enc"}, runs, fresh);
        printRow("import of encounters.csv (checked)", "shell: bare .import", import);
    }
    fs::remove_all(dir);
    fs::remove(pdf);
    return 0;
}
