// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/wilson_interval.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

namespace {

void expectInterval(std::int64_t k, std::int64_t n, double low, double high, double tol)
{
    const auto w = wilsonInterval(k, n);
    ASSERT_TRUE(w) << k << '/' << n;
    EXPECT_NEAR(w->low, low, tol) << k << '/' << n;
    EXPECT_NEAR(w->high, high, tol) << k << '/' << n;
}

} // namespace

TEST(WilsonInterval, Newcombe1998Table)
{
    // Newcombe 1998, Stat. Med. 17:857-872, illustrative intervals, method 3, printed
    // to 4 decimals [from memory; recomputed, docs/methods.md, "Check values" 9].
    expectInterval(81, 263, 0.2553, 0.3662, 5e-5);
    expectInterval(15, 148, 0.0624, 0.1605, 5e-5);
    expectInterval(0, 20, 0.0000, 0.1611, 5e-5);
    expectInterval(1, 29, 0.0061, 0.1718, 5e-5);
}

TEST(WilsonInterval, FurtherValues)
{
    // docs/methods.md, "Check values" 9, extra rows [computed regression values].
    expectInterval(23, 60, 0.2709, 0.5098, 5e-5);
    expectInterval(0, 8, 0.0, 0.3244, 5e-5);
}

TEST(WilsonInterval, IdentitiesAndEdges)
{
    // Identity: the interval of n - k of n mirrors that of k of n.
    const auto a = wilsonInterval(7, 19);
    const auto b = wilsonInterval(12, 19);
    ASSERT_TRUE(a && b);
    EXPECT_NEAR(a->low, 1.0 - b->high, 1e-15);
    EXPECT_NEAR(a->high, 1.0 - b->low, 1e-15);
    // Identity: with z = 0 the interval collapses to k / n.
    const auto z0 = wilsonInterval(3, 8, 0.0);
    ASSERT_TRUE(z0);
    EXPECT_DOUBLE_EQ(z0->low, 0.375);
    EXPECT_DOUBLE_EQ(z0->high, 0.375);
    // Limits at k = 0 and k = n are exactly 0 and 1.
    const auto all = wilsonInterval(20, 20);
    ASSERT_TRUE(all);
    EXPECT_EQ(all->high, 1.0);
    EXPECT_NEAR(all->low, 1.0 - 0.1611, 5e-5); // mirror of Newcombe's 0/20
    EXPECT_EQ(wilsonInterval(0, 20)->low, 0.0);
    // Undefined without observations, or with an impossible count.
    EXPECT_FALSE(wilsonInterval(0, 0));
    EXPECT_FALSE(wilsonInterval(3, 2));
    EXPECT_FALSE(wilsonInterval(-1, 2));
}
