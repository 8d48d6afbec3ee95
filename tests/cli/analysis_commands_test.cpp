// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::test;

namespace {

/// Three resident animals and the four encounters of docs/methods.md, "Check values" 1a.
std::string smallColony(const CliTempDir& dir)
{
    const std::string colony = dir.file("s.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,exit_date,exit_type\n"
                                                   "A,F,2010-01-01,,\nB,F,2010-01-01,,\nC,F,2010-01-01,2020-06-01,died\n");
    const std::string encounters = dir.write("e.csv", "date,time,winner,loser,outcome\n"
                                                      "2020-01-01,09:00,A,B,decided\n"
                                                      "2020-01-01,10:00,B,A,decided\n"
                                                      "2020-01-02,,A,C,decided\n"
                                                      "2020-01-02,08:00,B,C,decided\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--encounters", encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

} // namespace

TEST(CliAnalysis, EloFollowsTheWorkedSequence)
{
    CliTempDir dir;
    const std::string colony = smallColony(dir);
    // After day one (A beats B, B beats A): docs/methods.md, "Check values" 1a step 2 [computed]:
    // A = 985.9935, B = 1014.0065; C has no rating yet and is not ranked.
    const auto day1 = lines(runCli({"ranks", colony, "--method", "elo", "--at", "2020-01-01"}).out);
    ASSERT_EQ(day1.size(), 3U);
    EXPECT_EQ(day1[1].substr(0, 4), "B,1,");
    EXPECT_NEAR(std::stod(day1[1].substr(4)), 1014.0065, 1e-4);
    EXPECT_EQ(day1[2].substr(0, 4), "A,2,");
    EXPECT_NEAR(std::stod(day1[2].substr(4)), 985.9935, 1e-4);
    // Day two: the untimed encounter (A beats C) sorts after the 08:00 one
    // (B beats C), docs/methods.md "Encounter order"; the same logistic update by
    // hand in that order gives B = 1061.9919, A = 1031.1191, C = 906.8890
    // [computed regression value; 1a's order would give different numbers].
    const auto all = lines(runCli({"ranks", colony, "--at", "2020-01-02"}).out);
    ASSERT_EQ(all.size(), 4U);
    EXPECT_EQ(all[1].substr(0, 4), "B,1,");
    EXPECT_NEAR(std::stod(all[1].substr(4)), 1061.991893872262, 1e-9);
    EXPECT_NEAR(std::stod(all[2].substr(4)), 1031.1190749586156, 1e-9);
    EXPECT_NEAR(std::stod(all[3].substr(4)), 906.8890311691225, 1e-9);
}

TEST(CliAnalysis, RanksAmongResidentsOnTheDay)
{
    CliTempDir dir;
    const std::string colony = smallColony(dir);
    // C died on 2020-06-01: ranked on 2020-05-31, not on 2020-06-02.
    EXPECT_EQ(lines(runCli({"ranks", colony, "--at", "2020-05-31"}).out).size(), 4U);
    EXPECT_EQ(lines(runCli({"ranks", colony, "--at", "2020-06-02"}).out).size(), 3U);
}

TEST(CliAnalysis, MetricsRowsAlwaysPresentInOrderAndEmptyWhenUndefined)
{
    CliTempDir dir;
    const std::string colony = smallColony(dir);
    const std::vector<std::string> names{"animals", "encounters", "dyads", "known_dyads", "unknown_share", "landau_h",
                                         "h_prime", "h_prime_p", "dci", "steepness", "steepness_p", "ttri", "ttri_p",
                                         "elo_k_optimal", "elo_loglik", "seed", "randomisations"};
    // A window with no encounters: counts are 0, figures empty, never NaN.
    const CliResult empty = runCli({"metrics", colony, "--from", "2021-01-01", "--randomisations", "100"});
    ASSERT_EQ(empty.status, 0) << empty.err;
    const auto rows = lines(empty.out);
    ASSERT_EQ(rows.size(), names.size() + 1);
    EXPECT_EQ(rows[0], "metric,value");
    for (size_t i = 0; i < names.size(); ++i) EXPECT_EQ(rows[i + 1].substr(0, rows[i + 1].find(',')), names[i]);
    EXPECT_EQ(rows[1], "animals,0");
    EXPECT_EQ(rows[6], "landau_h,");
    EXPECT_EQ(rows[9], "dci,");
    EXPECT_EQ(rows[14], "elo_k_optimal,");
    EXPECT_EQ(empty.out.find("nan"), std::string::npos);

    // The whole record: A beat B once and B beat A once (a tie), A and B beat C.
    const auto full = lines(runCli({"metrics", colony, "--randomisations", "200", "--seed", "7"}).out);
    EXPECT_EQ(full[1], "animals,3");
    EXPECT_EQ(full[2], "encounters,4");
    EXPECT_EQ(full[3], "dyads,3");
    EXPECT_EQ(full[4], "known_dyads,3");
    // v = 1.5, 1.5, 0 -> h = 12/24 * (0.25+0.25+1) = 0.75 (Landau 1951, by hand).
    EXPECT_EQ(full[6], "landau_h,0.75");
    // DCI: dyads A-B (1,1), A-C (1,0), B-C (1,0): (0 + 1 + 1) / 4 = 0.5 (van Hooff & Wensing 1987, by hand).
    EXPECT_EQ(full[9], "dci,0.5");
    EXPECT_EQ(full[16], "seed,7");
    EXPECT_EQ(full[17], "randomisations,200");
}

TEST(CliAnalysis, DavidsScoreAndIsiAndMatrix)
{
    CliTempDir dir;
    const std::string colony = smallColony(dir);
    // P: A-B 0.5/0.5, A-C 1, B-C 1. w = (1.5, 1.5, 0); l = (0.5, 0.5, 2);
    // w2_A = 0.5*1.5 + 1*0 = 0.75; l2_A = 0.5*0.5 = 0.25; DS_A = 1.5+0.75-0.5-0.25 = 1.5 (David 1987, by hand).
    const auto ds = lines(runCli({"ranks", colony, "--method", "ds"}).out);
    ASSERT_EQ(ds.size(), 4U);
    EXPECT_EQ(ds[1], "A,1,1.5"); // A and B tie exactly: id order
    EXPECT_EQ(ds[2], "B,2,1.5");
    EXPECT_EQ(ds[3].substr(0, 4), "C,3,");
    const auto isi = lines(runCli({"ranks", colony, "--method", "isi"}).out);
    ASSERT_EQ(isi.size(), 4U);
    EXPECT_EQ(isi[3], "C,3,");
    const auto m = lines(runCli({"matrix", colony, "--order", "id"}).out);
    ASSERT_EQ(m.size(), 4U);
    EXPECT_EQ(m[0], "animal,A,B,C");
    EXPECT_EQ(m[1], "A,,1,1");
    EXPECT_EQ(m[2], "B,1,,1");
    EXPECT_EQ(m[3], "C,0,0,");
}

TEST(CliAnalysis, PeriodTableAndOptionMistakes)
{
    CliTempDir dir;
    const std::string colony = smallColony(dir);
    const auto rows = lines(runCli({"ranks", colony, "--every", "month", "--method", "ds"}).out);
    ASSERT_EQ(rows.size(), 4U);
    EXPECT_EQ(rows[0], "period_start,period_end,animal,rank,score");
    EXPECT_EQ(rows[1].substr(0, 22), "2020-01-01,2020-01-02,");
    EXPECT_EQ(runCli({"ranks", colony, "--at", "2020-02-30"}).status, 2);
    EXPECT_EQ(runCli({"ranks", colony, "--method", "ds", "--at", "2020-01-01"}).status, 2);
    EXPECT_EQ(runCli({"ranks", colony, "--group", "nowhere"}).status, 2);
    EXPECT_EQ(runCli({"ranks", colony, "--from", "2020-02-01", "--to", "2020-01-01"}).status, 2);
}
