// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/randomisation_test.h"
#include "core/ranks/win_matrix.h"

#include <cstdint>
#include <optional>

namespace hierloom::core {

/// Landau's (1951) linearity index h, with ties and unknown dyads at 1/2, and
/// de Vries' (1995) h' = h + 6u/(n^3 - n); both empty for fewer than two animals.
struct LinearityResult {
    std::optional<double> h;
    std::optional<double> hPrime;
    int unknownDyads = 0; ///< u, dyads with n_ij = 0
};

/// Computes Landau's h, de Vries' h' and the count of unknown dyads.
LinearityResult linearity(const WinMatrix& m);

/// The de Vries (1995) right-tailed linearity test: per iteration h_fill
/// (unknown dyads of the observed matrix given to either animal with
/// probability 1/2, ties kept at 1/2) and h_rand (every dyad of a complete
/// random matrix dominated either way with probability 1/2);
/// p = (1 + #{h_rand >= h_fill}) / (N + 1).
struct LinearityTest {
    RandomisationTest test;          ///< test.meanRandom is the mean of h_rand
    std::optional<double> meanHFill; ///< mean of h_fill, an estimate of h'
};

/// Runs the de Vries (1995) test; empty figures for fewer than two animals or N < 1.
LinearityTest linearityTest(const WinMatrix& m, int iterations, std::uint64_t seed, unsigned threads);

} // namespace hierloom::core
