// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

class ColonyStore;

/// One write to a colony file, whole or not at all. The constructor starts an
/// IMMEDIATE transaction (other programs may still read, none may write until
/// it ends), or a savepoint when the connection is already inside one; the
/// destructor rolls back unless commit() ran.
///
/// A bulk transaction (an import or merge of many encounters) additionally
/// drops the per-row audit trigger on encounters for its duration and
/// restores it in commit(); the caller then writes one audit row for the
/// whole load.
///
/// A checked bulk transaction is a bulk transaction whose caller has checked
/// every row it writes against every rule of the schema (animal ids, date
/// forms, time range, outcome, winner differs from loser), against the
/// colony as read inside this transaction. It turns foreign-key and CHECK
/// enforcement off for its duration, as repeating the checks row by row is a
/// third of the cost of the load, and enlarges the page cache. It cannot be
/// nested in another transaction. Everything is restored by commit() and by
/// the rollback alike.
class WriteTransaction {
public:
    enum class Size { Small, Bulk, CheckedBulk };

    explicit WriteTransaction(ColonyStore& store, Size size = Size::Small);
    ~WriteTransaction();
    WriteTransaction(const WriteTransaction&) = delete;
    WriteTransaction& operator=(const WriteTransaction&) = delete;

    void commit();

    /// True for a bulk transaction (one audit row for the whole load).
    bool bulk() const { return bulk_; }

private:
    void restoreConnection() noexcept;

    ColonyStore& store_;
    bool nested_ = false;
    bool bulk_ = false;
    bool checksOff_ = false;
    bool done_ = false;
};

} // namespace hierloom::core
