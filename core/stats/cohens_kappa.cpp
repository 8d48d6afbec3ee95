// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/stats/cohens_kappa.h"

#include <stdexcept>

namespace hierloom::core {

KappaResult cohensKappa(const std::vector<std::vector<int>>& table)
{
    const size_t k = table.size();
    std::vector<double> rows(k, 0), cols(k, 0);
    KappaResult r;
    double diagonal = 0;
    for (size_t i = 0; i < k; ++i) {
        if (table[i].size() != k) throw std::invalid_argument("cohensKappa: the table must be square");
        for (size_t j = 0; j < k; ++j) {
            rows[i] += table[i][j];
            cols[j] += table[i][j];
            r.items += table[i][j];
            if (i == j) diagonal += table[i][j];
        }
    }
    if (r.items == 0) return r;
    const double n = r.items;
    r.observed = diagonal / n;
    for (size_t i = 0; i < k; ++i) r.expected += (rows[i] / n) * (cols[i] / n);
    if (r.expected < 1) r.kappa = (r.observed - r.expected) / (1 - r.expected);
    return r;
}

} // namespace hierloom::core
