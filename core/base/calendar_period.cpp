// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/calendar_period.h"

#include <algorithm>

namespace hierloom::core {

std::optional<PeriodLength> parsePeriodLength(std::string_view t)
{
    if (t == "day") return PeriodLength::Day;
    if (t == "week") return PeriodLength::Week;
    if (t == "month") return PeriodLength::Month;
    if (t == "year") return PeriodLength::Year;
    return std::nullopt;
}

static CalendarPeriod periodOf(Day d, PeriodLength length)
{
    const CivilDate c = civilFromDay(d);
    switch (length) {
    case PeriodLength::Day: return {d, d};
    case PeriodLength::Week: {
        // 1970-01-01 was a Thursday: day 0 has weekday index 3 counting from Monday.
        const int weekday = ((d % 7) + 7 + 3) % 7;
        return {d - weekday, d - weekday + 6};
    }
    case PeriodLength::Month:
        return {dayFromCivil(c.year, c.month, 1), dayFromCivil(c.year, c.month, daysInMonth(c.year, c.month))};
    case PeriodLength::Year: return {dayFromCivil(c.year, 1, 1), dayFromCivil(c.year, 12, 31)};
    }
    return {d, d};
}

std::vector<CalendarPeriod> periodsCovering(Day from, Day to, PeriodLength length)
{
    std::vector<CalendarPeriod> out;
    for (Day d = from; d <= to;) {
        CalendarPeriod p = periodOf(d, length);
        p.start = std::max(p.start, from);
        p.end = std::min(p.end, to);
        out.push_back(p);
        d = p.end + 1;
    }
    return out;
}

} // namespace hierloom::core
