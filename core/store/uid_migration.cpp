// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/uid_migration.h"

#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"

#include <string>

namespace hierloom::core {

void storeUidsCompactly(ColonyStore& store)
{
    static const char* const tables[] = {"animal", "residence", "encounter", "encounter_support"};
    static const char* const actions[] = {"insert", "update", "delete"};
    // The old triggers would put bytes into json_object (an error) and would
    // record every converted row as an edit: off while converting, then
    // recreated in their version-4 form.
    for (const char* t : tables)
        for (const char* a : actions) store.exec(("DROP TRIGGER IF EXISTS audit_" + std::string(t) + "_" + a).c_str());
    registerCompactUidFunction(store.handle());
    store.exec("UPDATE animal SET uid = hierloom_compact_uid(uid) WHERE typeof(uid) = 'text'");
    store.exec("UPDATE residence SET uid = hierloom_compact_uid(uid) WHERE typeof(uid) = 'text'");
    // encounter_support.encounter follows by ON UPDATE CASCADE; the second
    // statement covers rows whose cascade was off (a file written with
    // foreign keys disabled).
    store.exec("UPDATE encounter SET uid = hierloom_compact_uid(uid) WHERE typeof(uid) = 'text'");
    store.exec("UPDATE encounter_support SET encounter = hierloom_compact_uid(encounter) WHERE typeof(encounter) = 'text'");
    for (const char* t : tables)
        for (const char* a : actions) store.exec(auditTriggerSql(t, a, 4).c_str());
}

} // namespace hierloom::core
