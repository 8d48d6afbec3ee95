// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/randomisation_test.h"
#include "core/ranks/win_matrix.h"

#include <cstdint>

namespace hierloom::core {

/// Right-tailed randomisation test of hierarchy steepness (de Vries, Stevens &
/// Vervaecke 2006): N random matrices keep each dyad's total n_ij (rounded to a
/// whole number) with s_ij ~ Binomial(n_ij, 1/2); a random steepness counts
/// when >= the observed one or equal within a relative 1e-9. meanRandom is the
/// mean random steepness. p is empty for fewer than two animals or N < 1.
RandomisationTest steepnessTest(const WinMatrix& m, int iterations, std::uint64_t seed, unsigned threads);

} // namespace hierloom::core
