// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>
#include <iterator>
#include <random>

namespace hierloom::core {

/// Portable random draws on top of std::mt19937_64 (Matsumoto & Nishimura 1998),
/// written out by hand because the standard distributions differ between
/// standard libraries and the demo colony must be identical everywhere.
class DemoRandom {
public:
    explicit DemoRandom(std::uint64_t seed) : engine_(seed) {}

    /// The next raw 64-bit output of the engine.
    std::uint64_t next() { return engine_(); }

    /// A uniform integer in [0, n) by rejection of the incomplete last block; n > 0.
    std::uint64_t below(std::uint64_t n)
    {
        const std::uint64_t limit = UINT64_MAX - (UINT64_MAX % n + 1) % n;
        std::uint64_t x = engine_();
        while (x > limit) x = engine_();
        return x % n;
    }

    /// A uniform integer in [lo, hi] (inclusive both ends); lo <= hi.
    int between(int lo, int hi)
    {
        return lo + static_cast<int>(below(static_cast<std::uint64_t>(hi - lo) + 1));
    }

    /// A uniform double in [0, 1) from the top 53 bits.
    double uniform() { return static_cast<double>(engine_() >> 11) * 0x1.0p-53; }

    /// True with probability p.
    bool chance(double p) { return uniform() < p; }

    /// An index drawn with probability proportional to weights[i] (all >= 0, sum > 0).
    template <class Weights>
    std::size_t pick(const Weights& weights)
    {
        double total = 0.0;
        for (double w : weights) total += w;
        double u = uniform() * total;
        std::size_t last = 0;
        for (std::size_t i = 0; i < std::size(weights); ++i) {
            if (weights[i] <= 0.0) continue;
            last = i;
            if (u < weights[i]) return i;
            u -= weights[i];
        }
        return last; // rounding left u just above the running sum
    }

private:
    std::mt19937_64 engine_;
};

/// SplitMix64 (Steele, Lea & Flood 2014), used to derive independent stream seeds.
inline std::uint64_t splitMix64(std::uint64_t x)
{
    x += 0x9E3779B97F4A7C15ULL;
    x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9ULL;
    x = (x ^ (x >> 27)) * 0x94D049BB133111EBULL;
    return x ^ (x >> 31);
}

} // namespace hierloom::core
