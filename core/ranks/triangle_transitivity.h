// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/randomisation_test.h"
#include "core/ranks/win_matrix.h"

#include <cstdint>
#include <optional>

namespace hierloom::core {

/// Triangle transitivity (Shizuka & McDonald 2012) of the dominance network
/// (arc i -> j when s_ij > s_ji; ties and unknown dyads have no arc), over the
/// triads whose three dyads all have an arc.
struct TriangleTransitivity {
    long long transitive = 0;  ///< T
    long long cyclic = 0;      ///< C
    std::optional<double> pt;  ///< P_t = T / (T + C); empty when T + C = 0
    std::optional<double> tTri; ///< 4 (P_t - 0.75), negative values kept; empty when T + C = 0
};

/// Counts transitive and cyclic triads and derives P_t and t_tri.
TriangleTransitivity triangleTransitivity(const WinMatrix& m);

/// Right-tailed test (Shizuka & McDonald 2012): N networks with the same
/// dyads carrying arcs, each arc's direction drawn with probability 1/2;
/// p = (1 + #{t_tri_r >= t_tri}) / (N + 1); meanRandom is the mean t_tri_r.
/// Empty p when T + C = 0 or N < 1.
RandomisationTest triangleTransitivityTest(const WinMatrix& m, int iterations, std::uint64_t seed, unsigned threads);

} // namespace hierloom::core
