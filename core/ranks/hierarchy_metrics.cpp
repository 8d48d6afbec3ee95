// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/hierarchy_metrics.h"

#include "core/ranks/davids_score.h"
#include "core/ranks/directional_consistency.h"
#include "core/ranks/dyadic_dominance.h"
#include "core/ranks/elo_optimisation.h"
#include "core/ranks/linearity.h"
#include "core/base/number_format.h"
#include "core/ranks/steepness_test.h"
#include "core/ranks/triangle_transitivity.h"
#include "core/ranks/win_matrix.h"

namespace hierloom::core {

HierarchyMetrics computeHierarchyMetrics(const EncounterSelection& sel, DrawPolicy draws, int randomisations,
                                         std::uint64_t seed, unsigned threads)
{
    HierarchyMetrics out;
    const int n = sel.size();
    const WinMatrix m = WinMatrix::fromBouts(n, sel.bouts, draws);
    out.animals = n;
    out.encounters = static_cast<long long>(sel.bouts.size());
    const DyadCounts dc = dyadCounts(m);
    out.dyads = dc.dyads;
    out.knownDyads = dc.knownDyads;
    out.unknownShare = dc.unknownShare;
    const LinearityResult lin = linearity(m);
    out.landauH = lin.h;
    out.hPrime = lin.hPrime;
    out.dci = directionalConsistency(m);
    out.steepness = steepness(m);
    out.tTri = triangleTransitivity(m).tTri;
    out.seed = seed;
    out.randomisations = randomisations;
    if (randomisations > 0) {
        out.hPrimeP = linearityTest(m, randomisations, seed, threads).test.p;
        out.steepnessP = steepnessTest(m, randomisations, seed, threads).p;
        out.tTriP = triangleTransitivityTest(m, randomisations, seed, threads).p;
    }
    EloSettings settings;
    settings.draws = draws;
    if (const auto best = optimiseEloK(n, sel.bouts, settings, threads)) {
        out.eloKOptimal = best->k;
        out.eloLogLikelihood = best->logLikelihood;
    }
    return out;
}

std::vector<std::pair<std::string, std::string>> metricRows(const HierarchyMetrics& m)
{
    return {
        {"animals", std::to_string(m.animals)},
        {"encounters", std::to_string(m.encounters)},
        {"dyads", std::to_string(m.dyads)},
        {"known_dyads", std::to_string(m.knownDyads)},
        {"unknown_share", formatNumber(m.unknownShare)},
        {"landau_h", formatNumber(m.landauH)},
        {"h_prime", formatNumber(m.hPrime)},
        {"h_prime_p", formatNumber(m.hPrimeP)},
        {"dci", formatNumber(m.dci)},
        {"steepness", formatNumber(m.steepness)},
        {"steepness_p", formatNumber(m.steepnessP)},
        {"ttri", formatNumber(m.tTri)},
        {"ttri_p", formatNumber(m.tTriP)},
        {"elo_k_optimal", formatNumber(m.eloKOptimal)},
        {"elo_loglik", formatNumber(m.eloLogLikelihood)},
        {"seed", std::to_string(m.seed)},
        {"randomisations", std::to_string(m.randomisations)},
    };
}

} // namespace hierloom::core
