// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/bout.h"

#include <cstddef>
#include <vector>

namespace hierloom::core {

/// The sociomatrix of wins: s(i, j) = encounters i won against j, a draw
/// adding 1/2 to both s(i, j) and s(j, i) under DrawPolicy::Half.
struct WinMatrix {
    int n = 0;
    std::vector<double> cells; // row-major n*n

    WinMatrix() = default;
    explicit WinMatrix(int size) : n(size), cells(static_cast<size_t>(size) * size, 0.0) {}

    double s(int i, int j) const { return cells[static_cast<size_t>(i) * n + j]; }
    double& s(int i, int j) { return cells[static_cast<size_t>(i) * n + j]; }
    /// n_ij = s_ij + s_ji, the encounters of the dyad.
    double total(int i, int j) const { return s(i, j) + s(j, i); }

    /// Builds the matrix of `n` animals from bouts.
    static WinMatrix fromBouts(int n, const std::vector<Bout>& bouts, DrawPolicy draws);
    /// Builds from a row-major list of whole counts (tests, hand examples).
    static WinMatrix fromRows(const std::vector<std::vector<double>>& rows);
};

} // namespace hierloom::core
