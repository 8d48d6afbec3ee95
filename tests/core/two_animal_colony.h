// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// A colony of one female and one male in group "main" since 2010-01-01, with
// n encounters F1 over M1 on 2012-01-01: the smallest file the store tests
// (backups, rotation, integrity checks) need.
#include "core/base/civil_date.h"
#include "core/store/colony_store.h"

#include <chrono>
#include <string>
#include <vector>

namespace hierloom::test {

// 2024-05-01 12:00:00 UTC = 1714564800 s after the Unix epoch.
inline const std::chrono::system_clock::time_point kNoon = std::chrono::system_clock::from_time_t(1714564800);

inline std::vector<core::Encounter> twoAnimalEncounters(int n)
{
    std::vector<core::Encounter> out(static_cast<size_t>(n));
    for (auto& e : out) {
        e.date = *core::parseDate("2012-01-01");
        e.winner = "F1";
        e.loser = "M1";
        e.group = "main";
    }
    return out;
}

inline core::ColonyStore twoAnimalColony(const std::string& path, int encounters)
{
    core::ColonyStore store = core::ColonyStore::create(path);
    core::Animal f, m;
    f.id = "F1";
    f.sex = core::Sex::Female;
    m.id = "M1";
    m.sex = core::Sex::Male;
    f.entry = m.entry = core::parseDate("2010-01-01");
    store.append({f, m},
                 {{"F1", "main", *core::parseDate("2010-01-01"), std::nullopt, ""},
                  {"M1", "main", *core::parseDate("2010-01-01"), std::nullopt, ""}},
                 twoAnimalEncounters(encounters));
    return store;
}

} // namespace hierloom::test
