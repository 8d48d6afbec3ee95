// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/write_transaction.h"

#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/file_identity.h"

#include <sqlite3.h>

#include <stdexcept>

namespace hierloom::core {

WriteTransaction::WriteTransaction(ColonyStore& store, Size size)
    : store_(store),
      nested_(sqlite3_get_autocommit(store.handle()) == 0),
      bulk_(size != Size::Small),
      checksOff_(size == Size::CheckedBulk)
{
    if (checksOff_ && nested_)
        throw std::logic_error("a checked bulk transaction cannot run inside another transaction");
    if (checksOff_) {
        // The foreign-key pragma is a no-op inside a transaction, so these come first.
        store_.exec("PRAGMA cache_size = -65536");
        store_.exec("PRAGMA foreign_keys = OFF");
        store_.exec("PRAGMA ignore_check_constraints = ON");
    }
    try {
        store_.exec(nested_ ? "SAVEPOINT write_records" : "BEGIN IMMEDIATE");
    } catch (...) {
        restoreConnection();
        throw;
    }
    if (!nested_) {
        try {
            // Inside the transaction, so no other program changes the file between the check and the write.
            store_.checkBeforeWrite();
        } catch (...) {
            sqlite3_exec(store_.handle(), "ROLLBACK", nullptr, nullptr, nullptr);
            restoreConnection();
            throw;
        }
    }
    if (bulk_) {
        try {
            // The trigger's per-row check costs a fifth of a bulk load; dropping
            // it inside the transaction is undone by any rollback.
            store_.exec(auditTriggerDropSql("encounter", "insert").c_str());
            store_.exec(auditTriggerDropSql("encounter_support", "insert").c_str());
        } catch (...) {
            sqlite3_exec(store_.handle(), nested_ ? "ROLLBACK TO write_records; RELEASE write_records" : "ROLLBACK",
                         nullptr, nullptr, nullptr);
            restoreConnection();
            throw;
        }
    }
}

void WriteTransaction::commit()
{
    if (bulk_) {
        store_.exec(auditTriggerSql("encounter", "insert").c_str());
        store_.exec(auditTriggerSql("encounter_support", "insert").c_str());
    }
    if (!nested_) countFileWrite(store_); // every -wal this program writes carries the file's identity
    if (nested_) store_.exec("RELEASE write_records");
    else store_.commitWrite();
    done_ = true;
    restoreConnection();
}

WriteTransaction::~WriteTransaction()
{
    if (done_) return;
    sqlite3_exec(store_.handle(), nested_ ? "ROLLBACK TO write_records; RELEASE write_records" : "ROLLBACK", nullptr,
                 nullptr, nullptr);
    restoreConnection();
}

void WriteTransaction::restoreConnection() noexcept
{
    if (!checksOff_) return;
    sqlite3_exec(store_.handle(), "PRAGMA foreign_keys = ON; PRAGMA ignore_check_constraints = OFF; PRAGMA cache_size = -2000",
                 nullptr, nullptr, nullptr);
}

} // namespace hierloom::core
