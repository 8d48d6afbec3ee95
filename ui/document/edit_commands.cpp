// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/edit_commands.h"

#include <utility>

namespace hierloom::ui {

ColonyCommand::ColonyCommand(ColonyDocument* document, const QString& text) : QUndoCommand(text), document_(document) {}

void ColonyCommand::redo()
{
    run(true);
    // The first redo() is the edit; later ones are the person's Redo.
    if (std::exchange(done_, true)) emit document_->historyStepped(false, text());
}

void ColonyCommand::undo()
{
    run(false);
    emit document_->historyStepped(true, text());
}

void ColonyCommand::run(bool forward)
{
    core::FieldProblems* first = std::exchange(firstFailure_, nullptr);
    if (!first && document_->writtenElsewhere()) {
        // Another program wrote since the file was read: the records this step
        // remembers may be gone or changed, so it writes nothing. Once the
        // stack is done, the document re-reads the file and empties the history.
        document_->catchUpLater();
        return;
    }
    try {
        apply(forward);
    } catch (const std::exception& error) {
        // The file is whole (each write is one transaction); show what it holds.
        // No exception may leave redo()/undo() through QUndoStack, so a file
        // that cannot be read either keeps the cache and the message below says why.
        try {
            if (document_->writtenElsewhere()) document_->catchUpLater(); // the history goes too
            else document_->reload();
        } catch (const std::exception&) {
        }
        if (first) {
            first->push_back({"", error.what()});
            setObsolete(true); // never written, so nothing to undo: QUndoStack::push drops it
        } else {
            emit document_->writeFailed(QString::fromUtf8(error.what()));
        }
    }
}

EncounterChangeCommand::EncounterChangeCommand(ColonyDocument* document, std::vector<core::Encounter> removed,
                                               std::vector<core::Encounter> inserted, const QString& text)
    : ColonyCommand(document, text), removed_(std::move(removed)), inserted_(std::move(inserted))
{
}

void EncounterChangeCommand::apply(bool forward)
{
    // The first write gives the inserted records their seq and uid; later
    // redos write them with the same, so later commands still find them.
    std::vector<core::Encounter> in = forward ? inserted_ : removed_;
    const std::vector<core::Encounter>& out = forward ? removed_ : inserted_;
    // Writing an encounter adds its observer to the observer list; later
    // undos and redos put the list back as it was on their side of the command.
    const bool first = !observersKnown_;
    if (first) observersBefore_ = store().observers();
    core::writeEncounterChange(store(), out, in);
    if (first) {
        observersAfter_ = store().observers();
        observersKnown_ = true;
    } else if (const Names& list = forward ? observersAfter_ : observersBefore_; store().observers() != list) {
        core::writeObservers(store(), list);
    }
    if (forward) inserted_ = in;
    applyEncounterChange(out, in);
}

AnimalChangeCommand::AnimalChangeCommand(ColonyDocument* document, core::AnimalChange change, const QString& text)
    : ColonyCommand(document, text), change_(std::move(change))
{
}

void AnimalChangeCommand::apply(bool forward)
{
    if (forward) core::writeAnimalChange(store(), change_.before, change_.after);
    else core::writeAnimalChange(store(), change_.after, change_.before);
    reloadAnimals();
}

ListChangeCommand::ListChangeCommand(ColonyDocument* document, Codes before, Codes after, const QString& text)
    : ColonyCommand(document, text), codes_(true), codesBefore_(std::move(before)), codesAfter_(std::move(after))
{
}

ListChangeCommand::ListChangeCommand(ColonyDocument* document, Names before, Names after, const QString& text)
    : ColonyCommand(document, text), codes_(false), namesBefore_(std::move(before)), namesAfter_(std::move(after))
{
}

void ListChangeCommand::apply(bool forward)
{
    if (codes_) core::writeBehaviourCodes(store(), forward ? codesAfter_ : codesBefore_);
    else core::writeObservers(store(), forward ? namesAfter_ : namesBefore_);
    announce(ColonyDocument::ChangeKind::ListsChanged);
}

SettingsChangeCommand::SettingsChangeCommand(ColonyDocument* document, core::SettingValues before,
                                             core::SettingValues after, const QString& text)
    : ColonyCommand(document, text), before_(std::move(before)), after_(std::move(after))
{
}

void SettingsChangeCommand::apply(bool forward)
{
    core::writeSettingValues(store(), forward ? after_ : before_);
    announce(ColonyDocument::ChangeKind::SettingsChanged);
}

} // namespace hierloom::ui
