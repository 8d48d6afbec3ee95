// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/encounter_terms.h"
#include "core/store/sqlite_statement.h"
#include "core/store/support_rows.h"

#include <cstddef>
#include <cstdint>
#include <memory>
#include <string>
#include <unordered_set>
#include <vector>

namespace hierloom::core {

class ColonyStore;
class WriteTransaction;

// Adding checked records inside an open WriteTransaction. Records without a
// uid get a new one, written back into them.

void insertAnimals(ColonyStore& store, std::vector<Animal>& animals);
void insertResidences(ColonyStore& store, std::vector<Residence>& residences);

/// Adds encounters one by one: each gets the next seq after the file's
/// largest (written back) and a uid if it has none; its supporters and the
/// observers are recorded.
/// In a bulk transaction finish() writes the one audit row naming the source
/// and the seq range; otherwise the schema's trigger audits every row.
class EncounterAppender {
public:
    EncounterAppender(ColonyStore& store, const WriteTransaction& transaction);

    void add(Encounter& e);
    /// The same for an encounter that has no uid of its own: it gets the
    /// derived `uid` (its bytes are written as they are; e.uid stays empty).
    /// An encounter that has a uid keeps it.
    void add(Encounter& e, const UidBytes& uid);
    /// add(rows[i], uids[i]) for every row in order. In a bulk transaction
    /// consecutive rows without supporters go kRowsPerInsert at a time into
    /// one statement: the same rows, seqs and order, with less work per row.
    void add(std::vector<Encounter>& rows, const std::vector<UidBytes>& uids);
    /// Records the observers and, for a bulk load, the audit row; call once, before commit.
    void finish(const std::string& source);

    std::int64_t count() const { return count_; }
    /// Seq of the first encounter added (valid when count() > 0).
    std::int64_t firstSeq() const { return firstSeq_; }

private:
    static constexpr std::size_t kRowsPerInsert = 64;
    /// Notes the observer of an encounter whose columns were just bound.
    void noteObserver(const Encounter& e);

    ColonyStore& store_;
    bool bulk_;
    bool indexAfter_ = false; ///< the group index was dropped for the load; finish() builds it
    SqliteStatement insert_;
    std::unique_ptr<SqliteStatement> insertMany_; ///< kRowsPerInsert rows, prepared when first needed
    EncounterTermCodes terms_;
    SupportWriter support_;
    std::int64_t nextSeq_ = 1;
    std::int64_t firstSeq_ = 1;
    std::int64_t count_ = 0;
    std::vector<bool> observerCodes_; ///< by term code: the observers already in observers_
    std::unordered_set<std::string> observers_;
};

} // namespace hierloom::core
