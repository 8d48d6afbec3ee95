// SPDX-License-Identifier: GPL-3.0-or-later
// Timings of the matrix-based hierarchy methods on 60 animals: each
// 10,000-randomisation test (h', steepness, t_tri) on a sparse-ish random
// matrix (about 70% of dyads known), and the I&SI order of a noisy linear
// hierarchy. Aims: under 1 s per test, under 2 s for I&SI.
#include "core/ranks/isi_order.h"
#include "core/ranks/linearity.h"
#include "core/ranks/steepness_test.h"
#include "core/ranks/triangle_transitivity.h"

#include <benchmark/benchmark.h>

#include <random>

using namespace hierloom::core;

namespace {

constexpr int animals = 60;
constexpr int iterations = 10000;

/// Each dyad known with probability 0.7, 1..6 encounters; the lower index wins
/// each with probability `bias` (0.5: random; 0.8: a noisy linear hierarchy).
WinMatrix benchMatrix(double bias, std::uint64_t seed)
{
    std::mt19937_64 rng(seed);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    WinMatrix m(animals);
    for (int i = 0; i < animals; ++i)
        for (int j = i + 1; j < animals; ++j) {
            if (u(rng) >= 0.7) continue;
            const int c = 1 + static_cast<int>(rng() % 6);
            for (int k = 0; k < c; ++k) (u(rng) < bias ? m.s(i, j) : m.s(j, i)) += 1.0;
        }
    return m;
}

void BM_LinearityTest(benchmark::State& state)
{
    const WinMatrix m = benchMatrix(0.5, 1);
    for (auto _ : state)
        benchmark::DoNotOptimize(linearityTest(m, iterations, 7, static_cast<unsigned>(state.range(0))));
}

void BM_SteepnessTest(benchmark::State& state)
{
    const WinMatrix m = benchMatrix(0.5, 1);
    for (auto _ : state)
        benchmark::DoNotOptimize(steepnessTest(m, iterations, 7, static_cast<unsigned>(state.range(0))));
}

void BM_TriangleTransitivityTest(benchmark::State& state)
{
    const WinMatrix m = benchMatrix(0.5, 1);
    for (auto _ : state)
        benchmark::DoNotOptimize(triangleTransitivityTest(m, iterations, 7, static_cast<unsigned>(state.range(0))));
}

void BM_IsiOrder(benchmark::State& state)
{
    const WinMatrix m = benchMatrix(0.8, 2);
    for (auto _ : state) benchmark::DoNotOptimize(isiOrder(m));
}

} // namespace

BENCHMARK(BM_LinearityTest)->Arg(1)->Arg(2)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_SteepnessTest)->Arg(1)->Arg(2)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_TriangleTransitivityTest)->Arg(1)->Arg(2)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_IsiOrder)->Unit(benchmark::kMillisecond);

BENCHMARK_MAIN();
