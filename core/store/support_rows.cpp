// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/support_rows.h"

#include <algorithm>

namespace hierloom::core {

namespace {

constexpr const char* kInsertSupportSql = "INSERT INTO encounter_support(encounter, animal, side) VALUES (?,?,?)";

void addRow(Encounter& e, const std::string& animal, const std::string& side)
{
    (side == "winner" ? e.winnerSupport : e.loserSupport).push_back(animal);
}

} // namespace

SupportWriter::SupportWriter(sqlite3* db) : insert_(db, kInsertSupportSql) {}

void SupportWriter::add(const Encounter& e)
{
    addSide(e, nullptr, e.winnerSupport, "winner");
    addSide(e, nullptr, e.loserSupport, "loser");
}

void SupportWriter::add(const Encounter& e, const UidBytes& uid)
{
    addSide(e, &uid, e.winnerSupport, "winner");
    addSide(e, &uid, e.loserSupport, "loser");
}

void SupportWriter::addSide(const Encounter& e, const UidBytes* uid, const std::vector<std::string>& ids,
                            const char* side)
{
    for (const std::string& id : ids) {
        if (uid) insert_.bindStaticUid(1, *uid);
        else insert_.bindUid(1, e.uid);
        insert_.bind(2, id);
        insert_.bind(3, side);
        insert_.run();
    }
}

void deleteSupportRows(sqlite3* db, const std::string& encounterUid)
{
    SqliteStatement del(db, "DELETE FROM encounter_support WHERE encounter = ?");
    del.bindUid(1, encounterUid);
    del.run();
}

void replaceSupportRows(sqlite3* db, const Encounter& e)
{
    deleteSupportRows(db, e.uid);
    SupportWriter(db).add(e);
}

namespace {

/// Every supporter row joined on its encounter, in seq order and within an
/// encounter in the order written: visit(seq, animal, side).
template <class Visit> void forEachSupportRow(sqlite3* db, Visit visit)
{
    SqliteStatement q(db, "SELECT e.seq, s.animal, s.side FROM encounter_support s JOIN encounter_row e "
                          "ON e.uid = s.encounter ORDER BY e.seq, s.rowid");
    while (q.step())
        if (!visit(q.integer(0), q.text(1), q.text(2))) return;
}

} // namespace

void loadSupportRows(sqlite3* db, std::vector<Encounter>& encounters)
{
    // The rows arrive in seq order; a walk along the loaded encounters (also
    // in seq order) then places them without a map.
    size_t at = 0;
    forEachSupportRow(db, [&](std::int64_t seq, const std::string& animal, const std::string& side) {
        while (at < encounters.size() && encounters[at].seq < seq) ++at;
        if (at == encounters.size()) return false;
        if (encounters[at].seq == seq) addRow(encounters[at], animal, side);
        return true;
    });
}

void loadSupportRows(sqlite3* db, EncounterRecords& records)
{
    size_t at = 0;
    forEachSupportRow(db, [&](std::int64_t seq, const std::string& animal, const std::string& side) {
        while (at < records.size() && records.seq(at) < seq) ++at;
        if (at == records.size()) return false;
        if (records.seq(at) == seq)
            records.appendSupporter(at, animal, side == "winner" ? SupportSide::Winner : SupportSide::Loser);
        return true;
    });
}

void loadSupportRowsOf(sqlite3* db, Encounter& e)
{
    e.winnerSupport.clear();
    e.loserSupport.clear();
    SqliteStatement q(db, "SELECT animal, side FROM encounter_support WHERE encounter = ? ORDER BY rowid");
    q.bindUid(1, e.uid);
    while (q.step()) addRow(e, q.text(0), q.text(1));
}

} // namespace hierloom::core
