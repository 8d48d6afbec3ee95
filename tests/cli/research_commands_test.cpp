// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli_test_support.h"

#include <gtest/gtest.h>

#include <filesystem>

using namespace hierloom::test;

namespace {

const std::vector<std::string> kSexRatioRows{"births_used", "births_left_out", "sons", "daughters", "intercept",
                                             "slope", "slope_se", "slope_z", "slope_p", "slope_ci_low",
                                             "slope_ci_high", "lr_chisq", "lr_p", "fisher_p"};

std::string demoColony(const CliTempDir& dir)
{
    const std::string colony = dir.file("demo.hierloom");
    const CliResult r = runCli({"demo", colony});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

/// Three adult females with a fixed linear record (A > B > C, worked by hand in
/// tests/core/maternal_rank_test.cpp) and one son of B conceived 2020-01-10.
std::string handColony(const CliTempDir& dir)
{
    const std::string colony = dir.file("h.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,mother\n"
                                                   "A,F,2000-01-01,\nB,F,2000-01-01,\nC,F,2000-01-01,\n"
                                                   "B1,M,2020-06-23,B\n");
    const std::string encounters = dir.write("e.csv", "date,winner,loser\n"
                                                      "2020-01-01,A,B\n2020-01-01,A,C\n2020-01-01,B,C\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--encounters", encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

} // namespace

TEST(CliResearch, SexRatioRowsInInterfaceOrder)
{
    CliTempDir dir;
    const std::string colony = demoColony(dir);
    const CliResult r = runCli({"sex-ratio", colony, "--births", dir.file("births.csv")});
    ASSERT_EQ(r.status, 0) << r.err;
    // docs/file-formats.md: `metric,value` then the 14 rows, in order.
    const auto rows = lines(r.out);
    ASSERT_EQ(rows.size(), kSexRatioRows.size() + 1);
    EXPECT_EQ(rows[0], "metric,value");
    for (size_t i = 0; i < kSexRatioRows.size(); ++i)
        EXPECT_EQ(rows[i + 1].substr(0, rows[i + 1].find(',')), kSexRatioRows[i]);
    // --births lists every birth, used or left out: their count is used + left out.
    const auto births = lines(CliTempDir::read(dir.file("births.csv")));
    const int used = std::stoi(rows[1].substr(rows[1].find(',') + 1));
    const int leftOut = std::stoi(rows[2].substr(rows[2].find(',') + 1));
    EXPECT_GT(used, 0);
    EXPECT_EQ(births.size(), static_cast<size_t>(used + leftOut) + 1);
    EXPECT_EQ(births[0].substr(0, 17), "offspring,mother,");
    EXPECT_EQ(r.out.find("nan"), std::string::npos);
}

TEST(CliResearch, OneUsableBirthGivesEmptyRegressionAndAMessage)
{
    CliTempDir dir;
    const std::string colony = handColony(dir);
    const CliResult r = runCli({"sex-ratio", colony, "--gestation-days", "165", "--births", dir.file("b.csv")});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto rows = lines(r.out);
    ASSERT_EQ(rows.size(), 15U);
    EXPECT_EQ(rows[1], "births_used,1");
    EXPECT_EQ(rows[3], "sons,1");
    EXPECT_EQ(rows[5], "intercept,"); // docs/methods.md: undefined with fewer than two births
    EXPECT_EQ(rows[14], "fisher_p,1");
    EXPECT_NE(r.err.find("all of one sex"), std::string::npos);
    // B is 2nd of 3 on 2020-01-10: relative rank 1 - 1/2 = 0.5 (docs/methods.md).
    const auto births = lines(CliTempDir::read(dir.file("b.csv")));
    bool found = false;
    for (const auto& line : births)
        if (line.rfind("B1,B,M,2020-06-23,2020-01-10,2,3,0.5,", 0) == 0) found = true;
    EXPECT_TRUE(found) << CliTempDir::read(dir.file("b.csv"));
}

TEST(CliResearch, NoBirthsInTheWindow)
{
    CliTempDir dir;
    const std::string colony = handColony(dir);
    const CliResult r = runCli({"sex-ratio", colony, "--from", "2024-01-01"});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto rows = lines(r.out);
    ASSERT_EQ(rows.size(), 15U);
    EXPECT_EQ(rows[1], "births_used,0");
    EXPECT_EQ(rows[14], "fisher_p,"); // docs/methods.md: no Fisher p without births
    EXPECT_NE(r.err.find("no births"), std::string::npos);
}

TEST(CliResearch, BadOptionsExitWithStatusTwo)
{
    CliTempDir dir;
    const std::string colony = handColony(dir);
    EXPECT_EQ(runCli({"sex-ratio", colony, "--gestation-days", "0"}).status, 2);
    EXPECT_EQ(runCli({"sex-ratio", colony, "--species", "axolotl"}).status, 2);
    EXPECT_EQ(runCli({"sex-ratio", colony, "--group", "nowhere"}).status, 2);
    EXPECT_EQ(runCli({"export-tables", colony, "--dir", dir.file("x"), "--window", "2020-02-01,2020-01-01"}).status, 2);
}

TEST(CliResearch, MaternalRanksTable)
{
    CliTempDir dir;
    const std::string colony = handColony(dir);
    const CliResult r = runCli({"maternal-ranks", colony, "--maturity-years", "4"});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto rows = lines(r.out);
    // header + B1: A, B and C were born in 2000, before the record's first encounter
    // (2020-01-01), so they are not births of the record (docs/methods.md, "Births").
    ASSERT_EQ(rows.size(), 2U);
    EXPECT_EQ(rows[0].substr(0, 48), "offspring,mother,sex,birth_date,conception_date,");
    EXPECT_EQ(rows[1], "B1,B,M,2020-06-23,2020-01-10,2,3,0.5,2,3,0.5,1,");
    EXPECT_NE(r.err.find("not counted as births: 0 founders, 3 animals born before then"), std::string::npos) << r.err;
}

TEST(CliResearch, ExportTablesWritesEveryTable)
{
    CliTempDir dir;
    const std::string colony = demoColony(dir);
    const std::string out = dir.file("tables");
    const CliResult r = runCli({"export-tables", colony, "--dir", out, "--every", "year", "--spreadsheet"});
    ASSERT_EQ(r.status, 0) << r.err;
    for (const char* name : {"ranks_by_period", "win_matrix", "metrics_by_period", "maternal_ranks", "sex_ratio",
                             "sex_ratio_by_rank_third"}) {
        const std::string text = CliTempDir::read(out + "/" + name + ".csv");
        ASSERT_GE(text.size(), 3U) << name;
        EXPECT_EQ(text.substr(0, 3), "\xEF\xBB\xBF") << name;
    }
    // The exported figures are the command's figures (one code path).
    const std::string sexRatio = CliTempDir::read(out + "/sex_ratio.csv").substr(3);
    EXPECT_EQ(sexRatio, runCli({"sex-ratio", colony}).out);
    EXPECT_EQ(CliTempDir::read(out + "/metrics_by_period.csv").substr(3, 24), "period_start,period_end,");
}

// The births are counted from the record's first encounter, and the command says so.
TEST(CliResearch, SexRatioSaysFromWhenBirthsAreCounted)
{
    CliTempDir dir;
    const std::string colony = demoColony(dir);
    const CliResult r = runCli({"sex-ratio", colony});
    ASSERT_EQ(r.status, 0) << r.err;
    // The demo's first encounter is on 2019-01-02 (tools/make_demo_colony); its 29 founders are not births.
    EXPECT_NE(r.err.find("births counted from the record's first encounter, 2019-01-02; not counted as births: 29 "
                         "founders"),
              std::string::npos)
        << r.err;
}

// Codes keep their form on the command line; help and `codes` give their names.
TEST(CliResearch, CodesAndTheirNames)
{
    const CliResult codes = runCli({"codes"});
    ASSERT_EQ(codes.status, 0) << codes.err;
    EXPECT_EQ(codes.out.rfind("kind,code,name\n", 0), 0U);
    EXPECT_NE(codes.out.find("metric,lr_chisq,likelihood-ratio chi-square (1 df)\n"), std::string::npos);
    EXPECT_NE(codes.out.find("category,cross_matriline,across matrilines\n"), std::string::npos);
    const CliResult help = runCli({"sex-ratio", "--help"});
    EXPECT_NE(help.out.find("lr_chisq"), std::string::npos);
    EXPECT_NE(help.out.find("likelihood-ratio chi-square (1 df)"), std::string::npos);
    EXPECT_NE(help.out.find("mother_not_resident"), std::string::npos);
    const CliResult inherit = runCli({"inherit", "--help"});
    EXPECT_NE(inherit.out.find("cross_matriline"), std::string::npos);
    EXPECT_NE(inherit.out.find("across matrilines"), std::string::npos);
}
