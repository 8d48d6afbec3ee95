// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

/// The caution every planner, alert screen and report shows beside predictions
/// of the matrilineal inheritance rule (Kawamura 1958; Datta 1988): one text, reused.
inline constexpr const char* kPlanningCaution =
    "Predictions follow the inheritance rule, not the animals. Introductions and removals are decided by "
    "veterinary and animal-care staff under the institution's approved protocols and local regulations.";

} // namespace hierloom::core
