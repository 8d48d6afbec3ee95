// SPDX-License-Identifier: GPL-3.0-or-later
// Every record rule of core/rules, enumerated from its rule list: a bad record
// fed through a CSV import and through the hand-edit path gives the same
// column and the same message. A rule added without a case here fails.
#include "core/rules/animal_rules.h"
#include "core/rules/encounter_rules.h"
#include "core/rules/record_messages.h"
#include "core/rules/residence_rules.h"
#include "core/rules/support_rules.h"
#include "core/store/colony_edits.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <functional>
#include <optional>
#include <set>
#include <vector>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

const Day kToday = *parseDate("2024-06-30");

Day day(const char* text) { return *parseDate(text); }

// The import tests' colony, and LONE: in the colony but in no group.
const char* kLone = "id,sex,entry_date,entry_type\nLONE,F,2012-01-01,founder\n";
const char* kAnimalHeader = "id,name,sex,birth_date,mother,father,entry_date,entry_type,exit_date,exit_type\n";
const char* kResidenceHeader = "animal,group,from,to\n";
const char* kEncounterHeader = "date,time,winner,loser,outcome,behaviour,group,observer,note\n";

/// One bad record: its import file rows (nullopt when no import file can
/// hold it), the same record checked the way the editor checks it, the column
/// both must name and a part of the message that shows the rule was hit.
struct RuleCase {
    std::optional<std::string> rows;
    std::function<FieldProblems()> byHand;
    std::string column;
    std::string hint;
    std::string importScope = {}; // where an import looks for an animal, when it differs from "the colony"
};

/// A colony holding the base records, its store kept open for the imports.
class RuleColony {
public:
    RuleColony()
        : store_(ColonyStore::create(dir_.file("c.hierloom")))
    {
        using hierloom::test::kBaseAnimals, hierloom::test::kBaseResidences;
        const ImportResult base =
            importFiles(store_, {dir_.write("a.csv", kBaseAnimals), dir_.write("r.csv", kBaseResidences), ""}, kToday);
        EXPECT_TRUE(base.ok()) << base.problems.text();
        // An empty residences file with LONE, which alone would be placed in group "main".
        const ImportResult lone =
            importFiles(store_, {dir_.write("lone.csv", kLone), dir_.write("none.csv", kResidenceHeader), ""}, kToday);
        EXPECT_TRUE(lone.ok()) << lone.problems.text();
        colony_ = store_.load();
    }

    const Colony& colony() const { return colony_; }
    ColonyStore& store() { return store_; }

    /// The problem the import of `text` as the given file reports on line 2 in `column`.
    std::optional<ImportProblem> importProblem(const std::string& file, const std::string& text, const std::string& column)
    {
        ImportPaths paths;
        const std::string path = dir_.write(file + ".csv", text);
        (file == "animals" ? paths.animals : file == "residences" ? paths.residences : paths.encounters) = path;
        const ImportResult r = importFiles(store_, paths, kToday);
        EXPECT_FALSE(r.ok()) << "the import of " << text << " passed";
        EXPECT_EQ(store_.loadAnimals().size(), colony_.animals.size()) << "a failed import wrote animals";
        for (const ImportProblem& p : r.problems.list())
            if (p.line == 2 && p.column == column) {
                EXPECT_EQ(p.file, path);
                return p;
            }
        ADD_FAILURE() << "no problem in column " << column << " on line 2 of:\n" << r.problems.text();
        return std::nullopt;
    }

private:
    TempDir dir_;
    ColonyStore store_;
    Colony colony_;
};

std::string replaced(std::string text, const std::string& from, const std::string& to)
{
    if (const auto at = text.find(from); at != std::string::npos) text.replace(at, from.size(), to);
    return text;
}

/// Checks one case both ways; `file` is the import file kind, `name` the rule's name.
void expectSameBothWays(RuleColony& colony, const std::string& file, const char* name, const RuleCase& c)
{
    SCOPED_TRACE(name);
    const FieldProblems hand = c.byHand();
    const std::string handMessage = problemFor(hand, c.column);
    ASSERT_FALSE(handMessage.empty()) << "the hand-edit path reports nothing in column " << c.column;
    EXPECT_NE(handMessage.find(c.hint), std::string::npos) << handMessage;
    if (!c.rows) return; // the rule is about records already in the colony: edit only
    const auto imported = colony.importProblem(file, *c.rows, c.column);
    ASSERT_TRUE(imported);
    const std::string expected = c.importScope.empty() ? handMessage : replaced(handMessage, "the colony", c.importScope);
    EXPECT_EQ(imported->message, expected);
    EXPECT_EQ(imported->text(), imported->file + ":2: " + c.column + ": " + expected);
}

Animal animal(const char* id, Sex sex, std::optional<Day> birth, const char* mother = "", const char* father = "")
{
    Animal a;
    a.id = id;
    a.sex = sex;
    a.birth = birth;
    a.mother = mother;
    a.father = father;
    return a;
}

/// A case for each animal rule; a rule without one reaches the failure below the switch.
std::optional<RuleCase> animalCase(AnimalRule rule, const Colony& colony)
{
    // planNewAnimal and planAnimalEdit are what the pedigree dialogs call.
    auto added = [&colony](Animal a) { return [&colony, a] { return planNewAnimal(colony, a, "", kToday).problems; }; };
    auto edited = [&colony](const char* id, std::function<void(Animal&)> change) {
        return [&colony, id, change] {
            Animal a = colony.animals[static_cast<size_t>(colony.animalIndex(id))];
            change(a);
            return planAnimalEdit(colony, a, kToday).problems;
        };
    };
    const std::string h = kAnimalHeader;
    switch (rule) {
    case AnimalRule::IdGiven:
        return RuleCase{h + ",,F,2012-01-01,,,,,,\n", added(animal("", Sex::Female, day("2012-01-01"))), "id", "is empty"};
    case AnimalRule::IdForm:
        return RuleCase{h + "a b,,F,2012-01-01,,,,,,\n", added(animal("a b", Sex::Female, day("2012-01-01"))), "id",
                        "must be 1-32"};
    case AnimalRule::IdUnique:
        return RuleCase{h + "MA,,F,2012-01-01,,,,,,\n", added(animal("MA", Sex::Female, day("2012-01-01"))), "id",
                        "already in the colony"};
    case AnimalRule::DatesNotInFuture:
        return RuleCase{h + "N1,,F,2030-01-01,,,,,,\n", added(animal("N1", Sex::Female, day("2030-01-01"))), "birth_date",
                        "in the future"};
    case AnimalRule::ExitTypeWithExitDate: {
        Animal a = animal("N1", Sex::Female, day("2012-01-01"));
        a.exit = day("2020-01-01");
        return RuleCase{h + "N1,,F,2012-01-01,,,,,2020-01-01,\n", added(a), "exit_type", "is required"};
    }
    case AnimalRule::ExitDateWithExitType: {
        Animal a = animal("N1", Sex::Female, day("2012-01-01"));
        a.exitType = ExitType::Died;
        return RuleCase{h + "N1,,F,2012-01-01,,,,,,died\n", added(a), "exit_date", "is required"};
    }
    case AnimalRule::EntryKnown:
        return RuleCase{h + "N1,,F,,,,,,,\n", added(animal("N1", Sex::Female, std::nullopt)), "entry_date", "is needed"};
    case AnimalRule::EntryNotBeforeBirth: {
        Animal a = animal("N1", Sex::Female, day("2012-01-01"));
        a.entry = day("2011-01-01");
        return RuleCase{h + "N1,,F,2012-01-01,,,2011-01-01,,,\n", added(a), "entry_date", "before the birth date"};
    }
    case AnimalRule::ExitNotBeforeEntry: {
        Animal a = animal("N1", Sex::Female, day("2012-01-01"));
        a.exit = day("2011-06-01");
        a.exitType = ExitType::Died;
        return RuleCase{h + "N1,,F,2012-01-01,,,,,2011-06-01,died\n", added(a), "exit_date", "before the entry date"};
    }
    case AnimalRule::ParentNotItself:
        return RuleCase{h + "N1,,F,2012-01-01,N1,,,,,\n", added(animal("N1", Sex::Female, day("2012-01-01"), "N1")),
                        "mother", "the animal itself"};
    case AnimalRule::ParentKnown:
        return RuleCase{h + "N1,,F,2012-01-01,XX,,,,,\n", added(animal("N1", Sex::Female, day("2012-01-01"), "XX")),
                        "mother", "is not an animal of the colony", "this file or the colony"};
    case AnimalRule::ParentSex:
        return RuleCase{h + "N1,,F,2012-01-01,,MA,,,,\n", added(animal("N1", Sex::Female, day("2012-01-01"), "", "MA")),
                        "father", "not recorded as male"};
    case AnimalRule::ParentBornBefore:
        return RuleCase{h + "N1,,F,2006-01-01,,SIRE,,,,\n",
                        added(animal("N1", Sex::Female, day("2006-01-01"), "", "SIRE")), "father",
                        "not before his offspring"};
    case AnimalRule::NoAncestorLoop:
        // Two new animals each other's mother: by hand L1 is added after L2 was.
        return RuleCase{h + "L1,,F,,L2,,2011-01-01,,,\nL2,,F,,L1,,2011-01-01,,,\n",
                        [&colony] {
                            std::vector<Animal> animals = colony.animals;
                            Animal l2 = animal("L2", Sex::Female, std::nullopt, "L1");
                            l2.entry = day("2011-01-01");
                            animals.push_back(l2);
                            Animal l1 = animal("L1", Sex::Female, std::nullopt, "L2");
                            l1.entry = day("2011-01-01");
                            return checkAnimal(l1, animals, kToday);
                        },
                        "mother", "own ancestor"};
    case AnimalRule::ParentKeepsSex:
        // An import only adds animals: none of them can already be a parent in the colony.
        return RuleCase{std::nullopt, edited("MA", [](Animal& a) { a.sex = Sex::Male; }), "sex", "must stay female"};
    case AnimalRule::ParentKeepsBirthOrder:
        return RuleCase{std::nullopt, edited("SIRE", [](Animal& a) { a.birth = day("2015-01-01"); }), "birth_date",
                        "is not before the birth of 'D1'"};
    case AnimalRule::NameText: {
        // A name holding a raw escape sequence (ESC [ 2 J clears a terminal): refused, and echoed escaped.
        Animal a = animal("N1", Sex::Female, day("2012-01-01"));
        a.name = "Ann\x1b[2J";
        return RuleCase{h + "N1,Ann\x1b[2J,F,2012-01-01,,,,,,\n", added(a), "name",
                        "'Ann\\x1b[2J' holds the control character \\x1b (only tab may appear in text)"};
    }
    case AnimalRule::Count: break;
    }
    return std::nullopt;
}

std::optional<RuleCase> residenceCase(ResidenceRule rule, const Colony& colony)
{
    // The rules as planMove, planAnimalEdit and planNewAnimal call them: the
    // animal's record and the stays of the colony.
    auto stay = [&colony](const char* id, const char* group, const char* from, const char* to) {
        return [&colony, id, group, from, to] {
            const Residence r{id, group, day(from), to ? std::optional<Day>(day(to)) : std::nullopt, {}};
            const int i = colony.animalIndex(id);
            if (i < 0) { // no record to pass: the rules directly
                FieldProblems out;
                checkStay(r, {kToday, nullptr, nullptr}, out);
                return out;
            }
            return checkResidence(r, colony.animals[static_cast<size_t>(i)], colony.residences, kToday);
        };
    };
    const std::string h = kResidenceHeader;
    switch (rule) {
    case ResidenceRule::AnimalKnown:
        return RuleCase{h + "NOPE,east,2020-01-01,\n", stay("NOPE", "east", "2020-01-01", nullptr), "animal",
                        "not an animal of the colony", "the colony or of the animals file"};
    case ResidenceRule::GroupGiven:
        return RuleCase{h + "D1,,2020-01-01,\n", stay("D1", "", "2020-01-01", nullptr), "group", "is empty"};
    case ResidenceRule::GroupText:
        // DEL inside a group name.
        return RuleCase{h + "D1,we\x7fst,2020-01-01,\n", stay("D1", "we\x7fst", "2020-01-01", nullptr), "group",
                        "'we\\x7fst' holds the control character \\x7f"};
    case ResidenceRule::DatesNotInFuture:
        return RuleCase{h + "D1,west,2025-01-01,\n", stay("D1", "west", "2025-01-01", nullptr), "from", "in the future"};
    case ResidenceRule::ToNotBeforeFrom:
        return RuleCase{h + "D1,west,2020-01-01,2019-01-01\n", stay("D1", "west", "2020-01-01", "2019-01-01"), "to",
                        "is before from"};
    case ResidenceRule::WithinLife:
        return RuleCase{h + "D2,west,2023-03-01,\n", stay("D2", "west", "2023-03-01", nullptr), "from",
                        "after D2 left the colony"};
    case ResidenceRule::NoOverlap:
        return RuleCase{h + "D1,west,2015-01-01,2016-01-01\n", stay("D1", "west", "2015-01-01", "2016-01-01"), "from",
                        "overlaps one already in the colony"};
    case ResidenceRule::Count: break;
    }
    return std::nullopt;
}

std::optional<RuleCase> encounterCase(EncounterRule rule, RuleColony& colony)
{
    // insertEncounters is what the evening entry and the encounter editor write through.
    auto typed = [&colony](const char* date, const char* winner, const char* loser, std::function<void(Encounter&)> more = {}) {
        return [&colony, date, winner, loser, more] {
            Encounter e;
            e.date = day(date);
            e.winner = winner;
            e.loser = loser;
            if (more) more(e);
            std::vector<Encounter> one{e};
            const FieldProblems p = insertEncounters(colony.store(), one, kToday);
            EXPECT_EQ(colony.store().encounterCount(), 0) << "a refused encounter was written";
            return p;
        };
    };
    const std::string h = kEncounterHeader;
    switch (rule) {
    case EncounterRule::DateNotInFuture:
        return RuleCase{h + "2024-07-01,,MA,D1,,,,,\n", typed("2024-07-01", "MA", "D1"), "date", "in the future"};
    case EncounterRule::TimeOfDay:
        return RuleCase{h + "2021-01-01,25:00,MA,D1,,,,,\n", typed("2021-01-01", "MA", "D1", [](Encounter& e) { e.time = 1500; }),
                        "time", "not a time of day"};
    case EncounterRule::AnimalKnown:
        return RuleCase{h + "2021-01-01,,NOPE,D1,,,,,\n", typed("2021-01-01", "NOPE", "D1"), "winner",
                        "not an animal of the colony"};
    case EncounterRule::TwoAnimals:
        return RuleCase{h + "2021-01-01,,MA,MA,,,,,\n", typed("2021-01-01", "MA", "MA"), "loser", "also the winner"};
    case EncounterRule::OutcomeKnown:
        // An Outcome can hold no other value unless forced; the import's "7" names the same value.
        return RuleCase{h + "2021-01-01,,MA,D1,7,,,,\n",
                        typed("2021-01-01", "MA", "D1", [](Encounter& e) { e.outcome = static_cast<Outcome>(7); }),
                        "outcome", "must be decided or draw"};
    case EncounterRule::AliveThatDay:
        return RuleCase{h + "2023-05-01,,MA,D2,,,,,\n", typed("2023-05-01", "MA", "D2"), "loser", "was not alive"};
    case EncounterRule::InAGroup:
        return RuleCase{h + "2021-01-01,,LONE,MA,,,,,\n", typed("2021-01-01", "LONE", "MA"), "winner", "in no group"};
    case EncounterRule::SameGroup:
        return RuleCase{h + "2021-01-01,,MA,SIRE,,,,,\n", typed("2021-01-01", "MA", "SIRE"), "loser",
                        "was in group 'west'"};
    case EncounterRule::GroupAsGiven:
        return RuleCase{h + "2021-01-01,,MA,D1,,,west,,\n",
                        typed("2021-01-01", "MA", "D1", [](Encounter& e) { e.group = "west"; }), "group", "differs"};
    case EncounterRule::TextFields:
        // The observer A<SOH>B of issue 16, which an import used to store.
        return RuleCase{h + "2021-01-01,,MA,D1,,,,A\x01" "B,\n",
                        typed("2021-01-01", "MA", "D1", [](Encounter& e) { e.observer = "A\x01" "B"; }), "observer",
                        "'A\\x01B' holds the control character \\x01 (only tab may appear in text)"};
    case EncounterRule::Count: break;
    }
    return std::nullopt;
}

std::optional<RuleCase> supportCase(SupportRule rule, RuleColony& colony)
{
    // MA beats D1 in east on 2021-01-01; D2 is there too, SIRE is in west.
    auto typed = [&colony](std::vector<std::string> winnerSide, std::vector<std::string> loserSide) {
        return [&colony, winnerSide, loserSide] {
            Encounter e;
            e.date = day("2021-01-01");
            e.winner = "MA";
            e.loser = "D1";
            e.winnerSupport = winnerSide;
            e.loserSupport = loserSide;
            std::vector<Encounter> one{e};
            const FieldProblems p = insertEncounters(colony.store(), one, kToday);
            EXPECT_EQ(colony.store().encounterCount(), 0) << "a refused encounter was written";
            return p;
        };
    };
    const std::string h = "date,time,winner,loser,outcome,behaviour,group,observer,note,winner_support,loser_support\n";
    const std::string row = "2021-01-01,,MA,D1,,,,,,";
    switch (rule) {
    case SupportRule::SupporterKnown:
        return RuleCase{h + row + "NOPE,\n", typed({"NOPE"}, {}), "winner_support", "not an animal of the colony"};
    case SupportRule::NotAParticipant:
        return RuleCase{h + row + "D1,\n", typed({"D1"}, {}), "winner_support", "is the loser"};
    case SupportRule::ListedOnce:
        return RuleCase{h + row + ",D2  D2\n", typed({}, {"D2", "D2"}), "loser_support", "listed twice"};
    case SupportRule::OneSide:
        return RuleCase{h + row + "D2,D2\n", typed({"D2"}, {"D2"}), "loser_support", "also supports the winner"};
    case SupportRule::PresentInGroup:
        return RuleCase{h + row + "SIRE,\n", typed({"SIRE"}, {}), "winner_support", "was in group 'west'"};
    case SupportRule::Count: break;
    }
    return std::nullopt;
}

/// Runs the case of every value of `Rule` below its Count; a value without a case fails.
template <typename Rule, typename MakeCase>
void expectEveryRuleBothWays(RuleColony& colony, const std::string& file, MakeCase makeCase)
{
    for (int i = 0; i < static_cast<int>(Rule::Count); ++i) {
        const auto rule = static_cast<Rule>(i);
        const std::optional<RuleCase> c = makeCase(rule);
        if (!c) ADD_FAILURE() << "no case for the rule " << ruleName(rule);
        else expectSameBothWays(colony, file, ruleName(rule), *c);
    }
}

template <typename Rule>
int addNames(std::set<std::string>& names)
{
    for (int i = 0; i < static_cast<int>(Rule::Count); ++i) names.insert(ruleName(static_cast<Rule>(i)));
    return static_cast<int>(Rule::Count);
}

} // namespace

TEST(RecordRules, EveryAnimalRuleReadsTheSameInAnImportAndByHand)
{
    RuleColony colony;
    expectEveryRuleBothWays<AnimalRule>(colony, "animals", [&](AnimalRule r) { return animalCase(r, colony.colony()); });
}

TEST(RecordRules, EveryResidenceRuleReadsTheSameInAnImportAndByHand)
{
    RuleColony colony;
    expectEveryRuleBothWays<ResidenceRule>(colony, "residences",
                                           [&](ResidenceRule r) { return residenceCase(r, colony.colony()); });
}

TEST(RecordRules, EveryEncounterRuleReadsTheSameInAnImportAndByHand)
{
    RuleColony colony;
    expectEveryRuleBothWays<EncounterRule>(colony, "encounters", [&](EncounterRule r) { return encounterCase(r, colony); });
}

TEST(RecordRules, EverySupportRuleReadsTheSameInAnImportAndByHand)
{
    RuleColony colony;
    expectEveryRuleBothWays<SupportRule>(colony, "encounters", [&](SupportRule r) { return supportCase(r, colony); });
}

TEST(RecordRules, ASupporterDeadThatDayIsRefusedWithItsLine)
{
    // D2 died on 2023-02-01 (kBaseAnimals); line 3 names her as a supporter on 2023-05-01.
    RuleColony colony;
    ImportPaths paths;
    TempDir dir;
    paths.encounters = dir.write("e.csv", "date,winner,loser,loser_support\n2021-01-01,MA,D1,D2\n2023-05-01,MA,D1,D2\n");
    const ImportResult r = importFiles(colony.store(), paths, kToday);
    ASSERT_FALSE(r.ok());
    EXPECT_EQ(r.problems.list().front().text(),
              paths.encounters + ":3: loser_support: 'D2' was not alive in the colony on 2023-05-01");
    EXPECT_EQ(colony.store().encounterCount(), 0);
}

TEST(RecordRules, EveryRuleHasItsOwnName)
{
    std::set<std::string> names;
    const int rules = addNames<AnimalRule>(names) + addNames<ResidenceRule>(names) + addNames<EncounterRule>(names) +
                      addNames<SupportRule>(names);
    EXPECT_EQ(names.size(), static_cast<size_t>(rules));
    EXPECT_EQ(names.count("?"), 0U);
}

TEST(RecordRules, PassingEncounterFillsItsGroup)
{
    RuleColony colony;
    const ResidenceIndex where(colony.colony().animals, colony.colony().residences);
    Encounter e;
    e.date = day("2021-01-01");
    e.winner = "MA";
    e.loser = "D1";
    EXPECT_TRUE(checkEncounter(e, where, kToday).empty());
    EXPECT_EQ(e.group, "east");
}

// A NUL byte, a C1 control and a line break in the other text fields of an
// encounter are refused at import with FILE:LINE: column, and echoed escaped;
// a tab is allowed.
TEST(RecordRules, ControlCharactersInEveryEncounterTextFieldAreRefusedAndEscaped)
{
    RuleColony colony;
    const std::string h = kEncounterHeader;
    struct Case {
        std::string row;
        std::string column;
        std::string shown;
    };
    const std::vector<Case> cases = {
        {h + "2021-01-01,,MA,D1,,dis" + std::string(1, '\0') + "place,,,\n", "behaviour", "'dis\\x00place'"},
        {h + "2021-01-01,,MA,D1,,,,,\"two\nlines\"\n", "note", "'two\\x0alines'"},
        {h + "2021-01-01,,MA,D1,,,,,x\xc2\x85y\n", "note", "'x\\u0085y'"},
        {h + "2021-01-01,,MA,D1,,,ea\x1bst,,\n", "group", "'ea\\x1bst'"},
    };
    for (const Case& c : cases) {
        const auto p = colony.importProblem("encounters", c.row, c.column);
        ASSERT_TRUE(p) << c.row;
        EXPECT_EQ(p->message.rfind(c.shown + " holds the control character", 0), 0U) << p->message;
        for (char ch : p->text()) EXPECT_FALSE(static_cast<unsigned char>(ch) < 0x20) << p->text();
    }
    EXPECT_EQ(colony.store().encounterCount(), 0);
    // A tab is text.
    FieldProblems none;
    checkPlainText("a\tb", "note", none);
    EXPECT_TRUE(none.empty());
}
