// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <CLI/CLI.hpp>

namespace hierloom::cli {

/// Check for a numeric option: refuses nan and the infinities, which CLI11
/// reads as numbers and CLI::Range lets through (every comparison with nan is
/// false). Add it before any range check: ->check(finiteNumber())->check(...).
CLI::Validator finiteNumber();

} // namespace hierloom::cli
