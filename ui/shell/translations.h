// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QLocale>

class QCoreApplication;

namespace hierloom::ui {

/// Installs Qt's own translations and Hierloom's catalogue (compiled in at
/// :/i18n/hierloom_<language>.qm from translations/*.ts) for `locale`.
/// Returns whether a Hierloom catalogue was found; with none the English
/// source strings show, so a missing language is never an error.
bool installTranslations(QCoreApplication& app, const QLocale& locale = QLocale());

/// Resource folder of the compiled catalogues.
inline constexpr const char* translationsResource = ":/i18n";

} // namespace hierloom::ui
