// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/directional_consistency.h"

#include <cmath>

namespace hierloom::core {

std::optional<double> directionalConsistency(const WinMatrix& m)
{
    double difference = 0.0, total = 0.0;
    for (int i = 0; i < m.n; ++i)
        for (int j = i + 1; j < m.n; ++j) {
            difference += std::fabs(m.s(i, j) - m.s(j, i));
            total += m.total(i, j);
        }
    if (total <= 0) return std::nullopt;
    return difference / total;
}

} // namespace hierloom::core
