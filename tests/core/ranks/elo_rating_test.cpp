// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/elo_rating.h"

#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <stdexcept>

using namespace hierloom::core;

namespace {

// Plain-formula Elo written independently of the optimised kernel, for brute-force comparison.
EloRun referenceElo(int n, const std::vector<Bout>& bouts, const EloSettings& s)
{
    EloRun run{std::vector<double>(static_cast<size_t>(n), s.start), std::vector<bool>(static_cast<size_t>(n), false), 0.0, 0};
    for (const Bout& b : bouts) {
        if (b.draw && s.draws == DrawPolicy::Ignore) continue;
        const double d = run.rating[b.winner] - run.rating[b.loser];
        const double e = s.curve == EloCurve::Logistic ? 1.0 / (1.0 + std::pow(10.0, -d / 400.0))
                                                       : 0.5 * (1.0 + std::erf(d / (200.0 * std::sqrt(2.0)) / std::sqrt(2.0)));
        const double delta = s.k * ((b.draw ? 0.5 : 1.0) - e);
        if (!b.draw) {
            run.logLikelihood += std::log(e);
            ++run.decided;
        }
        run.rating[b.winner] += delta;
        run.rating[b.loser] -= delta;
        run.rated[b.winner] = run.rated[b.loser] = true;
    }
    return run;
}

std::vector<Bout> randomBouts(int n, int count, unsigned seed, double drawShare)
{
    std::mt19937 gen(seed);
    std::uniform_int_distribution<int> pick(0, n - 1);
    std::bernoulli_distribution isDraw(drawShare);
    std::vector<Bout> bouts;
    while (static_cast<int>(bouts.size()) < count) {
        const int a = pick(gen), b = pick(gen);
        if (a != b) bouts.push_back({a, b, isDraw(gen)});
    }
    return bouts;
}

} // namespace

TEST(EloRating, LogisticExpectedScore)
{
    // docs/methods.md, "Check values" 1a [CONFIRMED]: 318chess.com / ualberta / chess.stackexchange 19653.
    EXPECT_DOUBLE_EQ(eloExpected(0, EloCurve::Logistic), 0.5);
    EXPECT_NEAR(eloExpected(92, EloCurve::Logistic), 0.6294, 5e-5);
    EXPECT_NEAR(eloExpected(100, EloCurve::Logistic), 0.6401, 5e-5);
    EXPECT_NEAR(eloExpected(200, EloCurve::Logistic), 0.7597, 5e-5);
    EXPECT_NEAR(eloExpected(400, EloCurve::Logistic), 0.9091, 5e-5);
    EXPECT_NEAR(eloExpected(800, EloCurve::Logistic), 0.9901, 5e-5);
    // docs/methods.md, "Check values" 1a [COMPUTED] regression value.
    EXPECT_NEAR(eloExpected(300, EloCurve::Logistic), 0.8490, 5e-5);
    // Identity E(d) + E(-d) = 1 (docs/methods.md formula).
    for (double d = -1000; d <= 1000; d += 37.5)
        EXPECT_NEAR(eloExpected(d, EloCurve::Logistic) + eloExpected(-d, EloCurve::Logistic), 1.0, 1e-15);
}

TEST(EloRating, NormalFormAgainstFideTable)
{
    // FIDE Handbook B.02 table 8.1(b) rows as quoted in docs/methods.md, "Check values" 1b [CONFIRMED];
    // docs/methods.md: the normal form with sd 200*sqrt(2) agrees within 0.011, not exactly.
    struct Row {
        int from, to;
        double pd;
    };
    const Row rows[] = {{0, 3, .50},     {4, 10, .51},    {11, 17, .52},   {92, 98, .63},   {99, 106, .64},
                        {189, 197, .75}, {198, 206, .76}, {291, 302, .85}, {329, 344, .88}, {345, 357, .89},
                        {358, 374, .90}, {392, 411, .92}, {620, 735, .99}};
    for (const Row& r : rows) {
        const double mid = 0.5 * (r.from + r.to);
        EXPECT_LE(std::fabs(eloExpected(mid, EloCurve::Normal) - r.pd), 0.011) << "row " << r.from << "-" << r.to;
        for (int d = r.from; d <= r.to; ++d)
            EXPECT_LE(std::fabs(eloExpected(d, EloCurve::Normal) - r.pd), 0.011) << "D=" << d;
    }
    // "over 735 -> 1.00" row, at its first value.
    EXPECT_LE(std::fabs(eloExpected(736, EloCurve::Normal) - 1.0), 0.011);
    // docs/methods.md, "Check values" 1b [COMPUTED]: Phi(400/(200 sqrt 2)) = 0.9214.
    EXPECT_NEAR(eloExpected(400, EloCurve::Normal), 0.9214, 5e-5);
    EXPECT_DOUBLE_EQ(eloExpected(0, EloCurve::Normal), 0.5);
}

TEST(EloRating, FourStepSequence)
{
    // docs/methods.md, "Check values" 1a update sequence [COMPUTED regression values]: A=0, B=1, C=2, k=100, start 1000.
    const std::vector<Bout> bouts = {{0, 1}, {1, 0}, {0, 2}, {1, 2}};
    const EloSettings s;
    const std::vector<EloRun> runs = eloAtCheckpoints(3, bouts, {1, 2, 3, 4}, s);
    EXPECT_NEAR(runs[0].rating[0], 1050, 1e-9);
    EXPECT_NEAR(runs[0].rating[1], 950, 1e-9);
    EXPECT_FALSE(runs[0].rated[2]);
    EXPECT_DOUBLE_EQ(runs[0].rating[2], 1000); // not yet rated: still the start value
    EXPECT_NEAR(runs[1].rating[0], 985.9935, 5e-5);
    EXPECT_NEAR(runs[1].rating[1], 1014.0065, 5e-5);
    EXPECT_NEAR(runs[2].rating[0], 1038.0081, 5e-5);
    EXPECT_NEAR(runs[2].rating[2], 947.9854, 5e-5);
    EXPECT_NEAR(runs[3].rating[1], 1054.6180, 5e-5);
    EXPECT_NEAR(runs[3].rating[2], 907.3739, 5e-5);
    // Winner's expected scores 0.5, 0.359935, 0.479854, 0.593885 (same table) give L.
    const double ll = std::log(0.5) + std::log(0.359935) + std::log(0.479854) + std::log(0.593885);
    EXPECT_NEAR(runs[3].logLikelihood, ll, 1e-5);
    EXPECT_EQ(runs[3].decided, 4);
    const EloRun whole = runElo(3, bouts, s);
    EXPECT_EQ(whole.rating, runs[3].rating);
    EXPECT_EQ(whole.logLikelihood, runs[3].logLikelihood);
    // Elo is zero-sum: the ratings always total n * start (docs/methods.md update rule).
    EXPECT_NEAR(whole.rating[0] + whole.rating[1] + whole.rating[2], 3000, 1e-9);
}

TEST(EloRating, DrawsHalfAndIgnore)
{
    EloSettings half;
    // docs/methods.md: a draw moves k(0.5 - E); with equal ratings E = 0.5, so nothing changes.
    const EloRun equal = runElo(2, {{0, 1, true}}, half);
    EXPECT_EQ(equal.rating[0], 1000);
    EXPECT_EQ(equal.rating[1], 1000);
    EXPECT_TRUE(equal.rated[0]);
    EXPECT_TRUE(equal.rated[1]);
    EXPECT_EQ(equal.decided, 0);
    EXPECT_EQ(equal.logLikelihood, 0);
    // After A beats B (1050/950), a draw named "B, A" gives B k(0.5 - E(-100)) = 100(0.5-0.359935) (docs/methods.md, "Check values" 1a).
    const EloRun after = runElo(2, {{0, 1}, {1, 0, true}}, half);
    EXPECT_NEAR(after.rating[1], 950 + 100 * (0.5 - 0.359935), 5e-5);
    EXPECT_NEAR(after.rating[0], 1050 - 100 * (0.5 - 0.359935), 5e-5);
    EXPECT_EQ(after.decided, 1);
    EXPECT_DOUBLE_EQ(after.logLikelihood, std::log(0.5));

    // docs/methods.md "Small choices": ignored draws neither update Elo nor count, so an animal
    // with only draws is not rated.
    EloSettings ignore;
    ignore.draws = DrawPolicy::Ignore;
    const EloRun ig = runElo(3, {{0, 1}, {2, 1, true}, {0, 2, true}}, ignore);
    EXPECT_NEAR(ig.rating[0], 1050, 1e-9);
    EXPECT_NEAR(ig.rating[1], 950, 1e-9);
    EXPECT_FALSE(ig.rated[2]);
    EXPECT_EQ(ig.decided, 1);
}

TEST(EloRating, MatchesPlainFormulaOnRandomData)
{
    // Brute force: the kernel against a plain, line-by-line implementation of the docs/methods.md formulas.
    const std::vector<Bout> bouts = randomBouts(12, 3000, 7, 0.1);
    for (EloCurve curve : {EloCurve::Logistic, EloCurve::Normal})
        for (DrawPolicy draws : {DrawPolicy::Half, DrawPolicy::Ignore}) {
            EloSettings s;
            s.curve = curve;
            s.draws = draws;
            s.k = 73;
            s.start = 1500;
            const EloRun fast = runElo(12, bouts, s);
            const EloRun ref = referenceElo(12, bouts, s);
            for (int i = 0; i < 12; ++i) EXPECT_NEAR(fast.rating[i], ref.rating[i], 1e-8);
            EXPECT_EQ(fast.rated, ref.rated);
            EXPECT_EQ(fast.decided, ref.decided);
            EXPECT_NEAR(fast.logLikelihood, ref.logLikelihood, 1e-8 * std::fabs(ref.logLikelihood));
        }
}

TEST(EloRating, ExtremeGapsStayFinite)
{
    // With k = 1e7 the first bout opens a gap of 1e7 points; the upset that follows has
    // E = 1/(1+10^25000), far below the smallest double, yet ln E = -25000 ln 10 - ln(1 + 10^-25000)
    // (docs/methods.md formula) is finite. The upset moves delta = k(1 - 0), so the two swap places.
    EloSettings s;
    s.k = 1e7;
    const EloRun run = runElo(2, {{0, 1}, {1, 0}}, s);
    EXPECT_NEAR(run.logLikelihood, std::log(0.5) - 25000 * std::log(10.0), 1e-6);
    EXPECT_NEAR(run.rating[0], 1000 - 5e6, 1e-6);
    EXPECT_NEAR(run.rating[1], 1000 + 5e6, 1e-6);
}

TEST(EloCheckpoints, AnyOrderOneRunAndDailyHistory)
{
    const std::vector<Bout> bouts = randomBouts(6, 50, 3, 0.0);
    const EloSettings s;
    const std::vector<size_t> counts = {50, 0, 17, 17, 3};
    const std::vector<EloRun> runs = eloAtCheckpoints(6, bouts, counts, s);
    ASSERT_EQ(runs.size(), counts.size());
    for (size_t c = 0; c < counts.size(); ++c) {
        // Brute force: a fresh run over the prefix.
        const std::vector<Bout> prefix(bouts.begin(), bouts.begin() + static_cast<std::ptrdiff_t>(counts[c]));
        const EloRun ref = runElo(6, prefix, s);
        EXPECT_EQ(runs[c].rating, ref.rating);
        EXPECT_EQ(runs[c].rated, ref.rated);
        EXPECT_EQ(runs[c].logLikelihood, ref.logLikelihood);
    }
    EXPECT_THROW(eloAtCheckpoints(6, bouts, {51}, s), std::out_of_range);
    EXPECT_THROW(runElo(5, {{0, 5}}, s), std::out_of_range);

    // Days 10,10,12,15,15: three days, ratings after each day's last bout (docs/methods.md "Elo rating").
    const std::vector<Bout> five(bouts.begin(), bouts.begin() + 5);
    const std::vector<EloDay> history = eloDailyHistory(6, five, {10, 10, 12, 15, 15}, s);
    ASSERT_EQ(history.size(), 3u);
    EXPECT_EQ(history[0].day, 10);
    EXPECT_EQ(history[1].day, 12);
    EXPECT_EQ(history[2].day, 15);
    EXPECT_EQ(history[0].rating, eloAtCheckpoints(6, five, {2}, s)[0].rating);
    EXPECT_EQ(history[1].rating, eloAtCheckpoints(6, five, {3}, s)[0].rating);
    EXPECT_EQ(history[2].rating, runElo(6, five, s).rating);
    EXPECT_EQ(history[2].rated, runElo(6, five, s).rated);
    EXPECT_THROW(eloDailyHistory(6, five, {10, 9, 12, 15, 15}, s), std::invalid_argument);
    EXPECT_THROW(eloDailyHistory(6, five, {10}, s), std::invalid_argument);
    EXPECT_TRUE(eloDailyHistory(6, {}, {}, s).empty());
}
