// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <optional>
#include <vector>

namespace hierloom::core {

/// Agreement of two raters over the same items, from their square table of
/// counts (row: first rater's category, column: second rater's).
struct KappaResult {
    int items = 0;
    double observed = 0; ///< share of items on the diagonal (p_o)
    double expected = 0; ///< agreement expected by chance from the margins (p_e)
    std::optional<double> kappa; ///< (p_o - p_e) / (1 - p_e); undefined without items or when p_e = 1
};

/// Cohen's kappa (Cohen 1960). The table must be square.
KappaResult cohensKappa(const std::vector<std::vector<int>>& table);

} // namespace hierloom::core
