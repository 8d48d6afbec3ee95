// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_csv_export.h"
#include "core/base/csv_writer.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom::core;

// Source for every check here: RFC 4180 section 2 (rules 5-7: fields holding
// commas, quotes or line breaks are quoted; a quote inside is doubled).
TEST(CsvWriter, QuotesOnlyWhenNeeded)
{
    EXPECT_EQ(csvField("plain"), "plain");
    EXPECT_EQ(csvField(""), "");
    EXPECT_EQ(csvField("a,b"), "\"a,b\"");
    EXPECT_EQ(csvField("say \"hi\""), "\"say \"\"hi\"\"\"");
    EXPECT_EQ(csvField("line\nbreak"), "\"line\nbreak\"");
    EXPECT_EQ(csvField("cr\rhere"), "\"cr\rhere\"");
    EXPECT_EQ(csvField(" spaces kept "), " spaces kept ");
}

TEST(CsvWriter, RowsEndWithNewline)
{
    std::ostringstream out;
    CsvWriter csv(out);
    csv.writeRow({"a", "", "c,d"});
    csv.writeRow({"\""});
    EXPECT_EQ(out.str(), "a,,\"c,d\"\n\"\"\"\"\n");
}

// Column order and formats of docs/file-formats.md ("Import files").
TEST(ColonyCsvExport, ColumnsAndFormats)
{
    Colony c;
    Animal a;
    a.id = "X1";
    a.name = "Ann, the first";
    a.sex = Sex::Female;
    a.birth = dayFromCivil(2019, 4, 2);
    a.entry = a.birth;
    a.entryType = EntryType::Born;
    a.exit = dayFromCivil(2021, 12, 31);
    a.exitType = ExitType::Died;
    c.animals.push_back(a);
    Animal b;
    b.id = "Y2";
    b.sex = Sex::Male;
    c.animals.push_back(b);
    c.residences.push_back({"X1", "G", dayFromCivil(2019, 4, 2), std::nullopt, ""});
    Encounter late;
    late.date = dayFromCivil(2020, 1, 3);
    late.winner = "Y2";
    late.loser = "X1";
    late.outcome = Outcome::Draw;
    late.seq = 2;
    Encounter early = late;
    early.time = 9 * 60 + 5;
    early.winner = "X1";
    early.loser = "Y2";
    early.outcome = Outcome::Decided;
    early.behaviour = "chase";
    early.group = "G";
    early.observer = "HK";
    early.note = "x";
    early.seq = 1;
    c.encounters = {late, early};

    std::ostringstream animals, residences, encounters;
    writeAnimalsCsv(animals, c);
    writeResidencesCsv(residences, c);
    writeEncountersCsv(encounters, c);
    EXPECT_EQ(animals.str(),
              "id,name,sex,birth_date,mother,father,entry_date,entry_type,exit_date,exit_type\n"
              "X1,\"Ann, the first\",F,2019-04-02,,,2019-04-02,born,2021-12-31,died\n"
              "Y2,,M,,,,,,,\n");
    EXPECT_EQ(residences.str(), "animal,group,from,to\nX1,G,2019-04-02,\n");
    // Written in seq order, whatever the storage order.
    EXPECT_EQ(encounters.str(),
              "date,time,winner,loser,outcome,behaviour,group,observer,note\n"
              "2020-01-03,09:05,X1,Y2,decided,chase,G,HK,x\n"
              "2020-01-03,,Y2,X1,draw,,,,\n");
}
