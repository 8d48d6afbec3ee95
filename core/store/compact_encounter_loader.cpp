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

namespace {

/// Reads the rows of `scope` into `out`; `more(q, record)` is called for
/// each row after the record is added (the uid and note of the full loader).
template <class More>
void readCompactRows(const ColonyStore& store, const EncounterScope& scope, const char* columns, CompactEncounters& out,
                     More more)
{
    const std::string& path = store.path();
    // The whole file: room for every row at once (no doubling of millions of records).
    if (scope.everything()) out.records.reserve(static_cast<size_t>(store.encounterCount()));
    SqliteStatement q(store.handle(), (columns + encounterScopeSql(scope) + " ORDER BY seq").c_str());
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
        more(q, r);
    }
    if (out.records.size() > UINT32_MAX)
        throw ColonyFileError(Kind::Damaged, path + ": holds more encounters than this program can analyse");
    loadSupporters(store.handle(), out);
}

} // namespace

CompactEncounters loadCompactEncounters(const ColonyStore& store, const EncounterScope& scope)
{
    CompactEncounters out;
    readCompactRows(store, scope, kColumns, out, [](const SqliteStatement&, const CompactEncounter&) {});
    return out;
}

EncounterRecords loadEncounterRecords(const ColonyStore& store, const EncounterScope& scope)
{
    static const std::string columns = std::string(kColumns).replace(std::string(kColumns).find(" FROM"), 0, ", uid, note");
    CompactEncounters compact;
    std::vector<UidBytes> uids;
    std::unordered_map<std::int64_t, std::string> otherUids;
    std::unordered_map<std::int64_t, std::string> notes;
    readCompactRows(store, scope, columns.c_str(), compact, [&](const SqliteStatement& q, const CompactEncounter& r) {
        if (const auto bytes = q.uidBytes(9)) {
            uids.push_back(*bytes);
        } else {
            uids.push_back({});
            otherUids.emplace(r.seq, q.text(9));
        }
        if (const std::string_view note = q.textView(10); !note.empty()) notes.emplace(r.seq, note);
    });
    return EncounterRecords(std::move(compact), std::move(uids), std::move(otherUids), std::move(notes));
}

} // namespace hierloom::core
