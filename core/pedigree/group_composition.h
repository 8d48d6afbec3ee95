// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Who lives in one group on one day: sizes, the adult sex ratio and the number
/// of matrilines (docs/methods.md "Matrilineal rank prediction": a matriline is named
/// after the end of its chain of mother links; Kawamura 1958).
struct GroupComposition {
    std::string group;
    int animals = 0;
    int adultFemales = 0;
    int adultMales = 0;
    int immature = 0;
    int unknownSex = 0; ///< adults of unknown sex
    /// Adult females per adult male; empty without adult males.
    std::optional<double> adultSexRatio;
    /// Distinct matrilines among the resident females.
    int matrilines = 0;
    /// Their matriarchs, ids ascending.
    std::vector<std::string> matriarchs;
};

/// The composition of each named group on day `at`; an animal is adult on and
/// after its maturityYears birthday, and one with an unknown birth date counts
/// as adult (docs/methods.md "Small choices").
std::vector<GroupComposition> groupComposition(const Colony& colony, const ResidenceIndex& where, Day at,
                                               const std::vector<std::string>& groups, int maturityYears);

} // namespace hierloom::core
