// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/sex_ratio_analysis.h"

#include "core/stats/fisher_exact.h"
#include "core/stats/wilson_interval.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

namespace {

MaternalRankRow birthAt(double rel, bool son)
{
    MaternalRankRow r;
    r.offspring = "o";
    r.mother = "m";
    r.sex = son ? Sex::Male : Sex::Female;
    r.atConception.relativeRank = rel;
    return r;
}

MaternalRankRow leftOut(BirthExclusion why)
{
    MaternalRankRow r;
    r.offspring = "o";
    r.sex = Sex::Female;
    r.exclusion = why;
    return r;
}

/// A mixed set: sons more common among low-ranking mothers, no separation.
std::vector<MaternalRankRow> mixedBirths()
{
    std::vector<MaternalRankRow> b;
    const double rel[] = {0.0, 0.1, 0.2, 0.25, 1.0 / 3.0, 0.4, 0.5, 0.5, 0.6, 2.0 / 3.0, 0.75, 0.8, 0.9, 1.0, 1.0};
    const bool son[] = {true, true, false, true, true, false, true, false, false, true, false, false, true, false, false};
    for (size_t i = 0; i < std::size(rel); ++i) b.push_back(birthAt(rel[i], son[i]));
    b.push_back(leftOut(BirthExclusion::MotherNotRated));
    b.push_back(leftOut(BirthExclusion::FewerThanTwoRanked));
    return b;
}

void expectSame(const std::optional<double>& a, const std::optional<double>& b)
{
    ASSERT_EQ(a.has_value(), b.has_value());
    if (a) {
        EXPECT_EQ(*a, *b);
    }
}

bool anyNan(const std::vector<std::pair<std::string, std::string>>& rows)
{
    for (const auto& [name, value] : rows)
        if (value.find("nan") != std::string::npos || value.find("inf") != std::string::npos) return true;
    return false;
}

} // namespace

TEST(SexRatioAnalysis, CountsAndLogisticEqualFitLogisticDirectly)
{
    const SexRatioAnalysis a = analyseSexRatio(mixedBirths());
    EXPECT_EQ(a.birthsUsed, 15);
    EXPECT_EQ(a.birthsLeftOut, 2);
    EXPECT_EQ(a.sons, 7);
    EXPECT_EQ(a.daughters, 8);
    // docs/methods.md: logistic regression of male (1) on relative rank at conception;
    // the figures must be fitLogistic's own, bit for bit.
    std::vector<double> x;
    std::vector<int> y;
    for (const MaternalRankRow& r : mixedBirths())
        if (r.exclusion == BirthExclusion::None) {
            x.push_back(*r.atConception.relativeRank);
            y.push_back(r.sex == Sex::Male ? 1 : 0);
        }
    const LogisticFit f = fitLogistic(x, y);
    ASSERT_TRUE(f.slope);
    expectSame(a.fit.intercept, f.intercept);
    expectSame(a.fit.slope, f.slope);
    expectSame(a.fit.slopeSe, f.slopeSe);
    expectSame(a.fit.slopeZ, f.slopeZ);
    expectSame(a.fit.slopeP, f.slopeP);
    expectSame(a.fit.slopeCiLow, f.slopeCiLow);
    expectSame(a.fit.slopeCiHigh, f.slopeCiHigh);
    expectSame(a.fit.lrChiSquare, f.lrChiSquare);
    expectSame(a.fit.lrP, f.lrP);
    EXPECT_LT(*a.fit.slope, 0.0); // sons commoner at low rank in this set
}

TEST(SexRatioAnalysis, FisherOnHighVersusLowEqualsFisherExactDirectly)
{
    const SexRatioAnalysis a = analyseSexRatio(mixedBirths());
    // docs/methods.md: high = relative rank >= 0.5 (both 0.5 births are high).
    // High: 0.5 M, 0.5 F, 0.6 F, 2/3 M, 0.75 F, 0.8 F, 0.9 M, 1 F, 1 F -> 3 sons, 6 daughters.
    // Low: 0 M, 0.1 M, 0.2 F, 0.25 M, 1/3 M, 0.4 F -> 4 sons, 2 daughters.
    EXPECT_EQ(a.highSons, 3);
    EXPECT_EQ(a.highDaughters, 6);
    EXPECT_EQ(a.lowSons, 4);
    EXPECT_EQ(a.lowDaughters, 2);
    ASSERT_TRUE(a.fisherP);
    EXPECT_EQ(*a.fisherP, fisherExact(3, 6, 4, 2)->twoSided);
}

TEST(SexRatioAnalysis, WilsonIntervalPerRankThird)
{
    const SexRatioAnalysis a = analyseSexRatio(mixedBirths());
    // docs/methods.md: low < 1/3 <= middle < 2/3 <= high.
    // low {0, 0.1, 0.2, 0.25}: 3 sons of 4; middle {1/3, 0.4, 0.5, 0.5, 0.6}: 2 of 5;
    // high {2/3, 0.75, 0.8, 0.9, 1, 1}: 2 of 6.
    const int births[] = {4, 5, 6};
    const int sons[] = {3, 2, 2};
    for (int t = 0; t < 3; ++t) {
        const RankThird& r = a.thirds[static_cast<size_t>(t)];
        EXPECT_EQ(r.births, births[t]) << r.name;
        EXPECT_EQ(r.sons, sons[t]) << r.name;
        EXPECT_EQ(r.proportion, static_cast<double>(sons[t]) / births[t]);
        const auto w = wilsonInterval(sons[t], births[t], kZ95); // docs/methods.md z = 1.959963984540054
        EXPECT_EQ(r.low, w->low);
        EXPECT_EQ(r.high, w->high);
    }
    EXPECT_EQ(a.thirds[0].name, "low");
    EXPECT_EQ(a.thirds[2].name, "high");
}

TEST(SexRatioAnalysis, PublishedWilsonExampleInOneThird)
{
    // Newcombe 1998, Stat. Med. 17:857-872, method 3: 15 of 148 gives
    // 0.0624-0.1605 [from memory; as in wilson_interval_test].
    std::vector<MaternalRankRow> b;
    for (int i = 0; i < 148; ++i) b.push_back(birthAt(0.9, i < 15));
    const SexRatioAnalysis a = analyseSexRatio(b);
    EXPECT_NEAR(*a.thirds[2].low, 0.0624, 5e-5);
    EXPECT_NEAR(*a.thirds[2].high, 0.1605, 5e-5);
    EXPECT_FALSE(a.thirds[0].proportion); // no births in the low third: empty, not 0
    EXPECT_FALSE(a.thirds[0].low);
}

TEST(SexRatioAnalysis, RowsInInterfaceOrder)
{
    const auto rows = sexRatioRows(analyseSexRatio(mixedBirths()));
    // docs/file-formats.md `sex-ratio` rows, in this order.
    const std::vector<std::string> names{"births_used", "births_left_out", "sons", "daughters", "intercept",
                                         "slope", "slope_se", "slope_z", "slope_p", "slope_ci_low",
                                         "slope_ci_high", "lr_chisq", "lr_p", "fisher_p"};
    ASSERT_EQ(rows.size(), names.size());
    for (size_t i = 0; i < names.size(); ++i) EXPECT_EQ(rows[i].first, names[i]);
    EXPECT_EQ(rows[0].second, "15");
    EXPECT_EQ(rows[1].second, "2");
}

TEST(SexRatioAnalysis, NoBirthsGiveEmptyFiguresAndNoNan)
{
    // docs/methods.md "Small choices": undefined figures empty; Fisher's p undefined without births.
    const SexRatioAnalysis a = analyseSexRatio({});
    const auto rows = sexRatioRows(a);
    EXPECT_EQ(rows[0].second, "0");
    for (size_t i = 4; i < rows.size(); ++i) EXPECT_EQ(rows[i].second, "") << rows[i].first;
    EXPECT_FALSE(anyNan(rows));
    for (const RankThird& t : a.thirds) EXPECT_FALSE(t.proportion);
}

TEST(SexRatioAnalysis, AllSonsLeaveTheRegressionEmpty)
{
    // docs/methods.md: offspring all of one sex -> the regression is undefined.
    std::vector<MaternalRankRow> b{birthAt(0.0, true), birthAt(0.5, true), birthAt(1.0, true)};
    const SexRatioAnalysis a = analyseSexRatio(b);
    const auto rows = sexRatioRows(a);
    EXPECT_EQ(a.sons, 3);
    EXPECT_EQ(a.daughters, 0);
    for (size_t i = 4; i < 13; ++i) EXPECT_EQ(rows[i].second, "") << rows[i].first;
    // Fisher's p is defined with births: a zero margin leaves one table, p = 1.
    EXPECT_EQ(rows[13].second, "1");
    EXPECT_FALSE(anyNan(rows));
}

TEST(SexRatioAnalysis, OneRankedFemaleLeavesEverythingOut)
{
    // Every birth left out as m < 2: no births used, every figure empty.
    std::vector<MaternalRankRow> b{leftOut(BirthExclusion::FewerThanTwoRanked),
                                   leftOut(BirthExclusion::FewerThanTwoRanked)};
    const auto rows = sexRatioRows(analyseSexRatio(b));
    EXPECT_EQ(rows[0].second, "0");
    EXPECT_EQ(rows[1].second, "2");
    for (size_t i = 4; i < rows.size(); ++i) EXPECT_EQ(rows[i].second, "") << rows[i].first;
    EXPECT_FALSE(anyNan(rows));
}
