// SPDX-License-Identifier: GPL-3.0-or-later
// chronologicalOrder against its definition (docs/methods.md: date, time with
// untimed last, entry order), brute force on random records with many ties.
#include "core/base/colony.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <numeric>
#include <random>

using namespace hierloom::core;

TEST(ChronologicalOrder, EqualsAStableSortByTheDefinition)
{
    std::mt19937 rng(17);
    for (int round = 0; round < 50; ++round) {
        std::vector<Encounter> encounters(1 + rng() % 300);
        for (Encounter& e : encounters) {
            e.date = -3 + static_cast<Day>(rng() % 8); // dates before 1970 too
            if (rng() % 3 != 0) e.time = static_cast<int>(rng() % 4) * 480; // 00:00, 08:00, 16:00, 24:00 (bad data)
            e.seq = static_cast<std::int64_t>(rng() % 5); // repeated seq: unsaved records
        }
        // The reference: indices stable-sorted by the comparison that defines the order.
        std::vector<size_t> expected(encounters.size());
        std::iota(expected.begin(), expected.end(), size_t{0});
        std::stable_sort(expected.begin(), expected.end(),
                         [&](size_t a, size_t b) { return encounterBefore(encounters[a], encounters[b]); });
        EXPECT_EQ(chronologicalOrder(encounters), expected) << "round " << round;
    }
    // Already in order: the identity.
    std::vector<Encounter> sorted(3);
    sorted[1].date = 1;
    sorted[2].date = 2;
    EXPECT_EQ(chronologicalOrder(sorted), (std::vector<size_t>{0, 1, 2}));
}

TEST(ChronologicalOrder, OfASubsetKeepsTheWholeOrdersRelativeOrder)
{
    // Reference: the whole file's order, restricted to the subset (what
    // selectEncounters did before it picked rows first and sorted only those).
    std::mt19937 rng(23);
    for (int round = 0; round < 50; ++round) {
        std::vector<Encounter> encounters(1 + rng() % 300);
        for (Encounter& e : encounters) {
            e.date = -3 + static_cast<Day>(rng() % 8);
            if (rng() % 3 != 0) e.time = static_cast<int>(rng() % 4) * 480;
            e.seq = static_cast<std::int64_t>(rng() % 5);
        }
        std::vector<size_t> subset;
        for (size_t i = 0; i < encounters.size(); ++i)
            if (rng() % 3 == 0) subset.push_back(i);
        std::vector<size_t> expected;
        for (size_t i : chronologicalOrder(encounters))
            if (std::binary_search(subset.begin(), subset.end(), i)) expected.push_back(i);
        EXPECT_EQ(chronologicalOrder(encounters, subset), expected) << "round " << round;
    }
    EXPECT_TRUE(chronologicalOrder(std::vector<Encounter>(4), {}).empty());
}

TEST(ChronologicalOrder, DatesAlreadyAscendingTimesNot)
{
    // Records of several groups entered day by day: the dates ascend, the
    // times within a day do not (the day-by-day sort's case). Reference: the
    // stable sort by the definition, whole and restricted to a subset.
    std::mt19937 rng(29);
    for (int round = 0; round < 50; ++round) {
        std::vector<Encounter> encounters(1 + rng() % 300);
        Day day = -2;
        for (Encounter& e : encounters) {
            if (rng() % 4 == 0) day += 1 + static_cast<Day>(rng() % 2);
            e.date = day;
            if (rng() % 3 != 0) e.time = static_cast<int>(rng() % 5) * 300;
            e.seq = static_cast<std::int64_t>(rng() % 7); // ties too
        }
        std::vector<size_t> expected(encounters.size());
        std::iota(expected.begin(), expected.end(), size_t{0});
        std::stable_sort(expected.begin(), expected.end(),
                         [&](size_t a, size_t b) { return encounterBefore(encounters[a], encounters[b]); });
        EXPECT_EQ(chronologicalOrder(encounters), expected) << "round " << round;
        std::vector<size_t> subset;
        for (size_t i = 0; i < encounters.size(); ++i)
            if (rng() % 2 == 0) subset.push_back(i);
        std::vector<size_t> part;
        for (size_t i : expected)
            if (std::binary_search(subset.begin(), subset.end(), i)) part.push_back(i);
        EXPECT_EQ(chronologicalOrder(encounters, subset), part) << "round " << round;
    }
}
