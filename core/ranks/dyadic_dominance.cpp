// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/dyadic_dominance.h"

namespace hierloom::core {

DyadCounts dyadCounts(const WinMatrix& m)
{
    DyadCounts c;
    c.dyads = static_cast<long long>(m.n) * (m.n - 1) / 2;
    for (int i = 0; i < m.n; ++i)
        for (int j = i + 1; j < m.n; ++j)
            if (m.total(i, j) > 0) ++c.knownDyads;
    if (c.dyads > 0) c.unknownShare = 1.0 - static_cast<double>(c.knownDyads) / static_cast<double>(c.dyads);
    return c;
}

} // namespace hierloom::core
