// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/calendar_period.h"
#include "core/base/colony.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"

#include <atomic>
#include <functional>
#include <optional>
#include <vector>

namespace hierloom::core {

/// One month of the hierarchy series: de Vries' (1995) h', steepness (de Vries,
/// Stevens & Vervaecke 2006) and triangle transitivity t_tri (Shizuka & McDonald
/// 2012) over the month's own encounters, and the conformity of the Elo order
/// with the matrilineal prediction at the month's last day (docs/methods.md).
struct HierarchyMonth {
    CalendarPeriod period;
    long long encounters = 0; ///< counted bouts of the month (draws kept under the draw policy)
    int animals = 0;          ///< animals with at least one of them
    std::optional<double> hPrime;
    std::optional<double> steepness;
    std::optional<double> tTri;
    std::optional<double> conformity;
};

/// The month-by-month series from the record's first to its last encounter.
struct HierarchySeries {
    std::vector<HierarchyMonth> months;
    bool cancelled = false; ///< stopped early: months is incomplete
};

/// h', steepness, t_tri and encounter counts per calendar month over the record
/// (of options.group's encounters; the figures of `metrics --every month`
/// without their randomisation tests), with monthlyConformity's Elo conformity.
/// `cancel`, when set, is checked between months; `progress` gets (done, total).
HierarchySeries computeHierarchySeries(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                       const InheritanceOptions& options, const std::atomic<bool>* cancel = nullptr,
                                       const std::function<void(int, int)>& progress = {});

} // namespace hierloom::core
