// SPDX-License-Identifier: GPL-3.0-or-later
// Import of 1,000,000 generated encounters among 200 animals through the real
// import path (every rule checked, one transaction), side by side with the
// sqlite3 shell's bare `.import` of the same rows into a table without
// constraints. Run on demand: build/tests/bench_import [rows]
#include "core/colony_import.h"
#include "core/colony_store.h"

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <string>

using namespace hierloom::core;

int main(int argc, char** argv)
{
    const long rows = argc > 1 ? std::atol(argv[1]) : 1000000;
    const int animals = 200;
    const auto dir = std::filesystem::temp_directory_path() / "hierloom-bench-import";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    {
        std::ofstream a(dir / "animals.csv");
        a << "id,sex,birth_date,entry_date,entry_type\n";
        for (int i = 0; i < animals; ++i)
            a << "A" << i << ',' << (i % 3 == 0 ? 'M' : 'F') << ",2005-03-01,2008-01-01,founder\n";
        std::ofstream e(dir / "encounters.csv");
        e << "date,time,winner,loser,outcome,behaviour,group,observer,note\n";
        std::mt19937_64 rng(42);
        const Day first = *parseDate("2010-01-01");
        const char* behaviours[] = {"displace", "threat", "chase", "bite"};
        for (long r = 0; r < rows; ++r) {
            const int w = static_cast<int>(rng() % animals);
            int l = static_cast<int>(rng() % (animals - 1));
            if (l >= w) ++l;
            const Day d = first + static_cast<Day>(r * 5000 / rows);
            const int minutes = 420 + static_cast<int>(rng() % 600);
            e << formatDate(d) << ',' << formatTimeOfDay(minutes) << ",A" << w << ",A" << l << ','
              << (rng() % 100 == 0 ? "draw" : "decided") << ',' << behaviours[rng() % 4] << ",main,OB" << (rng() % 3)
              << ",\n";
        }
    }
    const std::string colony = (dir / "bench.hierloom").string();
    {
        ColonyStore store = ColonyStore::create(colony);
        importFiles(store, {(dir / "animals.csv").string(), "", ""}, today());
    }
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
    const std::string bare = (dir / "bare.db").string();
    const std::string cmd = "sqlite3 '" + bare + "' '.mode csv' '.import " + (dir / "encounters.csv").string() + " enc'";
    const auto t1 = Clock::now();
    const int rc = std::system(cmd.c_str());
    const double shell = std::chrono::duration<double>(Clock::now() - t1).count();
    std::printf("rows: %ld\n", rows);
    std::printf("hierloom import (checked, one transaction): %.3f s, %.0f rows/s\n", ours, rows / ours);
    if (rc == 0)
        std::printf("sqlite3 shell .import into a bare table:   %.3f s, %.0f rows/s\n", shell, rows / shell);
    else
        std::printf("sqlite3 shell not available (exit %d)\n", rc);
    if (rc == 0) std::printf("ratio hierloom / shell: %.2f\n", ours / shell);
    if (!std::getenv("HIERLOOM_BENCH_KEEP")) std::filesystem::remove_all(dir);
    return 0;
}
