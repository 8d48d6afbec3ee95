// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/record_binding.h"

#include "core/base/colony_file_error.h"

namespace hierloom::core {

std::optional<std::string> storedDate(const std::optional<Day>& d)
{
    if (!d) return std::nullopt;
    return formatDate(*d);
}

void bindAnimalColumns(SqliteStatement& q, const Animal& a)
{
    q.bindUid(1, a.uid);
    q.bind(2, a.id);
    q.bind(3, a.name);
    q.bind(4, toString(a.sex));
    q.bindOptional(5, storedDate(a.birth));
    q.bindNullableText(6, a.mother);
    q.bindNullableText(7, a.father);
    q.bindOptional(8, storedDate(a.entry));
    q.bindNullableText(9, toString(a.entryType));
    q.bindOptional(10, storedDate(a.exit));
    q.bindNullableText(11, toString(a.exitType));
}

void bindResidenceColumns(SqliteStatement& q, const Residence& r)
{
    q.bindUid(1, r.uid);
    q.bind(2, r.animal);
    q.bind(3, r.group);
    q.bind(4, formatDate(r.from));
    q.bindOptional(5, storedDate(r.to));
}

void bindEncounterColumns(SqliteStatement& q, const Encounter& e, const std::string& dateText)
{
    q.bind(1, e.seq);
    q.bindUid(2, e.uid);
    q.bindStatic(3, dateText);
    if (e.time) q.bind(4, static_cast<std::int64_t>(*e.time));
    else q.bindNull(4);
    q.bindStatic(5, e.winner);
    q.bindStatic(6, e.loser);
    q.bindStatic(7, toString(e.outcome));
    q.bindStatic(8, e.behaviour);
    q.bindStatic(9, e.group);
    q.bindStatic(10, e.observer);
    q.bindStatic(11, e.note);
}

Encounter readEncounterRow(const SqliteStatement& q, const std::string& path)
{
    Encounter e;
    e.seq = q.integer(0);
    e.uid = q.uid(1);
    const std::string date = q.text(2);
    const auto day = parseDate(date);
    if (!day)
        throw ColonyFileError(ColonyFileError::Kind::Damaged, path + ": holds an impossible date '" + date + "'");
    e.date = *day;
    if (!q.isNull(3)) e.time = static_cast<int>(q.integer(3));
    e.winner = q.text(4);
    e.loser = q.text(5);
    e.outcome = q.text(6) == "draw" ? Outcome::Draw : Outcome::Decided;
    e.behaviour = q.text(7);
    e.group = q.text(8);
    e.observer = q.text(9);
    e.note = q.text(10);
    return e;
}

std::int64_t highestEncounterSeq(sqlite3* db)
{
    SqliteStatement q(db, "SELECT coalesce(max(seq), 0) FROM encounter");
    q.step();
    return q.integer(0);
}

} // namespace hierloom::core
