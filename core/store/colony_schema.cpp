// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_schema.h"

#include "core/store/uid_storage.h"

#include <stdexcept>
#include <string>
#include <vector>

namespace hierloom::core {

// Dates are stored as ISO text so that anyone opening the file with the
// sqlite3 shell reads them directly; the CHECKs keep them in that shape.
const char* schemaVersion1Sql()
{
    return R"SQL(
CREATE TABLE animal (
  uid         TEXT NOT NULL UNIQUE,
  id          TEXT PRIMARY KEY NOT NULL CHECK (length(id) BETWEEN 1 AND 32 AND id NOT GLOB '*[^A-Za-z0-9_.-]*'),
  name        TEXT NOT NULL DEFAULT '',
  sex         TEXT NOT NULL CHECK (sex IN ('F', 'M', 'U')),
  birth_date  TEXT CHECK (birth_date IS NULL OR birth_date GLOB '[0-9][0-9][0-9][0-9]-[0-1][0-9]-[0-3][0-9]'),
  mother      TEXT REFERENCES animal(id) ON UPDATE CASCADE DEFERRABLE INITIALLY DEFERRED,
  father      TEXT REFERENCES animal(id) ON UPDATE CASCADE DEFERRABLE INITIALLY DEFERRED,
  entry_date  TEXT CHECK (entry_date IS NULL OR entry_date GLOB '[0-9][0-9][0-9][0-9]-[0-1][0-9]-[0-3][0-9]'),
  entry_type  TEXT CHECK (entry_type IS NULL OR entry_type IN ('born', 'introduced', 'founder')),
  exit_date   TEXT CHECK (exit_date IS NULL OR exit_date GLOB '[0-9][0-9][0-9][0-9]-[0-1][0-9]-[0-3][0-9]'),
  exit_type   TEXT CHECK (exit_type IS NULL OR exit_type IN ('died', 'removed')),
  CHECK (mother IS NULL OR mother <> id),
  CHECK (father IS NULL OR father <> id),
  CHECK ((exit_date IS NULL) = (exit_type IS NULL)),
  CHECK (exit_date IS NULL OR entry_date IS NULL OR exit_date >= entry_date)
);
CREATE TABLE residence (
  uid        TEXT NOT NULL UNIQUE,
  animal     TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE ON DELETE CASCADE,
  grp        TEXT NOT NULL CHECK (length(grp) > 0),
  from_date  TEXT NOT NULL CHECK (from_date GLOB '[0-9][0-9][0-9][0-9]-[0-1][0-9]-[0-3][0-9]'),
  to_date    TEXT CHECK (to_date IS NULL OR to_date >= from_date)
);
CREATE INDEX residence_by_animal ON residence(animal, from_date);
CREATE TABLE encounter (
  seq        INTEGER PRIMARY KEY,
  uid        TEXT NOT NULL UNIQUE,
  date       TEXT NOT NULL CHECK (date GLOB '[0-9][0-9][0-9][0-9]-[0-1][0-9]-[0-3][0-9]'),
  time       INTEGER CHECK (time IS NULL OR time BETWEEN 0 AND 1439),
  winner     TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE,
  loser      TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE,
  outcome    TEXT NOT NULL DEFAULT 'decided' CHECK (outcome IN ('decided', 'draw')),
  behaviour  TEXT NOT NULL DEFAULT '',
  grp        TEXT NOT NULL DEFAULT '',
  observer   TEXT NOT NULL DEFAULT '',
  note       TEXT NOT NULL DEFAULT '',
  CHECK (winner <> loser)
);
CREATE TABLE observer (
  name       TEXT PRIMARY KEY NOT NULL CHECK (length(name) > 0),
  full_name  TEXT NOT NULL DEFAULT ''
);
CREATE TABLE behaviour_code (
  code         TEXT PRIMARY KEY NOT NULL CHECK (length(code) > 0),
  severity     INTEGER NOT NULL DEFAULT 1 CHECK (severity BETWEEN 0 AND 5),
  description  TEXT NOT NULL DEFAULT ''
);
CREATE TABLE setting (
  key    TEXT PRIMARY KEY NOT NULL,
  value  TEXT NOT NULL
);
INSERT INTO behaviour_code(code, severity, description) VALUES
  ('displace', 1, 'takes the place of the other, who moves away'),
  ('avoid', 1, 'the other moves away at its approach'),
  ('threat', 2, 'open-mouth stare, head bob or lunge without contact'),
  ('grab', 3, 'grabs, slaps or pushes'),
  ('chase', 3, 'chases the other'),
  ('bite', 5, 'bites; note wounds in the note column');
)SQL";
}

namespace {

struct AuditedTable {
    const char* name;
    std::vector<const char*> columns;
    const char* uidColumn = "uid"; // the audit row's uid: the record's own, or its encounter's
};

/// ROW.col, or its uid text for a column holding a uid (stored as 16 bytes
/// from version 4; JSON cannot hold bytes and audit rows keep text uids).
std::string valueOf(const AuditedTable& t, const char* row, const std::string& column)
{
    const std::string value = std::string(row) + "." + column;
    return column == "uid" || column == t.uidColumn ? uidTextSql(value) : value;
}

/// json_object('col', ROW.col, ...) for the columns of one table.
std::string jsonOf(const AuditedTable& t, const char* row)
{
    std::string out = "json_object(";
    for (size_t i = 0; i < t.columns.size(); ++i) {
        if (i) out += ", ";
        out += std::string("'") + t.columns[i] + "', " + valueOf(t, row, t.columns[i]);
    }
    return out + ")";
}

const std::vector<AuditedTable>& auditedTables()
{
    static const std::vector<AuditedTable> tables = {
        {"animal",
         {"uid", "id", "name", "sex", "birth_date", "mother", "father", "entry_date", "entry_type", "exit_date",
          "exit_type"}},
        {"residence", {"uid", "animal", "grp", "from_date", "to_date"}},
        {"encounter",
         {"seq", "uid", "date", "time", "winner", "loser", "outcome", "behaviour", "grp", "observer", "note"}},
    };
    return tables;
}

/// The table added by version 3; its rows are filed under their encounter's uid.
const AuditedTable& supportTable()
{
    static const AuditedTable table{"encounter_support", {"encounter", "animal", "side"}, "encounter"};
    return table;
}

const AuditedTable& auditedTable(const std::string& name)
{
    for (const AuditedTable& t : auditedTables())
        if (name == t.name) return t;
    if (name == supportTable().name) return supportTable();
    throw std::invalid_argument("no audited table " + name);
}

std::string buildVersion2Sql()
{
    // `user` is left empty here and stamped by the connection's TEMP trigger
    // (sessionSql); a change made with another tool keeps an empty user but is
    // still recorded. Rows in audit_pause switch the per-row triggers off;
    // version-2 files may hold the table, this program no longer uses it
    // (bulk loads drop the encounter insert trigger inside their transaction).
    std::string sql = R"SQL(
CREATE TABLE audit (
  id          INTEGER PRIMARY KEY,
  time        TEXT NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%SZ', 'now')),
  user        TEXT NOT NULL DEFAULT '',
  tbl         TEXT NOT NULL,
  uid         TEXT NOT NULL DEFAULT '',
  action      TEXT NOT NULL CHECK (action IN ('insert', 'update', 'delete', 'import', 'merge', 'restore')),
  old_values  TEXT,
  new_values  TEXT
);
CREATE INDEX audit_by_uid ON audit(uid);
CREATE TABLE audit_pause (reason TEXT NOT NULL);
)SQL";
    for (const AuditedTable& t : auditedTables())
        for (const char* action : {"insert", "update", "delete"}) sql += auditTriggerSql(t.name, action);
    return sql;
}

} // namespace

std::string auditTriggerSql(const std::string& table, const std::string& action)
{
    const AuditedTable& t = auditedTable(table);
    const std::string head = "CREATE TRIGGER audit_" + table + "_" + action + " AFTER " +
                             (action == "insert" ? "INSERT" : action == "update" ? "UPDATE" : "DELETE") + " ON " +
                             table + " WHEN NOT EXISTS (SELECT 1 FROM audit_pause) BEGIN\n";
    if (action == "insert")
        return head + "  INSERT INTO audit(tbl, uid, action, new_values) VALUES ('" + table + "', " + valueOf(t, "new", t.uidColumn) + ", 'insert', " +
               jsonOf(t, "new") + ");\nEND;\n";
    if (action == "update")
        return head + "  INSERT INTO audit(tbl, uid, action, old_values, new_values) VALUES ('" + table +
               "', " + valueOf(t, "new", t.uidColumn) + ", 'update', " + jsonOf(t, "old") + ", " + jsonOf(t, "new") + ");\nEND;\n";
    if (action == "delete")
        return head + "  INSERT INTO audit(tbl, uid, action, old_values) VALUES ('" + table + "', " + valueOf(t, "old", t.uidColumn) + ", 'delete', " +
               jsonOf(t, "old") + ");\nEND;\n";
    throw std::invalid_argument("no audit trigger for " + action);
}

std::string auditTriggerDropSql(const std::string& table, const std::string& action)
{
    auditedTable(table);
    return "DROP TRIGGER audit_" + table + "_" + action;
}

const char* schemaVersion2Sql()
{
    static const std::string sql = buildVersion2Sql();
    return sql.c_str();
}

const char* encounterIndexSql()
{
    // grp first: a group's rows (and the rows without a group) are one range
    // each; date second: a window within the group narrows that range.
    return "CREATE INDEX IF NOT EXISTS encounter_by_group ON encounter(grp, date);";
}

const char* schemaVersion3Sql()
{
    // One row per supporter. Keyed by the encounter's uid (never changed by an
    // edit) so that the audit rows sit in the encounter's own history; the
    // rowid keeps the order in which the supporters were recorded.
    static const std::string sql = [] {
        std::string out = R"SQL(
CREATE TABLE encounter_support (
  encounter  TEXT NOT NULL REFERENCES encounter(uid) ON UPDATE CASCADE ON DELETE CASCADE,
  animal     TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE,
  side       TEXT NOT NULL CHECK (side IN ('winner', 'loser')),
  PRIMARY KEY (encounter, animal)
);
CREATE INDEX encounter_support_by_animal ON encounter_support(animal);
)SQL";
        for (const char* action : {"insert", "update", "delete"}) out += auditTriggerSql(supportTable().name, action);
        return out;
    }();
    return sql.c_str();
}

const char* sessionSql()
{
    return R"SQL(
CREATE TEMP TABLE IF NOT EXISTS session_user (name TEXT NOT NULL);
CREATE TEMP TRIGGER IF NOT EXISTS stamp_audit_user AFTER INSERT ON main.audit WHEN new.user = '' BEGIN
  UPDATE audit SET user = (SELECT name FROM temp.session_user LIMIT 1) WHERE id = new.id;
END;
)SQL";
}

} // namespace hierloom::core
