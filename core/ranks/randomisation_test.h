// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/parallel_randomisation.h"

#include <cstdint>
#include <optional>

namespace hierloom::core {

/// Outcome of a right-tailed randomisation test (docs/methods.md "Randomisations"):
/// p = (1 + #{random statistic >= observed}) / (N + 1).
struct RandomisationTest {
    std::optional<double> p;          ///< empty when the statistic is undefined or N < 1
    int iterations = 0;               ///< N
    std::uint64_t seed = 0;           ///< seed reported with the result
    std::optional<double> meanRandom; ///< mean of the random statistic over the N iterations
};

/// Hands out the bits of the engine's 64-bit words one at a time, so a fair
/// coin costs one engine call per 64 flips (deterministic for a given engine state).
class RandomBits {
public:
    explicit RandomBits(RandomEngine& engine) : engine_(engine) {}
    bool next()
    {
        if (left_ == 0) {
            word_ = engine_();
            left_ = 64;
        }
        const bool bit = (word_ & 1U) != 0;
        word_ >>= 1;
        --left_;
        return bit;
    }

private:
    RandomEngine& engine_;
    std::uint64_t word_ = 0;
    int left_ = 0;
};

/// p of a right-tailed test from the count of random statistics at least the observed one.
inline double rightTailedP(long long atLeast, int iterations)
{
    return (1.0 + static_cast<double>(atLeast)) / (static_cast<double>(iterations) + 1.0);
}

} // namespace hierloom::core
