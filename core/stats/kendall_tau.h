// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <optional>
#include <span>

namespace hierloom::core {

/// Kendall's tau-b, (C - D) / sqrt((n0 - n1)(n0 - n2)), of paired observations
/// (Kendall 1945, Biometrika 33:239-251); ties are exact equality. Empty when the
/// lengths differ, n < 2, or either vector is constant (a zero denominator).
std::optional<double> kendallTauB(std::span<const double> x, std::span<const double> y);

} // namespace hierloom::core
