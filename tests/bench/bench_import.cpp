// SPDX-License-Identifier: GPL-3.0-or-later
// Import of 1,000,000 generated encounters among 200 animals through the real
// import path (every rule checked, one transaction), side by side with the
// sqlite3 shell's bare `.import` of the same rows into a table without
// constraints. Each is run three times, alternating, after flushing earlier
// writes to disk (sync), and the medians are compared.
// Run on demand: build/tests/bench_import [rows]
// HIERLOOM_BENCH_AUDIT=1 also times the import with one audit row per
// encounter (what the bulk load's single audit row saves);
// HIERLOOM_BENCH_KEEP=1 keeps the files in /tmp/hierloom-bench-import.
#include "core/store/colony_import.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"
#include "tests/core/generated_import.h"

#include <unistd.h>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <string>
#include <vector>

using namespace hierloom::core;
namespace fs = std::filesystem;
using Clock = std::chrono::steady_clock;

namespace {

double seconds(Clock::time_point since) { return std::chrono::duration<double>(Clock::now() - since).count(); }

double median(std::vector<double> v)
{
    std::sort(v.begin(), v.end());
    return v[v.size() / 2];
}

void removeColony(const std::string& path)
{
    for (const char* suffix : {"", "-wal", "-shm", "-journal"}) fs::remove(path + suffix);
}

/// Imports the encounters into a fresh copy of the base colony; seconds taken
/// from opening the file to closing it, or a negative value on failure.
double timeImport(const fs::path& dir, const std::string& base, const std::string& triggerSql = {})
{
    const std::string colony = (dir / "run.hierloom").string();
    removeColony(colony);
    fs::copy_file(base, colony);
    ::sync();
    const auto t0 = Clock::now();
    {
        ColonyStore store = ColonyStore::open(colony);
        if (!triggerSql.empty()) store.exec(triggerSql.c_str());
        const ImportResult result = importFiles(store, {"", "", (dir / "encounters.csv").string()}, today());
        if (!result.ok()) {
            std::fprintf(stderr, "import failed:\n%s", result.problems.text().c_str());
            return -1;
        }
    }
    return seconds(t0);
}

/// The sqlite3 shell's .import into a new bare table; negative when the shell is missing.
double timeShell(const fs::path& dir)
{
    const std::string bare = (dir / "bare.db").string();
    removeColony(bare);
    const std::string cmd =
        "sqlite3 '" + bare + "' '.mode csv' '.import " + (dir / "encounters.csv").string() + " enc'";
    ::sync();
    const auto t0 = Clock::now();
    const int rc = std::system(cmd.c_str());
    return rc == 0 ? seconds(t0) : -1;
}

} // namespace

int main(int argc, char** argv)
{
    const long rows = argc > 1 ? std::atol(argv[1]) : 1000000;
    const int animals = 200;
    const fs::path dir = fs::temp_directory_path() / "hierloom-bench-import";
    fs::remove_all(dir);
    fs::create_directories(dir);
    hierloom::test::writeGeneratedAnimals((dir / "animals.csv").string(), animals);
    hierloom::test::writeGeneratedEncounters((dir / "encounters.csv").string(), rows, animals);
    const std::string base = (dir / "base.hierloom").string();
    {
        ColonyStore store = ColonyStore::create(base);
        importFiles(store, {(dir / "animals.csv").string(), "", ""}, today());
    }
    std::vector<double> ours, shell;
    for (int run = 0; run < 3; ++run) {
        ours.push_back(timeImport(dir, base));
        shell.push_back(timeShell(dir));
        if (ours.back() < 0) return 1;
        std::printf("run %d: hierloom %.3f s, shell %.3f s\n", run + 1, ours.back(), shell.back());
    }
    const double o = median(ours), s = median(shell);
    std::printf("rows: %ld\n", rows);
    std::printf("hierloom import (checked, one transaction), median of 3: %.3f s, %.0f rows/s\n", o, rows / o);
    if (s > 0) {
        std::printf("sqlite3 shell .import into a bare table, median of 3:  %.3f s, %.0f rows/s\n", s, rows / s);
        std::printf("ratio hierloom / shell: %.2f\n", o / s);
    } else {
        std::printf("sqlite3 shell not available\n");
    }
    if (const char* audit = std::getenv("HIERLOOM_BENCH_AUDIT"); audit && *audit == '1') {
        // One audit row per encounter, as the schema's per-row trigger would
        // write: a TEMP trigger, which the bulk load does not drop.
        const double audited = timeImport(
            dir, base,
            [] {
                // The schema's own trigger as a TEMP one under another name.
                std::string sql = auditTriggerSql("encounter", "insert");
                sql.replace(0, sql.find(" AFTER"), "CREATE TEMP TRIGGER bench_audit");
                sql.replace(sql.find(" ON encounter_row"), 17, " ON main.encounter_row");
                return sql;
            }());
        std::printf("same, one audit row per encounter: %.3f s, %.0f rows/s (x%.2f)\n", audited, rows / audited,
                    audited / o);
    }
    if (!std::getenv("HIERLOOM_BENCH_KEEP")) fs::remove_all(dir);
    return 0;
}
