// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_store.h"

#include <QUndoCommand>

#include <optional>
#include <vector>

namespace hierloom::ui {

class ColonyDocument;

/// Base of the edit commands: the first redo() is skipped because the facade
/// already wrote the change (so a failed write is reported before anything is
/// pushed); later redo()/undo() write through core/ and refresh the document
/// once. A write that fails then is reported through the document's owner
/// (ColonyDocument::writeFailed) and the cache is re-read from the file.
class ColonyCommand : public QUndoCommand {
public:
    ColonyCommand(ColonyDocument* document, const QString& text);
    void redo() final;
    void undo() final;

protected:
    virtual void apply(bool forward) = 0;
    ColonyDocument* document_;

private:
    void run(bool forward);
    bool done_ = true;
};

/// Removes and inserts encounters (an entry, an edit, a delete, a whole session).
class EncounterChangeCommand : public ColonyCommand {
public:
    EncounterChangeCommand(ColonyDocument* document, std::vector<core::Encounter> removed,
                           std::vector<core::Encounter> inserted, const QString& text);
    /// Performs the change the first time; throws on a failed write.
    static void write(ColonyDocument* document, const std::vector<core::Encounter>& removed,
                      std::vector<core::Encounter>& inserted);

protected:
    void apply(bool forward) override;

private:
    std::vector<core::Encounter> removed_;
    std::vector<core::Encounter> inserted_;
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

} // namespace hierloom::ui
