// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/colony_store.h"
#include "core/base/field_problem.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

// Single-record edits of a colony file, for the desktop's edit facade and
// its undo commands. Each change is first planned against the colony as it
// stands (checked under the import's rules, docs/file-formats.md, with the import's
// wording; nothing is written on a problem), then written in one transaction.
// Written changes carry both states so an undo writes the earlier one back.

/// An animal together with all its stays in groups.
struct AnimalRecord {
    Animal animal;
    std::vector<Residence> residences;
};

/// A planned change to one animal: the record before (empty when new), after
/// (empty when removed), and the problems that stop it.
struct AnimalChange {
    std::optional<AnimalRecord> before;
    std::optional<AnimalRecord> after;
    FieldProblems problems;
    bool ok() const { return problems.empty(); }
};

/// The animal with this id and its stays, if it exists.
std::optional<AnimalRecord> animalRecord(const Colony& colony, const std::string& id);

/// A founder or other new animal living in `group` from its first day (no stay when `group` is empty).
AnimalChange planNewAnimal(const Colony& colony, Animal a, const std::string& group, Day today);
/// An introduction: entry date and type `introduced`, living in `group` from that day.
AnimalChange planIntroduction(const Colony& colony, Animal a, const std::string& group, Day today);
/// A birth: entry on the birth day, type `born`, living in the group its mother was in that day.
AnimalChange planBirth(const Colony& colony, Animal newborn, Day today);
/// New values for an existing animal (found by uid; its id stays), keeping its
/// stays and encounters inside its life in the colony.
AnimalChange planAnimalEdit(const Colony& colony, const Animal& edited, Day today);
/// A death or removal on `date`: sets the exit and closes the open stay on that day.
AnimalChange planExit(const Colony& colony, const std::string& id, Day date, ExitType type, Day today);
/// A move on `date` to `group`: the current stay ends the day before, the new one starts that day.
AnimalChange planMove(const Colony& colony, const std::string& id, const std::string& group, Day date, Day today);

/// Writes `to` in place of `from` in one transaction (either may be empty);
/// used for the change itself and, with the states swapped, for its undo.
void writeAnimalChange(ColonyStore& store, const std::optional<AnimalRecord>& from, const std::optional<AnimalRecord>& to);
/// Writes a planned change if it has no problems; returns its problems.
FieldProblems commitAnimalChange(ColonyStore& store, const AnimalChange& change);

/// Removes `remove` (by uid) and inserts `insert` in one transaction. Records
/// to insert keep their seq and uid when set (restoring them on undo/redo);
/// otherwise they get the next seq and a new uid, written back.
void writeEncounterChange(ColonyStore& store, const std::vector<Encounter>& remove, std::vector<Encounter>& insert);
/// Checks (checkEncounter) and, if all pass, inserts encounters; returns the
/// problems of the first refused one (nothing written then).
FieldProblems insertEncounters(ColonyStore& store, std::vector<Encounter>& encounters, Day today);
/// Checks and writes new values for the encounter with `e.uid` (keeping its seq).
FieldProblems updateEncounter(ColonyStore& store, Encounter& e, Day today);
/// Deletes encounters by uid in one transaction; returns the records deleted.
std::vector<Encounter> deleteEncounters(ColonyStore& store, const std::vector<std::string>& uids);
/// The stored encounters with these uids, in seq order.
std::vector<Encounter> encountersByUid(const ColonyStore& store, const std::vector<std::string>& uids);

/// Codes non-empty and distinct, severities 0-5.
FieldProblems checkBehaviourCodes(const std::vector<ColonyStore::BehaviourCode>& codes);
/// Replaces the colony's behaviour code list (encounters keep their text).
void writeBehaviourCodes(ColonyStore& store, const std::vector<ColonyStore::BehaviourCode>& codes);
/// Names non-empty and distinct.
FieldProblems checkObservers(const std::vector<std::string>& names);
/// Replaces the colony's observer list (encounters keep their text).
void writeObservers(ColonyStore& store, const std::vector<std::string>& names);

} // namespace hierloom::core
