// SPDX-License-Identifier: GPL-3.0-or-later
// The planted maternal-support pattern of the demo colony (demo-colony/README.md).
#include "core/demo/demo_colony.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "core/research/support_analysis.h"

#include <algorithm>
#include <map>

#include <gtest/gtest.h>

using namespace hierloom::core;

TEST(DemoSupport, MothersBackTheirOffspringFarMoreThanUnrelatedAnimalsDo)
{
    const Colony c = generateDemoColony();
    const ResidenceIndex where(c.animals, c.residences);
    SupportOptions o;
    o.iterations = 199;
    o.threads = 2;
    const SupportAnalysis a = analyseSupport(c, where, o);
    // Planted: a mother joins on her offspring's side in 22-40 % of their
    // encounters; an unrelated adult joins about one encounter in ten, spread
    // over the whole group, so its per-opportunity rate is far below 1 %.
    const KinClassRate& mother = a.classes[static_cast<size_t>(KinClass::Mother)];
    const KinClassRate& unrelated = a.classes[static_cast<size_t>(KinClass::Unrelated)];
    ASSERT_TRUE(mother.rate && unrelated.rate);
    EXPECT_GT(*mother.rate, 0.2);
    EXPECT_LT(*mother.rate, 0.45);
    EXPECT_LT(*unrelated.rate, 0.005);
    ASSERT_TRUE(a.nepotismIndex);
    EXPECT_GT(*a.nepotismIndex, 10.0);
    // No permutation reaches the observed index: p = 1/(N + 1).
    ASSERT_TRUE(a.test.p);
    EXPECT_DOUBLE_EQ(*a.test.p, 1.0 / 200.0);
}

TEST(DemoSupport, AMotherBacksTheYoungerOfTwoFightingDaughters)
{
    const Colony c = generateDemoColony();
    int younger = 0, elder = 0;
    auto birthOf = [&](const std::string& id) { return *c.animals[static_cast<size_t>(c.animalIndex(id))].birth; };
    auto motherOf = [&](const std::string& id) { return c.animals[static_cast<size_t>(c.animalIndex(id))].mother; };
    for (const Encounter& e : c.encounters) {
        const std::string m = motherOf(e.winner);
        if (m.empty() || m != motherOf(e.loser)) continue;
        const bool winnerYounger = birthOf(e.winner) > birthOf(e.loser);
        for (const std::string& s : e.winnerSupport)
            if (s == m) ++(winnerYounger ? younger : elder);
        for (const std::string& s : e.loserSupport)
            if (s == m) ++(winnerYounger ? elder : younger);
    }
    EXPECT_GT(younger, 20);
    EXPECT_EQ(elder, 0);
}

TEST(DemoSupport, TheMothersShareEqualsOnePredictionPerActComputedAfresh)
{
    // Brute force for the one-Elo-pass shortcut: predictInheritance (a full Elo
    // run up to the date) for every mother's act for a daughter against a female.
    const Colony c = generateDemoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    SupportOptions o;
    o.iterations = 0;
    const SupportAnalysis a = analyseSupport(c, where, o);
    auto animal = [&](const std::string& id) -> const Animal& { return c.animals[static_cast<size_t>(c.animalIndex(id))]; };
    std::map<Day, InheritancePrediction> byDay;
    int counted = 0, below = 0;
    for (const Encounter& e : c.encounters)
        for (int side = 0; side < 2; ++side) {
            const std::string& daughter = side == 0 ? e.winner : e.loser;
            const std::string& opponent = side == 0 ? e.loser : e.winner;
            const std::vector<std::string>& helpers = side == 0 ? e.winnerSupport : e.loserSupport;
            const std::string& mother = animal(daughter).mother;
            if (mother.empty() || animal(daughter).sex != Sex::Female || animal(opponent).sex != Sex::Female) continue;
            if (std::find(helpers.begin(), helpers.end(), mother) == helpers.end()) continue;
            auto [at, fresh] = byDay.try_emplace(e.date);
            if (fresh) {
                InheritanceOptions io;
                io.at = e.date;
                io.group = e.group;
                at->second = predictInheritance(c, where, lines, io);
            }
            const int pd = at->second.find(daughter), po = at->second.find(opponent);
            if (pd < 0 || po < 0) continue;
            ++counted;
            if (po > pd) ++below;
        }
    EXPECT_EQ(a.motherActsAgainstFemales, counted);
    EXPECT_EQ(a.motherActsAgainstBelow, below);
    EXPECT_GT(counted, 100);
}
