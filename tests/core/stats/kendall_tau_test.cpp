// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/kendall_tau.h"

#include <gtest/gtest.h>

#include <cmath>
#include <vector>

using namespace hierloom::core;

TEST(KendallTau, SciPyDocExample)
{
    // SciPy kendalltau docs: x = [12, 2, 1, 12, 2], y = [1, 4, 7, 1, 0] gives
    // tau-b = -0.47140452079103173 [from memory; recomputed, docs/methods.md, "Check values" 7].
    const std::vector<double> x{12, 2, 1, 12, 2};
    const std::vector<double> y{1, 4, 7, 1, 0};
    const auto t = kendallTauB(x, y);
    ASSERT_TRUE(t);
    EXPECT_NEAR(*t, -0.47140452079103173, 1e-15);
    // Identity: C = 2, D = 6, T = 1 tied in x only, U = 0 (one pair tied in both):
    // (C - D) / sqrt((C + D + T)(C + D + U)) = -4 / sqrt(9 * 8).
    EXPECT_NEAR(*t, -4.0 / std::sqrt(72.0), 1e-15);
}

TEST(KendallTau, AgrestiIncomeJobSatisfaction)
{
    // Agresti 2002, Categorical Data Analysis, p. 57: income x job satisfaction, 4x4
    // table expanded into paired observations; tau-b = 0.1524 [confirmed, docs/methods.md, "Check values" 7].
    const int counts[4][4] = {{1, 3, 10, 6}, {2, 3, 10, 7}, {1, 6, 14, 12}, {0, 1, 9, 11}};
    std::vector<double> income, satisfaction;
    for (int i = 0; i < 4; ++i)
        for (int j = 0; j < 4; ++j)
            for (int c = 0; c < counts[i][j]; ++c) {
                income.push_back(i + 1);
                satisfaction.push_back(j + 1);
            }
    ASSERT_EQ(income.size(), 96U);
    const auto t = kendallTauB(income, satisfaction);
    ASSERT_TRUE(t);
    EXPECT_NEAR(*t, 0.1524, 5e-5);
    // Symmetric in its arguments.
    EXPECT_DOUBLE_EQ(*kendallTauB(satisfaction, income), *t);
}

TEST(KendallTau, PerfectOrdersAndUndefinedCases)
{
    const std::vector<double> up{1, 2, 3, 4, 5};
    const std::vector<double> down{5, 4, 3, 2, 1};
    const std::vector<double> flat{2, 2, 2, 2, 2};
    EXPECT_DOUBLE_EQ(*kendallTauB(up, up), 1.0);
    EXPECT_DOUBLE_EQ(*kendallTauB(up, down), -1.0);
    EXPECT_FALSE(kendallTauB(up, flat)); // zero denominator
    EXPECT_FALSE(kendallTauB(std::vector<double>{1}, std::vector<double>{2}));
    EXPECT_FALSE(kendallTauB(std::vector<double>{}, std::vector<double>{}));
    EXPECT_FALSE(kendallTauB(up, std::vector<double>{1, 2}));
}
