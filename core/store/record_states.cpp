// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/record_states.h"

#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"

#include <algorithm>

namespace hierloom::core {

const std::vector<RecordTable>& recordTables()
{
    static const std::vector<RecordTable> tables = {
        {"animal",
         {"id", "name", "sex", "birth_date", "mother", "father", "entry_date", "entry_type", "exit_date", "exit_type"}},
        {"residence", {"animal", "grp", "from_date", "to_date"}},
        {"encounter", {"date", "time", "winner", "loser", "outcome", "behaviour", "grp", "observer", "note"}},
    };
    return tables;
}

bool RecordStates::knew(const std::string& uid, const RecordValues& values) const
{
    if (auto it = current.find(uid); it != current.end() && it->second == values) return true;
    if (auto it = deleted.find(uid); it != deleted.end() && it->second == values) return true;
    auto it = history.find(uid);
    return it != history.end() && std::find(it->second.begin(), it->second.end(), values) != it->second.end();
}

namespace {

RecordValues valuesAt(const SqliteStatement& q, size_t first, size_t count)
{
    RecordValues v;
    v.reserve(count);
    for (size_t i = 0; i < count; ++i) v.push_back(q.optionalText(static_cast<int>(first + i)));
    return v;
}

} // namespace

RecordStates readRecordStates(const ColonyStore& store, const RecordTable& table)
{
    RecordStates out;
    const size_t n = table.columns.size();
    {
        std::string sql = "SELECT uid";
        for (const char* c : table.columns) sql += std::string(", ") + c;
        sql += std::string(" FROM ") + table.name;
        SqliteStatement q(store.handle(), sql.c_str());
        while (q.step()) out.current.emplace(q.uid(0), valuesAt(q, 1, n));
    }
    if (!hasTable(store.handle(), "audit")) return out; // a version-1 file keeps no history
    // json_extract gives a column's value with its SQL type, so a state read
    // here compares equal to the same state read from the table above.
    std::string sql = "SELECT uid, action, old_values IS NOT NULL, new_values IS NOT NULL";
    for (const char* which : {"old_values", "new_values"})
        for (const char* c : table.columns) sql += std::string(", json_extract(") + which + ", '$." + c + "')";
    sql += " FROM audit WHERE tbl = ? AND uid <> '' ORDER BY id";
    SqliteStatement q(store.handle(), sql.c_str());
    q.bind(1, std::string(table.name));
    while (q.step()) {
        const std::string uid = q.text(0);
        const std::string action = q.text(1);
        std::vector<RecordValues>& states = out.history[uid];
        if (q.integer(2) != 0) {
            RecordValues before = valuesAt(q, 4, n);
            if (states.empty() || states.back() != before) states.push_back(before);
            if (action == "delete" && !out.current.count(uid)) out.deleted[uid] = std::move(before);
        }
        if (q.integer(3) != 0) {
            RecordValues after = valuesAt(q, 4 + n, n);
            if (states.empty() || states.back() != after) states.push_back(std::move(after));
            out.deleted.erase(uid); // inserted again after a delete
        }
    }
    return out;
}

} // namespace hierloom::core
