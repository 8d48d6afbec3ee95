// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/elo_optimisation.h"

#include "core/base/vector_state.h"
#include "core/ranks/elo_kernel.h"

#include <algorithm>
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

/// L(k) of kLanes values of k in one pass (eloLikelihoodLanes): the same
/// values as likelihoodAt of each.
void likelihoodsAt(const double* k, double* out, int n, const std::vector<Bout>& bouts, const EloSettings& settings)
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
    if (settings.curve == EloCurve::Logistic)
        detail::eloLikelihoodLanes<EloCurve::Logistic, kLanes>(first, last, rating, rated, k, ignoreDraws, tally);
    else
        detail::eloLikelihoodLanes<EloCurve::Normal, kLanes>(first, last, rating, rated, k, ignoreDraws, tally);
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
    auto work = [&](unsigned t) {
        clearUpperVectorState(); // a thread inherits its starter's registers
        for (int r = static_cast<int>(t); r < runs; r += static_cast<int>(threads)) {
            double k[kLanes];
            for (int j = 0; j < kLanes; ++j) k[j] = kGridStep * (1 + r * kLanes + j);
            likelihoodsAt(k, grid.data() + 1 + static_cast<size_t>(r) * kLanes, n, bouts, settings);
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
