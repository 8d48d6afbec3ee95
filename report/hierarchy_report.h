// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/informed_elo.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/planning/stability_watch.h"

#include <QString>
#include <QStringList>

#include <map>
#include <optional>
#include <string>

class QPagedPaintDevice;

namespace hierloom::report {

/// What a hierarchy report covers and how its figures are computed.
struct HierarchyReportOptions {
    std::string group;           ///< required
    std::optional<core::Day> at; ///< default: the group's last encounter
    std::string colonyName;      ///< shown under the title (the file name)
    core::EloSettings elo;
    /// Start rule of the Elo ranks in the observed order and the recent changes (docs/methods.md "Rule-informed Elo").
    core::EloStartRule startRule = core::EloStartRule::None;
    core::SiblingRule rule = core::SiblingRule::Youngest;
    int maturityYears = core::kDefaultMaturityYears;
    int changeDays = 90; ///< recent rank changes: Elo ranks this many days before the date against at it
    core::StabilityThresholds thresholds;
    std::map<std::string, int, std::less<>> severity; ///< behaviour code -> severity
};

/// Paints the hierarchy report of one group at one date on a paged device (a
/// QPdfWriter or a QPrinter) and returns its number of pages. Throws
/// std::invalid_argument for a group without encounters up to the date.
/// `headings`, when given, receives the section headings in order.
int paintHierarchyReport(QPagedPaintDevice& device, const core::Colony& colony, const HierarchyReportOptions& options,
                         QStringList* headings = nullptr);
/// The same from compact records (the desktop's, without expanding them);
/// `pedigree`'s animals and residences are read, not its encounters.
int paintHierarchyReport(QPagedPaintDevice& device, const core::CompactEncounters& encounters,
                         const core::Colony& pedigree, const HierarchyReportOptions& options,
                         QStringList* headings = nullptr);

/// Writes the report as an A4 PDF file; returns the number of pages. Throws
/// std::runtime_error when the file cannot be written.
int writeHierarchyReportPdf(const QString& path, const core::Colony& colony, const HierarchyReportOptions& options);
/// The same from compact records and the pedigree.
int writeHierarchyReportPdf(const QString& path, const core::CompactEncounters& encounters,
                            const core::Colony& pedigree, const HierarchyReportOptions& options);

} // namespace hierloom::report
