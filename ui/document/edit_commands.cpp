// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/edit_commands.h"

#include "ui/document/colony_document.h"

namespace hierloom::ui {

ColonyCommand::ColonyCommand(ColonyDocument* document, const QString& text) : QUndoCommand(text), document_(document) {}

void ColonyCommand::redo()
{
    if (done_) {
        done_ = false;
        return;
    }
    run(true);
}

void ColonyCommand::undo() { run(false); }

void ColonyCommand::run(bool forward)
{
    try {
        apply(forward);
    } catch (const std::exception& error) {
        // The file is whole (each write is one transaction); show what it holds.
        document_->reload();
        emit document_->writeFailed(QString::fromUtf8(error.what()));
    }
}

EncounterChangeCommand::EncounterChangeCommand(ColonyDocument* document, std::vector<core::Encounter> removed,
                                               std::vector<core::Encounter> inserted, const QString& text)
    : ColonyCommand(document, text), removed_(std::move(removed)), inserted_(std::move(inserted))
{
}

void EncounterChangeCommand::write(ColonyDocument* document, const std::vector<core::Encounter>& removed,
                                   std::vector<core::Encounter>& inserted)
{
    core::writeEncounterChange(*document->store(), removed, inserted);
    document->applyEncounterChange(removed, inserted);
}

void EncounterChangeCommand::apply(bool forward)
{
    // The records keep the seq and uid they got the first time, so a redo
    // restores them exactly and later commands still find them.
    std::vector<core::Encounter> in = forward ? inserted_ : removed_;
    write(document_, forward ? removed_ : inserted_, in);
}

AnimalChangeCommand::AnimalChangeCommand(ColonyDocument* document, core::AnimalChange change, const QString& text)
    : ColonyCommand(document, text), change_(std::move(change))
{
}

void AnimalChangeCommand::apply(bool forward)
{
    if (forward) core::writeAnimalChange(*document_->store(), change_.before, change_.after);
    else core::writeAnimalChange(*document_->store(), change_.after, change_.before);
    document_->reloadAnimals();
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
    if (codes_) core::writeBehaviourCodes(*document_->store(), forward ? codesAfter_ : codesBefore_);
    else core::writeObservers(*document_->store(), forward ? namesAfter_ : namesBefore_);
    document_->listsChanged();
}

} // namespace hierloom::ui
