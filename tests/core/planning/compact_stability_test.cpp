// SPDX-License-Identifier: GPL-3.0-or-later
// The stability watch on compact records against the watch on records (the
// older path is the reference: an identity check), on the demo colony and on
// random colonies with severe behaviour codes, draws and same-day encounters.
#include "core/planning/stability_watch.h"

#include "core/pedigree/matriline.h"
#include "demo_fixture.h"
#include "random_colony.h"

#include <gtest/gtest.h>

#include <bit>
#include <random>
#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

/// Every figure of a series, numbers by their bits.
std::string text(const StabilitySeries& s)
{
    std::ostringstream out;
    out << s.group << ' ' << bits(s.medianSevereRate) << '\n';
    for (const StabilityPeriod& p : s.periods) {
        out << p.period.start << ' ' << p.encounters << ' ' << p.decided << ' ' << p.counterDominant << ' '
            << bits(p.counterShare) << ' ' << p.rankedAnimals << ' ' << bits(p.rankChangePerAnimal) << ' ' << p.severe
            << ' ' << p.animalDays << ' ' << bits(p.severePerAnimalDay) << '\n';
        for (const CounterDominantDyad& d : p.dyads) {
            out << " d " << d.winner << ' ' << d.loser << ' ' << d.winnerLine << ' ' << d.loserLine << ' ' << d.count;
            for (Day day : d.dates) out << ' ' << day;
            out << '\n';
        }
        for (const MatrilinePairCount& m : p.matrilinePairs) out << " m " << m.winnerLine << ' ' << m.loserLine << ' ' << m.count << '\n';
        if (p.topLinePair) out << " t " << p.topLinePair->winnerLine << ' ' << p.topLinePair->loserLine << '\n';
        for (const SevereEncounter& e : p.severeEncounters)
            out << " s " << e.date << ' ' << e.winner << ' ' << e.loser << ' ' << e.behaviour << '\n';
    }
    for (const StabilityAlert& a : s.alerts)
        out << "a " << a.period << ' ' << toString(a.signal) << ' ' << bits(a.value) << ' ' << bits(a.threshold) << '\n';
    return out.str();
}

/// Both watches must agree; returns the record path's series.
StabilitySeries expectSameWatch(const Colony& colony, const StabilityOptions& o, const std::string& label)
{
    const ResidenceIndex where(colony.animals, colony.residences);
    const Matrilines lines(colony);
    const CompactEncounters compact = compactEncounters(colony.encounters);
    StabilitySeries series = stabilityWatch(colony, where, lines, o);
    EXPECT_EQ(text(series), text(stabilityWatch(compact, colony.animals, where, lines, o))) << label;
    // The stability badge's worker checks each group on its own scope (scopesOf, cut for every group at once).
    EXPECT_EQ(text(series), text(stabilityWatch(scopeOf(compact, o.group), colony.animals, where, lines, o))) << label;
    const std::vector<CompactEncounters> scopes = scopesOf(compact, {"elsewhere", o.group, "G1"});
    EXPECT_EQ(text(series), text(stabilityWatch(scopes[1], colony.animals, where, lines, o))) << label;
    return series;
}

} // namespace

TEST(CompactStability, DemoColonyWatchIsIdenticalToTheRecordPath)
{
    for (PeriodLength length : {PeriodLength::Week, PeriodLength::Month}) {
        StabilityOptions o;
        o.group = demo::kGroup;
        o.length = length;
        o.severity = {{"displace", 1}, {"avoid", 1}, {"threat", 2}, {"grab", 3}, {"chase", 3}, {"bite", 5}};
        expectSameWatch(hierloom::test::demoColony(), o, "demo " + std::to_string(static_cast<int>(length)));
    }
}

TEST(CompactStability, RandomColoniesWatchIdenticallyToTheRecordPath)
{
    std::mt19937_64 rng(77);
    auto below = [&](int n) { return static_cast<int>(rng() % static_cast<std::uint64_t>(n)); };
    int severe = 0, dyads = 0, alerts = 0;
    for (int round = 0; round < 40; ++round) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 3 + below(15);
        shape.groups = 1 + below(3);
        shape.encounters = below(600);
        shape.days = 1 + below(200);
        const Colony colony = hierloom::test::randomColony(rng(), shape);
        StabilityOptions o;
        o.group = "G" + std::to_string(1 + below(shape.groups));
        o.length = below(2) == 0 ? PeriodLength::Week : PeriodLength::Month;
        o.elo.draws = below(2) == 0 ? DrawPolicy::Half : DrawPolicy::Ignore;
        o.severity = {{"chase", 3}, {"bite", 5}};
        o.thresholds.severeAtLeast = 3;
        o.thresholds.minSevere = 1;
        o.thresholds.minDecided = 2;
        o.thresholds.rankChangePerAnimal = 0.5;
        if (below(3) == 0) o.from = 18000 + below(100);
        const StabilitySeries s = expectSameWatch(colony, o, "round " + std::to_string(round));
        for (const StabilityPeriod& p : s.periods) {
            severe += p.severe;
            dyads += static_cast<int>(p.dyads.size());
        }
        alerts += static_cast<int>(s.alerts.size());
        if (HasFailure()) break;
    }
    // The rounds reach every part of the watch: severe encounters, counter-dominant dyads, alerts.
    EXPECT_GT(severe, 0);
    EXPECT_GT(dyads, 0);
    EXPECT_GT(alerts, 0);
}
