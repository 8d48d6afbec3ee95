// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_edits.h"

#include "core/rules/animal_rules.h"
#include "core/rules/encounter_rules.h"
#include "core/rules/record_messages.h"
#include "core/rules/residence_rules.h"
#include "core/store/record_binding.h"
#include "core/base/residence_index.h"
#include "core/store/sqlite_statement.h"
#include "core/store/support_rows.h"
#include "core/store/write_transaction.h"

#include <sqlite3.h>

#include <algorithm>
#include <unordered_set>

namespace hierloom::core {

namespace {



/// Runs `body` inside one write transaction, rolled back on any exception.
template <typename F>
void inTransaction(ColonyStore& store, F&& body)
{
    WriteTransaction tx(store);
    body();
    tx.commit();
}

const Animal* findByUid(const Colony& colony, const std::string& uid)
{
    for (const Animal& a : colony.animals)
        if (a.uid == uid) return &a;
    return nullptr;
}

AnimalChange refused(std::string field, std::string message)
{
    AnimalChange c;
    c.problems.push_back({std::move(field), std::move(message)});
    return c;
}

void append(FieldProblems& to, const FieldProblems& from) { to.insert(to.end(), from.begin(), from.end()); }

} // namespace

std::optional<AnimalRecord> animalRecord(const Colony& colony, const std::string& id)
{
    const int i = colony.animalIndex(id);
    if (i < 0) return std::nullopt;
    AnimalRecord r{colony.animals[static_cast<size_t>(i)], {}};
    for (const Residence& s : colony.residences)
        if (s.animal == id) r.residences.push_back(s);
    std::sort(r.residences.begin(), r.residences.end(),
              [](const Residence& x, const Residence& y) { return x.from < y.from; });
    return r;
}

AnimalChange planNewAnimal(const Colony& colony, Animal a, const std::string& group, Day today)
{
    AnimalChange c;
    if (a.uid.empty()) a.uid = newUid();
    if (!a.entry) a.entry = a.birth; // as the import does
    c.problems = checkAnimal(a, colony.animals, today);
    AnimalRecord rec{a, {}};
    if (!group.empty() && c.ok()) {
        Residence r{a.id, group, *lifeStart(a), a.exit, newUid()};
        append(c.problems, checkResidence(r, a, {}, today));
        rec.residences.push_back(std::move(r));
    }
    if (c.ok()) c.after = std::move(rec);
    return c;
}

AnimalChange planIntroduction(const Colony& colony, Animal a, const std::string& group, Day today)
{
    a.entryType = EntryType::Introduced;
    FieldProblems early;
    if (!a.entry) early.push_back({"entry_date", "is needed for an introduction (the day the animal joined)"});
    if (group.empty()) early.push_back({"group", "is empty"});
    if (!early.empty()) return AnimalChange{{}, {}, early};
    return planNewAnimal(colony, std::move(a), group, today);
}

AnimalChange planBirth(const Colony& colony, Animal newborn, Day today)
{
    newborn.entryType = EntryType::Born;
    FieldProblems early;
    if (!newborn.birth) early.push_back({"birth_date", "is empty; a birth needs its date"});
    if (newborn.mother.empty()) early.push_back({"mother", "is empty; a newborn lives in its mother's group"});
    if (!early.empty()) return AnimalChange{{}, {}, early};
    newborn.entry = newborn.birth;
    // The newborn's first group is its mother's on the day of birth.
    const ResidenceIndex where(colony.animals, colony.residences);
    const int m = where.animal(newborn.mother);
    std::string group;
    if (m >= 0 && *newborn.birth <= today) {
        // Alive and in a group that day, in the encounter rules' words.
        if (auto problem = checkEncounterAnimal(newborn.mother, {}, *newborn.birth, where))
            return refused("mother", std::move(*problem));
        group = where.groups()[static_cast<size_t>(where.groupOn(m, *newborn.birth))];
    }
    AnimalChange c = planNewAnimal(colony, std::move(newborn), group, today);
    return c;
}

AnimalChange planAnimalEdit(const Colony& colony, const Animal& input, Day today)
{
    const Animal* old = findByUid(colony, input.uid);
    if (!old) return refused("id", notAnAnimalOf(input.id, "the colony"));
    if (old->id != input.id)
        return refused("id", "cannot be changed (" + old->id + " is the id used in the notebooks and encounters)");
    Animal a = input;
    if (!a.entry) a.entry = a.birth;
    AnimalChange c;
    c.before = animalRecord(colony, old->id);
    c.problems = checkAnimal(a, colony.animals, today);
    AnimalRecord after{a, c.before->residences};
    for (Residence& r : after.residences) {
        // An exit closes every stay still running on that day.
        if (a.exit && (!r.to || *r.to > *a.exit) && r.from <= *a.exit) r.to = a.exit;
        if (c.ok()) append(c.problems, checkResidence(r, a, {}, today));
    }
    // Encounters already recorded must stay inside the animal's life in the colony.
    const auto start = lifeStart(a);
    int before = 0, afterExit = 0;
    for (const Encounter& e : colony.encounters) {
        if (!takesPart(e, a.id)) continue; // as a supporter too
        if (start && e.date < *start) ++before;
        if (a.exit && e.date > *a.exit) ++afterExit;
    }
    if (before > 0)
        c.problems.push_back({"entry_date", quotedValue(a.id) + " has " + std::to_string(before) + " encounter" +
                                                (before == 1 ? "" : "s") + " before " + formatDate(*start)});
    if (afterExit > 0)
        c.problems.push_back({"exit_date", quotedValue(a.id) + " has " + std::to_string(afterExit) + " encounter" +
                                               (afterExit == 1 ? "" : "s") + " after " + formatDate(*a.exit)});
    if (c.ok()) c.after = std::move(after);
    else c.before.reset();
    return c;
}

AnimalChange planExit(const Colony& colony, const std::string& id, Day date, ExitType type, Day today)
{
    const auto rec = animalRecord(colony, id);
    if (!rec) return refused("id", notAnAnimalOf(id, "the colony"));
    Animal a = rec->animal;
    a.exit = date;
    a.exitType = type;
    return planAnimalEdit(colony, a, today);
}

AnimalChange planMove(const Colony& colony, const std::string& id, const std::string& group, Day date, Day today)
{
    auto rec = animalRecord(colony, id);
    if (!rec) return refused("id", notAnAnimalOf(id, "the colony"));
    if (group.empty()) return refused("group", "is empty");
    if (date > today) return refused("from", inTheFuture(date));
    const Animal& a = rec->animal;
    AnimalChange c;
    c.before = rec;
    AnimalRecord after = *rec;
    Residence moved{id, group, date, a.exit, newUid()};
    std::optional<Day> oldEnd;
    std::string oldGroup;
    size_t current = after.residences.size();
    for (size_t i = 0; i < after.residences.size(); ++i) {
        const Residence& s = after.residences[i];
        if (s.from <= date && date <= s.to.value_or(ResidenceIndex::openEnd)) current = i;
    }
    size_t added = 0;
    if (current < after.residences.size()) {
        Residence& s = after.residences[current];
        if (s.group == group)
            return refused("group", quotedValue(id) + " was already in " + quotedValue(group) + " on " + formatDate(date));
        oldGroup = s.group;
        oldEnd = s.to;
        moved.to = s.to;
        if (s.from == date) {
            s.group = group; // moved on its first day there: the stay simply changes group
            added = current;
        } else {
            s.to = date - 1;
            after.residences.push_back(moved);
            added = after.residences.size() - 1;
        }
    } else {
        after.residences.push_back(moved);
        added = after.residences.size() - 1;
    }
    std::vector<Residence> others;
    for (size_t i = 0; i < after.residences.size(); ++i)
        if (i != added) others.push_back(after.residences[i]);
    c.problems = checkResidence(after.residences[added], a, others, today);
    if (!oldGroup.empty()) {
        // Encounters already recorded in the old group after the move would lose their group.
        const Day end = oldEnd.value_or(ResidenceIndex::openEnd);
        int n = 0;
        for (const Encounter& e : colony.encounters)
            if (takesPart(e, id) && e.date >= date && e.date <= end) ++n;
        if (n > 0)
            c.problems.push_back({"from", quotedValue(id) + " has " + std::to_string(n) + " encounter" + (n == 1 ? "" : "s") +
                                              " in " + quotedValue(oldGroup) + " on or after " + formatDate(date)});
    }
    std::sort(after.residences.begin(), after.residences.end(),
              [](const Residence& x, const Residence& y) { return x.from < y.from; });
    if (c.ok()) c.after = std::move(after);
    else c.before.reset();
    return c;
}

void writeAnimalChange(ColonyStore& store, const std::optional<AnimalRecord>& from, const std::optional<AnimalRecord>& to)
{
    sqlite3* db = store.handle();
    inTransaction(store, [&] {
        if (from) {
            SqliteStatement del(db, "DELETE FROM residence WHERE uid = ?");
            for (const Residence& r : from->residences) {
                del.bindUid(1, r.uid);
                del.run();
            }
        }
        if (from && to) {
            SqliteStatement up(db, "UPDATE animal SET uid = ?1, id = ?2, name = ?3, sex = ?4, birth_date = ?5, "
                                   "mother = ?6, father = ?7, entry_date = ?8, entry_type = ?9, exit_date = ?10, "
                                   "exit_type = ?11 WHERE uid = ?12");
            bindAnimalColumns(up, to->animal);
            up.bindUid(12, from->animal.uid);
            up.run();
        } else if (from) {
            SqliteStatement del(db, "DELETE FROM animal WHERE uid = ?");
            del.bindUid(1, from->animal.uid);
            del.run();
        } else if (to) {
            SqliteStatement ins(db, kInsertAnimalSql);
            bindAnimalColumns(ins, to->animal);
            ins.run();
        }
        if (to) {
            SqliteStatement ins(db, kInsertResidenceSql);
            for (const Residence& r : to->residences) {
                bindResidenceColumns(ins, r);
                ins.run();
            }
        }
    });
}

FieldProblems commitAnimalChange(ColonyStore& store, const AnimalChange& change)
{
    if (change.ok()) writeAnimalChange(store, change.before, change.after);
    return change.problems;
}

void writeEncounterChange(ColonyStore& store, const std::vector<Encounter>& remove, std::vector<Encounter>& insert)
{
    sqlite3* db = store.handle();
    inTransaction(store, [&] {
        {
            SqliteStatement del(db, "DELETE FROM encounter_row WHERE uid = ?");
            for (const Encounter& e : remove) {
                deleteSupportRows(db, e.uid);
                del.bindUid(1, e.uid);
                del.run();
            }
        }
        if (insert.empty()) return;
        std::int64_t seq = highestEncounterSeq(db);
        SqliteStatement ins(db, kInsertEncounterSql);
        SupportWriter support(db);
        SqliteStatement obs(db, "INSERT OR IGNORE INTO observer(name) VALUES (?)");
        EncounterTermCodes terms(db);
        for (Encounter& e : insert) {
            if (e.uid.empty()) e.uid = newUid();
            if (e.seq <= 0) e.seq = ++seq;
            bindEncounterColumns(ins, e, terms);
            ins.run();
            support.add(e);
            if (!e.observer.empty()) {
                obs.bind(1, e.observer);
                obs.run();
            }
        }
    });
}

FieldProblems insertEncounters(ColonyStore& store, std::vector<Encounter>& encounters, Day today)
{
    const ResidenceIndex where(store.loadAnimals(), store.loadResidences());
    for (Encounter& e : encounters) {
        FieldProblems p = checkEncounter(e, where, today);
        if (!p.empty()) return p;
    }
    writeEncounterChange(store, {}, encounters);
    return {};
}

FieldProblems updateEncounter(ColonyStore& store, Encounter& e, Day today)
{
    const std::vector<Encounter> old = encountersByUid(store, {e.uid});
    if (old.empty()) return {{"uid", quotedValue(e.uid) + " is not an encounter of the colony"}};
    e.seq = old.front().seq;
    const ResidenceIndex where(store.loadAnimals(), store.loadResidences());
    FieldProblems p = checkEncounter(e, where, today);
    if (!p.empty()) return p;
    std::vector<Encounter> insert{e};
    writeEncounterChange(store, old, insert);
    return {};
}

std::vector<Encounter> deleteEncounters(ColonyStore& store, const std::vector<std::string>& uids)
{
    std::vector<Encounter> gone = encountersByUid(store, uids);
    std::vector<Encounter> none;
    writeEncounterChange(store, gone, none);
    return gone;
}

std::vector<Encounter> encountersByUid(const ColonyStore& store, const std::vector<std::string>& uids)
{
    SqliteStatement q(store.handle(), (std::string("SELECT ") + kEncounterColumnsSql + " FROM encounter_row WHERE uid = ?").c_str());
    const EncounterTermTexts terms(store.handle(), store.path());
    std::vector<Encounter> out;
    for (const std::string& uid : uids) {
        q.bindUid(1, uid);
        if (q.step()) {
            out.push_back(readEncounterRow(q, terms, store.path()));
            loadSupportRowsOf(store.handle(), out.back());
        }
        q.reset();
    }
    std::sort(out.begin(), out.end(), [](const Encounter& a, const Encounter& b) { return a.seq < b.seq; });
    return out;
}

FieldProblems checkBehaviourCodes(const std::vector<ColonyStore::BehaviourCode>& codes)
{
    FieldProblems out;
    std::unordered_set<std::string> seen;
    for (const auto& c : codes) {
        if (c.code.empty()) out.push_back({"code", "is empty; every behaviour needs a code"});
        else if (!seen.insert(c.code).second) out.push_back({"code", quotedValue(c.code) + " appears twice"});
        if (c.severity < 0 || c.severity > 5)
            out.push_back({"severity", std::to_string(c.severity) + " must be a whole number from 0 to 5"});
        checkPlainText(c.code, "code", out);
        checkPlainText(c.description, "description", out);
    }
    return out;
}

void writeBehaviourCodes(ColonyStore& store, const std::vector<ColonyStore::BehaviourCode>& codes)
{
    inTransaction(store, [&] {
        store.exec("DELETE FROM behaviour_code");
        SqliteStatement ins(store.handle(), "INSERT INTO behaviour_code(code, severity, description) VALUES (?,?,?)");
        for (const auto& c : codes) {
            ins.bind(1, c.code);
            ins.bind(2, static_cast<std::int64_t>(c.severity));
            ins.bind(3, c.description);
            ins.run();
        }
    });
}

FieldProblems checkObservers(const std::vector<std::string>& names)
{
    FieldProblems out;
    std::unordered_set<std::string> seen;
    for (const std::string& n : names) {
        if (n.empty()) out.push_back({"observer", "is empty; every observer needs a name or initials"});
        else if (!seen.insert(n).second) out.push_back({"observer", quotedValue(n) + " appears twice"});
        checkPlainText(n, "observer", out);
    }
    return out;
}

void writeObservers(ColonyStore& store, const std::vector<std::string>& names)
{
    inTransaction(store, [&] {
        // Keep the rows (and their full names) of observers still listed.
        const std::unordered_set<std::string> keep(names.begin(), names.end());
        std::vector<std::string> drop;
        for (const std::string& n : store.observers())
            if (!keep.count(n)) drop.push_back(n);
        SqliteStatement del(store.handle(), "DELETE FROM observer WHERE name = ?");
        for (const std::string& n : drop) {
            del.bind(1, n);
            del.run();
        }
        SqliteStatement ins(store.handle(), "INSERT OR IGNORE INTO observer(name) VALUES (?)");
        for (const std::string& n : names) {
            ins.bind(1, n);
            ins.run();
        }
    });
}

} // namespace hierloom::core
