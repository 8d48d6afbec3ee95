// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/dynamics_tables.h"

#include "core/base/number_format.h"

#include <string>

namespace hierloom::core {

ExportTable rankChangesTable(const std::vector<PeriodRankChanges>& periods, EloStartRule startRule)
{
    ExportTable t{"rank_changes",
                  {"period_start", "period_end", "animal", "rank_before", "rank_after", "total", "active", "passive",
                   "left_above", "entered_above", "start_rule"},
                  {}};
    for (const PeriodRankChanges& p : periods)
        for (const RankChange& c : p.changes)
            t.rows.push_back({formatDate(p.period.start), formatDate(p.period.end), c.animal,
                              std::to_string(c.rankBefore), std::to_string(c.rankAfter), std::to_string(c.total),
                              std::to_string(c.active), std::to_string(c.passive), std::to_string(c.leftAbove),
                              std::to_string(c.enteredAbove), toString(startRule)});
    return t;
}

ExportTable foresightTable(const Foresight& f)
{
    ExportTable t{"foresight",
                  {"model", "year", "encounters", "called", "predicted", "share_predicted", "log_likelihood", "brier",
                   "rule_win_probability", "rule"},
                  {}};
    for (const ForesightRow& r : f.rows) {
        const ForesightScore& s = r.score;
        t.rows.push_back({toString(r.model), r.year ? std::to_string(*r.year) : std::string("all"),
                          std::to_string(s.encounters), std::to_string(s.called), std::to_string(s.predicted),
                          formatNumber(s.sharePredicted), s.encounters > 0 ? formatNumber(s.logLikelihood) : std::string(),
                          formatNumber(s.brier),
                          r.model == ForesightModel::Rule ? formatNumber(f.ruleWinProbability) : std::string(),
                          toString(f.rule)});
    }
    return t;
}

ExportTable foresightEncountersTable(const Foresight& f)
{
    ExportTable t{"foresight_encounters", {"date", "winner", "loser", "rule_conforms", "rule", "elo", "informed_elo"}, {}};
    for (const ForesightEncounter& e : f.encounters)
        t.rows.push_back({formatDate(e.day), e.winner, e.loser,
                          e.ruleConforms ? std::string(*e.ruleConforms ? "1" : "0") : std::string(),
                          formatNumber(e.rule), formatNumber(e.elo), formatNumber(e.informedElo)});
    return t;
}

} // namespace hierloom::core
