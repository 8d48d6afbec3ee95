// SPDX-License-Identifier: GPL-3.0-or-later
// The kin-support analysis (docs/methods.md "Kin support") on colonies small
// enough to count by hand.
#include "core/pedigree/relatedness.h"
#include "core/research/support_analysis.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom::core;

namespace {

Day day(const char* text) { return *parseDate(text); }

Animal female(const char* id, const char* birth, const char* mother = "")
{
    Animal a;
    a.id = id;
    a.sex = Sex::Female;
    a.birth = day(birth);
    a.mother = mother;
    a.entry = day(birth);
    a.entryType = *mother ? EntryType::Born : EntryType::Founder;
    return a;
}

Encounter fight(const char* date, const char* winner, const char* loser, std::vector<std::string> winnerSide = {},
                std::vector<std::string> loserSide = {})
{
    static std::int64_t seq = 0;
    Encounter e;
    e.date = day(date);
    e.winner = winner;
    e.loser = loser;
    e.group = "g";
    e.seq = ++seq;
    e.winnerSupport = std::move(winnerSide);
    e.loserSupport = std::move(loserSide);
    return e;
}

/// M and her daughter D, and two unrelated females U and V, all in group g.
Colony fourFemales()
{
    Colony c;
    c.animals = {female("D", "2012-03-01", "M"), female("M", "2000-01-01"), female("U", "2000-01-01"),
                 female("V", "2000-01-01")};
    for (const Animal& a : c.animals) c.residences.push_back({a.id, "g", *a.birth, std::nullopt, ""});
    c.encounters = {fight("2020-01-01", "D", "U", {"M"}), fight("2020-01-02", "U", "D", {}, {"M"}),
                    fight("2020-01-03", "D", "V"), fight("2020-01-04", "U", "V", {"M"})};
    c.reindex();
    return c;
}

const SupportPair* pair(const SupportAnalysis& a, const char* s, const char* b)
{
    for (const SupportPair& p : a.pairs)
        if (p.supporter == s && p.beneficiary == b) return &p;
    return nullptr;
}

} // namespace

TEST(SupportAnalysis, OpportunitiesRatesAndTheIndexCountedByHand)
{
    const Colony c = fourFemales();
    const ResidenceIndex where(c.animals, c.residences);
    SupportOptions o;
    o.iterations = 0;
    const SupportAnalysis a = analyseSupport(c, where, o);
    // Hand count: each of the 4 encounters has 2 bystanders, each with one
    // opportunity per fighter: 16 opportunities; 3 acts.
    EXPECT_EQ(a.encounters, 4);
    EXPECT_EQ(a.acts, 3);
    int total = 0;
    for (const SupportPair& p : a.pairs) total += p.opportunities;
    EXPECT_EQ(total, 16);
    // M for D: present at D's encounters 1, 2 and 3, on her side in 1 and 2.
    const SupportPair* md = pair(a, "M", "D");
    ASSERT_NE(md, nullptr);
    EXPECT_EQ(md->opportunities, 3);
    EXPECT_EQ(md->given, 2);
    EXPECT_EQ(md->kin, KinClass::Mother);
    EXPECT_DOUBLE_EQ(md->r, 0.5);
    EXPECT_DOUBLE_EQ(*md->rate, 2.0 / 3.0);
    // M for U: encounters 1, 2 and 4, on her side in 4.
    const SupportPair* mu = pair(a, "M", "U");
    ASSERT_NE(mu, nullptr);
    EXPECT_EQ(mu->opportunities, 3);
    EXPECT_EQ(mu->given, 1);
    EXPECT_EQ(mu->kin, KinClass::Unrelated);
    // D for M: M never fights, so no opportunity and no row.
    EXPECT_EQ(pair(a, "D", "M"), nullptr);
    // Pooled: mother 2/3; unrelated 1 of 13 (16 - 3); the other classes empty.
    const KinClassRate& mother = a.classes[static_cast<size_t>(KinClass::Mother)];
    const KinClassRate& unrelated = a.classes[static_cast<size_t>(KinClass::Unrelated)];
    EXPECT_EQ(mother.opportunities, 3);
    EXPECT_EQ(mother.given, 2);
    EXPECT_EQ(unrelated.opportunities, 13);
    EXPECT_EQ(unrelated.given, 1);
    EXPECT_EQ(unrelated.pairs, 8);
    EXPECT_FALSE(a.classes[static_cast<size_t>(KinClass::Quarter)].rate.has_value());
    // Index (2/3) / (1/13) = 26/3.
    ASSERT_TRUE(a.nepotismIndex);
    EXPECT_NEAR(*a.nepotismIndex, 26.0 / 3.0, 1e-12);
    EXPECT_FALSE(a.test.p.has_value()); // no permutations asked for
}

TEST(SupportAnalysis, MothersAgainstFemalesTheRulePutsBelowTheirDaughter)
{
    // Hand-worked with Elo k 100, start 1000, logistic (the defaults):
    // 2020-01-01 D beats U: D 1050, U 950, M and V unrated, so M's line (its
    // best observed rank is D's) leads: M, D, U, V. U is below D: counted, below.
    // 2020-01-02 U beats D: D loses 100 * 0.640 = 64.0 -> 986.0, U -> 1014.0, so
    // U's line leads: U, M, D, V. U is above D: counted, not below.
    const Colony c = fourFemales();
    const ResidenceIndex where(c.animals, c.residences);
    SupportOptions o;
    o.iterations = 0;
    const SupportAnalysis a = analyseSupport(c, where, o);
    EXPECT_EQ(a.motherActsAgainstFemales, 2);
    EXPECT_EQ(a.motherActsAgainstBelow, 1);
    EXPECT_DOUBLE_EQ(*a.motherShareAgainstBelow, 0.5);
}

TEST(SupportAnalysis, PermutationPIsOfTheFormOnePlusCOverNPlusOneForAnyThreadCount)
{
    const Colony c = fourFemales();
    const ResidenceIndex where(c.animals, c.residences);
    SupportOptions o;
    o.iterations = 2000;
    o.seed = 20261202;
    std::optional<double> first;
    for (unsigned threads : {1U, 2U, 4U}) {
        o.threads = threads;
        const SupportAnalysis a = analyseSupport(c, where, o);
        ASSERT_TRUE(a.test.p);
        const double c1 = *a.test.p * (o.iterations + 1) - 1;
        EXPECT_NEAR(c1, std::round(c1), 1e-9) << "p is (1 + c)/(N + 1)";
        if (!first) first = a.test.p;
        else EXPECT_EQ(*a.test.p, *first) << threads << " threads";
    }
    // Brute force over the 8 equally likely redraws: the acts of encounters 1
    // and 2 (for D) draw M or V, that of encounter 4 (for U) M or D, all
    // unrelated to U. The index reaches the observed 26/3 only when both draws
    // for D are M: probability 1/4. With N = 2000 the standard error is 0.0097.
    EXPECT_NEAR(*first, 0.25, 0.04);
}

TEST(SupportAnalysis, WithoutSupportAmongUnrelatedPairsTheIndexIsUndefined)
{
    Colony c = fourFemales();
    c.encounters.pop_back(); // the one act for an unrelated animal
    const ResidenceIndex where(c.animals, c.residences);
    SupportOptions o;
    o.iterations = 100;
    const SupportAnalysis a = analyseSupport(c, where, o);
    EXPECT_FALSE(a.nepotismIndex.has_value());
    EXPECT_FALSE(a.test.p.has_value());
}

TEST(SupportAnalysis, ADaughtersRiseAndHerMothersSupportBeforeIt)
{
    // M's daughters D1 (2012) and D2 (2014); U unrelated. Elo by hand:
    // 2020-01-03 U beats D2 (D2 950, U 1050; D1 unrated). 2020-01-05 D2 beats D1
    // with M's help: D2 950 against D1 1000 expected 0.360, D2 -> 1014.0, D1 -> 986.0,
    // so D2 is above her older sister from 2020-01-05. M was present at both
    // of D2's encounters up to that day and helped in one; the help on
    // 2020-01-07 comes after and is not counted.
    Colony c;
    c.animals = {female("D1", "2012-03-01", "M"), female("D2", "2014-03-01", "M"), female("M", "2000-01-01"),
                 female("U", "2000-01-01")};
    for (const Animal& a : c.animals) c.residences.push_back({a.id, "g", *a.birth, std::nullopt, ""});
    c.encounters = {fight("2020-01-03", "U", "D2"), fight("2020-01-05", "D2", "D1", {"M"}),
                    fight("2020-01-07", "D2", "U", {"M"})};
    c.reindex();
    const ResidenceIndex where(c.animals, c.residences);
    SupportOptions o;
    o.iterations = 0;
    const SupportAnalysis a = analyseSupport(c, where, o);
    ASSERT_EQ(a.daughters.size(), 1U);
    EXPECT_EQ(a.daughters[0].daughter, "D2");
    EXPECT_EQ(a.daughters[0].mother, "M");
    EXPECT_EQ(a.daughters[0].olderSisters, 1);
    EXPECT_EQ(a.daughters[0].reached, day("2020-01-05"));
    EXPECT_EQ(a.daughters[0].maternalOpportunities, 2);
    EXPECT_EQ(a.daughters[0].maternalSupport, 1);
    // The matrix order follows Elo at the window's end, highest first.
    ASSERT_EQ(a.order.size(), 4U);
    EXPECT_EQ(a.order.front(), "D2");
    EXPECT_EQ(a.matriarchs.front(), "M");
}

TEST(SupportAnalysis, KinClassesOnATextbookPedigree)
{
    // Half-sibs share one parent: r = 1/4; first cousins (mothers full sisters):
    // r = 1/8; grandmother 1/4; aunt 1/4 (common practice; Wright 1922 path counts).
    // Nodes: 0 grandmother, 1 grandfather, 2 and 3 their daughters (full sisters),
    // 4 and 5 unrelated fathers, 6 and 7 daughters of 2 by 4 and 5 (half-sibs),
    // 8 daughter of 3 by 5 (first cousin of 6).
    const std::vector<PedigreeNode> nodes = {{-1, -1}, {-1, -1}, {0, 1}, {0, 1}, {-1, -1},
                                             {-1, -1}, {2, 4},   {2, 5}, {3, 5}};
    Relatedness r(nodes);
    EXPECT_DOUBLE_EQ(r.relatedness(6, 7), 0.25);
    EXPECT_EQ(kinClassOf(false, r.relatedness(6, 7)), KinClass::Quarter);
    EXPECT_DOUBLE_EQ(r.relatedness(6, 8), 0.125);
    EXPECT_EQ(kinClassOf(false, r.relatedness(6, 8)), KinClass::Eighth);
    // 7 and 8 are first cousins and also half-sibs by father 5: 1/8 + 1/4.
    EXPECT_DOUBLE_EQ(r.relatedness(7, 8), 0.375);
    EXPECT_EQ(kinClassOf(false, r.relatedness(2, 3)), KinClass::HalfOrMore);
    EXPECT_EQ(kinClassOf(false, r.relatedness(0, 6)), KinClass::Quarter);
    EXPECT_EQ(kinClassOf(true, 0.5), KinClass::Mother);
    EXPECT_EQ(kinClassOf(false, 0.0), KinClass::Unrelated);
}
