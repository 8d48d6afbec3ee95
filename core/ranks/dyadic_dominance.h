// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/win_matrix.h"

#include <optional>

namespace hierloom::core {

/// Binary dominance of the dyad (Landau 1951; de Vries 1995): i dominates j
/// when it won more of their encounters, s_ij > s_ji (ties and unknown dyads: no).
inline bool dominates(const WinMatrix& m, int i, int j) { return m.s(i, j) > m.s(j, i); }

/// Dyadic dominance V_ij of de Vries (1995): 1 if s_ij > s_ji, 0 if
/// s_ij < s_ji, 1/2 for a tie or an unknown relationship (n_ij = 0).
inline double dyadicDominance(const WinMatrix& m, int i, int j)
{
    const double a = m.s(i, j), b = m.s(j, i);
    return a > b ? 1.0 : (a < b ? 0.0 : 0.5);
}

/// How completely the dyads were observed (metrics rows dyads, known_dyads,
/// unknown_share): dyads = n(n-1)/2, known = dyads with n_ij > 0.
struct DyadCounts {
    long long dyads = 0;
    long long knownDyads = 0;
    std::optional<double> unknownShare; ///< 1 - known/dyads; empty when dyads = 0
};

/// Counts the dyads and the known (n_ij > 0) dyads of the matrix.
DyadCounts dyadCounts(const WinMatrix& m);

} // namespace hierloom::core
