// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/elo_optimisation.h"

#include "core/base/vector_state.h"
#include "core/ranks/elo_kernel.h"

#include <algorithm>
#include <atomic>
#include <limits>
#include <cmath>
#include <thread>

namespace hierloom::core {

namespace {

constexpr double kMaxK = 1000.0;
constexpr double kGridStep = 5.0;
constexpr double kRefineWidth = 0.01;

/// L(k) for bouts already checked; rating and rated are scratch buffers.
double likelihoodAt(double k, int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                    std::vector<double>& rating, std::vector<unsigned char>& rated)
{
    rating.assign(static_cast<size_t>(std::max(n, 0)), settings.start);
    rated.assign(static_cast<size_t>(std::max(n, 0)), 0);
    detail::EloTally tally;
    detail::eloStepsFor<true>(settings.curve, bouts.data(), bouts.data() + bouts.size(), rating.data(), rated.data(),
                              k, settings.draws == DrawPolicy::Ignore, tally);
    return tally.logLikelihood;
}

constexpr int kLanes = 4;
/// Bouts between two looks at the bound (likelihoodsAt).
constexpr size_t kBoundStride = 4096;

/// Raises `bound` to `value` when higher.
void raise(std::atomic<double>& bound, double value)
{
    double now = bound.load();
    while (value > now && !bound.compare_exchange_weak(now, value)) {
    }
}

/// L(k) of kLanes values of k in one pass (eloLikelihoodLanes): the same
/// values as likelihoodAt of each; or -infinity for all of them once every
/// lane's sum so far is below `bound`, the full L of some k already
/// evaluated. Every bout adds ln E <= 0 (elo_kernel.h: min(x,0) - ln(1+u),
/// or ln of 0.5 erfc <= 1), so a sum never rises as bouts are added: a lane
/// below the bound ends below it and can neither be the grid's best nor tie
/// with it. The grid's outcome is thus exactly that of every value computed
/// in full, whatever the bound and whichever thread raised it.
void likelihoodsAt(const double* k, double* out, int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                   const std::atomic<double>& bound)
{
    const auto size = static_cast<size_t>(std::max(n, 0));
    std::vector<double> ratings(size * kLanes, settings.start);
    std::vector<unsigned char> flags(size * kLanes, 0);
    double* rating[kLanes];
    unsigned char* rated[kLanes];
    for (int j = 0; j < kLanes; ++j) {
        rating[j] = ratings.data() + size * static_cast<size_t>(j);
        rated[j] = flags.data() + size * static_cast<size_t>(j);
    }
    detail::EloTally tally[kLanes];
    const bool ignoreDraws = settings.draws == DrawPolicy::Ignore;
    const Bout* first = bouts.data();
    const Bout* last = first + bouts.size();
    while (first != last) {
        const Bout* end = first + std::min<size_t>(kBoundStride, static_cast<size_t>(last - first));
        if (settings.curve == EloCurve::Logistic)
            detail::eloLikelihoodLanes<EloCurve::Logistic, kLanes>(first, end, rating, rated, k, ignoreDraws, tally);
        else
            detail::eloLikelihoodLanes<EloCurve::Normal, kLanes>(first, end, rating, rated, k, ignoreDraws, tally);
        first = end;
        const double limit = bound.load(std::memory_order_relaxed);
        if (first != last && std::all_of(tally, tally + kLanes, [&](const detail::EloTally& t) { return t.logLikelihood < limit; })) {
            std::fill(out, out + kLanes, -std::numeric_limits<double>::infinity());
            return;
        }
    }
    for (int j = 0; j < kLanes; ++j) out[j] = tally[j].logLikelihood;
}

} // namespace

double eloLogLikelihood(int n, const std::vector<Bout>& bouts, const EloSettings& settings)
{
    detail::checkBoutIndices(n, bouts);
    std::vector<double> rating;
    std::vector<unsigned char> rated;
    return likelihoodAt(settings.k, n, bouts, settings, rating, rated);
}

std::optional<EloOptimum> optimiseEloK(int n, const std::vector<Bout>& bouts, const EloSettings& settings,
                                       unsigned threads)
{
    detail::checkBoutIndices(n, bouts);
    if (std::none_of(bouts.begin(), bouts.end(), [](const Bout& b) { return !b.draw; })) return std::nullopt;
    clearUpperVectorState();

    std::vector<double> rating;
    std::vector<unsigned char> rated;
    EloOptimum best{0.0, likelihoodAt(0.0, n, bouts, settings, rating, rated)};
    // Every evaluated k competes; ties keep the smaller k (docs/methods.md).
    auto consider = [&](double k) {
        const double value = likelihoodAt(k, n, bouts, settings, rating, rated);
        if (value > best.logLikelihood || (value == best.logLikelihood && k < best.k)) best = {k, value};
        return value;
    };
    // The grid values are independent, so threads may share them out; each value is
    // computed the same way whatever thread runs it and they are compared in k order.
    const int cells = static_cast<int>(kMaxK / kGridStep);
    std::vector<double> grid(static_cast<size_t>(cells) + 1);
    grid[0] = best.logLikelihood;
    // Cells 1..cells in runs of kLanes computed in one pass each (cells is a multiple of kLanes).
    static_assert(static_cast<int>(kMaxK / kGridStep) % kLanes == 0);
    const int runs = cells / kLanes;
    threads = std::max(1U, std::min<unsigned>(threads, static_cast<unsigned>(runs)));
    // Runs in k order (the best k is usually small), each raising the bound
    // that lets later runs stop early (likelihoodsAt).
    std::atomic<double> bound(best.logLikelihood);
    auto work = [&](unsigned t) {
        clearUpperVectorState(); // a thread inherits its starter's registers
        for (int r = static_cast<int>(t); r < runs; r += static_cast<int>(threads)) {
            double k[kLanes];
            for (int j = 0; j < kLanes; ++j) k[j] = kGridStep * (1 + r * kLanes + j);
            double* out = grid.data() + 1 + static_cast<size_t>(r) * kLanes;
            likelihoodsAt(k, out, n, bouts, settings, bound);
            raise(bound, *std::max_element(out, out + kLanes));
        }
    };
    if (threads == 1) {
        work(0);
    } else {
        std::vector<std::thread> pool;
        for (unsigned t = 0; t < threads; ++t) pool.emplace_back(work, t);
        for (auto& th : pool) th.join();
    }
    for (int i = 1; i <= cells; ++i)
        if (grid[static_cast<size_t>(i)] > best.logLikelihood) best = {kGridStep * i, grid[static_cast<size_t>(i)]};

    // Golden-section search for a maximum within one grid step of the best grid point.
    const double invPhi = (std::sqrt(5.0) - 1.0) / 2.0;
    double a = std::max(0.0, best.k - kGridStep);
    double b = std::min(kMaxK, best.k + kGridStep);
    double c = b - invPhi * (b - a);
    double d = a + invPhi * (b - a);
    double fc = consider(c);
    double fd = consider(d);
    while (b - a > kRefineWidth) {
        if (fc >= fd) { // keep the lower side on ties, towards the smallest k
            b = d;
            d = c;
            fd = fc;
            c = b - invPhi * (b - a);
            fc = consider(c);
        } else {
            a = c;
            c = d;
            fc = fd;
            d = a + invPhi * (b - a);
            fd = consider(d);
        }
    }
    return best;
}

} // namespace hierloom::core
