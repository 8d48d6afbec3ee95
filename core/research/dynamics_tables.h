// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/foresight.h"
#include "core/ranks/rank_changes.h"
#include "core/research/export_tables.h"

#include <vector>

namespace hierloom::core {

/// Active and passive rank changes (docs/methods.md; rankChangesByPeriod) as
/// `dynamics` writes them: period_start, period_end, animal, rank_before,
/// rank_after, total, active, passive, left_above, entered_above, start_rule.
ExportTable rankChangesTable(const std::vector<PeriodRankChanges>& periods, EloStartRule startRule);

/// The foresight figures (docs/methods.md "Foresight"), one row per model and
/// year and one per model for the whole window (year `all`): model, year,
/// encounters, called, predicted, share_predicted, log_likelihood, brier,
/// rule_win_probability (rule rows only), rule.
ExportTable foresightTable(const Foresight& foresight);

/// Every decided encounter with the chance each model gave its winner: date,
/// winner, loser, rule_conforms (1, 0, empty when not comparable), rule, elo, informed_elo.
ExportTable foresightEncountersTable(const Foresight& foresight);

} // namespace hierloom::core
