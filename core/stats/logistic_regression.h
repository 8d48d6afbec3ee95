// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <optional>
#include <span>

namespace hierloom::core {

/// Fit of logit P(y = 1) = intercept + slope * x; every figure is empty when the
/// maximum-likelihood estimate does not exist (see fitLogistic).
struct LogisticFit {
    std::optional<double> intercept;
    std::optional<double> interceptSe;
    std::optional<double> slope;
    std::optional<double> slopeSe;
    /// Wald z = slope / slopeSe.
    std::optional<double> slopeZ;
    /// Two-sided normal p of slopeZ.
    std::optional<double> slopeP;
    /// slope -+ 1.96 slopeSe (docs/methods.md, "Maternal rank and offspring sex ratio").
    std::optional<double> slopeCiLow;
    std::optional<double> slopeCiHigh;
    /// Likelihood-ratio chi-square (1 df) against the intercept-only model.
    std::optional<double> lrChiSquare;
    std::optional<double> lrP;
    /// Newton-Raphson iterations used (0 when no fit was attempted).
    int iterations = 0;
};

/// Binary logistic regression of y (0/1) on one continuous x by maximum likelihood
/// with Newton-Raphson (Hosmer & Lemeshow 2000, Applied Logistic Regression, ch. 1-2);
/// standard errors from the inverse observed information matrix.
///
/// Empty when the estimate does not exist: lengths differ, fewer than two
/// observations, a y other than 0/1, all y equal, constant x, or complete or
/// quasi-complete separation. With one predictor, separation (Albert & Anderson 1984,
/// Biometrika 71:1-10) is decided exactly from the data: the classes are separated
/// when max x among y = 0 <= min x among y = 1, or max x among y = 1 <= min x among
/// y = 0 (for a binary x: a zero cell in the 2x2 table). Should Newton-Raphson still
/// fail to converge, or the information matrix be singular, the fit is empty too.
LogisticFit fitLogistic(std::span<const double> x, std::span<const int> y);

} // namespace hierloom::core
