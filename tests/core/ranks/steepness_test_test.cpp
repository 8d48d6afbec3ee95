// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/steepness_test.h"

#include "core/ranks/davids_score.h"
#include "matrix_examples.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom::core;
using namespace hierloom::core::testing;

// A steep linear 10-animal matrix (5 wins per dyad): random binomial matrices
// essentially never reach its steepness, so p is near 1/(N+1).
TEST(SteepnessTest, LinearMatrixGivesSmallP)
{
    const WinMatrix m = linearMatrix(10, 5.0);
    const RandomisationTest t = steepnessTest(m, 10000, 11, 2);
    ASSERT_TRUE(t.p.has_value());
    EXPECT_LT(*t.p, 0.01);
    EXPECT_EQ(t.iterations, 10000);
    EXPECT_EQ(t.seed, 11U);
    EXPECT_LT(*t.meanRandom, *steepness(m));
}

// A matrix drawn from the null model itself: p is not tiny; over many such
// matrices the mean p is near 1/2 (loose: ties make the test slightly conservative).
TEST(SteepnessTest, RandomMatricesGiveUniformishP)
{
    const RandomisationTest one = steepnessTest(randomMatrix(10, 21, 0.8, 0.5, 5), 2000, 5, 2);
    EXPECT_GT(*one.p, 0.01);
    double sum = 0.0;
    const int matrices = 40;
    for (int k = 0; k < matrices; ++k) sum += *steepnessTest(randomMatrix(8, 500 + k, 0.8, 0.5, 5), 300, k, 2).p;
    const double mean = sum / matrices;
    EXPECT_GT(mean, 0.35);
    EXPECT_LT(mean, 0.70);
}

// The random matrices keep n_ij: with one known dyad (1:0), hand reasoning gives p exactly.
TEST(SteepnessTest, SingleDyadExactP)
{
    // Observed 1:0; random s ~ Binomial(1, 1/2) gives 1:0 or 0:1, both of equal
    // steepness by symmetry, so every random value counts and p = 1.
    const RandomisationTest t = steepnessTest(WinMatrix::fromRows({{0, 1, 0}, {0, 0, 0}, {0, 0, 0}}), 500, 3, 1);
    EXPECT_EQ(*t.p, 1.0);
}

// docs/methods.md "Randomisations": identical figures for any thread count.
TEST(SteepnessTest, SameSeedSameResultAnyThreads)
{
    const WinMatrix m = randomMatrix(14, 8, 0.7, 0.65, 6, true);
    const RandomisationTest t1 = steepnessTest(m, 1000, 99, 1);
    for (unsigned threads : {2U, 4U}) {
        const RandomisationTest t = steepnessTest(m, 1000, 99, threads);
        EXPECT_EQ(*t.p, *t1.p);
        EXPECT_EQ(*t.meanRandom, *t1.meanRandom);
    }
}

// docs/methods.md "Small choices": empty below two animals; no NaN for an all-zero matrix.
TEST(SteepnessTest, DegenerateMatrices)
{
    for (int n : {0, 1}) EXPECT_FALSE(steepnessTest(WinMatrix(n), 100, 1, 1).p.has_value());
    // All zero: observed and every random steepness are 0, which counts (>=), so p = 1.
    const RandomisationTest zero = steepnessTest(WinMatrix(6), 200, 1, 2);
    EXPECT_EQ(*zero.p, 1.0);
    EXPECT_EQ(*zero.meanRandom, 0.0);
    EXPECT_FALSE(steepnessTest(exampleL(), 0, 1, 1).p.has_value());
}
