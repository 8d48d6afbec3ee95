// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/fisher_exact.h"

#include <algorithm>
#include <cmath>
#include <vector>

namespace hierloom::core {

namespace {

double logFactorial(std::int64_t n)
{
    return std::lgamma(static_cast<double>(n) + 1.0);
}

// Tables that differ from the observed one only by rounding error count as equally
// probable; without this the two-sided p of symmetric tables would depend on the
// last bit of lgamma.
constexpr double kRelativeTolerance = 1e-7;

} // namespace

std::optional<FisherExactResult> fisherExact(std::int64_t a, std::int64_t b, std::int64_t c,
                                             std::int64_t d)
{
    if (a < 0 || b < 0 || c < 0 || d < 0)
        return std::nullopt;
    const std::int64_t n = a + b + c + d;
    if (n == 0)
        return std::nullopt;
    const std::int64_t row1 = a + b;
    const std::int64_t row2 = c + d;
    const std::int64_t col1 = a + c;
    const std::int64_t lo = std::max<std::int64_t>(0, col1 - row2);
    const std::int64_t hi = std::min(row1, col1);

    // log P(A = x) = log C(row1, x) + log C(row2, col1 - x) - log C(n, col1).
    const double logDenominator = logFactorial(n) - logFactorial(col1) - logFactorial(n - col1);
    const double logRowConstant = logFactorial(row1) + logFactorial(row2);
    std::vector<double> logP;
    logP.reserve(static_cast<std::size_t>(hi - lo + 1));
    for (std::int64_t x = lo; x <= hi; ++x) {
        const double v = logRowConstant - logFactorial(x) - logFactorial(row1 - x)
                         - logFactorial(col1 - x) - logFactorial(row2 - col1 + x) - logDenominator;
        logP.push_back(v);
    }
    // Scale by the most probable table so that no term underflows before summing.
    const double logMax = *std::max_element(logP.begin(), logP.end());
    std::vector<double> p(logP.size());
    double total = 0.0;
    for (std::size_t i = 0; i < p.size(); ++i) {
        p[i] = std::exp(logP[i] - logMax);
        total += p[i];
    }
    const std::size_t obs = static_cast<std::size_t>(a - lo);
    const double threshold = p[obs] * (1.0 + kRelativeTolerance);
    double less = 0.0;
    double greater = 0.0;
    double two = 0.0;
    for (std::size_t i = 0; i < p.size(); ++i) {
        if (i <= obs)
            less += p[i];
        if (i >= obs)
            greater += p[i];
        if (p[i] <= threshold)
            two += p[i];
    }
    FisherExactResult r;
    r.less = std::min(1.0, less / total);
    r.greater = std::min(1.0, greater / total);
    r.twoSided = std::min(1.0, two / total);
    return r;
}

} // namespace hierloom::core
