// SPDX-License-Identifier: GPL-3.0-or-later
// The timeline's rank changes split into active and passive parts
// (docs/methods.md "Active and passive rank changes").
#include "core/pedigree/timeline_rank_changes.h"

#include "core/demo/demo_colony.h"
#include "core/pedigree/matriline.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

TEST(TimelineRankChanges, ADeathAboveByHand)
{
    // Hand-built timeline: at checkpoint 10, A 1, B 2, C 3; A is gone at 20,
    // where B is 1 and C 2. By hand: B and C each rose one place, passively.
    RankTimeline t;
    t.checkpoints = {10, 20};
    auto female = [&](const char* id, std::vector<std::pair<Day, int>> ranks) {
        RankTimelineFemale f;
        f.animal = id;
        for (const auto& [day, rank] : ranks) {
            RankTimelinePoint p;
            p.day = day;
            p.rank = rank;
            f.points.push_back(p);
        }
        t.females.push_back(f);
    };
    female("A", {{10, 1}});
    female("B", {{10, 2}, {20, 1}});
    female("C", {{10, 3}, {20, 2}});
    const auto changes = timelineRankChanges(t);
    ASSERT_EQ(changes.size(), 2u);
    EXPECT_EQ(changes[0].female, 1);
    EXPECT_EQ(changes[0].point, 1);
    EXPECT_EQ(changes[0].checkpoint, 1);
    EXPECT_EQ(changes[0].change.passive, 1);
    EXPECT_EQ(changes[0].change.active, 0);
    EXPECT_EQ(changes[1].change.total, 1);
}

TEST(TimelineRankChanges, DemoTimelineStepsSumToTheirTotals)
{
    // Generated colony (the seeded demo): every step satisfies active + passive = total
    // and total = the change of her observed rank between the two checkpoints.
    const Colony c = generateDemoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const RankTimeline t = computeRankTimeline(c, where, lines, RankTimelineOptions{});
    const auto changes = timelineRankChanges(t);
    ASSERT_GT(changes.size(), 100u);
    int active = 0, passive = 0;
    for (const TimelineRankChange& ch : changes) {
        EXPECT_EQ(ch.change.active + ch.change.passive, ch.change.total);
        const auto& pts = t.females[static_cast<size_t>(ch.female)].points;
        const RankTimelinePoint& now = pts[static_cast<size_t>(ch.point)];
        ASSERT_GT(ch.point, 0);
        const RankTimelinePoint& before = pts[static_cast<size_t>(ch.point) - 1];
        EXPECT_EQ(before.day, t.checkpoints[static_cast<size_t>(ch.checkpoint) - 1]);
        EXPECT_EQ(*before.rank - *now.rank, ch.change.total);
        active += ch.change.active != 0;
        passive += ch.change.passive != 0;
    }
    EXPECT_GT(active, 0);
    EXPECT_GT(passive, 0);
}
