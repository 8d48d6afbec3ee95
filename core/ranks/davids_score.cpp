// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/davids_score.h"

#include <algorithm>
#include <cmath>
#include <functional>

namespace hierloom::core {

std::vector<double> dyadicIndexMatrix(const WinMatrix& m, DyadicIndex index)
{
    const int n = m.n;
    std::vector<double> x(static_cast<size_t>(n) * n, 0.0);
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j) {
            if (i == j) continue;
            const double nij = m.total(i, j);
            if (nij <= 0) continue;
            x[static_cast<size_t>(i) * n + j] =
                index == DyadicIndex::Proportion ? m.s(i, j) / nij : (m.s(i, j) + 0.5) / (nij + 1.0);
        }
    return x;
}

std::vector<double> davidsScoresFromIndex(const std::vector<double>& x, int n)
{
    const auto un = static_cast<size_t>(n);
    std::vector<double> w(un, 0.0), l(un, 0.0);
    // Row sums give w, column sums give l; one row-major pass for both.
    for (size_t i = 0; i < un; ++i)
        for (size_t j = 0; j < un; ++j) {
            const double v = x[i * un + j];
            w[i] += v;
            l[j] += v;
        }
    std::vector<double> ds(un, 0.0);
    std::vector<double> l2(un, 0.0);
    for (size_t i = 0; i < un; ++i) {
        double w2 = 0.0;
        for (size_t j = 0; j < un; ++j) {
            const double v = x[i * un + j];
            w2 += v * w[j];
            l2[j] += v * l[i]; // X_ij * l_i is a term of l2_j = sum_i X_ij l_i
        }
        ds[i] = w[i] + w2 - l[i];
    }
    for (size_t i = 0; i < un; ++i) ds[i] -= l2[i];
    return ds;
}

std::vector<double> davidsScores(const WinMatrix& m, DyadicIndex index)
{
    return davidsScoresFromIndex(dyadicIndexMatrix(m, index), m.n);
}

std::vector<double> normalisedDavidsScores(const WinMatrix& m)
{
    std::vector<double> ds = davidsScores(m, DyadicIndex::Corrected);
    const double n = m.n;
    for (double& v : ds) v = (v + n * (n - 1) / 2.0) / n;
    return ds;
}

std::optional<double> steepnessOfScores(std::vector<double>& normDs)
{
    const auto n = static_cast<long long>(normDs.size());
    if (n < 2) return std::nullopt;
    std::sort(normDs.begin(), normDs.end(), std::greater<>());
    // Ranks 1..n: mean (n+1)/2, sum of squared deviations n(n^2-1)/12.
    const double meanRank = (static_cast<double>(n) + 1.0) / 2.0;
    double sxy = 0.0;
    for (long long k = 0; k < n; ++k) sxy += (static_cast<double>(k + 1) - meanRank) * normDs[static_cast<size_t>(k)];
    const double sxx = static_cast<double>(n) * (static_cast<double>(n) * n - 1.0) / 12.0;
    return std::fabs(sxy / sxx);
}

std::optional<double> steepness(const WinMatrix& m)
{
    std::vector<double> norm = normalisedDavidsScores(m);
    return steepnessOfScores(norm);
}

} // namespace hierloom::core
