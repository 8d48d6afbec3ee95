// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/rank_changes.h"

#include <stdexcept>
#include <unordered_map>

namespace hierloom::core {

std::vector<RankChange> splitRankChanges(const std::vector<std::string>& before, const std::vector<std::string>& after)
{
    std::unordered_map<std::string, int> posBefore;
    for (size_t i = 0; i < before.size(); ++i) posBefore.emplace(before[i], static_cast<int>(i));
    std::unordered_map<std::string, int> posAfter;
    for (size_t i = 0; i < after.size(); ++i) posAfter.emplace(after[i], static_cast<int>(i));
    // Rank among the animals ranked at both ends, in each order.
    std::unordered_map<std::string, int> commonBefore;
    for (const std::string& id : before)
        if (posAfter.count(id)) commonBefore.emplace(id, static_cast<int>(commonBefore.size()) + 1);
    std::vector<RankChange> out;
    int commonAfter = 0;
    int enteredSoFar = 0;
    for (size_t j = 0; j < after.size(); ++j) {
        const auto b = posBefore.find(after[j]);
        if (b == posBefore.end()) {
            ++enteredSoFar;
            continue;
        }
        ++commonAfter;
        RankChange c;
        c.animal = after[j];
        c.rankBefore = b->second + 1;
        c.rankAfter = static_cast<int>(j) + 1;
        c.total = c.rankBefore - c.rankAfter;
        c.active = commonBefore.at(after[j]) - commonAfter;
        c.enteredAbove = enteredSoFar;
        c.leftAbove = (c.rankBefore - 1) - (commonBefore.at(after[j]) - 1);
        c.passive = c.leftAbove - c.enteredAbove;
        out.push_back(std::move(c));
    }
    return out;
}

std::vector<PeriodRankChanges> rankChangesByPeriod(const Colony& colony, const ResidenceIndex& where,
                                                   const SelectionOptions& selection, const RankOptions& options,
                                                   PeriodLength every)
{
    if (options.method != RankMethod::Elo) throw std::invalid_argument("rank changes are computed from Elo ranks");
    // Periods in order, each with its ranking top first (rows come in rank order).
    std::vector<CalendarPeriod> periods;
    std::vector<std::vector<std::string>> orders;
    for (PeriodRankRow& row : computeRanksByPeriod(colony, where, selection, options, every)) {
        if (periods.empty() || periods.back().start != row.period.start) {
            periods.push_back(row.period);
            orders.emplace_back();
        }
        orders.back().push_back(std::move(row.row.animal));
    }
    // computeRanksByPeriod leaves out periods where nobody is ranked; the
    // change is always from the previous period's end, so refill the gaps.
    std::vector<PeriodRankChanges> out;
    for (size_t k = 1; k < periods.size(); ++k) {
        PeriodRankChanges p;
        p.period = periods[k];
        if (periods[k].start == periods[k - 1].end + 1) p.changes = splitRankChanges(orders[k - 1], orders[k]);
        else p.changes = splitRankChanges({}, orders[k]);
        out.push_back(std::move(p));
    }
    return out;
}

} // namespace hierloom::core
