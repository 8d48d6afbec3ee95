// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <CLI/CLI.hpp>

namespace hierloom::cli {

/// Check for a numeric option: refuses nan and the infinities, which CLI11
/// reads as numbers and CLI::Range lets through (every comparison with nan is
/// false). Add it before any range check: ->check(finiteNumber())->check(...).
CLI::Validator finiteNumber();

/// Makes every floating-point option of `app` and its commands (CLI11 type
/// FLOAT) refuse NaN, infinities and values too large for a double, as a
/// usage mistake (exit status 2). Runs after every command is added, so an
/// option added later is covered without a line of its own.
void requireFiniteNumbers(CLI::App& app);

} // namespace hierloom::cli
