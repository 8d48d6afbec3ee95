// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/wilson_interval.h"

#include <algorithm>
#include <cmath>

namespace hierloom::core {

std::optional<ProportionInterval> wilsonInterval(std::int64_t k, std::int64_t n, double z)
{
    if (n <= 0 || k < 0 || k > n)
        return std::nullopt;
    const double nn = static_cast<double>(n);
    const double p = static_cast<double>(k) / nn;
    const double z2 = z * z;
    const double centre = p + z2 / (2.0 * nn);
    const double half = z * std::sqrt(p * (1.0 - p) / nn + z2 / (4.0 * nn * nn));
    const double scale = 1.0 + z2 / nn;
    ProportionInterval r;
    // At k = 0 (k = n) the lower (upper) limit is exactly 0 (1); set it so rounding
    // cannot print -1e-17.
    r.low = k == 0 ? 0.0 : std::clamp((centre - half) / scale, 0.0, 1.0);
    r.high = k == n ? 1.0 : std::clamp((centre + half) / scale, 0.0, 1.0);
    return r;
}

} // namespace hierloom::core
