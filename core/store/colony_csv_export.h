// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"

#include <ostream>

namespace hierloom::core {

/// Writes animals.csv of docs/file-formats.md ("Import files"): id,name,sex,birth_date,
/// mother,father,entry_date,entry_type,exit_date,exit_type, one row per animal in colony order.
void writeAnimalsCsv(std::ostream& out, const Colony& colony);

/// Writes residences.csv of docs/file-formats.md: animal,group,from,to, in colony order.
void writeResidencesCsv(std::ostream& out, const Colony& colony);

/// Writes encounters.csv of docs/file-formats.md: date,time,winner,loser,outcome,
/// behaviour,group,observer,note, in entry order (seq ascending).
void writeEncountersCsv(std::ostream& out, const Colony& colony);

} // namespace hierloom::core
