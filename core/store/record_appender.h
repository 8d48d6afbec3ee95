// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/encounter_terms.h"
#include "core/store/sqlite_statement.h"
#include "core/store/support_rows.h"

#include <cstdint>
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
    /// Records the observers and, for a bulk load, the audit row; call once, before commit.
    void finish(const std::string& source);

    std::int64_t count() const { return count_; }
    /// Seq of the first encounter added (valid when count() > 0).
    std::int64_t firstSeq() const { return firstSeq_; }

private:
    ColonyStore& store_;
    bool bulk_;
    bool indexAfter_ = false; ///< the group index was dropped for the load; finish() builds it
    SqliteStatement insert_;
    EncounterTermCodes terms_;
    SupportWriter support_;
    std::int64_t nextSeq_ = 1;
    std::int64_t firstSeq_ = 1;
    std::int64_t count_ = 0;
    std::string lastObserver_;
    std::unordered_set<std::string> observers_;
};

} // namespace hierloom::core
