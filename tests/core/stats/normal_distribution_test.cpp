// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/normal_distribution.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom::core;

TEST(NormalDistribution, CdfTableValues)
{
    // Abramowitz & Stegun 1964, Table 26.1 [from memory]: Phi(1) = 0.8413447461,
    // Phi(2) = 0.9772498681; Phi(0) = 1/2 by symmetry.
    EXPECT_DOUBLE_EQ(normalCdf(0.0), 0.5);
    EXPECT_NEAR(normalCdf(1.0), 0.8413447461, 1e-10);
    EXPECT_NEAR(normalCdf(2.0), 0.9772498681, 1e-10);
    EXPECT_NEAR(normalCdf(-1.0), 1.0 - 0.8413447461, 1e-10);
    // docs/methods.md: z = 1.959963984540054 is the 97.5 % quantile.
    EXPECT_NEAR(normalCdf(1.959963984540054), 0.975, 1e-15);
}

TEST(NormalDistribution, UpperTailKeepsDigitsFarOut)
{
    // Identity Q(z) = Phi(-z); far out the direct form keeps relative accuracy
    // (Q(10) = 7.6198530241605e-24, A&S 26.2.12 asymptotics [from memory]).
    EXPECT_DOUBLE_EQ(normalUpperTail(1.5), normalCdf(-1.5));
    EXPECT_NEAR(normalUpperTail(10.0) / 7.6198530241605e-24, 1.0, 1e-12);
}

TEST(NormalDistribution, TwoSidedAndChiSquareAgree)
{
    // Identity: a chi-square(1) variable is Z^2, so its upper tail at z^2 is the
    // two-sided normal p at z.
    for (double z : {0.1, 0.5, 1.0, 1.96, 2.5, 3.3, 5.0, 8.0})
        EXPECT_NEAR(chiSquare1UpperP(z * z) / twoSidedNormalP(z), 1.0, 1e-13) << z;
    // Textbook critical values: chi-square(1) 3.841458820694124 -> 0.05 and
    // 6.634896601021214 -> 0.01 (A&S Table 26.8 [from memory]).
    EXPECT_NEAR(chiSquare1UpperP(3.841458820694124), 0.05, 1e-14);
    EXPECT_NEAR(chiSquare1UpperP(6.634896601021214), 0.01, 1e-14);
    EXPECT_NEAR(twoSidedNormalP(-1.959963984540054), 0.05, 1e-15);
    EXPECT_DOUBLE_EQ(chiSquare1UpperP(0.0), 1.0);
    EXPECT_DOUBLE_EQ(chiSquare1UpperP(-1.0), 1.0);
    EXPECT_DOUBLE_EQ(twoSidedNormalP(0.0), 1.0);
}

TEST(NormalDistribution, TwoSidedPToTheLastDigitsOfArbitraryPrecision)
{
    // Reference: erfc(|z| / sqrt 2) evaluated with 40 digits by mpmath [computed].
    EXPECT_NEAR(twoSidedNormalP(-1.4179520454417285), 0.1562047658522882149340862055566593381048, 1e-16);
    EXPECT_NEAR(twoSidedNormalP(3.5) / 0.0004652581580710500726998517734559695470975, 1.0, 1e-15);
    EXPECT_NEAR(twoSidedNormalP(0.25), 0.8025873486341525515182924168379325214359, 1e-15);
}
