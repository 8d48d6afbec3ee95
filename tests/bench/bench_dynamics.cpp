// SPDX-License-Identifier: GPL-3.0-or-later
// Rank dynamics on a generated colony (300 females, 15 years, about 117,000
// encounters): rule-informed Elo against plain Elo over the same selection
// (the bare baseline), the monthly active/passive split and the foresight of
// the three models.
#include "core/pedigree/foresight.h"
#include "core/ranks/informed_elo.h"
#include "core/ranks/rank_changes.h"
#include "large_colony.h"

#include <benchmark/benchmark.h>

using namespace hierloom::core;

namespace {

struct Fixture {
    Colony colony = hierloom::bench::generateLargeColony();
    ResidenceIndex where{colony.animals, colony.residences};
    EncounterSelection sel = selectEncounters(colony, where, SelectionOptions{});
};

const Fixture& fixture()
{
    static const Fixture f;
    return f;
}

void BM_PlainElo(benchmark::State& state)
{
    const Fixture& f = fixture();
    for (auto _ : state) benchmark::DoNotOptimize(runElo(f.sel.size(), f.sel.bouts, EloSettings{}).logLikelihood);
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(f.sel.bouts.size()));
}
BENCHMARK(BM_PlainElo)->Unit(benchmark::kMillisecond);

void BM_InformedElo(benchmark::State& state)
{
    const Fixture& f = fixture();
    const EloFamily family = eloFamilyOf(f.colony, f.sel.ids);
    const PresentOn present = residencePresence(f.sel.ids, f.where, {});
    for (auto _ : state)
        benchmark::DoNotOptimize(traceElo(f.sel.size(), f.sel.bouts, f.sel.days, EloSettings{}, EloStartRule::Youngest,
                                          family, present, {f.sel.bouts.size()})
                                     .checkpoints.front()
                                     .logLikelihood);
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(f.sel.bouts.size()));
}
BENCHMARK(BM_InformedElo)->Unit(benchmark::kMillisecond);

void BM_RankChangesByMonth(benchmark::State& state)
{
    const Fixture& f = fixture();
    RankOptions o;
    o.startRule = state.range(0) == 0 ? EloStartRule::None : EloStartRule::Youngest;
    for (auto _ : state)
        benchmark::DoNotOptimize(rankChangesByPeriod(f.colony, f.where, SelectionOptions{}, o, PeriodLength::Month).size());
    state.SetLabel(state.range(0) == 0 ? "plain start" : "youngest start");
}
BENCHMARK(BM_RankChangesByMonth)->Arg(0)->Arg(1)->Unit(benchmark::kMillisecond);

void BM_Foresight(benchmark::State& state)
{
    const Fixture& f = fixture();
    for (auto _ : state)
        benchmark::DoNotOptimize(computeForesight(f.colony, f.where, SelectionOptions{}, ForesightOptions{}).comparable);
    state.SetItemsProcessed(state.iterations() * static_cast<int64_t>(f.sel.bouts.size()));
}
BENCHMARK(BM_Foresight)->Unit(benchmark::kMillisecond);

} // namespace

BENCHMARK_MAIN();
