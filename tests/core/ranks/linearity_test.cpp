// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/linearity.h"

#include "matrix_examples.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <utility>
#include <vector>

using namespace hierloom::core;
using namespace hierloom::core::testing;

namespace {

std::vector<std::pair<int, int>> unknownDyads(const WinMatrix& m)
{
    std::vector<std::pair<int, int>> u;
    for (int i = 0; i < m.n; ++i)
        for (int j = i + 1; j < m.n; ++j)
            if (m.total(i, j) == 0) u.emplace_back(i, j);
    return u;
}

/// Landau's h of every completion of the unknown dyads (brute force).
std::vector<double> completionHs(const WinMatrix& m)
{
    const auto u = unknownDyads(m);
    std::vector<double> hs;
    for (unsigned mask = 0; mask < (1U << u.size()); ++mask) {
        WinMatrix c = m;
        for (size_t k = 0; k < u.size(); ++k) {
            const auto [i, j] = u[k];
            if ((mask >> k) & 1U) c.s(i, j) = 1;
            else c.s(j, i) = 1;
        }
        hs.push_back(*linearity(c).h);
    }
    return hs;
}

} // namespace

// docs/methods.md, "Check values" 3 [computed regression values].
TEST(Linearity, Examples)
{
    const LinearityResult l = linearity(exampleL());
    EXPECT_NEAR(*l.h, 1.0, 1e-12);
    EXPECT_NEAR(*l.hPrime, 1.0, 1e-12);
    EXPECT_EQ(l.unknownDyads, 0);
    const LinearityResult c = linearity(exampleC());
    EXPECT_NEAR(*c.h, 0.6, 1e-12);
    EXPECT_NEAR(*c.hPrime, 0.6, 1e-12);
    const LinearityResult e1 = linearity(example1());
    EXPECT_NEAR(*e1.h, 0.7, 1e-12);
    EXPECT_NEAR(*e1.hPrime, 0.8, 1e-12);
    EXPECT_EQ(e1.unknownDyads, 1);
    const LinearityResult e5 = linearity(example5());
    EXPECT_NEAR(*e5.h, 0.25, 1e-12);
    EXPECT_NEAR(*e5.hPrime, 0.30, 1e-12);
    EXPECT_EQ(e5.unknownDyads, 1);
}

// docs/methods.md, "Check values" 3, Example 1: the two completions give h = 1.0 and 0.6.
TEST(Linearity, ExampleOneCompletions)
{
    std::vector<double> hs = completionHs(example1());
    ASSERT_EQ(hs.size(), 2U);
    std::sort(hs.begin(), hs.end());
    EXPECT_NEAR(hs[0], 0.6, 1e-12);
    EXPECT_NEAR(hs[1], 1.0, 1e-12);
}

// de Vries 1995 identity (docs/methods.md): h' is the mean of h over ALL completions
// of the unknown dyads; enumerated on seeded random matrices with ties and draws.
TEST(Linearity, HPrimeIsMeanOverAllCompletions)
{
    int checked = 0;
    for (std::uint64_t seed = 1; checked < 12; ++seed) {
        const int n = 3 + static_cast<int>(seed % 5);
        const WinMatrix m = randomMatrix(n, seed, 0.55, 0.6, 2, true);
        const size_t u = unknownDyads(m).size();
        if (u == 0 || u > 14) continue;
        const std::vector<double> hs = completionHs(m);
        double mean = 0.0;
        for (double h : hs) mean += h;
        mean /= static_cast<double>(hs.size());
        EXPECT_NEAR(*linearity(m).hPrime, mean, 1e-12) << "seed " << seed;
        ++checked;
    }
}

// docs/methods.md: the mean of h_fill estimates h'; tolerance 4 binomial-style
// standard errors, the spread taken from the exact completion distribution.
TEST(Linearity, MeanHFillEstimatesHPrime)
{
    for (std::uint64_t seed : {101ULL, 202ULL}) {
        const WinMatrix m = randomMatrix(8, seed, 0.6, 0.7, 3);
        const std::vector<double> hs = completionHs(m);
        ASSERT_GT(hs.size(), 4U);
        const double hPrime = *linearity(m).hPrime;
        double var = 0.0;
        for (double h : hs) var += (h - hPrime) * (h - hPrime);
        var /= static_cast<double>(hs.size());
        const int iterations = 10000;
        const LinearityTest t = linearityTest(m, iterations, seed, 2);
        ASSERT_TRUE(t.meanHFill.has_value());
        EXPECT_NEAR(*t.meanHFill, hPrime, 4.0 * std::sqrt(var / iterations) + 1e-12);
    }
}

// docs/methods.md, "Check values" 3: E(h) under random dominance is 3/(n+1) [computed].
TEST(Linearity, MeanRandomHIsThreeOverNPlusOne)
{
    const LinearityTest t = linearityTest(randomMatrix(10, 5), 10000, 77, 2);
    EXPECT_NEAR(*t.test.meanRandom, 3.0 / 11.0, 0.01);
}

// A complete linear 10-animal hierarchy: h_rand reaches 1 only for a linear
// random tournament (chance 10!/2^45), so p = 1/(N+1) in practice.
TEST(Linearity, LinearMatrixGivesSmallP)
{
    const LinearityTest t = linearityTest(linearMatrix(10), 10000, 3, 2);
    EXPECT_LT(*t.test.p, 0.01);
    EXPECT_NEAR(*t.meanHFill, 1.0, 1e-12);
    EXPECT_EQ(t.test.iterations, 10000);
    EXPECT_EQ(t.test.seed, 3U);
}

// A random (null) matrix: p is not tiny; over many null matrices p is roughly uniform.
TEST(Linearity, RandomMatricesGiveUniformishP)
{
    const LinearityTest one = linearityTest(randomMatrix(10, 9, 1.0, 0.5, 1), 2000, 9, 2);
    EXPECT_GT(*one.test.p, 0.01);
    double sum = 0.0;
    const int matrices = 60;
    for (int k = 0; k < matrices; ++k)
        sum += *linearityTest(randomMatrix(8, 1000 + k, 1.0, 0.5, 1), 400, k, 2).test.p;
    const double mean = sum / matrices;
    EXPECT_GT(mean, 0.35);
    EXPECT_LT(mean, 0.70);
}

// docs/methods.md "Randomisations": the same seed gives the same figures whatever the thread count.
TEST(Linearity, SameSeedSameResultAnyThreads)
{
    const WinMatrix m = randomMatrix(15, 4, 0.6, 0.6, 4);
    const LinearityTest t1 = linearityTest(m, 1000, 42, 1);
    for (unsigned threads : {2U, 4U}) {
        const LinearityTest t = linearityTest(m, 1000, 42, threads);
        EXPECT_EQ(*t.test.p, *t1.test.p);
        EXPECT_EQ(*t.meanHFill, *t1.meanHFill);
        EXPECT_EQ(*t.test.meanRandom, *t1.test.meanRandom);
    }
}

// docs/methods.md "Small choices": h, h' and the test are empty below two animals; never NaN.
TEST(Linearity, DegenerateMatrices)
{
    for (int n : {0, 1}) {
        const LinearityResult l = linearity(WinMatrix(n));
        EXPECT_FALSE(l.h.has_value());
        EXPECT_FALSE(l.hPrime.has_value());
        const LinearityTest t = linearityTest(WinMatrix(n), 100, 1, 1);
        EXPECT_FALSE(t.test.p.has_value());
        EXPECT_FALSE(t.meanHFill.has_value());
    }
    // Two animals, one known dyad: v = 1, 0, h = 1 by the formula.
    EXPECT_NEAR(*linearity(WinMatrix::fromRows({{0, 2}, {1, 0}})).h, 1.0, 1e-15);
    // No encounters: h = 0 (all v = (n-1)/2), h' = 6u/(n^3-n) = 3/(n+1).
    const LinearityResult zero = linearity(WinMatrix(5));
    EXPECT_EQ(*zero.h, 0.0);
    EXPECT_NEAR(*zero.hPrime, 0.5, 1e-15);
    EXPECT_EQ(zero.unknownDyads, 10);
    const LinearityTest t = linearityTest(WinMatrix(5), 500, 1, 1);
    ASSERT_TRUE(t.test.p.has_value());
    EXPECT_FALSE(std::isnan(*t.test.p));
    // No iterations: no p.
    EXPECT_FALSE(linearityTest(exampleL(), 0, 1, 1).test.p.has_value());
}
