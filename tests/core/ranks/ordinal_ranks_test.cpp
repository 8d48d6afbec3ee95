// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/ordinal_ranks.h"

#include <gtest/gtest.h>

#include <stdexcept>

using namespace hierloom::core;

TEST(OrdinalRanks, DescendingWithIndexTiesAndExclusions)
{
    // docs/methods.md "Small choices": by score descending, equal (within relative 1e-9) by id ascending.
    const std::vector<double> score = {5, 9, 5 * (1 + 5e-10), 7, 9, 1};
    const std::vector<bool> include = {true, true, true, true, true, false};
    EXPECT_EQ(ordinalRanks(score, include), (std::vector<int>{4, 1, 5, 3, 2, 0}));
    // A relative gap of 1e-8 is not a tie: the larger score ranks first whatever the index.
    EXPECT_EQ(ordinalRanks({1000, 1000 * (1 + 1e-8)}, {true, true}), (std::vector<int>{2, 1}));
    // Within 1e-9: the smaller index first even though its score is slightly smaller.
    EXPECT_EQ(ordinalRanks({1000, 1000 * (1 + 1e-10)}, {true, true}), (std::vector<int>{1, 2}));
    EXPECT_EQ(ordinalRanks({}, {}), std::vector<int>{});
    EXPECT_EQ(ordinalRanks({0.0, 0.0, -0.0}, {true, true, true}), (std::vector<int>{1, 2, 3}));
    EXPECT_THROW(ordinalRanks({1.0}, {}), std::invalid_argument);
}
