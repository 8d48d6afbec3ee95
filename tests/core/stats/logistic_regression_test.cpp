// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/logistic_regression.h"

#include <gtest/gtest.h>

#include <cmath>
#include <vector>

using namespace hierloom::core;

namespace {

// A 2x2 table as observations: x = 0 with n00 zeros and n01 ones, x = 1 with n10 zeros
// and n11 ones.
struct Data {
    std::vector<double> x;
    std::vector<int> y;
};

Data fromTable(int n00, int n01, int n10, int n11)
{
    Data d;
    auto add = [&d](double x, int y, int count) {
        for (int i = 0; i < count; ++i) {
            d.x.push_back(x);
            d.y.push_back(y);
        }
    };
    add(0, 0, n00);
    add(0, 1, n01);
    add(1, 0, n10);
    add(1, 1, n11);
    return d;
}

// G statistic 2 sum O ln(O / E) of a 2x2 table, E = row * column / n: the
// likelihood-ratio chi-square of the binary-predictor model against the null.
double gStatistic(double n00, double n01, double n10, double n11)
{
    const double n = n00 + n01 + n10 + n11;
    const double r0 = n00 + n01, r1 = n10 + n11, c0 = n00 + n10, c1 = n01 + n11;
    auto term = [n](double o, double r, double c) { return o * std::log(o / (r * c / n)); };
    return 2.0 * (term(n00, r0, c0) + term(n01, r0, c1) + term(n10, r1, c0) + term(n11, r1, c1));
}

void expectEmpty(const LogisticFit& f)
{
    EXPECT_FALSE(f.intercept);
    EXPECT_FALSE(f.interceptSe);
    EXPECT_FALSE(f.slope);
    EXPECT_FALSE(f.slopeSe);
    EXPECT_FALSE(f.slopeZ);
    EXPECT_FALSE(f.slopeP);
    EXPECT_FALSE(f.slopeCiLow);
    EXPECT_FALSE(f.slopeCiHigh);
    EXPECT_FALSE(f.lrChiSquare);
    EXPECT_FALSE(f.lrP);
}

} // namespace

TEST(LogisticRegression, RefluxAndStress)
{
    // R-bloggers 2009, "Simple logistic regression on qualitative dichotomic variables":
    // stress no 251 / 4 reflux, stress yes 131 / 33; intercept -4.1392 (SE 0.5040),
    // slope 2.7605 (SE 0.5403), z 5.109, p 3.23e-07 [confirmed, docs/methods.md, "Check values" 10].
    const Data d = fromTable(251, 4, 131, 33);
    const LogisticFit f = fitLogistic(d.x, d.y);
    ASSERT_TRUE(f.slope && f.slopeSe && f.intercept && f.interceptSe && f.slopeZ && f.slopeP);
    EXPECT_NEAR(*f.intercept, -4.1392, 5e-5);
    EXPECT_NEAR(*f.interceptSe, 0.5040, 5e-5);
    EXPECT_NEAR(*f.slope, 2.7605, 5e-5);
    EXPECT_NEAR(*f.slopeSe, 0.5403, 5e-5);
    EXPECT_NEAR(*f.slopeZ, 5.109, 5e-4);
    // The post prints p = 3.23e-07, 0.2 % below the exact two-sided normal p at the
    // fitted z (3.2358e-07); the tolerance admits that printed discrepancy.
    EXPECT_NEAR(*f.slopeP, 3.23e-07, 1e-09);
    EXPECT_NEAR(*f.slopeP, std::erfc(*f.slopeZ / std::sqrt(2.0)), 1e-20);
    // Closed form (Woolf 1955; docs/methods.md, "Check values" 10 identity): log odds ratio and
    // sqrt(sum 1/cell); intercept the log odds at x = 0.
    EXPECT_NEAR(*f.slope, std::log(251.0 * 33.0 / (4.0 * 131.0)), 1e-9);
    EXPECT_NEAR(*f.slopeSe, std::sqrt(1 / 251.0 + 1 / 4.0 + 1 / 131.0 + 1 / 33.0), 1e-9);
    EXPECT_NEAR(*f.intercept, std::log(4.0 / 251.0), 1e-9);
    EXPECT_NEAR(*f.interceptSe, std::sqrt(1 / 251.0 + 1 / 4.0), 1e-9);
    // docs/methods.md: 95 % CI b +- 1.96 SE.
    EXPECT_NEAR(*f.slopeCiLow, *f.slope - 1.96 * *f.slopeSe, 1e-12);
    EXPECT_NEAR(*f.slopeCiHigh, *f.slope + 1.96 * *f.slopeSe, 1e-12);
    // Identity: LR chi-square = G statistic of the 2x2 table.
    ASSERT_TRUE(f.lrChiSquare && f.lrP);
    EXPECT_NEAR(*f.lrChiSquare, gStatistic(251, 4, 131, 33), 1e-8);
    EXPECT_NEAR(*f.lrP, std::erfc(std::sqrt(*f.lrChiSquare / 2.0)), 1e-15);
}

TEST(LogisticRegression, HosmerLemeshowChdAge)
{
    // Hosmer & Lemeshow 2000, Applied Logistic Regression, ch. 3: CHD by age >= 55,
    // 21 / 6 at x = 1 and 22 / 51 at x = 0; slope 2.094 (SE 0.529), intercept
    // -0.841 (SE 0.255) [from memory for the table; computed 2.093546 (0.528534),
    // -0.840783 (0.255073), z 3.961, docs/methods.md, "Check values" 10].
    const Data d = fromTable(51, 22, 6, 21);
    const LogisticFit f = fitLogistic(d.x, d.y);
    ASSERT_TRUE(f.slope && f.slopeSe && f.intercept && f.interceptSe && f.slopeZ);
    EXPECT_NEAR(*f.slope, 2.094, 5e-4);
    EXPECT_NEAR(*f.slopeSe, 0.529, 5e-4);
    EXPECT_NEAR(*f.intercept, -0.841, 5e-4);
    EXPECT_NEAR(*f.interceptSe, 0.255, 5e-4);
    EXPECT_NEAR(*f.slope, 2.093546, 5e-7);
    EXPECT_NEAR(*f.slopeSe, 0.528534, 5e-7);
    EXPECT_NEAR(*f.intercept, -0.840783, 5e-7);
    EXPECT_NEAR(*f.interceptSe, 0.255073, 5e-7);
    EXPECT_NEAR(*f.slopeZ, 3.961, 5e-4);
    EXPECT_NEAR(std::exp(*f.slope), 8.1, 0.05); // odds ratio 8.1
    ASSERT_TRUE(f.lrChiSquare);
    EXPECT_NEAR(*f.lrChiSquare, gStatistic(51, 22, 6, 21), 1e-8);
}

TEST(LogisticRegression, ContinuousPredictorSatisfiesScoreEquations)
{
    // Identity at the maximum: the score equations sum (y - p) = 0 and
    // sum x (y - p) = 0 hold, the SEs are the square roots of the diagonal of the
    // inverse information matrix (computed here on uncentred x), and the
    // log-likelihood is no higher at nearby points.
    const std::vector<double> x{0.0, 0.05, 0.1, 0.2, 0.25, 0.3, 0.4, 0.45, 0.5, 0.55,
                                0.6, 0.7, 0.75, 0.8, 0.9, 1.0, 0.15, 0.35, 0.65, 0.85};
    const std::vector<int> y{0, 0, 1, 0, 0, 1, 0, 1, 0, 1, 1, 0, 1, 1, 1, 1, 0, 0, 1, 0};
    const LogisticFit f = fitLogistic(x, y);
    ASSERT_TRUE(f.intercept && f.slope && f.interceptSe && f.slopeSe && f.lrChiSquare);
    const double a = *f.intercept, b = *f.slope;
    double s0 = 0, s1 = 0, iaa = 0, iab = 0, ibb = 0;
    auto loglik = [&](double aa, double bb) {
        double ll = 0;
        for (std::size_t i = 0; i < x.size(); ++i) {
            const double p = 1.0 / (1.0 + std::exp(-(aa + bb * x[i])));
            ll += y[i] ? std::log(p) : std::log(1 - p);
        }
        return ll;
    };
    for (std::size_t i = 0; i < x.size(); ++i) {
        const double p = 1.0 / (1.0 + std::exp(-(a + b * x[i])));
        s0 += y[i] - p;
        s1 += x[i] * (y[i] - p);
        const double w = p * (1 - p);
        iaa += w;
        iab += w * x[i];
        ibb += w * x[i] * x[i];
    }
    EXPECT_NEAR(s0, 0.0, 1e-10);
    EXPECT_NEAR(s1, 0.0, 1e-10);
    const double det = iaa * ibb - iab * iab;
    EXPECT_NEAR(*f.interceptSe, std::sqrt(ibb / det), 1e-9);
    EXPECT_NEAR(*f.slopeSe, std::sqrt(iaa / det), 1e-9);
    const double best = loglik(a, b);
    for (double da : {-1e-3, 0.0, 1e-3})
        for (double db : {-1e-3, 0.0, 1e-3})
            EXPECT_LE(loglik(a + da, b + db), best + 1e-12);
    // LR against the intercept-only model, whose maximum is at the sample log odds.
    const double ybar = 10.0 / 20.0;
    const double llNull = 20 * (ybar * std::log(ybar) + (1 - ybar) * std::log(1 - ybar));
    EXPECT_NEAR(*f.lrChiSquare, 2 * (best - llNull), 1e-9);
    EXPECT_GT(*f.slope, 0.0);
    // Shifting x by a constant changes only the intercept (invariance).
    std::vector<double> shifted = x;
    for (double& v : shifted)
        v += 100.0;
    const LogisticFit g = fitLogistic(shifted, y);
    ASSERT_TRUE(g.slope && g.slopeSe && g.intercept);
    EXPECT_NEAR(*g.slope, b, 1e-9);
    EXPECT_NEAR(*g.slopeSe, *f.slopeSe, 1e-9);
    EXPECT_NEAR(*g.intercept, a - 100.0 * b, 1e-6);
}

TEST(LogisticRegression, UndefinedCasesAreEmpty)
{
    // docs/methods.md "Small choices": fewer than two births, one sex only, a constant
    // predictor, complete separation: all figures empty.
    expectEmpty(fitLogistic(std::vector<double>{0.5}, std::vector<int>{1}));
    expectEmpty(fitLogistic(std::vector<double>{}, std::vector<int>{}));
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.5, 0.9}, std::vector<int>{1, 1, 1}));
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.5, 0.9}, std::vector<int>{0, 0, 0}));
    expectEmpty(fitLogistic(std::vector<double>{0.4, 0.4, 0.4, 0.4}, std::vector<int>{0, 1, 0, 1}));
    // Complete separation: every son above every daughter.
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.2, 0.7, 0.9}, std::vector<int>{0, 0, 1, 1}));
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.2, 0.7, 0.9}, std::vector<int>{1, 1, 0, 0}));
    // Quasi-complete separation: the classes meet at one x only.
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.5, 0.5, 0.9}, std::vector<int>{0, 0, 1, 1}));
    // A binary predictor with a zero cell: the log odds ratio is infinite.
    const Data zeroCell = fromTable(10, 5, 0, 7);
    expectEmpty(fitLogistic(zeroCell.x, zeroCell.y));
    // Malformed input.
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.5}, std::vector<int>{0, 2}));
    expectEmpty(fitLogistic(std::vector<double>{0.1, 0.5, 0.7}, std::vector<int>{0, 1}));
    // One overlapping pair is enough for a finite estimate.
    const LogisticFit ok =
        fitLogistic(std::vector<double>{0.1, 0.5, 0.6, 0.9}, std::vector<int>{0, 1, 0, 1});
    EXPECT_TRUE(ok.slope && ok.slopeSe && ok.lrP);
}
