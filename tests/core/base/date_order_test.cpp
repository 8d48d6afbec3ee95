// SPDX-License-Identifier: GPL-3.0-or-later
// Reading spreadsheet dates in a chosen order, and telling the order from a
// file's dates without guessing (docs/file-formats.md, "Import mapping files").
#include "core/base/date_order.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

TEST(DateOrder, ReadsEachOrder)
{
    // Hand-read: 05/10/2023 is 5 October as day/month/year, 10 May as month/day/year.
    EXPECT_EQ(parseDateAs("05/10/2023", DateOrder::DayMonthYear), parseDate("2023-10-05"));
    EXPECT_EQ(parseDateAs("05/10/2023", DateOrder::MonthDayYear), parseDate("2023-05-10"));
    EXPECT_EQ(parseDateAs("5.10.2023", DateOrder::DayMonthYear), parseDate("2023-10-05"));
    EXPECT_EQ(parseDateAs("2023-10-05", DateOrder::Iso), parseDate("2023-10-05"));
    EXPECT_EQ(parseDateAs("2023/10/05", DateOrder::Iso), parseDate("2023-10-05"));
    EXPECT_FALSE(parseDateAs("31/02/2023", DateOrder::DayMonthYear));  // no 31 February
    EXPECT_FALSE(parseDateAs("29/02/2023", DateOrder::DayMonthYear));  // 2023 is not a leap year
    EXPECT_TRUE(parseDateAs("29/02/2024", DateOrder::DayMonthYear));
    EXPECT_FALSE(parseDateAs("05/10/23", DateOrder::DayMonthYear));    // two-digit year refused
    EXPECT_FALSE(parseDateAs("05/10-2023", DateOrder::DayMonthYear));  // mixed separators
    EXPECT_FALSE(parseDateAs("25/10/2023", DateOrder::MonthDayYear));
    EXPECT_FALSE(parseDateAs("05/10/2023", DateOrder::Unset));
}

TEST(DateOrder, ADateWithADayAbove12Decides)
{
    const DateOrderFinding f = findDateOrder({{2, "05/10/2023"}, {3, "25/10/2023"}, {4, ""}, {5, "01/11/2023"}});
    ASSERT_TRUE(f.decided);
    EXPECT_EQ(*f.decided, DateOrder::DayMonthYear);
    EXPECT_EQ(f.decidingDate, "25/10/2023");
    EXPECT_EQ(f.decidingLine, 3);
    EXPECT_TRUE(f.ambiguousDate.empty());

    const DateOrderFinding g = findDateOrder({{2, "05/10/2023"}, {3, "10/25/2023"}});
    ASSERT_TRUE(g.decided);
    EXPECT_EQ(*g.decided, DateOrder::MonthDayYear);
    EXPECT_EQ(g.decidingLine, 3);
}

TEST(DateOrder, AmbiguousDatesAreNeverGuessed)
{
    const DateOrderFinding f = findDateOrder({{2, "03/03/2023"}, {3, "05/10/2023"}, {4, "06/11/2023"}});
    EXPECT_FALSE(f.decided);
    EXPECT_EQ(f.fitting.size(), 2u);
    EXPECT_EQ(f.ambiguousDate, "05/10/2023"); // 03/03 reads the same both ways
    EXPECT_EQ(f.ambiguousLine, 3);
    EXPECT_EQ(bothReadings("05/10/2023"),
              "'05/10/2023' reads as 2023-10-05 (day/month/year) or 2023-05-10 (month/day/year)");
}

TEST(DateOrder, SameReadingEitherWayIsNoAmbiguity)
{
    const DateOrderFinding f = findDateOrder({{2, "03/03/2023"}, {3, "11/11/2023"}});
    ASSERT_TRUE(f.decided);
    EXPECT_TRUE(f.decidingDate.empty());
}

TEST(DateOrder, IsoAndNothingFitting)
{
    const DateOrderFinding f = findDateOrder({{2, "2023-10-05"}});
    ASSERT_TRUE(f.decided);
    EXPECT_EQ(*f.decided, DateOrder::Iso);
    const DateOrderFinding g = findDateOrder({{2, "2023-10-05"}, {3, "25/10/2023"}});
    EXPECT_FALSE(g.decided);
    EXPECT_TRUE(g.fitting.empty());
}
