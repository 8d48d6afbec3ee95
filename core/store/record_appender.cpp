// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/record_appender.h"

#include "core/store/colony_store.h"
#include "core/store/colony_schema.h"
#include "core/store/record_binding.h"
#include "core/store/write_transaction.h"

#include <algorithm>
#include <cstddef>

namespace hierloom::core {

namespace {

template <typename Record, typename Bind>
void insertRecords(ColonyStore& store, const char* sql, std::vector<Record>& records, const Bind& bind)
{
    if (records.empty()) return;
    SqliteStatement ins(store.handle(), sql);
    for (Record& r : records) {
        if (r.uid.empty()) r.uid = newUid();
        bind(ins, r);
        ins.run();
    }
}

} // namespace

void insertAnimals(ColonyStore& store, std::vector<Animal>& animals)
{
    insertRecords(store, kInsertAnimalSql, animals, bindAnimalColumns);
}

void insertResidences(ColonyStore& store, std::vector<Residence>& residences)
{
    insertRecords(store, kInsertResidenceSql, residences, bindResidenceColumns);
}

EncounterAppender::EncounterAppender(ColonyStore& store, const WriteTransaction& transaction)
    : store_(store), bulk_(transaction.bulk()), insert_(store.handle(), kInsertEncounterSql), terms_(store.handle()),
      support_(store.handle())
{
    nextSeq_ = highestEncounterSeq(store.handle()) + 1;
    firstSeq_ = nextSeq_;
    // Into an empty table, a bulk load writes the rows first and sorts them
    // into the group index once at the end (finish): faster than
    // keeping the index up to date row by row (DEVELOPERS.md), and the index comes out with
    // full pages. Inside the transaction, so a rollback brings the index back.
    if (bulk_ && nextSeq_ == 1) {
        {
            SqliteStatement q(store.handle(), "SELECT 1 FROM sqlite_schema WHERE type = 'index' AND name = ?");
            q.bind(1, std::string_view(kEncounterIndexName));
            indexAfter_ = q.step();
        } // finished before the schema changes
        if (indexAfter_) store.exec((std::string("DROP INDEX ") + kEncounterIndexName).c_str());
    }
}

void EncounterAppender::add(Encounter& e)
{
    if (e.uid.empty()) e.uid = newUid();
    e.seq = nextSeq_++;
    bindEncounterColumns(insert_, e, terms_);
    noteObserver(e);
    insert_.run();
    support_.add(e);
    ++count_;
}

void EncounterAppender::add(Encounter& e, const UidBytes& uid)
{
    e.seq = nextSeq_++;
    bindEncounterColumns(insert_, e, uid, terms_);
    noteObserver(e);
    insert_.run();
    if (e.uid.empty()) support_.add(e, uid);
    else support_.add(e);
    ++count_;
}

void EncounterAppender::add(std::vector<Encounter>& rows, const std::vector<UidBytes>& uids)
{
    std::size_t i = 0;
    while (i < rows.size()) {
        // Rows from i on without supporters, up to a statement's worth.
        std::size_t plain = 0;
        while (plain < kRowsPerInsert && i + plain < rows.size() && rows[i + plain].winnerSupport.empty() &&
               rows[i + plain].loserSupport.empty())
            ++plain;
        if (!bulk_ || plain < kRowsPerInsert) {
            for (const std::size_t end = i + std::max<std::size_t>(plain, 1); i < end; ++i) add(rows[i], uids[i]);
            continue;
        }
        if (!insertMany_)
            insertMany_ = std::make_unique<SqliteStatement>(store_.handle(), insertEncountersSql(kRowsPerInsert).c_str());
        for (int k = 0; k < static_cast<int>(kRowsPerInsert); ++k, ++i) {
            rows[i].seq = nextSeq_++;
            bindEncounterColumns(*insertMany_, rows[i], uids[i], terms_, k);
            noteObserver(rows[i]);
        }
        insertMany_->run();
        count_ += kRowsPerInsert;
    }
}

void EncounterAppender::noteObserver(const Encounter& e)
{
    if (e.observer.empty()) return;
    // Its code was just bound, so this finds it without a look-up; the set
    // gets each observer once, in the order first met.
    const auto code = static_cast<std::size_t>(terms_(e.observer));
    if (code >= observerCodes_.size()) observerCodes_.resize(code + 1, false);
    if (observerCodes_[code]) return;
    observerCodes_[code] = true;
    observers_.insert(e.observer);
}

void EncounterAppender::finish(const std::string& source)
{
    SqliteStatement obs(store_.handle(), "INSERT OR IGNORE INTO observer(name) VALUES (?)");
    for (const std::string& name : observers_) {
        obs.bind(1, name);
        obs.run();
    }
    if (indexAfter_) {
        store_.exec(encounterIndexSql());
        indexAfter_ = false;
    }
    if (!bulk_ || count_ == 0) return;
    SqliteStatement note(store_.handle(), "INSERT INTO audit(tbl, action, new_values) VALUES ('encounter', 'import', "
                                          "json_object('source', ?, 'count', ?, 'first_seq', ?, 'last_seq', ?))");
    note.bind(1, source);
    note.bind(2, count_);
    note.bind(3, firstSeq_);
    note.bind(4, nextSeq_ - 1);
    note.run();
}

} // namespace hierloom::core
