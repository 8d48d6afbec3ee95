// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/triangle_transitivity.h"

#include "matrix_examples.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using namespace hierloom::core::testing;

namespace {

/// Brute force over every triple: arcs i -> j when s_ij > s_ji.
std::pair<long long, long long> bruteTriads(const WinMatrix& m)
{
    auto arc = [&](int a, int b) { return m.s(a, b) > m.s(b, a); };
    auto linked = [&](int a, int b) { return arc(a, b) || arc(b, a); };
    long long t = 0, c = 0;
    for (int i = 0; i < m.n; ++i)
        for (int j = i + 1; j < m.n; ++j)
            for (int k = j + 1; k < m.n; ++k) {
                if (!linked(i, j) || !linked(j, k) || !linked(i, k)) continue;
                const bool cycle = (arc(i, j) && arc(j, k) && arc(k, i)) || (arc(j, i) && arc(k, j) && arc(i, k));
                (cycle ? c : t) += 1;
            }
    return {t, c};
}

void expectTriads(const WinMatrix& m, long long t, long long c, double pt, double tTri)
{
    const TriangleTransitivity r = triangleTransitivity(m);
    EXPECT_EQ(r.transitive, t);
    EXPECT_EQ(r.cyclic, c);
    EXPECT_NEAR(*r.pt, pt, 1e-12);
    EXPECT_NEAR(*r.tTri, tTri, 1e-12);
}

} // namespace

// docs/methods.md, "Check values" 4 [computed regression values; a tie has no arc].
TEST(TriangleTransitivity, Examples)
{
    expectTriads(exampleL(), 4, 0, 1.0, 1.0);
    expectTriads(exampleC(), 3, 1, 0.75, 0.0);
    expectTriads(example1(), 2, 0, 1.0, 1.0);
    expectTriads(example5(), 3, 2, 0.6, -0.6); // negative t_tri is kept
}

// Brute force over all triples on seeded random matrices with ties, draws and unknowns.
TEST(TriangleTransitivity, CountsMatchBruteForce)
{
    for (std::uint64_t seed = 1; seed <= 60; ++seed) {
        const int n = 3 + static_cast<int>(seed % 70); // up to 72 animals: several bit words
        const WinMatrix m = randomMatrix(n, seed, 0.3 + 0.01 * static_cast<double>(seed), 0.55, 3, seed % 3 == 0);
        const auto [t, c] = bruteTriads(m);
        const TriangleTransitivity r = triangleTransitivity(m);
        EXPECT_EQ(r.transitive, t) << "seed " << seed;
        EXPECT_EQ(r.cyclic, c) << "seed " << seed;
        EXPECT_EQ(r.tTri.has_value(), t + c > 0);
    }
}

// A complete linear 10-animal hierarchy: a random orientation is fully
// transitive only if it is itself linear (chance 10!/2^45), so p ~ 1/(N+1).
TEST(TriangleTransitivity, LinearMatrixGivesSmallP)
{
    const RandomisationTest t = triangleTransitivityTest(linearMatrix(10), 10000, 8, 2);
    EXPECT_LT(*t.p, 0.01);
    EXPECT_EQ(t.iterations, 10000);
    EXPECT_EQ(t.seed, 8U);
    // Random orientations: P_t = 0.75 expected (docs/methods.md, "Check values" 4), so mean t_tri ~ 0.
    EXPECT_NEAR(*t.meanRandom, 0.0, 0.02);
}

// Null networks: p not tiny; mean p over many null networks roughly 1/2.
TEST(TriangleTransitivity, RandomMatricesGiveUniformishP)
{
    const RandomisationTest one = triangleTransitivityTest(randomMatrix(10, 31, 1.0, 0.5, 1), 2000, 3, 2);
    EXPECT_GT(*one.p, 0.01);
    double sum = 0.0;
    const int matrices = 60;
    for (int k = 0; k < matrices; ++k)
        sum += *triangleTransitivityTest(randomMatrix(9, 700 + k, 0.9, 0.5, 1), 400, k, 2).p;
    const double mean = sum / matrices;
    EXPECT_GT(mean, 0.35);
    EXPECT_LT(mean, 0.70);
}

// docs/methods.md "Randomisations": identical figures for any thread count.
TEST(TriangleTransitivity, SameSeedSameResultAnyThreads)
{
    const WinMatrix m = randomMatrix(20, 6, 0.7, 0.6, 3);
    const RandomisationTest t1 = triangleTransitivityTest(m, 1000, 5, 1);
    for (unsigned threads : {2U, 4U}) {
        const RandomisationTest t = triangleTransitivityTest(m, 1000, 5, threads);
        EXPECT_EQ(*t.p, *t1.p);
        EXPECT_EQ(*t.meanRandom, *t1.meanRandom);
    }
}

// docs/methods.md "Small choices": t_tri and its p are empty when T + C = 0.
TEST(TriangleTransitivity, EmptyWithoutClosedTriads)
{
    for (int n : {0, 1, 2, 6}) {
        const TriangleTransitivity r = triangleTransitivity(WinMatrix(n));
        EXPECT_EQ(r.transitive + r.cyclic, 0);
        EXPECT_FALSE(r.pt.has_value());
        EXPECT_FALSE(r.tTri.has_value());
        EXPECT_FALSE(triangleTransitivityTest(WinMatrix(n), 100, 1, 1).p.has_value());
    }
    // Only ties: no arcs at all.
    const WinMatrix ties = WinMatrix::fromRows({{0, 1, 1}, {1, 0, 1}, {1, 1, 0}});
    EXPECT_FALSE(triangleTransitivity(ties).tTri.has_value());
}
