// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/kendall_tau.h"

#include <cmath>
#include <cstdint>

namespace hierloom::core {

std::optional<double> kendallTauB(std::span<const double> x, std::span<const double> y)
{
    if (x.size() != y.size() || x.size() < 2)
        return std::nullopt;
    // Integer counts keep the numerator exact for any n the program meets.
    std::int64_t concordantMinusDiscordant = 0;
    std::int64_t untiedX = 0; // pairs not tied in x: n0 - n1
    std::int64_t untiedY = 0; // pairs not tied in y: n0 - n2
    const std::size_t n = x.size();
    for (std::size_t i = 0; i + 1 < n; ++i) {
        for (std::size_t j = i + 1; j < n; ++j) {
            const int sx = (x[i] < x[j]) - (x[j] < x[i]);
            const int sy = (y[i] < y[j]) - (y[j] < y[i]);
            untiedX += sx != 0;
            untiedY += sy != 0;
            concordantMinusDiscordant += sx * sy;
        }
    }
    if (untiedX == 0 || untiedY == 0)
        return std::nullopt;
    return static_cast<double>(concordantMinusDiscordant)
           / std::sqrt(static_cast<double>(untiedX) * static_cast<double>(untiedY));
}

} // namespace hierloom::core
