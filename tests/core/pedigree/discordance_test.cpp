// SPDX-License-Identifier: GPL-3.0-or-later
// Discordant dyads, conformity and tau-b of core/pedigree/discordance.h (docs/methods.md
// "Matrilineal rank prediction"), on constructed cases worked by hand.
#include "core/pedigree/discordance.h"

#include "pedigree_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

// Line M: M (1980); daughters D1 (2010), D2 (2012); D1's daughter G (2015).
// Line N: N (1985); daughter N1 (2011). Male Z.
Colony sixFemales()
{
    return PedigreeBuilder()
        .female("M", "1980-01-01")
        .female("D1", "2010-01-01", "M")
        .female("D2", "2012-01-01", "M")
        .female("G", "2015-01-01", "D1")
        .female("N", "1985-01-01")
        .female("N1", "2011-01-01", "N")
        .male("Z", "1990-01-01")
        .build();
}

} // namespace

TEST(Discordance, EveryCategoryByHand)
{
    const Colony c = sixFemales();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const Day at = dayFromCivil(2021, 6, 1);
    // Observed order (scores): Z (male, not ranked), M, D1, G, N1, D2, N.
    const ObservedScores scores{{"Z", 100}, {"M", 60}, {"D1", 50}, {"G", 40}, {"N1", 30}, {"D2", 20}, {"N", 10}};
    const InheritancePrediction p =
        predictOrder(lines, rankedFemalesOn(lines, where, at, {}, 4), scores, SiblingRule::Youngest);
    // Predicted (youngest ascendancy, Kawamura 1958): M, D2, D1, G, N, N1.
    ASSERT_EQ(p.females.size(), 6U);
    const std::vector<std::string> predicted{"M", "D2", "D1", "G", "N", "N1"};
    const std::vector<int> observedRank{1, 5, 2, 3, 6, 4}; // the male does not count (docs/methods.md "Small choices")
    for (size_t i = 0; i < 6; ++i) {
        EXPECT_EQ(p.females[i].animal, predicted[i]);
        EXPECT_EQ(p.females[i].observedRank, observedRank[i]) << predicted[i];
    }
    // Hand count over the 15 pairs: D1>D2 sibling_order, G>D2 within_matriline (niece over
    // aunt), N1>D2 cross_matriline, N1>N daughter_over_mother; the other 11 agree.
    const DiscordanceSummary s = summariseDiscordance(lines, p);
    EXPECT_EQ(s.comparable, 15);
    EXPECT_EQ(s.discordant, 4);
    ASSERT_EQ(s.dyads.size(), 4U);
    EXPECT_EQ(s.dyads[0].above, "D1");
    EXPECT_EQ(s.dyads[0].below, "D2");
    EXPECT_STREQ(toString(s.dyads[0].category), "sibling_order");
    EXPECT_EQ(s.dyads[1].above, "G");
    EXPECT_STREQ(toString(s.dyads[1].category), "within_matriline");
    EXPECT_EQ(s.dyads[2].above, "N1");
    EXPECT_EQ(s.dyads[2].below, "D2");
    EXPECT_STREQ(toString(s.dyads[2].category), "cross_matriline");
    EXPECT_EQ(s.dyads[3].above, "N1");
    EXPECT_EQ(s.dyads[3].below, "N");
    EXPECT_STREQ(toString(s.dyads[3].category), "daughter_over_mother");
    // Conformity = 1 - 4/15 (docs/methods.md); tau-b without ties = (C - D)/15 = (11 - 4)/15 (Kendall 1945).
    ASSERT_TRUE(s.conformity.has_value());
    EXPECT_DOUBLE_EQ(*s.conformity, 11.0 / 15.0);
    ASSERT_TRUE(s.tauB.has_value());
    EXPECT_DOUBLE_EQ(*s.tauB, 7.0 / 15.0);
    // Per-female discordant dyad counts: M 0, D2 3, D1 1, G 1, N 1, N1 2.
    const std::vector<int> counts{0, 3, 1, 1, 1, 2};
    for (size_t i = 0; i < 6; ++i) EXPECT_EQ(p.females[i].discordantDyads, counts[i]) << predicted[i];
}

TEST(Discordance, UnobservedFemalesAreNotComparable)
{
    // Only pairs with both observed ranks are comparable; with none, conformity and
    // tau-b are empty (never 0 or NaN).
    const Colony c = sixFemales();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const RankedFemales ranked = rankedFemalesOn(lines, where, dayFromCivil(2021, 6, 1), {}, 4);
    const InheritancePrediction none = predictOrder(lines, ranked, {}, SiblingRule::Youngest);
    const DiscordanceSummary s = summariseDiscordance(lines, none);
    EXPECT_EQ(s.ranked, 6);
    EXPECT_EQ(s.comparable, 0);
    EXPECT_FALSE(s.conformity.has_value());
    EXPECT_FALSE(s.tauB.has_value());
    // Two observed, in agreement: one comparable dyad, conformity 1, tau-b 1.
    const InheritancePrediction two = predictOrder(lines, ranked, {{"M", 2}, {"N1", 1}}, SiblingRule::Youngest);
    const DiscordanceSummary t = summariseDiscordance(lines, two);
    EXPECT_EQ(t.comparable, 1);
    EXPECT_DOUBLE_EQ(*t.conformity, 1.0);
    EXPECT_DOUBLE_EQ(*t.tauB, 1.0);
}

TEST(Discordance, MonthlySeriesShowsWhenTheReversalStarted)
{
    // January: the mother wins three times; February: her daughter wins five times.
    // Elo (k = 100, logistic; Elo 1978) after February: diff 100, +72, +56 in January,
    // then the daughter's wins bring her above by the second one, so February's Elo
    // point is a daughter_over_mother reversal; David's score of February alone agrees.
    const Colony c = PedigreeBuilder()
                         .female("M", "1990-01-01")
                         .female("D", "2010-01-01", "M")
                         .win("2021-01-05", "M", "D", 3)
                         .win("2021-02-20", "D", "M", 5)
                         .build();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const ConformitySeries s = monthlyConformity(c, where, lines, {});
    ASSERT_EQ(s.elo.size(), 2U);
    ASSERT_EQ(s.davidsScore.size(), 2U);
    // Periods: the calendar months clipped to the first and last encounter.
    EXPECT_EQ(s.elo[0].periodStart, dayFromCivil(2021, 1, 5));
    EXPECT_EQ(s.elo[0].periodEnd, dayFromCivil(2021, 1, 31));
    EXPECT_EQ(s.elo[1].periodStart, dayFromCivil(2021, 2, 1));
    EXPECT_EQ(s.elo[1].periodEnd, dayFromCivil(2021, 2, 20));
    for (const auto* series : {&s.elo, &s.davidsScore}) {
        EXPECT_EQ((*series)[0].ranked, 2);
        EXPECT_EQ((*series)[0].discordant, 0);
        EXPECT_DOUBLE_EQ(*(*series)[0].conformity, 1.0);
        EXPECT_DOUBLE_EQ(*(*series)[0].tauB, 1.0);
        EXPECT_EQ((*series)[1].discordant, 1);
        EXPECT_DOUBLE_EQ(*(*series)[1].conformity, 0.0);
        EXPECT_DOUBLE_EQ(*(*series)[1].tauB, -1.0);
    }
}
