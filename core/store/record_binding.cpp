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

namespace {

/// Every column but the uid, from parameter `at` + 1 on.
void bindEncounterFields(SqliteStatement& q, const Encounter& e, EncounterTermCodes& terms, int at)
{
    q.bind(at + 1, e.seq);
    q.bind(at + 3, static_cast<std::int64_t>(e.date));
    if (e.time) q.bind(at + 4, static_cast<std::int64_t>(*e.time));
    else q.bindNull(at + 4);
    q.bindStatic(at + 5, e.winner);
    q.bindStatic(at + 6, e.loser);
    q.bind(at + 7, static_cast<std::int64_t>(e.outcome == Outcome::Draw ? 1 : 0));
    q.bind(at + 8, terms(e.behaviour));
    q.bind(at + 9, terms(e.group));
    q.bind(at + 10, terms(e.observer));
    q.bindStatic(at + 11, e.note);
}

} // namespace

void bindEncounterColumns(SqliteStatement& q, const Encounter& e, EncounterTermCodes& terms)
{
    bindEncounterFields(q, e, terms, 0);
    q.bindUid(2, e.uid);
}

void bindEncounterColumns(SqliteStatement& q, const Encounter& e, const UidBytes& derivedUid,
                          EncounterTermCodes& terms, int row)
{
    const int at = row * kEncounterColumnCount;
    bindEncounterFields(q, e, terms, at);
    if (e.uid.empty()) q.bindStaticUid(at + 2, derivedUid);
    else q.bindUid(at + 2, e.uid);
}

std::string insertEncountersSql(int rows)
{
    std::string sql = kInsertEncounterSql;
    for (int i = 1; i < rows; ++i) sql += ",(?,?,?,?,?,?,?,?,?,?,?)";
    return sql;
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
