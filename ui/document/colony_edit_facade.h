// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/colony_store.h"
#include "core/store/colony_edits.h"
#include "core/base/field_problem.h"

#include <QObject>
#include <QString>

#include <string>
#include <vector>

namespace hierloom::ui {

class ColonyDocument;

/// The one place the desktop writes to a colony: each function checks the
/// change under the import's rules (core/rules/encounter_rules.h,
/// core/rules/animal_rules.h, core/store/colony_edits.h), writes it in one transaction
/// and pushes an undo command on the document's QUndoStack. Returns the
/// problems that stopped it (nothing written then), or nothing.
class ColonyEditFacade : public QObject {
    Q_OBJECT
public:
    explicit ColonyEditFacade(ColonyDocument* document, QObject* parent = nullptr);

    ColonyDocument* document() const { return document_; }
    /// The day after which dates count as in the future (default: the system's today).
    core::Day today() const;
    void setToday(core::Day day) { today_ = day; }

    /// Checks an encounter as addEncounter would, without writing; fills its group.
    core::FieldProblems checkEncounter(core::Encounter& e) const;
    /// Adds one encounter; on success `e` carries its seq and uid.
    core::FieldProblems addEncounter(core::Encounter& e);
    /// Replaces the encounter with `e.uid` by `e` (keeping its place in entry order).
    core::FieldProblems editEncounter(core::Encounter e);
    /// Deletes these encounters (as held in the document) as one undoable step.
    core::FieldProblems deleteEncounters(const std::vector<core::Encounter>& rows, const QString& text = {});

    core::FieldProblems addAnimal(const core::Animal& a, const std::string& group);
    core::FieldProblems introduceAnimal(const core::Animal& a, const std::string& group);
    core::FieldProblems recordBirth(const core::Animal& newborn);
    core::FieldProblems editAnimal(const core::Animal& a);
    core::FieldProblems recordExit(const std::string& id, core::Day date, core::ExitType type);
    core::FieldProblems moveAnimal(const std::string& id, const std::string& group, core::Day date);

    core::FieldProblems setBehaviourCodes(const std::vector<core::ColonyStore::BehaviourCode>& codes);
    core::FieldProblems setObservers(const std::vector<std::string>& names);

private:
    core::FieldProblems writable() const;
    core::FieldProblems pushEncounterChange(std::vector<core::Encounter> removed, std::vector<core::Encounter>& inserted,
                                            const QString& text);
    core::FieldProblems pushAnimalChange(const core::AnimalChange& change, const QString& text);

    ColonyDocument* document_;
    std::optional<core::Day> today_;
};

} // namespace hierloom::ui
