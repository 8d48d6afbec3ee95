// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/record_binding.h"


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

void bindEncounterColumns(SqliteStatement& q, const Encounter& e, EncounterTermCodes& terms)
{
    q.bind(1, e.seq);
    q.bindUid(2, e.uid);
    q.bind(3, static_cast<std::int64_t>(e.date));
    if (e.time) q.bind(4, static_cast<std::int64_t>(*e.time));
    else q.bindNull(4);
    q.bindStatic(5, e.winner);
    q.bindStatic(6, e.loser);
    q.bind(7, static_cast<std::int64_t>(e.outcome == Outcome::Draw ? 1 : 0));
    q.bind(8, terms(e.behaviour));
    q.bind(9, terms(e.group));
    q.bind(10, terms(e.observer));
    q.bindStatic(11, e.note);
}

Encounter readEncounterRow(const SqliteStatement& q, const EncounterTermTexts& terms, const std::string& path)
{
    Encounter e;
    e.seq = q.integer(0);
    e.uid = q.uid(1);
    e.date = storedDay(q.integer(2), path);
    if (!q.isNull(3)) e.time = static_cast<int>(q.integer(3));
    e.winner = q.text(4);
    e.loser = q.text(5);
    e.outcome = q.integer(6) == 1 ? Outcome::Draw : Outcome::Decided;
    e.behaviour = terms[q.integer(7)];
    e.group = terms[q.integer(8)];
    e.observer = terms[q.integer(9)];
    e.note = q.text(10);
    return e;
}

std::int64_t highestEncounterSeq(sqlite3* db)
{
    SqliteStatement q(db, "SELECT coalesce(max(seq), 0) FROM encounter_row");
    q.step();
    return q.integer(0);
}

} // namespace hierloom::core
