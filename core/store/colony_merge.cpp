// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_merge.h"

#include "core/store/colony_backup.h"
#include "core/store/colony_csv_export.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/store/record_states.h"
#include "core/store/sqlite_statement.h"
#include "core/store/support_rows.h"
#include "core/store/write_transaction.h"

#include <sqlite3.h>

#include <algorithm>
#include <array>
#include <map>
#include <optional>
#include <set>
#include <sstream>
#include <unordered_map>
#include <unordered_set>

namespace hierloom::core {

bool MergeReport::changes() const
{
    return !addedAnimals.empty() || !addedResidences.empty() || !addedEncounters.empty() || !updated.empty() ||
           !deleted.empty() || !takenFromOther.empty();
}

namespace {

const char* const deletedMark = "(deleted)";

bool isTable(const RecordTable& t, const char* name) { return std::string(t.name) == name; }

size_t columnIndex(const RecordTable& t, const char* column)
{
    for (size_t i = 0; i < t.columns.size(); ++i)
        if (std::string(t.columns[i]) == column) return i;
    return t.columns.size();
}

/// A value as a person reads it: times as HH:MM, NULL as empty, control
/// characters (in a file written by another tool) escaped.
std::string shown(const RecordTable& t, size_t column, const std::optional<std::string>& v)
{
    if (!v) return {};
    if (isTable(t, "encounter") && std::string(t.columns[column]) == "time") {
        try {
            return formatTimeOfDay(std::stoi(*v));
        } catch (const std::exception&) {
            // not a number of minutes: shown as stored
        }
    }
    return printableText(*v);
}

std::string at(const RecordValues& v, size_t i) { return i < v.size() && v[i] ? *v[i] : std::string(); }

std::string label(const RecordTable& t, const RecordValues& v)
{
    if (isTable(t, "animal")) return "animal " + at(v, 0);
    if (isTable(t, "residence"))
        return printableText("stay of " + at(v, 0) + " in " + at(v, 1) + " from " + at(v, 2));
    return "encounter of " + at(v, 0) + " " + at(v, 2) + (at(v, 4) == "draw" ? " drew with " : " beat ") + at(v, 3);
}

/// What makes two records with different uids the same record: the animal
/// id, the animal and first day of a stay, every field of an encounter.
std::string contentKey(const RecordTable& t, const RecordValues& v)
{
    if (isTable(t, "animal")) return at(v, 0);
    if (isTable(t, "residence")) return at(v, 0) + '\x1f' + at(v, 2);
    std::string key;
    for (const auto& f : v) key += (f ? "=" + *f : std::string("~")) + '\x1f';
    return key;
}

/// The newest state of our record that the other file's record also had.
std::optional<RecordValues> commonState(const RecordStates& ours, const std::string& ourUid,
                                        const RecordStates& theirs, const std::string& theirUid)
{
    if (auto it = ours.current.find(ourUid); it != ours.current.end() && theirs.knew(theirUid, it->second))
        return it->second;
    if (auto it = ours.history.find(ourUid); it != ours.history.end())
        for (auto s = it->second.rbegin(); s != it->second.rend(); ++s)
            if (theirs.knew(theirUid, *s)) return *s;
    return std::nullopt;
}

/// A record here and its counterpart in the other file, field by field.
struct FieldMerge {
    std::vector<size_t> taken;  ///< changed only in the other file
    std::vector<size_t> clash;  ///< changed on both sides to different values
};

FieldMerge mergeFields(const RecordValues& ours, const RecordValues& theirs, const std::optional<RecordValues>& base)
{
    FieldMerge m;
    for (size_t i = 0; i < ours.size(); ++i) {
        if (ours[i] == theirs[i]) continue;
        if (base && (*base)[i] == ours[i]) m.taken.push_back(i);
        else if (!(base && (*base)[i] == theirs[i])) m.clash.push_back(i);
    }
    return m;
}

std::string describeFields(const RecordTable& t, const std::vector<size_t>& fields, const RecordValues& ours,
                           const RecordValues& theirs)
{
    std::string out;
    for (size_t i : fields)
        out += std::string(out.empty() ? "" : "; ") + t.columns[i] + ": '" + shown(t, i, ours[i]) + "' here, '" +
               shown(t, i, theirs[i]) + "' in the other file";
    return out;
}

struct Update {
    std::string uid;
    std::vector<size_t> columns;
    RecordValues values; // the other file's record
};

std::vector<std::string> sortedUids(const std::unordered_map<std::string, RecordValues>& records)
{
    std::vector<std::string> out;
    out.reserve(records.size());
    for (const auto& entry : records) out.push_back(entry.first);
    std::sort(out.begin(), out.end());
    return out;
}

/// The decisions about one table, made before anything is written.
struct TablePlan {
    std::vector<Update> updates;
    std::vector<std::string> deletes;
    std::unordered_set<std::string> fresh; ///< uids of the other file's records to add
};

class TableMerger {
public:
    TableMerger(const RecordTable& table, const RecordStates& ours, const RecordStates& theirs,
                MergePreference prefer, MergeReport& report, size_t& skipped, std::string otherPath)
        : t_(table), ours_(ours), theirs_(theirs), prefer_(prefer), report_(report), skipped_(skipped),
          otherPath_(std::move(otherPath))
    {
    }

    /// `stillNamed(uid)`: why an animal deleted in the other file cannot be
    /// deleted here (records here that still name it), or empty.
    template <typename StillNamed>
    TablePlan run(const StillNamed& stillNamed)
    {
        // In uid order, so that a report lists the same records in the same
        // order every time (new uids are time-ordered: roughly entry order).
        std::vector<std::string> unmatchedTheirs;
        for (const std::string& uid : sortedUids(theirs_.current)) {
            if (ours_.current.count(uid)) pair(uid, uid, "");
            else if (ours_.deleted.count(uid)) deletedHere(uid, theirs_.current.at(uid));
            else unmatchedTheirs.push_back(uid);
        }
        // The same record under two uids (set up apart, e.g. the same
        // animals.csv imported into two new files by an older version).
        const std::vector<std::string> ourUids = sortedUids(ours_.current);
        std::unordered_map<std::string, std::vector<std::string>> ourByContent;
        for (const std::string& uid : ourUids)
            if (!theirs_.current.count(uid) && !theirs_.deleted.count(uid))
                ourByContent[contentKey(t_, ours_.current.at(uid))].push_back(uid);
        for (const std::string& uid : unmatchedTheirs) {
            auto it = ourByContent.find(contentKey(t_, theirs_.current.at(uid)));
            if (it == ourByContent.end() || it->second.empty()) {
                plan_.fresh.insert(uid);
                continue;
            }
            const std::string ourUid = it->second.back();
            it->second.pop_back();
            pair(ourUid, uid, "uid in the other file: " + uid);
        }
        for (const std::string& uid : ourUids)
            if (!theirs_.current.count(uid) && theirs_.deleted.count(uid))
                deletedThere(uid, ours_.current.at(uid), stillNamed(ours_.current.at(uid)));
        return std::move(plan_);
    }

private:
    void conflict(const std::string& uid, const RecordValues& labelled, std::string what,
                  std::vector<FieldConflict> fields)
    {
        report_.conflicts.push_back({t_.name, uid, label(t_, labelled), std::move(what), std::move(fields)});
    }

    /// Our record `ourUid` and theirs `theirUid` are one record.
    void pair(const std::string& ourUid, const std::string& theirUid, const std::string& matchedAs)
    {
        const RecordValues& o = ours_.current.at(ourUid);
        const RecordValues& th = theirs_.current.at(theirUid);
        if (!matchedAs.empty())
            report_.matched.push_back({t_.name, ourUid, label(t_, o), matchedAs});
        if (o == th) {
            ++skipped_;
            return;
        }
        const std::optional<RecordValues> base = commonState(ours_, ourUid, theirs_, theirUid);
        const FieldMerge m = mergeFields(o, th, base);
        Update u{ourUid, m.taken, th};
        if (!m.taken.empty())
            report_.updated.push_back({t_.name, ourUid, label(t_, o), describeFields(t_, m.taken, o, th)});
        if (!m.clash.empty()) {
            if (prefer_ == MergePreference::None) {
                std::string what = describeFields(t_, m.clash, o, th);
                if (!matchedAs.empty())
                    what = "another record here (uid " + ourUid + ") has the same identity; " + matchedAs + "; " + what;
                std::vector<FieldConflict> fields;
                for (size_t i : m.clash)
                    fields.push_back({t_.columns[i], shown(t_, i, o[i]), shown(t_, i, th[i]),
                                      base ? std::optional<std::string>(shown(t_, i, (*base)[i])) : std::nullopt});
                conflict(ourUid, o, std::move(what), std::move(fields));
            } else if (prefer_ == MergePreference::Theirs) {
                u.columns.insert(u.columns.end(), m.clash.begin(), m.clash.end());
                report_.takenFromOther.push_back(label(t_, th));
            }
        }
        if (u.columns.empty()) ++skipped_;
        else plan_.updates.push_back(std::move(u));
    }

    /// The other file has a record this file deleted.
    void deletedHere(const std::string& uid, const RecordValues& theirs)
    {
        const RecordValues& gone = ours_.deleted.at(uid);
        if (ours_.knew(uid, theirs)) {
            report_.keptDeleted.push_back({t_.name, uid, label(t_, gone), "deleted here"});
            return;
        }
        if (prefer_ == MergePreference::Ours) {
            report_.keptDeleted.push_back({t_.name, uid, label(t_, gone), "deleted here; edited in the other file"});
        } else if (prefer_ == MergePreference::Theirs) {
            plan_.fresh.insert(uid);
            report_.takenFromOther.push_back(label(t_, theirs));
        } else {
            std::vector<FieldConflict> fields;
            std::vector<size_t> changed;
            for (size_t i = 0; i < theirs.size(); ++i)
                if (theirs[i] != gone[i]) {
                    changed.push_back(i);
                    fields.push_back({t_.columns[i], deletedMark, shown(t_, i, theirs[i]), shown(t_, i, gone[i])});
                }
            std::string what = "deleted here, edited in the other file since";
            for (size_t i : changed)
                what += std::string(i == changed.front() ? ": " : "; ") + t_.columns[i] + ": '" +
                        shown(t_, i, gone[i]) + "' when deleted here, '" + shown(t_, i, theirs[i]) +
                        "' in the other file";
            conflict(uid, gone, std::move(what), std::move(fields));
        }
    }

    /// This file has a record the other file deleted.
    void deletedThere(const std::string& uid, const RecordValues& ours, const std::string& stillNamed)
    {
        const bool unchanged = theirs_.knew(uid, ours);
        const bool wanted = unchanged || prefer_ == MergePreference::Theirs;
        if (wanted && stillNamed.empty()) {
            plan_.deletes.push_back(uid);
            report_.deleted.push_back({t_.name, uid, label(t_, ours), "deleted in the other file"});
            if (!unchanged) report_.takenFromOther.push_back(label(t_, ours));
            return;
        }
        if (prefer_ == MergePreference::Ours) {
            ++skipped_; // kept, as preferred
            return;
        }
        if (wanted && prefer_ == MergePreference::Theirs) {
            report_.problems.add(otherPath_, 0, t_.columns[0],
                                 label(t_, ours) + " was deleted in the other file but is still named here by " +
                                     stillNamed + "; delete or change those first");
            return;
        }
        const RecordValues& gone = theirs_.deleted.at(uid);
        std::vector<FieldConflict> fields;
        std::string what = "deleted in the other file";
        if (!unchanged) {
            what += ", edited here since";
            for (size_t i = 0; i < ours.size(); ++i)
                if (ours[i] != gone[i]) {
                    fields.push_back({t_.columns[i], shown(t_, i, ours[i]), deletedMark, shown(t_, i, gone[i])});
                    what += std::string(fields.size() == 1 ? ": " : "; ") + t_.columns[i] + ": '" +
                            shown(t_, i, ours[i]) + "' here, '" + shown(t_, i, gone[i]) + "' when deleted there";
                }
        }
        if (!stillNamed.empty()) what += "; still named here by " + stillNamed;
        if (fields.empty()) fields.push_back({"(record)", "kept", deletedMark, std::nullopt});
        conflict(uid, ours, std::move(what), std::move(fields));
    }

    const RecordTable& t_;
    const RecordStates& ours_;
    const RecordStates& theirs_;
    MergePreference prefer_;
    MergeReport& report_;
    size_t& skipped_;
    std::string otherPath_;
    TablePlan plan_;
};

void applyUpdate(sqlite3* db, const RecordTable& t, const Update& u)
{
    std::string sql = std::string("UPDATE ") + t.name + " SET ";
    for (size_t k = 0; k < u.columns.size(); ++k)
        sql += std::string(k ? ", " : "") + t.columns[u.columns[k]] + " = ?" + std::to_string(k + 1);
    sql += " WHERE uid = ?" + std::to_string(u.columns.size() + 1);
    SqliteStatement q(db, sql.c_str());
    for (size_t k = 0; k < u.columns.size(); ++k) q.bindOptional(static_cast<int>(k + 1), u.values[u.columns[k]]);
    q.bindUid(static_cast<int>(u.columns.size() + 1), u.uid);
    q.run();
}

void applyDelete(sqlite3* db, const RecordTable& t, const std::string& uid)
{
    SqliteStatement q(db, (std::string("DELETE FROM ") + t.name + " WHERE uid = ?").c_str());
    q.bindUid(1, uid);
    q.run();
}

/// An encounter without a group belongs to the group both animals shared
/// that day, which the import and the merge fill in; so an empty group in the
/// other file stands for the group the same encounter has here.
void fillEmptyGroups(RecordStates& theirs, const RecordStates& ours, const RecordTable& t)
{
    const size_t g = columnIndex(t, "grp");
    auto fill = [&](const std::string& uid, RecordValues& v) {
        if (v[g] && !v[g]->empty()) return;
        if (auto it = ours.current.find(uid); it != ours.current.end()) v[g] = it->second[g];
    };
    for (auto& [uid, v] : theirs.current) fill(uid, v);
    for (auto& [uid, states] : theirs.history)
        for (RecordValues& v : states) fill(uid, v);
}

template <typename Record>
std::vector<Record> pick(const std::vector<Record>& all, const std::unordered_set<std::string>& uids)
{
    std::vector<Record> out;
    for (const Record& r : all)
        if (uids.count(r.uid)) out.push_back(r);
    return out;
}

} // namespace

namespace {

/// What the merge will do with each table (animal, residence, encounter).
/// The supporters of one encounter: both sides, as `joinSupporters` writes them.
struct SupportLists {
    std::string winner, loser;
    bool operator==(const SupportLists&) const = default;
};

/// Every encounter's supporters in a file (none in a file older than version 3).
std::unordered_map<std::string, SupportLists> supportListsOf(const ColonyStore& store)
{
    std::unordered_map<std::string, SupportLists> out;
    if (!hasTable(store.handle(), "encounter_support")) return out;
    SqliteStatement q(store.handle(), "SELECT encounter, animal, side FROM encounter_support ORDER BY rowid");
    while (q.step()) {
        SupportLists& l = out[q.uid(0)];
        std::string& list = q.text(2) == "winner" ? l.winner : l.loser;
        list += (list.empty() ? "" : " ") + q.text(1);
    }
    return out;
}

/// A supporter-list state as a set, so that two states compare whatever order
/// the rows were written in: (side, animal) pairs.
using SupportState = std::set<std::pair<std::string, std::string>>;

SupportState stateOf(const SupportLists& l)
{
    SupportState out;
    for (const std::string& a : splitSupporters(l.winner)) out.emplace("winner", a);
    for (const std::string& a : splitSupporters(l.loser)) out.emplace("loser", a);
    return out;
}

std::string sideOf(const SupportState& s, const char* side)
{
    std::string out;
    for (const auto& [which, animal] : s)
        if (which == side) out += (out.empty() ? "" : " ") + animal;
    return out;
}

/// Every supporter-list state each encounter has had in a file, newest first:
/// its current rows, then walked back through the encounter_support audit rows
/// (an insert undone removes the row, a delete undone puts it back). Walking
/// back from the present also gives the state a bulk import loaded without
/// audit rows.
std::unordered_map<std::string, std::vector<SupportState>>
supportHistoryOf(const ColonyStore& store, const std::unordered_map<std::string, SupportLists>& current)
{
    std::unordered_map<std::string, std::vector<SupportState>> out;
    for (const auto& [uid, lists] : current) out[uid].push_back(stateOf(lists));
    if (!hasTable(store.handle(), "audit")) return out;
    SqliteStatement q(store.handle(),
                      "SELECT uid, action, json_extract(old_values, '$.side'), json_extract(old_values, '$.animal'), "
                      "json_extract(new_values, '$.side'), json_extract(new_values, '$.animal') FROM audit "
                      "WHERE tbl = 'encounter_support' ORDER BY id DESC");
    while (q.step()) {
        std::vector<SupportState>& states = out[q.text(0)];
        if (states.empty()) states.emplace_back(); // no rows now
        SupportState before = states.back();
        const std::string action = q.text(1);
        if (action == "insert" || action == "update") before.erase({q.text(4), q.text(5)});
        if (action == "delete" || action == "update") before.emplace(q.text(2), q.text(3));
        if (before != states.back()) states.push_back(std::move(before));
    }
    return out;
}

/// An encounter whose supporters are taken from the other file.
struct SupportTaken {
    std::string uid;
    SupportLists lists;
};

struct Decisions {
    std::array<TablePlan, 3> plans;
    std::vector<SupportTaken> supporters;
    bool fresh() const
    {
        return std::any_of(plans.begin(), plans.end(), [](const TablePlan& p) { return !p.fresh.empty(); });
    }
};

/// Compares the two files and decides, writing nothing; conflicts and
/// problems go into `report`.
Decisions decide(const ColonyStore& target, const ColonyStore& other, MergePreference prefer, MergeReport& report)
{
    const std::vector<RecordTable>& tables = recordTables(); // animal, residence, encounter
    std::vector<RecordStates> ours, theirs;
    for (const RecordTable& t : tables) {
        ours.push_back(readRecordStates(target, t));
        theirs.push_back(readRecordStates(other, t));
    }
    fillEmptyGroups(theirs[2], ours[2], tables[2]);
    Decisions d;
    // Encounters first, so that an animal whose encounters go too may go.
    d.plans[2] = TableMerger(tables[2], ours[2], theirs[2], prefer, report, report.skippedEncounters, other.path())
                     .run([](const RecordValues&) { return std::string(); });
    d.plans[1] = TableMerger(tables[1], ours[1], theirs[1], prefer, report, report.skippedResidences, other.path())
                     .run([](const RecordValues&) { return std::string(); });
    const std::unordered_set<std::string> goingEncounters(d.plans[2].deletes.begin(), d.plans[2].deletes.end());
    std::unordered_set<std::string> goingAnimals;
    for (const auto& [uid, v] : ours[0].current)
        if (!theirs[0].current.count(uid) && theirs[0].deleted.count(uid)) goingAnimals.insert(uid);
    // Records here that still name an animal the other file deleted.
    auto stillNamed = [&](const RecordValues& animal) {
        const std::string id = at(animal, 0);
        size_t encounters = 0, offspring = 0;
        for (const auto& [uid, e] : ours[2].current)
            if (!goingEncounters.count(uid) && (at(e, 2) == id || at(e, 3) == id)) ++encounters;
        for (const auto& [uid, a] : ours[0].current)
            if (!goingAnimals.count(uid) && (at(a, 4) == id || at(a, 5) == id)) ++offspring;
        std::string out;
        if (encounters) out = std::to_string(encounters) + " encounter(s)";
        if (offspring) out += std::string(out.empty() ? "" : " and ") + std::to_string(offspring) + " offspring";
        return out;
    };
    d.plans[0] = TableMerger(tables[0], ours[0], theirs[0], prefer, report, report.skippedAnimals, other.path())
                     .run(stillNamed);
    // Supporters live in their own table: each side's list is merged like a
    // field, from the newest supporter state both files had (supportHistoryOf).
    const std::unordered_map<std::string, SupportLists> ourSupport = supportListsOf(target);
    const std::unordered_map<std::string, SupportLists> theirSupport = supportListsOf(other);
    std::vector<std::string> both;
    for (const auto& [uid, v] : ours[2].current)
        if (theirs[2].current.count(uid) && !goingEncounters.count(uid)) both.push_back(uid);
    std::sort(both.begin(), both.end());
    const auto ourStates = supportHistoryOf(target, ourSupport);
    const auto theirStates = supportHistoryOf(other, theirSupport);
    for (const std::string& uid : both) {
        const auto o = ourSupport.find(uid);
        const auto t = theirSupport.find(uid);
        const SupportLists here = o == ourSupport.end() ? SupportLists{} : o->second;
        const SupportLists there = t == theirSupport.end() ? SupportLists{} : t->second;
        const SupportState hereState = stateOf(here), thereState = stateOf(there);
        if (hereState == thereState) continue;
        // The common state: the newest state here that the other file also had.
        std::optional<SupportState> base;
        if (auto ours = ourStates.find(uid), theirs = theirStates.find(uid);
            ours != ourStates.end() && theirs != theirStates.end())
            for (const SupportState& state : ours->second)
                if (std::find(theirs->second.begin(), theirs->second.end(), state) != theirs->second.end()) {
                    base = state;
                    break;
                }
        SupportLists merged = here;
        bool taken = false;
        MergeConflict c{"encounter", uid, label(tables[2], ours[2].current.at(uid)), {}, {}};
        for (const char* side : {"winner", "loser"}) {
            const std::string ourSide = sideOf(hereState, side), theirSide = sideOf(thereState, side);
            if (ourSide == theirSide) continue;
            std::string& mine = std::string(side) == "winner" ? merged.winner : merged.loser;
            const std::string& otherList = std::string(side) == "winner" ? there.winner : there.loser;
            const std::optional<std::string> baseSide =
                base ? std::optional<std::string>(sideOf(*base, side)) : std::nullopt;
            if (baseSide && *baseSide == theirSide) continue; // changed here only: ours stays
            if ((baseSide && *baseSide == ourSide) || prefer == MergePreference::Theirs) {
                mine = otherList; // changed in the other file only, or settled for theirs
                taken = true;
                continue;
            }
            if (prefer == MergePreference::Ours) continue;
            const std::string field = std::string(side) + "_support";
            c.what += (c.what.empty() ? "" : "; ") + field + ": '" + ourSide + "' here, '" + theirSide +
                      "' in the other file";
            c.fields.push_back({field, ourSide, theirSide, baseSide});
        }
        if (!c.fields.empty()) {
            report.conflicts.push_back(std::move(c));
        } else if (taken) {
            d.supporters.push_back({uid, merged});
            report.updated.push_back({"encounter", uid, label(tables[2], ours[2].current.at(uid)), "supporters"});
        }
    }
    return d;
}

} // namespace

MergeReport mergeColonies(ColonyStore& target, const ColonyStore& other, const MergeOptions& options)
{
    MergeReport report;
    if (options.backup && !options.dryRun) {
        // SQLite cannot copy a file from the connection writing it, so the
        // backup is taken before the write transaction, when a first look
        // shows the merge would change something (and could go ahead).
        MergeReport look;
        const Decisions first = decide(target, other, options.prefer, look);
        if (look.conflicts.empty() && look.problems.empty() && (look.changes() || first.fresh()))
            report.backup = backupColony(target, options.now, backupsToKeep(target));
    }
    sqlite3* db = target.handle();
    // Reads and writes in one write transaction, so that nobody changes the
    // file between the checks and the write.
    WriteTransaction tx(target); // rolled back unless committed below
    const std::vector<RecordTable>& tables = recordTables();
    Decisions decided = decide(target, other, options.prefer, report);
    const TablePlan& animalPlan = decided.plans[0];
    const TablePlan& residencePlan = decided.plans[1];
    const TablePlan& encounterPlan = decided.plans[2];
    if (!report.conflicts.empty() || !report.problems.empty()) return report;

    // The records to add, from the other file, in its chronological order for encounters.
    const Colony theirColony = other.load();
    Colony fresh;
    fresh.animals = pick(theirColony.animals, animalPlan.fresh);
    fresh.residences = pick(theirColony.residences, residencePlan.fresh);
    for (size_t i : chronologicalOrder(theirColony.encounters))
        if (encounterPlan.fresh.count(theirColony.encounters[i].uid))
            fresh.encounters.push_back(theirColony.encounters[i]);
    // Edits of animals and stays and every deletion first, then every record
    // to add goes through the import's checks against the colony as it
    // stands after them; edits of encounters last, as they may name an
    // animal added just before.
    for (size_t k = 0; k < 2; ++k)
        for (const Update& u : decided.plans[k].updates) applyUpdate(db, tables[k], u);
    for (size_t k = tables.size(); k-- > 0;)
        for (const std::string& uid : decided.plans[k].deletes) applyDelete(db, tables[k], uid);
    for (Encounter& e : fresh.encounters) e.seq = 0;
    std::ostringstream animals, residences, encounters;
    writeAnimalsCsv(animals, fresh);
    writeResidencesCsv(residences, fresh);
    writeEncountersCsv(encounters, fresh);
    const std::string from = other.path();
    ImportInput input;
    if (!fresh.animals.empty()) input.animals = ImportSource{from + " (animals)", animals.str()};
    // Always given, so that new animals are not placed in a default group.
    input.residences = ImportSource{from + " (residences)", residences.str()};
    if (!fresh.encounters.empty()) input.encounters = ImportSource{from + " (encounters)", encounters.str()};
    ImportPlan plan =
        planImport(target.loadAnimals(), target.loadResidences(), input, options.today, target.encounterUids());
    if (!plan.ok()) {
        report.problems = plan.problems;
        return report;
    }
    target.append(plan.animals, plan.residences, plan.encounters, "merge from " + from);
    for (const Update& u : encounterPlan.updates) applyUpdate(db, tables[2], u);
    for (const SupportTaken& taken : decided.supporters) {
        Encounter e;
        e.uid = taken.uid;
        e.winnerSupport = splitSupporters(taken.lists.winner);
        e.loserSupport = splitSupporters(taken.lists.loser);
        replaceSupportRows(db, e);
    }
    report.addedAnimals = std::move(plan.animals);
    report.addedResidences = std::move(plan.residences);
    report.addedEncounters = std::move(plan.encounters);
    if (!options.dryRun) tx.commit(); // a dry run is rolled back
    report.written = !options.dryRun && report.changes();
    return report;
}

} // namespace hierloom::core
