// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <vector>

namespace hierloom::core {

/// Relative tolerance under which two scores count as equal in every ranking
/// (docs/methods.md "Small choices": equal within a relative 1e-9).
inline constexpr double kRankTieTolerance = 1e-9;

/// Ordinal ranks (1 = top) by score descending among animals with
/// include[i] true, ties (scores within a relative 1e-9, chained between
/// neighbours in score order) ordered by index ascending, as docs/methods.md
/// "Small choices" fixes for every ranking; excluded animals get rank 0.
/// Throws std::invalid_argument when the two vectors differ in length.
std::vector<int> ordinalRanks(const std::vector<double>& score, const std::vector<bool>& include);

} // namespace hierloom::core
