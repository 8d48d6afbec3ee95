// SPDX-License-Identifier: GPL-3.0-or-later
// The rank method registry (core/ranks/rank_method_registry.h): one entry per
// RankMethod, read back by code and by method.
#include "core/ranks/rank_method_registry.h"

#include <gtest/gtest.h>

#include <set>
#include <string>

using namespace hierloom::core;

TEST(RankMethodRegistry, OneEntryPerMethodWithUniqueCodes)
{
    const std::vector<RankMethodInfo>& all = rankMethods();
    ASSERT_EQ(all.size(), 3U);
    std::set<std::string> codes;
    std::set<int> methods;
    for (const RankMethodInfo& m : all) {
        codes.insert(m.code);
        methods.insert(static_cast<int>(m.method));
        EXPECT_EQ(findRankMethod(m.code), &m);
        EXPECT_EQ(&rankMethodInfo(m.method), &m);
        EXPECT_EQ(parseRankMethod(m.code), m.method);
        EXPECT_FALSE(std::string(m.displayName).empty());
        EXPECT_FALSE(std::string(m.computes).empty());
        EXPECT_FALSE(std::string(m.helpKey).empty());
    }
    EXPECT_EQ(codes.size(), all.size());
    EXPECT_EQ(methods.size(), all.size());
    EXPECT_EQ(findRankMethod("id"), nullptr);
    EXPECT_FALSE(parseRankMethod("ELO"));
}

TEST(RankMethodRegistry, OnlyEloTakesAStartRule)
{
    // docs/methods.md "Rule-informed Elo": an option of the Elo rating alone.
    EXPECT_TRUE(rankMethodInfo(RankMethod::Elo).takesStartRule);
    EXPECT_FALSE(rankMethodInfo(RankMethod::DavidsScore).takesStartRule);
    EXPECT_FALSE(rankMethodInfo(RankMethod::Isi).takesStartRule);
}

TEST(RankMethodRegistry, EntriesAsTheProgramNamesThem)
{
    EXPECT_EQ(rankMethodCodes(), (std::vector<std::string>{"elo", "ds", "isi"}));
    EXPECT_STREQ(rankMethodInfo(RankMethod::Isi).displayName, "I&SI");
    EXPECT_STREQ(rankMethodInfo(RankMethod::DavidsScore).displayName, "David's score");
    EXPECT_TRUE(rankMethodInfo(RankMethod::Elo).hasScore);
    EXPECT_TRUE(rankMethodInfo(RankMethod::DavidsScore).hasScore);
    EXPECT_FALSE(rankMethodInfo(RankMethod::Isi).hasScore);
    EXPECT_EQ(rankMethodChoicesText(), "elo (Elo rating), ds (David's score) or isi (I&SI)");
}
