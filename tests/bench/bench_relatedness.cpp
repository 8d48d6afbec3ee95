// SPDX-License-Identifier: GPL-3.0-or-later
// Relatedness among all dyads of 100 resident females in a multi-generation colony
// pedigree (the desktop's kinship view), and the sex-ratio statistics for scale.
#include "core/stats/fisher_exact.h"
#include "core/stats/logistic_regression.h"
#include "core/pedigree/relatedness.h"

#include <benchmark/benchmark.h>

#include <algorithm>
#include <random>
#include <vector>

using namespace hierloom::core;

namespace {

// `animals` split over 25 generations; mothers from the previous two generations,
// fathers known for half of the births (as with genotyped paternity).
std::vector<PedigreeNode> colonyPedigree(int animals, unsigned seed)
{
    constexpr int kGenerations = 25;
    const int perGeneration = std::max(1, animals / kGenerations);
    std::mt19937 gen(seed);
    std::vector<PedigreeNode> p(static_cast<std::size_t>(animals));
    for (int i = perGeneration; i < animals; ++i) {
        const int g = i / perGeneration;
        const int lo = std::max(0, (g - 2) * perGeneration);
        const int hi = g * perGeneration - 1;
        std::uniform_int_distribution<int> pick(lo, hi);
        p[static_cast<std::size_t>(i)].mother = pick(gen);
        if (gen() % 2 == 0) {
            const int f = pick(gen);
            if (f != p[static_cast<std::size_t>(i)].mother)
                p[static_cast<std::size_t>(i)].father = f;
        }
    }
    return p;
}

void BM_RelatednessAllDyads(benchmark::State& state)
{
    const int n = static_cast<int>(state.range(0));
    const std::vector<PedigreeNode> p = colonyPedigree(n, 7);
    std::vector<int> females;
    for (int i = n - 1; i >= 0 && females.size() < 100; i -= 2)
        females.push_back(i);
    for (auto _ : state) {
        std::vector<double> m = relatednessMatrix(p, females);
        benchmark::DoNotOptimize(m.data());
    }
    state.SetLabel("100 females, all dyads");
}
BENCHMARK(BM_RelatednessAllDyads)->Arg(1000)->Arg(3000)->Arg(10000)->Unit(benchmark::kMillisecond);

void BM_LogisticFit(benchmark::State& state)
{
    const int n = static_cast<int>(state.range(0));
    std::mt19937 gen(3);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    std::vector<double> x(static_cast<std::size_t>(n));
    std::vector<int> y(static_cast<std::size_t>(n));
    for (int i = 0; i < n; ++i) {
        x[i] = u(gen);
        y[i] = u(gen) < 0.4 + 0.2 * x[i] ? 1 : 0;
    }
    for (auto _ : state)
        benchmark::DoNotOptimize(fitLogistic(x, y).slope);
}
BENCHMARK(BM_LogisticFit)->Arg(500)->Arg(5000);

void BM_FisherExact(benchmark::State& state)
{
    const auto k = state.range(0);
    for (auto _ : state)
        benchmark::DoNotOptimize(fisherExact(k, k / 2, k / 3, k));
}
BENCHMARK(BM_FisherExact)->Arg(50)->Arg(5000);

} // namespace

BENCHMARK_MAIN();
