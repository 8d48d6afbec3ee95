// SPDX-License-Identifier: GPL-3.0-or-later
// The planted maternal-support pattern of the demo colony (demo-colony/README.md).
#include "core/demo/demo_colony.h"
#include "core/research/support_analysis.h"

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
