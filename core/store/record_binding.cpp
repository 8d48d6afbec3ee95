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
    q.bind(1, a.uid);
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
    q.bind(1, r.uid);
    q.bind(2, r.animal);
    q.bind(3, r.group);
    q.bind(4, formatDate(r.from));
    q.bindOptional(5, storedDate(r.to));
}

void bindEncounterColumns(SqliteStatement& q, const Encounter& e, const std::string& dateText)
{
    q.bind(1, e.seq);
    q.bindStatic(2, e.uid);
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

} // namespace hierloom::core
