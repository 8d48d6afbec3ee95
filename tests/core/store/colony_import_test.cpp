// SPDX-License-Identifier: GPL-3.0-or-later
// Every import rule of docs/file-formats.md, each with its message and the colony
// file left byte-for-byte unchanged.
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;

namespace {

const Day kToday = *parseDate("2024-06-30");

const char* kAnimals = hierloom::test::kBaseAnimals;
const char* kResidences = hierloom::test::kBaseResidences;

/// Imports into a fresh colony already holding the base animals and residences;
/// returns the problem text and checks the file did not change when it failed.
std::string importInto(const std::string& animals, const std::string& residences, const std::string& encounters)
{
    TempDir dir;
    const std::string colony = dir.file("c.hierloom");
    {
        ColonyStore store = ColonyStore::create(colony);
        const ImportResult base = importFiles(store,
                                            {dir.write("base_animals.csv", kAnimals),
                                             dir.write("base_residences.csv", kResidences), ""},
                                            kToday);
        EXPECT_TRUE(base.ok()) << base.problems.text();
    }
    const std::string before = fileBytes(colony);
    std::string problems;
    std::size_t animalCount = 0;
    {
        ColonyStore store = ColonyStore::open(colony);
        ImportPaths paths;
        if (!animals.empty()) paths.animals = dir.write("animals.csv", animals);
        if (!residences.empty()) paths.residences = dir.write("residences.csv", residences);
        if (!encounters.empty()) paths.encounters = dir.write("encounters.csv", encounters);
        const ImportResult plan = importFiles(store, paths, kToday);
        problems = plan.problems.text();
        animalCount = store.loadAnimals().size();
        if (!plan.ok()) {
            EXPECT_EQ(animalCount, 4U);
            EXPECT_EQ(store.encounterCount(), 0);
        }
    }
    if (!problems.empty()) EXPECT_EQ(fileBytes(colony), before) << "a failed import changed the colony file";
    return problems;
}

std::string encountersOnly(const std::string& rows)
{
    return importInto("", "", "date,time,winner,loser,outcome,behaviour,group,observer,note\n" + rows);
}

std::string animalsOnly(const std::string& rows)
{
    return importInto("id,sex,birth_date,mother,father,entry_date,exit_date,exit_type\n" + rows, "", "");
}

} // namespace

TEST(ColonyImport, GoodFilesImportWholly)
{
    EXPECT_EQ(encountersOnly("2020-03-01,08:15,MA,D1,decided,threat,east,JK,\n"
                             "2020-03-01,,D1,D2,draw,,,JK,\"a note, with comma\"\n"),
              "");
}

TEST(ColonyImport, EncounterRules)
{
    // Unknown id.
    EXPECT_NE(encountersOnly("2020-03-01,,MA,NOPE,,,,,\n").find(":2: loser: 'NOPE' is not an animal of the colony"),
              std::string::npos);
    // Winner equals loser.
    EXPECT_NE(encountersOnly("2020-03-01,,MA,MA,,,,,\n").find(":2: loser: 'MA' is also the winner"), std::string::npos);
    // Impossible date and a date in the future.
    EXPECT_NE(encountersOnly("2020-02-30,,MA,D1,,,,,\n").find(":2: date: '2020-02-30' is not a real date"),
              std::string::npos);
    EXPECT_NE(encountersOnly("2024-07-01,,MA,D1,,,,,\n").find(":2: date: '2024-07-01' is in the future"),
              std::string::npos);
    // Animal not alive: D2 died 2023-02-01 (the exit day still counts).
    EXPECT_EQ(encountersOnly("2023-02-01,,MA,D2,,,,,\n"), "");
    EXPECT_NE(encountersOnly("2023-02-02,,MA,D2,,,,,\n").find(":2: loser: 'D2' was not alive in the colony on 2023-02-02"),
              std::string::npos);
    // Before birth.
    EXPECT_NE(encountersOnly("2014-05-01,,MA,D1,,,,,\n").find("loser: 'D1' was not alive"), std::string::npos);
    // Different groups: SIRE moved to west on 2020-01-01.
    EXPECT_EQ(encountersOnly("2019-12-31,,SIRE,MA,,,,,\n"), "");
    EXPECT_NE(encountersOnly("2020-01-01,,SIRE,MA,,,,,\n").find(":2: loser: 'MA' was in group 'east'"), std::string::npos);
    // A group column that disagrees with the residences.
    EXPECT_NE(encountersOnly("2019-01-01,,SIRE,MA,,,west,,\n").find(":2: group: 'west' differs"), std::string::npos);
    // Bad time and bad outcome.
    EXPECT_NE(encountersOnly("2019-01-01,25:00,SIRE,MA,,,,,\n").find(":2: time: '25:00'"), std::string::npos);
    EXPECT_NE(encountersOnly("2019-01-01,,SIRE,MA,won,,,,\n").find(":2: outcome: 'won' must be decided or draw"),
              std::string::npos);
    // Problems on several lines are all reported in one pass.
    const std::string many = encountersOnly("2019-01-01,,SIRE,MA,,,,,\n2019-01-01,,X,MA,,,,,\n2019-01-01,,MA,MA,,,,,\n");
    EXPECT_NE(many.find(":3: winner:"), std::string::npos);
    EXPECT_NE(many.find(":4: loser:"), std::string::npos);
}

TEST(ColonyImport, ColumnRules)
{
    EXPECT_NE(importInto("", "", "date,winnr,loser\n2019-01-01,SIRE,MA\n")
                  .find("encounters.csv:1: winnr: unknown column"),
              std::string::npos);
    EXPECT_NE(importInto("", "", "date,loser\n2019-01-01,MA\n").find("encounters.csv:1: winner: required column is missing"),
              std::string::npos);
    EXPECT_NE(importInto("", "", "Date,WINNER,Loser,date\n").find(": date: column appears twice"), std::string::npos);
    // Case-insensitive names, any order, BOM and CRLF accepted, trailing blank lines ignored.
    EXPECT_EQ(importInto("", "", "\xEF\xBB\xBFLoser,Date,Winner\r\nMA,2019-01-01,SIRE\r\n\r\n\r\n"), "");
    EXPECT_NE(importInto("", "", "date,winner,loser\n2019-01-01,SIRE\n").find(":2: has 2 fields but the header has 3"),
              std::string::npos);
}

TEST(ColonyImport, AnimalRules)
{
    EXPECT_NE(animalsOnly("MA,F,2012-01-01,,,,,\n").find(":2: id: 'MA' is already in the colony"), std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,2012-01-01,,,,,\nN1,F,2012-01-01,,,,,\n").find(":3: id: 'N1' appears twice (first on line 2)"),
              std::string::npos);
    EXPECT_NE(animalsOnly("bad id,F,2012-01-01,,,,,\n").find(":2: id: 'bad id' must be 1-32"), std::string::npos);
    EXPECT_NE(animalsOnly("N1,X,2012-01-01,,,,,\n").find(":2: sex: 'X' must be F, M or U"), std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,2012-01-01,SIRE,,,,\n").find(":2: mother: 'SIRE' is not recorded as female"),
              std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,2012-01-01,,MA,,,\n").find(":2: father: 'MA' is not recorded as male"), std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,2012-01-01,GHOST,,,,\n").find(":2: mother: 'GHOST' is not an animal"), std::string::npos);
    // Mother born after her offspring.
    EXPECT_NE(animalsOnly("N1,F,2005-01-01,MA,,,,\n").find(":2: mother: 'MA' was born on 2008-04-01, not before"),
              std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,2012-01-01,,,,2013-01-01,\n").find(":2: exit_type: is required when exit_date"),
              std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,,,,,,\n").find(":2: entry_date: is needed when birth_date is empty"), std::string::npos);
    EXPECT_NE(animalsOnly("N1,F,2030-01-01,,,,,\n").find(":2: birth_date: '2030-01-01' is in the future"),
              std::string::npos);
    // A loop of mother links among animals with unknown birth dates.
    EXPECT_NE(animalsOnly("L1,F,,L2,,2011-01-01,,\nL2,F,,L1,,2011-01-01,,\n").find("would be its own ancestor"),
              std::string::npos);
    EXPECT_NE(animalsOnly("L1,F,,L1,,2011-01-01,,\n").find(":2: mother: 'L1' is the animal itself"), std::string::npos);
}

TEST(ColonyImport, ResidenceRules)
{
    const std::string head = "animal,group,from,to\n";
    EXPECT_NE(importInto("", head + "D1,west,2015-01-01,2016-01-01\n", "").find(":2: from: this stay of D1 overlaps one already in the colony"),
              std::string::npos);
    EXPECT_NE(importInto("", head + "ZZ,west,2015-01-01,\n", "").find(":2: animal: 'ZZ' is not an animal"), std::string::npos);
    EXPECT_NE(importInto("", head + "MA,west,2009-01-01,2009-06-01\n", "").find(":2: from: 2009-01-01 is before MA joined"),
              std::string::npos);
    EXPECT_NE(importInto("", head + "MA,west,2009-01-01,2008-06-01\n", "").find(":2: to: 2008-06-01 is before from"),
              std::string::npos);
}

TEST(ColonyImport, MalformedTextIsRefused)
{
    // Non-UTF-8 bytes on line 3.
    EXPECT_NE(encountersOnly("2019-01-01,,SIRE,MA,,,,,\n2019-01-01,,SIRE,MA,,,,,\xff\xfe\n").find(":3: is not UTF-8 text"),
              std::string::npos);
    // An unclosed quote.
    EXPECT_NE(encountersOnly("2019-01-01,,SIRE,MA,,,,,\"open\n").find("a quoted field is not closed"), std::string::npos);
    // A single 100 MB line is refused with a message, not swallowed.
    std::string huge = "date,winner,loser\n2019-01-01,SIRE,";
    huge.append(100u << 20, 'x');
    EXPECT_NE(importInto("", "", huge).find("a field is longer than 65536 bytes"), std::string::npos);
}

TEST(ColonyImport, WithoutResidencesEveryNewAnimalLivesInMain)
{
    const ImportInput input{ImportSource{"a.csv", "id,sex,birth_date,entry_date,exit_date,exit_type\n"
                                                  "A,F,2010-01-01,,2015-01-01,removed\nB,M,,2011-02-03,,\n"},
                            std::nullopt, std::nullopt};
    const ImportPlan plan = planImport({}, {}, input, kToday);
    ASSERT_TRUE(plan.ok()) << plan.problems.text();
    ASSERT_EQ(plan.residences.size(), 2U);
    EXPECT_EQ(plan.residences[0].group, "main");
    EXPECT_EQ(plan.residences[0].from, *parseDate("2010-01-01"));
    EXPECT_EQ(plan.residences[0].to, parseDate("2015-01-01"));
    EXPECT_EQ(plan.residences[1].from, *parseDate("2011-02-03"));
    EXPECT_FALSE(plan.residences[1].to.has_value());
}
