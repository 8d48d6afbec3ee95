// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Import files of a large invented colony: `animals` founders in group
// "main" and `rows` random encounters among them over ~14 years. Shared by
// the import benchmark and the crash and concurrency tests.
#include "core/base/civil_date.h"

#include <cstdint>
#include <fstream>
#include <random>
#include <string>

namespace hierloom::test {

/// Writes animals.csv: `animals` founders A0..A(n-1) born 2005-03-01, in the colony from 2008-01-01.
inline void writeGeneratedAnimals(const std::string& path, int animals)
{
    std::ofstream a(path, std::ios::binary);
    a << "id,sex,birth_date,entry_date,entry_type\n";
    for (int i = 0; i < animals; ++i) a << "A" << i << ',' << (i % 3 == 0 ? 'M' : 'F') << ",2005-03-01,2008-01-01,founder\n";
}

/// Writes encounters.csv: `rows` encounters between two different founders, dates spread
/// evenly over 5,000 days from 2010-01-01, times, outcomes and observers from a seeded generator.
inline void writeGeneratedEncounters(const std::string& path, long rows, int animals, std::uint64_t seed = 42)
{
    using namespace hierloom::core;
    std::ofstream e(path, std::ios::binary);
    e << "date,time,winner,loser,outcome,behaviour,group,observer,note\n";
    std::mt19937_64 rng(seed);
    const Day first = *parseDate("2010-01-01");
    const char* behaviours[] = {"displace", "threat", "chase", "bite"};
    std::string line;
    for (long r = 0; r < rows; ++r) {
        const int w = static_cast<int>(rng() % static_cast<unsigned>(animals));
        int l = static_cast<int>(rng() % static_cast<unsigned>(animals - 1));
        if (l >= w) ++l;
        const Day d = first + static_cast<Day>(r * 5000 / rows);
        const int minutes = 420 + static_cast<int>(rng() % 600);
        line = formatDate(d);
        line += ',';
        line += formatTimeOfDay(minutes);
        line += ",A" + std::to_string(w) + ",A" + std::to_string(l) + ',';
        line += rng() % 100 == 0 ? "draw" : "decided";
        line += ',';
        line += behaviours[rng() % 4];
        line += ",main,OB" + std::to_string(rng() % 3) + ",\n";
        e << line;
    }
}

} // namespace hierloom::test
