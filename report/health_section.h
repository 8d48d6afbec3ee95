// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/research/data_health.h"
#include "report/report_layout.h"

#include <QString>

namespace hierloom::report {

/// The tables of the report's data-health section (docs/methods.md, "Data
/// health"), kept apart from the painting so they can be checked.
struct HealthSection {
    ReportTable animals;   ///< effort per animal; rows with too few encounters tinted
    ReportTable observers; ///< effort per observer
    ReportTable months;    ///< effort per month (the last twelve)
    ReportTable unseen;    ///< residents not seen for more than N days
    ReportTable agreement; ///< observer pairs
};

HealthSection healthSection(const core::DataHealth& health);

/// Paints the data-health section: effort, the animals not seen with the
/// caution to check on them, the too-few-data flags and observer agreement.
void paintHealthSection(ReportLayout& doc, const core::DataHealth& health, const QString& group);

} // namespace hierloom::report
