// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/dyadic_dominance.h"

#include "matrix_examples.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using namespace hierloom::core::testing;

// Definitions of docs/methods.md "Linearity": V_ij is 1, 0 or 1/2 (tie or unknown).
TEST(DyadicDominance, DominanceValues)
{
    const WinMatrix m = example5();
    EXPECT_EQ(dyadicDominance(m, 0, 1), 1.0);
    EXPECT_EQ(dyadicDominance(m, 1, 0), 0.0);
    EXPECT_EQ(dyadicDominance(m, 0, 2), 0.5); // 2:2 tie
    EXPECT_EQ(dyadicDominance(m, 0, 3), 0.5); // unknown
    EXPECT_TRUE(dominates(m, 4, 1));
    EXPECT_FALSE(dominates(m, 0, 2));
    EXPECT_FALSE(dominates(m, 2, 0));
}

// docs/file-formats.md metrics rows: dyads = n(n-1)/2, known = n_ij > 0, unknown_share = 1 - known/dyads.
TEST(DyadicDominance, DyadCounts)
{
    const DyadCounts c1 = dyadCounts(example1()); // only B-D unknown
    EXPECT_EQ(c1.dyads, 6);
    EXPECT_EQ(c1.knownDyads, 5);
    EXPECT_NEAR(*c1.unknownShare, 1.0 / 6.0, 1e-15);
    const DyadCounts c5 = dyadCounts(example5()); // only A-D unknown
    EXPECT_EQ(c5.dyads, 10);
    EXPECT_EQ(c5.knownDyads, 9);
    EXPECT_NEAR(*c5.unknownShare, 0.1, 1e-15);
    // A dyad with only a draw is known.
    const DyadCounts draw = dyadCounts(WinMatrix::fromRows({{0, 0.5, 0}, {0.5, 0, 0}, {0, 0, 0}}));
    EXPECT_EQ(draw.knownDyads, 1);
    EXPECT_NEAR(*draw.unknownShare, 2.0 / 3.0, 1e-15);
    const DyadCounts zero = dyadCounts(WinMatrix(4));
    EXPECT_EQ(zero.dyads, 6);
    EXPECT_EQ(zero.knownDyads, 0);
    EXPECT_EQ(*zero.unknownShare, 1.0);
    for (int n : {0, 1}) {
        const DyadCounts c = dyadCounts(WinMatrix(n));
        EXPECT_EQ(c.dyads, 0);
        EXPECT_FALSE(c.unknownShare.has_value());
    }
}
