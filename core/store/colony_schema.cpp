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

/// Whether the audited table is the encounter table of version 5, whose
/// trigger sits on `encounter_row` and turns its numbers back into the texts
/// the audit rows have always held.
bool onEncounterRows(const AuditedTable& t, int schemaVersion)
{
    return schemaVersion >= 5 && std::string(t.name) == "encounter";
}

/// ROW.col, or its uid text for a column holding a uid (stored as 16 bytes
/// from version 4; JSON cannot hold bytes and audit rows keep text uids);
/// from version 5 an encounter's value as its view `encounter` shows it.
std::string valueOf(const AuditedTable& t, const char* row, const std::string& column, int schemaVersion)
{
    const std::string value = std::string(row) + "." + column;
    if (column == "uid" || column == t.uidColumn) return uidTextSql(value);
    if (!onEncounterRows(t, schemaVersion)) return value;
    if (column == "date") return dateOfDaySql(std::string(row) + ".day");
    if (column == "outcome") return outcomeOfDrawSql(std::string(row) + ".draw");
    if (column == "behaviour" || column == "grp" || column == "observer")
        return "(SELECT text FROM encounter_term WHERE code = " + value + ")";
    return value;
}

/// json_object('col', ROW.col, ...) for the columns of one table.
std::string jsonOf(const AuditedTable& t, const char* row, int schemaVersion)
{
    std::string out = "json_object(";
    for (size_t i = 0; i < t.columns.size(); ++i) {
        if (i) out += ", ";
        out += std::string("'") + t.columns[i] + "', " + valueOf(t, row, t.columns[i], schemaVersion);
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
        for (const char* action : {"insert", "update", "delete"}) sql += auditTriggerSql(t.name, action, 4);
    return sql;
}

} // namespace

std::string auditTriggerSql(const std::string& table, const std::string& action, int schemaVersion)
{
    const AuditedTable& t = auditedTable(table);
    const std::string on = onEncounterRows(t, schemaVersion) ? "encounter_row" : table;
    const std::string head = "CREATE TRIGGER audit_" + table + "_" + action + " AFTER " +
                             (action == "insert" ? "INSERT" : action == "update" ? "UPDATE" : "DELETE") + " ON " +
                             on + " WHEN NOT EXISTS (SELECT 1 FROM audit_pause) BEGIN\n";
    const auto uidOf = [&](const char* row) { return valueOf(t, row, t.uidColumn, schemaVersion); };
    const auto json = [&](const char* row) { return jsonOf(t, row, schemaVersion); };
    if (action == "insert")
        return head + "  INSERT INTO audit(tbl, uid, action, new_values) VALUES ('" + table + "', " + uidOf("new") +
               ", 'insert', " + json("new") + ");\nEND;\n";
    if (action == "update")
        return head + "  INSERT INTO audit(tbl, uid, action, old_values, new_values) VALUES ('" + table + "', " +
               uidOf("new") + ", 'update', " + json("old") + ", " + json("new") + ");\nEND;\n";
    if (action == "delete")
        return head + "  INSERT INTO audit(tbl, uid, action, old_values) VALUES ('" + table + "', " + uidOf("old") +
               ", 'delete', " + json("old") + ");\nEND;\n";
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
    // each; day second: a window within the group narrows that range.
    return "CREATE INDEX IF NOT EXISTS encounter_by_group ON encounter_row(grp, day);";
}

const char* encounterIndexSqlBeforeVersion5()
{
    return "CREATE INDEX IF NOT EXISTS encounter_by_group ON encounter(grp, date);";
}

std::string dateOfDaySql(const std::string& day)
{
    // 2440587.5 is the Julian day of 1970-01-01 at midnight.
    return "date(" + day + " + 2440587.5)";
}

std::string dayOfDateSql(const std::string& date)
{
    // NULL (refused by NOT NULL) for anything but a real date in ISO form:
    // with a modifier date() turns '2025-02-30' into '2025-03-02' (without
    // one it gives the text back), which then differs.
    return "CASE WHEN date(" + date + ", '+0 days') IS " + date + " THEN CAST(julianday(" + date +
           ") - 2440587.5 AS INTEGER) END";
}

std::string outcomeOfDrawSql(const std::string& draw)
{
    return "CASE " + draw + " WHEN 1 THEN 'draw' ELSE 'decided' END";
}

const char* encounterRowTablesSql()
{
    return R"SQL(
CREATE TABLE encounter_term (
  code  INTEGER PRIMARY KEY,
  text  TEXT NOT NULL UNIQUE
);
INSERT INTO encounter_term(code, text) VALUES (0, '');
CREATE TABLE encounter_row (
  seq        INTEGER PRIMARY KEY,
  uid        TEXT NOT NULL UNIQUE,
  day        INTEGER NOT NULL CHECK (day BETWEEN -719528 AND 2932896),
  time       INTEGER CHECK (time IS NULL OR time BETWEEN 0 AND 1439),
  winner     TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE,
  loser      TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE,
  draw       INTEGER NOT NULL DEFAULT 0 CHECK (draw IN (0, 1)),
  behaviour  INTEGER NOT NULL DEFAULT 0 REFERENCES encounter_term(code),
  grp        INTEGER NOT NULL DEFAULT 0 REFERENCES encounter_term(code),
  observer   INTEGER NOT NULL DEFAULT 0 REFERENCES encounter_term(code),
  note       TEXT NOT NULL DEFAULT '',
  CHECK (winner <> loser)
);
CREATE TABLE encounter_support_v5 (
  encounter  TEXT NOT NULL REFERENCES encounter_row(uid) ON UPDATE CASCADE ON DELETE CASCADE,
  animal     TEXT NOT NULL REFERENCES animal(id) ON UPDATE CASCADE,
  side       TEXT NOT NULL CHECK (side IN ('winner', 'loser')),
  PRIMARY KEY (encounter, animal)
);
)SQL";
}

const char* encounterViewSql()
{
    static const std::string sql = [] {
        // A column left out of an INSERT is NULL in a view: the old table's defaults apply.
        const auto term = [](const char* column) {
            return std::string("(SELECT code FROM encounter_term WHERE text = coalesce(new.") + column + ", ''))";
        };
        const std::string addTerms =
            "  INSERT INTO encounter_term(text) SELECT t FROM (SELECT coalesce(new.behaviour, '') AS t UNION SELECT "
            "coalesce(new.grp, '') UNION SELECT coalesce(new.observer, '')) WHERE t NOT IN (SELECT text FROM "
            "encounter_term);\n";
        std::string out =
            "CREATE VIEW encounter AS SELECT e.seq AS seq, e.uid AS uid, " + dateOfDaySql("e.day") +
            " AS date, e.time AS time, e.winner AS winner, e.loser AS loser, " + outcomeOfDrawSql("e.draw") +
            " AS outcome, b.text AS behaviour, g.text AS grp, o.text AS observer, e.note AS note "
            "FROM encounter_row e JOIN encounter_term b ON b.code = e.behaviour "
            "JOIN encounter_term g ON g.code = e.grp JOIN encounter_term o ON o.code = e.observer;\n";
        const std::string values = dayOfDateSql("new.date") + ", new.time, new.winner, new.loser, "
                                   "CASE coalesce(new.outcome, 'decided') WHEN 'decided' THEN 0 WHEN 'draw' THEN 1 END, " +
                                   term("behaviour") + ", " + term("grp") + ", " + term("observer") +
                                   ", coalesce(new.note, '')";
        out += "CREATE TRIGGER encounter_insert INSTEAD OF INSERT ON encounter BEGIN\n" + addTerms +
               "  INSERT INTO encounter_row(seq, uid, day, time, winner, loser, draw, behaviour, grp, observer, note) "
               "VALUES (new.seq, new.uid, " + values + ");\nEND;\n";
        out += "CREATE TRIGGER encounter_update INSTEAD OF UPDATE ON encounter BEGIN\n" + addTerms +
               "  UPDATE encounter_row SET (seq, uid, day, time, winner, loser, draw, behaviour, grp, observer, note) = "
               "(new.seq, new.uid, " + values + ") WHERE seq = old.seq;\nEND;\n";
        out += "CREATE TRIGGER encounter_delete INSTEAD OF DELETE ON encounter BEGIN\n"
               "  DELETE FROM encounter_row WHERE seq = old.seq;\nEND;\n";
        return out;
    }();
    return sql.c_str();
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
        for (const char* action : {"insert", "update", "delete"}) out += auditTriggerSql(supportTable().name, action, 4);
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
