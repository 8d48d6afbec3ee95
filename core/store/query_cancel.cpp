// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/query_cancel.h"

#include "core/store/colony_store.h"

#include <sqlite3.h>

namespace hierloom::core {

namespace {

// SQLite calls this every few thousand virtual-machine steps; non-zero interrupts the query.
int stopWhenSet(void* flag) { return static_cast<const std::atomic<bool>*>(flag)->load() ? 1 : 0; }

} // namespace

void stopQueriesWhen(ColonyStore& store, const std::atomic<bool>& flag)
{
    sqlite3_progress_handler(store.handle(), 4000, stopWhenSet,
                             const_cast<void*>(static_cast<const void*>(&flag)));
}

} // namespace hierloom::core
