// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/rank_table.h"

#include "core/ranks/davids_score.h"
#include "core/ranks/elo_optimisation.h"
#include "core/ranks/isi_order.h"
#include "core/ranks/ordinal_ranks.h"
#include "core/ranks/parallel_randomisation.h"
#include "core/ranks/randomised_elo.h"
#include "core/ranks/rank_method_registry.h"
#include "core/ranks/win_matrix.h"

#include <algorithm>
#include <numeric>
#include <stdexcept>

namespace hierloom::core {

std::optional<RankMethod> parseRankMethod(std::string_view t)
{
    const RankMethodInfo* m = findRankMethod(t);
    return m ? std::optional<RankMethod>(m->method) : std::nullopt;
}

namespace {

unsigned threadsOf(const RankOptions& o) { return o.threads == 0 ? defaultThreadCount() : o.threads; }

/// Rows in rank order from per-animal ranks (0 = not ranked).
std::vector<RankRow> rowsFromRanks(const std::vector<std::string>& ids, const std::vector<int>& ranks,
                                   const std::vector<double>* scores)
{
    std::vector<RankRow> rows;
    for (size_t i = 0; i < ids.size(); ++i) {
        if (ranks[i] == 0) continue;
        RankRow r;
        r.animal = ids[i];
        r.rank = ranks[i];
        if (scores) r.score = (*scores)[i];
        rows.push_back(std::move(r));
    }
    std::sort(rows.begin(), rows.end(), [](const RankRow& a, const RankRow& b) { return a.rank < b.rank; });
    return rows;
}

/// David's score or I&SI ranks of one set of bouts among `n` animals.
std::vector<RankRow> matrixRanks(const std::vector<std::string>& ids, const std::vector<Bout>& bouts,
                                 const RankOptions& o, DrawPolicy draws)
{
    const int n = static_cast<int>(ids.size());
    if (n == 0) return {};
    const WinMatrix m = WinMatrix::fromBouts(n, bouts, draws);
    if (o.method == RankMethod::DavidsScore) {
        const std::vector<double> ds =
            davidsScores(m, o.correctedDs ? DyadicIndex::Corrected : DyadicIndex::Proportion);
        return rowsFromRanks(ids, ordinalRanks(ds, std::vector<bool>(ids.size(), true)), &ds);
    }
    const IsiResult isi = isiOrder(m);
    std::vector<int> ranks(ids.size(), 0);
    for (size_t pos = 0; pos < isi.order.size(); ++pos) ranks[static_cast<size_t>(isi.order[pos])] = static_cast<int>(pos) + 1;
    return rowsFromRanks(ids, ranks, nullptr);
}

EloSettings eloSettingsOf(const RankOptions& o, const SelectionOptions& s)
{
    EloSettings e = o.elo;
    e.draws = s.draws;
    return e;
}

} // namespace

RankTable computeRanks(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                       const RankOptions& o)
{
    return computeRanks(selectEncounters(colony, where, selection), colony, where, selection, o);
}

RankTable computeRanks(EncounterSelection sel, const Colony& colony, const ResidenceIndex& where,
                       const SelectionOptions& selection, const RankOptions& o)
{
    RankTable table;
    if (o.method != RankMethod::Elo) {
        table.rows = matrixRanks(sel.ids, sel.bouts, o, selection.draws);
        return table;
    }
    if (o.startRule != EloStartRule::None && (o.optimiseK || o.randomise > 0))
        throw std::invalid_argument("a start rule cannot be combined with the optimised k or randomised Elo");
    // Elo: ratings after the last bout dated on or before the ranking day.
    std::optional<Day> day = o.at ? o.at : (selection.to ? selection.to : sel.lastDay);
    if (!day) return table;
    const size_t count =
        static_cast<size_t>(std::upper_bound(sel.days.begin(), sel.days.end(), *day) - sel.days.begin());
    // The bouts up to that day, in place (no copy of millions of bouts).
    sel.bouts.resize(count);
    sel.days.resize(count);
    const std::vector<Bout>& bouts = sel.bouts;
    EloSettings settings = eloSettingsOf(o, selection);
    const int n = sel.size();
    if (o.optimiseK) {
        if (const auto best = optimiseEloK(n, bouts, settings, threadsOf(o))) settings.k = best->k;
    }
    const EloRun run = o.startRule == EloStartRule::None
                           ? runElo(n, bouts, settings)
                           : std::move(traceElo(n, bouts, sel.days, settings, o.startRule, eloFamilyOf(colony, sel.ids),
                                                residencePresence(sel.ids, where, selection.group), {count})
                                           .checkpoints.front());
    table.kUsed = settings.k;
    if (run.decided > 0) table.logLikelihood = run.logLikelihood;
    table.rankedOn = day;
    std::vector<bool> include = residentMask(sel.ids, where, *day, selection.group);
    for (size_t i = 0; i < include.size(); ++i) include[i] = include[i] && run.rated[i];
    if (o.randomise > 0) {
        const auto rnd = randomisedElo(n, bouts, settings, o.randomise, o.seed, threadsOf(o));
        std::vector<double> mean(static_cast<size_t>(n), 0.0);
        for (size_t i = 0; i < rnd.size(); ++i) {
            mean[i] = rnd[i].meanRating;
            include[i] = include[i] && rnd[i].rated;
        }
        table.rows = rowsFromRanks(sel.ids, ordinalRanks(mean, include), &mean);
        for (RankRow& r : table.rows) {
            const auto& x = rnd[static_cast<size_t>(sel.indexOf(r.animal))];
            r.low = x.low;
            r.high = x.high;
            r.meanRank = x.meanRank;
        }
        return table;
    }
    table.rows = rowsFromRanks(sel.ids, ordinalRanks(run.rating, include), &run.rating);
    return table;
}

std::vector<PeriodRankRow> computeRanksByPeriod(const Colony& colony, const ResidenceIndex& where,
                                                const SelectionOptions& selection, const RankOptions& o,
                                                PeriodLength every)
{
    return computeRanksByPeriod(selectEncounters(colony, where, selection), colony, where, selection, o, every);
}

std::vector<PeriodRankRow> computeRanksByPeriod(const EncounterSelection& sel, const Colony& colony,
                                                const ResidenceIndex& where, const SelectionOptions& selection,
                                                const RankOptions& o, PeriodLength every)
{
    std::vector<PeriodRankRow> out;
    const std::optional<Day> from = selection.from ? selection.from : sel.firstDay;
    const std::optional<Day> to = selection.to ? selection.to : sel.lastDay;
    if (!from || !to || *from > *to) return out;
    const std::vector<CalendarPeriod> periods = periodsCovering(*from, *to, every);
    auto boutIndex = [&](Day d) {
        return static_cast<size_t>(std::upper_bound(sel.days.begin(), sel.days.end(), d) - sel.days.begin());
    };
    if (o.method == RankMethod::Elo) {
        if (o.startRule != EloStartRule::None && o.optimiseK)
            throw std::invalid_argument("a start rule cannot be combined with the optimised k");
        EloSettings settings = eloSettingsOf(o, selection);
        if (o.optimiseK)
            if (const auto best = optimiseEloK(sel.size(), sel.bouts, settings, threadsOf(o))) settings.k = best->k;
        std::vector<size_t> counts;
        for (const CalendarPeriod& p : periods) counts.push_back(boutIndex(p.end));
        const std::vector<EloRun> runs =
            o.startRule == EloStartRule::None
                ? eloAtCheckpoints(sel.size(), sel.bouts, counts, settings)
                : traceElo(sel.size(), sel.bouts, sel.days, settings, o.startRule, eloFamilyOf(colony, sel.ids),
                           residencePresence(sel.ids, where, selection.group), counts)
                      .checkpoints;
        for (size_t k = 0; k < periods.size(); ++k) {
            std::vector<bool> include = residentMask(sel.ids, where, periods[k].end, selection.group);
            for (size_t i = 0; i < include.size(); ++i) include[i] = include[i] && runs[k].rated[i];
            for (RankRow& r : rowsFromRanks(sel.ids, ordinalRanks(runs[k].rating, include), &runs[k].rating))
                out.push_back({periods[k], std::move(r)});
        }
        return out;
    }
    for (const CalendarPeriod& p : periods) {
        const size_t lo = boutIndex(p.start - 1);
        const size_t hi = boutIndex(p.end);
        // The period's own animals, in id order, and its bouts re-indexed to them.
        std::vector<int> used;
        for (size_t b = lo; b < hi; ++b) {
            used.push_back(sel.bouts[b].winner);
            used.push_back(sel.bouts[b].loser);
        }
        if (selection.includeResidents) {
            const int g = selection.group.empty() ? -1 : where.group(selection.group);
            for (int i = 0; i < sel.size(); ++i) {
                const int a = where.animal(sel.ids[static_cast<size_t>(i)]);
                if (a >= 0 && where.residentDuring(a, p.start, p.end, g)) used.push_back(i);
            }
        }
        std::sort(used.begin(), used.end());
        used.erase(std::unique(used.begin(), used.end()), used.end());
        if (used.empty()) continue;
        std::vector<int> local(static_cast<size_t>(sel.size()), -1);
        std::vector<std::string> ids;
        for (int i : used) {
            local[static_cast<size_t>(i)] = static_cast<int>(ids.size());
            ids.push_back(sel.ids[static_cast<size_t>(i)]);
        }
        std::vector<Bout> bouts;
        for (size_t b = lo; b < hi; ++b) {
            const Bout& x = sel.bouts[b];
            bouts.push_back({local[static_cast<size_t>(x.winner)], local[static_cast<size_t>(x.loser)], x.draw});
        }
        for (RankRow& r : matrixRanks(ids, bouts, o, selection.draws)) out.push_back({p, std::move(r)});
    }
    return out;
}

std::vector<int> orderByMethod(const EncounterSelection& sel, RankMethod method, const EloSettings& elo)
{
    const DrawPolicy draws = elo.draws;
    const int n = sel.size();
    std::vector<int> order(static_cast<size_t>(n));
    std::iota(order.begin(), order.end(), 0);
    if (n == 0) return order;
    std::vector<int> ranks;
    if (method == RankMethod::Elo) {
        const EloRun run = runElo(n, sel.bouts, elo);
        ranks = ordinalRanks(run.rating, run.rated);
        // Animals without a rating (resident only) go last, by id.
        int next = static_cast<int>(std::count(run.rated.begin(), run.rated.end(), true));
        for (size_t i = 0; i < ranks.size(); ++i)
            if (ranks[i] == 0) ranks[i] = ++next;
    } else if (method == RankMethod::DavidsScore) {
        const WinMatrix m = WinMatrix::fromBouts(n, sel.bouts, draws);
        ranks = ordinalRanks(davidsScores(m, DyadicIndex::Proportion), std::vector<bool>(static_cast<size_t>(n), true));
    } else {
        return isiOrder(WinMatrix::fromBouts(n, sel.bouts, draws)).order;
    }
    std::sort(order.begin(), order.end(), [&](int a, int b) { return ranks[static_cast<size_t>(a)] < ranks[static_cast<size_t>(b)]; });
    return order;
}

} // namespace hierloom::core
