// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/ordinal_ranks.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace hierloom::core {

namespace {

bool nearlyEqual(double a, double b)
{
    return std::fabs(a - b) <= kRankTieTolerance * std::max(std::fabs(a), std::fabs(b));
}

} // namespace

std::vector<int> ordinalRanks(const std::vector<double>& score, const std::vector<bool>& include)
{
    if (score.size() != include.size())
        throw std::invalid_argument("ordinalRanks: score and include differ in length");
    std::vector<int> order;
    order.reserve(score.size());
    for (size_t i = 0; i < score.size(); ++i)
        if (include[i]) order.push_back(static_cast<int>(i));
    // An exact sort first (a tolerance inside the comparator would not be a
    // strict weak order), then each run of nearly equal neighbours by index.
    std::sort(order.begin(), order.end(), [&](int a, int b) {
        const double sa = score[static_cast<size_t>(a)], sb = score[static_cast<size_t>(b)];
        return sa != sb ? sa > sb : a < b;
    });
    for (size_t begin = 0; begin < order.size();) {
        size_t end = begin + 1;
        while (end < order.size()
               && nearlyEqual(score[static_cast<size_t>(order[end - 1])], score[static_cast<size_t>(order[end])]))
            ++end;
        std::sort(order.begin() + static_cast<std::ptrdiff_t>(begin), order.begin() + static_cast<std::ptrdiff_t>(end));
        begin = end;
    }
    std::vector<int> rank(score.size(), 0);
    for (size_t r = 0; r < order.size(); ++r) rank[static_cast<size_t>(order[r])] = static_cast<int>(r) + 1;
    return rank;
}

} // namespace hierloom::core
