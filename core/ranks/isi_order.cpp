// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/isi_order.h"

#include "core/ranks/davids_score.h"
#include "core/ranks/dyadic_dominance.h"
#include "core/ranks/parallel_randomisation.h"

#include <algorithm>
#include <cstdint>
#include <numeric>
#include <random>

namespace hierloom::core {

namespace {

constexpr int exhaustiveLimit = 8;
constexpr std::uint64_t perturbationSeed = 0x15A15A15A15ULL;

/// The search state shared by the I&SI heuristics: the dominance relation and
/// the key I * M + SI, with M above any possible SI, so that comparing keys
/// compares (I, SI) lexicographically.
class IsiSearcher {
public:
    explicit IsiSearcher(const WinMatrix& m)
        : n_(m.n), dom_(static_cast<size_t>(n_) * static_cast<size_t>(n_), 0),
          weight_(static_cast<long long>(n_) * n_ * n_ + 1), above_(static_cast<size_t>(n_)),
          below_(static_cast<size_t>(n_))
    {
        for (int i = 0; i < n_; ++i)
            for (int j = 0; j < n_; ++j)
                if (i != j && dominates(m, i, j)) dom_[index(i, j)] = 1;
    }

    int d(int i, int j) const { return dom_[index(i, j)]; }

    IsiCriteria criteria(const std::vector<int>& ord) const
    {
        IsiCriteria c;
        for (int p = 0; p < n_; ++p)
            for (int q = p + 1; q < n_; ++q)
                if (d(ord[static_cast<size_t>(q)], ord[static_cast<size_t>(p)])) {
                    ++c.inconsistencies;
                    c.strength += q - p;
                }
        return c;
    }

    long long key(const IsiCriteria& c) const { return c.inconsistencies * weight_ + c.strength; }
    long long key(const std::vector<int>& ord) const { return key(criteria(ord)); }

    /// Change of the key when the animals at positions p and q are exchanged (O(n)).
    long long swapDelta(const std::vector<int>& ord, int p, int q) const
    {
        if (p > q) std::swap(p, q);
        const int a = ord[static_cast<size_t>(p)], b = ord[static_cast<size_t>(q)];
        long long dI = d(a, b) - d(b, a), dSI = static_cast<long long>(d(a, b) - d(b, a)) * (q - p);
        for (int k = 0; k < n_; ++k) {
            if (k == p || k == q) continue;
            const int x = ord[static_cast<size_t>(k)];
            // Inconsistency of animal z at position pos with x at k.
            auto incons = [&](int z, int pos) { return pos > k ? d(z, x) : d(x, z); };
            const int before = incons(a, p) + incons(b, q), after = incons(a, q) + incons(b, p);
            dI += after - before;
            dSI += static_cast<long long>(incons(a, q)) * std::abs(q - k) + static_cast<long long>(incons(b, p)) * std::abs(p - k)
                   - static_cast<long long>(incons(a, p)) * std::abs(p - k) - static_cast<long long>(incons(b, q)) * std::abs(q - k);
        }
        return dI * weight_ + dSI;
    }

    /// Local search over single moves and generalised swaps until neither improves.
    void localSearch(std::vector<int>& ord, long long& k)
    {
        for (;;) {
            bool improved = false;
            while (improveByMoves(ord, k)) improved = true;
            if (improveBySwap(ord, k)) improved = true;
            if (!improved) return;
        }
    }

    /// Exchanges adjacent animals when (I, SI) stays and the lower index comes first.
    bool tidy(std::vector<int>& ord) const
    {
        bool changed = false;
        for (bool again = true; again;) {
            again = false;
            for (int p = 0; p + 1 < n_; ++p)
                if (ord[static_cast<size_t>(p)] > ord[static_cast<size_t>(p) + 1] && swapDelta(ord, p, p + 1) == 0) {
                    std::swap(ord[static_cast<size_t>(p)], ord[static_cast<size_t>(p) + 1]);
                    again = changed = true;
                }
        }
        return changed;
    }

private:
    size_t index(int i, int j) const { return static_cast<size_t>(i) * static_cast<size_t>(n_) + static_cast<size_t>(j); }

    /// above_[p]: animals above position p dominated by ord[p];
    /// below_[p]: animals below position p that dominate ord[p].
    void prepare(const std::vector<int>& ord)
    {
        for (int p = 0; p < n_; ++p) {
            const int a = ord[static_cast<size_t>(p)];
            int up = 0, down = 0;
            for (int k = 0; k < p; ++k) up += d(a, ord[static_cast<size_t>(k)]);
            for (int k = p + 1; k < n_; ++k) down += d(ord[static_cast<size_t>(k)], a);
            above_[static_cast<size_t>(p)] = up;
            below_[static_cast<size_t>(p)] = down;
        }
    }

    /// One pass over every animal, each moved to its best position when that
    /// lowers the key. A move is a chain of adjacent exchanges; each exchange of
    /// t (above) and u (below) changes I by d(t,u) - d(u,t) and SI by that plus
    /// the inconsistencies of t and u with the animals above and below them.
    bool improveByMoves(std::vector<int>& ord, long long& k)
    {
        bool any = false;
        prepare(ord);
        for (int p = 0; p < n_; ++p) {
            const int a = ord[static_cast<size_t>(p)];
            long long best = 0;
            int bestQ = -1;
            long long dI = 0, dSI = 0;
            int aboveA = above_[static_cast<size_t>(p)], belowA = below_[static_cast<size_t>(p)];
            for (int q = p - 1; q >= 0; --q) { // a climbs past b = ord[q]
                const int b = ord[static_cast<size_t>(q)];
                aboveA -= d(a, b);
                const int stepI = d(b, a) - d(a, b);
                dI += stepI;
                dSI += stepI + above_[static_cast<size_t>(q)] - aboveA + belowA - (below_[static_cast<size_t>(q)] - d(a, b));
                belowA += d(b, a);
                const long long delta = dI * weight_ + dSI;
                if (delta < best) {
                    best = delta;
                    bestQ = q;
                }
            }
            dI = dSI = 0;
            aboveA = above_[static_cast<size_t>(p)];
            belowA = below_[static_cast<size_t>(p)];
            for (int q = p + 1; q < n_; ++q) { // a descends past b = ord[q]
                const int b = ord[static_cast<size_t>(q)];
                belowA -= d(b, a);
                const int stepI = d(a, b) - d(b, a);
                dI += stepI;
                dSI += stepI + aboveA - (above_[static_cast<size_t>(q)] - d(b, a)) + below_[static_cast<size_t>(q)] - belowA;
                aboveA += d(a, b);
                const long long delta = dI * weight_ + dSI;
                if (delta < best) {
                    best = delta;
                    bestQ = q;
                }
            }
            if (bestQ >= 0) {
                moveAnimal(ord, p, bestQ);
                k += best;
                any = true;
                prepare(ord);
            }
        }
        return any;
    }

    /// Applies the best generalised swap of a lower animal with a higher one it dominates.
    bool improveBySwap(std::vector<int>& ord, long long& k) const
    {
        long long best = 0;
        int bp = -1, bq = -1;
        for (int p = 0; p < n_; ++p)
            for (int q = p + 1; q < n_; ++q) {
                if (!d(ord[static_cast<size_t>(q)], ord[static_cast<size_t>(p)])) continue;
                const long long delta = swapDelta(ord, p, q);
                if (delta < best) {
                    best = delta;
                    bp = p;
                    bq = q;
                }
            }
        if (bp < 0) return false;
        std::swap(ord[static_cast<size_t>(bp)], ord[static_cast<size_t>(bq)]);
        k += best;
        return true;
    }

    static void moveAnimal(std::vector<int>& ord, int from, int to)
    {
        const auto f = ord.begin() + from, t = ord.begin() + to;
        if (to < from) std::rotate(t, f, f + 1);
        else std::rotate(f, f + 1, t + 1);
    }

    int n_;
    std::vector<std::uint8_t> dom_;
    long long weight_;
    std::vector<int> above_, below_;
};

IsiResult exhaustiveSearch(const WinMatrix& m, const IsiSearcher& s)
{
    std::vector<int> ord(static_cast<size_t>(m.n));
    std::iota(ord.begin(), ord.end(), 0);
    std::vector<int> best = ord;
    long long bestKey = s.key(ord);
    // Permutations come in lexicographic order, so keeping the first of equal
    // keys keeps the lexicographically smallest optimal order.
    while (std::next_permutation(ord.begin(), ord.end())) {
        const long long k = s.key(ord);
        if (k < bestKey) {
            bestKey = k;
            best = ord;
        }
    }
    const IsiCriteria c = s.criteria(best);
    return {best, c.inconsistencies, c.strength, true};
}

/// Deterministic starting orders: by animals dominated, by David's score, by index.
std::vector<std::vector<int>> startingOrders(const WinMatrix& m)
{
    const int n = m.n;
    std::vector<int> identity(static_cast<size_t>(n));
    std::iota(identity.begin(), identity.end(), 0);
    std::vector<double> dominated(static_cast<size_t>(n), 0.0);
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j)
            if (i != j && dominates(m, i, j)) dominated[static_cast<size_t>(i)] += 1.0;
    const std::vector<double> ds = davidsScores(m, DyadicIndex::Proportion);
    auto byScore = [&](const std::vector<double>& score) {
        std::vector<int> ord = identity;
        std::stable_sort(ord.begin(), ord.end(),
                         [&](int a, int b) { return score[static_cast<size_t>(a)] > score[static_cast<size_t>(b)]; });
        return ord;
    };
    return {byScore(dominated), byScore(ds), identity};
}

IsiResult heuristicSearch(const WinMatrix& m, IsiSearcher& s)
{
    const int n = m.n;
    std::vector<int> best;
    long long bestKey = 0;
    auto consider = [&](const std::vector<int>& ord, long long k) {
        if (best.empty() || k < bestKey || (k == bestKey && ord < best)) {
            best = ord;
            bestKey = k;
        }
    };

    const std::vector<std::vector<int>> starts = startingOrders(m);
    // Work per round grows as n^2, so rounds shrink for large groups.
    const long long nn = std::max(1LL, static_cast<long long>(n) * n);
    const int rounds = static_cast<int>(std::clamp(24'000'000LL / nn, 150LL, 3000LL));
    const int roundsPerStart = rounds / static_cast<int>(starts.size());
    RandomEngine engine(perturbationSeed);
    const int reach = std::max(3, n / 5);

    for (const std::vector<int>& start : starts) {
        std::vector<int> current = start;
        long long currentKey = s.key(current);
        s.localSearch(current, currentKey);
        consider(current, currentKey);
        for (int r = 0; r < roundsPerStart && bestKey > 0; ++r) {
            std::vector<int> trial = current;
            const int kicks = 2 + r % 3;
            for (int kick = 0; kick < kicks; ++kick) {
                const int from = static_cast<int>(engine() % static_cast<std::uint64_t>(n));
                const int lo = std::max(0, from - reach), hi = std::min(n - 1, from + reach);
                const int to = lo + static_cast<int>(engine() % static_cast<std::uint64_t>(hi - lo + 1));
                const int animal = trial[static_cast<size_t>(from)];
                trial.erase(trial.begin() + from);
                trial.insert(trial.begin() + to, animal);
            }
            long long trialKey = s.key(trial);
            s.localSearch(trial, trialKey);
            consider(trial, trialKey);
            // Equal keys are accepted so the search can walk across plateaus.
            if (trialKey <= currentKey) {
                current = std::move(trial);
                currentKey = trialKey;
            }
        }
    }

    // Tidy and re-optimise until both leave the order unchanged.
    for (;;) {
        const bool tidied = s.tidy(best);
        const long long before = bestKey;
        s.localSearch(best, bestKey);
        if (!tidied && bestKey == before) break;
    }
    const IsiCriteria c = s.criteria(best);
    return {best, c.inconsistencies, c.strength, false};
}

} // namespace

IsiCriteria isiCriteria(const WinMatrix& m, const std::vector<int>& order)
{
    return IsiSearcher(m).criteria(order);
}

IsiResult isiOrder(const WinMatrix& m, IsiSearch search)
{
    if (m.n == 0) return {{}, 0, 0, true};
    IsiSearcher s(m);
    if (search == IsiSearch::Automatic && m.n <= exhaustiveLimit) return exhaustiveSearch(m, s);
    return heuristicSearch(m, s);
}

} // namespace hierloom::core
