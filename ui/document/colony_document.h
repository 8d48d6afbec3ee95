// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/encounter_records.h"
#include "core/store/colony_store.h"
#include "core/base/residence_index.h"

#include <QObject>
#include <QString>

#include <algorithm>
#include <cstdint>
#include <memory>
#include <optional>
#include <string_view>
#include <vector>

class QUndoStack;

namespace hierloom::ui {

class BackgroundEncounterLoad;
class ColonyEditFacade;
class ColonyCommand;

/// The one open colony file and a cached copy of its records. Models and
/// views read the cache (and the file through the const store()) and listen
/// to changed(kind). The cache holds the animals and residences as a
/// core::Colony (pedigree(), whose encounters are always empty) and the
/// encounters compactly (encounters(), core/base/encounter_records.h).
///
/// A file of many encounters (progressiveFrom()) opens in steps: the animals,
/// residences and the encounters of one group first, so the first view shows
/// at once, then every encounter on a thread of its own (loadProgress,
/// loadFinished). Until then the cache holds the encounters of the groups
/// asked for (holdGroup) and of this window's own edits, and isComplete() is
/// false; views that need every group wait for loadFinished. Above
/// readEverythingUpTo() encounters (a centre whose records would not fit the
/// memory aim) nothing more is read by itself: the cache keeps the groups in
/// use (the last heldGroupLimit() asked for) until readEverything() is called. Only the edit facade and its undo commands
/// (colony_edit_facade.h, edit_commands.h) may write to the file: they alone
/// see the writable store. Errors are thrown as core::ColonyFileError.
class ColonyDocument : public QObject {
    Q_OBJECT
public:
    /// What a change was about, so a listener may update only what changed.
    enum class ChangeKind {
        Reset,              ///< another file, a close, an import, a merge, a restore: re-read everything
        EncountersAppended, ///< encounters added after the last one (Change::firstAppended)
        EncountersChanged,  ///< encounters edited, deleted or inserted elsewhere
        AnimalsChanged,     ///< animals or residences; encounters unchanged
        ListsChanged,       ///< the behaviour code or observer lists
        SettingsChanged,    ///< key-value settings (thresholds, species, saved scenarios...)
    };
    Q_ENUM(ChangeKind)

    explicit ColonyDocument(QObject* parent = nullptr);
    ~ColonyDocument() override;

    /// Opens an existing colony file; the current one stays open if this throws.
    void open(const QString& path, bool readOnly = false);
    /// Creates a new, empty colony file and opens it for writing.
    void create(const QString& path);
    void close();
    /// Re-reads every record from the file (after a failed write, or when another program wrote to it).
    void reload();

    /// True when the cache holds every encounter of the file (always, below progressiveFrom()).
    bool isComplete() const { return complete_; }
    /// True while the background load runs (it stops when it finished, failed or the file was closed).
    bool isLoading() const { return loader_ != nullptr; }
    /// True when the cache holds every encounter of `group`'s scope (always once complete).
    bool holdsGroup(const std::string& group) const;
    /// Makes sure the cache holds the encounters of `group` (read through the
    /// encounter_by_group index when the file is still loading; an
    /// EncountersChanged follows). Views call it when they turn to a group;
    /// true when it read the group and announced the change (which has
    /// recomputed a view on screen, or marked a hidden one stale, already).
    bool holdGroup(const QString& group);
    /// Shows `group` in every view that has a group choice: holdGroup(group),
    /// then groupShown(group). The one "go to this group" of the desktop
    /// (the centre overview, the first group of a large file).
    void showGroup(const QString& group);
    /// The encounters in the file: the cache's count once complete, else asked of the file.
    std::int64_t encountersInFile() const;
    /// Waits (running the event loop) until the background load has finished or failed.
    void finishLoading();
    /// Files with at least this many encounters open in steps (default 300,000).
    void setProgressiveFrom(std::int64_t encounters) { progressiveFrom_ = encounters; }
    std::int64_t progressiveFrom() const { return progressiveFrom_; }
    /// Files with at most this many encounters are read whole in the background
    /// after the first group (default 1,000,000, about 330 MiB of records);
    /// larger ones keep only the groups in use until readEverything().
    void setReadEverythingUpTo(std::int64_t encounters) { readEverythingUpTo_ = encounters; }
    std::int64_t readEverythingUpTo() const { return readEverythingUpTo_; }
    /// How many groups a cache that is not complete keeps (default 4); the
    /// least recently asked for is dropped first, never this window's new rows.
    void setHeldGroupLimit(std::size_t groups) { heldGroupLimit_ = std::max<std::size_t>(groups, 1); }
    std::size_t heldGroupLimit() const { return heldGroupLimit_; }
    /// Starts reading every encounter in the background (progress as on
    /// opening); nothing when complete or already loading.
    void readEverything();
    /// The groups a cache that is not complete holds, least recently asked for first.
    const std::vector<std::string>& heldGroups() const { return heldGroups_; }

    /// True when another program (any other connection: the command line, a
    /// second window) has written to the file since this document last read
    /// it; this document's own writes never count (`PRAGMA data_version`).
    bool writtenElsewhere() const;
    /// When another program wrote to the file: empties the undo history (its
    /// commands remember records as they were), re-reads the file and emits
    /// changedOutside(message); true then. Runs before every write of the
    /// facade, before Undo and Redo, and when the main window is activated.
    /// Throws core::ColonyFileError when the file cannot be read again (the
    /// history is emptied all the same). Never call it from inside an undo command.
    bool catchUpWithFile();
    /// Undoes / redoes one step after catching up with the file; when another
    /// program wrote, the history is gone and nothing is undone. A file that
    /// cannot be read again is reported through writeFailed.
    void undo();
    void redo();

    /// The details of the last changed(): its kind and, for appended encounters, where they start.
    struct Change {
        ChangeKind kind = ChangeKind::Reset;
        size_t firstAppended = 0; // EncountersAppended: index of the first new encounter
    };
    const Change& lastChange() const { return lastChange_; }
    /// The revision of the records as this window knows the file: a new
    /// number after every open, close, re-read and write (edits, undo, lists,
    /// settings), unchanged when more groups are only read into the cache or
    /// dropped from it. A result computed from the encounters of a group this
    /// document holds (holdsGroup) stays true while the revision is the same.
    std::uint64_t revision() const { return revision_; }

    /// The undo history of edits to this file. Cleared only through clearHistory().
    QUndoStack* undoStack() const { return undoStack_; }
    /// Empties the undo history, the one place that does; when it held
    /// anything, historyCleared(reason) tells the person why.
    void clearHistory(const QString& reason);

    bool isOpen() const { return store_.has_value(); }
    bool isReadOnly() const { return readOnly_; }
    QString path() const { return path_; }

    /// The open store for reading, or nullptr; writes go through ColonyEditFacade.
    const core::ColonyStore* store() const { return store_ ? &*store_ : nullptr; }
    /// The animals and residences; its `encounters` is always empty (encounters() holds them).
    const core::Colony& pedigree() const { return *colony_; }
    /// The encounters held, in seq order (all of the file's once isComplete()).
    const core::EncounterRecords& encounters() const { return *records_; }
    /// pedigree() with the encounters held for `group`'s scope as Encounters
    /// (every one held when `group` is empty), for the analyses of core that
    /// take a Colony: a copy made for the occasion; a job makes it on its own
    /// thread (Snapshot::colonyFor).
    core::Colony colonyFor(std::string_view group) const;
    /// pedigree() with the encounters held in which `animal` takes part (an
    /// animal's edit is checked against those).
    core::Colony colonyWithAnimal(std::string_view animal) const;
    /// The latest date of the encounters held, if any.
    std::optional<core::Day> lastEncounterDay() const;
    const core::ResidenceIndex& residences() const { return residences_; }

    /// The name stamped on the audit rows of this connection's writes (not a
    /// change to the file itself); ignored when no colony is open.
    void setAuditUserName(const std::string& name);

    /// An unchanging copy of pedigree(), encounters() and residences() for
    /// background jobs: shared with the document until its next change, which
    /// then copies what it changes (the compact encounters: tens of
    /// milliseconds for millions of rows) instead of waiting for the job.
    struct Snapshot {
        std::shared_ptr<const core::Colony> pedigree; ///< encounters empty
        std::shared_ptr<const core::EncounterRecords> encounters;
        std::shared_ptr<const core::ResidenceIndex> residences;
        /// The pedigree with the encounters an analysis of `group` reads
        /// (EncounterRecords::expandScope; every one when `group` is empty),
        /// as the analyses of core take them. For a job's own thread.
        core::Colony colonyFor(std::string_view group) const;
        /// The compact records a job about `group` selects from: the group's
        /// own, copied out in one scan, after which this snapshot lets go of
        /// the document's records; for every group (`group` empty) the
        /// shared records themselves. For a job's own thread.
        std::shared_ptr<const core::CompactEncounters> takeScope(std::string_view group);
    };
    Snapshot snapshot() const;

signals:
    /// Emitted once after any open, close, reload or write; lastChange() has the details.
    void changed(hierloom::ui::ColonyDocument::ChangeKind kind);
    /// An edit or its undo could not be written (disk full, file locked...).
    void writeFailed(const QString& message);
    /// The undo history was emptied; `reason` says why, for the status bar.
    void historyCleared(const QString& reason);
    /// Another program wrote to the file and it was read again (catchUpWithFile);
    /// `message` names the file, what changed in numbers, and that the history was emptied.
    void changedOutside(const QString& message);
    /// An edit was undone (`undone` true) or redone; `text` is the edit's name
    /// ("Enter NC004 over NC012"), for the status bar.
    void historyStepped(bool undone, const QString& text);
    /// A view with a group choice should turn to `group` (showGroup).
    void groupShown(const QString& group);
    /// The background load of a large file: `done` of `total` parts read (BackgroundEncounterLoad::partsFor).
    void loadProgress(int done, int total);
    /// Every encounter is now in the cache (an EncountersChanged came just before).
    void loadFinished();
    /// The background load failed; the cache keeps the groups it holds.
    void loadFailed(const QString& message);

private:
    // The writers: the facade and the undo commands reach the store and the
    // cache updates below; nothing else can.
    friend class ColonyEditFacade;
    friend class ColonyCommand;

    core::ColonyStore& writableStore();
    /// Re-reads animals and residences only (encounters unchanged).
    void reloadAnimals();
    /// Brings the cached encounters up to date after `removed` were deleted from
    /// the file and `inserted` written (seq order kept), without re-reading a
    /// million rows.
    void applyEncounterChange(const std::vector<core::Encounter>& removed, const std::vector<core::Encounter>& inserted);
    /// Announces a change that leaves the cached records as they are (lists, settings).
    void announce(ChangeKind kind);
    /// catchUpWithFile() once the event loop runs again: for an undo command,
    /// inside which the history may not be emptied.
    void catchUpLater();

    /// What a read of the file gave: everything, or (a large file) the
    /// encounters of `groups` only.
    struct Read {
        core::Colony colony; // animals and residences
        core::EncounterRecords records;
        bool complete = true;
        std::vector<std::string> groups;
        std::int64_t encounters = 0; // in the file
    };
    Read readFile(const core::ColonyStore& store, std::vector<std::string> groups) const;
    void adopt(core::ColonyStore store, const QString& path, bool readOnly);
    /// Takes a read as the cache; starts the background load when it is partial.
    void take(Read read);
    void startBackgroundLoad();
    /// The quick check of a file kept group by group, on a thread of its own,
    /// so the first write need not run it (trustIntegrityCheckedAt).
    void startBackgroundCheck();
    /// Forgets the least recently asked-for groups beyond heldGroupLimit() (not
    /// while loading) and returns them; the caller drops their rows.
    std::vector<std::string> dropOldGroups();
    void stopBackgroundLoad();
    void backgroundLoaded(std::shared_ptr<core::EncounterRecords> all);
    /// The animals and residences for changing: copied first when a snapshot still shares them.
    core::Colony& editPedigree();
    /// The encounters for changing: copied first when a snapshot still shares them.
    core::EncounterRecords& editRecords();
    /// Announces a change; `recordsChanged` false when the cache only read
    /// or dropped groups (the file's records, and revision(), are as they were).
    void emitChange(Change change, bool recordsChanged = true);

    std::optional<core::ColonyStore> store_;
    std::shared_ptr<core::Colony> colony_;            // animals, residences; shared with snapshots until changed
    std::shared_ptr<core::EncounterRecords> records_; // shared with snapshots until changed
    core::ResidenceIndex residences_;
    QString path_;
    bool readOnly_ = false;
    Change lastChange_;
    std::uint64_t revision_ = 0;
    QUndoStack* undoStack_;
    mutable Snapshot snapshot_; // empty until asked for after a change
    std::int64_t knownVersion_ = 0; // the store's dataVersion() when the file was last read
    // Opening in steps (a large file): see the class comment.
    std::int64_t progressiveFrom_ = 300000;
    std::int64_t readEverythingUpTo_ = 1000000;
    std::size_t heldGroupLimit_ = 4;
    std::int64_t keptFromSeq_ = 0; // rows after this (new since the read) are never dropped from the cache
    bool complete_ = true;
    std::vector<std::string> heldGroups_;
    std::unique_ptr<BackgroundEncounterLoad> loader_;
    std::unique_ptr<BackgroundEncounterLoad> checker_; // see startBackgroundCheck
    std::uint64_t checkGeneration_ = 0;
    std::uint64_t loadGeneration_ = 0; // results of a cancelled load are dropped
    // This window's encounter changes while the background load runs, applied
    // again to its result (which may or may not have seen them).
    std::vector<std::pair<std::vector<core::Encounter>, std::vector<core::Encounter>>> journal_;
};

} // namespace hierloom::ui
