// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace CLI {
class App;
}

namespace hierloom::cli {

/// Makes every floating-point option of `app` and its commands (CLI11 type
/// FLOAT) refuse NaN, infinities and values too large for a double, as a
/// usage mistake (exit status 2). Runs after every command is added, so an
/// option added later is covered without a line of its own.
void requireFiniteNumbers(CLI::App& app);

} // namespace hierloom::cli
