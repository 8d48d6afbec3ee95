// SPDX-License-Identifier: GPL-3.0-or-later
// dynamics and ranks --start-rule (docs/file-formats.md): columns, a period
// worked by hand (docs/methods.md "Active and passive rank changes") and the
// option mistakes.
#include "cli_test_support.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom::test;

namespace {

// January: A > B > C by their wins; A dies on 10 February; on 12 February B
// beats C again. D (born 2019, daughter of B) has no encounter.
std::string deathAbove(CliTempDir& dir)
{
    const std::string colony = dir.file("d.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,mother,exit_date,exit_type\n"
                                                   "A,F,2010-01-01,,2020-02-10,died\n"
                                                   "B,F,2011-01-01,,,\n"
                                                   "C,F,2012-01-01,,,\n"
                                                   "D,F,2015-01-01,B,,\n");
    const std::string encounters = dir.write("e.csv", "date,winner,loser\n"
                                                      "2020-01-05,A,B\n"
                                                      "2020-01-06,A,C\n"
                                                      "2020-01-07,B,C\n"
                                                      "2020-02-12,B,C\n"
                                                      "2020-03-01,D,C\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--encounters", encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

} // namespace

TEST(CliDynamics, ADeathAboveIsAPassiveRise)
{
    CliTempDir dir;
    const std::string colony = deathAbove(dir);
    const CliResult r = runCli({"dynamics", colony});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto rows = lines(r.out);
    ASSERT_GE(rows.size(), 3U);
    EXPECT_EQ(rows[0], "period_start,period_end,animal,rank_before,rank_after,total,active,passive,left_above,"
                       "entered_above,start_rule");
    // By hand: February, B 2 -> 1 and C 3 -> 2, each with A gone from above: passive +1, active 0.
    EXPECT_EQ(rows[1], "2020-02-01,2020-02-29,B,2,1,1,0,1,1,0,none");
    EXPECT_EQ(rows[2], "2020-02-01,2020-02-29,C,3,2,1,0,1,1,0,none");
    // March: D enters; the rows are B's and C's (D was not ranked in February).
    for (size_t i = 3; i < rows.size(); ++i) EXPECT_EQ(rows[i].substr(0, 10), "2020-03-01");
    EXPECT_NE(r.err.find("dynamics: settings:"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("dynamics: rule:"), std::string::npos) << r.err;
}

TEST(CliDynamics, ForesightFilesAndYearPeriods)
{
    CliTempDir dir;
    const std::string colony = deathAbove(dir);
    const std::string f = dir.file("f.csv");
    const std::string e = dir.file("e.csv");
    const CliResult r = runCli({"dynamics", colony, "--every", "year", "--foresight", f, "--encounters", e});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out).size(), 1U); // one year: no earlier period end to compare with
    const auto fr = lines(CliTempDir::read(f));
    ASSERT_EQ(fr.size(), 7U); // three models, 2020 and all
    EXPECT_EQ(fr[0], "model,year,encounters,called,predicted,share_predicted,log_likelihood,brier,"
                     "rule_win_probability,rule");
    EXPECT_EQ(fr[1].substr(0, 12), "rule,2020,5,");
    EXPECT_EQ(fr[2].substr(0, 11), "rule,all,5,");
    EXPECT_EQ(fr[6].substr(0, 19), "informed_elo,all,5,");
    // The first encounter is between two unrated animals: plain Elo gives 1/2.
    const auto er = lines(CliTempDir::read(e));
    ASSERT_EQ(er.size(), 6U);
    EXPECT_EQ(er[0], "date,winner,loser,rule_conforms,rule,elo,informed_elo");
    EXPECT_EQ(er[1], "2020-01-05,A,B,,0.5,0.5,0.5");
}

TEST(CliDynamics, RanksNameTheStartRule)
{
    CliTempDir dir;
    const std::string colony = deathAbove(dir);
    // On 1 March: B 1st (rated), C; D enters as B's daughter: youngest start
    // just below B, between B and C (docs/methods.md "Rule-informed Elo").
    const CliResult plain = runCli({"ranks", colony});
    ASSERT_EQ(plain.status, 0) << plain.err;
    EXPECT_EQ(lines(plain.out)[0], "animal,rank,score,start_rule");
    EXPECT_EQ(lines(plain.out)[1].substr(lines(plain.out)[1].rfind(',')), ",none");
    const CliResult informed = runCli({"ranks", colony, "--start-rule", "youngest"});
    ASSERT_EQ(informed.status, 0) << informed.err;
    EXPECT_NE(informed.err.find("start rule youngest"), std::string::npos) << informed.err;
    EXPECT_NE(plain.out, informed.out);
    for (const std::string& row : lines(informed.out))
        if (row != lines(informed.out)[0]) EXPECT_EQ(row.substr(row.rfind(',')), ",youngest");
    EXPECT_EQ(lines(runCli({"ranks", colony, "--every", "month"}).out)[0],
              "period_start,period_end,animal,rank,score,start_rule");
    // David's score keeps its columns and refuses the option.
    EXPECT_EQ(lines(runCli({"ranks", colony, "--method", "ds"}).out)[0], "animal,rank,score");
    EXPECT_EQ(runCli({"ranks", colony, "--method", "ds", "--start-rule", "youngest"}).status, 2);
    EXPECT_EQ(runCli({"ranks", colony, "--start-rule", "youngest", "--randomise", "10"}).status, 2);
    EXPECT_EQ(runCli({"ranks", colony, "--start-rule", "oldest"}).status, 2);
    EXPECT_EQ(runCli({"dynamics", colony, "--every", "week"}).status, 2);
}
