// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"
#include "core/planning/stability_watch.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_import.h"
#include "core/store/import_mapping.h"
#include "core/store/colony_merge.h"
#include "core/store/colony_store.h"
#include "core/ranks/analysis_settings.h"
#include "core/store/setting_values.h"

#include <QObject>
#include <QString>

#include <optional>
#include <string>
#include <vector>

namespace hierloom::ui {

class ColonyDocument;
class ColonyCommand;

/// The one writer of the desktop: every change to the open colony file goes
/// through here. An edit is checked under the import's rules
/// (core/rules/encounter_rules.h, core/rules/animal_rules.h,
/// core/store/colony_edits.h) and pushed on the document's QUndoStack as a
/// command whose redo() writes it in one transaction; an edit that changes
/// nothing is dropped (nothing written, nothing pushed). Each function
/// returns the problems that stopped it (nothing written then), or nothing.
/// Writes that cannot be undone (an import, a merge, a restore) are done
/// here too and then clear the undo history, saying why.
class ColonyEditFacade : public QObject {
    Q_OBJECT
public:
    explicit ColonyEditFacade(ColonyDocument* document, QObject* parent = nullptr);

    ColonyDocument* document() const { return document_; }
    /// The day after which dates count as in the future (default: the system's today).
    core::Day today() const;
    void setToday(core::Day day) { today_ = day; }

    /// Re-reads the file when another program wrote to it (ColonyDocument::
    /// catchUpWithFile, which empties the undo history with a message); every
    /// write below does this first and then checks and applies the edit to the
    /// file as it is now. Call it before preparing an edit from the cache (the
    /// entry's duplicate check). Problems when the file cannot be read again;
    /// `reread` (if given) says whether it was read again.
    core::FieldProblems catchUp(bool* reread = nullptr);

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

    /// Sets key-value settings (a missing value removes the key) as one undoable step.
    core::FieldProblems setSettings(const core::SettingValues& values, const QString& text);
    /// Stores the stability watch's thresholds; unchanged thresholds write nothing.
    core::FieldProblems setStabilityThresholds(const core::StabilityThresholds& thresholds);
    /// Stores the species and its overrides (empty: the species default applies).
    core::FieldProblems setSpeciesSetting(const std::string& species, std::optional<int> gestationDays,
                                          std::optional<int> maturityYears);
    /// Stores the analysis settings (Elo k, start, curve, draws, maturity, window);
    /// settings equal to those in effect write nothing.
    core::FieldProblems setAnalysisSettings(const core::AnalysisSettings& settings);
    /// Saves (or replaces) a named what-if scenario's text.
    core::FieldProblems saveScenario(const std::string& name, const std::string& text);
    /// Deletes a saved scenario; nothing happens when there is none of that name.
    core::FieldProblems deleteScenario(const std::string& name);

    /// Imports CSV files (all or nothing). Throws core::ColonyFileError when
    /// the file cannot be written. When records were added the undo history
    /// is cleared and the records re-read; a failure to read them back is put
    /// in `readBackError`.
    core::ImportResult importFiles(const core::ImportPaths& paths, QString* readBackError = nullptr);
    /// Imports a team's spreadsheet through an import mapping (core/store/sheet_import.h),
    /// all or nothing, like importFiles. With `saveMapping` the mapping is saved
    /// under its name in the same transaction: a failed import saves nothing,
    /// a failed save imports nothing.
    core::ImportResult importSheet(const core::ImportMapping& mapping, const QString& sheetPath,
                                   QString* readBackError = nullptr, bool saveMapping = false);
    /// Saves (or replaces) a named import mapping in the colony file (undoable).
    core::FieldProblems saveMapping(const core::ImportMapping& mapping);
    /// Checks a merge of another colony file without writing (throws when a file cannot be read).
    core::MergeReport checkMerge(const QString& otherPath);
    /// Merges another colony file (all or nothing; report.written says
    /// whether it wrote); after a merge the undo history is cleared.
    core::MergeReport merge(const QString& otherPath, core::MergePreference preference);
    /// Puts a backup back over the open colony file (which is backed up
    /// first by core) and re-opens it, clearing the undo history. Returns the
    /// restore's error, empty when restored; throws when re-opening fails.
    QString restoreBackup(const QString& backupPath);
    /// Puts a backup over a colony file that could not be opened (damaged or
    /// not a colony file); the open colony is not touched. Throws on failure.
    void restoreDamagedFile(const QString& backupPath, const QString& colonyPath);

private:
    /// Reads the groups `id` lived in when a large file is not read whole (holdGroup).
    void holdGroupsOf(const std::string& id);
    /// Catches up with the file, then refuses a closed or read-only colony.
    core::FieldProblems writable();
    /// Pushes a command, whose first redo() writes; the problems of a failed write.
    core::FieldProblems push(ColonyCommand* command);
    core::FieldProblems pushEncounterChange(std::vector<core::Encounter> removed, std::vector<core::Encounter>& inserted,
                                            const QString& text);
    core::FieldProblems pushAnimalChange(const core::AnimalChange& change, const QString& text);

    ColonyDocument* document_;
    std::optional<core::Day> today_;
};

} // namespace hierloom::ui
