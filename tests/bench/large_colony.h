// SPDX-License-Identifier: GPL-3.0-or-later
// A generated colony for timing the plots: 300 females in 20 matrilines over
// 15 years with daily encounters, deterministic from a seed. Not a scenario
// to analyse (the latent order is crude); only its size matters.
#pragma once
#include "core/base/civil_date.h"
#include "core/base/colony.h"

#include <random>
#include <string>
#include <vector>

namespace hierloom::bench {

/// `females` females (founders first, then daughters born over the years), as
/// many sons who leave at four, and about `perDay` encounters on each of
/// five weekdays among the animals present, from 2010-01-01 for `years` years.
inline core::Colony generateLargeColony(int females = 300, int years = 15, int perDay = 30, unsigned seed = 7)
{
    std::mt19937_64 rng(seed);
    auto uniform = [&] { return std::uniform_real_distribution<double>(0, 1)(rng); };
    const core::Day start = core::dayFromCivil(2010, 1, 1), end = core::dayFromCivil(2010 + years - 1, 12, 31);
    core::Colony c;
    std::vector<double> latent; // higher wins
    const int founders = females / 5, lines = 20;
    auto add = [&](core::Sex sex, core::Day birth, const std::string& mother, core::Day entry, double strength) {
        core::Animal a;
        a.id = "A" + std::to_string(c.animals.size() + 1);
        a.name = "Animal " + std::to_string(c.animals.size() + 1);
        a.sex = sex;
        a.birth = birth;
        a.mother = mother;
        a.entry = entry;
        a.entryType = mother.empty() ? core::EntryType::Founder : core::EntryType::Born;
        c.animals.push_back(a);
        latent.push_back(strength);
        return static_cast<int>(c.animals.size()) - 1;
    };
    std::vector<int> lineOf;
    for (int i = 0; i < founders; ++i) {
        add(core::Sex::Female, start - 365 * (5 + static_cast<int>(uniform() * 12)), {}, start, (lines - i % lines) * 10.0 + uniform());
        lineOf.push_back(i % lines);
    }
    // Daughters (and sons) spread evenly over the years, mothers drawn among the adult females alive then.
    const int daughters = females - founders;
    for (int k = 0; k < daughters; ++k) {
        const core::Day birth = start + static_cast<core::Day>((end - start - 400) * (k + 0.5) / daughters);
        std::vector<int> mothers;
        for (size_t a = 0; a < c.animals.size(); ++a)
            if (c.animals[a].sex == core::Sex::Female && *c.animals[a].birth + 4 * 365 <= birth &&
                (!c.animals[a].exit || *c.animals[a].exit > birth))
                mothers.push_back(static_cast<int>(a));
        const int m = mothers[static_cast<size_t>(rng() % mothers.size())];
        const double strength = latent[static_cast<size_t>(m)] - 0.5 + uniform() * 0.4;
        add(core::Sex::Female, birth, c.animals[static_cast<size_t>(m)].id, birth, strength);
        lineOf.push_back(lineOf[static_cast<size_t>(m)]);
        const int son = add(core::Sex::Male, birth + 3, c.animals[static_cast<size_t>(m)].id, birth + 3, strength - 0.1);
        lineOf.push_back(lineOf[static_cast<size_t>(m)]);
        c.animals[static_cast<size_t>(son)].exit = birth + 4 * 365;
        c.animals[static_cast<size_t>(son)].exitType = core::ExitType::Removed;
        // One death in ten among the older founders.
        if (k % 10 == 0) {
            const int f = k % founders;
            if (!c.animals[static_cast<size_t>(f)].exit) {
                c.animals[static_cast<size_t>(f)].exit = birth;
                c.animals[static_cast<size_t>(f)].exitType = core::ExitType::Died;
            }
        }
    }
    for (const core::Animal& a : c.animals) c.residences.push_back({a.id, "main", *a.entry, a.exit, {}});
    std::vector<int> present;
    std::int64_t seq = 0;
    for (core::Day d = start; d <= end; ++d) {
        if ((d + 4) % 7 >= 5) continue; // five days a week (1970-01-01 was a Thursday)
        if (present.empty() || d % 30 == 0) {
            present.clear();
            for (size_t a = 0; a < c.animals.size(); ++a)
                if (*c.animals[a].entry <= d && (!c.animals[a].exit || *c.animals[a].exit >= d) && *c.animals[a].birth + 365 <= d)
                    present.push_back(static_cast<int>(a));
        }
        if (present.size() < 2) continue;
        for (int e = 0; e < perDay; ++e) {
            const int a = present[static_cast<size_t>(rng() % present.size())];
            const int b = present[static_cast<size_t>(rng() % present.size())];
            if (a == b || (c.animals[static_cast<size_t>(a)].exit && *c.animals[static_cast<size_t>(a)].exit < d) ||
                (c.animals[static_cast<size_t>(b)].exit && *c.animals[static_cast<size_t>(b)].exit < d))
                continue;
            const bool upset = uniform() < 0.08;
            const bool aWins = (latent[static_cast<size_t>(a)] > latent[static_cast<size_t>(b)]) != upset;
            core::Encounter enc;
            enc.date = d;
            enc.winner = c.animals[static_cast<size_t>(aWins ? a : b)].id;
            enc.loser = c.animals[static_cast<size_t>(aWins ? b : a)].id;
            enc.group = "main";
            enc.seq = ++seq;
            c.encounters.push_back(std::move(enc));
        }
    }
    c.reindex();
    return c;
}

} // namespace hierloom::bench
