// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/win_matrix.h"

#include <optional>
#include <vector>

namespace hierloom::core {

/// Dyadic index David's score is built on: the win proportion P_ij (David
/// 1987) or the chance-corrected D_ij (de Vries, Stevens & Vervaecke 2006).
enum class DyadicIndex { Proportion, Corrected };

/// The dyadic index matrix (row-major n*n): P_ij = s_ij/n_ij or
/// D_ij = (s_ij + 1/2)/(n_ij + 1), both 0 when n_ij = 0.
std::vector<double> dyadicIndexMatrix(const WinMatrix& m, DyadicIndex index);

/// David's score DS_i = w_i + w2_i - l_i - l2_i (David 1987) on the chosen index.
std::vector<double> davidsScores(const WinMatrix& m, DyadicIndex index);

/// David's scores from a precomputed row-major index matrix X of n animals.
std::vector<double> davidsScoresFromIndex(const std::vector<double>& x, int n);

/// Normalised David's score NormDS_i = (DS_i + n(n-1)/2)/n from D_ij
/// (de Vries, Stevens & Vervaecke 2006).
std::vector<double> normalisedDavidsScores(const WinMatrix& m);

/// Steepness of NormDS values (de Vries, Stevens & Vervaecke 2006): the
/// absolute least-squares slope of the values sorted descending against rank
/// 1..n; empty for fewer than two values. The vector is sorted in place.
std::optional<double> steepnessOfScores(std::vector<double>& normDs);

/// Hierarchy steepness (de Vries, Stevens & Vervaecke 2006) of the matrix;
/// empty for fewer than two animals.
std::optional<double> steepness(const WinMatrix& m);

} // namespace hierloom::core
