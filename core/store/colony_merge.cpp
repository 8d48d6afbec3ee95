// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_merge.h"

#include "core/store/colony_csv_export.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"
#include "core/store/support_rows.h"
#include "core/store/write_transaction.h"

#include <sqlite3.h>

#include <sstream>
#include <unordered_map>

namespace hierloom::core {

namespace {

using Fields = std::vector<std::pair<const char*, std::string>>;

Fields fieldsOf(const Animal& a)
{
    return {{"id", a.id},
            {"name", a.name},
            {"sex", toString(a.sex)},
            {"birth_date", formatDate(a.birth)},
            {"mother", a.mother},
            {"father", a.father},
            {"entry_date", formatDate(a.entry)},
            {"entry_type", toString(a.entryType)},
            {"exit_date", formatDate(a.exit)},
            {"exit_type", toString(a.exitType)}};
}

Fields fieldsOf(const Residence& r)
{
    return {{"animal", r.animal}, {"group", r.group}, {"from", formatDate(r.from)}, {"to", formatDate(r.to)}};
}

Fields fieldsOf(const Encounter& e)
{
    return {{"date", formatDate(e.date)},
            {"time", e.time ? formatTimeOfDay(*e.time) : std::string()},
            {"winner", e.winner},
            {"loser", e.loser},
            {"outcome", toString(e.outcome)},
            {"behaviour", e.behaviour},
            {"group", e.group},
            {"observer", e.observer},
            {"note", e.note},
            {"winner_support", joinSupporters(e.winnerSupport)},
            {"loser_support", joinSupporters(e.loserSupport)}};
}

std::string label(const Animal& a) { return "animal " + a.id; }
std::string label(const Residence& r)
{
    return "stay of " + r.animal + " in " + r.group + " from " + formatDate(r.from);
}
std::string label(const Encounter& e)
{
    return "encounter of " + formatDate(e.date) + " " + e.winner + (e.outcome == Outcome::Draw ? " drew with " : " beat ") +
           e.loser;
}

/// The differing fields, `name: 'x' here, 'y' in the other file`; empty when the same.
template <typename Record>
std::string differences(const Record& ours, const Record& theirs)
{
    const Fields a = fieldsOf(ours);
    const Fields b = fieldsOf(theirs);
    std::string out;
    for (size_t i = 0; i < a.size(); ++i)
        if (a[i].second != b[i].second)
            out += std::string(out.empty() ? "" : "; ") + a[i].first + ": '" + a[i].second + "' here, '" +
                   b[i].second + "' in the other file";
    return out;
}

/// An encounter without a group belongs to the group both animals shared that
/// day, which the import and the merge fill in; so an empty group on either
/// side is not a difference.
std::string differences(const Encounter& ours, const Encounter& theirs)
{
    if (!ours.group.empty() && !theirs.group.empty()) return differences<Encounter>(ours, theirs);
    Encounter same = theirs;
    same.group = ours.group;
    return differences<Encounter>(ours, same);
}

template <typename Record>
std::unordered_map<std::string, const Record*> byUid(const std::vector<Record>& records)
{
    std::unordered_map<std::string, const Record*> out;
    for (const Record& r : records) out.emplace(r.uid, &r);
    return out;
}

void updateAnimal(sqlite3* db, const std::string& uid, const Animal& a)
{
    SqliteStatement q(db, "UPDATE animal SET id = ?, name = ?, sex = ?, birth_date = ?, mother = ?, father = ?, "
                          "entry_date = ?, entry_type = ?, exit_date = ?, exit_type = ? WHERE uid = ?");
    q.bind(1, a.id);
    q.bind(2, a.name);
    q.bind(3, toString(a.sex));
    q.bindNullableText(4, formatDate(a.birth));
    q.bindNullableText(5, a.mother);
    q.bindNullableText(6, a.father);
    q.bindNullableText(7, formatDate(a.entry));
    q.bindNullableText(8, toString(a.entryType));
    q.bindNullableText(9, formatDate(a.exit));
    q.bindNullableText(10, toString(a.exitType));
    q.bind(11, uid);
    q.run();
}

void updateResidence(sqlite3* db, const std::string& uid, const Residence& r)
{
    SqliteStatement q(db, "UPDATE residence SET animal = ?, grp = ?, from_date = ?, to_date = ? WHERE uid = ?");
    q.bind(1, r.animal);
    q.bind(2, r.group);
    q.bind(3, formatDate(r.from));
    q.bindNullableText(4, formatDate(r.to));
    q.bind(5, uid);
    q.run();
}

void updateEncounter(sqlite3* db, const std::string& uid, const Encounter& e)
{
    SqliteStatement q(db, "UPDATE encounter SET date = ?, time = ?, winner = ?, loser = ?, outcome = ?, "
                          "behaviour = ?, grp = coalesce(nullif(?, ''), grp), observer = ?, note = ? WHERE uid = ?");
    q.bind(1, formatDate(e.date));
    if (e.time) q.bind(2, static_cast<std::int64_t>(*e.time));
    else q.bindNull(2);
    q.bind(3, e.winner);
    q.bind(4, e.loser);
    q.bind(5, toString(e.outcome));
    q.bind(6, e.behaviour);
    q.bind(7, e.group);
    q.bind(8, e.observer);
    q.bind(9, e.note);
    q.bind(10, uid);
    q.run();
    Encounter supported = e;
    supported.uid = uid;
    replaceSupportRows(db, supported);
}

/// Sorts one kind of record of the other file into skipped, new, conflicting
/// or to be overwritten here (`update(ourUid, theirs)`).
template <typename Record, typename Update, typename SameKey>
void classify(const std::vector<Record>& ours, const std::vector<Record>& theirs, const char* table,
              MergePreference prefer, MergeReport& report, size_t& skipped, std::vector<Record>& fresh,
              const Update& update, const SameKey& sameKey)
{
    const auto mine = byUid(ours);
    for (const Record& t : theirs) {
        const Record* o = nullptr;
        std::string what;
        if (auto it = mine.find(t.uid); it != mine.end()) {
            o = it->second;
            what = differences(*o, t);
            if (what.empty()) {
                ++skipped;
                continue;
            }
        } else if ((o = sameKey(t)) != nullptr) {
            // Two records (two uids) claiming one identity, e.g. one animal id.
            what = "another record here (uid " + o->uid + ") has the same identity; uid in the other file: " + t.uid;
            if (const std::string d = differences(*o, t); !d.empty()) what += "; " + d;
        } else {
            fresh.push_back(t);
            continue;
        }
        if (prefer == MergePreference::None) report.conflicts.push_back({table, o->uid, label(*o), what});
        else if (prefer == MergePreference::Ours) ++skipped;
        else {
            update(o->uid, t);
            report.takenFromOther.push_back(label(t));
        }
    }
}

} // namespace

MergeReport mergeColonies(ColonyStore& target, const ColonyStore& other, const MergeOptions& options)
{
    MergeReport report;
    sqlite3* db = target.handle();
    // Reads and writes in one write transaction, so that nobody changes the
    // file between the checks and the write.
    WriteTransaction tx(target); // rolled back unless committed below
    const Colony ours = target.load();
    const Colony theirs = other.load();
    Colony fresh;
    classify(
        ours.animals, theirs.animals, "animal", options.prefer, report, report.skippedAnimals, fresh.animals,
        [&](const std::string& uid, const Animal& a) { updateAnimal(db, uid, a); },
        [&](const Animal& a) -> const Animal* {
            const int i = ours.animalIndex(a.id);
            return i < 0 ? nullptr : &ours.animals[static_cast<size_t>(i)];
        });
    classify(
        ours.residences, theirs.residences, "residence", options.prefer, report, report.skippedResidences,
        fresh.residences, [&](const std::string& uid, const Residence& r) { updateResidence(db, uid, r); },
        [](const Residence&) -> const Residence* { return nullptr; });
    // New encounters in the other file's chronological order, so their seq here follows it.
    std::vector<Encounter> theirsInOrder;
    for (size_t i : chronologicalOrder(theirs.encounters)) theirsInOrder.push_back(theirs.encounters[i]);
    classify(
        ours.encounters, theirsInOrder, "encounter", options.prefer, report, report.skippedEncounters,
        fresh.encounters, [&](const std::string& uid, const Encounter& e) { updateEncounter(db, uid, e); },
        [](const Encounter&) -> const Encounter* { return nullptr; });
    if (!report.conflicts.empty()) return report;
    // Every record to add goes through the import's checks, against the
    // colony as it stands after any overwrite above.
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
    report.addedAnimals = std::move(plan.animals);
    report.addedResidences = std::move(plan.residences);
    report.addedEncounters = std::move(plan.encounters);
    if (!options.dryRun) tx.commit(); // a dry run is rolled back
    report.written = !options.dryRun;
    return report;
}

} // namespace hierloom::core
