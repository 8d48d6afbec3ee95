// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Texts shared by the reports: methods with their references, and conversions.
#include "core/ranks/elo_rating.h"
#include "core/planning/stability_watch.h"

#include <QString>
#include <QStringList>

#include <string>

namespace hierloom::report {

inline QString qs(const std::string& s) { return QString::fromUtf8(s.data(), static_cast<qsizetype>(s.size())); }
inline QString qs(const char* s) { return QString::fromUtf8(s); }

/// How the stability figures are computed and the thresholds in force.
QString stabilityMethodText(const core::StabilityThresholds& thresholds);

/// The methods a hierarchy report uses, each with its references.
QStringList methodsText(const core::EloSettings& elo);

} // namespace hierloom::report
