// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/informed_elo.h"

#include "core/ranks/elo_kernel.h"
#include "core/ranks/ordinal_ranks.h"

#include <algorithm>
#include <numeric>
#include <stdexcept>

namespace hierloom::core {

const char* toString(EloStartRule rule)
{
    switch (rule) {
    case EloStartRule::Youngest: return "youngest";
    case EloStartRule::Eldest: return "eldest";
    case EloStartRule::None: break;
    }
    return "none";
}

std::optional<EloStartRule> parseEloStartRule(std::string_view text)
{
    if (text == "none") return EloStartRule::None;
    if (text == "youngest") return EloStartRule::Youngest;
    if (text == "eldest") return EloStartRule::Eldest;
    return std::nullopt;
}

EloFamily eloFamilyOf(const Colony& colony, const std::vector<std::string>& ids)
{
    EloFamily f;
    const size_t n = ids.size();
    f.mother.assign(n, -1);
    f.birth.assign(n, std::nullopt);
    f.female.assign(n, false);
    for (size_t i = 0; i < n; ++i) {
        const int k = colony.animalIndex(ids[i]);
        if (k < 0) continue;
        const Animal& a = colony.animals[static_cast<size_t>(k)];
        f.birth[i] = a.birth;
        f.female[i] = a.sex == Sex::Female;
        if (!a.mother.empty()) {
            const auto it = std::lower_bound(ids.begin(), ids.end(), a.mother);
            if (it != ids.end() && *it == a.mother) f.mother[i] = static_cast<int>(it - ids.begin());
        }
    }
    return f;
}

PresentOn residencePresence(const std::vector<std::string>& ids, const ResidenceIndex& where, const std::string& group)
{
    std::vector<int> animal(ids.size());
    for (size_t i = 0; i < ids.size(); ++i) animal[i] = where.animal(ids[i]);
    const int g = group.empty() ? -1 : where.group(group);
    const bool anyGroup = group.empty();
    return [animal = std::move(animal), &where, g, anyGroup](int i, Day d) {
        const int a = animal[static_cast<size_t>(i)];
        if (a < 0) return false;
        const int on = where.groupOn(a, d);
        return anyGroup ? on >= 0 : (g >= 0 && on == g);
    };
}

namespace {

/// True when daughter a comes before daughter b in the rule's order of sisters
/// (docs/methods.md: unknown birth dates count as the eldest; equal dates by index).
bool sisterBefore(int a, int b, const EloFamily& family, EloStartRule rule)
{
    const auto& ba = family.birth[static_cast<size_t>(a)];
    const auto& bb = family.birth[static_cast<size_t>(b)];
    if (ba.has_value() != bb.has_value()) {
        // The unknown one is the eldest: last under youngest, first under eldest.
        return rule == EloStartRule::Youngest ? ba.has_value() : !ba.has_value();
    }
    if (ba && *ba != *bb) return rule == EloStartRule::Youngest ? *ba > *bb : *ba < *bb;
    return a < b;
}

} // namespace

std::optional<double> informedStart(int f, const std::vector<double>& rating, const std::vector<bool>& rated,
                                    const std::vector<bool>& present, const EloFamily& family, EloStartRule rule)
{
    if (rule == EloStartRule::None) return std::nullopt;
    const auto fi = static_cast<size_t>(f);
    if (!family.female[fi]) return std::nullopt;
    const int m = family.mother[fi];
    auto counts = [&](int i) { return i >= 0 && i != f && rated[static_cast<size_t>(i)] && present[static_cast<size_t>(i)]; };
    if (!counts(m)) return std::nullopt;
    // U: the rated, present sister just before her in the rule's order, else the mother.
    int upper = m;
    const int n = static_cast<int>(rating.size());
    for (int s = 0; s < n; ++s) {
        if (s == f || family.mother[static_cast<size_t>(s)] != m || !counts(s)) continue;
        if (!sisterBefore(s, f, family, rule)) continue;
        if (upper == m || sisterBefore(upper, s, family, rule)) upper = s;
    }
    // L: the animal just below U in the current order of rated, present animals.
    std::vector<bool> include(rating.size(), false);
    for (int i = 0; i < n; ++i) include[static_cast<size_t>(i)] = counts(i);
    const std::vector<int> ranks = ordinalRanks(rating, include);
    const int below = ranks[static_cast<size_t>(upper)] + 1;
    const double ru = rating[static_cast<size_t>(upper)];
    for (int i = 0; i < n; ++i)
        if (ranks[static_cast<size_t>(i)] == below) return (ru + rating[static_cast<size_t>(i)]) / 2;
    return ru - kInformedStartOffset;
}

EloTrace traceElo(int n, const std::vector<Bout>& bouts, const std::vector<Day>& days, const EloSettings& settings,
                  EloStartRule rule, const EloFamily& family, const PresentOn& present,
                  const std::vector<size_t>& boutCounts, const EloObserver& observe)
{
    detail::checkBoutIndices(n, bouts);
    if (days.size() != bouts.size()) throw std::invalid_argument("traceElo: one day per bout is needed");
    const auto size = static_cast<size_t>(std::max(n, 0));
    if (rule != EloStartRule::None &&
        (family.mother.size() != size || family.birth.size() != size || family.female.size() != size))
        throw std::invalid_argument("traceElo: family facts for every animal are needed");
    for (size_t c : boutCounts)
        if (c > bouts.size()) throw std::out_of_range("traceElo: checkpoint beyond the last bout");
    std::vector<size_t> order(boutCounts.size());
    std::iota(order.begin(), order.end(), size_t{0});
    std::stable_sort(order.begin(), order.end(), [&](size_t a, size_t b) { return boutCounts[a] < boutCounts[b]; });

    EloTrace trace;
    trace.checkpoints.resize(boutCounts.size());
    trace.winnerChance.resize(bouts.size());
    trace.entry.assign(size, std::nullopt);
    std::vector<double> rating(size, settings.start);
    std::vector<unsigned char> rated(size, 0);
    std::vector<bool> ratedFlags(size, false);
    std::vector<bool> presentFlags(size, false);
    detail::EloTally tally;
    const bool ignoreDraws = settings.draws == DrawPolicy::Ignore;
    auto snapshot = [&] {
        EloRun run;
        run.rating = rating;
        run.rated.assign(rated.begin(), rated.end());
        run.logLikelihood = tally.logLikelihood;
        run.decided = tally.decided;
        return run;
    };
    size_t next = 0;
    auto readCheckpoints = [&](size_t done) {
        while (next < order.size() && boutCounts[order[next]] == done) trace.checkpoints[order[next++]] = snapshot();
    };
    readCheckpoints(0);
    for (size_t b = 0; b < bouts.size(); ++b) {
        const Bout& bout = bouts[b];
        const bool counted = !(bout.draw && ignoreDraws);
        if (rule != EloStartRule::None && counted) {
            const int newcomers[2] = {bout.winner, bout.loser};
            bool any = false;
            for (int a : newcomers) any = any || !rated[static_cast<size_t>(a)];
            if (any) {
                // Everyone rated before this bout and present that day; the two newcomers are not yet rated.
                for (size_t i = 0; i < size; ++i) {
                    ratedFlags[i] = rated[i] != 0;
                    presentFlags[i] = ratedFlags[i] && present(static_cast<int>(i), days[b]);
                }
                std::optional<double> start[2];
                for (int k = 0; k < 2; ++k)
                    if (!rated[static_cast<size_t>(newcomers[k])])
                        start[k] = informedStart(newcomers[k], rating, ratedFlags, presentFlags, family, rule);
                for (int k = 0; k < 2; ++k)
                    if (start[k]) {
                        rating[static_cast<size_t>(newcomers[k])] = *start[k];
                        trace.entry[static_cast<size_t>(newcomers[k])] = start[k];
                    }
            }
        }
        if (observe) observe(b, rating, rated);
        trace.winnerChance[b] = eloExpected(rating[static_cast<size_t>(bout.winner)] - rating[static_cast<size_t>(bout.loser)],
                                            settings.curve);
        detail::eloStepsFor<true>(settings.curve, &bout, &bout + 1, rating.data(), rated.data(), settings.k,
                                  ignoreDraws, tally);
        readCheckpoints(b + 1);
    }
    return trace;
}

} // namespace hierloom::core
