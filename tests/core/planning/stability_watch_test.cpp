// SPDX-License-Identifier: GPL-3.0-or-later
// The stability watch (core/planning/stability_watch.h), its stored thresholds, saved
// scenarios and the scenario text writer, on the demo colony and small cases.
#include "core/planning/stability_watch.h"

#include "core/demo/demo_colony.h"
#include "core/demo/demo_colony_file.h"
#include "core/pedigree/group_composition.h"
#include "core/pedigree/matriline.h"
#include "core/store/saved_scenarios.h"
#include "core/planning/scenario_file.h"
#include "core/store/stability_settings.h"
#include "demo_fixture.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <set>

using namespace hierloom::core;
using hierloom::test::demoColony;
using hierloom::test::facts;
using hierloom::test::TempDir;

namespace {

/// The severities of a new colony file's behaviour codes (colony_schema.cpp).
std::map<std::string, int, std::less<>> defaultSeverities()
{
    return {{"displace", 1}, {"avoid", 1}, {"threat", 2}, {"grab", 3}, {"chase", 3}, {"bite", 5}};
}

StabilitySeries demoSeries(PeriodLength length)
{
    const Colony& c = demoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    StabilityOptions o;
    o.group = demo::kGroup;
    o.length = length;
    o.severity = defaultSeverities();
    return stabilityWatch(c, where, lines, o);
}

std::set<size_t> alertedPeriods(const StabilitySeries& s)
{
    std::set<size_t> out;
    for (const StabilityAlert& a : s.alerts) out.insert(a.period);
    return out;
}

} // namespace

// The generator's scenario (demo_colony.h): matriline C overthrows B between
// kRevoltStart and kRevoltEnd with a burst of chases and bites; the rest of the
// record follows a steady latent order. With the default thresholds, exactly the
// three months the revolt touches alert.
TEST(StabilityWatch, DemoRevoltAlertsInItsMonthsOnly)
{
    const StabilitySeries s = demoSeries(PeriodLength::Month);
    const Day start = toDay(demo::kRevoltStart), end = toDay(demo::kRevoltEnd);
    ASSERT_EQ(s.periods.size(), 84u); // 2019-01 .. 2025-12
    for (size_t p = 0; p < s.periods.size(); ++p) {
        const CalendarPeriod& period = s.periods[p].period;
        const bool revolt = period.end >= start && period.start <= end;
        EXPECT_EQ(alertedPeriods(s).count(p) == 1, revolt) << formatDate(period.start);
    }
    // Evidence: the counter-dominance of the revolt months falls between lines B and C.
    const std::string lineB = facts().matriarchs.at('B'), lineC = facts().matriarchs.at('C');
    for (const StabilityAlert& a : s.alerts) {
        if (a.signal != StabilitySignal::CounterDominance) continue;
        const StabilityPeriod& sp = s.periods[a.period];
        ASSERT_TRUE(sp.topLinePair);
        EXPECT_EQ(std::set<std::string>({sp.topLinePair->winnerLine, sp.topLinePair->loserLine}),
                  std::set<std::string>({lineB, lineC}));
        EXPECT_FALSE(sp.dyads.empty());
        const std::string text = describeAlert(s, a);
        EXPECT_NE(text.find(lineB), std::string::npos) << text;
        EXPECT_NE(text.find(lineC), std::string::npos) << text;
    }
}

// Weekly: nearly every week inside the revolt alerts (its fights come in bursts
// as each C-line female turns on the B line on her own day); no week more than a
// week away from the revolt does.
TEST(StabilityWatch, DemoRevoltAlertsInItsWeeks)
{
    const StabilitySeries s = demoSeries(PeriodLength::Week);
    const Day start = toDay(demo::kRevoltStart), end = toDay(demo::kRevoltEnd);
    const std::set<size_t> alerted = alertedPeriods(s);
    int inside = 0, insideAlerted = 0;
    for (size_t p = 0; p < s.periods.size(); ++p) {
        const CalendarPeriod& w = s.periods[p].period;
        if (w.start >= start && w.end <= end) {
            ++inside;
            insideAlerted += alerted.count(p) ? 1 : 0;
        }
        const bool calm = w.end < start - 7 || w.start > end + 7;
        if (calm) EXPECT_EQ(alerted.count(p), 0u) << formatDate(w.start);
    }
    EXPECT_EQ(inside, 11); // 2023-05-15 (a Monday) .. 2023-07-30
    EXPECT_GE(insideAlerted, 9);
    // The first full week of the revolt alerts on both signals.
    bool counter = false, severe = false;
    for (const StabilityAlert& a : s.alerts) {
        if (s.periods[a.period].period.start != start) continue;
        counter |= a.signal == StabilitySignal::CounterDominance;
        severe |= a.signal == StabilitySignal::SevereAggression;
    }
    EXPECT_TRUE(counter);
    EXPECT_TRUE(severe);
}

// A hand-worked case: the first encounter of a pair ranks nobody (both unrated),
// the second is won by the higher-rated animal, the third by the lower-rated one.
TEST(StabilityWatch, CountsCounterDominanceAndSevereByHand)
{
    Colony c;
    for (const char* id : {"A", "B", "C"}) {
        Animal a;
        a.id = id;
        a.sex = Sex::Female;
        a.birth = dayFromCivil(2010, 1, 1);
        c.animals.push_back(a);
        c.residences.push_back({id, "G", dayFromCivil(2010, 1, 1), std::nullopt, {}});
    }
    c.reindex();
    const Day d1 = dayFromCivil(2024, 3, 4), d2 = dayFromCivil(2024, 3, 5);
    auto enc = [&](Day d, const char* w, const char* l, const char* b) {
        Encounter e;
        e.date = d;
        e.winner = w;
        e.loser = l;
        e.behaviour = b;
        e.group = "G";
        e.seq = static_cast<std::int64_t>(c.encounters.size()) + 1;
        c.encounters.push_back(e);
    };
    enc(d1, "A", "B", "displace"); // unrated pair: not counted
    enc(d1, "A", "B", "threat");   // A rated above B and wins: decided, not counter
    enc(d2, "B", "A", "bite");     // B below A wins: counter-dominant, severe
    enc(d2, "C", "A", "bite");     // C unrated: not counted, severe
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    StabilityOptions o;
    o.group = "G";
    o.length = PeriodLength::Month;
    o.severity = defaultSeverities();
    const StabilitySeries s = stabilityWatch(c, where, lines, o);
    ASSERT_EQ(s.periods.size(), 1u);
    const StabilityPeriod& p = s.periods[0];
    EXPECT_EQ(p.encounters, 4);
    EXPECT_EQ(p.decided, 2);
    EXPECT_EQ(p.counterDominant, 1);
    ASSERT_TRUE(p.counterShare);
    EXPECT_DOUBLE_EQ(*p.counterShare, 0.5);
    EXPECT_EQ(p.severe, 2);
    EXPECT_EQ(p.animalDays, 6); // two observed days x three residents
    ASSERT_TRUE(p.severePerAnimalDay);
    EXPECT_DOUBLE_EQ(*p.severePerAnimalDay, 2.0 / 6.0);
    ASSERT_EQ(p.dyads.size(), 1u);
    EXPECT_EQ(p.dyads[0].winner, "B");
    EXPECT_EQ(p.dyads[0].dates, std::vector<Day>{d2});
    // A and B head lines of their own: the counter-dominant encounter falls between them.
    ASSERT_TRUE(p.topLinePair);
    EXPECT_EQ(p.topLinePair->winnerLine, "B");
    EXPECT_EQ(p.topLinePair->count, 1);
    EXPECT_FALSE(p.rankChangePerAnimal); // the first period has no previous end
}

TEST(StabilityWatch, ThresholdsRoundTripThroughTheColonyFile)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("t.hierloom"));
    const StabilityThresholds defaults;
    EXPECT_EQ(readStabilityThresholds(store).minSevere, defaults.minSevere);
    StabilityThresholds t;
    t.counterShare = 0.2;
    t.minDecided = 30;
    t.linePairPerWeek = 4.5;
    t.rankChangePerAnimal = 1.25;
    t.severeAtLeast = 5;
    t.severeFactor = 2.5;
    t.minSevere = 2;
    writeStabilityThresholds(store, t);
    const StabilityThresholds back = readStabilityThresholds(store);
    EXPECT_EQ(back.counterShare, 0.2);
    EXPECT_EQ(back.minDecided, 30);
    EXPECT_EQ(back.linePairPerWeek, 4.5);
    EXPECT_EQ(back.rankChangePerAnimal, 1.25);
    EXPECT_EQ(back.severeAtLeast, 5);
    EXPECT_EQ(back.severeFactor, 2.5);
    EXPECT_EQ(back.minSevere, 2);
    store.setSetting(stability_keys::kCounterShare, "lots"); // unreadable: the default
    EXPECT_EQ(readStabilityThresholds(store).counterShare, defaults.counterShare);
    EXPECT_EQ(behaviourSeverities(store), defaultSeverities());
}

// A scenario written with formatScenarioText, saved in the colony file and read
// back parses to the same scenario and the same text.
TEST(SavedScenarios, SavedScenarioReopensIdentical)
{
    TempDir dir;
    const std::string path = dir.file("demo.hierloom");
    createDemoColonyFile(path);
    const Colony colony = ColonyStore::open(path, ColonyStore::Mode::ReadOnly).load();
    Scenario s;
    s.at = dayFromCivil(2024, 5, 1);
    s.group = demo::kGroup;
    s.rule = SiblingRule::Eldest;
    s.maturityYears = 3;
    s.recentDays = 90;
    s.newbornsAsAdults = false;
    const auto& m = facts().matriarchs;
    s.matrilineOrder = {m.at('A'), m.at('C'), m.at('B')};
    ScenarioChange birth;
    birth.kind = ScenarioChange::Kind::Birth;
    birth.animal = m.at('A');
    birth.sex = Sex::Female;
    birth.newId = "BABY1";
    ScenarioChange intro;
    intro.kind = ScenarioChange::Kind::Introduce;
    intro.animal = "NEW1";
    ScenarioChange split;
    split.kind = ScenarioChange::Kind::Split;
    split.matriarchs = {m.at('D')};
    split.toGroup = "South Pen";
    s.changes = {birth, intro, split};
    const std::string text = formatScenarioText(s);
    {
        ColonyStore store = ColonyStore::open(path);
        saveScenarioText(store, "spring split", text);
        saveScenarioText(store, "another", "remove X\n");
    }
    ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(savedScenarioNames(store), (std::vector<std::string>{"another", "spring split"}));
    const auto back = savedScenarioText(store, "spring split");
    ASSERT_TRUE(back);
    EXPECT_EQ(*back, text);
    const ScenarioFileResult parsed = parseScenarioText(*back, "spring split", colony);
    ASSERT_TRUE(parsed.scenario) << (parsed.errors.empty() ? "" : parsed.errors.front());
    const Scenario& r = *parsed.scenario;
    EXPECT_EQ(r.at, s.at);
    EXPECT_EQ(r.group, s.group);
    EXPECT_EQ(r.rule, s.rule);
    EXPECT_EQ(r.maturityYears, s.maturityYears);
    EXPECT_EQ(r.recentDays, s.recentDays);
    EXPECT_EQ(r.newbornsAsAdults, s.newbornsAsAdults);
    EXPECT_EQ(r.matrilineOrder, s.matrilineOrder);
    ASSERT_EQ(r.changes.size(), 3u);
    for (size_t i = 0; i < 3; ++i) {
        EXPECT_EQ(r.changes[i].kind, s.changes[i].kind);
        EXPECT_EQ(r.changes[i].animal, s.changes[i].animal);
        EXPECT_EQ(r.changes[i].newId, s.changes[i].newId);
        EXPECT_EQ(r.changes[i].matriarchs, s.changes[i].matriarchs);
        EXPECT_EQ(r.changes[i].toGroup, s.changes[i].toGroup);
    }
    EXPECT_EQ(r.changes[0].sex, Sex::Female);
    EXPECT_EQ(formatScenarioText(r), text);
    EXPECT_FALSE(savedScenarioText(store, "missing"));
}

TEST(SavedScenarios, DeleteRemovesOnlyThatScenario)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("t.hierloom"));
    saveScenarioText(store, "a%", "remove X\n"); // LIKE wildcards in a name stay literal
    saveScenarioText(store, "ab", "remove Y\n");
    store.setSetting("species", "rhesus");
    deleteSavedScenario(store, "a%");
    EXPECT_EQ(savedScenarioNames(store), std::vector<std::string>{"ab"});
    EXPECT_EQ(store.setting("species"), "rhesus");
    EXPECT_THROW(saveScenarioText(store, "", "x"), std::invalid_argument);
}

// Splitting whole matrilines (scenario `split`): every matriline of the group
// stays in one group afterwards, the moved ones in the new group; the group
// composition counts them there (demo matriarchs from demoColonyFacts()).
TEST(ScenarioComposition, SplitKeepsEveryMatrilineWhole)
{
    const Colony& c = demoColony();
    const auto& m = facts().matriarchs;
    Scenario s;
    s.at = dayFromCivil(2024, 5, 1);
    s.group = demo::kGroup;
    ScenarioChange split;
    split.kind = ScenarioChange::Kind::Split;
    split.matriarchs = {m.at('C'), m.at('D')};
    split.toGroup = "South Pen";
    s.changes = {split};
    const Colony after = scenarioColony(c, s);
    const ResidenceIndex where(after.animals, after.residences);
    const Matrilines lines(after);
    std::map<std::string, std::set<int>> groupsOfLine;
    for (const Animal& a : after.animals) {
        const int k = where.animal(a.id);
        const int g = where.groupOn(k, *s.at);
        if (g >= 0) groupsOfLine[lines.id(lines.matriarch(lines.index(a.id)))].insert(g);
    }
    const int south = where.group("South Pen");
    ASSERT_GE(south, 0);
    for (const auto& [head, groups] : groupsOfLine) {
        EXPECT_EQ(groups.size(), 1u) << head;
        const bool moved = head == m.at('C') || head == m.at('D');
        EXPECT_EQ(*groups.begin() == south, moved) << head;
    }
    const auto comp = groupComposition(after, where, *s.at, {demo::kGroup, "South Pen"}, 4);
    ASSERT_EQ(comp.size(), 2u);
    EXPECT_EQ(comp[1].matriarchs, (std::vector<std::string>{std::min(m.at('C'), m.at('D')), std::max(m.at('C'), m.at('D'))}));
    // Before the split the two groups together hold what the one group held.
    const ResidenceIndex where0(c.animals, c.residences);
    const auto comp0 = groupComposition(c, where0, *s.at, {demo::kGroup}, 4);
    EXPECT_EQ(comp[0].animals + comp[1].animals, comp0[0].animals);
    EXPECT_EQ(comp[0].matrilines + comp[1].matrilines, comp0[0].matrilines);
    EXPECT_EQ(comp[0].adultFemales + comp[1].adultFemales, comp0[0].adultFemales);
    ASSERT_TRUE(comp0[0].adultSexRatio);
    EXPECT_DOUBLE_EQ(*comp0[0].adultSexRatio, static_cast<double>(comp0[0].adultFemales) / comp0[0].adultMales);
}
