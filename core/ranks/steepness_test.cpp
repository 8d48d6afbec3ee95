// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/steepness_test.h"

#include "core/ranks/davids_score.h"

#include <algorithm>
#include <bit>
#include <cmath>

namespace hierloom::core {

namespace {

struct Dyad {
    int i;
    int j;
    long long total;
};

/// Binomial(total, 1/2) as the number of set bits among `total` fair random bits.
long long fairBinomial(RandomEngine& engine, long long total)
{
    long long wins = 0;
    while (total >= 64) {
        wins += std::popcount(engine());
        total -= 64;
    }
    if (total > 0) wins += std::popcount(engine() & ((std::uint64_t{1} << total) - 1));
    return wins;
}

bool atLeast(double random, double observed)
{
    return random >= observed || std::fabs(random - observed) <= 1e-9 * std::max(std::fabs(random), std::fabs(observed));
}

} // namespace

RandomisationTest steepnessTest(const WinMatrix& m, int iterations, std::uint64_t seed, unsigned threads)
{
    RandomisationTest result;
    result.iterations = iterations;
    result.seed = seed;
    const int n = m.n;
    const std::optional<double> observed = steepness(m);
    if (!observed || iterations < 1) return result;

    std::vector<Dyad> dyads;
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j) {
            const long long total = std::llround(m.total(i, j));
            if (total > 0) dyads.push_back({i, j, total});
        }

    const auto un = static_cast<size_t>(n);
    const double half = static_cast<double>(n) * (n - 1) / 2.0;
    const std::vector<double> steep = runRandomisations<double>(iterations, seed, threads, [&](RandomEngine& engine, int) {
        std::vector<double> d(un * un, 0.0);
        for (const Dyad& dy : dyads) {
            const double wins = static_cast<double>(fairBinomial(engine, dy.total));
            const double tot = static_cast<double>(dy.total);
            d[static_cast<size_t>(dy.i) * un + static_cast<size_t>(dy.j)] = (wins + 0.5) / (tot + 1.0);
            d[static_cast<size_t>(dy.j) * un + static_cast<size_t>(dy.i)] = (tot - wins + 0.5) / (tot + 1.0);
        }
        std::vector<double> norm = davidsScoresFromIndex(d, n);
        for (double& v : norm) v = (v + half) / n;
        return *steepnessOfScores(norm);
    });

    long long count = 0;
    double sum = 0.0;
    for (double s : steep) {
        sum += s;
        if (atLeast(s, *observed)) ++count;
    }
    result.p = rightTailedP(count, iterations);
    result.meanRandom = sum / iterations;
    return result;
}

} // namespace hierloom::core
