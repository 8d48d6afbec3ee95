// SPDX-License-Identifier: GPL-3.0-or-later
// `health` and the data-health columns of `ranks`, on a hand-counted colony.
#include "cli_test_support.h"

#include <gtest/gtest.h>

#include <algorithm>

using namespace hierloom::test;

namespace {

/// P, Q, R in group g since 2024-01-01; S joined on 2024-03-01.
std::string handColony(const CliTempDir& dir)
{
    const std::string colony = dir.file("h.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,entry_date,entry_type\nP,F,2024-01-01,founder\n"
                                                   "Q,F,2024-01-01,founder\nR,F,2024-01-01,founder\n"
                                                   "S,F,2024-03-01,introduced\n");
    const std::string residences =
        dir.write("r.csv", "animal,group,from\nP,g,2024-01-01\nQ,g,2024-01-01\nR,g,2024-01-01\nS,g,2024-03-01\n");
    const std::string encounters = dir.write("e.csv", "date,time,winner,loser,observer\n"
                                                      "2024-03-02,09:00,P,Q,ann\n"
                                                      "2024-03-02,09:03,P,Q,bob\n"
                                                      "2024-03-02,09:40,Q,R,ann\n"
                                                      "2024-03-02,09:41,R,Q,bob\n"
                                                      "2024-03-10,10:00,P,R,ann\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--residences", residences, "--encounters",
                                encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

/// The hand colony with April added: P beat R, R beat P. Counted by hand:
/// March P 3, Q 4, R 3; April P 2, R 2, Q none.
std::string twoMonthColony(const CliTempDir& dir)
{
    const std::string colony = handColony(dir);
    const std::string april = dir.write("april.csv", "date,time,winner,loser,observer\n"
                                                     "2024-04-05,09:00,P,R,ann\n"
                                                     "2024-04-06,09:00,R,P,ann\n");
    const CliResult r = runCli({"import", colony, "--encounters", april});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

/// "period_start animal encounters few_encounters" of a long rank table whose last two columns are the flag, sorted.
std::vector<std::string> flagCells(const std::vector<std::string>& rows, size_t animalColumn = 2)
{
    std::vector<std::string> out;
    for (size_t i = 1; i < rows.size(); ++i) {
        std::vector<std::string> f;
        std::stringstream s(rows[i]);
        for (std::string x; std::getline(s, x, ',');) f.push_back(x);
        out.push_back(f[0] + ' ' + f[animalColumn] + ' ' + f[f.size() - 2] + ' ' + f.back());
    }
    std::sort(out.begin(), out.end());
    return out;
}

} // namespace

TEST(CliHealth, TablesCountedByHand)
{
    CliTempDir dir;
    const std::string colony = handColony(dir);
    const std::vector<std::string> window{"--from", "2024-03-01", "--to", "2024-03-31", "--group", "g"};
    auto run = [&](std::vector<std::string> extra) {
        std::vector<std::string> words{"health", colony};
        words.insert(words.end(), window.begin(), window.end());
        words.insert(words.end(), extra.begin(), extra.end());
        return runCli(words);
    };
    CliResult r = run({"--randomise", "0", "--min-encounters", "4"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"animal,encounters,days_seen,last_seen,few_encounters,interval_width",
                                                      "P,3,2,2024-03-10,yes,", "Q,4,1,2024-03-02,no,",
                                                      "R,3,2,2024-03-10,yes,", "S,0,0,,yes,"}));
    r = run({"--table", "observers"});
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"observer,encounters,days", "ann,3,2", "bob,2,1"}));
    r = run({"--table", "months"});
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"month,encounters,days,animals", "2024-03,5,2,3"}));
    // On 2024-03-31: S never seen since 2024-03-01 (30 days), Q last on 2024-03-02 (29); P and R 21 days.
    r = run({"--table", "unseen", "--unseen-days", "21"});
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"animal,last_seen,since,days_unseen", "S,,2024-03-01,30",
                                                      "Q,2024-03-02,2024-03-02,29"}));
    EXPECT_NE(r.err.find("may be ill, injured or missing: check on it"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("animal-care staff"), std::string::npos);
    EXPECT_NE(r.err.find("on 2024-03-31 (the window's last day)"), std::string::npos) << r.err;

    // Without --to the file's last record, 2024-03-10, is the reference day, not today:
    // S since 2024-03-01 is 9 days unseen, Q since 2024-03-02 8; P and R were seen that day.
    r = runCli({"health", colony, "--group", "g", "--table", "unseen", "--unseen-days", "7"});
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"animal,last_seen,since,days_unseen", "S,,2024-03-01,9",
                                                      "Q,2024-03-02,2024-03-02,8"}));
    EXPECT_NE(r.err.find("on 2024-03-10 (the file's last day of records, "), std::string::npos) << r.err;
    r = runCli({"health", colony, "--group", "g", "--table", "unseen"});
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"animal,last_seen,since,days_unseen"}));
    // ann and bob on 2024-03-02: P>Q both (agree), Q>R against R>Q (disagree):
    // share 1/2; categories (0,0) and (0,1): p_o = 1/2, p_e = 1 * 1/2, kappa 0.
    r = run({"--table", "agreement"});
    EXPECT_EQ(lines(r.out), (std::vector<std::string>{"first_observer,second_observer,shared_days,matched,only_first,"
                                                      "only_second,agreeing,agreement_share,kappa",
                                                      "ann,bob,1,2,0,0,1,0.5,0"}));
}

TEST(CliHealth, RanksCarryTheFlagAndTheIntervalWidth)
{
    CliTempDir dir;
    const std::string colony = handColony(dir);
    CliResult r = runCli({"ranks", colony, "--min-encounters", "4", "--health"});
    ASSERT_EQ(r.status, 0) << r.err;
    auto rows = lines(r.out);
    EXPECT_EQ(rows[0], "animal,rank,score,start_rule,encounters,few_encounters");
    for (size_t i = 1; i < rows.size(); ++i) {
        const bool q = rows[i].rfind("Q,", 0) == 0;
        EXPECT_NE(rows[i].find(q ? ",4,no" : ",3,yes"), std::string::npos) << rows[i];
    }
    EXPECT_NE(r.err.find("fewer than 4 encounters"), std::string::npos) << r.err;
    // Without --health the columns stay as they were; the warning is still given.
    r = runCli({"ranks", colony, "--min-encounters", "4"});
    EXPECT_EQ(lines(r.out)[0], "animal,rank,score,start_rule");
    EXPECT_NE(r.err.find("fewer than 4 encounters"), std::string::npos) << r.err;
    r = runCli({"ranks", colony, "--randomise", "50", "--health"});
    ASSERT_EQ(r.status, 0) << r.err;
    rows = lines(r.out);
    EXPECT_EQ(rows[0], "animal,rank,score,rating_low,rating_high,mean_rank,start_rule,encounters,few_encounters,interval_width");
    // interval_width = rating_high - rating_low on every row.
    for (size_t i = 1; i < rows.size(); ++i) {
        std::vector<std::string> f;
        std::stringstream s(rows[i]);
        for (std::string x; std::getline(s, x, ',');) f.push_back(x);
        ASSERT_EQ(f.size(), 10u); // start_rule sits before the health columns
        EXPECT_NEAR(std::stod(f[9]), std::stod(f[4]) - std::stod(f[3]), 1e-9) << rows[i];
    }
}

TEST(CliHealth, RanksEveryPeriodCarryTheFlag)
{
    CliTempDir dir;
    const std::string colony = twoMonthColony(dir);
    const std::vector<std::string> window{"ranks", colony, "--every", "month", "--from", "2024-03-01",
                                          "--to", "2024-04-30", "--min-encounters", "4"};
    // Elo runs on over the window: April's rows rest on March's encounters too (P 3+2, Q 4, R 3+2).
    std::vector<std::string> words = window;
    words.push_back("--health");
    CliResult r = runCli(words);
    ASSERT_EQ(r.status, 0) << r.err;
    auto rows = lines(r.out);
    EXPECT_EQ(rows[0], "period_start,period_end,animal,rank,score,start_rule,encounters,few_encounters");
    EXPECT_EQ(flagCells(rows), (std::vector<std::string>{"2024-03-01 P 3 yes", "2024-03-01 Q 4 no", "2024-03-01 R 3 yes",
                                                          "2024-04-01 P 5 no", "2024-04-01 Q 4 no", "2024-04-01 R 5 no"}));
    EXPECT_NE(r.err.find("2 of 6 rows rank an animal with fewer than 4 encounters"), std::string::npos) << r.err;
    // David's score uses each month alone: April has P and R with 2 each.
    words.insert(words.end(), {"--method", "ds"});
    r = runCli(words);
    ASSERT_EQ(r.status, 0) << r.err;
    rows = lines(r.out);
    EXPECT_EQ(rows[0], "period_start,period_end,animal,rank,score,encounters,few_encounters");
    EXPECT_EQ(flagCells(rows), (std::vector<std::string>{"2024-03-01 P 3 yes", "2024-03-01 Q 4 no", "2024-03-01 R 3 yes",
                                                          "2024-04-01 P 2 yes", "2024-04-01 R 2 yes"}));
    // Without --health the table keeps its columns.
    r = runCli(window);
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out)[0], "period_start,period_end,animal,rank,score,start_rule");
    EXPECT_EQ(lines(r.out).size(), 7u);
}

TEST(CliHealth, ExportedRankTableEndsWithTheFlagOnRequest)
{
    CliTempDir dir;
    const std::string colony = twoMonthColony(dir);
    const std::string header = "period_start,period_end,animal,rank,score,matriline,age_years,sex,group,start_rule";
    // Monthly, Elo: the same cells as `ranks --every month --health` (counted by hand above).
    CliResult r = runCli({"export-tables", colony, "--dir", dir.file("m"), "--every", "month", "--from", "2024-03-01",
                          "--to", "2024-04-30", "--health", "--min-encounters", "4"});
    ASSERT_EQ(r.status, 0) << r.err;
    auto rows = lines(CliTempDir::read(dir.file("m/ranks_by_period.csv")));
    EXPECT_EQ(rows[0], header + ",encounters,few_encounters");
    EXPECT_EQ(flagCells(rows), (std::vector<std::string>{"2024-03-01 P 3 yes", "2024-03-01 Q 4 no", "2024-03-01 R 3 yes",
                                                          "2024-04-01 P 5 no", "2024-04-01 Q 4 no", "2024-04-01 R 5 no"}));
    // Overlapping custom windows, David's score (each window alone): March-April P 5, Q 4, R 5; April P 2, R 2.
    r = runCli({"export-tables", colony, "--dir", dir.file("w"), "--method", "ds", "--window", "2024-03-01,2024-04-30",
                "--window", "2024-04-01,2024-04-30", "--health", "--min-encounters", "4"});
    ASSERT_EQ(r.status, 0) << r.err;
    rows = lines(CliTempDir::read(dir.file("w/ranks_by_period.csv")));
    EXPECT_EQ(flagCells(rows), (std::vector<std::string>{"2024-03-01 P 5 no", "2024-03-01 Q 4 no", "2024-03-01 R 5 no",
                                                          "2024-04-01 P 2 yes", "2024-04-01 R 2 yes"}));
    // Without --health the file keeps its columns.
    r = runCli({"export-tables", colony, "--dir", dir.file("n"), "--every", "month"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(CliTempDir::read(dir.file("n/ranks_by_period.csv")))[0], header);
}
