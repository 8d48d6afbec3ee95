// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/fisher_exact.h"

#include <boost/math/distributions/hypergeometric.hpp>

#include <algorithm>
#include <limits>
#include <vector>

namespace hierloom::core {

namespace {

// Tables that differ from the observed one only by rounding error count as equally
// probable; without this the two-sided p of symmetric tables would depend on the
// last bit of the probabilities.
constexpr double kRelativeTolerance = 1e-7;

} // namespace

std::optional<FisherExactResult> fisherExact(std::int64_t a, std::int64_t b, std::int64_t c,
                                             std::int64_t d)
{
    if (a < 0 || b < 0 || c < 0 || d < 0)
        return std::nullopt;
    const std::int64_t n = a + b + c + d;
    if (n == 0 || n > std::numeric_limits<unsigned>::max())
        return std::nullopt;
    const std::int64_t row1 = a + b;
    const std::int64_t row2 = c + d;
    const std::int64_t col1 = a + c;
    const std::int64_t lo = std::max<std::int64_t>(0, col1 - row2);
    const std::int64_t hi = std::min(row1, col1);

    // Given the margins, `a` is hypergeometric: row1 draws from n tables' worth of
    // items of which col1 are in the first column (Boost.Math's parameters r, n, N).
    const boost::math::hypergeometric_distribution<double> h(
        static_cast<unsigned>(col1), static_cast<unsigned>(row1), static_cast<unsigned>(n));
    std::vector<double> p;
    p.reserve(static_cast<std::size_t>(hi - lo + 1));
    for (std::int64_t x = lo; x <= hi; ++x)
        p.push_back(boost::math::pdf(h, static_cast<unsigned>(x)));
    const std::size_t obs = static_cast<std::size_t>(a - lo);
    const double threshold = p[obs] * (1.0 + kRelativeTolerance);
    double less = 0.0;
    double greater = 0.0;
    double two = 0.0;
    double total = 0.0;
    for (std::size_t i = 0; i < p.size(); ++i) {
        total += p[i];
        if (i <= obs)
            less += p[i];
        if (i >= obs)
            greater += p[i];
        if (p[i] <= threshold)
            two += p[i];
    }
    // Dividing by the sum (1 up to rounding) keeps the three p values consistent.
    FisherExactResult r;
    r.less = std::min(1.0, less / total);
    r.greater = std::min(1.0, greater / total);
    r.twoSided = std::min(1.0, two / total);
    return r;
}

} // namespace hierloom::core
