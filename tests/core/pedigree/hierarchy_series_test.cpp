// SPDX-License-Identifier: GPL-3.0-or-later
// The monthly hierarchy series of core/pedigree/hierarchy_series.h against the
// `metrics` figures of each month and monthlyConformity (identities).
#include "core/pedigree/hierarchy_series.h"

#include "core/demo/demo_colony.h"
#include "core/pedigree/discordance.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/hierarchy_metrics.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

TEST(HierarchySeries, DemoMonthsMatchTheMetricsOfEachMonth)
{
    const Colony c = generateDemoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const HierarchySeries s = computeHierarchySeries(c, where, lines, {});
    ASSERT_EQ(s.months.size(), 84u); // 2019-01 to 2025-12 (demo_colony.h)
    EXPECT_FALSE(s.cancelled);
    long long total = 0;
    for (const HierarchyMonth& m : s.months) total += m.encounters;
    // Identity: the months partition the record's bouts.
    EXPECT_EQ(total, static_cast<long long>(selectEncounters(c, where, {}).bouts.size()));
    const ConformitySeries conformity = monthlyConformity(c, where, lines, {});
    for (size_t k = 0; k < s.months.size(); k += 11) {
        SelectionOptions o;
        o.from = s.months[k].period.start;
        o.to = s.months[k].period.end;
        // Identity: the same figures as `metrics` over the month alone (the
        // relabelling of animals does not change them).
        const HierarchyMetrics m = computeHierarchyMetrics(selectEncounters(c, where, o), o.draws, 0, 1, 1);
        EXPECT_EQ(s.months[k].encounters, m.encounters);
        EXPECT_EQ(s.months[k].animals, m.animals);
        ASSERT_TRUE(s.months[k].hPrime && m.hPrime);
        EXPECT_NEAR(*s.months[k].hPrime, *m.hPrime, 1e-12);
        ASSERT_TRUE(s.months[k].steepness && m.steepness);
        EXPECT_NEAR(*s.months[k].steepness, *m.steepness, 1e-12);
        EXPECT_EQ(s.months[k].tTri.has_value(), m.tTri.has_value());
        if (m.tTri) {
            EXPECT_NEAR(*s.months[k].tTri, *m.tTri, 1e-12);
        }
        EXPECT_EQ(s.months[k].conformity, conformity.elo[k].conformity);
    }
}

TEST(HierarchySeries, CancelledSeriesSaysSo)
{
    const Colony c = generateDemoColony();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    std::atomic<bool> cancel{true};
    const HierarchySeries s = computeHierarchySeries(c, where, lines, {}, &cancel);
    EXPECT_TRUE(s.cancelled);
    EXPECT_TRUE(s.months.empty());
}
