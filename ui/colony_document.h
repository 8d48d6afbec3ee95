// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/colony.h"
#include "core/colony_store.h"
#include "core/residence_index.h"

#include <QObject>
#include <QString>

#include <optional>

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

    bool isOpen() const { return store_.has_value(); }
    bool isReadOnly() const { return readOnly_; }
    QString path() const { return path_; }

    /// The open store, or nullptr; writers must call reload() afterwards.
    core::ColonyStore* store() { return store_ ? &*store_ : nullptr; }
    const core::Colony& colony() const { return colony_; }
    const core::ResidenceIndex& residences() const { return residences_; }

signals:
    /// Emitted once after any open, close, reload or edit.
    void changed();

private:
    void adopt(core::ColonyStore store, const QString& path, bool readOnly);

    std::optional<core::ColonyStore> store_;
    core::Colony colony_;
    core::ResidenceIndex residences_;
    QString path_;
    bool readOnly_ = false;
};

} // namespace hierloom::ui
