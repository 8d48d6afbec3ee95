// SPDX-License-Identifier: GPL-3.0-or-later
// The `support` command and supporters through the command-line import and export.
#include "cli_test_support.h"

#include <gtest/gtest.h>

#include <algorithm>

using namespace hierloom::test;

namespace {

/// M and her daughter D, unrelated U and V; the four encounters counted by
/// hand in tests/core/research/support_analysis_test.cpp.
std::string supportColony(const CliTempDir& dir)
{
    const std::string colony = dir.file("s.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,mother\n"
                                                   "M,F,2000-01-01,\nD,F,2012-03-01,M\nU,F,2000-01-01,\nV,F,2000-01-01,\n");
    const std::string encounters = dir.write("e.csv", "date,winner,loser,winner_support,loser_support\n"
                                                      "2020-01-01,D,U,M,\n2020-01-02,U,D,,M\n"
                                                      "2020-01-03,D,V,,\n2020-01-04,U,V,M,\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--encounters", encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

bool hasLine(const std::string& text, const std::string& line)
{
    const auto all = lines(text);
    return std::find(all.begin(), all.end(), line) != all.end();
}

} // namespace

TEST(CliSupport, PairsAndSummaryAsCountedByHand)
{
    CliTempDir dir;
    const std::string colony = supportColony(dir);
    CliResult r = runCli({"support", colony, "--table", "pairs", "--permutations", "0"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out).front(), "supporter,beneficiary,r,kin_class,opportunities,given,rate");
    // Hand count (support_analysis_test.cpp): M for D 2 of 3, M for U 1 of 3.
    EXPECT_TRUE(hasLine(r.out, "M,D,0.5,mother,3,2,0.6666666666666666")) << r.out;
    EXPECT_TRUE(hasLine(r.out, "M,U,0,r<0.125,3,1,0.3333333333333333")) << r.out;
    r = runCli({"support", colony, "--permutations", "0"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_TRUE(hasLine(r.out, "nepotism_index,8.666666666666666")) << r.out; // (2/3)/(1/13) = 26/3
    EXPECT_TRUE(hasLine(r.out, "mother_share_against_below,0.5")) << r.out;
}

TEST(CliSupport, ThePermutationPIsTheSameForOneTwoAndFourThreads)
{
    CliTempDir dir;
    const std::string colony = supportColony(dir);
    std::string first;
    for (const char* threads : {"1", "2", "4"}) {
        const CliResult r = runCli({"support", colony, "--permutations", "999", "--seed", "7", "--threads", threads});
        ASSERT_EQ(r.status, 0) << r.err;
        if (first.empty()) first = r.out;
        else EXPECT_EQ(r.out, first) << threads << " threads";
    }
    EXPECT_NE(first.find("permutation_p,0."), std::string::npos) << first;
}

TEST(CliSupport, AnImportWithABadSupporterIsRefusedWithItsLineAndWritesNothing)
{
    CliTempDir dir;
    const std::string colony = supportColony(dir);
    const std::string bad = dir.write("bad.csv", "date,winner,loser,winner_support,loser_support\n"
                                                 "2020-02-01,D,U,M,\n2020-02-02,D,U,V,V\n");
    const CliResult r = runCli({"import", colony, "--encounters", bad});
    EXPECT_NE(r.status, 0);
    EXPECT_NE(r.err.find(bad + ":3: loser_support: 'V' also supports the winner; a supporter takes one side"),
              std::string::npos)
        << r.err;
    const CliResult pairs = runCli({"support", colony, "--table", "pairs", "--permutations", "0"});
    EXPECT_TRUE(hasLine(pairs.out, "M,D,0.5,mother,3,2,0.6666666666666666")) << "the refused file changed the colony";
}

TEST(CliSupport, ExportWritesTheSupporterColumnsAndTheyImportBack)
{
    CliTempDir dir;
    const std::string colony = supportColony(dir);
    const CliResult e = runCli({"export", colony, "--dir", dir.file("out")});
    ASSERT_EQ(e.status, 0) << e.err;
    const std::string text = CliTempDir::read(dir.file("out/encounters.csv"));
    EXPECT_NE(lines(text).front().find(",uid,winner_support,loser_support"), std::string::npos) << text;
    const std::string copy = dir.file("copy.hierloom");
    ASSERT_EQ(runCli({"init", copy}).status, 0);
    const CliResult i = runCli({"import", copy, "--animals", dir.file("out/animals.csv"), "--residences",
                                dir.file("out/residences.csv"), "--encounters", dir.file("out/encounters.csv")});
    ASSERT_EQ(i.status, 0) << i.err;
    EXPECT_EQ(runCli({"support", copy, "--table", "pairs", "--permutations", "0"}).out,
              runCli({"support", colony, "--table", "pairs", "--permutations", "0"}).out);
}
