// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/mersenne_twister.h"
#include "core/ranks/parallel_randomisation.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <random>
#include <vector>

using namespace hierloom::core;

TEST(MersenneTwister64, SameStreamAsTheStandardEngine)
{
    // Seeds at the edges and those runRandomisations gives its blocks; 2,000
    // draws cross six refills of the 312-word state.
    std::vector<std::uint64_t> seeds = {0, 1, 5489, 0xFFFFFFFFFFFFFFFFULL, 0x8000000000000000ULL};
    for (std::uint64_t b = 0; b < 20; ++b) seeds.push_back(blockSeed(7, b));
    for (std::uint64_t seed : seeds) {
        std::mt19937_64 reference(seed);
        MersenneTwister64 engine(seed);
        for (int i = 0; i < 2000; ++i) ASSERT_EQ(engine(), reference()) << "seed " << seed << ", draw " << i;
    }
    std::mt19937_64 reference;
    MersenneTwister64 engine;
    for (int i = 0; i < 1000; ++i) ASSERT_EQ(engine(), reference());
}

TEST(MersenneTwister64, TenThousandthDrawOfTheDefaultSeed)
{
    // The check value the C++ standard gives for mt19937_64 ([rand.predef]).
    MersenneTwister64 engine;
    for (int i = 1; i < 10000; ++i) engine();
    EXPECT_EQ(engine(), 9981545732273789042ULL);
}

TEST(MersenneTwister64, StandardDistributionsDrawTheSame)
{
    std::mt19937_64 reference(99);
    MersenneTwister64 engine(99);
    std::vector<int> a(50), b(50);
    for (int i = 0; i < 50; ++i) a[i] = b[i] = i;
    std::shuffle(a.begin(), a.end(), reference);
    std::shuffle(b.begin(), b.end(), engine);
    EXPECT_EQ(a, b);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    for (int i = 0; i < 100; ++i) ASSERT_EQ(u(engine), u(reference));
}
