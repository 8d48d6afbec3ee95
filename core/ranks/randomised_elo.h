// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/bout.h"
#include "core/ranks/elo_rating.h"

#include <atomic>
#include <cstdint>
#include <vector>

namespace hierloom::core {

/// One animal's summary over the random orders of randomised Elo
/// (Sanchez-Tojar, Schroeder & Farine 2018).
struct RandomisedEloRow {
    bool rated = false;   ///< the animal has a counted bout; otherwise the figures below are not defined
    double meanRating = 0;
    double low = 0;       ///< 2.5 % quantile of the final rating (type-7, linear interpolation)
    double high = 0;      ///< 97.5 % quantile of the final rating (type-7, linear interpolation)
    double meanRank = 0;  ///< mean ordinal rank among rated animals (1 = top)
};

/// Randomised Elo (Sanchez-Tojar, Schroeder & Farine 2018): sequential Elo
/// over `iterations` random orders of the counted bouts (Fisher-Yates with
/// unbiased bounded draws, streams from runRandomisations so the result is
/// the same for any thread count); per animal the mean final rating, its
/// 2.5 % and 97.5 % quantiles (Hyndman & Fan 1996 type 7: x[h] interpolated
/// linearly at h = (N-1)p over the sorted values) and the mean ordinal rank
/// (ordinalRanks among rated animals). Empty when iterations < 1, or when
/// `cancel` is set before the end (the remaining orders are skipped).
std::vector<RandomisedEloRow> randomisedElo(int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                                            int iterations, std::uint64_t seed, unsigned threads,
                                            const std::atomic<bool>* cancel = nullptr);

} // namespace hierloom::core
