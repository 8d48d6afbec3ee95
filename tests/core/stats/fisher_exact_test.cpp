// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/fisher_exact.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cstdint>

using namespace hierloom::core;

TEST(FisherExact, TeaTasting)
{
    // Fisher 1935, The Design of Experiments, ch. 2; R fisher.test help (Agresti 2002
    // p. 91) gives one-sided "greater" p = 0.2429 = 17/70 [confirmed, docs/methods.md, "Check values" 8].
    const auto r = fisherExact(3, 1, 1, 3);
    ASSERT_TRUE(r);
    EXPECT_NEAR(r->greater, 17.0 / 70.0, 1e-12);
    EXPECT_NEAR(r->greater, 0.2429, 5e-5);
    // Two-sided: the null distribution 1, 16, 36, 16, 1 of 70 [computed, docs/methods.md, "Check values" 8].
    EXPECT_NEAR(r->twoSided, 34.0 / 70.0, 1e-12);
    EXPECT_NEAR(r->less, 69.0 / 70.0, 1e-12);

    // All four cups right: 1/70 one-sided, 2/70 two-sided (Fisher 1935).
    const auto all = fisherExact(4, 0, 0, 4);
    ASSERT_TRUE(all);
    EXPECT_NEAR(all->greater, 1.0 / 70.0, 1e-12);
    EXPECT_NEAR(all->twoSided, 2.0 / 70.0, 1e-12);
    EXPECT_NEAR(all->less, 1.0, 1e-12);
}

TEST(FisherExact, LangeTwinConvictions)
{
    // Fisher's twins example from the R fisher.test help [table confirmed]; p values
    // [computed, docs/methods.md, "Check values" 8]: less 0.0004652, two-sided 0.0005367.
    const auto r = fisherExact(2, 15, 10, 3);
    ASSERT_TRUE(r);
    EXPECT_NEAR(r->less, 0.0004652, 5e-8);
    EXPECT_NEAR(r->twoSided, 0.0005367, 5e-8);
}

TEST(FisherExact, WhalesAndSharks)
{
    // SciPy fisher_exact docs, [[8, 2], [1, 5]]: two-sided 0.0349650 = 5/143
    // [table confirmed; p computed, docs/methods.md, "Check values" 8].
    const auto r = fisherExact(8, 2, 1, 5);
    ASSERT_TRUE(r);
    EXPECT_NEAR(r->twoSided, 5.0 / 143.0, 1e-12);
    EXPECT_NEAR(r->twoSided, 0.0349650, 5e-8);
}

TEST(FisherExact, EmptyAndDegenerateTables)
{
    EXPECT_FALSE(fisherExact(0, 0, 0, 0)); // docs/methods.md: no p without births
    EXPECT_FALSE(fisherExact(-1, 2, 3, 4));
    // A single possible table (a zero margin) has p = 1 in every direction.
    const auto r = fisherExact(0, 0, 3, 5);
    ASSERT_TRUE(r);
    EXPECT_DOUBLE_EQ(r->twoSided, 1.0);
    EXPECT_DOUBLE_EQ(r->less, 1.0);
    EXPECT_DOUBLE_EQ(r->greater, 1.0);
}

namespace {

std::uint64_t choose(std::int64_t n, std::int64_t k)
{
    if (k < 0 || k > n)
        return 0;
    std::uint64_t c = 1;
    for (std::int64_t i = 1; i <= k; ++i)
        c = c * static_cast<std::uint64_t>(n - k + i) / static_cast<std::uint64_t>(i);
    return c;
}

} // namespace

TEST(FisherExact, MatchesExactIntegerEnumeration)
{
    // Brute force on small tables: every table with the observed margins weighted by
    // the integer C(r1, x) C(r2, c1 - x), so "no more probable" is decided exactly.
    for (int a = 0; a <= 6; ++a)
        for (int b = 0; b <= 5; ++b)
            for (int c = 0; c <= 5; ++c)
                for (int d = 0; d <= 6; ++d) {
                    if (a + b + c + d == 0)
                        continue;
                    const std::int64_t r1 = a + b, r2 = c + d, c1 = a + c;
                    const std::int64_t lo = std::max<std::int64_t>(0, c1 - r2);
                    const std::int64_t hi = std::min(r1, c1);
                    const std::uint64_t obs = choose(r1, a) * choose(r2, c1 - a);
                    std::uint64_t total = 0, less = 0, greater = 0, two = 0;
                    for (std::int64_t x = lo; x <= hi; ++x) {
                        const std::uint64_t w = choose(r1, x) * choose(r2, c1 - x);
                        total += w;
                        if (x <= a)
                            less += w;
                        if (x >= a)
                            greater += w;
                        if (w <= obs)
                            two += w;
                    }
                    const auto r = fisherExact(a, b, c, d);
                    ASSERT_TRUE(r);
                    const double t = static_cast<double>(total);
                    EXPECT_NEAR(r->less, static_cast<double>(less) / t, 1e-12);
                    EXPECT_NEAR(r->greater, static_cast<double>(greater) / t, 1e-12);
                    EXPECT_NEAR(r->twoSided, static_cast<double>(two) / t, 1e-12)
                        << a << ' ' << b << ' ' << c << ' ' << d;
                }
}

TEST(FisherExact, LargeTableDoesNotUnderflow)
{
    // Identity: the tails overlap in the observed table, so less + greater >= 1, and
    // transposing the table leaves every p unchanged.
    // Identity: the two tails overlap in the observed table, so less + greater >= 1,
    // and transposing the table leaves every p unchanged. The large table checks
    // that the scaled lgamma sums neither overflow nor turn into NaN.
    const auto r = fisherExact(900, 100, 100, 900);
    ASSERT_TRUE(r);
    EXPECT_GT(r->less, 0.999);
    EXPECT_LE(r->less, 1.0);
    EXPECT_GE(r->greater, 0.0);
    EXPECT_LT(r->greater, 1e-100);
    EXPECT_NEAR(r->twoSided, r->greater * 2.0, 1e-9 * r->greater); // symmetric margins
    const auto u = fisherExact(30, 12, 7, 25);
    const auto ut = fisherExact(30, 7, 12, 25);
    ASSERT_TRUE(u && ut);
    EXPECT_NEAR(u->twoSided, ut->twoSided, 1e-14);
    EXPECT_NEAR(u->less, ut->less, 1e-14);
    EXPECT_GE(u->less + u->greater, 1.0);
}

TEST(FisherExact, TwoSidedPToTheLastDigitsOfExactArithmetic)
{
    // Reference: the two-sided p of each table summed exactly over rationals
    // (C(r1, x) C(r2, c1 - x) / C(n, c1), Python's fractions module, printed with
    // 30 digits by mpmath) [computed]. Boost.Math's hypergeometric probabilities
    // keep about 15 digits; sums of exp(lgamma) terms lost up to 13.
    struct Case {
        int a, b, c, d;
        double exact;
    };
    const Case cases[] = {
        {8, 8, 10, 36, 0.0531190917138092086817987183244},
        {40, 60, 55, 45, 0.0471654853830192796157535522439},
        {200, 180, 150, 230, 0.000356046791879911815262359440325},
    };
    for (const Case& k : cases) {
        const auto r = fisherExact(k.a, k.b, k.c, k.d);
        ASSERT_TRUE(r);
        EXPECT_NEAR(r->twoSided, k.exact, 2e-15 * k.exact) << k.a << ' ' << k.b << ' ' << k.c << ' ' << k.d;
    }
}
