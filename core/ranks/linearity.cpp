// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/linearity.h"


#include <utility>
#include <vector>

namespace hierloom::core {

namespace {

// Doubled dominance counts 2 v_i keep halves exact as integers, and
// S = sum (2 v_i - (n - 1))^2 gives h = 3 S / (n^3 - n) exactly.
std::vector<long long> doubledCounts(const WinMatrix& m, int& unknown)
{
    unknown = 0;
    std::vector<long long> v2(static_cast<size_t>(m.n), 0);
    for (int i = 0; i < m.n; ++i)
        for (int j = i + 1; j < m.n; ++j) {
            const double a = m.s(i, j), b = m.s(j, i);
            if (a > b) {
                v2[static_cast<size_t>(i)] += 2;
            } else if (a < b) {
                v2[static_cast<size_t>(j)] += 2;
            } else {
                ++v2[static_cast<size_t>(i)];
                ++v2[static_cast<size_t>(j)];
                if (m.total(i, j) <= 0) ++unknown;
            }
        }
    return v2;
}

long long squaredDeviations(const std::vector<long long>& v2, int n)
{
    long long sum = 0;
    for (long long v : v2) sum += (v - (n - 1)) * (v - (n - 1));
    return sum;
}

double hFromSquares(long long s, int n)
{
    const double nn = n;
    return 3.0 * static_cast<double>(s) / (nn * nn * nn - nn);
}

} // namespace

LinearityResult linearity(const WinMatrix& m)
{
    LinearityResult r;
    const std::vector<long long> v2 = doubledCounts(m, r.unknownDyads);
    if (m.n < 2) return r;
    const double nn = m.n;
    r.h = hFromSquares(squaredDeviations(v2, m.n), m.n);
    r.hPrime = *r.h + 6.0 * r.unknownDyads / (nn * nn * nn - nn);
    return r;
}

LinearityTest linearityTest(const WinMatrix& m, int iterations, std::uint64_t seed, unsigned threads)
{
    LinearityTest out;
    out.test.iterations = iterations;
    out.test.seed = seed;
    const int n = m.n;
    if (n < 2 || iterations < 1) return out;

    int unknown = 0;
    const std::vector<long long> base = doubledCounts(m, unknown);
    std::vector<std::pair<int, int>> unknownDyads;
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j)
            if (m.total(i, j) <= 0) unknownDyads.emplace_back(i, j);

    const auto results = runRandomisations<std::pair<long long, long long>>(
        iterations, seed, threads, [&](RandomEngine& engine, int) {
            RandomBits bits(engine);
            // h_fill: each unknown dyad moves from 1/2 each to 1 and 0.
            std::vector<long long> fill = base;
            for (const auto& [i, j] : unknownDyads) {
                if (bits.next()) {
                    ++fill[static_cast<size_t>(i)];
                    --fill[static_cast<size_t>(j)];
                } else {
                    --fill[static_cast<size_t>(i)];
                    ++fill[static_cast<size_t>(j)];
                }
            }
            // h_rand: a complete random dominance matrix.
            std::vector<long long> rand(static_cast<size_t>(n), 0);
            for (int i = 0; i < n; ++i)
                for (int j = i + 1; j < n; ++j) rand[static_cast<size_t>(bits.next() ? i : j)] += 2;
            return std::pair{squaredDeviations(fill, n), squaredDeviations(rand, n)};
        });

    long long count = 0;
    double sumFill = 0.0, sumRand = 0.0;
    for (const auto& [fill, rand] : results) {
        if (rand >= fill) ++count; // exact: both are integer sums of squares
        sumFill += hFromSquares(fill, n);
        sumRand += hFromSquares(rand, n);
    }
    out.test.p = rightTailedP(count, iterations);
    out.test.meanRandom = sumRand / iterations;
    out.meanHFill = sumFill / iterations;
    return out;
}

} // namespace hierloom::core
