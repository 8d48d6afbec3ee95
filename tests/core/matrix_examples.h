// SPDX-License-Identifier: GPL-3.0-or-later
// Shared inputs for the matrix-method tests: the hand examples of
// docs/methods.md, "Check values" and seeded random matrices.
#pragma once
#include "core/ranks/win_matrix.h"

#include <cstdint>
#include <random>

namespace hierloom::core::testing {

/// Example L: complete linear 4-group, one interaction per dyad.
inline WinMatrix exampleL()
{
    return WinMatrix::fromRows({{0, 1, 1, 1}, {0, 0, 1, 1}, {0, 0, 0, 1}, {0, 0, 0, 0}});
}

/// Example 1: 4-group with the B-D dyad unknown.
inline WinMatrix example1()
{
    return WinMatrix::fromRows({{0, 6, 3, 2}, {1, 0, 4, 0}, {0, 2, 0, 5}, {0, 0, 1, 0}});
}

/// Example C: cyclic triad A->B->C->A plus a bottom animal.
inline WinMatrix exampleC()
{
    return WinMatrix::fromRows({{0, 3, 0, 2}, {0, 0, 3, 2}, {3, 0, 0, 2}, {0, 0, 0, 0}});
}

/// Example 5: 5-group with one unknown dyad (A-D) and a 2:2 tie (A-C).
inline WinMatrix example5()
{
    return WinMatrix::fromRows({{0, 4, 2, 0, 3}, {1, 0, 5, 1, 0}, {2, 0, 0, 3, 2}, {0, 0, 0, 0, 4}, {0, 1, 0, 1, 0}});
}

/// A seeded random matrix: each dyad is observed with probability `known`,
/// then gets 1..maxCount encounters; the animal with the lower index wins
/// each encounter with probability `bias` (0.5 = no hierarchy). With `draws`, about one
/// encounter in ten is a draw (1/2 to each animal).
inline WinMatrix randomMatrix(int n, std::uint64_t seed, double known = 0.8, double bias = 0.5, int maxCount = 5,
                              bool draws = false)
{
    std::mt19937_64 rng(seed);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    std::uniform_int_distribution<int> count(1, maxCount);
    WinMatrix m(n);
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j) {
            if (u(rng) >= known) continue;
            const int c = count(rng);
            for (int k = 0; k < c; ++k) {
                if (draws && u(rng) < 0.1) {
                    m.s(i, j) += 0.5;
                    m.s(j, i) += 0.5;
                } else if (u(rng) < bias) {
                    m.s(i, j) += 1.0;
                } else {
                    m.s(j, i) += 1.0;
                }
            }
        }
    return m;
}

/// A complete linear hierarchy of n animals (index order), `wins` encounters per dyad.
inline WinMatrix linearMatrix(int n, double wins = 3.0)
{
    WinMatrix m(n);
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j) m.s(i, j) = wins;
    return m;
}

} // namespace hierloom::core::testing
