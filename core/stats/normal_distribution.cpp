// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/normal_distribution.h"

#include <boost/math/distributions/chi_squared.hpp>
#include <boost/math/distributions/normal.hpp>

#include <cmath>

namespace hierloom::core {

// Boost.Math computes both tails through its own erfc, so the upper tail of a
// large z keeps its digits (no 1 - cdf cancellation).
namespace {
const boost::math::normal_distribution<double> kStandardNormal(0.0, 1.0);
const boost::math::chi_squared_distribution<double> kChiSquare1(1.0);
} // namespace

double normalCdf(double z)
{
    if (std::isnan(z)) return z;
    if (std::isinf(z)) return z > 0 ? 1.0 : 0.0;
    return boost::math::cdf(kStandardNormal, z);
}

double normalUpperTail(double z)
{
    if (std::isnan(z)) return z;
    if (std::isinf(z)) return z > 0 ? 0.0 : 1.0;
    return boost::math::cdf(boost::math::complement(kStandardNormal, z));
}

double twoSidedNormalP(double z)
{
    return 2.0 * normalUpperTail(std::fabs(z));
}

double chiSquare1UpperP(double x)
{
    if (!(x > 0.0))
        return 1.0;
    if (std::isinf(x)) return 0.0;
    return boost::math::cdf(boost::math::complement(kChiSquare1, x));
}

} // namespace hierloom::core
