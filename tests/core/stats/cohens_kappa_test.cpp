// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/cohens_kappa.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

// Textbook worked example: Fleiss, Levin & Paik, Statistical Methods for
// Rates and Proportions (3rd ed., 2003), chapter 18 (Table 18.1 there; Table
// 13.1 in Fleiss 1981): two psychiatrists' diagnoses of 100 subjects
// (psychotic, neurotic, organic), kappa = 0.68 (table and value from memory).
// Worked by hand: p_o = (75 + 4 + 10)/100 = 0.89; margins 80/10/10 and
// 80/5/15, p_e = (80*80 + 10*5 + 10*15)/100^2 = 0.66; kappa = 0.23/0.34 = 23/34.
TEST(CohensKappa, FleissWorkedExample)
{
    const KappaResult r = cohensKappa({{75, 1, 4}, {5, 4, 1}, {0, 0, 10}});
    EXPECT_EQ(r.items, 100);
    EXPECT_DOUBLE_EQ(r.observed, 0.89);
    EXPECT_DOUBLE_EQ(r.expected, 0.66);
    ASSERT_TRUE(r.kappa);
    EXPECT_NEAR(*r.kappa, 23.0 / 34.0, 1e-12);
    EXPECT_NEAR(*r.kappa, 0.68, 0.005);
}

// Identities (Cohen 1960): perfect agreement gives 1; agreement at exactly
// the chance level gives 0; no items, or one category only, leaves it undefined.
TEST(CohensKappa, Identities)
{
    EXPECT_DOUBLE_EQ(*cohensKappa({{6, 0}, {0, 4}}).kappa, 1.0);
    EXPECT_NEAR(*cohensKappa({{25, 25}, {25, 25}}).kappa, 0.0, 1e-15);
    EXPECT_FALSE(cohensKappa({{0, 0}, {0, 0}}).kappa);
    EXPECT_FALSE(cohensKappa({{7, 0}, {0, 0}}).kappa);
    // Hand-worked 2x2: 20/5/10/15 of 50: p_o = 0.7, p_e = 0.5*0.6 + 0.5*0.4 = 0.5, kappa = 0.4.
    EXPECT_NEAR(*cohensKappa({{20, 5}, {10, 15}}).kappa, 0.4, 1e-12);
}
