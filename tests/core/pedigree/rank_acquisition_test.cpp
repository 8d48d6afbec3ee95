// SPDX-License-Identifier: GPL-3.0-or-later
// Rank acquisition of core/pedigree/rank_acquisition.h on a constructed record with known dates.
#include "core/pedigree/rank_acquisition.h"

#include "pedigree_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

TEST(RankAcquisition, FirstDayAboveEachOlderSister)
{
    // Mother M; daughters O (2010), Y (2014-05-01), Z (2016). O beats Y on 2017-01-10
    // (Elo k = 100: O 1050, Y 950). Y beats O on 2018-06-01: E = 1/(1+10^(100/400)) = 0.36,
    // delta = 64, so Y 1014 > O 986 that day (Elo 1978; hand computation). Z only loses.
    const Colony c = PedigreeBuilder()
                         .female("M", "1990-01-01")
                         .female("O", "2010-03-01", "M")
                         .female("Y", "2014-05-01", "M")
                         .female("Z", "2016-01-01", "M")
                         .female("W", "2017-01-01") // no sisters: no rows
                         .win("2017-01-10", "O", "Y")
                         .win("2018-06-01", "Y", "O")
                         .win("2018-06-02", "Y", "O")
                         .win("2019-01-01", "O", "Z")
                         .build();
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    const std::vector<SisterOvertaking> rows = rankAcquisition(c, where, lines, EloSettings{});
    // Rows by daughter id then sister id: (Y, O), (Z, O), (Z, Y); O is the eldest.
    ASSERT_EQ(rows.size(), 3U);
    EXPECT_EQ(rows[0].daughter, "Y");
    EXPECT_EQ(rows[0].olderSister, "O");
    EXPECT_EQ(rows[0].mother, "M");
    EXPECT_TRUE(rows[0].compared);
    ASSERT_TRUE(rows[0].firstAbove.has_value());
    EXPECT_EQ(*rows[0].firstAbove, dayFromCivil(2018, 6, 1));
    EXPECT_EQ(rows[0].ageYears, 4); // 2014-05-01 to 2018-06-01 (docs/methods.md "Age")
    EXPECT_EQ(rows[0].ageDays, dayFromCivil(2018, 6, 1) - dayFromCivil(2014, 5, 1));
    EXPECT_TRUE(rows[0].aboveAtLastComparison);
    EXPECT_EQ(rows[1].daughter, "Z");
    EXPECT_EQ(rows[1].olderSister, "O");
    EXPECT_TRUE(rows[1].compared);
    EXPECT_FALSE(rows[1].firstAbove.has_value()); // not yet
    EXPECT_FALSE(rows[1].ageYears.has_value());
    EXPECT_FALSE(rows[1].aboveAtLastComparison);
    EXPECT_EQ(rows[2].olderSister, "Y");
    EXPECT_FALSE(rows[2].firstAbove.has_value());
    // Cut off before Y's rise: not yet.
    const auto early = rankAcquisition(c, where, lines, EloSettings{}, {}, dayFromCivil(2018, 5, 31));
    ASSERT_EQ(early.size(), 3U);
    EXPECT_TRUE(early[0].compared);
    EXPECT_FALSE(early[0].firstAbove.has_value());
    EXPECT_FALSE(early[1].compared); // Z had no rating yet
}
