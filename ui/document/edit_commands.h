// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_store.h"
#include "core/store/setting_values.h"
#include "ui/document/colony_document.h"

#include <QUndoCommand>

#include <vector>

namespace hierloom::ui {

/// Base of the edit commands: redo() performs the change and undo() reverses
/// it, each a write through core/ followed by one update of the document.
/// The facade pushes a command, so its first redo() is the edit itself: when
/// that write fails the problem goes to the facade's caller and the command
/// marks itself obsolete, which makes QUndoStack drop it. A later redo() or
/// undo() that fails is reported through ColonyDocument::writeFailed. Either
/// way the cache is re-read from the file, which each transaction left whole.
class ColonyCommand : public QUndoCommand {
public:
    ColonyCommand(ColonyDocument* document, const QString& text);
    void redo() final;
    void undo() final;
    /// Where the first redo() puts a failure (instead of writeFailed).
    void reportFirstFailureTo(core::FieldProblems* problems) { firstFailure_ = problems; }

protected:
    virtual void apply(bool forward) = 0;
    // The document's writer side, open to the commands through this base.
    core::ColonyStore& store() { return document_->writableStore(); }
    void applyEncounterChange(const std::vector<core::Encounter>& removed, const std::vector<core::Encounter>& inserted)
    {
        document_->applyEncounterChange(removed, inserted);
    }
    void reloadAnimals() { document_->reloadAnimals(); }
    void announce(ColonyDocument::ChangeKind kind) { document_->announce(kind); }

private:
    void run(bool forward);

    ColonyDocument* document_;
    core::FieldProblems* firstFailure_ = nullptr;
    bool done_ = false; ///< the first redo() (the edit itself) has run
};

/// Removes and inserts encounters (an entry, an edit, a delete, a whole session).
class EncounterChangeCommand : public ColonyCommand {
public:
    EncounterChangeCommand(ColonyDocument* document, std::vector<core::Encounter> removed,
                           std::vector<core::Encounter> inserted, const QString& text);
    /// The inserted records; after the first redo() with their seq and uid.
    const std::vector<core::Encounter>& inserted() const { return inserted_; }

protected:
    void apply(bool forward) override;

private:
    using Names = std::vector<std::string>;
    std::vector<core::Encounter> removed_;
    std::vector<core::Encounter> inserted_;
    bool observersKnown_ = false; // set by the first redo()
    Names observersBefore_, observersAfter_;
};

/// Replaces one animal's record and stays (add, edit, birth, exit, introduction, move).
class AnimalChangeCommand : public ColonyCommand {
public:
    AnimalChangeCommand(ColonyDocument* document, core::AnimalChange change, const QString& text);

protected:
    void apply(bool forward) override;

private:
    core::AnimalChange change_;
};

/// Replaces the behaviour code list or the observer list.
class ListChangeCommand : public ColonyCommand {
public:
    using Codes = std::vector<core::ColonyStore::BehaviourCode>;
    using Names = std::vector<std::string>;
    ListChangeCommand(ColonyDocument* document, Codes before, Codes after, const QString& text);
    ListChangeCommand(ColonyDocument* document, Names before, Names after, const QString& text);

protected:
    void apply(bool forward) override;

private:
    bool codes_;
    Codes codesBefore_, codesAfter_;
    Names namesBefore_, namesAfter_;
};

/// Sets some key-value settings (thresholds, species, a saved scenario...),
/// restoring their earlier values, or their absence, on undo.
class SettingsChangeCommand : public ColonyCommand {
public:
    SettingsChangeCommand(ColonyDocument* document, core::SettingValues before, core::SettingValues after,
                          const QString& text);

protected:
    void apply(bool forward) override;

private:
    core::SettingValues before_, after_;
};

} // namespace hierloom::ui
