// SPDX-License-Identifier: GPL-3.0-or-later
// Rule-informed Elo (docs/methods.md "Rule-informed Elo"): the start of a
// daughter between two neighbours and at either end of the hierarchy, worked
// by hand from the definition there, and plain Elo unchanged without a rule.
#include "core/ranks/informed_elo.h"

#include "core/ranks/rank_table.h"
#include "pedigree_test_support.h"

#include <gtest/gtest.h>

#include <cmath>
#include <random>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

// Animals 0 M (mother), 1 X (unrelated), 2 D (daughter entering), 3 S (D's
// older sister), 4 Y (D's younger sister), 5 B (a son of M).
EloFamily family()
{
    EloFamily f;
    f.mother = {-1, -1, 0, 0, 0, 0};
    f.birth = {dayFromCivil(2000, 1, 1), dayFromCivil(2001, 1, 1), dayFromCivil(2010, 1, 1),
               dayFromCivil(2007, 1, 1), dayFromCivil(2012, 1, 1), dayFromCivil(2011, 1, 1)};
    f.female = {true, true, true, true, true, false};
    return f;
}

std::vector<bool> flags(std::initializer_list<int> on)
{
    std::vector<bool> v(6, false);
    for (int i : on) v[static_cast<size_t>(i)] = true;
    return v;
}

} // namespace

TEST(InformedElo, YoungestStartsBetweenMotherAndTheAnimalBelowHer)
{
    // Hand-worked: M 1100 > X 1000 > S 950. Youngest ascendancy puts D just
    // below M: U = M, L = X (the animal just below M), start (1100 + 1000) / 2.
    const std::vector<double> r{1100, 1000, 0, 950, 0, 0};
    const auto rated = flags({0, 1, 3});
    EXPECT_DOUBLE_EQ(*informedStart(2, r, rated, rated, family(), EloStartRule::Youngest), 1050.0);
}

TEST(InformedElo, EldestStartsBelowHerLastOlderSisterAtTheBottom)
{
    // Hand-worked: same ratings; the eldest rule puts D just below her older
    // sister S, who is the lowest-rated animal: no L, so 950 - 100.
    const std::vector<double> r{1100, 1000, 0, 950, 0, 0};
    const auto rated = flags({0, 1, 3});
    EXPECT_DOUBLE_EQ(*informedStart(2, r, rated, rated, family(), EloStartRule::Eldest), 850.0);
}

TEST(InformedElo, AtTheTopAndAtTheBottomOfTheHierarchy)
{
    // Top end, hand-worked: M is the top animal (1300 > X 900): D second, (1300 + 900) / 2.
    const auto rated = flags({0, 1});
    EXPECT_DOUBLE_EQ(*informedStart(2, {1300, 900, 0, 0, 0, 0}, rated, rated, family(), EloStartRule::Youngest), 1100.0);
    // Bottom end: M is the lowest (800 < X 900): nobody below M, so 800 - 100.
    EXPECT_DOUBLE_EQ(*informedStart(2, {800, 900, 0, 0, 0, 0}, rated, rated, family(), EloStartRule::Youngest), 700.0);
}

TEST(InformedElo, YoungerSisterRatedStaysAboveUnderYoungestAscendancy)
{
    // Y (born 2012) is younger than D (2010): under youngest ascendancy Y comes
    // before D, so U = Y (1040) and L = the animal just below Y, X (1000).
    const std::vector<double> r{1100, 1000, 0, 950, 1040, 0};
    const auto rated = flags({0, 1, 3, 4});
    EXPECT_DOUBLE_EQ(*informedStart(2, r, rated, rated, family(), EloStartRule::Youngest), 1020.0);
    // Under the eldest rule D comes after S (2007) and before Y: U = S, L none: 850.
    EXPECT_DOUBLE_EQ(*informedStart(2, r, rated, rated, family(), EloStartRule::Eldest), 850.0);
}

TEST(InformedElo, StartValueWhenTheRuleDoesNotApply)
{
    const std::vector<double> r{1100, 1000, 0, 950, 0, 0};
    const auto rated = flags({0, 1, 3});
    EXPECT_FALSE(informedStart(5, r, rated, rated, family(), EloStartRule::Youngest)); // a son
    EXPECT_FALSE(informedStart(1, r, rated, rated, family(), EloStartRule::Youngest)); // no recorded mother
    EXPECT_FALSE(informedStart(2, r, rated, flags({1, 3}), family(), EloStartRule::Youngest)); // mother absent
    EXPECT_FALSE(informedStart(2, r, flags({1, 3}), flags({1, 3}), family(), EloStartRule::Youngest)); // mother unrated
    EXPECT_FALSE(informedStart(2, r, rated, rated, family(), EloStartRule::None));
}

TEST(InformedElo, TraceByHand)
{
    // Bouts: M beats X, Y beats M, D beats X (k 100, start 1000, logistic).
    // By hand (docs/methods.md "Elo rating"): after bout 1 M 1050, X 950;
    // bout 2: E(1000 - 1050) = 1/(1 + 10^(50/400)), Y += 100(1 - E), M -= the same.
    // D enters under youngest ascendancy between M and X: (R_M + R_X) / 2.
    const double e2 = 1.0 / (1.0 + std::pow(10.0, 50.0 / 400.0));
    const double m = 1050 - 100 * (1 - e2);
    const double dStart = (m + 950) / 2;
    EloFamily f;
    f.mother = {-1, -1, 0, -1};
    f.birth = {std::nullopt, std::nullopt, dayFromCivil(2010, 1, 1), std::nullopt};
    f.female = {true, true, true, true};
    const std::vector<Bout> bouts{{0, 1, false}, {3, 0, false}, {2, 1, false}};
    const std::vector<Day> days{1, 2, 3};
    const PresentOn always = [](int, Day) { return true; };
    const EloTrace t = traceElo(4, bouts, days, EloSettings{}, EloStartRule::Youngest, f, always, {2, 3});
    ASSERT_TRUE(t.entry[2]);
    EXPECT_NEAR(*t.entry[2], dStart, 1e-9);
    EXPECT_FALSE(t.entry[3]); // Y has no recorded mother
    EXPECT_NEAR(t.winnerChance[0], 0.5, 1e-15);
    EXPECT_NEAR(t.winnerChance[1], e2, 1e-12);
    EXPECT_NEAR(t.winnerChance[2], 1.0 / (1.0 + std::pow(10.0, -(dStart - 950) / 400.0)), 1e-12);
    EXPECT_NEAR(t.checkpoints[0].rating[0], m, 1e-9);
    const double e3 = t.winnerChance[2];
    EXPECT_NEAR(t.checkpoints[1].rating[2], dStart + 100 * (1 - e3), 1e-9);
    EXPECT_NEAR(t.checkpoints[1].logLikelihood, std::log(0.5) + std::log(e2) + std::log(e3), 1e-12);
}

TEST(InformedElo, WithoutARuleItIsPlainElo)
{
    // Identity: EloStartRule::None gives exactly the numbers of eloAtCheckpoints.
    std::mt19937 gen(7);
    std::uniform_int_distribution<int> pick(0, 9);
    std::vector<Bout> bouts;
    std::vector<Day> days;
    for (int i = 0; i < 300; ++i) {
        const int w = pick(gen);
        const int l = (w + 1 + pick(gen) % 9) % 10;
        bouts.push_back({w, l, i % 17 == 0});
        days.push_back(i / 4);
    }
    const std::vector<size_t> counts{0, 50, 300, 120};
    const auto plain = eloAtCheckpoints(10, bouts, counts, EloSettings{});
    const EloTrace t = traceElo(10, bouts, days, EloSettings{}, EloStartRule::None, EloFamily{}, {}, counts);
    for (size_t c = 0; c < counts.size(); ++c) {
        EXPECT_EQ(t.checkpoints[c].rating, plain[c].rating);
        EXPECT_EQ(t.checkpoints[c].rated, plain[c].rated);
        EXPECT_DOUBLE_EQ(t.checkpoints[c].logLikelihood, plain[c].logLikelihood);
    }
}

TEST(InformedElo, RankTableUsesTheStartRule)
{
    // M beats X, Y beats M, then M's daughter D beats X. By hand (docs/methods.md
    // "Elo rating" and "Rule-informed Elo"): M 1050 and X 950 after day 1;
    // e2 = E(1000 - 1050), Y = 1000 + 100(1 - e2), M = 1050 - 100(1 - e2).
    // Youngest start: D between M and X, at (R_M + 950) / 2; plain: 1000.
    const Colony c = PedigreeBuilder()
                         .female("M", "2000-01-01")
                         .female("X", "2000-01-01")
                         .female("Y", "2000-01-01")
                         .female("D", "2010-01-01", "M")
                         .win("2020-01-01", "M", "X")
                         .win("2020-01-02", "Y", "M")
                         .win("2020-01-03", "D", "X")
                         .build();
    const ResidenceIndex where(c.animals, c.residences);
    auto expected = [](double d) { return 1.0 / (1.0 + std::pow(10.0, -d / 400.0)); };
    const double m = 1050 - 100 * (1 - expected(-50));
    const double dStart = (m + 950) / 2;
    RankOptions o;
    o.startRule = EloStartRule::Youngest;
    const RankTable informed = computeRanks(c, where, SelectionOptions{}, o);
    ASSERT_EQ(informed.rows.size(), 4u);
    const double dInformed = dStart + 100 * (1 - expected(dStart - 950));
    const double dPlain = 1000 + 100 * (1 - expected(50));
    for (const RankRow& r : informed.rows)
        if (r.animal == "D") EXPECT_NEAR(*r.score, dInformed, 1e-9);
    o.startRule = EloStartRule::None;
    for (const RankRow& r : computeRanks(c, where, SelectionOptions{}, o).rows)
        if (r.animal == "D") EXPECT_NEAR(*r.score, dPlain, 1e-9);
    o.startRule = EloStartRule::Youngest;
    o.randomise = 10;
    EXPECT_THROW(computeRanks(c, where, SelectionOptions{}, o), std::invalid_argument);
}

TEST(InformedElo, NamesReadBack)
{
    for (EloStartRule r : {EloStartRule::None, EloStartRule::Youngest, EloStartRule::Eldest})
        EXPECT_EQ(parseEloStartRule(toString(r)), r);
    EXPECT_FALSE(parseEloStartRule("oldest"));
}
