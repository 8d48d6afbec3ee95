// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/davids_score.h"

#include "matrix_examples.h"

#include <gtest/gtest.h>

#include <cmath>
#include <numeric>

using namespace hierloom::core;
using namespace hierloom::core::testing;

namespace {

void expectNear(const std::vector<double>& got, const std::vector<double>& want, double tol)
{
    ASSERT_EQ(got.size(), want.size());
    for (size_t i = 0; i < got.size(); ++i) EXPECT_NEAR(got[i], want[i], tol) << "index " << i;
}

/// NormDS from the P-based scores, for the P-version steepness column of docs/methods.md, "Check values".
std::vector<double> normFromProportion(const WinMatrix& m)
{
    std::vector<double> ds = davidsScores(m, DyadicIndex::Proportion);
    for (double& v : ds) v = (v + m.n * (m.n - 1) / 2.0) / m.n;
    return ds;
}

} // namespace

// docs/methods.md, "Check values" 2, Example L [computed regression value].
TEST(DavidsScore, ExampleLinear)
{
    const WinMatrix m = exampleL();
    expectNear(davidsScores(m, DyadicIndex::Proportion), {6, 2, -2, -6}, 1e-12);
    expectNear(davidsScores(m, DyadicIndex::Corrected), {3, 1, -1, -3}, 1e-12);
    expectNear(normalisedDavidsScores(m), {2.25, 1.75, 1.25, 0.75}, 1e-12);
    EXPECT_NEAR(*steepness(m), 0.5, 1e-12);
    std::vector<double> normP = normFromProportion(m);
    expectNear(normP, {3, 2, 1, 0}, 1e-12);
    EXPECT_NEAR(*steepnessOfScores(normP), 1.0, 1e-12);
}

// docs/methods.md, "Check values" 2, Example 1 [computed regression value], 4 decimals.
TEST(DavidsScore, ExampleOneUnknownDyad)
{
    const WinMatrix m = example1();
    expectNear(davidsScores(m, DyadicIndex::Proportion), {4.5714, 0.0714, -1.5, -3.1429}, 5e-5);
    expectNear(davidsScores(m, DyadicIndex::Corrected), {3.4375, -0.0595, -1.0714, -2.3065}, 5e-5);
    expectNear(normalisedDavidsScores(m), {2.3594, 1.4851, 1.2321, 0.9234}, 5e-5);
    EXPECT_NEAR(*steepness(m), 0.4561, 5e-5);
    std::vector<double> normP = normFromProportion(m);
    expectNear(normP, {2.6429, 1.5179, 1.125, 0.7143}, 5e-5);
    EXPECT_NEAR(*steepnessOfScores(normP), 0.6179, 5e-5);
}

// docs/methods.md, "Check values" 2, Example C [computed regression value].
TEST(DavidsScore, ExampleCyclicTriad)
{
    const WinMatrix m = exampleC();
    expectNear(davidsScores(m, DyadicIndex::Proportion), {2, 2, 2, -6}, 1e-12);
    expectNear(normalisedDavidsScores(m), {1.8333, 1.8333, 1.8333, 0.5}, 5e-5);
    EXPECT_NEAR(*steepness(m), 0.4, 1e-12);
    std::vector<double> normP = normFromProportion(m);
    expectNear(normP, {2, 2, 2, 0}, 1e-12);
    EXPECT_NEAR(*steepnessOfScores(normP), 0.6, 1e-12);
}

// docs/methods.md, "Check values" 2, Example 5 [computed regression value].
TEST(DavidsScore, ExampleFiveGroup)
{
    const WinMatrix m = example5();
    expectNear(davidsScores(m, DyadicIndex::Proportion), {4.7, 0.8, 2.0, -4.3, -3.2}, 1e-12);
    expectNear(normalisedDavidsScores(m), {2.7, 2.1667, 2.2167, 1.5, 1.4167}, 5e-5);
    EXPECT_NEAR(*steepness(m), 0.3283, 5e-5);
    std::vector<double> normP = normFromProportion(m);
    EXPECT_NEAR(*steepnessOfScores(normP), 0.464, 5e-4);
}

// The D index is algebra on its published definition: D = P - (P - 1/2)/(n + 1) (docs/methods.md, "Check values" 2).
TEST(DavidsScore, CorrectedIndexMatchesPublishedForm)
{
    const WinMatrix m = randomMatrix(9, 17, 0.7, 0.6, 6, true);
    const std::vector<double> p = dyadicIndexMatrix(m, DyadicIndex::Proportion);
    const std::vector<double> d = dyadicIndexMatrix(m, DyadicIndex::Corrected);
    for (int i = 0; i < m.n; ++i)
        for (int j = 0; j < m.n; ++j) {
            const size_t k = static_cast<size_t>(i * m.n + j);
            const double nij = m.total(i, j);
            const double want = (i == j || nij == 0) ? 0.0 : p[k] - (p[k] - 0.5) / (nij + 1.0);
            EXPECT_NEAR(d[k], want, 1e-12);
        }
}

// Invariants (docs/methods.md, "Check values" 2): sum DS = 0 and sum NormDS = n(n-1)/2; steepness in [0, 1].
TEST(DavidsScore, InvariantsOnRandomMatrices)
{
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        const int n = 2 + static_cast<int>(seed % 15);
        const WinMatrix m = randomMatrix(n, seed, 0.6, 0.65, 7, seed % 2 == 0);
        for (DyadicIndex index : {DyadicIndex::Proportion, DyadicIndex::Corrected}) {
            const std::vector<double> ds = davidsScores(m, index);
            EXPECT_NEAR(std::accumulate(ds.begin(), ds.end(), 0.0), 0.0, 1e-9);
        }
        const std::vector<double> norm = normalisedDavidsScores(m);
        EXPECT_NEAR(std::accumulate(norm.begin(), norm.end(), 0.0), n * (n - 1) / 2.0, 1e-9);
        const double st = *steepness(m);
        EXPECT_GE(st, 0.0);
        EXPECT_LE(st, 1.0);
    }
}

// docs/methods.md "Small choices": steepness is empty with fewer than two animals, never NaN.
TEST(DavidsScore, DegenerateMatrices)
{
    EXPECT_TRUE(davidsScores(WinMatrix(0), DyadicIndex::Proportion).empty());
    EXPECT_FALSE(steepness(WinMatrix(0)).has_value());
    EXPECT_FALSE(steepness(WinMatrix(1)).has_value());
    expectNear(normalisedDavidsScores(WinMatrix(1)), {0.0}, 0.0);
    // Two animals, one win, by hand from docs/methods.md: D = 0.75 / 0.25, w = 0.75, w2 = 0.75 * 0.25,
    // l = 0.25, l2 = 0.25 * 0.75, so DS = +-0.5 and NormDS = 0.75, 0.25.
    const WinMatrix two = WinMatrix::fromRows({{0, 1}, {0, 0}});
    expectNear(davidsScores(two, DyadicIndex::Corrected), {0.75 + 0.1875 - 0.25 - 0.1875, -0.5}, 1e-12);
    EXPECT_NEAR(*steepness(two), 0.5, 1e-12);
    // No encounters: every score zero, NormDS (n-1)/2, steepness 0 (defined, not NaN).
    const WinMatrix zero(5);
    expectNear(davidsScores(zero, DyadicIndex::Proportion), {0, 0, 0, 0, 0}, 0.0);
    expectNear(normalisedDavidsScores(zero), {2, 2, 2, 2, 2}, 0.0);
    EXPECT_EQ(*steepness(zero), 0.0);
}
