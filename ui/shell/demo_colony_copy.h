// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QString>

namespace hierloom::ui {

/// Where the person's copy of the demo colony lives: demo.hierloom in the
/// per-user application data folder (QStandardPaths::AppDataLocation).
QString demoColonyCopyPath();

/// Writes a fresh copy of the bundled demo colony to demoColonyCopyPath()
/// (replacing an older copy, so it always matches this version of the
/// program) and returns its path. Throws std::exception with a message a
/// person can act on when the folder cannot be written.
QString prepareDemoColonyCopy();

} // namespace hierloom::ui
