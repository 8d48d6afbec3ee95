// SPDX-License-Identifier: GPL-3.0-or-later
// Foresight (docs/methods.md "Foresight"): Brier score and log-likelihood of
// short sequences by hand, the rule's maximum-likelihood win probability, and
// plain Elo's chances against its own log-likelihood.
#include "core/pedigree/foresight.h"

#include "core/ranks/elo_rating.h"
#include "pedigree_test_support.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

TEST(Foresight, ScoresOfAShortSequenceByHand)
{
    // By hand: chances 0.8, 0.6, 0.3 for the three winners.
    // ln 0.8 + ln 0.6 + ln 0.3 = -0.2231436 - 0.5108256 - 1.2039728 = -1.9379420;
    // Brier ((0.2)^2 + (0.4)^2 + (0.7)^2) / 3 = (0.04 + 0.16 + 0.49) / 3 = 0.23;
    // two of three above 1/2.
    const ForesightScore s = scoreForesight({0.8, 0.6, 0.3});
    EXPECT_EQ(s.encounters, 3);
    EXPECT_EQ(s.called, 3);
    EXPECT_EQ(s.predicted, 2);
    EXPECT_NEAR(s.logLikelihood, -1.9379420, 1e-7);
    EXPECT_NEAR(*s.brier, 0.23, 1e-15);
    EXPECT_NEAR(*s.sharePredicted, 2.0 / 3.0, 1e-15);
    const ForesightScore half = scoreForesight({0.5, 0.5});
    EXPECT_EQ(half.called, 0);
    EXPECT_EQ(half.predicted, 0);
    EXPECT_NEAR(*half.brier, 0.25, 1e-15);
    EXPECT_FALSE(scoreForesight({}).brier);
}

namespace {

// One matriline: M (2000) with daughters D1 (2005) and D2 (2008), all mature
// in 2020; youngest ascendancy predicts M > D2 > D1, so every dyad is comparable.
PedigreeBuilder oneLine()
{
    PedigreeBuilder b;
    b.female("M", "2000-01-01").female("D1", "2005-01-01", "M").female("D2", "2008-01-01", "M").male("Z", "2010-01-01");
    return b;
}

} // namespace

TEST(Foresight, RuleProbabilityIsTheShareOfConformingOutcomes)
{
    // Five encounters, three as the rule predicts (M > D1, D2 > D1, M > D2) and
    // two against it (D1 > D2, D1 > M): the maximum-likelihood p is 3/5.
    PedigreeBuilder b = oneLine();
    b.win("2020-03-01", "M", "D1")
        .win("2020-03-02", "D2", "D1")
        .win("2020-03-03", "D1", "D2")
        .win("2020-03-04", "M", "D2")
        .win("2020-03-05", "D1", "M")
        .win("2020-03-06", "Z", "M"); // a male: not in the predicted order
    const Colony c = b.build();
    const ResidenceIndex where(c.animals, c.residences);
    const Foresight f = computeForesight(c, where, SelectionOptions{}, ForesightOptions{});
    EXPECT_EQ(f.comparable, 5);
    EXPECT_EQ(f.conforming, 3);
    ASSERT_TRUE(f.ruleWinProbability);
    EXPECT_DOUBLE_EQ(*f.ruleWinProbability, 0.6);
    ASSERT_EQ(f.encounters.size(), 6u);
    EXPECT_DOUBLE_EQ(f.encounters[0].rule, 0.6);
    EXPECT_DOUBLE_EQ(f.encounters[2].rule, 0.4);
    EXPECT_FALSE(f.encounters[5].ruleConforms);
    EXPECT_DOUBLE_EQ(f.encounters[5].rule, 0.5);
    // The rule's log-likelihood, 3 ln 0.6 + 2 ln 0.4 + ln 0.5, is the largest
    // over a grid of p (brute force of the maximum-likelihood claim).
    const ForesightRow& all = f.rows[1];
    ASSERT_EQ(all.model, ForesightModel::Rule);
    ASSERT_FALSE(all.year);
    const double ll = 3 * std::log(0.6) + 2 * std::log(0.4) + std::log(0.5);
    EXPECT_NEAR(all.score.logLikelihood, ll, 1e-12);
    for (double p = 0.01; p < 1; p += 0.01)
        EXPECT_LE(3 * std::log(p) + 2 * std::log(1 - p) + std::log(0.5), ll + 1e-12);
    EXPECT_EQ(all.score.predicted, 3);
    EXPECT_EQ(all.score.called, 5);
}

TEST(Foresight, EloChancesAreTheLogisticExpectationBeforeEachUpdate)
{
    // M beats D1 twice: plain Elo gives 1/2, then E(100) = 1/(1 + 10^(-1/4))
    // (Elo 1978; docs/methods.md check value 1); the sum of their logs is the
    // Foerster et al. (2016) log-likelihood of the run.
    PedigreeBuilder b = oneLine();
    b.win("2020-03-01", "M", "D1").win("2020-03-02", "M", "D1");
    const Colony c = b.build();
    const ResidenceIndex where(c.animals, c.residences);
    const Foresight f = computeForesight(c, where, SelectionOptions{}, ForesightOptions{});
    ASSERT_EQ(f.encounters.size(), 2u);
    EXPECT_DOUBLE_EQ(f.encounters[0].elo, 0.5);
    EXPECT_NEAR(f.encounters[1].elo, 1.0 / (1.0 + std::pow(10.0, -0.25)), 1e-12);
    const EloRun run = runElo(2, {{0, 1, false}, {0, 1, false}}, EloSettings{});
    for (const ForesightRow& r : f.rows)
        if (r.model == ForesightModel::Elo && !r.year) EXPECT_NEAR(r.score.logLikelihood, run.logLikelihood, 1e-12);
    // Both are new at that first bout (M not yet rated), so informed Elo gives 1/2 too.
    EXPECT_DOUBLE_EQ(f.encounters[0].informedElo, 0.5);
}

TEST(Foresight, RowsPerYearAndWindow)
{
    PedigreeBuilder b = oneLine();
    b.win("2020-03-01", "M", "D1").win("2021-03-01", "D2", "D1").win("2021-04-01", "D1", "D2");
    const Colony c = b.build();
    const ResidenceIndex where(c.animals, c.residences);
    const Foresight f = computeForesight(c, where, SelectionOptions{}, ForesightOptions{});
    // Per model: 2020, 2021, whole window.
    ASSERT_EQ(f.rows.size(), 9u);
    EXPECT_EQ(f.rows[0].year, 2020);
    EXPECT_EQ(f.rows[1].year, 2021);
    EXPECT_FALSE(f.rows[2].year);
    EXPECT_EQ(f.rows[0].score.encounters, 1);
    EXPECT_EQ(f.rows[1].score.encounters, 2);
    EXPECT_EQ(f.rows[2].score.encounters, 3);
    EXPECT_NEAR(f.rows[2].score.logLikelihood, f.rows[0].score.logLikelihood + f.rows[1].score.logLikelihood, 1e-12);
    EXPECT_EQ(f.rows[3].model, ForesightModel::Elo);
    EXPECT_EQ(f.rows[6].model, ForesightModel::InformedElo);
}

TEST(Foresight, InformedEloGivesTheDaughterHerPlaceBeforehand)
{
    // X beats M, then X meets M's daughter D2 for the first time: rule-informed
    // Elo starts D2 just below M. By hand: day 1 X beats M
    // (X 1050, M 950); D2's U is M (950) and nobody is below M: D2 = 850, so
    // her chance against X (1050) is E(-200) = 1/(1 + 10^(1/2)); plain: E(-50).
    PedigreeBuilder b = oneLine();
    b.female("X", "2000-01-01").win("2020-03-01", "X", "M").win("2020-03-02", "X", "D2");
    const Colony c = b.build();
    const ResidenceIndex where(c.animals, c.residences);
    const Foresight f = computeForesight(c, where, SelectionOptions{}, ForesightOptions{});
    ASSERT_EQ(f.encounters.size(), 2u);
    // The winner is X: its chance is 1 - E(-200) = E(200).
    EXPECT_NEAR(f.encounters[1].informedElo, 1.0 / (1.0 + std::pow(10.0, -0.5)), 1e-12);
    EXPECT_NEAR(f.encounters[1].elo, 1.0 / (1.0 + std::pow(10.0, -50.0 / 400.0)), 1e-12);
}

TEST(Foresight, TwoMatrilinesAreComparedOnlyOnceBothArePlacedTheDayBefore)
{
    // Two founders, P and Q, each her own matriline. On 1 March P beats Q
    // twice: neither line had an observed rank before that day, so neither
    // encounter is comparable (docs/methods.md "Foresight": matrilines placed
    // by Elo after the day before). On 2 March P's line stands above Q's: P's
    // win conforms, Q's win does not; p = 1/2 by maximum likelihood.
    const Colony c = PedigreeBuilder()
                         .female("P", "2000-01-01")
                         .female("Q", "2000-01-01")
                         .win("2020-03-01", "P", "Q", 2)
                         .win("2020-03-02", "P", "Q")
                         .win("2020-03-02", "Q", "P")
                         .build();
    const ResidenceIndex where(c.animals, c.residences);
    const Foresight f = computeForesight(c, where, SelectionOptions{}, ForesightOptions{});
    ASSERT_EQ(f.encounters.size(), 4u);
    EXPECT_FALSE(f.encounters[0].ruleConforms);
    EXPECT_FALSE(f.encounters[1].ruleConforms);
    EXPECT_EQ(f.encounters[2].ruleConforms, true);
    EXPECT_EQ(f.encounters[3].ruleConforms, false);
    EXPECT_EQ(f.comparable, 2);
    EXPECT_DOUBLE_EQ(*f.ruleWinProbability, 0.5);
}
