// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/elo_optimisation.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom::core;

namespace {

// docs/methods.md, "Check values" 12 sequence A>B, A>C, B>C, A>B, C>B with A=0, B=1, C=2.
const std::vector<Bout> kSequence = {{0, 1}, {0, 2}, {1, 2}, {0, 1}, {2, 1}};

// docs/methods.md, "Check values" 12 uses p = 1/(1+exp(-0.01 d)); our curve is exp(-d ln10/400). Scaling
// every rating by 0.01/(ln10/400) maps one onto the other, so their k equals ours / (4/ln10)
// with the same log-likelihood.
const double kScale = 4.0 / std::log(10.0);

} // namespace

TEST(EloOptimisation, LikelihoodMatchesCheckValues)
{
    // docs/methods.md, "Check values" 12 [COMPUTED regression values], rescaled as above; start value is irrelevant.
    EloSettings s;
    const std::pair<double, double> cases[] = {{0, -3.465736}, {50, -3.310397}, {100, -3.342845}, {200, -3.952504}};
    for (const auto& [theirK, ll] : cases) {
        s.k = theirK * kScale;
        EXPECT_NEAR(eloLogLikelihood(3, kSequence, s), ll, 1e-6) << "k=" << theirK;
        EXPECT_NEAR(runElo(3, kSequence, s).logLikelihood, ll, 1e-6);
    }
}

TEST(EloOptimisation, AgreesWithFineGrid)
{
    // Brute force: step 0.01 over [0, 1000] (docs/methods.md: accurate to 0.5 is enough).
    for (EloCurve curve : {EloCurve::Logistic, EloCurve::Normal}) {
        EloSettings s;
        s.curve = curve;
        double gridK = 0, gridL = -INFINITY;
        for (int i = 0; i <= 100000; ++i) {
            s.k = i * 0.01;
            const double l = eloLogLikelihood(3, kSequence, s);
            if (l > gridL) {
                gridL = l;
                gridK = s.k;
            }
        }
        const auto opt = optimiseEloK(3, kSequence, s);
        ASSERT_TRUE(opt.has_value());
        EXPECT_GE(opt->logLikelihood, gridL - 1e-6);
        EXPECT_NEAR(opt->k, gridK, 0.5);
        // Same answer whatever the thread count (the grid is only shared out).
        const auto threaded = optimiseEloK(3, kSequence, s, 3);
        ASSERT_TRUE(threaded.has_value());
        EXPECT_EQ(threaded->k, opt->k);
        EXPECT_EQ(threaded->logLikelihood, opt->logLikelihood);
        s.k = opt->k;
        EXPECT_EQ(opt->logLikelihood, eloLogLikelihood(3, kSequence, s));
        if (curve == EloCurve::Logistic) {
            // docs/methods.md, "Check values" 12 [COMPUTED]: maximum near their k = 66.2, L = -3.300607.
            EXPECT_NEAR(opt->k / kScale, 66.2, 0.5 / kScale + 0.05);
            EXPECT_NEAR(opt->logLikelihood, -3.300607, 1e-5);
        }
    }
}

TEST(EloOptimisation, FlatLikelihoodGivesSmallestK)
{
    // One bout per animal: E = 0.5 for every k, so L is flat and docs/methods.md picks the smallest k, 0.
    const auto opt = optimiseEloK(4, {{0, 1}, {2, 3}}, EloSettings{});
    ASSERT_TRUE(opt.has_value());
    EXPECT_EQ(opt->k, 0.0);
    EXPECT_DOUBLE_EQ(opt->logLikelihood, 2 * std::log(0.5));
}

TEST(EloOptimisation, BoundaryMaximum)
{
    // A always beats B: L(k) increases with k, so the optimum is the upper end 1000 (docs/methods.md range).
    const std::vector<Bout> bouts(6, Bout{0, 1});
    const auto opt = optimiseEloK(2, bouts, EloSettings{});
    ASSERT_TRUE(opt.has_value());
    EXPECT_NEAR(opt->k, 1000, 0.5);
}

TEST(EloOptimisation, NoDecidedEncounters)
{
    // docs/methods.md "Small choices": optimised k is undefined without decided encounters.
    EXPECT_FALSE(optimiseEloK(3, {}, EloSettings{}).has_value());
    EXPECT_FALSE(optimiseEloK(3, {{0, 1, true}, {1, 2, true}}, EloSettings{}).has_value());
}
