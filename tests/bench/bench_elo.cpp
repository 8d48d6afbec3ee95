// SPDX-License-Identifier: GPL-3.0-or-later
// Elo engine throughput: plain runs with log-likelihood, randomised Elo,
// optimised k, and a bare exp+log loop as the floor to compare against.
#include "core/ranks/elo_optimisation.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/randomised_elo.h"

#include <benchmark/benchmark.h>

#include <cmath>
#include <random>
#include <vector>

using namespace hierloom::core;

namespace {

std::vector<Bout> randomBouts(int n, int count, unsigned seed)
{
    std::mt19937_64 gen(seed);
    std::uniform_int_distribution<int> pick(0, n - 1);
    std::vector<Bout> bouts;
    bouts.reserve(static_cast<size_t>(count));
    while (static_cast<int>(bouts.size()) < count) {
        const int a = pick(gen), b = pick(gen);
        // Lower index wins 70 % of the time, so ratings spread as in a real group.
        if (a != b) bouts.push_back(gen() % 10 < 7 ? Bout{std::min(a, b), std::max(a, b)} : Bout{std::max(a, b), std::min(a, b)});
    }
    return bouts;
}

void BM_RunElo(benchmark::State& state)
{
    const auto bouts = randomBouts(200, 1'000'000, 1);
    EloSettings s;
    s.curve = state.range(0) == 0 ? EloCurve::Logistic : EloCurve::Normal;
    for (auto _ : state) {
        EloRun run = runElo(200, bouts, s);
        benchmark::DoNotOptimize(run.logLikelihood);
    }
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(bouts.size()));
    state.SetLabel(state.range(0) == 0 ? "logistic" : "normal");
}
BENCHMARK(BM_RunElo)->Arg(0)->Arg(1)->Unit(benchmark::kMillisecond);

// The daily history: the same million bouts spread over 5,000 days (about 14
// years), one rating vector of 200 animals kept per day.
void BM_DailyHistory(benchmark::State& state)
{
    const auto bouts = randomBouts(200, 1'000'000, 1);
    std::vector<Day> days(bouts.size());
    for (size_t i = 0; i < days.size(); ++i) days[i] = static_cast<Day>(i * 5000 / days.size());
    EloSettings s;
    for (auto _ : state) {
        auto history = eloDailyHistory(200, bouts, days, s);
        benchmark::DoNotOptimize(history.data());
    }
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(bouts.size()));
}
BENCHMARK(BM_DailyHistory)->Unit(benchmark::kMillisecond);

void BM_RandomisedElo(benchmark::State& state)
{
    const auto bouts = randomBouts(200, 10'000, 2);
    for (auto _ : state) {
        auto rows = randomisedElo(200, bouts, EloSettings{}, 1000, 7, static_cast<unsigned>(state.range(0)));
        benchmark::DoNotOptimize(rows.data());
    }
    state.SetItemsProcessed(state.iterations() * 1000 * static_cast<int64_t>(bouts.size()));
    state.SetLabel("1000 orders x 10000 bouts; arg = threads");
}
BENCHMARK(BM_RandomisedElo)->Arg(1)->Arg(2)->UseRealTime()->Unit(benchmark::kMillisecond);

void BM_OptimiseK(benchmark::State& state)
{
    const auto bouts = randomBouts(200, static_cast<int>(state.range(0)), 3);
    for (auto _ : state) {
        auto opt = optimiseEloK(200, bouts, EloSettings{}, static_cast<unsigned>(state.range(1)));
        benchmark::DoNotOptimize(opt);
    }
    state.SetItemsProcessed(state.iterations() * state.range(0));
    state.SetLabel("args = bouts, threads");
}
BENCHMARK(BM_OptimiseK)->Args({10'000, 1})->Args({1'000'000, 1})->Args({1'000'000, 2})->UseRealTime()->Unit(benchmark::kMillisecond);

void BM_BareExpLog(benchmark::State& state)
{
    std::vector<double> x(1'000'000);
    std::mt19937_64 gen(4);
    std::uniform_real_distribution<double> u(-3, 3);
    for (double& v : x) v = u(gen);
    for (auto _ : state) {
        double sum = 0;
        for (double v : x) sum += std::log1p(std::exp(v));
        benchmark::DoNotOptimize(sum);
    }
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(x.size()));
    state.SetLabel("one exp + one log1p per element");
}
BENCHMARK(BM_BareExpLog)->Unit(benchmark::kMillisecond);

void BM_BareExpLogPlain(benchmark::State& state)
{
    std::vector<double> x(1'000'000);
    std::mt19937_64 gen(4);
    std::uniform_real_distribution<double> u(-3, 3);
    for (double& v : x) v = u(gen);
    for (auto _ : state) {
        double sum = 0;
        for (double v : x) sum += std::log(1.0 + std::exp(v));
        benchmark::DoNotOptimize(sum);
    }
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(x.size()));
    state.SetLabel("one exp + one log per element");
}
BENCHMARK(BM_BareExpLogPlain)->Unit(benchmark::kMillisecond);

} // namespace

BENCHMARK_MAIN();
