// SPDX-License-Identifier: GPL-3.0-or-later
// `import --mapping`: a team's sheet through a mapping file, all or nothing,
// messages in the sheet's terms; the mapping saved in the colony and reused.
#include "cli_test_support.h"
#include "core/store/colony_store.h"
#include "core/store/saved_mappings.h"

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
    r = runCli({"import", colony, "--mapping", dir.write("m.csv", kMapping), "--animals", dir.file("a.csv")});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find("a mapping reads one sheet, given as --encounters"), std::string::npos) << r.err;
    r = runCli({"import", colony, "--mapping", dir.file("m.csv"), "--encounters", sheet});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find(sheet + ":2: An: 'Nobody' is not the name of an animal of the colony"), std::string::npos)
        << r.err;
    r = runCli({"import", colony, "--encounters", sheet, "--dates", "iso"});
    EXPECT_EQ(r.status, 2);
}

namespace {

/// Animals, their groups and a sheet naming them, for one combined import into an empty colony.
struct Combined {
    CliTempDir dir;
    std::string colony = dir.file("new.hierloom");
    std::string animals = dir.write("animals.csv", kAnimals);
    std::string residences = dir.write("residences.csv", kResidences);
    std::string mapping = dir.write("north.csv", kMapping);
    std::string sheet = dir.write("sheet.csv", "Datum,Von,An,Res\n"
                                               "25/05/2023,Amber,Basil,+\n"
                                               "26/05/2023,Clove,Amber,-\n");
    Combined() { EXPECT_EQ(runCli({"init", colony}).status, 0); }
    CliResult run(std::vector<std::string> extra = {}) const
    {
        std::vector<std::string> words{"import", colony, "--animals", animals, "--residences", residences,
                                       "--mapping", mapping, "--encounters", sheet};
        words.insert(words.end(), extra.begin(), extra.end());
        return runCli(words);
    }
    std::vector<std::string> savedNames() const
    {
        const hierloom::core::ColonyStore store =
            hierloom::core::ColonyStore::open(colony, hierloom::core::ColonyStore::Mode::ReadOnly);
        return hierloom::core::savedMappingNames(store);
    }
};

} // namespace

// Animals, residences and a sheet naming the new animals, in one command and one transaction.
TEST(CliImportMapping, AnimalsResidencesAndSheetInOneImport)
{
    Combined c;
    const CliResult r = c.run({"--save-mapping", "north"});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_NE(r.err.find("imported 3 animals, 3 residences, 2 encounters"), std::string::npos) << r.err;
    const hierloom::core::ColonyStore store =
        hierloom::core::ColonyStore::open(c.colony, hierloom::core::ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(store.loadAnimals().size(), 3u);
    const auto encounters = store.loadEncounters();
    ASSERT_EQ(encounters.size(), 2u);
    EXPECT_EQ(encounters[0].winner, "AA"); // Amber '+' Basil: the actor won
    EXPECT_EQ(encounters[0].loser, "BB");
    EXPECT_EQ(encounters[1].winner, "AA"); // Clove '-' Amber: the recipient won
    EXPECT_EQ(encounters[1].loser, "CC");
    EXPECT_EQ(encounters[1].group, "north");
    EXPECT_EQ(hierloom::core::savedMappingNames(store), std::vector<std::string>{"north"});
}

// A problem in any of the three files: nothing written, the mapping not saved,
// the problem named FILE:LINE: column.
TEST(CliImportMapping, AProblemInAnyFileOfACombinedImportChangesNothing)
{
    struct Case {
        const char* file;
        std::string text;
        std::string expected; // after the file's path
    };
    const std::vector<Case> cases{
        {"animals.csv",
         "id,name,sex,birth_date,entry_date,entry_type\nAA,Amber,F,2012-01-01,2012-01-01,founder\n"
         "BB,Basil,X,2012-01-01,2012-01-01,founder\nCC,Clove,F,2014-01-01,2014-01-01,founder\n",
         ":3: sex: 'X' must be F, M or U"},
        {"residences.csv", "animal,group,from\nAA,north,2012-01-01\nBB,north,2012-01-01\nCC,north,2014-13-01\n",
         ":4: from: '2014-13-01' is not a real date in the form YYYY-MM-DD"},
        {"sheet.csv", "Datum,Von,An,Res\n25/05/2023,Amber,Basil,+\n26/05/2023,Clove,Nobody,-\n",
         ":3: An: 'Nobody' is not the name of an animal of the colony"},
        // Clove is in the animals file but joined in 2014: an encounter of 2013 breaks the encounter rules.
        {"sheet.csv", "Datum,Von,An,Res\n25/05/2023,Amber,Basil,+\n26/05/2013,Clove,Amber,-\n", ":3: Von: "},
    };
    for (const Case& k : cases) {
        Combined c;
        c.dir.write(k.file, k.text);
        const std::string before = CliTempDir::read(c.colony);
        const CliResult r = c.run({"--save-mapping", "north"});
        EXPECT_EQ(r.status, 2) << k.file;
        EXPECT_NE(r.err.find(c.dir.file(k.file) + k.expected), std::string::npos) << k.file << "\n" << r.err;
        EXPECT_NE(r.err.find("nothing was imported"), std::string::npos) << r.err;
        EXPECT_EQ(CliTempDir::read(c.colony), before) << k.file;
        EXPECT_TRUE(c.savedNames().empty()) << k.file;
    }
}

// The mapping is saved in the import's own transaction: when saving it fails
// (here a trigger of the file refuses it), the records are not written either.
TEST(CliImportMapping, AFailedSaveOfTheMappingImportsNothing)
{
    Combined c;
    {
        const hierloom::core::ColonyStore store = hierloom::core::ColonyStore::open(c.colony);
        store.exec("CREATE TRIGGER refuse_mappings BEFORE INSERT ON setting "
                   "WHEN substr(NEW.key, 1, 15) = 'import_mapping:' BEGIN SELECT RAISE(ABORT, 'refused'); END");
    }
    const std::string before = CliTempDir::read(c.colony);
    CliResult r = c.run({"--save-mapping", "north"});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find(c.colony + ": the mapping 'north' could not be saved"), std::string::npos) << r.err;
    EXPECT_EQ(CliTempDir::read(c.colony), before);
    const hierloom::core::ColonyStore store =
        hierloom::core::ColonyStore::open(c.colony, hierloom::core::ColonyStore::Mode::ReadOnly);
    EXPECT_TRUE(store.loadAnimals().empty());
    EXPECT_TRUE(store.loadEncounters().empty());
    // Without --save-mapping the same files import.
    r = c.run();
    EXPECT_EQ(r.status, 0) << r.err;
}
