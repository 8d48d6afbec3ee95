// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/civil_date.h"

#include <gtest/gtest.h>

#include <cstdio>

using namespace hierloom::core;

TEST(CivilDate, EpochAndKnownDays)
{
    EXPECT_EQ(dayFromCivil(1970, 1, 1), 0);
    // 2000-03-01 is day 11017 (POSIX: 951868800 s / 86400 s).
    EXPECT_EQ(dayFromCivil(2000, 3, 1), 11017);
    for (Day d = -1000; d < 30000; d += 7) {
        const CivilDate c = civilFromDay(d);
        EXPECT_EQ(dayFromCivil(c.year, c.month, c.day), d);
    }
}

TEST(CivilDate, ParseRejectsImpossibleDates)
{
    EXPECT_TRUE(parseDate("2024-02-29").has_value());
    EXPECT_FALSE(parseDate("2023-02-29").has_value());
    EXPECT_FALSE(parseDate("2023-13-01").has_value());
    EXPECT_FALSE(parseDate("2023-4-01").has_value());
    EXPECT_FALSE(parseDate("2023-04-31").has_value());
    EXPECT_FALSE(parseDate("").has_value());
    EXPECT_EQ(formatDate(*parseDate("2019-07-04")), "2019-07-04");
}

TEST(CivilDate, TimeOfDay)
{
    EXPECT_EQ(parseTimeOfDay("07:45"), 465);
    EXPECT_FALSE(parseTimeOfDay("24:00").has_value());
    EXPECT_FALSE(parseTimeOfDay("7:45").has_value());
    EXPECT_EQ(formatTimeOfDay(465), "07:45");
    // Hand-formatted for two-digit hours, printf's form otherwise: the same text as printf's everywhere.
    for (int minutes = -200; minutes < 100 * 60 + 200; ++minutes) {
        char buf[32];
        std::snprintf(buf, sizeof buf, "%02d:%02d", minutes / 60, minutes % 60);
        ASSERT_EQ(formatTimeOfDay(minutes), buf) << minutes;
    }
}

TEST(CivilDate, LeapDayBirthdayFallsOnFirstMarch)
{
    // docs/methods.md "Age": a 29 February birthday falls on 1 March in common years.
    const Day birth = *parseDate("2016-02-29");
    EXPECT_EQ(formatDate(anniversary(birth, 4)), "2020-02-29");
    EXPECT_EQ(formatDate(anniversary(birth, 3)), "2019-03-01");
    EXPECT_EQ(ageInYears(birth, *parseDate("2019-02-28")), 2);
    EXPECT_EQ(ageInYears(birth, *parseDate("2019-03-01")), 3);
}
