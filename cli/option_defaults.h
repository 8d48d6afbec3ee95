// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace CLI {
class App;
}

namespace hierloom::cli {

/// Makes every optional option of every command name its default in --help
/// (and so in the man page): options whose text does not already say
/// "default" get "(default: off)" (flags), "(default: standard output)"
/// (--out), their bound value, or "(default: none)". Run once after every
/// command is added, so a new option cannot be left without one.
void describeDefaults(CLI::App& app);

} // namespace hierloom::cli
