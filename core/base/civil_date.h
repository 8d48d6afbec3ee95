// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstddef>
#include <optional>
#include <string>
#include <string_view>

namespace hierloom::core {

/// A calendar day as a count of days since 1970-01-01 (proleptic Gregorian).
using Day = int;

/// Days since 1970-01-01 of a Gregorian date (H. Hinnant's days_from_civil algorithm).
Day dayFromCivil(int year, unsigned month, unsigned day);

struct CivilDate {
    int year;
    unsigned month;
    unsigned day;
};

/// The Gregorian date of a day count (inverse of dayFromCivil).
CivilDate civilFromDay(Day d);

/// Parses a strict `YYYY-MM-DD` real calendar date; nullopt otherwise.
std::optional<Day> parseDate(std::string_view text);

/// Formats a day as `YYYY-MM-DD`.
std::string formatDate(Day d);

/// Formats a day as `YYYY-MM-DD`, or empty text when the day is unknown.
std::string formatDate(const std::optional<Day>& d);

/// A value quoted for a message to a person: 'value', its control
/// characters escaped (printableText).
std::string quotedValue(std::string_view value);

/// True for a control character a text field may not hold: every byte below
/// 0x20 but tab, DEL (0x7F), and the C1 controls U+0080-U+009F (UTF-8 C2 80-C2 9F).
/// Returns the length of the control character at `text[i]` (1 or 2 bytes), 0 when none is there.
std::size_t controlCharacterAt(std::string_view text, std::size_t i);

/// `text` with each control character written as `\xNN` (C1 controls as
/// `\u0080`...) and each backslash doubled, so a message never carries a
/// raw NUL, escape sequence or line break to the terminal or a dialog.
std::string printableText(std::string_view text);

/// Parses `HH:MM` (24 h) into minutes after midnight; nullopt otherwise.
std::optional<int> parseTimeOfDay(std::string_view text);

/// Formats minutes after midnight as `HH:MM`.
std::string formatTimeOfDay(int minutes);

/// The day an animal born on `birth` turns `years` old; a 29 February
/// birthday falls on 1 March in common years (docs/methods.md, "Age").
Day anniversary(Day birth, int years);

/// Whole years of age on `d` for an animal born on `birth`.
int ageInYears(Day birth, Day d);

/// Today's date in the local time zone.
Day today();

bool isLeapYear(int year);
unsigned daysInMonth(int year, unsigned month);

} // namespace hierloom::core
