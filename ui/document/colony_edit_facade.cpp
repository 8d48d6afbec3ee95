// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/colony_edit_facade.h"

#include "core/store/colony_edits.h"
#include "core/rules/encounter_rules.h"
#include "ui/document/colony_document.h"
#include "ui/document/edit_commands.h"
#include "ui/document/qt_convert.h"

#include <QUndoStack>

namespace hierloom::ui {

ColonyEditFacade::ColonyEditFacade(ColonyDocument* document, QObject* parent) : QObject(parent), document_(document) {}

core::Day ColonyEditFacade::today() const { return today_ ? *today_ : core::today(); }

core::FieldProblems ColonyEditFacade::writable() const
{
    if (!document_->isOpen()) return {{"", tr("No colony is open.").toStdString()}};
    if (document_->isReadOnly())
        return {{"", tr("The colony is open read-only; open it for writing to change it.").toStdString()}};
    return {};
}

core::FieldProblems ColonyEditFacade::checkEncounter(core::Encounter& e) const
{
    return core::checkEncounter(e, document_->residences(), today());
}

core::FieldProblems ColonyEditFacade::pushEncounterChange(std::vector<core::Encounter> removed,
                                                          std::vector<core::Encounter>& inserted, const QString& text)
{
    try {
        EncounterChangeCommand::write(document_, removed, inserted);
    } catch (const std::exception& error) {
        document_->reload();
        return {{"", error.what()}};
    }
    document_->undoStack()->push(new EncounterChangeCommand(document_, std::move(removed), inserted, text));
    return {};
}

core::FieldProblems ColonyEditFacade::addEncounter(core::Encounter& e)
{
    if (auto p = writable(); !p.empty()) return p;
    e.seq = 0;
    e.uid.clear();
    if (auto p = checkEncounter(e); !p.empty()) return p;
    std::vector<core::Encounter> one{e};
    auto p = pushEncounterChange({}, one,
                                 tr("Enter %1 over %2").arg(toQString(e.winner), toQString(e.loser)));
    if (p.empty()) e = one.front();
    return p;
}

core::FieldProblems ColonyEditFacade::editEncounter(core::Encounter e)
{
    if (auto p = writable(); !p.empty()) return p;
    const auto& cache = document_->colony().encounters;
    auto it = std::lower_bound(cache.begin(), cache.end(), e.seq,
                               [](const core::Encounter& x, std::int64_t seq) { return x.seq < seq; });
    if (it == cache.end() || it->uid != e.uid) return {{"uid", "'" + e.uid + "' is not an encounter of the colony"}};
    e.group.clear(); // re-derived from the residences of the (possibly new) animals
    if (auto p = checkEncounter(e); !p.empty()) return p;
    std::vector<core::Encounter> one{e};
    return pushEncounterChange({*it}, one, tr("Edit encounter %1 over %2").arg(toQString(e.winner), toQString(e.loser)));
}

core::FieldProblems ColonyEditFacade::deleteEncounters(const std::vector<core::Encounter>& rows, const QString& text)
{
    if (auto p = writable(); !p.empty()) return p;
    if (rows.empty()) return {};
    std::vector<core::Encounter> none;
    return pushEncounterChange(rows, none, text.isEmpty() ? (rows.size() == 1 ? tr("Delete 1 encounter") : tr("Delete %1 encounters").arg(rows.size())) : text);
}

core::FieldProblems ColonyEditFacade::pushAnimalChange(const core::AnimalChange& change, const QString& text)
{
    if (!change.ok()) return change.problems;
    try {
        core::writeAnimalChange(*document_->store(), change.before, change.after);
    } catch (const std::exception& error) {
        document_->reload();
        return {{"", error.what()}};
    }
    document_->reloadAnimals();
    document_->undoStack()->push(new AnimalChangeCommand(document_, change, text));
    return {};
}

core::FieldProblems ColonyEditFacade::addAnimal(const core::Animal& a, const std::string& group)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planNewAnimal(document_->colony(), a, group, today()),
                            tr("Add animal %1").arg(toQString(a.id)));
}

core::FieldProblems ColonyEditFacade::introduceAnimal(const core::Animal& a, const std::string& group)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planIntroduction(document_->colony(), a, group, today()),
                            tr("Introduce %1 into %2").arg(toQString(a.id), toQString(group)));
}

core::FieldProblems ColonyEditFacade::recordBirth(const core::Animal& newborn)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planBirth(document_->colony(), newborn, today()),
                            tr("Birth of %1 to %2").arg(toQString(newborn.id), toQString(newborn.mother)));
}

core::FieldProblems ColonyEditFacade::editAnimal(const core::Animal& a)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planAnimalEdit(document_->colony(), a, today()), tr("Edit animal %1").arg(toQString(a.id)));
}

core::FieldProblems ColonyEditFacade::recordExit(const std::string& id, core::Day date, core::ExitType type)
{
    if (auto p = writable(); !p.empty()) return p;
    const QString what = type == core::ExitType::Died ? tr("Death of %1") : tr("Removal of %1");
    return pushAnimalChange(core::planExit(document_->colony(), id, date, type, today()), what.arg(toQString(id)));
}

core::FieldProblems ColonyEditFacade::moveAnimal(const std::string& id, const std::string& group, core::Day date)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planMove(document_->colony(), id, group, date, today()),
                            tr("Move %1 to %2").arg(toQString(id), toQString(group)));
}

core::FieldProblems ColonyEditFacade::setBehaviourCodes(const std::vector<core::ColonyStore::BehaviourCode>& codes)
{
    if (auto p = writable(); !p.empty()) return p;
    if (auto p = core::checkBehaviourCodes(codes); !p.empty()) return p;
    auto before = document_->store()->behaviourCodes();
    try {
        core::writeBehaviourCodes(*document_->store(), codes);
    } catch (const std::exception& error) {
        return {{"", error.what()}};
    }
    document_->listsChanged();
    document_->undoStack()->push(new ListChangeCommand(document_, std::move(before), codes, tr("Edit behaviour codes")));
    return {};
}

core::FieldProblems ColonyEditFacade::setObservers(const std::vector<std::string>& names)
{
    if (auto p = writable(); !p.empty()) return p;
    if (auto p = core::checkObservers(names); !p.empty()) return p;
    auto before = document_->store()->observers();
    try {
        core::writeObservers(*document_->store(), names);
    } catch (const std::exception& error) {
        return {{"", error.what()}};
    }
    document_->listsChanged();
    document_->undoStack()->push(new ListChangeCommand(document_, std::move(before), names, tr("Edit observers")));
    return {};
}

} // namespace hierloom::ui
