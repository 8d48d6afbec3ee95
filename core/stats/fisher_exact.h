// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>
#include <optional>

namespace hierloom::core {

/// P values of Fisher's exact test on a 2x2 table [[a, b], [c, d]] (Fisher 1935,
/// The Design of Experiments, ch. 2); `a` is hypergeometric given the margins.
struct FisherExactResult {
    /// Sum of the probabilities of all tables with the observed margins that are no
    /// more probable than the observed one (relative tolerance 1e-7), as in docs/methods.md.
    double twoSided = 1.0;
    /// P(A <= a): evidence that the odds ratio is below 1.
    double less = 1.0;
    /// P(A >= a): evidence that the odds ratio is above 1.
    double greater = 1.0;
};

/// Fisher's exact test of the 2x2 table [[a, b], [c, d]] (Fisher 1935; two-sided rule
/// of Agresti 2002, §3.5); empty when the table total is 0 or a count is negative.
std::optional<FisherExactResult> fisherExact(std::int64_t a, std::int64_t b, std::int64_t c,
                                             std::int64_t d);

} // namespace hierloom::core
