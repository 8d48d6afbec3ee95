// SPDX-License-Identifier: GPL-3.0-or-later
// The import assistant's core: a dozen hand-made spreadsheet layouts, each
// with the import it must give (or the messages that refuse it), all through
// the plain import's rules (docs/file-formats.md, "Import mapping files").
#include "core/store/sheet_import.h"

#include "core/store/colony_store.h"
#include "core/store/saved_mappings.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;

namespace {

const Day kToday = *parseDate("2024-06-30");

/// The base colony of import_test_support.h: MA (Matriarch), SIRE (Sire,
/// west from 2020), D1 (Daughter), D2 (Second, died 2023-02-01); east holds MA, D1, D2.
struct Base {
    std::vector<Animal> animals;
    std::vector<Residence> residences;
    Base()
    {
        ImportInput in;
        in.animals = ImportSource{"a.csv", hierloom::test::kBaseAnimals};
        in.residences = ImportSource{"r.csv", hierloom::test::kBaseResidences};
        const ImportPlan p = planImport({}, {}, in, kToday);
        EXPECT_TRUE(p.ok()) << p.problems.text();
        animals = p.animals;
        residences = p.residences;
    }
};

ImportPlan plan(const ImportMapping& m, const std::string& text, const std::string& name = "sheet.csv")
{
    static const Base base;
    return planSheetImport(m, {name, text}, base.animals, base.residences, kToday);
}

ImportMapping winnerLoser(const char* date, const char* winner, const char* loser)
{
    ImportMapping m;
    m.column(ColumnMeaning::Date) = date;
    m.column(ColumnMeaning::Winner) = winner;
    m.column(ColumnMeaning::Loser) = loser;
    return m;
}

ImportMapping actorRecipient()
{
    ImportMapping m;
    m.layout = SheetLayout::ActorRecipient;
    m.naming = AnimalNaming::Names;
    m.column(ColumnMeaning::Date) = "Date";
    m.column(ColumnMeaning::Actor) = "Actor";
    m.column(ColumnMeaning::Recipient) = "Recipient";
    m.column(ColumnMeaning::Outcome) = "Result";
    m.column(ColumnMeaning::Group) = "Troop";
    m.winCodes = {"W", "won"};
    m.lossCodes = {"L"};
    m.drawCodes = {"D"};
    return m;
}

std::string row(const Encounter& e)
{
    return formatDate(e.date) + " " + (e.time ? formatTimeOfDay(*e.time) : std::string("-")) + " " + e.winner + ">" +
           e.loser + " " + toString(e.outcome) + " " + e.group + " " + e.observer + "|" + e.behaviour + "|" + e.note;
}

std::vector<std::string> rows(const ImportPlan& p)
{
    std::vector<std::string> out;
    for (const Encounter& e : p.encounters) out.push_back(row(e));
    return out;
}

} // namespace

// Layout 1: the plain columns, ISO dates, ids.
TEST(SheetImport, IsoWinnerLoserIds)
{
    const ImportPlan p = plan(winnerLoser("date", "winner", "loser"),
                              "date,winner,loser\n2021-03-04,MA,D1\n2021-03-05,D1,D2\n");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-03-04 - MA>D1 decided east ||", "2021-03-05 - D1>D2 decided east ||"}));
}

// Layout 2: actor, recipient and a result code, names, day/month/year decided by 25/10.
TEST(SheetImport, ActorRecipientNamesDayMonthYear)
{
    const ImportPlan p = plan(actorRecipient(), "Date,Actor,Recipient,Result,Troop\n"
                                                "05/10/2021,Matriarch,Daughter,W,east\n"
                                                "25/10/2021,daughter,MATRIARCH,L,east\n"
                                                "01/11/2021,Second,Daughter,D,east\n"
                                                "02/11/2021,Second,Daughter,won,east\n");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-10-05 - MA>D1 decided east ||",
                                                 "2021-10-25 - MA>D1 decided east ||", // L: the recipient won
                                                 "2021-11-01 - D2>D1 draw east ||",
                                                 "2021-11-02 - D2>D1 decided east ||"}));
}

// Layout 3: a tab-separated export, month/day/year decided by 10/25, names as winner/loser.
TEST(SheetImport, TabSeparatedMonthDayYear)
{
    ImportMapping m = winnerLoser("When", "Top", "Bottom");
    m.naming = AnimalNaming::Names;
    const ImportPlan p = plan(m, "When\tTop\tBottom\n10/05/2021\tMatriarch\tSecond\n10/25/2021\tDaughter\tSecond\n",
                              "sheet.tsv");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-10-05 - MA>D2 decided east ||", "2021-10-25 - D1>D2 decided east ||"}));
}

// Layout 4: semicolons, every date readable both ways: refused, naming a date and its two readings.
TEST(SheetImport, AmbiguousDatesRefusedSayingWhich)
{
    const std::string sheet = "datum;winner;loser\n03/03/2021;MA;D1\n05/10/2021;MA;D2\n";
    const ImportPlan p = plan(winnerLoser("datum", "winner", "loser"), sheet);
    ASSERT_FALSE(p.ok());
    EXPECT_TRUE(p.encounters.empty());
    EXPECT_EQ(p.problems.list().front().text(),
              "sheet.csv:3: datum: the date order cannot be told from the dates: '05/10/2021' reads as 2021-10-05 "
              "(day/month/year) or 2021-05-10 (month/day/year), and no date of the sheet reads only one way; choose "
              "day-month-year or month-day-year (mapping entry 'dates')");
}

// Layout 5: the same sheet with the order chosen by the user.
TEST(SheetImport, AmbiguousDatesImportWhenChosen)
{
    const std::string sheet = "datum;winner;loser\n03/03/2021;MA;D1\n05/10/2021;MA;D2\n";
    ImportMapping m = winnerLoser("datum", "winner", "loser");
    m.dates = DateOrder::MonthDayYear;
    ImportPlan p = plan(m, sheet);
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-03-03 - MA>D1 decided east ||", "2021-05-10 - MA>D2 decided east ||"}));
    m.dates = DateOrder::DayMonthYear;
    p = plan(m, sheet);
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p)[1], "2021-10-05 - MA>D2 decided east ||");
}

// A chosen order that the file contradicts names the row.
TEST(SheetImport, ChosenOrderContradictedNamesTheRow)
{
    ImportMapping m = winnerLoser("d", "w", "l");
    m.dates = DateOrder::MonthDayYear;
    const ImportPlan p = plan(m, "d,w,l\n05/10/2021,MA,D1\n25/10/2021,MA,D1\n");
    ASSERT_FALSE(p.ok());
    EXPECT_EQ(p.problems.text(), "sheet.csv:3: d: '25/10/2021' is not a real date in the form MM/DD/YYYY\n");
}

// Layout 6: a name that matches no animal: refused, listed for the assistant's table.
TEST(SheetImport, UnknownNamesAreListedAndRefused)
{
    static const Base base;
    const std::string text = "Date,Actor,Recipient,Result,Troop\n"
                             "2021-10-05,Matriarch,Nina,W,east\n"
                             "2021-10-03,Nina,Daughter,L,east\n"
                             "2021-10-06,Matriarch,Daughter,W,east\n";
    const SheetTranslation t = translateSheet(actorRecipient(), {"s.csv", text}, base.animals);
    ASSERT_EQ(t.unknownNames.size(), 1u);
    EXPECT_EQ(t.unknownNames[0].name, "Nina");
    EXPECT_EQ(t.unknownNames[0].firstLine, 2);
    EXPECT_EQ(t.unknownNames[0].column, "Recipient");
    EXPECT_EQ(t.unknownNames[0].rows, 2);
    EXPECT_EQ(t.unknownNames[0].firstDate, parseDate("2021-10-03"));
    const ImportPlan p = plan(actorRecipient(), text);
    EXPECT_FALSE(p.ok());
    EXPECT_TRUE(p.encounters.empty()); // all or nothing: the good third row is not kept
    EXPECT_EQ(p.problems.text(),
              "sheet.csv:2: Recipient: 'Nina' is not the name of an animal of the colony; map it to an animal or add "
              "it as a new animal\n"
              "sheet.csv:3: Actor: 'Nina' is not the name of an animal of the colony; map it to an animal or add it "
              "as a new animal\n");
}

// Layout 7: the unknown name mapped to an existing animal (a nickname).
TEST(SheetImport, UnknownNameMappedToAnAnimal)
{
    ImportMapping m = actorRecipient();
    m.names.push_back({"Nina", "D2", false, Sex::Unknown});
    const ImportPlan p = plan(m, "Date,Actor,Recipient,Result,Troop\n2021-10-05,Matriarch,nina,W,east\n");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-10-05 - MA>D2 decided east ||"}));
}

// Layout 8: the unknown name added as a new animal, in the file's one group, from its first date.
TEST(SheetImport, UnknownNameAddedAsNewAnimal)
{
    ImportMapping m = actorRecipient();
    m.column(ColumnMeaning::Group).clear();
    m.fileGroup = "east";
    m.names.push_back({"Nina", "N01", true, Sex::Female});
    const ImportPlan p = plan(m, "Date,Actor,Recipient,Result\n"
                                 "2021-10-05,Matriarch,Nina,W\n"
                                 "2021-10-03,Nina,Daughter,W\n");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    ASSERT_EQ(p.animals.size(), 1u);
    EXPECT_EQ(p.animals[0].id, "N01");
    EXPECT_EQ(p.animals[0].name, "Nina");
    EXPECT_EQ(p.animals[0].sex, Sex::Female);
    EXPECT_EQ(p.animals[0].entry, parseDate("2021-10-03")); // the earliest row, not the first
    ASSERT_EQ(p.residences.size(), 1u);
    EXPECT_EQ(p.residences[0].group, "east");
    EXPECT_EQ(p.residences[0].from, *parseDate("2021-10-03"));
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-10-05 - MA>N01 decided east ||", "2021-10-03 - N01>D1 decided east ||"}));
}

// A new animal goes through the animal rules: an id already taken is refused at the name's first row.
TEST(SheetImport, NewAnimalGoesThroughTheAnimalRules)
{
    ImportMapping m = actorRecipient();
    m.names.push_back({"Nina", "MA", true, Sex::Female});
    const ImportPlan p = plan(m, "Date,Actor,Recipient,Result,Troop\n2021-10-05,Daughter,Nina,W,east\n");
    ASSERT_FALSE(p.ok());
    // Its id is taken, and so its stay overlaps MA's: both said, at the name's first row.
    ASSERT_EQ(p.problems.list().size(), 2u) << p.problems.text();
    EXPECT_EQ(p.problems.list()[1].line, 2);
    EXPECT_EQ(p.problems.list()[0].file, "sheet.csv");
    EXPECT_EQ(p.problems.list()[0].line, 2);
    EXPECT_EQ(p.problems.list()[0].column, "Recipient");
    EXPECT_NE(p.problems.list()[0].message.find("new animal: id:"), std::string::npos) << p.problems.text();
}

// Layout 9: one group for the file, times with seconds, a quoted note with a
// comma, observer and behaviour, and columns the mapping leaves out.
TEST(SheetImport, OneGroupTimesNotesAndIgnoredColumns)
{
    ImportMapping m = winnerLoser("Day", "Winner", "Loser");
    m.column(ColumnMeaning::Time) = "Clock";
    m.column(ColumnMeaning::Observer) = "Obs";
    m.column(ColumnMeaning::Behaviour) = "Act";
    m.column(ColumnMeaning::Note) = "Remarks";
    m.fileGroup = "east";
    const ImportPlan p = plan(m, "Weather,Day,Clock,Winner,Loser,Act,Obs,Remarks\n"
                                 "sunny,2021-03-04,09:15:40,MA,D1,chase,AB,\"near the pool, calm\"\n"
                                 "rain,2021-03-04,9:20,D1,D2,displace,AB,\n");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-03-04 09:15 MA>D1 decided east AB|chase|near the pool, calm",
                                                 "2021-03-04 09:20 D1>D2 decided east AB|displace|"}));
}

// Layout 10: an outcome code the mapping does not know.
TEST(SheetImport, UnknownOutcomeCode)
{
    const ImportPlan p = plan(actorRecipient(), "Date,Actor,Recipient,Result,Troop\n"
                                                "2021-10-05,Matriarch,Daughter,W,east\n"
                                                "2021-10-06,Matriarch,Daughter,?,east\n");
    ASSERT_FALSE(p.ok());
    EXPECT_EQ(p.problems.text(), "sheet.csv:3: Result: '?' is not an outcome code of the mapping ('W' (actor won), "
                                 "'won' (actor won), 'L' (recipient won), 'D' (draw))\n");
}

// Layout 11: a row the encounter rules refuse (D2 died 2023-02-01), named
// in the sheet's terms: the loser came from the Actor column (code L).
TEST(SheetImport, RuleProblemsInTheSheetsTerms)
{
    const ImportPlan p = plan(actorRecipient(), "Date,Actor,Recipient,Result,Troop\n"
                                                "2021-10-05,Matriarch,Daughter,W,east\n"
                                                "\n"
                                                "2023-03-01,Second,Daughter,L,east\n");
    ASSERT_FALSE(p.ok());
    ASSERT_EQ(p.problems.list().size(), 1u) << p.problems.text();
    const ImportProblem& q = p.problems.list()[0];
    EXPECT_EQ(q.file, "sheet.csv");
    EXPECT_EQ(q.line, 4);
    EXPECT_EQ(q.column, "Actor");
}

// Layout 12: winner/loser with a draw code, empty outcome cells decided, and
// short rows (spreadsheets drop trailing empty cells); CRLF and a BOM.
TEST(SheetImport, DrawCodesShortRowsBomCrlf)
{
    ImportMapping m = winnerLoser("date", "winner", "loser");
    m.column(ColumnMeaning::Outcome) = "tie";
    m.column(ColumnMeaning::Note) = "note";
    m.drawCodes = {"="};
    const ImportPlan p = plan(m, "\xEF\xBB\xBF" "date,winner,loser,tie,note\r\n"
                                 "2021-03-04,MA,D1,=,x\r\n"
                                 "2021-03-05,MA,D1\r\n");
    ASSERT_TRUE(p.ok()) << p.problems.text();
    EXPECT_EQ(rows(p), (std::vector<std::string>{"2021-03-04 - MA>D1 draw east ||x", "2021-03-05 - MA>D1 decided east ||"}));
}

// Layout 13: a mapping naming a column the sheet lacks, and a name shared by two animals.
TEST(SheetImport, MissingColumnAndSharedName)
{
    ImportMapping m = winnerLoser("date", "winner", "loser");
    m.column(ColumnMeaning::Observer) = "observer";
    ImportPlan p = plan(m, "date,winner,loser\n2021-03-04,MA,D1\n");
    EXPECT_EQ(p.problems.text(), "sheet.csv:1: observer: is not a column of the sheet (the mapping's observer column)\n");

    static const Base base;
    std::vector<Animal> animals = base.animals;
    animals[3].name = "Daughter"; // D2 now shares D1's name
    ImportMapping n = winnerLoser("date", "winner", "loser");
    n.naming = AnimalNaming::Names;
    p = planSheetImport(n, {"s.csv", "date,winner,loser\n2021-03-04,Matriarch,daughter\n"}, animals, base.residences,
                        kToday);
    EXPECT_EQ(p.problems.text(), "s.csv:2: loser: 'daughter' is the name of 2 animals (D1, D2); map it to one of them\n");
}

TEST(SheetImport, MappingFileRoundTripAndProblems)
{
    ImportMapping m = actorRecipient();
    m.name = "Station B, evenings";
    m.delimiter = SheetDelimiter::Semicolon;
    m.dates = DateOrder::DayMonthYear;
    m.names.push_back({"Nina", "N01", true, Sex::Female});
    m.names.push_back({"Old \"Ma\"", "MA", false, Sex::Unknown});
    const MappingFile back = readMappingFile("m.csv", writeMappingFile(m));
    ASSERT_TRUE(back.ok()) << back.problems.text();
    EXPECT_TRUE(back.mapping == m);

    const MappingFile bad = readMappingFile("m.csv", "entry,key,value,extra\n"
                                                     "layout,,sideways,\n"
                                                     "column,colour,C,\n"
                                                     "new_animal,Nina,N01,X\n");
    EXPECT_EQ(bad.problems.text(),
              "m.csv:2: value: 'sideways' must be winner-loser or actor-recipient\n"
              "m.csv:3: key: 'colour' is not a column meaning (date, time, winner, loser, actor, recipient, outcome, "
              "behaviour, group, observer, note)\n"
              "m.csv:4: extra: 'X' must be F, M or U (the new animal's sex)\n");
    const MappingFile incomplete = readMappingFile("m.csv", "entry,key,value,extra\ncolumn,date,D,\n");
    EXPECT_EQ(incomplete.problems.text(), "m.csv: no column is the winner (a winner-loser sheet needs both)\n"
                                          "m.csv: no column is the loser (a winner-loser sheet needs both)\n");
}

// Through the store: all or nothing, the file untouched on a refusal.
TEST(SheetImport, ImportSheetIsAllOrNothing)
{
    TempDir dir;
    const std::string colony = dir.file("c.hierloom");
    {
        ColonyStore store = ColonyStore::create(colony);
        ASSERT_TRUE(importFiles(store,
                                {dir.write("a.csv", hierloom::test::kBaseAnimals),
                                 dir.write("r.csv", hierloom::test::kBaseResidences), ""},
                                kToday)
                        .ok());
    }
    ImportMapping m = actorRecipient();
    const std::string bad = dir.write("bad.csv", "Date,Actor,Recipient,Result,Troop\n"
                                                 "2021-10-05,Matriarch,Daughter,W,east\n"
                                                 "2021-10-06,Matriarch,Nobody,W,east\n");
    const std::string before = fileBytes(colony);
    {
        ColonyStore store = ColonyStore::open(colony);
        const ImportResult r = importSheet(store, m, bad, kToday);
        ASSERT_FALSE(r.ok());
        EXPECT_EQ(r.problems.list()[0].text(), bad + ":3: Recipient: 'Nobody' is not the name of an animal of the "
                                                     "colony; map it to an animal or add it as a new animal");
    }
    EXPECT_EQ(fileBytes(colony), before);
    m.names.push_back({"Nobody", "N02", true, Sex::Male});
    ColonyStore store = ColonyStore::open(colony);
    const ImportResult r = importSheet(store, m, bad, kToday);
    ASSERT_TRUE(r.ok()) << r.problems.text();
    EXPECT_EQ(r.animals, 1u);
    EXPECT_EQ(r.encounters, 2u);
    const std::vector<Encounter> all = store.loadEncounters();
    ASSERT_EQ(all.size(), 2u);
    EXPECT_EQ(all[1].loser, "N02");
}

// Above ColonyStore::kBulkEncounters rows the combined import is a checked bulk
// load: an animals file, a sheet naming its animal, and the mapping saved, in one
// transaction; one bad last row and nothing of it is written.
TEST(SheetImport, BulkSheetWithAnimalsFileAndSavedMappingIsOneTransaction)
{
    TempDir dir;
    const std::string colony = dir.file("c.hierloom");
    {
        ColonyStore store = ColonyStore::create(colony);
        ASSERT_TRUE(importFiles(store,
                                {dir.write("a.csv", hierloom::test::kBaseAnimals),
                                 dir.write("r.csv", hierloom::test::kBaseResidences), ""},
                                kToday)
                        .ok());
    }
    SheetImportRequest request;
    request.mapping = actorRecipient();
    request.files.animals = ImportSource{"new.csv", "id,name,sex,entry_date,entry_type\nNW,Newcomer,F,2021-01-01,introduced\n"};
    request.files.residences = ImportSource{"stay.csv", "animal,group,from\nNW,east,2021-01-01\n"};
    request.save = MappingToSave{"east sheet", writeMappingFile(request.mapping)};
    const std::size_t rows = ColonyStore::kBulkEncounters + 1;
    std::string text = "Date,Actor,Recipient,Result,Troop\n";
    for (std::size_t i = 0; i < rows; ++i)
        text += std::string("2021-10-05,") + (i % 2 ? "Newcomer,Matriarch" : "Daughter,Newcomer") + ",W,east\n";
    request.sheet = {"big.csv", text + "2021-10-06,Newcomer,Nobody,W,east\n"};
    const std::string before = fileBytes(colony);
    {
        ColonyStore store = ColonyStore::open(colony);
        const ImportResult r = importSheet(store, request, kToday);
        ASSERT_FALSE(r.ok());
        EXPECT_EQ(r.problems.list()[0].text(),
                  "big.csv:" + std::to_string(rows + 2) +
                      ": Recipient: 'Nobody' is not the name of an animal of the colony; map it to an animal or add "
                      "it as a new animal");
    }
    EXPECT_EQ(fileBytes(colony), before);
    request.sheet.text = text;
    ColonyStore store = ColonyStore::open(colony);
    const ImportResult r = importSheet(store, request, kToday);
    ASSERT_TRUE(r.ok()) << r.problems.text();
    EXPECT_EQ(r.animals, 1u);
    EXPECT_EQ(r.residences, 1u);
    EXPECT_EQ(r.encounters, rows);
    const std::vector<Encounter> all = store.loadEncounters();
    ASSERT_EQ(all.size(), rows);
    EXPECT_EQ(all[0].winner, "D1");
    EXPECT_EQ(all[1].winner, "NW");
    EXPECT_EQ(savedMappingText(store, "east sheet"), request.save->text);
}
