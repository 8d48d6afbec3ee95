// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/win_matrix.h"

#include <vector>

namespace hierloom::core {

/// The two I&SI criteria of an order (de Vries 1998): I, the number of pairs
/// where the lower-placed animal dominates (s_ij > s_ji) the higher-placed one,
/// and SI, the sum of the position distances of those pairs.
struct IsiCriteria {
    int inconsistencies = 0; ///< I
    long long strength = 0;  ///< SI
    friend bool operator==(const IsiCriteria&, const IsiCriteria&) = default;
};

/// An I&SI order (de Vries 1998): order[0] is the top animal.
struct IsiResult {
    std::vector<int> order;
    int inconsistencies = 0;
    long long strength = 0;
    bool exhaustive = false; ///< true when every order was examined
};

/// How isiOrder searches: Automatic is exhaustive for n <= 8 and heuristic
/// above; Heuristic forces the heuristic (used by tests to gauge it).
enum class IsiSearch { Automatic, Heuristic };

/// I and SI (de Vries 1998) of `order` (position 0 = top) on the matrix.
IsiCriteria isiCriteria(const WinMatrix& m, const std::vector<int>& order);

/// I&SI order (de Vries 1998): an order minimising I and then SI.
///
/// Up to 8 animals every order is examined, so the result is optimal; among
/// optimal orders it is the lexicographically smallest sequence of animal
/// indices. Above 8 animals a deterministic heuristic runs: local search with
/// single moves (one animal to any other position) and generalised swaps
/// (exchanging a lower animal with a higher one it dominates), from the orders
/// by animals dominated, by David's score and by index, each followed by
/// iterated perturbation rounds drawn from a fixed seed. The result is then
/// tidied: adjacent animals are exchanged when that leaves (I, SI) unchanged
/// and puts the lower index first, local search is repeated, until neither
/// changes anything. The returned order therefore admits no single move that
/// lowers (I, SI) lexicographically. Tie-break: of the orders found with the
/// least (I, SI), the lexicographically smallest index sequence is kept before
/// that final tidying (which can only make it smaller still).
IsiResult isiOrder(const WinMatrix& m, IsiSearch search = IsiSearch::Automatic);

} // namespace hierloom::core
