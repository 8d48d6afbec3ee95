// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"

#include <QString>

#include <set>
#include <string>
#include <vector>

class QTableWidget;

namespace hierloom::ui {

/// The columns of the evening entry's table of the day's lines.
void setUpSessionTable(QTableWidget* table);

/// Fills the table with `rows` (the file's lines of one date and group, in
/// entry order): names beside ids, and lines not entered in this session
/// (`ours` holds the uids that were) marked as earlier, with their observer.
void fillSessionTable(QTableWidget* table, const std::vector<core::Encounter>& rows,
                      const std::set<std::string>& ours, const core::Colony& colony);

/// "F1 Ada", or the id alone when the animal has no name or is unknown.
QString idAndName(const std::string& id, const core::Colony& colony);

} // namespace hierloom::ui
