// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/randomised_elo.h"

#include "core/ranks/elo_kernel.h"
#include "core/ranks/ordinal_ranks.h"
#include "core/ranks/parallel_randomisation.h"

#include <algorithm>
#include <cmath>
#include <utility>

namespace hierloom::core {

namespace {

__extension__ typedef unsigned __int128 Wide;

/// Uniform integer in [0, bound), bound >= 1, without bias (Lemire 2019,
/// multiply-and-reject); written out so the stream does not depend on the
/// standard library's distribution classes.
std::uint64_t uniformBelow(RandomEngine& engine, std::uint64_t bound)
{
    Wide product = static_cast<Wide>(engine()) * bound;
    auto low = static_cast<std::uint64_t>(product);
    if (low < bound) {
        const std::uint64_t threshold = (0 - bound) % bound;
        while (low < threshold) {
            product = static_cast<Wide>(engine()) * bound;
            low = static_cast<std::uint64_t>(product);
        }
    }
    return static_cast<std::uint64_t>(product >> 64);
}

/// A counted bout in one word: winner in the low 32 bits, loser in the next
/// 31, the draw in the top bit. The shuffles move these 8 bytes instead of a
/// 12-byte Bout (a tenth less time).
using PackedBout = std::uint64_t;

PackedBout pack(const Bout& b)
{
    return static_cast<std::uint64_t>(static_cast<std::uint32_t>(b.winner))
           | static_cast<std::uint64_t>(static_cast<std::uint32_t>(b.loser)) << 32
           | static_cast<std::uint64_t>(b.draw) << 63;
}

/// Fisher-Yates shuffle (Durstenfeld 1964) from the back.
void shuffleBouts(std::vector<PackedBout>& bouts, RandomEngine& engine)
{
    for (size_t i = bouts.size(); i > 1; --i) {
        const auto j = static_cast<size_t>(uniformBelow(engine, i));
        std::swap(bouts[i - 1], bouts[j]);
    }
}

/// Sequential Elo over one order of counted bouts (the shared kernel, elo_kernel.h).
template <EloCurve Curve>
void eloOverOrder(const std::vector<PackedBout>& order, double* rating, unsigned char* seen, double k)
{
    double unusedLikelihood = 0;
    int unusedDecided = 0;
    for (const PackedBout b : order)
        detail::eloStep<Curve, false>(static_cast<int>(b & 0xFFFFFFFFU), static_cast<int>((b >> 32) & 0x7FFFFFFFU),
                                      (b >> 63) != 0, rating, seen, k, false, unusedLikelihood, unusedDecided);
}

/// Type-7 quantile (Hyndman & Fan 1996) of sorted values.
double quantileType7(const std::vector<double>& sorted, double p)
{
    const double h = (static_cast<double>(sorted.size()) - 1.0) * p;
    const auto lo = static_cast<size_t>(std::floor(h));
    if (lo + 1 >= sorted.size()) return sorted.back();
    return sorted[lo] + (h - static_cast<double>(lo)) * (sorted[lo + 1] - sorted[lo]);
}

struct Outcome {
    std::vector<double> rating;
    std::vector<int> rank;
};

} // namespace

std::vector<RandomisedEloRow> randomisedElo(int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                                            int iterations, std::uint64_t seed, unsigned threads,
                                            const std::atomic<bool>* cancel)
{
    detail::checkBoutIndices(n, bouts);
    if (iterations < 1) return {};
    const auto size = static_cast<size_t>(std::max(n, 0));

    // Ignored draws are no encounters at all, so they are not shuffled either.
    std::vector<PackedBout> counted;
    counted.reserve(bouts.size());
    std::vector<bool> rated(size, false);
    for (const Bout& b : bouts) {
        if (b.draw && settings.draws == DrawPolicy::Ignore) continue;
        counted.push_back(pack(b));
        rated[static_cast<size_t>(b.winner)] = true;
        rated[static_cast<size_t>(b.loser)] = true;
    }

    std::vector<std::vector<PackedBout>> buffers(
        static_cast<size_t>((iterations + kRandomisationBlock - 1) / kRandomisationBlock));
    const std::vector<Outcome> outcomes = runRandomisations<Outcome>(
        iterations, seed, threads, [&](RandomEngine& engine, int it) {
            if (cancel && cancel->load(std::memory_order_relaxed)) return Outcome{};
            // One buffer per block (its iterations run one after the other on one thread),
            // refilled for every order and freed after the block's last.
            const int block = it / kRandomisationBlock;
            std::vector<PackedBout>& order = buffers[static_cast<size_t>(block)];
            order.assign(counted.begin(), counted.end());
            shuffleBouts(order, engine);
            Outcome out;
            out.rating.assign(size, settings.start);
            std::vector<unsigned char> seen(size, 0);
            if (settings.curve == EloCurve::Logistic)
                eloOverOrder<EloCurve::Logistic>(order, out.rating.data(), seen.data(), settings.k);
            else
                eloOverOrder<EloCurve::Normal>(order, out.rating.data(), seen.data(), settings.k);
            out.rank = ordinalRanks(out.rating, rated);
            if ((it + 1) % kRandomisationBlock == 0 || it + 1 == iterations) std::vector<PackedBout>().swap(order);
            return out;
        });

    if (cancel && cancel->load()) return {};
    // Sums run in iteration order, so they do not depend on the thread count.
    std::vector<RandomisedEloRow> rows(size);
    std::vector<double> values(static_cast<size_t>(iterations));
    const double count = static_cast<double>(iterations);
    for (size_t a = 0; a < size; ++a) {
        if (!rated[a]) continue;
        double ratingSum = 0;
        long long rankSum = 0;
        for (size_t it = 0; it < outcomes.size(); ++it) {
            values[it] = outcomes[it].rating[a];
            ratingSum += values[it];
            rankSum += outcomes[it].rank[a];
        }
        std::sort(values.begin(), values.end());
        RandomisedEloRow& row = rows[a];
        row.rated = true;
        row.meanRating = ratingSum / count;
        row.low = quantileType7(values, 0.025);
        row.high = quantileType7(values, 0.975);
        row.meanRank = static_cast<double>(rankSum) / count;
    }
    return rows;
}

} // namespace hierloom::core
