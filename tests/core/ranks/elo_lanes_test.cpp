// SPDX-License-Identifier: GPL-3.0-or-later
// The optimised k's several-k pass (eloLikelihoodLanes) against one pass per k
// (eloSteps): the same ratings, rated flags and log-likelihood bit for bit, on
// random bouts with draws, both curves and both draw policies.
#include "core/ranks/elo_kernel.h"
#include "core/ranks/elo_optimisation.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <bit>
#include <cmath>
#include <cstdint>
#include <random>

using namespace hierloom::core;

namespace {

std::vector<Bout> randomBouts(std::uint64_t seed, int n, int count)
{
    std::mt19937_64 rng(seed);
    std::vector<Bout> bouts;
    for (int i = 0; i < count; ++i) {
        Bout b;
        b.winner = static_cast<int>(rng() % static_cast<std::uint64_t>(n));
        b.loser = static_cast<int>(rng() % static_cast<std::uint64_t>(n - 1));
        if (b.loser >= b.winner) ++b.loser;
        b.draw = rng() % 7 == 0;
        // A latent order, so ratings spread far (large |x| in the curve).
        if (b.winner > b.loser && rng() % 5 != 0) std::swap(b.winner, b.loser);
        bouts.push_back(b);
    }
    return bouts;
}

template <EloCurve Curve>
void expectLanesMatch(const std::vector<Bout>& bouts, int n, bool ignoreDraws, std::uint64_t seed)
{
    constexpr int lanes = 4;
    const double k[lanes] = {0.0, 5.0 + seed % 50, 100.0, 997.5};
    std::vector<double> ratings(static_cast<size_t>(n) * lanes, 1000.0);
    std::vector<unsigned char> flags(static_cast<size_t>(n) * lanes, 0);
    double* rating[lanes];
    unsigned char* rated[lanes];
    for (int j = 0; j < lanes; ++j) {
        rating[j] = ratings.data() + static_cast<size_t>(n) * j;
        rated[j] = flags.data() + static_cast<size_t>(n) * j;
    }
    detail::EloTally tally[lanes];
    detail::eloLikelihoodLanes<Curve, lanes>(bouts.data(), bouts.data() + bouts.size(), rating, rated, k, ignoreDraws,
                                             tally);
    for (int j = 0; j < lanes; ++j) {
        std::vector<double> r(static_cast<size_t>(n), 1000.0);
        std::vector<unsigned char> f(static_cast<size_t>(n), 0);
        detail::EloTally t;
        detail::eloSteps<Curve, true>(bouts.data(), bouts.data() + bouts.size(), r.data(), f.data(), k[j], ignoreDraws, t);
        EXPECT_EQ(std::bit_cast<std::uint64_t>(t.logLikelihood), std::bit_cast<std::uint64_t>(tally[j].logLikelihood))
            << "seed " << seed << ", lane " << j;
        EXPECT_EQ(t.decided, tally[j].decided);
        for (int a = 0; a < n; ++a) {
            EXPECT_EQ(std::bit_cast<std::uint64_t>(r[static_cast<size_t>(a)]), std::bit_cast<std::uint64_t>(rating[j][a]))
                << "seed " << seed << ", lane " << j << ", animal " << a;
            EXPECT_EQ(f[static_cast<size_t>(a)], rated[j][a]);
        }
    }
}

} // namespace

TEST(EloLanes, SeveralKInOnePassEqualOnePassEach)
{
    for (std::uint64_t seed = 1; seed <= 30; ++seed) {
        const int n = 2 + static_cast<int>(seed % 40);
        const std::vector<Bout> bouts = randomBouts(seed, n, 50 + static_cast<int>(seed * 97 % 3000));
        for (bool ignoreDraws : {false, true}) {
            expectLanesMatch<EloCurve::Logistic>(bouts, n, ignoreDraws, seed);
            expectLanesMatch<EloCurve::Normal>(bouts, n, ignoreDraws, seed);
        }
    }
}

TEST(EloLanes, OptimisedKIsTheBestOfEveryGridValueComputedAlone)
{
    // The grid of 200 values of k (5 apart, to 1000) is computed four at a time;
    // none computed alone may beat the optimum, and the optimum's own value is exact.
    for (std::uint64_t seed = 1; seed <= 4; ++seed) {
        const int n = 10 + static_cast<int>(seed * 5);
        const std::vector<Bout> bouts = randomBouts(seed, n, 800);
        for (unsigned threads : {1U, 3U}) {
            EloSettings s;
            s.draws = seed % 2 ? DrawPolicy::Half : DrawPolicy::Ignore;
            const auto best = optimiseEloK(n, bouts, s, threads);
            ASSERT_TRUE(best.has_value());
            for (int i = 0; i <= 200; ++i) {
                s.k = 5.0 * i;
                EXPECT_LE(eloLogLikelihood(n, bouts, s), best->logLikelihood) << "k " << s.k;
            }
            s.k = best->k;
            EXPECT_EQ(std::bit_cast<std::uint64_t>(eloLogLikelihood(n, bouts, s)),
                      std::bit_cast<std::uint64_t>(best->logLikelihood));
        }
    }
}

namespace {

/// The optimum of docs/methods.md ("Optimised k") computed the plain way: every
/// grid value in full, one k at a time, then the golden-section search (a
/// deliberate copy of the search in elo_optimisation.cpp, without its early
/// stop and lanes, so the two can be compared bit for bit).
EloOptimum plainOptimum(int n, const std::vector<Bout>& bouts, EloSettings s)
{
    auto at = [&](double k) {
        s.k = k;
        return eloLogLikelihood(n, bouts, s);
    };
    EloOptimum best{0.0, at(0.0)};
    for (int i = 1; i <= 200; ++i) {
        const double value = at(5.0 * i);
        if (value > best.logLikelihood) best = {5.0 * i, value};
    }
    auto consider = [&](double k) {
        const double value = at(k);
        if (value > best.logLikelihood || (value == best.logLikelihood && k < best.k)) best = {k, value};
        return value;
    };
    const double invPhi = (std::sqrt(5.0) - 1.0) / 2.0;
    double a = std::max(0.0, best.k - 5.0), b = std::min(1000.0, best.k + 5.0);
    double c = b - invPhi * (b - a), d = a + invPhi * (b - a);
    double fc = consider(c), fd = consider(d);
    while (b - a > 0.01) {
        if (fc >= fd) {
            b = d;
            d = c;
            fd = fc;
            c = b - invPhi * (b - a);
            fc = consider(c);
        } else {
            a = c;
            c = d;
            fc = fd;
            d = a + invPhi * (b - a);
            fd = consider(d);
        }
    }
    return best;
}

} // namespace

TEST(EloLanes, GridValuesStoppedEarlyChangeNothing)
{
    // Long records (many bound checks, elo_optimisation.cpp), so that the grid's
    // far values of k stop early: the optimum and its likelihood, bit for bit,
    // are those of every value computed in full, with any number of threads.
    for (std::uint64_t seed = 1; seed <= 6; ++seed) {
        const int n = 8 + static_cast<int>(seed * 7);
        const std::vector<Bout> bouts = randomBouts(seed, n, 9000 + static_cast<int>(seed * 3001));
        EloSettings s;
        s.draws = seed % 2 ? DrawPolicy::Half : DrawPolicy::Ignore;
        s.curve = seed % 3 == 0 ? EloCurve::Normal : EloCurve::Logistic;
        const EloOptimum plain = plainOptimum(n, bouts, s);
        for (unsigned threads : {1U, 2U, 3U}) {
            const auto best = optimiseEloK(n, bouts, s, threads);
            ASSERT_TRUE(best.has_value());
            EXPECT_EQ(std::bit_cast<std::uint64_t>(best->k), std::bit_cast<std::uint64_t>(plain.k))
                << "seed " << seed << ", threads " << threads;
            EXPECT_EQ(std::bit_cast<std::uint64_t>(best->logLikelihood), std::bit_cast<std::uint64_t>(plain.logLikelihood))
                << "seed " << seed << ", threads " << threads;
        }
    }
}
