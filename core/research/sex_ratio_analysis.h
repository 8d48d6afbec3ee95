// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/stats/logistic_regression.h"
#include "core/research/maternal_rank.h"

#include <array>
#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace hierloom::core {

/// Sons among the births of one maternal rank third, with the proportion of
/// sons and its Wilson 95 % interval (Wilson 1927); empty without births.
struct RankThird {
    std::string name; ///< "low", "middle", "high"
    double lower = 0; ///< relative rank bounds: lower <= rel < upper (high: rel <= 1)
    double upper = 0;
    int births = 0;
    int sons = 0;
    std::optional<double> proportion;
    std::optional<double> low;
    std::optional<double> high;
};

/// The figures of the `sex-ratio` command (Trivers & Willard 1973; docs/methods.md
/// "Maternal rank and offspring sex ratio"): counts, the logistic regression
/// of male (1) on maternal relative rank at conception (fitLogistic), Fisher's
/// exact test of high (rel >= 0.5) vs low mothers by offspring sex, and the
/// proportion of sons per rank third (low < 1/3 <= middle < 2/3 <= high).
struct SexRatioAnalysis {
    int birthsUsed = 0;
    int birthsLeftOut = 0;
    int sons = 0;
    int daughters = 0;
    LogisticFit fit;
    int highSons = 0, highDaughters = 0, lowSons = 0, lowDaughters = 0;
    std::optional<double> fisherP; ///< two-sided; empty without births
    std::array<RankThird, 3> thirds; ///< low, middle, high
};

/// Computes every figure from the per-birth table (births with exclusion None).
SexRatioAnalysis analyseSexRatio(const std::vector<MaternalRankRow>& births);

/// The figures as (metric, value) rows in the order of docs/file-formats.md, values
/// in round-trip form and empty where undefined.
std::vector<std::pair<std::string, std::string>> sexRatioRows(const SexRatioAnalysis& a);

} // namespace hierloom::core
