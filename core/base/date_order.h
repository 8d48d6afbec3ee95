// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace hierloom::core {

/// The order of day, month and year in a spreadsheet's dates
/// (docs/file-formats.md, "Import mapping files"). Unset: not chosen yet;
/// the file's own dates must then decide it, or the import asks.
enum class DateOrder { Unset, Iso, DayMonthYear, MonthDayYear };

/// "ask", "iso", "day-month-year", "month-day-year".
const char* toString(DateOrder order);
std::optional<DateOrder> parseDateOrder(std::string_view text);
/// The form a person reads: "YYYY-MM-DD", "DD/MM/YYYY", "MM/DD/YYYY".
const char* datePattern(DateOrder order);

/// Reads a date in the given order: three numbers separated by '/', '-' or
/// '.', the year with four digits, day and month with one or two; nullopt
/// when it is not a real calendar date so read (or the order is Unset).
std::optional<Day> parseDateAs(std::string_view text, DateOrder order);

/// What the dates of a file say about their order.
struct DateOrderFinding {
    /// Orders that read every date of the file.
    std::vector<DateOrder> fitting;
    /// The one order that fits, or DayMonthYear when both day-month-year
    /// and month-day-year fit but read every date as the same day.
    std::optional<DateOrder> decided;
    /// When decided: a date of the file that no other order reads (empty
    /// when every order would give the same days), and its line.
    std::string decidingDate;
    int decidingLine = 0;
    /// When day-month-year and month-day-year both fit and read some date
    /// differently: the first such date and its line. The user must choose.
    std::string ambiguousDate;
    int ambiguousLine = 0;
};

/// Looks at every (line, date text) of a file; empty texts are skipped.
DateOrderFinding findDateOrder(const std::vector<std::pair<int, std::string>>& dates);

/// "'05/10/2023' reads as 2023-10-05 (day/month/year) or 2023-05-10
/// (month/day/year)": the two readings of an ambiguous date, for messages.
std::string bothReadings(std::string_view date);

} // namespace hierloom::core
