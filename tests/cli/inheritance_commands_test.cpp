// SPDX-License-Identifier: GPL-3.0-or-later
// The inherit and scenario commands (docs/file-formats.md "Command line"), run in-process.
#include "cli_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::test;

namespace {

/// Line M: M, daughters D1 (2010) and D2 (2012); line N: N. M beats D1 three times, D1
/// beats her younger sister D2 three times and D2 beats N twice. Elo (k = 100, Elo 1978),
/// by hand: M 1114, D1 1033, D2 974, N 879.
std::string kinColony(const CliTempDir& dir)
{
    const std::string colony = dir.file("k.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,mother\n"
                                                   "M,F,1990-01-01,\nD1,F,2010-01-01,M\nD2,F,2012-01-01,M\n"
                                                   "N,F,1991-01-01,\n");
    const std::string encounters = dir.write("e.csv", "date,winner,loser\n"
                                                      "2021-01-05,M,D1\n2021-01-05,M,D1\n2021-01-05,M,D1\n"
                                                      "2021-01-06,D1,D2\n2021-01-07,D1,D2\n2021-01-08,D1,D2\n"
                                                      "2021-01-09,D2,N\n2021-01-10,D2,N\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--encounters", encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

} // namespace

TEST(CliInherit, PredictedAgainstObserved)
{
    CliTempDir dir;
    const std::string colony = kinColony(dir);
    // Youngest ascendancy (Kawamura 1958): M, D2, D1, N. Observed Elo: M, D1, D2, N, so the
    // only discordant dyad is D1 over D2 (sibling_order); default --at = last encounter.
    const CliResult r = runCli({"inherit", colony});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"animal,matriline,predicted_rank,observed_rank,discordant_dyads",
                                                       "M,M,1,1,0", "D2,M,2,3,1", "D1,M,3,2,1", "N,N,4,4,0"}));
    // Conformity 1 - 1/6 and tau-b (5 - 1)/6 on standard error (docs/methods.md; Kendall 1945).
    EXPECT_NE(r.err.find("2021-01-10"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("conformity 0.8333333333333334 (1 of 6 dyads discordant), tau-b 0.6666666666666666"),
              std::string::npos)
        << r.err;
    const CliResult d = runCli({"inherit", colony, "--dyads"});
    ASSERT_EQ(d.status, 0) << d.err;
    EXPECT_EQ(lines(d.out), (std::vector<std::string>{"above,below,category", "D1,D2,sibling_order"}));
    // Eldest rule: D1 before D2, no discordance.
    const CliResult e = runCli({"inherit", colony, "--rule", "eldest", "--dyads"});
    EXPECT_EQ(lines(e.out), (std::vector<std::string>{"above,below,category"}));
    // Explicit matriline order puts line N first.
    const CliResult o = runCli({"inherit", colony, "--matriline-order", "N,M"});
    ASSERT_EQ(o.status, 0) << o.err;
    EXPECT_EQ(lines(o.out)[1], "N,N,1,4,3");
    // An earlier date and maturity at 11 years: D2 (9) is not ranked, N has no rating yet.
    const CliResult m = runCli({"inherit", colony, "--at", "2021-01-05", "--maturity-years", "11"});
    EXPECT_EQ(lines(m.out), (std::vector<std::string>{"animal,matriline,predicted_rank,observed_rank,discordant_dyads",
                                                       "M,M,1,1,0", "D1,M,2,2,0", "N,N,3,,0"}));
}

TEST(CliInherit, MonthlyAndAcquisition)
{
    CliTempDir dir;
    const std::string colony = kinColony(dir);
    const CliResult m = runCli({"inherit", colony, "--monthly"});
    ASSERT_EQ(m.status, 0) << m.err;
    EXPECT_EQ(lines(m.out)[0], "method,period_start,period_end,ranked,observed,comparable,discordant,conformity,tau_b");
    EXPECT_EQ(lines(m.out)[1].rfind("elo,2021-01-05,2021-01-10,4,4,6,1,", 0), 0U) << m.out;
    const CliResult a = runCli({"inherit", colony, "--acquisition"});
    ASSERT_EQ(a.status, 0) << a.err;
    // D2 never rose above D1 (youngest ascendancy not yet reached).
    EXPECT_EQ(lines(a.out), (std::vector<std::string>{
                                "daughter,older_sister,mother,first_above,age_years,age_days,above_at_last_comparison",
                                "D2,D1,M,,,,no"}));
}

TEST(CliInherit, BadInputExitsWithTwo)
{
    CliTempDir dir;
    const std::string colony = kinColony(dir);
    const CliResult bad = runCli({"inherit", colony, "--matriline-order", "D1"});
    EXPECT_EQ(bad.status, 2);
    EXPECT_NE(bad.err.find("D1 is not a matriarch"), std::string::npos) << bad.err;
    EXPECT_EQ(runCli({"inherit", colony, "--group", "nowhere"}).status, 2);
    EXPECT_EQ(runCli({"inherit", colony, "--rule", "middle"}).status, 2);
    EXPECT_EQ(runCli({"inherit", colony, "--at", "2021-02-30"}).status, 2);
    EXPECT_EQ(runCli({"inherit", colony, "--dyads", "--monthly"}).status, 2);
}

TEST(CliScenario, WhatIfNeverWritesTheColony)
{
    CliTempDir dir;
    const std::string colony = dir.file("demo.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string bytes = CliTempDir::read(colony);
    const std::string file = dir.write("what-if.txt", "# remove Ada and introduce a newcomer\n"
                                                      "date 2024-05-01\n"
                                                      "group North Corral\n"
                                                      "remove NC001\n"
                                                      "introduce NEW1\n"
                                                      "split NC021 -> South Pen\n");
    const CliResult r = runCli({"scenario", colony, "--file", file});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto out = lines(r.out);
    ASSERT_GT(out.size(), 5U);
    EXPECT_EQ(out[0], "group,animal,rank_before,rank_after,matriline,group_before,status");
    // Line A without Ada: her youngest daughter on top (demo latent order, Ada's line first).
    EXPECT_EQ(out[1].rfind("North Corral,", 0), 0U);
    EXPECT_NE(r.out.find("North Corral,NC001,1,,NC001,North Corral,removed"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find(",NEW1,,"), std::string::npos);
    EXPECT_NE(r.out.find("South Pen,NC021,19,1,NC021,North Corral,moved"), std::string::npos) << r.out;
    const CliResult d = runCli({"scenario", colony, "--file", file, "--dyads"});
    ASSERT_EQ(d.status, 0) << d.err;
    EXPECT_EQ(lines(d.out)[0],
              "group,predicted_above,predicted_below,wins_predicted_above,wins_predicted_below,against_prediction_before");
    EXPECT_EQ(CliTempDir::read(colony), bytes); // the colony file is byte for byte unchanged

    // Bad scenario lines: FILE:LINE messages, exit 2, nothing run or written.
    const std::string bad = dir.write("bad.txt", "date 2024-05-01\nremove NOBODY\nintroduce NC002\n");
    const CliResult b = runCli({"scenario", colony, "--file", bad});
    EXPECT_EQ(b.status, 2);
    EXPECT_NE(b.err.find(bad + ":2: no animal 'NOBODY' in the colony"), std::string::npos) << b.err;
    EXPECT_NE(b.err.find(bad + ":3: the id NC002 is already taken"), std::string::npos) << b.err;
    EXPECT_EQ(b.out, "");
    EXPECT_EQ(CliTempDir::read(colony), bytes);
}
