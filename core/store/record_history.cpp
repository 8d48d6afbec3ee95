// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/record_history.h"

#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"

namespace hierloom::core {

std::vector<AuditEntry> recordHistory(const ColonyStore& store, const std::string& uid)
{
    SqliteStatement q(store.handle(),
                      "SELECT id, time, user, tbl, uid, action, coalesce(old_values, ''), coalesce(new_values, '') "
                      "FROM audit WHERE uid = ?1 OR (action = 'import' AND tbl = 'encounter' AND "
                      "(SELECT seq FROM encounter_row WHERE uid = ?2) BETWEEN json_extract(new_values, '$.first_seq') "
                      "AND json_extract(new_values, '$.last_seq')) ORDER BY id");
    q.bind(1, uid); // audit rows keep uids as text
    q.bindUid(2, uid);
    std::vector<AuditEntry> out;
    while (q.step())
        out.push_back({q.integer(0), q.text(1), q.text(2), q.text(3), q.text(4), q.text(5), q.text(6), q.text(7)});
    return out;
}

std::optional<std::string> animalUid(const ColonyStore& store, const std::string& animalId)
{
    {
        SqliteStatement q(store.handle(), "SELECT uid FROM animal WHERE id = ?");
        q.bind(1, animalId);
        if (q.step()) return q.uid(0);
    }
    SqliteStatement q(store.handle(),
                      "SELECT uid FROM audit WHERE tbl = 'animal' AND (json_extract(new_values, '$.id') = ?1 OR "
                      "json_extract(old_values, '$.id') = ?1) ORDER BY id DESC LIMIT 1");
    q.bind(1, animalId);
    if (q.step()) return q.text(0);
    return std::nullopt;
}

} // namespace hierloom::core
