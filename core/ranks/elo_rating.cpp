// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/elo_rating.h"

#include "core/ranks/elo_kernel.h"

#include <algorithm>
#include <cmath>
#include <numeric>
#include <stdexcept>
#include <string>

namespace hierloom::core {

namespace detail {

void checkBoutIndices(int n, const std::vector<Bout>& bouts)
{
    const auto limit = static_cast<unsigned>(std::max(n, 0));
    for (const Bout& b : bouts)
        if (static_cast<unsigned>(b.winner) >= limit || static_cast<unsigned>(b.loser) >= limit)
            throw std::out_of_range("Elo: a bout names an animal outside 0.." + std::to_string(n - 1));
}

} // namespace detail

double eloExpected(double d, EloCurve curve)
{
    if (curve == EloCurve::Normal) return 0.5 * std::erfc(-d * detail::kEloNormalScale);
    return 1.0 / (1.0 + std::exp(-d * detail::kEloLogisticScale));
}

namespace {

EloRun snapshot(const std::vector<double>& rating, const std::vector<unsigned char>& rated, const detail::EloTally& tally)
{
    EloRun run;
    run.rating = rating;
    run.rated.assign(rated.begin(), rated.end());
    run.logLikelihood = tally.logLikelihood;
    run.decided = tally.decided;
    return run;
}

} // namespace

std::vector<EloRun> eloAtCheckpoints(int n, const std::vector<Bout>& bouts, const std::vector<size_t>& boutCounts,
                                     const EloSettings& settings)
{
    detail::checkBoutIndices(n, bouts);
    for (size_t c : boutCounts)
        if (c > bouts.size()) throw std::out_of_range("eloAtCheckpoints: checkpoint beyond the last bout");
    // Visit checkpoints in increasing count so the bouts are run once.
    std::vector<size_t> order(boutCounts.size());
    std::iota(order.begin(), order.end(), size_t{0});
    std::stable_sort(order.begin(), order.end(), [&](size_t a, size_t b) { return boutCounts[a] < boutCounts[b]; });

    const auto size = static_cast<size_t>(std::max(n, 0));
    std::vector<double> rating(size, settings.start);
    std::vector<unsigned char> rated(size, 0);
    detail::EloTally tally;
    const bool ignoreDraws = settings.draws == DrawPolicy::Ignore;
    std::vector<EloRun> result(boutCounts.size());
    size_t done = 0;
    for (size_t idx : order) {
        const size_t target = boutCounts[idx];
        detail::eloStepsFor<true>(settings.curve, bouts.data() + done, bouts.data() + target, rating.data(),
                                  rated.data(), settings.k, ignoreDraws, tally);
        done = target;
        result[idx] = snapshot(rating, rated, tally);
    }
    return result;
}

EloRun runElo(int n, const std::vector<Bout>& bouts, const EloSettings& settings)
{
    return std::move(eloAtCheckpoints(n, bouts, {bouts.size()}, settings).front());
}

std::vector<EloDay> eloDailyHistory(int n, const std::vector<Bout>& bouts, const std::vector<Day>& days,
                                    const EloSettings& settings)
{
    if (days.size() != bouts.size()) throw std::invalid_argument("eloDailyHistory: one day per bout is needed");
    std::vector<size_t> counts;
    std::vector<Day> distinct;
    for (size_t i = 0; i < days.size(); ++i) {
        if (i > 0 && days[i] < days[i - 1]) throw std::invalid_argument("eloDailyHistory: days must not decrease");
        if (i + 1 == days.size() || days[i + 1] != days[i]) {
            counts.push_back(i + 1);
            distinct.push_back(days[i]);
        }
    }
    std::vector<EloRun> runs = eloAtCheckpoints(n, bouts, counts, settings);
    std::vector<EloDay> history(runs.size());
    for (size_t i = 0; i < runs.size(); ++i)
        history[i] = EloDay{distinct[i], std::move(runs[i].rating), std::move(runs[i].rated)};
    return history;
}

} // namespace hierloom::core
