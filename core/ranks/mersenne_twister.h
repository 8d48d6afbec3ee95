// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>

namespace hierloom::core {

/// MT19937-64 (Matsumoto & Nishimura 1998; Nishimura 2000): the same
/// generator, seeding and output as std::mt19937_64, draw for draw. Written
/// out because the standard library's refill of the state branches on each
/// word's random low bit (a mispredicted branch every second word, about a
/// tenth of randomised Elo's time); here that bit selects the constant
/// through a mask. Only what the randomisations use: seeding and draws.
class MersenneTwister64 {
public:
    using result_type = std::uint64_t;
    static constexpr result_type default_seed = 5489U;

    static constexpr result_type min() { return 0; }
    static constexpr result_type max() { return ~result_type(0); }

    explicit MersenneTwister64(result_type seed = default_seed)
    {
        state_[0] = seed;
        for (int i = 1; i < kWords; ++i) {
            const std::uint64_t prev = state_[i - 1];
            state_[i] = kSeedFactor * (prev ^ (prev >> 62)) + static_cast<std::uint64_t>(i);
        }
        next_ = kWords;
    }

    result_type operator()()
    {
        if (next_ >= kWords) refill();
        std::uint64_t z = state_[next_++];
        z ^= (z >> 29) & 0x5555555555555555ULL;
        z ^= (z << 17) & 0x71D67FFFEDA60000ULL;
        z ^= (z << 37) & 0xFFF7EEE000000000ULL;
        z ^= z >> 43;
        return z;
    }

private:
    static constexpr int kWords = 312;
    static constexpr int kShift = 156;
    static constexpr std::uint64_t kSeedFactor = 6364136223846793005ULL;
    static constexpr std::uint64_t kMatrix = 0xB5026F5AA96619E9ULL;
    static constexpr std::uint64_t kUpper = 0xFFFFFFFF80000000ULL;
    static constexpr std::uint64_t kLower = 0x7FFFFFFFULL;

    /// The new word from the upper bits of `word`, the lower bits of `following` and `far`.
    static std::uint64_t twist(std::uint64_t word, std::uint64_t following, std::uint64_t far)
    {
        const std::uint64_t y = (word & kUpper) | (following & kLower);
        return far ^ (y >> 1) ^ ((0 - (y & 1)) & kMatrix);
    }

    void refill()
    {
        int k = 0;
        for (; k < kWords - kShift; ++k) state_[k] = twist(state_[k], state_[k + 1], state_[k + kShift]);
        for (; k < kWords - 1; ++k) state_[k] = twist(state_[k], state_[k + 1], state_[k + kShift - kWords]);
        state_[kWords - 1] = twist(state_[kWords - 1], state_[0], state_[kShift - 1]);
        next_ = 0;
    }

    std::uint64_t state_[kWords];
    int next_;
};

} // namespace hierloom::core
