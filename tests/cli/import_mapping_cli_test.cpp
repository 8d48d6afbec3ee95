// SPDX-License-Identifier: GPL-3.0-or-later
// `import --mapping`: a team's sheet through a mapping file, all or nothing,
// messages in the sheet's terms; the mapping saved in the colony and reused.
#include "cli_test_support.h"
#include "core/store/colony_store.h"

#include <gtest/gtest.h>

using namespace hierloom::test;

namespace {

const char* kAnimals = "id,name,sex,birth_date,entry_date,entry_type\n"
                       "AA,Amber,F,2012-01-01,2012-01-01,founder\n"
                       "BB,Basil,M,2012-01-01,2012-01-01,founder\n"
                       "CC,Clove,F,2014-01-01,2014-01-01,founder\n";
const char* kResidences = "animal,group,from\nAA,north,2012-01-01\nBB,north,2012-01-01\nCC,north,2014-01-01\n";
const char* kMapping = "entry,key,value,extra\n"
                       "mapping,,North evenings,\n"
                       "layout,,actor-recipient,\n"
                       "animals,,names,\n"
                       "column,date,Datum,\n"
                       "column,actor,Von,\n"
                       "column,recipient,An,\n"
                       "column,outcome,Res,\n"
                       "group,,north,\n"
                       "code,win,+,\n"
                       "code,loss,-,\n";

std::string colonyWithAnimals(const CliTempDir& dir)
{
    const std::string colony = dir.file("c.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const CliResult r = runCli({"import", colony, "--animals", dir.write("a.csv", kAnimals), "--residences",
                                dir.write("r.csv", kResidences)});
    EXPECT_EQ(r.status, 0) << r.err;
    return colony;
}

} // namespace

TEST(CliImportMapping, AmbiguousDatesAreRefusedThenImportedWithDates)
{
    CliTempDir dir;
    const std::string colony = colonyWithAnimals(dir);
    const std::string mapping = dir.write("north.csv", kMapping);
    const std::string sheet = dir.write("sheet.tsv", "Datum\tVon\tAn\tRes\n04/05/2023\tAmber\tBasil\t+\n"
                                                      "06/05/2023\tclove\tamber\t-\n");
    const std::string before = CliTempDir::read(colony);
    CliResult r = runCli({"import", colony, "--mapping", mapping, "--encounters", sheet});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find(sheet + ":2: Datum: the date order cannot be told from the dates: '04/05/2023' reads as "
                                 "2023-05-04 (day/month/year) or 2023-04-05 (month/day/year)"),
              std::string::npos)
        << r.err;
    EXPECT_EQ(CliTempDir::read(colony), before);

    r = runCli({"import", colony, "--mapping", mapping, "--encounters", sheet, "--dates", "day-month-year",
                "--save-mapping", "north"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_NE(r.err.find("imported 0 animals, 0 residences, 2 encounters"), std::string::npos) << r.err;
    const hierloom::core::ColonyStore store =
        hierloom::core::ColonyStore::open(colony, hierloom::core::ColonyStore::Mode::ReadOnly);
    const auto encounters = store.loadEncounters();
    ASSERT_EQ(encounters.size(), 2u);
    EXPECT_EQ(hierloom::core::formatDate(encounters[1].date), "2023-05-06");
    EXPECT_EQ(encounters[1].winner, "AA"); // '-': the recipient (Amber) won
    EXPECT_EQ(encounters[1].loser, "CC");
}

TEST(CliImportMapping, SavedMappingIsReusedByName)
{
    CliTempDir dir;
    const std::string colony = colonyWithAnimals(dir);
    const std::string mapping = dir.write("north.csv", kMapping);
    const std::string first = dir.write("one.csv", "Datum,Von,An,Res\n25/05/2023,Amber,Basil,+\n");
    ASSERT_EQ(runCli({"import", colony, "--mapping", mapping, "--encounters", first, "--save-mapping", "north"}).status, 0);
    const std::string second = dir.write("two.csv", "Datum,Von,An,Res\n26/05/2023,Basil,Clove,+\n");
    CliResult r = runCli({"import", colony, "--saved-mapping", "north", "--encounters", second});
    ASSERT_EQ(r.status, 0) << r.err;
    r = runCli({"import", colony, "--saved-mapping", "south", "--encounters", second});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find("holds no mapping named 'south' (saved: north)"), std::string::npos) << r.err;
}

TEST(CliImportMapping, UsageAndMappingFileProblems)
{
    CliTempDir dir;
    const std::string colony = colonyWithAnimals(dir);
    const std::string sheet = dir.write("s.csv", "Datum,Von,An,Res\n25/05/2023,Amber,Nobody,+\n");
    const std::string broken = dir.write("broken.csv", "entry,key,value,extra\nlayout,,upside-down,\n");
    CliResult r = runCli({"import", colony, "--mapping", broken, "--encounters", sheet});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find(broken + ":2: value: 'upside-down' must be winner-loser or actor-recipient"),
              std::string::npos)
        << r.err;
    r = runCli({"import", colony, "--mapping", dir.write("m.csv", kMapping), "--animals", dir.file("a.csv"),
                "--encounters", sheet});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find("a mapping reads one sheet"), std::string::npos);
    r = runCli({"import", colony, "--mapping", dir.file("m.csv"), "--encounters", sheet});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find(sheet + ":2: An: 'Nobody' is not the name of an animal of the colony"), std::string::npos)
        << r.err;
    r = runCli({"import", colony, "--encounters", sheet, "--dates", "iso"});
    EXPECT_EQ(r.status, 2);
}
