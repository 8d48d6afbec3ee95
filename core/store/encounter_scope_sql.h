// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_store.h"

#include <string>

namespace hierloom::core {

class SqliteStatement;

/// The conditions choosing a scope's rows of `encounter_row` (" AND ..." to
/// follow "WHERE 1"; parameters ?1 group, ?2 first day, ?3 last day, bound by
/// bindEncounterScope). `grp IN (0, code)` is two ranges of encounter_by_group
/// (code 0 is the empty group); the days narrow each. Every scoped reader
/// uses it, so they read the same rows.
std::string encounterScopeSql(const EncounterScope& scope);
void bindEncounterScope(SqliteStatement& q, const EncounterScope& scope);

} // namespace hierloom::core
