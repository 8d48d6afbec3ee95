// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/directional_consistency.h"

#include "matrix_examples.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using namespace hierloom::core::testing;

// docs/methods.md, "Check values" 5 [computed regression values].
TEST(DirectionalConsistency, Examples)
{
    EXPECT_NEAR(*directionalConsistency(example1()), 16.0 / 24.0, 1e-15); // H = 20, L = 4
    EXPECT_NEAR(*directionalConsistency(example5()), 21.0 / 29.0, 1e-15); // H = 25, L = 4
    EXPECT_EQ(*directionalConsistency(exampleL()), 1.0);
    EXPECT_EQ(*directionalConsistency(exampleC()), 1.0);
}

// docs/methods.md, "Check values" 5: a tied dyad adds equally to H and L; a draw (1/2 each) likewise.
TEST(DirectionalConsistency, TiesAndDraws)
{
    EXPECT_EQ(*directionalConsistency(WinMatrix::fromRows({{0, 2}, {2, 0}})), 0.0);
    EXPECT_EQ(*directionalConsistency(WinMatrix::fromRows({{0, 0.5}, {0.5, 0}})), 0.0);
    // 3 wins and one draw: (3.5 - 0.5) / 4.
    EXPECT_NEAR(*directionalConsistency(WinMatrix::fromRows({{0, 3.5}, {0.5, 0}})), 0.75, 1e-15);
}

// docs/methods.md "Small choices": DCI is empty without encounters.
TEST(DirectionalConsistency, EmptyWithoutEncounters)
{
    EXPECT_FALSE(directionalConsistency(WinMatrix(0)).has_value());
    EXPECT_FALSE(directionalConsistency(WinMatrix(1)).has_value());
    EXPECT_FALSE(directionalConsistency(WinMatrix(2)).has_value());
    EXPECT_FALSE(directionalConsistency(WinMatrix(6)).has_value());
}
