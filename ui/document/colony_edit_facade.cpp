// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/colony_edit_facade.h"

#include "core/base/csv_reader.h"
#include "core/store/saved_mappings.h"
#include "core/store/sheet_import.h"

#include "core/store/analysis_settings_store.h"

#include "core/research/species_profile.h"
#include "core/rules/encounter_rules.h"
#include "core/store/colony_backup.h"
#include "core/store/colony_edits.h"
#include "core/store/species_settings.h"
#include "core/store/stability_settings.h"
#include "ui/document/colony_document.h"
#include "ui/document/edit_commands.h"
#include "ui/document/qt_convert.h"
#include "ui/document/record_equality.h"

#include <QUndoStack>

#include <chrono>

namespace hierloom::ui {

ColonyEditFacade::ColonyEditFacade(ColonyDocument* document, QObject* parent) : QObject(parent), document_(document) {}

core::Day ColonyEditFacade::today() const { return today_ ? *today_ : core::today(); }

core::FieldProblems ColonyEditFacade::catchUp(bool* reread)
{
    try {
        const bool again = document_->catchUpWithFile();
        if (reread) *reread = again;
    } catch (const std::exception& error) {
        return {{"", error.what()}};
    }
    return {};
}

core::FieldProblems ColonyEditFacade::writable()
{
    if (!document_->isOpen()) return {{"", tr("No colony is open.").toStdString()}};
    if (auto p = catchUp(); !p.empty()) return p;
    if (document_->isReadOnly())
        return {{"", tr("The colony is open read-only; open it for writing to change it.").toStdString()}};
    return {};
}

core::FieldProblems ColonyEditFacade::push(ColonyCommand* command)
{
    core::FieldProblems problems;
    command->reportFirstFailureTo(&problems);
    // push() runs redo(), which writes; a command whose write failed made
    // itself obsolete and QUndoStack deletes it instead of keeping it.
    document_->undoStack()->push(command);
    return problems;
}

core::FieldProblems ColonyEditFacade::checkEncounter(core::Encounter& e) const
{
    return core::checkEncounter(e, document_->residences(), today());
}

core::FieldProblems ColonyEditFacade::pushEncounterChange(std::vector<core::Encounter> removed,
                                                          std::vector<core::Encounter>& inserted, const QString& text)
{
    auto* command = new EncounterChangeCommand(document_, std::move(removed), inserted, text);
    core::FieldProblems problems = push(command);
    if (problems.empty()) inserted = command->inserted(); // kept by the stack, now with seq and uid
    return problems;
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
    const core::EncounterRecords& cache = document_->encounters();
    const size_t at = cache.find(e.seq);
    std::optional<core::Encounter> held;
    if (at < cache.size()) held = cache.at(at);
    if (!held || held->uid != e.uid)
        return {{"uid", tr("This encounter is no longer in the file (another program may have deleted it); "
                           "nothing was changed.").toStdString()}};
    e.group.clear(); // re-derived from the residences of the (possibly new) animals
    if (auto p = checkEncounter(e); !p.empty()) return p;
    if (sameRecord(*held, e)) return {}; // nothing changed: nothing to write or undo
    std::vector<core::Encounter> one{e};
    return pushEncounterChange({*held}, one, tr("Edit encounter %1 over %2").arg(toQString(e.winner), toQString(e.loser)));
}

core::FieldProblems ColonyEditFacade::deleteEncounters(const std::vector<core::Encounter>& rows, const QString& text)
{
    if (auto p = writable(); !p.empty()) return p;
    if (rows.empty()) return {};
    // The rows as the file holds them now (another program may have changed or deleted them).
    std::vector<core::Encounter> now;
    const core::EncounterRecords& cache = document_->encounters();
    for (const core::Encounter& r : rows) {
        const size_t at = cache.find(r.seq);
        std::optional<core::Encounter> held;
        if (at < cache.size()) held = cache.at(at);
        if (!held || held->uid != r.uid)
            return {{"uid", tr("The encounter %1 over %2 is no longer in the file (another program may have deleted "
                               "it); nothing was deleted.").arg(toQString(r.winner), toQString(r.loser)).toStdString()}};
        now.push_back(std::move(*held));
    }
    std::vector<core::Encounter> none;
    return pushEncounterChange(std::move(now), none, text.isEmpty() ? (rows.size() == 1 ? tr("Delete 1 encounter") : tr("Delete %1 encounters").arg(rows.size())) : text);
}

core::FieldProblems ColonyEditFacade::pushAnimalChange(const core::AnimalChange& change, const QString& text)
{
    if (!change.ok()) return change.problems;
    if (sameRecord(change.before, change.after)) return {};
    return push(new AnimalChangeCommand(document_, change, text));
}

core::FieldProblems ColonyEditFacade::addAnimal(const core::Animal& a, const std::string& group)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planNewAnimal(document_->pedigree(), a, group, today()),
                            tr("Add animal %1").arg(toQString(a.id)));
}

core::FieldProblems ColonyEditFacade::introduceAnimal(const core::Animal& a, const std::string& group)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planIntroduction(document_->pedigree(), a, group, today()),
                            tr("Introduce %1 into %2").arg(toQString(a.id), toQString(group)));
}

core::FieldProblems ColonyEditFacade::recordBirth(const core::Animal& newborn)
{
    if (auto p = writable(); !p.empty()) return p;
    return pushAnimalChange(core::planBirth(document_->pedigree(), newborn, today()),
                            tr("Birth of %1 to %2").arg(toQString(newborn.id), toQString(newborn.mother)));
}

void ColonyEditFacade::holdGroupsOf(const std::string& id)
{
    // An animal's encounters are in the scopes of the groups it lived in; a
    // large file read group by group must hold them for the checks of its edit.
    if (document_->isComplete()) return;
    for (const core::Residence& r : document_->pedigree().residences)
        if (r.animal == id) document_->holdGroup(toQString(r.group));
}

core::FieldProblems ColonyEditFacade::editAnimal(const core::Animal& a)
{
    if (auto p = writable(); !p.empty()) return p;
    for (const core::Animal& old : document_->pedigree().animals)
        if (old.uid == a.uid || old.id == a.id) holdGroupsOf(old.id);
    return pushAnimalChange(core::planAnimalEdit(document_->colonyWithAnimal(a.id), a, today()), tr("Edit animal %1").arg(toQString(a.id)));
}

core::FieldProblems ColonyEditFacade::recordExit(const std::string& id, core::Day date, core::ExitType type)
{
    if (auto p = writable(); !p.empty()) return p;
    const QString what = type == core::ExitType::Died ? tr("Death of %1") : tr("Removal of %1");
    holdGroupsOf(id);
    return pushAnimalChange(core::planExit(document_->colonyWithAnimal(id), id, date, type, today()), what.arg(toQString(id)));
}

core::FieldProblems ColonyEditFacade::moveAnimal(const std::string& id, const std::string& group, core::Day date)
{
    if (auto p = writable(); !p.empty()) return p;
    holdGroupsOf(id);
    return pushAnimalChange(core::planMove(document_->colonyWithAnimal(id), id, group, date, today()),
                            tr("Move %1 to %2").arg(toQString(id), toQString(group)));
}

core::FieldProblems ColonyEditFacade::setBehaviourCodes(const std::vector<core::ColonyStore::BehaviourCode>& codes)
{
    if (auto p = writable(); !p.empty()) return p;
    if (auto p = core::checkBehaviourCodes(codes); !p.empty()) return p;
    auto before = document_->store()->behaviourCodes();
    if (sameRecords(before, codes)) return {};
    return push(new ListChangeCommand(document_, std::move(before), codes, tr("Edit behaviour codes")));
}

core::FieldProblems ColonyEditFacade::setObservers(const std::vector<std::string>& names)
{
    if (auto p = writable(); !p.empty()) return p;
    if (auto p = core::checkObservers(names); !p.empty()) return p;
    auto before = document_->store()->observers();
    if (before == names) return {};
    return push(new ListChangeCommand(document_, std::move(before), names, tr("Edit observers")));
}

core::FieldProblems ColonyEditFacade::setSettings(const core::SettingValues& values, const QString& text)
{
    if (auto p = writable(); !p.empty()) return p;
    core::SettingValues before = core::readSettingValues(*document_->store(), values);
    if (before == values) return {};
    return push(new SettingsChangeCommand(document_, std::move(before), values, text));
}

core::FieldProblems ColonyEditFacade::setStabilityThresholds(const core::StabilityThresholds& thresholds)
{
    if (auto p = writable(); !p.empty()) return p;
    const core::SettingValues values = core::stabilityThresholdValues(thresholds);
    // Thresholds equal to those in effect (stored or default) change nothing.
    if (core::stabilityThresholdValues(core::readStabilityThresholds(*document_->store())) == values) return {};
    return setSettings(values, tr("Change stability thresholds"));
}

core::FieldProblems ColonyEditFacade::setSpeciesSetting(const std::string& species, std::optional<int> gestationDays,
                                                        std::optional<int> maturityYears)
{
    if (auto p = writable(); !p.empty()) return p;
    core::SettingValues values;
    try {
        values = core::speciesSettingValues(species, gestationDays, maturityYears);
    } catch (const std::invalid_argument& error) {
        return {{"species", error.what()}};
    }
    // A setting that resolves to the species and figures in effect changes nothing.
    try {
        const core::SpeciesSettings now = core::readSpeciesSettings(*document_->store());
        const core::SpeciesSettings then = core::resolveSpeciesSettings(
            species, values[core::kGestationSettingKey].value_or(""), values[core::kMaturitySettingKey].value_or(""));
        if (now.species == then.species && now.gestationDays == then.gestationDays && now.maturityYears == then.maturityYears)
            return {};
    } catch (const std::invalid_argument&) {
        // The stored setting is not valid: writing a valid one is a change.
    }
    return setSettings(values, tr("Set species %1").arg(toQString(species)));
}

core::FieldProblems ColonyEditFacade::setAnalysisSettings(const core::AnalysisSettings& settings)
{
    if (auto p = writable(); !p.empty()) return p;
    core::SettingValues values;
    try {
        values = core::analysisSettingValues(*document_->store(), settings);
    } catch (const std::invalid_argument& error) {
        return {{"settings", error.what()}};
    }
    // Settings equal to those in effect (stored or default) change nothing.
    if (core::readAnalysisSettings(*document_->store()) == settings) return {};
    return setSettings(values, tr("Change analysis settings"));
}

core::FieldProblems ColonyEditFacade::saveScenario(const std::string& name, const std::string& text)
{
    if (name.empty()) return {{"name", tr("A saved scenario needs a name.").toStdString()}};
    return setSettings(core::savedScenarioValue(name, text), tr("Save scenario %1").arg(toQString(name)));
}

core::FieldProblems ColonyEditFacade::deleteScenario(const std::string& name)
{
    if (name.empty()) return {{"name", tr("A saved scenario needs a name.").toStdString()}};
    return setSettings(core::savedScenarioValue(name, std::nullopt), tr("Delete scenario %1").arg(toQString(name)));
}

core::ImportResult ColonyEditFacade::importFiles(const core::ImportPaths& paths, QString* readBackError)
{
    core::ImportResult result;
    if (auto p = writable(); !p.empty()) {
        result.problems.add("", 0, "", p.front().message);
        return result;
    }
    result = core::importFiles(document_->writableStore(), paths, today());
    if (!result.ok() || result.animals + result.residences + result.encounters == 0) return result;
    document_->clearHistory(tr("an import added records outside the undo history"));
    try {
        document_->reload();
    } catch (const core::ColonyFileError& error) {
        if (readBackError) *readBackError = toQString(error.what());
    }
    return result;
}

core::ImportResult ColonyEditFacade::importSheet(const core::ImportMapping& mapping, const QString& sheetPath,
                                                 QString* readBackError, bool saveMapping)
{
    core::ImportResult result;
    if (auto p = writable(); !p.empty()) {
        result.problems.add("", 0, "", p.front().message);
        return result;
    }
    if (saveMapping && mapping.name.empty()) {
        result.problems.add("", 0, "", tr("A saved mapping needs a name.").toStdString());
        return result;
    }
    core::SheetImportRequest request;
    request.mapping = mapping;
    request.sheet.name = toStdString(sheetPath);
    try {
        request.sheet.text = core::readWholeFile(request.sheet.name);
    } catch (const std::exception&) {
        result.problems.add(request.sheet.name, 0, "", "cannot be read (no such file, or no permission to read it)");
        return result;
    }
    if (saveMapping) request.save = core::MappingToSave{mapping.name, core::writeMappingFile(mapping)};
    result = core::importSheet(document_->writableStore(), request, today());
    if (!result.ok()) return result;
    // The saved mapping, like the records, is outside the undo history.
    if (result.animals + result.residences + result.encounters == 0 && !saveMapping) return result;
    document_->clearHistory(tr("an import added records outside the undo history"));
    try {
        document_->reload();
    } catch (const core::ColonyFileError& error) {
        if (readBackError) *readBackError = toQString(error.what());
    }
    return result;
}

core::FieldProblems ColonyEditFacade::saveMapping(const core::ImportMapping& mapping)
{
    if (mapping.name.empty()) return {{"name", tr("A saved mapping needs a name.").toStdString()}};
    return setSettings({{core::kMappingKeyPrefix + mapping.name, core::writeMappingFile(mapping)}},
                       tr("Save import mapping %1").arg(toQString(mapping.name)));
}

core::MergeReport ColonyEditFacade::checkMerge(const QString& otherPath)
{
    if (auto p = writable(); !p.empty()) throw std::runtime_error(p.front().message);
    const core::ColonyStore other = core::ColonyStore::open(toStdString(otherPath), core::ColonyStore::Mode::ReadOnly);
    core::MergeOptions options;
    options.dryRun = true;
    options.today = today();
    return core::mergeColonies(document_->writableStore(), other, options);
}

core::MergeReport ColonyEditFacade::merge(const QString& otherPath, core::MergePreference preference)
{
    if (auto p = writable(); !p.empty()) throw std::runtime_error(p.front().message);
    const core::ColonyStore other = core::ColonyStore::open(toStdString(otherPath), core::ColonyStore::Mode::ReadOnly);
    core::MergeOptions options; // a merge that changes the file takes a backup first
    options.prefer = preference;
    options.today = today();
    core::MergeReport report = core::mergeColonies(document_->writableStore(), other, options);
    if (report.written) {
        document_->clearHistory(tr("a merge added records outside the undo history"));
        document_->reload();
    }
    return report;
}

QString ColonyEditFacade::restoreBackup(const QString& backupPath)
{
    if (auto p = writable(); !p.empty()) return toQString(p.front().message);
    const QString path = document_->path();
    document_->clearHistory(tr("the colony was restored from a backup"));
    // Closed while the backup is copied in, so no cached record outlives the restore.
    document_->close();
    QString failure;
    try {
        core::restoreBackup(toStdString(backupPath), toStdString(path), std::chrono::system_clock::now());
    } catch (const std::exception& error) {
        failure = QString::fromUtf8(error.what());
    }
    document_->open(path);
    return failure;
}

void ColonyEditFacade::restoreDamagedFile(const QString& backupPath, const QString& colonyPath)
{
    core::restoreBackup(toStdString(backupPath), toStdString(colonyPath), std::chrono::system_clock::now());
}

} // namespace hierloom::ui
