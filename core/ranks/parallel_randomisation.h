// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/vector_state.h"
#include "core/ranks/mersenne_twister.h"

#include <algorithm>
#include <cstdint>
#include <thread>
#include <vector>

namespace hierloom::core {

/// The generator every randomisation uses: MT19937-64, the same stream as
/// std::mt19937_64 (mersenne_twister.h).
using RandomEngine = MersenneTwister64;

/// Seed of iteration block `block` for a run seeded with `seed` (SplitMix64
/// mixing), so each block's stream is fixed whatever thread runs it.
inline std::uint64_t blockSeed(std::uint64_t seed, std::uint64_t block)
{
    std::uint64_t z = seed + 0x9E3779B97F4A7C15ULL * (block + 1);
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
    return z ^ (z >> 31);
}

/// Number of threads to use by default: every core.
inline unsigned defaultThreadCount()
{
    const unsigned hw = std::thread::hardware_concurrency();
    return hw == 0 ? 1U : hw;
}

/// Iterations per block of runRandomisations: one thread runs a block's
/// iterations in order, one after the other.
inline constexpr int kRandomisationBlock = 64;

/// Runs `iterations` randomisations split into fixed blocks of 64; block b
/// draws from RandomEngine(blockSeed(seed, b)). `body(engine, iteration)`
/// returns a value stored at results[iteration]. The results are identical
/// for any thread count because blocks, not threads, own the random streams.
template <typename Result, typename Body>
std::vector<Result> runRandomisations(int iterations, std::uint64_t seed, unsigned threads, Body body)
{
    constexpr int blockSize = kRandomisationBlock;
    std::vector<Result> results(static_cast<size_t>(std::max(iterations, 0)));
    const int blocks = (iterations + blockSize - 1) / blockSize;
    threads = std::max(1U, std::min<unsigned>(threads, static_cast<unsigned>(std::max(blocks, 1))));
    auto work = [&](unsigned t) {
        clearUpperVectorState(); // a thread inherits its starter's registers
        for (int b = static_cast<int>(t); b < blocks; b += static_cast<int>(threads)) {
            RandomEngine engine(blockSeed(seed, static_cast<std::uint64_t>(b)));
            const int end = std::min(iterations, (b + 1) * blockSize);
            for (int it = b * blockSize; it < end; ++it) results[static_cast<size_t>(it)] = body(engine, it);
        }
    };
    if (threads == 1) {
        work(0);
        return results;
    }
    std::vector<std::thread> pool;
    for (unsigned t = 0; t < threads; ++t) pool.emplace_back(work, t);
    for (auto& th : pool) th.join();
    return results;
}

/// A fair coin from the engine (used for random dominance directions).
inline bool coinFlip(RandomEngine& engine) { return (engine() >> 63) != 0; }

} // namespace hierloom::core
