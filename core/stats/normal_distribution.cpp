// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/normal_distribution.h"

#include <cmath>

namespace hierloom::core {

namespace {
constexpr double kSqrtHalf = 0.70710678118654752440;
}

double normalCdf(double z)
{
    return 0.5 * std::erfc(-z * kSqrtHalf);
}

double normalUpperTail(double z)
{
    return 0.5 * std::erfc(z * kSqrtHalf);
}

double twoSidedNormalP(double z)
{
    return std::erfc(std::fabs(z) * kSqrtHalf);
}

double chiSquare1UpperP(double x)
{
    if (!(x > 0.0))
        return 1.0;
    return std::erfc(std::sqrt(0.5 * x));
}

} // namespace hierloom::core
