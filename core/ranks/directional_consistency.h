// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/win_matrix.h"

#include <optional>

namespace hierloom::core {

/// Directional consistency index (van Hooff & Wensing 1987):
/// DCI = sum over dyads (max(s_ij, s_ji) - min(s_ij, s_ji)) / sum over dyads n_ij;
/// empty when there are no encounters.
std::optional<double> directionalConsistency(const WinMatrix& m);

} // namespace hierloom::core
