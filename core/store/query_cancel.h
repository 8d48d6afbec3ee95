// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <atomic>

namespace hierloom::core {

class ColonyStore;

/// From now on every query of `store` stops, with a ColonyFileError, within a
/// few thousand SQLite steps of `flag` becoming true (a background read that
/// is no longer wanted). `flag` must outlive the store's queries.
void stopQueriesWhen(ColonyStore& store, const std::atomic<bool>& flag);

} // namespace hierloom::core
