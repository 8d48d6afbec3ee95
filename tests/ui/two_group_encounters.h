// SPDX-License-Identifier: GPL-3.0-or-later
// The colony of the desktop's model tests (random steps checked against a
// fresh read of the file): two groups, and random encounters within one.
#pragma once

#include "core/base/civil_date.h"
#include "core/base/colony.h"

#include <random>
#include <string>
#include <vector>

namespace hierloom::test {

inline const std::vector<std::string> kGroupA = {"F1", "F2", "D1", "D2"};
inline const std::vector<std::string> kGroupB = {"M1", "G1"};

/// An encounter between two different animals of `group`, on a day drawn from
/// `first` to `first + span`; observer "GW". Draws the day, then the winner,
/// then the loser.
inline core::Encounter randomEncounterIn(std::mt19937& random, const std::vector<std::string>& group, core::Day first,
                                         int span)
{
    auto uniform = [&random](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(random); };
    core::Encounter e;
    e.date = first + uniform(0, span);
    const size_t w = static_cast<size_t>(uniform(0, static_cast<int>(group.size()) - 1));
    size_t l = static_cast<size_t>(uniform(0, static_cast<int>(group.size()) - 2));
    if (l >= w) ++l;
    e.winner = group[w];
    e.loser = group[l];
    e.observer = "GW";
    return e;
}

} // namespace hierloom::test
