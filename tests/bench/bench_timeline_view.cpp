// SPDX-License-Identifier: GPL-3.0-or-later
// The rank timeline on a generated colony of 300 females over 15 years
// (large_colony.h): the core computation alone, the time from opening the
// view to its first drawn frame, and the time of one frame while panning.
// Run on demand under QT_QPA_PLATFORM=offscreen; figures, not assertions.
#include "core/store/colony_store.h"
#include "core/pedigree/rank_timeline.h"
#include "large_colony.h"
#include "ui/document/animal_selection.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/analysis/rank_timeline_view.h"

#include <QApplication>

#include <benchmark/benchmark.h>
#include <qcustomplot.h>

#include <filesystem>

using namespace hierloom;

namespace {

const std::string& colonyFile()
{
    static const std::string path = [] {
        const std::string p = (std::filesystem::temp_directory_path() / "hierloom-bench-large.hierloom").string();
        std::filesystem::remove(p);
        core::Colony c = bench::generateLargeColony();
        core::ColonyStore store = core::ColonyStore::create(p);
        store.append(c.animals, c.residences, c.encounters);
        return p;
    }();
    return path;
}

void BM_ComputeRankTimeline(benchmark::State& state)
{
    const core::Colony c = core::ColonyStore::open(colonyFile()).load();
    const core::ResidenceIndex where(c.animals, c.residences);
    const core::Matrilines lines(c);
    core::RankTimelineOptions o;
    o.step = state.range(0) == 0 ? core::TimelineStep::Month : core::TimelineStep::Week;
    size_t females = 0;
    for (auto _ : state) {
        const core::RankTimeline t = core::computeRankTimeline(c, where, lines, o);
        females = t.females.size();
        benchmark::DoNotOptimize(t.maxRank);
    }
    state.counters["females"] = static_cast<double>(females);
    state.counters["encounters"] = static_cast<double>(c.encounters.size());
    state.SetLabel(state.range(0) == 0 ? "monthly" : "weekly");
}
BENCHMARK(BM_ComputeRankTimeline)->Arg(0)->Arg(1)->Unit(benchmark::kMillisecond)->Iterations(3);

// From a new view on an open document to its first frame: computation on the
// worker thread, building the graphs, one full replot.
void BM_TimelineFirstDraw(benchmark::State& state)
{
    ui::ColonyDocument document;
    document.open(QString::fromStdString(colonyFile()), true);
    int lines = 0;
    for (auto _ : state) {
        ui::AnimalSelection selection;
        ui::RankTimelineView view(&document, &selection);
        view.resize(1400, 800);
        view.show();
        view.runner()->wait();
        view.plot()->replot(QCustomPlot::rpImmediateRefresh);
        lines = view.visibleLineCount();
    }
    state.counters["lines"] = lines;
}
BENCHMARK(BM_TimelineFirstDraw)->Unit(benchmark::kMillisecond)->Iterations(3);

// One frame of a drag: the date axis moves by 1 % and the plot is redrawn.
void BM_TimelinePanFrame(benchmark::State& state)
{
    ui::ColonyDocument document;
    document.open(QString::fromStdString(colonyFile()), true);
    ui::AnimalSelection selection;
    ui::RankTimelineView view(&document, &selection);
    view.resize(1400, 800);
    view.show();
    view.runner()->wait();
    QCustomPlot* plot = view.plot();
    plot->replot(QCustomPlot::rpImmediateRefresh);
    const double step = plot->xAxis->range().size() * 0.01 * (state.range(0) == 0 ? 1 : 0.1);
    if (state.range(0) == 1) plot->xAxis->scaleRange(0.2, plot->xAxis->range().center()); // zoomed in to 3 years
    // What a drag does (QCustomPlot::setNoAntialiasingOnDrag, set by the view).
    if (state.range(1) == 1) plot->setNotAntialiasedElements(QCP::aeAll);
    int frame = 0;
    for (auto _ : state) {
        plot->xAxis->moveRange((frame++ / 20) % 2 == 0 ? step : -step);
        plot->replot(QCustomPlot::rpImmediateRefresh);
    }
    state.SetLabel(std::string(state.range(0) == 0 ? "whole record" : "zoomed to 3 years") +
                   (state.range(1) == 1 ? ", as dragged (no antialiasing)" : ", antialiased"));
}
BENCHMARK(BM_TimelinePanFrame)->Args({0, 0})->Args({0, 1})->Args({1, 0})->Args({1, 1})->Unit(benchmark::kMillisecond)->Iterations(60);

} // namespace

int main(int argc, char* argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    benchmark::Initialize(&argc, argv);
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    return 0;
}
