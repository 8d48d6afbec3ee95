// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/compact_encounter_loader.h"

#include "core/store/encounter_scope_sql.h"
#include "core/store/encounter_terms.h"
#include "core/store/sqlite_statement.h"

#include <stdexcept>
#include <string>

namespace hierloom::core {

namespace {

using Kind = ColonyFileError::Kind;

// The one query of this loader, on the physical table of schema version 5.
// Its scope clause is that of ColonyStore::loadEncounters(scope)
// (encounterScopeSql); a test (CompactEncounterLoader.*) checks both read the
// same rows.
constexpr const char* kColumns =
    "SELECT seq, day, time, winner, loser, draw, behaviour, grp, observer FROM encounter_row WHERE 1";

/// The code tables' codes of the file's term codes (encounter_term), one
/// code table's worth, looked up once per term.
class TermCodes {
public:
    TermCodes(const EncounterTermTexts& terms, CodeTable& table) : terms_(terms), table_(table), codes_(terms.size(), -1) {}

    std::int32_t operator()(std::int64_t code)
    {
        const std::string& text = terms_[code]; // a code the file lacks: Damaged
        std::int32_t& c = codes_[static_cast<size_t>(code)];
        if (c < 0) c = table_.intern(text);
        return c;
    }

private:
    const EncounterTermTexts& terms_;
    CodeTable& table_;
    std::vector<std::int32_t> codes_;
};

std::int16_t smallCode(std::int32_t code, const char* what, const std::string& path)
{
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
    SqliteStatement q(db, "SELECT e.seq, s.animal, s.side FROM encounter_support s JOIN encounter_row e "
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
    SqliteStatement q(store.handle(), (kColumns + encounterScopeSql(scope) + " ORDER BY seq").c_str());
    bindEncounterScope(q, scope);
    const EncounterTermTexts terms(store.handle(), path);
    TermCodes behaviourOf(terms, out.behaviours), groupOf(terms, out.groups), observerOf(terms, out.observers);
    while (q.step()) {
        CompactEncounter r;
        r.seq = q.integer(0);
        r.date = storedDay(q.integer(1), path);
        r.time = static_cast<std::int16_t>(q.isNull(2) ? -1 : q.integer(2));
        r.winner = out.animals.intern(q.textView(3));
        r.loser = out.animals.intern(q.textView(4));
        r.draw = q.integer(5) == 1;
        r.behaviour = smallCode(behaviourOf(q.integer(6)), "behaviour codes", path);
        r.group = smallCode(groupOf(q.integer(7)), "groups", path);
        r.observer = observerOf(q.integer(8));
        out.records.push_back(r);
    }
    if (out.records.size() > UINT32_MAX)
        throw ColonyFileError(Kind::Damaged, path + ": holds more encounters than this program can analyse");
    loadSupporters(store.handle(), out);
    return out;
}

} // namespace hierloom::core
