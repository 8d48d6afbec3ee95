// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <optional>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Length of the periods of a long rank table.
enum class PeriodLength { Day, Week, Month, Year };

std::optional<PeriodLength> parsePeriodLength(std::string_view text);

/// A period of whole days, both ends included.
struct CalendarPeriod {
    Day start;
    Day end;
};

/// The calendar periods (weeks run Monday to Sunday, as ISO 8601 has them)
/// that meet [from, to], each clipped to the window.
std::vector<CalendarPeriod> periodsCovering(Day from, Day to, PeriodLength length);

} // namespace hierloom::core
