// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <QString>

#include <optional>

namespace hierloom::ui {

/// A date as people type it in a date field: 2026-10-05 or 20261005. Anything
/// else (a month 13, 2026-1-5, letters) is refused, never read as another date.
std::optional<core::Day> parseTypedDate(const QString& typed);

/// The message shown beside a date field whose text parseTypedDate refused.
QString typedDateProblem(const QString& typed);

} // namespace hierloom::ui
