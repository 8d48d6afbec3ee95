// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/rank_table.h"

#include <QString>
#include <QStringList>

#include <optional>

namespace hierloom::ui {

/// Parts of an exported figure's caption line, in the same words everywhere.
namespace caption {

/// "group North Corral", or "all groups" for "".
QString group(const QString& name);
/// "2024-01-01 to 2025-12-31"; an open end reads "start of record" or "end of record".
QString window(std::optional<core::Day> from, std::optional<core::Day> to);
/// "Elo rating (k 100, start 1000, logistic curve, draws count half)".
QString elo(const core::EloSettings& elo);
/// The method's display name, with the Elo parameters for Elo and the draw policy otherwise.
QString method(core::RankMethod method, const core::EloSettings& elo);
/// The parts joined with " · ", empty parts left out.
QString join(const QStringList& parts);

} // namespace caption

} // namespace hierloom::ui
