// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

/// Standard normal cumulative distribution Phi(z) (Abramowitz & Stegun 1964, 26.2.29),
/// from Boost.Math's normal distribution.
double normalCdf(double z);

/// Upper tail 1 - Phi(z) (Abramowitz & Stegun 1964, 26.2.29), Boost.Math's
/// complement, so that large z do not lose all digits to cancellation.
double normalUpperTail(double z);

/// Two-sided p of a standard normal (Wald) statistic, P(|Z| >= |z|) = erfc(|z| / sqrt 2).
double twoSidedNormalP(double z);

/// Upper tail of the chi-square distribution with one degree of freedom,
/// P(X >= x) (Abramowitz & Stegun 1964, 26.4.4), Boost.Math's complement; 1 for x <= 0.
double chiSquare1UpperP(double x);

} // namespace hierloom::core
