// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/bout.h"
#include "core/base/civil_date.h"

#include <cstddef>
#include <vector>

namespace hierloom::core {

/// Shape of the Elo expectancy curve (Elo 1978): logistic base 10 over 400
/// points (default), or the normal curve with performance sd 200.
enum class EloCurve { Logistic, Normal };

/// Parameters of sequential Elo rating (Elo 1978; Albers & de Vries 2001;
/// Neumann et al. 2011) with the defaults of docs/methods.md.
struct EloSettings {
    double start = 1000;
    double k = 100;
    EloCurve curve = EloCurve::Logistic;
    DrawPolicy draws = DrawPolicy::Half;
};

/// Expected probability that an animal rated d points above its opponent
/// wins (Elo 1978): logistic 1/(1+10^(-d/400)) or normal Phi(d/(200*sqrt 2)).
double eloExpected(double d, EloCurve curve);

/// State of a sequential Elo run (Elo 1978; Neumann et al. 2011): ratings, which
/// animals have been rated, and the Foerster et al. (2016) log-likelihood.
struct EloRun {
    std::vector<double> rating; ///< the start value for animals not yet rated
    std::vector<bool> rated;    ///< the animal had at least one counted encounter
    double logLikelihood = 0;   ///< sum over decided encounters of ln E(R_w - R_l), before update
    int decided = 0;            ///< decided (non-draw) encounters counted
};

/// Sequential Elo rating (Elo 1978; Albers & de Vries 2001; Neumann et al.
/// 2011) of animals 0..n-1 over chronological bouts: decided bouts move
/// k(1-E) from loser to winner, draws k(0.5-E) (skipped entirely under
/// DrawPolicy::Ignore). Bouts need winner != loser; an index outside [0, n)
/// throws std::out_of_range.
EloRun runElo(int n, const std::vector<Bout>& bouts, const EloSettings& settings);

/// Sequential Elo (as runElo) read at several points in one pass: result[c]
/// is the run after the first boutCounts[c] bouts (any order of counts);
/// a count beyond bouts.size() throws std::out_of_range.
std::vector<EloRun> eloAtCheckpoints(int n, const std::vector<Bout>& bouts, const std::vector<size_t>& boutCounts,
                                     const EloSettings& settings);

/// Elo ratings (as runElo) after the last bout of one day.
struct EloDay {
    Day day = 0;
    std::vector<double> rating;
    std::vector<bool> rated;
};

/// Daily Elo history (Neumann et al. 2011 "ratings at date D"): days[i] is
/// the day of bouts[i], non-decreasing; one entry per distinct day holding
/// the ratings after that day's last bout. Throws std::invalid_argument when
/// days is shorter/longer than bouts or decreases.
std::vector<EloDay> eloDailyHistory(int n, const std::vector<Bout>& bouts, const std::vector<Day>& days,
                                    const EloSettings& settings);

} // namespace hierloom::core
