// SPDX-License-Identifier: GPL-3.0-or-later
// Import of 1,000,000 generated encounters among 200 animals through the real
// import path (every rule checked, one transaction), side by side with the
// sqlite3 shell's bare `.import` of the same rows into a table without
// constraints. Run on demand: build/tests/bench_import [rows]
#include "core/colony_import.h"
#include "core/colony_store.h"
#include "tests/core/generated_import.h"

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <string>

using namespace hierloom::core;

int main(int argc, char** argv)
{
    const long rows = argc > 1 ? std::atol(argv[1]) : 1000000;
    const int animals = 200;
    const auto dir = std::filesystem::temp_directory_path() / "hierloom-bench-import";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    hierloom::test::writeGeneratedAnimals((dir / "animals.csv").string(), animals);
    hierloom::test::writeGeneratedEncounters((dir / "encounters.csv").string(), rows, animals);
    const std::string colony = (dir / "bench.hierloom").string();
    {
        ColonyStore store = ColonyStore::create(colony);
        importFiles(store, {(dir / "animals.csv").string(), "", ""}, today());
    }
    const std::string perRow = (dir / "per-row.hierloom").string();
    std::filesystem::copy_file(colony, perRow);
    using Clock = std::chrono::steady_clock;
    const auto t0 = Clock::now();
    ImportPlan plan;
    {
        ColonyStore store = ColonyStore::open(colony);
        plan = importFiles(store, {"", "", (dir / "encounters.csv").string()}, today());
    }
    const double ours = std::chrono::duration<double>(Clock::now() - t0).count();
    if (!plan.ok()) {
        std::fprintf(stderr, "import failed:\n%s", plan.problems.text().c_str());
        return 1;
    }
    // The same import with one audit row per encounter, as the schema's
    // per-row trigger would write without the bulk pause (a TEMP trigger
    // ignores audit_pause): what the pause saves.
    const auto t2 = Clock::now();
    {
        ColonyStore store = ColonyStore::open(perRow);
        store.exec("CREATE TEMP TRIGGER bench_audit AFTER INSERT ON main.encounter BEGIN "
                   "INSERT INTO audit(tbl, uid, action, new_values) VALUES ('encounter', new.uid, 'insert', "
                   "json_object('seq', new.seq, 'uid', new.uid, 'date', new.date, 'time', new.time, 'winner', "
                   "new.winner, 'loser', new.loser, 'outcome', new.outcome, 'behaviour', new.behaviour, 'grp', "
                   "new.grp, 'observer', new.observer, 'note', new.note)); END");
        importFiles(store, {"", "", (dir / "encounters.csv").string()}, today());
    }
    const double audited = std::chrono::duration<double>(Clock::now() - t2).count();
    const std::string bare = (dir / "bare.db").string();
    const std::string cmd = "sqlite3 '" + bare + "' '.mode csv' '.import " + (dir / "encounters.csv").string() + " enc'";
    const auto t1 = Clock::now();
    const int rc = std::system(cmd.c_str());
    const double shell = std::chrono::duration<double>(Clock::now() - t1).count();
    std::printf("rows: %ld\n", rows);
    std::printf("hierloom import (checked, one transaction): %.3f s, %.0f rows/s\n", ours, rows / ours);
    std::printf("same, one audit row per encounter:          %.3f s, %.0f rows/s (x%.2f)\n", audited,
                rows / audited, audited / ours);
    if (rc == 0)
        std::printf("sqlite3 shell .import into a bare table:   %.3f s, %.0f rows/s\n", shell, rows / shell);
    else
        std::printf("sqlite3 shell not available (exit %d)\n", rc);
    if (rc == 0) std::printf("ratio hierloom / shell: %.2f\n", ours / shell);
    if (!std::getenv("HIERLOOM_BENCH_KEEP")) std::filesystem::remove_all(dir);
    return 0;
}
