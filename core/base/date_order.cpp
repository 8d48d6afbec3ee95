// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/date_order.h"

#include <array>

namespace hierloom::core {

namespace {

/// Splits "a/b/c" (or with '-' or '.') into three digit runs; false otherwise.
bool threeNumbers(std::string_view s, std::array<std::string_view, 3>& parts)
{
    size_t part = 0, start = 0;
    char separator = 0;
    for (size_t i = 0; i <= s.size(); ++i) {
        if (i < s.size() && s[i] >= '0' && s[i] <= '9') continue;
        if (i < s.size()) {
            if (s[i] != '/' && s[i] != '-' && s[i] != '.') return false;
            if (separator && s[i] != separator) return false;
            separator = s[i];
        }
        if (part == 3 || i == start) return false;
        parts[part++] = s.substr(start, i - start);
        start = i + 1;
    }
    return part == 3;
}

int number(std::string_view digits)
{
    int n = 0;
    for (char c : digits) n = n * 10 + (c - '0');
    return n;
}

std::optional<Day> realDate(std::string_view y, std::string_view m, std::string_view d)
{
    if (y.size() != 4 || m.size() > 2 || d.size() > 2) return std::nullopt;
    const int year = number(y);
    const int month = number(m);
    const int day = number(d);
    if (year < 1 || month < 1 || month > 12 || day < 1) return std::nullopt;
    if (static_cast<unsigned>(day) > daysInMonth(year, static_cast<unsigned>(month))) return std::nullopt;
    return dayFromCivil(year, static_cast<unsigned>(month), static_cast<unsigned>(day));
}

} // namespace

const char* toString(DateOrder order)
{
    switch (order) {
    case DateOrder::Iso: return "iso";
    case DateOrder::DayMonthYear: return "day-month-year";
    case DateOrder::MonthDayYear: return "month-day-year";
    case DateOrder::Unset: break;
    }
    return "ask";
}

std::optional<DateOrder> parseDateOrder(std::string_view text)
{
    for (DateOrder o : {DateOrder::Unset, DateOrder::Iso, DateOrder::DayMonthYear, DateOrder::MonthDayYear})
        if (text == toString(o)) return o;
    if (text.empty()) return DateOrder::Unset;
    return std::nullopt;
}

const char* datePattern(DateOrder order)
{
    switch (order) {
    case DateOrder::Iso: return "YYYY-MM-DD";
    case DateOrder::DayMonthYear: return "DD/MM/YYYY";
    case DateOrder::MonthDayYear: return "MM/DD/YYYY";
    case DateOrder::Unset: break;
    }
    return "a date order still to be chosen";
}

std::optional<Day> parseDateAs(std::string_view text, DateOrder order)
{
    std::array<std::string_view, 3> p;
    if (!threeNumbers(text, p)) return std::nullopt;
    switch (order) {
    case DateOrder::Iso: return realDate(p[0], p[1], p[2]);
    case DateOrder::DayMonthYear: return realDate(p[2], p[1], p[0]);
    case DateOrder::MonthDayYear: return realDate(p[2], p[0], p[1]);
    case DateOrder::Unset: break;
    }
    return std::nullopt;
}

DateOrderFinding findDateOrder(const std::vector<std::pair<int, std::string>>& dates)
{
    constexpr std::array<DateOrder, 3> orders{DateOrder::Iso, DateOrder::DayMonthYear, DateOrder::MonthDayYear};
    std::array<bool, 3> fits{true, true, true};
    std::array<int, 3> only{-1, -1, -1}; // first date read by this order alone
    int differing = -1;                  // first date read differently by the two orders with a day and a month
    bool any = false;
    for (size_t i = 0; i < dates.size(); ++i) {
        if (dates[i].second.empty()) continue;
        any = true;
        std::array<std::optional<Day>, 3> read;
        int readers = 0;
        for (size_t k = 0; k < 3; ++k) {
            read[k] = parseDateAs(dates[i].second, orders[k]);
            if (read[k]) ++readers;
            else fits[k] = false;
        }
        for (size_t k = 0; k < 3; ++k)
            if (read[k] && readers == 1 && only[k] < 0) only[k] = static_cast<int>(i);
        if (differing < 0 && read[1] && read[2] && *read[1] != *read[2]) differing = static_cast<int>(i);
    }
    DateOrderFinding f;
    if (!any) return f;
    for (size_t k = 0; k < 3; ++k)
        if (fits[k]) f.fitting.push_back(orders[k]);
    auto decide = [&](size_t k) {
        f.decided = orders[k];
        if (only[k] >= 0) {
            f.decidingDate = dates[static_cast<size_t>(only[k])].second;
            f.decidingLine = dates[static_cast<size_t>(only[k])].first;
        }
    };
    if (f.fitting.size() == 1) {
        for (size_t k = 0; k < 3; ++k)
            if (fits[k]) decide(k);
    } else if (fits[1] && fits[2]) {
        if (differing >= 0) {
            f.ambiguousDate = dates[static_cast<size_t>(differing)].second;
            f.ambiguousLine = dates[static_cast<size_t>(differing)].first;
        } else {
            decide(1); // every date has its day equal to its month: both orders read the same days
        }
    }
    return f;
}

std::string bothReadings(std::string_view date)
{
    const auto dmy = parseDateAs(date, DateOrder::DayMonthYear);
    const auto mdy = parseDateAs(date, DateOrder::MonthDayYear);
    std::string s = quotedValue(date) + " reads as ";
    s += dmy ? formatDate(*dmy) : std::string("nothing");
    s += " (day/month/year) or ";
    s += mdy ? formatDate(*mdy) : std::string("nothing");
    s += " (month/day/year)";
    return s;
}

} // namespace hierloom::core
