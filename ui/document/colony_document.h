// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/colony_store.h"
#include "core/base/residence_index.h"

#include <QObject>
#include <QString>

#include <memory>
#include <optional>
#include <vector>

class QUndoStack;

namespace hierloom::ui {

/// The one open colony file and a cached copy of its records. Models and
/// views read the cache and listen to changed(); every writer (import now,
/// undo commands later) calls reload() after changing the store, so nothing
/// can be left showing stale data. Errors are thrown as core::ColonyFileError.
class ColonyDocument : public QObject {
    Q_OBJECT
public:
    explicit ColonyDocument(QObject* parent = nullptr);
    ~ColonyDocument() override;

    /// Opens an existing colony file; the current one stays open if this throws.
    void open(const QString& path, bool readOnly = false);
    /// Creates a new, empty colony file and opens it for writing.
    void create(const QString& path);
    void close();
    /// Re-reads the records from the file; called after anything wrote to it.
    void reload();
    /// Re-reads animals and residences only (encounters unchanged), after a pedigree or life-history edit.
    void reloadAnimals();
    /// Brings the cached encounters up to date after `removed` were deleted from
    /// the file and `inserted` written (seq order kept), without re-reading a
    /// million rows; used by the undo commands of encounter edits.
    void applyEncounterChange(const std::vector<core::Encounter>& removed, const std::vector<core::Encounter>& inserted);
    /// Announces a change of the behaviour code or observer lists.
    void listsChanged();

    /// What the last changed() was about, so a listener may update only what changed.
    struct Change {
        enum Kind { Reset, EncountersAppended, EncountersChanged, AnimalsChanged, ListsChanged };
        Kind kind = Reset;
        size_t firstAppended = 0; // EncountersAppended: index of the first new encounter
    };
    const Change& lastChange() const { return lastChange_; }

    /// The undo history of edits to this file (cleared when another file opens
    /// or something outside the history, such as an import, writes to it).
    QUndoStack* undoStack() const { return undoStack_; }

    bool isOpen() const { return store_.has_value(); }
    bool isReadOnly() const { return readOnly_; }
    QString path() const { return path_; }

    /// The open store, or nullptr; writers must call reload() afterwards.
    core::ColonyStore* store() { return store_ ? &*store_ : nullptr; }
    const core::Colony& colony() const { return colony_; }
    const core::ResidenceIndex& residences() const { return residences_; }

    /// An unchanging copy of colony() and residences() for background jobs:
    /// made on the first request after a change and shared by every view
    /// until the next change, so a change costs one copy, not one per view.
    struct Snapshot {
        std::shared_ptr<const core::Colony> colony;
        std::shared_ptr<const core::ResidenceIndex> residences;
    };
    Snapshot snapshot() const;

signals:
    /// Emitted once after any open, close, reload or edit.
    void changed();
    /// An edit or its undo could not be written (disk full, file locked...).
    void writeFailed(const QString& message);

private:
    void adopt(core::ColonyStore store, const QString& path, bool readOnly);

    std::optional<core::ColonyStore> store_;
    core::Colony colony_;
    core::ResidenceIndex residences_;
    QString path_;
    bool readOnly_ = false;
    Change lastChange_;
    QUndoStack* undoStack_;
    mutable Snapshot snapshot_; // empty until asked for after a change
};

} // namespace hierloom::ui
