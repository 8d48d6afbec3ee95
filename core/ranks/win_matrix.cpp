// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/win_matrix.h"

namespace hierloom::core {

WinMatrix WinMatrix::fromBouts(int n, const std::vector<Bout>& bouts, DrawPolicy draws)
{
    WinMatrix m(n);
    for (const Bout& b : bouts) {
        if (b.draw) {
            if (draws == DrawPolicy::Ignore) continue;
            m.s(b.winner, b.loser) += 0.5;
            m.s(b.loser, b.winner) += 0.5;
        } else {
            m.s(b.winner, b.loser) += 1.0;
        }
    }
    return m;
}

WinMatrix WinMatrix::fromRows(const std::vector<std::vector<double>>& rows)
{
    WinMatrix m(static_cast<int>(rows.size()));
    for (int i = 0; i < m.n; ++i)
        for (int j = 0; j < m.n; ++j) m.s(i, j) = rows[static_cast<size_t>(i)][static_cast<size_t>(j)];
    return m;
}

} // namespace hierloom::core
