// SPDX-License-Identifier: GPL-3.0-or-later
// The colony's stored analysis settings on the command line: every command
// starts from them, its options override them for one run, the values used
// are named on standard error, and non-finite numbers are refused.
#include "cli_test_support.h"

#include "core/ranks/rank_method_registry.h"
#include "core/store/analysis_settings_store.h"
#include "core/store/colony_store.h"

#include <gtest/gtest.h>

using namespace hierloom::test;
using namespace hierloom::core;

namespace {

/// A beats B once, then C beats A and B draws with C a day later.
std::string threeEncounters(const CliTempDir& dir)
{
    const std::string colony = dir.file("t.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,mother\n"
                                                   "A,F,2010-01-01,\nB,F,2011-01-01,\nC,F,2015-01-01,A\n");
    const std::string encounters = dir.write("e.csv", "date,time,winner,loser,outcome\n"
                                                      "2020-01-01,09:00,A,B,decided\n"
                                                      "2020-01-02,09:00,C,A,decided\n"
                                                      "2020-01-02,10:00,B,C,draw\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--encounters", encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

void store(const std::string& path, const AnalysisSettings& s)
{
    ColonyStore file = ColonyStore::open(path);
    writeAnalysisSettings(file, s);
}

/// The score column (the third: animal,rank,score,...) of `animal` in a ranks CSV.
double scoreOf(const std::string& csv, const std::string& animal)
{
    for (const std::string& line : lines(csv))
        if (line.rfind(animal + ",", 0) == 0) {
            const size_t second = line.find(',', line.find(',') + 1);
            return std::stod(line.substr(second + 1, line.find(',', second + 1) - second - 1));
        }
    ADD_FAILURE() << animal << " not in\n" << csv;
    return 0;
}

} // namespace

TEST(CliAnalysisSettings, StoredKChangesRanks)
{
    CliTempDir dir;
    const std::string colony = threeEncounters(dir);
    // Only the first encounter: A beats B between equals, E = 1/2, so each moves k/2.
    const CliResult before = runCli({"ranks", colony, "--at", "2020-01-01"});
    ASSERT_EQ(before.status, 0) << before.err;
    EXPECT_DOUBLE_EQ(scoreOf(before.out, "A"), 1050);
    EXPECT_DOUBLE_EQ(scoreOf(before.out, "B"), 950);
    EXPECT_NE(before.err.find("ranks: settings: k 100, start 1000, start rule none, curve logistic, draws half, maturity 4 years, "
                              "window all data (the colony's settings)\n"),
              std::string::npos)
        << before.err;
    AnalysisSettings s;
    s.elo.k = 50;
    store(colony, s);
    const CliResult after = runCli({"ranks", colony, "--at", "2020-01-01"});
    ASSERT_EQ(after.status, 0) << after.err;
    // k = 50, start 1000, logistic: A = 1000 + 50/2 = 1025, B = 975 (by hand).
    EXPECT_DOUBLE_EQ(scoreOf(after.out, "A"), 1025);
    EXPECT_DOUBLE_EQ(scoreOf(after.out, "B"), 975);
    EXPECT_NE(after.err.find("ranks: settings: k 50, start 1000,"), std::string::npos) << after.err;
}

TEST(CliAnalysisSettings, OptionsOverrideStoredValuesForOneRun)
{
    CliTempDir dir;
    const std::string colony = threeEncounters(dir);
    AnalysisSettings s;
    s.elo.k = 50;
    s.elo.start = 2000;
    store(colony, s);
    const CliResult r = runCli({"ranks", colony, "--at", "2020-01-01", "--k", "20"});
    ASSERT_EQ(r.status, 0) << r.err;
    // k from the option, start from the file: 2000 + 20/2.
    EXPECT_DOUBLE_EQ(scoreOf(r.out, "A"), 2010);
    EXPECT_DOUBLE_EQ(scoreOf(r.out, "B"), 1990);
    EXPECT_NE(r.err.find("ranks: settings: k 20, start 2000, start rule none, curve logistic, draws half, maturity 4 years, window "
                         "all data (the colony's settings; this run: --k)\n"),
              std::string::npos)
        << r.err;
    // The file keeps its own value.
    const CliResult again = runCli({"ranks", colony, "--at", "2020-01-01"});
    EXPECT_DOUBLE_EQ(scoreOf(again.out, "A"), 2025);
}

TEST(CliAnalysisSettings, StoredDrawPolicyAndMaturityReachTheCommands)
{
    CliTempDir dir;
    const std::string colony = threeEncounters(dir);
    // The draw between B and C adds half a win to each: it shows in the matrix.
    EXPECT_NE(runCli({"matrix", colony, "--order", "id"}).out.find("B,0,,0.5"), std::string::npos);
    AnalysisSettings s;
    s.elo.draws = DrawPolicy::Ignore;
    s.maturityYears = 9;
    store(colony, s);
    const CliResult m = runCli({"matrix", colony, "--order", "id"});
    ASSERT_EQ(m.status, 0) << m.err;
    EXPECT_EQ(m.out.find("0.5"), std::string::npos) << m.out;
    EXPECT_NE(m.err.find("draws ignore"), std::string::npos);
    EXPECT_NE(runCli({"matrix", colony, "--order", "id", "--draws", "half"}).out.find("0.5"), std::string::npos);
    // inherit: maturity 9 years leaves C (born 2015) unranked on 2020-01-02.
    const CliResult i = runCli({"inherit", colony});
    ASSERT_EQ(i.status, 0) << i.err;
    EXPECT_NE(i.err.find("maturity 9 years"), std::string::npos) << i.err;
    EXPECT_EQ(i.out.find("\nC,"), std::string::npos) << i.out;
    const CliResult i4 = runCli({"inherit", colony, "--maturity-years", "4"});
    EXPECT_NE(i4.out.find("\nC,"), std::string::npos) << i4.out;
}

TEST(CliAnalysisSettings, DefaultWindowAppliesWithoutFromAndTo)
{
    CliTempDir dir;
    const std::string colony = threeEncounters(dir);
    AnalysisSettings s;
    s.windowDays = 1; // the last day only: C beats A, B draws with C
    store(colony, s);
    const CliResult r = runCli({"matrix", colony, "--order", "id"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out).front(), "animal,A,B,C");
    EXPECT_NE(r.out.find("A,,0,0\n"), std::string::npos) << r.out; // A's win over B is outside the window
    EXPECT_NE(r.err.find("window last 1 days"), std::string::npos);
    const CliResult all = runCli({"matrix", colony, "--order", "id", "--from", "2020-01-01"});
    EXPECT_NE(all.out.find("A,,1,0\n"), std::string::npos) << all.out;
}

TEST(CliAnalysisSettings, NonFiniteNumbersAreRefused)
{
    CliTempDir dir;
    const std::string colony = threeEncounters(dir);
    const std::vector<std::vector<std::string>> runs{
        {"ranks", colony, "--k", "nan"},        {"ranks", colony, "--start", "inf"},
        {"ranks", colony, "--k", "-inf"},       {"ranks", colony, "--start", "NaN"},
        {"inherit", colony, "--k", "infinity"}, {"matrix", colony, "--start", "nan"},
        {"sex-ratio", colony, "--k", "nan"},    {"stability", colony, "--group", "g", "--k", "inf"},
    };
    for (const auto& words : runs) {
        const CliResult r = runCli(words);
        EXPECT_EQ(r.status, 2) << words[0] << " " << words[2] << " " << words[3];
        EXPECT_NE(r.err.find("is not a finite number"), std::string::npos) << r.err;
        EXPECT_TRUE(r.out.empty());
    }
    EXPECT_EQ(runCli({"ranks", colony, "--k", "-1"}).status, 2);
    EXPECT_EQ(runCli({"ranks", colony, "--k", "1e9"}).status, 2);
}

TEST(CliAnalysisSettings, MethodChoicesAreTheRegistry)
{
    CliTempDir dir;
    const std::string colony = threeEncounters(dir);
    for (const RankMethodInfo& m : rankMethods()) {
        EXPECT_EQ(runCli({"ranks", colony, "--method", m.code}).status, 0) << m.code;
        EXPECT_EQ(runCli({"matrix", colony, "--order", m.code}).status, 0) << m.code;
    }
    EXPECT_EQ(runCli({"matrix", colony, "--order", "id"}).status, 0);
    for (const char* bad : {"id", "elo2", "David"}) EXPECT_EQ(runCli({"ranks", colony, "--method", bad}).status, 2);
    EXPECT_EQ(runCli({"matrix", colony, "--order", "rank"}).status, 2);
    // The help texts name every registered method.
    for (const char* command : {"ranks", "matrix", "export-tables"}) {
        const CliResult help = runCli({command, "--help"});
        std::string flat;
        for (char c : help.out) {
            if (c == '\n' || c == ' ') {
                if (!flat.empty() && flat.back() != ' ') flat += ' ';
            } else {
                flat += c;
            }
        }
        EXPECT_NE(flat.find(rankMethodChoicesText()), std::string::npos) << command << "\n" << help.out;
        EXPECT_NE(flat.find("default: the colony's setting, else 100"), std::string::npos) << command;
    }
}
