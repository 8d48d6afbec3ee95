// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_edits.h"

#include "core/rules/animal_rules.h"
#include "core/rules/encounter_rules.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

// Two groups: A holds the F1 matriline, B holds the male M1 and the female G1.
const char* const animalsCsv = "id,name,sex,birth_date,mother,entry_type\n"
                               "F1,Ada,F,2010-03-01,,founder\n"
                               "D1,Cleo,F,2015-04-03,F1,born\n"
                               "M1,Eli,M,2011-01-01,,founder\n"
                               "G1,Gus,F,2012-01-01,,founder\n";
const char* const residencesCsv = "animal,group,from\n"
                                  "F1,A,2010-03-01\n"
                                  "D1,A,2015-04-03\n"
                                  "M1,B,2011-01-01\n"
                                  "G1,B,2012-01-01\n";

struct Fixture {
    TempDir dir;
    ColonyStore store;
    Fixture() : store(ColonyStore::create(dir.file("c.hierloom")))
    {
        ImportPaths p{dir.write("a.csv", animalsCsv), dir.write("r.csv", residencesCsv), {}};
        const ImportResult plan = importFiles(store, p, today());
        EXPECT_TRUE(plan.ok()) << plan.problems.text();
    }
};

Encounter encounter(const std::string& date, const std::string& w, const std::string& l)
{
    Encounter e;
    e.date = *parseDate(date);
    e.winner = w;
    e.loser = l;
    e.observer = "AB";
    return e;
}

/// The message the import gives for a one-row encounters file (the reference wording).
std::string importMessage(const std::vector<Animal>& animals, const std::vector<Residence>& residences,
                          const std::string& row)
{
    ImportInput in;
    in.encounters = ImportSource{"e.csv", "date,winner,loser\n" + row + "\n"};
    const ImportPlan plan = planImport(animals, residences, in, today());
    return plan.problems.list().empty() ? std::string() : plan.problems.list().front().message;
}

} // namespace

TEST(ColonyEdits, InsertedEncountersAreInTheFileWithGroupSeqAndUid)
{
    Fixture f;
    std::vector<Encounter> es{encounter("2020-01-01", "F1", "D1"), encounter("2020-01-02", "D1", "F1")};
    EXPECT_TRUE(insertEncounters(f.store, es, today()).empty());
    // Hand-checked: both animals live in A, so the group is filled in; seqs count from 1.
    const auto stored = ColonyStore::open(f.store.path(), ColonyStore::Mode::ReadOnly).loadEncounters();
    ASSERT_EQ(stored.size(), 2u);
    EXPECT_EQ(stored[0].group, "A");
    EXPECT_EQ(stored[0].seq, 1);
    EXPECT_EQ(stored[1].seq, 2);
    EXPECT_EQ(stored[1].uid, es[1].uid);
    EXPECT_EQ(f.store.observers(), std::vector<std::string>{"AB"});
}

TEST(ColonyEdits, RefusedEncountersUseTheImportWordingAndWriteNothing)
{
    Fixture f;
    const auto animals = f.store.loadAnimals();
    const auto residences = f.store.loadResidences();
    const ResidenceIndex where(animals, residences);
    struct Case {
        std::string row, field;
    };
    // Each row breaks one import rule (docs/file-formats.md); the edit must name the same field and say the same.
    for (const Case& c : {Case{"2020-01-01,F1,ZZ", "loser"}, Case{"2020-01-01,F1,F1", "loser"},
                          Case{"2020-01-01,F1,M1", "loser"}, Case{"2009-01-01,F1,D1", "winner"},
                          Case{"2999-01-01,F1,D1", "date"}}) {
        const auto parts = [&] {
            std::vector<std::string> out;
            size_t s = 0;
            for (size_t e; (e = c.row.find(',', s)) != std::string::npos; s = e + 1) out.push_back(c.row.substr(s, e - s));
            out.push_back(c.row.substr(s));
            return out;
        }();
        Encounter e = encounter(parts[0], parts[1], parts[2]);
        std::vector<Encounter> one{e};
        const FieldProblems p = insertEncounters(f.store, one, today());
        ASSERT_FALSE(p.empty()) << c.row;
        EXPECT_EQ(p.front().field, c.field) << c.row;
        EXPECT_EQ(p.front().message, importMessage(animals, residences, c.row)) << c.row;
    }
    EXPECT_EQ(f.store.encounterCount(), 0);
    // A single animal against the session's group: M1 lives in B (residences above).
    EXPECT_EQ(checkEncounterAnimal("M1", "A", *parseDate("2020-01-01"), where),
              "'M1' was in group 'B' on 2020-01-01, not in 'A'");
    EXPECT_FALSE(checkEncounterAnimal("D1", "A", *parseDate("2020-01-01"), where));
}

TEST(ColonyEdits, UpdateDeleteAndRestoreKeepSeqAndUid)
{
    Fixture f;
    std::vector<Encounter> es{encounter("2020-01-01", "F1", "D1"), encounter("2020-01-02", "D1", "F1"),
                              encounter("2020-01-03", "M1", "G1")};
    ASSERT_TRUE(insertEncounters(f.store, es, today()).empty());
    Encounter edited = es[1];
    edited.note = "fixed";
    edited.outcome = Outcome::Draw;
    EXPECT_TRUE(updateEncounter(f.store, edited, today()).empty());
    auto stored = f.store.loadEncounters();
    EXPECT_EQ(stored[1].note, "fixed");
    EXPECT_EQ(stored[1].seq, 2); // the edit keeps its place in entry order
    EXPECT_EQ(stored[1].outcome, Outcome::Draw);

    Encounter wrong = es[0];
    wrong.loser = "M1";
    EXPECT_EQ(problemFor(updateEncounter(f.store, wrong, today()), "loser"),
              "'M1' was in group 'B' on 2020-01-01, not with F1 in 'A'");
    EXPECT_EQ(f.store.loadEncounters()[0].loser, "D1");

    const auto gone = deleteEncounters(f.store, {es[0].uid, es[2].uid});
    ASSERT_EQ(gone.size(), 2u);
    EXPECT_EQ(f.store.encounterCount(), 1);
    // Undo of the delete: the same records come back with their seq and uid.
    std::vector<Encounter> back = gone;
    writeEncounterChange(f.store, {}, back);
    stored = f.store.loadEncounters();
    ASSERT_EQ(stored.size(), 3u);
    EXPECT_EQ(stored[0].uid, es[0].uid);
    EXPECT_EQ(stored[2].seq, 3);
    EXPECT_EQ(stored[2].uid, es[2].uid);
}

TEST(ColonyEdits, BirthFollowsTheMothersGroupAndMatriline)
{
    Fixture f;
    Colony c = f.store.load();
    Animal baby;
    baby.id = "B1";
    baby.sex = Sex::Female;
    baby.birth = *parseDate("2021-06-01");
    baby.mother = "D1";
    const AnimalChange change = planBirth(c, baby, today());
    ASSERT_TRUE(change.ok()) << change.problems.front().message;
    EXPECT_TRUE(commitAnimalChange(f.store, change).empty());
    c = f.store.load();
    const ResidenceIndex where(c.animals, c.residences);
    const int b = where.animal("B1");
    ASSERT_GE(b, 0);
    // D1 lived in A on 2021-06-01, so the newborn does too; her matriarch is F1 (D1's mother).
    EXPECT_EQ(where.groups()[static_cast<size_t>(where.groupOn(b, *parseDate("2021-06-01")))], "A");
    const Matrilines m(c);
    EXPECT_EQ(m.id(m.matriarch(m.index("B1"))), "F1");
    EXPECT_EQ(c.animals[static_cast<size_t>(c.animalIndex("B1"))].entryType, EntryType::Born);

    // Undo writes the earlier state back: no B1, no stay.
    writeAnimalChange(f.store, change.after, change.before);
    c = f.store.load();
    EXPECT_EQ(c.animalIndex("B1"), -1);
    EXPECT_EQ(c.residences.size(), 4u);
}

TEST(ColonyEdits, ParentsMustBeKnownOfTheRightSexAndOlder)
{
    Fixture f;
    const Colony c = f.store.load();
    Animal a;
    a.id = "N1";
    a.sex = Sex::Male;
    a.birth = *parseDate("2014-01-01");
    a.mother = "M1";
    // Import wording (core/store/colony_import.cpp planAnimals).
    EXPECT_EQ(problemFor(planNewAnimal(c, a, "A", today()).problems, "mother"), "'M1' is not recorded as female");
    a.mother = "D1"; // born 2015, after N1
    EXPECT_EQ(problemFor(planNewAnimal(c, a, "A", today()).problems, "mother"),
              "'D1' was born on 2015-04-03, not before her offspring (2014-01-01)");
    a.mother = "XX";
    EXPECT_EQ(problemFor(planNewAnimal(c, a, "A", today()).problems, "mother"), "'XX' is not an animal of the colony");
    a.mother = "F1";
    a.id = "F1";
    EXPECT_EQ(problemFor(planNewAnimal(c, a, "A", today()).problems, "id"), "'F1' is already in the colony");
    // Edit F1 to have D1 (her own daughter) as mother: a loop of parent links.
    Animal f1 = c.animals[static_cast<size_t>(c.animalIndex("F1"))];
    f1.mother = "D1";
    f1.birth.reset();
    f1.entry = *parseDate("2010-03-01");
    EXPECT_EQ(problemFor(planAnimalEdit(c, f1, today()).problems, "mother"),
              "'F1' would be its own ancestor (a loop of parent links)");
    // F1 is D1's mother: she cannot become male.
    f1 = c.animals[static_cast<size_t>(c.animalIndex("F1"))];
    f1.sex = Sex::Male;
    EXPECT_FALSE(problemFor(planAnimalEdit(c, f1, today()).problems, "sex").empty());
}

TEST(ColonyEdits, ExitClosesTheStayAndGuardsLaterEncounters)
{
    Fixture f;
    std::vector<Encounter> es{encounter("2020-05-01", "M1", "G1")};
    ASSERT_TRUE(insertEncounters(f.store, es, today()).empty());
    Colony c = f.store.load();
    // An exit before a recorded encounter is refused.
    EXPECT_EQ(problemFor(planExit(c, "G1", *parseDate("2020-01-01"), ExitType::Died, today()).problems, "exit_date"),
              "'G1' has 1 encounter after 2020-01-01");
    const AnimalChange death = planExit(c, "G1", *parseDate("2020-06-01"), ExitType::Died, today());
    ASSERT_TRUE(death.ok());
    commitAnimalChange(f.store, death);
    c = f.store.load();
    const auto rec = animalRecord(c, "G1");
    EXPECT_EQ(rec->animal.exitType, ExitType::Died);
    ASSERT_EQ(rec->residences.size(), 1u);
    EXPECT_EQ(rec->residences[0].to, parseDate("2020-06-01"));
    // An encounter after the death is now refused with the import's wording.
    std::vector<Encounter> late{encounter("2020-07-01", "M1", "G1")};
    EXPECT_EQ(problemFor(insertEncounters(f.store, late, today()), "loser"),
              "'G1' was not alive in the colony on 2020-07-01");
}

TEST(ColonyEdits, MoveClosesOneStayAndOpensTheNext)
{
    Fixture f;
    std::vector<Encounter> es{encounter("2020-05-01", "M1", "G1")};
    ASSERT_TRUE(insertEncounters(f.store, es, today()).empty());
    Colony c = f.store.load();
    EXPECT_EQ(problemFor(planMove(c, "M1", "A", *parseDate("2020-01-01"), today()).problems, "from"),
              "'M1' has 1 encounter in 'B' on or after 2020-01-01");
    EXPECT_EQ(problemFor(planMove(c, "M1", "B", *parseDate("2020-06-01"), today()).problems, "group"),
              "'M1' was already in 'B' on 2020-06-01");
    const AnimalChange move = planMove(c, "M1", "A", *parseDate("2020-06-01"), today());
    ASSERT_TRUE(move.ok()) << move.problems.front().message;
    commitAnimalChange(f.store, move);
    c = f.store.load();
    const ResidenceIndex where(c.animals, c.residences);
    const int m = where.animal("M1");
    // Residence days are inclusive (docs/methods.md): B up to the day before, A from the move day.
    EXPECT_EQ(where.groups()[static_cast<size_t>(where.groupOn(m, *parseDate("2020-05-31")))], "B");
    EXPECT_EQ(where.groups()[static_cast<size_t>(where.groupOn(m, *parseDate("2020-06-01")))], "A");
    std::vector<Encounter> now{encounter("2020-06-02", "M1", "F1")};
    EXPECT_TRUE(insertEncounters(f.store, now, today()).empty());
}

TEST(ColonyEdits, IntroductionNeedsEntryAndGroup)
{
    Fixture f;
    const Colony c = f.store.load();
    Animal a;
    a.id = "I1";
    a.sex = Sex::Male;
    EXPECT_EQ(problemFor(planIntroduction(c, a, "A", today()).problems, "entry_date"),
              "is needed for an introduction (the day the animal joined)");
    a.entry = *parseDate("2019-02-02");
    const AnimalChange intro = planIntroduction(c, a, "B", today());
    ASSERT_TRUE(intro.ok());
    commitAnimalChange(f.store, intro);
    const auto rec = animalRecord(f.store.load(), "I1");
    ASSERT_TRUE(rec);
    EXPECT_EQ(rec->animal.entryType, EntryType::Introduced);
    ASSERT_EQ(rec->residences.size(), 1u);
    EXPECT_EQ(rec->residences[0].group, "B");
    EXPECT_EQ(rec->residences[0].from, *parseDate("2019-02-02"));
}

TEST(ColonyEdits, BehaviourCodeAndObserverListsAreReplacedWhole)
{
    Fixture f;
    EXPECT_FALSE(checkBehaviourCodes({{"bite", 5, ""}, {"bite", 1, ""}}).empty());
    EXPECT_FALSE(checkBehaviourCodes({{"x", 9, ""}}).empty());
    writeBehaviourCodes(f.store, {{"lunge", 2, "lunges"}, {"bite", 5, ""}});
    const auto codes = f.store.behaviourCodes();
    ASSERT_EQ(codes.size(), 2u);
    EXPECT_EQ(codes[0].code, "lunge"); // ordered by severity, then code
    EXPECT_FALSE(checkObservers({"AB", "AB"}).empty());
    writeObservers(f.store, {"CD", "AB"});
    EXPECT_EQ(f.store.observers(), (std::vector<std::string>{"AB", "CD"}));
    writeObservers(f.store, {"CD"});
    EXPECT_EQ(f.store.observers(), std::vector<std::string>{"CD"});
}
