// SPDX-License-Identifier: GPL-3.0-or-later
// Commands given a group read only that group's encounters; what they print
// must not change.
#include "cli_test_support.h"

#include "core/store/analysis_settings_store.h"
#include "core/store/colony_store.h"

#include <gtest/gtest.h>

using namespace hierloom::test;

namespace {

/// North: N1, N2; South: S1, S2. The file's last encounter is South's (2020-04-01).
std::string twoGroups(const CliTempDir& dir)
{
    const std::string colony = dir.file("two.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("a.csv", "id,sex,birth_date,entry_date,entry_type\n"
                                                   "N1,F,2010-01-01,2019-01-01,founder\n"
                                                   "N2,F,2012-01-01,2019-01-01,founder\n"
                                                   "S1,F,2010-01-01,2019-01-01,founder\n"
                                                   "S2,F,2012-01-01,2019-01-01,founder\n");
    const std::string residences = dir.write("r.csv", "animal,group,from,to\n"
                                                      "N1,North,2019-01-01,\nN2,North,2019-01-01,\n"
                                                      "S1,South,2019-01-01,\nS2,South,2019-01-01,\n");
    const std::string encounters = dir.write("e.csv", "date,time,winner,loser,outcome,behaviour,group\n"
                                                      "2020-01-01,,N1,N2,decided,,North\n"
                                                      "2020-01-02,,S2,S1,decided,,South\n"
                                                      "2020-01-03,,N1,N2,decided,,\n"
                                                      "2020-02-01,,N2,N1,decided,,North\n"
                                                      "2020-04-01,,S2,S1,decided,,South\n");
    const CliResult r = runCli({"import", colony, "--animals", animals, "--residences", residences, "--encounters",
                                encounters});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

} // namespace

TEST(CliScopedLoading, GroupRanksCountUngroupedRowsOfItsResidents)
{
    CliTempDir dir;
    const std::string colony = twoGroups(dir);
    // Hand-worked: North's rows are 1, 3 (no group; N1 lives in North) and 4:
    // N1 beats N2 twice, then loses once; three encounters, N1 above N2.
    const CliResult r = runCli({"ranks", colony, "--method", "ds", "--group", "North"});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto rows = lines(r.out);
    ASSERT_EQ(rows.size(), 3U);
    EXPECT_EQ(rows[1].substr(0, 5), "N1,1,");
    EXPECT_EQ(rows[2].substr(0, 5), "N2,2,");
    const CliResult m = runCli({"metrics", colony, "--group", "North", "--randomisations", "0"});
    ASSERT_EQ(m.status, 0) << m.err;
    EXPECT_NE(m.out.find("encounters,3\n"), std::string::npos) << m.out;
}

TEST(CliScopedLoading, InheritForAGroupDefaultsToTheFilesLastEncounter)
{
    CliTempDir dir;
    const std::string colony = twoGroups(dir);
    // North's last encounter is 2020-02-01, the file's (South's) 2020-04-01: the
    // prediction's date is the file's, with or without --group.
    const CliResult all = runCli({"inherit", colony});
    ASSERT_EQ(all.status, 0) << all.err;
    EXPECT_NE(all.err.find("inherit: 2020-04-01,"), std::string::npos) << all.err;
    const CliResult north = runCli({"inherit", colony, "--group", "North"});
    ASSERT_EQ(north.status, 0) << north.err;
    EXPECT_NE(north.err.find("inherit: 2020-04-01,"), std::string::npos) << north.err;
    EXPECT_EQ(lines(north.out).size(), 3U) << north.out;
}

TEST(CliScopedLoading, DefaultWindowOfAGroupEndsAtTheFilesLastEncounter)
{
    CliTempDir dir;
    const std::string colony = twoGroups(dir);
    {
        hierloom::core::ColonyStore file = hierloom::core::ColonyStore::open(colony);
        hierloom::core::AnalysisSettings s;
        s.windowDays = 70; // the 70 days up to the file's last encounter (South's, 2020-04-01)
        hierloom::core::writeAnalysisSettings(file, s);
    }
    // Hand-worked: the window starts in late January, so North keeps only
    // 2020-02-01 (N2 beats N1) and N2 ranks first; a window ending at North's
    // own last encounter would keep all three and put N1 first.
    const CliResult r = runCli({"ranks", colony, "--method", "ds", "--group", "North"});
    ASSERT_EQ(r.status, 0) << r.err;
    const auto rows = lines(r.out);
    ASSERT_EQ(rows.size(), 3U) << r.out;
    EXPECT_EQ(rows[1].substr(0, 5), "N2,1,");
}

TEST(CliScopedLoading, OverviewHasOneRowPerGroup)
{
    CliTempDir dir;
    const std::string colony = twoGroups(dir);
    // Hand-worked from twoGroups: on 2020-04-01 each group has its two founders,
    // both adult (born 2010 and 2012; maturity 4 years) and each her own
    // matriline; North last met on 2020-02-01, nothing in the 30 days from
    // 2020-03-03; South's last encounter is the day itself. Too few encounters
    // for any alert (20 decided ones at least), so both are calm.
    const CliResult r = runCli({"overview", colony});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(r.out, "group,animals,adult_females,matrilines,last_encounter,encounters_30_days,stability,alerts\n"
                     "North,2,2,2,2020-02-01,0,calm,\n"
                     "South,2,2,2,2020-04-01,1,calm,\n");
    EXPECT_NE(r.err.find("overview: 2020-04-01, 2 groups, 0 with alerts"), std::string::npos) << r.err;
    // Earlier: South's second encounter is not yet there; North had its two encounters within 30 days.
    const CliResult jan = runCli({"overview", colony, "--at", "2020-01-15"});
    ASSERT_EQ(jan.status, 0) << jan.err;
    EXPECT_NE(jan.out.find("North,2,2,2,2020-01-03,2,calm,\n"), std::string::npos) << jan.out;
    EXPECT_NE(jan.out.find("South,2,2,2,2020-01-02,1,calm,\n"), std::string::npos) << jan.out;
}

TEST(CliScopedLoading, DynamicsOfAGroupReadsItsScopeAndItsWindowEndsAtTheFilesLastEncounter)
{
    CliTempDir dir;
    const std::string colony = twoGroups(dir);
    // Hand-worked: North's encounters are rows 1, 3 (no group; both fighters
    // live in North) and 4, none of South's.
    const std::string all = dir.file("all.csv");
    const CliResult r = runCli({"dynamics", colony, "--group", "North", "--encounters", all});
    ASSERT_EQ(r.status, 0) << r.err;
    auto rows = lines(CliTempDir::read(all));
    ASSERT_EQ(rows.size(), 4U) << CliTempDir::read(all);
    EXPECT_EQ(rows[1].substr(0, 16), "2020-01-01,N1,N2");
    EXPECT_EQ(rows[2].substr(0, 16), "2020-01-03,N1,N2");
    EXPECT_EQ(rows[3].substr(0, 16), "2020-02-01,N2,N1");
    // Rank changes, hand-worked Elo (k 100, start 1000, logistic): N1 1050 then
    // about 1086 after January; N2's win on 1 February gains her about 73, not
    // enough to pass N1 (about 1013 against 987), so neither changes rank. The
    // window, and so the last period, ends at North's last encounter.
    const auto changes = lines(r.out);
    ASSERT_EQ(changes.size(), 3U) << r.out;
    EXPECT_EQ(changes[1], "2020-02-01,2020-02-01,N1,1,1,0,0,0,0,0,none");
    EXPECT_EQ(changes[2], "2020-02-01,2020-02-01,N2,2,2,0,0,0,0,0,none");
    {
        hierloom::core::ColonyStore file = hierloom::core::ColonyStore::open(colony);
        hierloom::core::AnalysisSettings s;
        s.windowDays = 70; // up to the file's last encounter (South's, 2020-04-01): from late January
        hierloom::core::writeAnalysisSettings(file, s);
    }
    const std::string windowed = dir.file("windowed.csv");
    const CliResult w = runCli({"dynamics", colony, "--group", "North", "--encounters", windowed});
    ASSERT_EQ(w.status, 0) << w.err;
    rows = lines(CliTempDir::read(windowed));
    ASSERT_EQ(rows.size(), 2U) << CliTempDir::read(windowed);
    EXPECT_EQ(rows[1].substr(0, 16), "2020-02-01,N2,N1");
}
