// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/triangle_transitivity.h"

#include "core/ranks/dyadic_dominance.h"

#include <bit>
#include <utility>
#include <vector>

namespace hierloom::core {

namespace {

/// Rows of n-bit sets, `words` 64-bit words per row.
struct BitRows {
    int words = 0;
    std::vector<std::uint64_t> bits;
    BitRows(int n, int w) : words(w), bits(static_cast<size_t>(n) * static_cast<size_t>(w), 0) {}
    std::uint64_t* row(int i) { return bits.data() + static_cast<size_t>(i) * static_cast<size_t>(words); }
    const std::uint64_t* row(int i) const { return bits.data() + static_cast<size_t>(i) * static_cast<size_t>(words); }
    void set(int i, int j) { row(i)[j / 64] |= std::uint64_t{1} << (j % 64); }
};

long long commonCount(const std::uint64_t* a, const std::uint64_t* b, int words)
{
    long long c = 0;
    for (int w = 0; w < words; ++w) c += std::popcount(a[w] & b[w]);
    return c;
}

/// A transitive triad has exactly one animal with arcs to both others (joined
/// by an arc themselves); a cyclic triad has none, so T counts such pairs.
long long transitiveCount(const BitRows& out, const BitRows& adj, const std::vector<std::pair<int, int>>& arcs)
{
    long long twice = 0;
    for (const auto& [from, to] : arcs) twice += commonCount(out.row(from), adj.row(to), out.words);
    return twice / 2;
}

/// Arc dyads (lower index first) and the undirected adjacency of the network.
struct Network {
    std::vector<std::pair<int, int>> dyads;
    BitRows adj;
    long long triangles = 0; ///< triads with all three arcs, T + C
};

Network buildNetwork(const WinMatrix& m, int words)
{
    Network net{{}, BitRows(m.n, words), 0};
    for (int i = 0; i < m.n; ++i)
        for (int j = i + 1; j < m.n; ++j)
            if (dominates(m, i, j) || dominates(m, j, i)) {
                net.dyads.emplace_back(i, j);
                net.adj.set(i, j);
                net.adj.set(j, i);
            }
    long long thrice = 0;
    for (const auto& [i, j] : net.dyads) thrice += commonCount(net.adj.row(i), net.adj.row(j), words);
    net.triangles = thrice / 3;
    return net;
}

std::optional<double> tTriOf(long long transitive, long long triangles)
{
    if (triangles == 0) return std::nullopt;
    return 4.0 * (static_cast<double>(transitive) / static_cast<double>(triangles) - 0.75);
}

} // namespace

TriangleTransitivity triangleTransitivity(const WinMatrix& m)
{
    const int words = (m.n + 63) / 64;
    const Network net = buildNetwork(m, words);
    BitRows out(m.n, words);
    std::vector<std::pair<int, int>> arcs;
    for (const auto& [i, j] : net.dyads) {
        const auto arc = dominates(m, i, j) ? std::pair{i, j} : std::pair{j, i};
        out.set(arc.first, arc.second);
        arcs.push_back(arc);
    }
    TriangleTransitivity r;
    r.transitive = transitiveCount(out, net.adj, arcs);
    r.cyclic = net.triangles - r.transitive;
    if (net.triangles > 0) r.pt = static_cast<double>(r.transitive) / static_cast<double>(net.triangles);
    r.tTri = tTriOf(r.transitive, net.triangles);
    return r;
}

RandomisationTest triangleTransitivityTest(const WinMatrix& m, int iterations, std::uint64_t seed, unsigned threads)
{
    RandomisationTest result;
    result.iterations = iterations;
    result.seed = seed;
    const TriangleTransitivity observed = triangleTransitivity(m);
    if (!observed.tTri || iterations < 1) return result;

    const int words = (m.n + 63) / 64;
    const Network net = buildNetwork(m, words);
    // t_tri is increasing in T for the fixed T + C, so comparing T is exact.
    const std::vector<long long> transitive = runRandomisations<long long>(
        iterations, seed, threads, [&](RandomEngine& engine, int) {
            RandomBits bits(engine);
            BitRows out(m.n, words);
            std::vector<std::pair<int, int>> arcs;
            arcs.reserve(net.dyads.size());
            for (const auto& [i, j] : net.dyads) {
                const auto arc = bits.next() ? std::pair{i, j} : std::pair{j, i};
                out.set(arc.first, arc.second);
                arcs.push_back(arc);
            }
            return transitiveCount(out, net.adj, arcs);
        });

    long long count = 0;
    double sum = 0.0;
    for (long long t : transitive) {
        if (t >= observed.transitive) ++count;
        sum += *tTriOf(t, net.triangles);
    }
    result.p = rightTailedP(count, iterations);
    result.meanRandom = sum / iterations;
    return result;
}

} // namespace hierloom::core
