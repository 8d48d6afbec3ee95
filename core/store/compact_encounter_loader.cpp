// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/compact_encounter_loader.h"

#include "core/store/sqlite_statement.h"

#include <cstring>
#include <stdexcept>
#include <string>

namespace hierloom::core {

namespace {

using Kind = ColonyFileError::Kind;

// The one query of this loader. Its scope clause is that of
// ColonyStore::loadEncounters(scope) (the index encounter_by_group (grp,
// date): `grp IN (?1, '')` is two ranges, the dates narrow each); a test
// (CompactEncounterLoader.*) checks both read the same rows.
// Parameters: ?1 group, ?2 from, ?3 to.
constexpr const char* kColumns = "SELECT seq, date, time, winner, loser, outcome, behaviour, grp, observer FROM encounter";

std::string scopedQuery(const EncounterScope& scope)
{
    std::string sql = std::string(kColumns) + " WHERE 1";
    if (!scope.group.empty())
        sql += " AND grp IN (?1, '') AND (grp = ?1 OR winner IN (SELECT animal FROM residence WHERE grp = ?1))";
    if (scope.from) sql += " AND date >= ?2";
    if (scope.to) sql += " AND date <= ?3";
    return sql + " ORDER BY seq";
}

/// Dates arrive as 'YYYY-MM-DD', mostly the same as the row before.
class DateReader {
public:
    explicit DateReader(const std::string& path) : path_(path) {}

    Day operator()(std::string_view text)
    {
        if (text.size() == last_.size() && std::memcmp(text.data(), last_.data(), text.size()) == 0) return day_;
        const std::optional<Day> d = parseDate(text);
        if (!d) throw ColonyFileError(Kind::Damaged, path_ + ": holds an impossible date '" + std::string(text) + "'");
        last_.assign(text);
        day_ = *d;
        return day_;
    }

private:
    const std::string& path_;
    std::string last_;
    Day day_ = 0;
};

std::int16_t smallCode(CodeTable& table, std::string_view text, const char* what, const std::string& path)
{
    const std::int32_t code = table.intern(text);
    if (code > CompactEncounters::kMaxCodes)
        throw ColonyFileError(Kind::Damaged, path + ": uses more than " + std::to_string(CompactEncounters::kMaxCodes) +
                                                 " different " + what + "; this program cannot analyse it");
    return static_cast<std::int16_t>(code);
}

/// Supporters of the loaded records (both in seq order), joined on the
/// encounter inside SQLite so no uid is read here.
void loadSupporters(sqlite3* db, CompactEncounters& out)
{
    if (!hasTable(db, "encounter_support")) return; // schema versions 1 and 2
    SqliteStatement q(db, "SELECT e.seq, s.animal, s.side FROM encounter_support s JOIN encounter e "
                          "ON e.uid = s.encounter ORDER BY e.seq, s.rowid");
    size_t at = 0;
    while (q.step()) {
        const std::int64_t seq = q.integer(0);
        while (at < out.records.size() && out.records[at].seq < seq) ++at;
        if (at == out.records.size()) break;
        if (out.records[at].seq != seq) continue;
        const SupportSide side = q.textView(2) == "loser" ? SupportSide::Loser : SupportSide::Winner;
        out.supporters.push_back({static_cast<std::uint32_t>(at), out.animals.intern(q.textView(1)), side});
    }
}

} // namespace

CompactEncounters loadCompactEncounters(const ColonyStore& store, const EncounterScope& scope)
{
    CompactEncounters out;
    const std::string& path = store.path();
    // The whole file: room for every row at once (no doubling of millions of records).
    if (scope.everything()) out.records.reserve(static_cast<size_t>(store.encounterCount()));
    SqliteStatement q(store.handle(), scopedQuery(scope).c_str());
    if (!scope.group.empty()) q.bind(1, scope.group);
    if (scope.from) q.bind(2, formatDate(*scope.from));
    if (scope.to) q.bind(3, formatDate(*scope.to));
    DateReader dateOf(path);
    while (q.step()) {
        CompactEncounter r;
        r.seq = q.integer(0);
        r.date = dateOf(q.textView(1));
        r.time = static_cast<std::int16_t>(q.isNull(2) ? -1 : q.integer(2));
        r.winner = out.animals.intern(q.textView(3));
        r.loser = out.animals.intern(q.textView(4));
        r.draw = q.textView(5) == "draw";
        r.behaviour = smallCode(out.behaviours, q.textView(6), "behaviour codes", path);
        r.group = smallCode(out.groups, q.textView(7), "groups", path);
        r.observer = out.observers.intern(q.textView(8));
        out.records.push_back(r);
    }
    if (out.records.size() > UINT32_MAX)
        throw ColonyFileError(Kind::Damaged, path + ": holds more encounters than this program can analyse");
    loadSupporters(store.handle(), out);
    return out;
}

} // namespace hierloom::core
