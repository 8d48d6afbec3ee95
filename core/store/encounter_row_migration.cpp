// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/encounter_row_migration.h"

#include "core/base/colony_file_error.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"

#include <string>

namespace hierloom::core {

void storeEncounterRows(ColonyStore& store)
{
    {
        SqliteStatement bad(store.handle(), ("SELECT date FROM encounter WHERE " + dayOfDateSql("date") +
                                             " IS NULL LIMIT 1").c_str());
        if (bad.step())
            throw ColonyFileError(ColonyFileError::Kind::Damaged,
                                  store.path() + ": holds an impossible date '" + bad.text(0) + "'");
    }
    for (const char* t : {"encounter", "encounter_support"})
        for (const char* a : {"insert", "update", "delete"})
            store.exec(("DROP TRIGGER IF EXISTS audit_" + std::string(t) + "_" + a).c_str());
    store.exec("DROP INDEX IF EXISTS encounter_by_group");
    store.exec(encounterRowTablesSql());
    // Codes in order of first use, so a file's usual texts get one-byte codes.
    store.exec("INSERT INTO encounter_term(text) SELECT t FROM (SELECT behaviour AS t, seq FROM encounter "
               "UNION ALL SELECT grp, seq FROM encounter UNION ALL SELECT observer, seq FROM encounter) "
               "WHERE t <> '' GROUP BY t ORDER BY min(seq), t");
    const std::string code = "(SELECT code FROM encounter_term WHERE text = e.";
    store.exec(("INSERT INTO encounter_row(seq, uid, day, time, winner, loser, draw, behaviour, grp, observer, note) "
                "SELECT e.seq, e.uid, " + dayOfDateSql("e.date") + ", e.time, e.winner, e.loser, e.outcome = 'draw', " +
                code + "behaviour), " + code + "grp), " + code + "observer), e.note FROM encounter e ORDER BY e.seq")
                   .c_str());
    // The old supporters' table points at the old encounter table: copied
    // (same rowids, so the recorded order stays) and dropped first, so that
    // dropping the encounter table cascades to nothing.
    store.exec("INSERT INTO encounter_support_v5(rowid, encounter, animal, side) "
               "SELECT rowid, encounter, animal, side FROM encounter_support ORDER BY rowid");
    store.exec("DROP TABLE encounter_support");
    store.exec("DROP TABLE encounter");
    store.exec("ALTER TABLE encounter_support_v5 RENAME TO encounter_support");
    store.exec("CREATE INDEX encounter_support_by_animal ON encounter_support(animal)");
    store.exec(encounterViewSql());
    for (const char* t : {"encounter", "encounter_support"})
        for (const char* a : {"insert", "update", "delete"}) store.exec(auditTriggerSql(t, a, 5).c_str());
    store.exec(encounterIndexSql());
}

} // namespace hierloom::core
