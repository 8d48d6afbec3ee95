// SPDX-License-Identifier: GPL-3.0-or-later
// Checks of the invented demo colony against the scenario it promises
// (core/demo/demo_colony.h, demo-colony/README.md) and the import rules of docs/file-formats.md.
#include "core/store/colony_csv_export.h"
#include "core/demo/demo_colony.h"
#include "demo_fixture.h"

#include <gtest/gtest.h>

#include <fstream>
#include <map>
#include <regex>
#include <set>
#include <sstream>

using namespace hierloom::core;
using hierloom::test::demoColony;
using hierloom::test::facts;

namespace {


const Animal& animal(const std::string& id)
{
    const int i = demoColony().animalIndex(id);
    EXPECT_GE(i, 0) << id;
    return demoColony().animals.at(static_cast<size_t>(i));
}

bool resident(const Animal& a, Day d) { return a.entry && *a.entry <= d && (!a.exit || d <= *a.exit); }

std::string readFile(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    EXPECT_TRUE(in.good()) << path;
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

bool sameEncounter(const Encounter& a, const Encounter& b)
{
    return a.date == b.date && a.time == b.time && a.winner == b.winner && a.loser == b.loser &&
           a.outcome == b.outcome && a.behaviour == b.behaviour && a.group == b.group &&
           a.observer == b.observer && a.note == b.note && a.seq == b.seq && a.uid == b.uid;
}

// Decided wins of adult females of line `w` over adult females of line `l` in [from, to].
int lineWins(char w, char l, Day from, Day to)
{
    int wins = 0;
    for (const Encounter& e : demoColony().encounters) {
        if (e.date < from || e.date > to || e.outcome != Outcome::Decided) continue;
        const Animal& a = animal(e.winner);
        const Animal& b = animal(e.loser);
        if (a.sex != Sex::Female || b.sex != Sex::Female) continue;
        if (ageInYears(*a.birth, e.date) < 4 || ageInYears(*b.birth, e.date) < 4) continue;
        auto la = facts().lineOf.find(a.id), lb = facts().lineOf.find(b.id);
        if (la != facts().lineOf.end() && lb != facts().lineOf.end() && la->second == w && lb->second == l) ++wins;
    }
    return wins;
}

} // namespace

// Same seed, same record: every field of every row (the generator promises determinism).
TEST(DemoColony, DeterministicForASeed)
{
    const Colony again = generateDemoColony(demo::kDefaultSeed);
    const Colony& c = demoColony();
    ASSERT_EQ(again.animals.size(), c.animals.size());
    ASSERT_EQ(again.encounters.size(), c.encounters.size());
    ASSERT_EQ(again.residences.size(), c.residences.size());
    for (size_t i = 0; i < c.animals.size(); ++i) {
        const Animal &x = c.animals[i], &y = again.animals[i];
        EXPECT_TRUE(x.id == y.id && x.name == y.name && x.sex == y.sex && x.birth == y.birth &&
                    x.mother == y.mother && x.father == y.father && x.entry == y.entry &&
                    x.entryType == y.entryType && x.exit == y.exit && x.exitType == y.exitType && y.uid.empty())
            << i;
    }
    for (size_t i = 0; i < c.encounters.size(); ++i)
        EXPECT_TRUE(sameEncounter(c.encounters[i], again.encounters[i])) << i;
    // Another seed gives another record (the seed is really used).
    const Colony other = generateDemoColony(7);
    bool differs = other.encounters.size() != c.encounters.size();
    for (size_t i = 0; !differs && i < c.encounters.size(); ++i)
        differs = !sameEncounter(c.encounters[i], other.encounters[i]);
    EXPECT_TRUE(differs);
}

// The scenario sizes the brief asks for.
TEST(DemoColony, Counts)
{
    const Colony& c = demoColony();
    EXPECT_GE(c.animals.size(), 60u);
    EXPECT_LE(c.animals.size(), 140u);
    EXPECT_GE(c.encounters.size(), 15000u);

    int matriarchs = 0, introducedFemales = 0, removals = 0, deaths = 0;
    std::set<std::string> observers;
    for (const Animal& a : c.animals) {
        if (a.entryType == EntryType::Founder && a.sex == Sex::Female && a.mother.empty()) ++matriarchs;
        if (a.entryType == EntryType::Introduced && a.sex == Sex::Female) {
            ++introducedFemales;
            EXPECT_EQ(a.id, facts().introducedFemale);
            EXPECT_TRUE(a.mother.empty());
            EXPECT_EQ(a.entry, toDay(demo::kIntroduction));
        }
        if (a.exitType == ExitType::Removed) {
            ++removals;
            EXPECT_EQ(a.id, facts().removedAnimal);
            EXPECT_EQ(a.exit, toDay(demo::kRemoval));
        }
        if (a.exitType == ExitType::Died) ++deaths;
        EXPECT_TRUE(std::regex_match(a.id, std::regex("[A-Za-z0-9_.-]{1,32}"))) << a.id;
        EXPECT_TRUE(a.uid.empty());
    }
    for (const Encounter& e : c.encounters) observers.insert(e.observer);
    EXPECT_GE(matriarchs, 4);
    EXPECT_EQ(facts().matriarchs.size(), 5u);
    EXPECT_EQ(introducedFemales, 1);
    EXPECT_EQ(removals, 1);
    EXPECT_GE(deaths, 5);
    EXPECT_EQ(observers.size(), 3u);
    EXPECT_EQ(observers, std::set<std::string>(facts().observers.begin(), facts().observers.end()));
    EXPECT_GE(facts().reversals.size(), 3u);
    EXPECT_LE(facts().reversals.size(), 6u);
}

// Import rules of docs/file-formats.md: distinct ids, both alive and resident that day;
// the scenario adds: at least a year old, not on or after the exit day.
TEST(DemoColony, EncountersBetweenResidentAnimals)
{
    const Colony& c = demoColony();
    std::map<std::string, const Residence*> stint;
    for (const Residence& r : c.residences) {
        EXPECT_EQ(r.group, demo::kGroup);
        EXPECT_TRUE(stint.emplace(r.animal, &r).second) << "one stint per animal: " << r.animal;
    }
    EXPECT_EQ(stint.size(), c.animals.size());
    const std::set<std::string> behaviours = {"displace", "threat", "chase", "bite", "grab", "avoid"};
    size_t draws = 0, untimed = 0, noted = 0;
    std::int64_t seq = 0;
    for (const Encounter& e : c.encounters) {
        EXPECT_EQ(e.seq, ++seq);
        ASSERT_NE(e.winner, e.loser);
        for (const std::string& id : {e.winner, e.loser}) {
            const Animal& a = animal(id);
            ASSERT_TRUE(resident(a, e.date)) << id << " " << formatDate(e.date);
            const Residence& r = *stint.at(id);
            EXPECT_TRUE(r.from <= e.date && (!r.to || e.date <= *r.to));
            EXPECT_GE(e.date, anniversary(*a.birth, 1)) << id;
            if (a.exit) EXPECT_LT(e.date, *a.exit) << id;
        }
        EXPECT_GE(e.date, toDay(demo::kRecordStart));
        EXPECT_LE(e.date, toDay(demo::kRecordEnd));
        if (e.time) {
            EXPECT_GE(*e.time, 7 * 60);
            EXPECT_LE(*e.time, 17 * 60);
        } else {
            ++untimed;
        }
        EXPECT_EQ(behaviours.count(e.behaviour), 1u) << e.behaviour;
        EXPECT_EQ(e.group, demo::kGroup);
        if (e.outcome == Outcome::Draw) ++draws;
        if (!e.note.empty()) ++noted;
    }
    const double n = static_cast<double>(c.encounters.size());
    EXPECT_GT(draws / n, 0.005);
    EXPECT_LT(draws / n, 0.025);
    EXPECT_GT(untimed, 0u);
    EXPECT_LT(untimed / n, 0.02);
    EXPECT_LT(noted / n, 0.02);
}

// Pedigree rules of docs/file-formats.md, plus the scenario's own: mothers at least
// three years old and alive at the birth, fathers adult males resident at the birth.
TEST(DemoColony, PedigreeIsPlausible)
{
    for (const Animal& a : demoColony().animals) {
        ASSERT_TRUE(a.birth.has_value()) << a.id;
        if (a.entryType == EntryType::Born) EXPECT_EQ(a.entry, a.birth);
        if (!a.mother.empty()) {
            const Animal& m = animal(a.mother);
            EXPECT_EQ(m.sex, Sex::Female);
            EXPECT_LT(*m.birth, *a.birth);
            if (a.entryType == EntryType::Born) {
                EXPECT_TRUE(resident(m, *a.birth)) << a.id;
                EXPECT_GE(ageInYears(*m.birth, *a.birth), 3) << a.id;
            }
        } else {
            EXPECT_NE(a.entryType, EntryType::Born) << a.id;
        }
        if (!a.father.empty()) {
            const Animal& f = animal(a.father);
            EXPECT_EQ(f.sex, Sex::Male);
            EXPECT_GE(ageInYears(*f.birth, *a.birth), 4) << a.id;
        }
        if (a.exit) EXPECT_NE(a.exitType, ExitType::None);
    }
}

// Rhesus macaques are seasonal breeders: at least 80 % of births March-June.
TEST(DemoColony, BirthsAreSeasonal)
{
    int births = 0, inSeason = 0, withFather = 0;
    for (const Animal& a : demoColony().animals) {
        if (a.entryType != EntryType::Born) continue;
        ++births;
        const unsigned m = civilFromDay(*a.birth).month;
        if (m >= 3 && m <= 6) ++inSeason;
        if (!a.father.empty()) ++withFather;
    }
    ASSERT_GT(births, 30);
    EXPECT_GE(inSeason * 100, births * 80);
    EXPECT_GT(withFather, births * 3 / 4); // fathers known for most births
    EXPECT_LT(withFather, births);         // ... but not all
}

// The shipped files are exactly what the writer produces now
// (regenerate with make_demo_colony when the generator changes).
TEST(DemoColony, ShippedFilesMatchGenerator)
{
    const std::string dir = HIERLOOM_SOURCE_DIR "/demo-colony/";
    std::ostringstream animals, residences, encounters;
    writeAnimalsCsv(animals, demoColony());
    writeResidencesCsv(residences, demoColony());
    writeEncountersCsv(encounters, demoColony());
    EXPECT_TRUE(readFile(dir + "animals.csv") == animals.str());
    EXPECT_TRUE(readFile(dir + "residences.csv") == residences.str());
    EXPECT_TRUE(readFile(dir + "encounters.csv") == encounters.str());
}

// The planted revolt: B-line adult females beat C-line ones before it, the
// reverse in the year after it, with a burst of encounters during it.
TEST(DemoColony, RevoltOfLineCOverLineB)
{
    const Day start = toDay(demo::kRevoltStart), end = toDay(demo::kRevoltEnd);
    const int cBefore = lineWins('C', 'B', start - 365, start - 1);
    const int bBefore = lineWins('B', 'C', start - 365, start - 1);
    const int cAfter = lineWins('C', 'B', end + 1, end + 365);
    const int bAfter = lineWins('B', 'C', end + 1, end + 365);
    EXPECT_GE(cBefore + bBefore, 40);
    EXPECT_GE(cAfter + bAfter, 40);
    EXPECT_GE(bBefore, 4 * cBefore);
    EXPECT_GE(cAfter, 4 * bAfter);
    // ... and C stays above B to the end of the record.
    EXPECT_GE(lineWins('C', 'B', end + 1, toDay(demo::kRecordEnd)),
              4 * lineWins('B', 'C', end + 1, toDay(demo::kRecordEnd)));

    auto perDay = [&](Day from, Day to) {
        std::set<Day> days;
        size_t n = 0, severe = 0;
        for (const Encounter& e : demoColony().encounters) {
            if (e.date < from || e.date > to) continue;
            days.insert(e.date);
            ++n;
            if (e.behaviour == "chase" || e.behaviour == "bite") ++severe;
        }
        return std::pair{static_cast<double>(n) / static_cast<double>(days.size()),
                         static_cast<double>(severe) / static_cast<double>(n)};
    };
    const auto during = perDay(start, end);
    const auto before = perDay(start - 120, start - 1);
    const auto after = perDay(end + 1, end + 120);
    EXPECT_GT(during.first, 1.3 * before.first);
    EXPECT_GT(during.first, 1.3 * after.first);
    EXPECT_GT(during.second, before.second);
}

// Each planted reversal holds: the upper animal wins most decided encounters
// against the lower one over the record.
TEST(DemoColony, PlantedReversalsHold)
{
    for (const PlantedReversal& r : facts().reversals) {
        int up = 0, down = 0;
        for (const Encounter& e : demoColony().encounters) {
            if (e.outcome != Outcome::Decided) continue;
            if (e.winner == r.upper && e.loser == r.lower) ++up;
            if (e.winner == r.lower && e.loser == r.upper) ++down;
        }
        EXPECT_GE(up + down, 10) << r.description;
        EXPECT_GE(up, 3 * down) << r.description;
    }
    std::set<std::string> kinds;
    for (const PlantedReversal& r : facts().reversals) kinds.insert(toString(r.kind));
    EXPECT_EQ(kinds.size(), facts().reversals.size()); // one of each kind
}

// Matrilines: the founding matriarchs have no recorded mother; everyone in a
// line descends from its matriarch; the introduced female founds line E.
TEST(DemoColony, Matrilines)
{
    for (const auto& [letter, id] : facts().matriarchs) {
        EXPECT_TRUE(animal(id).mother.empty()) << letter;
        EXPECT_EQ(animal(id).sex, Sex::Female);
        EXPECT_EQ(animal(id).entryType, letter == 'E' ? EntryType::Introduced : EntryType::Founder);
    }
    EXPECT_EQ(facts().matriarchs.at('E'), facts().introducedFemale);
    for (const auto& [id, letter] : facts().lineOf) {
        std::string top = id;
        while (!animal(top).mother.empty()) top = animal(top).mother;
        EXPECT_EQ(top, facts().matriarchs.at(letter)) << id;
    }
    std::map<char, int> members;
    for (const auto& [id, letter] : facts().lineOf) ++members[letter];
    for (char l : std::string("ABCD")) EXPECT_GE(members[l], 6) << l;
    EXPECT_GE(members['E'], 2);
}
