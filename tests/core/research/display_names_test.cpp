// SPDX-License-Identifier: GPL-3.0-or-later
// One vocabulary: every code the program writes has one display name in
// core/base/display_names.h, and the rank method registry uses the same names.
#include "core/base/display_names.h"

#include "core/pedigree/discordance.h"
#include "core/planning/stability_watch.h"
#include "core/ranks/rank_method_registry.h"
#include "core/research/export_tables.h"
#include "core/research/maternal_rank.h"
#include "core/research/sex_ratio_analysis.h"

#include <gtest/gtest.h>

#include <set>
#include <string>

using namespace hierloom::core;

namespace {
bool named(CodeKind kind, const std::string& code)
{
    for (const CodeName& c : codeNames())
        if (c.kind == kind && code == c.code) return *c.name != '\0';
    return false;
}
} // namespace

TEST(DisplayNames, EveryCodeWrittenHasOneName)
{
    for (const auto& [code, value] : sexRatioRows(SexRatioAnalysis{})) EXPECT_TRUE(named(CodeKind::Metric, code)) << code;
    for (BirthExclusion r : {BirthExclusion::UnknownMother, BirthExclusion::UnknownSex, BirthExclusion::MotherNotResident,
                             BirthExclusion::MotherNotMature, BirthExclusion::MotherNotRated,
                             BirthExclusion::FewerThanTwoRanked}) {
        EXPECT_TRUE(named(CodeKind::Reason, toString(r))) << toString(r);
        EXPECT_EQ(describe(r), displayName(CodeKind::Reason, toString(r)));
    }
    for (DiscordanceCategory c : {DiscordanceCategory::DaughterOverMother, DiscordanceCategory::SiblingOrder,
                                  DiscordanceCategory::WithinMatriline, DiscordanceCategory::CrossMatriline})
        EXPECT_TRUE(named(CodeKind::Category, toString(c))) << toString(c);
    for (StabilitySignal s :
         {StabilitySignal::CounterDominance, StabilitySignal::RankChanges, StabilitySignal::SevereAggression})
        EXPECT_TRUE(named(CodeKind::Signal, toString(s))) << toString(s);
    for (const std::string& column : maternalRankTable({}).header) EXPECT_TRUE(named(CodeKind::Column, column)) << column;
    // The rank methods: the registry's display name is the table's.
    for (const RankMethodInfo& m : rankMethods()) EXPECT_EQ(displayName(CodeKind::Method, m.code), m.displayName);
    EXPECT_EQ(displayName(CodeKind::Method, "isi"), "I&SI");
    // The words of the issue: the Prediction view and the report say the same.
    EXPECT_EQ(displayName(CodeKind::Category, "cross_matriline"), "across matrilines");
    EXPECT_EQ(displayName(CodeKind::Metric, "lr_chisq"), "likelihood-ratio chi-square (1 df)");
    // A code without a name reads as itself.
    EXPECT_EQ(displayName(CodeKind::Metric, "no_such_code"), "no_such_code");
}

TEST(DisplayNames, NoCodeTwiceInOneKind)
{
    std::set<std::pair<CodeKind, std::string>> seen;
    for (const CodeName& c : codeNames()) EXPECT_TRUE(seen.insert({c.kind, c.code}).second) << c.code;
}
