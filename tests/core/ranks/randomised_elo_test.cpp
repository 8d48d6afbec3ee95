// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/randomised_elo.h"

#include "core/ranks/elo_kernel.h"
#include "core/ranks/ordinal_ranks.h"
#include "core/ranks/parallel_randomisation.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <random>

using namespace hierloom::core;

namespace {

std::vector<Bout> randomBouts(int n, int count, unsigned seed)
{
    std::mt19937 gen(seed);
    std::uniform_int_distribution<int> pick(0, n - 1);
    std::vector<Bout> bouts;
    while (static_cast<int>(bouts.size()) < count) {
        const int a = pick(gen), b = pick(gen);
        // Lower index wins 3 times in 4, so the hierarchy has a shape but orders matter.
        if (a != b) bouts.push_back(pick(gen) % 4 == 0 ? Bout{std::max(a, b), std::min(a, b)} : Bout{std::min(a, b), std::max(a, b)});
    }
    return bouts;
}

bool sameRows(const std::vector<RandomisedEloRow>& a, const std::vector<RandomisedEloRow>& b)
{
    if (a.size() != b.size()) return false;
    for (size_t i = 0; i < a.size(); ++i)
        if (a[i].rated != b[i].rated || a[i].meanRating != b[i].meanRating || a[i].low != b[i].low
            || a[i].high != b[i].high || a[i].meanRank != b[i].meanRank)
            return false;
    return true;
}

/// The randomised Elo as it was before the packed bouts and the branch-free
/// engine (kept frozen here): std::mt19937_64 per block of 64 orders, each
/// order a Fisher-Yates shuffle of the counted Bouts, one thread.
std::vector<RandomisedEloRow> frozenRandomisedElo(int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                                                  int iterations, std::uint64_t seed)
{
    __extension__ typedef unsigned __int128 Wide;
    auto below = [](std::mt19937_64& engine, std::uint64_t bound) {
        Wide product = static_cast<Wide>(engine()) * bound;
        auto low = static_cast<std::uint64_t>(product);
        if (low < bound) {
            const std::uint64_t threshold = (0 - bound) % bound;
            while (low < threshold) {
                product = static_cast<Wide>(engine()) * bound;
                low = static_cast<std::uint64_t>(product);
            }
        }
        return static_cast<std::uint64_t>(product >> 64);
    };
    std::vector<Bout> counted;
    std::vector<bool> rated(static_cast<size_t>(n), false);
    for (const Bout& b : bouts)
        if (!(b.draw && settings.draws == DrawPolicy::Ignore)) {
            counted.push_back(b);
            rated[static_cast<size_t>(b.winner)] = rated[static_cast<size_t>(b.loser)] = true;
        }
    std::vector<std::vector<double>> ratings;
    std::vector<std::vector<int>> ranks;
    for (int block = 0; block * kRandomisationBlock < iterations; ++block) {
        std::mt19937_64 engine(blockSeed(seed, static_cast<std::uint64_t>(block)));
        for (int it = block * kRandomisationBlock; it < std::min(iterations, (block + 1) * kRandomisationBlock); ++it) {
            std::vector<Bout> order = counted;
            for (size_t i = order.size(); i > 1; --i) std::swap(order[i - 1], order[static_cast<size_t>(below(engine, i))]);
            std::vector<double> rating(static_cast<size_t>(n), settings.start);
            std::vector<unsigned char> seen(static_cast<size_t>(n), 0);
            detail::EloTally unused;
            detail::eloStepsFor<false>(settings.curve, order.data(), order.data() + order.size(), rating.data(),
                                       seen.data(), settings.k, false, unused);
            ranks.push_back(ordinalRanks(rating, rated));
            ratings.push_back(std::move(rating));
        }
    }
    std::vector<RandomisedEloRow> rows(static_cast<size_t>(n));
    for (size_t a = 0; a < rows.size(); ++a) {
        if (!rated[a]) continue;
        std::vector<double> values;
        double sum = 0;
        long long rankSum = 0;
        for (size_t it = 0; it < ratings.size(); ++it) {
            values.push_back(ratings[it][a]);
            sum += ratings[it][a];
            rankSum += ranks[it][a];
        }
        std::sort(values.begin(), values.end());
        auto quantile = [&](double p) {
            const double h = (static_cast<double>(values.size()) - 1.0) * p;
            const auto lo = static_cast<size_t>(std::floor(h));
            if (lo + 1 >= values.size()) return values.back();
            return values[lo] + (h - static_cast<double>(lo)) * (values[lo + 1] - values[lo]);
        };
        rows[a] = {true, sum / iterations, quantile(0.025), quantile(0.975), static_cast<double>(rankSum) / iterations};
    }
    return rows;
}

} // namespace

TEST(RandomisedElo, SameAsTheFrozenReferenceBitForBit)
{
    // Random small cases: both curves, both draw policies, up to three blocks
    // of orders, one and two threads; every figure must equal the frozen code's exactly.
    std::mt19937 gen(2026);
    for (int round = 0; round < 24; ++round) {
        const int n = 2 + static_cast<int>(gen() % 12);
        std::vector<Bout> bouts = randomBouts(n, 1 + static_cast<int>(gen() % 150), static_cast<unsigned>(gen()));
        for (Bout& b : bouts) b.draw = gen() % 7 == 0;
        EloSettings settings;
        settings.curve = round % 2 ? EloCurve::Normal : EloCurve::Logistic;
        settings.draws = round % 3 == 0 ? DrawPolicy::Ignore : DrawPolicy::Half;
        settings.k = 20.0 + static_cast<double>(gen() % 180);
        settings.start = static_cast<double>(gen() % 2000);
        const int iterations = 1 + static_cast<int>(gen() % 190);
        const std::uint64_t seed = gen();
        const auto expected = frozenRandomisedElo(n + 1, bouts, settings, iterations, seed);
        EXPECT_TRUE(sameRows(randomisedElo(n + 1, bouts, settings, iterations, seed, 1), expected)) << "round " << round;
        EXPECT_TRUE(sameRows(randomisedElo(n + 1, bouts, settings, iterations, seed, 2), expected)) << "round " << round;
    }
}

TEST(RandomisedElo, SameSeedSameResultAnyThreadCount)
{
    // docs/methods.md "Randomisations": same seed, same figure whatever the number of threads.
    const std::vector<Bout> bouts = randomBouts(8, 120, 11);
    const auto one = randomisedElo(8, bouts, EloSettings{}, 300, 42, 1);
    EXPECT_TRUE(sameRows(one, randomisedElo(8, bouts, EloSettings{}, 300, 42, 2)));
    EXPECT_TRUE(sameRows(one, randomisedElo(8, bouts, EloSettings{}, 300, 42, 4)));
    EXPECT_FALSE(sameRows(one, randomisedElo(8, bouts, EloSettings{}, 300, 43, 1)));
}

TEST(RandomisedElo, QuantilesOrderedAndRanksConsistent)
{
    const std::vector<Bout> bouts = randomBouts(10, 200, 5);
    const auto rows = randomisedElo(11, bouts, EloSettings{}, 500, 9, 2);
    ASSERT_EQ(rows.size(), 11u);
    double rankSum = 0, ratingSum = 0;
    for (int i = 0; i < 10; ++i) {
        ASSERT_TRUE(rows[i].rated);
        EXPECT_LE(rows[i].low, rows[i].meanRating);
        EXPECT_LE(rows[i].meanRating, rows[i].high);
        EXPECT_LT(rows[i].low, rows[i].high); // orders differ, so the ratings spread
        EXPECT_GE(rows[i].meanRank, 1.0);
        EXPECT_LE(rows[i].meanRank, 10.0);
        rankSum += rows[i].meanRank;
        ratingSum += rows[i].meanRating;
    }
    // Each order ranks 1..10, so mean ranks sum to 55; Elo is zero-sum, so mean ratings total 10 * 1000.
    EXPECT_NEAR(rankSum, 55.0, 1e-9);
    EXPECT_NEAR(ratingSum, 10000.0, 1e-6);
    // Animal 10 has no bout: not rated.
    EXPECT_FALSE(rows[10].rated);
    // Animal 0 wins most: ranked first on average, and above the bottom animal.
    EXPECT_LT(rows[0].meanRank, rows[9].meanRank);
    // No iterations: nothing defined, an empty result.
    EXPECT_TRUE(randomisedElo(10, bouts, EloSettings{}, 0, 1, 1).empty());
    // docs/methods.md "Small choices": under --draws ignore an animal with only draws is not analysed.
    EloSettings ignore;
    ignore.draws = DrawPolicy::Ignore;
    const auto ig = randomisedElo(3, {{0, 1}, {2, 0, true}}, ignore, 10, 1, 1);
    EXPECT_TRUE(ig[0].rated);
    EXPECT_FALSE(ig[2].rated);
    EXPECT_DOUBLE_EQ(ig[0].meanRating, 1050);
}

TEST(RandomisedElo, LinearGroupOneBoutPerDyad)
{
    // docs/methods.md, "Check values" 12 test suggestion: a perfectly linear group with one interaction per
    // dyad ranks the same in every order. Verified here by brute force over all 6! = 720
    // orders of 4 animals (it is not true in general: with 6 animals and k = 100 some orders
    // already swap two neighbours).
    std::vector<Bout> bouts;
    for (int i = 0; i < 4; ++i)
        for (int j = i + 1; j < 4; ++j) bouts.push_back({i, j});
    std::vector<int> perm(bouts.size());
    for (size_t i = 0; i < perm.size(); ++i) perm[i] = static_cast<int>(i);
    do {
        std::vector<Bout> order;
        for (int p : perm) order.push_back(bouts[static_cast<size_t>(p)]);
        const EloRun run = runElo(4, order, EloSettings{});
        EXPECT_GT(run.rating[0], run.rating[1]);
        EXPECT_GT(run.rating[1], run.rating[2]);
        EXPECT_GT(run.rating[2], run.rating[3]);
    } while (std::next_permutation(perm.begin(), perm.end()));

    const auto rows = randomisedElo(4, bouts, EloSettings{}, 1000, 2024, 2);
    for (int i = 0; i < 4; ++i) {
        EXPECT_EQ(rows[i].meanRank, i + 1.0);
        EXPECT_LE(rows[i].low, rows[i].meanRating);
        EXPECT_LE(rows[i].meanRating, rows[i].high);
    }
}

TEST(RandomisedElo, SingleOrderEqualsPlainElo)
{
    // With one bout every order is the same, so the quantiles and mean equal runElo (identity).
    const auto rows = randomisedElo(2, {{1, 0}}, EloSettings{}, 50, 3, 1);
    EXPECT_DOUBLE_EQ(rows[1].meanRating, 1050);
    EXPECT_DOUBLE_EQ(rows[1].low, 1050);
    EXPECT_DOUBLE_EQ(rows[1].high, 1050);
    EXPECT_EQ(rows[1].meanRank, 1.0);
    EXPECT_EQ(rows[0].meanRank, 2.0);
}
