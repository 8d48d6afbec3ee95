// SPDX-License-Identifier: GPL-3.0-or-later
// The rank timeline of core/pedigree/rank_timeline.h: each checkpoint must agree with a
// separate predictInheritance at that date (docs/methods.md "Matrilineal rank
// prediction"), and the demo colony's planted scenario must show in it.
#include "core/pedigree/rank_timeline.h"

#include "core/demo/demo_colony.h"
#include "pedigree_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

const Colony& demoColony()
{
    static const Colony c = generateDemoColony();
    return c;
}

} // namespace

TEST(RankTimeline, SmallColonyByHand)
{
    // Line M: M (1980) and her daughter D (2010); line N: N (1985). D beats her
    // mother in February 2021, against the youngest-ascendancy prediction M > D.
    const Colony c = PedigreeBuilder()
                         .female("M", "1980-01-01")
                         .female("D", "2010-01-01", "M")
                         .female("N", "1985-01-01")
                         .win("2021-01-10", "M", "N", 3)
                         .win("2021-01-12", "D", "N", 3)
                         .win("2021-02-03", "D", "M", 4)
                         .died("N", "2021-02-20")
                         .build();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const RankTimeline t = computeRankTimeline(c, where, lines, {});
    // Encounters run from 2021-01-10 to 2021-02-03: two monthly checkpoints, the
    // second clipped to the last encounter.
    ASSERT_EQ(t.checkpoints.size(), 2u);
    EXPECT_EQ(t.checkpoints[0], dayFromCivil(2021, 1, 31));
    EXPECT_EQ(t.checkpoints[1], dayFromCivil(2021, 2, 3));
    ASSERT_EQ(t.females.size(), 3u); // matriline order M (D, M), then N
    EXPECT_EQ(t.females[0].animal, "D");
    EXPECT_EQ(t.females[1].animal, "M");
    EXPECT_EQ(t.females[2].animal, "N");
    EXPECT_EQ(t.maxRank, 3);
    const RankTimelineFemale& d = t.females[0];
    const RankTimelineFemale& m = t.females[1];
    ASSERT_EQ(d.points.size(), 2u);
    // January: Elo by hand, k = 100 from 1000: M beats N three times, then D beats N
    // three times; M and D have equal-looking records but D met a weaker N, so
    // M (3 wins from 1000/1000) > D. Predicted: M 1, D 2, N 3 (line M first by best rank).
    EXPECT_EQ(m.points[0].predictedRank, 1);
    EXPECT_EQ(d.points[0].predictedRank, 2);
    EXPECT_EQ(*m.points[0].rank, 1);
    EXPECT_EQ(*d.points[0].rank, 2);
    EXPECT_FALSE(d.points[0].discordant());
    // 3 February: D has beaten M four times, so D is observed above her mother: discordant.
    EXPECT_EQ(*d.points[1].rank, 1);
    EXPECT_EQ(d.points[1].predictedRank, 2);
    EXPECT_EQ(d.points[1].discordantDyads, 1);
    EXPECT_EQ(m.points[1].discordantDyads, 1);
    // N dies after the record's last encounter; her death and birth are listed.
    const RankTimelineFemale& n = t.females[2];
    ASSERT_EQ(n.events.size(), 3u);
    EXPECT_EQ(n.events[0].kind, LifeEventKind::Birth);
    EXPECT_EQ(n.events[1].kind, LifeEventKind::Maturity);
    EXPECT_EQ(n.events[1].day, dayFromCivil(1989, 1, 1)); // four years after birth
    EXPECT_EQ(n.events[2].kind, LifeEventKind::Death);
    EXPECT_EQ(n.events[2].day, dayFromCivil(2021, 2, 20));
}

TEST(RankTimeline, EveryCheckpointEqualsAPredictionAtThatDate)
{
    const Colony& c = demoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const RankTimeline t = computeRankTimeline(c, where, lines, {});
    // The demo record runs 2019-01 to 2025-12 (demo_colony.h): 84 months.
    ASSERT_EQ(t.checkpoints.size(), 84u);
    // Identity: the single-pass timeline equals predictInheritance run at each date.
    for (size_t k = 0; k < t.checkpoints.size(); k += 7) {
        InheritanceOptions o;
        o.at = t.checkpoints[k];
        const InheritancePrediction p = predictInheritance(c, where, lines, o);
        int seen = 0;
        for (const RankTimelineFemale& f : t.females)
            for (const RankTimelinePoint& pt : f.points) {
                if (pt.day != t.checkpoints[k]) continue;
                ++seen;
                const int at = p.find(f.animal);
                ASSERT_GE(at, 0) << f.animal;
                const PredictedFemale& row = p.females[static_cast<size_t>(at)];
                EXPECT_EQ(pt.predictedRank, row.predictedRank) << f.animal;
                EXPECT_EQ(pt.rank, row.observedRank) << f.animal;
                EXPECT_EQ(pt.elo, row.observedScore) << f.animal;
                EXPECT_EQ(pt.discordantDyads, row.discordantDyads) << f.animal;
            }
        EXPECT_EQ(seen, static_cast<int>(p.females.size())) << formatDate(t.checkpoints[k]);
    }
}

TEST(RankTimeline, DemoScenarioShowsInTheTimeline)
{
    const Colony& c = demoColony();
    const DemoColonyFacts facts = demoColonyFacts();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    RankTimelineOptions options;
    options.step = TimelineStep::Week;
    const RankTimeline t = computeRankTimeline(c, where, lines, options);
    EXPECT_GT(t.checkpoints.size(), 360u); // seven years of weeks

    // The planted daughter-over-mother pair (demo-colony/README.md): at the last
    // checkpoint where both are ranked, the daughter is observed above her mother
    // though predicted below her, and both carry a discordant dyad.
    const auto planted = std::find_if(facts.reversals.begin(), facts.reversals.end(), [](const PlantedReversal& r) {
        return r.kind == PlantedReversalKind::DaughterOverMother;
    });
    ASSERT_NE(planted, facts.reversals.end());
    const int up = t.find(planted->upper), low = t.find(planted->lower);
    ASSERT_GE(up, 0);
    ASSERT_GE(low, 0);
    int both = 0;
    for (const RankTimelinePoint& a : t.females[static_cast<size_t>(up)].points)
        for (const RankTimelinePoint& b : t.females[static_cast<size_t>(low)].points)
            if (a.day == b.day && a.rank && b.rank) {
                ++both;
                EXPECT_GT(a.predictedRank, b.predictedRank);
                if (*a.rank < *b.rank) {
                    EXPECT_TRUE(a.discordant());
                    EXPECT_TRUE(b.discordant());
                }
            }
    EXPECT_GT(both, 100);

    // Life events of the scenario: the one removal and the one introduction.
    auto hasEvent = [&](const std::string& id, LifeEventKind kind, Day day) {
        const int i = t.find(id);
        if (i < 0) return false;
        for (const LifeEvent& e : t.females[static_cast<size_t>(i)].events)
            if (e.kind == kind && e.day == day) return true;
        return false;
    };
    EXPECT_TRUE(hasEvent(facts.removedAnimal, LifeEventKind::Removal, toDay(demo::kRemoval)));
    EXPECT_TRUE(hasEvent(facts.introducedFemale, LifeEventKind::Introduction, toDay(demo::kIntroduction)));
}

TEST(RankTimeline, CancelStopsAtTheNextCheckpoint)
{
    const Colony& c = demoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    std::atomic<bool> cancel{false};
    int calls = 0;
    const RankTimeline t = computeRankTimeline(c, where, lines, {}, &cancel, [&](int done, int total) {
        ++calls;
        EXPECT_EQ(total, 84);
        if (done == 10) cancel = true;
    });
    EXPECT_TRUE(t.cancelled);
    EXPECT_EQ(calls, 10);
    EXPECT_EQ(t.checkpoints.size(), 10u);
}
