// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/bout.h"
#include "core/ranks/elo_rating.h"

#include <optional>
#include <vector>

namespace hierloom::core {

/// The maximum-likelihood Elo k of Foerster et al. (2016) and its log-likelihood.
struct EloOptimum {
    double k = 0;
    double logLikelihood = 0;
};

/// Log-likelihood L(k) of Foerster et al. (2016): the sum over decided bouts
/// of ln E(R_w - R_l) with ratings before each update, sequential Elo with
/// `settings` (as runElo, without building the rating table).
double eloLogLikelihood(int n, const std::vector<Bout>& bouts, const EloSettings& settings);

/// Optimised k (Foerster et al. 2016): the k in [0, 1000] maximising L(k),
/// found by a grid of step 5 and golden-section refinement of the best
/// grid cell (accurate well within 0.5); among equal L the smallest k;
/// settings.k is ignored. nullopt without decided bouts. `threads` share
/// the grid; the result does not depend on it.
std::optional<EloOptimum> optimiseEloK(int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                                       unsigned threads = 1);

} // namespace hierloom::core
