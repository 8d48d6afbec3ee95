// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/sex_ratio_analysis.h"

#include "core/stats/fisher_exact.h"
#include "core/base/number_format.h"
#include "core/stats/wilson_interval.h"

namespace hierloom::core {

SexRatioAnalysis analyseSexRatio(const std::vector<MaternalRankRow>& births)
{
    SexRatioAnalysis a;
    const char* names[] = {"low", "middle", "high"};
    for (size_t t = 0; t < 3; ++t) {
        a.thirds[t].name = names[t];
        a.thirds[t].lower = static_cast<double>(t) / 3.0;
        a.thirds[t].upper = t == 2 ? 1.0 : static_cast<double>(t + 1) / 3.0;
    }
    std::vector<double> x;
    std::vector<int> y;
    for (const MaternalRankRow& b : births) {
        if (b.exclusion != BirthExclusion::None || !b.atConception.relativeRank) {
            ++a.birthsLeftOut;
            continue;
        }
        const double rel = *b.atConception.relativeRank;
        const bool son = b.sex == Sex::Male;
        ++a.birthsUsed;
        (son ? a.sons : a.daughters) += 1;
        x.push_back(rel);
        y.push_back(son ? 1 : 0);
        if (rel >= 0.5)
            (son ? a.highSons : a.highDaughters) += 1;
        else
            (son ? a.lowSons : a.lowDaughters) += 1;
        // docs/methods.md: low < 1/3 <= middle < 2/3 <= high.
        RankThird& t = a.thirds[rel < 1.0 / 3.0 ? 0 : rel < 2.0 / 3.0 ? 1 : 2];
        ++t.births;
        if (son) ++t.sons;
    }
    a.fit = fitLogistic(x, y);
    if (const auto f = fisherExact(a.highSons, a.highDaughters, a.lowSons, a.lowDaughters)) a.fisherP = f->twoSided;
    for (RankThird& t : a.thirds) {
        if (t.births == 0) continue;
        t.proportion = static_cast<double>(t.sons) / t.births;
        if (const auto w = wilsonInterval(t.sons, t.births, kZ95)) {
            t.low = w->low;
            t.high = w->high;
        }
    }
    return a;
}

std::vector<std::pair<std::string, std::string>> sexRatioRows(const SexRatioAnalysis& a)
{
    return {
        {"births_used", std::to_string(a.birthsUsed)},
        {"births_left_out", std::to_string(a.birthsLeftOut)},
        {"sons", std::to_string(a.sons)},
        {"daughters", std::to_string(a.daughters)},
        {"intercept", formatNumber(a.fit.intercept)},
        {"slope", formatNumber(a.fit.slope)},
        {"slope_se", formatNumber(a.fit.slopeSe)},
        {"slope_z", formatNumber(a.fit.slopeZ)},
        {"slope_p", formatNumber(a.fit.slopeP)},
        {"slope_ci_low", formatNumber(a.fit.slopeCiLow)},
        {"slope_ci_high", formatNumber(a.fit.slopeCiHigh)},
        {"lr_chisq", formatNumber(a.fit.lrChiSquare)},
        {"lr_p", formatNumber(a.fit.lrP)},
        {"fisher_p", formatNumber(a.fisherP)},
    };
}

} // namespace hierloom::core
