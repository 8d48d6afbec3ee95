// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_store.h"

#include <QString>

namespace hierloom::ui {

/// A second, read-only connection to the colony file at `path`, for a job on
/// a worker thread that reads the file a piece at a time (the document's own
/// connection belongs to the interface thread; a store is used by one thread
/// at a time). SQLite opens it read-only, so nothing can be written through
/// it; in WAL mode it sees every write committed before each of its reads.
/// Opening it runs the store's integrity check; call it on the worker thread.
core::ColonyStore openReadingConnection(const QString& path);

} // namespace hierloom::ui
