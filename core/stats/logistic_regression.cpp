// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/logistic_regression.h"

#include "core/stats/normal_distribution.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <vector>

namespace hierloom::core {

namespace {

constexpr int kMaxIterations = 100;
constexpr int kMaxHalvings = 60;
constexpr double kTolerance = 1e-10; // Newton converges quadratically: the next step would be ~1e-20
constexpr double kCiZ = 1.96; // docs/methods.md fixes b +- 1.96 SE

// log(1 + e^t) without overflow.
double log1pExp(double t)
{
    return t > 0.0 ? t + std::log1p(std::exp(-t)) : std::log1p(std::exp(t));
}

// Log-likelihood of (a, b) on centred x: sum y*eta - log(1 + e^eta).
double logLikelihood(std::span<const double> xc, std::span<const int> y, double a, double b)
{
    double ll = 0.0;
    for (std::size_t i = 0; i < xc.size(); ++i) {
        const double eta = a + b * xc[i];
        ll += (y[i] != 0 ? eta : 0.0) - log1pExp(eta);
    }
    return ll;
}

double logistic(double eta)
{
    return eta >= 0.0 ? 1.0 / (1.0 + std::exp(-eta)) : std::exp(eta) / (1.0 + std::exp(eta));
}

} // namespace

LogisticFit fitLogistic(std::span<const double> x, std::span<const int> y)
{
    LogisticFit fit;
    const std::size_t n = x.size();
    if (y.size() != n || n < 2)
        return fit;
    double max0 = -std::numeric_limits<double>::infinity();
    double min0 = std::numeric_limits<double>::infinity();
    double max1 = max0;
    double min1 = min0;
    std::size_t ones = 0;
    double sumX = 0.0;
    for (std::size_t i = 0; i < n; ++i) {
        if ((y[i] != 0 && y[i] != 1) || !std::isfinite(x[i]))
            return fit;
        sumX += x[i];
        if (y[i] == 1) {
            ++ones;
            max1 = std::max(max1, x[i]);
            min1 = std::min(min1, x[i]);
        } else {
            max0 = std::max(max0, x[i]);
            min0 = std::min(min0, x[i]);
        }
    }
    if (ones == 0 || ones == n)
        return fit; // all y equal
    if (std::min(min0, min1) == std::max(max0, max1))
        return fit; // constant x
    if (max0 <= min1 || max1 <= min0)
        return fit; // complete or quasi-complete separation: the slope diverges

    // Centring x makes the information matrix well conditioned; the estimates are
    // transformed back to the original x afterwards.
    const double mean = sumX / static_cast<double>(n);
    std::vector<double> xc(n);
    for (std::size_t i = 0; i < n; ++i)
        xc[i] = x[i] - mean;

    const double ybar = static_cast<double>(ones) / static_cast<double>(n);
    // The intercept-only model's maximum, and the start of the iteration.
    double a = std::log(ybar / (1.0 - ybar));
    double b = 0.0;
    const double llNull = logLikelihood(xc, y, a, 0.0);
    double ll = llNull;
    bool converged = false;
    double iaa = 0.0, iab = 0.0, ibb = 0.0; // information matrix at (a, b)
    for (int it = 1; it <= kMaxIterations; ++it) {
        fit.iterations = it;
        double ga = 0.0, gb = 0.0;
        iaa = iab = ibb = 0.0;
        for (std::size_t i = 0; i < n; ++i) {
            const double p = logistic(a + b * xc[i]);
            const double r = static_cast<double>(y[i]) - p;
            const double w = p * (1.0 - p);
            ga += r;
            gb += r * xc[i];
            iaa += w;
            iab += w * xc[i];
            ibb += w * xc[i] * xc[i];
        }
        const double det = iaa * ibb - iab * iab;
        if (!(det > 0.0) || !std::isfinite(det))
            return LogisticFit{};
        const double da = (ibb * ga - iab * gb) / det;
        const double db = (iaa * gb - iab * ga) / det;
        // Step halving keeps every step uphill; the log-likelihood is concave, so a
        // full Newton step is taken near the maximum.
        double step = 1.0;
        double newLl = logLikelihood(xc, y, a + da, b + db);
        int halvings = 0;
        while (!(newLl >= ll - 1e-12 * std::fabs(ll)) && halvings < kMaxHalvings) {
            step *= 0.5;
            newLl = logLikelihood(xc, y, a + step * da, b + step * db);
            ++halvings;
        }
        a += step * da;
        b += step * db;
        const double change = std::fabs(step * da) + std::fabs(step * db);
        ll = std::max(ll, newLl);
        if (change < kTolerance * (1.0 + std::fabs(a) + std::fabs(b))) {
            converged = true;
            break;
        }
    }
    if (!converged || !std::isfinite(a) || !std::isfinite(b))
        return LogisticFit{};

    // Information at the final estimate for the standard errors.
    iaa = iab = ibb = 0.0;
    for (std::size_t i = 0; i < n; ++i) {
        const double p = logistic(a + b * xc[i]);
        const double w = p * (1.0 - p);
        iaa += w;
        iab += w * xc[i];
        ibb += w * xc[i] * xc[i];
    }
    const double det = iaa * ibb - iab * iab;
    if (!(det > 0.0) || !std::isfinite(det))
        return LogisticFit{};
    const double varA = ibb / det; // centred intercept
    const double varB = iaa / det;
    const double covAB = -iab / det;
    // Back to the original x: intercept = a - b * mean.
    const double intercept = a - b * mean;
    const double varIntercept = varA + mean * mean * varB - 2.0 * mean * covAB;
    if (!(varB > 0.0) || !(varIntercept > 0.0))
        return LogisticFit{};
    ll = logLikelihood(xc, y, a, b);
    const int iterations = fit.iterations;

    fit.intercept = intercept;
    fit.interceptSe = std::sqrt(varIntercept);
    fit.slope = b;
    fit.slopeSe = std::sqrt(varB);
    fit.slopeZ = b / *fit.slopeSe;
    fit.slopeP = twoSidedNormalP(*fit.slopeZ);
    fit.slopeCiLow = b - kCiZ * *fit.slopeSe;
    fit.slopeCiHigh = b + kCiZ * *fit.slopeSe;
    const double lr = std::max(0.0, 2.0 * (ll - llNull));
    fit.lrChiSquare = lr;
    fit.lrP = chiSquare1UpperP(lr);
    fit.iterations = iterations;
    return fit;
}

} // namespace hierloom::core
