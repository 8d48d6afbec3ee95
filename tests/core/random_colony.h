// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Small random colonies for model-based tests: animals with mothers and birth
// days, one or two stays in groups, encounters in entry order whose dates are
// not (many on the same day, timed and untimed), draws, encounters without a
// group, behaviour codes, observers and supporters. All invented.
#include "core/base/colony.h"

#include <bit>
#include <cstdint>
#include <optional>
#include <sstream>
#include <random>
#include <string>
#include <vector>

namespace hierloom::test {

/// A number by its exact bits ("-" when absent), for comparing two paths bit for bit.
inline std::string bits(const std::optional<double>& x)
{
    if (!x) return "-";
    std::ostringstream s;
    s << std::hex << std::bit_cast<std::uint64_t>(*x);
    return s.str();
}

struct RandomColonyShape {
    int animals = 14;
    int groups = 3;
    int encounters = 300;
    int days = 40; // encounters fall on this many days (so many share a day)
};

inline core::Colony randomColony(std::uint64_t seed, const RandomColonyShape& shape = {})
{
    using namespace hierloom::core;
    std::mt19937_64 rng(seed);
    auto below = [&](int n) { return static_cast<int>(rng() % static_cast<std::uint64_t>(n)); };
    const Day start = 18000; // 2019-04-14
    Colony c;
    const int n = std::max(2, shape.animals);
    for (int i = 0; i < n; ++i) {
        Animal a;
        // Ids of different lengths and cases, so byte order matters.
        a.id = (i % 3 == 0 ? "a" : i % 3 == 1 ? "B" : "Cx") + std::to_string(below(1000)) + "-" + std::to_string(i);
        a.sex = below(3) == 0 ? Sex::Male : Sex::Female;
        a.birth = start - 400 - below(3000);
        if (i > 2 && below(2) == 0) a.mother = c.animals[static_cast<size_t>(below(i))].id;
        a.entry = start - 100;
        a.entryType = EntryType::Founder;
        c.animals.push_back(a);
    }
    const int groups = std::max(1, shape.groups);
    auto groupName = [](int g) { return "G" + std::to_string(g + 1); };
    for (const Animal& a : c.animals) {
        const int g = below(groups);
        if (below(3) == 0) {
            // Moves once, in the middle of the record.
            const Day move = start + 1 + below(std::max(1, shape.days - 1));
            c.residences.push_back({a.id, groupName(g), start - 100, move - 1, ""});
            c.residences.push_back({a.id, groupName((g + 1) % groups), move, std::nullopt, ""});
        } else {
            c.residences.push_back({a.id, groupName(g), start - 100, std::nullopt, ""});
        }
    }
    const char* behaviours[] = {"", "displace", "chase", "bite"};
    const char* observers[] = {"", "ann", "ben"};
    for (int i = 0; i < shape.encounters; ++i) {
        Encounter e;
        e.date = start + below(std::max(1, shape.days));
        if (below(3) != 0) e.time = below(4) * 360 + below(2);
        const int w = below(n);
        int l = below(n - 1);
        if (l >= w) ++l;
        e.winner = c.animals[static_cast<size_t>(w)].id;
        e.loser = c.animals[static_cast<size_t>(l)].id;
        e.outcome = below(6) == 0 ? Outcome::Draw : Outcome::Decided;
        e.behaviour = behaviours[below(4)];
        e.group = below(5) == 0 ? std::string() : groupName(below(groups));
        e.observer = observers[below(3)];
        e.note = below(4) == 0 ? "note " + std::to_string(i) : std::string();
        e.seq = i + 1;
        if (below(8) == 0) {
            // One or two supporters, neither fighter, on either side.
            for (int k = 0, count = 1 + below(2); k < count; ++k) {
                const std::string& s = c.animals[static_cast<size_t>(below(n))].id;
                if (s == e.winner || s == e.loser || takesPart(e, s)) continue;
                (below(2) == 0 ? e.winnerSupport : e.loserSupport).push_back(s);
            }
        }
        c.encounters.push_back(e);
    }
    c.reindex();
    return c;
}

} // namespace hierloom::test
