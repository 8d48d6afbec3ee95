// SPDX-License-Identifier: GPL-3.0-or-later
// Data health on a hand-counted colony (docs/methods.md, "Data health").
#include "core/research/data_health.h"

#include "core/ranks/encounter_selection.h"
#include "core/ranks/randomised_elo.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

namespace {

Day d(const char* text) { return *parseDate(text); }

Encounter enc(const char* date, std::optional<const char*> time, const char* w, const char* l, const char* observer,
              Outcome outcome = Outcome::Decided, const char* group = "g")
{
    Encounter e;
    e.date = d(date);
    if (time) e.time = parseTimeOfDay(*time);
    e.winner = w;
    e.loser = l;
    e.outcome = outcome;
    e.group = group;
    e.observer = observer;
    return e;
}

/// A, B, C, D in group g since 2024-01-01, E joined g on 2024-03-01, F lives in h.
Colony handColony()
{
    Colony c;
    for (const char* id : {"A", "B", "C", "D", "F"}) {
        Animal a;
        a.id = id;
        a.entry = d("2024-01-01");
        c.animals.push_back(a);
        c.residences.push_back({id, id[0] == 'F' ? "h" : "g", d("2024-01-01"), std::nullopt, {}});
    }
    Animal e;
    e.id = "E";
    e.entry = d("2024-03-01");
    c.animals.push_back(e);
    c.residences.push_back({"E", "g", d("2024-03-01"), std::nullopt, {}});
    c.encounters = {
        enc("2024-02-20", "10:00", "A", "B", "X"),                 // before the window
        enc("2024-03-02", "09:00", "A", "B", "X"),                 // matches the next: agree
        enc("2024-03-02", "09:02", "A", "B", "Y"),
        enc("2024-03-02", "09:30", "B", "C", "X"),                 // matches the next: disagree
        enc("2024-03-02", "09:33", "C", "B", "Y"),
        enc("2024-03-02", "10:00", "A", "C", "X"),                 // 20 minutes apart: no match
        enc("2024-03-02", "10:20", "A", "C", "Y"),
        enc("2024-03-05", "11:00", "A", "B", "X", Outcome::Draw),  // X alone that day
        enc("2024-03-20", "08:00", "C", "A", "X"),                 // matches the next: agree
        enc("2024-03-20", "08:04", "C", "A", "Y"),
        enc("2024-04-02", "08:00", "A", "B", "X"),                 // after the window
    };
    for (size_t i = 0; i < c.encounters.size(); ++i) c.encounters[i].seq = static_cast<std::int64_t>(i + 1);
    c.reindex();
    return c;
}

HealthOptions windowOf(const char* from, const char* to)
{
    HealthOptions o;
    o.from = d(from);
    o.to = d(to);
    o.group = "g";
    o.minEncounters = 6;
    o.randomisations = 0;
    return o;
}

} // namespace

// Counted by hand from the list above.
TEST(DataHealth, EffortPerAnimalObserverAndMonth)
{
    const Colony c = handColony();
    const ResidenceIndex where(c.animals, c.residences);
    const DataHealth h = dataHealth(c, where, windowOf("2024-03-01", "2024-03-31"));
    ASSERT_EQ(h.animals.size(), 5u); // A..E: F lives in h
    auto animal = [&](const char* id) {
        for (const AnimalEffort& a : h.animals)
            if (a.animal == id) return a;
        ADD_FAILURE() << id;
        return AnimalEffort{};
    };
    EXPECT_EQ(animal("A").encounters, 7);
    EXPECT_EQ(animal("A").daysSeen, 3);
    EXPECT_EQ(animal("B").encounters, 5);
    EXPECT_EQ(animal("B").daysSeen, 2);
    EXPECT_EQ(animal("C").encounters, 6);
    EXPECT_EQ(animal("D").encounters, 0);
    EXPECT_EQ(animal("E").daysSeen, 0);
    // Too few for a stable rank below 6 here: B, D and E.
    EXPECT_FALSE(animal("A").fewEncounters);
    EXPECT_FALSE(animal("C").fewEncounters);
    EXPECT_TRUE(animal("B").fewEncounters);
    EXPECT_TRUE(animal("D").fewEncounters);
    EXPECT_EQ(animal("B").lastSeen, d("2024-03-05"));

    ASSERT_EQ(h.observers.size(), 2u);
    EXPECT_EQ(h.observers[0].observer, "X");
    EXPECT_EQ(h.observers[0].encounters, 5);
    EXPECT_EQ(h.observers[0].days, 3);
    EXPECT_EQ(h.observers[1].encounters, 4);
    EXPECT_EQ(h.observers[1].days, 2);

    ASSERT_EQ(h.months.size(), 1u);
    EXPECT_EQ(h.months[0].year, 2024);
    EXPECT_EQ(h.months[0].month, 3u);
    EXPECT_EQ(h.months[0].encounters, 9);
    EXPECT_EQ(h.months[0].days, 3);
    EXPECT_EQ(h.months[0].animals, 3);
}

TEST(DataHealth, ResidentsNotSeenForMoreThanNDays)
{
    const Colony c = handColony();
    const ResidenceIndex where(c.animals, c.residences);
    HealthOptions o = windowOf("2024-03-01", "2024-03-31");
    const DataHealth h = dataHealth(c, where, o);
    // On 2024-03-31: D never seen since 2024-01-01 (90 days), E never since
    // 2024-03-01 (30), B last on 2024-03-05 (26); A and C 11 days; F is in h.
    ASSERT_EQ(h.unseen.size(), 3u);
    EXPECT_EQ(h.unseen[0].animal, "D");
    EXPECT_EQ(h.unseen[0].days, 90);
    EXPECT_FALSE(h.unseen[0].lastSeen);
    EXPECT_EQ(h.unseen[1].animal, "E");
    EXPECT_EQ(h.unseen[1].days, 30);
    EXPECT_EQ(h.unseen[2].animal, "B");
    EXPECT_EQ(h.unseen[2].days, 26);
    o.unseenDays = 26; // more than 26 days: B drops out
    EXPECT_EQ(dataHealth(c, where, o).unseen.size(), 2u);
    o.unseenDays = 10; // A and C (11 days) join
    EXPECT_EQ(dataHealth(c, where, o).unseen.size(), 5u);
}

TEST(DataHealth, WindowEndingInThePastCountsToItsEnd)
{
    const Colony c = handColony();
    const ResidenceIndex where(c.animals, c.residences);
    HealthOptions o = windowOf("2024-03-01", "2024-03-10");
    o.today = d("2026-12-02");
    const DataHealth h = dataHealth(c, where, o);
    EXPECT_EQ(h.reference, d("2024-03-10"));
    EXPECT_EQ(h.referenceKind, ReferenceDay::WindowEnd);
    // On 2024-03-10 (counted by hand): D since 2024-01-01, 31 + 29 + 9 = 69 days;
    // E joined 2024-03-01, 9 days; A and B last on 2024-03-05, 5; C on 2024-03-02, 8.
    ASSERT_EQ(h.unseen.size(), 1u);
    EXPECT_EQ(h.unseen[0].animal, "D");
    EXPECT_EQ(h.unseen[0].days, 69);
    o.unseenDays = 7; // C (8 days) and E (9) join, E first
    const DataHealth seven = dataHealth(c, where, o);
    ASSERT_EQ(seven.unseen.size(), 3u);
    EXPECT_EQ(seven.unseen[1].animal, "E");
    EXPECT_EQ(seven.unseen[1].days, 9);
    EXPECT_EQ(seven.unseen[2].animal, "C");
    EXPECT_EQ(seven.unseen[2].days, 8);
}

TEST(DataHealth, OpenWindowCountsToTheFilesLastRecordNotToToday)
{
    Colony c = handColony();
    HealthOptions o;
    o.group = "g";
    o.randomisations = 0;
    o.today = d("2026-12-02"); // long after the last record, 2024-04-02
    {
        const ResidenceIndex where(c.animals, c.residences);
        const DataHealth h = dataHealth(c, where, o);
        EXPECT_EQ(h.reference, d("2024-04-02"));
        EXPECT_EQ(h.referenceKind, ReferenceDay::LastRecord);
        // On 2024-04-02 (by hand): D since 2024-01-01, 31 + 29 + 31 + 1 = 92 days;
        // E since 2024-03-01, 32; C last on 2024-03-20, 13; A and B on 2024-04-02, 0.
        ASSERT_EQ(h.unseen.size(), 2u);
        EXPECT_EQ(h.unseen[0].animal, "D");
        EXPECT_EQ(h.unseen[0].days, 92);
        EXPECT_EQ(h.unseen[1].animal, "E");
        EXPECT_EQ(h.unseen[1].days, 32);
        o.unseenDays = 12; // C (13 days) joins
        EXPECT_EQ(dataHealth(c, where, o).unseen.size(), 3u);
        o.unseenDays = 14;
    }
    // Records after "today" do not count: today 2024-03-25, the last record up to it is 2024-03-20.
    {
        HealthOptions early = o;
        early.today = d("2024-03-25");
        const ResidenceIndex where(c.animals, c.residences);
        const DataHealth h = dataHealth(c, where, early);
        EXPECT_EQ(h.reference, d("2024-03-20"));
        // D 31 + 29 + 19 = 79 days, E 19, B last on 2024-03-05, 15; A and C 0.
        ASSERT_EQ(h.unseen.size(), 3u);
        EXPECT_EQ(h.unseen[0].days, 79);
        EXPECT_EQ(h.unseen[1].animal, "E");
        EXPECT_EQ(h.unseen[1].days, 19);
        EXPECT_EQ(h.unseen[2].animal, "B");
        EXPECT_EQ(h.unseen[2].days, 15);
    }
    // The last record of any group counts: G and F in group h seen on 2024-04-10
    // make it the reference day of group g too (nobody recorded g since 2024-04-02).
    Animal g;
    g.id = "G";
    g.entry = d("2024-01-01");
    c.animals.push_back(g);
    c.residences.push_back({"G", "h", d("2024-01-01"), std::nullopt, {}});
    c.encounters.push_back(enc("2024-04-10", "08:00", "F", "G", "X", Outcome::Decided, "h"));
    c.encounters.back().seq = static_cast<std::int64_t>(c.encounters.size());
    c.reindex();
    {
        const ResidenceIndex where(c.animals, c.residences);
        const DataHealth h = dataHealth(c, where, o);
        EXPECT_EQ(h.reference, d("2024-04-10"));
        // D 92 + 8 = 100, E 40, C 21 days; A and B 8.
        ASSERT_EQ(h.unseen.size(), 3u);
        EXPECT_EQ(h.unseen[0].days, 100);
        EXPECT_EQ(h.unseen[1].days, 40);
        EXPECT_EQ(h.unseen[2].animal, "C");
        EXPECT_EQ(h.unseen[2].days, 21);
    }
    // Without any record the reference day is today.
    c.encounters.clear();
    c.reindex();
    const ResidenceIndex where(c.animals, c.residences);
    const DataHealth none = dataHealth(c, where, o);
    EXPECT_EQ(none.reference, d("2026-12-02"));
    EXPECT_EQ(none.referenceKind, ReferenceDay::Today);
}

TEST(DataHealth, ObserverAgreementByDyadAndTime)
{
    const Colony c = handColony();
    const ResidenceIndex where(c.animals, c.residences);
    HealthOptions o = windowOf("2024-03-01", "2024-03-31");
    DataHealth h = dataHealth(c, where, o);
    ASSERT_EQ(h.agreement.size(), 1u);
    const ObserverAgreement& a = h.agreement[0];
    EXPECT_EQ(a.first, "X");
    EXPECT_EQ(a.second, "Y");
    EXPECT_EQ(a.sharedDays, 2);
    EXPECT_EQ(a.matched, 3);
    EXPECT_EQ(a.onlyFirst, 1);
    EXPECT_EQ(a.onlySecond, 1);
    EXPECT_EQ(a.agreeing, 2);
    EXPECT_DOUBLE_EQ(*a.share, 2.0 / 3.0);
    // Hand-worked: categories (first id won, second won, draw); pairs (0,0),
    // (0,1), (1,1): p_o = 2/3, margins X 2/3,1/3 and Y 1/3,2/3, p_e = 4/9,
    // kappa = (2/3 - 4/9) / (5/9) = 0.4.
    EXPECT_NEAR(*a.kappa, 0.4, 1e-12);
    // With a 20-minute tolerance the A-C pair matches too (agreeing): 3 of 4.
    o.matchMinutes = 20;
    h = dataHealth(c, where, o);
    EXPECT_EQ(h.agreement[0].matched, 4);
    EXPECT_EQ(h.agreement[0].agreeing, 3);
}

// The interval width is randomised Elo's 97.5 % minus 2.5 % quantile (identity
// with core/ranks/randomised_elo.h); an animal without a counted bout has none.
TEST(DataHealth, IntervalWidthIsTheRandomisedEloSpread)
{
    const Colony c = handColony();
    const ResidenceIndex where(c.animals, c.residences);
    HealthOptions o = windowOf("2024-03-01", "2024-03-31");
    o.randomisations = 200;
    o.seed = 7;
    const DataHealth h = dataHealth(c, where, o);
    SelectionOptions sel;
    sel.from = o.from;
    sel.to = o.to;
    sel.group = "g";
    const EncounterSelection s = selectEncounters(c, where, sel);
    const auto rows = randomisedElo(s.size(), s.bouts, o.elo, 200, 7, 1);
    for (const AnimalEffort& a : h.animals) {
        const int i = s.indexOf(a.animal);
        if (i < 0) {
            EXPECT_FALSE(a.intervalWidth) << a.animal;
            continue;
        }
        ASSERT_TRUE(a.intervalWidth) << a.animal;
        EXPECT_DOUBLE_EQ(*a.intervalWidth, rows[static_cast<size_t>(i)].high - rows[static_cast<size_t>(i)].low);
        EXPECT_GT(*a.intervalWidth, 0);
    }
}

// Counted by hand from the list above: March A 7, B 5, C 6; April (2024-04-02) A 1, B 1.
TEST(DataHealth, PeriodFlagsCountEachPeriodOrRunOn)
{
    const Colony c = handColony();
    const std::vector<CalendarPeriod> periods{{d("2024-03-01"), d("2024-03-31")}, {d("2024-04-01"), d("2024-04-30")}};
    auto cells = [](const std::map<std::string, RankFlag>& m) {
        std::vector<std::string> out;
        for (const auto& [id, f] : m) out.push_back(id + ' ' + std::to_string(f.encounters) + (f.fewEncounters ? " few" : ""));
        return out;
    };
    // Each period alone (David's score, I&SI).
    const auto alone = periodRankFlags(c, periods, d("2024-03-01"), "g", 6, false);
    ASSERT_EQ(alone.size(), 2u);
    EXPECT_EQ(cells(alone[0]), (std::vector<std::string>{"A 7", "B 5 few", "C 6"}));
    EXPECT_EQ(cells(alone[1]), (std::vector<std::string>{"A 1 few", "B 1 few"}));
    // Running on from the window's start (Elo): April adds to March.
    const auto runOn = periodRankFlags(c, periods, d("2024-03-01"), "g", 6, true);
    EXPECT_EQ(cells(runOn[0]), cells(alone[0]));
    EXPECT_EQ(cells(runOn[1]), (std::vector<std::string>{"A 8", "B 6", "C 6"}));
    // Identity: one period is the same as rankFlags over it, and the flags agree with dataHealth.
    EXPECT_EQ(cells(rankFlags(c, d("2024-03-01"), d("2024-03-31"), "g", 6)), cells(alone[0]));
    const ResidenceIndex where(c.animals, c.residences);
    for (const AnimalEffort& a : dataHealth(c, where, windowOf("2024-03-01", "2024-03-31")).animals)
        EXPECT_EQ(a.fewEncounters, tooFewEncounters(a.encounters, 6)) << a.animal;
    EXPECT_TRUE(tooFewEncounters(9, 10));
    EXPECT_FALSE(tooFewEncounters(10, 10));
}

TEST(DataHealth, IntervalWidthsStopWhenCancelled)
{
    const Colony c = handColony();
    const ResidenceIndex where(c.animals, c.residences);
    HealthOptions o = windowOf("2024-03-01", "2024-03-31");
    o.randomisations = 200;
    const std::map<std::string, double> widths = eloIntervalWidths(c, where, o);
    const DataHealth h = dataHealth(c, where, o);
    ASSERT_EQ(widths.size(), 3u); // A, B, C have bouts in March
    for (const AnimalEffort& a : h.animals)
        if (a.intervalWidth) EXPECT_DOUBLE_EQ(*a.intervalWidth, widths.at(a.animal)) << a.animal;
    const std::atomic<bool> cancel{true};
    EXPECT_TRUE(eloIntervalWidths(c, where, o, &cancel).empty());
}
